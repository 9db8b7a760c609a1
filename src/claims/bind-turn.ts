/**
 * A turn of contrast to a subject of its own. In "Mauna Loa passed 430 ppm, while the global mean
 * for 2024 was about 424 ppm" and "Dome C spans about 800,000 years, whereas Vostok covers about
 * 420,000" the clause after ", while" or ", whereas" names its own subject right at its head, so
 * the words before the turn speak of the other side: they neither name nor veto what a number after
 * the turn measures. A turn whose clause opens with no subject of its own ("..., while each was
 * more like 10 ppm") still speaks of the subject before; "but" mostly qualifies the same subject
 * ("Greenland ice is superb ..., but the deepest layers ... are folded") and is no turn here.
 *
 *   "Mauna Loa passed 430 ppm, while the global mean for 2024 was about 424 ppm"
 *    ^^^^^^^^^ other side      ^^^^^ turn ^^^^^^ own subject      └ the global mean's
 */
import type { Quantity } from '../types.js';
import type { TermHits } from './bind-view.js';

/** A clause that turns to a contrasting subject. */
const CONTRAST_TURN = /[,;]\s*(?:while|whereas)\s+/giu;
/** What may stand between the turn and its subject's first word: a determiner or two. */
const HEAD = /^(?:(?:the|a|an|its|their|this|that|these|those|at|in)\s+)*$/iu;

/** Removes from each quantity's view the words before a turn to a subject named at the turn's head. */
export function withoutOtherSide(sentence: string, quantities: readonly Quantity[], views: TermHits[]): void {
  const turns = [...sentence.matchAll(CONTRAST_TURN)].map((m) => ({ at: m.index, head: m.index + m[0].length }));
  if (turns.length === 0) return;
  quantities.forEach((q, i) => {
    const view = views[i];
    if (view === undefined) return;
    const own = turns.filter((t) => t.head <= q.start && [...view.values()].some((spans) => spans.some(([start, end]) => start >= t.head && end <= q.start && HEAD.test(sentence.slice(t.head, start)))));
    const turn = own.at(-1);
    if (turn === undefined) return;
    for (const [id, spans] of view) {
      const left = spans.filter(([, end]) => end > turn.at);
      if (left.length > 0) view.set(id, left);
      else view.delete(id);
    }
  });
}
