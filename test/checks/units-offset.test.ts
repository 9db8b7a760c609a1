import { describe, expect, it } from 'vitest';
import { checkArithmetic } from '../../src/checks/arithmetic.js';
import { checkUnits } from '../../src/checks/units.js';
import { parseQuantities } from '../../src/quantities/index.js';

const units = (sentence: string, before: string[] = []) =>
  checkUnits(sentence, parseQuantities(sentence), before).map((f) => [f.ruleId, sentence.slice(f.start, f.end), f.correction]);
const arithmetic = (sentence: string) => checkArithmetic(sentence, parseQuantities(sentence), []);

// NIST SP 811 (Appendix B.8, temperature): a difference of 1 °C is a difference of 1.8 °F (= 9/5);
// the 32 of the Fahrenheit scale belongs to readings only. 4 °C → 7.2 °F; 7 °C → 12.6 °F; 10 °C → 18 °F.
describe('a written sum that adds 32 to a temperature change', () => {
  it.each([
    ['In Fahrenheit, that 4 °C of warming is 4 + 32 = 36 °F of warming.', '36 °F', '7.2 °F'],
    ['Converted: 7 × 1.8 + 32 = 44.6 °F colder at the glacial peak.', '44.6 °F', '12.6 °F'],
    ['Our answer for the swing: 10 + 32 gives 42 °F of warming.', '42 °F', '18 °F'],
  ])('%s flags %s', (sentence, text, correction) => {
    expect(units(sentence)).toEqual([['unit.temperature-difference', text, correction]]);
    // The unit slip is the one explanation: the sum is not judged again as arithmetic.
    expect(arithmetic(sentence).filter((f) => sentence.slice(f.start, f.end) === text)).toEqual([]);
  });

  it.each([
    // A reading converts with the 32 (NIST SP 811): 20 °C is 68 °F.
    'The lab at 20 °C reads 20 × 1.8 + 32 = 68 °F.',
    'The change in Fahrenheit is 4 × 1.8 = 7.2 °F of warming.',
    'Summer air at the camp was 5 °C, so 5 × 1.8 + 32 = 41 °F.',
  ])('leaves alone: %s', (sentence) => {
    expect(units(sentence)).toEqual([]);
  });
});

// A bare "degrees" takes the one scale the sentence names in words (common practice: a writer names
// the scale once). 7 °C of change is 12.6 °F (NIST SP 811, as above).
describe('bare degrees read in the scale the sentence names', () => {
  it.each([
    ['For Fahrenheit readers, a 7-degree Celsius drop is about 45 degrees.', 'about 45 degrees'],
    ['Put in Fahrenheit, the 10 °C swing amounts to 50 degrees.', '50 degrees'],
  ])('%s flags %s', (sentence, text) => {
    const found = units(sentence);
    expect(found.map((f) => f[0])).toEqual(['unit.temperature-difference']);
    expect(found[0]?.[1]).toBe(text);
  });

  it.each([
    'For Fahrenheit readers, a 7-degree Celsius drop is about 12.6 degrees.',
    // Two scales named: the bare figure is not given either.
    'In Celsius or Fahrenheit, the drill site sits at 75 degrees of latitude and 3 km up.',
    'The site is at 75 degrees south, and summer there is cold even in Fahrenheit terms.',
  ])('leaves alone: %s', (sentence) => {
    expect(units(sentence)).toEqual([]);
  });
});

// Numbers spoken aloud (common practice in scripts and spoken pieces): "two-eighty" is 280,
// "three point one" is 3.1, and "up to" after "from" closes a from-to pair. 275 − 185 = 90.
describe('spoken numbers', () => {
  it.each([
    ['about two-eighty ppm', 280],
    ['some four-twenty parts per million', 420],
    ['about three point one kilometres', 3100],
    ['nought', undefined],
  ])('%s', (text, value) => {
    expect(parseQuantities(`It was ${text} then.`)[0]?.value).toBe(value);
  });

  it('keeps "twenty-one" and "one of" as they were', () => {
    expect(parseQuantities('It was twenty-one thousand years ago.')[0]?.value).toBe(21000);
    expect(parseQuantities('One of the cores was drilled in 1998.').map((q) => q.text)).toEqual(['1998']);
  });

  it('reads a spoken from-to pair against a stated change', () => {
    const sentence = 'So over the thaw it went from about one-eighty-five up to two-seventy-five, a jump of a hundred and thirty ppm.';
    const flags = checkArithmetic(sentence, parseQuantities(sentence), []);
    expect(flags.map((f) => [f.ruleId, f.correction])).toEqual([]);
    const plain = 'So over the thaw it went from about one-eighty up to two-seventy, a jump of a hundred and thirty ppm.';
    expect(checkArithmetic(plain, parseQuantities(plain), []).map((f) => [f.ruleId, f.correction])).toEqual([['arith.change', '90 ppm']]);
  });
});

// A date restated in another era in the next sentence, after the era is named (Stuiver & Polach
// 1977: BP counts from AD 1950; Walker et al. 2009: b2k counts from AD 2000, so b2k − 50 = BP).
// 14,700 b2k = 14,650 BP; 8,200 b2k = 8,150 BP.
describe('a date restated after the era it is written in', () => {
  it.each([
    [['The warming starts 14,700 years b2k (before AD 2000).'], 'On the BP scale it is 14,750 years.', '14,650 years'],
    [['The cold event is dated to 8,200 years b2k.'], 'Counting from 1950 instead, in BP that is 8,250 years.', '8,150 years'],
  ])('%j / %s', (before, sentence, correction) => {
    const found = units(sentence, before);
    expect(found.map((f) => f[0])).toEqual(['unit.age-era']);
    expect(found[0]?.[2]).toBe(correction);
  });

  it.each([
    [['The warming starts 14,700 years b2k (before AD 2000).'], 'On the BP scale it is 14,650 years.'],
    // A length is not a date, whatever points back to it.
    [['That core is only 3,270 feet long.'], "It's 3,270 metres, so closer to 10,700 feet."],
    // No era named before the figure: a span, not a date.
    [['The warming starts 14,700 years b2k.'], 'It is 3,000 years long.'],
  ])('leaves alone: %j / %s', (before, sentence) => {
    expect(units(sentence, before)).toEqual([]);
  });
});

// Look-alikes of a restatement that must stay clean (NIST SP 811: 1% = 10,000 ppm; Walker et al.
// 2009: b2k = BP + 50; a relative change in percent is not a share of the air).
describe('figures beside each other that restate nothing', () => {
  it.each([
    // a relative change after a level
    'In 2023 the inlet read over 419 ppm, some 50 percent higher than in 1750.',
    'Glacial air held 185 ppm, about 34 percent lower than the 280 ppm of 1750.',
    // a new equation after the comma
    'One ppm is 0.0001 percent, so 410 ppm equals 0.041 percent.',
    // the reference year inside a date
    'The warm spell is put at 8,200 years before AD 2000, which is 8,150 BP.',
  ])('%s', (sentence) => {
    expect(units(sentence)).toEqual([]);
  });

  it('still reads the date inside a b2k phrase against its BP restatement', () => {
    const sentence = 'The warm spell is put at 8,200 years before AD 2000, which is 8,250 BP.';
    expect(units(sentence)).toEqual([['unit.age-era', '8,250 BP', '8,150 BP']]);
  });
});

// "half of a doubling" names a doubling as the yardstick of a fraction (common practice: forcing
// compared in doublings of CO2); it claims no doubling between the sentence's two levels.
describe('a ratio named as a yardstick', () => {
  it.each([
    'Going from 280 to 400 ppm is already more than half of a doubling in forcing terms.',
    'From 190 to 280 ppm the glacial rise was about a third of a tripling in those terms.',
  ])('%s', (sentence) => {
    expect(arithmetic(sentence)).toEqual([]);
  });

  it('still flags a doubling the sentence claims', () => {
    const sentence = 'From 280 to 400 ppm, CO2 has doubled.';
    expect(arithmetic(sentence).map((f) => f.ruleId)).toEqual(['arith.ratio']);
  });
});
