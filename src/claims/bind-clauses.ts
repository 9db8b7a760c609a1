/**
 * Coordinated predicates that share one subject. In
 *
 *   "The last ice age began to fade 18,000 years ago and was over by 3,000 years ago."
 *    └─ subject ──────┘└ first predicate ───────────┘    └ second predicate ─────────┘
 *
 * the second number speaks of "the last ice age was over", not of "began": its words are the subject
 * and its own predicate. A quantity in such a clause loses the words of the predicates before it and
 * gains the terms that only the rebuilt clause (subject + its predicate) contains, such as "the last
 * ice age was over". compromise tags the verbs; it runs only on sentences with a quantity after "and"
 * or "but".
 */
import { termsOf } from '../nlp/sentence-terms.js';
import type { Quantity } from '../types.js';
import type { TermHits } from './bind-view.js';

/** One predicate joined by "and"/"but" to the ones before it, sharing their subject. */
export interface SharedSubject {
  subject: [number, number];
  /** The predicates before this one: from the first verb to the coordinator. */
  before: [number, number];
  /** This predicate: from its verb to the end of its clause. */
  clause: [number, number];
}

const COORDINATOR = /^(?:and|but)$/iu;
const GATE = /(?<![\p{L}])(?:and|but)\s/iu;
const VERB_TAGS = ['Verb', 'Copula', 'Auxiliary', 'Modal'];

interface Token {
  text: string;
  start: number;
  end: number;
  tags: readonly string[];
}

/** The coordinated predicates of `sentence` that hold a quantity, each with the subject it shares. */
export function sharedSubjects(sentence: string, quantities: Quantity[]): SharedSubject[] {
  const gate = GATE.exec(sentence);
  if (gate === null || !quantities.some((q) => q.start > gate.index)) return [];
  // "There's a newer one too: the team reached bedrock at 2,800 m and say ...": past a colon or a
  // semicolon before the coordinator, the clause has its own subject.
  const last = (quantities.at(-1) as Quantity).start;
  const cut = Math.max(sentence.lastIndexOf(':', last), sentence.lastIndexOf(';', last)) + 1;
  const join = cut > 0 ? GATE.exec(sentence.slice(cut, last)) : null;
  if (join !== null && /\p{L}/u.test(sentence.slice(cut, cut + join.index))) {
    const shift = (span: [number, number]): [number, number] => [span[0] + cut, span[1] + cut];
    const tail = quantities.filter((q) => q.start >= cut).map((q) => ({ ...q, start: q.start - cut, end: q.end - cut }));
    return sharedSubjects(sentence.slice(cut), tail).map((c) => ({ subject: shift(c.subject), before: shift(c.before), clause: shift(c.clause) }));
  }
  if (!mayJoinPredicates(sentence)) return [];
  const tokens = tokensOf(sentence);
  const found = subjectOf(sentence, tokens);
  if (found === undefined) return [];
  const { first, subjectStart } = found;
  const verb = tokens[first] as Token;
  const joins = tokens
    .map((t, k) => ({ t, k }))
    .filter(({ t, k }) => k > first && COORDINATOR.test(t.text) && isVerb(tokens[k + 1]))
    // "The tilt swings over 41,000 years, and the shape of the orbit stretches and rounds on a cycle
    // of 100,000 years": past a join that opens a clause with its own subject, a later predicate
    // shares that subject, not the sentence's.
    .filter(({ k }) => !tokens.some((o, m) => m > first && m < k && COORDINATOR.test(o.text) && !isVerb(tokens[m + 1]) && /^(?:the|a|an|its|their|this|that|these|those|[A-Z]\p{L}*)$/u.test(tokens[m + 1]?.text ?? '')))
    // "The deglaciation began and ended 18,000 and 11,500 years ago respectively": verbs joined with
    // nothing of their own between them share what follows; that is one predicate, not two.
    .filter(({ k }) => tokens.slice(first, k).some((o) => !isVerb(o) && !o.tags.includes('Adverb') && !COORDINATOR.test(o.text)));
  return joins
    .map(({ t, k }, n): SharedSubject => {
      const start = (tokens[k + 1] as Token).start;
      const next = joins[n + 1];
      const stop = /[;:]/u.exec(sentence.slice(start));
      const end = Math.min(next === undefined ? sentence.length : next.t.start, stop === null ? sentence.length : start + stop.index);
      return { subject: [subjectStart, verb.start], before: [verb.start, t.start], clause: [start, end] };
    })
    .filter((c) => quantities.some((q) => q.start >= c.clause[0] && q.end <= c.clause[1]));
}

/**
 * The view of a quantity in `c`: without the words of the predicates before it, with the terms the
 * rebuilt clause adds across the join of subject and predicate (`find` reads terms of any text).
 */
export function clauseView(sentence: string, view: TermHits, c: SharedSubject, find: (text: string) => TermHits): TermHits {
  const kept: TermHits = new Map();
  for (const [id, spans] of view) {
    const left = spans.filter(([start, end]) => end <= c.before[0] || start >= c.before[1]);
    if (left.length > 0) kept.set(id, left);
  }
  const subject = sentence.slice(...c.subject).trimEnd();
  const rebuilt = `${subject} ${sentence.slice(...c.clause)}`;
  const seam = subject.length;
  for (const [id, spans] of find(rebuilt)) {
    for (const [start, end] of spans) {
      if (start >= seam || end <= seam) continue;
      const span: [number, number] = [c.subject[0] + start, c.clause[0] + (end - seam - 1)];
      kept.set(id, [...(kept.get(id) ?? []), span]);
    }
  }
  return kept;
}

/**
 * The subject of a sentence: from its start (after an opening phrase such as "During the coldest
 * spells,") to its first verb. Undefined when no verb follows a word.
 */
export function subjectSpan(sentence: string): [number, number] | undefined {
  const tokens = tokensOf(sentence);
  const found = subjectOf(sentence, tokens);
  return found === undefined ? undefined : [found.subjectStart, (tokens[found.first] as Token).start];
}

function subjectOf(sentence: string, tokens: Token[]): { first: number; subjectStart: number } | undefined {
  const first = tokens.findIndex((t, k) => k > 0 && isVerb(t));
  if (first < 0) return undefined;
  const verb = tokens[first] as Token;
  const opening = tokens[0]?.tags.includes('Preposition') ? sentence.lastIndexOf(',', verb.start) + 1 : 0;
  const subjectStart = opening + (sentence.slice(opening).length - sentence.slice(opening).trimStart().length);
  return subjectStart >= verb.start ? undefined : { first, subjectStart };
}

function isVerb(t: Token | undefined): boolean {
  return t !== undefined && VERB_TAGS.some((tag) => t.tags.includes(tag));
}

/** Words that compromise never tags as a verb: after "and" or "but" they start no predicate. */
const NEVER_VERB = new Set(['the', 'a', 'an', 'its', 'their', 'this', 'these', 'those', 'his', 'her', 'our', 'my', 'your']);
const JOIN_NEXT = /(?<![\p{L}])(?:and|but)[\s\p{P}]+([\p{L}\p{N}]+)/giu;

/**
 * False when every "and" or "but" is followed by a figure or a determiner ("between 180 and 280
 * ppm", "and the ice"): no coordinated predicate can start there, so compromise need not read the
 * sentence for one. Most sentences with a range stop here.
 */
function mayJoinPredicates(sentence: string): boolean {
  for (const m of sentence.matchAll(JOIN_NEXT)) {
    const next = (m[1] ?? '').toLowerCase();
    if (!/^\p{N}/u.test(next) && !NEVER_VERB.has(next)) return true;
  }
  return false;
}

function tokensOf(sentence: string): Token[] {
  // compromise reads each distinct sentence once (nlp/sentence-terms.ts).
  return termsOf(sentence).map((t) => ({ text: t.text, start: t.start, end: t.start + t.length, tags: t.tags }));
}
