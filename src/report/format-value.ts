import type { ShownValue } from '../types.js';

/** How a canonical unit is written after a number; a unit not listed is written as it is. */
const UNIT_WORDS: Record<string, string> = {
  degC: '°C',
  // Temperature differences: the draft's own unit, not the internal name (1 K = 1 °C difference, SI).
  'degC-change': '°C',
  'degF-change': '°F',
  'ppm/yr': 'ppm per year',
  'K/yr': '°C per year',
  ratio: 'times',
  count: '',
};

const NUMBER_FORMAT = new Intl.NumberFormat('en-US', { maximumFractionDigits: 20 });

/**
 * A number for an editor: thousands separated, no float noise (0.1 + 0.2 shows as 0.3), open ends
 * in words. `formatNumber(790000)` is `790,000`.
 */
export function formatNumber(value: number): string {
  if (value === Infinity) return 'no upper limit';
  if (value === -Infinity) return 'no lower limit';
  // Twelve significant digits is far beyond any reference value and drops binary rounding noise.
  return NUMBER_FORMAT.format(Number(value.toPrecision(12)));
}

/** A number with its unit, e.g. `800,000 yr`, `-8 °C` (SI: a space between number and unit). */
export function formatAmount(value: number, unit: string): string {
  const word = UNIT_WORDS[unit] ?? unit;
  return word === '' ? formatNumber(value) : `${formatNumber(value)} ${word}`;
}

/**
 * An interval in words: `790,000 to 810,000 yr`; one number when both ends agree; `at least` and
 * `at most` for half-open intervals.
 */
export function formatRange(low: number, high: number, unit: string): string {
  if (low === high) return formatAmount(low, unit);
  if (high === Infinity) return `at least ${formatAmount(low, unit)}`;
  if (low === -Infinity) return `at most ${formatAmount(high, unit)}`;
  const word = UNIT_WORDS[unit] ?? unit;
  const tail = word === '' ? '' : ` ${word}`;
  return `${formatNumber(low)} to ${formatNumber(high)}${tail}`;
}

/** What the draft wrote and how Firnline read it: `"about 400,000 years" (read as 395,000 to 405,000 yr)`. */
export function formatClaimed(value: ShownValue): string {
  return `"${value.text}" (read as ${formatRange(value.low, value.high, value.unit)})`;
}

/** Ends a sentence with a full stop unless it already ends with one (or ? or !). */
export function asSentence(text: string): string {
  const trimmed = text.trim();
  return /[.!?]["')\]]?$/.test(trimmed) ? trimmed : `${trimmed}.`;
}
