/**
 * The same sentences as reference-values.test.ts, read by the real quantity parser
 * (src/quantities parseQuantities) instead of hand-built quantities: parser, binder and reference
 * check together. Sources for each range are named beside each case in reference-cases.ts.
 */
import { describe, expect, it } from 'vitest';
import { bindQuantities } from '../../src/claims/bind.js';
import { checkReferences } from '../../src/checks/reference.js';
import { parseQuantities } from '../../src/quantities/index.js';
import { loadPacks } from '../../src/rulepack/index.js';
import { CASES, type Said } from './reference-cases.js';

const packs = await loadPacks([]);

/** Verdict and flag rule ids for the quantity the case is about (the one that covers its text). */
function judge([sentence, text]: Said) {
  const quantities = parseQuantities(sentence);
  const at = sentence.indexOf(text);
  const index = quantities.findIndex((q) => q.start <= at + text.length - 1 && q.end > at);
  const { bindings } = bindQuantities(sentence, quantities, packs);
  const mine = bindings.filter((b) => b.quantityIndex === index);
  const { flags, verdicts } = checkReferences(sentence, quantities, mine, packs);
  return { found: index >= 0, bound: mine.map((b) => b.referenceId), verdicts, flags: flags.map((f) => f.ruleId) };
}

describe('parsed sentences: every built-in value passes its agreeing sentence and flags its conflicting one', () => {
  describe.each(CASES)('%s', (id, agrees, conflicts) => {
    it(`passes: ${agrees[0]}`, () => {
      expect(judge(agrees)).toEqual({ found: true, bound: [id], verdicts: ['agrees'], flags: [] });
    });
    it(`flags: ${conflicts[0]}`, () => {
      expect(judge(conflicts)).toEqual({ found: true, bound: [id], verdicts: ['conflicts'], flags: [`value.${id}`] });
    });
  });
});
