/**
 * The arithmetic rules as data: each derives values from the draft's own numbers and returns the
 * stated numbers they should equal. checkArithmetic runs every rule the same way. The inputs are
 * read as written, without their hedges (quantities/written-interval.ts): the writer did the sum
 * on the numbers they wrote. The stated result keeps its hedge.
 */
import { writtenInterval as w } from '../quantities/index.js';
import type { Dimension, Quantity } from '../types.js';
import { changesAcross, type Previous } from './arithmetic-context.js';
import { divide, facing, invert, minus, percentChange, rangeSpan, size, type Derived } from './arithmetic-derive.js';
import { comesToRate, comparesToNext, findPairs, isSpanOfChange, isSpanOfPair, isStatedChange, isStatedRatio, type Pair } from './arithmetic-frames.js';

/** A stated quantity next to the value the draft's other numbers give it. */
export interface Finding {
  stated: Quantity;
  computed: Derived;
  /** What the computed value is, in words: "the change from 180 to 280 ppm". */
  measures: string;
  /** Whose numbers these are, when not the sentence's own alone: "the paragraph's". */
  basis?: string;
}

/** One arithmetic rule. */
export interface ArithmeticRule {
  id: string;
  summary: string;
  /** `previous` is the sentence before in the same paragraph, read only by rules that span two. */
  derive: (text: string, qs: Quantity[], pairs: Pair[], previous?: Previous) => Finding[];
}

const DIFFERENCE: Partial<Record<Dimension, Dimension>> = {
  concentration: 'concentration', temperature: 'temperature-change', 'temperature-change': 'temperature-change',
  length: 'length', duration: 'duration', count: 'count', number: 'number',
};
const RATE_OF: Partial<Record<Dimension, Dimension>> = { 'concentration-rate': 'concentration', 'temperature-rate': 'temperature-change' };
const RATIOED: Dimension[] = ['concentration', 'temperature-change', 'length', 'duration', 'count', 'concentration-rate', 'temperature-rate'];

const ends = (qs: Quantity[], p: Pair): [Quantity, Quantity] => [qs[p.from] as Quantity, qs[p.to] as Quantity];
const only = <T>(xs: T[]): T | undefined => (xs.length === 1 ? xs[0] : undefined);
const words = (a: Quantity, b: Quantity): string => `from ${a.text} to ${b.text}`;
const others = (qs: Quantity[], p: Pair | undefined): Quantity[] => qs.filter((_, i) => p === undefined || (i !== p.from && i !== p.to));

function changes(text: string, qs: Quantity[], pairs: Pair[]): Finding[] {
  return pairs.flatMap((p) => {
    const [a, b] = ends(qs, p);
    const stated = only(others(qs, p).filter((q) => q.dimension === DIFFERENCE[a.dimension] && isStatedChange(text, q)));
    if (stated === undefined) return [];
    return [{ stated, computed: facing(minus(w(b), w(a)), stated.value), measures: `the change ${words(a, b)}` }];
  });
}

function spanOfDates(text: string, qs: Quantity[], pairs: Pair[]): { span: Derived; after: number; measures: string }[] {
  const fromPairs = pairs.filter((p) => qs[p.from]?.dimension === 'age').map((p) => {
    const [a, b] = ends(qs, p);
    return { span: size(minus(w(a), w(b))), after: b.end, measures: `the time ${words(a, b)}` };
  });
  const fromRanges = qs.filter((q) => q.dimension === 'age').flatMap((q) => {
    const span = rangeSpan(q);
    return span === undefined ? [] : [{ span, after: q.end, measures: `the time ${q.text}` }];
  });
  return [...fromPairs, ...fromRanges];
}

function durations(text: string, qs: Quantity[], pairs: Pair[]): Finding[] {
  return spanOfDates(text, qs, pairs).flatMap(({ span, after, measures }) => {
    const stated = only(qs.filter((q) => q.dimension === 'duration' && isSpanOfPair(text, q, after)));
    return stated === undefined ? [] : [{ stated, computed: span, measures }];
  });
}

function rates(text: string, qs: Quantity[], pairs: Pair[]): Finding[] {
  return qs.flatMap((rate) => {
    const changeDim = RATE_OF[rate.dimension];
    if (changeDim === undefined) return [];
    const explicit = only(qs.filter((q) => q.dimension === changeDim && (isStatedChange(text, q) || comesToRate(text, q, rate))));
    const pair = only(pairs.filter((p) => DIFFERENCE[qs[p.from]?.dimension ?? 'number'] === changeDim));
    const pairEnds = pair === undefined ? undefined : ends(qs, pair);
    const change = explicit !== undefined ? w(explicit) : pairEnds === undefined ? undefined : minus(w(pairEnds[1]), w(pairEnds[0]));
    const spanOfChange = only(qs.filter((q) => q.dimension === 'duration' && isSpanOfChange(text, q)));
    const duration = spanOfChange !== undefined ? w(spanOfChange) : only(spanOfDates(text, qs, pairs))?.span;
    if (change === undefined || duration === undefined) return [];
    const computed = divide(size(change), duration);
    return computed === undefined ? [] : [{ stated: rate, computed: facing(computed, rate.value), measures: 'the change divided by the time it took' }];
  });
}

function ratios(text: string, qs: Quantity[], pairs: Pair[]): Finding[] {
  const pair = only(pairs.filter((p) => RATIOED.includes(qs[p.from]?.dimension ?? 'number')));
  return qs.flatMap((stated, i) => {
    const isPercent = stated.dimension === 'percent' && (isStatedChange(text, stated) || comparesToNext(text, stated));
    const isRatio = stated.dimension === 'ratio' && (isStatedRatio(text, stated) || comparesToNext(text, stated));
    if (!isPercent && !isRatio) return [];
    let pairRatio: Derived | undefined;
    let measures: string;
    if (pair !== undefined) {
      const [a, b] = ends(qs, pair);
      pairRatio = divide(w(b), w(a));
      measures = `${isPercent ? 'the percentage change' : 'the ratio'} ${words(a, b)}`;
    } else {
      const after = qs.slice(i + 1).find((q) => RATIOED.includes(q.dimension));
      const x = after === undefined ? undefined : only(qs.filter((q) => q !== after && q !== stated && q.dimension === after.dimension));
      if (after === undefined || x === undefined || !comparesToNext(text, stated)) return [];
      pairRatio = divide(w(x), w(after));
      measures = `${isPercent ? 'the percentage difference' : 'the ratio'} of ${x.text} to ${after.text}`;
    }
    if (pairRatio === undefined) return [];
    if (isPercent) return [{ stated, computed: percentChange(pairRatio, stated.value), measures }];
    const r = (stated.value < 1) === (pairRatio.value < 1) ? pairRatio : invert(pairRatio);
    return [{ stated, computed: r, measures }];
  });
}

/** The arithmetic rule table. */
export const ARITHMETIC_RULES: readonly ArithmeticRule[] = [
  { id: 'arith.change', summary: 'A stated change equals the difference between the stated start and end values.', derive: (t, qs, p, prev) => [...changes(t, qs, p), ...changesAcross(t, qs, p, prev)] },
  { id: 'arith.duration', summary: 'A stated duration equals the time between the stated start and end dates.', derive: durations },
  { id: 'arith.rate', summary: 'A stated rate equals the stated change divided by the time it took.', derive: rates },
  { id: 'arith.ratio', summary: 'A stated ratio or percentage change agrees with the two values it compares.', derive: ratios },
];

export { findPairs };
