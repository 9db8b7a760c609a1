/**
 * The time an amount took: "10 to 15 ppm in under two centuries", "about 8 °C within a few thousand
 * years". A stretch of time told with "in" or "within" right after an amount of another dimension
 * says how long that amount of change took; it measures the amount's change, not the period the
 * sentence names around it ("during the deglaciation"). So the words the amount's unit names (the
 * gas for ppm, temperature for °C: the pack term's `units`) are the time's words too, and the values
 * that veto them (the length of the whole deglaciation vetoes the gas) do not bind it.
 */
import type { LoadedPacks } from '../rulepack/types.js';
import type { Quantity } from '../types.js';
import type { TermHits } from './bind-view.js';

/** What may stand between the amount and its time: "in", "within", with a word of smallness ("in just"). */
const AMOUNT_TIME_JOIN = /^[\s\u00A0]*(?:in|within)(?:[\s\u00A0]+(?:just|only|barely))?[\s\u00A0]*$/iu;

/** Per quantity index: the index of the amount whose time it is, for every time told right after an amount. */
export function amountTimes(sentence: string, quantities: readonly Quantity[]): Map<number, number> {
  const found = new Map<number, number>();
  quantities.forEach((q, i) => {
    const amount = quantities[i - 1];
    if (q.dimension !== 'duration' || amount === undefined || amount.dimension === 'duration' || amount.dimension === 'age') return;
    if (AMOUNT_TIME_JOIN.test(sentence.slice(amount.end, q.start))) found.set(i, i - 1);
  });
  return found;
}

/**
 * Gives each time an amount took the words of its amount: what the amount's own words name ("some
 * steps of 10-15 ppm": the steps) and the terms its unit names (ppm: the gas), where the time lacks them.
 */
export function withAmountWords(sentence: string, quantities: readonly Quantity[], views: TermHits[], packs: LoadedPacks): void {
  for (const [i, a] of amountTimes(sentence, quantities)) {
    const amount = quantities[a] as Quantity;
    const view = views[i];
    if (view === undefined) continue;
    for (const [id, spans] of views[a] ?? new Map<string, [number, number][]>()) if (!view.has(id)) view.set(id, spans);
    for (const term of packs.terms) {
      if (term.units?.includes(amount.statedUnit) !== true || view.has(term.id)) continue;
      view.set(term.id, [[amount.start, amount.end]]);
    }
  }
}
