/**
 * A glacial or interglacial period named in other words ("the coldest spells", "cold stages"), the
 * dotted terms that add such words to a pack term, and level verbs that do not veto a level value.
 * Sentences are our own; quantities are built by hand (quantity-at.ts) so only the binder is measured.
 */
import { describe, expect, it } from 'vitest';
import { bindQuantities, extendedTerm, findTerms } from '../../src/claims/bind.js';
import { checkText } from '../../src/index.js';
import { loadPacks } from '../../src/rulepack/index.js';
import { quantitiesIn, type Written } from './quantity-at.js';

const packs = await loadPacks([]);

function bound(sentence: string, written: Written[], context?: string): string[] {
  const { bindings, ambiguous } = bindQuantities(sentence, quantitiesIn(sentence, written), packs, context);
  return written.map((_, i) => bindings.find((b) => b.quantityIndex === i)?.referenceId ?? (ambiguous.includes(i) ? '?' : '-'));
}

// Lüthi et al. 2008 (Nature 453, 379-382): glacial CO2 minima about 172-200 ppm; interglacial peaks about 240-300 ppm.
const ROWS: [sentence: string, written: Written[], expected: string][] = [
  ['During the coldest spells, carbon dioxide fell to about 240 parts per million.', [['about 240 parts per million', 'concentration']], 'co2-glacial-minimum-typical'],
  ['In the cold stages of the Pleistocene, CO2 sank to roughly 185 ppm.', [['roughly 185 ppm', 'concentration']], 'co2-glacial-minimum-typical'],
  ['At the depths of the ice ages the air held about 190 ppm of carbon dioxide.', [['about 190 ppm', 'concentration']], 'co2-glacial-minimum-typical'],
  ['In the warmest spells CO2 climbed as high as 290 ppm.', [['as high as 290 ppm', 'concentration']], 'co2-interglacial-maximum-typical'],
  // A change told as a change binds the change, not a level (Fischer et al. 1999: 80-100 ppm per termination).
  ['During the coldest spells, carbon dioxide fell by about 90 ppm.', [['about 90 ppm', 'concentration']], 'co2-glacial-interglacial-amplitude'],
];

describe('a glacial period named in other words', () => {
  it.each(ROWS)('%s', (sentence, written, expected) => expect(bound(sentence, written)).toEqual([expected]));

  it('reads a dotted term id as more words for the term before the dot', () => {
    expect(extendedTerm('glacial.in-other-words', packs)).toBe('glacial');
    // No term "nothing-here" exists: the id stays as written.
    expect(extendedTerm('nothing-here.more', packs)).toBe('nothing-here.more');
    expect(findTerms('In the coldest spells it was dry.', packs).get('glacial')).toEqual([[7, 21]]);
    expect(findTerms('In the coldest spells it was dry.', packs).has('glacial.in-other-words')).toBe(false);
  });

  it('flags glacial CO2 given at an interglacial level, with the glacial range as correction', async () => {
    // Lüthi et al. 2008: glacial minima about 172-200 ppm, so 240 ppm in the coldest spells is wrong.
    const result = await checkText('During the coldest spells, carbon dioxide fell to about 240 parts per million.\n');
    expect(result.flags.map((f) => [f.ruleId, f.correction])).toEqual([['value.co2-glacial-minimum-typical', 'about 190 ppm (180 to 200 ppm)']]);
  });
});
