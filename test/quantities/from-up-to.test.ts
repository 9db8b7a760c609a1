/**
 * Intervals of a round number follow docs/quantities.md (280 → 275 to 285).
 * "From A up to B" and "from A down to B" are the two ends of a change, not "up to B" as a bound.
 * Glacial CO2 about 190 ppm and pre-industrial about 280 ppm: Lüthi et al. 2008, Nature 453,
 * 379-382, doi 10.1038/nature06949; the subtraction is common practice.
 */
import { describe, expect, it } from 'vitest';
import { checkArithmetic } from '../../src/checks/arithmetic.js';
import { parseQuantities } from '../../src/quantities/index.js';

describe('from A up to B', () => {
  it('reads both ends in the stated unit, with no bound on the far end', () => {
    const qs = parseQuantities('CO2 went from 190 up to 280 ppm, a jump of roughly 140 ppm.');
    expect(qs.map((q) => [q.text, q.dimension, q.low, q.high])).toEqual([
      ['190', 'concentration', 185, 195],
      ['280 ppm', 'concentration', 275, 285],
      ['roughly 140 ppm', 'concentration', expect.any(Number), expect.any(Number)],
    ]);
  });

  it('flags a change that does not follow from the two ends, and passes one that does', () => {
    const wrong = 'CO2 went from 190 up to 280 ppm, a jump of roughly 140 ppm.';
    const right = 'CO2 went from 190 up to 280 ppm, a jump of roughly 90 ppm.';
    expect(checkArithmetic(wrong, parseQuantities(wrong)).map((f) => f.ruleId)).toEqual(['arith.change']);
    expect(checkArithmetic(right, parseQuantities(right))).toEqual([]);
  });

  it('keeps "up to" a bound where no "from" comes before it', () => {
    const [q] = parseQuantities('The cores hold up to 800,000 years of air.');
    expect(q?.text).toBe('up to 800,000 years');
  });
});
