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
  ['arith.rate', 'From 1750 to 2019, CO2 rose 130 ppm, about 2 ppm per year.', 'about 2 ppm per year', 'about 0.48 ppm per year', 'warning'],
  ['arith.rate', 'Antarctica warmed by 8 °C in 8,000 years, a pace of 1 °C per century.', '1 °C per century', '0.1 °C per century (about 0.001 °C per year)', 'warning'],
  ['arith.ratio', 'CO2 rose from 180 to 280 ppm, an increase of 80 percent.', '80 percent', '56 percent', 'error'],
  ['arith.ratio', 'CO2 rose from 190 to 280 ppm; it doubled.', 'doubled', '1.5 times', 'error'],
  ['arith.ratio', 'CO2 fell from 280 to 180 ppm, a drop of 50 percent.', '50 percent', '36 percent', 'error'],
  ['arith.ratio', 'At 420 ppm, today\'s air holds three times more CO2 than the 180 ppm of the ice age.', 'three times', '2.3 times', 'warning'],
  // Start and end dates in "began ... ended ..." wording, across a comma, colon or semicolon.
  ['arith.duration', 'The Antarctic Cold Reversal began 14,700 years ago and ended 12,700 years ago, a pause of about 3,000 years.', 'about 3,000 years', 'about 2,000 years', 'error'],
  ['arith.duration', 'The warm spell started 5,900 years ago; it ended 5,300 years ago: about 900 years of mild winters.', 'about 900 years', 'about 600 years', 'warning'],
  // A hedged start date: the writer subtracts the numbers written (8,200 − 7,100), not the widest reading of "about".
  ['arith.duration', 'The Northmoor team dates the wet phase from about 8,200 to 7,100 years ago, a stretch of some 2,100 years.', 'some 2,100 years', 'some 1,100 years', 'error'],
  // A phrase of time between "from" and "to"; hedges on both ends.
  ['arith.change', 'CO2 fell from 300 ppm at the interglacial peak to 180 ppm at the glacial maximum, a drop of 200 ppm.', '200 ppm', '120 ppm', 'error'],
  ['arith.change', 'The Halden panel says CO2 went from about 185 to about 275 ppm as the ice melted, a rise of roughly 40 ppm.', 'roughly 40 ppm', 'roughly 90 ppm', 'error'],
  // Percentages: 280 / 190 = 1.474, a 47.4% rise; 400 / 270 = 1.481. "more than 400" is read as the 400 written.
  ['arith.ratio', 'CO2 climbed from 190 to 280 ppm, an increase of roughly 30 percent.', 'roughly 30 percent', 'roughly 47 percent', 'warning'],
  ['arith.ratio', 'CO2 rose from about 270 ppm in 1800 to more than 400 ppm today, a rise of roughly 70 percent.', 'roughly 70 percent', 'roughly 48 percent', 'error'],
  // A start in a short verb phrase and an end after "by": 16,500 − 12,000 = 4,500 years.
  ['arith.duration', 'Meltwater began to pour out of the Alder basin about 16,500 years ago and the lake had drained by 12,000 years ago, an outflow of some 2,500 years.', 'some 2,500 years', 'some 4,500 years', 'error'],
  // An amount equated with a rate over a span named earlier: 100 ppm / 5,000 years = 0.2 ppm per decade;
  // 80 ppm / 6,300 years = 1.27 ppm per century, shown to the two figures the draft's numbers allow.
  ['arith.rate', 'Spread across the 5,000 years of the warming, the Alder Hall team\'s 100 ppm of CO2 would be about 0.5 ppm per decade.', 'about 0.5 ppm per decade', 'about 0.2 ppm per decade (about 0.02 ppm per year)', 'error'],
  ['arith.rate', 'Over the 6,300 years of the thaw, those 80 ppm work out at 4 ppm per century.', '4 ppm per century', '1.3 ppm per century (about 0.013 ppm per year)', 'error'],
  // The precision of "one" does not stretch to four: 80 / 2,000 = 4 ppm per century.
  ['arith.rate', 'The Brackwater display says CO2 rose 80 ppm over 2,000 years, which comes to a little over one ppm per century.', 'a little over one ppm per century', '4 ppm per century (about 0.04 ppm per year)', 'error'],
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
  // Start and end dates whose stated span is right, or rounded as the hedge allows.
  'The Bølling warm phase began about 14,700 years ago and ended about 12,900 years ago, some 1,800 years in all.',
  'Termination I ran from roughly 18,000 to 11,700 years ago: some 6,000 years of warming.',
  'The Last Glacial Maximum lasted from about 26,500 to 19,000 years ago, roughly 7,500 years.',
  'The stadial set in 12,850 years ago; it ended 11,650 years ago; in all it lasted about 1,200 years.',
  'The record begins 800,000 years ago and ends in 1911, a span of about 800,000 years.',
  // Two starts are not a start and an end; a later span is not the span of the pair.
  'Warming began 18,000 years ago, and CO2 began rising 17,500 years ago.',
  'The Halden core\'s warm layer began forming 9,300 years ago and stopped 8,900 years ago, after which came 600 years of cold.',
  // Changes and percentages, right or rounded within their hedges (410 / 280 = 1.464; 410 / 278 = 1.475).
  'CO2 went from about 180 ppm in the glacial to about 280 ppm in the Holocene, a rise of roughly 100 ppm.',
  'CO2 rose from 190 ppm at the glacial maximum to 265 ppm by the early Holocene, a gain of about 75 ppm.',
  'CO2 started at 190 ppm and ended at 280 ppm: a rise of 90 ppm.',
  'From 280 ppm in 1750 to 410 ppm in 2019, CO2 rose by about 46 percent.',
  'Between 1750 and 2019, CO2 rose from 278 to 410 ppm, a 47 percent increase.',
  'CO2 rose from about 185 to about 280 ppm, roughly a 50 percent rise.',
  'CO2 rose from 280 to over 400 ppm, a rise of more than 40 percent.',
  'CO2 rose by about 80 ppm in about 6,000 years, about 0.013 ppm a year.',
  'Meltwater began to pour out of the Alder basin about 16,500 years ago and the lake had drained by 12,000 years ago, an outflow of some 4,500 years.',
  'Peat began forming at Tollan Moss 9,800 years ago; by 6,000 years ago it was 2 m thick.',
  'Spread across the 5,000 years of the warming, the same 100 ppm of CO2 would be about 2 ppm per century.',
  'Over the 60 years of the Kestrel Bay record CO2 reached 420 ppm, and it is now rising at 2.4 ppm per year.',
  // "Just over" and "nearly" keep a small round number's own precision ("one" is ±0.5):
  // 70 / 6,000 = 1.17 ppm per century; 9 / 7,000 = 1.29 °C per millennium; 110 / 6,000 = 1.83.
  'The Brackwater display says CO2 rose 70 ppm over 6,000 years, which comes to a little over one ppm per century.',
  'Antarctica warmed by 9 °C in 7,000 years, just over 1 °C per millennium.',
  'In the Tollan model CO2 climbs by 110 ppm over 6,000 years, nearly two ppm per century.',
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

  it('subtracts the numbers as written: a hedge on an input does not widen the derived value', () => {
    const [f] = check('The Northmoor team dates the wet phase from about 8,200 to 7,100 years ago, a stretch of some 2,100 years.');
    // 8,200 and 7,100 are each read to ±50 (the precision row); "about" is set aside for the sum:
    // [8,150 − 7,150, 8,250 − 7,050] = [1,000, 1,200]. With "about" (±820) it would reach 2,110.
    expect(f?.reference).toMatchObject({ low: 1000, high: 1200, text: '1,100 years' });
    // "some 2,100" is ±50 as written, and "some" widens it by 2.5% of 2,100 (the interval table's about row).
    expect(f?.claimed).toMatchObject({ text: 'some 2,100 years', low: 1997.5, high: 2202.5 });
  });

  it('keeps the level rule in one table: error only past the sum of both widths', () => {
    expect(LEVEL_RULES.map((r) => r.level)).toEqual(['error', 'warning']);
    expect(LEVEL_RULES[0]?.test(3, 2)).toBe(true);
    expect(LEVEL_RULES[0]?.test(2, 2)).toBe(false);
  });
});
