/**
 * The age of the Beyond EPICA - Oldest Ice core (pack value beyond-epica-ice-age) and a clause with
 * its own subject after a colon (src/claims/bind-clauses.ts). Sentences of our own.
 */
import { describe, expect, it } from 'vitest';
import { bindQuantities } from '../../src/claims/bind.js';
import { restoreElidedUnits } from '../../src/claims/elided-units.js';
import { checkText } from '../../src/index.js';
import { parseQuantities } from '../../src/quantities/index.js';
import { loadPacks } from '../../src/rulepack/index.js';

const packs = await loadPacks([]);

function at(sentence: string, text: string, context?: string): string {
  const quantities = restoreElidedUnits(sentence, parseQuantities(sentence));
  const { bindings } = bindQuantities(sentence, quantities, packs, context);
  const i = quantities.findIndex((q) => q.text === text);
  if (i < 0) throw new Error(`no quantity "${text}" in ${JSON.stringify(quantities.map((q) => q.text))}`);
  return bindings.find((b) => b.quantityIndex === i)?.referenceId ?? '-';
}

// Beyond EPICA reached bedrock at Little Dome C in January 2025 in ice at least 1.2 million years old,
// preliminary (IPEV press release, 24 March 2025); EPICA Dome C spans about 800,000 years (Jouzel et al. 2007).
describe('the age of the Beyond EPICA ice', () => {
  it('binds its own value, not the EPICA Dome C or Dome Fuji span', () => {
    expect(at('The Beyond EPICA ice at Little Dome C is thought to be at least 1.2 million years old.', 'at least 1.2 million years')).toBe('beyond-epica-ice-age');
    expect(at('Its deepest ice is probably some 1.3 million years old.', 'some 1.3 million years', 'The Oldest Ice core at Little Dome C reached bedrock in 2025.')).toBe('beyond-epica-ice-age');
  });

  it('agrees with "at least 1.2 million years" and flags a far younger age', async () => {
    const clean = await checkText('The Beyond EPICA core at Little Dome C holds ice at least 1.2 million years old.');
    expect(clean.flags.filter((f) => f.ruleId.startsWith('value.'))).toEqual([]);
    const wrong = await checkText('The Beyond EPICA core at Little Dome C holds ice about 400,000 years old.');
    expect(wrong.flags.map((f) => f.ruleId)).toContain('value.beyond-epica-ice-age');
  });

  it('leaves the rank of the published records alone', async () => {
    const result = await checkText('The longest continuous record published so far comes from EPICA Dome C and covers about 800,000 years.');
    expect(result.flags.map((f) => f.ruleId)).toEqual([]);
  });
});

describe('a clause with its own subject after a colon', () => {
  // Beyond EPICA bedrock about 2,800 m (IPEV press release, 2025).
  it('gives a second predicate the subject of its own clause', () => {
    expect(at('And there is more: the Beyond EPICA drillers hit bedrock near 2,800 m and believe the ice is at least 1.2 million years old.', 'at least 1.2 million years')).toBe('beyond-epica-ice-age');
  });
});
