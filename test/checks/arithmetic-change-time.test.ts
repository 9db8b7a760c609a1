import { describe, expect, it } from 'vitest';
import { check, flagged } from './arithmetic-at.js';

// A percentage change from a level in the sentence before, with the time the change took right
// after it ("in two centuries"): the time is the change's, not another period's. Sums by hand
// (common practice of arithmetic), sentences our own: 420 / 280 − 1 = 50 percent.
describe('a relative change with the time it took', () => {
  it.each([
    [['In 1800 the air held about 280 ppm.', 'By 2020 it was about 420 ppm, a rise of about 30 percent in two centuries.'], 'about 30 percent', 'about 50 percent'],
    [['In 1800 the air held about 280 ppm.', 'By 2020 it was about 420 ppm, a rise of about 30 percent in under three centuries.'], 'about 30 percent', 'about 50 percent'],
  ] as [string[], string, string][])('%j: flags %s', (sentences, text, correction) => {
    expect(flagged(...sentences)).toEqual([['arith.ratio', text, correction]]);
  });

  it.each([
    ['right share', ['In 1800 the air held about 280 ppm.', 'By 2020 it was about 420 ppm, a rise of about 50 percent in two centuries.']],
    // A time that is not the change's own: a rate's span elsewhere in the sentence.
    ['a time elsewhere', ['In 1800 the air held about 280 ppm.', 'Over two centuries it reached about 420 ppm, a rise of about 30 percent.']],
  ] as [string, string[]][])('leaves alone: %s', (_why, sentences) => {
    expect(check(...sentences)).toEqual([]);
  });
});
