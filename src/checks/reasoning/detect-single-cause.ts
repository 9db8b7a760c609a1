/**
 * `logic.single-cause`: one cause asserted where the sources document two acting together (the
 * orbital trigger and the CO2 and ice-sheet feedbacks).
 *
 *   "The deglacial warming was caused entirely by the Milankovitch cycles."
 *                                     ^^^^^^^^ flagged
 *
 * Fires on an exclusive word (`exclusive`: alone, solely, entirely, "the only cause", ", not CO2,")
 * in a clause that also has a causal word (`causal`) and a named cause (`causes`), unless the
 * clause says the single cause falls short (`limits`: "too weak", "cannot", "together", "only part").
 */
import { clauseOf, findPhrases } from '../../claims/frames-match.js';
import { spanOf, type Cue, type DetectInput, type DetectorEntry } from './detector.js';

function detect({ sentence, words }: DetectInput): Cue[] {
  const inClause = (slot: string, clause: number) => findPhrases(sentence, words(slot)).filter((h) => clauseOf(sentence, h.first) === clause);
  for (const exclusive of findPhrases(sentence, words('exclusive'))) {
    const clause = clauseOf(sentence, exclusive.first);
    if (inClause('causal', clause).length === 0 || inClause('causes', clause).length === 0) continue;
    if (inClause('limits', clause).length > 0) continue;
    return [spanOf(exclusive, exclusive)];
  }
  return [];
}

/** The detector entry for the registry. */
export const singleCause: DetectorEntry = { detect, keys: ['exclusive', 'causal', 'causes'] };
