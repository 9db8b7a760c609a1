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
