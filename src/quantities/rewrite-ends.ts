/**
 * A stated range corrected end by end, for corrections: a range the draft wrote is put right as a
 * range, each end in its own place, never as the one figure at its middle.
 *   "between 0.18% and 0.28%" of the air, ten times off  → "between 0.018% and 0.028%"
 *   "4 to 7 °F" where °C was meant                        → "4 to 7 °C"
 *   "about 41 to 45 °F" restating a change of 5 to 7 °C   → "about 9 to 13 °F"
 * The draft's words around and between the ends stay; a range whose unit changes keeps only a
 * plain joining word between its ends ("to", "and", a dash) and takes the new unit after its last.
 */
import type { Quantity } from '../types.js';
import { findUnit, fromCanonical, toCanonical } from './convert.js';
import { findAtoms, type Atom } from './find-atoms.js';
import { formatNumber } from './format-quantity.js';
import { statesRange } from './range-ends.js';

/** What may stand between the two ends of a range whose unit is rewritten: "4 to 7", "180-280", "between 4 and 7". */
const JOIN = /^[\s\u00A0]*(?:-|–|—|to|and|or)[\s\u00A0]*$/iu;

/** Units whose figures are calendar years: their ends are no amounts to scale. */
const CALENDAR = new Set(['CE', 'BCE']);

/** A unit shown right after its number, with no space. */
const TIGHT = new Set(['%']);

/** The two written ends of a range, in the draft's order, each in the canonical unit; undefined for one figure. */
function endsOf(q: Quantity): [{ atom: Atom; at: number }, { atom: Atom; at: number }] | undefined {
  if (!statesRange(q)) return undefined;
  const id = q.statedUnit === '' ? q.unit : q.statedUnit;
  if (CALENDAR.has(id)) return undefined;
  const [a, b] = findAtoms(q.text) as [Atom, Atom];
  let ends: [number, number];
  try {
    ends = [toCanonical(a.value, id, q.dimension), toCanonical(b.value, id, q.dimension)];
  } catch {
    return undefined;
  }
  // A scale word written once ("7-8 thousand years") is not on the first figure: no end to read.
  const slack = 1e-9 * Math.max(1, Math.abs(q.low), Math.abs(q.high));
  if (ends.some((x) => x < q.low - slack || x > q.high + slack)) return undefined;
  return [
    { atom: a, at: ends[0] },
    { atom: b, at: ends[1] },
  ];
}

/** The written ends of a range, low then high, in the canonical unit; undefined when `q` is one figure. */
export function writtenEnds(q: Quantity): [number, number] | undefined {
  const ends = endsOf(q);
  if (ends === undefined) return undefined;
  const [x, y] = [ends[0].at, ends[1].at];
  return x <= y ? [x, y] : [y, x];
}

/** Significant digits as written: "0.18" → 2, "5,500" → 2, "12.6" → 3. */
function figuresWritten(written: string): number {
  const digits = written.replace(/[^\d.]/gu, '');
  const bare = digits.replace('.', '').replace(/^0+/u, '');
  return digits.includes('.') ? bare.length : bare.replace(/0+$/u, '').length;
}

/**
 * `q`'s words with each end of its range put right, or undefined when `q` states one figure (or
 * ends the rewrite cannot place). `ends` is either a reading of one canonical figure (the slip's own:
 * ten times smaller, °F read as °C) applied to each end, or the right ends themselves, low then high,
 * given to the draft's ends in their order. Each end keeps the figures the draft wrote, at least
 * `least`; `unit` (a unit-table id) shows the range in another unit than the draft's.
 */
export function rewriteEnds(q: Quantity, ends: ((x: number) => number) | readonly [number, number], least = 2, unit?: string): string | undefined {
  const written = endsOf(q);
  if (written === undefined) return undefined;
  const from = q.statedUnit === '' ? q.unit : q.statedUnit;
  const to = unit ?? from;
  const def = findUnit(to, q.dimension);
  if (def === undefined || CALENDAR.has(to)) return undefined;
  const [a, b] = written;
  const lowFirst = a.at <= b.at;
  const right = typeof ends === 'function' ? [ends(a.at), ends(b.at)] : lowFirst ? [ends[0], ends[1]] : [ends[1], ends[0]];
  const shown = (at: number, atom: Atom): string => {
    const value = fromCanonical(at, to, q.dimension);
    return formatNumber(value, Math.max(least, figuresWritten(q.text.slice(atom.start, atom.end))));
  };
  const [first, second] = [shown(right[0] as number, a.atom), shown(right[1] as number, b.atom)];
  const between = q.text.slice(a.atom.end, b.atom.start);
  const before = q.text.slice(0, a.atom.start);
  if (to === from) return before + first + between + second + q.text.slice(b.atom.end);
  if (!JOIN.test(between)) return undefined;
  const tail = def.display === '' ? '' : TIGHT.has(def.display) ? def.display : ` ${def.display}`;
  return before + first + between + second + tail;
}
