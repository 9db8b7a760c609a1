/**
 * A co-variation called proof with nothing said to be proved ("the correlation itself is the proof",
 * "that's all the proof anyone needs"): in a passage about CO2 it proves the causal claim the passage
 * is about, and is correlation presented as proof (src/propositions/evidence.ts proofWithoutObject).
 * The science: two curves that co-vary do not by themselves show which drives which; the case that
 * CO2 amplified the glacial terminations rests on radiative physics and on the phasing of global
 * temperature after CO2 (Shakun et al. 2012, Nature 484, 49-54, doi 10.1038/nature10915; that a
 * correlation is no proof of a cause is common practice in statistics).
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { checkText } from '../../src/engine.js';
import { loadPacks } from '../../src/rulepack/index.js';
import type { LoadedPacks } from '../../src/rulepack/types.js';

let packs: LoadedPacks;
beforeAll(async () => {
  packs = await loadPacks([]);
});

const serious = async (text: string) =>
  (await checkText(text, { packs, format: 'markdown' })).flags.filter((f) => f.level !== 'note').map((f) => f.ruleId);

describe('a co-variation called proof of nothing named', () => {
  it.each([
    'CO2 and Antarctic temperature climb and fall as one through the Dome C record, and for me the close match is proof enough.',
    'Look at the carbon dioxide curve beside the temperature curve: they move together for eight cycles, and that is the smoking gun.',
    'The CO2 and temperature lines mirror each other in every core, which is all the proof a sensible reader should need.',
    // The sentence names no subject; the passage before it is about CO2.
    'Carbon dioxide and Antarctic warmth rose and fell together for 800,000 years. When two curves shadow each other that long, the match is the proof.',
  ])('%s', async (text) => {
    expect(await serious(text)).toContain('logic.correlation-as-proof');
  });

  it.each([
    'CO2 and Antarctic temperature climb and fall as one through the Dome C record, but the close match on its own is no proof.',
    'CO2 and temperature move together in the cores; is that match proof? Not by itself.',
    'The CO2 and temperature curves track each other closely, and the match is proof that the two records were dated with care.',
    'The two curves track each other closely. The physics of how CO2 absorbs infrared light, not the match, is the real proof.',
  ])('stays clean: %s', async (text) => {
    expect((await serious(text)).filter((r) => r === 'logic.correlation-as-proof')).toEqual([]);
  });
});
