/**
 * A display that stands for a regional record (session 16): a passage that shows a regional record as a
 * display ("The dotted curve is temperature at Vostok.") and then reads that display as the whole
 * planet's temperature ("The dotted curve therefore traces the temperature of the entire planet.") reads
 * the regional record as global, though the second sentence names no record. A display never tied to a
 * regional record, a display set against the globe, and a "figure" that is a number stay clean.
 * Sentences of our own.
 *
 * Sources: an Antarctic core's isotopes record the temperature near the drill site, whose glacial
 * swings (about 8-10 °C, Jouzel et al. 2007, Science 317, 793-796) are roughly twice the global mean
 * change (about 4.5-7 °C, Tierney et al. 2020, Nature 584, 569-573); the CO2 of the trapped air is a
 * global signal (Masson-Delmotte et al. 2013, IPCC AR5 WG1 ch. 5).
 */
import { describe, expect, it } from 'vitest';
import { checkText } from '../../src/engine.js';
import { loadPacks } from '../../src/rulepack/index.js';

const packs = await loadPacks([]);
const RULE = 'scope.regional-record-as-global';

async function scopeFlags(text: string): Promise<string[]> {
  const result = await checkText(text, { path: 'draft.txt', packs });
  return result.flags.filter((f) => f.ruleId === RULE && f.level !== 'note').map((f) => f.excerpt);
}

describe('a display standing for a regional record', () => {
  it.each([
    ['The dotted curve is temperature at Vostok, read from deuterium. The dotted curve therefore traces the temperature of the entire planet.', 'entire planet'],
    ['On this chart the green trace gives temperature at EPICA Dome C. Grey shading marks the warm spells. That green trace is simply the temperature of the Earth over 800,000 years.', 'the Earth'],
    ['Plot 3 is the Greenland temperature record from NGRIP. Plot 3 tells us how much the whole world warmed after the ice age.', 'whole world'],
  ])('flags %s', async (text, excerpt) => {
    expect(await scopeFlags(text)).toEqual([excerpt]);
  });
});

describe('a display that stays clean', () => {
  it.each([
    // no sentence before shows a regional record as a display
    'Dome C lies high on the East Antarctic plateau. The dotted curve traces the temperature of the entire planet, rebuilt from ocean sediments.',
    // the display is set against the globe
    'The dotted curve is temperature at Vostok. The dotted curve swings about twice as far as the temperature of the entire planet.',
    // "figure" as a number is no display
    'The dotted curve is temperature at Vostok, swinging by 9 °C. The global figure is smaller: about 5 to 6 °C.',
    // the display holds CO2, a global signal
    'The dotted curve is temperature at Vostok. The dashed curve is CO2, which was the same over the entire planet.',
  ])('leaves clean: %s', async (text) => {
    expect(await scopeFlags(text)).toEqual([]);
  });
});
