/**
 * A multiple written as a ratio to one ("18 to 1", "185:1", "a 20-to-1 ratio") is read as a ratio
 * (common practice of English); a range that ends at 1 and a clock time are not. Sentences of our own.
 */
import { describe, expect, it } from 'vitest';
import { parseQuantities } from '../../src/quantities/index.js';

const read = (text: string) => parseQuantities(text).map((q) => [q.text, q.dimension, q.value]);

describe('a ratio to one', () => {
  it.each([
    ['a ratio of roughly 18 to 1.', [['roughly 18 to 1', 'ratio', 18]]],
    ['a ratio of 185:1 today', [['185:1', 'ratio', 185]]],
    ['a 20-to-1 ratio', [['20-to-1', 'ratio', 20]]],
    ['the ratio is about 190 to 1, far more', [['about 190 to 1', 'ratio', 190]]],
  ] as [string, [string, string, number][]][])('%s', (text, expected) => {
    expect(read(text)).toEqual(expected);
  });

  it.each([
    ['from 10 to 1 ppm', [['10', 'concentration', 10], ['1 ppm', 'concentration', 1]]],
    ['the ratio went from 10 to 1 ppm', [['10', 'concentration', 10], ['1 ppm', 'concentration', 1]]],
    ['at 10:15 we met', []],
  ] as [string, [string, string, number][]][])('%s is no ratio to one', (text, expected) => {
    expect(read(text)).toEqual(expected);
  });
});
