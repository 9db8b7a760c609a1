/**
 * A figure the draft denies is not a figure it claims: "the record is not 420,000 years long but
 * 800,000", "800,000 years, not 420,000", "about 420 ppm rather than 280", "instead of 3,000 metres".
 * The reference check gives such a figure no value flag (the figure the draft does claim is checked
 * as ever). Only a negation right before the number counts, with at most a hedge between ("not about
 * 420,000"); "not until 11,700 years ago", "not quite 800,000", "not even 200 ppm" and the bounds
 * "not more than" and "never above" (claims/bind-bound.ts) claim their figure and are left alone.
 * These are English's closed-class words (common practice of English grammar), not subject knowledge.
 */
import type { Quantity } from '../types.js';

/** Words that deny what follows them at once. */
const DENIALS: readonly string[][] = [['not'], ["n't"], ['n’t'], ['rather', 'than'], ['instead', 'of'], ['as', 'opposed', 'to']];
/** A hedge that may stand between the denial and the number. */
const HEDGES = new Set(['about', 'around', 'roughly', 'some', 'approximately', 'circa', 'ca.', 'c.', 'nearly', 'almost', 'a', 'the']);

/** The words of `text`, lower case; a contraction's "n't" is a word of its own ("isn't" → "is", "n't"). */
function wordsOf(text: string): string[] {
  return text
    .toLowerCase()
    .replace(/(\p{L})(n['’]t)(?!\p{L})/gu, '$1 $2')
    .split(/[^\p{L}\p{N}'’.]+/u)
    .filter((w) => w !== '');
}

/** Whether the number of `q` stands right after a denial in `sentence`, in its own clause. */
export function isDeniedFigure(sentence: string, q: Pick<Quantity, 'start'>): boolean {
  const before = sentence.slice(0, q.start);
  const clause = before.slice(Math.max(...[';', ':', '.', '!', '?', '(', '—'].map((c) => before.lastIndexOf(c))) + 1);
  const words = wordsOf(clause);
  let end = words.length;
  while (end > 0 && HEDGES.has(words[end - 1] as string)) end -= 1;
  return DENIALS.some((denial) => denial.length <= end && denial.every((w, i) => words[end - denial.length + i] === w));
}
