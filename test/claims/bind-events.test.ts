/**
 * An event named by the state of a thing (src/claims/bind-events.ts, pack lexicon class `states`):
 * ice sheets at their greatest extent are the Last Glacial Maximum, ice sheets beginning their
 * retreat the start of the deglaciation. Sentences of our own, read by the real parser and binder.
 *
 * Values: ice sheets at their maximum about 26,500-19,000 years ago (Clark, P. U. et al. (2009),
 * The Last Glacial Maximum, Science 325, 710-714, doi:10.1126/science.1172873); the deglaciation
 * began about 18,000-19,000 years ago (Chowdhry Beeman, J. et al. (2019), Clim. Past 15, 913-926,
 * doi:10.5194/cp-15-913-2019; Clark et al. 2009).
 */
import { describe, expect, it } from 'vitest';
import { judge, judgeAt } from './judge-at.js';


describe('ice sheets at their greatest are the ice-sheet maximum of the last glacial', () => {
  it.each([
    ['North American ice sheets stood at their largest extent about 70,000 years ago.', 'conflicts'],
    ['The Scandinavian ice sheet grew to its maximum size some 40,000 years ago.', 'conflicts'],
    ['Ice sheets across the north were at their biggest roughly 21,000 years ago.', 'agrees'],
    ['The ice sheets reached their farthest extent around 22,000 years ago.', 'agrees'],
  ])('%s', (sentence, verdict) => {
    expect(judge(sentence)).toEqual({ value: 'lgm-ice-sheet-maximum', verdict });
  });
});

describe('ice sheets beginning their retreat are the start of the deglaciation', () => {
  it.each([
    ['The northern ice sheets started to recede about 6,000 years ago.', 'conflicts'],
    ['The great ice sheets began pulling back in earnest some 40,000 years ago.', 'conflicts'],
    ['The ice sheets began to retreat roughly 19,000 years ago.', 'agrees'],
  ])('%s', (sentence, verdict) => {
    expect(judge(sentence)).toEqual({ value: 'termination-1-start', verdict });
  });
});

describe('other words about ice sheets name no event', () => {
  it.each([
    // Today's ice sheets and their size (common practice): no glacial event.
    ['Greenland\'s ice sheet holds about 7 metres of sea-level equivalent.'],
    // The state after a clause boundary is not the ice sheets' own.
    ['The ice sheets were thick, and the valley reached its greatest extent of farmland some 5,000 years ago.'],
    // A state too far from the thing.
    ['The ice sheets that once covered the plain left behind moraines, lakes and kettles that reached their greatest size about 9,000 years ago.'],
  ])('%s', (sentence) => {
    const value = judge(sentence).value;
    expect(value).not.toBe('lgm-ice-sheet-maximum');
    expect(value).not.toBe('termination-1-start');
  });
});

/**
 * The orbit's cycles told by what they do (pack lexicon `states`): the tilt that wobbles or nods is
 * the tilt's own cycle, and its wobble names no precession; the orbit that stretches or changes
 * shape is the eccentricity cycle. Sentences of our own. Periods: obliquity about 41,000 years,
 * eccentricity about 100,000 years, climatic precession about 19,000-23,000 years (Berger, A. (1978),
 * J. Atmos. Sci. 35, 2362-2367; Hays, Imbrie & Shackleton (1976), Science 194, 1121-1132).
 */
describe('a wobble told of the tilt is the tilt cycle, not precession', () => {
  it.each([
    ['The tilt of the planet wobbles back and forth roughly every 26,000 years.', 'milankovitch-obliquity-period', 'conflicts'],
    ["Earth's tilt wobbles on a cycle of about 100,000 years.", 'milankovitch-obliquity-period', 'conflicts'],
    ['The axial tilt nods slowly, one full swing every 41,000 years or so.', 'milankovitch-obliquity-period', 'agrees'],
    ['The tilt wobble takes about 22,000 years to come round.', 'milankovitch-obliquity-period', 'conflicts'],
  ])('%s', (sentence, value, verdict) => {
    expect(judge(sentence)).toEqual({ value, verdict });
  });

  it('a wobble with no tilt before it stays precession', () => {
    expect(judge('The wobble of the axis comes round every 41,000 years.')).toEqual({ value: 'milankovitch-precession-period', verdict: 'conflicts' });
  });

  it('precession named beside the tilt keeps its own figure', () => {
    expect(judgeAt('The tilt goes through its cycle in 41,000 years and precession in about 21,000 years.', '21,000')).toEqual({
      value: 'milankovitch-precession-period',
      verdict: 'agrees',
    });
  });
});

describe('the orbit changing shape is the eccentricity cycle', () => {
  it.each([
    ["Earth's orbit stretches out and relaxes again over roughly 23,000 years.", 'conflicts'],
    ['The path around the Sun slowly changes shape about every 41,000 years.', 'conflicts'],
    ['The orbit becomes more elliptical and then rounder again over about 100,000 years.', 'agrees'],
  ])('%s', (sentence, verdict) => {
    expect(judge(sentence)).toEqual({ value: 'milankovitch-eccentricity-period', verdict });
  });
});

/**
 * A peak or a low told of the recurring warm or cold periods is each period's own extreme, no ceiling
 * or floor of the whole record (pack lexicon `states`, interglacial:interglacial and glacial:glacial).
 * Sentences of our own. Values: interglacial CO2 peaks near 280 ppm (240-300), glacial lows near
 * 185 ppm (172-200), the whole 800,000-year record 172-300 ppm (Lüthi, D. et al. (2008), Nature 453,
 * 379-382; Siegenthaler, U. et al. (2005), Science 310, 1313-1317).
 */
describe('a peak told of the interglacials is their typical peak', () => {
  it.each([
    ['In the warm interglacials carbon dioxide peaked at close to 280 ppm.', 'co2-interglacial-maximum-typical', 'agrees'],
    ['During interglacials the gas typically topped out near 390 ppm.', 'co2-interglacial-maximum-typical', 'conflicts'],
    ['In the cold glacials CO2 bottomed out at around 190 ppm.', 'co2-glacial-minimum-typical', 'agrees'],
  ])('%s', (sentence, value, verdict) => {
    expect(judge(sentence)).toEqual({ value, verdict });
  });

  it.each([
    // No recurring period named: the peak of the whole record.
    ['Across the whole ice-core record, CO2 peaked at roughly 360 ppm before industry.', 'co2-highest-preindustrial-800kyr', 'conflicts'],
    // A superlative is the record's ceiling, whichever interglacial reached it.
    ['The highest level in the ice, about 380 ppm, came in one of the interglacials.', 'co2-highest-preindustrial-800kyr', 'conflicts'],
  ])('the ceiling of the record stays: %s', (sentence, value, verdict) => {
    expect(judge(sentence)).toEqual({ value, verdict });
  });
});
