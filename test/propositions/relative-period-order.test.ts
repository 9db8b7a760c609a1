/**
 * An order verb in a relative clause on a period ("the warm spell that followed", "the interglacial
 * which came after") orders that period, not CO2 and temperature (session 16): read as CO2 first, it
 * hid a regional record read as global. An order verb after a relative pronoun on CO2 or temperature
 * still orders them. Sentences of our own.
 *
 * The science: Antarctic swings of about 8-10 °C (Jouzel et al. 2007, Science 317, 793-796) are about
 * twice the global mean change (Tierney et al. 2020, Nature 584, 569-573); global temperature mostly
 * rose after CO2 in the last deglaciation (Shakun et al. 2012, Nature 484, 49-54).
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { compileLexicon, readPropositions, readSentence } from '../../src/propositions/index.js';
import { loadPacks } from '../../src/rulepack/index.js';
import { checkReasoning } from '../../src/checks/reasoning/index.js';
import type { LoadedPacks } from '../../src/rulepack/types.js';

let packs: LoadedPacks;
beforeAll(async () => {
  packs = await loadPacks([]);
});

const ordersOf = (text: string) => readPropositions(readSentence(text, compileLexicon(packs))).orders.map((o) => `${o.first}>${o.then}`);

describe('an order verb in a relative clause', () => {
  it.each([
    'Temperature at the site swung by eight degrees between each glaciation and the warm spell that followed.',
    'Temperature dropped during the cold snap, and the interstadial which came after was brief.',
  ])('on a period orders nothing: %s', (text) => {
    expect(ordersOf(text)).toEqual([]);
  });

  it('on CO2 still orders it', () => {
    expect(ordersOf('Temperature climbed, and the CO2 that followed came centuries later.')).toContain('temperature>co2');
  });

  it('no longer hides a regional record read as the whole planet', () => {
    const paragraph = [
      'The solid curve is temperature at Vostok.',
      'The solid curve shows how the temperature of the entire planet changed between each glaciation and the warm spell that followed.',
    ];
    expect(checkReasoning(paragraph, 1, packs).map((f) => f.ruleId)).toContain('scope.regional-record-as-global');
  });
});
