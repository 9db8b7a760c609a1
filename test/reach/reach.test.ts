/**
 * Knowledge an editor can reach: every reference value of the built-in pack is checked from a plain
 * sentence that names what it measures, in a draft that says nothing else (issue 9). Each sentence
 * of reach-cases.ts is a whole draft for checkText, the library's entry point, so the topic gate
 * (a draft is on topic because it names a subject), the binder and the checks are tested together.
 * The sources are named beside each row in reach-cases.ts.
 */
import { describe, expect, it } from 'vitest';
import { checkText } from '../../src/engine.js';
import { loadPacks } from '../../src/rulepack/index.js';
import type { Flag } from '../../src/types.js';
import { REACH, type ReachRow } from './reach-cases.js';

const packs = await loadPacks([]);

/** Drops digit-group separators so "420 000", "420,000" and "420000" compare equal (as the eval does). */
function digits(text: string): string {
  return text.toLowerCase().replace(/(?<=\d)[,\u00a0\u202f\u2009 ](?=\d{3})/gu, '');
}

/** What a one-sentence draft comes to: the reference values its numbers bind, and its flags. */
async function read(text: string): Promise<{ bound: string[]; flags: Flag[] }> {
  const result = await checkText(text, { packs });
  return { bound: result.claims.flatMap((c) => c.bindings.map((b) => b.referenceId)), flags: result.flags };
}

describe('every reference value of the built-in pack is reached from a one-sentence draft', () => {
  it('covers every reference value', () => {
    const ids = packs.references.map((r) => r.id).sort();
    expect(REACH.map(([id]) => id).sort()).toEqual(ids);
  });

  describe.each(REACH)('%s', (id, rows: ReachRow[]) => {
    it.each(rows.filter((r) => r.right).map((r) => [r.text]))('binds and stays clean: %s', async (text) => {
      const { bound, flags } = await read(text);
      expect({ bound: bound.includes(id), flags: flags.map((f) => f.ruleId) }).toEqual({ bound: true, flags: [] });
    });
    it.each(rows.flatMap((r) => (r.right ? [] : [[r.text, r] as const])))('is flagged: %s', async (text, row) => {
      if (row.right) return;
      const { flags } = await read(text);
      const rule = row.rule ?? `value.${id}`;
      const matching = flags.filter((f) => (rule.endsWith('.') ? f.ruleId.startsWith(rule) : f.ruleId === rule));
      expect(matching.map((f) => f.ruleId), `flags: ${flags.map((f) => f.ruleId).join(', ')}`).not.toEqual([]);
      const said = matching.map((f) => digits(f.correction ?? f.reference?.text ?? ''));
      expect(said.some((s) => row.key.some((k) => s.includes(digits(k)))), `corrections: ${said.join(' | ')}`).toBe(true);
    });
  });
});
