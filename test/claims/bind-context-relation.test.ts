/**
 * A relation told as a bare noun ("the lag", "the gap", "the delay", "the Antarctic lag") or a gas
 * told as "the gas" names no subject of its own: the two things it relates, or the gas, are those of
 * the sentence before (src/claims/bind-context.ts, MEASURE_SUBJECT and REFERS_BACK). A term that is a
 * word of a longer term serving the value ("ice age" in "the end of the last ice age") names no
 * other subject. Two-sentence passages of our own; quantities built by hand (quantity-at.ts).
 *
 * Value: the Antarctic temperature-CO2 offset over the last deglaciation is a few centuries at most
 * (about -200 to 650 years): Pedro, J. B. et al. (2012), Clim. Past 8, 1213-1221,
 * doi:10.5194/cp-8-1213-2012; Parrenin, F. et al. (2013), Science 339, 1060-1063,
 * doi:10.1126/science.1226368; Chowdhry Beeman, J. et al. (2019), Clim. Past 15, 913-926,
 * doi:10.5194/cp-15-913-2019.
 */
import { describe, expect, it } from 'vitest';
import { loadPacks } from '../../src/rulepack/index.js';
import { boundAfter, type ContextRow, type Written } from './quantity-at.js';

const packs = await loadPacks([]);
const bound = (context: string, sentence: string, written: Written[]): string[] => boundAfter(packs, context, sentence, written);
const CONSENSUS = 'antarctic-co2-phasing-termination-1-consensus';

const REACHED: ContextRow[] = [
  ['In the Dome C ice, Antarctic warming leads and carbon dioxide follows.', 'During the last deglaciation the delay was roughly 3,000 years.', [['roughly 3,000 years', 'duration']], [CONSENSUS]],
  ['In the Dome C ice, Antarctic warming leads and carbon dioxide follows.', 'At the end of the last ice age the lag was about 4,000 years.', [['about 4,000 years', 'duration']], [CONSENSUS]],
  ['Carbon dioxide and Antarctic temperature rose almost together.', 'Newer cores put the Antarctic lag over the last deglaciation at about 1,200 years.', [['about 1,200 years', 'duration']], [CONSENSUS]],
  ['Carbon dioxide rose after Antarctica began to warm.', 'Across the last deglaciation the gas trailed Antarctic temperature by roughly 1,800 years.', [['roughly 1,800 years', 'duration']], [CONSENSUS]],
  ['The CO2 curve sits a little behind the Antarctic temperature curve.', 'At the end of the last ice age, the gap between them was some 2,500 years.', [['some 2,500 years', 'duration']], [CONSENSUS]],
];

const KEPT_APART: ContextRow[] = [
  // A relation with an "of" phrase names its own subject.
  ['Carbon dioxide rose after Antarctica began to warm.', 'The lag of sea level behind the warming during the last deglaciation was about 3,000 years.', [['about 3,000 years', 'duration']], ['-']],
  // The sentence before names no gas: the lag is not the CO2 lag.
  ["Greenland's temperature swung wildly during the deglaciation.", 'At the end of the last ice age the lag was about 2,000 years.', [['about 2,000 years', 'duration']], ['-']],
  // No bare relation and no back-reference: the sentence does not borrow the gas.
  ['Carbon dioxide rose after Antarctica began to warm.', 'Sediment layers from the fjord span about 3,000 years.', [['about 3,000 years', 'duration']], ['-']],
];

describe('a bare relation or "the gas" takes its subjects from the sentence before', () => {
  it.each(REACHED)('%s / %s', (context, sentence, written, expected) => {
    expect(bound(context, sentence, written)).toEqual(expected);
  });
});

describe('and only then', () => {
  it.each(KEPT_APART)('%s / %s', (context, sentence, written, expected) => {
    expect(bound(context, sentence, written)).toEqual(expected);
  });
});
