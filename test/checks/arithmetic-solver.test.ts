import { describe, expect, it } from 'vitest';
import { check, flagged } from './arithmetic-at.js';


// A rate worked out from a change and a duration given anywhere in the sentences before, in any
// order. Sums by hand (common practice): 60 ppm ÷ 5,000 yr = 0.012 ppm/yr; 4 °C ÷ 8,000 yr =
// 0.0005 °C/yr; 90 m ÷ 9,000 yr = 0.01 m/yr = 1 cm/yr; 70 ppm ÷ 7,000 yr = 0.01 ppm/yr;
// 120 ppm ÷ (16,000 − 10,000) yr = 0.02 ppm/yr.
describe('a rate drawn from a change and a duration earlier in the paragraph', () => {
  it.each([
    [['At the Tarnbeck site the CO2 climb was about 60 ppm.', 'It took some 5,000 years.', 'That works out to roughly 0.12 ppm per year.'], 'roughly 0.12 ppm per year', 'roughly 0.012 ppm per year'],
    [['Over 8,000 years the lake warmed by 4 °C.', 'On average that is 0.05 °C per year.'], '0.05 °C per year', '0.0005 °C per year'],
    [['Across roughly 9,000 years the shoreline rose about 90 m.', 'Divide one by the other and you get an average of 10 cm per year.'], '10 cm per year', '1 cm per year'],
    [['The gauge logged a rise of 70 ppm, spread across 7,000 years.', 'So the mean pace was near 0.1 ppm a year.'], '0.1 ppm a year', '0.01 ppm a year'],
    [['Between 16,000 and 10,000 years ago CO2 gained 120 ppm in the Orrin record.', 'That is some 0.2 ppm per year.'], 'some 0.2 ppm per year', 'some 0.02 ppm per year'],
    // An amount of a change named after it: 45 m ÷ 9,000 yr = 0.5 cm per year.
    [['The Orrin cores show 45 m of sea-level rise over 9,000 years.', 'That is an average of 2 cm per year.'], '2 cm per year', '0.5 cm per year'],
  ] as [string[], string, string][])('%j: flags %s', (sentences, text, correction) => {
    expect(flagged(...sentences)).toEqual([['arith.rate', text, correction]]);
  });

  it.each([
    ['right quotient', ['At the Tarnbeck site the CO2 climb was about 60 ppm.', 'It took some 5,000 years.', 'That works out to roughly 0.012 ppm per year.']],
    ['another period named', ['The CO2 climb was about 60 ppm over some 5,000 years.', 'In the 2010s the pace averaged 2.4 ppm per year.']],
    ['a rate of today', ['The CO2 climb was about 60 ppm over some 5,000 years.', 'So today we add 2.4 ppm a year.']],
    ['not drawn from anything', ['The CO2 climb was about 60 ppm over some 5,000 years.', 'Methane rose 0.5 ppm per year in the stadial.']],
    ['no duration before', ['The CO2 climb was about 60 ppm.', 'That works out to roughly 0.12 ppm per year.']],
    // Two readings: either the change of the first sentence or of the second may be meant.
    ['a reading fits', ['CO2 climbed 60 ppm in the first phase and 600 ppm of methane followed.', 'It all took 5,000 years.', 'So that is about 0.012 ppm per year.']],
  ] as [string, string[]][])('leaves alone: %s', (_why, sentences) => {
    expect(check(...sentences).filter((f) => f.ruleId === 'arith.rate')).toEqual([]);
  });
});

// A change drawn from levels given before. Sums by hand (common practice): 270 − 185 = 85;
// 415 − 270 = 145; 9 − 2 = 7 °C; 300 − 200 = 100.
describe('a change drawn from levels earlier in the paragraph', () => {
  it.each([
    [['In the coldest stadials the Brenner record sits near 185 ppm.', 'In the warm stages it reaches about 270 ppm.', 'That means each thaw added roughly 130 ppm.'], 'roughly 130 ppm', 'roughly 85 ppm'],
    [['The station logged 415 ppm last spring.', 'So on top of the old 270 ppm baseline we have stacked another 185 ppm.'], '185 ppm', '145 ppm'],
    [['The lake stood at 2 °C in the stadial.', 'It stood at 9 °C in the early Holocene.', 'So the water warmed by 5 °C across the transition.'], '5 °C', '7 °C'],
    [['Core A gives 200 ppm for the glacial; core B gives 300 ppm for the interglacial.', 'Thus the swing between them is a rise of 150 ppm.'], '150 ppm', '100 ppm'],
  ] as [string[], string, string][])('%j: flags %s', (sentences, text, correction) => {
    expect(flagged(...sentences)).toEqual([['arith.change', text, correction]]);
  });

  it.each([
    ['right difference', ['In the coldest stadials the Brenner record sits near 185 ppm.', 'In the warm stages it reaches about 270 ppm.', 'That means each thaw added roughly 85 ppm.']],
    ['a change per year', ['The station logged 415 ppm last spring.', 'So we now add another 2.5 ppm a year.']],
    ['held against its own base', ['The station logged 415 ppm last spring.', 'So it is 40 ppm higher than in 1995.']],
    ['another size altogether', ['The lake stood at 2 °C in the stadial.', 'It stood at 9 °C in the early Holocene.', 'So a single storm warmed it by 0.5 °C.']],
    ['not drawn from anything', ['The lake stood at 2 °C in the stadial.', 'It stood at 9 °C in the early Holocene.', 'The sea warmed by 3 °C in that time.']],
  ] as [string, string[]][])('leaves alone: %s', (_why, sentences) => {
    expect(check(...sentences).filter((f) => f.ruleId === 'arith.change')).toEqual([]);
  });
});

// A multiple of a pace against the pace the sentences before give, stated or worked out. Sums by
// hand (common practice): 90 ppm ÷ 6,000 yr = 0.015 ppm/yr, 2.4 ÷ 0.015 = 160; 2 ÷ 0.02 = 100;
// 3 °C ÷ 3,000 yr = 0.001 °C/yr, 0.02 ÷ 0.001 = 20.
describe('a multiple of a pace drawn from the paragraph', () => {
  it.each([
    [['The Skelda core shows CO2 gaining 90 ppm over about 6,000 years.', 'A later sentence about the drill team.', 'Today’s 2.4 ppm a year is some 15 times the pace of that rise.'], 'some 15 times', 'some 160 times'],
    [['In the Brenner record CO2 crept up at 0.02 ppm per year.', 'Another remark.', 'Our present 2 ppm per year is about 10 times faster.'], 'about 10 times', 'about 100 times'],
    [['The island warmed 3 °C over 3,000 years.', 'The modern 0.02 °C per year is roughly 200 times that average pace.'], 'roughly 200 times', 'roughly 20 times'],
  ] as [string[], string, string][])('%j: flags %s', (sentences, text, correction) => {
    expect(flagged(...sentences)).toEqual([['arith.ratio', text, correction]]);
  });

  it.each([
    ['right multiple', ['The Skelda core shows CO2 gaining 90 ppm over about 6,000 years.', 'Another line.', 'Today’s 2.4 ppm a year is some 160 times the pace of that rise.']],
    // The rate before was itself a slip of its own figures; the multiple fits what they give.
    ['fits the worked-out rate before', ['CO2 went 190 → 280 ppm over 6,000 years, so about 0.15 ppm per year.', 'Today’s 2.4 ppm a year is some 160 times faster.']],
    ['no pace before', ['The Skelda core shows CO2 at 280 ppm.', 'Today’s 2.4 ppm a year is some 15 times faster.']],
  ] as [string, string[]][])('leaves alone: %s', (_why, sentences) => {
    expect(check(...sentences).filter((f) => f.ruleId === 'arith.ratio')).toEqual([]);
  });
});

// A percentage change named with its base after a change noun ("an increase on", "a rise over"),
// against the level before. Sums by hand (common practice): 420 ÷ 280 − 1 = 50 %; 330 ÷ 275 − 1 = 20 %.
describe('a percentage increase on a named base', () => {
  it.each([
    [['Last year the Corran Head inlet averaged about 420 ppm.', 'That is a 30% increase on the 280 ppm of 1750.'], '30%', '50%'],
    [['By 1975 the flask samples read 330 ppm.', 'So that was a 35 percent rise over the 275 ppm baseline.'], '35 percent', '20 percent'],
  ] as [string[], string, string][])('%j: flags %s', (sentences, text, correction) => {
    expect(flagged(...sentences)).toEqual([['arith.ratio', text, correction]]);
  });

  it('leaves a right percentage alone', () => {
    expect(check('Last year the Corran Head inlet averaged about 420 ppm.', 'That is a 50% increase on the 280 ppm of 1750.')).toEqual([]);
  });
});

// "A → B": an arrow is a from-to pair. 280 − 190 = 90 ppm; 90 ÷ 9,000 = 0.01 ppm/yr (common practice).
describe('a from-to pair written with an arrow', () => {
  it('reads the pair, with the unit written once', () => {
    expect(flagged('CO2 went ~190 → 280 ppm over 9,000 years, about 0.1 ppm per year.')).toEqual([['arith.rate', 'about 0.1 ppm per year', 'about 0.01 ppm per year']]);
    expect(flagged('CO2 went ~190 → 280 ppm over 9,000 years, about 0.01 ppm per year.')).toEqual([]);
    // Figures with no unit, and a fraction that is a relative change, not the difference itself.
    expect(flagged('The build took 2,400 → 1,800 ms of CPU, about a quarter less.')).toEqual([]);
  });
});

// A span in apposition after its dates, with an article and one adjective before it. Sums by hand
// (common practice): 14,700 − 12,900 = 1,800; 19,000 − 11,000 = 8,000; 12,900 − 11,700 = 1,200.
describe('a span after its dates with an adjective ("a leisurely ten thousand years")', () => {
  it.each([
    ['The warm spell ran from 14,700 to 12,900 years ago, a brisk 800 years in all.', '800 years', '1,800 years'],
    ['Sea level climbed from 19,000 to 11,000 years ago, a mere 5,000 years by our count.', '5,000 years', '8,000 years'],
    ['The Brenner stadial lasted from 12,900 until 11,700 years ago, a bitter 2,200 years.', '2,200 years', '1,200 years'],
  ])('%s flags %s', (sentence, text, correction) => {
    expect(flagged(sentence)).toEqual([['arith.duration', text, correction]]);
  });

  it.each([
    'The warm spell ran from 14,700 to 12,900 years ago, a brisk 1,800 years in all.',
    // "a further 600 years" is another span, after the first.
    'The cold snap ran from 12,900 to 11,700 years ago, a further 600 years later the ice was gone.',
  ])('leaves alone: %s', (sentence) => {
    expect(check(sentence)).toEqual([]);
  });
});

// A percentage change drawn from levels given before. Sums by hand (common practice): 412 ÷ 280 − 1
// = 47 %; 415 ÷ 290 − 1 = 43 %; 290 ÷ 415 − 1 = −30 %; 330 ÷ 300 − 1 = 10 %.
describe('a percentage change drawn from levels earlier in the paragraph', () => {
  it.each([
    [['In 1750 the Orrin flasks held 280 ppm.', 'By 2021 they held 412 ppm, an increase of about 30 percent.'], 'about 30 percent', 'about 47 percent'],
    [['Before industry the Brenner air held about 290 ppm.', 'Today’s 415 ppm is therefore roughly 60% higher.'], 'roughly 60%', 'roughly 43%'],
    [['The glacial lake level was 300 m.', 'At the thaw’s end it was 330 m.', 'That is a rise of some 30 percent.'], 'some 30 percent', 'some 10 percent'],
    [['Before industry the Brenner air held about 290 ppm.', 'Last year it held 415 ppm.', 'So going back would mean a drop of some 43 percent.'], 'some 43 percent', 'some 30 percent'],
  ] as [string[], string, string][])('%j: flags %s', (sentences, text, correction) => {
    expect(flagged(...sentences)).toEqual([['arith.ratio', text, correction]]);
  });

  it.each([
    ['right percentage', ['In 1750 the Orrin flasks held 280 ppm.', 'By 2021 they held 412 ppm, an increase of about 47 percent.']],
    ['right drop', ['Before industry the Brenner air held about 290 ppm.', 'Last year it held 415 ppm.', 'So going back would mean a drop of some 30 percent.']],
    ['held against a base named after it', ['Before industry the Brenner air held about 290 ppm.', 'Today’s 415 ppm is roughly 10% higher than the 1990 level of 377 ppm.']],
    ['a yearly percentage', ['In 1750 the Orrin flasks held 280 ppm.', 'So it now rises by about 0.6 percent a year.']],
  ] as [string, string[]][])('leaves alone: %s', (_why, sentences) => {
    expect(check(...sentences).filter((f) => f.ruleId === 'arith.ratio')).toEqual([]);
  });
});

// Both paces in the sentence before, the multiple here: 2.5 ÷ 0.01 = 250; 0.3 ÷ 0.002 = 150 (common practice).
describe('a multiple of two paces given in the sentence before', () => {
  it.each([
    [['Today CO2 climbs about 2.5 ppm per year, while in the thaw it gained about 0.01 ppm per year.', 'That is some 25 times faster.'], 'some 25 times', 'some 250 times'],
    [['The Orrin delta now grows 0.3 m per year; in the stadial it grew 0.002 m per year.', 'So it is now about 15 times faster.'], 'about 15 times', 'about 150 times'],
  ] as [string[], string, string][])('%j: flags %s', (sentences, text, correction) => {
    expect(flagged(...sentences)).toEqual([['arith.ratio', text, correction]]);
  });

  it('leaves a right multiple alone', () => {
    expect(check('Today CO2 climbs about 2.5 ppm per year, while in the thaw it gained about 0.01 ppm per year.', 'That is some 250 times faster.')).toEqual([]);
  });
});
