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
 * (`causes`). When the exclusive words end right before a colon or dash, the clause after it
 * names the one cause, so the named cause must stand there. Passes when the clause says the single
 * cause falls short (`limits`: "too weak", "cannot", "together", "only part"), when the exclusive
 * words are denied (`negation`: "no single cause"), in a question, and when the sentence is about
 * the modern rise (`modern`: emissions, fossil fuels), which this check does not judge.
 */
import { clauseOf, findPhrases, isNegated, type PhraseHit } from '../../claims/frames-match.js';
import type { SentenceTokens } from '../../claims/frames-tokens.js';
import { spanOf, type Cue, type DetectInput, type DetectorEntry } from './detector.js';

const INTRODUCERS = new Set([':', '—', '–']);

/** The clause a cue named by `exclusive` stands in, and the clause it introduces after a colon. */
function introducedClause(sentence: SentenceTokens, exclusive: PhraseHit): number | undefined {
  const after = sentence.tokens[(sentence.words[exclusive.last] ?? -2) + 1];
  return after !== undefined && INTRODUCERS.has(after.text) ? after.clause : undefined;
}

function detect({ sentence, words }: DetectInput): Cue[] {
  if (sentence.text.trimEnd().endsWith('?') || findPhrases(sentence, words('modern')).length > 0) return [];
  const inClauses = (slot: string, clauses: number[]) =>
    findPhrases(sentence, words(slot)).filter((h) => clauses.includes(clauseOf(sentence, h.first)));
  for (const exclusive of findPhrases(sentence, words('exclusive'))) {
    if (isNegated(sentence, exclusive.first, words('negation'), 2)) continue;
    const clause = clauseOf(sentence, exclusive.first);
    const introduced = introducedClause(sentence, exclusive);
    const both = introduced === undefined ? [clause] : [clause, introduced];
    if (inClauses('causal', both).length === 0 || inClauses('causes', introduced === undefined ? both : [introduced]).length === 0) continue;
    if (inClauses('limits', both).length > 0) continue;
    return [spanOf(exclusive, exclusive)];
  }
  return [];
}

/** The detector entry for the registry. */
export const singleCause: DetectorEntry = { detect, keys: ['exclusive', 'causal', 'causes'] };
