/**
 * A quantity's own words with a new value in place of its number, for corrections: the hedge and
 * the unit stay as the draft wrote them. "about 120 ppm" with 100 ppm → "about 100 ppm";
 * "41 °F" with 5 K → "9 °F"; "10,000 years ago" with 11,949 yr BP → "11,900 years ago".
 */
import type { Quantity } from '../types.js';
import { fromCanonical } from './convert.js';
import { findAtoms } from './find-atoms.js';
import { fractionWordsIn } from './find-multipliers.js';
import { formatNumber, formatQuantity } from './format-quantity.js';

/** Significant digits as written: "11,703" → 5, "10,000" → 1, "0.040" → 2. */
function writtenFigures(written: string): number {
  const digits = written.replace(/[^\d.]/g, '');
  const bare = digits.replace('.', '').replace(/^0+/, '');
  return digits.includes('.') ? bare.length : bare.replace(/0+$/, '').length;
}

/** The significant figures a correction of `q` keeps: as many as the draft wrote, and at least `least`. */
export function correctionFigures(q: Quantity, least = 3): number {
  const atom = findAtoms(q.text)[0];
  return Math.max(least, atom === undefined ? 0 : writtenFigures(q.text.slice(atom.start, atom.end)));
}

/**
 * The figures a value worked out from the draft's own numbers is shown with, in the draft's unit: a
 * whole result exactly (12,900 − 11,700 = 1,200), any other to the figures the draft wrote and at
 * least two, since its inputs are rounded too (76 ÷ 6,000 = 0.013, not 0.0127).
 */
export function derivedFigures(q: Quantity, value: number): number {
  const stated = fromCanonical(value, q.statedUnit === '' ? q.unit : q.statedUnit, q.dimension);
  const whole = Math.round(stated);
  const exact = Math.abs(stated) >= 1 && Math.abs(stated - whole) <= 1e-9 * Math.abs(stated);
  // A multiple of 100 or more is given to the whole number, as the finding's own message gives it
  // ("is 185 times, not about 50 times" corrects to "about 185 times", not "about 180 times").
  if (q.dimension === 'ratio' && Math.abs(stated) >= 100) return closeFigures(stated, 2);
  return exact ? Math.max(1, String(Math.abs(whole)).replace(/0+$/u, '').length) : correctionFigures(q, 2);
}

/** How far a correction's rounding may move it from the value worked out: one part in a hundred. */
const ROUNDING_SLACK = 0.01;

/**
 * The fewest significant figures, from `least` up, that write `x` within one percent of itself: a
 * multiple of 100 or more and a share of the air are rounded as a writer rounds them unless that
 * moves them more than one percent (2.4 ÷ 0.0127 = 189 is "190 times", 184.6 is "185 times"; 424
 * ppm as a share is "0.042 percent"). Other worked values keep the draft's own figures (derivedFigures).
 */
export function closeFigures(x: number, least: number): number {
  if (!Number.isFinite(x) || x === 0) return least;
  for (let n = Math.max(1, least); n < 15; n++) if (Math.abs(Number(x.toPrecision(n)) - x) <= ROUNDING_SLACK * Math.abs(x)) return n;
  return 15;
}

/** Significant figures of a multiple in a correction: two, or from 100 up as many as keep it within one percent (closeFigures: 184.6 is "185 times", 189 "190 times"). */
function multipleFigures(x: number): number {
  return Math.abs(x) >= 100 ? closeFigures(x, 2) : 2;
}

/**
 * `q.text` with its number replaced by `value` (canonical unit), rounded to `significant` figures:
 * by default as many as the draft wrote, and at least 3.
 */
export function rewriteQuantity(q: Quantity, value: number, significant?: number): string {
  // "a rise of one third" corrected to 0.5 reads "a rise of 50 percent", not "0.5 third".
  // Only a fraction no wider figure holds: "two and a half times" is a multiple of its own.
  const fraction = q.dimension === 'ratio' && !/\d/u.test(q.text) ? fractionWordsIn(q.text) : undefined;
  const atoms = findAtoms(q.text);
  if (fraction !== undefined && !atoms.some((a) => a.start < fraction.end && a.end > fraction.start && (a.start < fraction.start || a.end > fraction.end))) {
    const shown = Math.abs(value) < 1 ? `${formatNumber(value * 100, 2)} percent` : `${formatNumber(value, multipleFigures(value))} times`;
    return q.text.slice(0, fraction.start) + shown + q.text.slice(fraction.end);
  }
  const atom = atoms[0];
  const figures = significant ?? correctionFigures(q);
  const id = q.statedUnit === '' ? q.unit : q.statedUnit;
  if (atom === undefined || atoms.length > 1 || atom.form === 'vague') return formatQuantity(value, q.unit, q.statedUnit, figures);
  const stated = fromCanonical(value, id, q.dimension);
  let written: string;
  // A ratio below one reads as a share ("roughly 45 percent of today's 420 ppm", not "0.45 times");
  // a ratio of 100 or more is given to the whole number ("185 times", not "180 times" for 184.6), as
  // the reference-slip corrections give theirs.
  if (atom.form === 'multiplier') written = Math.abs(stated) < 1 ? `${formatNumber(stated * 100, 2)} percent` : `${formatNumber(stated, multipleFigures(stated))} times`;
  else if (q.statedUnit === 'CE') {
    if (Math.round(stated) < 1) return formatQuantity(value, q.unit, q.statedUnit);
    written = String(Math.round(stated));
  } else if (atom.scale > 1) {
    const atomText = q.text.slice(atom.start, atom.end);
    written = scaledNumber(stated, atom.scale, /\p{L}+$/u.exec(atomText)?.[0] ?? '', figures, /\d[.,]\d/u.test(atomText));
  } else written = formatNumber(stated, figures, q.statedUnit !== 'BCE' || Math.abs(stated) >= 10000);
  if (q.text.slice(atom.start, atom.end).startsWith('−')) written = written.replace(/^-/, '−');
  return q.text.slice(0, atom.start) + written + q.text.slice(atom.end);
}

const SCALE_WORDS: [string, number][] = [
  ['trillion', 1e12],
  ['billion', 1e9],
  ['million', 1e6],
  ['thousand', 1e3],
];

/**
 * A number in the draft's scale word, or a smaller one when the value would fall below 1 in it:
 * 800,000 with "billion" reads "0.8 million", not "0.0008 billion"; plain digits below a thousand,
 * and for "thousand" itself ("three thousand years" → "1,700 years"), unless the draft wrote a decimal.
 */
function scaledNumber(stated: number, scale: number, word: string, figures: number, decimals = false): string {
  // "three thousand years" corrected to 1,700 reads "1,700 years", not "1.7 thousand years": below a
  // million, digits with separators say it plainly (common practice in copy-editing), unless the draft
  // itself wrote a decimal ("2.5 thousand years").
  if (!decimals && word.toLowerCase() === 'thousand' && Math.abs(stated) < 1e6) return formatNumber(stated, figures);
  // "80k" corrected reads "100k", as the draft wrote it, with no space before a scale letter.
  if (Math.abs(stated) >= scale || word === '') return `${formatNumber(stated / scale, figures)}${word.length === 1 ? '' : ' '}${word}`.trimEnd();
  const [smaller, size] = SCALE_WORDS.find(([, size]) => Math.abs(stated) >= size) ?? ['', 1];
  return size === 1 ? formatNumber(stated, figures) : `${formatNumber(stated / size, figures)} ${smaller}`;
}
