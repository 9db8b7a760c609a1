/**
 * A choice of CO2's part, and an answer that picks one side of it: the either/or framing told with
 * the part nouns of the lexicon rather than with two directed causes.
 *
 *   "Was CO2 a driver of the warming, or merely a passenger?"      choice: cause noun "or" effect noun
 *   "The record points to passenger."                              answer: one side, asserted
 *
 *   "Ask whether the gas was the cause or the effect, and the cores answer: the effect."
 *    choice ──────────────────────────────────────   answer, past a segment of its own ──
 *
 * A side is a part noun of the lexicon (`causes.nouns`: cause, driver...; `causes.effects`: effect,
 * consequence, passenger...) held by the answer undenied. An answer that holds both sides undenied,
 * "both", or a loop (`causes.feedback`) picks none; one that names a side only to deny it ("it was
 * no passenger") picks none either.
 */
import { polarityAt } from '../../propositions/causes.js';
import type { LexHit, ReadSentence } from '../../propositions/index.js';

/** The two sides of a choice of parts. */
export type Side = 'cause' | 'effect';

/** Words that join a clause of its own to the choice before it. */
const COORDINATORS = new Set(['and', 'but', 'so']);

/** How many words may stand between the two part nouns of one choice ("a driver of deglacial warming, or merely a passenger"). */
const CHOICE_SPAN = 9;

/** The part nouns of a sentence with their side, in order. */
function partNouns(s: ReadSentence): { hit: LexHit; side: Side }[] {
  const causes = s.of('causes', 'nouns').map((hit) => ({ hit, side: 'cause' as const }));
  const effects = s.of('causes', 'effects').map((hit) => ({ hit, side: 'effect' as const }));
  return [...causes, ...effects].sort((a, b) => a.hit.first - b.hit.first);
}

/**
 * Where the choice of parts in `s` ends (the index of its last word), or undefined when `s` offers
 * none: a cause noun and an effect noun joined by an "or" between them, within one clause, in a
 * sentence about CO2 (named in it, or in one of the sentences `before` it when `s` refers back with
 * a pronoun).
 */
export function roleChoiceEnd(s: ReadSentence, before: ReadSentence | readonly ReadSentence[] = []): number | undefined {
  return roleChoiceOf(s, before)?.last;
}

/**
 * The choice of parts in `s` (roleChoiceEnd) as the indices of its first and last words, or
 * undefined when `s` offers none.
 */
export function roleChoiceOf(s: ReadSentence, before: ReadSentence | readonly ReadSentence[] = []): { first: number; last: number } | undefined {
  const earlier = Array.isArray(before) ? (before as readonly ReadSentence[]) : [before as ReadSentence];
  const aboutCo2 = s.of('entities', 'co2').length > 0 || (s.words.some((w) => w.text === 'it') && earlier.some((b) => b.of('entities', 'co2').length > 0));
  if (!aboutCo2) return undefined;
  const nouns = partNouns(s);
  for (const a of nouns) {
    const b = nouns.find((n) => n.side !== a.side && n.hit.first > a.hit.last && n.hit.first - a.hit.last <= CHOICE_SPAN);
    if (b === undefined) continue;
    const between = s.words.slice(a.hit.last + 1, b.hit.first);
    const sameClause = s.words[a.hit.first]?.clause === s.words[b.hit.first]?.clause;
    if (sameClause && between.some((w) => w.text === 'or') && !between.some((w) => w.text === 'and' || w.text === 'both')) return { first: a.hit.first, last: b.hit.last };
  }
  return undefined;
}

/** How many words may stand between "either" and the first part noun it opens ("either the main driver"). */
const EITHER_REACH = 3;

/**
 * A choice of parts that "either" sets up as exhaustive, said and not asked: "it's either a cause or
 * a result", "CO2 is either the driver or the passenger, pick one". The writer holds that one part
 * excludes the other, which is the either/or framing whether or not a side is picked. "either" must
 * open the choice in its clause, undenied ("it is not either a cause or an effect" passes), in a
 * sentence that is no question; `before` as for roleChoiceEnd. Returns the words from "either" to the
 * choice's end.
 */
export function eitherChoiceAsserted(s: ReadSentence, before: readonly ReadSentence[] = []): { first: number; last: number } | undefined {
  if (s.question) return undefined;
  const choice = roleChoiceOf(s, before);
  if (choice === undefined) return undefined;
  const clause = s.words[choice.first]?.clause;
  const either = s.words.findIndex((w, i) => w.text === 'either' && i < choice.first && choice.first - i <= EITHER_REACH && s.words[i]?.clause === clause);
  if (either < 0 || polarityAt(s, either) !== 'asserted') return undefined;
  return { first: either, last: choice.last };
}

/**
 * The one side that the words of `s` from word `from` on hold undenied, or undefined when they hold
 * none, both, "both" or a loop.
 */
export function pickedPart(s: ReadSentence, from = 0): Side | undefined {
  const after = (h: LexHit) => h.first >= from;
  if (s.words.slice(from).some((w) => w.text === 'both') || s.of('causes', 'feedback').some(after)) return undefined;
  const held = new Set(partNouns(s).filter((n) => after(n.hit) && polarityAt(s, n.hit.first) === 'asserted').map((n) => n.side));
  return held.size === 1 ? [...held][0] : undefined;
}

/**
 * Both parts offered and one picked in one sentence: the answer stands past the choice, in a
 * segment of its own ("..., and concluded that it was the cause"; "...: it was the effect").
 * `before`: the sentences a pronoun of `s` may refer back to ("it's either the driver or the
 * passenger, and the cores say passenger" after a post about CO2).
 */
export function choicePickedInSentence(s: ReadSentence, before: readonly ReadSentence[] = []): { start: number; end: number } | undefined {
  const end = roleChoiceEnd(s, before);
  if (end === undefined) return undefined;
  const segment = s.words[end]?.segment;
  // "..., or the passenger and the ice cores say passenger": a clause joined by a coordinator after
  // the choice is an answer as a segment of its own is.
  const from = s.words.findIndex((w, i) => i > end && (w.segment !== segment || (COORDINATORS.has(w.text) && i === end + 1)));
  if (from < 0 || pickedPart(s, from) === undefined) return undefined;
  // The flag covers the answer: a reported question before it ("People ask whether ...") is not the draft's.
  return { start: s.words[from]?.start ?? 0, end: s.text.length };
}
