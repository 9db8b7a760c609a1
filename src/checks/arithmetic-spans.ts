/**
 * The spans of time a sentence's dates mark out: a from-to or began-ended pair of dates ("from
 * 12,900 to 11,700 years ago") or one range of dates ("between 1750 and 2019"). Read by the
 * duration and rate rules, within one sentence and across two.
 */
import { writtenInterval as w } from '../quantities/index.js';
import type { Quantity } from '../types.js';
import { minus, rangeSpan, size, type Derived } from './arithmetic-derive.js';
import type { Pair } from './arithmetic-frames.js';

/** A span of dates: its length, where its last date ends, and what it is in words. */
export interface DateSpan {
  span: Derived;
  after: number;
  measures: string;
}

/**
 * True when the start of a pair is a bare number whose date unit is written at the end only
 * ("12,900 → 11,700 years ago", "from its start at about 14,700 to its end near 13,000 years
 * ago"): a number of the end date's size, in the end date's unit as written, is that date.
 */
function datedByEnd(a: Quantity | undefined, b: Quantity | undefined): boolean {
  if (a?.dimension !== 'number' || b?.dimension !== 'age' || !(a.value > 0) || !(b.value > 0)) return false;
  return b.statedUnit !== '' && toCanonicalOfEnd(b) === 1 && a.value / b.value < 3 && b.value / a.value < 3;
}

/** The factor from the end date's written unit to years, 1 when its numbers are years as written. */
function toCanonicalOfEnd(b: Quantity): number {
  const written = Number(b.text.replace(/[^\d.]/gu, ''));
  return written > 0 ? Math.round((b.value / written) * 1000) / 1000 : 0;
}

/** Every span of dates in a sentence, from its date pairs and its ranges of dates. */
export function spanOfDates(qs: Quantity[], pairs: Pair[]): DateSpan[] {
  const fromPairs = pairs.filter((p) => qs[p.from]?.dimension === 'age' || datedByEnd(qs[p.from], qs[p.to])).map((p) => {
    const a = qs[p.from] as Quantity;
    const b = qs[p.to] as Quantity;
    return { span: size(minus(w(a), w(b))), after: b.end, measures: `the time from ${a.text} to ${b.text}` };
  });
  const fromRanges = qs.filter((q) => q.dimension === 'age').flatMap((q) => {
    const span = rangeSpan(q);
    return span === undefined ? [] : [{ span, after: q.end, measures: `the time ${q.text}` }];
  });
  return [...fromPairs, ...fromRanges];
}
