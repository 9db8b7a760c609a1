import { describe, expect, it } from 'vitest';
import { bindQuantities } from '../../src/claims/bind.js';
import { checkReferences } from '../../src/checks/reference.js';
import { CANONICAL_UNITS, loadPacks } from '../../src/rulepack/index.js';
import type { Quantity } from '../../src/types.js';
import { CASES, type Said } from './reference-cases.js';

const packs = await loadPacks([]);

/** The quantity a parser should read from the sentence, built by hand (see reference-cases.ts). */
export function quantityOf([sentence, text, dimension, low, high, statedUnit = '']: Said): Quantity {
  const start = sentence.indexOf(text);
  if (start < 0) throw new Error(`"${text}" is not in "${sentence}"`);
  return { text, start, end: start + text.length, value: (low + high) / 2, low, high, dimension, unit: CANONICAL_UNITS[dimension], statedUnit };
}

function run(said: Said) {
  const quantities = [quantityOf(said)];
  const { bindings, ambiguous } = bindQuantities(said[0], quantities, packs);
  return { bindings, ambiguous, ...checkReferences(said[0], quantities, bindings, packs) };
}

describe('every built-in reference value has an agreeing and a conflicting sentence (sources in reference-cases.ts)', () => {
  it('covers every reference value of the pack', () => {
    expect(CASES.map(([id]) => id).sort()).toEqual(packs.references.map((r) => r.id).sort());
  });

  describe.each(CASES)('%s', (id, agrees, conflicts) => {
    it(`passes: ${agrees[0]}`, () => {
      const result = run(agrees);
      expect(result.bindings).toEqual([{ quantityIndex: 0, referenceId: id }]);
      expect(result.verdicts).toEqual(['agrees']);
      expect(result.flags).toEqual([]);
    });

    it(`flags: ${conflicts[0]}`, () => {
      const result = run(conflicts);
      const reference = packs.reference(id)!;
      expect(result.bindings).toEqual([{ quantityIndex: 0, referenceId: id }]);
      expect(result.verdicts).toEqual(['conflicts']);
      expect(result.flags).toHaveLength(1);
      expect(result.flags[0]).toMatchObject({
        ruleId: `value.${id}`,
        claimed: { text: conflicts[1] },
        reference: { id, measures: reference.measures },
        sources: reference.sources,
      });
      expect(result.flags[0]?.reason).toContain(`The draft gives ${conflicts[1]} for the `);
      expect(result.flags[0]?.correction).toBeTruthy();
    });
  });
});
