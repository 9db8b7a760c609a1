/**
 * A conflicting figure that matches its reference once its unit or scale is read as another: the
 * number is right and the unit word is wrong. "Drilling ended at 3,270 feet" (metres meant), "we are
 * at 424 parts per billion" (ppm meant), "the ice reaches back 800 years" (800,000 meant), "the
 * Pleistocene began 2.58 kyr ago" (million meant). Such a claim gets a unit flag that names the slip
 * instead of a value flag that only says the number is out of range.
 *
 * The readings tried, each a unit swap inside one dimension (factors from NIST SP 811: 1 ft =
 * 0.3048 m; SI prefixes k = 10^3, M = 10^6; ppm and ppb are 10^-6 and 10^-9 of the air by volume):
 * feet for metres and metres for feet, ppb for ppm, ppm for percent, BCE for years before present, and a thousand-fold slip of a time in either direction (years for
 * thousands of years, thousands for millions). Temperatures are left out: a change read in °F
 * instead of °C is 5/9 of itself, close enough to many a wrong figure to excuse it as a slip; the
 * restatement rules catch °F slips where both units are written.
 */
import { convert, correctionFigures, formatQuantity, rewriteQuantity } from '../quantities/index.js';
import type { ReferenceValue } from '../rulepack/types.js';
import type { Dimension, Quantity } from '../types.js';

/** One reading: the stated number in another unit, or scaled. */
interface Slip {
  dimensions: Dimension[];
  /** Applies when the quantity was stated in this unit. */
  from: string[];
  /** The unit the number was meant in (undefined: the same unit, scaled). */
  to?: string;
  /** A scale on the canonical interval (1000: thousands meant where years were written). */
  scale?: number;
  /** With a scale: the unit that keeps the draft's number ("2.58 ka" reads "2.58 Ma"). */
  swap?: Record<string, string>;
  /** With a unit swap: the right figure is also given in the draft's own words ("(about 10,700 feet)"). */
  alsoAsWritten?: boolean;
  /** Significant figures of that restatement, when the draft's own are too few (an era's offset is exact). */
  asWrittenFigures?: number;
  what: string;
}

const SLIPS: readonly Slip[] = [
  { dimensions: ['length'], from: ['ft'], to: 'm', alsoAsWritten: true, what: 'feet written for metres (1 ft = 0.3048 m)' },
  // "the seas were 400 metres lower" (400 feet meant): the American reader's feet, written as metres.
  { dimensions: ['length'], from: ['m'], to: 'ft', alsoAsWritten: true, what: 'metres written for feet (1 ft = 0.3048 m)' },
  { dimensions: ['concentration', 'concentration-rate'], from: ['ppb'], to: 'ppm', what: 'parts per billion written for parts per million (1 ppm = 1,000 ppb)' },
  // "CO2 is barely 0.04 parts per million of the air" (0.04 percent meant): a share in percent, written in ppm.
  { dimensions: ['concentration'], from: ['ppm'], to: '%', what: 'parts per million written for percent (1% = 10,000 ppm)' },
  // "the Holocene began around 11,700 BC" (11,700 years ago meant): the era written for "ago".
  // Y BCE = (1949 + Y) BP (unit-table.ts). Not the other way round: a date "years ago" some two
  // thousand years off ("over by about 9,000 years ago") is far more often a wrong figure.
  { dimensions: ['age'], from: ['BCE'], to: 'yr ago', alsoAsWritten: true, asWrittenFigures: 4, what: 'BCE written for years before present (Y BCE is 1,949 + Y years BP)' },
  { dimensions: ['age', 'duration'], from: ['yr', 'yr ago', 'yr BP', 'kyr', 'ka', 'century', 'millennium'], scale: 1000, swap: { ka: 'Ma', kyr: 'Myr' }, what: 'a thousand-fold slip: thousands meant and not written, or thousands written for millions (SI: k = 10^3, M = 10^6)' },
  { dimensions: ['age', 'duration'], from: ['kyr', 'ka', 'Myr', 'Ma'], scale: 1 / 1000, swap: { Ma: 'ka', Myr: 'kyr' }, what: 'a thousand-fold slip: millions written for thousands, or thousands for units (SI: k = 10^3, M = 10^6)' },
];

/** The slip that makes `q` agree with `r`, with the corrected wording, or undefined. */
export function unitSlip(r: Pick<ReferenceValue, 'low' | 'high' | 'unit'>, q: Quantity): { what: string; correction: string; low: number; high: number } | undefined {
  if (q.statedUnit === 'CE' || q.unit === '') return undefined;
  for (const slip of SLIPS) {
    if (!slip.dimensions.includes(q.dimension) || !slip.from.includes(q.statedUnit)) continue;
    let low: number;
    let high: number;
    let shown: () => string;
    if (slip.to !== undefined) {
      // The number as written, read in the other unit, then taken to the canonical unit.
      const asWritten = (x: number) => convert(x, q.unit, q.statedUnit, q.dimension);
      const toOther = (x: number) => convert(asWritten(x), slip.to as string, q.unit, q.dimension);
      [low, high] = [toOther(q.low), toOther(q.high)].sort((a, b) => a - b) as [number, number];
      const meant = toOther(q.value);
      shown = () => formatQuantity(meant, q.unit, slip.to as string) + (slip.alsoAsWritten === true ? ` (${rewriteQuantity(q, meant, correctionFigures(q, slip.asWrittenFigures ?? 2))})` : '');
    } else {
      const k = slip.scale ?? 1;
      [low, high] = [q.low * k, q.high * k];
      shown = () => formatQuantity(q.value * k, q.unit, slip.swap?.[q.statedUnit] ?? q.statedUnit);
    }
    if (low <= r.high && r.low <= high) return { what: slip.what, correction: shown(), low, high };
  }
  return undefined;
}
