/**
 * `logic.single-cause`: one cause asserted where the sources document two acting together (the
 * orbital trigger and the CO2 and ice-sheet feedbacks).
 *
 *   "The deglacial warming was caused entirely by the Milankovitch cycles."
 *                                     ^^^^^^^^ flagged
 *   "The great ice sheets melted for one reason only: rising carbon dioxide."
 *                                ^^^^^^^^^^^^^^^^^^^ flagged (the cause is named after the colon)
 *
 * Fires on an exclusive word (`exclusive`: alone, solely, entirely, "the only cause", "had one
 * cause", ", not CO2,") in a clause that also has a causal word (`causal`) and a named cause
 * (`causes`). When the clause of the exclusive words ends at a colon or dash, the clause after it
 * names the one cause, so the named cause must stand there. Passes when the clause says the single
 * cause falls short (`limits`: "too weak", "cannot", "together", "only part"), when the exclusive
 * words are denied (`negation`: "no single cause"), in a question, and when the sentence is about
 * the modern rise (`modern`: emissions, fossil fuels), which this check does not judge.
 */
import { clauseOf, findPhrases, isNegated, type PhraseHit } from '../../claims/frames-match.js';
import type { SentenceTokens } from '../../claims/frames-tokens.js';
import type { Cue, DetectInput, DetectorEntry } from './detector.js';

const INTRODUCERS = new Set([':', '—', '–']);

/**
 * The clause that a colon or dash closing the exclusive words' clause opens ("had one cause: the
 * orbit", "only one cause ended it: CO2"); undefined when the clause ends otherwise.
 */
function introducedClause(sentence: SentenceTokens, exclusive: PhraseHit): number | undefined {
  const from = (sentence.words[exclusive.last] ?? -2) + 1;
  const clause = clauseOf(sentence, exclusive.first);
  const end = sentence.tokens.slice(from).find((t) => t.clause !== clause || INTRODUCERS.has(t.text));
  return end !== undefined && INTRODUCERS.has(end.text) ? end.clause : undefined;
}

function detect({ sentence, words }: DetectInput): Cue[] {
  if (sentence.text.trimEnd().endsWith('?') || findPhrases(sentence, words('modern')).length > 0) return [];
  const inClauses = (slot: string, clauses: number[]) =>
    findPhrases(sentence, words(slot)).filter((h) => clauses.includes(clauseOf(sentence, h.first)));
  const exclusives = findPhrases(sentence, words('exclusive'));
  for (const exclusive of exclusives) {
    if (isNegated(sentence, exclusive.first, words('negation'), 2)) continue;
    const clause = clauseOf(sentence, exclusive.first);
    const introduced = introducedClause(sentence, exclusive);
    const both = introduced === undefined ? [clause] : [clause, introduced];
    if (inClauses('causal', both).length === 0 || inClauses('causes', introduced === undefined ? both : [introduced]).length === 0) continue;
    if (inClauses('limits', both).length > 0) continue;
    // "for one reason" and "one reason only" overlap: flag the whole stretch they cover.
    const end = Math.max(...exclusives.filter((e) => e.start < exclusive.end && exclusive.start < e.end).map((e) => e.end));
    return [{ start: exclusive.start, end }];
  }
  return [];
}

/** The detector entry for the registry. */
export const singleCause: DetectorEntry = { detect, keys: ['exclusive', 'causal', 'causes'] };
