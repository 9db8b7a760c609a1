/**
 * `logic.lag-rules-out-cause`: an order of events (temperature first, CO2 after) used to deny that
 * CO2 acts on temperature, in the same sentence or in one that draws its conclusion.
 *
 *   "CO2 rose 800 years after Antarctic temperature, so it cannot have caused the warming."
 *    order: temperature → co2                            cause co2 → temperature, denied  ^ flagged
 *   "If CO2 trails temperature, how could it be the cause?"   (a rhetorical question denies it)
 *   "The lag means the cores tell us nothing about climate sensitivity."
 *
 * Denying only the trigger is right (orbital changes started each deglaciation): a denied `start`
 * role passes, and so does a sentence that grants CO2 an amplifying or feedback role.
 */
import type { Cue, DetectInput, DetectorEntry } from './detector.js';
import { isCo2OnWarming, isTemperatureFirst, opensWithInference } from './queries.js';

function detect({ index, read }: DetectInput): Cue[] {
  const here = read(index);
  if (here === undefined) return [];
  const before = index > 0 && opensWithInference(here.s) ? read(index - 1) : undefined;
  const ordered = here.props.orders.some(isTemperatureFirst) || (before?.props.orders.some(isTemperatureFirst) ?? false);
  if (!ordered) return [];
  const kept = here.props.causes.some((c) => c.polarity === 'asserted' && (c.role === 'amplify' || c.role === 'feedback') && (c.agent === 'co2' || c.agent === undefined));
  if (kept) return [];
  // "a consequence cannot also be a cause": an agent left unnamed in a sentence about CO2 is CO2.
  const aboutCo2 = here.s.of('entities', 'co2').length > 0;
  const denial = here.props.causes.find(
    (c) => c.polarity === 'denied' && c.role !== 'start' && c.role !== 'feedback' && (isCo2OnWarming(c) || (aboutCo2 && c.agent === undefined)) && !onlyTheStart(here.s.text, c.end),
  );
  if (denial !== undefined) return [{ start: denial.start, end: denial.end }];
  const follower = here.s.words.some((w) => w.text === 'whether') ? undefined : here.props.orders.find((o) => isTemperatureFirst(o) && o.dismissive);
  return follower === undefined ? [] : [{ start: follower.start, end: follower.end }];
}

/** "played no part in starting it": a denial about the start only. */
function onlyTheStart(text: string, end: number): boolean {
  return /^\W*(?:\w+\W+){0,2}(?:start|starting|trigger|triggering|initiat\w*|kick\w*|set(?:ting)? (?:it )?off|begin\w*|onset)\b/iu.test(text.slice(end));
}

/** The detector entry for the registry. */
export const lagRulesOutCause: DetectorEntry = { detect, keys: [] };
