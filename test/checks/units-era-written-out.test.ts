/**
 * A date's era written out or named before a bare number, with sentences written for this file.
 * BP counts years before AD 1950 (Stuiver & Polach 1977, Radiocarbon 19, 355-363); b2k years before
 * AD 2000 (Walker et al. 2009, doi:10.1002/jqs.1227), so a date in b2k is 50 years less in BP:
 * 11,700 b2k = 11,650 BP, 14,600 b2k = 14,550 BP.
 */
import { describe, expect, it } from 'vitest';
import { checkUnits } from '../../src/checks/units.js';
import { parseQuantities } from '../../src/quantities/index.js';

const flagged = (sentence: string, context: string[] = []) =>
  checkUnits(sentence, parseQuantities(sentence), context).map((f) => [f.ruleId, sentence.slice(f.start, f.end), f.correction]);

describe('the reference year written out', () => {
  it.each([
    ['11,700 years before the year 2000', 'yr b2k'],
    ['14,600 years before the year 1950', 'yr BP'],
    ['14,600 years before AD 2000', 'yr b2k'],
  ])('"%s" is a date in %s', (text, unit) => {
    expect(parseQuantities(`The onset is put at ${text} in the Skarn core.`).map((q) => q.statedUnit)).toContain(unit);
  });

  it('a restatement in BP of a date given before the year 2000 moves by 50 years, down', () => {
    expect(flagged('Counted from 1950 instead, that is 14,650 years BP.', ['The Skarn warming is dated to 14,600 years before the year 2000.'])).toEqual([
      ['unit.age-era', '14,650 years BP', '14,550 years BP'],
    ]);
    expect(flagged('Counted from 1950 instead, that is 14,550 years BP.', ['The Skarn warming is dated to 14,600 years before the year 2000.'])).toEqual([]);
  });
});

describe('a bare number after the era it is given in', () => {
  it.each([
    ['The Skarn warming began 14,600 years b2k, which in BP terms is 14,650.', '14,650', '14,550'],
    ['By the Skarn count the warming began 14,600 years b2k, which in BP is 14,650.', '14,650', '14,550'],
  ])('%s', (sentence, words, correction) => {
    expect(flagged(sentence)).toEqual([['unit.age-era', words, correction]]);
  });

  it.each([
    'The Skarn warming began 14,600 years b2k, which in BP terms is 14,550.',
    // A count after the era's name that is no date: no restatement.
    'The Skarn warming began 14,600 years b2k, and in BP terms 3 cores agree on it.',
  ])('leaves alone: %s', (sentence) => {
    expect(flagged(sentence)).toEqual([]);
  });
});

describe('label words', () => {
  // "Worked example 3." numbers an exercise: no figure for the sums after it (common practice).
  it.each(['Worked example 3.', 'Question 4: how long did it last?', 'Step 2 of the method.'])('%s holds no quantity', (text) => {
    expect(parseQuantities(text)).toEqual([]);
  });
});
