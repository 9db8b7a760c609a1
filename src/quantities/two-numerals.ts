/**
 * The cheap test before a sentence that names no subject gets the arithmetic and unit checks: two
 * numbers in it, in digits or in words ("went up about 80 metres between nineteen thousand and
 * eleven thousand years ago"). A spoken draft writes most of its numbers in words.
 */
import { NUMBER_WORDS } from './number-words.js';

/** Words that are numbers on their own (not "a", "and", "half", which only join a number). */
const NUMERAL_WORDS = NUMBER_WORDS.filter((word) => !['a', 'an', 'and', 'half'].includes(word));
const NUMERAL = new RegExp(String.raw`\d+(?:[.,]\d+)*|(?<![\p{L}])(?:${NUMERAL_WORDS.join('|')})(?![\p{L}])`, 'giu');

/** True when `text` holds at least two numbers, each in digits or one number word. */
export function hasTwoNumerals(text: string): boolean {
  NUMERAL.lastIndex = 0;
  let seen = 0;
  while (NUMERAL.exec(text) !== null) if (++seen >= 2) return true;
  return false;
}

/** True when `text` holds a number, in digits or as a number word ("about 1,800 years", "call it nine"). */
export function hasNumeral(text: string): boolean {
  NUMERAL.lastIndex = 0;
  return NUMERAL.exec(text) !== null;
}
