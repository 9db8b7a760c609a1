/**
 * A figure in ppm names its gas: in writing about ice cores, CO2 is given in parts per million while
 * methane and nitrous oxide are given in parts per billion (common practice; NOAA GML reports CO2 in
 * ppm and CH4 and N2O in ppb). So a CO2 figure binds even when the sentence says "it" or "the air"
 * instead of "CO2", and never when the sentence names another gas.
 * Values: glacial CO2 about 180-190 ppm and interglacial peaks about 280-300 ppm over 800,000 years
 * (Lüthi et al. 2008, Nature 453, 379-382, doi 10.1038/nature06949); pre-industrial 278 ppm in 1750
 * (IPCC AR6 WGI, Gulev et al. 2021, ch. 2).
 */
import { describe, expect, it } from 'vitest';
import { parseQuantities } from '../../src/quantities/index.js';
import { bindQuantities } from '../../src/claims/bind.js';
import { restoreElidedUnits } from '../../src/claims/elided-units.js';
import { checkText } from '../../src/engine.js';
import { loadPacks } from '../../src/rulepack/index.js';

const packs = await loadPacks([]);
const bound = (sentence: string): string[] => {
  const quantities = restoreElidedUnits(sentence, parseQuantities(sentence));
  return bindQuantities(sentence, quantities, packs).bindings.map((b) => b.referenceId);
};
const valueFlags = async (text: string): Promise<string[]> =>
  (await checkText(text, { packs, format: 'markdown' })).flags.filter((f) => f.ruleId.startsWith('value.')).map((f) => f.ruleId);

describe('a figure in ppm names CO2', () => {
  it('binds a glacial level given as "it" in the sentence', () => {
    expect(bound('During the coldest glacial spells it sank to about 120 ppm.')).toContain('co2-glacial-minimum-typical');
  });

  it('flags the highest natural level given only in ppm', async () => {
    // "The interglacials topped out at" is each warm period's own peak (240-300 ppm, Lüthi et al. 2008),
    // which the record's ceiling (about 300 ppm) bounds: either reference corrects the 360 ppm.
    const flags = await valueFlags('Over 800,000 years of ice-core air, the warm interglacials topped out at roughly 360 ppm.');
    expect(flags.filter((id) => ['value.co2-highest-preindustrial-800kyr', 'value.co2-interglacial-maximum-typical'].includes(id))).toHaveLength(1);
  });

  it('binds nothing when the sentence names another gas', () => {
    expect(bound('During the glacial spells methane sank to about 0.35 ppm.')).toEqual([]);
  });

  it('reads a ceiling of the record ("no sample exceeds") as no 1750 level', () => {
    expect(bound('No pre-industrial sample in the ice exceeds about 300 ppm.')).not.toContain('co2-preindustrial-1750');
  });
});

describe('"a century or two" counts centuries', () => {
  it('gives the bare "two" no unit from an earlier figure', () => {
    const sentence = 'There were abrupt jumps of 10 to 15 ppm, each within a century or two.';
    const quantities = restoreElidedUnits(sentence, parseQuantities(sentence));
    expect(quantities.filter((q) => q.dimension === 'concentration').map((q) => q.text)).toEqual(['10 to 15 ppm']);
  });
});

describe('a date beside one end of a change belongs to that end', () => {
  // Common practice in writing a change: "from A in YEAR to B" dates A, not B.
  it('does not read the far end of "from 280 ppm in 1750 to 420 ppm" as the 1750 level', () => {
    const sentence = 'CO2 went from 280 ppm in 1750 to 420 ppm.';
    const quantities = restoreElidedUnits(sentence, parseQuantities(sentence));
    const far = quantities.findIndex((q) => q.text === '420 ppm');
    const { bindings } = bindQuantities(sentence, quantities, packs);
    expect(bindings.find((b) => b.quantityIndex === far)).toBeUndefined();
    expect(bindings.map((b) => b.referenceId)).toContain('co2-preindustrial-1750');
  });
});

/**
 * A yearly rate in ppm names CO2 as a level in ppm does, when the sentence dates it to the present
 * or to a decade: NOAA GML reports the growth of CO2 per year, about 0.8 ppm/yr in the 1960s and about
 * 2.4 ppm/yr in the 2010s (Lan et al., NOAA GML "Trends in CO2", annual mean growth rates), and about
 * 2-3.5 ppm/yr in 2020-2024. A pace set against a period of the past, or told with no time, says
 * nothing of whose pace it is by its unit alone.
 */
describe('a dated yearly rate in ppm names CO2', () => {
  it('binds a decade\'s growth told of "the level"', () => {
    expect(bound('Through the 1960s the level crept up by roughly 0.8 ppm each year.')).toEqual(['co2-growth-1960s']);
  });

  it('flags a wrong decade growth told with a pronoun', async () => {
    expect(await valueFlags('Back when I started at the observatory, CO2 was the talk of the lab. In the 2010s it climbed by about 0.6 ppm per year.')).toContain(
      'value.co2-growth-2010s',
    );
  });

  it('binds the present growth told with "now"', () => {
    expect(bound('Out on the mountain the readings are now going up by roughly 2.5 ppm a year.')).toEqual(['co2-growth-recent']);
  });

  it('binds nothing for an undated pace set against the deglaciation', () => {
    expect(bound('That pace, about 2 ppm a year, dwarfs anything in the deglaciation.')).toEqual([]);
  });

  it('binds nothing for a pace per century', () => {
    expect(bound('Today the air gains about 1 ppm per century in that reconstruction.')).toEqual([]);
  });

  it('dates only the rate beside the date: a pace set against it past another rate stays unbound', () => {
    const sentence = 'In 2024 it was 3.5 ppm a year against some 0.01 ppm a year.';
    const quantities = restoreElidedUnits(sentence, parseQuantities(sentence));
    const far = quantities.findIndex((q) => q.text.includes('0.01'));
    expect(bindQuantities(sentence, quantities, packs).bindings.find((b) => b.quantityIndex === far)).toBeUndefined();
  });

  it('binds nothing when another gas is named', () => {
    expect(bound('In the 2010s methane rose by about 8 ppb a year.')).toEqual([]);
  });
});
