/**
 * A temperature change converted to Fahrenheit in a written sum that adds 32: "5 + 32 = 41 °F of
 * cooling", "6 × 1.8 + 32 = 42.8 °F colder". A change of C degrees Celsius is a change of 1.8 × C
 * degrees Fahrenheit; the 32 belongs to readings (NIST SP 811, the Fahrenheit and Celsius scales).
 * The sum's first number is the change in °C; the result must be a change (a change word or cue
 * made it one), never a reading ("20 × 1.8 + 32 = 68 °F" for a room is right).
 */
import type { Quantity } from '../types.js';
import type { Derived } from './arithmetic-derive.js';

const S = String.raw`[\s\u00A0]`;
/** Between the numbers of a sum: operators only ("×", "*", "x", "+", "·"). */
const OPERATOR_GAP = new RegExp(String.raw`^${S}*[×x*·+]${S}*$`, 'u');
/** Before the result: "=" or a worked answer's word for it. */
const RESULT_GAP = new RegExp(String.raw`^${S}*(?:=|gives|makes|comes${S}+to|equals)${S}*$`, 'iu');

/** A written sum that added 32 to a change: the stated °F result and the change it should be. */
export interface OffsetSum {
  stated: Quantity;
  /** The right change, in kelvin (the canonical unit of a temperature change). */
  computed: Derived;
  first: Quantity;
}

/** Every written sum in `text` that adds 32 to turn a change into Fahrenheit. */
export function offsetSums(text: string, qs: Quantity[]): OffsetSum[] {
  return qs.flatMap((c, k) => {
    if (c.statedUnit !== 'degF' || c.dimension !== 'temperature-change' || k < 2) return [];
    if (!RESULT_GAP.test(text.slice((qs[k - 1] as Quantity).end, c.start))) return [];
    // Walk back over the chain of numbers joined by operators.
    let i = k - 1;
    while (i > 0 && OPERATOR_GAP.test(text.slice((qs[i - 1] as Quantity).end, (qs[i] as Quantity).start))) i--;
    const chain = qs.slice(i, k);
    const first = chain[0] as Quantity;
    const added32 = chain.slice(1).some((q, j) => q.value === 32 && q.dimension === 'number' && /\+/u.test(text.slice((chain[j] as Quantity).end, q.start)));
    if (chain.length < 2 || !added32 || !(first.dimension === 'number' || first.statedUnit === 'degC')) return [];
    const change = first.value;
    return [{ stated: c, computed: { value: change, low: change, high: change }, first }];
  });
}
