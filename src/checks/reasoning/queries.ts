/**
 * Small questions the reasoning checks ask of propositions, named once so every check reads them
 * the same way.
 */
import type { Cause, Order, ReadSentence } from '../../propositions/index.js';

/** Things a warming claim can be about: temperature itself, a region's, the ice ages' end. */
const WARMING_SIDE = new Set(['temperature', 'ice-age', 'ice', 'water', 'global', 'antarctic', 'greenland', 'polar', 'south', 'north', 'tropics']);

/** True for the temperature side of a cause or order. */
export function isWarmingSide(kind: string | undefined): boolean {
  return kind !== undefined && WARMING_SIDE.has(kind);
}

/** Temperature (anywhere) first, CO2 after. */
export function isTemperatureFirst(o: Order): boolean {
  return !o.together && isWarmingSide(o.first) && o.then === 'co2';
}

/** A cause said of CO2 acting on temperature, or on nothing named (the warming is understood). */
export function isCo2OnWarming(c: Cause): boolean {
  return c.agent === 'co2' && (c.patient === undefined || isWarmingSide(c.patient));
}

/** Temperature acting on CO2. */
export function isWarmingOnCo2(c: Cause): boolean {
  return isWarmingSide(c.agent) && c.patient === 'co2';
}

const INFERENCE_OPENERS = /^(?:so|therefore|thus|hence|consequently|clearly|obviously|that|this|which|it)\b/u;

/** The sentence draws a conclusion from the one before ("So...", "That means...", "This shows..."). */
export function opensWithInference(s: ReadSentence): boolean {
  const head = s.words.slice(s.opening, s.opening + 3).map((w) => w.text).join(' ');
  return INFERENCE_OPENERS.test(head) && /^(?:so|therefore|thus|hence|consequently|clearly|obviously)\b|^(?:that|this|which|it) (?:means|shows|proves|tells|implies|rules)/u.test(head);
}

/** Words that name the modern rise (our emissions): a single cause is right there. */
export function isAboutModernRise(s: ReadSentence): boolean {
  return s.words.some((w) => /^(?:fossil|emissions?|industrial|burning|humans?|coal|oil|cars?|factories)$/u.test(w.text));
}
