/**
 * A bare number after a term whose figures the pack gives one unit (`units` on a term: a figure in
 * ppm is CO2): "Before the factories CO2 was around 350" reads 350 as 350 ppm, as a reader does.
 * Only a number with nothing but the end of its clause or a function word after it takes the unit
 * ("CO2 in 2 cores" counts cores), never a year, and only when the sentence names no other gas.
 */
import { parseQuantities } from '../quantities/index.js';
import type { LoadedPacks } from '../rulepack/types.js';
import type { Quantity } from '../types.js';
import { findTerms } from './bind.js';
import { YEAR_LIKE } from './elided-units.js';

/** What may follow a bare level: the end of its clause, or a word that opens another part of it. */
const CLOSE_AFTER = /^\s*(?:$|[.,;:!?)—–-]|(?:and|or|but|in|at|by|back|then|before|after|during|when|while|so|which|to|for|on|until|today|now|tops|or so|max|at most)(?![\p{L}]))/iu;

/** The quantities with bare numbers read in the unit of the term before them, where one applies. */
export function restoreTermUnits(sentence: string, quantities: Quantity[], packs: LoadedPacks): Quantity[] {
  const bare = quantities.filter((q) => q.dimension === 'number' && !YEAR_LIKE.test(q.text.trim()) && /\d/u.test(q.text) && CLOSE_AFTER.test(sentence.slice(q.end)));
  if (bare.length === 0) return quantities;
  const hits = findTerms(sentence, packs);
  const terms = packs.terms.filter((t) => t.units?.length === 1 && hits.has(t.id) && !(t.unless ?? []).some((id) => hits.has(id)));
  if (terms.length !== 1) return quantities;
  const term = terms[0]!;
  const first = Math.min(...(hits.get(term.id) ?? []).map(([start]) => start));
  return quantities.map((q) => {
    if (!bare.includes(q) || q.start < first) return q;
    const [read] = parseQuantities(`${q.text} ${term.units![0]}`);
    if (read === undefined || read.dimension === 'number' || read.value < 100 || read.value > 5000) return q;
    return { ...read, text: q.text, start: q.start, end: q.end };
  });
}
