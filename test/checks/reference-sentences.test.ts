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

// Sea level said the ways people say it: against today's shoreline, as "the sea" or "the oceans",
// and glacial times named by what they did ("so much water was locked in ice"). Lowstand about
// 120-135 m below present: Lambeck et al. 2014, PNAS 111, 15296-15303, doi 10.1073/pnas.1411762111;
// deglacial rise about 80 m: Clark et al. 2012, doi 10.1073/pnas.1116619109.
describe('sea level in everyday wording', () => {
  it.each([
    ['The sea stood only about 60 metres lower than today.', '60 metres', 'lgm-sea-level-lowstand', 'conflicts'],
    ['Sea level stood about 125 metres below today\'s shoreline.', '125 metres', 'lgm-sea-level-lowstand', 'agrees'],
    ['So much water was locked in ice sheets that sea level fell by about 300 metres.', '300 metres', 'lgm-sea-level-lowstand', 'conflicts'],
    ['Between 19,000 and 11,000 years ago, melting ice sheets raised the oceans by about 8 metres.', '8 metres', 'deglacial-sea-level-rise', 'conflicts'],
    ['Between 19,000 and 11,000 years ago, melting ice sheets raised the oceans by about 80 metres.', '80 metres', 'deglacial-sea-level-rise', 'agrees'],
  ])('%s', (sentence, text, id, verdict) => {
    const { bound, verdicts } = judge([sentence, text] as unknown as Said);
    expect(bound).toEqual([id]);
    expect(verdicts).toEqual([verdict]);
  });
});
