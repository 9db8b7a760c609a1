/**
 * Binds each quantity in a sentence to the reference value it speaks about. A value is a candidate
 * when the sentence has a word of every one of its term groups, none of its veto terms, and the
 * quantity's dimension is one the value accepts. Among candidates the one whose terms stand nearest
 * the quantity wins, a clause boundary counting as far; a tie binds nothing (the quantity is listed
 * as ambiguous and goes to the checklist instead of raising a flag).
 *
 *   "Vostok reaches back 420,000 years and EPICA Dome C 800,000 years"
 *    ^^^^^^ ─────────── 420,000 ──┘      ^^^^^^^^^^^^ ─── 800,000 (each binds its nearest core)
 */
import type { LoadedPacks, ReferenceValue } from '../rulepack/types.js';
import type { Binding, Quantity } from '../types.js';

/** Characters added to a distance for each clause boundary between a term and the quantity. */
const CLAUSE_PENALTY = 1000;
const CLAUSE_BREAK = /[;:,()–—]|\b(?:and|but|while|whereas|although|though|versus|vs\.?|compared with)\b/giu;

/** Where each term of the packs appears in a sentence: term id → [start, end) spans. */
export type TermHits = Map<string, [number, number][]>;

const compiled = new WeakMap<object, Map<string, RegExp>>();

/** Finds every term occurrence (case-insensitive, on word boundaries) in `sentence`. */
export function findTerms(sentence: string, packs: LoadedPacks): TermHits {
  let regexes = compiled.get(packs);
  if (regexes === undefined) {
    regexes = new Map(packs.terms.map((t) => [t.id, termRegex(t.words)]));
    compiled.set(packs, regexes);
  }
  const hits: TermHits = new Map();
  for (const [id, regex] of regexes) {
    const spans = [...sentence.matchAll(regex)].map((m): [number, number] => [m.index + (m[1] ?? '').length, m.index + m[0].length]);
    if (spans.length > 0) hits.set(id, spans);
  }
  return hits;
}

function termRegex(words: string[]): RegExp {
  const escaped = [...words].sort((a, b) => b.length - a.length).map((w) => w.replace(/[.*+?^${}()|[\]\\]/gu, '\\$&').replace(/\s+/gu, '\\s+'));
  return new RegExp(`(^|[^\\p{L}\\p{N}])(?:${escaped.join('|')})(?![\\p{L}\\p{N}])`, 'giu');
}

/** Binds `quantities` (parsed from `sentence`) to reference values of `packs`. */
export function bindQuantities(sentence: string, quantities: Quantity[], packs: LoadedPacks): { bindings: Binding[]; ambiguous: number[] } {
  const hits = findTerms(sentence, packs);
  const breaks = [...sentence.matchAll(CLAUSE_BREAK)].map((m) => m.index);
  const candidates = packs.references.filter((r) => satisfies(r, hits));
  const bindings: Binding[] = [];
  const ambiguous: number[] = [];
  quantities.forEach((q, quantityIndex) => {
    const scored = candidates
      .filter((r) => r.dimensions.includes(q.dimension))
      .map((r) => ({ r, score: nearness(r, hits, q, breaks) }))
      .sort((a, b) => a.score - b.score);
    const [best, next] = scored;
    if (best === undefined) return;
    if (next !== undefined && next.score === best.score) ambiguous.push(quantityIndex);
    else bindings.push({ quantityIndex, referenceId: best.r.id });
  });
  return { bindings, ambiguous };
}

function satisfies(r: ReferenceValue, hits: TermHits): boolean {
  return r.binding.all.every((group) => group.some((id) => hits.has(id))) && !r.binding.none.some((id) => hits.has(id));
}

/** Sum over term groups of the distance from the quantity to the group's nearest term. */
function nearness(r: ReferenceValue, hits: TermHits, q: Quantity, breaks: number[]): number {
  let total = 0;
  for (const group of r.binding.all) {
    let nearest = Infinity;
    for (const id of group) {
      for (const [start, end] of hits.get(id) ?? []) nearest = Math.min(nearest, distance(start, end, q, breaks));
    }
    total += nearest;
  }
  return total;
}

function distance(start: number, end: number, q: Quantity, breaks: number[]): number {
  const [from, to] = end <= q.start ? [end, q.start] : start >= q.end ? [q.end, start] : [0, 0];
  const crossed = breaks.filter((b) => b >= from && b < to).length;
  return to - from + crossed * CLAUSE_PENALTY;
}
