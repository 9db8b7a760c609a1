/**
 * A rate drawn from the change and time of the sentence before, in a sentence that goes on to set
 * another time's rate against it (src/checks/arithmetic-solver.ts, ratesInParagraph and
 * comparedAfter): the drawn rate is judged on its own clause. Every sentence is written for this
 * test; the sites are invented. Sums (common practice): 90 ÷ 6,000 = 0.015; 75 ÷ 5,000 = 0.015.
 */
import { describe, expect, it } from 'vitest';
import { flagged } from './arithmetic-at.js';

const change = 'Over the thaw the Varne core shows CO2 rising by about 90 ppm across some 6,000 years.';

describe('a drawn rate set against another time\'s rate', () => {
  it.each([
    ['"whereas"', 'That comes to about 0.15 ppm a year, whereas the 2010s ran at about 2.4 ppm a year.', 'about 0.15 ppm a year', 'about 0.015 ppm a year'],
    ['"against"', 'That works out at roughly 0.15 ppm per year, against about 2.4 ppm per year in the 2010s.', 'roughly 0.15 ppm per year', 'roughly 0.015 ppm per year'],
    ['"compared with"', 'So the pace was about 0.0015 ppm a year, compared with 2.4 ppm a year today.', 'about 0.0015 ppm a year', 'about 0.015 ppm a year'],
  ])('%s', (_why, sentence, words, correction) => {
    expect(flagged(change, sentence)).toEqual([['arith.rate', words, correction]]);
  });

  it.each([
    ['right, "whereas"', 'That comes to about 0.015 ppm a year, whereas the 2010s ran at about 2.4 ppm a year.'],
    ['right, "against"', 'That works out at roughly 0.015 ppm per year, against about 2.4 ppm per year in the 2010s.'],
    ['no word drawing the rate from the change', 'The 1960s managed about 0.9 ppm a year, against about 2.4 ppm a year in the 2010s.'],
  ])('leaves alone: %s', (_why, sentence) => {
    expect(flagged(change, sentence)).toEqual([]);
  });

  it('a second change and time of its own still makes a sum of its own', () => {
    // 75 ÷ 5,000 = 0.015: the rate is drawn from the sentence's own change and time, and is right.
    expect(flagged('CO2 rose 75 ppm over 5,000 years, so about 0.015 ppm a year, while today it climbs 2.4 ppm a year.')).toEqual([]);
  });
});
