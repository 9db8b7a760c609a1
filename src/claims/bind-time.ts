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
/** "before" or "until" directly before an age: the age is the time the clause is set before. */
const BEFORE_AGE = /(?:^|[^\p{L}])(?:before|until|till|prior\s+to|earlier\s+than)\s*$/iu;

/**
 * Adds the earlier-time term to the view of each quantity whose clause is set before another time.
 * `hits` are the sentence's term hits (the pack's anaphoric words: "before that", "before then").
 */
export function addEarlierTime(sentence: string, quantities: Quantity[], views: TermHits[], hits: TermHits, packs: LoadedPacks): void {
  if (packs.term(EARLIER_TIME) === undefined) return;
  // The words reach a quantity by their clause, not by how near they stand.
  for (const view of views) view.delete(EARLIER_TIME);
  const markers: { span: [number, number]; age?: number }[] = (hits.get(EARLIER_TIME) ?? []).map((span) => ({ span }));
  quantities.forEach((q, i) => {
    if (q.dimension !== 'age') return;
    const before = BEFORE_AGE.exec(sentence.slice(Math.max(0, q.start - 16), q.start));
    if (before !== null) markers.push({ span: [q.start - before[0].length + before[0].search(/\p{L}/u), q.start], age: i });
  });
  if (markers.length === 0) return;
  const turns = [...sentence.matchAll(TURN)].map((m) => m.index);
  const segmentOf = (at: number): number => turns.filter((t) => t < at).length;
  quantities.forEach((q, i) => {
    const own = markers.filter((m) => m.age !== i && segmentOf(m.span[0]) === segmentOf(q.start));
    if (own.length === 0) return;
    const view = views[i] as TermHits;
    view.set(EARLIER_TIME, [...(view.get(EARLIER_TIME) ?? []), ...own.map((m) => m.span)]);
  });
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
