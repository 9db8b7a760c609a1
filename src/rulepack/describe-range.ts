/**
 * A reference value's range in words and digits, in the pack's canonical unit or in another unit
 * of the same dimension: `790,000–810,000 years`, `3,623 metres`. The numbers and words come from
 * the one formatter all reports share (src/format/value.ts).
 */
import { formatNumber, formatRange as formatShownRange, unitWord } from '../format/value.js';
import type { ReferenceValue } from './types.js';
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

/** A phrase to use mid-sentence: first letter lower-cased unless the word is an acronym (CO2, EPICA). */
export function midSentence(text: string): string {
  return /^\p{Lu}\p{Ll}/u.test(text) ? `${text.charAt(0).toLowerCase()}${text.slice(1)}` : text;
}
