/**
 * How serious a contradiction is, in one table shared by the arithmetic and unit checks. Two
 * intervals conflict only when they are disjoint; the level then grows with the gap between them.
 */
import type { Level } from '../types.js';

/** A closed interval. */
export interface Interval {
  low: number;
  high: number;
}

/** One row: a level and the test on (gap, sum of the two widths) that earns it. Tried in order. */
export interface LevelRule {
  level: Level;
  when: string;
  test: (gap: number, widths: number) => boolean;
}

/** The level table. */
export const LEVEL_RULES: readonly LevelRule[] = [
  { level: 'error', when: 'the intervals are disjoint by more than their two widths together', test: (gap, widths) => gap > widths },
  { level: 'warning', when: 'the intervals are disjoint by less than that', test: () => true },
];

/** The distance between two intervals; 0 or less when they overlap. */
export function gapBetween(a: Interval, b: Interval): number {
  return Math.max(a.low - b.high, b.low - a.high);
}

/** A tiny slack for floating-point noise in conversions (0.3048 × 3.2808... is not exactly 1). */
const EPSILON = 1e-9;

/** True when the intervals share no point (beyond rounding noise). */
export function disjoint(a: Interval, b: Interval): boolean {
  const scale = Math.max(1, Math.abs(a.low), Math.abs(a.high), Math.abs(b.low), Math.abs(b.high));
  return gapBetween(a, b) > EPSILON * scale;
}

/** The level for a conflict between a stated and a computed interval (call only when disjoint). */
export function levelFor(stated: Interval, computed: Interval): Level {
  const gap = gapBetween(stated, computed);
  const widths = stated.high - stated.low + (computed.high - computed.low);
  return (LEVEL_RULES.find((r) => r.test(gap, widths)) ?? LEVEL_RULES[LEVEL_RULES.length - 1])?.level ?? 'warning';
}
