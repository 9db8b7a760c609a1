/**
 * How far off a conflicting value is, as a level floor: a value off by a factor of 2 or more is an
 * error, one off by a factor of 1.25 or more at least a warning, whatever a pack's `levels` say.
 * A pack's `levels` steps (over the relative distance) still set the level of near misses, and may
 * raise a level, never lower it below this floor. The rule is documented in docs/rule-packs.md.
 *
 *   factorOff(25, 25, { low: 180, high: 210 }) === 7.2  → error, even under `levels: { note: 0 }`
 *   factorOff(0.3, 0.3, { low: 0.4, high: 1.0 }) === 1.33… → at least a warning
 */
import { LEVELS, type Level } from '../types.js';

/** Factor steps: the least level for a value at least this many times off. Most severe first. */
export const FACTOR_FLOORS: readonly { factor: number; level: Level }[] = [
  { factor: 2, level: 'error' },
  { factor: 1.25, level: 'warning' },
];

/**
 * How many times off the claim `[low, high]` is from the reference range: the ratio of the nearer
 * ends, 1 when they overlap. Only defined for ranges on one side of zero; 1 otherwise (a sign
 * change, like a temperature change given as a rise instead of a fall, is judged by distance).
 */
export function factorOff(low: number, high: number, r: { low: number; high: number }): number {
  const positive = low > 0 && r.low > 0;
  const negative = high < 0 && r.high < 0;
  if (!positive && !negative) return 1;
  const [a, b, c, d] = negative ? [-high, -low, -r.high, -r.low] : [low, high, r.low, r.high];
  if (a > d) return a / d;
  if (c > b) return c / b;
  return 1;
}

/** The more severe of `level` and the floor for a claim `factor` times off; undefined stays undefined only when no floor applies. */
export function levelWithDistance(level: Level | undefined, factor: number): Level | undefined {
  const floor = FACTOR_FLOORS.find((f) => factor >= f.factor)?.level;
  if (floor === undefined) return level;
  if (level === undefined) return floor;
  return LEVELS.indexOf(floor) < LEVELS.indexOf(level) ? floor : level;
}
