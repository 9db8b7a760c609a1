/**
 * Restatements: one quantity followed by the same quantity in another unit. Three ways of writing
 * one are read:
 *  - tight: a parenthesis, "or", "i.e.", "=" or a comma right between them: "3,270 m (10,700 ft)",
 *    "5 °C, or 9 °F", "12,000 years ago, around 10,000 BCE";
 *  - loose: a few words and no other quantity between them, ending in a restatement word: "420 ppm of
 *    CO2, which is 0.042 percent", "about 6 °C colder than before industry, that is, 10.8 °F colder";
 *  - across sentences: the next sentence of the paragraph restates the last date of this one:
 *    "... at 11,700 b2k. That is 11,650 years BP."
 * The second is the conversion the unit checks verify, except that a °F figure is always taken as
 * the conversion of its °C or K partner, whichever comes first.
 */
import { CHANGE_SUBJECT_NOUNS, RESTATING_VERB_PATTERN } from '../quantities/reading-cues.js';
import { fromCanonical, toCanonical } from '../quantities/convert.js';
import { CANONICAL_UNIT } from '../quantities/unit-table.js';
import type { Quantity } from '../types.js';

const S = String.raw`[\s\u00A0]`;
/** What the first amount is of, before a joiner: "190 ppm of carbon dioxide, ...", "120 metres of sea-level fall is ...". */
const OF_WHAT = String.raw`(?:${S}+of${S}+(?:the${S}+)?[\p{L}₂-]+(?:${S}+[\p{L}₂-]+){0,2})?`;
/** A hedge before the second amount: "..., barely 0.19 percent". */
const HEDGE_TAIL = String.raw`(?:(?:barely|just|only|roughly|about|around|some|nearly|almost|approximately)${S}+)?`;
const JOINER = new RegExp(
  String.raw`^${OF_WHAT}${S}*(?:\(|\[|,?${S}*or${S}+|,?${S}*i\.e\.,?${S}*|,?${S}*that is,?${S}*|=${S}*|\/${S}*|,?${S}*equivalent to${S}+|,?${S}*which is${S}+|,?${S}*(?:aka|a\.k\.a\.)${S}+|,${S}*so${S}+|,${S}*|—${S}*)${HEDGE_TAIL}$`,
  'iu',
);
/** Words that end a loose gap and announce the same amount again ("which readers would call"). */
/**
 * "which in physicist units is", "that, in feet, comes to": a pointing word, a frame naming the other
 * unit or scale ("in X units", "in X terms", "in X"), then a copula or a restating verb.
 */
const FRAMED = String.raw`(?:which|that|this)${S}*,?${S}+in${S}+(?:[\p{L}-]+${S}+){0,2}?(?:[\p{L}-]+)${S}*,?${S}+(?:is|was|comes${S}+to|works${S}+out${S}+(?:to|at)|becomes|reads)`;
/**
 * What a pointing word may name before the amount again: "a drop of", or a noun phrase of the
 * thing measured, "that is a column of ice roughly 1,070 feet long".
 */
const NAMED_AGAIN = String.raw`(?:${S}*(?:a|an)${S}+(?:(?:${CHANGE_SUBJECT_NOUNS.join('|')})${S}+of|[\p{L}-]+(?:${S}+of(?:${S}+[\p{L}-]+){1,2})?))`;
const LEAD = String.raw`(?:(?:or|i\.e\.,?|that is,?|that's|that’s|thats|this is|which is|which was|which comes to|equivalent to|in other words,?|or about|(?:would|might|will|can|could)${S}+call|call${S}+it|=|\(|—|${FRAMED})${NAMED_AGAIN}?|${RESTATING_VERB_PATTERN})`;
/**
 * Words a speaker or a poster drops between the pointing word and the amount, each with its commas:
 * "that's, uh, roughly thirty-three hundred feet", "that's, what, twelve hundred feet", "thats like
 * 3.2 miles" (common practice of speech and chat).
 */
const FILLERS = String.raw`(?:uh|um|er|erm|what|like|you${S}+know|so)`;
const HEDGES = String.raw`(?:still|just|only|merely|roughly|about|around|some|barely|nearly|almost|approximately)`;
const LOOSE_END = new RegExp(String.raw`(?:^|[^\p{L}])${LEAD}(?:,?${S}*(?:${HEDGES}|${FILLERS})(?![\p{L}])){0,3},?${S}*$`, 'iu');
/**
 * "She says the core went down 3,623 m. So about three and a half miles of ice": a sentence that
 * opens with "so" right before a hedged amount draws that amount from the one before: the amount
 * again, in another unit (the hedge is the quantity's own, so it is read from the figure).
 */
const SO_OPENS = new RegExp(String.raw`(?:^|[:>\]])${S}*so,?${S}*$`, 'iu');
const HEDGED = new RegExp(String.raw`^(?:${HEDGES}|like|~)`, 'iu');
/** A loose gap: short, with no clause break that would end the thought (no other quantity: they are adjacent). */
const LOOSE_GAP = /^[^;:!?]{0,80}$/u;
/** Words after a percentage that make it a relative change ("50 percent above", "30 percent higher"). */
const RELATIVE_AFTER = new RegExp(String.raw`^${S}*(?:above|below|higher|lower|more|less|greater|smaller|up|down|increase|rise|drop|fall|over|under)(?![\p{L}])`, 'iu');
/**
 * One comparison written twice, in two units: "about 130 metres lower than now, roughly 430 feet
 * below today's shore"; "6 °C colder than today, some 11 °F colder". The gap is a comparative (with
 * what it compares with) and a comma; a comparative follows the second figure too.
 */
const COMPARATIVE = String.raw`(?:lower|higher|below|above|deeper|shallower|colder|warmer|cooler|hotter|longer|shorter|older|younger|thicker|thinner|taller|more|less)`;
const PARALLEL_GAP = new RegExp(String.raw`^${S}+${COMPARATIVE}(?:${S}+than${S}+(?:[\p{L}'’-]+${S}*){1,4})?${S}*,${S}*(?:or${S}+)?$`, 'iu');
const PARALLEL_AFTER = new RegExp(String.raw`^${S}+${COMPARATIVE}(?![\p{L}])`, 'iu');
/**
 * Or the second figure alone closes the clause after the comma, an appositive of the first: "about
 * 130 metres lower, roughly 430 feet." (common practice of giving a conversion).
 */
const CLAUSE_CLOSES = new RegExp(String.raw`^${S}*(?:[.;:!?)\]—–]|$)`, 'u');
const parallelComparison = (text: string, gap: string, second: Quantity): boolean =>
  PARALLEL_GAP.test(gap) && (PARALLEL_AFTER.test(text.slice(second.end)) || CLAUSE_CLOSES.test(text.slice(second.end))) && second.dimension !== 'percent';

/** A copula alone between two amounts in different units: "420 ppm is 0.042 percent". */
const COPULA_GAP = new RegExp(String.raw`^${OF_WHAT},?${S}+(?:is|was|are|were|equals|makes${S}+up|made${S}+up)(?:${S}+(?:still|just|only|roughly|about|around|some))?${S}+$`, 'iu');
/** "in BP it is", "on the b2k scale that's": the era named, then a pointing word, just before the date. */
const ERA_NAMED_BACK = new RegExp(String.raw`(?:^|[^\p{L}])(?:in|on)${S}+(?:the${S}+)?(?:bp|b2k)(?:${S}+(?:terms|scale|years))?,?${S}+(?:it|that|this)(?:${S}+(?:is|was|becomes|comes${S}+to)|['’]s)${S}*(?:(?:about|roughly|around|some)${S}+)?$`, 'iu');

/**
 * A sentence that opens by naming a system of units or a unit to read in: "In imperial units",
 * "In US customary terms", "In feet", "In Fahrenheit", "Converted to feet" (common practice of
 * writing a conversion; NIST SP 811 names the US customary and SI systems).
 */
const SYSTEM_FRAME = new RegExp(String.raw`^[^\p{L}]*(?:in|into|converted${S}+(?:in)?to|expressed${S}+in|measured${S}+in)${S}+(?:(?:imperial|metric|us|u\.s\.|american|british|customary|si|english|everyday|old${S}+money)(?:${S}+customary)?${S}+(?:units|terms|measures|measurements)|feet|foot|miles|metres|meters|kilometres|kilometers|fahrenheit|celsius|percent|per${S}+cent|parts${S}+per${S}+million|ppm)(?![\p{L}])`, 'iu');
/** Words too common to tie a sentence to the one before. */
const COMMON = new Set(['that', 'this', 'with', 'from', 'into', 'have', 'were', 'which', 'there', 'their', 'about', 'units', 'terms', 'imperial', 'metric', 'feet', 'runs', 'comes']);
/**
 * True when `head` (the words before the figure) opens with a frame naming a system of units and
 * speaks of what the sentence before spoke of: a pointing word ("that", "it") or a word of four
 * letters or more that the sentence before holds too ("In imperial units the core runs to ...").
 */
function namesSystemBack(head: string, before: string): boolean {
  const frame = SYSTEM_FRAME.exec(head);
  if (frame === null) return false;
  const rest = head.slice(frame[0].length);
  if (/(?:^|[^\p{L}])(?:that|this|it|its|which)(?![\p{L}])/iu.test(rest)) return true;
  const earlier = new Set((before.toLowerCase().match(/\p{L}{4,}/gu) ?? []).filter((w) => !COMMON.has(w)));
  return (rest.toLowerCase().match(/\p{L}{4,}/gu) ?? []).some((w) => !COMMON.has(w) && earlier.has(w));
}

/** A sentence that opens by restating: "That is 11,650 years BP", "On the BP scale, that's ...". */
const OPENING = /^[^;!?]{0,100}$/u;

/**
 * The scale word of a quantity ("0.8 billion years" → billion), or "" for plain digits. A unit
 * written the same with another scale word is a restatement too ("800,000 years, or 0.8 million
 * years"; "600,000 years old, or 0.6 million"), but only behind a bracket or "or": a bare comma
 * there joins the items of a list.
 */
const scaleOf = (q: Quantity): string => /(?:thousand|million|billion|trillion)/iu.exec(q.text)?.[0].toLowerCase() ?? '';
const SCALE_JOINER = new RegExp(String.raw`^(?:${S}+(?:old|long))?${S}*(?:\(|\[|,?${S}*or${S}+|,?${S}*i\.e\.,?${S}*|,?${S}*that is,?${S}*|=${S}*)$`, 'iu');

/** "are roughly 50 percent higher": a percentage that is a relative change, not the amount again. */
const relativeChange = (text: string, q: Quantity): boolean =>
  q.dimension === 'percent' && (RELATIVE_AFTER.test(text.slice(q.end)) || shareOfAnother(text, q) || (CHANGE_OF_BEFORE.test(text.slice(Math.max(0, q.start - 48), q.start)) && !ofTheAir(text, q)));

/** A change named just before a figure, as what the figure is: "a rise of 132 ppm", "the increase, 140 ppm". */
const CHANGE_OF_BEFORE = new RegExp(String.raw`(?:^|[^\p{L}])(?:${CHANGE_SUBJECT_NOUNS.join('|')})(?:${S}+of|${S}*,|${S}+(?:was|is|came${S}+to|comes${S}+to|amounted${S}+to))${S}+(?:(?:about|roughly|around|some|nearly|almost|just|only)${S}+)?$`, 'iu');

/**
 * "a rise of 132 ppm, or about 32 per cent": a percentage after a change told in ppm is that change
 * relative to where it started (the arithmetic checks' share of a change), not the change again as
 * a share of the air.
 */
const changeAsShare = (text: string, first: Quantity, second: Quantity): boolean =>
  first.dimension === 'concentration' && second.dimension === 'percent' && CHANGE_OF_BEFORE.test(text.slice(Math.max(0, first.start - 48), first.start)) && !ofTheAir(text, second);

/** "0.0132 per cent of the air": a percentage that names the air as its whole. */
function ofTheAir(text: string, q: Quantity): boolean {
  const m = SHARE_OF.exec(text.slice(q.end));
  return m !== null && (m[1] ?? '').toLowerCase().split(/[\s\u00A0]+/u).some((w) => AIR_WORDS.test(w.replace(/['’]s$/u, '')));
}

/** The words after "of" that name a percentage's whole ("of the starting value", "of the air"). */
const SHARE_OF = new RegExp(String.raw`^${S}*of${S}+((?:[\p{L}'’-]+${S}*){1,5})`, 'iu');
/** Wholes that make a percentage a share of the air: the amount in ppm again (common practice: 1% of the air = 10,000 ppm). */
const AIR_WORDS = /^(?:air|atmosphere|atmospheric|gas|gases|volume)$/u;

/**
 * "90 ppm, which is about 47 percent of the starting value": a percentage of a named whole that is
 * not the air is a share of another figure, not the amount again in percent.
 */
function shareOfAnother(text: string, q: Quantity): boolean {
  const m = SHARE_OF.exec(text.slice(q.end));
  if (m === null) return false;
  const words = (m[1] ?? '').toLowerCase().split(/[\s\u00A0]+/u).filter((w) => w !== '');
  return !words.some((w) => AIR_WORDS.test(w.replace(/['’]s$/u, '')));
}

/** "1 ppm is 0.0001 percent, so 280 ppm equals 0.028 percent": a figure that opens a new equation. */
const EQUATION_AFTER = new RegExp(String.raw`^${S}+(?:is|equals|=|makes|gives|comes${S}+to)${S}+(?:(?:about|roughly|around|some|just)${S}+)?[\d.]`, 'iu');
const startsAnEquation = (text: string, q: Quantity): boolean => EQUATION_AFTER.test(text.slice(q.end, q.end + 40));

/** A quantity and its restatement in another unit; `loose` when words stand between them. */
export interface Restatement {
  first: Quantity;
  second: Quantity;
  loose: boolean;
}

/** The sentence before, for restatements that cross a sentence boundary. */
export interface PreviousSentence {
  text: string;
  quantities: Quantity[];
  /** The paragraph's earlier sentences up to this one, in order (the last is `text`). */
  earlier?: readonly string[];
}

const sameThing = (a: Quantity, b: Quantity): boolean =>
  a.dimension === b.dimension || (a.dimension === 'concentration' && b.dimension === 'percent') || (a.dimension === 'percent' && b.dimension === 'concentration');

/**
 * Two dates a loose restatement could join: a slip moves a date by an era offset (50, 1,950 or
 * 2,000 years), never to another order of magnitude. "Counts back from 1950, that's 11,750 years
 * BP" names a reference year, not the date restated.
 */
function closeDates(a: Quantity, b: Quantity): boolean {
  if (a.dimension !== 'age') return true;
  const [x, y] = [Math.abs(a.value), Math.abs(b.value)].sort((m, n) => m - n) as [number, number];
  return y <= 2 * x + 100 || thousandFold(x, y);
}

/**
 * A date restated a thousand times too large or too small: the same number with the neighbouring
 * scale word ("800 ka, is eight hundred million years ago": ka are thousands of years), the slip the
 * unit checks name (units-scale.ts); no era offset or reference year is ever that far off.
 */
function thousandFold(x: number, y: number): boolean {
  return x > 0 && Math.abs(y / x / 1e3 - 1) < 1e-6;
}

/**
 * "The 3,270-metre borehole is 10,700 feet deep": a measure written as a hyphenated modifier of the
 * subject, then the subject's measure in another unit after "is", ending in a word of measure
 * (deep, long, thick, old...: "is 300 feet from the camp" is another length). The modifier must
 * end there ("a 10-km-wide shelf is 300 feet thick" measures two things).
 */
const MODIFIER = /\d-\p{L}+$/u;
const MODIFIER_GAP = new RegExp(String.raw`^${S}+[^\d,;:.!?()]{1,40}${S}(?:is|was|measures|measured|runs|ran)${S}+$`, 'iu');
const MEASURE_AFTER = new RegExp(String.raw`^${S}+(?:deep|long|tall|high|thick|old|in${S}+(?:depth|length|height|thickness))(?![\p{L}])`, 'iu');
function restatesModifier(text: string, first: Quantity, gap: string, second: Quantity): boolean {
  return MODIFIER.test(first.text) && text[first.end] !== '-' && MODIFIER_GAP.test(gap) && MEASURE_AFTER.test(text.slice(second.end));
}

/** A short gap in one clause ending in a copula or a restatement word: "global warm-up is", ", or". */
/** A change noun pointed at before a figure: "that six-degree drop works out to", "this warming is". */
const CHANGE_NOUN_BEFORE = new RegExp(String.raw`(?:^|[^\p{L}])(?:that|this|the|which)${S}+(?:[\p{L}\d-]+${S}+){0,2}(?:${CHANGE_SUBJECT_NOUNS.join('|')})(?![\p{L}])[^.;:!?\d]{0,40}$`, 'iu');

/** True when the words just before a figure point at a change: "that six-degree drop works out to". */
export const pointsAtChange = (head: string): boolean => CHANGE_NOUN_BEFORE.test(head);

const READING_AS_CHANGE_GAP = new RegExp(String.raw`^[^;:.!?\d]{0,40}?(?:(?:^|[^\p{L}])(?:is|was|are|were|equals|or|that is|which is|that's|that’s)|${RESTATING_VERB_PATTERN})(?:${S}+(?:still|just|only|roughly|about|around|some))?${S}*$`, 'iu');

/** Words that open another clause, whose reading is its own: "... colder, and a summer day was 38 °F". */
const NEW_CLAUSE = /(?:^|[^\p{L}])(?:and|but|while|whereas|when|where|though|although)(?![\p{L}])/iu;

/** A temperature read as a reading, read again as a change of the same number of degrees. */
function asChange(q: Quantity): Quantity {
  const again = (x: number): number => toCanonical(fromCanonical(x, q.statedUnit, 'temperature'), q.statedUnit, 'temperature-change');
  return { ...q, dimension: 'temperature-change', unit: CANONICAL_UNIT['temperature-change'], value: again(q.value), low: again(q.low), high: again(q.high) };
}

/** The °F side of a °C ↔ °F pair is the conversion; otherwise the second one is. */
function ordered(a: Quantity, b: Quantity, loose: boolean): Restatement {
  return a.statedUnit === 'degF' && b.statedUnit !== 'degF' ? { first: b, second: a, loose } : { first: a, second: b, loose };
}

/** Every adjacent pair of one thing in different stated units, joined as a restatement. */
/** A plural of a round number with no count ("thousands of years", "hundreds of metres"). */
const VAGUE = /^(?:many\s+|several\s+|some\s+|tens\s+of\s+|hundreds\s+of\s+)?(?:dozens|hundreds|thousands|millions|billions)(?![\p{L}])/iu;

export function findRestatements(text: string, qs: Quantity[], previous?: PreviousSentence): Restatement[] {
  const out: Restatement[] = [];
  for (let i = 0; i + 1 < qs.length; i++) {
    const first = qs[i] as Quantity;
    const second = qs[i + 1] as Quantity;
    if (!sameThing(first, second)) continue;
    // "ka, thousands of years before present, so 21 ka means...": a vague plural names no amount to restate.
    if (VAGUE.test(first.text) || VAGUE.test(second.text)) continue;
    const gap = text.slice(first.end, second.start);
    if (first.statedUnit === second.statedUnit) {
      if (scaleOf(first) !== scaleOf(second) && SCALE_JOINER.test(gap)) out.push(ordered(first, second, false));
      continue;
    }
    // "above 420 ppm, roughly 50 percent higher than ...": a relative change is not the amount again.
    if (relativeChange(text, second) || startsAnEquation(text, second) || changeAsShare(text, first, second)) continue;
    if (JOINER.test(gap)) out.push(ordered(first, second, false));
    // "Today's 420 ppm is about 0.042 percent of the air": one amount, the copula, the same amount.
    else if (COPULA_GAP.test(gap) && closeDates(first, second) && !relativeChange(text, second)) out.push(ordered(first, second, true));
    else if (LOOSE_GAP.test(gap) && LOOSE_END.test(gap) && closeDates(first, second)) out.push(ordered(first, second, true));
    else if (restatesModifier(text, first, gap, second) && closeDates(first, second)) out.push(ordered(first, second, true));
    else if (parallelComparison(text, gap, second) && closeDates(first, second)) out.push(ordered(first, second, true));
  }
  // A °F figure in this writing is a conversion: "in Fahrenheit that difference is about 43 °F",
  // "a 6 °C warm-up is about 38 °F". It restates the nearest °C or K figure before it.
  for (const q of qs) {
    if (q.statedUnit !== 'degF' || out.some((r) => r.first === q || r.second === q)) continue;
    const partner = qs.filter((p) => p.end <= q.start && (p.statedUnit === 'degC' || p.statedUnit === 'K')).at(-1);
    if (partner === undefined || qs.some((o) => o.start > partner.end && o.end <= q.start && o.statedUnit === 'degF')) continue;
    // "a 6 °C warm-up is about 38 °F": "is" made the °F figure a reading, but it restates a change.
    // Only in one short clause that equates them ("is", "or", "which is"), never across a clause break.
    const gap = text.slice(partner.end, q.start);
    const equated = READING_AS_CHANGE_GAP.test(gap) && !NEW_CLAUSE.test(gap);
    const same = sameThing(partner, q) ? q : partner.dimension === 'temperature-change' && q.dimension === 'temperature' && equated ? asChange(q) : undefined;
    if (same !== undefined) out.push(ordered(partner, same, true));
  }
  const opening = previous === undefined ? undefined : acrossSentences(text, qs, previous, out);
  return opening === undefined ? out : [...out, opening];
}

/**
 * The first quantity of a sentence that opens by restating the last quantity of the sentence
 * before ("... at 11,700 b2k. That is 11,650 years BP."). Words and a reference year may come
 * first ("On the BP scale, which counts back from 1950, that's ..."), but no other candidate.
 */
function acrossSentences(text: string, qs: Quantity[], previous: PreviousSentence, found: Restatement[]): Restatement | undefined {
  // The last amount of the sentence before that this one could restate ("430 ppm in 2025. That is
  // 430 parts per billion": the year is passed over).
  // A reference year in brackets ("11,700 b2k (before AD 2000). In BP that is ...") is passed over
  // for the date a slip could have moved: the last one close enough to a date of this sentence.
  // "that six-degree drop works out to about 43 °F": a °F reading after a change noun that points
  // back is the change restated.
  const changeBack = (q: Quantity): Quantity => (q.statedUnit === 'degF' && q.dimension === 'temperature' && CHANGE_NOUN_BEFORE.test(text.slice(0, q.start)) ? asChange(q) : q);
  const partnerOf = (p: Quantity): Quantity | undefined => qs.map(changeBack).find((q) => sameThing(p, q) && closeDates(p, q) && p.statedUnit !== q.statedUnit);
  const first = [...previous.quantities].reverse().find((p) => partnerOf(p) !== undefined);
  if (first === undefined) return undefined;
  const second = partnerOf(first) as Quantity;
  const original = qs.find((q) => q.start === second.start) ?? second;
  if (found.some((r) => r.second === second || r.first === second)) return undefined;
  // "fifty percent above where it stood in 1750": a relative change, not the amount again.
  // "That is a rise of about 32 per cent": after a change noun, too.
  if (relativeChange(text, second)) return undefined;
  const head = text.slice(0, second.start);
  // "For readers who think in Fahrenheit, that makes it about 43 °F colder": a °F figure that
  // points back restates the last °C or K figure before it.
  const fahrenheitBack = second.statedUnit === 'degF' && (first.statedUnit === 'degC' || first.statedUnit === 'K') && /\b(?:fahrenheit|that|this|which)\b/iu.test(head) && !qs.some((q) => q.start < second.start && q !== original && q.dimension === second.dimension);
  // "BP counts from 1950, so in BP it is 11,750 years": a date after the era it is restated in.
  const eraBack = second.dimension === 'age' && ERA_NAMED_BACK.test(head);
  const systemBack = namesSystemBack(head, previous.text) && !qs.some((q) => q !== original && q.dimension === second.dimension);
  const soBack = SO_OPENS.test(head) && HEDGED.test(second.text);
  if (!OPENING.test(head) || !(LOOSE_END.test(head) || fahrenheitBack || eraBack || systemBack || soBack)) return undefined;
  // "That is a rise of 132 ppm, or about 32 per cent": a figure of the same thing before it in this
  // sentence is what it restates, if anything, not the last figure of the sentence before. A calendar
  // year names an era's reference ("counting back from 1950, that is 8,250 years BP"), no date restated.
  if (qs.some((q) => q.end <= second.start && q.statedUnit !== 'CE' && sameThing(q, first))) return undefined;
  // "we sat at about 280, which is, um, 0.028 percent": a bare number of this sentence right before
  // the pointing words is what they point at, not a figure of the sentence before.
  // A post's counter ("Mon 4/ that's well over ...") points at nothing.
  if (qs.some((q) => q.end <= second.start && q.dimension === 'number' && /^[,\s\u00A0]/u.test(text.slice(q.end, second.start)) && LOOSE_END.test(text.slice(q.end, second.start)))) return undefined;
  // "0.042 per cent. (One ppm is one ten-thousandth of one per cent.)": a bracket that opens the
  // sentence opens an aside; only one right after its figure restates it.
  if (/^[\s\u00A0]*[([][\s\u00A0]*$/u.test(head)) return undefined;
  // Only a number in this sentence can be flagged here, so it must be the conversion.
  const pair = ordered(first, second, true);
  return pair.second === second ? pair : undefined;
}
