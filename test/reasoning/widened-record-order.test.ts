/**
 * A global order of the writer's own is a direction error, not a record read as the globe (session
 * 17): the record is named only to be widened ("not just an Antarctic feature", "not only
 * Antarctica"), or the sentence opens on an expletive "it" ("It is true that ...") that reads no
 * record of the sentence before. The direction fact global-co2-ahead-of-warming judges such an
 * order; a record that the order is read from still gives the scope flag. Sentences of our own.
 *
 * Sources: over the last deglaciation global mean temperature generally lagged CO2, while Antarctic
 * temperature rose with it or a few centuries earlier (Shakun et al. 2012, Nature 484, 49-54;
 * Parrenin et al. 2013, Science 339, 1060-1063).
 */
import { describe, expect, it } from 'vitest';
import { checkText } from '../../src/engine.js';
import { loadPacks } from '../../src/rulepack/index.js';

const packs = await loadPacks([]);

async function rulesOf(text: string): Promise<string[]> {
  const result = await checkText(text, { path: 'draft.txt', packs });
  return result.flags.filter((f) => f.level === 'error' || f.level === 'warning').map((f) => f.ruleId);
}

describe('a global order of the writer\'s own', () => {
  it.each([
    'Taken over the whole planet, warming also came before the CO2 rise, so this is not merely an Antarctic quirk.',
    'It was not only the Vostok ice: across the entire globe the warming came first and CO2 came after.',
    'Talos Dome shows the two rising almost together. It is nevertheless clear that the planet as a whole warmed before CO2 began to climb.',
  ])('is a direction error: %s', async (text) => {
    const rules = await rulesOf(text);
    expect(rules).toContain('direction.global-co2-ahead-of-warming');
    expect(rules.filter((r) => r.startsWith('scope.'))).toEqual([]);
  });
});

describe('a global order read from a record', () => {
  it.each([
    'The Talos Dome core shows that the whole globe warmed first and CO2 came after.',
    'Antarctic cores show warming ahead of CO2. It shows that the whole planet warmed first.',
  ])('is a scope error: %s', async (text) => {
    expect((await rulesOf(text)).some((r) => r.startsWith('scope.'))).toBe(true);
  });
});
