/**
 * Multiples of two paces (src/checks/arithmetic-solver.ts, recurringPaces, paceRatiosInParagraph and
 * paceRatiosInSentence): a pace told as an amount that recurs in a unit of time ("2.5 ppm added every
 * single year") is a pace; two readings of one pace ("0.015 ppm a year or roughly 1.5 ppm a century")
 * make no pair; two paces set against each other ("against", "vs") make the multiple after them
 * their ratio. Every sentence is written for this test; the stations are invented. Figures: about 2.4
 * ppm a year in the 2010s (NOAA Global Monitoring Laboratory), about 76 ppm over some 6,000 years
 * across the last deglaciation (Monnin et al. 2001, Science 291). Sums (common practice):
 * 2.5 ÷ 0.01 = 250; 2.5 ÷ 0.0125 = 200; 2.4 ÷ 0.015 = 160.
 */
import { describe, expect, it } from 'vitest';
import { flagged } from './arithmetic-at.js';

const modern = 'In the 2010s the Harrow station logged a rise of about 2.5 ppm every single year.';
const thaw = 'Across the thaw the gas gained roughly one ppm per century.';

describe('a pace told as an amount that recurs', () => {
  it('is set against the pace of the sentence before', () => {
    expect(flagged(thaw, modern, 'So the modern climb runs about twelve times faster than that.')).toEqual([['arith.ratio', 'about twelve times', 'about 250 times']]);
  });

  it('leaves a right multiple alone', () => {
    expect(flagged(thaw, modern, 'So the modern climb runs about 250 times faster than that.')).toEqual([]);
  });

  it('reads "each decade" in years', () => {
    // 30 ppm a decade is 3 ppm a year; 3 ÷ 0.01 = 300.
    expect(flagged(thaw, 'Lately the gas gains about 30 ppm each decade.', 'So today it is rising about 30 times faster.')).toEqual([['arith.ratio', 'about 30 times', 'about 300 times']]);
  });
});

describe('two readings of one pace', () => {
  it('make no pair of paces', () => {
    const restated = 'The thaw added 90 ppm over 6,000 years, about 0.015 ppm a year or roughly 1.5 ppm a century.';
    expect(flagged(restated, 'These days the gas climbs near 2.4 ppm every single year.', 'So today it is rising about 160 times faster.')).toEqual([]);
  });
});

describe('two paces set against each other in one sentence', () => {
  it('"against" ties the multiple after them', () => {
    expect(flagged('Set side by side, 2.5 ppm a year now against 0.0125 a year across the thaw is about twenty times faster.')).toEqual([['arith.ratio', 'about twenty times', 'about 200 times']]);
  });

  it('"vs" does too, and a right multiple is left alone', () => {
    expect(flagged('Put plainly, 2.5 ppm a year now vs 0.0125 a year back then comes out about 200 times faster.')).toEqual([]);
    expect(flagged('Put plainly, 2.5 ppm a year now vs 0.0125 a year back then is about 2,000 times faster.')).toEqual([['arith.ratio', 'about 2,000 times', 'about 200 times']]);
  });

  it('no word setting them against each other ties no multiple', () => {
    expect(flagged('The gauge showed 2.5 ppm a year and the core 0.0125 a year, and a slow pump is about twenty times faster.')).toEqual([]);
  });
});
