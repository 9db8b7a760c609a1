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
import { findAtoms, type Atom } from './find-atoms.js';
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
  const [a, b] = findAtoms(q.text) as [Atom, Atom];
  const unit = q.statedUnit === '' ? q.unit : q.statedUnit;
  const canonical = (value: number): number | undefined => {
    try {
      return toCanonical(value, unit, q.dimension);
    } catch {
      return undefined;
    }
  };
  // Each end as written, with half a unit in its last place; canonical units may run the other way
  // (a calendar year against years before 1950), so the ends are ordered after conversion.
  const ends = [a, b].map((atom) => {
    const at = canonical(atom.value);
    const off = canonical(atom.value + atom.half);
    return at === undefined || off === undefined ? undefined : { at, half: Math.abs(off - at) };
  });
  const [first, second] = ends;
  let [low, high] = first === undefined || second === undefined ? [undefined, undefined] : first.at <= second.at ? [first, second] : [second, first];
  // A scale word written once ("7-8 thousand years") is not on the first figure: read the ends from the interval.
  if (low === undefined || high === undefined || low.at < q.low - 1e-9 || high.at > q.high + 1e-9) {
    const written = writtenInterval(q);
    [low, high] = [{ at: written.low, half: 0 }, { at: written.high, half: 0 }];
  }
  // The hedge widened the whole range; each end keeps its share of it.
  const slackLow = Math.max(0, low.at - q.low);
  const slackHigh = Math.max(0, q.high - high.at);
  return {
    low: [low.at - low.half - slackLow, low.at + low.half + slackLow],
    high: [high.at - high.half - slackHigh, high.at + high.half + slackHigh],
  };
}
