import { describe, expect, it } from 'vitest';
import { checkArithmetic } from '../../src/checks/arithmetic.js';
import { LEVEL_RULES } from '../../src/checks/arithmetic-levels.js';
import { parseQuantities } from '../../src/quantities/index.js';

const check = (sentence: string) => checkArithmetic(sentence, parseQuantities(sentence));

// Wrong arithmetic: [rule id, sentence, flagged text, correction, level]. The right values are the
// sentence's own numbers worked by hand (e.g. 280 − 180 = 100; 130 ppm ÷ 269 years = 0.483 ppm/yr).
const WRONG: [string, string, string, string, string][] = [
  ['arith.change', 'CO2 rose from 180 to 280 ppm at the end of the ice age, a rise of 120 ppm.', '120 ppm', '100 ppm', 'warning'],
  ['arith.change', 'CO2 fell from 280 to 180 ppm, a drop of 150 ppm.', '150 ppm', '100 ppm', 'error'],
  ['arith.change', 'Antarctic air warmed from -55 °C to -47 °C, a rise of 10 °C.', '10 °C', '8 °C', 'warning'],
  ['arith.change', 'Sea level rose from -120 m to 0 m, a rise of 60 m.', '60 m', '120 m', 'error'],
  ['arith.duration', 'The deglaciation ran from 18,000 to 11,700 years ago, lasting some 8,000 years.', 'some 8,000 years', 'some 6,300 years', 'warning'],
  ['arith.duration', 'From 1750 to 2019, a span of 300 years, CO2 climbed.', '300 years', '269 years', 'error'],
  ['arith.duration', 'Between 1750 and 1850 (150 years) coal use grew.', '150 years', '100 years', 'error'],
  ['arith.rate', 'CO2 rose by 80 ppm over 8,000 years, or 0.1 ppm per year.', '0.1 ppm per year', '0.01 ppm per year', 'warning'],
  ['arith.rate', 'From 1750 to 2019, CO2 rose 130 ppm, about 2 ppm per year.', 'about 2 ppm per year', 'about 0.483 ppm per year', 'warning'],
  ['arith.rate', 'Antarctica warmed by 8 °C in 8,000 years, a pace of 1 °C per century.', '1 °C per century', '0.1 °C per century', 'warning'],
  ['arith.ratio', 'CO2 rose from 180 to 280 ppm, an increase of 80 percent.', '80 percent', '55.6 percent', 'error'],
  ['arith.ratio', 'CO2 rose from 190 to 280 ppm; it doubled.', 'doubled', '1.5 times', 'error'],
  ['arith.ratio', 'CO2 fell from 280 to 180 ppm, a drop of 50 percent.', '50 percent', '35.7 percent', 'error'],
  ['arith.ratio', 'At 420 ppm, today\'s air holds three times more CO2 than the 180 ppm of the ice age.', 'three times', '2.33 times', 'warning'],
];

// Right arithmetic, never flagged.
const RIGHT: string[] = [
  'CO2 rose from 180 to 280 ppm at the end of the ice age, a rise of 100 ppm.',
  'CO2 fell from 280 to 180 ppm, a drop of about 100 ppm.',
  'Antarctic air warmed from -55 °C to -47 °C, a rise of 8 °C.',
  'The deglaciation ran from 18,000 to 11,700 years ago, lasting some 6,300 years.',
  'From 1750 to 2019, a span of 269 years, CO2 climbed.',
  'CO2 rose by 80 ppm over 8,000 years, or 0.01 ppm per year.',
  'From 1750 to 2019, CO2 rose 130 ppm, about 0.5 ppm per year.',
  'CO2 rose from 180 to 280 ppm, an increase of about 55 percent.',
  'CO2 rose from 190 to 410 ppm; it more than doubled.',
  'CO2 rose from 280 to 560 ppm, a doubling in the scenario.',
  'CO2 fell from 280 to 180 ppm, a drop of 36 percent.',
  'From 1750 to 2019 CO2 rose faster than at any time in the past 800,000 years.',
  'The 800,000-year record was extended from 1750 to 2019 by direct measurement.',
  'CO2 rose from 180 to 280 ppm while temperatures rose twice as fast in Antarctica.',
  'Between 20 and 18 ka the ice sheets stood at their largest.',
];

describe('checkArithmetic', () => {
  it.each(WRONG)('%s flags: %s', (ruleId, sentence, flagged, correction, level) => {
    const flags = check(sentence);
    expect(flags).toHaveLength(1);
    const [f] = flags;
    expect(f?.ruleId).toBe(ruleId);
    expect(sentence.slice(f?.start, f?.end)).toBe(flagged);
    expect(f?.correction).toBe(correction);
    expect(f?.level).toBe(level);
    expect(f?.reason).toContain(flagged);
  });

  it.each(RIGHT)('leaves correct arithmetic alone: %s', (sentence) => {
    expect(check(sentence)).toEqual([]);
  });

  it('puts the stated and the derived interval on the flag', () => {
    const [f] = check('CO2 rose from 180 to 280 ppm at the end of the ice age, a rise of 120 ppm.');
    expect(f?.claimed).toEqual({ text: '120 ppm', low: 115, high: 125, unit: 'ppm' });
    // to − from as intervals: [275 − 185, 285 − 175] = [90, 110].
    expect(f?.reference).toMatchObject({ low: 90, high: 110, unit: 'ppm', text: '100 ppm' });
  });

  it('keeps the level rule in one table: error only past the sum of both widths', () => {
    expect(LEVEL_RULES.map((r) => r.level)).toEqual(['error', 'warning']);
    expect(LEVEL_RULES[0]?.test(3, 2)).toBe(true);
    expect(LEVEL_RULES[0]?.test(2, 2)).toBe(false);
  });
});
