/**
 * One reference value from its written form to its loaded form: unit checked and converted to the
 * canonical unit of its dimension, bounds checked, term and source ids resolved.
 */
import type { Level } from '../types.js';
import type { RawReferenceValue } from './raw-pack.js';
import type { PackScope } from './resolve-pack.js';
import type { LevelSteps, ReferenceValue } from './types.js';
import { CANONICAL_UNITS, UNITS, toCanonical, unitDef } from './units.js';

/**
 * How the level grows when a value states no `levels`: any claim outside the range is a warning,
 * one further out than a tenth of the range's magnitude is an error.
 */
export const DEFAULT_LEVELS: LevelSteps = { warning: 0, error: 0.1 };

/** The loaded value, or undefined after reporting its mistakes into `scope.errors`. */
export function resolveReference(scope: PackScope, raw: RawReferenceValue, path: (string | number)[]): ReferenceValue | undefined {
  const before = scope.errors.length;
  const at = (key: string | number, ...rest: (string | number)[]) => [...path, key, ...rest];
  const def = unitDef(raw.unit);
  if (def === undefined) {
    scope.errors.push(scope.yaml.errorAt('pack-unknown-unit', at('unit'), `unknown unit \`${raw.unit}\`; use one of: ${Object.keys(UNITS).join(', ')}`));
  }
  if (raw.low > raw.high) {
    scope.errors.push(scope.yaml.errorAt('pack-interval', at('low'), `low (${raw.low}) is greater than high (${raw.high}); swap them`));
  } else if (raw.central !== undefined && (raw.central < raw.low || raw.central > raw.high)) {
    scope.errors.push(scope.yaml.errorAt('pack-interval', at('central'), `central (${raw.central}) lies outside low..high (${raw.low}..${raw.high})`));
  }
  raw.binds_when.all.forEach((group, g) => group.forEach((id, i) => checkTerm(scope, id, at('binds_when', 'all', g, i))));
  (raw.binds_when.none ?? []).forEach((id, i) => checkTerm(scope, id, at('binds_when', 'none', i)));
  (raw.binds_when.default_setting ?? []).forEach((id, i) => checkTerm(scope, id, at('binds_when', 'default_setting', i)));
  const sources = scope.sourcesAt(raw.sources, at('sources'));
  if (def === undefined || scope.errors.length > before) return undefined;

  const convert = (v: number) => toCanonical(v, raw.unit);
  const [low, high] = [convert(raw.low), convert(raw.high)].sort((a, b) => a - b) as [number, number];
  const dimensions = [def.dimension, ...(raw.also_as ?? []).filter((d) => d !== def.dimension)];
  return {
    id: raw.id,
    measures: raw.measures,
    dimension: def.dimension,
    dimensions,
    low,
    high,
    unit: CANONICAL_UNITS[def.dimension],
    binding: {
      all: raw.binds_when.all,
      none: raw.binds_when.none ?? [],
      ...(raw.binds_when.role === undefined || raw.binds_when.role === 'any' ? {} : { role: raw.binds_when.role }),
      ...(raw.binds_when.implied === false ? { implied: false as const } : {}),
      ...(raw.binds_when.default_setting === undefined ? {} : { defaultSetting: raw.binds_when.default_setting }),
    },
    wording: raw.correction,
    levels: raw.levels ?? DEFAULT_LEVELS,
    sources,
    ...(raw.central === undefined ? {} : { central: convert(raw.central) }),
    ...(raw.as_of === undefined ? {} : { asOf: raw.as_of }),
    ...(raw.review_by === undefined ? {} : { reviewBy: raw.review_by }),
    ...(raw.superseded_by === undefined ? {} : { supersededBy: raw.superseded_by }),
    ...(raw.regional_version_of === undefined ? {} : { regionalVersionOf: raw.regional_version_of }),
    ...(raw.ends === undefined ? {} : { ends: { low: [raw.ends.low].flat(), high: [raw.ends.high].flat() } }),
    ...(raw.notes === undefined ? {} : { notes: raw.notes }),
  };
}

function checkTerm(scope: PackScope, id: string, path: (string | number)[]): void {
  if (!scope.terms.has(id)) scope.errors.push(scope.yaml.errorAt('pack-unknown-term', path, `unknown term id \`${id}\`; add it under \`terms\``));
}

/** The level for a claim at relative distance `distance` outside the range (undefined: none applies). */
export function levelAt(levels: LevelSteps, distance: number): Level | undefined {
  let chosen: { level: Level; step: number } | undefined;
  for (const [level, step] of Object.entries(levels) as [Level, number][]) {
    if (distance >= step && (chosen === undefined || step > chosen.step)) chosen = { level, step };
  }
  return chosen?.level;
}
