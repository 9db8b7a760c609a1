/**
 * Which words may stop a value (src/claims/bind-veto.ts): a veto word in a later clause speaks of
 * that clause, not of the number before it; one in the number's own clause, or before it, still
 * vetoes. Sentences of our own; quantities built by hand (quantity-at.ts).
 */
import { describe, expect, it } from 'vitest';
import { loadPacks } from '../../src/rulepack/index.js';
import { boundIn, type Row, type Written } from './quantity-at.js';

const packs = await loadPacks([]);

const bound = (sentence: string, written: Written[]): string[] => boundIn(packs, sentence, written);

const ROWS: Row[] = [
  // "faster" belongs to the comparison after the comma; today's growth is about 2.2-3.8 ppm a year
  // (Lan, Tans & Thoning, NOAA GML growth rates, doi:10.15138/9N0H-ZH07).
  ['Carbon dioxide now climbs by about 0.5 ppm a year, several times faster than in any ice-core record.', [['about 0.5 ppm a year', 'concentration-rate']], ['co2-growth-recent']],
  // "faster" in the number's own clause still keeps the modern growth value out (it is a comparison of rates).
  ['Carbon dioxide now climbs several times faster, by about 0.5 ppm a year.', [['about 0.5 ppm a year', 'concentration-rate']], ['-']],
  // "sea level" in the clause after the date: the date is still the last interglacial's, about
  // 115,000-130,000 years ago (Kopp et al. 2009, doi:10.1038/nature08686).
  ['Our oldest sample is ice from the last interglacial, some 300,000 years ago, when sea level stood higher than now.', [['some 300,000 years ago', 'age']], ['last-interglacial']],
  // Orbital cycles pace the glacial cycles but are not them (Hays, Imbrie & Shackleton 1976,
  // doi:10.1126/science.194.4270.1121): no glacial-cycle period is read, whatever the clause after says.
  ['Orbital cycles of about 100,000, 41,000 and 19,000 years pace the ice ages, with CO2 as an amplifier.', [['100,000', 'duration'], ['41,000', 'duration'], ['19,000 years', 'duration']], ['-', '-', '-']],
];

describe('bindQuantities: vetoes stay in their clause', () => {
  it.each(ROWS)('%s', (sentence, written, expected) => expect(bound(sentence, written)).toEqual(expected));
});
