/**
 * Two numbers in words joined by "and" (src/quantities/number-words.ts): a count of hundreds as
 * large as the scale after the "and" ("fifteen hundred and two thousand") is a number of its own,
 * so "between ... and ..." reads as a range; "a hundred and twenty thousand" and "two thousand and
 * five" stay one number; a bare "hundred" before a scale ("every hundred thousand years") is one
 * hundred. English number names (common practice); sentences of our own.
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

describe('a bare hundred before a scale', () => {
  it.each([
    ['Since then the cycles have recurred every hundred thousand years.', 100000],
    ['Some hundred thousand years ago the sheet advanced again.', 100000],
    ['Those deep layers span about hundred thousand years.', 100000],
  ])('%s', (sentence, value) => {
    const [q] = parseQuantities(sentence);
    expect(q?.value).toBe(value);
  });

  it('a bare hundred before no scale is no number: "hundred" alone names no quantity (common practice)', () => {
    expect(parseQuantities('The hundred cores were stored at minus thirty.').filter((q) => q.text.startsWith('hundred'))).toEqual([]);
  });
});

// Glacial cycles of about 100,000 years since the Mid-Pleistocene Transition (Clark, P. U. et al.
// (2006), Quaternary Science Reviews 25, 3150-3184, doi:10.1016/j.quascirev.2006.07.008): with the
// period read, an opening time frame yields to it instead of being taken for the period.
describe('the period, not the frame', () => {
  it('binds the hundred thousand years', async () => {
    const { bindQuantities } = await import('../../src/claims/bind.js');
    const { loadPacks } = await import('../../src/rulepack/index.js');
    const packs = await loadPacks([]);
    const sentence = 'Over the past 700,000 years or so the great cycles have returned about every hundred thousand years.';
    const quantities = parseQuantities(sentence);
    const { bindings } = bindQuantities(sentence, quantities, packs);
    expect(bindings.map((b) => quantities[b.quantityIndex]?.value)).toEqual([100000]);
  });
});
