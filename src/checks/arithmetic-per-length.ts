/**
 * How much time a length of ice holds, checked against the draft's own years and metres:
 *  - a stated gradient after the years and the metres it divides:
 *    "the lowest [200 m] hold about [150,000 years], or roughly [75 years per metre]" (750);
 *  - a unit length that holds some years, then another length and what it holds:
 *    "[one metre] there holds [750 years], so the lowest [200 m] hold about [15,000 years]" (150,000);
 *  - the same across two sentences, when the second draws its figure from the first ("therefore",
 *    "so", "at that rate"): "[One metre] stores some [750 years]. A [ten-metre] section therefore
 *    spans roughly [75,000 years]." (7,500).
 * Precision first: each side must be the only one of its kind, and a unit length ("one metre",
 * "1 m") must be followed by its years in the same clause, with no other number between.
 */
import { writtenInterval as w } from '../quantities/index.js';
import type { Quantity } from '../types.js';
import { divide, type Derived } from './arithmetic-derive.js';
import type { Previous } from './arithmetic-context.js';
import { isVagueTime } from './arithmetic-vague.js';
import { reachBack } from './arithmetic-reader/roles.js';

/** A finding on a stated number, with what the computed value is in words. */
export interface PerLengthFinding {
  stated: Quantity;
  computed: Derived;
  measures: string;
  basis?: string;
}

/** A gradient the draft states: its years per metre, and the quantities that state it. */
interface Gradient {
  perMetre: Derived;
  words: string;
  parts: Quantity[];
}

const S = String.raw`[\s\u00A0]`;
/** Between a unit length and the years it holds: a few words in one clause ("of ice there holds"). */
const HOLDS_GAP = /^[^\d;:.!?()]{1,48}$/u;
/** Words that draw a figure from the sentence before ("therefore", "so", "at that rate"). */
const DRAWS_ON = new RegExp(String.raw`(?:^|[^\p{L}])(?:therefore|so|thus|hence|at${S}+that${S}+rate|which${S}+means|that${S}+means|by${S}+the${S}+same${S}+token)(?![\p{L}])`, 'iu');
const only = <T>(xs: T[]): T | undefined => (xs.length === 1 ? xs[0] : undefined);
/** A stated gradient that restates the sentence before: "That works out to", "That is", "So", "which means". */
const REFERS_BACK = new RegExp(String.raw`^[^\d]{0,24}?(?:^|[^\p{L}])(?:that|this|which|so|therefore|thus|hence|in${S}+other${S}+words)(?![\p{L}])`, 'iu');

function times(a: Derived, b: Derived): Derived {
  return { value: a.value * b.value, low: a.low * b.low, high: a.high * b.high };
}

/**
 * One metre named by a distributive word instead of a numeral: "each metre", "every metre", "a
 * single metre" (common practice of English: each, every and a/an pick out one unit). Read as the
 * length 1 m, so "each metre there holds about 75 years" is a gradient as "one metre holds" is.
 */
const ONE_METRE = new RegExp(String.raw`(?:^|[^\p{L}])((?:each|every|a${S}+single|any${S}+one|a)${S}+(?:metre|meter)(?![\p{L}]))`, 'giu');
function withUnitMetres(text: string, qs: Quantity[]): Quantity[] {
  const extra: Quantity[] = [];
  for (const m of text.matchAll(ONE_METRE)) {
    const word = m[1] as string;
    const start = (m.index ?? 0) + m[0].length - word.length;
    const end = start + word.length;
    if (qs.some((q) => q.start < end && start < q.end)) continue;
    extra.push({ text: word, start, end, value: 1, low: 1, high: 1, dimension: 'length', unit: 'm', statedUnit: 'm' });
  }
  return extra.length === 0 ? qs : [...qs, ...extra].sort((a, b) => a.start - b.start);
}

/**
 * "75 years of climate history per metre of ice", "750 years of record for every metre": years of
 * a named record before the length they are counted on. Up to three words may name what the years
 * are of; the length is one metre named by "per", "a", "each" or "(for/in) every".
 */
const OF_RECORD_PER_METRE = new RegExp(String.raw`^${S}+of${S}+(?:[\p{L}'’-]+${S}+){1,3}(?:per|a|an|each|(?:for${S}+|in${S}+)?every)${S}+(?:metre|meter|m)(?![\p{L}])`, 'iu');

/** A span of time counted on each metre after its record's name is read as years per metre. */
function withRecordPerMetre(text: string, qs: Quantity[]): Quantity[] {
  return qs.map((q) => {
    if (q.dimension !== 'duration' || isVagueTime(q.text)) return q;
    const m = OF_RECORD_PER_METRE.exec(text.slice(q.end, q.end + 80));
    return m === null ? q : { ...q, dimension: 'duration-per-length', unit: 'yr/m', perMetreEnd: q.end + m[0].length } as Quantity;
  });
}

/** The quantities a gradient is read from: one metre named in words, years of a record per metre. */
const readLengths = (text: string, qs: Quantity[]): Quantity[] => {
  const read = withRecordPerMetre(text, qs);
  // "every metre" inside a gradient of years per metre is its unit, not a length of its own.
  const within = read.filter((q) => (q as Quantity & { perMetreEnd?: number }).perMetreEnd !== undefined);
  return withUnitMetres(text, read).filter((q) => !(q.value === 1 && q.dimension === 'length' && within.some((g) => q.start >= g.end && q.end <= ((g as Quantity & { perMetreEnd?: number }).perMetreEnd ?? 0))));
};

/** Every gradient a sentence states: "75 years per metre", or "one metre ... holds 750 years". */
function gradients(text: string, all: Quantity[]): Gradient[] {
  const qs = readLengths(text, all);
  const stated = qs.filter((q) => q.dimension === 'duration-per-length').map((q) => ({ perMetre: w(q), words: q.text, parts: [q] }));
  const units = qs.flatMap((q, i) => {
    const next = qs[i + 1];
    // "a metre of ice covers only a few decades": a vague time is no gradient to reckon with.
    if (q.dimension !== 'length' || q.value !== 1 || next === undefined || next.dimension !== 'duration' || isVagueTime(next.text)) return [];
    if (!HOLDS_GAP.test(text.slice(q.end, next.start))) return [];
    const per = w(next);
    // The unit length is a definition ("one metre"), exact; only the years carry the writer's precision.
    return [{ perMetre: { value: per.value / q.value, low: per.low / q.value, high: per.high / q.value }, words: `${next.text} in ${q.text}`, parts: [q, next] }];
  });
  return [...stated, ...units];
}

/**
 * The one length and the one duration of `qs`, or undefined. When `years` is the figure to check,
 * the length must come first ("the lowest 200 m hold 15,000 years"); as the inputs of a stated
 * gradient either order reads ("150,000 years in 200 m").
 */
function lengthAndYears(qs: Quantity[], lengthFirst: boolean): [Quantity, Quantity] | undefined {
  const length = only(qs.filter((q) => q.dimension === 'length'));
  const years = only(qs.filter((q) => q.dimension === 'duration'));
  return length === undefined || years === undefined || (lengthFirst && length.start > years.start) ? undefined : [length, years];
}

/** Every contradiction between a gradient and the years and metres beside it. */
export function perLength(text: string, parsed: Quantity[], last?: Previous, earlier: readonly Previous[] = []): PerLengthFinding[] {
  // A figure read as years per metre is flagged as the years it was written as.
  return gradientFindings(text, parsed, last, earlier).map((f) => ({ ...f, stated: parsed.find((q) => q.start === f.stated.start && q.end === f.stated.end) ?? f.stated }));
}

function gradientFindings(text: string, parsed: Quantity[], last?: Previous, earlier: readonly Previous[] = []): PerLengthFinding[] {
  const qs = readLengths(text, parsed);
  // The sentence before with figures, past one short line with none ("frostfern_amy - 4 Jun").
  const previous = earlier.length === 0 ? last : reachBack(earlier, 1).find((p) => p.quantities.length > 0);
  const found = only(gradients(text, qs));
  if (found !== undefined) {
    const [stated] = found.parts;
    if (found.parts.length === 1 && stated !== undefined) {
      // "200 m ... 150,000 years ..., or roughly 75 years per metre": the years over the metres before it.
      const pair = lengthAndYears(qs.filter((q) => q.end <= stated.start), false);
      const computed = pair === undefined ? undefined : divide(w(pair[1]), w(pair[0]));
      if (pair !== undefined && computed !== undefined) return [{ stated, computed, measures: `${pair[1].text} over ${pair[0].text}` }];
      // "The lowest 200 m hold 150,000 years. That works out to about 75 years per metre.": the
      // sentence before gives the years and the metres, when this one draws on it and has no figure of its own before.
      const back = previous === undefined || qs.some((q) => q.end <= stated.start) || !REFERS_BACK.test(text.slice(0, stated.start)) ? undefined : lengthAndYears(previous.quantities, false);
      const fromBefore = back === undefined ? undefined : divide(w(back[1]), w(back[0]));
      return back === undefined || fromBefore === undefined ? [] : [{ stated, computed: fromBefore, measures: `${back[1].text} over ${back[0].text} in the sentence before`, basis: "the paragraph's" }];
    }
    // "one metre holds 750 years, so 200 m hold 15,000 years": the metres times the gradient.
    const pair = lengthAndYears(qs.filter((q) => q.start >= (found.parts.at(-1)?.end ?? 0)), true);
    if (pair !== undefined) return [{ stated: pair[1], computed: times(w(pair[0]), found.perMetre), measures: `${pair[0].text} at ${found.words}` }];
    // "200 m hold 150,000 years, so one metre holds 750 years": the years over the metres before it.
    const [unit, years] = found.parts as [Quantity, Quantity];
    const earlier = lengthAndYears(qs.filter((q) => q.end <= unit.start), false);
    // "...; near the surface a metre holds only 10 years": another clause, or a metre with no word
    // that draws it from the figures before ("so", "therefore"), is another place in the ice.
    // "each" and "every" metre distribute over the length just named.
    // "The lowest 200 m hold 150,000 years. So one metre there is about 750 years.": the sentence
    // before gives the years and the metres when this one draws on it and has no figure before its metre.
    if (earlier === undefined) {
      const back = previous === undefined || qs.some((q) => q.end <= unit.start) || !DRAWS_ON.test(text.slice(0, unit.start)) ? undefined : lengthAndYears(previous.quantities, false);
      const perBack = back === undefined ? undefined : divide(w(back[1]), w(back[0]));
      return back === undefined || perBack === undefined ? [] : [{ stated: years, computed: times(perBack, { value: unit.value, low: unit.value, high: unit.value }), measures: `${back[1].text} over ${back[0].text} in the sentence before, for ${unit.text}`, basis: "the paragraph's" }];
    }
    const gap = earlier === undefined ? '' : text.slice(Math.max(earlier[0].end, earlier[1].end), unit.start);
    if (/;/u.test(gap) || (!/^(?:each|every)(?![\p{L}])/iu.test(unit.text) && !/^\d/u.test(unit.text) && !/^one(?![\p{L}])/iu.test(unit.text) && !DRAWS_ON.test(gap))) return [];
    const per = earlier === undefined ? undefined : divide(w(earlier[1]), w(earlier[0]));
    return per === undefined || earlier === undefined ? [] : [{ stated: years, computed: times(per, { value: unit.value, low: unit.value, high: unit.value }), measures: `${earlier[1].text} over ${earlier[0].text}, for ${unit.text}` }];
  }
  if (previous === undefined || gradients(text, qs).length > 0 || !DRAWS_ON.test(text)) return [];
  const before = only(gradients(previous.text, previous.quantities));
  const pair = lengthAndYears(qs, true);
  if (before === undefined || pair === undefined) return [];
  return [{ stated: pair[1], computed: times(w(pair[0]), before.perMetre), measures: `${pair[0].text} at ${before.words} in the sentence before`, basis: "the paragraph's" }];
}
