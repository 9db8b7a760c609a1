/**
 * The one formatter for numbers, amounts and ranges, used by every report and by the packs'
 * descriptions: thousands separators, no float noise, the unit's own word (km, kyr, ppm, °F,
 * years ago), and calendar years as CE/BCE ("2024 CE", "10,000 BCE"), never as negative ages.
 * Values are given in the unit they are shown in; `fromCanonical` converts first when needed.
 */
import { unitDef } from '../rulepack/units.js';
import { groupedNumberFormat } from './grouped-number.js';

/** Words for units that have no pack label (internal names of the unit table). */
const UNIT_WORDS: Record<string, string> = {
  yr: 'years',
  degC: '°C',
  // Temperature differences: the draft's own unit, not the internal name (1 K = 1 °C difference, SI).
  'degC-change': '°C',
  'degF-change': '°F',
  degF: '°F',
  'ppm/yr': 'ppm per year',
  'K/yr': '°C per year',
  ratio: 'times',
  count: '',
  number: '',
};

const CALENDAR = new Set(['CE', 'BCE']);

/**
 * A number for an editor: thousands separated, at most ten significant digits (drops binary
 * rounding noise such as 0.1 + 0.2), open ends in words. `formatNumber(790000)` is `790,000`.
 */
export function formatNumber(value: number, digits = 10): string {
  if (value === Infinity) return 'no upper limit';
  if (value === -Infinity) return 'no lower limit';
  const rounded = Number(value.toPrecision(Math.max(1, digits)));
  return NUMBER_FORMAT.format(rounded);
}

/**
 * What `toLocaleString('en-US', { maximumFractionDigits: 12 })` writes, made once (making one per
 * number was a hot spot), and ICU loaded only for a number whose digits need it (grouped-number.ts).
 */
const NUMBER_FORMAT = groupedNumberFormat('en-US', 12);

/** The word written after a number in `unit` (`years`, `kyr`, `ppm`, `°F`, `years ago`), or the unit name. */
export function unitWord(unit: string): string {
  return unitDef(unit)?.label ?? UNIT_WORDS[unit] ?? unit;
}

/** A year of the calendar: `2024 CE`, `10,000 BCE` (there is no year 0: 0 CE is 1 BCE). */
function calendarYear(value: number, unit: string): string {
  const ce = unit === 'CE' ? value : 1 - value;
  const [year, era] = ce >= 1 ? [ce, 'CE'] : [1 - ce, 'BCE'];
  // A calendar year is a whole year: the ends of a hedged date ("around 9,000 BC") are shown so.
  const shown = Math.round(year);
  return `${shown >= 10_000 ? formatNumber(shown) : String(shown)} ${era}`;
}

/** A number with its unit word, e.g. `800,000 years`, `8 °C`, `2024 CE` (SI: a space between number and unit). */
export function formatAmount(value: number, unit: string): string {
  if (CALENDAR.has(unit) && Number.isFinite(value)) return calendarYear(value, unit);
  const word = unitWord(unit);
  return word === '' ? formatNumber(value) : `${formatNumber(value)} ${word}`;
}

/**
 * An interval: `790,000–810,000 years`; one amount when both ends agree; `at least` and `at most`
 * for half-open intervals; calendar years as `1998–2000 CE` or `50 BCE – 10 CE`.
 */
export function formatRange(low: number, high: number, unit: string): string {
  const [a, b] = low <= high ? [low, high] : [high, low];
  if (a === b || formatAmount(a, unit) === formatAmount(b, unit)) return formatAmount(a, unit);
  if (b === Infinity) return `at least ${formatAmount(a, unit)}`;
  if (a === -Infinity) return `at most ${formatAmount(b, unit)}`;
  if (CALENDAR.has(unit)) {
    const [first, last] = [calendarYear(a, unit), calendarYear(b, unit)].sort((x, y) => calendarOrder(x) - calendarOrder(y));
    const era = (t: string) => t.slice(t.lastIndexOf(' ') + 1);
    return era(first ?? '') === era(last ?? '') ? `${(first ?? '').replace(/ \S+$/u, '')}–${last}` : `${first} – ${last}`;
  }
  const word = unitWord(unit);
  const text = `${formatNumber(a)}–${formatNumber(b)}`;
  return word === '' ? text : `${text} ${word}`;
}

/** Sort key of a calendar year as written (`50 BCE` before `10 CE`). */
function calendarOrder(text: string): number {
  const [n, era] = text.split(' ');
  const year = Number((n ?? '0').replace(/,/gu, ''));
  return era === 'BCE' ? -year : year;
}
