/**
 * The scope checks: a regional record read as the whole planet's, and Antarctic lag figures
 * turned into a global order of events.
 *
 *   `scope.regional-record-as-global`
 *   "The Vostok ice core shows that global temperature swung by about 10 °C."
 *        ^^^^^^ record                 ^^^^^^^^^^^^^^^^^^ flagged
 *   Fires when one sentence names a regional record (`record`) and, in the same clause, a global
 *   scope (`global`), with a temperature word (`temperature`), and no contrast (`contrast`: "than", "not", "unlike",
 *   "while", "combined"...) sets them apart; a "than" inside a comparison of two times
 *   (`time-comparison`: "colder than today") is no contrast. CO2 from Antarctic ice is a global signal: a
 *   sentence without a temperature word passes, and so does a global word that CO2 acts on
 *   ("the CO2 then warmed the planet").
 *
 *   `scope.antarctic-lag-as-global`
 *   "Globally, temperature rose about 800 years before CO2."
 *                              ^^^^^^^^^^^^^^^^^^^^ flagged
 *   Fires on an order frame with temperature first and CO2 second, in a clause with a global
 *   scope word (or after a sentence-opening "Globally," / "Around the globe,"), carrying a duration
 *   (`durations`) or naming an Antarctic record (`record`). An order whose temperature is itself
 *   given a region ("Antarctic temperature rose centuries before CO2, which then warmed the
 *   planet") is a regional order, and passes.
 */
import { clauseOf, findPhrases, type Phrase, type PhraseHit } from '../../claims/frames-match.js';
import { nearestMention, orderFrames, subjectMentions, type OrderFrame } from '../../claims/frames-order.js';
import type { SentenceTokens } from '../../claims/frames-tokens.js';
import { spanOf, type Cue, type DetectInput, type DetectorEntry } from './detector.js';

// "...and the CO2 then warmed the planet": CO2 acting on the globe, not a record read as global.
function isCo2Acting(sentence: SentenceTokens, global: PhraseHit, temperature: PhraseHit[], co2: PhraseHit[]): boolean {
  const clause = clauseOf(sentence, global.first);
  const agent = co2.filter((c) => c.last < global.first && clauseOf(sentence, c.first) === clause).at(-1);
  return agent !== undefined && temperature.some((t) => t.first > agent.last && t.last < global.first);
}

function detectRegional({ sentence, words }: DetectInput): Cue[] {
  const has = (slot: string) => findPhrases(sentence, words(slot));
  const temperature = has('temperature');
  // "colder than today" compares two times, not the record with the globe: no contrast.
  const times = has('time-comparison');
  const contrast = has('contrast').filter((c) => !times.some((t) => t.first <= c.first && t.last >= c.last));
  if (has('record').length === 0 || temperature.length === 0 || contrast.length > 0) return [];
  // A record in one clause and the globe in the next ("In Antarctica, ...: for the globe as a
  // whole, ...") set the two side by side; only a record and the globe in one clause equate them.
  const recordClauses = new Set(has('record').map((r) => clauseOf(sentence, r.first)));
  const global = has('global').find((g) => recordClauses.has(clauseOf(sentence, g.first)) && !isCo2Acting(sentence, g, temperature, has('co2')));
  if (global === undefined) return [];
  const next = temperature.find((t) => t.first > global.last && t.first - global.last <= 3);
  return [spanOf(global, next ?? global)];
}

/** How many words before a temperature word a region may stand and still name its region. */
const REGION_WINDOW = 2;

// "Antarctic temperature rose before CO2": the temperature that came first is named with a region.
function isRegionalOrder(sentence: SentenceTokens, frame: OrderFrame, subjects: Record<string, Phrase[]>, regional: PhraseHit[]): boolean {
  const mentions = subjectMentions(sentence, subjects);
  const first = nearestMention(sentence, mentions, frame.cue, frame.relation === 'before' ? -1 : 1);
  if (first?.kind !== 'temperature') return false;
  const clause = clauseOf(sentence, first.hit.first);
  const before = (r: PhraseHit) => r.last < first.hit.first && first.hit.first - r.last <= REGION_WINDOW;
  // "the warming in Antarctica": the region stands just after the temperature, after "in".
  const after = (r: PhraseHit) => r.first === first.hit.last + 2 && sentence.tokens[sentence.words[first.hit.last + 1] ?? -1]?.text.toLowerCase() === 'in';
  return regional.some((r) => (before(r) || after(r)) && clauseOf(sentence, r.first) === clause);
}

function detectLag({ sentence, words }: DetectInput): Cue[] {
  const globals = findPhrases(sentence, words('global'));
  const opening = globals.find((g) => g.first === 0 && sentence.tokens[sentence.words[g.last] as number + 1]?.text === ',');
  const subjects = { co2: words('co2'), temperature: words('temperature') };
  const regional = findPhrases(sentence, words('regional'));
  const frames = orderFrames(sentence, {
    before: words('before'),
    after: words('after'),
    durations: words('durations'),
    subjects,
  });
  const antarctic = findPhrases(sentence, words('record')).length > 0;
  for (const frame of frames) {
    if (frame.first !== 'temperature' || frame.second !== 'co2') continue;
    const clause = clauseOf(sentence, frame.cue.first);
    const global = opening ?? globals.find((g) => clauseOf(sentence, g.first) === clause);
    if (global === undefined || (frame.amount === undefined && !antarctic)) continue;
    if (isRegionalOrder(sentence, frame, subjects, regional)) continue;
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
