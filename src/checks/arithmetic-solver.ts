/**
 * The paragraph's equations: a result a sentence draws from figures given anywhere in the last few
 * sentences of its paragraph (or its block's lead-in, prose/lead-in.ts), in any word order.
 *
 * Every figure of those sentences is given a role: a level, a change (stated as one, a from-to pair
 * of levels, or an amount over a time: "80 ppm over 7,000 years"), a duration (stated, or the span
 * of a pair or range of dates) or a rate. The simple relations among them are then enumerated:
 *  - a rate is a change ÷ a duration ("... 80 ppm, spread over roughly 6,500 years. Do the division
 *    and that's around 0.12 ppm per year");
 *  - a change is the difference of two levels ("... at about 180 ppm ... to about 280 ppm. That
 *    means CO2 went up by roughly 150 ppm");
 *  - a multiple of a pace is one rate ÷ another, stated or derived ("Today's rate, over two ppm a
 *    year, is about twenty times the average pace of that ancient rise").
 * A stated result is flagged only when it matches NONE of the values the relations give (so a
 * writer who meant any reading of their figures is left alone), when the sentence marks it as drawn
 * from what came before ("so", "that's", "works out to", "on average", "do the division"...), and
 * when it carries no time of its own ("today", "in 2024", "a year") that would make it another
 * quantity. The correction is the value from the nearest figures.
 */
import { toCanonical, writtenInterval as w } from '../quantities/index.js';
import type { Dimension, Quantity } from '../types.js';
import type { Previous } from './arithmetic-context.js';
import { disjoint } from './arithmetic-levels.js';
import { divide, facing, invert, minus, rangeSpan, size, type Derived } from './arithmetic-derive.js';
import { changesOver, findPairs, isPaceRatio, isStatedChange, timesTheMeasure, type Pair } from './arithmetic-frames.js';
import { spanOfDates } from './arithmetic-spans.js';
import { holdsPhrase, WORDS, wordsIn } from './arithmetic-reader/word-classes.js';
import { isVagueTime } from './arithmetic-vague.js';

/** A finding from the paragraph's equations, with the basis named. */
export interface SolverFinding {
  stated: Quantity;
  computed: Derived;
  measures: string;
  /** Whose numbers: the paragraph's, or (left out) the sentence's own. */
  basis?: string;
}

/** One sentence as the solver reads it: its text, figures and from-to pairs; `distance` 0 is the sentence checked. */
interface Read {
  text: string;
  qs: Quantity[];
  pairs: Pair[];
  distance: number;
}

/** A value one relation gives, with its words and how far back its inputs stand. */
interface Candidate {
  value: Derived;
  measures: string;
  distance: number;
}

const S = String.raw`[\s\u00A0]`;
const RATE_OF: Partial<Record<Dimension, Dimension>> = { 'concentration-rate': 'concentration', 'temperature-rate': 'temperature-change', 'length-rate': 'length' };
const LEVEL_OF: Partial<Record<Dimension, Dimension>> = { concentration: 'concentration', temperature: 'temperature-change', length: 'length' };
/** How many earlier sentences the equations reach back. */
const LOOK_BACK = 3;
const basis = "the paragraph's";

/**
 * Words that present a figure as worked out from what came before: a consequence ("so", "thus",
 * "which means"), an equation ("that's", "works out to", "work that out and you get", "comes to", "equals"), a mean ("on
 * average", "an average of", "averaged over") or the sum itself ("do the division", "by my
 * arithmetic"). Matched anywhere before the figure in its sentence.
 */
const DRAWN = new RegExp(
  String.raw`(?:^|[^\p{L}])(?:so|thus|hence|therefore|that${S}+means|which${S}+means|meaning|that's|that’s|that${S}+is|which${S}+is|i\.e\.|works?${S}+out|worked${S}+out|work(?:s|ed|ing)?${S}+(?:it|that|this|those|these)${S}+out|(?:you|we|I)${S}+get|that${S}+gives|which${S}+gives|giving|comes?${S}+to|came${S}+to|equals|averag(?:e|es|ed|ing)|on${S}+average|divid(?:e|ed|ing)|division|arithmetic|math|maths|sum|in${S}+all|all${S}+told|in${S}+other${S}+words|put${S}+another${S}+way|or${S}+about|or${S}+roughly)(?![\p{L}])`,
  'iu',
);
/** Words that give a figure a time of its own: it is about another period than the figures before. */
const OWN_TIME = new RegExp(String.raw`(?:^|[^\p{L}])(?:today|today's|today’s|now|nowadays|currently|current|modern|present|recent|recently|lately|this${S}+(?:year|decade|century)|last${S}+(?:year|decade|century)|(?:1[5-9]|20)\d\d(?:s|['’]s)?)(?![\p{L}\p{N}])`, 'iu');
/** After a change: a time it recurs in ("a year", "per decade", "each century", "annually"), or a start it is counted from ("since"). */
const PER_TIME_AFTER = new RegExp(String.raw`^[^.;:!?,]{0,12}?(?:^|[^\p{L}])(?:(?:a|an|per|each|every|in${S}+a|in${S}+one)${S}+(?:year|decade|century|month|day|millennium)|annually|yearly|since|than)(?![\p{L}])`, 'iu');
/** Words that make a duration no span of a change: "the past 800,000 years", "every 100,000 years". */
const NOT_A_SPAN = new RegExp(String.raw`(?:^|[^\p{L}])(?:past|last|previous|next|every|each|per|ago|old|back)${S}*$`, 'iu');

/**
 * A change named as the subject of a copula ("the rise was about 80 ppm", "the warming came to 6 °C"),
 * added on top of what came before ("another 184 ppm", "a further 2 °C") or an amount of a change
 * named after it ("60 m of sea-level rise"): changes the frames' cue words (isStatedChange) do not read.
 */
const CHANGE_SUBJECT = new RegExp(
  String.raw`(?:(?:^|[^\p{L}])(?:rise|increase|drop|fall|decline|change|jump|gain|loss|swing|difference|warming|cooling|growth|decrease|reduction|climb|surge|plunge)(?:${S}+(?:in|of|across|during|over|at)${S}+[^,;:.!?\d]{1,40}?)?${S}+(?:was|is|were|came${S}+to|comes${S}+to|amounted${S}+to|amounts${S}+to|totalled|totaled)|(?:^|[^\p{L}])(?:another|a${S}+further|an${S}+extra|an${S}+additional))${S}*$`,
  'iu',
);
/** "60 m of sea-level rise", "5 °C of warming", "80 ppm of CO2 gain": an amount of a change named after it. */
const OF_CHANGE_AFTER = new RegExp(String.raw`^${S}+of${S}+(?:[\p{L}\d-]+${S}+){0,2}(?:rise|increase|drop|fall|decline|change|jump|gain|loss|warming|cooling|growth|decrease|climb)(?![\p{L}])`, 'iu');
const isChange = (text: string, q: Quantity): boolean =>
  isStatedChange(text, q) || CHANGE_SUBJECT.test(text.slice(Math.max(0, q.start - 40), q.start)) || OF_CHANGE_AFTER.test(text.slice(q.end, q.end + 48));

const only = <T>(xs: T[]): T | undefined => (xs.length === 1 ? xs[0] : undefined);

function readAll(text: string, qs: Quantity[], pairs: Pair[], earlier: readonly Previous[]): Read[] {
  return [{ text, qs, pairs, distance: 0 }, ...earlier.slice(0, LOOK_BACK).map((p, i) => ({ text: p.text, qs: p.quantities, pairs: findPairs(p.text, p.quantities), distance: i + 1 }))];
}

/** The changes of `dimension` a sentence states: stated changes, amounts over a time, from-to pairs of levels. */
function changesIn(s: Read, dimension: Dimension, except: readonly Quantity[]): { value: Derived; text: string }[] {
  const paired = new Set(s.pairs.flatMap((p) => [s.qs[p.from], s.qs[p.to]]));
  const stated = s.qs.filter((q) => !except.includes(q) && !paired.has(q) && q.dimension === dimension && (isChange(s.text, q) || s.qs.some((d) => changesOver(s.text, q, d))));
  // A pair's unit may be written at its end only ("~190 → 280 ppm").
  const fromPairs = s.pairs.filter((p) => LEVEL_OF[s.qs[p.to]?.dimension ?? 'number'] === dimension && [s.qs[p.to]?.dimension, 'number'].includes(s.qs[p.from]?.dimension)).map((p) => {
    const [a, b] = [s.qs[p.from] as Quantity, s.qs[p.to] as Quantity];
    return { value: size(minus(w(b), w(a))), text: `from ${a.text} to ${b.text}` };
  });
  return [...stated.map((q) => ({ value: size(w(q)), text: q.text })), ...fromPairs];
}

/** The spans of time a sentence states: durations that are no age or interval, and the spans of its dates. */

function durationsIn(s: Read, except: readonly Quantity[]): { value: Derived; text: string }[] {
  // "several centuries", "a few thousand years": a time told vaguely is no operand of a sum (common practice).
  const stated = s.qs.filter((q) => !except.includes(q) && q.dimension === 'duration' && !isVagueTime(q.text) && !NOT_A_SPAN.test(s.text.slice(Math.max(0, q.start - 12), q.start)) && !/^[\s\u00A0]*(?:ago|old|back|before)(?![\p{L}])/iu.test(s.text.slice(q.end)));
  const dated = spanOfDates(s.qs, s.pairs).map((d) => ({ value: d.span, text: d.measures.replace(/^the time /u, '') }));
  const ages = s.qs.filter((q) => q.dimension === 'age');
  const two = dated.length === 0 && ages.length === 2 && ages.every((q) => rangeSpan(q) === undefined) ? [{ value: size(minus(w(ages[0] as Quantity), w(ages[1] as Quantity))), text: `${(ages[0] as Quantity).text} to ${(ages[1] as Quantity).text}` }] : [];
  return [...stated.map((q) => ({ value: w(q), text: q.text })), ...dated, ...two];
}

/** Every change ÷ duration among the sentences, a change and its duration from one sentence or from this one and one before. */
function rateCandidates(reads: Read[], changeDim: Dimension, except: readonly Quantity[]): Candidate[] {
  const out: Candidate[] = [];
  for (const a of reads) {
    for (const c of changesIn(a, changeDim, except)) {
      // A change told with the time it took ("rose 76 ppm in 6,000 years", "took thousands of years")
      // takes no other sentence's time.
      const ownTime = a.qs.some((q) => !except.includes(q) && q.dimension === 'duration' && !NOT_A_SPAN.test(a.text.slice(Math.max(0, q.start - 12), q.start)));
      for (const b of reads) {
        // From one sentence, from this one and one before, or from two sentences next to each other.
        if (a !== b && a.distance !== 0 && b.distance !== 0 && Math.abs(a.distance - b.distance) > 1) continue;
        if (a !== b && ownTime) continue;
        for (const d of durationsIn(b, except)) {
          const r = divide(c.value, d.value);
          if (r !== undefined) out.push({ value: r, measures: `${c.text} divided by ${d.text}`, distance: a.distance + b.distance });
        }
      }
    }
  }
  return out.sort((x, y) => x.distance - y.distance);
}

/** The candidate to show: the nearest; undefined when none, or when any agrees with `stated`. */
function verdict(stated: Quantity, candidates: Candidate[], like: (c: Derived) => Derived = (c) => c): Candidate | undefined {
  if (candidates.length === 0 || candidates.some((c) => !disjoint(stated, like(c.value)))) return undefined;
  return candidates[0];
}

/**
 * A rate drawn from a change and a duration stated anywhere in the last few sentences: "The last
 * deglacial rise was about 80 ppm, spread over roughly 6,500 years. Do the division and that's
 * around 0.12 ppm per year."
 */
export function ratesInParagraph(text: string, qs: Quantity[], pairs: Pair[], earlier: readonly Previous[]): SolverFinding[] {
  return qs.flatMap((rate) => {
    const changeDim = RATE_OF[rate.dimension];
    if (changeDim === undefined) return [];
    // "That works out at about 0.1 ppm per year, while today's rate is about 2.4 ppm per year": the
    // drawn rate's clause ends where another time's rate is set against it; what follows is not its.
    const against = comparedAfter(text, qs, rate);
    if (against !== undefined) {
      const own = qs.filter((q) => q.end <= against);
      return ratesInParagraph(text.slice(0, against), own, findPairs(text.slice(0, against), own), earlier).filter((f) => f.stated === rate);
    }
    if (qs.some((q) => q !== rate && q.dimension === rate.dimension)) return [];
    const head = text.slice(0, rate.start);
    // A single date of its own ("the 2010s averaged 2.4 ppm/yr") makes it another period's rate.
    const dates = qs.filter((q) => q.dimension === 'age');
    const ownDate = dates.length === 1 && rangeSpan(dates[0] as Quantity) === undefined;
    if (!DRAWN.test(head) || OWN_TIME.test(head) || ownDate) return [];
    const reads = readAll(text, qs, pairs, earlier);
    const found = verdict(rate, rateCandidates(reads, changeDim, [rate]));
    return found === undefined ? [] : [{ stated: rate, computed: facing(found.value, rate.value), measures: `the change divided by the time it took (${found.measures})`, ...(found.distance === 0 ? {} : { basis }) }];
  });
}

/** Words that set what follows against what came before: another time's figure, not a part of this one's sum. */
const SET_AFTER = [...WORDS.setAgainst, 'while', 'whereas', 'but', 'than'];

/**
 * Where the clause that sets another rate of the same kind against `rate` begins ("..., while
 * today's rate is about 2.4 ppm per year", "..., against about 2.4 ppm per year in the 2010s"):
 * the offset of its setting word, or undefined when no rate of its kind follows so.
 */
function comparedAfter(text: string, qs: Quantity[], rate: Quantity): number | undefined {
  const next = qs.find((q) => q.start >= rate.end && q.dimension === rate.dimension);
  if (next === undefined || qs.some((q) => q.end <= rate.start && q.dimension === rate.dimension)) return undefined;
  const words = wordsIn(text, rate.end, next.start);
  const at = words.findIndex((x, i) => SET_AFTER.some((p) => p.split(' ').every((part, k) => words[i + k]?.text === part)));
  return at < 0 ? undefined : (words[at] as { start: number }).start;
}

/** Levels of `dimension` in a sentence in the unit `unit` as written; a bare figure of the same size counts too. */
function levelsIn(s: Read, dimension: Dimension, unit: string, like: number): Quantity[] {
  return s.qs.filter((q) => {
    if (isChange(s.text, q)) return false;
    if (q.dimension === dimension) return q.statedUnit === unit;
    // "the pre-industrial 280": the writer left off the unit of a level of the same size.
    return q.dimension === 'number' && like > 0 && q.value / like < 10 && like / q.value < 10 && !/^[^\p{L}]*$/u.test(s.text.slice(0, q.start));
  });
}

/**
 * A change, or a percentage change, drawn from levels given before: "During warm interglacials it
 * rose to about 280 ppm. That means CO2 went up by roughly 150 ppm each time."; "Before industry the
 * air held about 280 ppm. Today's 420 ppm is therefore roughly 30% higher." With a level of its own
 * ("on top of the pre-industrial 280 we've piled another 184 ppm") the change is from a level before
 * to that level; without, between two levels of the nearest sentences. A result that is not the
 * same size as any of them (within a factor of three) is taken to be about something else. A time
 * named before the sentence's own level is that level's ("By 2020 it held 412 ppm, an increase of
 * about 30 percent"); one elsewhere makes the result another period's.
 */
export function changesFromLevels(text: string, qs: Quantity[], pairs: Pair[], earlier: readonly Previous[]): SolverFinding[] {
  if (pairs.length > 0 || earlier.length === 0) return [];
  return Object.entries(LEVEL_OF).flatMap(([level, changeDim]) => {
    const dimension = level as Dimension;
    const percent = only(qs.filter((q) => q.dimension === 'percent' && (isChange(text, q) || COMPARED_ALONE.test(text.slice(q.end)))));
    const change = only(qs.filter((q) => q.dimension === changeDim && isChange(text, q)));
    const stated = change ?? percent;
    if (stated === undefined || (change !== undefined && percent !== undefined)) return [];
    const isPercent = stated === percent;
    if (PER_TIME_AFTER.test(text.slice(stated.end))) return [];
    // "a rise of about 30 percent in two centuries": the time the change took, right after it, keeps it the change.
    if (qs.some((q) => (q.dimension === 'duration' && !isTimeTaken(text, stated, q)) || RATE_OF[q.dimension] !== undefined || (q.dimension === 'age' && q.start > stated.start))) return [];
    const here: Read = { text, qs: qs.filter((q) => q !== stated), pairs, distance: 0 };
    const just = here.qs.filter((q) => q.end <= stated.start).at(-1);
    // "By 2021 they held 412 ppm, an increase of about 30 percent": a percentage in apposition to a
    // level this sentence dates is its change from the level before. (A change in ppm so placed
    // needs a word that refers back: arithmetic-context.ts.)
    const apposed = isPercent && just !== undefined && (just.dimension === dimension || just.dimension === 'number') && APPOSED_CHANGE.test(text.slice(just.end, stated.start)) && OWN_TIME.test(text.slice(0, just.start));
    if (!DRAWN.test(text.slice(0, stated.start)) && !apposed) return [];
    const reads = readAll(text, qs, pairs, earlier).slice(1);
    const firstLevel = reads.flatMap((r) => r.qs.filter((q) => q.dimension === dimension && !isChange(r.text, q)))[0];
    const unit = isPercent ? (here.qs.find((q) => q.dimension === dimension)?.statedUnit ?? firstLevel?.statedUnit) : stated.statedUnit;
    const like = isPercent ? (here.qs.find((q) => q.dimension === dimension)?.value ?? firstLevel?.value ?? 0) : stated.value;
    if (unit === undefined) return [];
    const own = levelsIn(here, dimension, unit, like).filter((q) => q.start < stated.start);
    if (own.length > 1 || qs.some((q) => q.start > stated.start && (q.dimension === dimension || (q.dimension === 'number' && q !== stated)))) return [];
    // A time of its own, outside the words that give the sentence's own level, is another period's.
    const timeFrom = own.length === 1 ? (own[0] as Quantity).end : 0;
    if (OWN_TIME.test(text.slice(timeFrom)) || (own.length === 0 && qs.some((q) => q.dimension === 'age'))) return [];
    const withLevels = reads.map((r) => ({ r, levels: levelsIn(r, dimension, unit, like).filter((q) => q.dimension === dimension) })).filter((x) => x.levels.length > 0).slice(0, own.length === 1 ? 1 : 2);
    const candidates: Candidate[] = [];
    const add = (a: Quantity, b: Quantity, distance: number, where: string): void => {
      if (a.value === b.value) return;
      if (!isPercent) {
        candidates.push({ value: size(minus(w(b), w(a))), measures: `the difference between ${a.text} and ${b.text}${where}`, distance });
        return;
      }
      // From the earlier level to this sentence's; without one, from the lower level for a rise
      // and from the higher for a drop.
      const down = DOWNWARD.test(text.slice(0, stated.start)) || DOWNWARD.test(text.slice(stated.end, stated.end + 12));
      // A level of its own named as the base ("Against the 1750 level of 278 ppm, that is ...") is where it runs from.
      const ownBase = own.length === 1 && NAMED_BASE.test(text.slice(0, (own[0] as Quantity).start));
      const [x, y] = ownBase ? [b, a] : own.length === 1 || (a.value < b.value) !== down ? [a, b] : [b, a];
      const r = divide(w(y), w(x));
      if (r !== undefined) candidates.push({ value: size(percentOf(r)), measures: `the percentage change from ${x.text} to ${y.text}${where}`, distance });
    };
    if (own.length === 1) {
      for (const { r, levels } of withLevels) for (const l of levels) add(l, own[0] as Quantity, r.distance, ' in an earlier sentence');
    } else {
      const all = withLevels.flatMap(({ r, levels }) => levels.map((l) => ({ l, d: r.distance })));
      all.forEach((x, i) => all.slice(i + 1).forEach((y) => add(y.l, x.l, x.d + y.d, ' in earlier sentences')));
    }
    candidates.sort((a, b) => a.distance - b.distance);
    const found = verdict(stated, candidates, (c) => facing(c, stated.value));
    if (found === undefined) return [];
    const ratio = Math.abs(stated.value) / found.value.value;
    if (!(ratio > 1 / 3 && ratio < 3)) return [];
    return [{ stated, computed: facing(found.value, stated.value), measures: found.measures, basis }];
  });
}

/** The time a stated change took, right after it: "30 percent in two centuries", "140 ppm over about 250 years". */
const isTimeTaken = (text: string, change: Quantity, q: Quantity): boolean => q.start >= change.end && TIME_TAKEN.test(text.slice(change.end, q.start));
const TIME_TAKEN = new RegExp(String.raw`^${S}+(?:in|over|across|within|during)${S}+$`, 'iu');

/** A clause that opens by naming a base before the level: "Against the 1750 level of", "relative to the glacial". */
const NAMED_BASE = new RegExp(String.raw`(?:^|[,;:(—–])${S}*(?:against|relative${S}+to|compared${S}+(?:with|to)|measured${S}+against|set${S}+against)${S}+[^\d,;:.!?]{0,40}(?:\d{4}${S}+[^\d,;:.!?]{0,30})?$`, 'iu');

/** Words of a change downward; any other change is read as a rise. */
const DOWNWARD = /(?:^|[^\p{L}])(?:drop|dropped|fall|fell|fallen|decline|declined|decrease|decreased|loss|lost|reduction|cut|plunge|plunged|sank|lower|below|less|down|cooling|cooled)(?![\p{L}])/iu;
/** A change named in apposition right after the sentence's own level: ", an increase of", " (a rise of". */
const APPOSED_CHANGE = new RegExp(String.raw`^${S}*[,(—–]${S}*(?:(?:a|an)${S}+(?:[\p{L}-]+${S}+)?(?:rise|increase|jump|gain|climb|growth|drop|fall|decline|decrease|loss)${S}+of|up|down)${S}*$`, 'iu');

/** "roughly 30% higher." with nothing it is compared with after it: the comparison is with what came before. */
const COMPARED_ALONE = new RegExp(String.raw`^${S}*(?:higher|lower|more|less|greater|larger|smaller|up|down)${S}*(?:[.;!?]|$)`, 'iu');
/** r as a percentage change (r − 1) × 100. */
const percentOf = (r: Derived): Derived => ({ value: (r.value - 1) * 100, low: (r.low - 1) * 100, high: (r.high - 1) * 100 });

/** The dimensions of a pace. */
const PACE_DIMENSIONS: Dimension[] = ['concentration-rate', 'temperature-rate', 'length-rate'];
/** Two paces within this factor of each other are one pace told twice ("0.013 ppm per year, roughly 1.3 ppm per century"), no pair to set against each other. */
const RESTATED = 1.25;

/** Years in one of the units of time an amount may recur in ("2.4 ppm every single year", "a metre each century"). */
const YEARS_IN: Record<string, number> = { year: 1, yr: 1, annum: 1, decade: 10, century: 100, millennium: 1000 };
/** The unit of time right after an amount that recurs in it: "every single year", "each decade", "per century", "a year". */
const RECURS_IN = new RegExp(String.raw`^${S}+(?:of${S}+[\p{L}\p{N}₂]+${S}+)?(?:a|an|per|each|every)${S}+(?:single${S}+)?(year|yr|annum|decade|century|millennium)(?![\p{L}])`, 'iu');

/**
 * The paces a sentence gives as an amount that recurs in a unit of time ("today we add about 2.4
 * ppm every single year", "it climbs a metre each century"): the amount over the years of that unit,
 * in the rate's canonical unit per year.
 */
function recurringPaces(s: Read, dimension: Dimension): Candidate[] {
  const amountDim = RATE_OF[dimension];
  if (amountDim === undefined) return [];
  return s.qs.flatMap((q) => {
    if (q.dimension !== amountDim && LEVEL_OF[q.dimension] !== amountDim) return [];
    const recurs = RECURS_IN.exec(s.text.slice(q.end, q.end + 40));
    const years = recurs === null ? undefined : YEARS_IN[(recurs[1] ?? '').toLowerCase()];
    if (recurs === null || years === undefined) return [];
    const d = size(w(q));
    return [{ value: { value: d.value / years, low: d.low / years, high: d.high / years }, measures: `${q.text}${recurs[0]}`, distance: s.distance }];
  });
}

/** The rates a sentence gives: stated, told as an amount that recurs, or a change over the time it took. A rate of a time that reaches the present is left out. */
function ratesOf(s: Read, dimension: Dimension): Candidate[] {
  const stated = [...s.qs.filter((q) => q.dimension === dimension).map((q) => ({ value: w(q), measures: q.text, distance: s.distance })), ...recurringPaces(s, dimension)];
  const changeDim = RATE_OF[dimension];
  if (changeDim === undefined || OWN_TIME.test(s.text) || s.qs.some((q) => q.dimension === 'age' && q.high < 0)) return stated;
  // A stated rate whose own sentence gives another ("90 ppm over 7,000 yrs, so about 0.13 ppm per
  // year") may be a slip of its own: either reading is one the writer may have compared with.
  return [...stated, ...rateCandidates([{ ...s, distance: 0 }], changeDim, []).map((c) => ({ ...c, distance: s.distance }))];
}

/**
 * A multiple of a pace: "Today's rate, over two ppm a year, is about twenty times the average pace
 * of that ancient rise." This sentence's one rate over each rate the sentences before give, stated
 * or worked out from a change and the time it took.
 */
export function paceRatiosInParagraph(text: string, qs: Quantity[], earlier: readonly Previous[]): SolverFinding[] {
  const stated = only(qs.filter((q) => isPaceRatio(text, q) || timesTheMeasure(text, q)));
  if (stated === undefined) return [];
  const now = only(qs.filter((q) => RATE_OF[q.dimension] !== undefined));
  const reads = readAll(text, qs, [], earlier).slice(1);
  // "... rising by about 2.5 ppm per year, while in the deglaciation it rose by about 0.01 ppm per
  // year. That is some 25 times faster.": no pace here, both in the nearest sentence that gives one.
  // A pace may be told as an amount that recurs ("we add about 2.4 ppm every single year"), and the
  // two paces may stand in two sentences; two readings of one pace ("0.013 ppm per year, roughly 1.3
  // ppm per century") restate it and give no multiple.
  if (now === undefined && qs.length === 1 && isPaceRatio(text, stated) && DRAWN.test(text.slice(0, stated.start))) {
    const near = reads.find((r) => PACE_DIMENSIONS.some((d) => ratesOf(r, d).length > 0));
    const dimension = PACE_DIMENSIONS.find((d) => near !== undefined && ratesOf(near, d).length > 0);
    if (near === undefined || dimension === undefined) return [];
    // The paces of the nearest sentence that gives one; when that sentence or the one before it tells
    // its pace only as an amount that recurs ("we add about 2.4 ppm every single year"), the paces of
    // the two sentences are set against each other.
    const before = reads.find((r) => r.distance === near.distance + 1);
    const recurs = (r: Read | undefined): boolean => r !== undefined && recurringPaces(r, dimension).length > 0 && ratesOf(r, dimension).length === 1;
    const told = recurs(near) || recurs(before);
    const paces = reads.filter((r) => r.distance >= near.distance && r.distance <= near.distance + (told ? 1 : 0)).flatMap((r) => ratesOf(r, dimension));
    const candidates: Candidate[] = [];
    for (const [i, a] of paces.entries()) {
      for (const b of paces.slice(i + 1)) {
        const [hi, lo] = a.value.value >= b.value.value ? [a, b] : [b, a];
        const r = divide(hi.value, lo.value);
        if (r === undefined || r.value < RESTATED) continue;
        const where = a.distance === b.distance ? 'in the sentence before' : 'in the sentences before';
        candidates.push({ value: stated.value < 1 ? invert(r) : r, measures: `the ratio of ${hi.measures} to ${lo.measures} ${where}`, distance: a.distance + b.distance });
      }
    }
    const found = verdict(stated, candidates.sort((x, y) => x.distance - y.distance));
    return found === undefined ? [] : [{ stated, computed: found.value, measures: found.measures, basis }];
  }
  if (now === undefined || now.start > stated.start) return [];
  const candidates = reads.flatMap((s) => ratesOf(s, now.dimension)).flatMap((then): Candidate[] => {
    const r = divide(w(now), then.value);
    return r === undefined ? [] : [{ value: (stated.value < 1) === (r.value < 1) ? r : invert(r), measures: `the ratio of ${now.text} to ${then.measures} in an earlier sentence`, distance: then.distance }];
  });
  const found = verdict(stated, candidates);
  return found === undefined ? [] : [{ stated, computed: found.value, measures: found.measures, basis }];
}

/** The rates of a sentence, stated or derived, for rules that compare a pace with one before. */
export function rateReadings(text: string, quantities: Quantity[], dimension: Dimension): Derived[] {
  return ratesOf({ text, qs: quantities, pairs: findPairs(text, quantities), distance: 1 }, dimension).map((c) => c.value);
}

/** a × b of two positive intervals. */
function product(a: Derived, b: Derived): Derived | undefined {
  if (a.low < 0 || b.low < 0) return undefined;
  return { value: a.value * b.value, low: a.low * b.low, high: a.high * b.high };
}

/** A word of this sentence, between two offsets, that presents what follows as worked out (word-classes.ts LINKS). */
const linkedBetween = (text: string, from: number, to: number): boolean => holdsPhrase(wordsIn(text, from, to), WORDS.links);
/** "At 2.4 ppm a year, ...": a rate given as the condition the rest of the sentence works from. */
const isConditionRate = (text: string, rate: Quantity): boolean => wordsIn(text, Math.max(0, rate.start - 12), rate.start).at(-1)?.text === 'at';

/**
 * The other two relations among a change, the time it took and its pace (rate × duration =
 * change; change ÷ rate = duration), as worked sums state them:
 *  - an amount drawn from a pace over a time: "Growth ran at 2.4 ppm a year. Over the ten years of
 *    that decade, that adds up to roughly 40 ppm." (24 ppm);
 *  - a time drawn from an amount at a pace: "At 2.4 ppm a year, adding 100 ppm takes about 4
 *    years." (about 42 years); "Today we add 2.4 ppm a year, so we'd match the whole 80-ppm rise in
 *    about 3 years." (33 years).
 * The pace is the one rate of this sentence or (for an amount) of the sentence before; the result
 * comes after its inputs, and a link word ("so", "that adds up to", "comes to") stands between the
 * pace and the result, or the pace is a condition ("At 2.4 ppm a year, ...").
 */
export function amountsAtPace(text: string, qs: Quantity[], earlier: readonly Previous[]): SolverFinding[] {
  const rates = qs.filter((q) => RATE_OF[q.dimension] !== undefined);
  if (rates.length > 1) return [];
  const here = rates[0];
  const out: SolverFinding[] = [];
  // An amount: one stated amount after one span of time, the pace here or in the sentence before.
  const pace = here ?? only((earlier[0]?.quantities ?? []).filter((q) => RATE_OF[q.dimension] !== undefined));
  const changeDim = pace === undefined ? undefined : RATE_OF[pace.dimension];
  if (pace !== undefined && changeDim !== undefined) {
    const spans = qs.filter((q) => q.dimension === 'duration' && !NOT_A_SPAN.test(text.slice(Math.max(0, q.start - 12), q.start)));
    const amounts = qs.filter((q) => q.dimension === changeDim);
    const span = only(spans);
    const amount = only(amounts);
    if (span !== undefined && amount !== undefined && span.end <= amount.start && (here === undefined || here.end <= span.start)) {
      const from = here === undefined ? 0 : here.end;
      const linked = linkedBetween(text, from, amount.start) || (here !== undefined && isConditionRate(text, here));
      // The amount is a change or a total ("adds up to", "in all"), never a level the pace reached.
      const changed = wordsIn(text, span.end, amount.start).some((x) => WORDS.changeVerbs.has(x.text) || WORDS.changeNouns.has(x.text)) || isChange(text, amount);
      const total = product(w(pace), w(span));
      if (linked && changed && total !== undefined && !PER_TIME_AFTER.test(text.slice(amount.end))) {
        out.push({ stated: amount, computed: facing(total, amount.value), measures: `${pace.text} over ${span.text}`, ...(here === undefined ? { basis } : {}) });
      }
    }
  }
  // A time: one amount and one pace of this sentence before one stated span of time.
  const rate = here;
  const amountDim = rate === undefined ? undefined : RATE_OF[rate.dimension];
  if (rate !== undefined && amountDim !== undefined) {
    const amount = only(qs.filter((q) => q.dimension === amountDim));
    const span = only(qs.filter((q) => q.dimension === 'duration'));
    if (amount !== undefined && span !== undefined && amount.end <= span.start && rate.end <= span.start && !NOT_A_SPAN.test(text.slice(Math.max(0, span.start - 12), span.start))) {
      const linked = linkedBetween(text, rate.end, span.start) || isConditionRate(text, rate);
      const time = divide(size(w(amount)), w(rate));
      if (linked && time !== undefined) out.push({ stated: span, computed: time, measures: `${amount.text} at ${rate.text}` });
    }
  }
  return out;
}

/**
 * A multiple of a pace drawn from the two paces just before it in its sentence: "2.4 ppm a year now
 * versus about 0.012 back then, so roughly twenty times faster" (200); "2.4 a yr now vs 0.013 then
 * = about 20x faster" (185). A bare figure beside a pace is a pace in its unit (the writer wrote
 * the unit once); two bare figures are paces in one unit. The multiple must be drawn from them: a
 * link word ("so", "=", "means", "that is") stands between the second pace and it.
 */
export function paceRatiosInSentence(text: string, qs: Quantity[]): SolverFinding[] {
  const stated = only(qs.filter((q) => isPaceRatio(text, q)));
  if (stated === undefined) return [];
  const before = qs.filter((q) => q.end <= stated.start);
  if (before.length !== 2 || qs.some((q) => q !== stated && q.start >= stated.end && (RATE_OF[q.dimension] !== undefined || q.dimension === 'number'))) return [];
  const [a, b] = before as [Quantity, Quantity];
  const rates = before.filter((q) => RATE_OF[q.dimension] !== undefined);
  if (!before.every((q) => RATE_OF[q.dimension] !== undefined || q.dimension === 'number')) return [];
  if (rates.length === 2 && a.dimension !== b.dimension) return [];
  const signed = /[=≈→]/u.test(text.slice(b.end, stated.start)) || stated.hedge === '≈' || stated.hedge === '~';
  // "2.4 ppm a year now against 0.012 a year then is about twenty times faster": two paces set
  // against each other make the multiple that follows them their ratio, with or without a link word.
  const against = holdsPhrase(wordsIn(text, a.end, b.start), WORDS.setAgainst) && !/[;:]/u.test(text.slice(b.end, stated.start));
  if (!signed && !against && !linkedBetween(text, b.end, stated.start)) return [];
  // In one unit: each pace in its canonical unit, a bare figure in the unit of the pace beside it.
  const unit = rates[0];
  const inUnit = (q: Quantity): Derived => {
    const d = w(q);
    if (q.dimension !== 'number' || unit === undefined) return d;
    const c = (x: number): number => toCanonical(x, unit.statedUnit, unit.dimension);
    return { value: c(d.value), low: c(d.low), high: c(d.high) };
  };
  const r = divide(inUnit(a), inUnit(b));
  if (r === undefined) return [];
  const faced = (stated.value < 1) === (r.value < 1) ? r : invert(r);
  return [{ stated, computed: faced, measures: `the ratio of ${a.text} to ${b.text}` }];
}
