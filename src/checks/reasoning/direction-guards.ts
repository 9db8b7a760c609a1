/**
 * Guards for direction facts: a wrong-way-round phrasing that the sentence itself denies, asks
 * about or concedes is not the writer's claim. They apply to every direction fact of every pack,
 * so a team's own facts get them too.
 *
 *   "It is not true that warmer seas absorb more CO2."             denied: passes
 *   "Do warmer seas absorb more CO2?"                              asked: passes
 *   "Even as the seas warm, they absorb more CO2 each year, because the air holds more of it."
 *                                                                  conceded: passes
 */
import { compilePhrases, findPhrases, isNegated } from '../../claims/frames-match.js';
import { tokenizeSentence, type SentenceTokens } from '../../claims/frames-tokens.js';
import type { Span } from './time-limit.js';

/** The guard words (English), as cue-word phrases. */
export const DIRECTION_GUARD_WORDS = {
  /** Denial just before the match or inside it: "not true that", "warm seas never absorb more". */
  negation: ['not', 'never', 'no', 'nor', 'neither', 'untrue', 'false', 'myth'],
  /** A concession: the sentence grants the surface fact while giving another reason for it. */
  concession: ['even as', 'even though', 'even while', 'even when', 'although', 'though', 'despite', 'in spite of', 'still'],
} as const;

const NEGATION = compilePhrases(DIRECTION_GUARD_WORDS.negation);
const CONCESSION = compilePhrases(DIRECTION_GUARD_WORDS.concession);

/** How many words before the match a denial may stand ("it is not true that warmer ..."). */
const NEGATION_WINDOW = 4;

/** True when the sentence asks, denies or concedes the statement at `hit` instead of making it. */
export function isGuarded(text: string, hit: Span, tokens: SentenceTokens = tokenizeSentence(text, [], null)): boolean {
  if (text.trimEnd().endsWith('?')) return true;
  const first = tokens.words.findIndex((w) => (tokens.tokens[w]?.start ?? -1) >= hit.start);
  if (first === -1) return false;
  const inside = (h: { start: number; end: number }) => h.start >= hit.start && h.end <= hit.end;
  if (findPhrases(tokens, NEGATION).some(inside) || isNegated(tokens, first, NEGATION, NEGATION_WINDOW)) return true;
  return findPhrases(tokens, CONCESSION).some((h) => h.start < hit.end);
}
