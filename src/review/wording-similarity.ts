/**
 * How alike two wordings of a claim are, to tell an edited claim (a stale sign-off) from a new one.
 * Words are compared lower-case, with punctuation dropped. Two wordings that differ only in their
 * numbers score 1: that is the usual edit after a fact check ("420,000" → "800,000"). Otherwise the
 * score is the Dice coefficient over the two word multisets: 2·shared / (words in a + words in b).
 *
 *   wordingSimilarity('The core spans 420,000 years.', 'The core spans 800,000 years.') === 1
 */

/** Scores at or above this count as the same claim reworded. */
export const SAME_CLAIM_THRESHOLD = 0.6;

const NUMBER = /^[\d.,]+$/u;

/** A score from 0 (no word shared) to 1 (same words, numbers aside). */
export function wordingSimilarity(a: string, b: string): number {
  const wordsA = wordsOf(a);
  const wordsB = wordsOf(b);
  if (wordsA.length === 0 || wordsB.length === 0) return 0;
  const masked = (words: string[]) => words.map((w) => (NUMBER.test(w) ? '#' : w)).join(' ');
  if (masked(wordsA) === masked(wordsB)) return 1;
  const counts = new Map<string, number>();
  for (const w of wordsA) counts.set(w, (counts.get(w) ?? 0) + 1);
  let shared = 0;
  for (const w of wordsB) {
    const left = counts.get(w) ?? 0;
    if (left > 0) {
      shared += 1;
      counts.set(w, left - 1);
    }
  }
  return (2 * shared) / (wordsA.length + wordsB.length);
}

/** Lower-case words and numbers; a number keeps its inner separators ("420,000", "2.5"). */
function wordsOf(text: string): string[] {
  return text.toLowerCase().match(/[\p{L}\p{N}]+(?:[.,'’-][\p{L}\p{N}]+)*/gu) ?? [];
}
