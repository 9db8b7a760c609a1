/**
 * Whether a reference value's terms are present for a quantity, and how near they stand to it.
 * Both read one quantity's view of the sentence (see bind-view.ts).
 */
import type { ReferenceValue } from '../rulepack/types.js';
import type { Quantity } from '../types.js';
import { distance, type TermHits } from './bind-view.js';

/** Every `all` group has one of its terms in `hits`, and no `none` term is there. */
export function satisfies(r: ReferenceValue, hits: TermHits): boolean {
  return r.binding.all.every((group) => group.some((id) => hits.has(id))) && !r.binding.none.some((id) => hits.has(id));
}

/** The term ids of `hits` that serve one of the value's `all` groups. */
export function usedTerms(r: ReferenceValue, hits: TermHits): string[] {
  return [...new Set(r.binding.all.flat())].filter((id) => hits.has(id));
}

/** Sum over term groups of the distance from the quantity to the group's nearest term. */
export function nearness(r: ReferenceValue, hits: TermHits, q: Pick<Quantity, 'start' | 'end'>, breaks: number[]): number {
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
