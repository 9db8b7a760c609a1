/**
 * A series of equal steps: how many fit a span, and how long each is (span = count × spacing).
 * "Eight glacial cycles in 800,000 years works out to one cycle every 10,000 years" (100,000);
 * "800k yrs of record ÷ ~100k-yr cycles = about 4 cycles" (8); "the window from 18,000 to 11,000
 * years BP at a 50-year spacing, about 70 samples" (140); "4 cycles in 420,000 years, so each one's
 * about 150k long" (105k).
 *
 * One sentence holds the three: the span (a duration after "in", "over", "across"..., or the span
 * of a pair of dates), the count (a count of things, or a bare figure before a plural noun) and the
 * spacing (a duration after "every", "each", "per", or written onto "spacing", "interval", "cycles";
 * as a result, also a bare figure followed by "long" or "apart"). The result is the last of them,
 * drawn from the two before by a link word, a sign ("=", "≈") or a comma. Words are data
 * (word-classes.ts: spacingBefore, spacingNouns, eachLong, spanBefore).
 */
import { toCanonical, writtenInterval as w } from '../quantities/index.js';
import type { Quantity } from '../types.js';
import { divide, rangeSpan, size, type Derived } from './arithmetic-derive.js';
import type { Pair } from './arithmetic-frames.js';
import { spanOfDates } from './arithmetic-spans.js';
import { holdsPhrase, WORDS, wordsIn } from './arithmetic-reader/word-classes.js';

/** A finding of a series: the stated figure and the value its span and other member give. */
export interface SeriesFinding {
  stated: Quantity;
  computed: Derived;
  measures: string;
}

const wordBefore = (text: string, q: Quantity): string => wordsIn(text, Math.max(0, q.start - 16), q.start).at(-1)?.text ?? '';
const wordsAfter = (text: string, q: Quantity, n: number): string[] => wordsIn(text, q.end, Math.min(text.length, q.end + 24)).slice(0, n).map((x) => x.text);
const only = <T>(xs: T[]): T | undefined => (xs.length === 1 ? xs[0] : undefined);

/** "every 10,000 years", "a 50-year spacing", "~100k-yr cycles". */
function isSpacing(text: string, q: Quantity): boolean {
  if (q.dimension !== 'duration') return false;
  if (WORDS.spacingBefore.has(wordBefore(text, q))) return true;
  // "each panel spans 100,000 years", "every cycle lasts about": the member named, then its verb.
  const nearWords = wordsIn(text, Math.max(0, q.start - 40), q.start);
  const near = nearWords.slice(-3).map((x) => x.text);
  // "100,000 years each gives 800,000 years": an "each" after a span of time belongs to that span.
  const eachOfFigure = WORDS.timeUnits.has(nearWords.at(-4)?.text ?? '');
  if (near.length === 3 && !eachOfFigure && WORDS.spacingBefore.has(near[0] ?? '') && !WORDS.notASpan.has(near[1] ?? '') && !qsBetween(text, q)) return true;
  // "each glacial cycle lasted about 80,000 years", "each one ran for 150,000 years": a member named
  // after "each" or "every", then what it did, in the clause before the figure.
  if (memberBefore(text, q)) return true;
  // "cycles of 100,000 years each", "at about 100,000 years apiece": the length of each member.
  const [next = '', member = ''] = wordsAfter(text, q, 2);
  if (next === 'each' || next === 'apiece') return true;
  // "about 125,000 years per cycle": the figure per member, the member a noun and no unit of time.
  if (next === 'per' && member !== '' && !WORDS.timeUnits.has(member) && /^\s*[\p{L}]+\s+[\p{L}]+/u.test(text.slice(q.end))) return true;
  return /^-?[\p{L}]*$/u.test(q.text.split(/[\s\u00A0-]/u).at(-1) ?? '') && /-/u.test(q.text) && WORDS.spacingNouns.has(next);
}

/**
 * True when the clause before a span of time opens its subject with "each" or "every" and names a
 * member that is no unit of time: "each glacial cycle lasted about", "each one ran for". The words
 * between are at most five, with no figure, punctuation or word of a span ("last", "past") among them.
 */
function memberBefore(text: string, q: Quantity): boolean {
  const from = Math.max(0, q.start - 60);
  const clause = text.slice(from, q.start);
  const cut = Math.max(...[',', ';', ':', '(', '\n'].map((c) => clause.lastIndexOf(c)));
  const words = wordsIn(text, from + cut + 1, q.start).slice(-6);
  const at = words.findLastIndex((x) => x.text === 'each' || x.text === 'every');
  if (at < 0 || at === words.length - 1 || /\d/u.test(text.slice(words[at]?.end ?? 0, q.start))) return false;
  // "100,000 years each gives": an "each" after a figure or its unit belongs to that figure.
  const eachAt = words[at]?.start ?? 0;
  if (WORDS.timeUnits.has(wordsIn(text, Math.max(0, eachAt - 16), eachAt).at(-1)?.text ?? '') || /\d[\s\u00A0]*$/u.test(text.slice(0, eachAt))) return false;
  const member = words[at + 1]?.text ?? '';
  if (WORDS.timeUnits.has(member) || WORDS.notASpan.has(member)) return false;
  return words.slice(at + 1).every((x) => !WORDS.notASpan.has(x.text) && !WORDS.timeUnits.has(x.text));
}

/** True when a digit stands in the few words before the figure (then "each" belongs to another figure). */
const qsBetween = (text: string, q: Quantity): boolean => /\d/u.test(text.slice(Math.max(0, q.start - 30), q.start).split(/\b(?:each|every|per|apiece)\b/iu).at(-1) ?? '');

/**
 * "800,000 years ago ... today": one date and the present mark out the time since that date.
 * Undefined unless the sentence holds exactly one date and a word of the present.
 */
function spanToPresent(text: string, qs: Quantity[]): { value: Derived; text: string; end: number } | undefined {
  const dates = qs.filter((q) => q.dimension === 'age');
  const date = only(dates);
  if (date === undefined || rangeSpan(date) !== undefined) return undefined;
  const now = wordsIn(text, 0, text.length).find((x) => WORDS.ownTime.has(x.text) && ['today', 'now', 'present'].includes(x.text));
  if (now === undefined) return undefined;
  return { value: size(w(date)), text: `from ${date.text} to ${now.text}`, end: Math.max(date.end, now.end) };
}

/** "8 cycles", "about 70 samples": a count of things. */
const isCount = (text: string, q: Quantity): boolean =>
  q.dimension === 'count' || (q.dimension === 'number' && (/s$/u.test(wordsAfter(text, q, 1)[0] ?? '') || partitive(wordsAfter(text, q, 2))) && !WORDS.timeUnits.has(wordsAfter(text, q, 1)[0] ?? ''));

/** "twelve of them", "nine of those": a count of the members a pronoun stands for. */
const partitive = ([of, which]: string[]): boolean => of === 'of' && PARTITIVE_PRONOUNS.has(which ?? '');
const PARTITIVE_PRONOUNS = new Set(['them', 'those', 'these']);

/** True when the text between the inputs and the result draws it from them. */
function drawn(text: string, from: number, to: number): boolean {
  const between = text.slice(from, to);
  return /[=≈,]/u.test(between) || holdsPhrase(wordsIn(text, from, to), WORDS.links);
}

export function seriesSpacings(text: string, qs: Quantity[], pairs: Pair[]): SeriesFinding[] {
  const dated = only(spanOfDates(qs, pairs));
  // "8 cycles in 800,000 years"; "800k yrs of record ÷ ...": a span the series fills.
  const spans = qs.filter((q) => q.dimension === 'duration' && !isSpacing(text, q) && (WORDS.spanBefore.has(wordBefore(text, q)) || wordsAfter(text, q, 1)[0] === 'of'));
  const spacings = qs.filter((q) => isSpacing(text, q));
  const counts = qs.filter((q) => isCount(text, q));
  // "800,000 years and eight cycles, so each cycle lasted ...": with a count and a spacing, the one
  // other span of time before the later of them is the whole, whatever word stands before it.
  if (spans.length === 0 && dated === undefined && counts.length === 1 && spacings.length === 1) {
    const later = Math.max((counts[0] as Quantity).start, (spacings[0] as Quantity).start);
    const loose = qs.filter((q) => q.dimension === 'duration' && !isSpacing(text, q));
    if (loose.length === 1 && (loose[0] as Quantity).end <= later) spans.push(loose[0] as Quantity);
  }
  const span: { value: Derived; text: string; end: number } | undefined =
    spans.length === 1 && dated === undefined ? { value: w(spans[0] as Quantity), text: (spans[0] as Quantity).text, end: (spans[0] as Quantity).end } : spans.length === 0 && dated !== undefined ? { value: dated.span, text: dated.measures.replace(/^the time /u, ''), end: Math.max(...qs.filter((q) => q.dimension === 'age').map((q) => q.end)) } : undefined;
  const whole = span ?? (spans.length === 0 && dated === undefined ? spanToPresent(text, qs) : undefined);
  if (counts.length > 1 || spacings.length > 1) return [];
  const total = totalOfSeries(text, qs, counts[0], spacings[0]);
  if (total !== undefined) return [total];
  if (whole === undefined) return [];
  return fromSpan(text, qs, whole, counts, spacings);
}

function fromSpan(text: string, qs: Quantity[], span: { value: Derived; text: string; end: number }, counts: Quantity[], spacings: Quantity[]): SeriesFinding[] {
  const count = counts[0];
  const spacing = spacings[0];
  // The result: the last of the three, after both inputs.
  if (count !== undefined && spacing !== undefined) {
    const [input, result] = count.start < spacing.start ? [count, spacing] : [spacing, count];
    const from = Math.max(input.end, span.end);
    if (result.start < from || !drawn(text, from, result.start)) return [];
    const other = result === count ? divide(span.value, w(spacing)) : divide(span.value, exact(count));
    if (other === undefined) return [];
    return [{ stated: result, computed: other, measures: result === count ? `${span.text} divided by ${spacing.text}` : `${span.text} divided by ${count.text}` }];
  }
  // "4 cycles in 420,000 years, so each one's about 150k long": a bare length of each member.
  if (count !== undefined && spacing === undefined) {
    const each = only(qs.filter((q) => q.dimension === 'number' && q !== count && q.start > Math.max(count.end, span.end) && WORDS.eachLong.has(wordsAfter(text, q, 1)[0] ?? '')));
    if (each === undefined || !drawn(text, Math.max(count.end, span.end), each.start)) return [];
    const length = divide(span.value, exact(count));
    if (length === undefined) return [];
    // The bare figure is in years, as the span is.
    const c = (x: number): number => toCanonical(x, 'yr', 'duration');
    return [{ stated: { ...each, dimension: 'duration', unit: 'yr', statedUnit: 'yr', value: c(each.value), low: c(each.low), high: c(each.high) }, computed: length, measures: `${span.text} divided by ${count.text}` }];
  }
  return [];
}

/**
 * "eight cycles of about 100,000 years each, a total of some 600,000 years", "eight cycles at
 * 100,000 years apiece give 800,000 years of record": the span as the result, after its count and
 * spacing and drawn from them, is their product. It must be the only span of time after both, and
 * no other figure may stand before it.
 */
function totalOfSeries(text: string, qs: Quantity[], count: Quantity | undefined, spacing: Quantity | undefined): SeriesFinding | undefined {
  if (count === undefined || spacing === undefined || count.start > spacing.start) return undefined;
  if (qs.some((q) => q.end <= spacing.end && q !== count && q !== spacing)) return undefined;
  const result = only(qs.filter((q) => q.start >= spacing.end));
  if (result === undefined || result.dimension !== 'duration' || isSpacing(text, result) || !drawn(text, spacing.end, result.start)) return undefined;
  const n = exact(count);
  const each = w(spacing);
  return { stated: result, computed: { value: n.value * each.value, low: n.low * each.low, high: n.high * each.high }, measures: `${count.text} of ${spacing.text}` };
}

/** A count is exact: eight cycles are eight. */
const exact = (q: Quantity): Derived => ({ value: q.value, low: q.value, high: q.value });
