/**
 * `logic.correlation-as-proof`: two curves moving together presented as proof of which drives which.
 *
 *   "The close match between the CO2 and temperature curves proves that CO2 controls the climate."
 *        ^^^^^^^^^^^ correlation                           ^^^^^^^^^^^^^^^^^^^^^^^^^ flagged
 *
 * Fires on a correlation cue (`correlation`), then a proof word (`proof`) that is not denied
 * (`negation` just before it, or a `not-proof` phrase such as "does not by itself"), then a word
 * of causal direction (`direction`) after the proof word. "The match alone does not prove it"
 * and "the correlation is consistent with a feedback" pass.
 */
import { findPhrases, isNegated } from '../../claims/frames-match.js';
import { isBlocked, spanOf, type Cue, type DetectInput, type DetectorEntry } from './detector.js';

function detect({ sentence, words }: DetectInput): Cue[] {
  const correlation = findPhrases(sentence, words('correlation'))[0];
  if (correlation === undefined) return [];
  const blockers = findPhrases(sentence, words('not-proof'));
  const directions = findPhrases(sentence, words('direction'));
  for (const proof of findPhrases(sentence, words('proof'))) {
    if (isNegated(sentence, proof.first, words('negation')) || isBlocked(sentence, proof, blockers)) continue;
    const direction = directions.find((d) => d.first > proof.last && d.first - proof.last <= 10);
    if (direction !== undefined) return [spanOf(proof, direction)];
  }
  return [];
}

/** The detector entry for the registry. */
export const correlationAsProof: DetectorEntry = { detect, keys: ['correlation', 'proof', 'direction'] };
