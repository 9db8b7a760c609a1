import { describe, expect, it } from 'vitest';
import { checkArithmetic } from '../../src/checks/arithmetic.js';
import { parseQuantities } from '../../src/quantities/index.js';

const check = (sentence: string) => checkArithmetic(sentence, parseQuantities(sentence));

// A from-to pair whose end reads "up to B" (the quantity reader takes "up to" for a bound) or whose
// start is named with an article and a word ("from a glacial 190 ppm"): [why, sentence, flagged, correction].
// Worked by hand: 280 − 185 = 95; 280 / 190 = 1.474 (47%); 265 − 189 = 76. The levels are common
// practice's round glacial and interglacial CO2 figures (from memory).
const WRONG: [string, string, string, string][] = [
  ['"up to" as the end of a from-to pair', 'In the Tollmere core CO2 went from 185 ppm up to 280 ppm, a rise of 115 ppm.', '115 ppm', '95 ppm'],
  ['an article and an adjective before the start', 'Carbon dioxide climbing from a glacial 190 ppm up to 280 ppm is an increase of about 60 percent.', 'about 60 percent', 'about 47 percent'],
  ['"the" and a word before the start', 'Over the thaw CO2 rose from the glacial 189 ppm to 265 ppm, a gain of 96 ppm.', '96 ppm', '76 ppm'],
];

const RIGHT: [string, string][] = [
  ['right change with "up to"', 'In the Tollmere core CO2 went from 185 ppm up to 280 ppm, a rise of 95 ppm.'],
  ['right percentage after an adjective', 'Carbon dioxide climbing from a glacial 190 ppm up to 280 ppm is an increase of about 47 percent.'],
  ['"up to" as a bound, with no start before it', 'Interglacial CO2 reached up to 300 ppm, a rise of 100 ppm on some glacials.'],
];

describe('checkArithmetic: from-to pairs with "up to" ends and named starts', () => {
  it.each(WRONG)('%s', (_why, sentence, flagged, correction) => {
    const flags = check(sentence);
    expect(flags).toHaveLength(1);
    const [f] = flags;
    expect(sentence.slice(f?.start, f?.end)).toBe(flagged);
    expect(f?.correction).toBe(correction);
  });

  it.each(RIGHT)('leaves alone: %s', (_why, sentence) => {
    expect(check(sentence)).toEqual([]);
  });
});
