/**
 * The arithmetic check keeps its reading of a context sentence (its figures, each result its own
 * paragraph contradicts taken at its right value) for the next sentences of the paragraph, which
 * read the same sentence again (src/checks/arithmetic.ts correctedQuantities). A kept reading must
 * give exactly what a fresh one gives: the flags of a sentence are the same whether the sentences
 * before it were read already or not, whatever other paragraphs came between, and a reading is kept
 * by the whole window it was read with, never by the sentence alone. Every sentence is written for
 * this test (the stations are invented); the sums are division (common practice): 80 ÷ 6,500 =
 * 0.0123 ppm a year, 2.4 ÷ 0.0123 = 195; 90 ÷ 6,000 = 0.015 ppm a year, 3.0 ÷ 0.015 = 200.
 */
import { describe, expect, it } from 'vitest';
import { check, flagged } from './arithmetic-at.js';

const wrongRate = ['Over the Tamsin thaw, CO2 climbed by about 80 ppm in roughly 6,500 years.', 'That works out to a mean rate of 0.12 ppm per year.'];
const multiple = 'The present 2.4 ppm per year is therefore only some 20 times faster.';

describe('a context reading kept for the next sentences', () => {
  it('gives the flags of a fresh reading, read once or many times', () => {
    const first = check(...wrongRate, multiple);
    // The same paragraph again, now with every window read before: the same flags, field by field.
    const again = check(...wrongRate, multiple);
    expect(again).toEqual(first);
    expect(first.map((f) => f.ruleId)).toEqual(['arith.ratio']);
    // The reason names the earlier result the sum took at its right value.
    expect(first[0]?.reason).toContain('0.12 ppm per year is itself');
  });

  it('is kept by the whole window: the same sentence after other figures reads them', () => {
    // One rate sentence after two first sentences: 90 ppm in 6,000 years makes it right, 60 ppm in
    // 6,000 years (0.01 ppm a year, so 3.0 ÷ 0.01 = 300) makes it wrong.
    const rate = 'That works out to a mean rate of 0.015 ppm per year.';
    const faster = 'The present 3.0 ppm per year is therefore some 200 times faster.';
    const right = 'At the Brede station CO2 rose by about 90 ppm across some 6,000 years.';
    const wrong = 'At the Brede station CO2 rose by about 60 ppm across some 6,000 years.';
    const fresh = (first: string) => check(first, rate, faster).map((f) => f.ruleId);
    expect(fresh(right)).toEqual([]);
    expect(fresh(wrong)).toEqual(['arith.ratio']);
    expect(fresh(right)).toEqual([]);
    expect(flagged(wrong, rate)).toEqual([['arith.rate', '0.015 ppm per year', expect.any(String)]]);
  });

  it('is not changed by what a caller does with the flags', () => {
    const first = check(...wrongRate, multiple);
    for (const f of first) {
      f.reason = 'changed';
      f.start = -1;
    }
    const again = check(...wrongRate, multiple);
    expect(again[0]?.reason).toContain('0.12 ppm per year is itself');
    expect(again[0]?.start).toBeGreaterThan(0);
  });

  it('survives many other paragraphs read in between', () => {
    const first = check(...wrongRate, multiple);
    for (let n = 0; n < 200; n += 1) check(`Station ${n} logged ${300 + n} ppm.`, `A year later it logged ${302 + n} ppm, a rise of 2 ppm.`);
    expect(check(...wrongRate, multiple)).toEqual(first);
  });
});
