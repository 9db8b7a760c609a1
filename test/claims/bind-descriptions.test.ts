/**
 * Periods and events named by description (src/claims/bind-descriptions.ts, pack lexicon classes
 * `time-parts` and `time-descriptions`): a phase of a period noun with its qualifier ("the close of
 * the most recent glaciation"), the period's course told as a clause ("as the last ice age drew to a
 * close", "the ice started melting back"), interglacials in other words ("the warm spells between ice
 * ages"), and the time before industry told by what began it ("before people began burning coal on a
 * large scale"). Sentences of our own, read by the real parser, binder and reference check.
 *
 * Values and their sources (the pack's `sources:` entries):
 * - the Last Glacial Maximum about 19,000-26,500 years ago: Clark, P. U. et al. (2009), The Last
 *   Glacial Maximum, Science 325, 710-714, doi:10.1126/science.1172873; Mix et al. (2001) as cited by
 *   Annan, J. D. & Hargreaves, J. C. (2015), Clim. Past 11, 1-20 (19-23 ka);
 * - CO2 at the LGM about 180-200 ppm: Forster, P. et al. (2021), IPCC AR6 WGI ch. 7; Monnin, E. et
 *   al. (2001), Science 291, 112-114;
 * - the deglacial CO2 rise of about 80 ppm (70-100 ppm): Monnin et al. (2001) (+76 ppmv); Pedro, J.
 *   B. et al. (2012), Clim. Past 8, 1213-1221 (~80 ppmv between 19 and 11 ka);
 * - the last deglaciation began about 18,000 years ago (17,000-20,000) and ended about 11,500 years
 *   ago (11,000-11,700): Chowdhry Beeman, J. et al. (2019), Clim. Past 15, 913-926,
 *   doi:10.5194/cp-15-913-2019; Clark et al. (2009); Walker, M. et al. (2009), J. Quat. Sci. 24, 3-17;
 * - the Holocene began 11,700 years before 2000 (Walker et al. 2009);
 * - typical interglacial CO2 peaks 240-300 ppm: Lüthi, D. et al. (2008), Nature 453, 379-382;
 *   Siegenthaler, U. et al. (2005), Science 310, 1313-1317;
 * - CO2 in 1750 about 278 ppm (270-285): Gulev, S. K. et al. (2021), IPCC AR6 WGI ch. 2 (from memory
 *   in the pack's notes; IPCC 2021 SPM's 47% rise to 2019 agrees).
 */
import { describe, expect, it } from 'vitest';
import { describedTimes } from '../../src/claims/bind-descriptions.js';
import { loadPacks } from '../../src/rulepack/index.js';
import { judge, judgeAt } from './judge-at.js';

const loadedLexicon = (await loadPacks([])).lexicon;

describe('the deepest cold of the last ice age, in any wording, is the Last Glacial Maximum', () => {
  it.each([
    ['At the height of the most recent glaciation, about 50,000 years ago, ice covered Canada.', 'lgm-chronozone', 'conflicts'],
    ['When the last ice age was at its coldest, some 80,000 years ago, Canada lay under ice.', 'lgm-chronozone', 'conflicts'],
    ['The coldest part of the last glacial came roughly 21,000 years ago.', 'lgm-chronozone', 'agrees'],
    ['The depths of the latest ice age fell around 20,000 years ago.', 'lgm-chronozone', 'agrees'],
    ['At the coldest point of the most recent glaciation, carbon dioxide was about 240 ppm.', 'co2-lgm', 'conflicts'],
    ['At the peak of the last glacial period, CO2 stood near 190 ppm.', 'co2-lgm', 'agrees'],
  ])('%s', (sentence, value, verdict) => {
    expect(judge(sentence)).toEqual({ value, verdict });
  });
});

describe('the end of the last ice age, as a phrase or a clause, is the last deglaciation', () => {
  it.each([
    // The rise across it (Monnin et al. 2001; Pedro et al. 2012); "saw CO2 climb" is the change it names.
    ['The close of the most recent glaciation saw CO2 climb ~300 ppm.', 'co2-deglacial-rise-magnitude', 'conflicts'],
    ['As the last ice age drew to a close, carbon dioxide rose by some 200 ppm.', 'co2-deglacial-rise-magnitude', 'conflicts'],
    ['The end of the last ice age saw CO2 climb about 80 ppm.', 'co2-deglacial-rise-magnitude', 'agrees'],
    // Its end (Chowdhry Beeman et al. 2019; Walker et al. 2009).
    ['As the last ice age drew to a close, about 40,000 years ago, the seas rose.', 'termination-1-end', 'conflicts'],
    ['The last glacial period came to an end about 11,500 years ago.', 'termination-1-end', 'agrees'],
    // Its start (Chowdhry Beeman et al. 2019; Clark et al. 2009).
    ['The ice started melting back about 40,000 years ago.', 'termination-1-start', 'conflicts'],
    ['The onset of the last deglaciation came about 40,000 years ago.', 'termination-1-start', 'conflicts'],
    ['The ice began to retreat roughly 18,000 years ago.', 'termination-1-start', 'agrees'],
    ['The last ice age started to fade around 18,000 years ago.', 'termination-1-start', 'agrees'],
  ])('%s', (sentence, value, verdict) => {
    expect(judge(sentence)).toEqual({ value, verdict });
  });
});

describe('interglacials and the Holocene in other words', () => {
  it.each([
    // Lüthi et al. 2008; Siegenthaler et al. 2005.
    ['During the warm spells between ice ages, CO2 regularly reached 350 ppm.', 'co2-interglacial-maximum-typical', 'conflicts'],
    ['In the mild spells that separated the ice ages, CO2 climbed to about 400 ppm.', 'co2-interglacial-maximum-typical', 'conflicts'],
    ['In the warm periods between glacials, CO2 peaked near 280 ppm.', 'co2-interglacial-maximum-typical', 'agrees'],
    // Walker et al. 2009.
    ['The dawn of the Holocene came about 20,000 years ago.', 'holocene-start', 'conflicts'],
    ['The current interglacial began about 20,000 years ago.', 'holocene-start', 'conflicts'],
    ['The opening of the Holocene came about 11,700 years ago.', 'holocene-start', 'agrees'],
  ])('%s', (sentence, value, verdict) => {
    expect(judge(sentence)).toEqual({ value, verdict });
  });
});

describe('the recurring warm and cold periods, told by their warmth or cold and a stretch of time in the plural', () => {
  it.each([
    // Typical interglacial peaks 240-300 ppm, glacial lows 172-200 ppm (Lüthi et al. 2008; Siegenthaler et al. 2005).
    ['In the warm breaks of the last 800,000 years, carbon dioxide reached about 280 ppm.', 'about 280 ppm', 'co2-interglacial-maximum-typical', 'agrees'],
    ['In the milder stretches, carbon dioxide climbed to about 390 ppm.', 'about 390 ppm', 'co2-interglacial-maximum-typical', 'conflicts'],
    ['During the warm peaks between ice ages, CO2 held near 285 ppm.', '285 ppm', 'co2-interglacial-maximum-typical', 'agrees'],
    ['During the warm times between the glacials, CO2 held near 360 ppm.', '360 ppm', 'co2-interglacial-maximum-typical', 'conflicts'],
    ['In the colder times the ice held about 185 ppm of carbon dioxide.', 'about 185 ppm', 'co2-glacial-minimum-typical', 'agrees'],
    ['In the icy phases, CO2 sank to some 120 ppm.', 'some 120 ppm', 'co2-glacial-minimum-typical', 'conflicts'],
    // The glacial lows and the warm peaks of one sentence each keep their own figure.
    ['Glacial lows sat at about 185 ppm and the warm peaks near 290 ppm.', '290 ppm', 'co2-interglacial-maximum-typical', 'agrees'],
  ])('%s', (sentence, figure, value, verdict) => {
    expect(judgeAt(sentence, figure)).toEqual({ value, verdict });
  });
  it('takes the adjective only as written: a warming spell names no interglacial (common practice of English)', () => {
    const found = describedTimes('A warming spell of a few decades raised CO2 by 3 ppm.', loadedLexicon);
    expect(found).toEqual([]);
  });
});

describe('the time before industry, told by what began it, is pre-industrial (Gulev et al. 2021)', () => {
  it.each([
    ['Before people began burning coal on a large scale, CO2 stood near 350 ppm.', 'conflicts'],
    ['Before factories and cars, CO2 was around 350 ppm.', 'conflicts'],
    ['Before we started burning fossil fuels, carbon dioxide sat at about 280 ppm.', 'agrees'],
    ['Prior to the age of coal, carbon dioxide stood at roughly 280 ppm.', 'agrees'],
  ])('%s', (sentence, verdict) => {
    expect(judge(sentence)).toEqual({ value: 'co2-preindustrial-1750', verdict });
  });
});

describe('a level reached or a ceiling in the sentences descriptions stand in', () => {
  it.each([
    // "fell to a meagre 120 ppm": an article and one word of description between "to" and the level
    // keep it a level reached, not a change (CO2 at the LGM, Forster et al. 2021; Monnin et al. 2001).
    ['In the depths of the last ice age, carbon dioxide fell to a meagre 120 ppm.', 'co2-lgm', 'conflicts'],
    ['CO2 fell to a mere 190 ppm at the peak of the last ice age.', 'co2-lgm', 'agrees'],
    // "never cracked" is a ceiling (lexicon bounds.ceiling-verb): the highest natural level, about
    // 300 ppm (Lüthi et al. 2008), not the 1750 level the "until ..." clause names.
    ['Across those 800,000 years CO2 never cracked 380 ppm until we started burning coal.', 'co2-highest-preindustrial-800kyr', 'conflicts'],
    ['Across those 800,000 years CO2 never cracked ~300 ppm, not once, until we started burning coal.', 'co2-highest-preindustrial-800kyr', 'agrees'],
  ])('%s', (sentence, value, verdict) => {
    expect(judge(sentence)).toEqual({ value, verdict });
  });
});

describe('look-alikes name no period (common practice of English)', () => {
  it.each([
    ['At the end of the record, CO2 was 350 ppm.'],
    ['The start of the core dates to 40,000 years ago.'],
    ['The peak of the season saw CO2 climb 9 ppm.'],
    ['Before the storm, the station logged 350 ppm of CO2.'],
    ['The coldest part of the station sits at -40 °C.'],
    ['Before people began burning candles, the room held 350 ppm of CO2.'],
    // An earlier glacial's end or cold peak is no date of the last one.
    ['The end of the previous deglaciation came about 40,000 years ago.'],
    ['The penultimate ice age reached its coldest point about 40,000 years ago.'],
  ])('%s', (sentence) => {
    expect(judge(sentence)).toEqual({ value: '-', verdict: '-' });
  });
});

describe('a team adds its own parts and descriptions', () => {
  const lexicon = {
    'time-parts': { end: ['end of', 'close of'], last: ['the last'], glacial: ['ice age', 'Weichselian'], 'end-verb': ['end', 'draw to a close'] },
    'time-descriptions': { 'end last glacial:one': ['deglaciation'], 'last glacial:one end-verb': ['deglaciation'] },
  };
  it.each([
    ['By the close of the last Weichselian, the sea had risen.', 'close of the last Weichselian'],
    ['As the last ice age drew to a close, forests spread.', 'last ice age drew to a close'],
  ])('%s', (sentence, words) => {
    const found = describedTimes(sentence, lexicon);
    expect(found.map((f) => [sentence.slice(f.start, f.end), f.terms])).toEqual([[words, ['deglaciation']]]);
  });
  it('reads no description across a clause break', () => {
    expect(describedTimes('At the close, the last ice age was far behind us.', lexicon)).toEqual([]);
  });
});
