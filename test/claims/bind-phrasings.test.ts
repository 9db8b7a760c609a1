/**
 * Everyday ways of naming a period, a moment or a measure, each added to the pack's terms as words
 * (rules/paleoclimate.yaml): an onset told as "got going" or "kicked off", the thaw for the
 * deglaciation, the cold and warm spells of the cycles, CO2 rising "in leaps ... at a time", a peak
 * that "never got above", "higher than at any point in". Sentences of our own, quantities built by
 * hand (quantity-at.ts), so that only the binder is measured.
 */
import { describe, expect, it } from 'vitest';
import { bindQuantities } from '../../src/claims/bind.js';
import { loadPacks } from '../../src/rulepack/index.js';
import { quantitiesIn, type Written } from './quantity-at.js';

const packs = await loadPacks([]);

type Row = [sentence: string, written: Written[], expected: string];

function bound(sentence: string, written: Written[]): string {
  const { bindings, ambiguous } = bindQuantities(sentence, quantitiesIn(sentence, written), packs);
  return bindings[0]?.referenceId ?? (ambiguous.length > 0 ? '?' : '-');
}

const ROWS: Row[] = [
  // Holocene base 11,700 b2k (Walker et al. 2009, doi:10.1002/jqs.1227).
  ['Our own warm period only got going about 5,000 years ago, in the Holocene.', [['about 5,000 years ago', 'age']], 'holocene-start'],
  // Younger Dryas onset about 12,900 years ago (Rasmussen et al. 2006, doi:10.1029/2005JD006079).
  ['The Younger Dryas kicked off roughly 14,000 years ago.', [['roughly 14,000 years ago', 'age']], 'younger-dryas-start'],
  // The Last Glacial Maximum about 19,000-23,000 years ago (Clark et al. 2009, doi:10.1126/science.1172873).
  ['That glacial maximum fell roughly 50,000 years ago.', [['roughly 50,000 years ago', 'age']], 'lgm-chronozone'],
  // The last deglaciation took some 6,500-8,000 years (Chowdhry Beeman et al. 2019, doi:10.5194/cp-15-913-2019).
  ['The whole thaw took about 2,000 years from first warming to the Holocene.', [['about 2,000 years', 'duration']], 'termination-1-duration'],
  // Glacial CO2 about 172-200 ppm (Lüthi et al. 2008, doi:10.1038/nature06949).
  ['In the cold spells carbon dioxide fell to about 240 ppm.', [['about 240 ppm', 'concentration']], 'co2-glacial-minimum-typical'],
  // Centennial CO2 steps of 10-15 ppm (Marcott et al. 2014, doi:10.1038/nature13799).
  ['Carbon dioxide rose in leaps of about 50 ppm at a time.', [['about 50 ppm', 'concentration']], 'co2-deglacial-abrupt-step'],
  // The highest pre-industrial CO2 of 800,000 years is about 300 ppm (Lüthi et al. 2008, doi:10.1038/nature06949).
  ['Carbon dioxide never got above 250 ppm in all that time.', [['250 ppm', 'concentration']], 'co2-highest-preindustrial-800kyr'],
  // CO2 in 2019 was higher than at any time in at least 2 million years (IPCC 2021, SPM A.2.1, doi:10.1017/9781009157896.001).
  ['Carbon dioxide is now higher than at any point in at least 20 million years.', [['20 million years', 'duration']], 'co2-2019-highest-in-2-myr'],
  // A gap between two records is a lag, never how long the deglaciation took: CO2 and Antarctic
  // temperature within a few centuries (Pedro et al. 2012, doi:10.5194/cp-8-1213-2012).
  ['At the end of the last ice age the gap between Antarctic warming and the CO2 rise was some 2,000 years.', [['some 2,000 years', 'duration']], 'antarctic-co2-phasing-termination-1-consensus'],
  ['Later work narrowed the Termination I offset to some 2,000 years.', [['some 2,000 years', 'duration']], '-'],
];

describe('bindQuantities: everyday phrasings in the pack', () => {
  it.each(ROWS)('%s', (sentence, written, expected) => expect(bound(sentence, written)).toBe(expected));
});
