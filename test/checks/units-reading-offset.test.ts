/**
 * A temperature change converted as a reading (× 1.8 + 32, or + 273.15), found by the number
 * whatever the words between: sentences written for this file, none taken from the corpus. The
 * factors are NIST SP 811 (2008): a change of 1 °C is a change of 1.8 °F and of 1 K; the 32 and the
 * 273.15 belong to readings. So a 6 °C change is 10.8 °F (6 × 1.8 + 32 = 42.8 is the slip), 10 °C
 * is 18 °F (not 50), 9 °C is 9 K (not 282.15), 5-7 °C is 9-12.6 °F (not 41-44.6).
 */
import { describe, expect, it } from 'vitest';
import { checkUnits } from '../../src/checks/units.js';
import { parseQuantities } from '../../src/quantities/index.js';

const check = (sentence: string, context: string[] = []) =>
  checkUnits(sentence, parseQuantities(sentence), context).filter((f) => f.ruleId === 'unit.temperature-difference');

/** [how it is written, sentences before, sentence, flagged words, correction (in the draft's own spelling of the unit)]. */
const WRONG: [string, string[], string, string, string][] = [
  ['restating verb, change noun after the figure', [], 'For the visitors from Ohio: 6 °C of glacial cooling works out to about 43 °F.', 'about 43 °F', 'about 10.8 °F'],
  ['relative clause far from the change', [], 'The Skerry summit warmed something like 10 °C over a few decades after the cold snap, which is 50 °F.', '50 °F', '18 °F'],
  ['scale named after the figure, change word later', [], '6 degrees C is about 43 Fahrenheit, so the cooling was a big one.', 'about 43 Fahrenheit', 'about 10.8 Fahrenheit'],
  ['kelvin', [], 'A planet-wide cooling of 6 °C is a cooling of 279.15 K.', '279.15 K', '6 K'],
  ['kelvin after "in other words"', [], 'Over a termination the Kell dome warms by about 9 °C - in other words, by 282 K.', '282 K', '9 K'],
  ['next sentence points back', ['At its coldest the glacial world was around 6 degrees colder than before industry.'], 'And for readers in Fahrenheit, that comes to about 43 degrees.', 'about 43 degrees', 'about 10.8 degrees'],
  ['next sentence names the scale, bare degrees with a change word', ['At its coldest the glacial world was about 6 °C colder on average.'], 'So, in Fahrenheit for our guests, it was about 43 degrees colder.', 'about 43 degrees', 'about 10.8 degrees'],
  ['a range two sentences on', ['Across the planet the drop was about 5-7 degrees C.', 'Can you give that in Fahrenheit?'], 'Sure, it\'s 41-45 °F.', '41-45 °F', '9-12.6 °F'],
  ['the change repeated before its conversion', ['The glacial world was about 6 °C colder than before industry.'], '6 °C is 42.8 °F, so it was roughly 43 °F colder.', '42.8 °F', '10.8 °F'],
];

/** Correct conversions and readings that look like the slip and must stay clean. */
const RIGHT: [string, string[], string][] = [
  ['a change rightly converted', [], 'The glacial world was about 6 °C colder, which is about 10.8 °F colder.'],
  ['a reading rightly converted', [], 'Summers on the Skerry coast averaged 10 °C, which is 50 °F.'],
  ['a reading of its own after a change', [], 'The Skerry summit warmed by 10 °C after the cold snap; today a summer afternoon there can reach 50 °F.'],
  ['a reading in another clause', [], 'The Kell valley was 6 °C colder and a winter day in the valley now is 43 °F.'],
  ['a reading converted after a paragraph on a change', ['The glacial world was about 6 °C colder than before industry.'], 'Convert this reading: 6 °C is 42.8 °F.'],
  ['a reading in the next sentence that points nowhere', ['The glacial world was 6 °C colder than today.'], 'A mild winter day in the port is 43 °F.'],
  ['the slip named to deny it', [], 'A 6 °C difference is about 10.8 °F, not 43 °F.'],
  ['a change in kelvin rightly given', ['The glacial world was about 6 °C colder.'], 'In kelvin that is a cooling of 6 K.'],
  ['a kelvin reading of its own', [], 'The Kell dome warmed by 9 °C, and its winter air now averages about 223 K.'],
];

describe('a change converted as a reading', () => {
  it.each(WRONG)('%s', (_how, before, sentence, words, correction) => {
    const flags = check(sentence, before);
    expect(flags.map((f) => [sentence.slice(f.start, f.end), f.correction])).toContainEqual([words, correction]);
  });
  it.each(RIGHT)('%s stays clean', (_how, before, sentence) => {
    expect(check(sentence, before)).toEqual([]);
  });
});
