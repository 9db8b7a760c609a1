/**
 * Arithmetic in two wordings that escaped the readers: a span with a demonstrative before its
 * figure ("over those 8,000 years") and a unit written in the singular ("one part per million").
 * The arithmetic is the sentence's own (common practice); 1 ppm is one part per million by volume
 * (NIST SP 811 discourages ppm but defines its meaning as 10^-6).
 */
import { describe, expect, it } from 'vitest';
import { checkArithmetic } from '../../src/checks/arithmetic.js';
import { parseQuantities } from '../../src/quantities/index.js';

const ids = (text: string) => checkArithmetic(text, parseQuantities(text)).map((f) => f.ruleId);

describe('a span with a demonstrative or article before its figure', () => {
  it.each([
    // 90 ppm over 9,000 years is 1 ppm per century, not 0.2.
    ['Over those 9,000 years the 90 ppm climb comes to just 0.2 ppm per century.'],
    ['During that 6,000 years the gas rose 60 ppm, some 4 ppm per century.'],
    ['Across these 5,000 years the lake level fell 50 m, or 5 m per century.'],
  ])('flags a rate that does not follow: %s', (text) => {
    expect(ids(text)).toContain('arith.rate');
  });

  it.each([
    ['Over those 9,000 years the 90 ppm climb comes to about 1 ppm per century.'],
    ['During that 6,000 years the gas rose 60 ppm, some 1 ppm per century.'],
  ])('keeps a right rate clean: %s', (text) => {
    expect(ids(text)).toEqual([]);
  });
});

describe('a concentration unit in the singular', () => {
  it('reads "one part per million" as 1 ppm', () => {
    expect(parseQuantities('about one part per million').map((q) => [q.unit, q.value])).toEqual([['ppm', 1]]);
    expect(parseQuantities('one part per billion').map((q) => q.statedUnit)).toEqual(['ppb']);
  });

  it('checks a pace written with it against the change and the time', () => {
    // 60 ppm in 6,000 years is 1 ppm a century, so one part per million every hundred years is right.
    expect(ids('The gas climbed 60 ppm in 6,000 years, roughly one part per million every ten years.')).toContain('arith.rate');
    expect(ids('The gas climbed 60 ppm in 6,000 years, roughly one part per million every hundred years.')).toEqual([]);
  });
});
