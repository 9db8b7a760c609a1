/**
 * `logic.lag-rules-out-cause`: a lag or lead used to rule out a cause.
 *
 *   "CO2 rose about 800 years after Antarctic temperature, so CO2 cannot have caused the warming."
 *                              ^^^^^ order cue           ^^^^^^^^^^^^^^^^^^^^^^^^^^^ flagged
 *   "Because the warming started first, carbon dioxide played no part in ending the ice ages."
 *                                                      ^^^^^^^^^^^^^^ flagged
 *
 * Fires when the sentence names CO2, states an order of events (`order`), and after it denies
 * that CO2 causes warming (`rules-out`), unless the denial is itself denied (`not-rules-out`:
 * "does not mean CO2 cannot..."). A denial may carry the order in its own words ("merely
 * followed"). The flag starts at an inference word (`inference`) between the two when there is one.
 * Denying that CO2 was the *trigger* is correct and passes: a `trigger` word just after the denial
 * ("played no part in starting it"), or an amplifying role granted after it (`role-kept`: "...; it
 * amplified the warming"), shows the sentence denies the start, not every role.
 */
import { findPhrases, type PhraseHit } from '../../claims/frames-match.js';
import { isBlocked, spanOf, type Cue, type DetectInput, type DetectorEntry } from './detector.js';

/** How many words after a denial a trigger word may stand ("no part in ending the start" is too far). */
const TRIGGER_WINDOW = 3;

function detect({ sentence, words }: DetectInput): Cue[] {
  if (findPhrases(sentence, words('co2')).length === 0) return [];
  const orders = findPhrases(sentence, words('order'));
  const blockers = findPhrases(sentence, words('not-rules-out'));
  const inferences = findPhrases(sentence, words('inference'));
  const triggers = findPhrases(sentence, words('trigger'));
  const kept = findPhrases(sentence, words('role-kept'));
  const cues: Cue[] = [];
  for (const denial of findPhrases(sentence, words('rules-out'))) {
    const inside = (o: PhraseHit) => o.first >= denial.first && o.last <= denial.last;
    const order = orders.find((o) => o.last < denial.first || inside(o));
    if (order === undefined || isBlocked(sentence, denial, blockers, 5)) continue;
    if (triggers.some((t) => t.first > denial.last && t.first - denial.last <= TRIGGER_WINDOW)) continue;
    if (kept.some((k) => k.first > denial.last)) continue;
    const link = inferences.filter((i) => i.first > order.last && i.last < denial.first && denial.first - i.last <= 8).at(-1);
    cues.push(spanOf(link ?? denial, denial));
  }
  return cues.slice(0, 1);
}

/** The detector entry for the registry. */
export const lagRulesOutCause: DetectorEntry = { detect, keys: ['co2', 'order', 'rules-out'] };
