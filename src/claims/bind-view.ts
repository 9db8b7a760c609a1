/**
 * Which term words each quantity of a sentence may use. Words that open a sentence, before its
 * first quantity, are its subject and speak for every quantity; a word standing after a quantity
 * belongs to the quantity it stands nearest (a clause boundary counting as far), so the words of one
 * quantity do not bind, or veto, its neighbour.
 *
 *   "CO2 swung between about 180 ppm in the glacial periods and about 280 ppm in the interglacials"
 *    ^^^ both ──────────────┘ 180 ppm ^^^^^^^ ─┘               └ 280 ppm ^^^^^^^^^^^^^ ─┘
 *
 * Quantities that cannot carry a claim of their own (bare numbers, calendar years such as "in 2024",
 * a time phrase that opens the sentence, "Over the last 800,000 years CO2 ...") own no words, and a
 * term word that is part of a quantity ("1750") speaks for every quantity. A restatement in brackets
 * ("6 °C (11 °F)") owns its words together with the quantity it restates, and the numbers of a
 * parallel list ("100,000, 41,000 and 23,000 years") own theirs together.
 */
import type { Quantity } from '../types.js';
import type { EndpointPair } from './bind-role.js';

/** Where each term of the packs appears in a sentence: term id → [start, end) spans. */
export type TermHits = Map<string, [number, number][]>;

/** Characters added to a distance for each clause boundary between a term and the quantity. */
export const CLAUSE_PENALTY = 1000;
/** A comma between digits ("800,000") groups a number's digits and ends no clause. */
const CLAUSE_BREAK = /[;:()–—]|,(?!\d)|\b(?:and|but|while|whereas|although|though|versus|vs\.?|compared with)\b/giu;
const RESTATEMENT = /^\s*(?:[([]|,?\s*(?:or|that is|i\.e\.),?)\s*$/iu;
/** What may stand before a time phrase that opens a sentence: "Over the last", "For", "During the past". */
const OPENING_TIME = /^\s*(?:(?:over|for|during|in|across|through|throughout|since|until|within)\s+)?(?:the\s+)?(?:(?:last|past|first|next)\s+)?$/iu;

/** The offsets of the clause boundaries of a sentence. */
export function clauseBreaks(sentence: string): number[] {
  return [...sentence.matchAll(CLAUSE_BREAK)].map((m) => m.index);
}

/** Distance in characters from a term span to a quantity, plus the penalty of each boundary crossed. */
export function distance(start: number, end: number, q: Pick<Quantity, 'start' | 'end'>, breaks: number[]): number {
  const [from, to] = end <= q.start ? [end, q.start] : start >= q.end ? [q.end, start] : [0, 0];
  const crossed = breaks.filter((b) => b >= from && b < to).length;
  return to - from + crossed * CLAUSE_PENALTY;
}

/** The term hits each quantity may use, one map per quantity. */
export function termViews(sentence: string, quantities: Quantity[], hits: TermHits, pairs: EndpointPair[], lists: number[][]): TermHits[] {
  const owners = ownerGroups(sentence, quantities, lists);
  const breaks = clauseBreaks(sentence);
  const firstOwned = Math.min(...owners.flat().map((i) => (quantities[i] as Quantity).start));
  const owned = new Set(owners.flat());
  const views: TermHits[] = quantities.map(() => new Map());
  const add = (i: number, id: string, span: [number, number]): void => {
    const view = views[i] as TermHits;
    view.set(id, [...(view.get(id) ?? []), span]);
  };
  for (const [id, spans] of hits) {
    for (const span of spans) {
      const [start, end] = span;
      // A term inside a quantity's own words is every quantity's, except a calendar year ("1750"),
      // which dates the figure beside it: in "from 280 ppm in 1750 to 420 ppm" it is 280's.
      const shared = end <= firstOwned || quantities.some((q) => q.statedUnit !== 'CE' && start < q.end && q.start < end);
      const claimants = shared ? [] : claimantsOf(sentence, start, end, owners, quantities, breaks, pairs);
      quantities.forEach((_, i) => {
        if (shared || !owned.has(i) || claimants.includes(i)) add(i, id, span);
      });
    }
  }
  return views;
}

/**
 * Quantities that may own words, grouped so that a bracketed restatement shares its quantity's
 * words and a parallel list owns its words as one (its bare numbers included, as places to measure from).
 */
function ownerGroups(sentence: string, quantities: Quantity[], lists: number[][]): number[][] {
  const owns = (i: number): boolean => {
    const q = quantities[i] as Quantity;
    if (q.dimension === 'number' || q.statedUnit === 'CE') return false;
    return !opensAsTimeFrame(sentence, quantities, i) && !spanOfScope(sentence, q);
  };
  const groups: number[][] = [];
  quantities.forEach((q, i) => {
    const list = lists.find((l) => l.includes(i));
    if (list !== undefined) {
      if (list[0] === i && list.some(owns)) groups.push([...list]);
      return;
    }
    if (!owns(i)) return;
    const last = groups.at(-1);
    const previous = last === undefined ? undefined : quantities[last.at(-1) as number];
    if (last !== undefined && previous !== undefined && RESTATEMENT.test(sentence.slice(previous.end, q.start))) last.push(i);
    else groups.push([i]);
  });
  return groups;
}

/** A preposition and determiners before an attributive span: "anywhere in the", "across the whole", "from its". */
const SCOPE_BEFORE = /(?:^|[^\p{L}])(?:in|across|through|throughout|over|within|during|along)\s+(?:(?:the|this|that|these|those|its|their|our|a|an|whole|entire|full|complete|long|full-length)\s+)*$/iu;

/**
 * Whether `q` is a span told as an adjective inside a prepositional phrase, "anywhere in the
 * 800,000-year ice record", "across the whole 420,000-year archive" (not "40,000 years of the 800,000-year record", a part of a whole): it sets the scope of what the
 * sentence says, as an opening time frame does, and claims none of the sentence's words.
 */
export function spanOfScope(sentence: string, q: Quantity): boolean {
  if (q.dimension !== 'duration' || !/-\s*(?:years?|yrs?|millennia|millennium|centur(?:y|ies)|kyr|ka)$/iu.test(q.text)) return false;
  return SCOPE_BEFORE.test(sentence.slice(Math.max(0, q.start - 40), q.start).replace(/(?:about|roughly|some|around|~)\s*$/iu, ''));
}

/** Whether quantity `i` is a time phrase that opens the sentence: "Over the last 800,000 years, ...". */
export function opensAsTimeFrame(sentence: string, quantities: Quantity[], i: number): boolean {
  const q = quantities[i];
  return i === 0 && q !== undefined && (q.dimension === 'duration' || q.dimension === 'age') && OPENING_TIME.test(sentence.slice(0, q.start));
}

/**
 * A verb of being or staying that makes the words before it the subject of the figure after it, with
 * at most three words of description between ("pre-industrial **is the usual** 280 ppm", "the
 * interglacial level **sat at about** 280 ppm"; common practice of English grammar: a subject and its
 * predicate). No digit, mark of a clause or second verb may stand between.
 */
const PREDICATE_TO_FIGURE = /^[\s\p{L}'’-]{0,24}?(?:^|\s)(?:is|was|are|were|sat|sits|stood|stands|stayed|stays|remained|remains|hovered|hovers|came\s+in\s+at|comes\s+in\s+at)(?:\s+[\p{L}'’~-]+){0,3}\s*$/iu;

/** What opens a clause between a figure and the words after it: a line break, a clause mark, a conjunction. */
const CLAUSE_OPENS = /^[^\p{L}\p{N}]*(?:\n|[,;:–—]|(?:^|\s)(?:and|but|while|whereas)\s)[^\p{N}]*$/iu;

/** The owner quantities nearest a term span that stands after the first owner (all of them on a tie). */
function claimantsOf(sentence: string, start: number, end: number, owners: number[][], quantities: Quantity[], breaks: number[], pairs: EndpointPair[]): number[] {
  // Between the endpoints of "from X to Y", words before "to" speak of X and words after it of Y.
  const pair = pairs.find((p) => (quantities[p.first] as Quantity).end <= start && end <= (quantities[p.second] as Quantity).start);
  if (pair !== undefined) return groupOf(owners, end <= pair.join ? pair.first : pair.second);
  // "... 190 ppm, give or take 10 / pre-industrial is the usual 280 ppm": the subject that opens the
  // next figure's clause (after a line break or a clause mark) is that figure's, however near the
  // figure before it stands; "the max in 800,000 years before industry was 300 ppm" opens none.
  const next = owners.find((g) => (quantities[g[0] as number] as Quantity).start >= end);
  const nextStart = next === undefined ? undefined : (quantities[next[0] as number] as Quantity).start;
  const previousEnd = Math.max(-1, ...quantities.filter((q) => q.end <= start).map((q) => q.end));
  if (next !== undefined && nextStart !== undefined && previousEnd >= 0 && CLAUSE_OPENS.test(sentence.slice(previousEnd, start)) && PREDICATE_TO_FIGURE.test(sentence.slice(end, nextStart))) return [...next];
  let best = Infinity;
  let chosen: number[] = [];
  for (const group of owners) {
    const d = Math.min(...group.map((i) => distance(start, end, quantities[i] as Quantity, breaks)));
    if (d < best) [best, chosen] = [d, [...group]];
    else if (d === best) chosen.push(...group);
  }
  return chosen;
}

function groupOf(owners: number[][], index: number): number[] {
  return owners.find((g) => g.includes(index)) ?? [index];
}
