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
  ['length rate', 'The Morrow coast sank about 60 metres between 16,000 and 10,000 years ago, on average some 5 metres per century.', 'arith.rate', 'some 5 metres per century', 'some 1 metres per century'],
  ['length rate', 'Between 12,000 and 11,000 years ago the lake rose by 30 m, a rate of about 3 mm a year.', 'arith.rate', 'about 3 mm a year', 'about 30 mm a year'],
];

/** [cause, sentence]: right, or within the hedges. */
const RIGHT: [string, string][] = [
  ['length rate', 'The Morrow coast sank about 60 metres between 16,000 and 10,000 years ago, on average some 1 metre per century.'],
  ['length rate', 'Between 12,000 and 11,000 years ago the lake rose by 30 m, a rate of about 30 mm a year.'],
  ['length rate', 'Sea level now rises about 4 mm a year, and it rose 120 m after the glacial maximum.'],
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
  ];
  it.each(RIGHT_GRADIENT)('leaves alone: %s', (sentence, context) => {
    expect(check(sentence, context)).toEqual([]);
  });
});
