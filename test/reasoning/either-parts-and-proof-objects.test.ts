/**
 * Two structures of issue 9, in wordings of our own:
 * - a choice of parts that "either" sets up as exhaustive and the writer says rather than asks ("it's
 *   either a cause or a consequence"): the either/or framing whether or not a side is picked; a frame
 *   in words whose cause stands before a question that names the gas;
 * - a co-variation said to prove the causal relation named as a noun ("proves the connection", "proof
 *   of how sensitive ..."), or measured by its statistic ("an r² of 0.8").
 *
 * The science: CO2 is both a response to the orbitally started warming and an amplifier of it (a
 * feedback: Shakun et al. 2012, Nature 484, 49-54, doi 10.1038/nature10915); the glacial co-variation
 * of CO2 and Antarctic temperature does not by itself show cause or measure sensitivity (IPCC AR6 WG1
 * chapter 5 and chapter 7, from memory), so offering it as proof is the correlation error.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { checkText } from '../../src/engine.js';
import { loadPacks } from '../../src/rulepack/index.js';
import type { LoadedPacks } from '../../src/rulepack/types.js';

let packs: LoadedPacks;
beforeAll(async () => {
  packs = await loadPacks([]);
});

const EITHER = 'logic.either-or-causation';
const PROOF = 'logic.correlation-as-proof';
const rules = async (text: string) =>
  (await checkText(`${text}\n`, { packs, format: 'markdown' })).flags.filter((f) => f.level !== 'note').map((f) => f.ruleId);

describe('a choice of parts set up by "either" and said', () => {
  it.each([
    'Carbon dioxide is either a driver of the climate or a consequence of it, so make up your mind.',
    'The graph in the museum showed the gas rising late. It is either the trigger or the response, you cannot have it both ways.',
    'The greenhouse gas was either the main cause or a mere echo of the thaw.',
    // The gas named only in the same voice's next sentence.
    'Honestly it is either the driver or the follower. And CO2 arrived late in every core I have seen.',
  ])('flags: %s', async (text) => {
    expect(await rules(text)).toContain(EITHER);
  });

  it.each([
    // Asked, denied, granted both, or reported and set aside.
    'Is CO2 either a cause or an effect of the warming?',
    'CO2 is not either a cause or an effect alone; it is both at different stages.',
    'CO2 is either a cause or an effect of the warming in most textbooks, and in truth it is both.',
    // No choice of parts: "either" over two records.
    'Either the Vostok or the Dome C core would show CO2 near 280 ppm in the warm spells.',
  ])('leaves alone: %s', async (text) => {
    expect(await rules(text)).not.toContain(EITHER);
  });

  it('reads the cause before a question that names the gas', async () => {
    const text = 'The orbit set off the thaw, the panel admits. So which is it then, the orbit or the carbon dioxide? It can not be both.';
    expect(await rules(text)).toContain(EITHER);
  });

  it('reads "one thing or the other" as the frame in words', async () => {
    expect(await rules('CO2 warmed the planet or the planet released CO2; it must be one thing or the other.')).toContain(EITHER);
  });
});

describe('a co-variation said to prove the causal relation named as a noun', () => {
  it.each([
    'The close fit between carbon dioxide and temperature across eight cycles proves the connection beyond argument.',
    'That CO2 and Antarctic temperature track each other is, on its own, proof of how sensitive the climate is to the gas.',
    'The r² between CO2 and the deuterium curve is about 0.8, which settles that CO2 is the control knob.',
    'A correlation coefficient that high between CO2 and temperature establishes the causal link.',
  ])('flags: %s', async (text) => {
    expect(await rules(text)).toContain(PROOF);
  });

  it.each([
    // The proof has another subject, or is denied, or is an adverb of certainty.
    'CO2 and temperature track each other closely, and the physics of absorption establishes the link.',
    'CO2 and temperature match closely, but the match alone does not prove the link.',
    'The two curves clearly match, and the link has been known from laboratory physics since the 1850s.',
  ])('leaves alone: %s', async (text) => {
    expect(await rules(text)).not.toContain(PROOF);
  });
});
