import { describe, expect, it } from 'vitest';
import { B2K_CONVENTION, BP_CONVENTION, LUTHI_2008, NIST_SP_811, NOAA_2024 } from '../../src/checks/standard-sources.js';
import { PLAUSIBLE_CO2_PPM } from '../../src/checks/units-co2-share.js';
import { checkUnits } from '../../src/checks/units.js';
import { parseQuantities } from '../../src/quantities/index.js';
import { loadPacks } from '../../src/rulepack/index.js';

const check = (sentence: string) => checkUnits(sentence, parseQuantities(sentence));

// Unit slips: [rule id, sentence, flagged text, correction, source id]. Right values from
// NIST SP 811 (1 ft = 0.3048 m; °F interval = 5/9 K; °F = 1.8 °C + 32; 1% = 10^4 ppm) and the
// BP (before AD 1950) and b2k (before AD 2000) definitions.
const WRONG: [string, string, string, string, string][] = [
  ['unit.temperature-difference', 'A 5 °C (41 °F) warming of Antarctica is glacial-scale.', '41 °F', '9 °F', NIST_SP_811.id],
  ['unit.temperature-difference', 'Antarctica was 8 °C, or 46 °F, colder at the maximum.', '46 °F', '14.4 °F', NIST_SP_811.id],
  ['unit.temperature', 'At -30 °C (-54 °F) the snow squeaks.', '-54 °F', '-22 °F', NIST_SP_811.id],
  ['unit.percent-ppm', 'CO2 reached 0.4 percent (400 ppm) of the atmosphere.', '400 ppm', '4,000 ppm', NIST_SP_811.id],
  ['unit.percent-ppm', 'CO2 stood at 280 percent before industrialisation.', '280 percent', '280 ppm', NIST_SP_811.id],
  ['unit.percent-ppm', 'Pre-industrial CO2 was 0.028 ppm in the air.', '0.028 ppm', '0.028%', NIST_SP_811.id],
  ['unit.age-era', 'The ice sheet melted back in 10,000 BCE (10,000 years ago).', '10,000 years ago', '11,900 years ago', BP_CONVENTION.id],
  ['unit.age-era', 'The Holocene began 11,703 years b2k (11,703 years BP).', '11,703 years BP', '11,653 years BP', BP_CONVENTION.id],
  ['unit.length', 'The core is 3,270 m (9,750 ft) long.', '9,750 ft', '10,700 ft', NIST_SP_811.id],
  ['unit.length', 'The ice is 2 miles (2,000 m) thick there.', '2,000 m', '3,220 m', NIST_SP_811.id],
  ['unit.duration', 'The record spans 800 kyr (80,000 years).', '80,000 years', '800,000 years', NIST_SP_811.id],
  // A temperature change converted as a reading (× 1.8 + 32): 10 × 1.8 + 32 = 50; 3 × 1.8 + 32 = 37.4.
  ['unit.temperature-difference', 'Greenland\'s summit warmed by about 10 °C (50 °F) within decades.', '50 °F', '18 °F', NIST_SP_811.id],
  ['unit.temperature-difference', 'The tropics cooled by 3 °C, which is 37.4 °F, at the Last Glacial Maximum.', '37.4 °F', '5.4 °F', NIST_SP_811.id],
  // Words between the two, and the °F figure first: the °F side is always the conversion.
  ['unit.temperature-difference', 'The Halden guide says the ice-age world was about 5 °C colder than the 1800s, in other words roughly 41 °F colder.', 'roughly 41 °F', 'roughly 9 °F', NIST_SP_811.id],
  ['unit.temperature-difference', 'Central Greenland was some 68 °F (20 °C) colder at the glacial peak.', 'some 68 °F', 'some 36 °F', NIST_SP_811.id],
  // b2k = BP + 50 (Walker et al. 2009); Y BCE = 1949 + Y years before 1950: 7,500 BCE is 9,449 BP.
  ['unit.age-era', 'The Holocene boundary sits at 11,700 b2k, that\'s 11,750 years BP in radiocarbon terms.', '11,750 years BP', '11,650 years BP', BP_CONVENTION.id],
  ['unit.age-era', 'Farming reached the valley in 7,500 BCE, which is 7,500 years ago.', '7,500 years ago', '9,450 years ago', BP_CONVENTION.id],
  // A percentage beside a ppm value that does not convert (1% = 10,000 ppm).
  ['unit.percent-ppm', 'Pre-industrial air held 280 ppm of CO2, or 0.28 percent.', '0.28 percent', '0.028 percent', NIST_SP_811.id],
  ['unit.percent-ppm', 'The Northmoor station logs 415 ppm of CO2, which is 0.415 percent of the air.', '0.415 percent', '0.0415 percent', NIST_SP_811.id],
  // A CO2 share in percent with no ppm beside it, outside every plausible level (150-2,000 ppm):
  // 0.42% = 4,200 ppm → 0.042%; 0.0028% = 28 ppm → 0.028%; 4% = 40,000 ppm → 0.04%.
  ['unit.percent-ppm', 'CO2 makes up 0.42 percent of the atmosphere today.', '0.42 percent', '0.042 percent', LUTHI_2008.id],
  ['unit.percent-ppm', 'In 1750, carbon dioxide was about 0.0028 percent of the air.', 'about 0.0028 percent', 'about 0.028 percent', LUTHI_2008.id],
  ['unit.percent-ppm', 'Firn & Flux wrote that CO2 is now 4 percent of the air.', '4 percent', '0.04 percent', NOAA_2024.id],
  ['unit.percent-ppm', 'CO2 is now higher than at any time in two million years, at 0.42 percent of the air.', '0.42 percent', '0.042 percent', NIST_SP_811.id],
  // "would call" restates: a change of 7 °C is 12.6 °F (7 × 1.8 + 32 = 44.6 is the reading).
  ['unit.temperature-difference', 'The Kestrel Bay models cool the tropics by 7 °C, which visitors from Ohio would call roughly 44.6 °F.', 'roughly 44.6 °F', 'roughly 12.6 °F', NIST_SP_811.id],
  // The same unit with another scale word: 600,000 years is 0.6 million years, not 0.6 billion.
  ['unit.duration', 'The Harrow Hill ice is some 600,000 years old, or 0.6 billion years.', '0.6 billion years', '600 thousand years', NIST_SP_811.id],
  // A hyphenated measure of the subject restated after "is": 2,500 m = 8,202 ft (÷ 0.3048).
  ['unit.length', 'For visitors from Denver, the 2,500-metre Harrow Hill core is nearly 800 feet long.', 'nearly 800 feet', '8,200 feet', NIST_SP_811.id],
  // A change named elsewhere in the sentence does not make a stated share relative.
  ['unit.percent-ppm', 'Despite the rise of coal, CO2 was 0.4 percent in 1900.', '0.4 percent', '0.04 percent', LUTHI_2008.id],
  ['unit.percent-ppm', 'After the increase in CO2 since 1850, the gas stood at 4 percent of the air.', '4 percent', '0.04 percent', LUTHI_2008.id],
];

// Right conversions, never flagged.
const RIGHT: string[] = [
  'A 5 °C (9 °F) warming of Antarctica is glacial-scale.',
  'At -30 °C (-22 °F) the snow squeaks.',
  'The air there was -40 °C, or -40 °F.',
  'CO2 reached 0.04 percent (400 ppm) of the atmosphere.',
  'CO2 rose by 40 percent since 1750.',
  'The Kestrel Bay models cool the tropics by 7 °C, which visitors from Ohio would call roughly 12.6 °F.',
  'A summer day at the Kestrel Bay station reads 30 °C, which a visitor from Ohio would call 86 °F.',
  'The Harrow Hill ice is some 600,000 years old, or 0.6 million years.',
  'The Harrow Hill cores hold ice 400,000 years old, 600,000 years old and 0.9 million years old.',
  'For visitors from Denver, the 2,500-metre Harrow Hill core is just over 8,200 feet long.',
  'The 2,500-metre Harrow Hill core was 300 feet from the old camp.',
  'The 4-km-wide Harrow ice shelf is 900 feet thick.',
  // The size of a change named as the subject is relative to its start (420 / 280 = 1.5), not a share of the air.
  'The Marlow almanac put the growth of CO2 from 1850 to 2020 at 45 percent.',
  'The increase in atmospheric carbon dioxide since the glacial maximum was about 120 percent by 2020.',
  'CO2 levels are 50 percent higher than before industry.',
  'The ice sheet melted back around 10,000 BCE, some 12,000 years ago.',
  'In 1750, about 270 years ago, CO2 was 280 ppm.',
  'The Holocene began 11,700 years b2k (11,650 years BP).',
  'The core is 3,270 m (10,700 ft) long.',
  'The record spans 800 kyr (800,000 years).',
  'Methane was 0.7 ppm in warm times.',
  // Right restatements, also with words between them and with the °F figure first.
  'The world was about 6 °C colder than before the industrial era, that is, roughly 11 °F colder.',
  'Central Greenland was some 36 °F (20 °C) colder at the glacial peak.',
  'Layer 1,492 dates to 11,700 b2k, which is 11,650 years BP.',
  'Farming reached the valley in 7,500 BCE, some 9,500 years ago.',
  'The Northmoor station logs 415 ppm of CO2, which is 0.0415 percent of the air.',
  'Vostok sits at 3,488 m above sea level, or about 11,400 ft.',
  // A reading conversion with no change word is a reading, whatever the default would say.
  'The gallery thermostat reads 68 °F (20 °C) year round, while glacial CO2 was 190 ppm.',
  // Not a restatement: a comparison, and numbers of different things.
  'The core reached 3,270 m, which is deeper than the 2,000 ft of the first Greenland core.',
  'The record spans 800,000 years, or eight glacial cycles of about 100 kyr.',
  // Plausible CO2 shares, other gases, changes, rates and shares of something else.
  'CO2 is only about 0.04 percent of the air.',
  'CO2 makes up 0.042% of the atmosphere by volume.',
  'CO2 at the glacial maximum was 0.019 percent of the atmosphere.',
  'Argon is 0.93 percent of the air, CO2 only 0.04 percent.',
  'Nitrogen is 78 percent of the air and CO2 only 0.04 percent.',
  'Methane, at 0.00019 percent of the air, is rarer still than CO2.',
  'CO2 is 0.04 percent of the air but water vapour is up to 4 percent.',
  'Burning coal and oil has raised CO2 by 50 percent.',
  'CO2 has been rising about 0.6 percent a year.',
  'About 25 percent of the CO2 we emit dissolves in the ocean.',
  'CO2 is now at 150 percent of its pre-industrial level.',
  // Deep time, before the ice ages: a large share there is a claim for the reference values.
  'CO2 stood at 0.3 percent in the Cretaceous greenhouse, the museum claims.',
  'Some 50 million years ago, CO2 may have made up 0.1 percent of the air.',
];

// Restatements across two sentences of one paragraph: [the sentence before, the sentence, flagged
// text, correction]. b2k = BP + 50 (Walker et al. 2009); Y BCE = 1949 + Y years BP.
const ACROSS_WRONG: [string, string, string, string][] = [
  ['The Northmoor ash layer lies at 12,100 b2k.', 'That is 12,150 years BP.', '12,150 years BP', '12,050 years BP'],
  ['The Halden label dates the boundary to 11,700 b2k.', "On the BP scale, which counts back from 1950, that's 11,750 years BP.", '11,750 years BP', '11,650 years BP'],
  ['The first villages appear around 9,000 BCE.', 'In other words, 9,000 years ago.', '9,000 years ago', '10,900 years ago'],
  ['Pre-industrial air held 280 ppm of CO2.', 'That is 0.28 percent of the air.', '0.28 percent', '0.028 percent'],
  // A year after the amount is passed over, and an adverb may follow the restating words (1 ppm = 1,000 ppb).
  ['The Harrow station logged about 430 ppm of CO2 in 2025.', 'That is still only 430 parts per billion of the air.', '430 parts per billion', '430,000 parts per billion'],
];
const ACROSS_RIGHT: [string, string][] = [
  ['The Northmoor ash layer lies at 12,100 b2k.', 'That is 12,050 years BP.'],
  // A percentage above a level is a relative change, not the level again.
  ['The Harrow station logged just under 424 ppm of CO2 last year.', "That's more than fifty percent above where it stood in 1750."],
  ["The Halden label dates the boundary to 11,700 b2k.", "On the BP scale, which counts back from 1950, that's 11,650 years BP."],
  // The second sentence does not restate: a new date, or a date with words of its own before it.
  ['The Northmoor ash layer lies at 12,100 b2k.', 'A second layer formed 11,000 years BP.'],
  ['The layer formed at 12,100 b2k.', 'The team then sampled ice that formed 12,400 years BP, that is, later.'],
];

describe('checkUnits across sentences', () => {
  it.each(ACROSS_WRONG)('flags a restatement of %s in: %s', (before, sentence, flagged, correction) => {
    const flags = checkUnits(sentence, parseQuantities(sentence), ['The panel was rewritten in May.', before]);
    expect(flags).toHaveLength(1);
    const [f] = flags;
    expect(sentence.slice(f?.start, f?.end)).toBe(flagged);
    expect(f?.correction).toBe(correction);
  });

  it.each(ACROSS_RIGHT)('leaves alone: %s / %s', (before, sentence) => {
    expect(checkUnits(sentence, parseQuantities(sentence), [before])).toEqual([]);
  });

  it('reads only the sentence just before, and nothing without context', () => {
    const sentence = 'That is 12,150 years BP.';
    expect(checkUnits(sentence, parseQuantities(sentence))).toEqual([]);
    expect(checkUnits(sentence, parseQuantities(sentence), ['The ash lies at 12,100 b2k.', 'Nobody doubts it.'])).toEqual([]);
  });
});

const packs = await loadPacks([]);

describe('the plausible CO2 levels behind unit.percent-ppm', () => {
  it('take in every level the sources give, from the 800-kyr minimum to the newest peak', () => {
    // Lüthi et al. (2008): 172 ppm is the lowest in 800,000 years; NOAA/Scripps: 430.5 ppm in May 2025.
    const lowest = packs.reference('co2-lowest-800kyr');
    const newest = packs.reference('co2-mlo-may-2025');
    expect(lowest?.low).toBeGreaterThanOrEqual(PLAUSIBLE_CO2_PPM.low);
    expect(newest?.high).toBeLessThanOrEqual(PLAUSIBLE_CO2_PPM.high);
    // ...and leave out the two slips a factor of ten away from today's air and the pre-industrial air.
    expect(0.42 * 1e4).toBeGreaterThan(PLAUSIBLE_CO2_PPM.high);
    expect(0.0028 * 1e4).toBeLessThan(PLAUSIBLE_CO2_PPM.low);
  });

  it('cite the same source entries as the built-in pack', () => {
    const luthi = packs.reference('co2-lowest-800kyr')?.sources.find((x) => x.id === LUTHI_2008.id);
    expect(luthi).toEqual(LUTHI_2008);
    expect(LUTHI_2008.doi).toBe('10.1038/nature06949');
    const noaa = packs.references.flatMap((r) => r.sources).find((x) => x.id === NOAA_2024.id);
    expect(noaa).toEqual(NOAA_2024);
  });

  it('names the level the slip would be and the corrected one', () => {
    const [f] = check('CO2 makes up 0.42 percent of the atmosphere today.');
    expect(f?.reason).toContain('4,200 ppm');
    expect(f?.reason).toContain('0.042 percent is 420 ppm');
    expect(f?.level).toBe('error');
    expect(f?.sources.map((x) => x.id)).toEqual([NIST_SP_811.id, LUTHI_2008.id, NOAA_2024.id]);
  });
});

describe('checkUnits', () => {
  it.each(WRONG)('%s flags: %s', (ruleId, sentence, flagged, correction, source) => {
    const flags = check(sentence);
    expect(flags).toHaveLength(1);
    const [f] = flags;
    expect(f?.ruleId).toBe(ruleId);
    expect(sentence.slice(f?.start, f?.end)).toBe(flagged);
    expect(f?.correction).toBe(correction);
    expect(f?.sources.map((s) => s.id)).toContain(source);
  });

  it.each(RIGHT)('leaves correct units alone: %s', (sentence) => {
    expect(check(sentence)).toEqual([]);
  });

  it('cites both conventions when b2k is involved', () => {
    const [f] = check('The Holocene began 11,703 years b2k (11,703 years BP).');
    expect(f?.sources).toEqual([BP_CONVENTION, B2K_CONVENTION]);
  });

  it('names the reading conversion when a °F change added 32', () => {
    const [f] = check('Greenland\'s summit warmed by about 10 °C (50 °F) within decades.');
    expect(f?.reason).toContain('50 °F is about 10 °C converted as a reading (× 1.8 + 32)');
    const [g] = check('The tropics cooled by 3 °C (7 °F) at the Last Glacial Maximum.');
    expect(g?.reason).not.toContain('as a reading');
  });

  it('says why a temperature change takes no 32', () => {
    const [f] = check('A 5 °C (41 °F) warming of Antarctica is glacial-scale.');
    expect(f?.reason).toContain('9 °F');
    expect(f?.level).toBe('error');
  });

  it('names the published definitions with where to read them', () => {
    expect(NIST_SP_811.url).toBe('https://physics.nist.gov/cuu/pdf/sp811.pdf');
    expect(BP_CONVENTION.doi).toBe('10.1017/S0033822200003672');
    expect(B2K_CONVENTION.doi).toBe('10.1002/jqs.1227');
  });
});
