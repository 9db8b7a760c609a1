/**
 * A range told for the span of a record, or for one of its ends. A value with `ends` is the span
 * of a record (the levels CO2 moved between over the glacial cycles); its ends are values of their
 * own (the glacial minimum, the interglacial maximum), and a sentence often names both ("over the
 * ice ages" is the cycles and the glacial periods alike). A range that reaches from the low end to
 * the high end states the span; one that stays by one end states that end's level.
 *
 *   "Over the ice ages CO2 stayed between 180 and 380 ppm"   → the span (checked end by end)
 *   "During the ice ages CO2 was between 180 and 200 ppm"    → the glacial minimum
 */
import { rangeEnds, type RangeEnds } from '../quantities/range-ends.js';
import type { LoadedPacks, ReferenceValue } from '../rulepack/types.js';
import type { Quantity } from '../types.js';

/** The interval every value of `ids` lies in, or undefined when none is loaded. */
export function hullOf(ids: readonly string[], packs: Pick<LoadedPacks, 'reference'>): [number, number] | undefined {
  const values = ids.flatMap((id) => packs.reference(id) ?? []);
  if (values.length === 0) return undefined;
  return [Math.min(...values.map((v) => v.low)), Math.max(...values.map((v) => v.high))];
}

/**
 * Whether a range reaches both ends of a span: its low end lies at or below the top of the low
 * end's values and its high end at or above the bottom of the high end's values.
 */
export function reachesBothEnds(span: ReferenceValue, ends: RangeEnds, packs: Pick<LoadedPacks, 'reference'>): boolean {
  const low = hullOf(span.ends?.low ?? [], packs);
  const high = hullOf(span.ends?.high ?? [], packs);
  return low !== undefined && high !== undefined && ends.low[0] <= low[1] && ends.high[1] >= high[0];
}

/**
 * A range something went to is a level reached, not a span: "sank to around 180–190 ppm", "fell to
 * between 180 and 200 ppm", "rose to 280–300 ppm" (common practice: "to" names where a change ends).
 */
const REACHED = /(?:^|[^\p{L}])to\s+(?:(?:between|around|about|roughly|some|near|approximately|~)\s+)*$/iu;

/**
 * Whether a range stays by one end of a span: it does not reach both ends, and it meets the values
 * of one of them ("between 180 and 220 ppm" by the glacial minimum). A range near neither end
 * ("between 180 and 300 parts per billion") is a span told wrong, not an end's level.
 */
export function staysByOneEnd(span: ReferenceValue, ends: RangeEnds, packs: Pick<LoadedPacks, 'reference'>): boolean {
  if (reachesBothEnds(span, ends, packs)) return false;
  const [low, high] = [ends.low[0], ends.high[1]];
  const meets = (hull: [number, number] | undefined) => hull !== undefined && low <= hull[1] && hull[0] <= high;
  return meets(hullOf(span.ends?.low ?? [], packs)) || meets(hullOf(span.ends?.high ?? [], packs));
}

/**
 * The candidates of a range quantity with a span and its ends sorted out: a range reached ("fell to
 * 180–190 ppm") binds no span; where a span value and one of its own ends both qualify, the end
 * values stay when the range stays by one end, and the span otherwise. Anything else is left as it is.
 */
export function spanOrEnds<T extends { r: ReferenceValue }>(scored: T[], q: Quantity, packs: Pick<LoadedPacks, 'reference'>, sentence: string): T[] {
  const spans = scored.filter(({ r }) => r.ends !== undefined);
  if (spans.length === 0) return scored;
  const ends = rangeEnds(q);
  if (ends === undefined) return scored;
  if (REACHED.test(sentence.slice(Math.max(0, q.start - 40), q.start))) return scored.filter(({ r }) => r.ends === undefined);
  let kept = scored;
  for (const { r: span } of spans) {
    const endIds = new Set([...(span.ends?.low ?? []), ...(span.ends?.high ?? [])]);
    if (!kept.some(({ r }) => endIds.has(r.id))) continue;
    kept = staysByOneEnd(span, ends, packs) ? kept.filter(({ r }) => r !== span) : kept.filter(({ r }) => !endIds.has(r.id));
  }
  return kept;
}
