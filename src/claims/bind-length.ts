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

/** Nouns of a point in a period's course: a figure set at one is no length of the period. */
const POINT_PHASES = ['start', 'onset', 'beginning', 'outset', 'end', 'close', 'height', 'peak'];
/**
 * What opens a frame after a figure: "for" (the event a figure is given for) or "at the <phase> of"
 * (a point in the event's course), with an optional article; the frame's words follow.
 */
const FRAME_OPENERS = ['for', ...POINT_PHASES.map((p) => `at the ${p} of`), ...POINT_PHASES.map((p) => `at its ${p} of`)].flatMap((o) => [o, `${o} the`]);

/** Qualifiers of a period that may stand between a frame's opener and its noun. */
const QUALIFIERS = new Set(['last', 'most', 'recent', 'latest', 'previous', 'whole', 'entire']);

/** Whether the words right before `at` close with a frame opener (or `at` starts a phase after "at the"). */
function opensFrame(sentence: string, at: number): boolean {
  const before = lexiconWords(sentence.slice(Math.max(0, at - 60), at)).map((w) => w.text);
  // "for the last deglaciation", "at the start of the most recent one": a qualifier is the frame's.
  while (before.length > 0 && QUALIFIERS.has(before[before.length - 1] as string)) before.pop();
  const tail = (n: number) => before.slice(-n).join(' ');
  if (FRAME_OPENERS.some((o) => tail(o.split(' ').length) === o)) return true;
  // "at the start of the last deglaciation" matched as one term: "at the" before its phase word.
  const first = lexiconWords(sentence.slice(at, at + 12))[0]?.text;
  return first !== undefined && POINT_PHASES.includes(first) && (tail(2) === 'at the' || tail(2) === 'at its');
}

/**
 * A period named only after a figure, as the frame it is given for or the point of its course it is
 * set at, when no verb of length governs the figure:
 *
 *   "Monnin's team got roughly 800 years, give or take 600, at the start of the last deglaciation"
 *   "later work put it under 400 years for the last deglaciation"
 *
 * The figure is a finding set at or given for that period (a lag, a gap), not the period's length:
 * a value the period alone names (one term group: how long the period lasted) is not its value.
 * "The deglaciation lasted about 7,000 years" (subject, verb of length) is read as before.
 */
export function framedAfter(sentence: string, q: Pick<Quantity, 'start' | 'end' | 'dimension'>, r: Pick<ReferenceValue, 'binding'>, view: TermHits): boolean {
  if (q.dimension !== 'duration' || r.binding.all.length !== 1) return false;
  const ids = new Set(r.binding.all.flat());
  const spans = [...view].filter(([id]) => ids.has(id)).flatMap(([, s]) => s);
  if (spans.length === 0 || toldAsLength(sentence, q, r, view)) return false;
  // "It took 300 years for the deglaciation to run its course": "for" opens the subject of an infinitive.
  return spans.every(([s, e]) => s >= q.end && opensFrame(sentence, s) && lexiconWords(sentence.slice(e, e + 12))[0]?.text !== 'to');
}
