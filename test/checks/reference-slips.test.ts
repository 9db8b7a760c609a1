/**
 * The right number in the wrong unit is a unit slip, not a value out of range.
 * Factors: NIST SP 811 (1 ft = 0.3048 m exactly; SI prefixes k = 10^3, M = 10^6).
 * Values: the EPICA Dome C core reached 3,270 m (EPICA community members 2004, Nature 429, 623-628,
 * doi 10.1038/nature02599, from memory); the Pleistocene began 2.58 million years ago (Gibbard et al.
 * 2010, Journal of Quaternary Science 25, 96-102, doi 10.1002/jqs.1338); global mean CO2 was about
 * 419 ppm in 2023 (NOAA GML global annual mean, from memory).
 */
import { describe, expect, it } from 'vitest';
import { unitSlip } from '../../src/checks/reference-slips.js';
import { checkText } from '../../src/engine.js';
import { parseQuantities } from '../../src/quantities/index.js';
import { loadPacks } from '../../src/rulepack/index.js';

const packs = await loadPacks([]);
const flagsOf = async (text: string) => (await checkText(text, { packs, format: 'markdown' })).flags.map((f) => [f.ruleId, f.correction ?? '']);

describe('a unit slip against a reference', () => {
  it('reads feet written for metres', () => {
    const [q] = parseQuantities('3,270 feet');
    expect(unitSlip({ low: 3260, high: 3280, unit: 'm' }, q!)?.correction).toBe('3,270 m (10,700 feet)');
  });

  it('reads a thousand-fold slip of a date', () => {
    const [q] = parseQuantities('2.58 kyr ago');
    expect(unitSlip({ low: 2_580_000, high: 2_580_000, unit: 'yr BP' }, q!)?.correction).toBe('2.58 Ma');
  });

  it('keeps the number of the draft and swaps the prefix when millions were written for thousands', () => {
    // The Younger Dryas began about 12,900 years ago (Rasmussen et al. 2006, JGR 111, D06102,
    // doi 10.1029/2005JD006079, from memory): "12.9 Ma" meant 12.9 ka.
    const [q] = parseQuantities('12.9 Ma');
    expect(unitSlip({ low: 12_800, high: 12_900, unit: 'yr BP' }, q!)?.correction).toBe('12.9 ka');
  });

  it('finds no slip where no reading fits', () => {
    const [q] = parseQuantities('1,200 feet');
    expect(unitSlip({ low: 3260, high: 3280, unit: 'm' }, q!)).toBeUndefined();
  });

  it('flags the slip through the engine, with the figure in the right unit', async () => {
    const flags = await flagsOf('The EPICA Dome C ice core was drilled to a depth of 3,270 feet.');
    expect(flags).toContainEqual(['unit.scale-slip', '3,270 m (10,700 feet)']);
    expect(flags.map(([id]) => id)).not.toContain('value.edc-drilled-depth');
  });

  it('keeps a plain value flag when no unit reading fits', async () => {
    const flags = await flagsOf('The EPICA Dome C ice core was drilled to a depth of 1,200 metres.');
    expect(flags.map(([id]) => id).some((id) => id?.startsWith('value.'))).toBe(true);
    expect(flags.map(([id]) => id)).not.toContain('unit.scale-slip');
  });
});

describe('metres written for feet', () => {
  // Sea level at the Last Glacial Maximum about 120-130 m lower than today (Clark et al. 2009,
  // Science 325, 710-714, doi 10.1126/science.1172873); 1 ft = 0.3048 m (NIST SP 811).
  it.each([
    'At the peak of the last ice age the seas stood 400 metres lower.',
    'Sea level at the Last Glacial Maximum was about 410 m below today.',
    'At the last glacial maximum sea level fell by roughly 420 metres.',
  ])('%s is a unit slip', async (text) => {
    expect((await flagsOf(text)).map(([id]) => id)).toEqual(['unit.scale-slip']);
  });

  it('a wrong figure that no unit explains stays a value flag', async () => {
    expect((await flagsOf('At the Last Glacial Maximum sea level was about 60 metres lower.')).map(([id]) => id)).toEqual(['value.lgm-sea-level-lowstand']);
  });

  it('the right figure in metres is clean', async () => {
    expect(await flagsOf('At the Last Glacial Maximum sea level was about 125 metres lower.')).toEqual([]);
  });
});

describe('BCE written for years before present', () => {
  // The base of the Holocene: 11,700 years before AD 2000 in the NGRIP ice core (Walker et al. 2009,
  // Journal of Quaternary Science 24, 3-17, doi 10.1002/jqs.1227), i.e. about 9,700 BCE; Y BCE =
  // (1949 + Y) years BP (Stuiver & Polach 1977 for BP; no year 0: common practice).
  it.each([
    'The Holocene began around 11,700 BC.',
    'Our present warm period, the Holocene, started about 11,700 BCE.',
    'The Holocene began 11,700 years BCE, when the ice sheets were in retreat.',
    'By 11,700 B.C. the Holocene had begun.',
  ])('%s', async (text) => {
    const flags = await flagsOf(text);
    expect(flags.map(([id]) => id)).toContain('unit.scale-slip');
    expect(flags.find(([id]) => id === 'unit.scale-slip')?.[1]).toMatch(/^11,700 years ago \((?:about |around )?975\d (?:years )?B\.?C/u);
    expect(flags.map(([id]) => id)).not.toContain('value.holocene-start');
  });

  it('reads a year word before the era as a date, not a duration', () => {
    const [q] = parseQuantities('11,700 years BCE');
    expect([q?.dimension, q?.statedUnit, q?.value]).toEqual(['age', 'BCE', 11_700 + 1949]);
  });

  it.each([
    // Look-alikes: the right era, and a date told in years ago that is simply wrong.
    ['The Holocene began around 9,700 BCE.', []],
    ['The Holocene began about 11,700 years ago.', []],
    ['The Holocene began around 9,000 years ago.', ['value.holocene-start']],
  ])('%s', async (text, ids) => {
    expect((await flagsOf(text)).map(([id]) => id)).toEqual(ids);
  });
});
