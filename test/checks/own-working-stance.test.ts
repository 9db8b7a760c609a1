/**
 * A slip in the sentence's own sums and conversions keeps its level where the sentence asks,
 * quotes or reports: the sum is wrong whoever works it. Sentences written for this file. Sums by
 * hand (common practice of arithmetic): 280 − 190 = 90; a change of 6 °C is 10.8 °F, not
 * 6 × 1.8 + 32 = 42.8 (NIST SP 811); 1% of the air = 10,000 ppm, so 190 ppm is 0.019% (NIST SP 811).
 */
import { describe, expect, it } from 'vitest';
import { checkText } from '../../src/engine.js';

const levels = async (text: string, rule: string) =>
  (await checkText(text, { path: 'draft.md' })).flags.filter((f) => f.ruleId.startsWith(rule)).map((f) => f.level);

describe('own working under a stance', () => {
  it.each([
    ['asked', 'In the Kell core CO2 went from 190 ppm in the glacial to 280 ppm in the warm spell after the ice age, so that is a rise of 130 ppm, right?', 'arith.'],
    ['quoted', 'The guide told the group: "In the Kell core CO2 went from 190 ppm in the glacial to 280 ppm after the ice age, a rise of 130 ppm."', 'arith.'],
    ['reported', 'My old textbook says that at the Last Glacial Maximum CO2 stood near 190 ppm, which is 0.19 percent of the air.', 'unit.'],
  ])('%s: the slip keeps its level', async (_stance, text, rule) => {
    const found = await levels(`# The ice ages\n\n${text}\n`, rule);
    expect(found.length).toBeGreaterThan(0);
    expect(found).not.toContain('note');
  });

  it('a figure the pack disagrees with, reported, is still a note', async () => {
    const text = '# The ice ages\n\nSome people claim that the EPICA Dome C ice core covers 420,000 years.\n';
    const flags = (await checkText(text, { path: 'draft.md' })).flags.filter((f) => f.ruleId.startsWith('value.'));
    expect(flags.map((f) => f.level)).toEqual(['note']);
  });

  it('a right sum, asked, stays clean', async () => {
    const text = '# The ice ages\n\nIn the Kell core CO2 went from 190 ppm in the glacial to 280 ppm in the warm spell after the ice age, so that is a rise of 90 ppm, right?\n';
    expect(await levels(text, 'arith.')).toEqual([]);
  });
});
