/**
 * A peak told of the warm periods ("interglacials peaked at ...") or of one of them ("the Eemian
 * topped out near ...") is that period's own peak: it binds the typical interglacial maximum, not the
 * highest level of the whole 800,000-year record. A peak or ceiling told of the record alone still
 * binds the record's highest. Sentences of our own, read by the real parser, binder and reference check.
 *
 * Values and their sources (the pack's `sources:` entries): interglacial peaks of the last 800,000
 * years near 240-300 ppm, the highest about 300 ppm (Lüthi, D. et al. (2008), Nature 453, 379-382,
 * doi 10.1038/nature06949).
 */
import { describe, expect, it } from 'vitest';
import { judgeAt } from './judge-at.js';

describe('a period peaked at its own peak', () => {
  it.each([
    ['In the warm interglacials the gas peaked at about 285 ppm.', 'about 285 ppm', 'co2-interglacial-maximum-typical', 'agrees'],
    ['Interglacials, for their part, topped out near 290 ppm of CO2.', '290 ppm', 'co2-interglacial-maximum-typical', 'agrees'],
    ['In the warm interglacials CO2 peaked at about 370 ppm.', 'about 370 ppm', 'co2-interglacial-maximum-typical', 'conflicts'],
  ])('%s', (sentence, figure, value, verdict) => {
    expect(judgeAt(sentence, figure)).toEqual({ value, verdict });
  });

  it('a peak of the last interglacial is no highest of the record', () => {
    expect(judgeAt('Eemian CO2 topped out near 285 ppm, by the Dome C air.', '285 ppm').value).not.toBe('co2-highest-preindustrial-800kyr');
  });
});

describe('the record\'s highest is still read where no period peaked', () => {
  it.each([
    ['Over 800,000 years the gas in the bubbles peaked at about 360 ppm.', 'about 360 ppm', 'conflicts'],
    ['Natural CO2 never went above 300 ppm, not even in the warmest interglacials.', '300 ppm', 'agrees'],
  ])('%s', (sentence, figure, verdict) => {
    expect(judgeAt(sentence, figure)).toEqual({ value: 'co2-highest-preindustrial-800kyr', verdict });
  });
});
