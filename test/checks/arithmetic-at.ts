/** The arithmetic check on the last of some sentences, the ones before it as its paragraph (shared by the arithmetic tests). */
import { checkArithmetic } from '../../src/checks/arithmetic.js';
import { parseQuantities } from '../../src/quantities/index.js';

/** Checks the last sentence with the ones before it as its paragraph. */
export const check = (...sentences: string[]) => {
  const sentence = sentences[sentences.length - 1] as string;
  return checkArithmetic(sentence, parseQuantities(sentence), sentences.slice(0, -1));
};

/** The flags of `check`, as rule id, flagged words and correction. */
export const flagged = (...sentences: string[]) => {
  const sentence = sentences[sentences.length - 1] as string;
  return check(...sentences).map((f) => [f.ruleId, sentence.slice(f.start, f.end), f.correction]);
};
