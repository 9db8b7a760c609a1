import { describe, expect, it } from 'vitest';
import { check, flagged } from './arithmetic-at.js';

// A series whose span, count and length of each member stand in one sentence, the member told as
// its subject ("each one ran for", "each glacial stage lasted"), per member ("years per cycle"), or
// a count of the members a pronoun stands for ("nine of them"); the span may stand with no word of
// a span before it ("300,000 years shared by three cycles"). Sums by hand (common practice of
// arithmetic); the sentences are our own inventions: 300,000 / 3 = 100,000; 600,000 / 6 =
// 100,000; 500,000 / 5 = 100,000; 400,000 / 100,000 = 4; 240k / 6 = 40k.
describe('the length of each member of a series, or their count, drawn from its span', () => {
  it.each([
    ['300,000 years divided among three cycles means each one ran for about 150,000 years.', 'about 150,000 years', 'about 100,000 years'],
    ['The record gives 600,000 years and six cycles, so each glacial stage lasted about 80,000 years.', 'about 80,000 years', 'about 100,000 years'],
    ['Our 500,000 years break into five cycles, which is roughly 125,000 years per cycle.', 'roughly 125,000 years', 'roughly 100,000 years'],
    ['Over 400,000 years the ice returned roughly every 100,000 years, so the core records about seven cycles.', 'about seven cycles', 'about 4 cycles'],
    ['240k years and 6 cycles so thats 30k years per cycle', '30k years', '40k years'],
  ] as [string, string, string][])('%s: flags %s', (sentence, text, correction) => {
    expect(flagged(sentence)).toEqual([[expect.stringMatching(/^arith\./u), text, correction]]);
  });

  it.each([
    ['300,000 years divided among three cycles means each one ran for about 100,000 years.'],
    ['The record gives 600,000 years and six cycles, so each glacial stage lasted about 100,000 years.'],
    ['Our 500,000 years break into five cycles, which is roughly 100,000 years per cycle.'],
    // "each" after a figure belongs to that figure: the total is a product, and right (5 × 100,000).
    ['Five cycles at 100,000 years each gives us about 500,000 years of record.'],
    // A member that is a unit of time is no member of the series.
    ['The record gives 600,000 years and six cycles, so each year of the record stands for about 80,000 years of drift.'],
    // Two spans and no link: nothing is drawn.
    ['The 600,000-year record and the 400,000 years of the older core hold six cycles each lasting about 80,000 years.'],
  ])('leaves alone: %s', (sentence) => {
    expect(check(sentence)).toEqual([]);
  });
});
