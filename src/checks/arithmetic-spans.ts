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

/** Every span of dates in a sentence, from its date pairs and its ranges of dates. */
export function spanOfDates(qs: Quantity[], pairs: Pair[]): DateSpan[] {
  const fromPairs = pairs.filter((p) => qs[p.from]?.dimension === 'age').map((p) => {
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
