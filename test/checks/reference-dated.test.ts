/**
 * A figure given for one calendar year is that year's measurement (src/checks/reference-dated.ts):
 * "about" widens it by at most half a percent, so a figure a few years out of date is flagged while a
 * rounded right figure passes. Sentences of our own, read by the real parser, binder and check.
 *
 * Global annual means of CO2 (NOAA GML, Lan, Tans & Thoning, doi:10.15138/9N0H-ZH07; WMO Greenhouse
 * Gas Bulletins): 2019 about 410 ppm, 2023 about 419.3 ppm, 2024 about 423.9 ppm.
 */
import { describe, expect, it } from 'vitest';
import { bindQuantities } from '../../src/claims/bind.js';
import { checkReferences } from '../../src/checks/reference.js';
import { ONE_YEAR_SLACK, isOneYearMeasurement } from '../../src/checks/reference-dated.js';
import { parseQuantities } from '../../src/quantities/index.js';
import { loadPacks } from '../../src/rulepack/index.js';

const packs = await loadPacks([]);

function judge(sentence: string): { value: string; verdict: string } {
  const quantities = parseQuantities(sentence);
  const { bindings } = bindQuantities(sentence, quantities, packs);
  const { verdicts } = checkReferences(sentence, quantities, bindings, packs);
  const i = bindings.findIndex((b) => quantities[b.quantityIndex]?.dimension === 'concentration');
  return { value: bindings[i]?.referenceId ?? '-', verdict: verdicts[i] ?? '-' };
}

describe('a figure for one year, a few years out of date, is flagged', () => {
  it.each([
    ['In 2023 the world-wide mean of carbon dioxide stood at about 411 ppm.', 'co2-global-2023'],
    ['For 2024, NOAA put global carbon dioxide at roughly 414 ppm.', 'co2-global-2024'],
    ['Global CO2 averaged approximately 402 ppm across 2019.', 'co2-global-2019'],
  ])('%s', (sentence, value) => {
    expect(judge(sentence)).toEqual({ value, verdict: 'conflicts' });
  });
});

describe('a rounded right figure for one year passes', () => {
  it.each([
    ['In 2023 the world-wide mean of carbon dioxide stood at about 420 ppm.', 'co2-global-2023'],
    ['For 2024, NOAA put global carbon dioxide at roughly 424 ppm.', 'co2-global-2024'],
    ['Global CO2 averaged approximately 410 ppm across 2019.', 'co2-global-2019'],
    ['In 2023 global carbon dioxide came to some 418 ppm.', 'co2-global-2023'],
  ])('%s', (sentence, value) => {
    expect(judge(sentence)).toEqual({ value, verdict: 'agrees' });
  });
});

describe('which values are one year\'s measurement', () => {
  it('a value bound by a year term is; a value bound by a decade or none is not', () => {
    const of = (id: string): boolean => isOneYearMeasurement(packs.reference(id) as NonNullable<ReturnType<typeof packs.reference>>, packs);
    expect(of('co2-global-2023')).toBe(true);
    expect(of('co2-growth-2010s')).toBe(false);
    expect(of('co2-highest-preindustrial-800kyr')).toBe(false);
    // About a year of growth at ~2.4 ppm a year (NOAA GML growth rates) on ~420 ppm.
    expect(ONE_YEAR_SLACK * 420).toBeCloseTo(2.1, 5);
  });
});
