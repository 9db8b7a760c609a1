import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { parseQuantities } from '../../src/quantities/index.js';

const ONES = ['', 'one', 'two', 'three', 'four', 'five', 'six', 'seven', 'eight', 'nine', 'ten', 'eleven', 'twelve', 'thirteen', 'fourteen', 'fifteen', 'sixteen', 'seventeen', 'eighteen', 'nineteen'];
const TENS = ['', '', 'twenty', 'thirty', 'forty', 'fifty', 'sixty', 'seventy', 'eighty', 'ninety'];

/** English words for 1..999,999 (the test's own writer, independent of the parser). */
function words(n: number): string {
  const below100 = (x: number): string => (x < 20 ? (ONES[x] ?? '') : `${TENS[Math.floor(x / 10)]}${x % 10 ? `-${ONES[x % 10]}` : ''}`);
  const below1000 = (x: number): string =>
    [x >= 100 ? `${ONES[Math.floor(x / 100)]} hundred` : '', x % 100 ? below100(x % 100) : ''].filter(Boolean).join(' ');
  return [n >= 1000 ? `${below1000(Math.floor(n / 1000))} thousand` : '', n % 1000 ? below1000(n % 1000) : ''].filter(Boolean).join(' ');
}

const group = (n: number, sep: string): string => String(n).replace(/\B(?=(\d{3})+(?!\d))/g, sep);
const SUP = '⁰¹²³⁴⁵⁶⁷⁸⁹';

/** Every supported way to write V = m × 10^e, where m has 2 or 3 digits and ends in a non-zero digit. */
function forms(m: number, e: number): string[] {
  const value = m * 10 ** e;
  const digits = String(m).length;
  const mantissa = (m / 10 ** (digits - 1)).toString();
  const exp = e + digits - 1;
  const out = [group(value, ','), group(value, '\u2009'), group(value, ' '), `${mantissa}e${exp}`, `${mantissa} × 10^${exp}`, `${mantissa}×10${[...String(exp)].map((c) => SUP[Number(c)]).join('')}`];
  if (value >= 1000) out.push(`${(value / 1000).toString()} thousand`);
  if (value < 1e6) out.push(words(value));
  return out;
}

const UNITS: [written: string, factor: number][] = [['years', 1], ['ppm', 1], ['metres', 1], ['feet', 0.3048], ['ppb', 0.001]];
const HEDGES = ['', 'about ', 'nearly ', 'more than ', 'up to ', 'at least ', 'less than ', 'just over '];

describe('property: a quantity written in any supported form parses back to the same interval', () => {
  it('holds for random values, units and hedges', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 10, max: 999 }).filter((m) => m % 10 !== 0),
        fc.integer({ min: 0, max: 3 }),
        fc.constantFrom(...UNITS),
        fc.constantFrom(...HEDGES),
        (m, e, [unit, factor], hedge) => {
          const value = m * 10 ** e;
          const half = 0.5 * 10 ** e;
          const parsed = forms(m, e).map((written) => {
            const sentence = `The display in gallery B showed ${hedge}${written} ${unit} on the card.`;
            const qs = parseQuantities(sentence);
            expect(qs, sentence).toHaveLength(1);
            return qs[0];
          });
          const first = parsed[0];
          for (const q of parsed) {
            expect(q?.low).toBeCloseTo(first?.low ?? Number.NaN, 6);
            expect(q?.high).toBeCloseTo(first?.high ?? Number.NaN, 6);
          }
          if (hedge === '') {
            expect(first?.low).toBeCloseTo((value - half) * factor, 6);
            expect(first?.high).toBeCloseTo((value + half) * factor, 6);
          }
        },
      ),
      { numRuns: 300 },
    );
  });
});

const PIECES = ['about ', '~', '8e5', '1,000', '−30 °C', ' to ', '–', 'from ', ' ppm', ' years ago', ' ka', 'between ', ' and ', '±', 'half a ', 'million', ' BCE', 'AD ', '1750', '%', ' per ', 'year', 'twice', '-fold', ' times as', 'thousands of ', '(', ')', ' or so', '°', 'K', 'e', '\u2009', '.', ','];

describe('property: any Unicode input', () => {
  it('never throws, and every span lies inside the sentence and spells the quantity', () => {
    fc.assert(
      fc.property(fc.array(fc.oneof(fc.constantFrom(...PIECES), fc.string({ unit: 'binary', maxLength: 6 })), { maxLength: 24 }), (bits) => {
        const sentence = bits.join('');
        for (const q of parseQuantities(sentence)) {
          expect(q.start).toBeGreaterThanOrEqual(0);
          expect(q.end).toBeLessThanOrEqual(sentence.length);
          expect(q.start).toBeLessThan(q.end);
          expect(sentence.slice(q.start, q.end)).toBe(q.text);
          expect(q.low).toBeLessThanOrEqual(q.high);
        }
      }),
      { numRuns: 2000 },
    );
  });
});

describe('regressions found by the property tests', () => {
  it('does not read "8e51750" as 8 × 10^51750 (Infinity)', () => {
    for (const q of parseQuantities('8e51750')) expect(Number.isFinite(q.low) && Number.isFinite(q.high)).toBe(true);
  });

  it('ends a number that borrows the unit written before it with the number itself ("from −30 °C–8", seed 725866795)', () => {
    const text = 'from −30 °C–8e5';
    for (const q of parseQuantities(text)) {
      expect(q.start).toBeLessThan(q.end);
      expect(text.slice(q.start, q.end)).toBe(q.text);
    }
    expect(parseQuantities(text).map((q) => q.text)).toEqual(['−30 °C', '8e5']);
  });
});
