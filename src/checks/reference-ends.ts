/**
 * A range told for the span of a record, checked end by end. A value with `ends` (the levels CO2
 * moved between over the glacial cycles) names the values at its low end (the glacial minimum, the
 * lowest level) and at its high end (the interglacial maximum, the highest level). Overlap is no
 * test for a span: "between 180 and 380 ppm" overlaps 172–300 ppm, yet its high end is some 80 ppm
 * above any interglacial. So the claim's low end must meet the low values and its high end the high
 * values, and a flag names both published ends.
 *
 *   "between 180 and 380 ppm" against 172–200 | 240–300 → the high end is off; correction names both
 *   "between about 180 and 280 ppm"                     → agrees
 */
import { hullOf } from '../claims/bind-span.js';
import { formatAmount } from '../format/value.js';
import { fromCanonical } from '../rulepack/units.js';
import { rangeEnds, type RangeEnds } from '../quantities/range-ends.js';
import { formatRange, midSentence } from '../rulepack/describe-range.js';
import { levelAt } from '../rulepack/resolve-reference.js';
import type { LoadedPacks, ReferenceValue } from '../rulepack/types.js';
import { LEVELS, type FlagDraft, type Level, type Quantity } from '../types.js';
import { factorOff, levelWithDistance } from './distance-level.js';
import { correctionFor, displayUnit, shownClaim, shownReference } from './reference-format.js';

/** How a range claim fares against a span, end by end. */
export interface EndsVerdict {
  agrees: boolean;
  /** The flag of a claim with an end off (absent when it agrees or no level applies). */
  flag?: FlagDraft;
}

/** The distance of `[low, high]` from `[a, b]`, relative to the larger of |a|, |b| and b − a. */
function distanceFrom([low, high]: [number, number], [a, b]: [number, number]): number {
  const gap = Math.max(a - high, low - b, 0);
  if (gap === 0) return 0;
  const scale = Math.max(Math.abs(a), Math.abs(b), b - a);
  return scale === 0 ? Infinity : gap / scale;
}

/**
 * The end-by-end verdict of `q` against the span `r`, or undefined when the check does not apply
 * (the value is no span, the quantity states one figure, or an end's values are not loaded).
 */
export function checkEnds(r: ReferenceValue, q: Quantity, packs: LoadedPacks, side?: 'low' | 'high'): EndsVerdict | undefined {
  if (r.ends === undefined) return undefined;
  // One end of "from 120 to 300 ppm" written as two figures is that end alone.
  const ends: Partial<RangeEnds> | undefined = side === undefined ? rangeEnds(q) : { [side]: [q.low, q.high] };
  const lowHull = hullOf(r.ends.low, packs);
  const highHull = hullOf(r.ends.high, packs);
  if (ends === undefined || lowHull === undefined || highHull === undefined) return undefined;
  const sides = [
    { side: 'low', claimed: ends.low, hull: lowHull, ids: r.ends.low },
    { side: 'high', claimed: ends.high, hull: highHull, ids: r.ends.high },
  ].flatMap((s) => (s.claimed === undefined ? [] : [{ ...s, claimed: s.claimed, distance: distanceFrom(s.claimed, s.hull), factor: factorOff(s.claimed[0], s.claimed[1], { low: s.hull[0], high: s.hull[1] }) }]));
  const off = sides.filter((s) => s.distance > 0);
  if (off.length === 0) return { agrees: true };
  const level = off
    .map((s) => levelWithDistance(levelAt(r.levels, s.distance), s.factor))
    .reduce((worst, l) => (l === undefined ? worst : worst === undefined || rank(l) > rank(worst) ? l : worst), undefined as Level | undefined);
  if (level === undefined) return { agrees: false };
  const unit = displayUnit(q);
  const endWords = [{ side: 'low', hull: lowHull, ids: r.ends.low }, { side: 'high', hull: highHull, ids: r.ends.high }].map((s) => `${formatRange(s.hull[0], s.hull[1], unit)} at the ${s.side} end (the ${midSentence(endName(s.ids, packs), packs)})`);
  const offWords = off.map((s) => `its ${s.side} end, ${formatAmount(fromCanonical((s.claimed[0] + s.claimed[1]) / 2, unit), unit)}, lies outside ${formatRange(s.hull[0], s.hull[1], unit)}`);
  return {
    agrees: false,
    flag: {
      ruleId: `value.${r.id}`,
      level,
      start: q.start,
      end: q.end,
      reason: `The draft gives ${q.text} ${side === undefined ? 'for' : `as the ${side} end of`} the ${midSentence(r.measures, packs)}, a span checked end by end: ${offWords.join(', and ')}. The sources give ${endWords.join(' and ')}.`,
      claimed: shownClaim(q),
      reference: shownReference(r, q),
      correction: correctionFor(r, q),
      // The span cites what its ends rest on (the pack keeps them together), like every value flag.
      sources: r.sources,
    },
  };
}

/** Higher is more severe (LEVELS runs from the most severe). */
function rank(level: Level): number {
  return -LEVELS.indexOf(level);
}

/** What the first loaded value of an end measures. */
function endName(ids: readonly string[], packs: LoadedPacks): string {
  for (const id of ids) {
    const v = packs.reference(id);
    if (v !== undefined) return v.measures;
  }
  return ids.join(', ');
}
