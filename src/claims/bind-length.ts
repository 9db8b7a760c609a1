/**
 * A length told of its subject. A vague stretch of time ("a few centuries", "a couple hundred
 * years") speaks of a value only when it could state the value's range (bind-match.ts canState),
 * because such a phrase often times something other than what its subject words name ("climbed
 * within a few centuries of one another" is a lag). One structure settles it the other way: the
 * figure is the complement of a verb of lasting, taking or ending whose subject is the value's own
 * subject, named before that verb in the figure's clause:
 *
 *   "the whole deglaciation was over within a couple of centuries"
 *    ^^^^^^^^^^^^^^^^^^^^^^ subject  ^^^^^^^^^^^^^^^^ verb and figure: how long the deglaciation took
 *
 *   "At the end of the last ice age it took a few centuries for CO2 to catch up"
 *    (the period stands in an opening phrase, not as the subject of "took": not read)
 *
 * Only fillers (a hedge, a limiter, a preposition of extent: "in", "within", "for") stand between the
 * verb and the figure. The figure then binds the value as any figure does, and the reference check
 * judges it.
 */
import type { ReferenceValue } from '../rulepack/types.js';
import type { Quantity } from '../types.js';
import { lexiconWords } from '../prose/lexicon-words.js';
import { clauseBreaks, type TermHits } from './bind-view.js';

/**
 * Verbs that tell how long their subject went on or took, with every form a writer uses (common
 * practice: how English tells a duration): lasting ("lasted", "persisted"), taking ("took"), ending
 * within a stretch ("ended in", "was over within", "was complete inside", "finished in").
 */
const LENGTH_VERBS = new Set([
  'last', 'lasts', 'lasted', 'lasting', 'persist', 'persists', 'persisted', 'persisting', 'endure', 'endures', 'endured',
  'take', 'takes', 'took', 'taken', 'taking', 'end', 'ends', 'ended', 'ending', 'finish', 'finishes', 'finished', 'over',
  'complete', 'completed', 'done', 'unfold', 'unfolds', 'unfolded', 'happen', 'happens', 'happened',
]);
/** Words that may stand between the verb and the figure: a preposition of extent, a hedge or a limiter. */
const FILLERS = new Set([
  'in', 'within', 'inside', 'under', 'for', 'only', 'just', 'some', 'about', 'around', 'roughly', 'approximately', 'nearly',
  'almost', 'perhaps', 'maybe', 'probably', 'like', 'something', 'barely', 'mere', 'merely', 'all', 'of', 'the', 'space', 'span',
  'no', 'more', 'less', 'than', 'little', 'a', 'matter',
]);
/** How far before the figure the verb may stand, in words. */
const REACH = 8;

/** Where the verb of length governing the figure starts, when one does. */
function lengthVerbAt(sentence: string, q: Pick<Quantity, 'start'>): number | undefined {
  const words = lexiconWords(sentence.slice(0, q.start));
  for (let k = words.length - 1, seen = 0; k >= 0 && seen < REACH; k -= 1, seen += 1) {
    const w = words[k] as { text: string; start: number; end: number };
    // A clause mark between the word and the figure ends the search.
    if (/[,;:()–—]/u.test(sentence.slice(w.end, k === words.length - 1 ? q.start : (words[k + 1] as { start: number }).start))) return undefined;
    if (LENGTH_VERBS.has(w.text)) return w.start;
    if (!FILLERS.has(w.text)) return undefined;
  }
  return undefined;
}

/**
 * Whether the duration `q` is told as the length of the value's subject: a verb of length governs
 * it, and a term of one of the value's groups stands before that verb in the figure's clause.
 */
export function toldAsLength(sentence: string, q: Pick<Quantity, 'start' | 'dimension'>, r: Pick<ReferenceValue, 'binding'>, view: TermHits): boolean {
  if (q.dimension !== 'duration') return false;
  const verb = lengthVerbAt(sentence, q);
  if (verb === undefined) return false;
  const from = Math.max(0, ...clauseBreaks(sentence).filter((b) => b < verb));
  const ids = new Set(r.binding.all.flat());
  return [...view].some(([id, spans]) => ids.has(id) && spans.some(([s]) => s >= from && s < verb));
}
