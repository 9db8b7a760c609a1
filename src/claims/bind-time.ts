/**
 * The time a number speaks of. Two rules read it from the sentence's structure:
 *
 * - An earlier time. A number in a clause set before another time ("before about a million years
 *   ago", "before that", "until then") speaks of that earlier time, so a value that holds only for a
 *   later stretch (the 100,000-year cycles since the Mid-Pleistocene Transition) vetoes it. The
 *   clause ends at a semicolon or at a word that turns to another time or contrast ("while",
 *   "whereas", "but", "since then"). The pack names the term (`earlier-time`) and its anaphoric
 *   words ("before that"); a "before" or "until" followed by an age is found here.
 *
 *     "Before about a million years ago, the glacial cycles came roughly every 41,000 years"
 *      ^^^^^^ ───────────────────────────────────────────────────────────── earlier time
 *
 * - A time frame. A stretch that opens a sentence ("Over the past 800,000 years, ...") or is told
 *   as the time a statement covers ("... for the past 800,000 years") sets the scene; when another number of the sentence states the same value, the claim is that number's
 *   and the frame binds nothing.
 *
 *     "Over the past 800,000 years, glacial periods came roughly every 100,000 years"
 *                    └ frame: yields ┘                             └ the period ┘
 */
import type { LoadedPacks } from '../rulepack/types.js';
import type { Binding, Quantity } from '../types.js';
import { opensAsTimeFrame, type TermHits } from './bind-view.js';

/** The pack's term for a clause set at an earlier time. */
export const EARLIER_TIME = 'earlier-time';
/** Where a clause turns to another time or subject: its scope for an earlier-time word ends there. */
const TURN = /[;!?]|\.(?!\d)|\b(?:while|whereas|but|since then|after that|since that time|today|now)\b/giu;
/** The pack's term for a clause set after another time ("afterwards", "since then"). */
export const LATER_TIME = 'later-time';
/** A verb of change of state and "from" just before a figure (an adverb, an article may stand between): the figure is where it started. */
const CHANGE_FROM = /(?:^|[^\p{L}])(?:switch|shift|chang|slow|lengthen|stretch|mov|went|go|grew|grow|turn|evolv|transition|jump|swung|swing|sped|speed|shorten)\p{L}*\s+(?:\p{L}+ly\s+)?from\s+(?:(?:a|an|the|its)\s+)?$/iu;
/** A phrase of replacement between two figures: the first is the state replaced. */
const REPLACED_BY = /(?:^|[^\p{L}])(?:gave|give|gives|giving)\s+way\s+to|(?:was|were|been|being)\s+(?:replaced|succeeded|superseded|overtaken)\s+by|(?:yielded|yields|yield)\s+to|made\s+way\s+for/iu;
/** "before" or "until" directly before an age: the age is the time the clause is set before. */
const BEFORE_AGE = /(?:^|[^\p{L}])(?:before|until|till|prior\s+to|earlier\s+than)\s*$/iu;

/**
 * Adds the earlier-time term to the view of each quantity whose clause is set before another time,
 * or that is the former state of a change told in the sentence ("switched from about 41,000 years
 * to about 100,000", "the 41-kyr rhythm gave way to a 100-kyr one"), and the later-time term to the
 * view of each quantity whose clause is set after another time ("; afterwards, ..."). `hits` are
 * the sentence's term hits (the pack's anaphoric words: "before that", "since then").
 */
export function addEarlierTime(sentence: string, quantities: Quantity[], views: TermHits[], hits: TermHits, packs: LoadedPacks): void {
  const turns = [...sentence.matchAll(TURN)].map((m) => m.index);
  const segmentOf = (at: number): number => turns.filter((t) => t < at).length;
  if (packs.term(LATER_TIME) !== undefined) {
    for (const view of views) view.delete(LATER_TIME);
    // A later-time word may itself be the turn ("since then"): its clause is the one it opens.
    const later = hits.get(LATER_TIME) ?? [];
    quantities.forEach((q, i) => {
      const own = later.filter(([, end]) => segmentOf(end) === segmentOf(q.start));
      if (own.length > 0) (views[i] as TermHits).set(LATER_TIME, own);
    });
  }
  if (packs.term(EARLIER_TIME) === undefined) return;
  // The words reach a quantity by their clause, not by how near they stand.
  for (const view of views) view.delete(EARLIER_TIME);
  const markers: { span: [number, number]; age?: number }[] = (hits.get(EARLIER_TIME) ?? []).map((span) => ({ span }));
  quantities.forEach((q, i) => {
    if (q.dimension !== 'age') return;
    const before = BEFORE_AGE.exec(sentence.slice(Math.max(0, q.start - 16), q.start));
    if (before !== null) markers.push({ span: [q.start - before[0].length + before[0].search(/\p{L}/u), q.start], age: i });
  });
  quantities.forEach((q, i) => {
    const own = markers.filter((m) => m.age !== i && segmentOf(m.span[0]) === segmentOf(q.start));
    const former = formerState(sentence, quantities, i);
    if (former !== undefined) own.push({ span: former });
    if (own.length === 0) return;
    const view = views[i] as TermHits;
    view.set(EARLIER_TIME, [...(view.get(EARLIER_TIME) ?? []), ...own.map((m) => m.span)]);
  });
}

/**
 * The words that make quantity `i` the former state of a change of state the sentence tells, when
 * they do: a verb of change and "from" before it with a later "to" or "into" and a figure of its
 * dimension in the same clause, or a phrase of replacement after it and a figure of its dimension
 * after that.
 *
 *     "the rhythm switched from about 41,000 years to about 100,000 years"
 *                 ^^^^^^^^^^^^^ └ former state ┘
 *     "the ~41-kyr rhythm gave way to a ~100-kyr one"
 *          └ former ┘     ^^^^^^^^^^^^
 */
function formerState(sentence: string, quantities: Quantity[], i: number): [number, number] | undefined {
  const q = quantities[i] as Quantity;
  const later = quantities.find((o, j) => j > i && o.dimension === q.dimension);
  if (later === undefined) return undefined;
  const between = sentence.slice(q.end, later.start);
  if (/[;!?]|\.(?!\d)/u.test(between)) return undefined;
  const windowStart = Math.max(0, q.start - 60);
  const from = CHANGE_FROM.exec(sentence.slice(windowStart, q.start));
  if (from !== null && /(?:^|[^\p{L}])(?:to|into)(?:[^\p{L}]|$)/iu.test(between)) return [windowStart + from.index, q.start];
  const replaced = REPLACED_BY.exec(between);
  if (replaced !== null) return [q.end + replaced.index, q.end + replaced.index + replaced[0].length];
  return undefined;
}

/** A stretch told as the time a statement covers: "over the past", "for the last", "during the previous". */
const FRAME_BEFORE = /(?:^|[^\p{L}])(?:over|for|during|across|through|throughout|in|within)\s+(?:all\s+of\s+)?(?:the\s+)?(?:last|past|previous|preceding)\s+$/iu;

/** Whether quantity `i` is a time frame: a stretch that opens the sentence, or one told as "over the past N years". */
function isTimeFrame(sentence: string, quantities: Quantity[], i: number): boolean {
  const q = quantities[i] as Quantity;
  if (q.dimension !== 'duration') return opensAsTimeFrame(sentence, quantities, i);
  return opensAsTimeFrame(sentence, quantities, i) || FRAME_BEFORE.test(sentence.slice(Math.max(0, q.start - 40), q.start));
}

/** `bindings` without the binding of a time frame whose value another number of the sentence states. */
export function framesYield(sentence: string, quantities: Quantity[], bindings: Binding[]): Binding[] {
  return bindings.filter((b) => !(isTimeFrame(sentence, quantities, b.quantityIndex) && bindings.some((o) => o !== b && o.referenceId === b.referenceId && !isTimeFrame(sentence, quantities, o.quantityIndex))));
}

/** The pack's term for a span that is not how long an event took (a lead, a lag, a pace). */
export const NOT_A_DURATION = 'not-a-duration';
/** "within" just before a figure (a hedge may stand between; it is part of the figure's text). */
const WITHIN_BEFORE = /(?:^|[^\p{L}])within\s+$/iu;
/** "of" just after it: the figure measures nearness to what follows. */
const OF_AFTER = /^\s+of(?![\p{L}])/iu;

/**
 * Adds the not-a-duration term to the view of each span told as a nearness in time: "within about
 * 400 years of Antarctic temperature" measures how far apart two things were, not how long anything
 * lasted, so the durations of events veto it while leads and lags still bind it.
 *
 *     "Pedro et al. put CO2 within about 400 years of Antarctic temperature"
 *                           ^^^^^^ └ nearness ┘ ^^
 */
export function addNearness(sentence: string, quantities: Quantity[], views: TermHits[], packs: LoadedPacks): void {
  if (packs.term(NOT_A_DURATION) === undefined) return;
  quantities.forEach((q, i) => {
    if (q.dimension !== 'duration') return;
    if (!WITHIN_BEFORE.test(sentence.slice(Math.max(0, q.start - 12), q.start)) || !OF_AFTER.test(sentence.slice(q.end, q.end + 8))) return;
    const view = views[i] as TermHits;
    view.set(NOT_A_DURATION, [...(view.get(NOT_A_DURATION) ?? []), [q.start, q.end]]);
  });
}
