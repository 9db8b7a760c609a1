/**
 * A sentence that reads the record named before it: "This tells us that the whole Earth...",
 * "CURATOR: Those layers show...", "the curve means...". The scope check and the reference check
 * both ask it, so that a global figure read back from a regional record is judged the same way in
 * each.
 */
const READS_BACK = /^\W*(?:\[[^\]\n]{1,24}\]\s*)?(?:(?:\p{L}{2,9}\.?\s+)?\d{1,3}\/\s+)?(?:\p{Lu}[\p{L}'’.-]*:\s*)?(?:(?:and|but|so|now)\s+)?(?:this|that|these|those|it|they|the curve|the record|the graph|the column)(?![\p{L}])[^.;:!?]{0,20}?(?<![\p{L}])(?:tells?|told|shows?|showed|means?|meant|suggests?|indicates?|gives?|gave|reveals?|says?|said)(?![\p{L}])/iu;

/** True when `sentence` opens by reading the record named before it. */
export function readsBack(sentence: string): boolean {
  return READS_BACK.test(sentence);
}
