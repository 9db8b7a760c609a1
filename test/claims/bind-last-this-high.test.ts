/**
 * The time a level was last reached, told from today's (rules/paleoclimate.yaml, term
 * `unprecedented`): "the last time CO2 was as high as now", "held this much CO2", "last matched"
 * name the span over which today's CO2 is unprecedented, as "highest in" does. A level last reached
 * going down ("this low") names the lowest level's age, not that span. Sentences of our own;
 * quantities built by hand (quantity-at.ts).
 */
import { describe, expect, it } from 'vitest';
import { loadPacks } from '../../src/rulepack/index.js';
import { boundIn, type Row, type Written } from './quantity-at.js';

const packs = await loadPacks([]);

const bound = (sentence: string, written: Written[]): string[] => boundIn(packs, sentence, written);

// IPCC AR6 WGI SPM A.2.1 (2021, doi:10.1017/9781009157896.001): CO2 in 2019 was higher than at any
// time in at least 2 million years.
const ROWS: Row[] = [
  ['The last time the atmosphere held this much carbon dioxide was about 400,000 years ago.', [['about 400,000 years ago', 'age']], ['co2-2019-highest-in-2-myr']],
  ['The last time CO2 was as high as now was over three million years ago.', [['over three million years ago', 'age']], ['co2-2019-highest-in-2-myr']],
  ["Today's CO2 was last matched some 50,000 years ago, the panel claims.", [['some 50,000 years ago', 'age']], ['co2-2019-highest-in-2-myr']],
  // Going down is another record: the lowest level of the ice cores, about 667,000 years ago (Lüthi et al. 2008, doi:10.1038/nature06949).
  ['The last time CO2 fell this low was about 670,000 years ago.', [['about 670,000 years ago', 'age']], ['-']],
];

describe('bindQuantities: the last time CO2 was this high', () => {
  it.each(ROWS)('%s', (sentence, written, expected) => expect(bound(sentence, written)).toEqual(expected));
});
