/**
 * A fraction of a scale word is one number ("two-thirds of a million years ago" is about 667,000
 * years ago, "a quarter of a million years" 250,000 years), and "a million and a half" is 1.5
 * million (src/quantities/find-atoms.ts, number-words.ts). Read apart, the fraction was a multiplier
 * and "a million" a number of its own: a sentence then stated a million years. Common practice of
 * English; the intervals follow the precision row of docs/quantities.md (two digits of the scale).
 */
import { describe, expect, it } from 'vitest';
import { parseQuantities } from '../../src/quantities/index.js';

const read = (text: string) => parseQuantities(text).map((q) => ({ text: q.text, low: Math.round(q.low), high: Math.round(q.high), dimension: q.dimension }));

describe('a fraction of a scale word', () => {
  it.each([
    ['It happened around two-thirds of a million years ago.', 'around two-thirds of a million years ago', 645000, 688333, 'age'],
    ['The record covers a quarter of a million years.', 'a quarter of a million years', 245000, 255000, 'duration'],
    ['That is three quarters of a million years of ice.', 'three quarters of a million years', 745000, 755000, 'duration'],
    ['The ice holds half a million years of air.', 'half a million years', 495000, 505000, 'duration'],
    ['The older ice is a million and a half years old.', 'a million and a half years', 1450000, 1550000, 'duration'],
    ['It lasted two and a half million years.', 'two and a half million years', 2450000, 2550000, 'duration'],
  ])('%s', (sentence, text, low, high, dimension) => {
    expect(read(sentence)).toEqual([{ text, low, high, dimension }]);
  });

  it('a fraction of something that is no scale stays a multiplier', () => {
    const [third, ...rest] = parseQuantities('CO2 fell by a third of its value.');
    expect(rest).toEqual([]);
    expect({ text: third?.text, dimension: third?.dimension }).toEqual({ text: 'a third', dimension: 'ratio' });
    // The multiplier-word row: a third ± 5%.
    expect(third?.low).toBeCloseTo(0.3167, 3);
    expect(third?.high).toBeCloseTo(0.35, 3);
  });
});
