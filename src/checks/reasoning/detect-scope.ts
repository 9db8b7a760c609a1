/**
 * The scope checks: a regional record read as the whole planet's, and Antarctic lag figures
 * turned into a global order of events.
 *
 *   `scope.regional-record-as-global`
 *   "The Vostok ice core shows that global temperature swung by about 10 °C."
 *        ^^^^^^ record                 ^^^^^^^^^^^^^^^^^^ flagged
 *   Fires when one sentence names a regional record (`record`), a global scope (`global`) and a
 *   temperature word (`temperature`), and no contrast (`contrast`: "than", "not", "unlike",
 *   "while", "combined"...) sets them apart. CO2 from Antarctic ice is a global signal: a
 *   sentence without a temperature word passes.
 *
 *   `scope.antarctic-lag-as-global`
 *   "Globally, temperature rose about 800 years before CO2."
 *                              ^^^^^^^^^^^^^^^^^^^^ flagged
 *   Fires on an order frame with temperature first and CO2 second, in a clause with a global
 *   scope word (or after a sentence-opening "Globally,"), carrying a duration (`durations`) or
 *   naming an Antarctic record (`record`).
 */
import { clauseOf, findPhrases } from '../../claims/frames-match.js';
import { orderFrames } from '../../claims/frames-order.js';
import { spanOf, type Cue, type DetectInput, type DetectorEntry } from './detector.js';

function detectRegional({ sentence, words }: DetectInput): Cue[] {
  const has = (slot: string) => findPhrases(sentence, words(slot));
  const temperature = has('temperature');
  if (has('record').length === 0 || temperature.length === 0 || has('contrast').length > 0) return [];
  const global = has('global')[0];
  if (global === undefined) return [];
  const next = temperature.find((t) => t.first > global.last && t.first - global.last <= 3);
  return [spanOf(global, next ?? global)];
}

function detectLag({ sentence, words }: DetectInput): Cue[] {
  const globals = findPhrases(sentence, words('global'));
  const opening = globals.find((g) => g.first === 0 && sentence.tokens[sentence.words[g.last] as number + 1]?.text === ',');
  const frames = orderFrames(sentence, {
    before: words('before'),
    after: words('after'),
    durations: words('durations'),
    subjects: { co2: words('co2'), temperature: words('temperature') },
  });
  const antarctic = findPhrases(sentence, words('record')).length > 0;
  for (const frame of frames) {
    if (frame.first !== 'temperature' || frame.second !== 'co2') continue;
    const clause = clauseOf(sentence, frame.cue.first);
    const global = opening ?? globals.find((g) => clauseOf(sentence, g.first) === clause);
    if (global === undefined || (frame.amount === undefined && !antarctic)) continue;
    const amount = frame.amount;
    if (amount === undefined) return [spanOf(frame.cue, frame.cue)];
    return [amount.start < frame.cue.start ? spanOf(amount, frame.cue) : spanOf(frame.cue, amount)];
  }
  return [];
}

/** `scope.regional-record-as-global` for the registry. */
export const regionalRecordAsGlobal: DetectorEntry = { detect: detectRegional, keys: ['record', 'global', 'temperature'] };

/** `scope.antarctic-lag-as-global` for the registry. */
export const antarcticLagAsGlobal: DetectorEntry = { detect: detectLag, keys: ['global', 'co2'] };
