/**
 * Figures that are no operands of the draft's own sums:
 *  - a time told vaguely ("several centuries", "a few decades", "thousands of years"): it says
 *    roughly how long, and a writer does no division on it (common practice of English);
 *  - a day of the month in a date line ("4 Jun", "June 4", "03 Nov"): a calendar day, not an amount.
 */
import type { Quantity } from '../types.js';

const S = String.raw`[\s\u00A0]`;
const VAGUE_TIME = new RegExp(
  String.raw`^(?:(?:about|some|roughly|around|many|several|a${S}+few)${S}+)?(?:a${S}+(?:few|couple)|several|some${S}+(?:few|centuries|millennia|decades)|many|centuries|millennia|decades|tens|dozens|hundreds|thousands|millions)(?![\p{L}])`,
  'iu',
);
const MONTHS = String.raw`(?:jan|feb|mar|apr|may|jun|jul|aug|sep|sept|oct|nov|dec)[a-z]*\.?`;
const MONTH_AFTER = new RegExp(String.raw`^${S}*(?:of${S}+)?${MONTHS}(?![\p{L}])`, 'iu');
const MONTH_BEFORE = new RegExp(String.raw`(?:^|[^\p{L}])${MONTHS}${S}*$`, 'iu');

/** True when a time is told vaguely: "several centuries", "a few decades", "thousands of years". */
export function isVagueTime(text: string): boolean {
  return VAGUE_TIME.test(text);
}

/** True when a bare whole number from 1 to 31 stands next to a month's name: a calendar day. */
export function isCalendarDay(text: string, q: Quantity): boolean {
  if (q.dimension !== 'number' || !Number.isInteger(q.value) || q.value < 1 || q.value > 31) return false;
  return MONTH_AFTER.test(text.slice(q.end, q.end + 16)) || MONTH_BEFORE.test(text.slice(Math.max(0, q.start - 16), q.start));
}

/** The quantities of a sentence that can be operands: calendar days left out. */
export function operandsOf(text: string, qs: Quantity[]): Quantity[] {
  return qs.some((q) => isCalendarDay(text, q)) ? qs.filter((q) => !isCalendarDay(text, q)) : qs;
}
