/**
 * Every unit Firnline reads or writes, as data: canonical value = factor × stated value + offset,
 * where the canonical unit of each dimension is the one named in src/types.ts.
 * Factors: 1 ft = 0.3048 m and 1 mile = 1609.344 m exactly, 1 °F (interval) = 5/9 K, t/°C =
 * (t/°F − 32)/1.8 and t/°C = T/K − 273.15 (NIST SP 811, 2008 edition, Appendix B.8 and B.9).
 * Ages: BP = years before AD 1950 (Stuiver & Polach 1977); b2k = years before AD 2000 (Walker et al.
 * 2009), so BP = b2k − 50; there is no year 0, so Y BCE = (1949 + Y) BP and Y CE = (1950 − Y) BP.
 */
import type { Dimension } from '../types.js';
import { ANNUM, YEAR_WORD, symbol, words } from './unit-forms.js';

/** One unit of one dimension. The same id may appear in two dimensions (°C as a temperature and as a change). */
export interface UnitDef {
  /** The normalised stated unit, e.g. `kyr`, `degF`, `yr ago`. */
  id: string;
  dimension: Dimension;
  factor: number;
  offset: number;
  /** How a corrected value is written in this unit, e.g. `kyr`, `°F`, `years ago`. */
  display: string;
  /** Written forms, as case-sensitive regular-expression sources; empty for units only used in conversions. */
  forms: string[];
}

const u = (id: string, dimension: Dimension, factor: number, display: string, forms: string[], offset = 0): UnitDef => ({
  id,
  dimension,
  factor,
  offset,
  display,
  forms,
});

const BP = String.raw`(?:BP|B\.P\.)`;
/**
 * The words that count an age back from now: "ago", and as people also write it, "back" ("fifty
 * thousand years back"; not "back then", "back in", which date a time and speak of no span),
 * "before present" (or "before the present"), "before now", "before today", "in the past" (common practice); for years,
 * millennia and centuries. After kyr or Ma only "ago" and "before present" make an age ("reaches
 * 420 kyr back" stays the span it was read as).
 */
const AGO_WORDS = '(?:ago|back(?! (?:then|in(?! (?:time|the past)\\b)|when|to|from|at|during|before|after|and|or|of|by|up|down|out|over)\\b)|before (?:the present|present|now|today)|in the past)';
const AGO = words('(?:ago|before (?:the )?present)');
/**
 * A bare "degrees" is a temperature (read as Celsius, the science writer's default: common practice)
 * only in a clause about temperature: a comparative or a warming word right after it ("one degree
 * colder", "six degrees of warming") or a temperature word shortly before ("the temperature rose by
 * twenty-five degrees"), and never near an angle ("the tilt varies by about 2.4 degrees", "75 degrees south").
 */
const LETTERS = String.raw`\p{L}*`;
const ANGLE_CUE = `(?:${['tilt', 'obliquit', 'axi', 'latitude', 'longitude', 'angle', 'inclin', 'rotat', 'compass', 'arc'].map((w) => words(w) + LETTERS).join('|')})`;
// Climate sensitivity is warming per doubling of CO2 (IPCC AR6 WGI, ch. 7): "sensitivity" and
// "doubling" before, "per doubling" or "of eventual warming" after, make bare degrees a temperature.
const TEMPERATURE_CUE = `(?:${['temperature', 'thermometer', 'warm', 'cool', 'cold', 'heat', 'hotter', 'chill', 'sensitivit', 'doubl'].map((w) => words(w) + LETTERS).join('|')})`;
const TEMPERATURE_AFTER = words('(?:colder|warmer|cooler|hotter|chillier|of (?:warming|cooling|cold|warmth)|of (?:eventual|further|extra|additional|equilibrium|long-term) warming|(?:per|for (?:a|each|every|one|such a)) doubling)');
/** "degrees", and its clippings "deg" and "degs" as people type them ("4-7deg colder", "about 6 degs warmer"). */
const BARE_DEGREE_WORD = words('(?:degrees?|degs?)');
const BARE_DEGREES = String.raw`(?<!(?<![\p{L}])${ANGLE_CUE}(?![\p{L}])(?:[^.;:!?]|\.(?=\d)){0,80})${BARE_DEGREE_WORD}(?![\s\u00A0]+(?:[nN]orth|[sS]outh|[eE]ast|[wW]est|[NSEW](?![\p{L}])))(?:(?<=(?<![\p{L}])${TEMPERATURE_CUE}(?![\p{L}])(?:[^.;:!?]|\.(?=\d)){0,60}[\p{N}\p{L}][\s\u00A0-]*${BARE_DEGREE_WORD})|(?=[\s\u00A0]+${TEMPERATURE_AFTER}(?![\p{L}])))`;
/**
 * A bare capital C after a number is a Celsius figure in a clause about temperature, as people write
 * it in posts and chat ("the world was ~6C colder", "warmed something like 8-10 C coming out of the
 * last glacial", "a 6C drop"): a comparative, a warming word or a noun of change right after it, or a
 * temperature word shortly before it, as for bare degrees (common practice); or a minus sign before
 * the number ("-12 C": below zero is a temperature). With none of these it is not read, and "14C" written solid is radiocarbon whatever follows.
 */
const C_CHANGE_AFTER = words('(?:drop|swing|rise|fall|change|difference|shift|jump|increase|decrease|cooling|warming|warm-?up|cool-?down|colder|warmer|cooler|hotter)');
const BARE_C = String.raw`(?<!(?<![\p{N}.,])14)C(?:(?<=(?<![\p{N}\p{L}])[-\u2212]\p{N}[\p{N}.,]*[\s\u00A0]?C)|(?<=(?<![\p{L}])${TEMPERATURE_CUE}(?![\p{L}])(?:[^.;:!?]|\.(?=\d)){0,60}\p{N}[\s\u00A0-]*C)|(?=[\s\u00A0]+(?:${TEMPERATURE_AFTER}|${C_CHANGE_AFTER})(?![\p{L}])))`;
/**
 * The scale's name alone after a number is its degree too, as people write it ("about 43 Fahrenheit",
 * "minus 40 Celsius"), and a bare capital F after a number is a Fahrenheit figure ("9 F for the folks
 * back home"; common practice in US writing); "deg F" and "deg. C" are the abbreviated degree.
 */
const DEG_C = [symbol('° C'), 'ºC', '℃', words('(?:degrees? )?(?:celsius|centigrade)'), symbol('degrees? C'), symbol('deg\\.? C'), BARE_DEGREES, BARE_C];
const DEG_F = [symbol('° F'), 'ºF', '℉', words('(?:degrees? )?fahrenheit'), symbol('degrees? F'), symbol('deg\\.? F'), 'F'];
const KELVIN = ['K', words('kelvins?')];
const PPM = ['ppmv?', words('parts? per million(?: by volume)?')];
const PPB = ['ppbv?', words('parts? per billion(?: by volume)?')];

const BASE_UNITS: UnitDef[] = [
  u('yr', 'duration', 1, 'years', [YEAR_WORD, ANNUM]),
  u('kyr', 'duration', 1e3, 'kyr', ['kyrs?', 'ky', String.raw`k\.y\.`]),
  u('Myr', 'duration', 1e6, 'Myr', ['Myrs?', 'My', String.raw`m\.y\.`]),
  u('ka', 'duration', 1e3, 'ka', ['ka']),
  u('Ma', 'duration', 1e6, 'Ma', ['Ma']),
  u('decade', 'duration', 10, 'decades', [words('decades?')]),
  u('century', 'duration', 100, 'centuries', [words('(?:century|centuries)')]),
  u('millennium', 'duration', 1e3, 'millennia', [words('(?:millennium|millennia|millenniums)')]),
  u('yr BP', 'age', 1, 'years BP', [
    String.raw`(?:[cC]al(?:ibrated)?\.?[\s\u00A0]+)?(?:${YEAR_WORD}[\s\u00A0]+)?${BP}`,
    words('(?:years?|yrs?) before (?:the )?present'),
    // "11,750 years before 1950", "... before the year 1950": the BP convention's reference year written out (Stuiver & Polach 1977).
    words('(?:years?|yrs?) before (?:the year |ad )?1950'),
  ]),
  u('yr ago', 'age', 1, 'years ago', [words(`(?:years?|yrs?) ${AGO_WORDS}`)]),
  // "fifty millennia ago", "twelve centuries ago": an age counted in longer units.
  u('millennia ago', 'age', 1e3, 'millennia ago', [words(`(?:millennium|millennia|millenniums) ${AGO_WORDS}`)]),
  u('centuries ago', 'age', 100, 'centuries ago', [words(`(?:century|centuries) ${AGO_WORDS}`)]),
  u('ka', 'age', 1e3, 'ka', [String.raw`(?:[cC]al[\s\u00A0]+)?(?:ka|kyrs?|ky)[\s\u00A0]+(?:${BP}|${AGO})`, 'ka']),
  u('Ma', 'age', 1e6, 'Ma', [String.raw`(?:Ma|Myrs?|My)[\s\u00A0]+(?:${BP}|${AGO})`, 'Ma']),
  u('yr b2k', 'age', 1, 'years b2k', [
    String.raw`(?:${YEAR_WORD}[\s\u00A0]+)?b2k`,
    // "11,700 years before the year 2000": the b2k reference year written out (Walker et al. 2009).
    words('(?:years?|yrs?) before (?:the year |ad )?2000'),
  ], -50),
  u('ka b2k', 'age', 1e3, 'ka b2k', [String.raw`(?:ka|kyrs?)[\s\u00A0]+b2k`], -50),
  // "11,700 years BCE", "9700 yrs BC": a year word before the era is still a date.
  u('BCE', 'age', 1, 'BCE', [String.raw`(?:${YEAR_WORD}[\s\u00A0]+)?(?:BCE|BC|B\.C\.E\.|B\.C\.)`], 1949),
  u('CE', 'age', -1, 'CE', ['CE', 'AD', String.raw`C\.E\.`, String.raw`A\.D\.`], 1950),
  u('ppm', 'concentration', 1, 'ppm', PPM),
  u('ppb', 'concentration', 1e-3, 'ppb', PPB),
  // A percentage of the air, for the ppm ↔ % check only: the parser reads "%" as a percent.
  u('%', 'concentration', 1e4, '%', []),
  // Per mille (‰): a thousandth of the air by volume, 1‰ = 1,000 ppm (SI: 10^-3).
  u('permille', 'concentration', 1e3, '‰', ['‰', words('per (?:mille|mil)')]),
  u('%', 'percent', 1, '%', ['%', words('per(?: |)cent')]),
  u('degC', 'temperature', 1, '°C', DEG_C),
  u('degF', 'temperature', 5 / 9, '°F', DEG_F, -32 * (5 / 9)),
  u('K', 'temperature', 1, 'K', KELVIN, -273.15),
  u('degC', 'temperature-change', 1, '°C', DEG_C),
  u('degF', 'temperature-change', 5 / 9, '°F', DEG_F),
  u('K', 'temperature-change', 1, 'K', KELVIN),
  u('m', 'length', 1, 'm', ['m', words('(?:metres?|meters?)')]),
  u('km', 'length', 1e3, 'km', ['km', words('(?:kilometres?|kilometers?)')]),
  u('cm', 'length', 1e-2, 'cm', ['cm', words('(?:centimetres?|centimeters?)')]),
  u('mm', 'length', 1e-3, 'mm', ['mm', words('(?:millimetres?|millimeters?)')]),
  u('ft', 'length', 0.3048, 'ft', ['ft', words('(?:feet|foot)')]),
  u('mi', 'length', 1609.344, 'miles', [words('miles?')]),
  // A partitive counts the same things: "eight of those ice-age cycles", "ten of these cycles".
  u('count', 'count', 1, '', [
    words(
      '(?:of (?:those|these|the|its|their) )?(?:(?:full|major|complete|distinct|separate|great|big|large) )?(?:glacial(?:[-–]| )interglacial (?:cycles?|periods?)|glacial (?:cycles?|periods?)|ice(?:-| )age cycles|ice(?:-| )ages?|glaciations?|interglacials?|glacials|terminations?|cycles)',
    ),
  ]),
  u('ratio', 'ratio', 1, 'times', []),
  u('', 'number', 1, '', []),
  u('number', 'number', 1, '', []),
];

const PER = String.raw`[\s\u00A0]*(?:\/|${words('per|an?|each|every')})[\s\u00A0]*`;
const PER_DURATION: { id: string; years: number; forms: string }[] = [
  { id: 'yr', years: 1, forms: String.raw`(?:${PER}(?:${YEAR_WORD}|${words('annum')}|a)|[\s\u00A0]*(?:yr|a)(?:⁻¹|-1|\^-1))` },
  { id: 'decade', years: 10, forms: `${PER}${words('decade')}` },
  { id: 'century', years: 100, forms: `${PER}${words('century')}` },
  { id: 'kyr', years: 1e3, forms: `${PER}(?:${words('millennium|thousand years')}|kyr|ka)` },
];
const RATE_BASES: { id: string; dimension: Dimension; factor: number; display: string; forms: string[] }[] = [
  { id: 'ppm', dimension: 'concentration-rate', factor: 1, display: 'ppm', forms: PPM },
  { id: 'ppb', dimension: 'concentration-rate', factor: 1e-3, display: 'ppb', forms: PPB },
  { id: 'degC', dimension: 'temperature-rate', factor: 1, display: '°C', forms: DEG_C },
  { id: 'K', dimension: 'temperature-rate', factor: 1, display: 'K', forms: KELVIN },
  { id: 'degF', dimension: 'temperature-rate', factor: 5 / 9, display: '°F', forms: DEG_F },
  // Sea level and ice thickness change in metres, centimetres or millimetres a year or century.
  { id: 'm', dimension: 'length-rate', factor: 1, display: 'm', forms: ['m', words('(?:metres?|meters?)')] },
  { id: 'cm', dimension: 'length-rate', factor: 1e-2, display: 'cm', forms: ['cm', words('(?:centimetres?|centimeters?)')] },
  { id: 'mm', dimension: 'length-rate', factor: 1e-3, display: 'mm', forms: ['mm', words('(?:millimetres?|millimeters?)')] },
  { id: 'ft', dimension: 'length-rate', factor: 0.3048, display: 'ft', forms: ['ft', words('(?:feet|foot)')] },
];
const PER_WORDS: Record<string, string> = { yr: 'year', decade: 'decade', century: 'century', kyr: 'thousand years' };

/** Rates: every concentration, temperature-change or length unit per every duration (ppm/yr, degC/century, mm/yr...). */
const RATE_UNITS: UnitDef[] = RATE_BASES.flatMap((base) =>
  PER_DURATION.map((per) =>
    u(`${base.id}/${per.id}`, base.dimension, base.factor / per.years, `${base.display} per ${PER_WORDS[per.id] ?? per.id}`, [
      `(?:${base.forms.join('|')})${per.forms}`,
    ]),
  ),
);

/** "per metre", "to every metre", "a metre", "/m": what follows the years in a depth-age gradient. */
const PER_LENGTH = String.raw`[\s\u00A0]*(?:\/|${words('(?:per|an?|each|every|(?:to|for|in) (?:each|every|a|one))')}[\s\u00A0]*)`;
/** Years per metre or centimetre of ice: how much time one unit of depth holds ("75 years per metre"). */
const PER_LENGTH_UNITS: UnitDef[] = [
  u('yr/m', 'duration-per-length', 1, 'years per metre', [`${YEAR_WORD}${PER_LENGTH}(?:${words('(?:metres?|meters?)')}|m)`]),
  u('yr/cm', 'duration-per-length', 100, 'years per centimetre', [`${YEAR_WORD}${PER_LENGTH}(?:${words('(?:centimetres?|centimeters?)')}|cm)`]),
];

/** The unit table: every unit, its dimension, its factor and offset to the canonical unit, and its written forms. */
export const UNIT_TABLE: readonly UnitDef[] = [...BASE_UNITS, ...RATE_UNITS, ...PER_LENGTH_UNITS];

/** The canonical unit of each dimension (as in src/types.ts). */
export const CANONICAL_UNIT: Record<Dimension, string> = {
  duration: 'yr',
  age: 'yr BP',
  concentration: 'ppm',
  'temperature-change': 'K',
  temperature: 'degC',
  length: 'm',
  'concentration-rate': 'ppm/yr',
  'temperature-rate': 'K/yr',
  'length-rate': 'm/yr',
  'duration-per-length': 'yr/m',
  count: 'count',
  ratio: 'ratio',
  percent: '%',
  number: 'number',
};
