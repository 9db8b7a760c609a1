/**
 * unit.ppb-ppm: CO2 written in parts per billion where parts per million were meant. CO2 in the air
 * is about 420 ppm and grows by some 2-3 ppm a year (NOAA Global Monitoring Laboratory, annual means
 * 2023-2024); methane, about 1,900 ppb, is the gas given in ppb (NOAA GML, methane trends; from
 * memory for the rounded figure). 1 ppm = 1,000 ppb (NIST SP 811, common practice for mole
 * fractions). Sentences of our own.
 */
import { describe, expect, it } from 'vitest';
import { checkUnits } from '../../src/checks/units.js';
import { parseQuantities } from '../../src/quantities/index.js';

const slips = (sentence: string, before: string[] = []) =>
  checkUnits(sentence, parseQuantities(sentence), before)
    .filter((f) => f.ruleId === 'unit.ppb-ppm')
    .map((f) => [sentence.slice(f.start, f.end), f.correction]);

describe('unit.ppb-ppm', () => {
  it.each([
    ['These days the CO2 in our air sits near 421 ppb.', '421 ppb', '421 ppm'],
    ['Carbon dioxide has climbed to some 420 parts per billion.', 'some 420 parts per billion', 'some 420 parts per million'],
    ['Each decade of burning adds roughly 24 ppb of CO2.', 'roughly 24 ppb', 'roughly 24 ppm'],
    ['Before industry, CO2 held at about 280 ppbv.', 'about 280 ppbv', 'about 280 ppm'],
  ])('%s', (sentence, figure, correction) => expect(slips(sentence)).toEqual([[figure, correction]]));

  it('reads a figure with no gas of its own as CO2 after a sentence that names CO2', () => {
    expect(slips('So where are we now?', [])).toEqual([]);
    expect(slips("We're sitting at 420 parts per billion right now.", ['CO2 is the gas everyone argues about.'])).toEqual([['420 parts per billion', '420 parts per million']]);
  });

  it.each([
    // The right unit.
    ['These days the CO2 in our air sits near 421 ppm.'],
    // Methane is given in ppb, beside CO2 or after it.
    ['Carbon dioxide sits near 420 ppm, methane near 1,920 ppb.'],
    ['Methane in the ice cores ranged from about 350 to 800 ppb.'],
    // A number that is no CO2 level in ppm: 42,000 ppb is 42 ppm, a figure of no CO2 claim either way.
    ['CO2 in that sample read 42,000 ppb.'],
  ])('leaves %s alone', (sentence) => expect(slips(sentence)).toEqual([]));

  it('gives no second flag where a reference value binds the figure (the scale slip says it)', async () => {
    const { checkText } = await import('../../src/engine.js');
    const result = await checkText("Today's CO2 level is about 420 ppb.", { path: 'draft.md' });
    expect(result.flags.map((f) => f.ruleId)).toEqual(['unit.scale-slip']);
  });
});
