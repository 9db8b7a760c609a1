/**
 * Correlation presented as proof, told the other way round: the cause first, then a word that
 * gives its ground (pack lexicon `proof.reasons`: "because", "since", ...) and the co-variation as
 * that ground. A ground that is physics, a co-variation in another clause, an explanation of the
 * co-variation, or a sentence that itself denies the proof stays clean.
 *
 * The science: co-variation of CO2 and temperature in the ice cores does not by itself show which
 * drives which; the case for CO2's warming rests on radiative physics and on timing across many
 * records (IPCC AR6 WG1, ch. 5 and 7; Shakun, J. D. et al. 2012, Nature 484, 49-54). That a
 * correlation is no proof of a cause is common practice in statistics.
 */
import { describe, expect, it } from 'vitest';
import { checkReasoning } from '../../src/checks/reasoning/index.js';
import { loadPacks } from '../../src/rulepack/index.js';

const packs = await loadPacks([]);
const PROOF = 'logic.correlation-as-proof';
const ids = (sentence: string): string[] => checkReasoning([sentence], 0, packs).map((f) => f.ruleId);

describe('a cause given a co-variation as its ground', () => {
  it.each([
    'We know carbon dioxide warms the planet because the two lines in the ice go up and down together.',
    'CO2 must drive the temperature, because the two curves in the Vostok core rise and fall together.',
    'CO2 helped end the ice ages, since the two curves track each other closely.',
  ])('flags: %s', (sentence) => {
    expect(ids(sentence)).toContain(PROOF);
  });

  it.each([
    'CO2 warms the planet because it traps heat, and the two curves in the ice rise and fall together.',
    'CO2 and temperature rise and fall together because CO2 amplifies the warming.',
    'CO2 helped end the ice ages, since the two curves track each other closely, though a match alone proves nothing.',
  ])('stays clean: %s', (sentence) => {
    expect(ids(sentence)).not.toContain(PROOF);
  });
});
