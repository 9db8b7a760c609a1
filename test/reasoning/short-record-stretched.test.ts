/**
 * scope.short-record-stretched (session 20): what a record of limited length shows, told of a far
 * longer span. Sentences of our own.
 *
 * Sources: the ice-core CO2 record covers about 800,000 years, over which CO2 stayed between about
 * 172 and 300 ppm (Lüthi et al. 2008, Nature 453, 379-382); today's CO2 is the highest in at least
 * 2 million years (IPCC 2021, AR6 WGI SPM A.2.1); Mauna Loa's record began in 1958; the 2024 rise of
 * about 3.5 ppm was the largest on record, the 1960s averaged under 1 ppm a year and the 2010s about
 * 2.4 (WMO 2025, Greenhouse Gas Bulletin 21; Lan, Tans & Thoning, NOAA GML growth rates).
 */
import { describe, expect, it } from 'vitest';
import { checkText } from '../../src/engine.js';
import { loadPacks } from '../../src/rulepack/index.js';

const packs = await loadPacks([]);
const RULE = 'scope.short-record-stretched';

async function rulesOf(text: string): Promise<string[]> {
  const result = await checkText(text, { path: 'draft.txt', packs });
  return result.flags.filter((f) => f.level === 'error' || f.level === 'warning').map((f) => f.ruleId);
}

describe('a short record stretched to a longer span', () => {
  it.each([
    'The Dome C ice holds 800,000 years of trapped air, and CO2 in it never went above 300 ppm, so CO2 has never been this high in the whole history of the Earth.',
    'Our 800,000-year core record keeps CO2 under 300 ppm.\nSo CO2 has not passed 300 ppm at any point in the history of the planet.',
    'In 800,000 years it never passed 300 ppm, hence CO2 has never passed 300 ppm in the planet\'s 4.5-billion-year history.',
    'Measurements at Mauna Loa, running since 1958, prove that CO2 has risen without a pause for the last million years.',
    // the span named in a sentence about CO2 just before the claim of all history
    'The bubbles show CO2 held below about 300 ppm for those 800,000 years.\nSo CO2 never passed 300 ppm in the entire history of the Earth.',
    // one year's change told as every year's, or over a century
    'The 2023 rise of 3 ppm in CO2 shows that we now add 3 ppm every single year.',
    'The 2024 increase of 3.5 ppm sets the pace, so CO2 will climb by roughly 350 ppm in the next century.',
    'CO2 jumped by 3.5 ppm in 2024.\nIt has been climbing that fast year after year since the 1960s.',
    // a record word of the pack's list in the sentence before, one the old word test lacked (session 21)
    'Our measurements reach back 800,000 years.\nSo CO2 has never been this high in the history of the planet.',
  ])('flags %s', async (text) => {
    expect(await rulesOf(text)).toContain(RULE);
  });
});

describe('a claim kept within its record', () => {
  it.each([
    'The ice cores show CO2 never rose above about 300 ppm in 800,000 years, and today\'s 424 ppm is higher than at any time in at least 2 million years.',
    'Mauna Loa has measured CO2 since 1958, and the ice cores show that today\'s level is the highest in 800,000 years.',
    'CO2 rose by a record 3.5 ppm in 2024; the 2010s averaged about 2.4 ppm a year.',
    'The 2024 jump of 3.5 ppm was the largest ever recorded at Mauna Loa, and CO2 has risen every year since 1958.',
    // a span of the sentence before that is no record's reach, and a date that names no record
    'The age gap between ice and air at Dome C is small, only about 50 years.\nThrough the 800,000 years of the ice core, CO2 stayed between about 172 and 300 ppm.',
    'Careful dating since 2012 puts the CO2 rise within about 400 years of Antarctic warming.',
    'The EPICA core covers 800,000 years of CO2, twice the span of the Vostok record of 420,000 years.',
  ])('leaves clean: %s', async (text) => {
    expect(await rulesOf(text)).not.toContain(RULE);
  });
});
