import { formatRange } from '../format/value.js';
import type { ShownValue } from '../types.js';

// Numbers, amounts and ranges: the one formatter every report and pack description shares.
export { formatAmount, formatNumber, formatRange } from '../format/value.js';

/** What the draft wrote and how Firnline read it: `"about 400,000 years" (read as 395,000–405,000 years)`. */
export function formatClaimed(value: ShownValue): string {
  return `"${value.text}" (read as ${formatRange(value.low, value.high, value.unit)})`;
}

/** Ends a sentence with a full stop unless it already ends with one (or ? or !). */
export function asSentence(text: string): string {
  const trimmed = text.trim();
  return /[.!?]["')\]]?$/.test(trimmed) ? trimmed : `${trimmed}.`;
}
