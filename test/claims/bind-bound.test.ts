/**
 * A number stated as a ceiling or a floor (src/claims/bind-bound.ts): "never rose above N", "a
 * natural upper limit of N", "peaked at N", "at most N", "never fell below N", "bottomed out at N".
 * It binds the highest or the lowest level and is compared as the number written, not as the
 * half-open interval of its hedge. Sentences of our own, read by the real parser, binder and check.
 *
 * Reference values: CO2 in the 800,000-year ice-core record ranged from about 172 ppm (its lowest,
 * Marine Isotope Stage 16) to about 300 ppm (its highest natural level): Lüthi, D. et al. (2008),
 * Nature 453, 379-382, doi:10.1038/nature06949.
 */
import { describe, expect, it } from 'vitest';
import { boundAt } from './judge-at.js';

const HIGHEST = 'co2-highest-preindustrial-800kyr';
const LOWEST = 'co2-lowest-800kyr';

describe('a ceiling binds the highest natural CO2 level and is read as the number written', () => {
  it.each([
    // Negated verbs of passing, in several tenses and with words between.
    ['Before industry, carbon dioxide did not rise above 260 ppm in any interglacial of the Dome C record.', '260 ppm', 'conflicts'],
    ['Across eight glacial cycles, CO2 levels never once topped 400 ppm.', '400 ppm', 'conflicts'],
    ['In the ice, pre-industrial CO2 has at no point exceeded 340 ppm.', '340 ppm', 'conflicts'],
    ['Carbon dioxide never went higher than 250 ppm before the factories came.', '250 ppm', 'conflicts'],
    // Ceiling nouns and verbs that need no negation.
    ['In the ice-core record, carbon dioxide had a natural upper limit of roughly 380 ppm.', 'roughly 380 ppm', 'conflicts'],
    ['Pre-industrial CO2 reached a maximum of about 380 ppm during the warmest interglacials.', 'about 380 ppm', 'conflicts'],
    ['Over 800,000 years natural CO2 stayed at most 350 ppm.', '350 ppm', 'conflicts'],
    ['Warm-period CO2 levels got as high as 360 ppm in the old ice.', '360 ppm', 'conflicts'],
    // The same forms with the right number agree.
    ['Before industry, carbon dioxide never rose above about 300 ppm.', 'about 300 ppm', 'agrees'],
    ['In the ice-core record, carbon dioxide had a natural upper limit of roughly 290 ppm.', 'roughly 290 ppm', 'agrees'],
    ['Pre-industrial CO2 topped out at about 300 ppm in the warmest interglacials.', 'about 300 ppm', 'agrees'],
    // A relative clause opened by a preposition and "which": the present named before it vetoes nothing there.
    ['Today the air holds more CO2 than in the whole ice record, over which the gas never rose above 300 ppm.', '300 ppm', 'agrees'],
    ['Our air now beats every layer of the ice, in which carbon dioxide never climbed above 390 ppm.', '390 ppm', 'conflicts'],
  ])('%s', (sentence, text, verdict) => {
    expect(boundAt(sentence, text)).toEqual({ bound: 'ceiling', value: HIGHEST, verdict });
  });
});

describe('a floor binds the lowest CO2 level', () => {
  it.each([
    ['In the coldest glacials, CO2 never fell below 100 ppm.', '100 ppm', 'conflicts'],
    ['Over the last 800,000 years carbon dioxide did not drop below 230 ppm.', '230 ppm', 'conflicts'],
    ['Carbon dioxide bottomed out at about 175 ppm some 670,000 years ago.', 'about 175 ppm', 'agrees'],
    ['CO2 in the ice sank as low as 172 ppm.', '172 ppm', 'agrees'],
  ])('%s', (sentence, text, verdict) => {
    expect(boundAt(sentence, text)).toEqual({ bound: 'floor', value: LOWEST, verdict });
  });
});

describe('numbers that are no bound stay as they were', () => {
  it('a bound words the first number of a pair, not the second (common practice)', () => {
    const sentence = 'CO2 never went higher than about 300 ppm, and in the coldest spells it sank to about 185 ppm.';
    expect(boundAt(sentence, 'about 300 ppm')).toEqual({ bound: 'ceiling', value: HIGHEST, verdict: 'agrees' });
    expect(boundAt(sentence, 'about 185 ppm').bound).toBe('-');
    expect(boundAt(sentence, 'about 185 ppm').value).not.toBe(HIGHEST);
  });

  it.each([
    // A plain lower bound with no negation is no ceiling: today's level (NOAA GML, 2024 mean ~424 ppm).
    ['Today carbon dioxide stands above 420 ppm.', 'above 420 ppm'],
    // A bound word after a number is that number's, not the next one's.
    ['CO2 ranged from roughly 175 ppm at its lowest to roughly 295 ppm at its highest.', 'roughly 295 ppm'],
    // "Maximum" inside the name of a period is no bound: LGM CO2 about 190 ppm (Lüthi et al. 2008).
    ['Carbon dioxide at the Last Glacial Maximum was about 190 ppm.', 'about 190 ppm'],
    // An age or a span has no extreme to bind (common practice).
    ['The ice sheets never grew larger than they were about 21,000 years ago.', 'about 21,000 years ago'],
  ])('%s', (sentence, text) => {
    expect(boundAt(sentence, text).bound).toBe('-');
  });

  it('a seasonal peak is no ceiling of the record: Mauna Loa May 2020 monthly mean 417.1 ppm (NOAA GML co2_mm_mlo.txt)', () => {
    expect(boundAt('At Mauna Loa, CO2 peaked at 417.1 ppm in May 2020.', '417.1 ppm')).toEqual({ bound: '-', value: 'co2-mlo-may-2020', verdict: 'agrees' });
  });

  it('the Last Glacial Maximum level still binds the LGM value and agrees', () => {
    expect(boundAt('Carbon dioxide at the Last Glacial Maximum was about 190 ppm.', 'about 190 ppm')).toEqual({ bound: '-', value: 'co2-lgm', verdict: 'agrees' });
  });

  it('a ceiling in one clause does not reach a present-day figure stated before it (common practice)', () => {
    const sentence = 'Present-day air holds far more CO2 than any ice-core sample, where natural CO2 never went above about 300 ppm.';
    expect(boundAt(sentence, 'about 300 ppm')).toEqual({ bound: 'ceiling', value: HIGHEST, verdict: 'agrees' });
  });
});
