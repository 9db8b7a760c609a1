/**
 * Sums written out in the draft, as worked answers and explainers show them: "265 − 188 = 77",
 * "420 − 280 = 140 ppm", "9 × 1.8 = 16.2", or with the result in words ("76 ÷ 6,000 gives 0.013";
 * "280 − 180, an increase of 100 ppm"). The result must be what the two numbers before it give.
 * The operands are exact and the result is read as written (its last written place), so
 * "18.2 − 9 = 9" passes: 9.2 rounds to 9. Only a sum whose three numbers the quantity reader found on their own
 * is read; "3-4" and the like are ranges, not subtractions.
 */
import { toCanonical, writtenInterval as w } from '../quantities/index.js';
import type { Quantity } from '../types.js';
import { divide, minus, type Derived } from './arithmetic-derive.js';
import { WORDS } from './arithmetic-reader/word-classes.js';
import { disjoint } from './arithmetic-levels.js';

const S = String.raw`[\s\u00A0]`;
/** Scales a result may carry that its operands leave off ("6.5 thousand", "105k", "2 million"). */
const SCALES = [1e3, 1e6, 1e9];
const escape = (x: string): string => x.replace(/[.*+?^${}()|[\]\\/]/gu, '\\$&').replace(/ /gu, `${S}+`);
const longestFirst = (xs: Iterable<string>): string[] => [...xs].sort((a, b) => b.length - a.length);
/** The operator between the first two numbers of a written sum, in symbols or words (WORDS.operators). */
const OPERATOR = new RegExp(String.raw`^${S}*(${longestFirst(WORDS.operators.keys()).map(escape).join('|')})${S}*$`, 'iu');
/**
 * Between the second number and the result: a word or sign of the result (WORDS.equals: "=", "≈",
 * "gives", "leaves", "works out at"), perhaps after a comma, perhaps followed by a name of the
 * result in a few words ("leaves a cold spell of", "gives an increase of"); or an apposition naming
 * the result alone (", an increase of"): "280 − 180, an increase of 100 ppm".
 */
const NAMED = String.raw`(?:an?|the)${S}+(?:[\p{L}-]+${S}+){1,3}of`;
const EQUALS = new RegExp(String.raw`^${S}*(?:,${S}*)?(?:(?:${longestFirst(WORDS.equals).map(escape).join('|')})(?:${S}+${NAMED})?|${NAMED})${S}*$`, 'iu');

/**
 * An operand of a written sum is the number itself: the writer worked "280 − 180" as exactly 100.
 * The result keeps the precision it was written to, which is the sum's only slack.
 */
const exact = (q: Quantity): Derived => {
  const { value } = w(q);
  return { value, low: value, high: value };
};
const plus = (a: Derived, b: Derived): Derived => ({ value: a.value + b.value, low: a.low + b.low, high: a.high + b.high });
function times(a: Derived, b: Derived): Derived | undefined {
  if (a.low < 0 || b.low < 0) return undefined;
  return { value: a.value * b.value, low: a.low * b.low, high: a.high * b.high };
}

/** `d`, a number in `c`'s written unit, in `c`'s canonical unit. */
function inUnitOf(d: Derived, c: Quantity): Derived {
  const [low, high] = [toCanonical(d.low, c.statedUnit, c.dimension), toCanonical(d.high, c.statedUnit, c.dimension)].sort((x, y) => x - y) as [number, number];
  return { value: toCanonical(d.value, c.statedUnit, c.dimension), low, high };
}

/**
 * "5 + 32 = 41 °F of cooling": 32 added to give a Fahrenheit change is a unit slip, which the unit
 * check reports (units-offset-sums.ts); its arithmetic is not judged twice.
 */
export function addsReadingOffset(op: string, a: Quantity, b: Quantity, c: Quantity): boolean {
  return op === '+' && c.statedUnit === 'degF' && c.dimension === 'temperature-change' && (a.value === 32 || b.value === 32);
}

/** What the operator makes of the two numbers, or undefined when it cannot say. */
function apply(op: string, a: Derived, b: Derived): Derived | undefined {
  switch (op) {
    case '−':
      return minus(a, b);
    case '+':
      return plus(a, b);
    case '×':
      return times(a, b);
    default:
      return divide(a, b);
  }
}

/** A written sum whose stated result is not what its two numbers give. */
export interface SumFinding {
  stated: Quantity;
  computed: Derived;
  measures: string;
}

/** Every written sum "A op B = C" in a sentence, with C set against A op B. */
export function writtenSums(text: string, qs: Quantity[]): SumFinding[] {
  const out: SumFinding[] = [];
  for (let i = 0; i + 2 < qs.length; i++) {
    const [a, b, c] = [qs[i], qs[i + 1], qs[i + 2]] as [Quantity, Quantity, Quantity];
    const written = OPERATOR.exec(text.slice(a.end, b.start))?.[1];
    const op = written === undefined ? undefined : WORDS.operators.get(written.toLowerCase().replace(/[\s\u00A0]+/gu, ' '));
    // "≈ 0.11 ppm per year": a sign of the result read as the result's hedge stands for "=".
    const between = text.slice(b.end, c.start);
    const signed = /^[\s\u00A0]*$/u.test(between) && c.hedge !== undefined && WORDS.equals.includes(c.hedge.trim());
    if (op === undefined || !(EQUALS.test(between) || signed)) continue;
    if (a.hedge !== undefined || b.hedge !== undefined || !comparable(op, a, b, c)) continue;
    if (addsReadingOffset(op, a, b, c)) continue;
    const sum = apply(op, exact(a), exact(b));
    if (sum === undefined) continue;
    // Bare operands give the result in the unit it is written in ("265 − 188 = 77 ppm", "9 × 1.8 = 16.2 °F").
    const computed = a.dimension === 'number' && b.dimension === 'number' && c.statedUnit !== '' ? inUnitOf(sum, c) : sum;
    // "18 minus 11.5 is 6.5 thousand", "420 divided by 4 is 105k": a sum done in thousands (or
    // millions) whose result carries the scale its operands left off.
    if (SCALES.some((k) => !disjoint(c, { low: computed.low * k, high: computed.high * k }))) continue;
    out.push({ stated: c, computed, measures: `${a.text} ${op} ${b.text}` });
  }
  return out;
}

/**
 * Whether the three numbers can be set against each other in their canonical units: bare numbers
 * (the result may carry the unit: "265 − 188 = 77 ppm"), or, for a sum or difference, one
 * dimension throughout ("420 ppm − 280 ppm = 140 ppm"). A product or quotient of measures
 * changes the unit ("10 m × 750 years per metre") and is left alone.
 */
function comparable(op: string, a: Quantity, b: Quantity, c: Quantity): boolean {
  if (a.dimension === 'number' && b.dimension === 'number') return true;
  const additive = op === '−' || op === '+';
  const same = (q: Quantity): boolean => q.dimension === a.dimension || (a.dimension === 'temperature' && q.dimension === 'temperature-change');
  return additive && a.dimension !== 'age' && same(b) && same(c);
}
