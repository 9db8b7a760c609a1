import { describe, expect, it } from 'vitest';
import { parseQuantities } from '../../src/quantities/index.js';
import { check, flagged } from './arithmetic-at.js';
import { readNumberWords } from '../../src/quantities/number-words.js';
import { hasTwoNumerals } from '../../src/quantities/two-numerals.js';


// Levels stated earlier in the paragraph. The right values are the sentences' own numbers worked
// by hand (common practice): 275 ÷ 185 − 1 = 48.6 %; 280 − 200 = 80; 9 − 3 = 6 °C; 419 − 280 = 139;
// 40 − 25 = 15 m.
describe('a change whose levels stand earlier in the paragraph', () => {
  it.each([
    // [sentences..., flagged text, correction]
    [['In the Harrowgate exercise, CO2 goes from 185 ppm to 275 ppm across the thaw.', 'How much is that, and by what share?', 'Answer: it rose by 90 ppm, an increase of roughly 20 percent.'], 'roughly 20 percent', 'roughly 49 percent'],
    [['Pupils read CO2 climbing from 200 ppm to 280 ppm over the termination.', 'So it went up by 60 ppm.'], '60 ppm', '80 ppm'],
    [['The panel has the lake warming from 3 °C to 9 °C between the stadial and the Holocene.', 'That is a rise of 4 °C in summer water.'], '4 °C', '6 °C'],
    [['The 2023 annual mean at the Corran Head inlet was 419 ppm.', 'Before industry the air held about 280 ppm, so the 2023 value is some 100 ppm higher.'], 'some 100 ppm', 'some 139 ppm'],
    [['Our guide says the lake stood 40 m deep at the stadial.', 'Today it is 25 m deep, so it has dropped by 25 m.'], '25 m', '15 m'],
  ] as [string[], string, string][])('%j: flags %s', (sentences, text, correction) => {
    const found = flagged(...sentences);
    expect(found).toHaveLength(1);
    expect(found[0]?.[1]).toBe(text);
    expect(found[0]?.[2]).toBe(correction);
    expect(check(...sentences)[0]?.reason).toMatch(/^By the paragraph's own numbers/u);
  });

  it.each([
    ['right sums', ['Pupils read CO2 climbing from 200 ppm to 280 ppm over the termination.', 'So it went up by 80 ppm, or 40 percent.']],
    ['right difference', ['The 2023 annual mean at the Corran Head inlet was 419 ppm.', 'Before industry the air held about 280 ppm, so the 2023 value is some 140 ppm higher.']],
    // The change is held against something it names itself, not against the earlier level.
    ['held against a named level', ['The 2023 annual mean at the Corran Head inlet was 419 ppm.', 'Before industry the air held about 280 ppm, so CO2 is now 30 ppm higher than in 1990.']],
    ['no reference back', ['Pupils read CO2 climbing from 200 ppm to 280 ppm over the termination.', 'Methane rose by 300 ppb in the same window.']],
    ['two pairs in the earlier sentence', ['CO2 climbed from 190 to 240 ppm and then from 240 to 280 ppm.', 'So it went up by 50 ppm in each step.']],
    ['another level in between', ['CO2 climbed from 200 ppm to 280 ppm over the termination.', 'By 1950 it stood at 310 ppm.', 'So it went up by 30 ppm in the industrial age.']],
    ['other unit', ['CO2 climbed from 200 ppm to 280 ppm over the termination.', 'So methane rose by 350 ppb.']],
    ['level here without a consequence word', ['The 2023 annual mean at the Corran Head inlet was 419 ppm.', 'Glacial air held 190 ppm and the rise of 90 ppm came later.']],
  ] as [string, string[]][])('leaves alone: %s', (_why, sentences) => {
    expect(check(...sentences)).toEqual([]);
  });
});

// Worked sums whose result is given in words, as handouts write them. Sums by hand (common practice):
// 265 − 190 = 75; 90 ÷ 6,000 = 0.015; 12 × 4 = 48.
describe('a worked sum with its result in words', () => {
  it.each([
    ['The climb is 265 − 190, an increase of 85 ppm.', '85 ppm', '75 ppm'],
    ['90 ÷ 6,000 gives roughly 0.15 ppm per year.', 'roughly 0.15 ppm per year', 'roughly 0.015 ppm per year'],
    ['Twelve layers a year for four years: 12 × 4 makes 36 layers.', '36', '48'],
    ['Taking 265 − 190 comes to 65 ppm.', '65 ppm', '75 ppm'],
  ])('%s flags %s', (sentence, text, correction) => {
    const found = flagged(sentence);
    expect(found.map((f) => f[1])).toContain(text);
    expect(found.find((f) => f[1] === text)?.[2]).toBe(correction);
  });

  it.each([
    'The climb is 265 − 190, an increase of 75 ppm.',
    '90 ÷ 6,000 gives about 0.015 ppm per year.',
    '18.2 − 9 = 9 °C, to the nearest degree.',
    'Between 280 and 180 there is a gap of 100 ppm.',
  ])('leaves alone: %s', (sentence) => {
    expect(check(sentence)).toEqual([]);
  });
});

// A pace as an amount per interval, and a duration from a sentence's only two dates. Sums by hand
// (common practice): 80 ppm / 8,000 yr = 0.1 ppm per decade; 120 m / 12,000 yr = 1 m per 100 yr;
// 21,000 − 11,000 = 10,000 years; (421 − 411) / (2023 − 2019) = 2.5 ppm a year.
describe('paces and spans the sentence states in other words', () => {
  it.each([
    ['CO2 rose by some 80 ppm over about 8,000 years, on average 2 ppm every decade.', 'rate', '2 ppm every decade'],
    ['CO2 rose by some 80 ppm over about 8,000 years, roughly 1 ppm every ten years.', 'rate', 'roughly 1 ppm'],
    ['The sea climbed about 120 metres between 20,000 and 8,000 years ago, so it rose a metre every 30 years.', 'rate', '30 years'],
    ['At 21,000 years ago CO2 was near 190 ppm and by 11,000 years ago near 260 ppm, so it gained 70 ppm in about 3,000 years.', 'duration', 'about 3,000 years'],
    ['The inlet reading went from 411 ppm in 2019 to 421 ppm in 2023, an average of 5 ppm a year.', 'rate', '5 ppm a year'],
    ['The shoreline went up about 60 metres between eighteen thousand and twelve thousand years ago, a metre every 50 years.', 'rate', '50 years'],
  ])('%s', (sentence, rule, text) => {
    const found = flagged(sentence);
    expect(found.map((f) => `${String(f[0])} ${String(f[1])}`)).toContain(`arith.${rule} ${text}`);
  });

  it.each([
    'CO2 rose by some 80 ppm over about 8,000 years, on average 1 ppm every century.',
    'CO2 rose by some 80 ppm over about 8,000 years, roughly 0.1 ppm every ten years.',
    'The sea climbed about 120 metres between 20,000 and 8,000 years ago, so it rose a metre every 100 years.',
    'At 21,000 years ago CO2 was near 190 ppm and by 11,000 years ago near 260 ppm, so it gained 70 ppm in about 10,000 years.',
    'The inlet reading went from 411 ppm in 2019 to 421 ppm in 2023, an average of 2.5 ppm a year.',
    // Samples every 50 years are a spacing, not a pace of change.
    'The team sampled the 7,000 years from 18,000 to 11,000 years ago every 50 years.',
  ])('leaves alone: %s', (sentence) => {
    expect(check(sentence)).toEqual([]);
  });
});

describe('numbers in words', () => {
  // Two numbers of a range each keep their own scale (common practice: English number words).
  it('ends a number before a second scale word no smaller than the first', () => {
    expect(readNumberWords(['nineteen', 'thousand', 'and', 'eleven', 'thousand'])).toEqual({ used: 2, value: 19000 });
    expect(readNumberWords(['two', 'million', 'and', 'one', 'thousand'])).toEqual({ used: 5, value: 2001000 });
    expect(readNumberWords(['three', 'hundred', 'and', 'twelve'])).toEqual({ used: 4, value: 312 });
  });

  it('reads a range in words as two dates', () => {
    const [range] = parseQuantities('It happened between nineteen thousand and eleven thousand years ago.');
    expect(range?.low).toBe(11000);
    expect(range?.high).toBe(19000);
  });

  it('counts numbers in digits or words', () => {
    expect(hasTwoNumerals('It went up about 80 metres between nineteen thousand and eleven thousand years ago.')).toBe(true);
    expect(hasTwoNumerals('Forty people came, and twelve stayed.')).toBe(true);
    expect(hasTwoNumerals('It went up about 80 metres.')).toBe(false);
    expect(hasTwoNumerals('A long and slow thaw, half of it in the dark.')).toBe(false);
  });
});

// Wordings of the same frames, sums by hand (common practice): 270 − 185 = 85; 143 ÷ 280 = 51 %;
// 17,000 − 11,000 = 6,000 years.
describe('more wordings of a change and a span', () => {
  it.each([
    [['In the Kelder cores the coldest layers hold about 185 ppm.'], 'By the time the thaw was over, the concentration had reached some 270 ppm, a rise of about 60 ppm.', 'arith.change', 'about 60 ppm'],
    [['The 2024 figure at the Corran Head inlet was 423 ppm.'], 'That is 143 ppm above the 280 ppm of 1750, an increase of over 70 percent.', 'arith.ratio', 'over 70 percent'],
    [[], 'The retreat gets under way about 17,000 years ago and wraps up by 11,000 years ago, so some 8,000 years of melting.', 'arith.duration', 'some 8,000 years'],
    [[], 'The thaw kicked off 17,000 years ago and was over by 11,000 years ago, a span of 4,000 years.', 'arith.duration', '4,000 years'],
  ] as [string[], string, string, string][])('%j %s', (before, sentence, rule, text) => {
    const found = flagged(...before, sentence);
    expect(found.map((f) => `${String(f[0])} ${String(f[1])}`)).toContain(`${rule} ${text}`);
  });

  it.each([
    [['In the Kelder cores the coldest layers hold about 185 ppm.', 'By the time the thaw was over, the concentration had reached some 270 ppm, a rise of about 85 ppm.']],
    [['The 2024 figure at the Corran Head inlet was 423 ppm.', 'That is 143 ppm above the 280 ppm of 1750, an increase of about 51 percent.']],
    [['The retreat gets under way about 17,000 years ago and wraps up by 11,000 years ago, so some 6,000 years of melting.']],
    // Sea level 120 m below today's is a level against today, not a change between two stated levels.
    [['At the glacial peak the sea stood 120 m below today, and the ice was 3 km thick.']],
  ] as [string[]][])('leaves alone: %j', (sentences) => {
    expect(check(...sentences)).toEqual([]);
  });
});

// Spans and changes drawn from dates and levels named by their events. Sums by hand (common
// practice): 130,000 − 116,000 = 14,000; 14,700 − 12,900 = 1,800; 275 − 185 = 90.
describe('ends named by their events, and spans drawn across two sentences', () => {
  it.each([
    [[], 'The interglacial ran from the end of the penultimate glacial, about 130,000 years ago, to the first ice growth some 116,000 years ago, a stretch of roughly 24,000 years.', 'arith.duration', 'roughly 24,000 years'],
    [['Close to 14,700 years ago Greenland warmed abruptly into the Bølling.'], 'That mild spell gave way about 12,900 years ago, so it lasted some 2,800 years.', 'arith.duration', 'some 2,800 years'],
    [['Around 14,700 years ago the Bølling warming began in Greenland.'], 'The warm phase ended by 12,900 years ago, which means it ran for about 800 years.', 'arith.duration', 'about 800 years'],
    [[], 'Glacial air held roughly 185 ppm, so the climb to 275 ppm by the early Holocene added 120 ppm.', 'arith.change', '120 ppm'],
  ] as [string[], string, string, string][])('%j %s', (before, sentence, rule, text) => {
    const found = flagged(...before, sentence);
    expect(found.map((f) => `${String(f[0])} ${String(f[1])}`)).toContain(`${rule} ${text}`);
  });

  it.each([
    [['The interglacial ran from the end of the penultimate glacial, about 130,000 years ago, to the first ice growth some 116,000 years ago, a stretch of roughly 14,000 years.']],
    [['Close to 14,700 years ago Greenland warmed abruptly into the Bølling.', 'That mild spell gave way about 12,900 years ago, so it lasted some 1,800 years.']],
    // A span stated, not drawn from the dates: the sentence before may date something else.
    [['The glacial maximum came about 21,000 years ago.', 'The Younger Dryas ended about 11,700 years ago and lasted some 1,200 years.']],
    [['Glacial air held roughly 185 ppm, so the climb to 275 ppm by the early Holocene added 90 ppm.']],
    // "climbed to" names the end level, not a change: no change is stated here.
    [['Glacial air held roughly 185 ppm, so it climbed to 275 ppm by the early Holocene.']],
  ] as [string[]][])('leaves alone: %j', (sentences) => {
    expect(check(...sentences)).toEqual([]);
  });
});

// A comparison whose subject is the level of the sentence before. Sums by hand (common practice):
// 426 ÷ 280 − 1 = 52 %; 426 ÷ 185 = 2.3 times.
describe('a comparison whose subject stands in the sentence before', () => {
  it.each([
    [['The station averaged 426 ppm over 2025.'], "That's more than 70% above the pre-industrial 280.", 'more than 70%'],
    [['The station averaged 426 ppm over 2025.'], '7/ That is about 30 percent higher than the 280 ppm of 1750.', 'about 30 percent'],
    [['The station averaged 426 ppm over 2025.'], 'It is some four times higher than the glacial 185 ppm.', 'some four times'],
  ] as [string[], string, string][])('%j %s', (before, sentence, text) => {
    const found = flagged(...before, sentence);
    expect(found.map((f) => `${String(f[0])} ${String(f[1])}`)).toContain(`arith.ratio ${text}`);
  });

  it.each([
    [['The station averaged 426 ppm over 2025.', "That's about 52% above the pre-industrial 280."]],
    [['The station averaged 426 ppm over 2025.', 'It is some 2.3 times higher than the glacial 185 ppm.']],
    // Two levels before: which one is compared is not known.
    [['The station averaged 426 ppm over 2025, up from 411 ppm in 2019.', "That's more than 70% above the pre-industrial 280."]],
    // No reference back: the comparison is of something else.
    [['The station averaged 426 ppm over 2025.', 'Methane is more than 150% above its pre-industrial 700 ppb.']],
    // A bare figure of another size is not read in the level's unit.
    [['The station averaged 426 ppm over 2025.', "That's more than 70% above the 1.5 of the old scale."]],
  ] as [string[]][])('leaves alone: %j', (sentences) => {
    expect(check(...sentences)).toEqual([]);
  });
});
