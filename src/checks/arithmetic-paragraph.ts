/**
 * A change, or a change as a percentage, whose levels stand earlier in the paragraph: the worked
 * answer below its question, the "so" sentence after the figures.
 *  - no level here: "CO2 went from 185 to 275 ppm over the thaw. [A question.] It rose by 90 ppm,
 *    an increase of some 30 percent." The levels are the one from-to pair of the nearest earlier
 *    sentence that states a level of that dimension (up to the paragraph's context), and 30
 *    percent is set against 275 ÷ 185 − 1 = 49 percent;
 *  - one level here and one before: "The 2023 mean was 419 ppm. Before industry the air held
 *    about 280 ppm, so today's value is some 100 ppm higher." (139 ppm).
 * Precision first: this sentence must refer back (an opening such as "That", "So", "It", or a
 * pronoun before the change), the earlier levels must be the only ones of the nearest sentence
 * holding that dimension, in the same unit as written, and the change must be the only stated
 * change of its dimension here. A change held up against something named after it ("100 ppm
 * higher than in 1900") is someone else's comparison and is left alone.
 */
import { writtenInterval as w } from '../quantities/index.js';
import type { Dimension, Quantity } from '../types.js';
import { divide, facing, invert, minus, percentChange, size, type Derived } from './arithmetic-derive.js';
import type { Previous } from './arithmetic-context.js';
import { comparesToNext, findPairs, isStatedChange, type Pair } from './arithmetic-frames.js';

/** A finding from the paragraph, with the basis named. */
export interface ParagraphFinding {
  stated: Quantity;
  computed: Derived;
  measures: string;
  basis: string;
}

const S = String.raw`[\s\u00A0]`;
/** Levels and the dimension of a change between two of them. */
const CHANGE_OF: Partial<Record<Dimension, Dimension>> = { concentration: 'concentration', temperature: 'temperature-change', length: 'length' };
/** An opening that carries the reader on, perhaps after a label ("Model answer:"): "It", "That", "So". */
const OPENS_BY_REFERRING = new RegExp(
  String.raw`^[^\p{L}\p{N}]*(?:\d{1,3}(?:${S}*\/${S}*\d{1,3})?[/.)][^\p{L}\p{N}]*)?(?:\p{L}+(?:${S}+\p{L}+){0,2}${S}*:[^\p{L}\p{N}]*)?(?:that|this|so|thus|hence|therefore|it|which|in${S}+all|overall)(?![\p{L}])`,
  'iu',
);
/** A pronoun or a word of consequence before the change: the sentence speaks of what came before. */
const REFERS_BACK = new RegExp(String.raw`(?:^|[^\p{L}])(?:it|so|thus|hence|therefore|which|that)(?![\p{L}])`, 'iu');
/** Between this sentence's level and the change drawn from it: a word of consequence. */
const CONSEQUENCE = new RegExp(String.raw`(?:^|[^\p{L}])(?:so|thus|hence|therefore|which|making|giving|meaning)(?![\p{L}])`, 'iu');
/** "... higher than", "... above the", "... compared with": the change is held against something named after it. */
const HELD_AGAINST = new RegExp(String.raw`^[^.;:!?]{0,30}?(?:^|[^\p{L}])(?:than|above|below|over|compared|relative|against|since|from)(?![\p{L}])`, 'iu');
/** How far back a level may stand: the sentences of the paragraph the engine passes as context. */
const LOOK_BACK = 3;
const only = <T>(xs: T[]): T | undefined => (xs.length === 1 ? xs[0] : undefined);

/** The levels of `dimension` in a sentence: its quantities of that dimension that are not stated changes. */
const levelsIn = (text: string, qs: Quantity[], dimension: Dimension): Quantity[] => qs.filter((q) => q.dimension === dimension && !isStatedChange(text, q));

/** The nearest earlier sentence (within LOOK_BACK) that states a level of `dimension`, with its pairs. */
function nearestWithLevel(earlier: readonly Previous[], dimension: Dimension): { sentence: Previous; levels: Quantity[]; pairs: Pair[] } | undefined {
  for (const sentence of earlier.slice(0, LOOK_BACK)) {
    const levels = levelsIn(sentence.text, sentence.quantities, dimension);
    if (levels.length > 0) return { sentence, levels, pairs: findPairs(sentence.text, sentence.quantities).filter((p) => sentence.quantities[p.from]?.dimension === dimension) };
  }
  return undefined;
}

const basis = "the paragraph's";

/**
 * Every stated change (or percentage change) in `text` set against levels earlier in the paragraph.
 * `earlier` is the sentences before, nearest first. Only this sentence's quantities are `stated`.
 */
export function changesInParagraph(text: string, qs: Quantity[], pairs: Pair[], earlier: readonly Previous[]): ParagraphFinding[] {
  if (earlier.length === 0 || pairs.length > 0) return [];
  return Object.entries(CHANGE_OF).flatMap(([level, changeDim]) => {
    const dimension = level as Dimension;
    const own = levelsIn(text, qs, dimension);
    const before = nearestWithLevel(earlier, dimension);
    if (before === undefined || own.length > 1) return [];
    const changes = qs.filter((q) => q.dimension === changeDim && isStatedChange(text, q) && !own.includes(q));
    if (own.length === 0) return noLevelHere(text, qs, changes, before);
    const [here] = own as [Quantity];
    const stated = only(changes);
    const start = only(before.levels);
    if (stated === undefined || start === undefined || before.pairs.length > 0 || stated.start < here.end) return [];
    if (start.statedUnit !== here.statedUnit || stated.statedUnit !== here.statedUnit) return [];
    if (!CONSEQUENCE.test(text.slice(here.end, stated.start)) || HELD_AGAINST.test(text.slice(stated.end))) return [];
    return [{ stated, computed: facing(size(minus(w(here), w(start))), stated.value), measures: `the difference between ${start.text} in an earlier sentence and ${here.text}`, basis }];
  });
}

/** This sentence states no level: the change (and any percentage of it) against the one pair before. */
function noLevelHere(text: string, qs: Quantity[], changes: Quantity[], before: { levels: Quantity[]; pairs: Pair[]; sentence: Previous }): ParagraphFinding[] {
  const pair = only(before.pairs);
  if (pair === undefined || before.levels.length !== 2) return [];
  const a = before.sentence.quantities[pair.from] as Quantity;
  const b = before.sentence.quantities[pair.to] as Quantity;
  if (a.statedUnit !== b.statedUnit) return [];
  const first = [...changes, ...qs.filter((q) => q.dimension === 'percent')].sort((x, y) => x.start - y.start)[0];
  if (first === undefined || !(OPENS_BY_REFERRING.test(text) || REFERS_BACK.test(text.slice(0, first.start)))) return [];
  const findings: ParagraphFinding[] = [];
  const stated = only(changes);
  if (stated !== undefined && stated.statedUnit === a.statedUnit && !HELD_AGAINST.test(text.slice(stated.end))) {
    findings.push({ stated, computed: facing(minus(w(b), w(a)), stated.value), measures: `the change from ${a.text} to ${b.text} in an earlier sentence`, basis });
  }
  const percent = only(qs.filter((q) => q.dimension === 'percent'));
  if (percent !== undefined && isStatedChange(text, percent) && !HELD_AGAINST.test(text.slice(percent.end))) {
    const r = divide(w(b), w(a));
    if (r !== undefined) findings.push({ stated: percent, computed: percentChange(r, percent.value), measures: `the percentage change from ${a.text} to ${b.text} in an earlier sentence`, basis });
  }
  return findings;
}

/**
 * "Mauna Loa averaged about 426 ppm in 2025. That's more than 70% above the pre-industrial 280."
 * A percentage or a multiple compared with the figure after it, in a sentence that opens by
 * referring back and states no level of its own before it: its subject is the one level of the
 * nearest earlier sentence naming one. A bare figure after it ("the pre-industrial 280") is read in
 * that level's unit when it is of the same size (within a factor of ten), as the writer left it off.
 */
export function comparisonsInParagraph(text: string, qs: Quantity[], earlier: readonly Previous[]): ParagraphFinding[] {
  if (earlier.length === 0 || !OPENS_BY_REFERRING.test(text)) return [];
  // A thread's or list's number ("14/", "3.") is no figure of the sentence.
  const figures = qs.filter((q) => !(/^[^\p{L}]*$/u.test(text.slice(0, q.start)) && /^[/.)]/u.test(text.slice(q.end))));
  return figures.flatMap((stated, k) => {
    const qs = figures;
    if ((stated.dimension !== 'percent' && stated.dimension !== 'ratio') || !comparesToNext(text, stated)) return [];
    const next = qs[k + 1];
    if (next === undefined || qs.slice(0, k).some((q) => q.dimension === next.dimension || CHANGE_OF[q.dimension] !== undefined)) return [];
    const dimension = next.dimension === 'number' ? undefined : next.dimension;
    const level = (d: Dimension): Quantity | undefined => {
      const before = nearestWithLevel(earlier, d);
      return before === undefined || before.pairs.length > 0 ? undefined : only(before.levels);
    };
    const subject = dimension !== undefined ? (CHANGE_OF[dimension] === undefined ? undefined : level(dimension)) : only(Object.keys(CHANGE_OF).flatMap((d) => level(d as Dimension) ?? []));
    if (subject === undefined) return [];
    const base = w(next);
    const ratioToBase = divide(w(subject), next.dimension === 'number' ? base : base);
    if (ratioToBase === undefined || (next.dimension === 'number' && (ratioToBase.value > 10 || ratioToBase.value < 0.1))) return [];
    if (next.dimension !== 'number' && next.statedUnit !== subject.statedUnit) return [];
    const measures = `${subject.text} in an earlier sentence against ${next.text}`;
    if (stated.dimension === 'percent') return [{ stated, computed: percentChange(ratioToBase, stated.value), measures: `the percentage difference of ${measures}`, basis }];
    const r = (stated.value < 1) === (ratioToBase.value < 1) ? ratioToBase : invert(ratioToBase);
    return [{ stated, computed: r, measures: `the ratio of ${measures}`, basis }];
  });
}
