/**
 * Finds the hedge or bound word of a quantity, from the hedge rows of the interval table:
 * before the number ("about 800,000 years", "~8e5", "more than twice") or after the unit
 * ("800,000 years or so"). Two readings are set aside because the words mean something else there:
 *  - "over", "under", "below", "above" before a length are places ("under 3,000 m of ice");
 *  - "over" before a duration after a change is "during" ("rose 80 ppm over 8,000 years").
 */
import { NUMBER_WORDS } from './number-words.js';
import type { Dimension } from '../types.js';
import { hedgeRule, INTERVAL_RULES, type IntervalRule } from './interval-rules.js';

/** A hedge found next to a quantity. */
export interface HedgeMatch {
  word: string;
  rule: IntervalRule;
  start: number;
  end: number;
}

const escape = (s: string): string => s.replace(/[.*+?^${}()|[\]\\]/g, '\\$&').replace(/ /g, String.raw`[\s\u00A0]+`);
const HEDGE_WORDS = INTERVAL_RULES.filter((r) => r.kind === 'hedge').flatMap((r) => r.words);
const byLength = (a: string, b: string): number => b.length - a.length;
const SUFFIXES = HEDGE_WORDS.filter((w) => w.startsWith('or ')).sort(byLength);
/** Hedges written onto the number itself ("420ish", "280-ish"): find-atoms.ts reads them with the digits. */
const GLUED = HEDGE_WORDS.filter((w) => w.startsWith('-'));
const PREFIXES = HEDGE_WORDS.filter((w) => !w.startsWith('or ') && !GLUED.includes(w)).sort(byLength);

/** Every hedge word written before a number, longest first, as a regular-expression alternation. */
export const HEDGE_PREFIX_PATTERN = PREFIXES.map(escape).join('|');

const BEFORE = new RegExp(String.raw`(?:^|(?<=[^\p{L}\p{N}]))(?<word>${PREFIXES.map(escape).join('|')})[\s\u00A0]*$`, 'iu');
const AFTER = new RegExp(String.raw`^[\s\u00A0]*,?[\s\u00A0]*(?<word>${SUFFIXES.map(escape).join('|')})(?![\p{L}])`, 'iu');
const PLACE_WORDS = /^(?:over|under|below|above)$/i;
const CHANGE_BEFORE_OVER = /(?:\d|%|(?:^|[^\p{L}])(?:rose|risen|rise|rising|fell|fallen|falling|warmed|warming|cooled|cooling|increased|decreased|dropped|declined|climbed|grew|changed|shifted|melted|retreated|advanced|accumulated|happened|occurred|unfolded|ppm|°C|K))[^.;]{0,30}$/iu;

/**
 * The hedge that ends `text` just before `at` (the start of the number), or undefined.
 * `dimension` is the quantity's reading, used for the two exceptions above.
 */
/** "from 190", "from about one-ninety", "from 190 ppm": the start of a from-to pair, just before "up to". */
const NUMBER_WORD = `(?:${NUMBER_WORDS.filter((w) => !['a', 'an', 'and', 'half'].includes(w)).join('|')})`;
const FROM_A_NUMBER = new RegExp(
  String.raw`\bfrom\s+(?:about\s+|around\s+|roughly\s+|some\s+)?(?:[\d.,]+|${NUMBER_WORD}(?:[\s-]${NUMBER_WORD})*)(?:\s*[\p{L}%°]+)?\s*$`,
  'iu',
);

export function hedgeBefore(text: string, at: number, dimension: Dimension): HedgeMatch | undefined {
  const head = text.slice(Math.max(0, at - 40), at);
  const m = BEFORE.exec(head);
  const word = m?.groups?.['word'];
  if (m === null || word === undefined) return undefined;
  const start = at - head.length + m.index + (m[0].length - m[0].trimStart().length);
  if (PLACE_WORDS.test(word) && dimension === 'length') return undefined;
  if (/^over$/i.test(word) && dimension === 'duration' && CHANGE_BEFORE_OVER.test(text.slice(Math.max(0, start - 60), start))) return undefined;
  // "from 190 up to 280": after "from" and a number, "up to" is the other end, not a bound.
  if (/^(?:up|down) to$/iu.test(word) && FROM_A_NUMBER.test(text.slice(Math.max(0, start - 40), start))) return undefined;
  const rule = hedgeRule(word);
  return rule === undefined ? undefined : { word, rule, start, end: start + word.length };
}

/** The hedge right after `at` (the end of the unit), such as ", or so", or undefined. */
export function hedgeAfter(text: string, at: number): HedgeMatch | undefined {
  const m = AFTER.exec(text.slice(at, at + 24));
  const word = m?.groups?.['word'];
  if (m === null || word === undefined) return undefined;
  const rule = hedgeRule(word);
  const end = at + m[0].length;
  return rule === undefined ? undefined : { word, rule, start: end - word.length, end };
}

/**
 * The hedge written onto a number's digits ("420ish", "280-ish"), which find-atoms.ts reads as part
 * of the number: from `start` (where the suffix begins) to `end`, or undefined.
 */
export function gluedHedge(text: string, start: number, end: number): HedgeMatch | undefined {
  const rule = hedgeRule('-ish');
  return start >= end || rule === undefined || !/^-?ish$/iu.test(text.slice(start, end)) ? undefined : { word: '-ish', rule, start, end };
}
