/**
 * Restatements: one quantity followed by the same quantity in another unit, joined by a
 * parenthesis, "or", "i.e.", "=" or a comma: "3,270 m (10,700 ft)", "5 °C, or 9 °F",
 * "12,000 years ago, around 10,000 BCE". The second is the conversion the unit checks verify.
 */
import type { Quantity } from '../types.js';

const S = String.raw`[\s\u00A0]`;
const JOINER = new RegExp(
  String.raw`^${S}*(?:\(|\[|,?${S}*or${S}+|,?${S}*i\.e\.,?${S}*|,?${S}*that is,?${S}*|=${S}*|\/${S}*|,?${S}*equivalent to${S}+|,?${S}*which is${S}+|,${S}*|—${S}*)$`,
  'iu',
);

/** A quantity and its restatement in another unit. */
export interface Restatement {
  first: Quantity;
  second: Quantity;
}

/** Every adjacent pair of one dimension, in different stated units, joined as a restatement. */
export function findRestatements(text: string, qs: Quantity[]): Restatement[] {
  const out: Restatement[] = [];
  for (let i = 0; i + 1 < qs.length; i++) {
    const first = qs[i] as Quantity;
    const second = qs[i + 1] as Quantity;
    const sameThing = first.dimension === second.dimension || (first.dimension === 'concentration' && second.dimension === 'percent') || (first.dimension === 'percent' && second.dimension === 'concentration');
    if (sameThing && first.statedUnit !== second.statedUnit && JOINER.test(text.slice(first.end, second.start))) out.push({ first, second });
  }
  return out;
}
