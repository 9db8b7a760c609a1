/**
 * The two ends of a quantity that states a range, each as an interval of its own, in the
 * quantity's canonical unit. A range claim about the span of a record ("CO2 moved between 180 and
 * 300 ppm over the ice ages") is checked end by end, so each end needs the slack a single figure
 * would have: half a unit in its last written place, and its share of the hedge.
 *   "between about 180 and 280 ppm" → low end 170.5–189.5, high end 270.5–289.5
 *    (180 and 280 are read to their second digit, ±5; "about" adds 2.5% of the midpoint, 5.75)
 *   "280 ± 10 ppm", "about 280 ppm" → undefined (one figure, not two ends)
 */
import type { Quantity } from '../types.js';
import { toCanonical } from './convert.js';
import { findAtoms } from './find-atoms.js';
import { writtenInterval } from './written-interval.js';

/** The low and high end of a stated range, each [low, high] in the canonical unit. */
export interface RangeEnds {
  low: [number, number];
  high: [number, number];
}

/** "280 ± 10", "280 +/- 10", "280 plus or minus 10": a figure and its uncertainty, not a range. */
const PLUS_MINUS = /±|\+\/-|\+-|plus\s+or\s+minus/iu;

/** Whether `q` states a range with two written ends ("between 180 and 300 ppm", "180–300 ppm"). */
export function statesRange(q: Pick<Quantity, 'text'>): boolean {
  const atoms = findAtoms(q.text);
  if (atoms.length !== 2) return false;
  const [a, b] = atoms as [(typeof atoms)[0], (typeof atoms)[0]];
  if (a.form === 'vague' || a.form === 'multiplier' || b.form === 'vague' || b.form === 'multiplier') return false;
  return !PLUS_MINUS.test(q.text.slice(a.end, b.start));
}

/** The ends of a stated range, or undefined when `q` is one figure. */
export function rangeEnds(q: Quantity): RangeEnds | undefined {
  if (!statesRange(q)) return undefined;
  const atoms = findAtoms(q.text);
  const unit = q.statedUnit === '' ? q.unit : q.statedUnit;
  const half = (value: number, h: number): number => {
    try {
      return Math.abs(toCanonical(value + h, unit, q.dimension) - toCanonical(value, unit, q.dimension));
    } catch {
      return 0;
    }
  };
  const [a, b] = atoms as [(typeof atoms)[0], (typeof atoms)[0]];
  const halves = [half(a.value, a.half), half(b.value, b.half)];
  // Canonical units may run the other way (a calendar year against years before 1950): order by value.
  const written = writtenInterval(q);
  const aCanonical = Math.abs(written.low - safeCanonical(a.value, unit, q)) <= Math.abs(written.high - safeCanonical(a.value, unit, q));
  const [lowHalf, highHalf] = (aCanonical ? halves : [...halves].reverse()) as [number, number];
  // The hedge widened the whole range; each end keeps its share of it.
  const slackLow = Math.max(0, written.low - q.low);
  const slackHigh = Math.max(0, q.high - written.high);
  return {
    low: [written.low - lowHalf - slackLow, written.low + lowHalf + slackLow],
    high: [written.high - highHalf - slackHigh, written.high + highHalf + slackHigh],
  };
}

function safeCanonical(value: number, unit: string, q: Quantity): number {
  try {
    return toCanonical(value, unit, q.dimension);
  } catch {
    return value;
  }
}
