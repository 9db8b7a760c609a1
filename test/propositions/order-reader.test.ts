/**
 * The order reader and the signed relations told as comparisons, in sentences of our own (none taken
 * from the evaluation corpus): an order needs two events and a word of sequence between them; a core's
 * name, a record's span, a rank or a lag told as a noun orders nothing. Each mechanism has several
 * wordings that must be flagged and correct look-alikes that must stay clean or be notes.
 *
 * The science:
 * - Antarctic temperature rose with CO2 or a few centuries before it at the start of the last
 *   deglaciation, never after it: Parrenin et al. 2013, Science 339, 1060-1063 (from memory);
 *   Pedro et al. 2012, Climate of the Past 8, 1213-1221; across Termination III CO2 lagged Antarctic
 *   temperature by 800 ± 200 years: Caillon et al. 2003, Science 299, 1728-1731.
 * - Global mean temperature mostly rose after CO2: Shakun et al. 2012, Nature 484, 49-54.
 * - CO2 solubility falls as water warms: Weiss 1974, Marine Chemistry 2, 203-215 (from memory).
 * - Ice-core air is younger than the ice around it (delta-age): Caillon et al. 2003, as above;
 *   Schwander and Stauffer 1984, Nature 311, 45-47 (from memory).
 * - Dome Fuji's second core (3,035 m, about 720,000 years) ranks behind EPICA Dome C (about 800,000
 *   years): Dome Fuji Ice Core Project Members 2017, Science Advances 3, e1600446; Jouzel et al. 2007,
 *   Science 317, 793-796.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { checkText } from '../../src/engine.js';
import { loadPacks } from '../../src/rulepack/index.js';
import type { LoadedPacks } from '../../src/rulepack/types.js';

let packs: LoadedPacks;
beforeAll(async () => {
  packs = await loadPacks([]);
});

/** A first sentence that puts the draft on topic. */
const TOPIC = 'Ice cores keep a record of CO2. ';

/** Rule ids of the flags on `text`, a note marked as such. */
const flagsOf = async (text: string) =>
  (await checkText(TOPIC + text, { packs, format: 'markdown' })).flags.map((f) => (f.level === 'note' ? `note:${f.ruleId}` : f.ruleId));

const ANTARCTIC = 'direction.antarctic-warming-not-behind-co2';
const SOLUBILITY = 'direction.co2-solubility-falls-with-warming';
const AIR_AGE = 'direction.trapped-air-younger-than-ice';

describe('CO2 told ahead of the Antarctic warming (Parrenin et al. 2013; Pedro et al. 2012)', () => {
  it.each([
    'At the close of the last glacial, carbon dioxide climbed some centuries ahead of Antarctic temperature.',
    'In the Antarctic cores the gas moved first and the temperature only caught up centuries later.',
    'Antarctic warming trailed the CO2 rise by roughly 800 years at the start of the deglaciation.',
    'Carbon dioxide began rising well before Antarctica started to warm.',
    'In Antarctica, CO2 had a head start of several hundred years on temperature.',
    'Over Antarctica, temperature lagged CO2 by a few centuries at the end of the last ice age.',
  ])('flags: %s', async (text) => {
    expect(await flagsOf(text)).toContain(ANTARCTIC);
  });

  it.each([
    // Correct orders and lags stated the right way round (Caillon et al. 2003 for Termination III).
    'In Antarctica, temperature started rising a few centuries before CO2 did.',
    'Antarctic temperature and CO2 rose within a few centuries of each other.',
    'Across Termination III, CO2 lagged Antarctic temperature by about 800 years.',
    // A lag told as a noun, with or without its figure, is the usual temperature-first lag.
    'The Antarctic lag is now put at a few centuries at most.',
    'Newer dating has cut that Antarctic delay to under 400 years.',
    'A lag of about 200 years separates the two Antarctic curves.',
    'Any lead or lag shorter than a millennium is blurred at low-snowfall sites such as Vostok.',
    // Ranks, ordinals and record spans beside a core's name order no events.
    'The second-deepest Antarctic core was drilled at Dome Fuji.',
    "Dome Fuji's record comes second, behind EPICA Dome C, at about 720,000 years.",
    'Vostok came first, and EPICA Dome C later pushed the record to 800,000 years.',
    "Japan's second Antarctic core reached 3,035 metres.",
    // The global order told beside the Antarctic one (Shakun et al. 2012).
    'Averaged over the globe, temperature rose after CO2, unlike Antarctic temperature.',
    'In Antarctica temperature and CO2 moved together, and for the world as a whole temperature followed CO2.',
    'For the world as a whole the order was reversed: most of the warming came after CO2 began to rise, and Antarctica was the exception.',
    // An elided subject: the clause after "or" is still the temperature's.
    'In Antarctica, temperature started to climb at about the same time as CO2, or a few centuries before it.',
  ])('leaves clean: %s', async (text) => {
    const flags = await flagsOf(text);
    expect(flags).not.toContain(ANTARCTIC);
    expect(flags.filter((f) => f.startsWith('direction.'))).toEqual([]);
  });

  it.each([
    'Some say CO2 led Antarctic temperature at the end of the ice age, but the best-dated cores show the two rising together.',
    'It is a myth that carbon dioxide rose before Antarctica warmed.',
  ])('a myth quoted or answered is a note: %s', async (text) => {
    const flags = await flagsOf(text);
    expect(flags).toContain(`note:${ANTARCTIC}`);
    expect(flags).not.toContain(ANTARCTIC);
  });
});

describe('solubility told as a comparison (Weiss 1974)', () => {
  it.each([
    'Cold seawater dissolves less CO2 than warm seawater does.',
    'Chilly water keeps a smaller share of dissolved carbon dioxide than warm water.',
    'Cold seawater retains a smaller fraction of its dissolved CO2 than warm seawater.',
    'Cold water can hold only half as much CO2 as warm water.',
    'Cold seas cannot keep as much carbon dioxide dissolved as warm seas do.',
    'Warm water can hold twice as much CO2 as cold water.',
  ])('flags: %s', async (text) => {
    expect(await flagsOf(text)).toContain(SOLUBILITY);
  });

  it.each([
    'Warm water cannot hold as much CO2 as cold water.',
    'Cold water holds a larger share of dissolved CO2 than warm water.',
    'Warm water holds about as much CO2 as it did a century ago.',
  ])('leaves clean: %s', async (text) => {
    expect(await flagsOf(text)).not.toContain(SOLUBILITY);
  });
});

describe('the age of the trapped air in informal wording (Schwander and Stauffer 1984)', () => {
  it.each([
    // An answer's "no" before its own clause denies nothing in it.
    'No, the bubbles are older than the ice around them.',
    'no the trapped air is older than the ice that holds it',
    'The air in the bubbles is older than the snow that buried it.',
  ])('flags: %s', async (text) => {
    expect(await flagsOf(text)).toContain(AIR_AGE);
  });

  it.each([
    // "No" that determines its noun still denies.
    'No bubble is older than the ice around it.',
    'No, the air is younger than the ice around it.',
    'The bubbles are younger than the ice that surrounds them.',
  ])('leaves clean: %s', async (text) => {
    expect(await flagsOf(text)).not.toContain(AIR_AGE);
  });
});
