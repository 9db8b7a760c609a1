/**
 * A spread a writer states in words (session 10, false flags): two neighbouring counts joined by
 * "or" with the unit written once ("six or seven thousand years") are one range, and "give or
 * take N" / "plus or minus N" after a figure is its stated uncertainty, so neither the second
 * count nor the tolerance is read as a figure of its own (a restatement to convert, or a level).
 * Every sentence is our own; each right one has a wrong twin in a nearby wording that must still
 * be flagged.
 */
import { describe, expect, it } from 'vitest';
import { checkText } from '../../src/engine.js';
import { loadPacks } from '../../src/rulepack/index.js';

const packs = await loadPacks([]);

async function rulesOf(text: string): Promise<string[]> {
  const result = await checkText(text, { path: 'draft.txt', packs });
  return result.flags.filter((f) => f.level === 'error' || f.level === 'warning').map((f) => f.ruleId);
}

// Reference values used below, as the built-in pack has them:
// - the last deglaciation took about 6,000 to 9,000 years (termination-1-duration; Pedro, Rasmussen &
//   van Ommen 2012, Clim. Past 8, 1213-1221; Shakun et al. 2012, Nature 484, 49-54);
// - the glacial-interglacial CO2 swing of the last cycles is 80 to 100 ppm (Lüthi et al. 2008,
//   Nature 453, 379-382);
// - CO2 in 1750 was about 278 ppm, 278.3 ± 2.9 ppm (Gulev et al. 2021, IPCC AR6 WG1 ch. 2).
describe('two counts joined by "or" with one unit are a range', () => {
  const RIGHT = [
    'The last deglaciation took something like six or seven thousand years.',
    'Getting out of the last ice age took 6 or 7 thousand years in all.',
    'The end of the last ice age played out over seven or eight thousand years.',
  ];
  const WRONG: [string, string][] = [
    // the same wording with counts far off the reference
    ['The last deglaciation took about 600 or 700 years.', 'value.termination-1-duration'],
    // a restatement with a unit after each figure is still converted and checked (1 kyr = 1,000 years)
    ['The last deglaciation took about 7,000 years, or 70 kyr.', 'unit.duration'],
  ];
  it.each(RIGHT)('leaves clean: %s', async (sentence) => {
    expect(await rulesOf(sentence)).toEqual([]);
  });
  it.each(WRONG)('flags %s', async (sentence, rule) => {
    expect(await rulesOf(sentence)).toContain(rule);
  });
});

describe('"give or take" and "plus or minus" state the uncertainty of the figure before them', () => {
  const RIGHT = [
    'Across a full glacial cycle, CO2 typically swung by some 90 ppm, give or take ten.',
    'From glacial to interglacial, CO2 rose by about 90 ppm, give or take ten.',
    'The IPCC puts the 1750 level of carbon dioxide at 278 ppm, give or take about 3.',
    'Pre-industrial CO2 in 1750 was 278 ppm plus or minus 3 ppm.',
  ];
  const WRONG: [string, string][] = [
    // the figure itself is off: its tolerance does not save it
    ['From glacial to interglacial, CO2 rose by about 190 ppm, give or take ten.', 'value.co2-glacial-interglacial-amplitude'],
    ['The IPCC puts the 1750 level of carbon dioxide at 340 ppm, give or take about 3.', 'value.co2-preindustrial-1750'],
  ];
  it.each(RIGHT)('leaves clean: %s', async (sentence) => {
    expect(await rulesOf(sentence)).toEqual([]);
  });
  it.each(WRONG)('flags %s', async (sentence, rule) => {
    expect(await rulesOf(sentence)).toContain(rule);
  });
});
