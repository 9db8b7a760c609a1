/**
 * One figure, one explanation: a rate the sentence works out from its own numbers is checked as
 * arithmetic, and a reading of the reference in another unit gives way to it (src/engine.ts,
 * preferSpecific). The deglacial CO2 rise of about 76 ppm over about 6,000 years (Monnin et al. 2001,
 * Science 291, 112-114, DOI 10.1126/science.291.5501.112) is 76 / 6,000 = 0.0127 ppm a year, about
 * 0.13 ppm per decade. Sentences of our own.
 */
import { describe, expect, it } from 'vitest';
import { checkText, loadPacks } from '../../src/index.js';

const packs = await loadPacks([]);

async function rulesOn(text: string, figure: string): Promise<string[]> {
  const report = await checkText(text, { packs, path: 'x.md' });
  const at = text.indexOf(figure);
  return report.claims
    .flatMap((c) => c.flags)
    .filter((f) => f.span.start.offset <= at && at < f.span.end.offset)
    .map((f) => f.ruleId)
    .sort();
}

describe('an arithmetic slip before a unit slip', () => {
  it('a rate drawn wrongly from the sentence\'s own figures is an arithmetic flag alone', async () => {
    const text = 'At the end of the last ice age, CO2 climbed by about 76 ppm over some 6,000 years, roughly 1 ppm per decade.';
    expect(await rulesOn(text, '1 ppm per decade')).toEqual(['arith.rate']);
  });
  it('the right rate stays clean', async () => {
    const text = 'At the end of the last ice age, CO2 climbed by about 76 ppm over some 6,000 years, roughly 0.13 ppm per decade.';
    expect(await rulesOn(text, '0.13 ppm per decade')).toEqual([]);
  });
  it('a rate with no inputs beside it keeps its unit slip', async () => {
    const text = 'At the end of the last ice age, CO2 rose at a mean rate of roughly 1.3 ppm per decade.';
    expect(await rulesOn(text, '1.3 ppm per decade')).toEqual(['unit.scale-slip']);
  });
});
