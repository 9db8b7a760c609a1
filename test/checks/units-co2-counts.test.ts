import { describe, expect, it } from 'vitest';
import { checkUnits } from '../../src/checks/units.js';
import { parseQuantities } from '../../src/quantities/index.js';

const flagged = (sentence: string) => checkUnits(sentence, parseQuantities(sentence)).map((f) => [f.ruleId, sentence.slice(f.start, f.end), f.correction]);

// A CO2 share the sentence places in the ice-core era is held to the 800,000-year range, 172-300
// ppm (Lüthi et al. 2008, Nature 453, 379-382, doi:10.1038/nature06949); 1% = 10,000 ppm (NIST SP
// 811: percent is 10^-2, ppm 10^-6). 0.18% = 1,800 ppm, 0.018% = 180 ppm; 0.27% = 2,700 ppm.
describe('a CO2 share placed in a glacial, an interglacial or the pre-industrial air', () => {
  it.each([
    ['In the depths of the ice age CO2 made up roughly 0.18 percent of the air.', 'roughly 0.18 percent', 'roughly 0.018 percent'],
    ['Pre-industrial air carried about 0.27% CO2, the Harrow Fell panel says.', 'about 0.27%', 'about 0.027%'],
    ['During the interglacials the air held some 0.25 per cent carbon dioxide.', 'some 0.25 per cent', 'some 0.025 per cent'],
  ])('%s flags %s', (sentence, text, correction) => {
    expect(flagged(sentence)).toEqual([['unit.percent-ppm', text, correction]]);
  });

  it.each([
    'In the depths of the ice age CO2 made up roughly 0.018 percent of the air.',
    'Pre-industrial air carried about 0.028% CO2.',
    // A share of today's air, beside an ice-age word, is not held to the ice-core range.
    'Unlike the glacial air, today the atmosphere holds about 0.042 percent CO2.',
    // 0.05 percent (500 ppm) reads in no power of ten as an ice-core level: a claim for the reference values.
    'Some scenarios take CO2 in a future interglacial to 0.05 percent of the air.',
  ])('leaves alone: %s', (sentence) => {
    expect(flagged(sentence)).toEqual([]);
  });
});

// A share written as a count in a whole: N molecules in every M is N ÷ M × 10^6 ppm (NIST SP 811:
// ppm is one part in 10^6). 3.9 per thousand = 3,900 ppm (0.39 per thousand = 390 ppm); 28 per
// hundred thousand = 280 ppm; 19 per ten thousand in a glacial = 1,900 ppm (1.9 = 190 ppm).
describe('a CO2 share written as molecules in every thousand or million', () => {
  it.each([
    ['Out of every thousand molecules of air, about 3.9 molecules of CO2 were counted at the station in 2010.', 'about 3.9', 'about 0.39'],
    ['At the glacial maximum, each ten thousand molecules of air held 19 molecules of carbon dioxide.', '19', '1.9'],
    ['For every million molecules of air there are about 42 molecules of CO2 today.', 'about 42', 'about 420'],
  ])('%s flags %s', (sentence, text, correction) => {
    expect(flagged(sentence)).toEqual([['unit.percent-ppm', text, correction]]);
  });

  it.each([
    'For every million molecules of air there are about 420 molecules of CO2 today.',
    'Out of every thousand molecules of air, about 0.42 molecules are CO2.',
    // A count of something else in the whole.
    'For every million molecules of air there are about 1.9 molecules of methane.',
  ])('leaves alone: %s', (sentence) => {
    expect(flagged(sentence)).toEqual([]);
  });
});

// A share of the air in a sentence that names no gas is CO2's when the nearest earlier sentence of
// the paragraph that gives a level or names a gas gives a level in ppm and names no other gas.
// 2.6% = 26,000 ppm; 0.026% = 260 ppm (NIST SP 811: percent 10^-2, ppm 10^-6).
describe('a share of the air whose gas the paragraph gives', () => {
  const check = (...sentences: string[]) => {
    const sentence = sentences[sentences.length - 1] as string;
    return checkUnits(sentence, parseQuantities(sentence), sentences.slice(0, -1)).map((f) => [f.ruleId, sentence.slice(f.start, f.end), f.correction]);
  };
  it('reads past a line with no level', () => {
    expect(check('The Orrin core never went above 290 parts per million.', 'And before the mills?', 'Two-sixty, and that is about 2.6 percent of the air.')).toEqual([['unit.percent-ppm', 'about 2.6 percent', 'about 0.026 percent']]);
  });
  it('leaves alone a share after a sentence about another gas', () => {
    expect(check('The Orrin core never went above 290 parts per million.', 'Methane peaked near 700 parts per billion in the same core.', 'At its peak it made up about 2.6 percent of the air.')).toEqual([]);
  });
});
