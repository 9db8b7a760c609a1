/**
 * The next event. A stretch of time told as how long something lasted is often closed by a clause
 * that says what came after it:
 *
 *   "It lasted about 3,000 years before warming resumed."
 *    ^^^^^^^^^^^^^^^^^^^^^^^^^^^ the figure ^^^^^^^^^^^^^^^^^ the next event (its words are not the figure's)
 *
 * The clause opened by "before", "until" or "till" right after the figure names a later event: its
 * words say neither what the figure measures nor what it is not, so they leave the figure's view
 * (they bind and veto nothing for it, and name no subject of the sentence for it). Only a figure that
 * a verb of lasting governs ("lasted", "dragged on for", "persisted for", "went on for") is read so:
 * in "Antarctica warmed for about 800 years before CO2 began to rise" the clause after the figure
 * names the other record of a lag, and the figure keeps its words.
 */
import type { Quantity } from '../types.js';
import { lexiconWords } from '../prose/lexicon-words.js';
import type { TermHits } from './bind-view.js';

/**
 * Verbs of lasting, as their words are cut (common practice: how English tells a duration), each
 * with every form a writer uses; a phrasal verb's particle ("drag on") may follow.
 */
const LASTING = new Set(['last', 'lasts', 'lasted', 'lasting', 'persist', 'persists', 'persisted', 'persisting', 'endure', 'endures', 'endured', 'enduring', 'drag', 'drags', 'dragged', 'dragging', 'go', 'goes', 'went', 'going', 'continue', 'continues', 'continued', 'continuing', 'hold', 'holds', 'held', 'holding', 'linger', 'lingers', 'lingered', 'lingering', 'run', 'runs', 'ran', 'running']);
/** Words that may stand between the verb of lasting and the figure: a particle, "for", a hedge or a limiter. */
const BETWEEN = new Set(['on', 'out', 'for', 'only', 'just', 'some', 'about', 'around', 'roughly', 'approximately', 'nearly', 'almost', 'perhaps', 'maybe', 'like', 'something', 'over', 'a', 'full', 'good', 'mere', 'merely', 'another']);
/** The words that open a clause naming what came after. */
const NEXT = new Set(['before', 'until', 'till']);
/** What ends the clause of the next event (a comma or point inside a number, "11,700", ends nothing). */
const CLAUSE_END = /[;:!?()–—]|[,.](?!\d)/u;

/** Whether a verb of lasting governs the figure: only the words of BETWEEN stand between them. */
function lastingBefore(sentence: string, q: Pick<Quantity, 'start'>): boolean {
  const words = lexiconWords(sentence.slice(Math.max(0, q.start - 60), q.start));
  for (let k = words.length - 1; k >= 0; k -= 1) {
    const w = (words[k] as { text: string }).text;
    if (LASTING.has(w)) return true;
    if (!BETWEEN.has(w)) return false;
  }
  return false;
}

/** The span of the next event's clause after the figure, when one opens right after it. */
export function nextEventClause(sentence: string, q: Pick<Quantity, 'start' | 'end'>, others: readonly Pick<Quantity, 'start' | 'end'>[]): [number, number] | undefined {
  const after = lexiconWords(sentence.slice(q.end));
  const opener = after[0];
  if (opener === undefined || !NEXT.has(opener.text)) return undefined;
  // Nothing but spaces between the figure and the conjunction.
  if (sentence.slice(q.end, q.end + opener.start).trim() !== '') return undefined;
  if (!lastingBefore(sentence, q)) return undefined;
  const from = q.end + opener.start;
  const rest = sentence.slice(from);
  const stop = rest.search(CLAUSE_END);
  const to = stop < 0 ? sentence.length : from + stop;
  // "lasted 1,200 years until about 11,700 years ago": a clause holding a figure of its own dates the end; it stays.
  if (others.some((o) => o.start >= from && o.end <= to)) return undefined;
  return [from, to];
}

/** Takes the words of each duration's next-event clause out of its view. */
export function withoutNextEvents(sentence: string, quantities: readonly Quantity[], views: TermHits[]): void {
  quantities.forEach((q, i) => {
    if (q.dimension !== 'duration') return;
    const clause = nextEventClause(sentence, q, quantities.filter((o) => o !== q));
    if (clause === undefined) return;
    const view = views[i] as TermHits;
    for (const [id, spans] of [...view]) {
      const kept = spans.filter(([s, e]) => e <= clause[0] || s >= clause[1]);
      if (kept.length === 0) view.delete(id);
      else if (kept.length < spans.length) view.set(id, kept);
    }
  });
}
