/**
 * A CO2 share of the air whose gas the sentence before names (src/checks/units-co2-share.ts): "CO2
 * lags the warming. It's a trace gas, like 0.4% of the air." 0.4% of the air is 4,000 ppm; CO2 is
 * about 0.042% (about 420 ppm: NOAA Global Monitoring Laboratory, annual mean 2024; 1% = 10,000 ppm,
 * NIST SP 811). The air also named as what people breathe. Sentences of our own.
 */
import { describe, expect, it } from 'vitest';
import { checkUnits } from '../../src/checks/units.js';
import { parseQuantities } from '../../src/quantities/index.js';

const flagged = (before: string[], sentence: string) => checkUnits(sentence, parseQuantities(sentence), before).filter((f) => f.ruleId === 'unit.percent-ppm').map((f) => sentence.slice(f.start, f.end));

describe('unit.percent-ppm: a share of the air after a sentence that names CO2', () => {
  it.each([
    [['Carbon dioxide only follows the warming.'], 'It is a trace gas, roughly 0.4% of the air.', 'roughly 0.4%'],
    [['Honestly CO2 is overrated.'], 'Thing makes up maybe 0.3 percent of the atmosphere.', '0.3 percent'],
    [['We keep hearing about CO2.'], 'Yet that stuff is only 0.5 percent of every breath.', '0.5 percent'],
    [['Today the global mean is near 420 parts per million.'], 'That is roughly 0.4 percent of everything we breathe.', 'roughly 0.4 percent'],
  ])('%s %s', (before, sentence, expected) => expect(flagged(before, sentence)).toEqual([expected]));

  it.each([
    // The right share: about 0.04% (NOAA 2024).
    [['Carbon dioxide only follows the warming.'], 'It is a trace gas, roughly 0.04% of the air.'],
    // Another gas named before: methane is about 1.9 ppm (NOAA 2024), argon about 0.93% (common practice).
    [['Methane and CO2 both rose.'], 'It is only 0.4 percent of the air.'],
    [['Argon is the third gas of the air.'], 'It is roughly 0.9% of the air.'],
    // No gas named before: a share of something else.
    [['The town council met on Tuesday.'], 'Turnout was 0.4% of the electorate.'],
  ])('leaves %s %s alone', (before, sentence) => expect(flagged(before, sentence)).toEqual([]));
});
