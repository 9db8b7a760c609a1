/**
 * A time after "within", or told in vague words ("a few", "a couple of", "several"), bounds how
 * long something took; it is never the span between two dates the sentence states
 * (src/checks/arithmetic-rules.ts, arith.duration; common practice of English). Deglacial CO2 rose
 * about 80 ppm between about 18,000 and 11,000 years ago, with centennial steps of 10-15 ppm
 * (Marcott et al. 2014, doi:10.1038/nature13799). Sentences of our own.
 */
import { describe, expect, it } from 'vitest';
import { flagged } from './arithmetic-at.js';

const durations = (...sentences: string[]) => flagged(...sentences).filter(([id]) => id === 'arith.duration');

describe('arith.duration: a bounding or vague time is no span of the stated dates', () => {
  it.each([
    ['From about 18,000 to 11,000 years ago carbon dioxide climbed, sometimes by 12 ppm within a couple of centuries.'],
    ['Between 17,500 and 11,500 years ago the rise came in spurts of 10 ppm within a few centuries.'],
    ['The warming ran from 19,000 to 11,000 years ago, with steps taking a couple of centuries each.'],
    ['From 18,000 to 11,000 years ago CO2 rose; the sharpest steps took within 200 years.'],
  ])('%s', (sentence) => expect(durations(sentence)).toEqual([]));

  it('a plain span that misstates the dates is still flagged', () => {
    // 18,000 - 11,000 = 7,000 years (common practice: subtraction).
    expect(durations('The thaw ran from 18,000 to 11,000 years ago, so roughly 9,000 years.').map(([, words]) => words)).toEqual(['roughly 9,000 years']);
  });
});
