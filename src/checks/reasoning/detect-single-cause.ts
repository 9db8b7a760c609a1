/**
 * `logic.single-cause`: the orbit or CO2 said to be the one cause of the ice ages or of a
 * deglaciation, where the sources document the orbital trigger and the CO2 feedback together.
 *
 *   "Orbital changes alone ended the ice ages."        cause orbit → ice-age, exclusive
 *   "The ice ages were driven solely by CO2."          cause co2 → ice-age (passive), exclusive
 *
 * Saying the orbit alone *started* the warming is right and passes; so does the modern rise,
 * which has one main cause (our emissions).
 */
import { isMention } from '../../propositions/causes.js';
import type { Cause, ReadSentence } from '../../propositions/index.js';
import type { Cue, DetectInput, DetectorEntry } from './detector.js';
import { isAboutModernRise } from './queries.js';

/** The two factors the sources name together: the orbital trigger and the CO2 feedback. */
const FACTORS = new Set(['orbit', 'co2']);
/** Agents that may be singled out as the one cause: the two factors, and the ocean. */
const SINGLE_AGENTS = new Set(['orbit', 'co2', 'water']);

/**
 * The ocean's warming named as the cause: a water of the lexicon with a warming word beside it
 * ("the oceans warming up", "warmer seas") in the cause's span or just after it. Warming seawater
 * releases only part of the glacial-interglacial CO2 rise (about a third by solubility; the rest from
 * Southern Ocean circulation, marine life and carbonate chemistry: IPCC AR6 WG1 chapter 5, from
 * memory; Sigman and Boyle 2000, Nature 407, 859-869), so it is no one cause of that rise, while
 * "the extra CO2 came only from the ocean" names the reservoir and passes.
 */
function warmingOcean(s: ReadSentence, c: Cause): boolean {
  if (c.agent !== 'water') return false;
  const waters = s.of('entities', 'water').filter((w) => (s.words[w.first]?.start ?? 0) >= c.start && (s.words[w.last]?.end ?? 0) <= c.end);
  return waters.some((w) => s.of('changes', 'warm').some((h) => h.first >= w.first - 2 && h.last <= w.last + 2));
}

/** How many words after an amount its "of" may stand ("15 to 30 ppm of the rise"). */
const AMOUNT_TO_OF = 4;
/** Words that name an amount as the whole of the effect, not a part of it. */
const WHOLE = new Set(['whole', 'all', 'entire', 'full', 'total', 'complete']);

/**
 * True when the cause is said to give an amount of its effect ("ocean warming alone can explain
 * perhaps 15 to 30 ppm of the CO2 rise", "accounts alone for 20 ppm of it"): what the agent does
 * alone is a part, so the sentence says the opposite of a single cause. Read from structure: a
 * numeral after the cause word, then "of" within a few words, in the cause's clause.
 */
function amountOfEffect(s: ReadSentence, c: Cause): boolean {
  const at = s.words.findIndex((w) => w.start >= c.start);
  if (at < 0) return false;
  const clause = s.words[at]?.clause;
  const after = s.words.slice(at).filter((w) => w.clause === clause);
  // "the whole 80 ppm of the rise", "all 80 ppm of it": the amount named as the whole is no part.
  return after.some((w, i) => /^\d/u.test(w.text) && !WHOLE.has(after[i - 1]?.text ?? '') && after.slice(i + 1, i + 1 + AMOUNT_TO_OF).some((x) => x.text === 'of'));
}

function detect({ index, read }: DetectInput): Cue[] {
  const here = read(index);
  if (here === undefined || isAboutModernRise(here.s)) return [];
  // One agent singled out as the cause of the ice ages or of a warming: the orbit, CO2, or another
  // factor of the climate system ("for one reason only: the ocean currents switched back on").
  // "the 'CO2 did it all' line": a claim named as a thing in quotation marks is mentioned, not made.
  const mentioned = (c: Cause) => isMention(here.s, here.s.words.findIndex((w) => w.start >= c.start));
  const single = here.props.causes.find(
    // The orbit alone *starting* the warming is what the sources say; any other agent alone starting it is not.
    (c) => c.polarity === 'asserted' && !mentioned(c) && c.exclusive && !(c.role === 'start' && c.agent === 'orbit') && c.role !== 'amplify' && SINGLE_AGENTS.has(c.agent ?? '') && (c.patient !== 'co2' || warmingOcean(here.s, c)) && !amountOfEffect(here.s, c),
  );
  // "It was CO2 that pulled the planet out, after the orbit set things in motion": the other factor keeps a role.
  const other = single === undefined ? undefined : here.props.causes.find((c) => c.polarity === 'asserted' && c !== single && FACTORS.has(c.agent ?? '') && c.agent !== single.agent);
  if (single !== undefined && other === undefined) return [{ start: single.start, end: single.end }];
  // "Orbital changes, not CO2, caused the warming"; "the orbit ended the ice age and CO2 had nothing
  // to do with it": one factor named as the cause, the other denied any part, for the same effect.
  const named = here.props.causes.find((c) => c.polarity === 'asserted' && c.role === 'cause' && FACTORS.has(c.agent ?? '') && c.patient !== 'co2');
  const denied = here.props.causes.find(
    (c) => c.polarity === 'denied' && c.role === 'cause' && FACTORS.has(c.agent ?? '') && c.agent !== named?.agent && (c.start === named?.start || named?.exclusive === true || c.patient === undefined || c.patient === named?.patient),
  );
  return named !== undefined && denied !== undefined ? [{ start: named.start, end: named.end }] : [];
}

/** The detector entry for the registry. */
export const singleCause: DetectorEntry = { detect, keys: [] };
