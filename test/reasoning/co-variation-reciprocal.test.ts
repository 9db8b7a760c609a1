/**
 * "tracked each other", "mirror one another": a reciprocal object after a co-variation word says the
 * two curves went together, not that each drove the other, so it answers no either/or frame in the
 * sentence beside it; a feedback stated in words still does. Wordings of our own.
 *
 * The science: warming released CO2 and the CO2 amplified the warming, a feedback running both
 * ways (Shakun et al. 2012, Nature 484, 49-54, doi 10.1038/nature10915); so framing the two as
 * alternatives is the either/or error, and naming the loop answers it.
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
const rules = async (text: string) =>
  (await checkText(text, { packs, format: 'markdown' })).flags.filter((f) => f.level !== 'note').map((f) => f.ruleId);

describe('a co-variation with a reciprocal object is no feedback', () => {
  it.each([
    'Did the orbit or carbon dioxide drive the ice ages? It must be one or the other. The two curves tracked each other for 800,000 years.',
    'Did the orbit or carbon dioxide drive the ice ages? It must be one or the other. Temperature and CO2 mirror one another in the cores.',
  ])('keeps the frame flagged: %s', async (text) => {
    expect(await rules(`${text}\n`)).toContain(EITHER);
  });

  it('a feedback in words still answers the frame', async () => {
    expect(await rules('Did the orbit or carbon dioxide drive the ice ages? It must be one or the other. In fact warming and CO2 fed each other.\n')).not.toContain(EITHER);
  });
});
