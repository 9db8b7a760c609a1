/**
 * The subject that opens the next figure's clause is that figure's (src/claims/bind-view.ts
 * claimantsOf): after a line break or a clause mark, "pre-industrial is 280 ppm" speaks of 280 ppm
 * however near the figure before it stands. Sentences are our own; the figures: CO2 about 190 ppm at
 * the Last Glacial Maximum and about 278 ppm in 1750 (IPCC AR6 WGI, Gulev et al. 2021 ch. 2;
 * Forster et al. 2021 ch. 7).
 */
import { describe, expect, it } from 'vitest';
import { bindQuantities } from '../../src/claims/bind.js';
import { parseQuantities } from '../../src/quantities/index.js';
import { loadPacks } from '../../src/rulepack/index.js';

const packs = await loadPacks([]);

function bound(sentence: string): string[] {
  const quantities = parseQuantities(sentence);
  const { bindings } = bindQuantities(sentence, quantities, packs);
  return quantities.map((_, i) => bindings.find((b) => b.quantityIndex === i)?.referenceId ?? '-');
}

describe('the subject opening the next figure\'s clause', () => {
  it.each([
    ['at the glacial maximum carbon dioxide was near 190 ppm\npre-industrial was roughly 280 ppm', ['co2-lgm', 'co2-preindustrial-1750']],
    ['in the coldest part of the last glacial maximum co2 got down to roughly 190 ppm\npre-industrial is the familiar 280 ppm', ['co2-lgm', 'co2-preindustrial-1750']],
  ])('%j', (sentence, expected) => expect(bound(sentence)).toEqual(expected));

  it('a phrase that runs on from the figure before opens no clause', () => {
    // "before industry" qualifies the maximum of the 800,000 years; it is no subject of its own.
    const [, second] = bound('The maximum in 800,000 years before industry was about 300 ppm.');
    expect(second).not.toBe('co2-preindustrial-1750');
  });
});
