/**
 * `logic.correlation-as-proof`: co-variation offered as proof of a cause.
 *
 *   "The close match between the two curves proves that CO2 controls the climate."
 *    evidence: correlation → proof (undenied) → cause  ^ flagged from the correlation to the cause
 *
 * "The match alone does not prove it" and "the curves move together, as expected when each
 * amplifies the other" pass: the proof is denied, or there is none.
 */
import type { Cue, DetectInput, DetectorEntry } from './detector.js';

function detect({ index, read }: DetectInput): Cue[] {
  const evidence = read(index)?.props.evidence[0];
  return evidence === undefined ? [] : [{ start: evidence.start, end: evidence.end }];
}

/** The detector entry for the registry. */
export const correlationAsProof: DetectorEntry = { detect, keys: [] };
