/**
 * Numbers whose unit the sentence leaves out because a neighbour states it once:
 *
 *   "Vostok covers four cycles and EPICA Dome C eight."          gapping: "eight" takes "cycles"
 *   "Vostok and EPICA Dome C reach back 420,000 and 800,000 years respectively."
 *                                           └ list: "420,000" takes "years" from the number after it
 *
 * A bare number (a numeral the reader left without a unit, or a small number written as a word)
 * takes the unit of the quantity it is listed with (joined by a comma, "and" or "or", the unit
 * written after the last number), or, when it closes a clause joined by "and", "but", "while",
 * "whereas" or a comma to the clause before, the unit of the nearest measured quantity before it.
 * The number is then read again with that unit, so its interval follows the same interval table.
 * A bare year ("et al. 2021", "in Jan 2025") takes no unit.
 */
import { parseQuantities } from '../quantities/index.js';
import type { Quantity } from '../types.js';

const SMALL_WORDS = 'one|two|three|four|five|six|seven|eight|nine|ten|eleven|twelve|thirteen|fourteen|fifteen|sixteen|seventeen|eighteen|nineteen|twenty';
const WORD_NUMBER = new RegExp(String.raw`(?<![\p{L}\p{N}-])(?:${SMALL_WORDS})(?![\p{L}\p{N}-])`, 'giu');
/** The last number in a quantity's text: what comes after it is the unit ("four| cycles", "800,000| years ago"). */
const LAST_NUMBER = new RegExp(String.raw`(?:\d(?:[\d,.]*\d)?(?:[kKmM](?![\p{L}]))?|(?<![\p{L}])(?:${SMALL_WORDS})(?![\p{L}]))(?!.*(?:\d|(?<![\p{L}])(?:${SMALL_WORDS})(?![\p{L}])))`, 'iu');
const LIST_JOIN = /^\s*(?:\([^()]{1,40}\)\s*)?(?:,\s*(?:and\s+|or\s+)?|and\s+|or\s+)$/iu;
/** A list whose members each carry a label in brackets: "~100k yrs (orbit shape), 41k (tilt) and 23k (precession)". */
const LABELLED_JOIN = /^\s*\([^()]{1,40}\)\s*(?:,\s*(?:and\s+|or\s+)?|and\s+|or\s+)$/iu;
const LABEL_AFTER = /^\s*\([^()]{1,40}\)/u;
const CLAUSE_JOIN = /(?:^|[^\p{L}])(?:and|but|while|whereas)(?![\p{L}])|,/iu;
/**
 * What may follow the last number of a gapped clause: the end of the clause, after a partitive
 * pronoun that counts the things named before ("and Vostok covers six of them").
 */
const CLAUSE_CLOSE = /^(?:\s+of\s+(?:them|those|these))?\s*(?:[.;,:!?)]|$|(?:and|but|while|whereas|respectively)(?![\p{L}]))/iu;

/** "a century or ", "one year or ": an approximate count of the noun named just before. */
const A_NOUN_OR = /(?:^|[^\p{L}])(?:a|an|one)\s+\p{L}+\s+or\s+$/iu;

interface Bare {
  text: string;
  start: number;
  end: number;
  /** The index of the reader's unitless quantity, when the reader found one. */
  index?: number;
}

/** The quantities of `sentence` with every elided unit restored; other quantities are returned unchanged. */
export function restoreElidedUnits(sentence: string, quantities: Quantity[]): Quantity[] {
  const bare = bareNumbers(sentence, quantities);
  if (bare.length === 0) return quantities;
  const measured = quantities.filter((q) => q.dimension !== 'number' && q.statedUnit !== 'CE');
  if (measured.length === 0) return quantities;
  const restored: Quantity[] = quantities.filter((q) => !bare.some((b) => b.index !== undefined && quantities[b.index] === q));
  for (const b of bare) {
    const model = listPartner(sentence, b, bare, measured) ?? labelledPartner(sentence, b, bare, measured) ?? gapPartner(sentence, b, quantities, measured);
    const read = model === undefined ? undefined : readWithUnit(b, model);
    if (read !== undefined) restored.push(read);
    else if (b.index !== undefined) restored.push(quantities[b.index] as Quantity);
  }
  return restored.sort((a, b) => a.start - b.start);
}

/**
 * Four digits with no thousands separator, 1500 to 2100: a year ("Seltzer et al. 2021", "in Jan 2025"),
 * which dates a statement and takes no unit from a neighbour (common practice: years are written
 * without a separator, amounts of four digits and more with one).
 */
export const YEAR_LIKE = /^(?:1[5-9]\d\d|20\d\d|2100)$/u;

/**
 * "a regional value rather than a global one", "the older one", "this one": "one" after a determiner,
 * with at most one word between, stands for a noun named before (the pronoun "one" of English
 * grammar, common practice) and counts nothing.
 */
const PRONOUN_ONE_BEFORE = /(?:^|[^\p{L}])(?:a|an|the|this|that|each|every|another|any|which|no)(?:\s+[\p{L}'’-]+)?\s+$/iu;

function bareNumbers(sentence: string, quantities: Quantity[]): Bare[] {
  const found: Bare[] = [];
  quantities.forEach((q, index) => {
    if (q.dimension === 'number' && !YEAR_LIKE.test(q.text.trim())) found.push({ text: q.text, start: q.start, end: q.end, index });
  });
  for (const m of sentence.matchAll(WORD_NUMBER)) {
    const [start, end] = [m.index, m.index + m[0].length];
    if (m[0].toLowerCase() === 'one' && PRONOUN_ONE_BEFORE.test(sentence.slice(Math.max(0, start - 40), start))) continue;
    if (!quantities.some((q) => start < q.end && q.start < end)) found.push({ text: m[0], start, end });
  }
  return found.sort((a, b) => a.start - b.start);
}

/** A list "420,000 and 800,000 years": the measured quantity that closes the list this number opens or continues. */
function listPartner(sentence: string, b: Bare, bare: Bare[], measured: Quantity[]): Quantity | undefined {
  let at = b;
  for (;;) {
    const nextMeasured = measured.find((q) => q.start >= at.end);
    const nextBare = bare.find((x) => x.start >= at.end);
    const next = nextBare !== undefined && (nextMeasured === undefined || nextBare.start < nextMeasured.start) ? nextBare : nextMeasured;
    if (next === undefined || !LIST_JOIN.test(sentence.slice(at.end, next.start))) return undefined;
    if (next === nextMeasured) return nextMeasured;
    at = next as Bare;
  }
}

/**
 * A list whose members each carry a label in brackets, the unit written once on the first:
 * "obliquity and precession, 41,000 yrs (tilt), 23,000 (wobble) and 19,000 (wobble again)". A
 * bare member with its own label takes the unit of the measured member that opens the list.
 */
function labelledPartner(sentence: string, b: Bare, bare: Bare[], measured: Quantity[]): Quantity | undefined {
  if (!LABEL_AFTER.test(sentence.slice(b.end))) return undefined;
  let at: { start: number; end: number } = b;
  for (;;) {
    const prevMeasured = measured.filter((q) => q.end <= at.start).at(-1);
    const prevBare = bare.filter((x) => x.end <= at.start).at(-1);
    const prev = prevBare !== undefined && (prevMeasured === undefined || prevBare.start > prevMeasured.start) ? prevBare : prevMeasured;
    if (prev === undefined || !LABELLED_JOIN.test(sentence.slice(prev.end, at.start))) return undefined;
    if (prev === prevMeasured) return prevMeasured;
    at = prev;
  }
}

/** A gapped clause "… four cycles and EPICA Dome C eight": the nearest measured quantity before, across a clause join. */
function gapPartner(sentence: string, b: Bare, quantities: Quantity[], measured: Quantity[]): Quantity | undefined {
  const model = measured.filter((q) => q.end <= b.start).at(-1);
  if (model === undefined || !CLAUSE_CLOSE.test(sentence.slice(b.end))) return undefined;
  // "within a century or two": the number counts the noun just before it, not the earlier unit.
  if (A_NOUN_OR.test(sentence.slice(0, b.start))) return undefined;
  const between = sentence.slice(model.end, b.start);
  if (!CLAUSE_JOIN.test(between) || quantities.some((q) => q.start >= model.end && q.end <= b.start)) return undefined;
  // The clause names what the number counts ("and EPICA Dome C eight"): at least one word before the number.
  return /[\p{L}]/u.test(between.replace(CLAUSE_JOIN, '')) ? model : undefined;
}

/** The bare number read again with the model's unit, placed where the number stands. */
function readWithUnit(b: Bare, model: Quantity): Quantity | undefined {
  const last = LAST_NUMBER.exec(model.text);
  if (last === null) return undefined;
  const unit = model.text.slice(last.index + last[0].length);
  if (unit.trim() === '') return undefined;
  const [read] = parseQuantities(`${b.text}${unit}`).filter((q) => q.dimension === model.dimension);
  if (read === undefined) return undefined;
  return { ...read, text: b.text, start: b.start, end: b.end };
}
