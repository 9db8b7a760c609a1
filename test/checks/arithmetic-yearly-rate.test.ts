/**
 * A drawn pace told over another stretch than a year, an amount every interval or a rate per decade
 * or century, gets its yearly rate beside the corrected figure (src/checks/arithmetic.ts
 * withYearlyRate): the unit the reference values keep and an editor restates a pace in. Sentences of
 * our own; the sums are the draft's own (common practice: rate = change ÷ time).
 */
import { describe, expect, it } from 'vitest';
import { checkText } from '../../src/engine.js';

const rateCorrection = async (text: string): Promise<string | undefined> =>
  (await checkText(text, { path: 'draft.md' })).flags.find((f) => f.ruleId === 'arith.rate')?.correction;

describe('the yearly rate beside a pace told over another stretch', () => {
  it('an amount every interval, in the paragraph: 60 ppm over 6,000 years is 0.01 ppm a year', async () => {
    const said = await rateCorrection('Over the long thaw carbon dioxide crept up some 60 ppm across 6,000 years. That is roughly one part per million every twelve years.');
    expect(said).toContain('0.12');
    expect(said).toContain('(about 0.01 ppm per year)');
  });
  it('an amount every interval in its own sentence keeps the draft\'s amount unit', async () => {
    const said = await rateCorrection('During the deglaciation the sea climbed 120 metres over 12,000 years, about 5 cm every ten years.');
    expect(said).toContain('(about 1 cm per year)');
  });
  it('a rate per decade: 50 ppm in 10,000 years is 0.05 ppm per decade', async () => {
    const said = await rateCorrection('The gas gained some 50 ppm in 10,000 years, or about 2 ppm per decade.');
    expect(said).toContain('0.05 ppm per decade');
    expect(said).toContain('(about 0.005 ppm per year)');
  });
  it('leaves a yearly rate as it is, in any amount unit', async () => {
    expect(await rateCorrection('The gas gained some 50 ppm in 10,000 years, or about 0.5 ppm a year.')).toBe('about 0.005 ppm a year');
    expect(await rateCorrection('During the deglaciation the sea climbed 90 metres in 9,000 years, or about 30 millimetres a year.')).toBe('about 10 millimetres a year');
  });
});
