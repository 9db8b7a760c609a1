/**
 * A reference value's range in words and digits, in the pack's canonical unit or in another unit
 * of the same dimension: `790,000–810,000 years`, `3,623 metres`.
 */
import type { ReferenceValue } from './types.js';
import { fromCanonical, unitDef } from './units.js';

/** A number with thousands separators and at most `digits` decimals, trailing zeros dropped. */
export function formatNumber(value: number, digits = 3): string {
  const rounded = Number(value.toFixed(digits));
  return rounded.toLocaleString('en-US', { maximumFractionDigits: digits });
}

/** The unit word shown after a number (`years`, `ppm`, `°C`), or the unit name itself. */
export function unitLabel(unit: string): string {
  return unitDef(unit)?.label ?? unit;
}

/** `low–high unit` (or `value unit` when they are equal) with bounds shown in `unit`. */
export function formatRange(low: number, high: number, unit: string): string {
  const [a, b] = [fromCanonical(low, unit), fromCanonical(high, unit)].sort((x, y) => x - y) as [number, number];
  const label = unitLabel(unit);
  const digits = Math.abs(b - a) > 0 && Math.abs(b - a) < 1 ? 3 : 2;
  const text = a === b ? formatNumber(a, digits) : `${formatNumber(a, digits)}–${formatNumber(b, digits)}`;
  return label === '' ? text : `${text} ${label}`;
}

/** The value's range in its canonical unit. */
export function describeRange(r: ReferenceValue): string {
  return formatRange(r.low, r.high, r.unit);
}

/** A phrase to use mid-sentence: first letter lower-cased unless the word is an acronym (CO2, EPICA). */
export function midSentence(text: string): string {
  return /^\p{Lu}\p{Ll}/u.test(text) ? `${text.charAt(0).toLowerCase()}${text.slice(1)}` : text;
}
