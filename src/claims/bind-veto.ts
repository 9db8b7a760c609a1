/**
 * Which of a quantity's words may veto a value. A change verb that carries its quantity to a level
 * names the level reached, not a change: in "carbon dioxide fell to about 240 ppm" or "peaks climbed
 * as high as 350 ppm" the verb does not stop a level value that vetoes change words, since the
 * quantity's role (bind-role.ts) already says it is a level.
 *
 *   "During the coldest spells, carbon dioxide fell to about 240 parts per million."
 *                                              ^^^^ ── level verb: no veto for the glacial CO2 level
 */
import type { Quantity } from '../types.js';
import { isChangeVerb, type ReadRole } from './bind-role.js';
import { clauseBreaks, type TermHits } from './bind-view.js';

/**
 * What may stand between a level verb and its quantity: "to", "at", or nothing ("climbed as high as");
 * "to" may take an article and one word of description ("fell to a meagre 120 ppm").
 */
const LEVEL_LINK = /^\s*(?:to(?:\s+(?:a|an)\s+\p{L}+)?|at)?\s*$/iu;

/** The hits of `view` that may veto a value for `q`: all of them, less the verb that brings a level quantity to its level. */
export function vetoView(sentence: string, view: TermHits, q: Pick<Quantity, 'start' | 'end'>, role: ReadRole): TermHits {
  const breaks = clauseBreaks(sentence);
  // "CO2 is climbing by 0.2 ppm a year, many times faster than ...": a word in a later clause
  // speaks of that clause, not of the number before it.
  const later = (start: number): boolean => start >= q.end && breaks.some((b) => b >= q.end && b < start);
  const kept: TermHits = new Map();
  for (const [id, spans] of view) {
    // Only a verb of change carries the number to its level: "the offset to 2,000 years" is still an offset.
    const carries = ([start, end]: [number, number]): boolean => role === 'level' && end <= q.start && isChangeVerb(sentence.slice(start, end)) && LEVEL_LINK.test(sentence.slice(end, q.start));
    const left = spans.filter((span) => !later(span[0]) && !carries(span));
    if (left.length > 0) kept.set(id, left);
  }
  return kept;
}
