/**
 * One sentence through the real parser, binder and reference check (shared by the binding tests):
 * `judge` reads the first number, `judgeAt` the number written `text` (with the sentence before, if
 * given), `boundAt` the bound the number written `text` is read as.
 */
import { boundReadings } from '../../src/claims/bind-bound.js';
import { bindQuantities, findTerms } from '../../src/claims/bind.js';
import { checkReferences } from '../../src/checks/reference.js';
import { parseQuantities } from '../../src/quantities/index.js';
import { loadPacks } from '../../src/rulepack/index.js';

const packs = await loadPacks([]);

export function judge(sentence: string): { value: string; verdict: string } {
  const quantities = parseQuantities(sentence);
  const { bindings } = bindQuantities(sentence, quantities, packs);
  const { verdicts } = checkReferences(sentence, quantities, bindings, packs);
  return { value: bindings[0]?.referenceId ?? '-', verdict: verdicts[0] ?? '-' };
}

/** The index of the quantity written `text` in `sentence`. */
function indexOf(sentence: string, text: string): number {
  const at = sentence.indexOf(text);
  return parseQuantities(sentence).findIndex((q) => q.start <= at + text.length - 1 && q.end > at);
}

export function judgeAt(sentence: string, text: string, before?: string): { value: string; verdict: string } {
  const quantities = parseQuantities(sentence);
  const index = indexOf(sentence, text);
  const { bindings } = bindQuantities(sentence, quantities, packs, before);
  const mine = bindings.filter((b) => b.quantityIndex === index);
  const { verdicts } = checkReferences(sentence, quantities, mine, packs);
  return { value: mine[0]?.referenceId ?? '-', verdict: verdicts[0] ?? '-' };
}

/** The bound ('ceiling', 'floor' or '-') the quantity written `text` is read as, with its value and verdict. */
export function boundAt(sentence: string, text: string): { bound: string; value: string; verdict: string } {
  const quantities = parseQuantities(sentence);
  const bound = boundReadings(sentence, quantities, packs, findTerms(sentence, packs))[indexOf(sentence, text)]?.kind ?? '-';
  return { bound, ...judgeAt(sentence, text) };
}
