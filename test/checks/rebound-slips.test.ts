/**
 * A figure whose wrong unit keeps it from binding is read again in the unit it is confused with
 * (src/checks/rebound-slips.ts). Values: global mean CO2 in 2024 about 423.9 ppm (WMO Greenhouse Gas
 * Bulletin No. 21, 2025); Mauna Loa annual mean for 2024 about 424.6 ppm (NOAA GML co2_annmean_mlo.txt);
 * methane about 1,930 ppb and nitrous oxide about 337 ppb today, glacial methane near 370 ppb (from
 * memory). Factor: 1 ppm = 1,000 ppb (NIST SP 811, SI prefixes).
 */
import { describe, expect, it } from 'vitest';
import { reboundSlips } from '../../src/checks/rebound-slips.js';
import { bindQuantities } from '../../src/claims/bind.js';
import { checkText } from '../../src/engine.js';
import { parseQuantities } from '../../src/quantities/index.js';
import { loadPacks } from '../../src/rulepack/index.js';

const packs = await loadPacks([]);
const flagsOf = async (text: string) => (await checkText(text, { packs, format: 'markdown' })).flags.map((f): [string, string] => [f.ruleId, f.correction ?? '']);

describe('a figure bound in the unit it was meant in', () => {
  it.each([
    ['Today the air over the oceans holds roughly 425 parts per billion of the gas.', 'roughly 425 ppm (roughly 425,000 parts per billion)'],
    ['The observatory on Mauna Loa logged a 2024 annual mean of about 424.6 ppb.', 'about 424.6 ppm (about 424,600 ppb)'],
  ])('flags a CO2 level written in ppb whose ppm reading binds: %s', async (text, correction) => {
    expect(await flagsOf(text)).toContainEqual(['unit.scale-slip', correction]);
  });

  it('reads the level from the passage before when the gas is not named in the sentence', async () => {
    const flags = await flagsOf('Ice cores never show CO2 above about 300 ppm before the factories. By 2024 the worldwide annual mean had climbed to roughly 424 parts per billion.');
    expect(flags.filter(([id]) => id === 'unit.scale-slip')).toHaveLength(1);
  });

  it.each([
    'Methane is another story. Its 2024 global mean was about 1,930 ppb, and at the last glacial maximum it sat near 370 ppb.',
    'Methane doubled after industry. Today\'s air holds about 420 ppb of it.',
    'Nitrous oxide today is near 337 ppb.',
  ])('leaves a ppb figure of another gas alone: %s', async (text) => {
    expect((await flagsOf(text)).filter(([id]) => id.startsWith('unit.'))).toEqual([]);
  });

  it('gives a figure already bound to the reference check, and none twice', async () => {
    const text = 'The observatory on Mauna Loa logged a 2024 annual mean of about 424.6 ppm.';
    const qs = parseQuantities(text);
    const { bindings } = bindQuantities(text, qs, packs);
    expect(bindings).toHaveLength(1);
    expect(reboundSlips(text, qs, bindings, packs, (again) => bindQuantities(text, again, packs).bindings, [])).toEqual([]);
  });

  it('keeps nothing when the meant reading binds a value it does not fit', () => {
    // 24.6 ppb read as ppm is no Mauna Loa annual mean of 2024: a wrong figure, not a slip.
    const text = 'The observatory on Mauna Loa logged a 2024 annual mean of about 24.6 ppb.';
    const qs = parseQuantities(text);
    expect(reboundSlips(text, qs, [], packs, (again) => bindQuantities(text, again, packs).bindings, [])).toEqual([]);
  });
});
