import { describe, expect, it } from 'vitest';
import { parseQuantities } from '../../src/quantities/index.js';
import type { Quantity } from '../../src/types.js';
import { LABELLED_SET, type Expected } from './labelled-set.js';

/** Equal up to floating-point noise from unit factors (0.3048, 5/9). */
const close = (a: number, b: number): boolean => Math.abs(a - b) <= 1e-9 * Math.max(1, Math.abs(a), Math.abs(b));

function matches(q: Quantity, [text, low, high, dimension, unit]: Expected): boolean {
  return q.text === text && q.dimension === dimension && q.unit === unit && close(q.low, low) && close(q.high, high);
}

const describeQuantity = (q: Quantity): string => `[${q.text}] ${q.dimension} ${q.low}..${q.high} ${q.unit}`;

describe('the labelled set', () => {
  it('has at least 150 sentences of our own writing', () => {
    expect(LABELLED_SET.length).toBeGreaterThanOrEqual(150);
  });

  it('is parsed exactly (text, interval, dimension, unit) in at least 97% of sentences', () => {
    const misses: string[] = [];
    for (const { sentence, expect: wanted } of LABELLED_SET) {
      const got = parseQuantities(sentence);
      const exact = got.length === wanted.length && got.every((q, i) => matches(q, wanted[i] as Expected));
      if (!exact) misses.push(`${sentence}\n    got:  ${got.map(describeQuantity).join(' | ') || '(none)'}\n    want: ${wanted.map((w) => `[${w[0]}] ${w[3]} ${w[1]}..${w[2]} ${w[4]}`).join(' | ') || '(none)'}`);
    }
    const exactCount = LABELLED_SET.length - misses.length;
    const rate = exactCount / LABELLED_SET.length;
    console.log(`quantities: ${exactCount}/${LABELLED_SET.length} labelled sentences parsed exactly (${(rate * 100).toFixed(1)}%)`);
    if (misses.length > 0) console.log(`not exact:\n${misses.join('\n')}`);
    expect(rate).toBeGreaterThanOrEqual(0.97);
  });

  it('gives spans that point at the quantity as written', () => {
    for (const { sentence } of LABELLED_SET) {
      for (const q of parseQuantities(sentence)) expect(sentence.slice(q.start, q.end)).toBe(q.text);
    }
  });
});
