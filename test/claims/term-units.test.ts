/**
 * A bare number after a term the pack gives one unit (src/claims/term-units.ts): "CO2 was around
 * 350" is 350 ppm. Sentences of our own. Pre-industrial CO2 about 278 ppm in 1750 (Gulev et al.
 * 2021, IPCC AR6 WG1 ch. 2); glacial minima about 180-200 ppm (Lüthi et al. 2008, Nature 453,
 * 379-382).
 */
import { describe, expect, it } from 'vitest';
import { checkText } from '../../src/engine.js';

const rules = async (text: string) => (await checkText(`${text}\n`, { format: 'markdown' })).flags.map((f) => f.ruleId);

describe('a bare number after CO2 is read in ppm', () => {
  it.each([
    ['Before the industrial revolution CO2 was around 350.', 'value.co2-preindustrial-1750'],
    // "The depths of the last ice age" is the Last Glacial Maximum (a description, bind-descriptions.ts): the LGM level.
    ['In the depths of the last ice age, carbon dioxide sat around 100, tops.', 'value.co2-lgm'],
  ])('flags %j', async (text, rule) => {
    expect(await rules(text)).toContain(rule);
  });

  it.each([
    'Before the industrial revolution CO2 was around 280.',
    // A count with its noun, a year, or another gas named: no ppm.
    'Carbon dioxide was measured in 2 cores from the Dome C site.',
    'CO2 levels in the ice record were first published in 1980.',
    'Methane and CO2 rose together; methane went from about 350 to 700.',
  ])('passes %j', async (text) => {
    expect(await rules(text)).toEqual([]);
  });
});
