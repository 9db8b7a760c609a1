import { describe, expect, it } from 'vitest';
import { checkArithmetic } from '../../src/checks/arithmetic.js';
import { parseQuantities } from '../../src/quantities/index.js';

/** Checks `sentence` with `before` as the sentences ahead of it in the paragraph, in order. */
const check = (sentence: string, before: string[]) => checkArithmetic(sentence, parseQuantities(sentence), before);

// A relative change whose base is named by words ("than the glacial one") and whose two levels
// stand in one sentence before it: [why, sentences before, sentence, flagged text, correction].
// Worked by hand: 280 / 185 = 1.514 (51%); 280 / 190 = 1.474 (47%); 265 / 189 = 1.402 (40%).
// The levels are common practice's round glacial and interglacial CO2 figures (from memory).
const WRONG: [string, string[], string, string, string][] = [
  ['the base named by its period, the level after it rising to the other', ['Glacial CO2 of 185 ppm rising to 280 ppm is the usual swing.'], 'So the interglacial level sits about 25% higher than the glacial one.', 'about 25%', 'about 51%'],
  ['a participle "climbing to" makes the first figure the start', ['Glacial air at 190 ppm climbing to 280 ppm in each warm spell is the pattern.'], 'That makes the warm level some 70% higher than the glacial one.', 'some 70%', 'some 47%'],
  ['"rose to" after the base level', ['The glacial reading of 189 ppm rose to 265 ppm by the Holocene.'], 'So the Holocene value was about 60 percent higher than the glacial one.', 'about 60 percent', 'about 40 percent'],
];

const RIGHT: [string, string[], string][] = [
  ['right share', ['Glacial CO2 of 185 ppm rising to 280 ppm is the usual swing.'], 'So the interglacial level sits about 50% higher than the glacial one.'],
  ['right share, participle', ['Glacial air at 190 ppm climbing to 280 ppm in each warm spell is the pattern.'], 'That makes the warm level some 47% higher than the glacial one.'],
  ['a change noun before "to" keeps the figure a change', ['CO2 stood at 190 ppm in the cold, a 90 ppm rise to 280 ppm followed.'], 'So the warm level was about 47% higher than the glacial one.'],
];

describe('checkArithmetic: a named base among two levels of one sentence', () => {
  it.each(WRONG)('%s', (_why, before, sentence, flagged, correction) => {
    const flags = check(sentence, before);
    expect(flags).toHaveLength(1);
    const [f] = flags;
    expect(f?.ruleId).toBe('arith.ratio');
    expect(sentence.slice(f?.start, f?.end)).toBe(flagged);
    expect(f?.correction).toBe(correction);
  });

  it.each(RIGHT)('leaves alone: %s', (_why, before, sentence) => {
    expect(check(sentence, before)).toEqual([]);
  });
});
