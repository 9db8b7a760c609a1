import { describe, expect, it } from 'vitest';
import { BP_CONVENTION, CLARK_2009, NIST_SP_811, YAN_2019 } from '../../src/checks/standard-sources.js';
import { checkUnits } from '../../src/checks/units.js';
import { parseQuantities } from '../../src/quantities/index.js';

const check = (sentence: string) => checkUnits(sentence, parseQuantities(sentence));

// Unit slips in phrasings read since the unit tuning pass: [rule id, sentence, flagged text,
// correction, source id]. Factors from NIST SP 811 (2008): a °F interval is 5/9 K, °F = 1.8 °C +
// 32 for readings only, K = °C + 273.15 for readings only, SI prefixes k = 10^3 and M = 10^6;
// b2k = BP + 50 (Walker et al. 2009, doi:10.1002/jqs.1227).
const WRONG: [string, string, string, string, string][] = [
  // A change named as the clause's subject, then "was": 5 × 1.8 = 9 °F (41 °F adds 32).
  ['unit.temperature-difference', 'The cooling between the two stages was about 5 °C, which is about 41 °F.', 'about 41 °F', 'about 9 °F', NIST_SP_811.id],
  // Restating verbs: 7 × 1.8 = 12.6 °F; 4 × 1.8 = 7.2 °F.
  ['unit.temperature-difference', 'The Harrow Fell site was some 7 °C colder at the glacial peak, which works out at about 45 °F.', 'about 45 °F', 'about 12.6 °F', NIST_SP_811.id],
  ['unit.temperature-difference', 'A warming of 4 °C across the thaw equals a warming of about 39 °F.', 'about 39 °F', 'about 7.2 °F', NIST_SP_811.id],
  ['unit.age-era', 'The Holocene began 11,700 years b2k, which corresponds to 11,750 years BP.', '11,750 years BP', '11,650 years BP', BP_CONVENTION.id],
  // A change in °C restated in K with 273.15 added: a change of 10 °C is a change of 10 K.
  ['unit.temperature-difference', 'Antarctic air warmed by 10 °C (a rise of some 283 K) as the ice age ended.', 'some 283 K', 'some 10 K', NIST_SP_811.id],
  // Thousand-for-million slips: the Younger Dryas about 12,900 years ago; Dome Fuji about 720,000 years.
  ['unit.age-scale', 'The Younger Dryas cold snap struck around 12.9 million years ago.', 'around 12.9 million years ago', 'around 12.9 thousand years ago', CLARK_2009.id],
  ['unit.age-scale', 'Ice from the Dome Fuji core reaches back about 720 Ma.', 'about 720 Ma', 'about 720 ka', YAN_2019.id],
  ['unit.age-scale', 'The EPICA core holds eight hundred million years of snowfall.', 'eight hundred million years', 'eight hundred thousand years', YAN_2019.id],
  // A copula alone between the two amounts: 420 ppm is 0.042 percent of the air (1% = 10,000 ppm).
  ['unit.percent-ppm', 'Today\'s roughly 420 ppm of CO2 is about 0.42 percent of the air.', 'about 0.42 percent', 'about 0.042 percent', NIST_SP_811.id],
  // A °F figure with no restating word is still the conversion of the °C figure before it:
  // 6 × 1.8 = 10.8 °F (43 °F adds 32).
  ['unit.temperature-difference', 'The Harrow Fell valley was about 6 °C colder at the glacial peak; in Fahrenheit the difference is about 43 °F.', 'about 43 °F', 'about 10.8 °F', NIST_SP_811.id],
];

// Right conversions in the same phrasings, and millions of years where they belong: never flagged.
const RIGHT: string[] = [
  'The cooling between the two stages was about 5 °C, which is about 9 °F.',
  'Today\'s roughly 420 ppm of CO2 is about 0.042 percent of the air.',
  'The Dome C core is 3,270 m deep, and 3,270 m is about 10,700 feet.',
  'The Harrow Fell valley was about 6 °C colder at the glacial peak; in Fahrenheit the difference is about 11 °F.',
  'The thermostat in the Harrow lab reads 68 °F, which works out at 20 °C.',
  'The borehole at Dome C read about −54 °C, which is about −65 °F.',
  'A warming of 4 °C across the thaw equals a warming of about 7 °F.',
  'The Holocene began 11,700 years b2k, which corresponds to 11,650 years BP.',
  'Antarctic air warmed by 10 °C (a rise of 10 K) as the ice age ended.',
  'The summer air at the Harrow Fell camp reached 295 K, a mild 22 °C.',
  // Deep time, another record, and the ice sheet's own birth (from memory: Lake Vostok has been
  // sealed for millions of years; the East Antarctic ice sheet formed about 34 million years ago).
  'Lake Vostok, under the ice, has been sealed for some 15 million years.',
  'The East Antarctic ice sheet that holds the EPICA core formed about 34 million years ago.',
  'Unlike the Holocene, the Eocene of 50 million years ago had no ice at the poles.',
  'Blue ice at Allan Hills is about 2.7 million years old, older than any ice core record.',
];

describe('checkUnits: phrasings of restatements and scale slips', () => {
  it.each(WRONG)('%s flags: %s', (ruleId, sentence, flagged, correction, source) => {
    const flags = check(sentence);
    expect(flags).toHaveLength(1);
    const [f] = flags;
    expect(f?.ruleId).toBe(ruleId);
    expect(sentence.slice(f?.start, f?.end)).toBe(flagged);
    expect(f?.correction).toBe(correction);
    expect(f?.sources.map((s) => s.id)).toContain(source);
  });

  it.each(RIGHT)('leaves alone: %s', (sentence) => {
    expect(check(sentence)).toEqual([]);
  });

  // A share of the air in a sentence that names no gas, after a sentence with a level in ppm:
  // 0.42% = 4,200 ppm, never measured (1% = 10^4 ppm, NIST SP 811); 0.042% = 420 ppm.
  it('reads a share of the air as CO2 when the sentence before gives a level in ppm', () => {
    const at = (...s: string[]) => checkUnits(s[1] ?? '', parseQuantities(s[1] ?? ''), [s[0] ?? '']);
    const [f] = at('The Harrow Fell station logged a yearly rise of about 2.5 ppm.', 'Expressed as a share of the air, the level there is about 0.42 percent.');
    expect(f?.ruleId).toBe('unit.percent-ppm');
    expect(f?.correction).toBe('about 0.042 percent');
    expect(at('The Harrow Fell station logged a yearly rise of about 2.5 ppm.', 'Expressed as a share of the air, the level there is about 0.042 percent.')).toEqual([]);
    // No ppm in the sentence before: the share could be of anything.
    expect(at('The Harrow Fell station opened in 1998.', 'As a share of the air, water vapour there is about 0.4 percent.')).toEqual([]);
  });

  it('says when a K figure is a °C change converted as a reading (+ 273.15)', () => {
    const [f] = check('Antarctic air warmed by 10 °C (a rise of some 283 K) as the ice age ended.');
    expect(f?.reason).toContain('+ 273.15');
  });
});
