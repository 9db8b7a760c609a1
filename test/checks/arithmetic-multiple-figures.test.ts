/**
 * A multiple worked out from the draft's own figures: its correction gives a multiple of 100 or more
 * to the whole number, as the finding's message does ("is 185 times"), and a smaller one to two
 * figures (src/quantities/rewrite-quantity.ts derivedFigures). Sentences of our own; the sums are the
 * draft's own (common practice: a ratio is one pace divided by the other).
 */
import { describe, expect, it } from 'vitest';
import { checkText } from '../../src/engine.js';

const ratioFlag = async (text: string) => (await checkText(text, { path: 'draft.md' })).flags.find((f) => f.ruleId === 'arith.ratio');

describe('the figures of a corrected multiple', () => {
  it('gives a multiple of 100 or more to the whole number: 2.4 / 0.013 = 184.6, so about 185 times', async () => {
    const flag = await ratioFlag('As the ice sheets melted, CO2 climbed by about 0.013 ppm a year. Our smokestacks now add about 2.4 ppm a year, which is about 50 times faster.');
    expect(flag?.reason).toContain('185 times');
    expect(flag?.correction).toBe('about 185 times');
  });
  it('keeps two figures below 100: 2.4 / 0.2 = 12, so about 12 times', async () => {
    const flag = await ratioFlag('In the warm spell the gas crept up by about 0.2 ppm a year. Our smokestacks now add about 2.4 ppm a year, which is about 50 times faster.');
    expect(flag?.correction).toBe('about 12 times');
  });
});
