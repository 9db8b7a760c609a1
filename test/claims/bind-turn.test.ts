/**
 * A turn of contrast to a subject of its own (src/claims/bind-turn.ts): after ", while" or
 * ", whereas" with a new subject at the clause's head, the words before the turn neither name nor
 * veto what the number after it measures. Sentences of our own, through the real parser, binder
 * and check.
 *
 * Reference values: the Vostok record spans about 420,000 years (Petit, J. R. et al. 1999, Nature
 * 399, 429-436) and Dome C about 800,000 (Jouzel, J. et al. 2007, Science 317, 793-796); the global
 * mean CO2 for 2024 was about 423.9 ppm (NOAA Global Monitoring Laboratory, annual global mean,
 * 2025 release) and Mauna Loa's May 2024 monthly mean about 426.9 ppm (NOAA GML / Scripps).
 */
import { describe, expect, it } from 'vitest';
import { judgeAt } from './judge-at.js';

describe('the clause after a turn to a new subject is that subject\'s', () => {
  it.each([
    // Petit et al. 1999; Jouzel et al. 2007.
    ['The Dome C core holds about 800,000 years of climate, whereas the Vostok record holds about 420,000 years.', 'about 420,000 years', 'vostok-record-span', 'agrees'],
    ['The oldest continuous record, EPICA Dome C, reaches back some 800,000 years, while Vostok reaches back about 420,000 years.', 'about 420,000 years', 'vostok-record-span', 'agrees'],
    // NOAA GML: the global mean, not Mauna Loa's May value.
    ['At Mauna Loa the May 2025 monthly mean topped 430 ppm, while the global mean for 2024 was close to 424 ppm.', 'close to 424 ppm', 'co2-global-2024', 'agrees'],
    // The errors that must still be caught.
    ['The Dome C core holds about 800,000 years of climate, whereas the Vostok record holds about 250,000 years.', 'about 250,000 years', 'vostok-record-span', 'conflicts'],
    ['At Mauna Loa the May 2025 monthly mean topped 430 ppm, while the global mean for 2024 was close to 395 ppm.', 'close to 395 ppm', 'co2-global-2024', 'conflicts'],
  ])('%s', (sentence, text, value, verdict) => {
    expect(judgeAt(sentence, text)).toEqual({ value, verdict });
  });

  it('a turn with no subject of its own keeps the subject before (common practice)', () => {
    // Jouzel et al. 2007: "it" is still Dome C.
    expect(judgeAt('The Dome C record is long, while it reaches back about 800,000 years.', 'about 800,000 years')).toEqual({ value: 'edc-record-span', verdict: 'agrees' });
  });
});
