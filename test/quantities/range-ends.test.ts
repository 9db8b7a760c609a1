import { describe, expect, it } from 'vitest';
import { parseQuantities } from '../../src/quantities/index.js';
import { rangeEnds, statesRange } from '../../src/quantities/range-ends.js';

// [sentence, range as written, low end, high end], worked by hand from the interval table
// (docs/quantities.md, common practice): each end keeps half a unit in its last written place (a
// round number read to its second digit: 180 is ±5, 172 is ±0.5, 7,000 is ±50) and its share of the
// hedge ("about" on a range adds 2.5% of the midpoint to each end: 230 × 0.025 = 5.75).
const CASES: [string, string, [number, number], [number, number]][] = [
  ['CO2 moved between about 180 and 280 ppm.', 'between about 180 and 280 ppm', [169.25, 190.75], [269.25, 290.75]],
  ['CO2 spans 172 to 300 ppm.', '172 to 300 ppm', [171.5, 172.5], [295, 305]],
  ['CO2 stayed at 180–380 ppm.', '180–380 ppm', [175, 185], [375, 385]],
  ['CO2 ranged from 180 ppm to 300 ppm.', '180 ppm to 300 ppm', [175, 185], [295, 305]],
  ['It took 7,000 to 8,000 years.', '7,000 to 8,000 years', [6950, 7050], [7950, 8050]],
  // A scale word written once: the ends are the interval's own.
  ['It took 7-8 thousand years.', '7-8 thousand years', [7000, 7000], [8000, 8000]],
  // Ages before present: the low end is the younger date.
  ['The cold spell ran 12,900–11,700 years ago.', '12,900–11,700 years ago', [11650, 11750], [12850, 12950]],
];

describe('rangeEnds', () => {
  it.each(CASES)('reads the ends of %j', (sentence, text, low, high) => {
    const q = parseQuantities(sentence).find((x) => x.text === text);
    expect(q).toBeDefined();
    const ends = rangeEnds(q!);
    expect(ends?.low[0]).toBeCloseTo(low[0], 6);
    expect(ends?.low[1]).toBeCloseTo(low[1], 6);
    expect(ends?.high[0]).toBeCloseTo(high[0], 6);
    expect(ends?.high[1]).toBeCloseTo(high[1], 6);
  });

  it.each([
    ['CO2 was 280 ± 10 ppm.', '280 ± 10 ppm'],
    ['CO2 was about 280 ppm.', 'about 280 ppm'],
    ['It lasted tens of thousands of years.', 'tens of thousands of years'],
  ])('one figure is no range: %j', (sentence, text) => {
    const q = parseQuantities(sentence).find((x) => x.text === text);
    expect(q).toBeDefined();
    expect(statesRange(q!)).toBe(false);
    expect(rangeEnds(q!)).toBeUndefined();
  });
});
