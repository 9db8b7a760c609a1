/**
 * scope.regional-record-as-global, session 19: readings that carry over to unseen phrasings.
 *
 * - An answer reads what its question asked about: a pronoun opening the answer stands for the record
 *   the question names (or points back to), and an answer that names a record under a question about
 *   the whole planet gives the record's figure as the planet's.
 * - "more than 20 degrees on the Greenland panel": a "than" before a figure bounds it and sets no place
 *   against the globe; "warmer than pre-industrial times": "times" after no count names an era.
 * - "it's" after a record named earlier in its sentence stands for the record.
 * - A record's clause resumed after an apposition ("Dome Fuji, a single spot ..., hands us the global
 *   mean") still reads the record as the globe.
 * - A record that will be read ("will give the global temperature") is read as the globe all the same.
 * - "measured in", "recorded at": where a figure was read from.
 *
 * Sentences of our own. Sources: Antarctic glacial-interglacial swings of about 8-10 °C (Jouzel et al.
 * 2007, Science 317, 793-796); central Greenland about 20 °C colder at the LGM (Cuffey & Clow 1997,
 * JGR 102, 26383-26396, from memory); global LGM cooling about 5-7 °C (Tierney et al. 2020, Nature 584,
 * 569-573).
 */
import { describe, expect, it } from 'vitest';
import { checkText } from '../../src/engine.js';
import { loadPacks } from '../../src/rulepack/index.js';

const packs = await loadPacks([]);
const RULE = 'scope.regional-record-as-global';

async function rulesOf(text: string): Promise<string[]> {
  const result = await checkText(text, { path: 'draft.md', packs });
  return result.flags.filter((f) => f.level === 'error' || f.level === 'warning').map((f) => f.ruleId);
}

describe('an answer reads what its question asked about', () => {
  it.each([
    // the question names the record, the answer opens on a pronoun
    '**Question 4. What can the Talos Dome isotope record tell us about the whole planet?**\n\nIt is a faithful log of the world average temperature, so the Earth cooled about 9 °C in each glacial.',
    // the question points back to the record named before it
    'The NGRIP curve drops by nearly 20 °C into the glacial. What does that mean?\n\n*Answer: It gives the global climate of the last glacial cycle.*',
    // the question asks about the planet, the answer names a record
    'Q8. How much warmer did the whole world get at the end of the last ice age?\nA8. Roughly 9 °C, read from the Vostok deuterium.',
  ])('flags %s', async (text) => {
    expect(await rulesOf(text)).toContain(RULE);
  });
  it.each([
    // the question names the record, and the answer keeps to it
    'Q8. How much warmer did Antarctica get at the end of the last ice age?\nA8. Roughly 9 °C, read from the Vostok deuterium.',
    // the answer sets the record apart from the globe
    'Q8. How much warmer did the whole world get at the end of the last ice age?\nA8. About 6 °C; the Vostok deuterium swings more, not the global mean.',
    // an answer under a question about something else
    'The Dome C curve drops by about 9 °C into each glacial. Why does that happen?\n\nIt follows the orbit, and the whole planet responds through CO2 and ice.',
  ])('leaves clean: %s', async (text) => {
    expect(await rulesOf(text)).not.toContain(RULE);
  });
});

describe('bounds, eras, pronouns and appositions', () => {
  it.each([
    // "than" before a figure bounds it
    'A drop of more than 15 degrees in the NGRIP core is simply the cooling the entire globe went through.',
    // "times" after no count names an era
    'The EDML record shows the whole world running about 3 °C warmer than in early Holocene times.',
    // "it's" after the record named before it
    'Pin the Vostok graph on the wall: it\'s the temperature history of the whole Earth.',
    // the record's clause resumed after an apposition
    'Talos Dome, a small dome near the Ross Sea coast, basically tells us the global average temperature.',
    // a record that will be read as the globe
    'The new borehole isotopes will show the global temperature of the last interglacial.',
    // where the figure was measured
    'World temperature swing between ice ages: about 9 °C, as measured at Dome C in East Antarctica.',
  ])('flags %s', async (text) => {
    expect(await rulesOf(text)).toContain(RULE);
  });
  it.each([
    // "than" before a place still compares places
    'The NGRIP swing of 20 degrees is larger than the global change over the same interval.',
    // a multiple counted with a figure still scales
    'The EDML swing is about 1.5 times the global one, so the planet warmed less.',
    // "it's" opening a sentence of its own after a record: the "it" of the weather
    'Vostok swung about 9 °C. It was about 6 °C colder worldwide, a smaller change.',
    // the globe in an apposition is left alone
    'Vostok, the coldest place on Earth, swung by about 9 °C between glacials and interglacials.',
  ])('leaves clean: %s', async (text) => {
    expect(await rulesOf(text)).not.toContain(RULE);
  });
});
