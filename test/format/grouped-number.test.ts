import { describe, expect, it } from 'vitest';
import { groupedNumberFormat, groupedWithoutIntl } from '../../src/format/grouped-number.js';

// The Intl formatters the module stands in for (ECMA-402 NumberFormat, English locales: a comma
// every three whole digits, rounding half away from zero; common practice).
const INTL = {
  12: new Intl.NumberFormat('en-US', { maximumFractionDigits: 12 }),
  0: new Intl.NumberFormat('en-GB', { maximumFractionDigits: 0 }),
};

/** A small deterministic generator (a linear congruential one), so a failure can be replayed. */
function numbers(seed: number): () => number {
  let state = seed;
  return () => {
    state = (state * 1103515245 + 12345) % 2147483648;
    return state / 2147483648;
  };
}

describe('numbers grouped without starting ICU', () => {
  const written: [number, number, string][] = [
    [4_250, 12, '4,250'],
    [-37.25, 12, '-37.25'],
    [0.000042, 12, '0.000042'],
    [1_000_000.5, 12, '1,000,000.5'],
    [1_499.5, 0, '1,500'],
    [999.4999, 0, '999'],
    [99_999.5, 0, '100,000'],
    [0, 0, '0'],
  ];
  it.each(written)('%s with at most %s fraction digits is %s, as Intl writes it', (value, digits, text) => {
    expect(groupedWithoutIntl(value, digits)).toBe(text);
    expect(INTL[digits as 0 | 12].format(value)).toBe(text);
  });

  it('leaves to Intl what needs its rounding or notation', () => {
    expect(groupedWithoutIntl(1 / 7, 12)).toBeUndefined(); // more fraction digits than allowed
    expect(groupedWithoutIntl(-0.4, 0)).toBeUndefined(); // Intl writes "-0"
    expect(groupedWithoutIntl(-0, 12)).toBeUndefined();
    expect(groupedWithoutIntl(3e-9, 12)).toBeUndefined(); // exponent notation in String()
    expect(groupedWithoutIntl(2 ** 60, 0)).toBeUndefined();
    expect(groupedWithoutIntl(Number.NaN, 12)).toBeUndefined();
    expect(groupedNumberFormat('en-US', 12).format(1 / 7)).toBe(INTL[12].format(1 / 7));
    expect(groupedNumberFormat('en-GB', 0).format(-0.4)).toBe('-0');
  });

  it('writes what Intl writes, on numbers of every size and fraction length', () => {
    const next = numbers(20261205);
    let compared = 0;
    for (let i = 0; i < 60_000; i += 1) {
      const sign = next() < 0.2 ? -1 : 1;
      const values = [
        (sign * Math.floor(next() * 10 ** Math.floor(next() * 16))) / 10 ** Math.floor(next() * 15),
        sign * next() * 10 ** (Math.floor(next() * 20) - 5),
        sign * Math.floor(next() * 1e6) + 0.5,
        sign * Number((next() * 10 ** Math.floor(next() * 12)).toPrecision(1 + Math.floor(next() * 10))),
      ];
      for (const value of values) {
        for (const digits of [12, 0] as const) {
          const plain = groupedWithoutIntl(value, digits);
          if (plain === undefined) continue;
          compared += 1;
          if (plain !== INTL[digits].format(value)) expect(`${value} (${digits}): ${plain}`).toBe(INTL[digits].format(value));
        }
      }
    }
    // Most numbers take the path without Intl (the rest were not compared).
    expect(compared).toBeGreaterThan(300_000);
  });
});
