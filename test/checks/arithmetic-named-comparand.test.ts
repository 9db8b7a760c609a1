/**
 * A multiple that names what it is a multiple of after itself (src/checks/arithmetic-reader/
 * relations.ts, checkNamedComparand): a figure right after it ("four times the 0.9 ppm a year"), a
 * year ("twice the 1800 figure"), or a word of the place or scope a figure before was given for
 * ("three times the worldwide one", "twice as long as the Kesh one"); and multiples written with
 * "and a half" in words (src/quantities/find-multipliers.ts). Every sentence is written for this
 * test; the sites are invented. Sums (common practice): 2.4 ÷ 0.9 = 2.67; 410 ÷ 280 = 1.46;
 * 12 ÷ 6 = 2; 900,000 ÷ 300,000 = 3; 2.4 ÷ 0.8 = 3.
 */
import { describe, expect, it } from 'vitest';
import { parseQuantities } from '../../src/quantities/index.js';
import { flagged } from './arithmetic-at.js';

const tarn = 'In 1800 the Tarn core held about 280 ppm of CO2.';
const cooling = ['The polar sites cooled by about 12 °C.', 'Worldwide the cooling was about 6 °C.'];
const cores = 'The Kesh core spans 300,000 years and the Orla core 900,000 years.';

describe('a multiple of a comparand named after it', () => {
  it.each([
    ['a figure right after it', ['Across the 2010s the Harlow station logged about 2.4 ppm a year, four times the 0.9 ppm a year of the 1960s.'], 'four times', '2.7 times'],
    ['a year naming the sentence of its figure', [tarn, 'Its 2020 layer holds some 410 ppm of CO2, roughly twice the 1800 figure.'], 'roughly twice', 'roughly 1.5 times'],
    ['"and a half" in words', [tarn, 'Its 2020 layer holds some 410 ppm of CO2, about two and a half times the 1800 figure.'], 'about two and a half times', 'about 1.5 times'],
    ['a word of the scope, the subject named by its own word', [...cooling, 'So the polar drop was some three times the worldwide one.'], 'some three times', 'some 2 times'],
    ['"as long as"', [cores, 'So the Orla record is about twice as long as the Kesh one.'], 'about twice', 'about 3 times'],
  ] as [string, string[], string, string][])('%s', (_why, sentences, words, correction) => {
    expect(flagged(...sentences)).toEqual([['arith.ratio', words, correction]]);
  });

  it.each([
    ['right, a figure after it', ['Across the 2010s the Harlow station logged about 2.4 ppm a year, three times the 0.8 ppm a year of the 1960s.']],
    ['right, a year', [tarn, 'Its 2020 layer holds some 410 ppm of CO2, roughly one and a half times the 1800 figure.']],
    ['right, a word of the scope', [...cooling, 'So the polar drop was some twice the worldwide one.']],
    ['right, "as long as"', [cores, 'So the Orla record is about three times as long as the Kesh one.']],
    // 10 ÷ 9 = 1.1, but the name "global" stands in the multiple's own sentence only after it, so
    // it points to the figure of the sentence before, which is larger than the subject: no multiple of it is read.
    ['the name stands in its own sentence only after the multiple', ['Global temperatures in glacial times were about 10 °C lower.', 'Antarctica itself swung by roughly 8-10 °C over each cycle, around twice the global change.']],
    ['a name that points to no figure', ['Before industry the air held about 280 ppm.', 'Today it holds about 420 ppm, some one and a half times the level my grandfather grew up with.']],
  ] as [string, string[]][])('leaves alone: %s', (_why, sentences) => {
    expect(flagged(...sentences)).toEqual([]);
  });
});

describe('multiples in words with a half', () => {
  it.each([
    ['about two and a half times the pace', 2.5],
    ['one and a half times as fast', 1.5],
    ['three and a half times higher', 3.5],
  ])('%s', (text, value) => {
    const q = parseQuantities(text).find((x) => x.dimension === 'ratio');
    expect(q?.value).toBe(value);
  });

  it('a half after a count of things is no multiple', () => {
    expect(parseQuantities('two and a half cycles').some((x) => x.dimension === 'ratio')).toBe(false);
  });
});
