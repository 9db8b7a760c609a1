/**
 * compromise reads a sentence only when a check can use its reading (docs/speed.md, "The NLP library
 * only where a check uses it"): a draft whose sentences hold no coordinated predicate with a number
 * and no cue words a detector reads through roots never loads it, and one that does is parsed once
 * per distinct sentence. The counts come from nlp/compromise.ts `nlpUse`, which a run never prints.
 * The science of the sentences: Caillon et al. 2003 (Science 299, 1728-1731) on the Antarctic lag
 * of some 800 years; Masson-Delmotte et al. 2013 (IPCC AR5 WG1 ch. 5) on what ice cores show.
 */
import { describe, expect, it } from 'vitest';
import { checkText } from '../../src/engine.js';
import { nlpUse } from '../../src/nlp/compromise.js';

describe('compromise only where a check uses it', () => {
  it('is not loaded for a draft no check needs it for, and the flags are found without it', async () => {
    const result = await checkText('Ice cores show that CO2 rose about 800 years after the warming, so CO2 cannot have caused it.\n', { path: 'draft.md' });
    expect(result.flags.map((f) => f.ruleId)).toContain('logic.lag-rules-out-cause');
    expect(nlpUse()).toEqual({ loaded: false, parses: 0 });
  });

  it('parses a sentence whose certainty word the detector reads, once however often it is checked', async () => {
    const draft = 'The Vostok ice core settles the question of what caused the ice ages.\n';
    const first = await checkText(draft, { path: 'draft.md' });
    expect(first.flags.map((f) => f.ruleId)).toContain('logic.ice-core-certainty');
    const after = nlpUse();
    expect(after.loaded).toBe(true);
    expect(after.parses).toBeGreaterThan(0);
    await checkText(draft, { path: 'draft.md' });
    expect(nlpUse().parses).toBe(after.parses);
  });
});
