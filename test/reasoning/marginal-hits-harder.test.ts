/**
 * The effect of one more ppm told as a blow ("every extra ppm hits harder than the one before"):
 * "hit" is a verb of effect and "harder" a comparative of size (pack lexicon data, every
 * inflection derived), so the marginal-forcing reader hears the claim that the effect per ppm grows,
 * the wrong way round. The right way round and a "hit" with no extra ppm stay clean.
 * Sentences of our own invention.
 *
 * Source: CO2 forcing grows with the logarithm of the concentration, so each added ppm adds a little
 * less (Myhre et al. 1998, Geophysical Research Letters 25, 2715-2718; IPCC AR6 WGI chapter 7).
 */
import { describe, expect, it } from 'vitest';
import { checkText } from '../../src/engine.js';
import { loadPacks } from '../../src/rulepack/index.js';

const packs = await loadPacks([]);
const LOG = 'direction.co2-forcing-logarithmic';

async function rulesOf(text: string): Promise<string[]> {
  const result = await checkText(text, { path: 'chat.txt', packs });
  return result.flags.filter((f) => f.level !== 'note').map((f) => f.ruleId);
}

describe('one more ppm that hits harder', () => {
  it.each([
    'every extra ppm of CO2 hits harder than the one before',
    'Each additional ppm hit harder than the last one did, so the next hundred will be brutal.',
    'mate every extra ppm hits harder than the one before it',
  ])('flags: %s', async (text) => {
    expect(await rulesOf(text)).toContain(LOG);
  });

  it.each([
    'Every extra ppm hits a little less hard than the one before.',
    'Each extra ppm of CO2 adds a bit less warming than the one before.',
    'CO2 hit 1,000 ppm in the Eemian.',
    'The Younger Dryas cold snap hit Europe hard about 12,900 years ago.',
  ])('stays clean: %s', async (text) => {
    expect(await rulesOf(text)).not.toContain(LOG);
  });
});
