/**
 * A floor or a ceiling told with a verb of change ("never fell below", "never dropped under", "never
 * rose above") and a hedge before its number: the verb belongs to the bound, so it names no change
 * and vetoes no value of the extreme (src/claims/bind.ts, bound readings). Sentences of our own,
 * through the real parser, binder and check.
 *
 * Reference values: CO2 in the 800,000-year ice-core record ranged from about 172 ppm (its lowest)
 * to about 300 ppm (its highest natural level): Lüthi, D. et al. (2008), Nature 453, 379-382,
 * doi:10.1038/nature06949.
 */
import { describe, expect, it } from 'vitest';
import { boundAt, judgeAt } from './judge-at.js';

const HIGHEST = 'co2-highest-preindustrial-800kyr';
const LOWEST = 'co2-lowest-800kyr';

describe('a verb of change inside a bound is the bound, not a change', () => {
  it.each([
    // Lüthi et al. 2008: the lowest level is about 172 ppm, so a floor of 220 is too high.
    ['Over those 800,000 years, CO2 never dropped below about 220 ppm.', 'about 220 ppm', 'floor', LOWEST, 'conflicts'],
    ['In the ice-core record carbon dioxide never fell below roughly 230 ppm.', 'roughly 230 ppm', 'floor', LOWEST, 'conflicts'],
    ['Across the glacials, CO2 never sank below about 210 ppm.', 'about 210 ppm', 'floor', LOWEST, 'conflicts'],
    // ...a floor at the right level agrees (Lüthi et al. 2008).
    ['In the ice-core record carbon dioxide never fell below about 172 ppm.', 'about 172 ppm', 'floor', LOWEST, 'agrees'],
    ['Over the last 800,000 years CO2 never dropped below roughly 175 ppm.', 'roughly 175 ppm', 'floor', LOWEST, 'agrees'],
    // A ceiling told with a verb of rising (Lüthi et al. 2008: about 300 ppm).
    ['Before industry, CO2 in the ice never rose above about 380 ppm.', 'about 380 ppm', 'ceiling', HIGHEST, 'conflicts'],
    ['Before industry, CO2 in the ice never rose above about 300 ppm.', 'about 300 ppm', 'ceiling', HIGHEST, 'agrees'],
    // A verb of change right before a plain bound carries the number to the extreme: a level, no
    // change and no glacial-interglacial swing (Lüthi et al. 2008: lowest about 172 ppm).
    ['In the deepest cold phases carbon dioxide sank as low as about 100 ppm.', 'about 100 ppm', 'floor', LOWEST, 'conflicts'],
    ['In the deepest cold phases carbon dioxide sank as low as roughly 175 ppm.', 'roughly 175 ppm', 'floor', LOWEST, 'agrees'],
  ])('%s', (sentence, text, bound, value, verdict) => {
    expect(boundAt(sentence, text)).toEqual({ bound, value, verdict });
  });

  it('a change told without a bound is still a change, not the lowest level (common practice)', () => {
    // "fell by about 80 ppm" is the size of a fall, not the floor of the record.
    expect(judgeAt('As the last glacial set in, CO2 fell by about 80 ppm.', 'about 80 ppm').value).not.toBe(LOWEST);
  });
});
