/**
 * A time worked from a pace ("at 2.4 ppm a year, a rise that size takes roughly 35 years") is the
 * pace's, not the length of the event it is set beside: it binds no duration value. Sentences of our
 * own, read by the real parser, binder and reference check.
 *
 * Values and their sources (the pack's `sources:` entries): the last deglaciation lasted about 7,000
 * years (6,000-9,000; Chowdhry Beeman, J. et al. (2019), Clim. Past 15, 913-926; Clark, P. U. et al.
 * (2012), PNAS 109, E1134-E1142); the 2010s growth rate of about 2.4 ppm a year (NOAA GML, from the
 * pack's notes).
 */
import { describe, expect, it } from 'vitest';
import { judgeAt } from './judge-at.js';

describe('a time worked from a pace binds no event length', () => {
  it.each([
    ['At 2.4 ppm a year, a rise as big as the whole deglaciation would take us roughly 35 years.', 'roughly 35 years'],
    ['Modern emissions, at about 2.5 ppm a year, would repeat the deglacial rise in about four decades.', 'about four decades'],
  ])('%s', (sentence, figure) => {
    expect(judgeAt(sentence, figure).value).toBe('-');
  });
});

describe('the length of the deglaciation is still read where no pace is set', () => {
  it.each([
    ['The last deglaciation took only about 500 years.', 'about 500 years', 'conflicts'],
    ['The last deglaciation took about 7,000 years, at a mean CO2 rise near 0.012 ppm a year.', 'about 7,000 years', 'agrees'],
  ])('%s', (sentence, figure, verdict) => {
    expect(judgeAt(sentence, figure)).toEqual({ value: 'termination-1-duration', verdict });
  });
});
