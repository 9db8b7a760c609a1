/**
 * The unit rules as data. Restated conversions (ppm ↔ %, °C ↔ °F for changes and for readings,
 * dates across eras, m ↔ ft) are compared as intervals in the canonical unit; CO2 levels in the
 * wrong unit are also caught on their own (units-co2-share.ts).
 */
import { afterMatcher, beforeMatcher } from '../quantities/reading-cues.js';
import { convert, correctionFigures, formatNumber, formatQuantity, namesChangeBefore, rewriteEnds, TEMPERATURE_CUES, writtenEnds } from '../quantities/index.js';
import { fromCanonical } from '../quantities/convert.js';
import type { Dimension, Level, Quantity, Source } from '../types.js';
import type { Derived } from './arithmetic-derive.js';
import { B2K_CONVENTION, BP_CONVENTION, NIST_SP_811 } from './standard-sources.js';
import { co2PpbSlips, co2UnitSlips } from './units-co2-share.js';
import { scaleSlips } from './units-scale.js';
import { offsetSums } from './units-offset-sums.js';
import { eraDefinitionSlips } from './units-era-definition.js';
import { readingOffsetSlips } from './units-reading-offset.js';
import { findRestatements, pointsAtChange, type PreviousSentence, type Restatement } from './units-pairs.js';

/** A quantity whose unit use is in doubt, with the value it should have. */
export interface UnitFinding {
  stated: Quantity;
  /** The right value in the stated quantity's canonical unit. */
  computed: Derived;
  reason: string;
  /** The replacement text, when it is not simply the stated words with a new number. */
  correction?: string;
  /** Significant figures of the correction, when the stated figure's own would round the answer back to it. */
  figures?: number;
  /** A fixed level for single-quantity slips; restatements take theirs from the level table. */
  level?: Level;
  /** The unit of `computed` when it is not the stated quantity's (a slip read in another unit). */
  unit?: string;
  sources: Source[];
}

/** One unit rule: `previous` is the sentence before in the same paragraph, when known. */
export interface UnitRule {
  id: string;
  summary: string;
  find: (text: string, qs: Quantity[], previous?: PreviousSentence) => UnitFinding[];
}

/** How far "years ago" may count from a year later than 1950: the present year, at most. */
const YEARS_SINCE_1950 = Math.max(0, new Date().getUTCFullYear() - 1950);

/** The stated quantity as an interval, widened for "years ago" counted from a later year than 1950. */
function heldAs(q: Quantity): Derived {
  const slack = q.statedUnit === 'yr ago' ? YEARS_SINCE_1950 : 0;
  return { value: q.value, low: q.low - slack, high: q.high };
}

/** A concentration as a percentage of the air, or a percentage as ppm: the other reading of `q`. */
function percentOf(q: Quantity): Derived {
  const k = q.dimension === 'percent' ? convert(1, '%', 'ppm', 'concentration') : 1 / convert(1, '%', 'ppm', 'concentration');
  return { value: q.value * k, low: q.low * k, high: q.high * k };
}

const restatementsOf = (dimensions: Dimension[], text: string, qs: Quantity[], previous?: PreviousSentence): Restatement[] =>
  findRestatements(text, qs, previous).filter(({ first, second }) => dimensions.includes(first.dimension) && dimensions.includes(second.dimension));

type Keep = (text: string, r: Restatement) => boolean;

/** How the first figure of a restatement is held: as its interval, or (a date moved between eras) as written. */
type Held = (first: Quantity, second: Quantity) => { computed: Derived; stated: Derived; figures?: number; correction?: string };

/** The other SI prefix of an age a thousand times off: ka for Ma, Ma for ka. */
const SWAPPED_PREFIX: Readonly<Record<string, string>> = { Ma: 'ka', ka: 'Ma' };

const asIntervals: Held = (first, second) => ({ computed: second.dimension === first.dimension ? heldAs(first) : percentOf(first), stated: heldAs(second) });

/**
 * A date restated in another era is the same date moved by the eras' offset, an exact number of
 * years (BP = b2k − 50; Y BCE = 1949 + Y BP): the restatement converts the first date as written,
 * whatever its rounding ("12,000 b2k is the same as 12,050 BP": 11,950 BP, not 12,050), and only
 * the restated date keeps its own rounding. The same digits in two eras that differ by an offset
 * ("11,700 b2k, in other words 11,700 BP") put the offset at zero: both are read as written.
 */
const asWrittenDate: Held = (first, second) => {
  // "21,000 years ago, or 21 Ma": the restated figure keeps its digits and takes the other prefix (21 ka).
  const prefix = SWAPPED_PREFIX[second.statedUnit];
  if (prefix !== undefined && scaledApart(first, second)) return { computed: asWritten(first), stated: heldAs(second), correction: formatQuantity(first.value, second.unit, prefix) };
  const sameDigits = first.statedUnit !== second.statedUnit && writtenValue(first) === writtenValue(second);
  const computed = asWritten(first);
  if (!sameDigits) return { computed, stated: heldAs(second) };
  // "11,700 BP" shown for 11,650 would repeat the slip: when the stated figure's own precision rounds
  // the answer back to it, keep the figures down to the decade (the b2k offset is 50 years).
  const meant = fromCanonical(computed.value, second.statedUnit, 'age');
  const repeats = Number(meant.toPrecision(correctionFigures(second))) === writtenValue(second);
  return { computed, stated: asWritten(second), ...(repeats ? { figures: toDecade(meant, second) } : {}) };
};

/** The significant figures that write `x` (in `q`'s stated unit) to the nearest ten years. */
function toDecade(x: number, q: Quantity): number {
  const years = Math.abs(convert(1, q.statedUnit, 'yr BP', 'age') - convert(0, q.statedUnit, 'yr BP', 'age'));
  return figuresOf(Math.round((x * years) / 10) * 10 / years);
}

/** The fewest significant figures that write `x` exactly: 11,650 → 4, 11.65 → 4. */
function figuresOf(x: number): number {
  for (let n = 1; n < 15; n++) if (Math.abs(Number(x.toPrecision(n)) - x) <= 1e-9 * Math.max(1, Math.abs(x))) return n;
  return 15;
}

/** A date as written, with only the slack of "years ago" counted from a year later than 1950. */
const asWritten = (q: Quantity): Derived => ({ value: q.value, low: q.value - (q.statedUnit === 'yr ago' ? YEARS_SINCE_1950 : 0), high: q.value });

/** The number as the draft wrote it, in its own stated unit: "11,700 b2k" → 11,700. */
const writtenValue = (q: Quantity): number => Math.round(fromCanonical(q.value, q.statedUnit, q.dimension) * 1e6) / 1e6;

/**
 * A range restating a range, put right end by end: "5 to 7 °C ... about 41 to 45 °F" is "about 9
 * to 13 °F", each end of the first converted, not the one figure at the middle of both.
 */
function restatedEnds(first: Quantity, second: Quantity): string | undefined {
  const ends = writtenEnds(first);
  if (ends === undefined) return undefined;
  const k = second.dimension === first.dimension ? 1 : percentOf({ ...first, value: 1, low: 1, high: 1 }).value;
  return rewriteEnds(second, [ends[0] * k, ends[1] * k]);
}

function restated(dimensions: Dimension[], sources: (a: Quantity, b: Quantity) => Source[], why: (a: Quantity, b: Quantity) => string, keep: Keep = () => true, held: Held = asIntervals) {
  return (text: string, qs: Quantity[], previous?: PreviousSentence): UnitFinding[] =>
    restatementsOf(dimensions, text, qs, previous).filter((r) => keep(text, r)).map(({ first, second }) => {
      const held_ = held(first, second);
      const { computed, stated, figures } = held_;
      const correction = held_.correction ?? restatedEnds(first, second);
      return { stated: { ...second, ...stated }, computed, reason: why(first, second), sources: sources(first, second), ...(figures === undefined ? {} : { figures }), ...(correction === undefined ? {} : { correction }) };
    });
}

/** ppm ↔ % restatements, then CO2 levels in the wrong unit that no restatement covers. */
function percentPpm(text: string, qs: Quantity[], previous?: PreviousSentence): UnitFinding[] {
  const pairs = restatementsOf(['concentration', 'percent'], text, qs, previous);
  const found = restated(['concentration', 'percent'], nist, () => '1% of the air is 10,000 ppm.')(text, qs, previous);
  return [...found, ...co2UnitSlips(text, qs, new Set(pairs.flatMap((p) => [p.first, p.second])), previous?.earlier ?? (previous === undefined ? [] : [previous.text]))];
}

const CHANGE_CUES = TEMPERATURE_CUES.filter((c) => c.reading === 'temperature-change');
const CHANGE_BEFORE = CHANGE_CUES.filter((c) => c.where === 'before').map((c) => beforeMatcher(c.words));
const CHANGE_AFTER = CHANGE_CUES.filter((c) => c.where === 'after').map((c) => afterMatcher(c.words));

/**
 * True when the words, not the default, make the pair a change: a change word before the first
 * ("warmed by 5 °C (9 °F)") or after either ("6 °C (10.8 °F) colder"), or a leading +. A pair read
 * as a change only for want of a cue ("the thermostat reads 68 °F (20 °C)") is left alone, since
 * a correct reading conversion would look like the 32 slip.
 */
function cuedAsChange(text: string, { first, second }: Restatement): boolean {
  const [a, b] = first.start < second.start ? [first, second] : [second, first];
  const before = text.slice(Math.max(0, a.start - 48), a.start);
  const afters = [a, b].map((q) => text.slice(q.end, q.end + 48).replace(/^[\s\u00A0]*[)\],]/u, ''));
  const clause = text.slice(Math.max(0, a.start - 160), a.start);
  // The restated figure's own clause may name the change ("that six-degree drop works out to about 43 °F").
  const own = text.slice(Math.max(0, second.start - 160), second.start);
  return /^[+]/u.test(a.text) || CHANGE_BEFORE.some((re) => re.test(before)) || namesChangeBefore(clause) || pointsAtChange(own) || afters.some((t) => CHANGE_AFTER.some((re) => re.test(t)));
}

/** Says what a °F figure that added 32 to a change did, when that is what happened. */
function temperatureChangeWhy(a: Quantity, b: Quantity): string {
  if (a.statedUnit !== 'degF' && b.statedUnit !== 'degF') return kelvinChangeWhy(a, b);
  const right = formatQuantity(a.value, 'K', 'degF');
  const asReading = convert(a.value, 'degC', 'degF', 'temperature');
  const added32 = b.statedUnit === 'degF' && Math.abs(b.value * 1.8 - asReading) <= Math.max(1, Math.abs(asReading) * 0.05);
  const slip = added32 ? ` ${b.text} is ${a.text} converted as a reading (× 1.8 + 32).` : '';
  return `A change of ${a.text} is a change of ${right}: differences convert by 9/5 alone; the 32 belongs to readings.${slip}`;
}

/**
 * A change in °C restated in K (or back): the same number, since 1 K and 1 °C are the same
 * difference. When the K figure is the change read as a reading (+ 273.15: "a cooling of 22 °C, a
 * drop of some 295 K"), the reason says so.
 */
function kelvinChangeWhy(a: Quantity, b: Quantity): string {
  const offset = convert(0, 'degC', 'K', 'temperature');
  const added = b.statedUnit === 'K' && Math.abs(b.value - (a.value + offset)) <= Math.max(2, Math.abs(b.value) * 0.05);
  const slip = added ? ` ${b.text} is ${a.text} converted as a reading (+ 273.15).` : '';
  return `A change of ${a.text} is a change of ${formatQuantity(a.value, 'K', 'K')}: as a difference 1 K equals 1 °C; the 273.15 belongs to readings.${slip}`;
}

const nist = (): Source[] => [NIST_SP_811];

/** "5 + 32 = 41 °F of cooling": a written sum that added 32 to a change. */
function offsetSumSlips(text: string, qs: Quantity[]): UnitFinding[] {
  // Only a result the words make a change ("of cooling", "colder", "that change"): a reading may add 32.
  const cued = (first: Quantity, stated: Quantity): boolean => cuedAsChange(text, { first, second: stated, loose: true });
  return offsetSums(text, qs).filter(({ stated, first }) => cued(first, stated)).map(({ stated, computed, first }) => ({
    stated,
    computed,
    reason: `A change of ${first.text} °C is a change of ${formatQuantity(computed.value, 'K', 'degF')}: differences convert by 9/5 alone; the 32 belongs to readings.`,
    sources: [NIST_SP_811],
  }));
}
/**
 * "about 6 °C colder ... in Fahrenheit, that's about 43 degrees": a change stated before, in this
 * sentence or the paragraph's last few, converted as a reading (units-reading-offset.ts).
 */
function readingOffsets(text: string, qs: Quantity[], previous?: PreviousSentence): UnitFinding[] {
  const earlier = previous?.earlier ?? (previous === undefined ? [] : [previous.text]);
  return readingOffsetSlips(text, qs, earlier).map(({ stated, computed, change, offset }) => {
    const unit = stated.statedUnit === 'degF' ? 'degF' : 'K';
    const right = formatQuantity(computed.value, 'K', unit);
    const how = offset === 32 ? '× 1.8 + 32' : '+ 273.15';
    const cause = offset === 32 ? 'differences convert by 9/5 alone; the 32 belongs to readings' : 'as a difference 1 K equals 1 °C; the 273.15 belongs to readings';
    // A range converts end by end: "5-7 °C" is a change of 9-12.6 °F.
    const range = computed.low !== computed.high ? `${formatNumber(fromCanonical(computed.low, unit, 'temperature-change'))}-${formatQuantity(computed.high, 'K', unit)}` : undefined;
    const said = range ?? right;
    return { stated, computed, reason: `A change of ${change.text} is a change of ${said}: ${cause}. ${stated.text} is ${change.text} converted as a reading (${how}).`, sources: [NIST_SP_811], ...(range === undefined ? {} : { correction: range }) };
  });
}
const eras = (a: Quantity, b: Quantity): Source[] => (a.statedUnit.includes('b2k') || b.statedUnit.includes('b2k') ? [BP_CONVENTION, B2K_CONVENTION] : [BP_CONVENTION]);

/** A date restated a thousand times too large or small: a scale slip, not an era's offset ("800 ka, is eight hundred million years ago"). */
const scaledApart = (a: Quantity, b: Quantity): boolean => {
  const [x, y] = [Math.abs(a.value), Math.abs(b.value)].sort((m, n) => m - n) as [number, number];
  return x > 0 && Math.abs(y / x / 1e3 - 1) < 1e-6;
};

/** What a date restated in another era should be, and why: the eras' offsets, or the scale of ka and Ma. */
function eraWhy(a: Quantity, b: Quantity): string {
  if (scaledApart(a, b)) return `${a.text} is ${formatQuantity(a.value, 'yr BP', 'yr ago')}: ka counts thousands of years and Ma millions (SI prefixes: k = 10^3, M = 10^6), so ${b.text} is a thousand times off.`;
  return 'BP counts years before AD 1950 and b2k before AD 2000; Y BCE is 1949 + Y years before 1950 (there is no year 0).';
}

/** The eras' conventions, or the SI prefixes for a thousand-fold slip. */
const eraSources = (a: Quantity, b: Quantity): Source[] => (scaledApart(a, b) ? [NIST_SP_811] : eras(a, b));

/** The unit rule table. */
export const UNIT_RULES: readonly UnitRule[] = [
  { id: 'unit.percent-ppm', summary: 'A CO2 level restated between ppm and percent converts at 1% = 10,000 ppm; a CO2 share in percent is a level someone has measured.',
    find: percentPpm },
  { id: 'unit.ppb-ppm', summary: 'CO2 is given in parts per million (ppm); a CO2 level or change written in parts per billion (ppb) is a thousand times smaller.',
    // A figure that restates another ("430 ppm ... That is 430 ppb") is the restatement check's (unit.percent-ppm).
    find: (text, qs, previous) => {
      const restating = new Set(restatementsOf(['concentration', 'percent'], text, qs, previous).flatMap((p) => [p.first, p.second]));
      return co2PpbSlips(text, qs.filter((q) => !restating.has(q)), previous?.earlier ?? (previous === undefined ? [] : [previous.text]));
    } },
  { id: 'unit.temperature-difference', summary: 'A temperature change restated in °F is 1.8 times the change in °C or K, with no 32 added; restated in K it is the same number as in °C, with no 273.15 added.',
    find: (text, qs, previous) => {
      const pairs = restated(['temperature-change'], nist, temperatureChangeWhy, cuedAsChange)(text, qs, previous);
      const sums = offsetSumSlips(text, qs).filter((f) => !pairs.some((p) => p.stated.start === f.stated.start));
      const found = [...pairs, ...sums];
      return [...found, ...readingOffsets(text, qs, previous).filter((f) => !found.some((p) => p.stated.start === f.stated.start))];
    } },
  { id: 'unit.temperature', summary: 'A temperature reading restated in °F is 1.8 × °C + 32.',
    find: restated(['temperature'], nist, () => 'A temperature reading converts as °F = 1.8 × °C + 32.') },
  { id: 'unit.age-era', summary: 'A date restated in another era converts through years before AD 1950 (BP); b2k counts from AD 2000; there is no year 0.',
    find: restated(['age'], eraSources, eraWhy, () => true, asWrittenDate) },
  { id: 'unit.era-reference-year', summary: 'BP counts years before AD 1950 and b2k years before AD 2000: an age scale defined with the other year shifts every date by 50 years.',
    find: (text, qs) => eraDefinitionSlips(text, qs) },
  { id: 'unit.length', summary: 'A length restated in feet or miles converts at 1 ft = 0.3048 m and 1 mile = 1609.344 m.',
    find: restated(['length'], nist, () => '1 ft = 0.3048 m and 1 mile = 1609.344 m exactly.') },
  { id: 'unit.age-scale', summary: 'A date or span of the last glacial cycle or of an ice core written in millions of years where thousands were meant (Ma for ka, million for thousand).',
    find: (text, qs, previous) => scaleSlips(text, qs, previous?.text) },
  { id: 'unit.duration', summary: 'A duration restated in another unit (kyr, years, centuries) converts by powers of ten.',
    find: restated(['duration'], nist, () => '1 kyr = 1,000 years; 1 century = 100 years; 1 millennium = 1,000 years.') },
];
