/**
 * Numbers whose unit a neighbour states once (src/claims/elided-units.ts), and what they bind to.
 * Glacial cycles: EPICA Dome C eight (EPICA community members 2004, Nature 429, 623-628), Vostok four
 * (Petit et al. 1999, Nature 399, 429-436). Record spans: Vostok about 420,000 years (Petit et al.
 * 1999), EPICA Dome C about 800,000 years (Jouzel et al. 2007, Science 317, 793-796). Sentences are our own.
 */
import { describe, expect, it } from 'vitest';
import { bindQuantities } from '../../src/claims/bind.js';
import { restoreElidedUnits } from '../../src/claims/elided-units.js';
import { checkText } from '../../src/index.js';
import { parseQuantities } from '../../src/quantities/index.js';
import { loadPacks } from '../../src/rulepack/index.js';

const packs = await loadPacks([]);

function read(sentence: string): [string, string][] {
  return restoreElidedUnits(sentence, parseQuantities(sentence)).map((q) => [q.text, q.dimension]);
}

function bound(sentence: string): string[] {
  const quantities = restoreElidedUnits(sentence, parseQuantities(sentence));
  const { bindings } = bindQuantities(sentence, quantities, packs);
  return quantities.map((_, i) => bindings.find((b) => b.quantityIndex === i)?.referenceId ?? '-');
}

describe('restoreElidedUnits', () => {
  it('gives a gapped clause the unit of the clause before', () => {
    expect(read('The Marrow Hall panel says Vostok covers four cycles and EPICA Dome C eight.')).toEqual([['four cycles', 'count'], ['eight', 'count']]);
    expect(read('Vostok reaches back 420,000 years, EPICA Dome C 800,000.')).toEqual([['420,000 years', 'duration'], ['800,000', 'duration']]);
  });

  it('gives the numbers of a list the unit written after the last one', () => {
    expect(read('They reach back 420,000 and 800,000 years respectively.')).toEqual([['420,000', 'duration'], ['800,000 years', 'duration']]);
    expect(read('The three periods are 100,000, 41,000 and 23,000 years.')).toEqual([['100,000', 'duration'], ['41,000', 'duration'], ['23,000 years', 'duration']]);
  });

  it('leaves alone numbers that count something else or start a new phrase', () => {
    expect(read('Three teams drilled to 3,270 metres over eight seasons.')).toEqual([['3,270 metres', 'length']]);
    expect(read('The core reached 3,270 metres, and one team stayed on.')).toEqual([['3,270 metres', 'length']]);
    // A range the reader already joins stays one quantity.
    expect(read('CO2 swung between 180 and 280 ppm.')).toEqual([['between 180 and 280 ppm', 'concentration']]);
  });
});

describe('binding numbers with elided units', () => {
  it('binds each count of a gapped clause to its own core', () => {
    expect(bound('Vostok covers four cycles and EPICA Dome C eight.')).toEqual(['vostok-glacial-cycles', 'edc-glacial-cycles']);
  });

  it('binds a list read "respectively" in order', () => {
    expect(bound('Vostok and EPICA Dome C reach back 420,000 and 800,000 years respectively.')).toEqual(['vostok-record-span', 'edc-record-span']);
  });

  it('flags swapped counts, each against its own core', async () => {
    const result = await checkText('Vostok covers eight cycles and EPICA Dome C four.\n');
    expect(result.flags.map((f) => [f.ruleId, f.excerpt, f.correction])).toEqual([
      ['value.vostok-glacial-cycles', 'eight cycles', 'four glacial cycles'],
      ['value.edc-glacial-cycles', 'four', 'eight glacial cycles'],
    ]);
  });

  it('flags swapped spans in a "respectively" list', async () => {
    const result = await checkText('Vostok and EPICA Dome C reach back 800,000 and 420,000 years respectively.\n');
    expect(result.flags.map((f) => [f.ruleId, f.excerpt])).toEqual([
      ['value.vostok-record-span', '800,000'],
      ['value.edc-record-span', '420,000 years'],
    ]);
  });
});
