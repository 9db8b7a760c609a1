/**
 * Reference ranges and corrections in the draft's own unit: a draft that writes "400 kyr" is shown
 * "790–810 kyr", one that writes "°F" sees degrees Fahrenheit. Falls back to the canonical unit when
 * the draft's unit is not in the unit table.
 */
import { formatAmount } from '../format/value.js';
import { formatRange } from '../rulepack/describe-range.js';
import type { ReferenceValue } from '../rulepack/types.js';
import { CANONICAL_UNITS, fromCanonical, unitDef } from '../rulepack/units.js';
import type { Quantity, ShownValue } from '../types.js';

/** The unit to show values in for this quantity: its stated unit when known, else the canonical. */
export function displayUnit(q: Quantity): string {
  const stated = q.statedUnit.replace(/^°/u, 'deg');
  for (const name of [stated, `${stated}-change`]) {
    if (name !== '' && unitDef(name)?.dimension === q.dimension) return name;
  }
  return CANONICAL_UNITS[q.dimension];
}

/** The reference range as shown beside a claim, in the claim's unit. */
export function shownReference(r: ReferenceValue, q: Quantity): ShownValue & { id: string; measures: string; asOf?: string } {
  const unit = displayUnit(q);
  const [low, high] = [fromCanonical(r.low, unit), fromCanonical(r.high, unit)].sort((a, b) => a - b) as [number, number];
  return {
    id: r.id, measures: r.measures, text: rangeIn(r, unit), low, high, unit,
    ...(r.asOf === undefined ? {} : { asOf: r.asOf }),
  };
}

/**
 * A reference's range in words, per reference and unit: the same few hundred texts are shown
 * beside every claim bound to a reference, and each was formatted anew per claim (the ICU number
 * formatter, some 1 percent of a run over on-topic prose in a CPU profile).
 */
const ranges = new WeakMap<ReferenceValue, Map<string, string>>();

function rangeIn(r: ReferenceValue, unit: string): string {
  let byUnit = ranges.get(r);
  if (byUnit === undefined) {
    byUnit = new Map();
    ranges.set(r, byUnit);
  }
  let text = byUnit.get(unit);
  if (text === undefined) {
    text = formatRange(r.low, r.high, unit);
    byUnit.set(unit, text);
  }
  return text;
}

/** The claim as shown: its own words, with its interval in its own unit. */
export function shownClaim(q: Quantity): ShownValue {
  const unit = displayUnit(q);
  const [low, high] = [fromCanonical(q.low, unit), fromCanonical(q.high, unit)].sort((a, b) => a - b) as [number, number];
  return { text: q.text, low, high, unit };
}

/**
 * The correction for a claim: the pack's wording when the draft's unit equals the canonical one
 * (years, ppm, °C as a difference...), else the central value (or the range) restated in the draft's unit.
 */
export function correctionFor(r: ReferenceValue, q: Quantity): string {
  const unit = displayUnit(q);
  const def = unitDef(unit);
  if (def === undefined || (def.factor === 1 && def.offset === 0)) return r.wording;
  if (r.central === undefined) return formatRange(r.low, r.high, unit);
  // Four significant digits: a correction restates a reference value, it does not add precision.
  const shown = Number(fromCanonical(r.central, unit).toPrecision(4));
  // A length measured to the metre that the draft's larger unit turns into a decimal ("3.623 km" of
  // 3,623 m, "3.27 km" of 3,270 m) is rounded as an editor would write it, with the figure as the
  // source gives it beside it: "about 3.6 km (3,623 metres)".
  if (q.dimension === 'length' && Number.isInteger(r.central) && Math.abs(r.central) >= 1000 && decimalPlaces(shown) >= 2) return `about ${formatAmount(Number(shown.toPrecision(2)), unit)} (${r.wording})`;
  return `about ${formatAmount(shown, unit)}`;
}

/** How many digits a number has after its decimal point. */
function decimalPlaces(n: number): number {
  const text = String(n);
  const point = text.indexOf('.');
  return point < 0 || text.includes('e') ? 0 : text.length - point - 1;
}
