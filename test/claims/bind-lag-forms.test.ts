/**
 * The lag term names every form of the verbs that tell one record coming before or after another
 * (rules/paleoclimate.yaml, term `lag`): "leading", "leads", "follows", "precedes", "delayed" as much
 * as "lagged". Sentences of our own; quantities built by hand (quantity-at.ts).
 */
import { describe, expect, it } from 'vitest';
import { loadPacks } from '../../src/rulepack/index.js';
import { boundIn, type Row, type Written } from './quantity-at.js';

const packs = await loadPacks([]);

const bound = (sentence: string, written: Written[]): string[] => boundIn(packs, sentence, written);

// Chowdhry Beeman et al. (2019, doi:10.5194/cp-15-913-2019): Antarctic temperature led CO2 by about
// 570 years at the onset of Termination I; Pedro et al. (2012, doi:10.5194/cp-8-1213-2012): any lag
// of CO2 was likely under 400 years.
const ROWS: Row[] = [
  ['In Beeman\'s reconstruction, Antarctic warmth was leading CO2 by some 4,000 years at the onset of the deglaciation.', [['some 4,000 years', 'duration']], ['lag-beeman2019-t1-onset']],
  ['Pedro\'s team says CO2 follows Antarctic temperature by about 1,000 years.', [['about 1,000 years', 'duration']], ['lag-pedro2012']],
  ['According to Pedro, Antarctic temperature precedes CO2 by about 1,000 years.', [['about 1,000 years', 'duration']], ['lag-pedro2012']],
  ['Pedro found the CO2 rise delayed by roughly 1,000 years.', [['roughly 1,000 years', 'duration']], ['lag-pedro2012']],
];

describe('bindQuantities: every form of a lag verb', () => {
  it.each(ROWS)('%s', (sentence, written, expected) => expect(bound(sentence, written)).toEqual(expected));
});
