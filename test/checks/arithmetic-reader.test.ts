/**
 * The broad arithmetic reader (src/checks/arithmetic-reader/): a figure stated as the difference,
 * relative change, multiple or span of figures before it, however loosely it is linked to them.
 * Every sentence here is written for this test (places and sites are invented; the figures are of
 * the sizes the ice-core literature reports) and appears in no corpus file. The arithmetic itself
 * is subtraction and division (common practice); each case states its sum.
 */
import { describe, expect, it } from 'vitest';
import { flagged } from './arithmetic-at.js';

describe('a change between two levels, loosely linked', () => {
  // Sums (common practice): 690 − 380 = 310; 4.6 − 3.1 = 1.5; 212 − 180 = 32; 296 − 182 = 114;
  // 262 − 188 = 74; 285 − 185 = 100; 265 − 190 = 75; 95 − 25 = 70; 90 − 20 = 70; 410 − 280 = 130.
  it.each([
    ['so a swing of', ['Methane in the Tarnwick core sat near 380 ppb in the cold phase and 690 ppb in the warm one, so a swing of about 150 ppb.'], 'about 150 ppb', 'about 310 ppb'],
    ['a bare particle', ['The harbour gauge read 3.1 m at dawn and 4.6 m by noon, up 2.5 m.'], '2.5 m', '1.5 m'],
    ['which is a fall of', ['The shoreline of Lake Orva dropped from a high stand of 212 m to a low of 180 m, which is a fall of roughly 50 m.'], 'roughly 50 m', 'roughly 32 m'],
    ['a bare level takes the unit', ['The lowest CO2 in the Pellam record is 182 and the highest 296 ppm, so the series moves 150 ppm top to bottom.'], '150 ppm', '114 ppm'],
    ['a signed figure', ['At the coldest point the Brask site read 188 ppm, and by the early Holocene ~262 ppm, so +90 ppm in all.'], '+90 ppm', '74 ppm'],
    ['a change verb of its own', ['Between a glacial floor of 185 ppm and an interglacial ceiling of 285 ppm the air gained some 140 ppm of CO2.'], 'some 140 ppm', 'some 100 ppm'],
    ['all bare, a jump of', ['The Vell Ridge curve goes from 190 in the cold phase to about 265 at the thaw, which is a jump of about 120.'], 'about 120', 'about 75'],
    ['the rest of a stated whole', ['Of the 95 ppm gained, ocean warming supplied about 25 ppm, and the rest, some 90 ppm, came from the deep ocean.'], 'some 90 ppm', 'some 70 ppm'],
    ['the remaining part', ['Suppose cooler seas took up 20 of the 90 ppm; the land and the deep ocean would then hold the remaining 50.'], '50', '70 ppm'],
    ['more than a level named after it', ['By 2020 the Corran inlet read about 410 ppm.', 'In other words, it held some 170 ppm more CO2 than the pre-industrial 280 ppm.'], 'some 170 ppm', 'some 130 ppm'],
  ] as [string, string[], string, string][])('%s', (_why, sentences, words, correction) => {
    expect(flagged(...sentences)).toEqual([['arith.change', words, correction]]);
  });

  // Correct sums and figures about other things stay clean (common practice: 280 − 190 = 90; 4.6 − 3.1 = 1.5).
  it.each([
    ['right', ['CO2 went from 190 ppm to 280 ppm, a rise of 90 ppm.']],
    ['right, a bare particle', ['The harbour gauge read 3.1 m at dawn and 4.6 m by noon, up 1.5 m.']],
    ['right, the rest', ['Of the 95 ppm gained, ocean warming supplied about 25 ppm, and the rest, some 70 ppm, came from the deep ocean.']],
    ['another gas after "while"', ['CO2 stood at 190 ppm at the glacial peak and 280 ppm before industry, while methane rose by 300 ppb.']],
    ['added on top', ['It climbed from 190 to 280 ppm over the thaw and has since added another 140 ppm.']],
    ['a change that recurs', ['The Corran inlet read 280 ppm in 1750 and 420 ppm in 2023, and it now rises by 2.5 ppm every year.']],
    ['a change counted from its own base', ['By then it was 280 ppm, up 40 ppm on the ice-age mean.']],
    ['a restated unit is no change', ['For a difference you multiply by 1.8, so 6 °C is roughly 11 °F, with no adding 32.']],
    ['a place on the globe', ['Lowland sites between 40° S and 30° N cooled by about 5 °C.']],
    ['a part of the change', ['CO2 went from 190 to 280 ppm, with the sharpest jump of 40 ppm in the Bølling warming.']],
    ['a part of the change, including', ['Across the thaw the Vell core climbs from 188 ppm to 265 ppm, including a rise of about 35 ppm in two short steps.']],
    ['no word referring back', ['The Orrin display gives the glacial level as 190 ppm.', 'Its second panel shows the air climbing to 280 ppm, a rise of 40 ppm.']],
  ] as [string, string[]][])('leaves alone: %s', (_why, sentences) => {
    expect(flagged(...sentences)).toEqual([]);
  });
});

describe('a relative change between two levels', () => {
  // Sums (common practice): 1 − 9/12 = 0.25; 450/300 − 1 = 0.5; 700/380 − 1 = 0.84; 420/280 − 1 = 0.5.
  it.each([
    ['a loss of a percentage', ['The glacier shrank from 12 km to 9 km, a loss of roughly 40 percent.'], 'roughly 40 percent', 'roughly 25 percent'],
    ['a fraction after a copula', ['Going from 300 to 450 ppm is an increase of about a quarter.'], 'about a quarter', 'about 50 percent'],
    ['a colon and "up"', ['Methane was 380 ppb then and 700 ppb later: that is up about 30 percent.'], 'about 30 percent', 'about 84 percent'],
    ['a level in the sentence before', ['Before industry the Corran inlet read about 280 ppm.', 'Its 2023 mean, 420 ppm, is about 140 ppm above that, a rise of roughly a quarter.'], 'roughly a quarter', 'roughly 50 percent'],
  ] as [string, string[], string, string][])('%s', (_why, sentences, words, correction) => {
    expect(flagged(...sentences)).toEqual([['arith.ratio', words, correction]]);
  });

  it.each([
    ['right, a fraction of a drop', ['The glacier shrank from 12 km to 9 km, a loss of a quarter.']],
    ['right, a level before', ['Before industry the Corran inlet read about 280 ppm.', 'Its 2023 mean, 420 ppm, is about 140 ppm above that, a rise of roughly a half.']],
    ['a share, not a change', ['Of the 420 ppm in the air today, about a third came from burning coal, oil and gas.']],
    ['a share of something named after it, after a phrasal verb', ['CO2 was about 280 ppm in 1750 and about 420 ppm in 2023, and the ocean has taken up roughly a quarter of our emissions.']],
    ['a share of the rise', ['The Corran inlet went from 280 ppm to 420 ppm, and up to 40 percent of that rise came from land clearing.']],
  ] as [string, string[]][])('leaves alone: %s', (_why, sentences) => {
    expect(flagged(...sentences)).toEqual([]);
  });
});

describe('a multiple of two paces or levels', () => {
  // Sums (common practice): 2 ÷ 0.02 = 100; 3,200 ÷ 800 = 4; 12 ÷ 3 = 4.
  it.each([
    ['two rates, so times faster', ['Growth ran ~0.02 ppm a year then and ~2 ppm a year in the 2010s, so about 20 times faster.'], 'about 20 times', 'about 100 times'],
    ['two levels, twice the measure', ['The Sorrel ice cap is 3,200 m thick against 800 m at the coast, which is about twice the coastal thickness.'], 'about twice', 'about 4 times'],
  ] as [string, string[], string, string][])('%s', (_why, sentences, words, correction) => {
    expect(flagged(...sentences)).toEqual([['arith.ratio', words, correction]]);
  });

  it.each([
    ['right', ['At 12 mm a year against 3 mm a year, the new pace is four times the old one.']],
    ['a measure per doubling', ['Sensitivity from the glacial cooling comes out near 3.4 °C per doubling, close to the 3 °C best estimate.']],
    ['each doubling', ['Forcing goes with the logarithm of concentration, so each doubling adds about the same 3.7 W/m².']],
  ] as [string, string[]][])('leaves alone: %s', (_why, sentences) => {
    expect(flagged(...sentences)).toEqual([]);
  });
});

describe('a span of time between two dates', () => {
  // Sums (common practice): 13,100 − 12,300 = 800; 9,400 − 8,200 = 1,200; 17,000 − 11,000 = 6,000.
  it.each([
    ['so, after a start and an end', ['The cold spell began 13,100 years ago and ended 12,300 years ago, so roughly 2,000 years of cold.'], 'roughly 2,000 years', 'roughly 800 years'],
    ['an apposition after a range of dates', ['From 9,400 to 8,200 years ago, a stretch of about 3,000 years, the lake stayed low.'], 'about 3,000 years', 'about 1,200 years'],
    ['"later", the start in the sentence before', ['The thaw at Hollin Moss began about 17,000 years ago.', 'By 11,000 years ago, some 9,000 years later, the ice was gone.'], 'some 9,000 years', 'some 6,000 years'],
  ] as [string, string[], string, string][])('%s', (_why, sentences, words, correction) => {
    expect(flagged(...sentences)).toEqual([['arith.duration', words, correction]]);
  });

  it.each([
    ['right', ['The cold spell began 13,100 years ago and ended 12,300 years ago, so roughly 800 years of cold.']],
    ['a stretch after the end', ['It began 9,300 years ago and ended 8,900 years ago, after which came 600 years of drought.']],
    ['a lag, not a span', ['The Younger Dryas set in about 12,900 years ago.', 'I read that the CO2 came 800 years after the warming.']],
    ['a further stretch', ['The cold snap ran from 12,900 to 11,700 years ago, and a further 600 years later the ice was gone.']],
  ] as [string, string[]][])('leaves alone: %s', (_why, sentences) => {
    expect(flagged(...sentences)).toEqual([]);
  });
});

describe('pairs written as a range, results set in the present, brackets and bare paces', () => {
  // Sums (common practice): 410 − 270 = 140; 290 − 185 = 105; 418 − 280 = 138; 14,700 − 12,900 = 1,800;
  // 2.4 ÷ 0.012 = 200; 420 ÷ 280 − 1 = 0.5.
  it.each([
    ['a range from one level to another', ['Going from 270 to 410 since the early 1800s, so up 160 ppm in two centuries.'], 'arith.change', '160 ppm', '140 ppm'],
    ['a range, a swing after it', ['The Vell record runs 185 to 290 ppm, which is a swing of roughly 150 ppm.'], 'arith.change', 'roughly 150 ppm', 'roughly 105 ppm'],
    ['a present result with a present level before it', ['In 2022 the Corran inlet averaged about 418 ppm.', "In other words, today's air holds some 180 ppm more CO2 than the pre-industrial 280 ppm."], 'arith.change', 'some 180 ppm', 'some 138 ppm'],
    ['a span after a bracketed range of dates', ['Map the Bølling warm phase (14,700 to 12,900 years BP), a 1,000-year window, at high resolution.'], 'arith.duration', '1,000-year', '1,800-year'],
    ['a bare pace per year beside a written one', ['Growth ran ~2.4 ppm a year in the 2010s vs ~0.012 a year in the thaw, so about 20 times faster.'], 'arith.ratio', 'about 20 times', 'about 200 times'],
    ['a fraction two sentences on, the change given as its base', ['In 2022 the inlet averaged 420 ppm.', 'That is 140 ppm more than the 280 ppm of 1750.', 'Put another way, the air now holds about a third more CO2 than before industry.'], 'arith.ratio', 'about a third', 'about 50 percent'],
  ] as [string, string[], string, string, string][])('%s', (_why, sentences, rule, words, correction) => {
    expect(flagged(...sentences)).toEqual([[rule, words, correction]]);
  });

  it.each([
    ['a range, right', ['The Vell record runs 185 to 290 ppm, which is a swing of roughly 100 ppm.']],
    ['readings spread over a range', ['Levels of 180 to 190 ppm at the glacial peak and 280 ppm before industry make a rise of roughly 95 ppm.']],
    ['a present result with no present level', ['Glacial air held about 190 ppm.', "So today's air holds some 180 ppm more CO2 than the pre-industrial 280 ppm."]],
    ['a bracketed span, right', ['Map the Bølling warm phase (14,700 to 12,900 years BP), a 1,800-year window, at high resolution.']],
    ['a bare pace in another unit than the written one', ['Sea level rose ~3.6 mm a year lately vs ~1.2 a year last century, so about 3 times faster.']],
    ['a rounded percentage', ['Before industry the inlet read 278 ppm, and in 2024 about 424 ppm, so about 50 percent higher.']],
    ['the change as a share of where it started, right', ['In 2022 the inlet averaged 420 ppm.', 'That is 140 ppm more than the 280 ppm of 1750.', 'Put another way, the air now holds about half as much CO2 again as before industry.']],
  ] as [string, string[]][])('leaves alone: %s', (_why, sentences) => {
    expect(flagged(...sentences)).toEqual([]);
  });
});

describe('a multiple of paces worked out from amounts and the times they took', () => {
  // Sums (common practice): (140 ÷ 200) ÷ (100 ÷ 7,000) = 49; (45 ÷ 90) ÷ (30 ÷ 600) = 10; (6 ÷ 300) ÷ (4 ÷ 5,000) = 25.
  it.each([
    ['versus, times faster', ['So 100 ppm over 7,000 years versus 140 ppm over about 200 years means we are only about 10 times faster than nature managed.'], 'about 10 times', 'about 49 times'],
    ['but, so times faster', ['The Halm glacier lost 30 m over 600 years, but 45 m in 90 years, so it is now retreating about 3 times faster.'], 'about 3 times', 'about 10 times'],
    ['against, which is', ['Warming of 4 °C across 5,000 years against 6 °C within 300 years, which is about 60 times the pace.'], 'about 60 times', 'about 25 times'],
  ] as [string, string[], string, string][])('%s', (_why, sentences, words, correction) => {
    expect(flagged(...sentences)).toEqual([['arith.ratio', words, correction]]);
  });

  it.each([
    ['right', ['The Halm glacier lost 30 m over 600 years, but 45 m in 90 years, so it is now retreating about 10 times faster.']],
    ['a time counted back from now ("the last 90 years") is left to the rate rules', ['The Halm glacier lost 30 m over 600 years, but 45 m in the last 90 years, so it is now retreating about 3 times faster.']],
  ] as [string, string[]][])('leaves alone: %s', (_why, sentences) => {
    expect(flagged(...sentences)).toEqual([]);
  });
});

describe('a change restated in another unit after "or"', () => {
  // Sums (common practice): 410 − 280 = 130; 212 − 180 = 32; 5.1 − 3.9 = 1.2.
  it.each([
    ['a percentage since a time, or an amount', ['Before industry the Tarn inlet read about 280 ppm.', 'By 2020 it had reached about 410 ppm, a rise of 46 percent since then, or roughly 90 ppm.'], 'roughly 90 ppm', 'roughly 130 ppm'],
    ['a drop as a percentage, or in metres', ['The lake fell from 212 m to 180 m, a drop of 15 percent, or about 20 m.'], 'about 20 m', 'about 32 m'],
    ['that is', ['The Marrow Sound gauge went from 3.9 m to 5.1 m, a gain of roughly 30 percent, that is 2.1 m.'], '2.1 m', '1.2 m'],
  ] as [string, string[], string, string][])('%s', (_why, sentences, words, correction) => {
    expect(flagged(...sentences)).toEqual([['arith.change', words, correction]]);
  });

  it.each([
    ['right', ['The lake fell from 212 m to 180 m, a drop of 15 percent, or about 32 m.']],
    ['right, across sentences', ['Before industry the Tarn inlet read about 280 ppm.', 'By 2020 it had reached about 410 ppm, a rise of 46 percent since then, or roughly 130 ppm.']],
    ['an alternative level, not a restated change', ['Glacial CO2 sat near 190 ppm, or 185 ppm in the Dome Fuji series.']],
  ] as [string, string[]][])('leaves alone: %s', (_why, sentences) => {
    expect(flagged(...sentences)).toEqual([]);
  });
});

describe('a change noun heading the subject, the figure its complement', () => {
  // Sums (common practice): 276 − 183 = 93; 690 − 380 = 310; 282 − 194 = 88.
  it.each([
    ['a pair inside the subject, after a comma', ['The usual swing, from roughly 183 ppm in a cold stage to roughly 276 ppm in a warm stage, is about 130 ppm.'], 'about 130 ppm', 'about 93 ppm'],
    ['a pair inside the subject', ['The climb from 380 ppb to 690 ppb was some 200 ppb in the Tarnwick methane record.'], 'some 200 ppb', 'some 310 ppb'],
    ['a parenthesis and "comes to"', ['The Pellam core held about 282 ppm in its warm stages.', 'Its cold stages sat nearer 194 ppm.', 'So the gap between cold and warm, on my reckoning, comes to 120 ppm.'], '120 ppm', '88 ppm'],
  ] as [string, string[], string, string][])('%s', (_why, sentences, words, correction) => {
    expect(flagged(...sentences)).toEqual([['arith.change', words, correction]]);
  });

  // The same frames with the right sum, and nouns that are no subject of the copula, stay clean.
  it.each([
    ['right', ['The usual swing, from roughly 183 ppm in a cold stage to roughly 276 ppm in a warm stage, is about 93 ppm.']],
    ['a noun in a phrase before the subject', ['At the start of the rise, CO2 at the Brask site was 190 ppm and by its end 265 ppm.']],
    ['a noun after a preposition', ['During the climb in temperature the Brask air was 240 ppm, against 190 ppm at the glacial floor.']],
    ['a range as the complement', ['The spread of the Pellam readings was 180 to 300 ppm, from a floor of 180 ppm to a ceiling of 300 ppm.']],
  ] as [string, string[]][])('leaves alone: %s', (_why, sentences) => {
    expect(flagged(...sentences)).toEqual([]);
  });
});
