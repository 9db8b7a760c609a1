/**
 * Unit slips that unseen writing makes: each cause with sentences of our own in several wordings, and
 * correct look-alikes that must stay clean.
 *
 * Conversion factors: NIST SP 811 (Thompson & Taylor 2008), Appendix B.8 and B.9: a difference of
 * 1 °F is 5/9 K (so 11 °F is 6.1 K and 18 °F is 10 K), t/°F = 1.8 t/°C + 32 for readings only;
 * percent is 10^-2 and ppm 10^-6 of the air, so 420 ppm is 0.042 percent.
 * Age conventions: BP counts years before AD 1950 (Stuiver & Polach 1977, Radiocarbon 19, 355-363);
 * b2k counts years before AD 2000 (Walker et al. 2009, Journal of Quaternary Science 24, 3-17), so
 * BP = b2k − 50; Y BCE = 1949 + Y years BP (no year 0: common practice).
 * Reference values are the pack's, with the pack's sources: global cooling at the Last Glacial
 * Maximum about 6 °C, 3.5-7.5 °C (Annan et al. 2022; IPCC AR6 WGI ch. 2 and 7); Greenland warming
 * at the end of the Younger Dryas about 10 °C, 6-14 °C (Grachev & Severinghaus 2005; Buizert et al.
 * 2014); sea level at the LGM 120-135 m below present (Lambeck et al. 2014, PNAS 111, 15296-15303);
 * the Holocene base 11,700 b2k (Walker et al. 2009).
 */
import { describe, expect, it } from 'vitest';
import { checkText } from '../../src/engine.js';
import { loadPacks } from '../../src/rulepack/index.js';

const packs = await loadPacks([]);
const flagsOf = async (text: string) => (await checkText(text, { packs, format: 'markdown' })).flags.map((f) => [f.ruleId, f.correction ?? '']);
const idsOf = async (text: string) => (await flagsOf(text)).map(([id]) => id);

describe('a Fahrenheit difference written as Celsius, where the figure is also a regional size', () => {
  // 11 °F is 6.1 °C, the global cooling; 11 °C is also the size of an Antarctic cooling, but a
  // sentence that names no regional record is told in the wrong unit, not about the wrong place.
  it.each([
    'At the height of the last glacial period the planet as a whole was roughly 11 °C colder than in pre-industrial times.',
    'Averaged over the globe, the Last Glacial Maximum was about 11 degrees Celsius cooler than before industrialisation.',
    'The last ice age was at its coldest some 21,000 years ago. Back then the whole world was about 11 degrees Celsius colder than before industry.',
  ])('%s is a unit slip with the reading in °F', async (text) => {
    const flags = await flagsOf(text);
    expect(flags.map(([id]) => id)).toEqual(['unit.scale-slip']);
    expect(flags[0]?.[1]).toMatch(/^(?<hedge>about |roughly )11 °F \(\k<hedge>6\.1 /u);
  });

  it('keeps the regional explanation when the sentence names the regional record', async () => {
    expect(await idsOf('At the Last Glacial Maximum Antarctica was some 11 °C colder, and so was the whole planet.')).toEqual(['scope.regional-record-as-global']);
  });

  it.each([
    // 12 °F is 6.7 °C and 9 °F is 5 °C: neither holds the best estimate of 6 °C, so they stay wrong values.
    ['At the Last Glacial Maximum the planet was some 12 °C colder than before industry.', ['value.gmst-lgm-to-preindustrial-warming']],
    ['At the Last Glacial Maximum the planet was some 9 °C colder than before industry.', ['value.gmst-lgm-to-preindustrial-warming']],
    ['At the height of the last glacial period the planet as a whole was roughly 6 °C colder than in pre-industrial times.', []],
  ])('%s', async (text, ids) => {
    expect(await idsOf(text)).toEqual(ids);
  });
});

describe('a Fahrenheit difference written as Celsius, a little outside the range', () => {
  it.each([
    'When the Younger Dryas ended, central Greenland warmed by around 18 °C in a few decades.',
    "Greenland's temperature jumped about 18 degrees Celsius at the close of the Younger Dryas.",
    'The Younger Dryas cold spell lasted about 1,200 years. When it ended, Greenland warmed by around 18 °C within a few decades.',
  ])('%s is 18 °F (10 °C) written as °C', async (text) => {
    const flags = await flagsOf(text);
    expect(flags.map(([id]) => id)).toEqual(['unit.scale-slip']);
    expect(flags[0]?.[1]).toMatch(/^(?<hedge>around |about )18 °F \(\k<hedge>10 /u);
  });

  it.each([
    // The right figure in either unit, and a wrong one that no unit explains (16 °F is 8.9 °C, off the best estimate).
    ["Greenland's temperature jumped about 18 degrees Fahrenheit at the close of the Younger Dryas.", []],
    ['At the end of the Younger Dryas, Greenland warmed by about 10 °C in a few decades.', []],
    ['At the end of the Younger Dryas, Greenland warmed by about 16 °C in a few decades.', ['value.greenland-younger-dryas-end-warming']],
  ])('%s', async (text, ids) => {
    expect(await idsOf(text)).toEqual(ids);
  });

  it('a coarse figure that fits another unit only through its rounding stays a wrong value', async () => {
    // "two kilometres" read as two miles is 2.4-4.0 km, which holds Vostok's 3,623 m only because "two" is coarse.
    expect(await idsOf('Vostok was drilled to about two kilometres before the team stopped.')).toEqual(['value.vostok-drilled-depth']);
  });
});

describe('the scale name alone, and a bare F, after a number', () => {
  it.each([
    ['The deglacial warming at Dome C was around 9 K, which is 9 F for readers in Ohio.', '16.2 F'],
    ['At the Last Glacial Maximum the world was about 6 °C colder than today, or 43 Fahrenheit colder.', '10.8 Fahrenheit'],
  ])('%s', async (text, correction) => {
    expect(await flagsOf(text)).toContainEqual(['unit.temperature-difference', correction]);
  });

  it.each([
    'The deglacial warming at Dome C was around 9 K, which is 16 F for readers in Ohio.',
    'At the Last Glacial Maximum the world was about 6 °C colder than today, or 11 Fahrenheit colder.',
    'In the ice age the world was 5 Celsius colder, some 9 Fahrenheit.',
  ])('%s is a right conversion and stays clean', async (text) => {
    expect(await flagsOf(text)).toEqual([]);
  });
});

describe('a date restated between b2k and BP', () => {
  it.each([
    ['The Holocene began 11,700 b2k, which is 11,700 BP.', '11,650 BP'],
    ['On the NGRIP timescale the Younger Dryas ended at 11,700 b2k, in other words 11,700 years BP.', '11,650 years BP'],
    ['So an age of 12,000 b2k for the Younger Dryas end is the same as 12,050 BP.', '11,950 BP'],
    ['The Holocene began 11,700 b2k, which makes it 11,750 BP.', '11,650 BP'],
    ['The Holocene began 11,700 b2k, which is 11,750 years before 1950.', '11,650 years BP'],
    ['The Holocene began 11.7 ka b2k, or 11.7 ka BP.', '11.65 ka BP'],
  ])('%s', async (text, correction) => {
    expect(await flagsOf(text)).toContainEqual(['unit.age-era', correction]);
  });

  it.each([
    'The Holocene began 11,700 b2k, which makes it 11,650 BP.',
    'The Holocene began 11,700 b2k, which is 11,650 years before 1950.',
    'So an age of 12,000 b2k for the Younger Dryas end is the same as 11,950 BP.',
    // "Years ago" counts from today, a few decades after 1950: the same number in BP is no slip.
    'The Holocene began 11,700 years ago, which is 11,700 BP.',
  ])('%s stays clean', async (text) => {
    expect(await flagsOf(text)).toEqual([]);
  });
});

describe('a CO2 share in percent a factor of ten off, after "is now"', () => {
  it.each([
    ['Compare that with the air outside, which is now about 0.42 percent carbon dioxide.', 'about 0.042 percent'],
    ['The air we breathe is today about 0.42 percent CO2.', 'about 0.042 percent'],
    ['Outdoor air today is currently 0.4 percent CO2.', '0.04 percent'],
  ])('%s', async (text, correction) => {
    expect(await flagsOf(text)).toContainEqual(['unit.percent-ppm', correction]);
  });

  it.each([
    'The air is now about 0.042 percent carbon dioxide.',
    'Carbon dioxide is still only 0.04 percent of the air.',
    // A percentage of something else.
    'Emissions of carbon dioxide are now 60 percent higher than in 1990.',
  ])('%s stays clean', async (text) => {
    expect(await flagsOf(text)).toEqual([]);
  });
});

describe('a CO2 share counted in molecules of a whole', () => {
  // 1 ppm is one molecule in a million (a mole fraction: NOAA GML gives ppm as micromol per mol of
  // dry air); today's air holds about 420 ppm (the pack's co2-global values, NOAA GML), 0.42 in every
  // thousand molecules; before industry about 280 ppm, 2.8 in every ten thousand.
  it.each([
    ['In 2024 every thousand molecules of air held about 4.2 molecules of CO2.', 'about 0.42'],
    ['Today every million molecules of air hold about 42 molecules of CO2.', 'about 420'],
    ['Before industry, every ten thousand molecules of air held about 28 molecules of carbon dioxide.', 'about 2.8'],
  ])('%s', async (text, correction) => {
    expect(await flagsOf(text)).toContainEqual(['unit.percent-ppm', correction]);
  });

  it.each([
    'In 2024 every thousand molecules of air held about 0.42 molecules of CO2.',
    'Today every million molecules of air hold about 420 molecules of CO2.',
    'Before industry, every ten thousand molecules of air held about 2.8 molecules of carbon dioxide.',
  ])('%s is right and stays clean', async (text) => {
    expect(await flagsOf(text)).toEqual([]);
  });
});

describe('an age scale defined with the other scale’s year', () => {
  // BP: years before AD 1950 (Stuiver & Polach 1977); b2k: years before AD 2000 (Walker et al. 2009).
  it.each([
    ['Greenland ice-core ages are given on GICC05 in years BP (before AD 2000) and converted for comparison.', 'AD 1950'],
    ['The Holocene formally began 11,700 years BP, where "present" means the year 2000.', '1950'],
    ['NGRIP ice-core ages are in b2k, counted back from 1950.', '2000'],
    ['In the Vostok ice core, ages are given as years BP, counting back from 2000.', '1950'],
  ])('%s', async (text, correction) => {
    expect(await flagsOf(text)).toContainEqual(['unit.era-reference-year', correction]);
  });

  it.each([
    'Greenland ice-core ages are given on GICC05 in years b2k (before AD 2000) and converted for comparison.',
    'The Holocene formally began 11,650 years BP, where "present" means the year 1950.',
    'NGRIP ice-core ages are in b2k, counted back from AD 2000.',
    // A year that is no scale's zero: an event after the scale is named.
    'Ice-core ages are in years BP, and since 2000 the Greenland cores have used b2k.',
  ])('%s stays clean', async (text) => {
    expect((await flagsOf(text)).map(([id]) => id)).not.toContain('unit.era-reference-year');
  });
});
