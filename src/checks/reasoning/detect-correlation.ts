/**
 * `logic.correlation-as-proof`: co-variation offered as proof of a cause.
 *
 *   "The close match between the two curves proves that CO2 controls the climate."
 *    evidence: correlation → proof (undenied) → cause  ^ flagged from the correlation to the cause
 *
 * A sentence that points back ("That's proof CO2 controls temperature.") takes its correlation from
 * the sentence before, in the same voice.
 *
 * "The match alone does not prove it" and "the curves move together, as expected when each
 * amplifies the other" pass: the proof is denied, or there is none.
 */
import { proofOfWhatCameBefore, proofWithoutObject } from '../../propositions/evidence.js';
import { denialsBefore } from '../../propositions/sentence.js';
import { opensUtterance } from '../../prose/index.js';
import type { Cue, DetectInput, DetectorEntry } from './detector.js';

/** How many sentences back a proof with no object looks for the CO2 its passage is about. */
const PASSAGE_REACH = 8;

function detect({ index, read }: DetectInput): Cue[] {
  const here = read(index);
  const evidence = here?.props.evidence[0];
  if (evidence !== undefined) return [{ start: evidence.start, end: evidence.end }];
  // "When two curves track each other that closely, the correlation itself is the proof.": a
  // co-variation called proof with no object stated proves the causal claim the passage is about.
  if (here !== undefined && !here.s.question) {
    // The passage is about CO2 when the sentence or one of the paragraph's sentences before it names the gas
    // ("Those two lines track each other so well, that's all the proof anybody needs" in a script on CO2).
    const passage = Array.from({ length: PASSAGE_REACH + 1 }, (_, k) => read(index - k));
    const aboutCo2 = passage.some((r) => r !== undefined && r.s.of('entities', 'co2').length > 0);
    const proof = aboutCo2 ? proofWithoutObject(here.s) : undefined;
    if (proof !== undefined) return [proof];
  }
  // "CO2 and temperature line up in the cores. That's proof CO2 controls temperature.": the proof
  // points back to a correlation the same voice stated just before.
  if (here === undefined || opensUtterance(here.s.text)) return [];
  const before = read(index - 1);
  const correlated = before !== undefined && before.s.of('correlation').some((c) => denialsBefore(before.s, c.first, 4) % 2 === 0);
  if (!correlated) return [];
  // The cause offered is CO2's, or the correlation was CO2's.
  const causes = before.s.of('entities', 'co2').length > 0 ? here.props.causes : here.props.causes.filter((c) => c.agent === 'co2');
  const proof = proofOfWhatCameBefore(here.s, causes);
  return proof === undefined ? [] : [proof];
}

/** The detector entry for the registry. */
export const correlationAsProof: DetectorEntry = { detect, keys: [] };
