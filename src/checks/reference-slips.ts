/**
 * A conflicting figure that matches its reference once its unit or scale is read as another: the
 * number is right and the unit word is wrong. "Drilling ended at 3,270 feet" (metres meant), "we are
 * at 424 parts per billion" (ppm meant), "the ice reaches back 800 years" (800,000 meant), "the
 * Pleistocene began 2.58 thousand years ago" (million meant), "a cooling of 10 °C" (10 °F meant), "a
 * drop of 295 K" (a change of 22 K with 273.15 added). Such a claim gets a unit flag that names the
 * slip instead of a value flag that only says the number is out of range.
 *
 * The readings are data, not rules per wording: CONFUSED_UNITS lists, per dimension, the units a
 * writer mixes up; every reading converts through the unit table (unit-table.ts, factors from NIST SP
 * 811, 2008, Appendix B.8 and B.9: 1 ft = 0.3048 m, 1 mile = 1609.344 m, a difference of 1 °F = 5/9 K,
 * T/K = t/°C + 273.15; SI prefixes k = 10^3, M = 10^6, G = 10^9; 1% = 10^-2, 1 ppm = 10^-6 and 1 ppb =
 * 10^-9 of the air by volume). A rate's slips are derived: its amount's units and its per-time units
 * (per year, decade, century, thousand years) are each confused as the units of their own dimension.
 * Three more readings come from the table too: a scale word read as its neighbour (SCALE_WORDS), an
 * era read for "ago" (BCE, whose offset is in the table) and a difference written with the offset of
 * an absolute temperature (the table's offsets of K and °F).
 */
import { groupedNumberFormat } from '../format/grouped-number.js';
import { convert, correctionFigures, findUnit, formatQuantity, fromCanonical, rewriteEnds, rewriteQuantity, writtenInterval } from '../quantities/index.js';
import { findAtoms } from '../quantities/find-atoms.js';
import type { ReferenceValue } from '../rulepack/types.js';
import type { Dimension, Quantity } from '../types.js';
import { relativeDistance } from './reference-distance.js';

/** The units a writer confuses within one dimension, as unit-table ids. */
export const CONFUSED_UNITS: readonly { dimension: Dimension; units: readonly string[] }[] = [
  { dimension: 'length', units: ['m', 'ft', 'km', 'mi'] },
  // °C before K: a difference meant in Celsius is shown as a writer writes it (a difference of 1 °C is 1 K).
  { dimension: 'temperature-change', units: ['degC', 'K', 'degF'] },
  { dimension: 'concentration', units: ['%', 'permille', 'ppm', 'ppb'] },
  // Years, thousands and millions of years: the thousand-fold ladder of a time.
  { dimension: 'duration', units: ['yr', 'kyr', 'Myr'] },
  { dimension: 'duration', units: ['ka', 'Ma'] },
  { dimension: 'age', units: ['yr ago', 'ka', 'Ma'] },
  { dimension: 'age', units: ['yr BP', 'ka', 'Ma'] },
  { dimension: 'age', units: ['millennia ago', 'Ma'] },
];

/** The per-time units of a rate in their order; a writer confuses each with its neighbours ("2.4 ppm per decade" for per year). */
const CONFUSED_PER_TIME: readonly string[] = ['yr', 'decade', 'century', 'kyr'];

/** The dimension of a rate's amount (a rate's unit id is `<amount>/<per time>` in the unit table). */
const AMOUNT_OF_RATE: Partial<Record<Dimension, Dimension>> = {
  'concentration-rate': 'concentration',
  'temperature-rate': 'temperature-change',
  'length-rate': 'length',
};

/** Scale words in their order: each one is confused with its neighbours ("2.58 thousand" for million). */
const SCALE_WORDS: readonly [string, number][] = [
  ['thousand', 1e3],
  ['million', 1e6],
  ['billion', 1e9],
];

/**
 * Below this ratio two units are near enough that a wrong figure often fits the other reading by
 * chance (°F and °C differences: 1.8; miles and kilometres: 1.6); such a slip is read only when the
 * other reading lands in the middle of the reference (nearFits) and the figure as written is well
 * outside it.
 */
const NEAR_RATIO = 2.5;
/** How far outside its reference a figure must be (relativeDistance) for a near-unit slip. */
const NEAR_MIN_DISTANCE = 0.3;

/**
 * How far outside its reference a figure on the reference's best estimate must be: when the number as
 * written (without its hedge) read in the other unit holds the best estimate itself, and is a precise
 * figure (its reading no wider than half the reference range), the number is the reference's own and
 * only its unit is wrong, so any distance outside the range is enough: "around 18 °C" of Greenland
 * warming is 18 °F, 9.7-10.3 °C, on the central 10 °C of 6-14 °C; "about 10 °F" of it is 10 °C written
 * as °F (5.6 °C, just under 6 °C); "some 22 °F" of Greenland's glacial cooling is the central 22 °C
 * written as °F (12.2 °C against 15-25 °C). A figure inside the range is never a slip (distance 0).
 * "About two kilometres" of a 3,623 m core read as miles (2.4-4.0 km) holds the figure only because
 * "two" is coarse, and stays a wrong value.
 */
const NEAR_MIN_DISTANCE_ON_BEST = 0;

function nearMinDistance(q: Quantity, reading: Reading, r: Pick<ReferenceValue, 'central' | 'low' | 'high'>): number {
  if (reading.read === undefined) return NEAR_MIN_DISTANCE;
  const w = writtenInterval(q);
  const [low, high] = [reading.read(w.low), reading.read(w.high)].sort((a, b) => a - b) as [number, number];
  // "only 4 to 7 °F colder" of a 4-7 °C cooling: both ends as written are the reference's own ends
  // in the other unit, which no wrong figure matches by chance.
  if (w.low !== w.high && sameFigure(low, r.low) && sameFigure(high, r.high)) return NEAR_MIN_DISTANCE_ON_BEST;
  if (r.central === undefined) return NEAR_MIN_DISTANCE;
  const precise = high - low <= (r.high - r.low) / 2;
  return precise && low <= r.central && r.central <= high ? NEAR_MIN_DISTANCE_ON_BEST : NEAR_MIN_DISTANCE;
}

/** Two figures equal up to rounding in the last of about four significant digits. */
const sameFigure = (a: number, b: number): boolean => Math.abs(a - b) <= Math.max(Math.abs(a), Math.abs(b)) * 5e-4;

/** What a slip found says and the reading that fits. */
export interface UnitSlip {
  what: string;
  correction: string;
  low: number;
  high: number;
}

interface Reading {
  /** The canonical interval and value when the number is read the other way. */
  low: number;
  high: number;
  value: number;
  /** The factor between the two readings (≥ 1), for the near-unit guard. */
  ratio: number;
  /** A unit swap's reading of one canonical figure. */
  read?: (x: number) => number;
  what: string;
  shown: (value: number) => string;
}

/** The slip that makes `q` agree with `r`, with the corrected wording, or undefined. */
export function unitSlip(r: Pick<ReferenceValue, 'low' | 'high' | 'unit' | 'central'>, q: Quantity): UnitSlip | undefined {
  if (q.statedUnit === 'CE' || q.unit === '') return undefined;
  for (const reading of readingsOf(q)) {
    if (!(reading.low <= r.high && r.low <= reading.high)) continue;
    // "probably under 400 years" is 0-400 years; read in kyr it overlaps any span up to 400,000
    // years. The number as written, without its hedge or bound, must fit in the other unit too.
    if (reading.read !== undefined && !writtenFits(q, reading.read, r)) continue;
    if (reading.ratio < NEAR_RATIO && !(nearFits(q, reading, r) && relativeDistance(q.low, q.high, r) >= nearMinDistance(q, reading, r))) continue;
    return { what: reading.what, correction: reading.shown(reading.value), low: reading.low, high: reading.high };
  }
  return undefined;
}

/**
 * A near unit's reading fits only when the number as written (its last digit, without its hedge)
 * lands in the middle half of the reference, or on a reference given as one figure: "about 40 °C" of
 * Greenland cooling read as 40 °F (22 °C) in 15-25 °C, but not "12 °C" of global cooling read as
 * 12 °F (6.7 °C) against 3.6-7 °C, nor "1.8 km" read as 1.8 miles (2.82-2.98 km) for a 2.8 km depth.
 */
function nearFits(q: Quantity, reading: Reading, r: Pick<ReferenceValue, 'low' | 'high' | 'central'>): boolean {
  if (reading.read === undefined) return false;
  const w = writtenInterval(q);
  const [low, high] = [reading.read(w.low), reading.read(w.high)].sort((a, b) => a - b) as [number, number];
  const [middle, quarter] = [(r.low + r.high) / 2, (r.high - r.low) / 4];
  // And the reading with its hedge holds the reference's best estimate: "9 °C" of global cooling read
  // as 9 °F (4.7-5.3 °C) misses Annan et al.'s 4.5 °C and stays a wrong figure.
  const best = r.central ?? middle;
  return low <= middle + quarter && middle - quarter <= high && reading.low <= best && best <= reading.high;
}

/** Whether the number as written (writtenInterval: no hedge, no bound), read by `read`, overlaps the reference. */
function writtenFits(q: Quantity, read: (x: number) => number, r: Pick<ReferenceValue, 'low' | 'high'>): boolean {
  const w = writtenInterval(q);
  const [low, high] = [read(w.low), read(w.high)].sort((a, b) => a - b) as [number, number];
  return low <= r.high && r.low <= high;
}

/** Every other reading of `q`'s number, in the order tried. */
function readingsOf(q: Quantity): Reading[] {
  // One quantity is tried against every reference its sentence may bind: its readings are made once.
  const kept = readingsKept.get(q);
  if (kept !== undefined) return kept;
  // A scale word written ("2.58 thousand years") is the slip before the unit it scales.
  const made = [...scaleWordReadings(q), ...swapReadings(q), ...eraReadings(q), ...offsetReadings(q)];
  readingsKept.set(q, made);
  return made;
}

const readingsKept = new WeakMap<Quantity, Reading[]>();

/** The unit ids `id` is confused with in `dimension`, a rate's derived from its amount and its per-time unit. */
export function confusedWith(id: string, dimension: Dimension): string[] {
  const amountDimension = AMOUNT_OF_RATE[dimension];
  if (amountDimension !== undefined) {
    const cut = id.lastIndexOf('/');
    if (cut < 0) return [];
    const [amount, per] = [id.slice(0, cut), id.slice(cut + 1)];
    const amounts = confusedWith(amount, amountDimension).map((a) => `${a}/${per}`);
    // Only the neighbouring per-time unit: "2.4 ppm per decade" for per year, not "2 ppm per year" for per century.
    const at = CONFUSED_PER_TIME.indexOf(per);
    const pers = at < 0 ? [] : [CONFUSED_PER_TIME[at - 1], CONFUSED_PER_TIME[at + 1]].flatMap((p) => (p === undefined ? [] : [`${amount}/${p}`]));
    return [...amounts, ...pers].filter((other) => findUnit(other, dimension) !== undefined);
  }
  const others = CONFUSED_UNITS.filter((g) => g.dimension === dimension && g.units.includes(id)).flatMap((g) => g.units.filter((u) => u !== id));
  return [...new Set(others)].filter((other) => findUnit(other, dimension) !== undefined);
}

/** The number read in each confused unit: "3,270 feet" as 3,270 m, "10 °C" of cooling as 10 °F. */
function swapReadings(q: Quantity): Reading[] {
  const from = findUnit(q.statedUnit, q.dimension);
  if (from === undefined) return [];
  return confusedWith(q.statedUnit, q.dimension).flatMap((to) => {
    const other = findUnit(to, q.dimension);
    if (other === undefined || other.factor === from.factor) return [];
    const read = (x: number) => convert(convert(x, q.unit, q.statedUnit, q.dimension), to, q.unit, q.dimension);
    const [low, high] = [read(q.low), read(q.high)].sort((a, b) => a - b) as [number, number];
    const ratio = Math.max(other.factor / from.factor, from.factor / other.factor);
    // A time's thousand-fold slip keeps the draft's own words ("800 years" → "800,000 years").
    const time = q.dimension === 'age' || q.dimension === 'duration';
    const ownWords = q.statedUnit === 'yr' || q.statedUnit.startsWith('yr ');
    // The meant figure is the draft's own number, so it keeps every figure the draft wrote: "3,623 feet"
    // is 3,623 m, not 3,620 m; "423.9 ppb" is 423.9 ppm.
    const figures = correctionFigures(q);
    // A range the draft wrote is put right end by end ("4 to 7 °F" meant in °C is "4 to 7 °C"), not as its middle.
    const inTo = (value: number): string => rewriteEnds(q, read, figures, to) ?? formatQuantity(value, q.unit, to, figures);
    const asWritten = (value: number, least: number): string => rewriteEnds(q, read, least) ?? rewriteQuantity(q, value, correctionFigures(q, least));
    const shown = time
      ? (value: number) => (ownWords ? `${rewriteEnds(q, read, figures) ?? formatQuantity(value, q.unit, q.statedUnit, figures)} (${inTo(value)}, not ${q.text})` : inTo(value))
      : (value: number) => `${hedgeOf(q)}${inTo(value)} (${asWritten(value, 2)})`;
    return [{ low, high, value: read(q.value), ratio, read, what: `${other.display} meant where ${from.display} was written (${factorWords(from.display, other.display, ratio, from.factor < other.factor)})`, shown }];
  });
}

/** "1 mile = 1.61 km": how many of the smaller unit make the larger, for the reason. */
function factorWords(written: string, meant: string, ratio: number, writtenSmaller: boolean): string {
  const [small, large] = writtenSmaller ? [written, meant] : [meant, written];
  return `1 ${large} = ${formatRatio(ratio)} ${small}`;
}

function formatRatio(ratio: number): string {
  return ratio >= 100 ? WHOLE_NUMBER.format(ratio) : String(Number(ratio.toPrecision(4)));
}

/**
 * `toLocaleString('en-GB', { maximumFractionDigits: 0 })`'s formatter, made once (the call made one
 * per reading), and ICU loaded only for a number whose digits need it (format/grouped-number.ts).
 */
const WHOLE_NUMBER = groupedNumberFormat('en-GB', 0);

/** A scale word read as its neighbour: "2.58 thousand years ago" as 2.58 million, "1.2 billion years" as million. */
function scaleWordReadings(q: Quantity): Reading[] {
  const words = q.text.toLowerCase().split(/[^\p{L}]+/u);
  const at = SCALE_WORDS.findIndex(([w]) => words.includes(w));
  const written = SCALE_WORDS[at];
  if (written === undefined) return [];
  return [SCALE_WORDS[at - 1], SCALE_WORDS[at + 1]].flatMap((meant) => {
    if (meant === undefined) return [];
    const k = meant[1] / written[1];
    const [low, high] = [q.low * k, q.high * k].sort((a, b) => a - b) as [number, number];
    return [{ low, high, value: q.value * k, ratio: Math.max(k, 1 / k), what: `"${meant[0]}" meant where "${written[0]}" was written`, shown: () => `${withWord(q.text, written[0], meant[0])} (${meant[0]}, not ${written[0]})` }];
  });
}

/**
 * "The Holocene began around 11,700 BC" (11,700 years ago meant): the era written for "ago", with the
 * era's offset from the unit table (Y BCE = (1949 + Y) BP). Not the other way round: a date "years
 * ago" some two thousand years off ("over by about 9,000 years ago") is far more often a wrong figure.
 */
function eraReadings(q: Quantity): Reading[] {
  if (q.dimension !== 'age' || q.statedUnit !== 'BCE') return [];
  const read = (x: number) => convert(convert(x, q.unit, 'BCE', 'age'), 'yr ago', q.unit, 'age');
  return [
    {
      low: read(q.low),
      high: read(q.high),
      value: read(q.value),
      ratio: Infinity,
      what: 'BCE written for years before present (Y BCE is 1,949 + Y years BP)',
      shown: (value: number) => `${hedgeOf(q)}${formatQuantity(value, q.unit, 'yr ago')} (${rewriteQuantity(q, value, correctionFigures(q, 4))})`,
    },
  ];
}

/**
 * A difference written with the offset of an absolute temperature: "a drop of 295 K" (22 °C + 273.15),
 * "a cooling of 42.8 °F" (6 °C × 1.8 + 32). The number is read as an absolute temperature in its own
 * unit and taken in °C, which is the change meant; the offsets are the unit table's.
 */
function offsetReadings(q: Quantity): Reading[] {
  if (q.dimension !== 'temperature-change') return [];
  const absolute = findUnit(q.statedUnit, 'temperature');
  if (absolute === undefined || absolute.offset === 0) return [];
  const read = (x: number) => convert(convert(x, q.unit, q.statedUnit, q.dimension), q.statedUnit, 'degC', 'temperature');
  return [
    {
      low: read(q.low),
      high: read(q.high),
      value: read(q.value),
      ratio: Infinity,
      what: `an absolute temperature in ${absolute.display} written for a difference (a difference of 1 °C is 1 K; only an absolute temperature adds 273.15 K or 32 °F)`,
      shown: (value: number) => {
        // Each figure keeps the draft's decimal places in its own unit: "42.8 F" read as 6 °C is a change of 10.8 F, not 11 F.
        const stated = fromCanonical(value, q.statedUnit, q.dimension);
        return `${rewriteQuantity(q, value, placesKept(q, stated))} (${q.text} is an absolute temperature, ${formatQuantity(value, 'degC', 'degC', placesKept(q, value))}, not a difference)`;
      },
    },
  ];
}

/**
 * The words a figure's hedge or bound takes before its number, as the draft wrote them ("about ",
 * "~", "nearly "), so a figure corrected into another unit keeps them: "about 9 degrees F" meant in
 * °C is "about 9 °C", as the draft's own sentence would say it. Empty for a bare figure or a range.
 */
function hedgeOf(q: Quantity): string {
  const atoms = findAtoms(q.text);
  const first = atoms[0];
  if (q.hedge === undefined || first === undefined || atoms.length > 1) return '';
  const before = q.text.slice(0, first.start);
  return /\d/u.test(before) ? '' : before;
}

/** Significant figures that keep the decimal places the draft wrote: taking off an offset keeps them ("295 K" less 273.15 is 22 K). */
function placesKept(q: Quantity, value: number): number {
  const decimals = q.text.split('.')[1]?.match(/^\d+/u)?.[0].length ?? 0;
  return Math.max(1, Math.floor(Math.log10(Math.max(Math.abs(value), 1))) + 1 + decimals);
}

/** `text` with the whole word `word` (any case) put as `other`: "between 26.5 and 19 million years" → "... thousand years". */
function withWord(text: string, word: string, other: string): string {
  const lower = text.toLowerCase();
  const isLetter = (c: string | undefined) => c !== undefined && /\p{L}/u.test(c);
  for (let at = lower.indexOf(word); at >= 0; at = lower.indexOf(word, at + 1)) {
    if (!isLetter(text[at - 1]) && !isLetter(text[at + word.length])) return text.slice(0, at) + other + text.slice(at + word.length);
  }
  return text;
}
