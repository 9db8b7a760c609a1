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
import type { Cue, DetectInput, DetectorEntry } from './detector.js';
import { isAboutModernRise } from './queries.js';

function detect({ index, read }: DetectInput): Cue[] {
  const here = read(index);
  if (here === undefined || isAboutModernRise(here.s)) return [];
  const single = here.props.causes.find(
    (c) => c.polarity === 'asserted' && c.exclusive && c.role !== 'start' && c.role !== 'amplify' && (c.agent === 'orbit' || c.agent === 'co2') && c.patient !== 'co2',
  );
  // "It was CO2 that pulled the planet out, after the orbit set things in motion": the other factor keeps a role.
  const other = single === undefined ? undefined : here.props.causes.find((c) => c.polarity === 'asserted' && c !== single && (c.agent === 'orbit' || c.agent === 'co2') && c.agent !== single.agent);
  if (single !== undefined && other === undefined) return [{ start: single.start, end: single.end }];
  // "Orbital changes, not CO2, caused the warming": one named, the other denied, for the same effect.
  const named = here.props.causes.find((c) => c.polarity === 'asserted' && c.role === 'cause' && (c.agent === 'orbit' || c.agent === 'co2'));
  const denied = here.props.causes.find((c) => c.polarity === 'denied' && c.role === 'cause' && (c.agent === 'orbit' || c.agent === 'co2') && c.agent !== named?.agent && c.start === named?.start);
  return named !== undefined && denied !== undefined ? [{ start: named.start, end: named.end }] : [];
}

/** The detector entry for the registry. */
export const singleCause: DetectorEntry = { detect, keys: [] };
