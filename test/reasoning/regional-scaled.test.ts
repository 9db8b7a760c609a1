/**
 * A polar record scaled to the globe is not read as the globe (session 10, false flags of
 * scope.regional-record-as-global): a multiple just before the global words ("1.5-2x the global
 * mean"), a figure of the globe's own unlike the record's ("Antarctic swings of eight to ten
 * degrees correspond to a global change of five or six"), or the globe given its own order with CO2
 * first ("the lag is an Antarctic thing and global temperature trailed CO2") compares the record with
 * the globe. A record read as the globe, with the record's own figure, is still flagged. Sentences
 * of our own.
 *
 * Sources: Antarctic glacial-interglacial swings of about 8-10 °C (Jouzel et al. 2007, Science 317,
 * 793-796), against a global LGM cooling of about 4.5-7 °C (Tierney et al. 2020, Nature 584, 569-573;
 * Annan et al. 2022, Clim. Past 18, 1883-1896): Antarctica swings about 1.5-2 times the global mean.
 * Global temperature rose after CO2 in the last deglaciation (Shakun et al. 2012, Nature 484, 49-54).
 */
import { describe, expect, it } from 'vitest';
import { checkText } from '../../src/engine.js';
import { loadPacks } from '../../src/rulepack/index.js';

const packs = await loadPacks([]);
const RULE = 'scope.regional-record-as-global';

async function rulesOf(text: string): Promise<string[]> {
  const result = await checkText(text, { path: 'draft.txt', packs });
  return result.flags.filter((f) => f.level === 'error' || f.level === 'warning').map((f) => f.ruleId);
}

describe('a polar record scaled to the globe', () => {
  // Each of these was flagged before the record was read as scaled.
  it.each([
    'Ice cores overstate it: the Antarctic swing is 1.5-2x the global mean.',
    'Polar amplification means Vostok temperature swings of ten degrees correspond to a global change of about six.',
    'The lag is an Antarctic feature and global temperature actually followed CO2.',
  ])('leaves clean: %s', async (sentence) => {
    expect(await rulesOf(sentence)).not.toContain(RULE);
  });
  it.each([
    'Ice-core sites exaggerate the swing: Antarctica moves roughly twice the global mean.',
    'Vostok temperature fell by about 9 °C, which corresponds to a global cooling of roughly 5 °C.',
    'That lag belongs to the Antarctic record; global temperature rose after CO2.',
  ])('leaves clean: %s', async (sentence) => {
    expect(await rulesOf(sentence)).not.toContain(RULE);
  });
});

describe('a polar record read as the globe', () => {
  it.each([
    'The Vostok ice core shows that global temperature swung by about 10 °C.',
    'Vostok shows a swing of 9 °C, so the whole planet cooled by 9 °C.',
    'The Dome C record shows swings of about 10 °C, meaning global temperature changed by 10 °C.',
    // "one" as a pronoun is no figure of the record's
    'The Vostok curve is clear, and from it one may say that the whole planet was some 9 degrees colder.',
  ])('flags %s', async (sentence) => {
    expect(await rulesOf(sentence)).toContain(RULE);
  });
});
