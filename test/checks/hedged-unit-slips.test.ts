/**
 * A near unit's slip on the reference's own figure: "about 6 °F colder" of the global glacial
 * cooling, which only its hedge brings inside the range, and a range whose two ends are the
 * reference's ends in the other unit (src/checks/reference.ts writtenOutside, reference-slips.ts
 * nearMinDistance). Values: global mean cooling at the Last Glacial Maximum about 6 °C, 5 to 7 °C
 * (IPCC AR6 WGI, Gulev et al. 2021, ch. 2, doi 10.1017/9781009157896.004); East Antarctic glacial
 * cooling 4 to 7 °C (Buizert et al. 2021, Science 372, 1097-1101, doi 10.1126/science.abd2897).
 * Factor: a difference of 1 °F is 5/9 K (NIST SP 811, 2008).
 */
import { describe, expect, it } from 'vitest';
import { checkText } from '../../src/engine.js';
import { loadPacks } from '../../src/rulepack/index.js';

const packs = await loadPacks([]);
const flagsOf = async (text: string) => (await checkText(text, { packs, format: 'text' })).flags.map((f): [string, string] => [f.ruleId, f.correction ?? '']);

describe('a slip that only the hedge kept in range', () => {
  it('reads "about 6 °F colder" of the global glacial cooling as 6 °C written in Fahrenheit', async () => {
    expect(await flagsOf('Averaged over the globe, the last ice age was about 6 °F colder than the pre-industrial world.')).toEqual([['unit.scale-slip', 'about 6 °C (about 11 °F)']]);
  });

  it.each([
    'Averaged over the globe, the last ice age was about 4 °C colder than the pre-industrial world.',
    'Averaged over the globe, the last ice age was about 11 °F colder than the pre-industrial world.',
    // Outside the range as written, but 3.4 °F is no reading of the reference: no slip is made up.
    'Averaged over the globe, the last ice age was about 3.4 °C colder than the pre-industrial world.',
  ])('leaves a figure whose written number fits, or that fits in no other unit: %s', async (text) => {
    expect((await flagsOf(text)).filter(([id]) => id === 'unit.scale-slip')).toEqual([]);
  });
});

describe("a range whose ends are the reference's own in another unit", () => {
  it('reads "4 to 7 °F" of the East Antarctic cooling as the 4 to 7 °C of the reference', async () => {
    const flags = await flagsOf('Borehole temperatures show East Antarctica was some 4 to 7 °F colder in the glacial than now.');
    expect(flags.map(([id]) => id)).toEqual(['unit.scale-slip']);
  });

  it.each([
    'Borehole temperatures show East Antarctica was some 7 to 13 °F colder in the glacial than now.',
    'Borehole temperatures show East Antarctica was some 4 to 7 °C colder in the glacial than now.',
  ])('leaves the range right in either unit: %s', async (text) => {
    expect(await flagsOf(text)).toEqual([]);
  });
});
