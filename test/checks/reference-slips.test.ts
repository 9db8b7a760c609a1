/**
 * The right number in the wrong unit is a unit slip, not a value out of range.
 * Factors: NIST SP 811 (1 ft = 0.3048 m exactly; SI prefixes k = 10^3, M = 10^6).
 * Values: the EPICA Dome C core reached 3,270 m (EPICA community members 2004, Nature 429, 623-628,
 * doi 10.1038/nature02599, from memory); the Pleistocene began 2.58 million years ago (Gibbard et al.
 * 2010, Journal of Quaternary Science 25, 96-102, doi 10.1002/jqs.1338); global mean CO2 was about
 * 419 ppm in 2023 (NOAA GML global annual mean, from memory).
 */
import { describe, expect, it } from 'vitest';
import { CONFUSED_UNITS, confusedWith, unitSlip } from '../../src/checks/reference-slips.js';
import { checkText } from '../../src/engine.js';
import { convert, findUnit, parseQuantities } from '../../src/quantities/index.js';
import { loadPacks } from '../../src/rulepack/index.js';

const packs = await loadPacks([]);
const flagsOf = async (text: string) => (await checkText(text, { packs, format: 'markdown' })).flags.map((f) => [f.ruleId, f.correction ?? '']);

describe('a unit slip against a reference', () => {
  it('reads feet written for metres', () => {
    const [q] = parseQuantities('3,270 feet');
    expect(unitSlip({ low: 3260, high: 3280, unit: 'm' }, q!)?.correction).toBe('3,270 m (10,700 feet)');
  });

  it('keeps every figure the draft wrote in the meant unit', () => {
    // The Vostok core reached 3,623 m (Petit et al. 1999, Nature 399, 429-436, doi 10.1038/20859);
    // 1 ft = 0.3048 m (NIST SP 811): 3,623 m is 11,890 ft to four figures.
    const [q] = parseQuantities('3,623 ft');
    expect(unitSlip({ low: 3623, high: 3623, unit: 'm' }, q!)?.correction).toBe('3,623 m (11,890 ft)');
    const [p] = parseQuantities('3.62 miles');
    expect(unitSlip({ low: 3600, high: 3650, unit: 'm' }, p!)?.correction).toBe('3.62 km (2.25 miles)');
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

describe('feet written for metres where the period is set before a comparison', () => {
  // Sea level at the Last Glacial Maximum about 120-130 m lower than today (Clark et al. 2009,
  // Science 325, 710-714); 1 ft = 0.3048 m (NIST SP 811): 125 m is 410 ft.
  it('reads the period past a sentence that only compares with today', async () => {
    const flags = await flagsOf('During the last ice age thick ice covered Canada. Back then the world ran a few degrees colder than it is today. Sea level fell some 125 feet.');
    expect(flags).toContainEqual(['unit.scale-slip', 'some 125 m (some 410 feet)']);
  });

  it('reads the sea told at a level without its article ("Seas stood") as sea level', async () => {
    const flags = await flagsOf('During the last ice age great ice sheets covered Canada. Seas stood about 125 feet lower, and the coast lay far out.');
    expect(flags).toContainEqual(['unit.scale-slip', 'about 125 m (about 410 feet)']);
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
    expect(flags.find(([id]) => id === 'unit.scale-slip')?.[1]).toMatch(/^(?<hedge>(?:about |around )?)11,700 years ago \(\k<hedge>975\d (?:years )?B\.?C/u);
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

/**
 * The confused units are data (CONFUSED_UNITS), every reading goes through the unit table. Factors
 * checked against NIST SP 811 (Thompson & Taylor 2008, Special Publication 811, Appendix B.8 and B.9):
 * 1 ft = 0.3048 m and 1 mile = 1609.344 m exactly; a difference of 1 °F is 5/9 K, T/K = t/°C + 273.15
 * and t/°F = 1.8 t/°C + 32; SI prefixes k = 10^3, M = 10^6, G = 10^9; percent, per mille, ppm and ppb
 * are 10^-2, 10^-3, 10^-6 and 10^-9 of the air by volume.
 */
describe('the unit table behind the slips (NIST SP 811)', () => {
  it.each([
    [1, 'ft', 'm', 'length', 0.3048],
    [1, 'mi', 'm', 'length', 1609.344],
    [1, 'mi', 'km', 'length', 1.609344],
    [9, 'degF', 'K', 'temperature-change', 5],
    [295.15, 'K', 'degC', 'temperature', 22],
    [42.8, 'degF', 'degC', 'temperature', 6],
    [1, '%', 'ppm', 'concentration', 10_000],
    [1, 'permille', 'ppm', 'concentration', 1000],
    [1, 'ppm', 'ppb', 'concentration', 1000],
    [1, 'Ma', 'ka', 'age', 1000],
  ] as const)('%s %s is %s %s', (value, from, to, dimension, expected) => {
    expect(convert(value, from, to, dimension)).toBeCloseTo(expected, 9);
  });

  it('lists every confused unit in the unit table, in its dimension', () => {
    for (const group of CONFUSED_UNITS) for (const id of group.units) expect(findUnit(id, group.dimension), `${id} (${group.dimension})`).toBeDefined();
  });

  it('derives the slips of a rate from its amount and its per-time unit', () => {
    expect(confusedWith('ppm/yr', 'concentration-rate')).toEqual(expect.arrayContaining(['ppb/yr', 'ppm/decade']));
    expect(confusedWith('ppm/yr', 'concentration-rate')).not.toContain('ppm/century');
    expect(confusedWith('m/yr', 'length-rate')).toEqual(expect.arrayContaining(['ft/yr', 'm/decade']));
    expect(confusedWith('degC/century', 'temperature-rate')).toEqual(expect.arrayContaining(['degF/century', 'degC/decade', 'degC/kyr']));
  });

  it('reads per mille as a share of the air', () => {
    const [q] = parseQuantities('0.42 ‰');
    expect([q?.dimension, q?.value]).toEqual(['concentration', 420]);
  });
});

describe('unit slips of every dimension, through the engine', () => {
  // Sea level at the LGM about 120-135 m below present (Lambeck et al. 2014, PNAS 111, 15296-15303,
  // doi 10.1073/pnas.1411762111); Vostok drilled to 3,623 m (Petit et al. 1999, Nature 399, 429-436,
  // doi 10.1038/20859); central Greenland 15-25 K colder at the LGM (Dahl-Jensen et al. 1998, Science
  // 282, 268-271, doi 10.1126/science.282.5387.268); CO2 about 280 ppm before industry (IPCC AR6 WGI
  // ch. 2, Gulev et al. 2021); the Pleistocene began 2.58 million years ago (Gibbard et al. 2010, JQS 25,
  // 96-102); the EPICA Dome C record spans 800,000 years (Jouzel et al. 2007, Science 317, 793-796);
  // CO2 grew by about 2.4 ppm a year in the 2010s (NOAA GML global growth rates, from memory).
  it.each([
    ['At the Last Glacial Maximum sea level stood some 120 feet lower than today.', /^some 120 m \(some .*feet\)$/u],
    ['The Vostok ice core was drilled to a depth of 3.6 miles.', /^3\.6 km \(.*miles\)$/u],
    ['At the Last Glacial Maximum central Greenland was about 40 °C colder than today.', /^about 40 °F \(about 22 °C\)$/u],
    ['Greenland at the Last Glacial Maximum: a cooling of 40 degrees Celsius at the summit.', /^40 °F \(22 degrees Celsius\)$/u],
    ['At the Last Glacial Maximum the Greenland summit saw a drop of 295 K.', /^22 K \(295 K is an absolute temperature, 22 °C, not a difference\)$/u],
    ['Before industry, CO2 stood at 280 parts per billion.', /^280 ppm \(280,000 parts per billion\)$/u],
    ['The Pleistocene began 2.58 thousand years ago.', /^2\.58 million years ago \(million, not thousand\)$/u],
    ['The ice sheets held their greatest extent between 26.5 and 19 million years ago.', /^between 26\.5 and 19 thousand years ago \(thousand, not million\)$/u],
    ['Examiners should accept 800 million years for the EPICA Dome C record.', /^800 thousand years \(thousand, not million\)$/u],
    ['In the 2010s CO2 grew by about 2.4 ppm per decade.', /^about 2\.4 ppm per year \(about 24 ppm per decade\)$/u],
  ])('%s', async (text, correction) => {
    const flags = await flagsOf(text);
    expect(flags.map(([id]) => id)).toEqual(['unit.scale-slip']);
    expect(flags[0]?.[1]).toMatch(correction);
  });

  it.each([
    // Look-alikes that stay as they are: the right figure with its conversion, a wrong number in the
    // right unit (a value flag), and a figure that fits in no unit (a value flag).
    ['At the Last Glacial Maximum sea level stood some 400 feet (120 metres) lower than today.', []],
    ['At the Last Glacial Maximum central Greenland was about 20 °C (36 °F) colder than today.', []],
    ['At the Last Glacial Maximum central Greenland was about 30 °C colder than today.', ['value.greenland-lgm-cooling']],
    ['The Vostok ice core was drilled to a depth of 2.9 kilometres.', ['value.vostok-drilled-depth']],
    ['Before industry, CO2 stood at 350 ppm.', ['value.co2-preindustrial-1750']],
    ['At the Last Glacial Maximum sea level stood some 60 metres lower than today.', ['value.lgm-sea-level-lowstand']],
  ])('%s', async (text, ids) => {
    expect((await flagsOf(text)).map(([id]) => id)).toEqual(ids);
  });
});

describe('near units (°F and °C differences, miles and kilometres) need a reading in the middle of the reference', () => {
  // Equilibrium climate sensitivity 2.5-4 K likely, 2-5 K very likely (IPCC AR6 WGI ch. 7, Forster et
  // al. 2021); global LGM cooling some 5-7 K (IPCC AR6 WGI ch. 2; Tierney et al. 2020, Nature 584,
  // 569-573); Beyond EPICA reached bedrock at about 2.8 km (IPEV 2025, from memory).
  it.each([
    ['Equilibrium climate sensitivity is something like 8 to 10 degrees of warming per doubling.', 'value.'],
    ['At the Last Glacial Maximum the world was some 12 °C colder on average than before industry.', 'value.'],
    ['Beyond EPICA at Little Dome C reached bedrock in January 2025 at about 1.8 km down.', 'value.'],
  ])('%s stays a value flag', async (text, prefix) => {
    const ids = (await flagsOf(text)).map(([id]) => id);
    expect(ids).not.toContain('unit.scale-slip');
    expect(ids.some((id) => id?.startsWith(prefix))).toBe(true);
  });

  it("reads a figure that is a regional record's own size as that record told as global, not as a slip", async () => {
    // 10 °F of cooling would be 5.6 K (NIST SP 811, B.9), inside the global range; but 10 °C is the
    // Antarctic deglacial warming (8-11 °C, Jouzel et al. 2007, Science 317, 793-796), which the
    // pack names as the regional version of the global value: that explanation comes first.
    const ids = (await flagsOf('At the Last Glacial Maximum the planet saw a global cooling of 10 degrees Celsius.')).map(([id]) => id);
    expect(ids).toEqual(['value.gmst-lgm-to-preindustrial-warming']);
  });

  it('reads a Fahrenheit difference written as Celsius where no regional record has that size', async () => {
    // Central Greenland 15-25 K colder at the LGM, best estimate 22 K (Dahl-Jensen et al. 1998); 39 °F is 21.7 K.
    expect((await flagsOf('At the Last Glacial Maximum central Greenland cooled by roughly 39 degrees Celsius.')).map(([id]) => id)).toEqual(['unit.scale-slip']);
  });

  it('keeps the thousand-for-million rule of a subject with a ceiling, with no second flag', async () => {
    // EPICA Dome C spans about 800,000 years (Jouzel et al. 2007); src/checks/units-scale.ts.
    expect((await flagsOf('The EPICA Dome C core holds a record of 800 million years.')).map(([id]) => id)).toEqual(['unit.age-scale']);
  });
});
