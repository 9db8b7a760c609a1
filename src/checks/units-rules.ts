/**
 * The unit rules as data. Restated conversions (ppm ↔ %, °C ↔ °F for changes and for readings,
 * dates across eras, m ↔ ft) are compared as intervals in the canonical unit; two slips are caught
 * on their own: a CO2 level written as a percentage above 1 ("280 percent") and a CO2 level in ppm
 * below 1 ("0.04 ppm").
 */
import { convert, formatQuantity } from '../quantities/index.js';
import type { Dimension, Level, Quantity, Source } from '../types.js';
import type { Derived } from './arithmetic-derive.js';
import { isStatedChange } from './arithmetic-frames.js';
import { B2K_CONVENTION, BP_CONVENTION, NIST_SP_811 } from './standard-sources.js';
import { findRestatements } from './units-pairs.js';

/** A quantity whose unit use is in doubt, with the value it should have. */
export interface UnitFinding {
  stated: Quantity;
  /** The right value in the stated quantity's canonical unit. */
  computed: Derived;
  reason: string;
  /** The replacement text, when it is not simply the stated words with a new number. */
  correction?: string;
  /** A fixed level for single-quantity slips; restatements take theirs from the level table. */
  level?: Level;
  /** The unit of `computed` when it is not the stated quantity's (a slip read in another unit). */
  unit?: string;
  sources: Source[];
}

/** One unit rule. */
export interface UnitRule {
  id: string;
  summary: string;
  find: (text: string, qs: Quantity[]) => UnitFinding[];
}

/** How far "years ago" may count from a year later than 1950: the present year, at most. */
const YEARS_SINCE_1950 = Math.max(0, new Date().getUTCFullYear() - 1950);
const CO2 = /(?:CO2|CO₂|carbon dioxide)/iu;
const OTHER_GAS = /(?:methane|CH4|CH₄|nitrous|N2O|N₂O)/iu;
const LEVEL_BEFORE = /(?:^|[^\p{L}])(?:at|of|reached|reaching|was|were|is|are|stood at|to|hit|peaked at|near|around|about|from|between|and)[\s\u00A0]*$/iu;

/** The stated quantity as an interval, widened for "years ago" counted from a later year than 1950. */
function heldAs(q: Quantity): Derived {
  const slack = q.statedUnit === 'yr ago' ? YEARS_SINCE_1950 : 0;
  return { value: q.value, low: q.low - slack, high: q.high };
}

function restated(dimensions: Dimension[], sources: (a: Quantity, b: Quantity) => Source[], why: (a: Quantity, b: Quantity) => string) {
  return (text: string, qs: Quantity[]): UnitFinding[] =>
    findRestatements(text, qs)
      .filter(({ first, second }) => dimensions.includes(first.dimension) && dimensions.includes(second.dimension))
      .map(({ first, second }) => {
        const computed = second.dimension === first.dimension ? heldAs(first) : percentOf(first);
        return { stated: { ...second, ...heldAs(second) }, computed, reason: why(first, second), sources: sources(first, second) };
      });
}

/** A concentration as a percentage of the air, or a percentage as ppm: the other reading of `q`. */
function percentOf(q: Quantity): Derived {
  const k = q.dimension === 'percent' ? convert(1, '%', 'ppm', 'concentration') : 1 / convert(1, '%', 'ppm', 'concentration');
  return { value: q.value * k, low: q.low * k, high: q.high * k };
}

function standaloneSlips(text: string, qs: Quantity[]): UnitFinding[] {
  if (!CO2.test(text)) return [];
  return qs.flatMap((q): UnitFinding[] => {
    const before = text.slice(Math.max(0, q.start - 24), q.start);
    const levelFrame = LEVEL_BEFORE.test(before) && !isStatedChange(text, q);
    if (q.dimension === 'percent' && levelFrame && q.value > 1) {
      return [{ stated: q, computed: { value: q.value, low: q.low, high: q.high }, unit: 'ppm', level: 'error', sources: [NIST_SP_811],
        reason: `CO2 has never made up ${q.text} of the air; ${q.value} reads as a level in ppm (1% = 10,000 ppm).`,
        correction: q.text.replace(/[\s\u00A0]*(?:%|per[\s\u00A0]?cent)$/iu, ' ppm') }];
    }
    if (q.dimension === 'concentration' && q.statedUnit === 'ppm' && levelFrame && q.high < 1 && !OTHER_GAS.test(text)) {
      return [{ stated: q, computed: { value: q.value, low: q.low, high: q.high }, unit: '%', level: 'warning', sources: [NIST_SP_811],
        reason: `A CO2 level of ${q.text} is far below any measured value; ${q.value} reads as a percentage of the air (${q.value}% = ${q.value * 1e4} ppm).`,
        correction: q.text.replace(/[\s\u00A0]*(?:ppmv?|parts per million)$/iu, '%') }];
    }
    return [];
  });
}

const nist = (): Source[] => [NIST_SP_811];
const eras = (a: Quantity, b: Quantity): Source[] => (a.statedUnit.includes('b2k') || b.statedUnit.includes('b2k') ? [BP_CONVENTION, B2K_CONVENTION] : [BP_CONVENTION]);

/** The unit rule table. */
export const UNIT_RULES: readonly UnitRule[] = [
  { id: 'unit.percent-ppm', summary: 'A CO2 level restated between ppm and percent converts at 1% = 10,000 ppm.',
    find: (text, qs) => [...restated(['concentration', 'percent'], nist, () => '1% of the air is 10,000 ppm.')(text, qs), ...standaloneSlips(text, qs)] },
  { id: 'unit.temperature-difference', summary: 'A temperature change restated in °F is 1.8 times the change in °C or K, with no 32 added.',
    find: restated(['temperature-change'], nist, (a) => `A change of ${a.text} is a change of ${formatQuantity(a.value, 'K', 'degF')}: differences convert by 9/5 alone; the 32 belongs to readings.`) },
  { id: 'unit.temperature', summary: 'A temperature reading restated in °F is 1.8 × °C + 32.',
    find: restated(['temperature'], nist, () => 'A temperature reading converts as °F = 1.8 × °C + 32.') },
  { id: 'unit.age-era', summary: 'A date restated in another era converts through years before AD 1950 (BP); b2k counts from AD 2000; there is no year 0.',
    find: restated(['age'], eras, () => 'BP counts years before AD 1950 and b2k before AD 2000; Y BCE is 1949 + Y years before 1950 (there is no year 0).') },
  { id: 'unit.length', summary: 'A length restated in feet or miles converts at 1 ft = 0.3048 m and 1 mile = 1609.344 m.',
    find: restated(['length'], nist, () => '1 ft = 0.3048 m and 1 mile = 1609.344 m exactly.') },
  { id: 'unit.duration', summary: 'A duration restated in another unit (kyr, years, centuries) converts by powers of ten.',
    find: restated(['duration'], nist, () => '1 kyr = 1,000 years; 1 century = 100 years; 1 millennium = 1,000 years.') },
];
