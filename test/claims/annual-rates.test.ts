/**
 * A change in CO2 told over one year is that year's growth rate (src/claims/annual-rates.ts): two
 * calendar years a year apart, a word that makes the change yearly ("annual", "one-year") or one
 * calendar year the change happened in ("in 2024"). Sentences of our own, in several wordings, through
 * the whole engine; correct figures and levels told the same way must stay clean.
 *
 * Reference values:
 * - the global increase from 2023 to 2024 was about 3.5 ppm, the largest on record: WMO Greenhouse Gas
 *   Bulletin No. 21 (2025); NOAA GML annual mean global growth rates (Lan, Tans and Thoning,
 *   doi:10.15138/9N0H-ZH07);
 * - the mean global growth rate of the 1960s was about 0.8 ppm per year and of the 2010s about 2.4 ppm
 *   per year: NOAA GML annual mean growth rates (same data set);
 * - the global mean in 2024 was about 424 ppm (WMO Bulletin No. 21); the pre-industrial level about
 *   278 ppm (IPCC AR6 WGI, Gulev et al. 2021, ch. 2).
 */
import { describe, expect, it } from 'vitest';
import { readAnnualRates } from '../../src/claims/annual-rates.js';
import { checkText } from '../../src/engine.js';
import { parseQuantities } from '../../src/quantities/index.js';
import { loadPacks } from '../../src/rulepack/index.js';

const packs = await loadPacks([]);
const valueFlags = async (text: string): Promise<string[]> =>
  (await checkText(text, { packs, format: 'markdown' })).flags.filter((f) => f.ruleId.startsWith('value.')).map((f) => f.ruleId);
const rates = (sentence: string): string[] =>
  readAnnualRates(sentence, parseQuantities(sentence), packs)
    .filter((q) => q.dimension === 'concentration-rate')
    .map((q) => q.text);

describe('a CO2 change told over one year is the growth rate of that year', () => {
  it.each([
    // Two calendar years a year apart (WMO 2025: about 3.5 ppm from 2023 to 2024).
    'Global CO2 went up by only 1.2 ppm between 2023 and 2024.',
    'From 2023 to 2024 the amount of carbon dioxide in the air grew by roughly 1.4 ppm.',
    'The 2024 increase in CO2 over 2023 was 1.6 ppm, the biggest annual jump yet.',
    'Carbon dioxide rose just 1.1 ppm between 2023 and 2024, the largest one-year jump on record.',
    // One calendar year the change happened in.
    'CO2 only went up about 1 ppm in 2024, a fairly ordinary year.',
    'In 2024 atmospheric CO2 jumped by about 1.5 ppm.',
    'During 2024 carbon dioxide climbed by 0.9 ppm.',
  ])('flags a wrong 2023-2024 increase: %s', async (sentence) => {
    expect(await valueFlags(sentence)).toContain('value.co2-growth-2024');
  });

  it.each([
    // NOAA GML: the 1960s averaged about 0.8 ppm per year.
    'In the 1960s the annual CO2 rise averaged about 2 ppm.',
    'Back in the 1960s the yearly increase in carbon dioxide was close to 2.5 ppm.',
  ])('flags a wrong yearly rise of a decade: %s', async (sentence) => {
    expect(await valueFlags(sentence)).toContain('value.co2-growth-1960s');
  });

  it.each([
    // The right figures, in the same wordings, stay clean (WMO 2025; NOAA GML).
    'Global CO2 went up by about 3.5 ppm between 2023 and 2024.',
    'CO2 rose by roughly 3.6 ppm in 2024, the largest one-year jump on record.',
    'The 2024 increase in CO2 over 2023 was about 3.5 ppm.',
    'In the 1960s the annual CO2 rise averaged about 0.8 ppm.',
  ])('leaves a right figure clean: %s', async (sentence) => {
    expect(await valueFlags(sentence)).toEqual([]);
  });
});

describe('a level told with a year stays a level', () => {
  it.each([
    'CO2 rose to about 424 ppm in 2024.',
    'CO2 climbed past 424 ppm in 2024.',
    'In 2024 the annual mean CO2 level was about 424 ppm.',
    'CO2 was about 424 ppm in 2024, up from about 421 ppm in 2023.',
  ])('reads no rate in: %s', (sentence) => {
    expect(rates(sentence)).toEqual([]);
  });

  it('reads no rate in a change counted from another time (pre-industrial, 1750)', () => {
    // A rise of about 146 ppm since 1750 (278 to 424 ppm: IPCC AR6; WMO 2025) is no one-year change.
    expect(rates('Since 1750 CO2 has risen by about 146 ppm, to about 424 ppm in 2024.')).toEqual([]);
    expect(rates('By 2024 CO2 had gained about 146 ppm over its pre-industrial level.')).toEqual([]);
  });

  it('reads no rate across years more than one apart', () => {
    // 1960 to 2024 is a span of decades (common practice: a change over many years is no yearly rate).
    expect(rates('Between 1960 and 2024 CO2 rose by about 107 ppm.')).toEqual([]);
  });

  it('reads the change, not the level, in one sentence holding both', () => {
    expect(rates('In 2024 CO2 rose by about 3.5 ppm, to about 424 ppm.')).toEqual(['about 3.5 ppm']);
  });

  it('gives a noun of change the figure after it, and leaves a level before the noun a level', () => {
    // The global mean was about 421 ppm in 2023 and the 2023-2024 increase about 3.5 ppm (WMO 2025; NOAA GML).
    expect(rates('the global mean sat near 421 ppm in 2023, and the 2024 increase came to about 3.5 ppm.')).toEqual(['about 3.5 ppm']);
  });

  it('flags neither figure of a level and a yearly increase told together', async () => {
    expect(await valueFlags('The global mean sat near 421 ppm in 2023, and the 2024 increase came to about 3.5 ppm.')).toEqual([]);
  });
});
