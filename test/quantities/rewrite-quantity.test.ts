import { describe, expect, it } from 'vitest';
import { parseQuantities } from '../../src/quantities/index.js';
import { rewriteQuantity } from '../../src/quantities/rewrite-quantity.js';

describe('rewriteQuantity', () => {
  // Scale words: thousand = 10^3, million = 10^6, billion = 10^9 (short scale, as the SI prefixes
  // k, M, G; NIST SP 811 section number from memory). A correction keeps the draft's scale word
  // unless the value would fall below 1 in it.
  it.each([
    ['It spans 0.8 billion years.', 800_000, '800 thousand years'],
    ['It spans 2.6 million years.', 2_580_000, '2.58 million years'],
    ['It spans 1.2 million years.', 800_000, '800 thousand years'],
    ['It spans 5 thousand years.', 900, '900 years'],
    // A number of thousands reads as digits unless the draft wrote a decimal itself (common practice in editing).
    ['The cold spell lasted two thousand years.', 1_200, '1,200 years'],
    ['It was a four-thousand-year thaw.', 6_500, '6,500-year'],
    ['It spans 2.5 thousand years.', 6_500, '6.5 thousand years'],
    ['It spans nine thousand years.', 6_000, '6,000 years'],
  ])('%s with %d years → %s', (sentence, value, expected) => {
    const [q] = parseQuantities(sentence);
    expect(q).toBeDefined();
    if (q !== undefined) expect(rewriteQuantity(q, value)).toBe(expected);
  });
});
