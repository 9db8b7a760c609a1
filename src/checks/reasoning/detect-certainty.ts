/**
 * `logic.ice-core-certainty` (a note): certainty overclaimed about what ice cores alone show.
 *
 *   "The ice cores prove beyond doubt that CO2 controls Earth's temperature."
 *                  ^^^^^ flagged
 *
 * Fires when a sentence names the ice-core evidence (`records`) and a certainty word (`certainty`:
 * proves, settles, beyond doubt, conclusively) that is not denied (`negation` just before it).
 * "Ice cores alone cannot prove how much warming CO2 causes" passes.
 */
import { findPhrases, isNegated } from '../../claims/frames-match.js';
import { spanOf, type Cue, type DetectInput, type DetectorEntry } from './detector.js';

function detect({ sentence, words }: DetectInput): Cue[] {
  if (findPhrases(sentence, words('records')).length === 0) return [];
  const certainty = findPhrases(sentence, words('certainty')).find((c) => !isNegated(sentence, c.first, words('negation'), 4));
  return certainty === undefined ? [] : [spanOf(certainty, certainty)];
}

/** The detector entry for the registry. */
export const iceCoreCertainty: DetectorEntry = { detect, keys: ['records', 'certainty'] };
