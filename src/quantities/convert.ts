/**
 * Conversion between units of one dimension through the unit table. Affine: canonical = factor ×
 * value + offset, so absolute temperatures and calendar years convert correctly.
 */
import { DIMENSIONS, type Dimension } from '../types.js';
import { CANONICAL_UNIT, UNIT_TABLE, type UnitDef } from './unit-table.js';

const BY_KEY = new Map<string, UnitDef>(UNIT_TABLE.map((d) => [`${d.dimension}\u0000${d.id}`, d]));

/**
 * When a pair of unit ids exists in two dimensions (°C ↔ °F as temperatures and as changes), the
 * reading without a stated dimension is the absolute one, as NIST SP 811 B.9 writes the formula;
 * pass the dimension to convert a difference.
 */
const PREFERENCE: Dimension[] = ['temperature', ...DIMENSIONS.filter((d) => d !== 'temperature')];

/** The definition of `id` in `dimension`, or undefined. */
export function findUnit(id: string, dimension: Dimension): UnitDef | undefined {
  return BY_KEY.get(`${dimension}\u0000${id}`);
}

/** A stated value in unit `id` of `dimension` converted to the dimension's canonical unit. */
export function toCanonical(value: number, id: string, dimension: Dimension): number {
  const def = findUnit(id, dimension);
  if (def === undefined) throw new Error(`unit "${id}" is not a ${dimension} unit`);
  return def.factor * value + def.offset;
}

/** A canonical value of `dimension` written in unit `id` (the inverse of toCanonical). */
export function fromCanonical(value: number, id: string, dimension: Dimension): number {
  const def = findUnit(id, dimension);
  if (def === undefined) throw new Error(`unit "${id}" is not a ${dimension} unit`);
  return (value - def.offset) / def.factor;
}

/** The dimension whose canonical unit is `unit` (each dimension has its own), or undefined. */
export function dimensionOfCanonical(unit: string): Dimension | undefined {
  return PREFERENCE.find((d) => CANONICAL_UNIT[d] === unit);
}

/**
 * Converts `value` from one unit to another of the same dimension, e.g. convert(5, 'degC', 'degF',
 * 'temperature-change') = 9 and convert(1, 'ft', 'm') = 0.3048. Throws when no dimension has both.
 */
export function convert(value: number, fromUnit: string, toUnit: string, dimension?: Dimension): number {
  const dims = dimension === undefined ? PREFERENCE : [dimension];
  const dim = dims.find((d) => findUnit(fromUnit, d) !== undefined && findUnit(toUnit, d) !== undefined);
  if (dim === undefined) throw new Error(`cannot convert "${fromUnit}" to "${toUnit}": no dimension has both`);
  return fromCanonical(toCanonical(value, fromUnit, dim), toUnit, dim);
}
