/**
 * Two numbers in words joined by "and" (src/quantities/number-words.ts): a count of hundreds as
 * large as the scale after the "and" ("fifteen hundred and two thousand") is a number of its own,
 * so "between ... and ..." reads as a range; "a hundred and twenty thousand" and "two thousand and
 * five" stay one number. English number names (common practice); sentences of our own.
 */
import { describe, expect, it } from 'vitest';
import { parseQuantities } from '../../src/quantities/index.js';

describe('a range in words', () => {
  it.each([
    ['The offset was between fifteen hundred and two thousand years.', 1500, 2000],
    ['Estimates ran between twelve hundred and three thousand years.', 1200, 3000],
    ['The cold spell lasted between eleven hundred and thirteen hundred years.', 1100, 1300],
    ['It lasted between nineteen hundred and twenty-one hundred years.', 1900, 2100],
  ])('%s', (sentence, low, high) => {
    const [q] = parseQuantities(sentence);
    expect(q).toMatchObject({ dimension: 'duration', low, high });
  });
});

describe('one number in words with "and"', () => {
  it.each([
    ['The record covers a hundred and twenty thousand years.', 120000],
    ['The layer holds two thousand and five years.', 2005],
    ['The layer holds two thousand and five hundred years.', 2500],
    ['The sheet took one hundred and twenty years to thin.', 120],
    ['The epoch began two and a half million years ago.', 2500000],
  ])('%s', (sentence, value) => {
    const [q] = parseQuantities(sentence);
    expect(q?.value).toBe(value);
  });
});
