/**
 * Arithmetic slips grouped by how the sentence is built, each cause with sentences written for this
 * file (none taken from the corpus). Every expected value is the sentence's own numbers worked by
 * hand ("common practice": arithmetic on the draft's own numbers), unless a comment names a source.
 */
import { describe, expect, it } from 'vitest';
import { checkArithmetic } from '../../src/checks/arithmetic.js';
import { parseQuantities } from '../../src/quantities/index.js';

const check = (sentence: string, context: string[] = []) => checkArithmetic(sentence, parseQuantities(sentence), context);

/** [cause, sentence, rule id, flagged words, correction]. */
const WRONG: [string, string, string, string, string][] = [
  // A rate of a length (sea level, a shoreline, ice thickness) in m, cm or mm per year or century.
  // Common practice: 60 m / 6,000 years = 1 m per century; 30 m / 1,000 years = 30 mm a year.
  ['length rate', 'The Morrow coast sank about 60 metres between 16,000 and 10,000 years ago, on average some 5 metres per century.', 'arith.rate', 'some 5 metres per century', 'some 1 metres per century (about 0.01 m per year)'],
  ['length rate', 'Between 12,000 and 11,000 years ago the lake rose by 30 m, a rate of about 3 mm a year.', 'arith.rate', 'about 3 mm a year', 'about 30 mm a year'],
  // A span restated after a date pair in more ways: a lead of two words, a filler, an adjectival
  // figure with its article, "lay" after "between ... and ...", and two dates whose second ends
  // something. Common practice: 16,200 − 14,900 = 1,300; 9,400 − 8,200 = 1,200; 24,000 − 17,000 = 7,000.
  ['span of dates', 'The Kell lake stood high from about 16,200 to 14,900 years ago, so that\'s a good 3,300 years of flooding.', 'arith.duration', '3,300 years', '1,300 years'],
  ['span of dates', 'The Kell lake stood high from about 16,200 to 14,900 years ago, which comes to some 2,300 years.', 'arith.duration', 'some 2,300 years', 'some 1,300 years'],
  ['span of dates', 'The Orm glacier readvanced from 9,400 to 8,200 years ago, a span of only 200 years.', 'arith.duration', '200 years', '1,200 years'],
  ['span of dates', 'The Orm glacier readvanced from 9,400 to 8,200 years ago, a 2,200-year advance.', 'arith.duration', '2,200-year', '1,200-year'],
  ['span of dates', 'Between the first moraine, about 24,000 years ago, and the last, 17,000 years ago, lay some 9,000 years of retreat.', 'arith.duration', 'some 9,000 years', 'some 7,000 years'],
  ['span of dates', 'The Skarn ice peaked about 24,000 years ago, and the valley was free of ice by 17,000 years ago - roughly 4,000 years of melt.', 'arith.duration', 'roughly 4,000 years', 'roughly 7,000 years'],
  // A multiple of a pace: "N times the ... rate of Y", "twenty-odd times the pace", "Nx faster" after
  // both rates. Common practice: 1.5 / 0.01 = 150; 0.9 / 0.03 = 30.
  ['multiple of a pace', 'The Tarn Ridge glacier now thins about 1.5 m a year, some 15 times the average pace of its retreat after the Little Ice Age, about 0.01 m a year.', 'arith.ratio', 'some 15 times', 'some 150 times'],
  ['multiple of a pace', 'At 0.9 °C per decade the Vell station warms roughly five times the long-term rate of 0.03 °C per decade.', 'arith.ratio', 'roughly five times', 'roughly 30 times'],
  ['multiple of a pace', 'The methane sensor logged 0.9 ppm per year against 0.03 ppm per year in the old record, so the gas now climbs forty-odd times faster.', 'arith.ratio', 'forty-odd times', '30-odd times'],
  // A change as a share of where it started: a fraction after a change noun, or a percentage restating
  // a change. Common practice: (300 − 200) / 200 = a half; (250 − 200) / 250 = a fifth (a drop is
  // measured from the higher level); 60 / 240 = 25 percent.
  ['share of a change', 'In the Dunholm model CO2 climbs from about 200 ppm to 300 ppm, a rise of roughly a third.', 'arith.ratio', 'roughly a third', 'roughly 50 percent'],
  ['share of a change', 'The lake level sat at 250 m, some 50 m above its glacial stand of 200 m: a fall of almost half.', 'arith.ratio', 'almost half', '20 percent'],
  ['share of a change', 'In the Dunholm run CO2 rose from 240 ppm to 300 ppm, a gain of 60 ppm, or about 40 percent.', 'arith.ratio', 'about 40 percent', 'about 25 percent'],
  // A unit left off one side: bare ends beside a change in ppm, or a bare change beside ends in ppm;
  // a filler ("barely", "only") between the change word and the figure. Common practice: 300 − 220 = 80.
  ['unit left off', 'In the Dunholm run the model gives a jump of about 120 ppm, from 220 up to 300.', 'arith.change', 'about 120 ppm', 'about 80 ppm'],
  ['unit left off', 'In the Dunholm run CO2 went from 220 to 300 ppm, an increase of barely 40.', 'arith.change', '40', '80 ppm'],
  // A ratio verb in the present tense after the two figures it joins. Common practice: 900 / 300 = 3.
  ['ratio verb', 'The Harnby delay is about 300 years near the top and about 900 years near the bed, so it roughly doubles with depth.', 'arith.ratio', 'roughly doubles', 'roughly 3 times'],
];

/** [cause, sentence]: right, or within the hedges. */
const RIGHT: [string, string][] = [
  ['length rate', 'The Morrow coast sank about 60 metres between 16,000 and 10,000 years ago, on average some 1 metre per century.'],
  ['length rate', 'Between 12,000 and 11,000 years ago the lake rose by 30 m, a rate of about 30 mm a year.'],
  ['length rate', 'Sea level now rises about 4 mm a year, and it rose 120 m after the glacial maximum.'],
  ['span of dates', 'The Kell lake stood high from about 16,200 to 14,900 years ago, so that\'s a good 1,300 years of flooding.'],
  ['span of dates', 'The Orm glacier readvanced from 9,400 to 8,200 years ago, a 1,200-year advance.'],
  ['span of dates', 'Between the first moraine, about 24,000 years ago, and the last, 17,000 years ago, lay some 7,000 years of retreat.'],
  ['span of dates', 'The Skarn ice peaked about 24,000 years ago, and the valley was free of ice by 17,000 years ago - roughly 7,000 years of melt.'],
  ['multiple of a pace', 'The Tarn Ridge glacier now thins about 1.5 m a year, some 150 times the average pace of its retreat after the Little Ice Age, about 0.01 m a year.'],
  ['multiple of a pace', 'The methane sensor logged 0.9 ppm per year against 0.03 ppm per year in the old record, so the gas now climbs thirty-odd times faster.'],
  // Two rates and a multiple of something else: nothing to check.
  ['multiple of a pace', 'Sea level rose 4 mm a year in the 2010s and 1.5 mm a year a century ago, and storms were twice as frequent.'],
  ['share of a change', 'In the Dunholm model CO2 climbs from about 200 ppm to 300 ppm, a rise of roughly a half.'],
  ['share of a change', 'The lake level sat at 250 m, some 50 m above its glacial stand of 200 m: a fall of a fifth.'],
  ['share of a change', 'In the Dunholm run CO2 rose from 240 ppm to 300 ppm, a gain of 60 ppm, or about 25 percent.'],
  // A share of something else: three levels, so which two the change joins is not clear.
  ['share of a change', 'CO2 was 190 ppm, then 280 ppm, and now 420 ppm, a rise of almost a third since the last peak.'],
  ['unit left off', 'In the Dunholm run the model gives a jump of about 80 ppm, from 220 up to 300.'],
  ['unit left off', 'In the Dunholm run CO2 went from 220 to 300 ppm, an increase of barely 80.'],
  // Bare ends and a change in °F: the numbers are not in one unit as written, so nothing is said.
  ['unit left off', 'The Vell record warmed by 14 °F, from 20 up to 30 on the old scale.'],
  ['ratio verb', 'The Harnby delay is about 300 years near the top and about 900 years near the bed, so it roughly triples with depth.'],
  // Two figures in different units: not one measure, so no ratio is read.
  ['ratio verb', 'The Harnby core is 900 m deep and 300 years of it are firn; the cost doubles each season.'],
  // Three dates: which two the span joins is not clear.
  ['span of dates', 'The ice peaked 24,000 years ago, retreated 19,000 years ago, and was gone by 17,000 years ago - roughly 2,000 years of melt.'],
  // A span that is not the pair's: a lead word, then another stretch of time named.
  ['span of dates', 'The Orm glacier readvanced from 9,400 to 8,200 years ago, and for the past 8,000 years it has been shrinking.'],
];

describe('arithmetic slips by the way the sentence is built', () => {
  it.each(WRONG)('%s: %s', (_cause, sentence, ruleId, flagged, correction) => {
    const flags = check(sentence);
    expect(flags.map((f) => [f.ruleId, sentence.slice(f.start, f.end), f.correction])).toEqual([[ruleId, flagged, correction]]);
  });

  it.each(RIGHT)('%s, right: %s', (_cause, sentence) => {
    expect(check(sentence)).toEqual([]);
  });
});

describe('years per metre of ice', () => {
  // Common practice: 120,000 years / 300 m = 400 years per metre; 400 × 50 m = 20,000 years.
  const WRONG_GRADIENT: [string, string, string, string, string[]][] = [
    ['The last 300 m of the Harnby core hold some 120,000 years, about 40 years per metre.', 'about 40 years per metre', 'about 400 years per metre', 'arith.rate', []],
    ['Some 120,000 years lie in 300 metres of basal ice: roughly 40 years to every metre.', 'roughly 40 years to every metre', 'roughly 400 years to every metre', 'arith.rate', []],
    ['Near the bed one metre of the Harnby ice holds about 400 years, so the lowest 50 metres hold some 2,000 years.', 'some 2,000 years', 'some 20,000 years', 'arith.rate', []],
    ['At Harnby 300 m of ice hold 120,000 years, so one metre there holds some 40 years.', 'some 40 years', 'some 400 years', 'arith.rate', []],
    ['A 50-metre stretch of that ice therefore spans about 2,000 years.', 'about 2,000 years', 'about 20,000 years', 'arith.rate', ['Near the bed one metre of the Harnby ice holds about 400 years.']],
    // Years of a named record counted per metre, the record's name between them.
    ['The last 300 m of the Harnby core hold some 120,000 years, about 40 years of climate record per metre.', 'about 40 years', 'about 400 years', 'arith.rate', []],
    ['That comes to roughly 40 years of snowfall for every metre of ice.', 'roughly 40 years', 'roughly 400 years', 'arith.rate', ['The last 300 m of the Harnby core hold some 120,000 years.']],
    // One metre and its years drawn from the sentence before ("so").
    ['So a single metre down there holds some 40 years.', 'some 40 years', 'some 400 years', 'arith.rate', ['The last 300 m of the Harnby core hold some 120,000 years.']],
  ];
  it.each(WRONG_GRADIENT)('flags: %s', (sentence, flagged, correction, ruleId, context) => {
    const flags = check(sentence, context);
    expect(flags.map((f) => [f.ruleId, sentence.slice(f.start, f.end), f.correction])).toEqual([[ruleId, flagged, correction]]);
  });

  const RIGHT_GRADIENT: [string, string[]][] = [
    ['The last 300 m of the Harnby core hold some 120,000 years, about 400 years per metre.', []],
    ['Near the bed one metre of the Harnby ice holds about 400 years, so the lowest 50 metres hold some 20,000 years.', []],
    // Two lengths: which one the gradient belongs to is not clear, so nothing is said.
    ['The top 100 m hold 1,000 years and the lowest 300 m some 120,000 years, about 400 years per metre at the bed.', []],
    // No word draws the second sentence from the first: the core's whole span is another matter.
    ['The Harnby core is 2,900 m long and covers about 800,000 years.', ['Near the bed one metre of the Harnby ice holds about 400 years.']],
    ['That comes to roughly 400 years of snowfall for every metre of ice.', ['The last 300 m of the Harnby core hold some 120,000 years.']],
    ['So a single metre down there holds some 400 years.', ['The last 300 m of the Harnby core hold some 120,000 years.']],
    // No word draws the metre from the sentence before: another place in the ice.
    ['Near the surface a single metre holds some 10 years.', ['The last 300 m of the Harnby core hold some 120,000 years.']],
  ];
  it.each(RIGHT_GRADIENT)('leaves alone: %s', (sentence, context) => {
    expect(check(sentence, context)).toEqual([]);
  });
});
