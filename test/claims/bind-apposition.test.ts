/**
 * Numbers in an apposition state measures of the subject beside them (src/claims/bind-apposition.ts).
 * Sentences are our own; the quantities come from the real parser.
 * EPICA Dome C: about 3,260-3,270 m, about 800,000 years (Lüthi et al. 2008, Nature 453, 379-382;
 * Jouzel et al. 2007, Science 317, 793-796). Vostok: 3,623 m, about 420,000 years (Petit et al. 1999,
 * Nature 399, 429-436). Dome Fuji: about 720,000 years (Kawamura et al. 2017, Science Advances 3, e1600446).
 */
import { describe, expect, it } from 'vitest';
import { bindQuantities } from '../../src/claims/bind.js';
import { checkText } from '../../src/index.js';
import { parseQuantities } from '../../src/quantities/index.js';
import { loadPacks } from '../../src/rulepack/index.js';

const packs = await loadPacks([]);

function bound(sentence: string): string[] {
  const quantities = parseQuantities(sentence);
  const { bindings } = bindQuantities(sentence, quantities, packs);
  return quantities.map((_, i) => bindings.find((b) => b.quantityIndex === i)?.referenceId ?? '-');
}

const ROWS: [sentence: string, expected: string[]][] = [
  ['EPICA Dome C (3,270 m deep, about 800,000 years) is the reference core for the Harwell panels.', ['edc-drilled-depth', 'edc-record-span']],
  ['The Harwell panels start with Vostok (about 420,000 years) and end with the ice of today.', ['vostok-record-span']],
  ['Dome Fuji — about 720,000 years — comes next in the gallery.', ['dome-fuji-record-span']],
  ['The Vostok core (3,623 m) was drilled by a Russian, French and American team.', ['vostok-drilled-depth']],
  // Not the quantity alone: "560 km away" is a distance, not a measure of the core.
  ['EPICA Dome C, about 560 km away, reaches further.', ['-']],
  // A clause after the comma, though every word is a pack term: the lag of CO2 behind Antarctic
  // temperature (a few centuries; Parrenin et al. 2013, Science 339, 1060-1063), not the core's span.
  ['In the Vostok core, CO2 rose about 800 years after Antarctic temperature.', ['-']],
  // No head term right before the bracket: nothing to read.
  ['The gallery (about 800,000 years of climate) opens in May.', ['-']],
];

describe('numbers in an apposition', () => {
  it.each(ROWS)('%s', (sentence, expected) => expect(bound(sentence)).toEqual(expected));

  it('flags a wrong span and a wrong depth in brackets, each against its own value', async () => {
    const result = await checkText('EPICA Dome C (2,270 m deep, about 400,000 years) is the reference core.\n');
    expect(result.flags.map((f) => [f.ruleId, f.excerpt])).toEqual([
      ['value.edc-drilled-depth', '2,270 m'],
      ['value.edc-record-span', 'about 400,000 years'],
    ]);
  });
});
