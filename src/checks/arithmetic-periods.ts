/**
 * A pace told again over a longer stretch of time: the amount one period of a decade, a century or
 * a millennium gathers at a yearly pace, as a worked sum states it.
 *  - "at 3 ppb per yr, that's about 40 ppb a decade" (30 ppb a decade): a pace restated per another
 *    period, drawn from the first by a link word;
 *  - "methane climbed about 3 ppb a year, which over the decade comes to roughly 40 ppb" (30 ppb),
 *    "rising 3 ppb per year, adding some 15 ppb over the decade" (30 ppb): an amount gathered over
 *    one period named by a noun with no figure ("the decade", "a century", "that decade");
 *  - "methane going up 3 a year for ten years, that's 300 ppb in a decade" (30 ppb): a bare figure
 *    that recurs every year is a pace in the unit of the amount drawn from it.
 * The pace is the one pace of this sentence, before the result, or of the sentence before (a
 * table's row under the row giving the pace). A result drawn from it stands after a link word
 * ("that's", "which comes to", "so") or a word of change ("adding", "gained"). Two paces told in
 * the same period make no such pair (they compare two times), nor does a result with a time of its
 * own between ("in the last decade"). Words are data: the units of time are those
 * arithmetic-solver.ts counts an amount every interval in (YEARS_IN), the link words WORDS.links.
 */
import { toCanonical, writtenInterval as w } from '../quantities/index.js';
import type { Dimension, Quantity } from '../types.js';
import type { Previous } from './arithmetic-context.js';
import type { Derived } from './arithmetic-derive.js';
import { holdsPhrase, WORDS, wordsIn } from './arithmetic-reader/word-classes.js';

/** A result worked from a pace over one period. */
export interface PeriodFinding {
  stated: Quantity;
  computed: Derived;
  measures: string;
  basis?: string;
}

/** The amount dimension of each pace dimension. */
const AMOUNT_OF: Partial<Record<Dimension, Dimension>> = { 'concentration-rate': 'concentration', 'temperature-rate': 'temperature-change', 'length-rate': 'length' };

/** Years in a unit of time a pace may be told over. */
const YEARS_IN: Record<string, number> = { year: 1, years: 1, yr: 1, yrs: 1, annum: 1, decade: 10, decades: 10, century: 100, centuries: 100, millennium: 1000, millennia: 1000 };

/** The period of a stated rate unit ("ppb/decade" is a decade), in years; undefined for no period. */
function periodOf(q: Quantity): number | undefined {
  const at = q.statedUnit.lastIndexOf('/');
  return at < 0 ? undefined : YEARS_IN[q.statedUnit.slice(at + 1).toLowerCase()];
}

/** Prepositions that make a period noun after them the stretch an amount gathers over. */
const OVER = new Set(['in', 'over', 'across', 'through', 'during', 'for', 'per', 'a', 'an', 'each', 'every']);
/** Words that make the period noun after them one period: "the decade", "a century", "that decade". */
const ONE = new Set(['a', 'an', 'the', 'one', 'that', 'this', 'each', 'every', 'per']);

/**
 * The years of one period named with no figure right after `from` or right before `to` ("over the
 * decade as a whole", "in a decade", "which over that decade comes to"): a preposition, a word of
 * one, then a unit of time longer than a year. Undefined when none stands there.
 */
function namedPeriod(text: string, from: number, to: number): { years: number; definite: boolean } | undefined {
  const words = wordsIn(text, from, to).map((x) => x.text);
  for (let i = 0; i + 1 < words.length; i++) {
    const years = YEARS_IN[words[i + 1] ?? ''];
    if (years === undefined || years === 1 || !ONE.has(words[i] ?? '')) continue;
    // "a century or two", "a decade or so": a stretch told vaguely is no one period.
    if (words[i + 2] === 'or') return undefined;
    // "over the decade", "in a decade", "a decade": the word before "the"/"a" is a preposition, or the
    // article itself is the preposition ("40 ppb a decade").
    if (OVER.has(words[i - 1] ?? '') || words[i] === 'a' || words[i] === 'per') return { years, definite: DEFINITE.has(words[i] ?? '') };
  }
  return undefined;
}

/** Words that make a period one named before: "the decade", "that decade". */
const DEFINITE = new Set(['the', 'that', 'this']);

/** A bare figure that recurs every year ("going up 2.4 a year"): its value per year, else undefined. */
function barePace(text: string, q: Quantity): number | undefined {
  if (q.dimension !== 'number') return undefined;
  const next = wordsIn(text, q.end, Math.min(text.length, q.end + 14)).slice(0, 2).map((x) => x.text);
  return (next[0] === 'a' || next[0] === 'per' || next[0] === 'each' || next[0] === 'every') && YEARS_IN[next[1] ?? ''] === 1 ? q.value : undefined;
}

/** True when a word between presents the result as drawn from the pace or gathered by it. */
const drawnBetween = (text: string, from: number, to: number): boolean => {
  const words = wordsIn(text, from, to);
  return /[=≈]/u.test(text.slice(from, to)) || holdsPhrase(words, WORDS.links) || words.some((x) => WORDS.changeVerbs.has(x.text));
};

/** A time of the result's own between the pace and it ("in the last decade", "since 2015"): another stretch. */
const ownTime = (text: string, from: number, to: number): boolean => /\d/u.test(text.slice(from, to)) || wordsIn(text, from, to).some((x) => ['last', 'past', 'next', 'previous', 'since', 'first'].includes(x.text));

const scaled = (d: Derived, k: number): Derived => ({ value: d.value * k, low: d.low * k, high: d.high * k });

export function periodAmounts(text: string, qs: Quantity[], earlier: readonly Previous[]): PeriodFinding[] {
  const paces = qs.filter((q) => AMOUNT_OF[q.dimension] !== undefined && periodOf(q) === 1);
  const out: PeriodFinding[] = [];
  // A pace restated per a longer period, after a link: "at 3 ppb per yr that's about 40 ppb a decade".
  const longer = qs.filter((q) => AMOUNT_OF[q.dimension] !== undefined && (periodOf(q) ?? 1) > 1);
  if (paces.length === 1 && longer.length === 1) {
    const [pace, told] = [paces[0] as Quantity, longer[0] as Quantity];
    const between = qs.filter((q) => q.start >= pace.end && q.end <= told.start);
    if (pace.dimension === told.dimension && pace.end <= told.start && between.length === 0 && drawnBetween(text, pace.end, told.start) && !ownTime(text, pace.end, told.start)) {
      out.push({ stated: told, computed: w(pace), measures: `${pace.text} told per ${told.statedUnit.slice(told.statedUnit.lastIndexOf('/') + 1)}` });
    }
    return out;
  }
  if (paces.length > 1 || longer.length > 0) return out;
  // An amount gathered over one named period, after a pace of this sentence or of the one before.
  const here = paces[0];
  const bare = here === undefined ? only(qs.filter((q) => barePace(text, q) !== undefined)) : undefined;
  const before = here === undefined && bare === undefined ? only((earlier[0]?.quantities ?? []).filter((q) => AMOUNT_OF[q.dimension] !== undefined && periodOf(q) === 1)) : undefined;
  const pace = here ?? bare ?? before;
  if (pace === undefined) return out;
  const from = pace === before ? 0 : pace.end;
  const after = qs.filter((q) => q.start >= from && q !== pace);
  const amountDim = pace === bare ? undefined : AMOUNT_OF[pace.dimension];
  const amounts = after.filter((q) => (amountDim === undefined ? AMOUNT_OF[q.dimension] === undefined && q.dimension !== 'number' && q.dimension !== 'duration' && q.dimension !== 'age' : q.dimension === amountDim));
  const amount = only(amounts);
  if (amount === undefined) return out;
  // "for ten years, that's 300 ppb in a decade": a span of time with a figure is amountsAtPace's.
  if (after.some((q) => q !== amount && q.dimension !== 'duration')) return out;
  const period = namedPeriod(text, from, amount.start) ?? namedPeriod(text, amount.end, Math.min(text.length, amount.end + 30));
  if (period === undefined || !drawnBetween(text, from, amount.start) || ownTime(text, from, amount.start)) return out;
  // A pace of the sentence before is drawn on only by a link word or a period named as that pace's
  // ("over that decade"): a word of change alone ("sudden jumps of 10 ppm in a century") tells of another stretch.
  if (pace === before && !period.definite && !holdsPhrase(wordsIn(text, 0, amount.start), WORDS.links)) return out;
  const years = period.years;
  // A bare pace is in the unit of the amount drawn from it.
  const inAmountUnit = (x: number): number => toCanonical(x, amount.statedUnit === '' ? amount.unit : amount.statedUnit, amount.dimension);
  const perYear: Derived = pace === bare ? { value: inAmountUnit(pace.value), low: inAmountUnit(pace.low), high: inAmountUnit(pace.high) } : w(pace);
  const basis = pace === before ? { basis: "the paragraph's" } : {};
  out.push({ stated: amount, computed: scaled(perYear, years), measures: `${pace.text} over ${years === 10 ? 'a decade' : years === 100 ? 'a century' : 'a millennium'}`, ...basis });
  return out;
}

const only = <T>(xs: T[]): T | undefined => (xs.length === 1 ? xs[0] : undefined);
