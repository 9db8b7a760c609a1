/**
 * A fraction in words after a change noun and "of" is a relative change ("a rise of one third", "an
 * increase of two-thirds", "a drop of a quarter": src/quantities/find-multipliers.ts
 * FRACTION_OF_CHANGE), and its correction gives the percentage in place of the fraction's words
 * (src/quantities/rewrite-quantity.ts, fractionWordsIn). Every sentence is written for this test.
 * Levels: about 190 ppm at the Last Glacial Maximum, about 280 ppm before industry (Monnin et al.
 * 2001, Science 291); sums (common practice): 420 ÷ 280 − 1 = 0.5; 280 ÷ 190 − 1 = 0.47;
 * 1 − 210 ÷ 280 = 0.25.
 */
import { describe, expect, it } from 'vitest';
import { parseQuantities } from '../../src/quantities/index.js';
import { flagged } from './arithmetic-at.js';

describe('a fraction after a change noun and "of"', () => {
  it.each([
    ['"a rise of one third"', 'Taking the Brenna core from 280 to 420 ppm makes a rise of one third.', 'one third', '50 percent'],
    ['"an increase of a third"', 'From 190 to 280 ppm the gas saw an increase of a third.', 'a third', '47 percent'],
  ])('%s is read and corrected to a percentage', (_why, sentence, words, correction) => {
    expect(flagged(sentence)).toEqual([['arith.ratio', words, correction]]);
  });

  it('a right fraction is left alone', () => {
    expect(flagged('Taking the Brenna core from 280 to 420 ppm makes a rise of one half.')).toEqual([]);
    expect(flagged('From 280 down to 210 ppm the model run shows a drop of a quarter.')).toEqual([]);
  });

  it('a fraction that is no change stays unread', () => {
    expect(parseQuantities('The first third of the Brenna core is firn.').map((q) => q.text)).toEqual([]);
  });
});
