/**
 * `logic.lag-rules-out-cause`: a lag or lead used to rule out a cause.
 *
 *   "CO2 rose about 800 years after Antarctic temperature, so CO2 cannot have caused the warming."
 *                              ^^^^^ order cue           ^^^^^^^^^^^^^^^^^^^^^^^^^^^ flagged
 *
 * Fires when the sentence names CO2, states an order of events (`order`), and after it denies
 * that CO2 causes warming (`rules-out`), unless the denial is itself denied (`not-rules-out`:
 * "does not mean CO2 cannot..."). The flag starts at an inference word (`inference`) between
 * the two when there is one. Denying that CO2 was the *trigger* is correct and is not a cue.
 */
import { findPhrases } from '../../claims/frames-match.js';
import { isBlocked, spanOf, type Cue, type DetectInput, type DetectorEntry } from './detector.js';

function detect({ sentence, words }: DetectInput): Cue[] {
  if (findPhrases(sentence, words('co2')).length === 0) return [];
  const orders = findPhrases(sentence, words('order'));
  const blockers = findPhrases(sentence, words('not-rules-out'));
  const inferences = findPhrases(sentence, words('inference'));
  const cues: Cue[] = [];
  for (const denial of findPhrases(sentence, words('rules-out'))) {
    const order = orders.find((o) => o.last < denial.first);
    if (order === undefined || isBlocked(sentence, denial, blockers, 5)) continue;
    const link = inferences.filter((i) => i.first > order.last && i.last < denial.first && denial.first - i.last <= 8).at(-1);
    cues.push(spanOf(link ?? denial, denial));
  }
  return cues.slice(0, 1);
}

/** The detector entry for the registry. */
export const lagRulesOutCause: DetectorEntry = { detect, keys: ['co2', 'order', 'rules-out'] };
