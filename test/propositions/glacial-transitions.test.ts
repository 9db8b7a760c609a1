/**
 * CO2 changes set in a glacial transition (src/propositions/transitions.ts), in sentences of our own.
 * The science: CO2 rose by 76 ppmv over the last glacial termination (Monnin et al. 2001, Science
 * 291, 112-114, doi 10.1126/science.291.5501.112, abstract); CO2 was low in each glacial and high in
 * each interglacial, falling as each glacial set in (Petit et al. 1999, Nature 399, 429-436; Luthi et
 * al. 2008, Nature 453, 379-382).
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { checkText } from '../../src/engine.js';
import { loadPacks } from '../../src/rulepack/index.js';
import type { LoadedPacks } from '../../src/rulepack/types.js';

let packs: LoadedPacks;
beforeAll(async () => {
  packs = await loadPacks([]);
});

const RULE = 'direction.co2-rises-as-ice-ages-end';
const rules = async (text: string) => (await checkText(text, { packs, format: 'markdown' })).flags.map((f) => f.ruleId);

describe('a CO2 change set in the end or the start of an ice age', () => {
  it.each([
    // the ice melting back, as a clause before or after the change
    'While the northern glaciers were wasting away, the concentration of carbon dioxide sank.',
    'Carbon dioxide in the atmosphere declined as the continental ice broke up.',
    // the end of a glacial, by phase noun, by a verb of its course, by a period noun
    'Around the close of the penultimate glaciation, CO2 went down by roughly 70 ppm.',
    'Once more, just as the glacial period was waning, CO2 plunged.',
    'Over the termination the CO2 content of the air declined.',
    // coming out of a glacial, and going into one
    'CO2 decreased as Earth climbed out of the ice age.',
    'Each time the climate tipped into a glaciation, carbon dioxide soared.',
    // the ice advancing, with the change after it or a pronoun for the ice
    'CO2 increased whenever the ice caps spread south.',
    'The ice sheets grew and CO2 kept rising, then they collapsed and CO2 dropped.',
  ])('flags %s', async (text) => {
    expect(await rules(text)).toContain(RULE);
  });

  it.each([
    // the right way round
    'While the northern glaciers were wasting away, the concentration of carbon dioxide climbed.',
    'Each time the climate tipped into a glaciation, carbon dioxide declined.',
    'CO2 increased by about 80 ppm as Earth climbed out of the ice age.',
    // a time before or after the transition, not the transition itself
    'In the early Holocene, after the ice caps had broken up, CO2 sank by a few ppm.',
    'CO2 declined slowly until the ice sheets began to spread again.',
    // a comparison of levels is no change in the transition
    'CO2 was lower at the start of the deglaciation than at its end.',
    // "glacial" as a measure, not a period to go into
    'In the model run CO2 dropped back into the glacial range.',
    // the gas is not what changed
    'As the ice melted back, the ocean took up less CO2 and its temperature rose.',
  ])('leaves %s alone', async (text) => {
    expect(await rules(text)).not.toContain(RULE);
  });

  it('a denied fall is no fall: "CO2 did not drop as the ice retreated"', async () => {
    expect(await rules('CO2 did not drop as the ice retreated; it climbed.')).not.toContain(RULE);
    expect(await rules('CO2 did not rise as the ice retreated.')).toContain(RULE);
  });
});
