/**
 * A number stated as a ceiling or a floor of what it measures. "CO2 never climbed above 300 ppm",
 * "a natural ceiling of about 300 ppm", "peaks reached no more than 300 ppm" and "it bottomed out
 * near 180 ppm" each give the highest or the lowest level, not a bound on some level: the number
 * binds the extreme value (the pack term `highest` or `lowest`) and is compared as written, with the
 * slack of an approximation, not as the half-open interval of its hedge ("above 250" is not 250-375).
 *
 *   "CO2 never got above 250 ppm in the 800,000 years before factories"
 *        ^^^^^^^^^^^^^^^ ceiling ── 250 ppm: the highest natural level, about 250 (the record: ~300)
 *
 * The words are the pack's lexicon class `bounds` (every inflection derived): `ceiling` and `floor`
 * state a bound by themselves ("peaked at", "as low as"); `ceiling-verb` and `floor-verb` only after
 * a negation ("never exceeded", "did not fall below", "no reading above"), and a word of `degree` may
 * stand inside such a verb's phrase ("never went much past", "did not dip far below"). Between the words and the number only a few
 * filler words may stand ("of about", "was roughly", "at"; not "to": in "from 172 ppm at its
 * lowest to 300 ppm" the bound is the first number's), and none of them may be a word of another
 * term's name ("the Last Glacial Maximum was 190 ppm"). A bound speaks of the number it
 * introduces: its words are that number's alone, a veto in an earlier clause does not reach it, and
 * when some value reads the extreme, the number binds only such values.
 */
import type { LoadedPacks } from '../rulepack/types.js';
import type { TermHits } from './bind-view.js';
import type { Quantity } from '../types.js';
import { applyRule, hedgeRule, intervalRule } from '../quantities/interval-rules.js';
import { writtenInterval } from '../quantities/written-interval.js';
import { type FormsTrie, phrasesTrie } from './forms-trie.js';
import { isChangeVerb } from './bind-role.js';

/** The pack terms a ceiling and a floor stand for. */
export const BOUND_TERMS = { ceiling: 'highest', floor: 'lowest' } as const;

/** Which way a bound goes. */
export type BoundKind = keyof typeof BOUND_TERMS;

/** A quantity read as a bound: which way, and where its words stand. */
export interface BoundReading {
  kind: BoundKind;
  span: [number, number];
  /** A verb of change before the bound's words carries the number to it ("fell as low as"): a level. */
  carried?: true;
}

/** The word right before a bound's words: "dropped" in "dropped as low as". */
const VERB_BEFORE = /(?:^|[^\p{L}])(\p{L}+)\s+$/u;

/** Dimensions of levels, which have extremes; ages, spans and counts are not read as bounds. */
const LEVELS = new Set<Quantity['dimension']>(['concentration', 'temperature', 'temperature-change', 'length', 'concentration-rate', 'temperature-rate', 'length-rate', 'number']);
/** What may stand between the bound words and the number: "of about", "was roughly", "at", "near". */
const FILLER = /^(?:[\s,]*(?:about|around|roughly|some|approximately|approx\.|nearly|near|close\s+to|just|only|barely|of|at|on|was|were|is|are|be|been|being|stood|sat|reached|hit|level|mark|value|a|an|the|its|their|~|∼|≈|c\.|ca\.))*[\s]*$/iu;
/** A negation shortly before a `-verb` word: "never got above", "did not rise above", "no CO2 reading above". */
const NEGATION = /(?:^|[^\p{L}])(?:never|not|no|nothing|none|without|n't|n’t)(?:\s+[\p{L}\p{N}'’-]+){0,2}\s*$/iu;
/**
 * A negation fronted at the head of the clause, with the subject and its auxiliary inverted: "Not
 * once in 800,000 years did CO2 rise above", "At no point was it higher than", "Never before had
 * the air held more than" (common practice of English grammar: negative inversion). It covers the
 * verb of its clause however far it stands.
 */
const FRONTED_NEGATION = /^[\s"'“‘(]*(?:never|not\s+once|not\s+(?:one|a|any)\s+[\p{L}-]+|at\s+no\s+[\p{L}-]+|in\s+no\s+[\p{L}-]+|on\s+no\s+[\p{L}-]+|nowhere|nor|no\s+[\p{L}-]+)(?![\p{L}])[^;:]*?(?:^|[^\p{L}])(?:did|do|does|was|were|is|are|has|have|had|could|would|can|will)(?![\p{L}])/iu;

/**
 * True when `head` (the clause up to the bound's words) opens with a fronted negation whose
 * inverted verb is the bound's own: no "that" and no comma stand between the auxiliary and the
 * bound's words ("Nor do I dispute that today's level, well above 400 ppm, ..." negates "dispute").
 */
function frontedNegation(head: string): boolean {
  const m = FRONTED_NEGATION.exec(head);
  return m !== null && !/,|(?:^|[^\p{L}])that(?![\p{L}])/iu.test(head.slice(m.index + m[0].length));
}

/**
 * Where a clause ends: a bound's words and its number stand in one clause. A relative clause may open
 * on a preposition before "which" (", during which the gas never exceeded 300 ppm").
 */
const CLAUSE_END = /[;:()–—]|,\s*(?:and|but|while|whereas|although|though|where|when|(?:(?:during|in|over|across|throughout|through|for|at|by|from|after|before|since|of|within)\s+)?which)\b/giu;

/** Where each clause of `sentence` begins after the first (a semicolon, a bracket, ", where", ", but"...). */
export function clauseStarts(sentence: string): number[] {
  return [...sentence.matchAll(CLAUSE_END)].map((m) => m.index + m[0].length);
}

interface CompiledBounds {
  plain: { kind: BoundKind; words: FormsTrie }[];
  negated: { kind: BoundKind; words: FormsTrie }[];
}

const compiledBounds = new WeakMap<LoadedPacks, CompiledBounds>();

function boundsOf(packs: LoadedPacks): CompiledBounds {
  let found = compiledBounds.get(packs);
  if (found !== undefined) return found;
  const bounds = packs.lexicon['bounds'] ?? {};
  const entry = (kind: BoundKind, key: string) => {
    // A negated verb and its particle may hold a word of degree: "never got much above".
    const words = phrasesTrie(bounds[key] ?? [], key.endsWith('-verb') ? (bounds['degree'] ?? []) : []);
    return words === undefined || packs.term(BOUND_TERMS[kind]) === undefined ? [] : [{ kind, words }];
  };
  found = {
    plain: [...entry('ceiling', 'ceiling'), ...entry('floor', 'floor')],
    negated: [...entry('ceiling', 'ceiling-verb'), ...entry('floor', 'floor-verb')],
  };
  compiledBounds.set(packs, found);
  return found;
}

/** Where the number of `q` starts: after its hedge when the hedge opens its text ("above 250 ppm"). */
function numberStart(q: Quantity): number {
  const hedge = q.hedge;
  if (hedge !== undefined && q.text.toLowerCase().startsWith(hedge.toLowerCase())) return q.start + hedge.length;
  return q.start;
}

/**
 * Per quantity, the bound it is stated as, or undefined. The words must stand in the quantity's
 * clause, after any quantity before it, with only filler words up to its number.
 */
export function boundReadings(sentence: string, quantities: readonly Quantity[], packs: LoadedPacks, hits: TermHits): (BoundReading | undefined)[] {
  const { plain, negated } = boundsOf(packs);
  if (plain.length === 0 && negated.length === 0) return quantities.map(() => undefined);
  // "the Last Glacial Maximum was about 190 ppm": a word of another term's name is no bound.
  const named = [...hits].filter(([id]) => id !== BOUND_TERMS.ceiling && id !== BOUND_TERMS.floor).flatMap(([, spans]) => spans);
  const inName = (start: number, end: number): boolean => named.some(([s, e]) => s <= start && e >= end && e - s > end - start);
  const ends = clauseStarts(sentence);
  return quantities.map((q, i) => {
    if (!LEVELS.has(q.dimension)) return undefined;
    const number = numberStart(q);
    const previous = i > 0 ? (quantities[i - 1] as Quantity).end : 0;
    const clause = Math.max(0, ...ends.filter((e) => e <= q.start));
    const from = Math.max(previous, clause);
    const window = sentence.slice(from, number);
    let best: BoundReading | undefined;
    const consider = (kind: BoundKind, words: FormsTrie, needsNegation: boolean): void => {
      for (const [at, to] of words.occurrences(window)) {
        const start = from + at;
        const end = from + to;
        if (!FILLER.test(sentence.slice(end, number)) || inName(start, end)) continue;
        if (needsNegation && !NEGATION.test(sentence.slice(from, start)) && !frontedNegation(sentence.slice(clause, start))) continue;
        if (best === undefined || end > best.span[1]) best = { kind, span: [start, end] };
      }
    };
    for (const { kind, words } of plain) consider(kind, words, false);
    for (const { kind, words } of negated) consider(kind, words, true);
    // "it dropped as low as about 100 ppm", "peaks climbed as high as 350 ppm": the verb of change
    // right before the bound's words carries the number to the extreme; it is the bound's, no change.
    const verb = best === undefined ? null : VERB_BEFORE.exec(sentence.slice(from, best.span[0]));
    if (best !== undefined && verb !== null && verb[1] !== undefined && isChangeVerb(verb[1])) best = { ...best, span: [from + verb.index + verb[0].indexOf(verb[1]), best.span[1]], carried: true };
    return best;
  });
}

/** The hedges that bound a number on one side: read as a bound, the number is the extreme itself. */
const ONE_SIDED = new Set(['more-than', 'at-least', 'up-to', 'less-than', 'nearly', 'just-over']);

/**
 * The interval a quantity read as a bound states for the extreme: a one-sided hedge ("above 250",
 * "as high as 350") gives way to the number as written, with an approximation's slack (the interval
 * table's `about` row); any other quantity keeps its interval.
 */
export function boundInterval(q: Quantity): { low: number; high: number } {
  const rule = q.hedge === undefined ? undefined : hedgeRule(q.hedge);
  if (rule === undefined || !ONE_SIDED.has(rule.id)) return { low: q.low, high: q.high };
  const written = writtenInterval(q);
  const [low, high] = applyRule(intervalRule('about'), { v: written.value, h: 0, L: written.low, H: written.high, s: 1 });
  return { low, high };
}
