/**
 * The time an amount took ("a step of 12 ppm in under a century") speaks of that amount: it takes
 * the words of the amount and of its unit (ppm names the gas), so it is no length of the period the
 * sentence names around it. A recurrence ("every 41,000 years") and a lead ("ahead by 600 years")
 * are no length of the deglaciation either. Sentences of our own, read by the real parser, binder
 * and reference check.
 *
 * Values and their sources (the pack's `sources:` entries): the last deglaciation lasted about 7,000
 * years (6,000-9,000; Chowdhry Beeman, J. et al. (2019), Clim. Past 15, 913-926; Clark, P. U. et al.
 * (2012), PNAS 109, E1134-E1142); the deglacial CO2 rise took about 6,000-7,500 years (Monnin, E. et
 * al. (2001), Science 291, 112-114).
 */
import { describe, expect, it } from 'vitest';
import { judgeAt } from './judge-at.js';

describe('the time an amount took is no length of the deglaciation', () => {
  it.each([
    ['During the deglaciation the gas sometimes leapt 12 ppm in barely a century.', 'barely a century'],
    ['Across the deglaciation there were pulses of roughly 12 ppm within about 150 years.', 'about 150 years'],
    ['In the last deglaciation, the record shows steps of 10-15 ppm in under two hundred years.', 'two hundred years'],
  ])('%s', (sentence, figure) => {
    expect(judgeAt(sentence, figure).value).toBe('-');
  });
});

describe('a recurrence or a lead is no length of the deglaciation', () => {
  it.each([
    ['Back then the ice sheets waxed and waned about every 41,000 years.', 'about every 41,000 years'],
    ['At the onset of the deglaciation Antarctica ran ahead by about 600 years.', 'about 600 years'],
  ])('%s', (sentence, figure) => {
    expect(judgeAt(sentence, figure).value).not.toBe('termination-1-duration');
  });
});

describe('the length of the deglaciation and of its CO2 rise are still read', () => {
  it.each([
    ['The last deglaciation took only about 800 years.', 'about 800 years', 'termination-1-duration', 'conflicts'],
    ['Over the last deglaciation CO2 climbed about 80 ppm in only 500 years.', '500 years', 'co2-deglacial-rise-duration', 'conflicts'],
    ['Over the last deglaciation CO2 climbed about 80 ppm in some 6,500 years.', 'some 6,500 years', 'co2-deglacial-rise-duration', 'agrees'],
  ])('%s', (sentence, figure, value, verdict) => {
    expect(judgeAt(sentence, figure)).toEqual({ value, verdict });
  });
});
