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
  ])('%s with %d years → %s', (sentence, value, expected) => {
    const [q] = parseQuantities(sentence);
    expect(q).toBeDefined();
    if (q !== undefined) expect(rewriteQuantity(q, value)).toBe(expected);
  });
});
