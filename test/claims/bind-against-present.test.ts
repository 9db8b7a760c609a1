/**
 * A level told against today's ("lower than today") is not today's level: the present-day CO2 value
 * vetoes the pack term `below-present`, so the figure stays with the period the passage speaks of or
 * binds nothing. Sentences of our own, read by the real parser, binder and reference check.
 *
 * Values and their sources (the pack's `sources:` entries):
 * - CO2 today about 424 ppm as a global annual mean in 2024 (WMO 2025; NOAA GML global annual mean);
 * - typical interglacial CO2 peaks 240-300 ppm (Lüthi, D. et al. (2008), Nature 453, 379-382;
 *   Siegenthaler, U. et al. (2005), Science 310, 1313-1317).
 */
import { describe, expect, it } from 'vitest';
import { judgeAt } from './judge-at.js';

describe('a level lower than today is no present-day level', () => {
  it.each([
    // The period comes from the sentence before; "than today" is only the yardstick.
    ['Carbon dioxide then stood at about 285 ppm, lower than today.', 'about 285 ppm', 'The last interglacial peaked some 125,000 years ago.'],
    ['Back then CO2 held near 300 ppm, well below today\'s level.', '300 ppm', 'In the last interglacial the seas stood higher.'],
  ])('%s', (sentence, figure, before) => {
    expect(judgeAt(sentence, figure, before).value).not.toBe('co2-present-day');
  });

  it('still reads a level of today as today\'s (WMO 2025: about 424 ppm in 2024)', () => {
    expect(judgeAt('Today carbon dioxide stands at about 380 ppm.', 'about 380 ppm')).toEqual({ value: 'co2-present-day', verdict: 'conflicts' });
  });

  it('reads the interglacial level told against today in its own sentence (Lüthi et al. 2008)', () => {
    expect(judgeAt('In the interglacials CO2 peaked near 360 ppm, lower than today.', '360 ppm')).toEqual({ value: 'co2-interglacial-maximum-typical', verdict: 'conflicts' });
  });
});
