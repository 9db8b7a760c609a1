/**
 * The setting a passage carries (src/claims/bind-setting.ts, docs/binding.md, The setting): a value's
 * period or region group filled from the latest period or region named before the sentence, read
 * through the whole engine on short drafts of our own (so the sentences before, the lead-in and the
 * heading are the engine's own). Each factual check names the pack's source beside it.
 */
import { describe, expect, it } from 'vitest';
import { loadPacks } from '../../src/rulepack/index.js';
import { readingOf as readingWith, type Row } from './fixtures/reading-of.js';
import { settingKindsOf } from '../../src/claims/bind-setting.js';

const packs = await loadPacks([]);

const readingOf = (draft: string, number: string) => readingWith(packs, draft, number);

const LAG = 'antarctic-co2-phasing-termination-1-consensus';

// Over the last deglaciation Antarctic temperature and CO2 moved within a few centuries of each other
// (Pedro et al. 2012, Climate of the Past 8:1213-1221; Parrenin et al. 2013, Science 339:1060-1063;
// Chowdhry Beeman et al. 2019, Climate of the Past 15:913-926: the pack's consensus envelope, -200 to
// +650 years). A lag of thousands of years is wrong for that setting.
const CARRIED: Row[] = [
  // The period set by an earlier sentence of the paragraph, in several wordings.
  ['At the end of the last ice age, Antarctica warmed first. In the Antarctic cores carbon dioxide trails temperature by some 6,000 years.', '6,000 years', LAG, true],
  ['During the last deglaciation the great ice sheets shrank. In Antarctica, CO2 lagged temperature by about 5,000 years.', '5,000 years', LAG, true],
  ['The last deglaciation was uneven. Seen from Antarctica, the carbon dioxide curve trailed the temperature curve by roughly 4,000 years.', '4,000 years', LAG, true],
  ['Termination I is the best-dated warming we have. In Antarctica, the gas CO2 followed temperature by close to 3,000 years.', '3,000 years', LAG, true],
  // The section heading sets it.
  ['## The last deglaciation\n\nIn Antarctica, CO2 lagged temperature by some 2,500 years.', '2,500 years', LAG, true],
  // A figure inside the envelope binds and stays clean.
  ['At the end of the last ice age, Antarctica warmed first. In the Antarctic cores carbon dioxide trails temperature by some 300 years.', '300 years', LAG, false],
];

// Look-alikes that keep their own setting or have none to take.
const KEPT: Row[] = [
  // A setting contradicted in the sentence: the start of the last glaciation (at glacial inceptions CO2
  // lagged by several thousand years: Petit et al. 1999, Nature 399:429-436, from memory as the pack's
  // note records), in three wordings, dated or not.
  ['At the end of the last ice age, Antarctica warmed first. At the start of the last glaciation, CO2 in the Antarctic cores trailed temperature by some 6,000 years.', '6,000 years', '-', false],
  ['At the end of the last ice age, Antarctica warmed first. About 115,000 years ago, CO2 in the Antarctic cores trailed temperature by some 6,000 years.', '6,000 years', '-', false],
  ['At the end of the last ice age, Antarctica warmed first. In the run-up to the last glacial, CO2 in Antarctica lagged temperature by some 6,000 years.', '6,000 years', '-', false],
  // A later sentence names another period: the latest setting is the Younger Dryas, not the deglaciation.
  ['At the end of the last ice age, Antarctica warmed first. Then the Younger Dryas set in. In the Antarctic cores carbon dioxide trails temperature by some 6,000 years.', '6,000 years', '-', false],
  // A new paragraph on another period.
  ['At the end of the last ice age, Antarctica warmed first.\n\nThe last glacial period set in slowly. In Antarctica, CO2 lagged temperature by about 5,000 years.', '5,000 years', '-', false],
  // Another region in the sentence keeps its own.
  ['At the end of the last ice age, Antarctica warmed first. In the Greenland cores carbon dioxide trails temperature by some 6,000 years.', '6,000 years', '-', false],
  // The setting's sentence brings its vetoes: Termination III (Caillon et al. 2003, Science 299:1728-1731).
  ['Caillon and colleagues studied Termination III at Vostok. In the Antarctic cores carbon dioxide trails temperature by some 6,000 years.', '6,000 years', '-', false],
  // A sentence that opens before a time of its own ("before the mills") takes no period from the passage.
  ['Glacial cycles shaped the valley.\n\nSecond, the gas. Before the mills and the railways the air held about 250 ppm of carbon dioxide.', '250 ppm', '-', false],
  // Figures of one another (a conversion) take no setting.
  ['At the coldest point of the last ice age the air was thin in CO2. In percent of the air, 420 ppm is 0.042 percent.', '420 ppm', '-', false],
];

describe('a setting carried by the passage (bind-setting.ts)', () => {
  it.each(CARRIED)('%s → %s binds %s', async (draft, number, value, flagged) => {
    expect(await readingOf(draft, number)).toEqual({ value, flagged });
  });
  it.each(KEPT)('%s → %s stays %s', async (draft, number, value, flagged) => {
    expect(await readingOf(draft, number)).toEqual({ value, flagged });
  });

  it('reads the setting kinds from the lexicon: periods are times, regions places, cores neither', () => {
    const kinds = settingKindsOf(packs);
    const time = kinds.get('time') ?? new Set<string>();
    const place = kinds.get('place') ?? new Set<string>();
    expect([...time]).toEqual(expect.arrayContaining(['deglaciation', 'lgm', 'glacial', 'younger-dryas', 'preindustrial']));
    expect([...place]).toEqual(expect.arrayContaining(['antarctic', 'greenland', 'global']));
    // "Vostok" is an Antarctic word of the lexicon but a core: no setting. "Caillon" is a study.
    for (const id of ['vostok', 'edc', 'caillon', 'co2', 'lag']) {
      expect(time.has(id) || place.has(id)).toBe(false);
    }
  });
});

// What a comparison is set against ("colder than it is today") names no setting, neither the
// passage's nor the sentence's own. Glacial sea level some 120-135 m below today's (Lambeck et al. 2014,
// PNAS 111:15296-15303); glacial cooling about 6 °C, 4-7 °C (the pack's gmst value, Tierney et al. 2020).
const STANDARDS: Row[] = [
  ['During the last ice age thick ice covered Canada. Back then the world ran a few degrees colder than it is today. Sea level fell some 40 metres.', '40 metres', 'lgm-sea-level-lowstand', true],
  ['In the depths of the last glacial, great ice sheets spread over Canada. The whole Earth was about 2 °C colder than today.', '2 °C', 'gmst-lgm-to-preindustrial-warming', true],
  // "Today" as the time the sentence speaks from is a setting still: no glacial figure.
  ['During the last ice age thick ice covered Canada. Today sea level sits some 40 metres above the old shore.', '40 metres', '-', false],
];

describe('a comparison standard is no setting', () => {
  it.each(STANDARDS)('%s → %s binds %s', async (draft, number, value, flagged) => {
    expect(await readingOf(draft, number)).toEqual({ value, flagged });
  });
});

// The duration of the deglacial CO2 rise: about 6,500 years (Monnin et al. 2001, Science 291:112-114,
// as the pack's co2-deglacial-rise-duration cites it).
describe('durations in a passage that set the period', () => {
  it('binds the deglacial rise told with its measure after the period is named', async () => {
    expect(await readingOf('The last deglaciation was uneven. Carbon dioxide took about 2,000 years to climb.', '2,000 years')).toEqual({ value: 'co2-deglacial-rise-duration', flagged: true });
    expect(await readingOf('The last deglaciation was uneven. Carbon dioxide rose over about 6,500 years.', '6,500 years')).toEqual({ value: 'co2-deglacial-rise-duration', flagged: false });
  });
  it('leaves a duration with a date of its own alone', async () => {
    expect(await readingOf('The last deglaciation was uneven. From 18,000 years ago, carbon dioxide rose over about 2,000 years.', '2,000 years')).toEqual({ value: '-', flagged: false });
  });
});

// The pack declares the deglaciation the default setting of the consensus lag: a CO2-temperature lag
// told with no period, in a passage that names none, is about the deglaciations (Pedro et al. 2012;
// Parrenin et al. 2013 as above).
describe('a default setting declared by a value', () => {
  it('fills the period when neither the sentence nor the passage names one', async () => {
    expect(await readingOf('Ice cores hold old air. In Antarctica, CO2 lagged temperature by about 5,000 years.', '5,000 years')).toEqual({ value: LAG, flagged: true });
  });
  it('never overrides a period the passage names', async () => {
    expect(await readingOf('The last glacial period set in slowly. In Antarctica, CO2 lagged temperature by about 5,000 years.', '5,000 years')).toEqual({ value: '-', flagged: false });
  });
  // The lag in the cores is measured against Antarctic temperature (Pedro et al. 2012; Parrenin et al.
  // 2013 as above), so the pack declares the Antarctic the lag's default region as well.
  it('fills the region and the period when the passage names neither', async () => {
    expect(await readingOf('Old air sits in bubbles in the ice. In those bubbles, carbon dioxide trailed the warming by roughly 7,000 years.', '7,000 years')).toEqual({ value: LAG, flagged: true });
    expect(await readingOf('Old air sits in bubbles in the ice. In those bubbles, carbon dioxide trailed the warming by roughly 300 years.', '300 years')).toEqual({ value: LAG, flagged: false });
  });
  it('never overrides a region the sentence or the passage names', async () => {
    expect(await readingOf('Old air sits in bubbles in the ice. Over the whole globe, carbon dioxide trailed the warming by roughly 7,000 years.', '7,000 years')).toEqual({ value: '-', flagged: false });
    expect(await readingOf('Greenland holds the best northern record. There, carbon dioxide trailed the warming by roughly 7,000 years.', '7,000 years')).not.toEqual({ value: LAG, flagged: true });
  });
});

// The Younger Dryas lasted about 1,100-1,300 years (Rasmussen et al. 2006, JGR 111:D06102; Rasmussen
// et al. 2014, QSR 106:14-28, as the pack's younger-dryas-duration cites them). "Relapse" is a noun of
// the kind `period` (lexicon `kinds`): "that relapse" takes up the latest period named before it.
describe('a relapse is a period', () => {
  it('takes up the period named before it', async () => {
    expect(await readingOf('The Younger Dryas brought the cold back to Europe. That relapse lasted about 3,000 years.', '3,000 years')).toEqual({ value: 'younger-dryas-duration', flagged: true });
    expect(await readingOf('The Younger Dryas brought the cold back to Europe. That cold relapse lasted about 1,200 years.', '1,200 years')).toEqual({ value: 'younger-dryas-duration', flagged: false });
  });
  it('takes up no period when none is named', async () => {
    expect(await readingOf('The ice cores tell the story of the air. That relapse lasted about 3,000 years.', '3,000 years')).toEqual({ value: '-', flagged: false });
  });
});

// CO2 stood near 190 ppm at the Last Glacial Maximum and near 280 ppm before industry (IPCC AR6 WGI
// Chapter 2, Gulev et al. 2021, doi:10.1017/9781009157896.004: the pack's co2-lgm and co2-preindustrial-1750).
describe('a sentence that opens on a time of its own', () => {
  const coldest = 'In the depths of the last glacial maximum, carbon dioxide stood near 190 ppm.';
  it('takes no period from the sentence before', async () => {
    expect(await readingOf(`${coldest} By the dawn of the steam age it had crept up to about 280 ppm.`, 'about 280 ppm')).toEqual({ value: '-', flagged: false });
    expect(await readingOf(`${coldest} Shortly before the first coal furnaces were lit, it had about 280 ppm.`, 'about 280 ppm')).toEqual({ value: '-', flagged: false });
  });

  it('still takes the period when its opening refers back ("by then", "at that time")', async () => {
    expect(await readingOf(`${coldest} By then it had dropped to about 280 ppm.`, 'about 280 ppm')).toEqual({ value: 'co2-lgm', flagged: true });
  });
});

// The gas a passage speaks of (`settings.gas`): a study's lag told without naming the gas again.
// Caillon et al. 2003 (Science 299:1728-1731): CO2 lagged Antarctic temperature by 800 ± 200 years
// across Termination III; Parrenin et al. 2013 (Science 339:1060-1063): no lag beyond about 200
// years either way at the breakpoints of Termination I (the pack's lag values and sources).
const GAS: Row[] = [
  ['Everyone quotes the CO2 lag. Caillon and his team later measured a lag of about 3,000 years at Termination III.', '3,000 years', 'lag-caillon2003-termination-iii', true],
  ['Carbon dioxide rose as the south warmed. In 2013 Parrenin and co-authors found a lag of about 2,000 years at the breakpoints.', '2,000 years', 'lag-parrenin2013', true],
  // Inside the study's range: bound and clean.
  ['Everyone quotes the CO2 lag. Caillon and his team later measured a lag of about 800 years at Termination III.', '800 years', 'lag-caillon2003-termination-iii', false],
];
// The gas fills a value's gas only when that is all its sentence lacks: a share of the air whose period
// and gas both come from the passage (280 ppm before 1750 is 0.028% of the air: IPCC AR6 WGI ch. 2,
// Gulev et al. 2021) stays unbound.
const GAS_KEPT: Row[] = [
  ['Before the industrial era the air held about 280 ppm of CO2. That is roughly 0.05 percent of the air.', '0.05 percent', '-', false],
  // No gas named before: nothing to fill.
  ['The ice tells of warm and cold. Caillon and his team later measured a lag of about 3,000 years at Termination III.', '3,000 years', '-', false],
];

describe('the gas a passage speaks of', () => {
  it.each(GAS)('%s → %s binds %s', async (draft, number, value, flagged) => {
    expect(await readingOf(draft, number)).toEqual({ value, flagged });
  });
  it.each(GAS_KEPT)('%s → %s stays %s', async (draft, number, value, flagged) => {
    expect(await readingOf(draft, number)).toEqual({ value, flagged });
  });
  it('reads the gas kind from the lexicon', () => {
    expect([...(settingKindsOf(packs).get('gas') ?? [])]).toEqual(['co2']);
  });
});
