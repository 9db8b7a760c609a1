/**
 * The units a rule pack may state its values in, and how each converts to the canonical unit of its
 * dimension (see DIMENSIONS in src/types.ts): names and display words here, factors and offsets from
 * the quantity reader's unit table, so a pack and a draft always convert alike.
 */
import { findUnit } from '../quantities/convert.js';
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

/** Canonical unit of each dimension: the quantity reader's table, the one truth for both. */
export const CANONICAL_UNITS: Record<Dimension, string> = CANONICAL_UNIT;

/**
 * Unit names a pack may use, each an alias of a unit of the quantity reader's table (src/quantities/
 * unit-table.ts: one truth for factors and offsets, checked there against NIST SP 811 and the BP/b2k
 * definitions) with the word shown after a number. A name missing from that table fails at load,
 * so the two can never disagree.
 */
const PACK_UNITS: Record<string, [id: string, dimension: Dimension, label: string]> = {
  yr: ['yr', 'duration', 'years'],
  years: ['yr', 'duration', 'years'],
  kyr: ['kyr', 'duration', 'kyr'],
  Myr: ['Myr', 'duration', 'Myr'],
  'yr BP': ['yr BP', 'age', 'years ago'],
  BP: ['yr BP', 'age', 'years BP'],
  ka: ['ka', 'age', 'ka'],
  'ka BP': ['ka', 'age', 'ka'],
  Ma: ['Ma', 'age', 'Ma'],
  'yr b2k': ['yr b2k', 'age', 'years b2k'],
  b2k: ['yr b2k', 'age', 'years b2k'],
  'ka b2k': ['ka b2k', 'age', 'ka b2k'],
  BCE: ['BCE', 'age', 'BCE'],
  CE: ['CE', 'age', 'CE'],
  ppm: ['ppm', 'concentration', 'ppm'],
  ppmv: ['ppm', 'concentration', 'ppmv'],
  K: ['K', 'temperature-change', '°C'],
  degC: ['degC', 'temperature', '°C'],
  'degC-change': ['degC', 'temperature-change', '°C'],
  'degF-change': ['degF', 'temperature-change', '°F'],
  m: ['m', 'length', 'metres'],
  km: ['km', 'length', 'km'],
  ft: ['ft', 'length', 'feet'],
  'ppm/yr': ['ppm/yr', 'concentration-rate', 'ppm per year'],
  'ppm/kyr': ['ppm/kyr', 'concentration-rate', 'ppm per thousand years'],
  'ppm/century': ['ppm/century', 'concentration-rate', 'ppm per century'],
  'K/yr': ['K/yr', 'temperature-rate', '°C per year'],
  'K/kyr': ['K/kyr', 'temperature-rate', '°C per thousand years'],
  'm/yr': ['m/yr', 'length-rate', 'm per year'],
  'mm/yr': ['mm/yr', 'length-rate', 'mm per year'],
  'm/century': ['m/century', 'length-rate', 'm per century'],
  'yr/m': ['yr/m', 'duration-per-length', 'years per metre'],
  count: ['count', 'count', ''],
  cycles: ['count', 'count', 'cycles'],
  ratio: ['ratio', 'ratio', 'times'],
  '%': ['%', 'percent', '%'],
  number: ['number', 'number', ''],
};

/** Unit names (as written in packs) to definitions, taken from the quantity reader's table. */
export const UNITS: Record<string, UnitDef> = Object.fromEntries(
  Object.entries(PACK_UNITS).map(([name, [id, dimension, label]]) => {
    const def = findUnit(id, dimension);
    if (def === undefined) throw new Error(`pack unit ${name}: no ${dimension} unit "${id}" in the unit table`);
    return [name, { dimension, factor: def.factor, offset: def.offset, label }];
  }),
);

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
