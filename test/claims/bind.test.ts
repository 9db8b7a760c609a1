import { describe, expect, it } from 'vitest';
import { bindQuantities, findTerms } from '../../src/claims/bind.js';
import { loadPacks } from '../../src/rulepack/index.js';
import type { Dimension, Quantity } from '../../src/types.js';

const packs = await loadPacks([]);

/** A hand-built quantity for `text` inside `sentence` (the parser's job, done by hand here). */
function q(sentence: string, text: string, dimension: Dimension, low: number, high: number): Quantity {
  const start = sentence.indexOf(text);
  return { text, start, end: start + text.length, value: (low + high) / 2, low, high, dimension, unit: 'yr', statedUnit: '' };
}

describe('bindQuantities', () => {
  it('binds two subjects in one sentence each to its own number', () => {
    const s = 'Vostok reaches back 420,000 years and EPICA Dome C 800,000 years.';
    const quantities = [q(s, '420,000 years', 'duration', 415e3, 425e3), q(s, '800,000 years', 'duration', 795e3, 805e3)];
    expect(bindQuantities(s, quantities, packs)).toEqual({
      bindings: [
        { quantityIndex: 0, referenceId: 'vostok-record-span' },
        { quantityIndex: 1, referenceId: 'edc-record-span' },
      ],
      ambiguous: [],
    });
  });

  it('binds a present-day and a pre-industrial level in one sentence by the nearest words', () => {
    const s = 'CO2 now tops 420 ppm, up from about 280 ppm before the industrial revolution.';
    const quantities = [q(s, '420 ppm', 'concentration', 419.5, 420.5), q(s, 'about 280 ppm', 'concentration', 275, 285)];
    expect(bindQuantities(s, quantities, packs).bindings).toEqual([
      { quantityIndex: 0, referenceId: 'co2-present-day' },
      { quantityIndex: 1, referenceId: 'co2-preindustrial-1750' },
    ]);
  });

  it('binds nothing when the quantity is of a dimension the value does not accept', () => {
    const s = 'The Vostok core reaches down to 3,600 metres.';
    expect(bindQuantities(s, [q(s, '3,600 metres', 'length', 3550, 3650)], packs).bindings).toEqual([{ quantityIndex: 0, referenceId: 'vostok-drilled-depth' }]);
    expect(bindQuantities(s, [q(s, '3,600 metres', 'count', 3550, 3650)], packs)).toEqual({ bindings: [], ambiguous: [] });
  });

  it('lets a veto term stop a binding', () => {
    // vostok-record-span is vetoed by delta-age words: the 4,000 years is the gas-age gap, not the span.
    const s = 'In the Vostok record the gas age trails the ice by 4,000 years.';
    expect(bindQuantities(s, [q(s, '4,000 years', 'duration', 3950, 4050)], packs).bindings).toEqual([{ quantityIndex: 0, referenceId: 'delta-age-vostok' }]);
  });

  it('lists a quantity as ambiguous when two values tie', () => {
    // Both record-span values are satisfied and their core names stand equally far from the number.
    const s = 'Vostok 500,000 years EPICA Dome C record.';
    const result = bindQuantities(s, [q(s, '500,000 years', 'duration', 495e3, 505e3)], packs);
    expect(result).toEqual({ bindings: [], ambiguous: [0] });
  });

  it('matches terms case-insensitively on word boundaries, including CO₂ with a subscript', () => {
    expect(findTerms('Carbon dioxide and CO₂ and co2', packs).get('co2')).toEqual([[0, 14], [19, 22], [27, 30]]);
    expect(findTerms('the interglacial', packs).has('glacial')).toBe(false);
  });
});

describe('bindQuantities on depths', () => {
  it('does not bind a distance to a core depth when the sentence says nothing of depth', async () => {
    // Regression: "about 560 km away" bound to the EPICA Dome C drilled depth (Lüthi et al. 2008 give 3270 m).
    const packs = await loadPacks([]);
    const s = 'The EPICA Dome C core, about 560 km away, reaches further.';
    const km = { text: 'about 560 km', start: s.indexOf('about'), end: s.indexOf(' away'), value: 560000, low: 499000, high: 621000, dimension: 'length' as const, unit: 'm', statedUnit: 'km' };
    expect(bindQuantities(s, [km], packs).bindings).toEqual([]);
  });
});

describe('bindQuantities on calendar years', () => {
  it('does not read the year of a drilling season or a paper as the span of a record', async () => {
    // Regression: "in 1998" (a calendar year, an age of −48 yr BP) bound to the Vostok record span,
    // 400,000–423,000 years (Petit et al. 1999, Nature 399, 429-436, doi 10.1038/20859).
    const packs = await loadPacks([]);
    for (const s of ['The Vostok core, finished in January 1998, holds a climate record.', 'The Vostok record, published in Nature in 1999, changed the debate.']) {
      const year = /\d{4}/u.exec(s);
      const q = { text: year?.[0] ?? '', start: year?.index ?? 0, end: (year?.index ?? 0) + 4, value: 1950 - Number(year?.[0]), low: 1949.5 - Number(year?.[0]), high: 1950.5 - Number(year?.[0]), dimension: 'age' as const, unit: 'yr BP', statedUnit: 'CE' };
      expect(bindQuantities(s, [q], packs).bindings).toEqual([]);
    }
  });
});
