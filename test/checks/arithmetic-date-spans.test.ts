import { describe, expect, it } from 'vitest';
import { checkArithmetic } from '../../src/checks/arithmetic.js';
import { parseQuantities } from '../../src/quantities/index.js';

/** Checks `sentence` with `before` as the sentences ahead of it in the paragraph, in order. */
const check = (sentence: string, before: string[] = []) => checkArithmetic(sentence, parseQuantities(sentence), before);

// The time between two dates told as a span: [why, sentences before, sentence, flagged text, correction].
// The right values are the dates' own difference, worked by hand: 21,000 − 11,700 = 9,300;
// 14,700 − 12,900 = 1,800; 18,000 − 11,700 = 6,300; 17,500 − 11,700 = 5,800 (the dates are common
// practice's round figures for the glacial maximum, the Bølling warming and the Holocene; from memory).
const WRONG: [string, string[], string, string, string][] = [
  ['a from-to pair of named dates as the subject of "is"', [], 'From the Bølling warming 14,700 years ago to the Younger Dryas 12,900 years ago is roughly 2,800 years.', 'roughly 2,800 years', 'roughly 1,800 years'],
  ['dates in brackets after their events', [], 'From the glacial peak (21,000 years ago) to the Holocene (11,700 years ago) was about 11,300 years.', 'about 11,300 years', 'about 9,300 years'],
  ['"comes to" after the pair, with a span noun', [], 'From the cold maximum at 21,000 years ago to the warm start at 11,700 years ago comes to a stretch of 12,700 years.', '12,700 years', '9,300 years'],
  ['an apposed span after a start date in the sentence before', ['- In the Marrowby cores the thaw began some 18,000 years ago'], '- and was mostly done by 11,700 years ago, a span of about 4,000 years.', 'about 4,000 years', 'about 6,300 years'],
  ['"It" carrying on, "a stretch of"', ['Warming set in around 17,500 years ago.'], 'It was over by 11,700 years ago, a stretch of some 3,800 years.', 'some 3,800 years', 'some 5,800 years'],
];

// Never flagged: right sums and look-alikes.
const RIGHT: [string, string[], string][] = [
  ['right span after "is"', [], 'From the glacial peak 21,000 years ago to the Holocene 11,700 years ago is about 9,300 years.'],
  ['right span in brackets', [], 'From the Bølling warming (14,700 years ago) to the Younger Dryas (12,900 years ago) was 1,800 years.'],
  ['a duration of something else after "is"', [], 'From the glacial peak 21,000 years ago to the Holocene 11,700 years ago is a story told in 400 metres of ice.'],
  ['an apposed span of another stretch: no carrying on', ['The Holocene began 11,700 years ago.'], 'The Younger Dryas ended about 11,700 years ago, a span of some 1,200 years.'],
  ['an apposed span with no start word before', ['Sea level stood low 21,000 years ago.'], 'It was far higher by 11,700 years ago, a span of 5,000 years.'],
  ['right apposed span', ['The thaw started about 18,000 years ago.'], 'It was over by 11,700 years ago, a span of some 6,300 years.'],
];

describe('checkArithmetic: spans between two dates', () => {
  it.each(WRONG)('%s', (_why, before, sentence, flagged, correction) => {
    const flags = check(sentence, before);
    expect(flags).toHaveLength(1);
    const [f] = flags;
    expect(f?.ruleId).toBe('arith.duration');
    expect(sentence.slice(f?.start, f?.end)).toBe(flagged);
    expect(f?.correction).toBe(correction);
  });

  it.each(RIGHT)('leaves alone: %s', (_why, before, sentence) => {
    expect(check(sentence, before)).toEqual([]);
  });
});
