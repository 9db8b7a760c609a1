/**
 * Unit slips read from what a figure measures rather than from a phrasing (session 19): a hedge
 * written "like" as people write it in public ("co2 is like 0.04 ppm"), and the age of ice itself
 * (its own age, or the span of history it holds) written in millions where thousands were meant.
 * Every sentence is our own; each wrong one has a right twin that must stay clean.
 */
import { describe, expect, it } from 'vitest';
import { checkText } from '../../src/engine.js';
import { loadPacks } from '../../src/rulepack/index.js';

const packs = await loadPacks([]);
const OPENING = 'Ice cores show CO2 and temperature rising and falling together through the ice ages.\n\n';

/** The rule ids and corrections of every flag on the draft's last line. */
async function flagsOf(text: string): Promise<{ rule: string; correction: string }[]> {
  const result = await checkText(text, { path: 'draft.txt', packs });
  const last = text.split('\n').length;
  return result.flags.filter((f) => f.span.start.line === last).map((f) => ({ rule: f.ruleId, correction: f.correction ?? '' }));
}

describe('"like" before a figure is a hedge, as "about" is', () => {
  // CO2 is about 420 ppm today, 0.042% of the air (NOAA 2024); 1% = 10,000 ppm (NIST SP 811).
  it('reads "like 0.04 ppm" of the air as a percentage written in ppm', async () => {
    const flags = await flagsOf(`${OPENING}honestly carbon dioxide is like 0.04 ppm of the whole atmosphere`);
    expect(flags.map((f) => f.rule)).toContain('unit.percent-ppm');
    expect(flags.find((f) => f.rule === 'unit.percent-ppm')?.correction).toContain('0.04%');
  });
  it('reads "something like 4 percent" of the air as a share far above any level', async () => {
    const flags = await flagsOf(`${OPENING}the CO2 in the air is something like 4 percent of the air these days`);
    expect(flags.map((f) => f.rule)).toContain('unit.percent-ppm');
  });
  it('leaves a right share hedged with "like" clean', async () => {
    expect(await flagsOf(`${OPENING}honestly carbon dioxide is like 0.04 percent of the whole atmosphere`)).toEqual([]);
  });
  it('leaves "like" as a verb before a count clean', async () => {
    expect(await flagsOf(`${OPENING}I would like 3 copies of the CO2 poster for the school.`)).toEqual([]);
  });
});
