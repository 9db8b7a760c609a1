/**
 * A ceiling or a floor with a word of degree inside its verb ("never went much past N", "did not
 * dip far below N"), and a bare preposition after a negated noun ("no CO2 sample above N", "at no
 * point lower than N"): the number is still the extreme (src/claims/bind-bound.ts, lexicon
 * `bounds.degree`), not a level of today or of 1750. Sentences of our own, through the real
 * parser, binder and check.
 *
 * Reference values: CO2 in the 800,000-year ice-core record ranged from about 172 ppm (its lowest)
 * to about 300 ppm (its highest natural level): Lüthi, D. et al. (2008), Nature 453, 379-382,
 * doi:10.1038/nature06949.
 */
import { describe, expect, it } from 'vitest';
import { boundAt } from './judge-at.js';

const HIGHEST = 'co2-highest-preindustrial-800kyr';
const LOWEST = 'co2-lowest-800kyr';

describe('a word of degree inside a negated verb of passing keeps the ceiling', () => {
  it.each([
    // Lüthi et al. 2008: the natural maximum is about 300 ppm, so these agree.
    ['Through every warm interval of the ice record, carbon dioxide never climbed much above 300 ppm.', '300 ppm', 'agrees'],
    ['Before the first factories, CO2 did not rise far beyond about 300 ppm.', 'about 300 ppm', 'agrees'],
    ['Natural CO2 in the old air never went appreciably past 300 ppm.', '300 ppm', 'agrees'],
    // ...and a ceiling set too low is still an error (Lüthi et al. 2008).
    ['Through every warm interval of the ice record, carbon dioxide never climbed much above 240 ppm.', '240 ppm', 'conflicts'],
    ['Natural CO2 in the old air never went significantly past 250 ppm.', '250 ppm', 'conflicts'],
  ])('%s', (sentence, text, verdict) => {
    expect(boundAt(sentence, text)).toEqual({ bound: 'ceiling', value: HIGHEST, verdict });
  });
});

describe('a bare preposition after a negation states a ceiling or a floor', () => {
  it.each([
    // Lüthi et al. 2008.
    ['The bubbles in the Antarctic cores hold no CO2 sample above about 300 ppm.', 'about 300 ppm', 'ceiling', HIGHEST, 'agrees'],
    ['The bubbles in the Antarctic cores hold no CO2 sample above 260 ppm.', '260 ppm', 'ceiling', HIGHEST, 'conflicts'],
    ['In the ice, carbon dioxide was at no point higher than 300 ppm before industry.', '300 ppm', 'ceiling', HIGHEST, 'agrees'],
    ['In the glacial ice, CO2 did not dip far below 240 ppm.', '240 ppm', 'floor', LOWEST, 'conflicts'],
    ['Even in the coldest glacials, carbon dioxide did not sink much below about 172 ppm.', 'about 172 ppm', 'floor', LOWEST, 'agrees'],
  ])('%s', (sentence, text, bound, value, verdict) => {
    expect(boundAt(sentence, text)).toEqual({ bound, value, verdict });
  });
});

describe('without a negation the preposition is no bound (common practice)', () => {
  it.each([
    ['Carbon dioxide in the air is now well above 400 ppm.', '400 ppm'],
    ['By 2024 CO2 stood above 420 ppm at most stations.', '420 ppm'],
  ])('%s', (sentence, text) => {
    expect(boundAt(sentence, text).bound).toBe('-');
  });
});
