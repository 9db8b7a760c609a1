/**
 * Words that name another subject, held up for comparison: "comparable to other East Antarctic
 * records", "unlike Vostok", "similar to that of Greenland", or denied: "Termination III, not the end
 * of the last ice age". Such a term says what the number is compared with or is not about, not what
 * it is about, so it neither binds nor vetoes.
 *
 *   "a local warming of about 9 °C, comparable to other East Antarctic isotope records"
 *                                                  ^^^^^^^^^^^^^^ another subject: not bound
 */
import type { TermHits } from './bind-view.js';

const ANOTHER = /(?:^|[^\p{L}])(?:other|not(?:\s+(?:at|in|during|for|from|of|about))?(?:\s+the)?|rather\s+than(?:\s+(?:at|in|during))?(?:\s+the)?|instead\s+of(?:\s+the)?|unlike(?:\s+(?:the|those\s+of|that\s+of))?|(?:comparable|similar)\s+(?:to|with)(?:\s+(?:the|those\s+of|that\s+of|other))?|like\s+(?:the|those\s+of|that\s+of))\s+$/iu;

/** `hits` without the terms that name a subject held up for comparison (and the terms inside those). */
export function withoutOthers(sentence: string, hits: TermHits): TermHits {
  const others = [...hits.values()].flat().filter(([start]) => ANOTHER.test(sentence.slice(Math.max(0, start - 40), start)));
  if (others.length === 0) return hits;
  const kept: TermHits = new Map();
  for (const [id, spans] of hits) {
    const left = spans.filter(([start, end]) => !others.some(([s, e]) => start < e && s < end));
    if (left.length > 0) kept.set(id, left);
  }
  return kept;
}
