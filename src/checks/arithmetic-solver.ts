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
import { writtenInterval as w } from '../quantities/index.js';
import type { Dimension, Quantity } from '../types.js';
import type { Previous } from './arithmetic-context.js';
import { disjoint } from './arithmetic-levels.js';
import { divide, facing, invert, minus, rangeSpan, size, type Derived } from './arithmetic-derive.js';
import { changesOver, findPairs, isPaceRatio, isStatedChange, timesTheMeasure, type Pair } from './arithmetic-frames.js';
import { spanOfDates } from './arithmetic-spans.js';

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
 * "which means"), an equation ("that's", "works out to", "comes to", "equals"), a mean ("on
 * average", "an average of", "averaged over") or the sum itself ("do the division", "by my
 * arithmetic"). Matched anywhere before the figure in its sentence.
 */
const DRAWN = new RegExp(
  String.raw`(?:^|[^\p{L}])(?:so|thus|hence|therefore|that${S}+means|which${S}+means|meaning|that's|that’s|that${S}+is|which${S}+is|i\.e\.|works?${S}+out|worked${S}+out|comes?${S}+to|came${S}+to|equals|averag(?:e|es|ed|ing)|on${S}+average|divid(?:e|ed|ing)|division|arithmetic|math|maths|sum|in${S}+all|all${S}+told)(?![\p{L}])`,
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
  String.raw`(?:(?:^|[^\p{L}])(?:rise|increase|drop|fall|decline|change|jump|gain|loss|swing|difference|warming|cooling|growth|decrease|reduction|climb|surge|plunge)${S}+(?:was|is|were|came${S}+to|comes${S}+to|amounted${S}+to|amounts${S}+to|totalled|totaled)|(?:^|[^\p{L}])(?:another|a${S}+further|an${S}+extra|an${S}+additional))${S}*$`,
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
  const stated = s.qs.filter((q) => !except.includes(q) && q.dimension === 'duration' && !NOT_A_SPAN.test(s.text.slice(Math.max(0, q.start - 12), q.start)) && !/^[\s\u00A0]*(?:ago|old|back|before)(?![\p{L}])/iu.test(s.text.slice(q.end)));
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
      for (const b of reads) {
        // From one sentence, from this one and one before, or from two sentences next to each other.
        if (a !== b && a.distance !== 0 && b.distance !== 0 && Math.abs(a.distance - b.distance) > 1) continue;
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
    if (changeDim === undefined || qs.some((q) => q !== rate && q.dimension === rate.dimension)) return [];
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
 * A change drawn from levels given before: "During warm interglacials it rose to about 280 ppm.
 * That means CO2 went up by roughly 150 ppm each time." With a level of its own ("on top of the
 * pre-industrial 280 we've piled another 184 ppm") the change is from that level to a level before;
 * without, between two levels of the nearest sentences. A change that is not the same size as
 * any of them (within a factor of three) is taken to be about something else.
 */
export function changesFromLevels(text: string, qs: Quantity[], pairs: Pair[], earlier: readonly Previous[]): SolverFinding[] {
  if (pairs.length > 0 || earlier.length === 0) return [];
  return Object.entries(LEVEL_OF).flatMap(([level, changeDim]) => {
    const dimension = level as Dimension;
    const stated = only(qs.filter((q) => q.dimension === changeDim && isChange(text, q)));
    if (stated === undefined || !DRAWN.test(text.slice(0, stated.start)) || OWN_TIME.test(text) || PER_TIME_AFTER.test(text.slice(stated.end))) return [];
    if (qs.some((q) => q.dimension === 'age' || q.dimension === 'duration' || RATE_OF[q.dimension] !== undefined)) return [];
    const here: Read = { text, qs: qs.filter((q) => q !== stated), pairs, distance: 0 };
    const own = levelsIn(here, dimension, stated.statedUnit, stated.value).filter((q) => q.start < stated.start);
    if (own.length > 1) return [];
    const reads = readAll(text, qs, pairs, earlier).slice(1);
    const withLevels = reads.map((s) => ({ s, levels: levelsIn(s, dimension, stated.statedUnit, stated.value).filter((q) => q.dimension === dimension) })).filter((x) => x.levels.length > 0).slice(0, own.length === 1 ? 1 : 2);
    // A sentence that names a time of its own for its levels ("in 2024") is as good as any: the change is between levels.
    const candidates: Candidate[] = [];
    const add = (a: Quantity, b: Quantity, distance: number, where: string): void => {
      if (a.value === b.value) return;
      candidates.push({ value: size(minus(w(b), w(a))), measures: `the difference between ${a.text} and ${b.text}${where}`, distance });
    };
    if (own.length === 1) {
      for (const { s, levels } of withLevels) for (const l of levels) add(l, own[0] as Quantity, s.distance, ' in an earlier sentence');
    } else {
      const all = withLevels.flatMap(({ s, levels }) => levels.map((l) => ({ l, d: s.distance })));
      all.forEach((x, i) => all.slice(i + 1).forEach((y) => add(y.l, x.l, x.d + y.d, ' in earlier sentences')));
    }
    candidates.sort((a, b) => a.distance - b.distance);
    const found = verdict(stated, candidates, (c) => facing(c, stated.value));
    if (found === undefined) return [];
    const r = Math.abs(stated.value) / found.value.value;
    if (!(r > 1 / 3 && r < 3)) return [];
    return [{ stated, computed: facing(found.value, stated.value), measures: found.measures, basis }];
  });
}

/** The rates a sentence gives: stated, or a change over the time it took. A rate of a time that reaches the present is left out. */
function ratesOf(s: Read, dimension: Dimension): Candidate[] {
  const stated = s.qs.filter((q) => q.dimension === dimension).map((q) => ({ value: w(q), measures: q.text, distance: s.distance }));
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
  if (now === undefined || now.start > stated.start) return [];
  const reads = readAll(text, qs, [], earlier).slice(1);
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
