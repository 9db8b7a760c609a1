/**
 * The arithmetic rules as data: each derives values from the draft's own numbers and returns the
 * stated numbers they should equal. checkArithmetic runs every rule the same way. The inputs are
 * read as written, without their hedges (quantities/written-interval.ts): the writer did the sum
 * on the numbers they wrote. The stated result keeps its hedge.
 */
import { parseQuantities, writtenInterval as w } from '../quantities/index.js';
import type { Dimension, Quantity } from '../types.js';
import { changesAcross, type Previous } from './arithmetic-context.js';
import { divide, facing, invert, minus, percentChange, rangeSpan, size, type Derived } from './arithmetic-derive.js';
import { spanOfDates } from './arithmetic-spans.js';
import { durationsAcross, paceRatiosAcross, spansAcross } from './arithmetic-across.js';
import { writtenSums } from './arithmetic-equations.js';
import { writtenFormulas } from './arithmetic-formulas.js';
import { perLength } from './arithmetic-per-length.js';
import { changeShares } from './arithmetic-shares.js';
import { changesInParagraph, comparisonsInParagraph } from './arithmetic-paragraph.js';
import { amountsAtPace, changesFromLevels, paceRatiosInParagraph, paceRatiosInSentence, ratesInParagraph } from './arithmetic-solver.js';
import { readArithmetic } from './arithmetic-reader/relations.js';
import { seriesSpacings } from './arithmetic-counts.js';
import { periodAmounts } from './arithmetic-periods.js';
import { holdsPhrase, WORDS, wordsIn } from './arithmetic-reader/word-classes.js';
import { changesOver, comesToRate, comparesToNext, findPairs, fractionOf, isApposedChange, isConsequenceChange, isPaceRatio, isSpanOfChange, isSpanOfPair, isStatedChange, isStatedRatio, timesTheMeasure, type Pair } from './arithmetic-frames.js';

/** A stated quantity next to the value the draft's other numbers give it. */
export interface Finding {
  stated: Quantity;
  computed: Derived;
  /** What the computed value is, in words: "the change from 180 to 280 ppm". */
  measures: string;
  /** Whose numbers these are, when not the sentence's own alone: "the paragraph's". */
  basis?: string;
  /**
   * The yearly rate behind a pace told as an amount every interval ("one ppm every ten years"), in
   * its canonical rate unit: the correction states it beside the amount, as an editor restates a pace.
   */
  yearly?: { value: number; unit: string };
}

/** One arithmetic rule. */
export interface ArithmeticRule {
  id: string;
  summary: string;
  /**
   * `previous` is the sentence before in the same paragraph, read only by rules that span two;
   * `earlier` is every context sentence before, nearest first, read by rules that look further back.
   */
  derive: (text: string, qs: Quantity[], pairs: Pair[], previous?: Previous, earlier?: readonly Previous[]) => Finding[];
}

const DIFFERENCE: Partial<Record<Dimension, Dimension>> = {
  concentration: 'concentration', temperature: 'temperature-change', 'temperature-change': 'temperature-change',
  length: 'length', duration: 'duration', count: 'count', number: 'number',
};
const RATE_OF: Partial<Record<Dimension, Dimension>> = { 'concentration-rate': 'concentration', 'temperature-rate': 'temperature-change', 'length-rate': 'length' };
const RATIOED: Dimension[] = ['concentration', 'temperature-change', 'length', 'duration', 'count', 'concentration-rate', 'temperature-rate', 'length-rate'];

const ends = (qs: Quantity[], p: Pair): [Quantity, Quantity] => [qs[p.from] as Quantity, qs[p.to] as Quantity];
const only = <T>(xs: T[]): T | undefined => (xs.length === 1 ? xs[0] : undefined);
// "from 190 ppm up to 280 ppm" names its end "280 ppm", not "up to 280 ppm".
const words = (a: Quantity, b: Quantity): string => `from ${a.text} to ${b.text.replace(/^(?:up|down)[\s\u00A0]+to[\s\u00A0]+/iu, '')}`;
const others = (qs: Quantity[], p: Pair | undefined): Quantity[] => qs.filter((_, i) => p === undefined || (i !== p.from && i !== p.to));

function changes(text: string, qs: Quantity[], pairs: Pair[]): Finding[] {
  const found = [...pairChanges(text, qs, pairs), ...apposedChanges(text, qs, pairs), ...writtenSums(text, qs)];
  return [...found, ...notYet(found, writtenFormulas(text, qs))];
}

/** Dimensions whose two levels name a change between them, and the dimension of that change. */
const LEVELS: Partial<Record<Dimension, Dimension>> = { concentration: 'concentration', temperature: 'temperature-change', length: 'length' };

/** A word that draws what follows from the level before it: ", so", ", which means", ", thus". */
const DRAWN = /[,;:—–][\s\u00A0]*(?:and[\s\u00A0]+)?(?:so|thus|hence|which[\s\u00A0]+means|meaning)(?![\p{L}])/iu;

/**
 * "it sat near 180 ppm in the cold phases and near 280 ppm in the warm ones, a swing of some 140
 * ppm": exactly two levels of one dimension, no from-to pair, and a change in apposition right
 * after the second. The change is the size of their difference, whichever came first.
 */
function apposedChanges(text: string, qs: Quantity[], pairs: Pair[]): Finding[] {
  return Object.entries(LEVELS).flatMap(([level, changeDim]) => {
    if (pairs.some((p) => qs[p.from]?.dimension === level)) return [];
    // "..., which makes the increase 140 ppm": a change drawn from the value before it is no level.
    const levels = qs.filter((q, k) => q.dimension === level && !isStatedChange(text, q) && !(k > 0 && isConsequenceChange(text, qs[k - 1] as Quantity, q)));
    if (levels.length !== 2) return [];
    const [a, b] = levels as [Quantity, Quantity];
    // "... held 190 ppm, so the climb to 280 ppm added 130 ppm": a change drawn after both levels.
    const drawn = (q: Quantity): boolean => q.start > b.end && DRAWN.test(text.slice(a.end, b.start)) && isStatedChange(text, q) && !/[;.!?]/u.test(text.slice(a.end, q.start));
    const stated = only(qs.filter((q) => q.dimension === changeDim && q !== a && q !== b && (isApposedChange(text, b, q) || drawn(q))));
    if (stated === undefined || !(isStatedChange(text, stated) || isConsequenceChange(text, b, stated))) return [];
    return [{ stated, computed: facing(size(minus(w(b), w(a))), stated.value), measures: `the difference between ${a.text} and ${b.text}` }];
  });
}

/**
 * True when `q` can be set against the ends `a`, `b` of a pair of `dimension`: of the change's
 * dimension, or a bare number beside ends in a unit whose numbers are canonical as written ("from
 * 180 to 280 ppm, an increase of barely 50"), or the other way round ("a jump of 110 ppm, from 190
 * up to 280"): the writer left the unit off one side.
 */
function sameChangeUnit(q: Quantity, a: Quantity, b: Quantity): boolean {
  const asWritten = (x: Quantity): boolean => x.statedUnit !== '' && x.unit === x.statedUnit.replace(/^degC$/u, 'K');
  // A ratio or a percentage is a relative change, never the difference itself ("2,490 → 1,910, about a quarter less").
  if (q.dimension === 'ratio' || q.dimension === 'percent') return false;
  if (a.dimension === 'number' && b.dimension === 'number') return q.dimension !== 'number' && q.dimension !== 'age' && q.dimension !== 'duration' && asWritten(q);
  return q.dimension === DIFFERENCE[a.dimension] || (q.dimension === 'number' && a.dimension !== 'age' && a.dimension !== 'duration' && asWritten(b));
}

function pairChanges(text: string, qs: Quantity[], pairs: Pair[]): Finding[] {
  return pairs.flatMap((p) => {
    const [a, b] = ends(qs, p);
    // "from 190 to 280 ppm, with the sharpest jump of 40 ppm": a part of the change is no restatement of it.
    const part = (q: Quantity): boolean => q.start > b.end && holdsPhrase(wordsIn(text, b.end, q.start), WORDS.part);
    const stated = only(others(qs, p).filter((q) => sameChangeUnit(q, a, b) && isStatedChange(text, q) && !part(q)));
    if (stated === undefined) return [];
    return [{ stated, computed: facing(minus(w(b), w(a)), stated.value), measures: `the change ${words(a, b)}` }];
  });
}

function durations(text: string, qs: Quantity[], pairs: Pair[]): Finding[] {
  const spans = spanOfDates(qs, pairs);
  if (spans.length === 0) return changeBetweenDates(text, qs, pairs);
  return spans.flatMap(({ span, after, measures }) => {
    const stated = only(qs.filter((q) => q.dimension === 'duration' && isSpanOfPair(text, q, after)));
    return stated === undefined ? [] : [{ stated, computed: span, measures }];
  });
}

/**
 * The time between the only two dates of a sentence that pairs none: "about 190 ppm 21,000 years
 * ago and about 265 ppm 11,000 years ago". Each date must be one date, not a range.
 */
function twoDates(qs: Quantity[]): { span: Derived; measures: string } | undefined {
  const dates = qs.filter((q) => q.dimension === 'age');
  if (dates.length !== 2 || dates.some((q) => rangeSpan(q) !== undefined)) return undefined;
  const [a, b] = dates as [Quantity, Quantity];
  return { span: size(minus(w(a), w(b))), measures: `the time from ${a.text} to ${b.text}` };
}

/**
 * "At 21,000 years ago it was 190 ppm and by 11,000 years ago 265 ppm, so it climbed 75 ppm in
 * about 4,000 years": the time a stated change took, after it, set against its two dates.
 */
function changeBetweenDates(text: string, qs: Quantity[], pairs: Pair[]): Finding[] {
  const between = twoDates(qs);
  if (between === undefined) return [];
  const dates = qs.filter((q) => q.dimension === 'age');
  const levelPaired = pairs.some((p) => qs[p.from]?.dimension !== 'age');
  const change = only(qs.filter((q) => Object.values(RATE_OF).includes(q.dimension) && isStatedChange(text, q)));
  const changed = change !== undefined && dates.every((d) => d.end <= change.start);
  if (!changed && !levelPaired) return [];
  const stated = only(qs.filter((q) => q.dimension === 'duration' && isSpanOfChange(text, q) && (change === undefined || q.start > change.end) && dates.every((d) => d.end <= q.start)));
  return stated === undefined ? [] : [{ stated, computed: between.span, measures: between.measures }];
}

/** The change of `changeDim` a sentence states and the time it took, as the rate rules read them. */
function changeAndSpan(text: string, qs: Quantity[], pairs: Pair[], changeDim: Dimension, except: readonly Quantity[] = []): { change: Derived; duration: Derived } | undefined {
  const paired = new Set(pairs.flatMap((p) => [qs[p.from], qs[p.to]]));
  const over = (q: Quantity): boolean => !paired.has(q) && qs.some((d) => changesOver(text, q, d));
  const rate = qs.find((q) => RATE_OF[q.dimension] === changeDim);
  const explicit = only(qs.filter((q) => !except.includes(q) && q.dimension === changeDim && (isStatedChange(text, q) || (rate !== undefined && comesToRate(text, q, rate)) || over(q))));
  // "~190 → 280 ppm": a pair whose unit is written at its end only takes the end's dimension.
  const pairDim = (p: Pair): Dimension => (qs[p.from]?.dimension === 'number' ? qs[p.to]?.dimension : qs[p.from]?.dimension) ?? 'number';
  const pair = only(pairs.filter((p) => DIFFERENCE[pairDim(p)] === changeDim));
  const pairEnds = pair === undefined ? undefined : ends(qs, pair);
  const change = explicit !== undefined ? w(explicit) : pairEnds === undefined ? undefined : minus(w(pairEnds[1]), w(pairEnds[0]));
  const spanOfChange = only(qs.filter((q) => !except.includes(q) && q.dimension === 'duration' && isSpanOfChange(text, q)));
  const duration = spanOfChange !== undefined ? w(spanOfChange) : (only(spanOfDates(qs, pairs))?.span ?? twoDates(qs)?.span);
  return change === undefined || duration === undefined ? undefined : { change, duration };
}

/**
 * True when a rate is the other side of a comparison with a rate of its kind before it ("= 0.012
 * ppm/yr (vs ~2.4 ppm/yr in the 2010s)", "against 2.4 ppm a year today"): another time's pace,
 * not the sentence's change divided by its time.
 */
function isComparedRate(text: string, qs: Quantity[], rate: Quantity): boolean {
  const earlier = qs.filter((q) => q.dimension === rate.dimension && q.end <= rate.start).at(-1);
  if (earlier === undefined) return false;
  const words = wordsIn(text, earlier.end, rate.start);
  // "..., while today it climbs 2.4 ppm a year": a clause turned to another time sets its rate against the one before.
  return holdsPhrase(words, [...WORDS.setAgainst, 'than', 'while', 'whereas']);
}

function rates(text: string, qs: Quantity[], pairs: Pair[]): Finding[] {
  return qs.flatMap((rate) => {
    const changeDim = RATE_OF[rate.dimension];
    if (changeDim === undefined || isComparedRate(text, qs, rate)) return [];
    const found = changeAndSpan(text, qs, pairs, changeDim);
    const computed = found === undefined ? undefined : divide(size(found.change), found.duration);
    return computed === undefined ? [] : [{ stated: rate, computed: facing(computed, rate.value), measures: 'the change divided by the time it took' }];
  });
}

const S = String.raw`[\s\u00A0]`;
const RATE_CHANGES: Dimension[] = ['concentration', 'temperature-change', 'length'];
/** "every", "each", "in every": the word between an amount and the interval it comes in. */
const EVERY = new RegExp(String.raw`^${S}+(?:(?:in|for)${S}+)?(?:every|each)${S}+$`, 'iu');
/** "a metre every", "one ppm every": an amount of one unit, in words, before "every". */
const ONE_UNIT_EVERY = new RegExp(String.raw`(?:^|[^\p{L}])(?:a|an|one)${S}+([\p{L}]+)${S}+(?:(?:in|for)${S}+)?(?:every|each)${S}+$`, 'iu');

/**
 * A pace written as an amount per interval: "an average of about 1 ppm every ten years", "a metre
 * every 25 years". It is set against the sentence's change and the time it took: the amount
 * against change ÷ time × interval, or, when the amount is one unit in words, the interval against
 * time ÷ change × unit.
 */
function paces(text: string, qs: Quantity[], pairs: Pair[]): Finding[] {
  return qs.flatMap((interval, k) => {
    if (interval.dimension !== 'duration') return [];
    const amount = k > 0 ? (qs[k - 1] as Quantity) : undefined;
    if (amount !== undefined && RATE_CHANGES.includes(amount.dimension) && EVERY.test(text.slice(amount.end, interval.start)) && !isStatedChange(text, amount)) {
      const found = changeAndSpan(text, qs, pairs, amount.dimension, [amount, interval]);
      const per = found === undefined ? undefined : divide(size(found.change), found.duration);
      if (per === undefined) return [];
      const n = w(interval).value;
      const rate = RATE_FOR[amount.dimension];
      return [{ stated: amount, computed: facing({ value: per.value * n, low: per.low * n, high: per.high * n }, amount.value), measures: `the change divided by the time it took, for each ${interval.text}`, ...(rate === undefined ? {} : { yearly: { value: per.value, unit: rate.unit } }) }];
    }
    const unitWord = ONE_UNIT_EVERY.exec(text.slice(Math.max(0, interval.start - 40), interval.start))?.[1];
    if (unitWord === undefined) return [];
    const unit = oneUnit(unitWord);
    if (unit === undefined || qs.some((q) => q.end > interval.start - unitWord.length - 8 && q.end <= interval.start)) return [];
    const found = changeAndSpan(text, qs, pairs, unit.dimension, [interval]);
    const years = found === undefined ? undefined : divide(found.duration, size(found.change));
    if (years === undefined) return [];
    const u = unit.value;
    return [{ stated: interval, computed: { value: years.value * u, low: years.low * u, high: years.high * u }, measures: `the time it took divided by the change, for each ${unitWord}` }];
  });
}

/**
 * One unit named in words before "every", as an amount of change: "a metre", "one ppm", and "a
 * degree", which in a pace is a degree of warming or cooling (a change of 1 °C, common practice).
 */
function oneUnit(unitWord: string): { dimension: Dimension; value: number } | undefined {
  const lower = unitWord.toLowerCase();
  if (lower === 'degree' || lower === 'degrees') return { dimension: 'temperature-change', value: 1 };
  const unit = parseQuantities(`1 ${unitWord}`)[0];
  return unit === undefined || !RATE_CHANGES.includes(unit.dimension) ? undefined : { dimension: unit.dimension, value: unit.value };
}

const RATE_FOR: Partial<Record<Dimension, { dimension: Dimension; unit: string }>> = {
  concentration: { dimension: 'concentration-rate', unit: 'ppm/yr' }, 'temperature-change': { dimension: 'temperature-rate', unit: 'K/yr' }, length: { dimension: 'length-rate', unit: 'm/yr' },
};

/**
 * A pace written as an amount per interval in a sentence drawn from the change and time of the
 * sentences before ("Across the thaw CO2 rose 80 ppm over 7,000 years. That's about one ppm every
 * ten years."): the amount over the interval is read as a rate, set against the paragraph's
 * changes and times as any drawn rate is (ratesInParagraph), and the finding is given back as the
 * amount for one interval.
 */
function pacesInParagraph(text: string, qs: Quantity[], pairs: Pair[], earlier: readonly Previous[]): Finding[] {
  return qs.flatMap((interval, k) => {
    const amount = k > 0 ? (qs[k - 1] as Quantity) : undefined;
    const rate = amount === undefined ? undefined : RATE_FOR[amount.dimension];
    if (amount === undefined || rate === undefined || interval.dimension !== 'duration' || !EVERY.test(text.slice(amount.end, interval.start)) || isStatedChange(text, amount)) return [];
    const n = w(interval).value;
    if (!(n > 0)) return [];
    const paced: Quantity = { ...amount, dimension: rate.dimension, unit: rate.unit, value: amount.value / n, low: amount.low / n, high: amount.high / n, end: interval.end };
    const rest = qs.filter((q) => q !== amount && q !== interval);
    return ratesInParagraph(text, [...rest, paced], pairs, earlier).map((f) => ({
      ...f,
      stated: amount,
      computed: facing({ value: f.computed.value * n, low: f.computed.low * n, high: f.computed.high * n }, amount.value),
      measures: `${f.measures}, for each ${interval.text}`,
      yearly: { value: f.computed.value, unit: rate.unit },
    }));
  });
}

function ratios(text: string, qs: Quantity[], pairs: Pair[]): Finding[] {
  // "280 → 420 ppm": a pair whose unit is written at its end only takes the end's dimension.
  const pairDim = (p: Pair): Dimension => (qs[p.from]?.dimension === 'number' ? qs[p.to]?.dimension : qs[p.from]?.dimension) ?? 'number';
  const pair = only(pairs.filter((p) => RATIOED.includes(pairDim(p))));
  return qs.flatMap((stated, i) => {
    const after = qs.slice(i + 1).find((q) => RATIOED.includes(q.dimension));
    const fraction = after !== undefined && fractionOf(text, stated, after);
    // "an increase of 140 ppm, roughly 33 per cent": a percentage set right after a stated change restates it.
    const restated = qs.some((c) => c.end <= stated.start && c.dimension !== 'percent' && isStatedChange(text, c) && /^[\s\u00A0]*[,(—–][\s\u00A0]*(?:or[\s\u00A0]+)?$/u.test(text.slice(c.end, stated.start)));
    const isPercent = stated.dimension === 'percent' && (isStatedChange(text, stated) || comparesToNext(text, stated) || (restated && pair !== undefined));
    const multiple = timesTheMeasure(text, stated);
    // "more than half of a doubling": a ratio named as the yardstick of a fraction is no claim.
    const yardstick = /(?:^|[^\p{L}])of[\s\u00A0]+(?:a|an|the|one)[\s\u00A0]*$/iu.test(text.slice(Math.max(0, stated.start - 12), stated.start));
    const isRatio = stated.dimension === 'ratio' && !yardstick && (isStatedRatio(text, stated) || comparesToNext(text, stated) || fraction || multiple);
    if (!isPercent && !isRatio) return [];
    let pairRatio: Derived | undefined;
    let measures: string;
    if (pair !== undefined) {
      const [a, b] = ends(qs, pair);
      pairRatio = divide(w(b), w(a));
      measures = `${isPercent ? 'the percentage change' : 'the ratio'} ${words(a, b)}`;
    } else if (after === undefined) {
      return isPercent ? percentOfBase(text, qs, stated) : paceOfTwo(text, qs, stated);
    } else {
      const x = only(qs.filter((q) => q !== after && q !== stated && q.dimension === after.dimension));
      if (x === undefined || !(comparesToNext(text, stated) || fraction || multiple)) return [];
      pairRatio = divide(w(x), w(after));
      measures = `${isPercent ? 'the percentage difference' : 'the ratio'} of ${x.text} to ${after.text}`;
    }
    if (pairRatio === undefined) return [];
    if (isPercent) return [{ stated, computed: percentChange(pairRatio, stated.value), measures }];
    const r = (stated.value < 1) === (pairRatio.value < 1) ? pairRatio : invert(pairRatio);
    return [{ stated, computed: r, measures }];
  });
}

const PACES: Dimension[] = ['concentration-rate', 'temperature-rate', 'length-rate'];

/**
 * "~2.4 ppm/yr now vs ~0.012 ppm/yr in the deglaciation, so we're going about 20x faster": a pace
 * ratio after exactly two rates of one dimension is the faster over the slower; a ratio verb
 * ("doubles", "triples") after exactly two figures of one unit is their ratio.
 */
function paceOfTwo(text: string, qs: Quantity[], stated: Quantity): Finding[] {
  // "about 1,200 years in the Holocene and about 2,400 years at the glacial maximum, so the offset
  // roughly triples": a ratio verb after exactly two figures of one dimension and unit is their ratio.
  const verb = isStatedRatio(text, stated) && !isPaceRatio(text, stated);
  const kinds = verb ? RATIOED : PACES;
  if (!verb && !isPaceRatio(text, stated)) return [];
  const before = qs.filter((q) => q.end <= stated.start && kinds.includes(q.dimension));
  if (before.length !== 2 || qs.some((q) => q.start > stated.end && kinds.includes(q.dimension))) return [];
  const [a, b] = before as [Quantity, Quantity];
  if (a.dimension !== b.dimension || (verb && a.statedUnit !== b.statedUnit)) return [];
  const r = divide(w(a), w(b));
  if (r === undefined) return [];
  return [{ stated, computed: (stated.value < 1) === (r.value < 1) ? r : invert(r), measures: `the ratio of ${a.text} to ${b.text}` }];
}

/**
 * "Measured against the 280 ppm of 1750, that is about 140 ppm added, a jump of 50 percent": a
 * percentage change after one stated change and one level of its dimension is the change as a
 * share of the level. Both must come before the percentage, and be the only ones of their kind.
 */
function percentOfBase(text: string, qs: Quantity[], stated: Quantity): Finding[] {
  const before = qs.filter((q) => q.end <= stated.start && RATIOED.includes(q.dimension));
  const change = only(before.filter((q) => isStatedChange(text, q)));
  if (change === undefined) return [];
  const base = only(before.filter((q) => q !== change && q.dimension === change.dimension));
  if (base === undefined || isStatedChange(text, base) || qs.some((q) => q !== base && q !== change && q.dimension === change.dimension)) return [];
  const share = divide(size(w(change)), w(base));
  if (share === undefined) return [];
  const computed = facing({ value: share.value * 100, low: share.low * 100, high: share.high * 100 }, stated.value);
  return [{ stated, computed, measures: `${change.text} as a percentage of ${base.text}` }];
}

/** The findings of `more` on numbers no finding of `found` has judged already. */
const notYet = (found: Finding[], more: Finding[]): Finding[] => more.filter((f) => !found.some((g) => g.stated === f.stated));

/** The broad reader's findings under one rule id (arithmetic-reader/): results read from every figure's role. */
const read = (id: string, t: string, qs: Quantity[], earlier: readonly Previous[] = []): Finding[] => readArithmetic(t, qs, earlier).filter((f) => f.ruleId === id);

/** The arithmetic rule table. */
export const ARITHMETIC_RULES: readonly ArithmeticRule[] = [
  { id: 'arith.change', summary: 'A stated change equals the difference between the stated start and end values.', derive: (t, qs, p, prev, earlier = []) => {
    const found = [...changes(t, qs, p), ...changesAcross(t, qs, p, prev)];
    const paragraph = [...found, ...notYet(found, changesInParagraph(t, qs, p, earlier).filter((f) => f.stated.dimension !== 'percent'))];
    const levels = [...paragraph, ...notYet(paragraph, changesFromLevels(t, qs, p, earlier).filter((f) => f.stated.dimension !== 'percent'))];
    const read_ = [...levels, ...notYet(levels, read('arith.change', t, qs, earlier))];
    const paced = [...read_, ...notYet(read_, amountsAtPace(t, qs, earlier).filter((f) => f.stated.dimension !== 'duration'))];
    return [...paced, ...notYet(paced, periodAmounts(t, qs, earlier).filter((f) => !RATE_OF[f.stated.dimension]))];
  } },
  { id: 'arith.duration', summary: 'A stated duration equals the time between the stated start and end dates.', derive: (t, qs, p, prev, earlier = []) => {
    const found = [...durations(t, qs, p), ...durationsAcross(t, qs, prev)];
    const across = [...found, ...notYet(found, spansAcross(t, qs, prev))];
    const read_ = [...across, ...notYet(across, read('arith.duration', t, qs, earlier))];
    const paced = [...read_, ...notYet(read_, amountsAtPace(t, qs, earlier).filter((f) => f.stated.dimension === 'duration'))];
    return [...paced, ...notYet(paced, seriesSpacings(t, qs, p).filter((f) => f.stated.dimension === 'duration'))].filter((f) => !isBoundOrVague(t, f.stated));
  } },
  { id: 'arith.rate', summary: 'A stated rate equals the stated change divided by the time it took; the years a length of ice holds equal its metres times the years per metre.', derive: (t, qs, p, prev, earlier = []) => {
    const found = [...rates(t, qs, p), ...paces(t, qs, p), ...perLength(t, qs, prev, earlier)];
    const drawn = [...found, ...notYet(found, ratesInParagraph(t, qs, p, earlier))];
    const all = [...drawn, ...notYet(drawn, pacesInParagraph(t, qs, p, earlier))];
    // "At 2.4 ppm a year, adding 100 ppm takes about 4 years": a time worked from the pace makes the
    // pace its premise, not a result of the amount and the time.
    const premise = amountsAtPace(t, qs, earlier).some((f) => f.stated.dimension === 'duration');
    const kept = premise ? all.filter((f) => !RATE_OF[f.stated.dimension]) : all;
    // "at 3 ppb per yr, that's about 40 ppb a decade": a pace told again per a longer period.
    return [...kept, ...notYet(kept, periodAmounts(t, qs, earlier).filter((f) => RATE_OF[f.stated.dimension] !== undefined))];
  } },
  { id: 'arith.ratio', summary: 'A stated ratio or percentage change agrees with the two values it compares.', derive: (t, qs, p, prev, earlier = []) => {
    const found = [...ratios(t, qs, p), ...paceRatiosAcross(t, qs, prev)];
    const shares = [...found, ...notYet(found, changeShares(t, qs, p))];
    const paragraph = [...shares, ...notYet(shares, changesInParagraph(t, qs, p, earlier).filter((f) => f.stated.dimension === 'percent'))];
    const compared = [...paragraph, ...notYet(paragraph, comparisonsInParagraph(t, qs, earlier))];
    const paces = [...compared, ...notYet(compared, paceRatiosInParagraph(t, qs, earlier))];
    const levels = [...paces, ...notYet(paces, changesFromLevels(t, qs, p, earlier).filter((f) => f.stated.dimension === 'percent'))];
    const reader = [...levels, ...notYet(levels, read('arith.ratio', t, qs, earlier))];
    const paced = [...reader, ...notYet(reader, paceRatiosInSentence(t, qs))];
    return [...paced, ...notYet(paced, seriesSpacings(t, qs, p).filter((f) => f.stated.dimension !== 'duration'))];
  } },
];

export { findPairs };

/**
 * "jumps of 10 to 15 ppm within a couple of centuries": a time after "within", or told in vague
 * words ("a few", "a couple of", "several"), bounds how long something took; it is never the span
 * between two stated dates (common practice of English).
 */
function isBoundOrVague(text: string, q: Pick<Quantity, 'start' | 'text'>): boolean {
  return /(?:^|[^\p{L}])within[\s\u00A0]+$/iu.test(text.slice(Math.max(0, q.start - 12), q.start)) || /^(?:a[\s\u00A0]+(?:few|couple)|several)(?![\p{L}])/iu.test(q.text);
}
