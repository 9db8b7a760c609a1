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

/** "from 190", "from a glacial 190", "from the pre-industrial 280": an article and up to two words may name the start. */
const FROM = new RegExp(String.raw`(?:^|[^\p{L}])from${S}+(?:(?:a|an|the)${S}+(?:[\p{L}-]+${S}+){0,2})?$`, 'iu');
const TO = new RegExp(String.raw`^${S}*(?:(?:up|down)${S}+to|to|until|till|through|–|—|-)${S}*$`, 'iu');
/** A phrase of time or place between the start of a from-to pair and its "to" (a date in it reads DATE). */
const WHEN_TO = new RegExp(String.raw`^,?${S}+(?:in|by|at|around|circa|during|before|after|near)${S}+[^\d.;:!?()]{1,40}?${S}+(?:to|until|till)${S}+$`, 'iu');
/** Words that open the start of a stretch of time or a change, and words that mark its end ("... clear by B"). */
const START_WORDS = list(['began', 'begun', 'begins', 'started', 'starts', 'set in', 'opened', 'onset', 'beginning', 'starting', 'kicks off', 'kicked off', 'got going', 'gets going', 'got under way', 'gets under way', 'commenced', 'commences']);
/** A start word, perhaps with a short phrase after it (up to seven words): "began at", "began to withdraw from the moor". */
const START_CUE = new RegExp(String.raw`(?:^|[^\p{L}])(?:${START_WORDS})(?:${S}+[\p{L}'’-]+){0,7}${S}*$`, 'iu');
const END_CUE = new RegExp(String.raw`(?:^|[^\p{L}])(?:ended|ends|ending|finished|finishes|closed|ceased|stopped|terminated|lasted${S}+until|until|till|ended${S}+at|ending${S}+at|by|wraps${S}+up|wrapped${S}+up|winds${S}+down|wound${S}+down|was${S}+over|is${S}+over|was${S}+complete|is${S}+complete|completed)${S}*$`, 'iu');
const CHANGE_NOUNS = ['rise', 'increase', 'drop', 'fall', 'decline', 'change', 'jump', 'gain', 'loss', 'swing', 'difference', 'warming', 'cooling', 'growth', 'decrease', 'reduction', 'climb', 'leap', 'surge', 'plunge', 'slide'];
const CHANGE_VERBS = ['rose', 'risen', 'fell', 'fallen', 'sank', 'sunk', 'thinned', 'thickened', 'climbed', 'dropped', 'increased', 'decreased', 'declined', 'jumped', 'grew', 'warmed', 'cooled', 'gained', 'lost', 'changed'];
/** Phrasal verbs of change ("went up 80 m") and the present forms of the change verbs ("rises 2 ppm"). */
const PHRASAL_CHANGES = ['went up', 'gone up', 'goes up', 'go up', 'going up', 'went down', 'gone down', 'rises', 'rising', 'climbs', 'climbing', 'falls', 'falling', 'drops', 'dropping', 'grows', 'growing', 'added', 'adds', 'adding'];
const CHANGE_BEFORE = before(['by', 'amounting to', 'a total of', 'net', ...CHANGE_VERBS, ...PHRASAL_CHANGES, ...CHANGE_NOUNS.map((n) => `${n} of`)]);
const CHANGE_AFTER = after([...CHANGE_NOUNS, 'higher', 'lower', 'more', 'less', 'warmer', 'cooler', 'colder', 'up', 'down', 'added', 'extra', 'above', 'below']);
const SPAN_OF_PAIR = before(['lasting', 'lasted', 'lasts', 'spanning', 'spanned', 'spans', 'span of', 'period of', 'interval of', 'stretch of', 'over', 'across', 'within', 'took', 'taking', 'during', 'for', 'or', 'that is', 'i.e.', 'i.e.,', '(', '—', 'lay', 'lie', 'passed', 'elapsed', 'went by']);
const SPAN_OF_CHANGE = before(['lasting', 'spanning', 'span of', 'period of', 'over', 'across', 'within', 'in', 'took', 'taking', 'during', 'for', 'after', '(', 'over the', 'across the', 'within the', 'during the']);
/** Words that equate an amount with the rate it comes to ("80 ppm of CO2 would be 1.3 ppm per century"). */
const COMES_TO = new RegExp(String.raw`^[^;:.!?,]{0,30}?(?:^|[^\p{L}])(?:would${S}+be|comes${S}+to|come${S}+to|works${S}+out${S}+(?:at|to)|work${S}+out${S}+(?:at|to)|amounts${S}+to|translates${S}+(?:in)?to|is${S}+equivalent${S}+to|equals)${S}*$`, 'iu');
/** Words that lead a restatement of the span just given ("so that's", "which comes to", "in all"). */
const SPAN_LEADS = ['or', 'that is', "that's", 'that’s', 'i.e.', 'so', 'thus', 'hence', 'so call it', 'call it', 'in all', 'all told', 'which is', 'which comes to', 'which makes', 'which makes it', 'that comes to', 'that makes', 'making', 'giving', 'which means'];
/** Words that may stand between the lead and the figure without a hedge's meaning ("a span of only 700 years", "a good 6,000 years"). */
const SPAN_FILLERS = ['only', 'just', 'barely', 'merely', 'a mere', 'a good', 'a full', 'fully', 'all of'];
/**
 * Between the end date and a duration that restates the span: a comma, colon, semicolon, bracket,
 * dash or spaced hyphen, then perhaps up to two lead words ("so that's"), a short noun phrase ending
 * in "of" ("a cold spell of") or an article and one adjective ("a leisurely", "a brisk"), and a
 * filler ("only"). An adjectival figure may take its article alone: ", a 3,000-year thaw" (see
 * isSpanOfPair).
 */
const PAIR_GAP = new RegExp(
  String.raw`^${S}*(?:[,:;(—–]|${S}-)${S}*(?:(?:${list(SPAN_LEADS)})(?![\p{L}])[,\s\u00A0]+){0,2}(?:(?:a|an|the)${S}+(?:[\p{L}-]+${S}+){0,2}(?:of|lasting|spanning)${S}+|(?:a|an)${S}+(?!(?:further|additional|extra|past|last|next|previous|later|earlier)(?![\p{L}]))\p{L}+(?:ly)?${S}+)?(?:(?:${list(SPAN_FILLERS)})${S}+)?$`,
  'iu',
);
/**
 * Between the end date and a duration that completes a copula whose subject is the from-to pair
 * ("From the LGM, 21,000 years ago, to the Holocene, 11,700 years ago, is 9,300 years", "from 12,900
 * to 11,700 years ago was a span of 1,200 years"): the pair names the stretch, the figure its length.
 */
const COPULA_GAP = new RegExp(
  String.raw`^${S}*\)?,?${S}*(?:is|was|comes${S}+to|came${S}+to|makes|made|equals|gives|gave)${S}+(?:(?:a|an|the)${S}+(?:[\p{L}-]+${S}+){0,2}(?:of|lasting|spanning)${S}+)?(?:(?:${list(SPAN_FILLERS)})${S}+)?$`,
  'iu',
);
const NOT_A_SPAN = before(['past', 'last', 'previous', 'preceding', 'next', 'every', 'each', 'per']);
const RATIO_AFTER = after([...CHANGE_NOUNS, 'faster', 'slower', 'quicker', 'higher', 'larger', 'greater', 'more', 'lower', 'less', 'smaller', 'above', 'below', 'as high', 'as large', 'as much', 'as great', 'as long']);
const RATIO_VERB = /^(?:doubled|tripled|quadrupled|halved|doubling|tripling|halving|doubles|triples|quadruples|halves|[\p{N}.]+[-\s]?fold|\p{L}+[-\s]?fold)$/iu;
/**
 * "higher than", "more CO2 than", "above": a comparison, with up to three words before "than"; a
 * change noun held against its base ("a 34% increase on the 280 ppm of 1750", "a rise over").
 */
const COMPARATIVE_AFTER = new RegExp(String.raw`^[\s\u00A0-]*(?:(?:higher|more|greater|larger|lower|less|smaller|faster|slower|quicker)(?:${S}+[^\s.;,]+){0,3}${S}+than|above|below|(?:increase|rise|gain|jump|climb|drop|fall|decrease|decline)${S}+(?:on|over))(?![\p{L}])`, 'iu');

/** A from-to pair: indices of the two ends in the quantity list. */
export interface Pair {
  from: number;
  to: number;
}

const ARROW = new RegExp(String.raw`^${S}*(?:→|⟶|->|–>|-->)${S}*$`, 'u');
const head = (text: string, q: Quantity): string => text.slice(Math.max(0, q.start - 40), q.start);
const tail = (text: string, q: Quantity): string => text.slice(q.end, q.end + 32);

/**
 * Every pair of one dimension that states a start and an end: "from [A] to [B]" (a date may sit
 * between them: "from 280 ppm in 1750 to 420 ppm"), and "began [A] ... ended [B]" ("began 14,700
 * years ago and ended 12,900 years ago"; "started at 190 ppm and ended at 280 ppm").
 */
export function findPairs(text: string, qs: Quantity[]): Pair[] {
  const pairs: Pair[] = [];
  for (let i = 0; i + 1 < qs.length; i++) {
    const a = qs[i] as Quantity;
    const to = toEnd(text, qs, i);
    const b = qs[i + 1] as Quantity;
    if (to !== undefined && FROM.test(head(text, a))) pairs.push({ from: i, to });
    // "~190 → 280 ppm": an arrow is "from ... to" in one sign; the unit may be written once, at the end.
    else if (ARROW.test(text.slice(a.end, b.start)) && b.dimension !== 'number' && b.dimension !== 'ratio' && b.dimension !== 'percent' && (a.dimension === b.dimension || a.dimension === 'number')) pairs.push({ from: i, to: i + 1 });
    else if ((a.dimension === 'age' || a.dimension === 'number') && datesFromTo(text, qs, i)) pairs.push({ from: i, to: i + 1 });
    else {
      const end = startEnd(text, qs, i) ?? datesBetween(text, qs, i) ?? endOfTwoDates(text, qs, i);
      if (end !== undefined) pairs.push({ from: i, to: end });
    }
  }
  return pairs;
}

/**
 * The index of B in "from A to B", or undefined. A short phrase of time or place may stand before
 * "to", with at most one date in it: "from 190 ppm [at the glacial maximum] to 280 ppm", "from 280
 * ppm [in 1750] to 420 ppm".
 */
function toEnd(text: string, qs: Quantity[], i: number): number | undefined {
  const a = qs[i] as Quantity;
  const j = qs.findIndex((q, k) => k > i && q.dimension === a.dimension);
  const b = qs[j];
  if (b === undefined || j > i + 2) return undefined;
  const middle = j === i + 2 ? (qs[i + 1] as Quantity) : undefined;
  if (middle !== undefined && middle.dimension !== 'age') return undefined;
  const between = middle === undefined ? text.slice(a.end, b.start) : `${text.slice(a.end, middle.start)}DATE${text.slice(middle.end, b.start)}`;
  if (TO.test(between) || WHEN_TO.test(between)) return j;
  // "from 190 ppm up to 280 ppm": the reader took "up to" for a bound, but right
  // after a start it is the end of the pair (its written number is the end level).
  return middle === undefined && /^[\s\u00A0]*$/u.test(between) && UP_TO.test(b.text) && !UP_TO.test(a.text) ? j : undefined;
}

/** The opening of a figure that reads "up to" or "down to": "up to 280 ppm". */
const UP_TO = new RegExp(String.raw`^(?:up|down)${S}+to${S}`, 'iu');

/**
 * "from the end of the last warm period, about 115,000 years ago, to its peak", "from its start at
 * about 14,700 to its end near 13,000 years ago": "from" and a short noun phrase before a date.
 */
const FROM_PHRASE = new RegExp(String.raw`(?:^|[^\p{L}])from${S}+(?:[\p{L}'’-]+${S}+){1,7}?[\p{L}'’-]+(?:,|${S}*\(|${S}+(?:at|around|near|circa|c\.))${S}*(?:(?:about|around|some|roughly|circa|c\.)${S}+)?$`, 'iu');
/**
 * "from the Last Glacial Maximum 21,000 years ago": the event's name and its date with nothing
 * between. Read so only for a date in years ago or BP, the one kind of figure such a name is dated by.
 */
const FROM_NAMED = new RegExp(String.raw`(?:^|[^\p{L}])from${S}+(?:[\p{L}'’-]+${S}+){1,6}$`, 'iu');
/** ", to its peak some", ", to the start of the Holocene at": "to" and a short noun phrase before the second date. */
const TO_PHRASE = new RegExp(String.raw`^\)?,?${S}+(?:up${S}+)?to${S}+(?:[\p{L}'’-]+${S}+){0,6}\(?$`, 'iu');

/**
 * True when dates A (index i) and the next date B are the ends of "from [a phrase], A, to [a
 * phrase] B": each end named by its event, then its date.
 */
function datesFromTo(text: string, qs: Quantity[], i: number): boolean {
  const a = qs[i] as Quantity;
  const b = qs[i + 1];
  if (b?.dimension !== 'age') return false;
  // A bare number whose unit the end date carries ("at about 14,700 to its end near 13,000 years ago").
  if (a.dimension !== 'age' && !(a.dimension === 'number' && a.value / b.value < 3 && b.value / a.value < 3)) return false;
  const gap = text.slice(a.end, b.start);
  const lead = text.slice(Math.max(0, a.start - 80), a.start);
  // A name with its date straight after it ("from the LGM 21,000 years ago"): only ages in years ago.
  const named = a.dimension === 'age' && /ago|bp/iu.test(a.text) && FROM_NAMED.test(lead);
  return (FROM_PHRASE.test(lead) || named) && TO_PHRASE.test(gap);
}

/** True when a start word stands just before `q`: "began about 18,000 years ago", "the warming started at". */
export function startsAt(text: string, q: Quantity): boolean {
  return START_CUE.test(head(text, q));
}

/** The index of B in "began A ... ended B" (the next quantity of A's dimension), or undefined. */
function startEnd(text: string, qs: Quantity[], i: number): number | undefined {
  const a = qs[i] as Quantity;
  if (!START_CUE.test(head(text, a))) return undefined;
  const j = qs.findIndex((q, k) => k > i && q.dimension === a.dimension);
  const b = qs[j];
  if (b === undefined) return undefined;
  const between = text.slice(a.end, b.start);
  return END_CUE.test(between) && !/[.!?]/u.test(between) && between.length <= 80 ? j : undefined;
}

/** "Between [the last glacial peak, some] A[, and the start of our warm era] B": words before "between" and "and". */
const BETWEEN_HEAD = new RegExp(String.raw`(?:^|[^\p{L}])between(?:${S}+[^\d;:.!?]{0,40})?${S}*$`, 'iu');
const AND_GAP = new RegExp(String.raw`^[^\d;:.!?]{0,60}?(?:^|[^\p{L}])and(?![\p{L}])[^\d;:.!?]{0,60}$`, 'iu');

/** The index of B in "between ... A ... and ... B" when A and B are the next two dates, or undefined. */
function datesBetween(text: string, qs: Quantity[], i: number): number | undefined {
  const a = qs[i] as Quantity;
  const b = qs[i + 1];
  if (a.dimension !== 'age' || b?.dimension !== 'age') return undefined;
  return BETWEEN_HEAD.test(head(text, a)) && AND_GAP.test(text.slice(a.end, b.start)) ? i + 1 : undefined;
}

/**
 * The index of B when a sentence names exactly two dates and the second ends something ("the
 * coldest point was 20,000 years ago, and the thaw was over by 11,700 years ago"), or undefined.
 */
function endOfTwoDates(text: string, qs: Quantity[], i: number): number | undefined {
  const a = qs[i] as Quantity;
  const b = qs[i + 1];
  if (a.dimension !== 'age' || b?.dimension !== 'age' || qs.filter((q) => q.dimension === 'age').length !== 2) return undefined;
  const between = text.slice(a.end, b.start);
  return END_CUE.test(between) && /(?:^|[^\p{L}])and(?![\p{L}])/iu.test(between) && !/[.!?;]/u.test(between) && between.length <= 80 ? i + 1 : undefined;
}

/** True when `q` is stated as a change ("by 100 ppm", "a rise of 5 °C", "5 °C warmer"). */
export function isStatedChange(text: string, q: Quantity): boolean {
  // "an increase of barely 50", "a rise of only 40 ppm": a filler between the change word and the figure.
  const before = head(text, q).replace(/(?:^|[^\p{L}])(?:only|just|barely|merely|a[\s\u00A0]+mere)[\s\u00A0]*$/iu, (m) => m.slice(0, m.length - m.trimStart().length) + ' ');
  return CHANGE_BEFORE.test(before) || CHANGE_AFTER.test(tail(text, q)) || /^[+−-]/.test(q.text);
}

/** True when `amount` is equated with `rate` just after it: "the same 80 ppm would be 5 ppm per century". */
export function comesToRate(text: string, amount: Quantity, rate: Quantity): boolean {
  return amount.end <= rate.start && COMES_TO.test(text.slice(amount.end, rate.start));
}

/** True when duration `q` states the span of a from-to pair of dates (pair ending at `pairEnd`). */
export function isSpanOfPair(text: string, q: Quantity, pairEnd: number): boolean {
  if (NOT_A_SPAN.test(head(text, q))) return false;
  let gap = text.slice(pairEnd, q.start);
  // ", a 3,000-year thaw": an adjectival figure keeps its article.
  if (/\d-(?:years?|yr)$/iu.test(q.text)) gap = gap.replace(/(?:^|[^\p{L}])an?[\s\u00A0]+$/iu, (m) => m.slice(0, m.length - m.trimStart().length));
  return SPAN_OF_PAIR.test(head(text, q)) || PAIR_GAP.test(gap) || COPULA_GAP.test(gap);
}

/** A demonstrative or article between a span word and its figure: "over those 8,000 years". */
const SPAN_DETERMINER = /(?<=[\s\u00A0])(?:the|those|these|that|this|its|their|some|another|a|an)[\s\u00A0]+$/iu;

/** True when duration `q` states how long a change took ("in 8,000 years", "over those 8,000 years"). */
export function isSpanOfChange(text: string, q: Quantity): boolean {
  const before = head(text, q);
  if (NOT_A_SPAN.test(before)) return false;
  return SPAN_OF_CHANGE.test(before) || SPAN_OF_CHANGE.test(before.replace(SPAN_DETERMINER, ''));
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

/** Nouns for the measure a multiple is taken of: "20 times the average deglacial rate", "twice the glacial level". */
const MEASURE_NOUNS = ['rate', 'pace', 'speed', 'average', 'tempo', 'level', 'value', 'figure', 'amount', 'concentration'];
const TIMES_THE = new RegExp(String.raw`^${S}+(?:the|that|its|their)${S}+(?:[\p{L}-]+${S}+){0,3}?(?:${list(MEASURE_NOUNS)})(?![\p{L}])`, 'iu');
/** "faster", "slower", "more quickly": a multiple of a pace with nothing after it. */
const PACE_AFTER = new RegExp(String.raw`^${S}*(?:faster|slower|quicker|more${S}+(?:quickly|rapidly|rapid)|as${S}+fast)(?![\p{L}])`, 'iu');

/** True when ratio `q` is a multiple of a measure named after it ("20 times the deglacial rate of ..."). */
export function timesTheMeasure(text: string, q: Quantity): boolean {
  return q.dimension === 'ratio' && TIMES_THE.test(tail(text, q));
}

/** True when ratio `q` says how much faster or slower one pace is ("about 20x faster"). */
export function isPaceRatio(text: string, q: Quantity): boolean {
  return q.dimension === 'ratio' && PACE_AFTER.test(text.slice(q.end, q.end + 24));
}

/**
 * Participles that say an amount was laid out across a time ("80 ppm spread over 7,000 years",
 * "stretched across", "drawn out over"): the amount is still the change the time took.
 */
const SPREAD_WORDS = ['spread', 'spread out', 'stretched', 'stretched out', 'drawn out', 'strung out', 'spaced out', 'distributed', 'accumulated', 'built up', 'piled up', 'added'];
/** "[76 ppm] over [6,000 years]": an amount followed at once by the time it took is a change. */
const OVER_SPAN = new RegExp(String.raw`^${S}+(?:(?:${list(SPREAD_WORDS)})${S}+)?(?:over|in|across|within|during)${S}+(?:the${S}+)?$`, 'iu');

/** True when `amount` is followed at once by `span`, the time it took: "76 ppm over 6,000 years". */
export function changesOver(text: string, amount: Quantity, span: Quantity): boolean {
  return span.dimension === 'duration' && amount.end <= span.start && OVER_SPAN.test(text.slice(amount.end, span.start));
}

/** "one third of [today's] 420 ppm", "half of the 280 ppm": a fraction taken of the quantity after it. */
const FRACTION_OF = new RegExp(String.raw`^${S}+of(?:${S}+(?!than)[^\s\d.;:,()]+){0,3}${S}+$`, 'iu');

/** True when ratio `q` is a fraction of the quantity `next` that follows it. */
export function fractionOf(text: string, q: Quantity, next: Quantity): boolean {
  return q.dimension === 'ratio' && q.value < 1 && q.end <= next.start && FRACTION_OF.test(text.slice(q.end, next.start));
}

/**
 * A change in apposition after the values it joins: ", a swing of", ": a difference of", "— a
 * climb of". The words between end in a change noun and "of".
 */
const APPOSED_CHANGE = new RegExp(
  String.raw`^[^\d;.!?]{0,40}?[,:(—–]${S}*(?:(?:that is|or|so|thus|i\.e\.)[,\s\u00A0]+)?(?:(?:a|an|the|some)${S}+)?(?:[\p{L}-]+${S}+)?(?:${list(CHANGE_NOUNS)}|gap|contrast|range)${S}+of${S}*$`,
  'iu',
);

/**
 * A change drawn as the consequence of the two values: ", so it climbed", ", which makes the
 * increase", "; so the rise was". A consequence word, a few words, then a change word just before
 * the number.
 */
const CONSEQUENCE_CHANGE = new RegExp(
  String.raw`^[^\d;.!?]{0,40}?[,;:—–]${S}*(?:and${S}+)?(?:so|which|thus|hence|that)${S}+(?:[^\d;.!?,]{0,30}?${S})?(?:${list(CHANGE_NOUNS)}|${list(CHANGE_VERBS)}|added|adds)(?:${S}+(?:of|by|was|is|came${S}+to|comes${S}+to|amounted${S}+to))?${S}*$`,
  'iu',
);

/** True when `change` follows `level` as an apposition naming the change between them. */
export function isApposedChange(text: string, level: Quantity, change: Quantity): boolean {
  return level.end <= change.start && (APPOSED_CHANGE.test(text.slice(level.end, change.start)) || isConsequenceChange(text, level, change));
}

/** True when `change` is drawn from the values as their consequence ("…, so it climbed 75 ppm"). */
export function isConsequenceChange(text: string, level: Quantity, change: Quantity): boolean {
  return level.end <= change.start && CONSEQUENCE_CHANGE.test(text.slice(level.end, change.start));
}
