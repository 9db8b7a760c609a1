/** One sentence through the real parser, binder and reference check: the first number's value and verdict (shared by the binding tests). */
import { bindQuantities } from '../../src/claims/bind.js';
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
