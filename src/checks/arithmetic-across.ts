/**
 * Arithmetic whose inputs stand in the sentence before, beyond the change of
 * arithmetic-context.ts:
 *  - a span: "The thaw began about 17,000 years ago and ended about 11,700 years ago. That is a
 *    stretch of some 4,000 years." (17,000 − 11,700 = 5,300);
 *  - a ratio of rates: "... close to 1.3 ppm per century. Today's 2.5 ppm a year is some 20 times
 *    faster." (2.5 ÷ 0.013 = 192).
 * Precision first: this sentence must open by referring back ("That is", "So", "Thus", "It",
 * a label such as "Answer:" first), state no date of its own, and the sentence before must hold
 * exactly one span of dates (or one rate). Flags fall only on this sentence's own numbers.
 */
import { writtenInterval as w } from '../quantities/index.js';
import type { Quantity } from '../types.js';
import { divide, invert, minus, rangeSpan, size, type Derived } from './arithmetic-derive.js';
import { findPairs, isPaceRatio, startsAt, timesTheMeasure } from './arithmetic-frames.js';
import type { Previous } from './arithmetic-context.js';
import { spanOfDates } from './arithmetic-spans.js';
import { disjoint } from './arithmetic-levels.js';
import { rateReadings } from './arithmetic-solver.js';

/** A finding from two sentences, with the basis named. */
export interface AcrossFinding {
  stated: Quantity;
  computed: Derived;
  measures: string;
  basis: string;
}

const S = String.raw`[\s\u00A0]`;
/** An opening that carries the reader on: "That is", "So", "Thus", "**Answer:** so", "It lasted". */
const OPENS_BY_REFERRING = new RegExp(
  String.raw`^[^\p{L}\p{N}]*(?:\p{L}+(?:${S}+\p{L}+){0,2}${S}*:[^\p{L}\p{N}]*)?(?:that|this|so|thus|hence|therefore|altogether|in${S}+all|all${S}+told|it)(?![\p{L}])`,
  'iu',
);
/** Words just before a duration that make it the length of something ("lasted", "a transition of", "spread over"). */
const SPAN_WORDS = new RegExp(String.raw`(?:^|[^\p{L}])(?:lasted|lasting|lasts|took|taking|spans|spanned|spanning|span${S}+of|over|across|within|of|for)${S}*$`, 'iu');
const NOT_A_SPAN = new RegExp(String.raw`(?:^|[^\p{L}])(?:past|last|previous|next|every|each|per|after|before)${S}*$`, 'iu');
const RATES = new Set(['concentration-rate', 'temperature-rate', 'length-rate']);
const only = <T>(xs: T[]): T | undefined => (xs.length === 1 ? xs[0] : undefined);

/**
 * "So about seven hundred years of stalling", "so ~2,200 years of cold": a duration named as a
 * stretch of something, "of" and a word after it, with no word before it but the opening that refers
 * back and its punctuation.
 */
function spanOfWhat(text: string, q: Quantity): boolean {
  const before = text.slice(0, q.start).replace(OPENS_BY_REFERRING, '');
  return /^[\s\u00A0,;:—–-]*(?:\p{L}+[\s\u00A0,;:—–-]*)?$/u.test(before) && new RegExp(String.raw`^${S}+of${S}+\p{L}`, 'u').test(text.slice(q.end));
}

/** "That is a transition of roughly 3,000 years": a duration restating the span of the sentence before. */
export function durationsAcross(text: string, qs: Quantity[], previous: Previous | undefined): AcrossFinding[] {
  if (previous === undefined || qs.some((q) => q.dimension === 'age')) return [];
  const stated = only(qs.filter((q) => q.dimension === 'duration'));
  if (stated === undefined || !OPENS_BY_REFERRING.test(text)) return [];
  const head = text.slice(Math.max(0, stated.start - 40), stated.start);
  if (!(SPAN_WORDS.test(head) || spanOfWhat(text, stated)) || NOT_A_SPAN.test(head)) return [];
  const earlier = only(spanOfDates(previous.quantities, findPairs(previous.text, previous.quantities)));
  if (earlier === undefined) return [];
  return [{ stated, computed: earlier.span, measures: `${earlier.measures} in the sentence before`, basis: "the paragraph's" }];
}

/** Words that end something just before its date: "ended around", "was over by", "gave way about". */
const END_BEFORE = new RegExp(String.raw`(?:^|[^\p{L}])(?:ended|ends|finished|closed|ceased|stopped|was${S}+over|gave${S}+way|until|till|by)(?:${S}+(?:at|in|around|about|some|roughly|near|c\.|circa))?${S}*$`, 'iu');
/** A span drawn from the dates as their consequence: ", so it lasted", "which means it took", "meaning a spell of". */
const DRAWN_SPAN = new RegExp(String.raw`^[^.;!?\d]{0,12}?[,;:—–]${S}*(?:and${S}+)?(?:so|thus|hence|which${S}+means|meaning)(?![\p{L}])[^.;!?\d]{0,40}$`, 'iu');

/**
 * ", a span of some 4,300 years", "(a stretch of 6,000 years)": a duration set in apposition to the
 * end date, naming the stretch its figure measures. Read across two sentences only when the date
 * before follows a start word ("began", "started"), so the two dates are the stretch's two ends.
 */
const APPOSED_SPAN = new RegExp(String.raw`^[^.;!?\d]{0,12}?[,;:—–(]${S}*(?:(?:a|an|the|some)${S}+)?(?:[\p{L}-]+${S}+)?(?:span|stretch|period|interval|spell|transition|gap)${S}+of${S}*(?:(?:only|just|barely|merely|a${S}+mere|a${S}+good|a${S}+full|fully)${S}+)?$`, 'iu');

/** An opening that carries on the sentence before: "and was over by", "It ended", "- which closed", or a lower-case word. */
const CARRIES_ON = new RegExp(String.raw`^[^\p{L}\p{N}]*(?:(?:[Aa]nd|[Ii]t|[Ww]hich|[Tt]hen|[Tt]his|[Tt]hat)(?![\p{L}])|\p{Ll})`, 'u');

/**
 * "About 12,900 years ago the region plunged back into cold. The cold snap ended around 11,700 years
 * ago, so it lasted some 2,200 years." The start date stands alone in the sentence before, the end
 * date alone here after a word that ends something, and the span is drawn from them as their
 * consequence ("so", "which means") right after the end date, or set in apposition to the end date
 * (", a span of") when the date before follows a start word ("The warming began about 18,000 years
 * ago / and was complete by 11,700 years ago, a span of some 4,300 years").
 */
export function spansAcross(text: string, qs: Quantity[], previous: Previous | undefined): AcrossFinding[] {
  if (previous === undefined) return [];
  const dates = qs.filter((q) => q.dimension === 'age');
  const end = only(dates);
  const start = only(previous.quantities.filter((q) => q.dimension === 'age'));
  if (end === undefined || start === undefined || !END_BEFORE.test(text.slice(Math.max(0, end.start - 30), end.start))) return [];
  if (rangeSpan(end) !== undefined || rangeSpan(start) !== undefined) return [];
  const stated = only(qs.filter((q) => q.dimension === 'duration' && q.start > end.end));
  if (stated === undefined) return [];
  const gap = text.slice(end.end, stated.start);
  const drawn = DRAWN_SPAN.test(gap) && SPAN_WORDS.test(text.slice(Math.max(0, stated.start - 40), stated.start));
  // An apposed span reads across only when this sentence carries on the one before ("and was over
  // by", "It ended"), so both dates are of one stretch, and the start is the older date.
  const carriesOn = CARRIES_ON.test(text.slice(0, end.start));
  if (!drawn && !(APPOSED_SPAN.test(gap) && startsAt(previous.text, start) && carriesOn && start.value > end.value)) return [];
  const span = size(minus(w(start), w(end)));
  return [{ stated, computed: span, measures: `the time from ${start.text} in the sentence before to ${end.text}`, basis: "the paragraph's" }];
}

/** "Today's 2.4 ppm a year is some 19 times faster": this rate over the one rate of the sentence before. */
export function paceRatiosAcross(text: string, qs: Quantity[], previous: Previous | undefined): AcrossFinding[] {
  if (previous === undefined) return [];
  const stated = only(qs.filter((q) => isPaceRatio(text, q) || (timesTheMeasure(text, q) && !qs.some((r) => r.start > q.end && RATES.has(r.dimension)))));
  const now = only(qs.filter((q) => RATES.has(q.dimension)));
  if (stated === undefined || now === undefined || now.start > stated.start) return [];
  const then = only(previous.quantities.filter((q) => q.dimension === now.dimension));
  if (then === undefined) return [];
  const r = divide(w(now), w(then));
  if (r === undefined) return [];
  const faced = (stated.value < 1) === (r.value < 1) ? r : invert(r);
  // The rate before may be a slip of its own sentence ("90 ppm over 7,000 yrs, so about 0.13 ppm
  // per year"): a multiple that fits the rate its figures give is no slip of this sentence.
  const fits = rateReadings(previous.text, previous.quantities, now.dimension).some((then) => {
    const x = divide(w(now), then);
    return x !== undefined && !disjoint(stated, (stated.value < 1) === (x.value < 1) ? x : invert(x));
  });
  if (fits) return [];
  return [{ stated, computed: faced, measures: `the ratio of ${now.text} to ${then.text} in the sentence before`, basis: "the paragraph's" }];
}
