/**
 * The short irregular verbs ("go", "do", "be") keep their participle in -ing, so a lexicon phrase
 * that opens with one matches its progressive form: "going up and down together" is the
 * co-variation "go up and down together".
 * The science: the ice-core co-variation of CO2 and temperature does not by itself show which drove
 * which; CO2 amplified a warming the orbit started (Shakun et al. 2012, Nature 484, 49-54).
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { checkText } from '../../src/engine.js';
import { inflect } from '../../src/propositions/inflect.js';
import { loadPacks } from '../../src/rulepack/index.js';
import type { LoadedPacks } from '../../src/rulepack/types.js';

let packs: LoadedPacks;
beforeAll(async () => {
  packs = await loadPacks([]);
});

describe('forms of the short irregular verbs', () => {
  it.each([
    ['go', ['going', 'went', 'gone', 'goes']],
    ['do', ['doing', 'did', 'done', 'does']],
    ['be', ['being', 'was', 'were']],
  ])('%s has %j', (word, forms) => {
    expect(inflect(word)).toEqual(expect.arrayContaining(forms));
  });

  it('gives a short word that is no verb no forms', () => {
    expect(inflect('up')).toEqual(['up']);
  });

  it('reads a progressive co-variation offered as proof', async () => {
    const flags = (await checkText('The chart has the gas and the temperature going up and down together, which proves that CO2 sets the temperature.', { packs, format: 'markdown' })).flags;
    expect(flags.map((f) => f.ruleId)).toContain('logic.correlation-as-proof');
  });
});
