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
import type { Cause, ReadSentence } from '../../propositions/index.js';
import type { Cue, DetectInput, DetectorEntry } from './detector.js';
import { isBareFragment } from './reading.js';
import { isCo2OnWarming, isTemperatureFirst, opensWithInference } from './queries.js';

function detect({ index, read }: DetectInput): Cue[] {
  const here = read(index);
  if (here === undefined) return [];
  // "CO2 goes up after temperature. Always has. So it can't be the driver.": the premise may stand
  // past a fragment that names nothing.
  const previous = read(index - 1);
  const premise = previous !== undefined && index > 1 && isBareFragment(previous.s) ? read(index - 2) : previous;
  const before = index > 0 && opensWithInference(here.s) ? premise : undefined;
  const ordered = here.props.orders.some(isTemperatureFirst) || (before?.props.orders.some(isTemperatureFirst) ?? false);
  // "Something that turns up after the fire has started cannot be what lit it.": the lag put as a
  // maxim about latecomers, after a sentence that puts temperature first.
  const kept = here.props.causes.some((c) => c.polarity === 'asserted' && (c.role === 'amplify' || c.role === 'feedback') && (c.agent === 'co2' || c.agent === undefined));
  if (kept) return [];
  const maxim = latecomerDenied(here.s);
  // "A gas that turns up late can't be the one who lit it": the latecomer named is CO2 itself.
  const context = maxim !== undefined && (maxim.co2 || [here, read(index - 1), read(index - 2)].some((r) => r?.props.orders.some(isTemperatureFirst) ?? false));
  const latecomer = maxim !== undefined && context ? [{ start: maxim.start, end: maxim.end }] : [];
  // "If the effect comes after, it cannot be the cause.", "If it came after the warming it can't be
  // driving it": the lag put as a condition, its latecomer unnamed, after a sentence that puts
  // temperature first; or named CO2 itself ("if CO2 really lagged then it can't have done the warming").
  const conditional = conditionalLatecomer(here.s, here.props.causes);
  const premised = conditional !== undefined && (conditional.co2 || [here, read(index - 1), read(index - 2)].some((r) => r?.props.orders.some(isTemperatureFirst) ?? false));
  if (conditional !== undefined && premised && latecomer.length === 0) latecomer.push({ start: conditional.start, end: conditional.end });
  if (!ordered) return latecomer;
  // "a consequence cannot also be a cause": an agent left unnamed in a sentence about CO2 is CO2.
  const aboutCo2 = here.s.of('entities', 'co2').length > 0;
  const denial = here.props.causes.find(
    (c) => c.polarity === 'denied' && c.role !== 'start' && c.role !== 'feedback' && (isCo2OnWarming(c) || (aboutCo2 && c.agent === undefined)) && !onlyTheStart(here.s.text, c.end),
  );
  if (denial !== undefined) return [{ start: denial.start, end: denial.end }];
  const follower = here.s.words.some((w) => w.text === 'whether') ? undefined : here.props.orders.find((o) => isTemperatureFirst(o) && o.dismissive);
  return follower === undefined ? latecomer : [{ start: follower.start, end: follower.end }];
}

const RELATIVE = new Set(['that', 'which', 'who']);
const DENYING_MODAL = new Set(['cannot', "can't", 'couldn’t', "couldn't", 'can’t']);

/**
 * A generic latecomer denied any part: a subject whose relative clause says it came late ("a gas
 * that turns up late", "something that arrives after the fact"), then "cannot be"/"can't have".
 * Returns the denial's span, and whether the latecomer is CO2 itself ("a gas that turns up late").
 */
function latecomerDenied(s: ReadSentence): (Cue & { co2: boolean }) | undefined {
  const words = s.words.map((w) => w.text);
  const denying = (i: number) => DENYING_MODAL.has(words[i] ?? '') || (['can', 'could'].includes(words[i] ?? '') && words[i + 1] === 'not');
  // "An effect can't come before its cause, so a gas that turns up late can't have done it": each
  // denying modal is tried, the maxim may follow another denial.
  for (const [modal] of words.entries()) {
    if (!denying(modal)) continue;
    const found = latecomerAt(s, words, modal);
    if (found !== undefined) return found;
  }
  return undefined;
}

/** The latecomer maxim whose denying modal is word `modal`. */
function latecomerAt(s: ReadSentence, words: readonly string[], modal: number): (Cue & { co2: boolean }) | undefined {
  // The relative clause opens at most 12 words before the modal, in its segment or just before it.
  const rel = words.findLastIndex((w, i) => i < modal - 1 && modal - i <= 12 && i >= 1 && RELATIVE.has(w));
  if (rel < 0) return undefined;
  const late = s.of('order', 'after').some((h) => h.first > rel && h.first < modal) || words.slice(rel, modal).includes('late');
  const verb = words.slice(modal + 1, modal + 4).find((w) => ['be', 'have', 'been'].includes(w));
  if (!late || verb === undefined) return undefined;
  const co2 = s.things.some((t) => t.kind === 'co2' && t.last === rel - 1);
  return { start: s.words[modal]?.start ?? 0, end: s.words.at(-1)?.end ?? 0, co2 };
}

/** Words that may open the latecomer of a condition: a pronoun, or a part's name ("the effect", "the follower"). */
const STAND_INS = new Set(['it', 'they', 'something', 'anything', 'whatever', 'one', 'the', 'a', 'an']);

/**
 * A condition (lexicon `stance.condition`: "if", "given that") holding an order word that puts its
 * subject later (lexicon `order.after`: "comes after", "lagged", "shows up late"), then a cause
 * denied, not only the start, whose subject is a stand-in (a pronoun, "the effect") or CO2.
 * Returns the denial's span, and whether the condition names CO2 as the latecomer.
 */
function conditionalLatecomer(s: ReadSentence, causes: readonly Cause[]): (Cue & { co2: boolean }) | undefined {
  const condition = s.of('stance', 'condition')[0];
  if (condition === undefined) return undefined;
  const late = s.of('order', 'after').find((h) => h.first > condition.last && h.first - condition.last <= 8);
  if (late === undefined) return undefined;
  const lateEnd = s.words[late.last]?.end ?? 0;
  const denial = causes.find((c) => c.polarity === 'denied' && c.role !== 'start' && c.role !== 'feedback' && c.start >= lateEnd && !onlyTheStart(s.text, c.end));
  if (denial === undefined) return undefined;
  const subject = s.words.find((w) => w.start >= denial.start);
  const co2Subject = s.of('entities', 'co2').some((e) => s.words[e.first]?.start === denial.start);
  if (subject === undefined || (!STAND_INS.has(subject.text) && !co2Subject)) return undefined;
  // Another thing named as the denied agent ("it cannot be the orbit that..."): not the latecomer.
  if (denial.agent !== undefined && denial.agent !== 'co2' && !STAND_INS.has(subject.text)) return undefined;
  const co2 = s.of('entities', 'co2').some((e) => e.first > condition.last && e.last < late.first);
  return { start: denial.start, end: denial.end, co2 };
}

/** "played no part in starting it": a denial about the start only. */
function onlyTheStart(text: string, end: number): boolean {
  return /^\W*(?:\w+\W+){0,2}(?:start|starting|trigger|triggering|initiat\w*|kick\w*|set(?:ting)? (?:it )?off|begin\w*|onset)\b/iu.test(text.slice(end));
}

/** The detector entry for the registry. */
export const lagRulesOutCause: DetectorEntry = { detect, keys: [] };
