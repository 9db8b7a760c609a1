/**
 * Writes a canonical value back in the draft's own unit, for corrections: formatQuantity(800000,
 * 'yr', 'kyr') → "800 kyr"; formatQuantity(5, 'K', 'degF') → "9 °F"; (200, 'yr BP', 'CE') → "1750".
 */
import { dimensionOfCanonical, findUnit, fromCanonical } from './convert.js';

/**
 * A number rounded to `significant` figures, with comma thousands separators when `grouping`:
 * formatNumber(11949, 3) → "11,900"; formatNumber(0.01234, 2) → "0.012".
 */
export function formatNumber(x: number, significant = 3, grouping = true): string {
  if (!Number.isFinite(x)) return String(x);
  if (x === 0) return '0';
  const place = Math.floor(Math.log10(Math.abs(x))) - significant + 1;
  const step = 10 ** place;
  const rounded = Math.round(x / step) * step;
  const decimals = Math.max(0, -place);
  let [whole = '0', fraction = ''] = rounded.toFixed(decimals).split('.');
  fraction = fraction.replace(/0+$/, '');
  if (grouping && Math.abs(rounded) >= 1000) whole = whole.replace(/\B(?=(\d{3})+(?!\d))/g, ',');
  return fraction === '' ? whole : `${whole}.${fraction}`;
}

/** Unit displays written without a space before them. */
const TIGHT = new Set(['%']);

/**
 * A canonical `value` in `unit` (the dimension's canonical unit) rendered in `statedUnit` with
 * sensible rounding (`significant` figures; calendar years to the year, BCE when before year 1).
 */
export function formatQuantity(value: number, unit: string, statedUnit: string, significant = 3): string {
  const dimension = dimensionOfCanonical(unit);
  if (dimension === undefined) throw new Error(`"${unit}" is not a canonical unit`);
  const id = statedUnit === '' ? unit : statedUnit;
  const def = findUnit(id, dimension);
  if (def === undefined) throw new Error(`unit "${statedUnit}" is not a ${dimension} unit`);
  const stated = fromCanonical(value, id, dimension);
  if (def.id === 'CE') {
    const year = Math.round(stated);
    return year >= 1 ? String(year) : `${1 - year} BCE`;
  }
  const number = formatNumber(stated, significant, def.id !== 'BCE' || Math.abs(stated) >= 10000);
  if (def.display === '') return number;
  return TIGHT.has(def.display) ? `${number}${def.display}` : `${number} ${def.display}`;
}
