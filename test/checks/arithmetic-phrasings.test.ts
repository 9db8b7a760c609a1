import { describe, expect, it } from 'vitest';
import { checkArithmetic } from '../../src/checks/arithmetic.js';
import { parseQuantities } from '../../src/quantities/index.js';

/** Checks the last sentence, with the ones before it as the paragraph's context. */
const check = (...sentences: string[]) => {
  const text = sentences[sentences.length - 1] ?? '';
  return checkArithmetic(text, parseQuantities(text), sentences.slice(0, -1));
};

// Phrasings of changes, spans, rates and ratios the frames read since the arith tuning pass:
// [rule id, sentences (the last one is checked), flagged text, correction]. The right values are
// the sentences' own numbers worked by hand (common practice: arithmetic on the draft's numbers).
const WRONG: [string, string[], string, string][] = [
  // Two levels, then the change between them in apposition: 275 − 185 = 90.
  ['arith.change', ['In the Harrow Fell core, CO2 stood near 185 ppm in the cold stages and near 275 ppm in the warm ones, a swing of about 150 ppm.'], 'about 150 ppm', 'about 90 ppm'],
  // The same across a semicolon, with a change noun the frames did not know ("climb"): 280 − 200 = 80.
  ['arith.change', ['At the glacial peak CO2 sat close to 200 ppm; by the Holocene it had reached 280 ppm, a climb of some 120 ppm.'], 'some 120 ppm', 'some 80 ppm'],
  // Two levels, then the change drawn as their consequence: 420 − 280 = 140; 265 − 190 = 75.
  ['arith.change', ['At the Harrow Fell station the air held 280 ppm in 1900 and holds 420 ppm now, which makes the increase 240 ppm.'], '240 ppm', '140 ppm'],
  ['arith.change', ['The core gave about 190 ppm at the glacial peak, and about 265 ppm by the early Holocene, so it climbed about 95 ppm.'], 'about 95 ppm', 'about 75 ppm'],
  // A written sum: 420 − 280 = 140.
  ['arith.change', ['Answer: 420 − 280 = 160, so the rise since 1750 is about 160 ppm.'], '160', '140'],
  // An amount followed at once by its span is the change a rate divides: 90 ppm / 7,000 yr = 1.29 ppm per century.
  ['arith.rate', ['Roughly 90 ppm over some 7,000 years: close to 3 ppm a century.'], 'close to 3 ppm a century', 'close to 1.3 ppm a century (about 0.013 ppm per year)'],
  // A fraction "of" a value: 180 / 420 = 0.429.
  ['arith.ratio', ['Glacial air held 180 ppm of CO2, roughly a quarter of the 420 ppm measured today.'], 'roughly a quarter', 'roughly 43 percent'],
  // A percentage of a base: 140 / 280 = 50 percent.
  ['arith.ratio', ['Against the 280 ppm of the pre-industrial air, the 140 ppm added since is a rise of 30 percent.'], '30 percent', '50 percent'],
  // "Times faster" in one sentence and across two: 2.5 ppm a year ÷ 1 ppm per century = 250.
  ['arith.ratio', ['At 2.5 ppm a year, today\'s rise is 25 times faster than the 1 ppm per century of the deglaciation.'], '25 times', '250 times'],
  ['arith.ratio', ['The deglacial rise averaged about 1 ppm per century.', 'Today CO2 climbs by about 2.5 ppm a year, some 25 times faster.'], 'some 25 times', 'some 250 times'],
  // A span restated in the next sentence: 14,700 − 12,700 = 2,000; 5,900 − 5,300 = 600.
  ['arith.duration', ['The Antarctic Cold Reversal began about 14,700 years ago and ended about 12,700 years ago.', 'That is a pause of some 3,000 years.'], 'some 3,000 years', 'some 2,000 years'],
  ['arith.duration', ['The Kestrel Moss wet phase began 5,900 years ago and ended 5,300 years ago.', 'Answer: so it lasted about 900 years.'], 'about 900 years', 'about 600 years'],
  // A hedged range of dates in the sentence before: 18,000 − 11,500 = 6,500.
  ['arith.duration', ['The moraine record spans between about 18,000 and 11,500 years ago.', 'That works out to a retreat spread over some 9,000 years.'], 'some 9,000 years', 'some 6,500 years'],
  // "so call it" before the span of a began-ended pair: 16,000 − 11,000 = 5,000.
  ['arith.duration', ['The thaw in the Harrow valley started about 16,000 years ago and was over by 11,000 years ago, so call it three thousand years of melting.'], 'three thousand years', '5,000 years'],
];

// Right arithmetic in the same phrasings, and sentences that only look like them: never flagged.
const RIGHT: string[][] = [
  ['CO2 stood near 180 ppm in glacials and near 280 ppm in interglacials, a swing of about 100 ppm.'],
  ['At the glacial peak CO2 sat close to 190 ppm; by the Holocene it had reached 280 ppm, a climb of some 90 ppm.'],
  ['Answer: 280 − 190 = 90, so CO2 rose by 90 ppm.'],
  ['At the Harrow Fell station the air held 280 ppm in 1900 and holds 420 ppm now, which makes the increase 140 ppm.'],
  ['The core gave about 190 ppm at the glacial peak, and about 265 ppm by the early Holocene, so it climbed about 75 ppm.'],
  ['Roughly 80 ppm over some 6,000 years is about 1.3 ppm per century.'],
  ['Glacial air held about 190 ppm of CO2, a little under half of today\'s 420 ppm.'],
  ['Against the 280 ppm of 1750, the 140 ppm added since is a rise of 50 percent.'],
  ['The deglacial rise averaged about 1 ppm per century.', 'Today CO2 climbs by about 2.5 ppm a year, some 250 times faster.'],
  ['The Antarctic Cold Reversal began about 14,700 years ago and ended about 12,700 years ago.', 'That is a pause of some 2,000 years.'],
  // A later span, a span of something else, and a sentence that does not refer back.
  ['The thaw began about 18,000 years ago and ended about 11,700 years ago.', 'That is why the next 2,000 years were so calm.'],
  ['The thaw began about 18,000 years ago and ended about 11,700 years ago.', 'After that came 1,000 years of calm.'],
  // Two levels with no change in apposition, and a pair whose end is followed by its span.
  ['CO2 was 280 ppm in 1750 and is 420 ppm today, and it rose 2.4 ppm last year.'],
  ['CO2 climbed from about 190 to 265 ppm over roughly 6,000 years, close to 1.25 ppm per century.'],
];

describe('checkArithmetic: phrasings of changes, spans, rates and ratios', () => {
  it.each(WRONG)('%s flags: %j', (ruleId, sentences, flagged, correction) => {
    const flags = check(...sentences);
    expect(flags).toHaveLength(1);
    const [f] = flags;
    const text = sentences[sentences.length - 1] ?? '';
    expect(f?.ruleId).toBe(ruleId);
    expect(text.slice(f?.start, f?.end)).toBe(flagged);
    expect(f?.correction).toBe(correction);
  });

  it.each(RIGHT)('leaves alone: %j', (...sentences) => {
    expect(check(...sentences)).toEqual([]);
  });
});
