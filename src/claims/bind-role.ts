/**
 * The part a number plays in its sentence, read from the words around it: a `level` (a value at a
 * time: an endpoint of "from X to Y" or "between X and Y", "fell to X", "stood at X") or a `change`
 * (a difference: "rose by X", "a rise of X", "an X swing"). A reference value may accept only one
 * role, so the two endpoints of a rise never bind to the size of the rise, nor the rise to a level.
 *
 *   "CO2 rose by roughly 80 ppm, from about 190 ppm to about 270 ppm"
 *                 └ change ┘        └ level ┘      └ level ┘
 */
import type { QuantityRole, ValueRole } from '../rulepack/types.js';
import { statesRange } from '../quantities/range-ends.js';
import type { Quantity } from '../types.js';

/** What the words around a quantity say it is; `unknown` binds to values of either role. */
export type ReadRole = QuantityRole | 'unknown';

/** Two quantities that are the endpoints of one "from X to Y" or "between X and Y". */
export interface EndpointPair {
  first: number;
  second: number;
  /** Where the joining word ("to", "and", a dash) starts: words before it speak of `first`. */
  join: number;
}

export const CHANGE_NOUNS = 'rise|rises|increase|increases|drop|drops|fall|falls|decline|decrease|swing|swings|amplitude|change|jump|step|gain|growth|difference';
/** A noun of change anywhere in a phrase: "the deglacial rise", "its increase". */
export const CHANGE_NOUN = new RegExp(String.raw`(?:^|[^\p{L}])(?:${CHANGE_NOUNS})(?![\p{L}])`, 'iu');
/**
 * Verbs whose "up" tells what a whole is made of, not a change: "CO2 made up about 280 ppm of the
 * air", "takes up 0.04 percent" (common practice: English phrasal verbs of composition).
 */
const COMPOSITION_VERBS = ['make', 'makes', 'made', 'making', 'take', 'takes', 'took', 'taken', 'taking'];
const CHANGE_VERBS = `rose|rise|rises|risen|rising|fell|falls|fallen|falling|dropped|dropping|climbed|climbing|jumped|increased|decreased|declined|grew|gained|gaining|gains|added|adding|adds|(?<!(?:^|[^\\p{L}])(?:${COMPOSITION_VERBS.join('|')})\\s+)up`;
const CHANGE_VERB = new RegExp(String.raw`^(?:${CHANGE_VERBS}|sank|sunk|peaked|topped|bottomed)$`, 'iu');

/** Whether a word is a verb of change ("fell", "climbed"), which may carry a number to the level it reaches. */
export function isChangeVerb(word: string): boolean {
  return CHANGE_VERB.test(word.trim());
}

/**
 * A loose hedge a writer puts between the words that give a number its role and the number, which the
 * quantity reader does not take into the number: "went up by something like 76 ppm", "fell to
 * somewhere around 185 ppm" (common practice: English approximators).
 */
const LOOSE_HEDGE = String.raw`(?:\s+(?:something\s+like|somewhere|in\s+the\s+region\s+of|on\s+the\s+order\s+of|of\s+the\s+order\s+of))?`;
/** Change words just before the quantity: "by", "a rise of", "the swing was", "rose", "fell", "up". */
const CHANGE_BEFORE = new RegExp(String.raw`(?:^|[^\p{L}])(?:by|(?:${CHANGE_NOUNS})\s+(?:of|was|is|were|came to|amounted to)|${CHANGE_VERBS})${LOOSE_HEDGE}\s*$`, 'iu');
/** Change words just after the quantity: "an 80 ppm rise", "90 ppm higher", "130 metres above the lake". */
const CHANGE_AFTER = /^[\s-]*(?:rise|increase|drop|fall|decline|swing|jump|step|gain|higher|lower|more|less|greater|smaller|above|below|beneath|short of|deeper|shallower)(?![\p{L}])/iu;
/** An amount per stretch of time is a change, however it is worded: "2 ppm of CO2 every year", "0.5 ppm a year". */
const PER_TIME_AFTER = /^\s*(?:of\s+[\p{L}\p{N}₂]+\s+)?(?:every|each|a|per|an)\s+(?:single\s+)?(?:year|decade|century|millennium)(?![\p{L}])/iu;
/** A place measured from a datum is a level: "3,623 metres below the surface", "2,800 m above sea level". */
const DATUM_AFTER = /^\s*(?:below|beneath|under|above)\s+(?:the\s+)?(?:ice\s+|snow\s+)?(?:surface|sea\s+level)(?![\p{L}])/iu;
/**
 * Level words just before the quantity: "fell to", "stood at", "reached", "from"; "fell to a meagre"
 * (an article and one word of description); "fell as far as" (how far a fall went: where it ended).
 */
const LEVEL_BEFORE = new RegExp(String.raw`(?:^|[^\p{L}])(?:from|to|to\s+(?:a|an)\s+\p{L}+|at|between|reached|reaching|hovered around|(?<!by\s+)as\s+far\s+as)${LOOSE_HEDGE}\s*$`, 'iu');
/** A loose word of place on the scale between a word of staying and its number: "sat around 190", "a low near 185". */
const NEAR = String.raw`(?:\s+(?:at|around|near|about|of|close\s+to|roughly|just\s+under|just\s+over|as\s+low\s+as|as\s+high\s+as|somewhere(?:\s+(?:around|near))?))?`;
/**
 * A verb of staying at a value ("sat around 190 ppm", "remained near 280 ppm", "hovered at"), of
 * reaching an extreme ("peaked somewhere around 300 ppm", "topped out near 290 ppm") or a
 * noun of an extreme of the scale ("a glacial low near 185 ppm", "a peak of 300 ppm", "a baseline
 * of 280 ppm") just before the quantity: a level, unless words of change follow the number ("sits
 * 144 ppm above that level" is a difference).
 */
const STAY_BEFORE = new RegExp(
  String.raw`(?:^|[^\p{L}])(?:sat|sits|sitting|stood|stands|stayed|stays|remained|remains|hovered|hovers|hovering|settled|idled|bottomed\s+out|levelled\s+off|leveled\s+off|peaked|peaking|topped\s+out|topping\s+out|maxed\s+out|low|lows|high|highs|peak|peaks|minimum|minima|maximum|maxima|baseline|floor|ceiling)${NEAR}\s*$`,
  'iu',
);
/** A bound read as a place on the scale: "never rose above 300 ppm", "fell below 200 ppm", "climbed as high as 350 ppm". */
/** A quantity told as the span between two figures: "between 180 and 300 ppm", "from 190 to 280 ppm". */
const SPAN_OPEN = /^(?:between|from)\s/iu;
const BY_BEFORE = /(?:^|[^\p{L}])by\s*$/iu;
const LEVEL_HEDGE = /^(?:above|below|beyond|past|under|as\s+(?:high|low)\s+as)(?![\p{L}])/iu;
/** "over" after a change verb may be either: "rose over 80 ppm" (a change) or "never rose over 300 ppm" (a level). */
const EITHER_HEDGE = /^over(?![\p{L}])/iu;
const PAIR_OPEN = /(?:^|[^\p{L}])(?:from|between)\s*$/iu;
/** What may stand between two endpoints: a few words without a sentence break, then the joining word. */
const PAIR_JOIN = /^[^;.!?]{0,80}?(?:(?:^|\s)(?:to|and)|[–—-])\s*$/iu;
const JOIN_WORD = /(?:to|and|[–—-])$/iu;

/** The endpoint pairs of a sentence: consecutive quantities joined by from…to or between…and. */
export function endpointPairs(sentence: string, quantities: Quantity[]): EndpointPair[] {
  const pairs: EndpointPair[] = [];
  for (let first = 0; first + 1 < quantities.length; first++) {
    const a = quantities[first] as Quantity;
    // "from 280 ppm in 1750 to 420 ppm": the date of the first end stands between the two ends.
    const dated = quantities[first + 1]?.statedUnit === 'CE' && a.statedUnit !== 'CE' ? 1 : 0;
    const second = first + 1 + dated;
    const b = quantities[second];
    if (b === undefined) continue;
    const between = sentence.slice((quantities[second - 1] as Quantity).end, b.start);
    if (!PAIR_OPEN.test(sentence.slice(Math.max(0, a.start - 20), a.start)) || !PAIR_JOIN.test(between)) continue;
    const trimmed = between.trimEnd();
    const join = JOIN_WORD.exec(trimmed);
    pairs.push({ first, second, join: (quantities[second - 1] as Quantity).end + (join === null ? trimmed.length : join.index) });
  }
  return pairs;
}

const PLUS_SIGNED = /^\+\s*\d/u;
/** A copula or a verb of amounting between the second figure of a "from ... to ..." and the next figure. */
const COMES_TO = /^[\s\u00A0]*(?:is|was|are|were|makes|made|gives|gave|comes\s+to|came\s+to|amounts\s+to|amounted\s+to)[\s\u00A0]*$/iu;
/** "from" opening a phrase before the first figure, a few words back at most: "From a glacial 190". */
const FROM_OPEN = /(?:^|[^\p{L}])from(?:\s+[\p{L}-]+){0,2}\s*$/iu;
/** "to" a few words before the second figure: "to an interglacial 280". */
const TO_OPEN = /(?:^|[^\p{L}])to(?:\s+[\p{L}-]+){0,2}\s*$/iu;

/** Whether quantity `i` states what a "from A to B" just before it comes to: "from 190 to 280 is 90 ppm". */
function isWayBetween(sentence: string, quantities: Quantity[], i: number): boolean {
  const [a, b, q] = [quantities[i - 2], quantities[i - 1], quantities[i]];
  if (a === undefined || b === undefined || q === undefined) return false;
  return COMES_TO.test(sentence.slice(b.end, q.start)) && TO_OPEN.test(sentence.slice(a.end, b.start)) && FROM_OPEN.test(sentence.slice(Math.max(0, a.start - 30), a.start));
}

/** The role of each quantity, in order. */
export function quantityRoles(sentence: string, quantities: Quantity[]): ReadRole[] {
  const endpoints = new Set(endpointPairs(sentence, quantities).flatMap((p) => [p.first, p.second]));
  return quantities.map((q, i) => {
    const before = sentence.slice(Math.max(0, q.start - 40), q.start);
    if (LEVEL_HEDGE.test(q.text)) return 'level';
    // "+90 ppm": a figure signed with a plus is an amount added, a change.
    if (PLUS_SIGNED.test(q.text)) return 'change';
    // "From a glacial 190 to an interglacial 280 is about 90 ppm": what the way from one figure to the next comes to is their difference.
    if (isWayBetween(sentence, quantities, i)) return 'change';
    // "swung between 180 and 300 ppm", "went from 190 to 280 ppm": the span a quantity moved over
    // names its levels, whatever verb stands before; only "by between 80 and 100 ppm" sizes a change.
    if (SPAN_OPEN.test(q.text) && !BY_BEFORE.test(before)) return 'level';
    if (CHANGE_BEFORE.test(before)) return EITHER_HEDGE.test(q.text) ? 'unknown' : 'change';
    const after = sentence.slice(q.end, q.end + 30);
    if (endpoints.has(i) || LEVEL_BEFORE.test(before) || DATUM_AFTER.test(after)) return 'level';
    if (CHANGE_AFTER.test(after) || PER_TIME_AFTER.test(after)) return 'change';
    if (STAY_BEFORE.test(before)) return 'level';
    return 'unknown';
  });
}

/**
 * Whether a value that accepts `accepted` (undefined: any) may bind a quantity read as `read`. A
 * `range` value binds only a quantity `q` that states both ends of a range, and a change never.
 */
export function roleFits(accepted: ValueRole | undefined, read: ReadRole, q?: Pick<Quantity, 'text'>): boolean {
  if (accepted === 'range') return read !== 'change' && q !== undefined && statesRange(q);
  return accepted === undefined || read === 'unknown' || accepted === read;
}
