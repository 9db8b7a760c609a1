/**
 * scope.figure-across-scales (session 20): a figure true at one scale handed unchanged to another.
 * Sentences of our own.
 *
 * Sources: the global mean cooling at the Last Glacial Maximum was about 6 °C (5 to 7 °C; Gulev et
 * al. 2021, IPCC AR6 WGI chapter 2, from memory); central Greenland cooled by about 20 °C or more
 * (Dahl-Jensen et al. 1998, Science 282, 268-271); Antarctic swings were about 1.5 to 2 times the
 * global change (Tierney et al. 2020, Nature 584, 569-573); the global sea-level fall was about 120
 * to 135 m, and local relative sea level differed with ice loading and the ground's response
 * (Lambeck et al. 2014, PNAS 111, 15296-15303).
 */
import { describe, expect, it } from 'vitest';
import { checkText } from '../../src/engine.js';
import { loadPacks } from '../../src/rulepack/index.js';

const packs = await loadPacks([]);
const RULE = 'scope.figure-across-scales';

async function rulesOf(text: string): Promise<string[]> {
  const result = await checkText(text, { path: 'draft.txt', packs });
  return result.flags.filter((f) => f.level === 'error' || f.level === 'warning').map((f) => f.ruleId);
}

describe('a figure handed unchanged across scales', () => {
  it.each([
    // the globe's figure to one place, in one sentence
    'The world was about 6 °C colder at the glacial maximum, so our valley was 6 °C colder too.',
    'Global mean sea level fell by about 125 metres at the glacial maximum, so the beach below my village was exactly 125 m lower as well.',
    'In the Last Glacial Maximum global sea level was about 125 m lower than today, and the seabed off this harbour was about 125 m lower too.',
    // the globe's figure to one place, from the sentence before
    'At the glacial maximum the planet as a whole ran some 6 °C colder.\nIt follows that the Tarrock moor was precisely 6 °C colder in those centuries.',
    // a polar figure to a hemisphere, from the sentence before
    'Central Greenland cooled by some 20 °C at the glacial maximum.\nTherefore the northern hemisphere was roughly 20 °C colder as well.',
    // a polar record read as one place
    'The ice cores of Greenland tell us this dale was about 20 degrees colder at the glacial peak.',
    // a polar figure to the globe, "that much" standing for it
    'Antarctica was about 9 °C colder at the glacial maximum.\nIt stands to reason the entire Earth was that much colder too.',
    // one place's figure handed to the globe, "which is how much" pointing back to it
    'Out here on the ice plateau the thermometer swung by about 9 °C between glacial maximum and interglacial, which is how much the entire planet changed.',
    // a clause opened by "therefore" after the target
    'The whole globe was roughly 6 °C colder at the glacial maximum.\nThe top of the Antarctic ice sheet would therefore have been about 6 °C colder as well.',
    // a wider scale after a sameness phrase
    'At the glacial maximum our parish was about 6 °C colder, the same as the global average.',
    // "that much" before a comparative: one of the lexicon ("lower", which compromise tags no
    // Comparative), or one compromise tags so ("frostier", which the lexicon lacks) (session 21)
    'Global sea level fell by about 120 metres at the glacial maximum.\nSo our bay was that much lower in the ice age too.',
    'The world was some 6 °C colder at the glacial maximum.\nSo our glen was that much frostier in the ice age too.',
  ])('flags %s', async (text) => {
    expect(await rulesOf(text)).toContain(RULE);
  });
});

describe('each figure kept with its scale, or scaled', () => {
  it.each([
    'At the glacial maximum the whole planet was about 6 °C colder; the summit of the Antarctic ice sheet was about 9 °C colder.',
    'The world was about 6 °C colder at the glacial maximum, but our valley, beside the ice sheet, was probably far more than that.',
    'Our town lay under 500 m of ice at the glacial maximum, when the world was about 6 °C colder.',
    'The Vostok core shows Antarctica was about 9 °C colder at the glacial maximum, while the world as a whole was about 6 °C colder.',
    // the same figure restated at its own scale with no word that hands it on
    'Global average cooling at the glacial maximum was about 6 °C.\nCentral Greenland cooled by about 20 °C, far more than the global average.',
    'Some say the whole globe was 20 °C colder at the glacial maximum.\nGreenland\'s summit really did run about twenty degrees colder, but that is one spot on a high ice sheet.',
    // one place's own figure beside a different global one
    'Our valley was about 12 °C colder at the glacial maximum, while the world as a whole was about 6 °C colder.',
    // "that much" before a word that merely ends in "-er", comparing nothing (session 21)
    'The whole planet was about 6 °C colder at the glacial maximum.\nOur valley farmers still remember that much winter from the ice age too.',
    'The whole planet was about 6 °C colder at the glacial maximum.\nSo our valley saw that much water in the ice age too.',
    // "that much" that measures no change
    'Antarctica swings about twice as much as the global mean, so nine degrees there is about five for the whole planet.\nAnd in the Younger Dryas Antarctica warmed a little, I recall that much.',
    // the same figure, scaled by a multiple
    'At the glacial maximum global temperature was about 5 °C lower than today, so Antarctic temperature swung by roughly 10 °C, around twice the global change.',
  ])('leaves clean: %s', async (text) => {
    expect(await rulesOf(text)).not.toContain(RULE);
  });
});
