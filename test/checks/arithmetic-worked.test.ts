import { describe, expect, it } from 'vitest';
import { checkText } from '../../src/engine.js';
import { check, flagged } from './arithmetic-at.js';

// Worked sums whose result stands in a sentence of its own, with no word of the subject: the answer
// under a question, a written operation in words or signs, an amount or a time worked from a pace.
// Every sum is done by hand (common practice of arithmetic); the sentences are our own inventions.

// The answer under a question that asks for a figure reads on from the figures before the question.
// 14,600 − 12,400 = 2,200; 24,000 − 17,500 = 6,500; 410 − 290 = 120.
describe('an answer under a question', () => {
  it.each([
    [['The Marrow cold phase ran from about 14,600 to 12,400 years ago.', 'How long did it last?', 'About 3,200 years.'], 'About 3,200 years', 'About 2,200 years'],
    [['The Brill advance held from 24,000 to 17,500 years ago.', 'How long was that?', 'That is a stretch of 8,500 years.'], '8,500 years', '6,500 years'],
    [['The Kell record goes from 290 ppm to 410 ppm.', 'By how much did the level change?', 'It rose by some 160 ppm.'], 'some 160 ppm', 'some 120 ppm'],
  ] as [string[], string, string][])('%j: flags %s', (sentences, text, correction) => {
    expect(flagged(...sentences)).toEqual([[expect.stringMatching(/^arith\./u), text, correction]]);
  });

  it.each([
    ['right answer', ['The Marrow cold phase ran from about 14,600 to 12,400 years ago.', 'How long did it last?', 'About 2,200 years.']],
    ['right answer, rounded', ['The Marrow cold phase ran from about 14,600 to 12,400 years ago.', 'How long did it last?', 'Roughly two thousand years.']],
    ['a question that asks for no figure', ['The Marrow cold phase ran from about 14,600 to 12,400 years ago.', 'What are the orbital cycles?', 'Tilt varies over about 41,000 years.']],
    ['a question with figures of its own', ['The Marrow cold phase ran from about 14,600 to 12,400 years ago.', 'Did it last 2,000 years?', 'Nearer 9,000 years, say some.']],
  ] as [string, string[]][])('leaves alone: %s', (_why, sentences) => {
    expect(check(...sentences)).toEqual([]);
  });
});

// Operations written in words and signs. 13,400 − 12,100 = 1,300; 90 ÷ 6,000 = 0.015;
// 4.1 × 0.5 = 2.05; 350 + 25 = 375.
describe('a written sum in words or signs', () => {
  it.each([
    ['13,400 take away 12,100 leaves a cold spell of about 2,300 years.', 'about 2,300 years', 'about 1,300 years'],
    ['13,400 minus 12,100 comes to 1,700.', '1,700', '1,300'],
    ['90 ÷ 6,000 ≈ 0.15 ppm per year.', '≈ 0.15 ppm per year', '≈ 0.015 ppm per year'],
    ['90 divided by 6,000 works out at about 0.15 ppm a year.', 'about 0.15 ppm a year', 'about 0.015 ppm a year'],
    ['4.1 times 0.5 gives 3.05.', '3.05', '2.05'],
    ['350 plus 25 makes 395 ppm.', '395 ppm', '375 ppm'],
  ] as [string, string, string][])('%s: flags %s', (sentence, text, correction) => {
    expect(flagged(sentence)).toEqual([['arith.change', text, correction]]);
  });

  it.each([
    ['13,400 take away 12,100 leaves a cold spell of about 1,300 years.'],
    ['90 ÷ 6,000 ≈ 0.015 ppm per year.'],
    ['90 divided by 6,000 works out at about 0.015 ppm a year.'],
    ['4.1 times 0.5 gives 2.05.'],
    // A function of a number is no operand: 4.1 × ln(1.5) ≈ 1.7 is read as no sum.
    ['4.1 × ln(300/200) ≈ 1.7.'],
    // A sum done in thousands whose result carries the scale: 17 − 12.5 = 4.5 (thousand); 360 ÷ 4 = 90 (k).
    ['17 minus 12.5 is 4.5 thousand, give or take.'],
    ['360 divided by 4 is 90k each.'],
    // Not a sum: a pace told over a time ("90 ppm over 6,000 years").
    ['The Kell record gained 90 ppm over 6,000 years, which is 0.015 ppm a year.'],
  ])('leaves alone: %s', (sentence) => {
    expect(check(sentence)).toEqual([]);
  });
});

// rate × time = amount; amount ÷ rate = time. 1.8 × 10 = 18 ppm; 150 ÷ 2.5 = 60 years;
// 60 ÷ 2 = 30 years.
describe('an amount or a time worked from a pace', () => {
  it.each([
    [['Across the 2000s the level climbed 1.8 ppm a year.', 'Over those ten years that adds up to roughly 30 ppm.'], 'roughly 30 ppm', 'roughly 18 ppm'],
    [['At 2.5 ppm a year, adding 150 ppm takes about 6 years.'], 'about 6 years', 'about 60 years'],
    [['We now add about 2 ppm a year, so we would repeat the 60 ppm rise of the thaw in some 3 years.'], 'some 3 years', 'some 30 years'],
  ] as [string[], string, string][])('%j: flags %s', (sentences, text, correction) => {
    expect(flagged(...sentences)).toEqual([[expect.stringMatching(/^arith\./u), text, correction]]);
  });

  it.each([
    ['right amount', ['Across the 2000s the level climbed 1.8 ppm a year.', 'Over those ten years that adds up to roughly 18 ppm.']],
    ['right time, rounded', ['At 2.5 ppm a year, adding 150 ppm takes about 60 years.']],
    ['a level, not an amount', ['The level grew by 2 ppm a year over the 1990s, so after ten years it stood at 370 ppm.']],
    ['a time of another change', ['The level grows 2.4 ppm a year now, while the thaw added 80 ppm and took some 7,000 years.']],
  ] as [string, string[]][])('leaves alone: %s', (_why, sentences) => {
    expect(check(...sentences).filter((f) => f.ruleId === 'arith.change' || f.ruleId === 'arith.duration')).toEqual([]);
  });
});

// A multiple of a pace drawn from two paces before it in its sentence. 1.8 ÷ 0.02 = 90;
// 3 ppm a year ÷ 2 ppm a century (0.02 ppm a year) = 150; 1.5 ÷ 0.015 = 100.
describe('a multiple of two paces in one sentence', () => {
  it.each([
    ['It is 1.8 ppm a year in the Kell record now against about 0.02 back then, so roughly nine times faster.', 'roughly nine times', 'roughly 90 times'],
    ['So three ppm a year against two ppm a century means the new climb is about fifteen times faster.', 'about fifteen times', 'about 150 times'],
    ['1.5 a yr now vs 0.015 then = about 10x faster.', 'about 10x', 'about 100x'],
  ] as [string, string, string][])('%s: flags %s', (sentence, text, correction) => {
    expect(flagged(sentence)).toEqual([['arith.ratio', text, correction]]);
  });

  it.each([
    ['It is 1.8 ppm a year in the Kell record now against about 0.02 back then, so roughly ninety times faster.'],
    ['So three ppm a year against two ppm a century means the new climb is about a hundred and fifty times faster.'],
    // Not drawn from the two paces: no link word between them and the multiple.
    ['It is 1.8 ppm a year now against 0.02 then; methane rose four times faster.'],
  ])('leaves alone: %s', (sentence) => {
    expect(check(sentence).filter((f) => f.ruleId === 'arith.ratio')).toEqual([]);
  });
});

// A series of equal steps: span = count × spacing. 600,000 ÷ 6 = 100,000; 500k ÷ 100k = 5;
// (16,000 − 12,000) ÷ 40 = 100; 300,000 ÷ 3 = 100,000 (100k).
describe('a count or a spacing of a series worked from its span', () => {
  it.each([
    ['Six cycles in 600,000 years works out to one cycle every 20,000 years.', '20,000 years', '100,000 years'],
    ['500k yrs of ice ÷ ~100k-yr cycles = about 9 cycles in the Orrin core.', 'about 9 cycles', 'about 5 cycles'],
    ['The survey covers 16,000 to 12,000 years BP at a 40-year spacing, about 50 samples in all.', 'about 50', 'about 100'],
    ['The Kell core holds 3 cycles in 300,000 years, so each one is about 150k long.', 'about 150k', expect.stringMatching(/^about 100/u)],
    // The span as the result of its count and spacing (common practice: 6 × 40,000 = 240,000; 5 × 23,000 = 115,000).
    ['The Orrin core shows six cycles of about 40,000 years each, a total of some 300,000 years.', 'some 300,000 years', 'some 240,000 years'],
    ['Five cycles at roughly 23,000 years apiece gives us about 90,000 years of record.', 'about 90,000 years', 'about 115,000 years'],
  ] as [string, string, unknown][])('%s: flags %s', (sentence, text, correction) => {
    expect(flagged(sentence)).toEqual([[expect.stringMatching(/^arith\./u), text, correction]]);
  });

  it.each([
    ['Six cycles in 600,000 years works out to one cycle every 100,000 years.'],
    ['The Kell core holds 3 cycles in 300,000 years, each about 100,000 years long.'],
    ['The survey covers 16,000 to 12,000 years BP sampled every 40 years, which gives about 100 samples.'],
    // The count and the spacing are not drawn from each other: no link between them.
    ['Over 600,000 years the core shows six cycles and the 41,000-year cycle before them.'],
    ['The Orrin core shows six cycles of about 40,000 years each, a total of some 240,000 years.'],
    // The span is no result drawn from the series: no link word or mark before it.
    ['The Orrin core shows six cycles of about 40,000 years each before the record ends 300,000 years ago.'],
  ])('leaves alone: %s', (sentence) => {
    expect(check(sentence)).toEqual([]);
  });
});

// Through the engine: a sentence with one figure and no word of the subject, in a draft on topic,
// reaches the arithmetic checks when the sentences before it hold figures.
describe('which sentences reach the arithmetic checks', () => {
  const draft = (...lines: string[]) => ['CO2 in Antarctic ice cores tracks the glacial cycles.', '', ...lines].join('\n');
  it('a one-figure answer under its question', async () => {
    const result = await checkText(draft('The Marrow cold phase ran from about 14,600 to 12,400 years ago. How long did it last?', 'About 3,200 years.'), { path: 'q.md' });
    expect(result.flags.map((f) => [f.ruleId, f.span.start.line, f.correction])).toEqual([['arith.duration', 4, 'About 2,200 years']]);
  });
  it('the right answer stays clean', async () => {
    const result = await checkText(draft('The Marrow cold phase ran from about 14,600 to 12,400 years ago. How long did it last?', 'About 2,200 years.'), { path: 'q.md' });
    expect(result.flags).toEqual([]);
  });
  it('a one-figure sentence with no figures before it gets no arithmetic', async () => {
    const result = await checkText(draft('Nobody knew how long it would last.', 'About 3,200 years, we guessed.'), { path: 'q.md' });
    expect(result.flags).toEqual([]);
  });
});
