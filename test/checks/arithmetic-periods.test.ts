import { describe, expect, it } from 'vitest';
import { check, flagged } from './arithmetic-at.js';

// A yearly pace told again over a longer period: restated per decade, or an amount gathered over
// one period named with no figure ("over the decade", "in a century"), or after a bare figure that
// recurs every year. Sums by hand (common practice of arithmetic), sentences our own:
// 3 ppb/yr × 10 = 30 ppb; 1 cm/yr × 100 = 1 m; 1.5 ppm/yr × 10 = 15 ppm.
describe('an amount over one period drawn from a yearly pace', () => {
  it.each([
    [['At 3 ppb per yr that is about 40 ppb a decade.'], 'about 40 ppb a decade', 'about 30 ppb a decade (about 3 ppb per year)'],
    [['Through the 2000s methane climbed about 3 ppb a year, which over the decade comes to roughly 40 ppb.'], 'roughly 40 ppb', 'roughly 30 ppb'],
    [['Methane rose 3 ppb per year through the 2000s,', 'adding some 15 ppb over the decade as a whole.'], 'some 15 ppb', 'some 30 ppb'],
    [['The sea rose 1 cm a year through the thaw.', 'Over a century that is about 3 m.'], 'about 3 m', 'about 1 m'],
    [['Methane going up 1.5 a year for ten years, that is 150 ppm in a decade.'], '150 ppm', '15 ppm'],
  ] as [string[], string, string][])('%j: flags %s', (sentences, text, correction) => {
    expect(flagged(...sentences)).toEqual([[expect.stringMatching(/^arith\./u), text, correction]]);
  });

  it.each([
    ['right product', ['Methane rose about 3 ppb a year, which over the decade comes to roughly 30 ppb.']],
    ['right restatement', ['At 3 ppb per yr, that is about 30 ppb a decade.']],
    // Another stretch of its own: "the last decade" is no decade at the pace before.
    ['a time of its own', ['In the 1990s it rose 1.5 ppm a year and in the last decade it added 24 ppm.']],
    // Two paces set against each other, no link word: two times compared, not one pace restated.
    ['two times compared', ['It rose about 2 ppm per year in the 2000s, against 24 ppm per decade now.']],
    ['no period named', ['Methane rose about 3 ppb a year, which comes to roughly 40 ppb since 2010.']],
    // A stretch told vaguely, after a pace of the sentence before: jumps of another time, no product.
    ['a vague stretch', ['Averaged out, the 70 ppm rise over 7,000 years is 0.01 ppm a year.', 'Inside it the Orrin core shows sudden steps of 8 to 12 ppm, each over a century or two.']],
    ['a new stretch after a pace before', ['Averaged out, the rise ran at 0.01 ppm a year.', 'Yet the Orrin core shows sudden steps of 8 ppm in a century.']],
  ] as [string, string[]][])('leaves alone: %s', (_why, sentences) => {
    expect(check(...sentences)).toEqual([]);
  });
});
