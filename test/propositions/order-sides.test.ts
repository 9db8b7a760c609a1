/**
 * Which side of an order a thing stands on (session 19): a region past a comma from a temperature
 * word is a temperature of its own; a region set against the subject in an aside ("unlike
 * Antarctica") is not where the order happened; a place in a phrase after an absolute order word
 * ("coming second in Antarctica") did not come second; an order verb in a relative clause with no
 * object ("the warming that followed") names nothing its thing came after; a region modifying "head
 * start" holds the head start; a thing that only modifies a hyphenated compound ("the gas-age issue")
 * is no event. Sentences of our own.
 *
 * The science: Antarctic temperature rose with CO2 or a few centuries before it at the start of the
 * last deglaciation (Parrenin et al. 2013, Science 339, 1060-1063; Pedro et al. 2012, Climate of the
 * Past 8, 1213-1221); global temperature mostly rose after CO2 (Shakun et al. 2012, Nature 484, 49-54).
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { compileLexicon, readPropositions, readSentence } from '../../src/propositions/index.js';
import { loadPacks } from '../../src/rulepack/index.js';
import type { LoadedPacks } from '../../src/rulepack/types.js';

let packs: LoadedPacks;
beforeAll(async () => {
  packs = await loadPacks([]);
});

const ordersOf = (text: string) => readPropositions(readSentence(text, compileLexicon(packs))).orders.map((o) => `${o.first}>${o.then}@${o.region ?? '-'}`);

describe('the two sides of an order', () => {
  it('a region past a comma from a temperature word is its own temperature', () => {
    expect(ordersOf('the world average trailed the gas, the antarctic plateau heated up slightly earlier')).toContain('temperature>co2@antarctic');
    expect(ordersOf('the world average trailed the gas, the antarctic plateau heated up slightly earlier')).not.toContain('co2>temperature@antarctic');
  });

  it('a region set against the subject in an aside sets no region', () => {
    const orders = ordersOf('The averaged global series, unlike Greenland, rose after carbon dioxide, with most of the heating arriving after the gas started climbing.');
    expect(orders).not.toContain('co2>temperature@greenland');
    expect(orders).toContain('co2>temperature@global');
  });

  it('a region after "as opposed to" sets no region either', () => {
    const orders = ordersOf("In the last thaw the world's mean temperature, as opposed to Greenland's, mostly climbed after the gas did.");
    expect(orders.filter((o) => o.endsWith('@greenland'))).toEqual([]);
  });

  it.each([
    'arriving second in Antarctica does not make the gas powerless',
    'Turning up a little late in Antarctica never stopped carbon dioxide from heating the rest of the world.',
  ])('a place after an absolute order word did not come second: %s', (text) => {
    expect(ordersOf(text).filter((o) => o.endsWith('@antarctic') && o.startsWith('co2>'))).toEqual([]);
  });

  it('an order verb in a relative clause with no object orders nothing', () => {
    expect(ordersOf('Carbon dioxide was no trigger, yet it amplified much of the global heating that followed.')).toEqual([]);
    // With an object the relative clause still orders its antecedent.
    expect(ordersOf('Temperature climbed, and the CO2 that followed it came centuries later.')).toContain('temperature>co2@-');
  });

  it('a region that modifies "head start" holds it', () => {
    expect(ordersOf('the global mean lagged the gas; the antarctic head start is a seesaw effect')).toContain('temperature>co2@antarctic');
  });

  it('a thing inside a hyphenated compound is no event', () => {
    expect(ordersOf('Later teams found no offset between them once the gas-dating problem was solved.')).toEqual([]);
  });
});
