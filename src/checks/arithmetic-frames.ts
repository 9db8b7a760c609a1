/**
 * The sentence frames the arithmetic checks look for, as word lists: from-to pairs ("from 180 to
 * 280 ppm"), change statements ("a rise of 100 ppm", "100 ppm higher"), spans ("lasting 6,300
 * years", "(269 years)") and ratio or percentage statements ("a 55 percent increase", "doubled").
 * Precision first: a number that is not clearly in one of these frames is left alone.
 */
import type { Quantity } from '../types.js';

const S = String.raw`[\s\u00A0]`;
const list = (words: string[]): string => words.map((w) => w.replace(/[.*+?^${}()|[\]\\]/g, '\\$&').replace(/ /g, `${S}+`)).join('|');
const before = (words: string[]): RegExp => new RegExp(String.raw`(?:^|[^\p{L}])(?:${list(words)})${S}*$`, 'iu');
const after = (words: string[]): RegExp => new RegExp(String.raw`^[\s\u00A0-]*(?:${list(words)})(?![\p{L}])`, 'iu');

const FROM = new RegExp(String.raw`(?:^|[^\p{L}])from${S}+$`, 'iu');
const TO = new RegExp(String.raw`^${S}*(?:to|until|till|through|–|—|-)${S}*$`, 'iu');
const CHANGE_NOUNS = ['rise', 'increase', 'drop', 'fall', 'decline', 'change', 'jump', 'gain', 'loss', 'swing', 'difference', 'warming', 'cooling', 'growth', 'decrease', 'reduction'];
const CHANGE_VERBS = ['rose', 'risen', 'fell', 'fallen', 'climbed', 'dropped', 'increased', 'decreased', 'declined', 'jumped', 'grew', 'warmed', 'cooled', 'gained', 'lost', 'changed'];
const CHANGE_BEFORE = before(['by', 'amounting to', 'a total of', 'net', ...CHANGE_VERBS, ...CHANGE_NOUNS.map((n) => `${n} of`)]);
const CHANGE_AFTER = after([...CHANGE_NOUNS, 'higher', 'lower', 'more', 'less', 'warmer', 'cooler', 'colder', 'up', 'down']);
const SPAN_OF_PAIR = before(['lasting', 'lasted', 'lasts', 'spanning', 'spanned', 'spans', 'span of', 'period of', 'interval of', 'stretch of', 'over', 'across', 'within', 'took', 'taking', 'during', 'for', 'or', 'that is', 'i.e.', 'i.e.,', '(', '—']);
const SPAN_OF_CHANGE = before(['lasting', 'spanning', 'span of', 'period of', 'over', 'across', 'within', 'in', 'took', 'taking', 'during', 'for', 'after', '(']);
const NOT_A_SPAN = before(['past', 'last', 'previous', 'preceding', 'next', 'every', 'each', 'per']);
const RATIO_AFTER = after([...CHANGE_NOUNS, 'higher', 'larger', 'greater', 'more', 'lower', 'less', 'smaller', 'above', 'below', 'as high', 'as large', 'as much', 'as great', 'as long']);
const RATIO_VERB = /^(?:doubled|tripled|quadrupled|halved|doubling|tripling|halving|[\p{N}.]+[-\s]?fold|\p{L}+[-\s]?fold)$/iu;
/** "higher than", "more CO2 than", "above": a comparison, with up to three words before "than". */
const COMPARATIVE_AFTER = new RegExp(String.raw`^[\s\u00A0-]*(?:(?:higher|more|greater|larger|lower|less|smaller)(?:${S}+[^\s.;,]+){0,3}${S}+than|above|below)(?![\p{L}])`, 'iu');

/** A from-to pair: indices of the two ends in the quantity list. */
export interface Pair {
  from: number;
  to: number;
}

const head = (text: string, q: Quantity): string => text.slice(Math.max(0, q.start - 40), q.start);
const tail = (text: string, q: Quantity): string => text.slice(q.end, q.end + 32);

/** Every "from A to B" pair of one dimension. */
export function findPairs(text: string, qs: Quantity[]): Pair[] {
  const pairs: Pair[] = [];
  for (let i = 0; i + 1 < qs.length; i++) {
    const a = qs[i] as Quantity;
    const b = qs[i + 1] as Quantity;
    if (a.dimension === b.dimension && FROM.test(head(text, a)) && TO.test(text.slice(a.end, b.start))) pairs.push({ from: i, to: i + 1 });
  }
  return pairs;
}

/** True when `q` is stated as a change ("by 100 ppm", "a rise of 5 °C", "5 °C warmer"). */
export function isStatedChange(text: string, q: Quantity): boolean {
  return CHANGE_BEFORE.test(head(text, q)) || CHANGE_AFTER.test(tail(text, q)) || /^[+−-]/.test(q.text);
}

/** True when duration `q` states the span of a from-to pair of dates (pair ending at `pairEnd`). */
export function isSpanOfPair(text: string, q: Quantity, pairEnd: number): boolean {
  if (NOT_A_SPAN.test(head(text, q))) return false;
  return SPAN_OF_PAIR.test(head(text, q)) || /^[\s\u00A0]*(?:,|\(|—|–)[\s\u00A0]*(?:or[\s\u00A0]+)?$/u.test(text.slice(pairEnd, q.start));
}

/** True when duration `q` states how long a change took ("in 8,000 years", "over a century"). */
export function isSpanOfChange(text: string, q: Quantity): boolean {
  return !NOT_A_SPAN.test(head(text, q)) && SPAN_OF_CHANGE.test(head(text, q));
}

/** True when ratio `q` compares two values ("doubled", "three times higher", "2.5-fold rise"). */
export function isStatedRatio(text: string, q: Quantity): boolean {
  const core = q.hedge !== undefined && q.text.toLowerCase().startsWith(q.hedge.toLowerCase()) ? q.text.slice(q.hedge.length).trim() : q.text;
  return RATIO_VERB.test(core) || RATIO_AFTER.test(tail(text, q));
}

/** True when `q` is followed by a comparison ("55 percent higher than", "twice as large as"). */
export function comparesToNext(text: string, q: Quantity): boolean {
  return COMPARATIVE_AFTER.test(tail(text, q)) || /^[\s\u00A0]+as[\s\u00A0]+\p{L}+[\s\u00A0]+as(?![\p{L}])/iu.test(tail(text, q));
}
