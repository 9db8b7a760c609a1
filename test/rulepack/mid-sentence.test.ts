/**
 * Measures quoted mid-sentence in a reason keep the capital of a name and lose that of a common
 * word (English capitalisation of proper nouns: common practice).
 */
import { describe, expect, it } from 'vitest';
import { midSentence } from '../../src/rulepack/describe-range.js';

const PACKS = { terms: [{ id: 'antarctic', words: ['Antarctic', 'Antarctica'] }, { id: 'co2', words: ['CO2', 'carbon dioxide'] }] };

describe('a measure quoted mid-sentence', () => {
  it.each([
    ['Atmospheric CO2 at the Last Glacial Maximum', 'atmospheric CO2 at the Last Glacial Maximum'],
    ['Depth of the EPICA Dome C core', 'depth of the EPICA Dome C core'],
    ['CO2 growth rate', 'CO2 growth rate'],
    ['A CO2 level restated in percent', 'a CO2 level restated in percent'],
    ['Mauna Loa annual mean CO2', 'Mauna Loa annual mean CO2'],
    ['East Antarctic LGM cooling', 'East Antarctic LGM cooling'],
    ['Antarctic warming across the last deglaciation', 'Antarctic warming across the last deglaciation'],
  ])('%j reads %j', (measures, expected) => {
    expect(midSentence(measures, PACKS)).toBe(expected);
  });
});
