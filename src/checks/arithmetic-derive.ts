/**
 * Interval arithmetic on the draft's own numbers. Every result keeps the widths of its inputs, so
 * a stated value conflicts with a derived one only when no reading of the inputs allows it
 * (a change C conflicts with "from A to B" only if C misses [B.low − A.high, B.high − A.low]).
 */
import { writtenInterval } from '../quantities/index.js';
import type { Quantity } from '../types.js';

/** A derived value: a central value and the interval every reading of the inputs allows. */
export interface Derived {
  value: number;
  low: number;
  high: number;
}

/** b − a. */
export function minus(b: Derived, a: Derived): Derived {
  return { value: b.value - a.value, low: b.low - a.high, high: b.high - a.low };
}

/** −d. */
export function negate(d: Derived): Derived {
  return { value: -d.value, low: -d.high, high: -d.low };
}

/** d turned to face the sign of `like` (a drop of 100 ppm is the size of a −100 ppm change). */
export function facing(d: Derived, like: number): Derived {
  return (like >= 0) === (d.value >= 0) ? d : negate(d);
}

/** |d|: the size of a difference, whichever end came first. */
export function size(d: Derived): Derived {
  const f = d.value >= 0 ? d : negate(d);
  return { value: f.value, low: Math.max(0, f.low), high: f.high };
}

/** n ÷ d for positive intervals; undefined when d may be zero or negative, or n may be negative. */
export function divide(n: Derived, d: Derived): Derived | undefined {
  if (d.low <= 0 || n.low < 0) return undefined;
  return { value: n.value / d.value, low: n.low / d.high, high: n.high / d.low };
}

/** 1 ÷ r for a positive ratio. */
export function invert(r: Derived): Derived {
  return { value: 1 / r.value, low: 1 / r.high, high: 1 / r.low };
}

/** r as a percentage change: (r − 1) × 100, turned to face `like` (a 36 percent drop). */
export function percentChange(r: Derived, like: number): Derived {
  return facing({ value: (r.value - 1) * 100, low: (r.low - 1) * 100, high: (r.high - 1) * 100 }, like);
}

/**
 * The span between the ends of a range of dates ("between 1750 and 2019", "18–11.7 ka"), exactly
 * as stated. A hedge on the range ("between about 18,000 and 11,500 years ago") is set aside, as
 * for every input to a sum: the writer subtracted the two numbers written.
 */
export function rangeSpan(q: Quantity): Derived | undefined {
  // "18–11.7 ka", or in words: "between nineteen thousand and eleven thousand years ago", "eighteen
  // thousand years ago to eleven and a half thousand" (a number in words never holds "to").
  const inWords = /(?:^|[^\p{L}])(?:between|from)[\s\u00A0].+[\s\u00A0](?:and|to)[\s\u00A0]/iu.test(q.text) || /\p{L}[\s\u00A0]+(?:to|through|until|till)[\s\u00A0]+\p{L}/iu.test(q.text);
  if (!/\d[^\d]*(?:to|–|—|-|and)[^\d]*\d/iu.test(q.text) && !inWords) return undefined;
  const { low, high } = q.hedge === undefined ? q : writtenInterval(q);
  const span = high - low;
  return { value: span, low: span, high: span };
}
