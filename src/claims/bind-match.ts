/**
 * Whether a reference value's terms are present for a quantity, and how near they stand to it.
 * Both read one quantity's view of the sentence (see bind-view.ts).
 */
import type { ReferenceValue } from '../rulepack/types.js';
import type { Quantity } from '../types.js';
import { distance, type TermHits } from './bind-view.js';

/**
 * Vague words that give an order of magnitude rather than a figure: "a few centuries", "a couple of
 * centuries", "several
 * thousand years", "tens of thousands of years". Such a phrase often times something other than the
 * value its subject words name ("rising within a few centuries of each other" is a lag, not the
 * length of the rise), so it speaks of a value only when it could state that value's range.
 */
const VAGUE = /(?:^|[^\p{L}])(?:a\s+few|several|(?:tens|hundreds|thousands|millions|dozens)\s+of|a\s+couple(?:\s+of)?(?=\s+(?:centur|millenni|decade|years?|thousand|hundred)))(?![\p{L}])/iu;

/**
 * Whether `q` could state the value: any figure can; a vague phrase, or a calendar year ("in 1998",
 * "AD 2000": the date of a drilling season or a paper, not an age of the ice), only a range its
 * interval meets.
 */
export function canState(r: Pick<ReferenceValue, 'low' | 'high'>, q: Pick<Quantity, 'text' | 'low' | 'high'> & { statedUnit?: string }): boolean {
  const loose = VAGUE.test(q.text) || q.statedUnit === 'CE';
  return !loose || (q.low <= r.high && r.low <= q.high);
}

/** Every `all` group has one of its terms in `hits`, and no `none` term is in `vetoes` (by default the same hits). */
export function satisfies(r: ReferenceValue, hits: TermHits, vetoes: TermHits = hits): boolean {
  return r.binding.all.every((group) => group.some((id) => hits.has(id))) && !r.binding.none.some((id) => vetoes.has(id));
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
