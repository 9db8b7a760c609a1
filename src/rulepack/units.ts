/**
 * The units a rule pack may state its values in, and how each converts to the canonical unit of its
 * dimension (see DIMENSIONS in src/types.ts). Written here because src/quantities had no unit table
 * yet when the pack loader was written; the two tables should agree, and a test checks the factors
 * against SI/NIST definitions.
 */
import { CANONICAL_UNIT } from '../quantities/unit-table.js';
import type { Dimension } from '../types.js';

/** One unit: canonical value = stated value * factor + offset. */
export interface UnitDef {
  dimension: Dimension;
  factor: number;
  offset: number;
  /** The word shown after a number in this unit, e.g. `years`, `ppm`, `°C`. */
  label: string;
}

const unit = (dimension: Dimension, factor: number, label: string, offset = 0): UnitDef => ({
  dimension,
  factor,
  offset,
  label,
});

/** Canonical unit of each dimension: the quantity reader's table, the one truth for both. */
export const CANONICAL_UNITS: Record<Dimension, string> = CANONICAL_UNIT;

/**
 * Unit names (as normalised by the quantity parser and as written in packs) to definitions.
 * Ages: BP counts years before AD 1950, b2k before AD 2000, so BP = b2k - 50 (Rasmussen et al. 2006,
 * GICC05; common practice). BCE: 1 BCE is 1950 years before 1950 (no year 0), so BP = BCE + 1949.
 * Temperature differences: 1 K = 1 degC = 1.8 degF (SI Brochure, 9th ed.; NIST SP 811 B.8).
 * Length: 1 ft = 0.3048 m exactly (NIST SP 811 B.8). 1 ppm = 1 ppmv for an ideal gas (NOAA GML).
 */
export const UNITS: Record<string, UnitDef> = {
  yr: unit('duration', 1, 'years'),
  years: unit('duration', 1, 'years'),
  kyr: unit('duration', 1e3, 'kyr'),
  Myr: unit('duration', 1e6, 'Myr'),
  'yr BP': unit('age', 1, 'years ago'),
  BP: unit('age', 1, 'years BP'),
  ka: unit('age', 1e3, 'ka'),
  'ka BP': unit('age', 1e3, 'ka'),
  Ma: unit('age', 1e6, 'Ma'),
  'yr b2k': unit('age', 1, 'years b2k', -50),
  b2k: unit('age', 1, 'years b2k', -50),
  'ka b2k': unit('age', 1e3, 'ka b2k', -50),
  BCE: unit('age', 1, 'BCE', 1949),
  ppm: unit('concentration', 1, 'ppm'),
  ppmv: unit('concentration', 1, 'ppmv'),
  K: unit('temperature-change', 1, '°C'),
  degC: unit('temperature', 1, '°C'),
  'degC-change': unit('temperature-change', 1, '°C'),
  'degF-change': unit('temperature-change', 1 / 1.8, '°F'),
  m: unit('length', 1, 'metres'),
  km: unit('length', 1e3, 'km'),
  ft: unit('length', 0.3048, 'feet'),
  'ppm/yr': unit('concentration-rate', 1, 'ppm per year'),
  'ppm/kyr': unit('concentration-rate', 1e-3, 'ppm per thousand years'),
  'ppm/century': unit('concentration-rate', 1e-2, 'ppm per century'),
  'K/yr': unit('temperature-rate', 1, '°C per year'),
  'K/kyr': unit('temperature-rate', 1e-3, '°C per thousand years'),
  count: unit('count', 1, ''),
  cycles: unit('count', 1, 'cycles'),
  ratio: unit('ratio', 1, 'times'),
  '%': unit('percent', 1, '%'),
  number: unit('number', 1, ''),
};

/** The definition of a unit name, or undefined when the name is not in the table. */
export function unitDef(name: string): UnitDef | undefined {
  return Object.hasOwn(UNITS, name) ? UNITS[name] : undefined;
}

/** A value stated in `name` converted to its dimension's canonical unit. */
export function toCanonical(value: number, name: string): number {
  const def = unitDef(name);
  if (def === undefined) throw new Error(`unknown unit ${name}`);
  return value * def.factor + def.offset;
}

/** A canonical value converted back to `name` (the inverse of toCanonical). */
export function fromCanonical(value: number, name: string): number {
  const def = unitDef(name);
  if (def === undefined) throw new Error(`unknown unit ${name}`);
  return (value - def.offset) / def.factor;
}
