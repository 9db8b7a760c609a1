/**
 * A quantity's interval as written, before its hedge: the stated row of the interval table alone.
 * Arithmetic on the draft's own numbers uses it for the inputs. A writer who puts "from about 190
 * to about 280 ppm" and then "a rise of some 50 ppm" subtracts the numbers written, 280 − 190; the
 * "about" says the world may differ from them, not that the sum may. The stated result keeps its
 * own hedge, so "a rise of about 100 ppm" still has its 10% of slack.
 *   "about 190 ppm"     → 189.5–190.5 ppm (the precision row; "about" takes it to 166–214)
 *   "more than 420 ppm" → 415–425 ppm (420 read to its second digit; "more than" makes 420–630)
 */
import type { Quantity } from '../types.js';
import { toCanonical, fromCanonical } from './convert.js';
import { findAtoms } from './find-atoms.js';
import { evaluateBound, hedgeRule, type Bound } from './interval-rules.js';

/** A central value and an interval, in the quantity's canonical unit. */
export interface WrittenInterval {
  value: number;
  low: number;
  high: number;
}

/** The bound with its L or H term taken out, evaluated at the quantity's value. */
function rest(bound: Bound, term: 'L' | 'H', v: number): number {
  const { [term]: _dropped, ...others } = bound;
  return evaluateBound(others, { v, h: 0, L: 0, H: 0, s: 1 });
}

/** Half a unit in the last written place of the single number in `q`, as a canonical interval. */
function precisionOf(q: Quantity): WrittenInterval | undefined {
  const atoms = findAtoms(q.text);
  const atom = atoms[0];
  if (atom === undefined || atoms.length > 1 || (atom.form !== 'digits' && atom.form !== 'words')) return undefined;
  const id = q.statedUnit === '' ? q.unit : q.statedUnit;
  const stated = fromCanonical(q.value, id, q.dimension);
  const half = q.statedUnit === 'CE' ? 0.5 : atom.half;
  const ends = [toCanonical(stated - half, id, q.dimension), toCanonical(stated + half, id, q.dimension)].sort((a, b) => a - b);
  return { value: q.value, low: ends[0] as number, high: ends[1] as number };
}

/**
 * `q` as written, without its hedge. An approximation row ("about") is undone exactly, since it
 * only widens the stated interval; a bound row ("more than") keeps nothing of it, so the number is
 * read again at its written precision. Anything else (no hedge, a vague word) stays as parsed.
 */
export function writtenInterval(q: Quantity): WrittenInterval {
  const parsed = { value: q.value, low: q.low, high: q.high };
  if (q.hedge === undefined) return parsed;
  const rule = hedgeRule(q.hedge);
  if (rule === undefined) return parsed;
  if (rule.low.L === 1 && rule.high.H === 1) {
    return { value: q.value, low: q.low - rest(rule.low, 'L', q.value), high: q.high - rest(rule.high, 'H', q.value) };
  }
  return precisionOf(q) ?? parsed;
}
