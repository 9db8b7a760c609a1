/**
 * A figure given for one calendar year ("In 2023 the global average was around 410 ppm") states a
 * measurement of that year, which the sources know to a fraction of a unit and which moves by about
 * half a percent a year. An approximation word then widens the figure as written by at most half a
 * percent, not the 2.5% of the interval table: "around 410 ppm" for 2023 is 403-417 ppm, two years
 * short of the 419 ppm measured, where "about 420 ppm" still agrees.
 *
 * A value is such a measurement when one of its binding groups holds only terms whose words are all
 * one four-digit year ("2023"); a decade ("the 2010s") or a span is not one year.
 */
import type { LoadedPacks, ReferenceValue } from '../rulepack/types.js';
import type { Quantity } from '../types.js';
import { hedgeRule } from '../quantities/interval-rules.js';
import { writtenInterval } from '../quantities/written-interval.js';

/** The widest an approximation may make a figure for one year's measurement, as a share of the figure. */
export const ONE_YEAR_SLACK = 0.005;
const YEAR = /^\d{4}$/u;
const byPacks = new WeakMap<LoadedPacks, Map<string, boolean>>();

/** Whether `r` is bound by one calendar year. */
export function isOneYearMeasurement(r: ReferenceValue, packs: LoadedPacks): boolean {
  let known = byPacks.get(packs);
  if (known === undefined) {
    known = new Map();
    byPacks.set(packs, known);
  }
  let found = known.get(r.id);
  if (found === undefined) {
    const isYear = (id: string): boolean => {
      const words = packs.term(id)?.words ?? [];
      return words.length > 0 && words.every((w) => YEAR.test(w.trim()));
    };
    found = r.binding.all.some((group) => group.length > 0 && group.every(isYear));
    known.set(r.id, found);
  }
  return found;
}

/** The interval `q` states for one year's measurement: an approximation narrowed to half a percent. */
export function oneYearInterval(q: Quantity): { low: number; high: number } {
  const rule = q.hedge === undefined ? undefined : hedgeRule(q.hedge);
  if (rule === undefined || rule.id !== 'about') return { low: q.low, high: q.high };
  const written = writtenInterval(q);
  const slack = ONE_YEAR_SLACK * Math.abs(written.value);
  return { low: Math.max(q.low, written.low - slack), high: Math.min(q.high, written.high + slack) };
}
