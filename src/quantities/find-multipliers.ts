/**
 * Multipliers and fractions, read as ratios: "twice", "doubled", "three-fold", "2.5 times higher",
 * "a third", "two thirds", "halved". Written in words they take the multiplier-word row of the
 * interval table; written in digits ("3-fold"), the precision row.
 */
import type { Atom } from './find-atoms.js';
import { halfPlace } from './precision.js';
import { CHANGE_SUBJECT_NOUNS } from './reading-cues.js';

/** Cardinals in words a multiplier is written with: units and teens, tens, and a ten joined to a unit ("twenty-five"). */
const UNITS: Record<string, number> = {
  two: 2, three: 3, four: 4, five: 5, six: 6, seven: 7, eight: 8, nine: 9, ten: 10, eleven: 11, twelve: 12, thirteen: 13, fourteen: 14, fifteen: 15,
  sixteen: 16, seventeen: 17, eighteen: 18, nineteen: 19, hundred: 100, thousand: 1000,
};
const TENS: Record<string, number> = { twenty: 20, thirty: 30, forty: 40, fifty: 50, sixty: 60, seventy: 70, eighty: 80, ninety: 90 };
const ONES = ['one', 'two', 'three', 'four', 'five', 'six', 'seven', 'eight', 'nine'];
const SMALL: Record<string, number> = { ...UNITS, ...TENS };
/** The value of a multiplier written in words: "twenty-five" is 25, "forty" 40. */
const wordValue = (word: string): number => {
  const [ten, one] = word.toLowerCase().split(/[-\s\u00A0]+/u);
  return (SMALL[ten ?? ''] ?? Number.NaN) + (one === undefined ? 0 : ONES.indexOf(one) + 1);
};
const VERBS: [RegExp, number][] = [
  [/^(?:twice|double[sd]?|doubling)$/i, 2],
  [/^(?:thrice|triple[sd]?|tripling)$/i, 3],
  [/^(?:quadruple[sd]?|quadrupling)$/i, 4],
  [/^(?:halved|halves|halving|halve)$/i, 0.5],
];
const FRACTIONS: Record<string, number> = { half: 1 / 2, third: 1 / 3, quarter: 1 / 4, fifth: 1 / 5, tenth: 1 / 10, thirds: 1 / 3, quarters: 1 / 4, fifths: 1 / 5, tenths: 1 / 10 };
const COUNTS: Record<string, number> = { a: 1, one: 1, two: 2, three: 3, four: 4 };
const SMALL_WORDS = `(?:${Object.keys(TENS).join('|')})[-\\s\\u00A0](?:${ONES.join('|')})|${Object.keys(SMALL).join('|')}`;

/** "two and a half times", "one and a half times": a multiplier in words with a half added (number words of English). */
const AND_A_HALF = String.raw`[\s\u00A0-]+and[\s\u00A0-]+an?[\s\u00A0-]+half`;

const VERB = /(?<![\p{L}])(?:twice|thrice|double[sd]?|doubling|triple[sd]?|tripling|quadruple[sd]?|quadrupling|halved|halves|halving|halve)(?![\p{L}])/giu;
const FOLD = new RegExp(String.raw`(?<![\p{L}\p{N}.])(?:(?<d>\d+(?:\.\d+)?)|(?<w>${SMALL_WORDS}))[-\s]?fold(?![\p{L}])`, 'giu');
// "20 times", "1,000 times", "twenty-odd times", "20x faster", "20× the pace" ("-odd" and "x" read as
// the number written; a comma groups thousands).
const TIMES = new RegExp(
  String.raw`(?<![\p{L}\p{N}.])(?:(?<d>\d{1,3}(?:,\d{3})+(?:\.\d+)?|\d+(?:\.\d+)?)|(?<w>${SMALL_WORDS}|one(?=${AND_A_HALF}))(?<half>${AND_A_HALF})?(?:-odd)?)(?:[\s\u00A0]+times|[\s\u00A0]?[x×])(?=[\s\u00A0]+(?:as|more|higher|greater|larger|bigger|lower|smaller|less|faster|slower|longer|shorter|that|the|what|its|their|above|below|over)(?![\p{L}]))`,
  'giu',
);
/**
 * "a factor of ten", "by a factor of 2.5": a multiple named by its noun (common practice of
 * English), read as a ratio, so the number is no amount of the unit stated beside it.
 */
const FACTOR = new RegExp(String.raw`(?<![\p{L}])factor[\s\u00A0]+of[\s\u00A0]+(?:(?<d>\d{1,3}(?:,\d{3})+(?:\.\d+)?|\d+(?:\.\d+)?)(?![\d,.]*\d)|(?<w>${SMALL_WORDS})(?![\p{L}]))`, 'giu');
/**
 * "a ratio of roughly 18 to 1", "a ratio of 185:1", "a 20-to-1 ratio": a multiple written as a ratio
 * to one (common practice of English), read so only next to the noun "ratio", so a range ("from 10
 * to 1 ppm") stays a range and a bare "3:1" stays two numbers; a clock time ("10:15") has more
 * digits after the colon.
 */
const TO_ONE = new RegExp(String.raw`(?<![\p{L}\p{N}.,:])(?<d>\d{1,3}(?:,\d{3})+(?:\.\d+)?|\d+(?:\.\d+)?)(?:[\s\u00A0]*:[\s\u00A0]*|[\s\u00A0-]+to[\s\u00A0-]+)1(?![\d.,:]\d|\d)`, 'giu');
const RATIO_NOUN_BEFORE = /(?:^|[^\p{L}])ratios?(?:[\s\u00A0]+(?:is|was|of|at|near|about|around|roughly|some|nearly|almost|approximately|close[\s\u00A0]+to|more[\s\u00A0]+than|over|under))*[\s\u00A0]*$/iu;
const RATIO_NOUN_AFTER = /^[\s\u00A0-]+ratios?(?![\p{L}])/iu;

function toOneAtom(text: string, m: RegExpExecArray): Atom | undefined {
  const end = m.index + m[0].length;
  // A unit sign after "1" makes it the end of a range ("10 to 1 %").
  if (/^[\s\u00A0]*(?:%|‰|°)/u.test(text.slice(end, end + 3))) return undefined;
  if (!RATIO_NOUN_BEFORE.test(text.slice(Math.max(0, m.index - 60), m.index)) && !RATIO_NOUN_AFTER.test(text.slice(end))) return undefined;
  const d = m.groups?.['d']?.replace(/,/gu, '') ?? '';
  return atom(m.index, end, Number(d), halfPlace(d), 'precision');
}

const FRACTION = /(?<![\p{L}])(?:(?<count>a|one|two|three|four)[\s\u00A0-]+(?<part>half|third|quarter|fifth|tenth|thirds|quarters|fifths|tenths)|(?<half>half))(?![\p{L}])/giu;
/** A fraction counts only in a ratio frame: "by a third", "about half", "half as much", "a third of". */
const FRACTION_BEFORE = /(?:^|[^\p{L}])(?:by|to|in|about|nearly|almost|roughly|only|some|around|over|than|just|cut|fell|rose|lost|gained|barely|more|less)[\s\u00A0]+$/iu;
const FRACTION_AFTER = /^[\s\u00A0]+(?:as|of|that)(?![\p{L}])/iu;
/**
 * A change noun and "of" before a fraction make it a relative change: "a rise of one third", "an
 * increase of two-thirds", "a drop of a quarter" (plurals of the nouns too). The nouns are the ones the
 * quantity reader already knows as a change (reading-cues.ts CHANGE_SUBJECT_NOUNS).
 */
const FRACTION_OF_CHANGE = new RegExp(String.raw`(?:^|[^\p{L}])(?:${CHANGE_SUBJECT_NOUNS.join('|')})s?[\s\u00A0]+of[\s\u00A0]+$`, 'iu');
const NOT_FRACTION_BEFORE = /(?:^|[^\p{L}])(?:the|first|second|latter|former|other|last|next|and|southern|northern|eastern|western)[\s\u00A0]+$/iu;

/**
 * Where a fraction written in words stands in a quantity's own text ("one third", "about two-thirds",
 * "half"), for a correction that rewrites it: the quantity was read as a fraction in its sentence's
 * frame, which its text alone no longer holds.
 */
export function fractionWordsIn(text: string): { start: number; end: number } | undefined {
  const m = new RegExp(FRACTION.source, 'iu').exec(text);
  return m === null ? undefined : { start: m.index, end: m.index + m[0].length };
}

function atom(start: number, end: number, value: number, half: number, rule: string): Atom {
  return { start, end, value, half, scale: 1, form: 'multiplier', rule, plainInteger: false, sign: '' };
}

function numberAtom(m: RegExpExecArray): Atom {
  const d = m.groups?.['d']?.replace(/,/gu, '');
  const end = m.index + m[0].length;
  if (d !== undefined) return atom(m.index, end, Number(d), halfPlace(d), 'precision');
  // "twenty-odd": twenty and some more, below thirty (read by the precision row as 25 ± 5).
  const w = m.groups?.['w'] ?? '';
  const word = (w.toLowerCase() === 'one' ? 1 : wordValue(w)) + (m.groups?.['half'] === undefined ? 0 : 0.5);
  if (/-odd/iu.test(m[0])) return atom(m.index, end, word * 1.25, word / 4, 'precision');
  return atom(m.index, end, word, 0, 'multiplier-word');
}

function fractionAtom(text: string, m: RegExpExecArray): Atom | undefined {
  const end = m.index + m[0].length;
  const before = text.slice(Math.max(0, m.index - 24), m.index);
  if (NOT_FRACTION_BEFORE.test(before)) return undefined;
  if (!FRACTION_BEFORE.test(before) && !FRACTION_OF_CHANGE.test(before) && !FRACTION_AFTER.test(text.slice(end, end + 8))) return undefined;
  const g = m.groups ?? {};
  const value = g['half'] !== undefined ? 0.5 : (COUNTS[(g['count'] ?? '').toLowerCase()] ?? 1) * (FRACTIONS[(g['part'] ?? '').toLowerCase()] ?? Number.NaN);
  return atom(m.index, end, value, 0, 'multiplier-word');
}

/** Every multiplier and fraction in `text` (they may overlap other numbers; findAtoms resolves that). */
export function findMultipliers(text: string): Atom[] {
  const out: Atom[] = [];
  for (const m of text.matchAll(VERB)) {
    const value = VERBS.find(([re]) => re.test(m[0]))?.[1] ?? Number.NaN;
    out.push(atom(m.index, m.index + m[0].length, value, 0, 'multiplier-word'));
  }
  for (const m of text.matchAll(FOLD)) out.push(numberAtom(m));
  for (const m of text.matchAll(TIMES)) out.push(numberAtom(m));
  for (const m of text.matchAll(FACTOR)) out.push(numberAtom(m));
  for (const m of text.matchAll(TO_ONE)) {
    const a = toOneAtom(text, m);
    if (a !== undefined) out.push(a);
  }
  for (const m of text.matchAll(FRACTION)) {
    const a = fractionAtom(text, m);
    if (a !== undefined) out.push(a);
  }
  return out.filter((a) => Number.isFinite(a.value));
}
