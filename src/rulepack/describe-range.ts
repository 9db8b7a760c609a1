/**
 * A reference value's range in words and digits, in the pack's canonical unit or in another unit
 * of the same dimension: `790,000–810,000 years`, `3,623 metres`. The numbers and words come from
 * the one formatter all reports share (src/format/value.ts).
 */
import { formatNumber, formatRange as formatShownRange, unitWord } from '../format/value.js';
import type { ReferenceValue, Term } from './types.js';
import { fromCanonical } from './units.js';

export { formatNumber };

/** The unit word shown after a number (`years`, `ppm`, `°C`), or the unit name itself. */
export function unitLabel(unit: string): string {
  return unitWord(unit);
}

/** `low–high unit` (or `value unit` when they are equal) for canonical bounds shown in `unit`. */
export function formatRange(low: number, high: number, unit: string): string {
  return formatShownRange(fromCanonical(low, unit), fromCanonical(high, unit), unit);
}

/** The value's range in its canonical unit. */
export function describeRange(r: ReferenceValue): string {
  return formatRange(r.low, r.high, r.unit);
}

const NAMES = new WeakMap<{ terms: readonly Term[] }, Set<string>>();

/** The capitalised words of the packs' terms ("Antarctic", "Greenland", "Vostok"): names that keep their capital. */
function properNames(packs: { terms: readonly Term[] }): Set<string> {
  let names = NAMES.get(packs);
  if (names === undefined) {
    names = new Set(packs.terms.flatMap((t) => t.words.flatMap((w) => w.split(/\s+/u))).filter((w) => /^\p{Lu}\p{Ll}/u.test(w)));
    NAMES.set(packs, names);
  }
  return names;
}

/**
 * A phrase to use mid-sentence: first letter lower-cased unless the word is an acronym (CO2, EPICA),
 * a name in the packs' terms ("Antarctic warming"), or the start of a name of two capitalised words
 * ("Mauna Loa", "East Antarctic").
 */
export function midSentence(text: string, packs?: { terms: readonly Term[] }): string {
  const [first = '', second = ''] = text.split(/\s+/u);
  if (!/^\p{Lu}(?:\p{Ll}|$)/u.test(first) || /^\p{Lu}\p{Ll}/u.test(second)) return text;
  if (packs !== undefined && properNames(packs).has(first)) return text;
  return `${text.charAt(0).toLowerCase()}${text.slice(1)}`;
}
