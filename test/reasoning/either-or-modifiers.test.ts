/**
 * An "or" between two participles that modify a noun ("CO2 and spreading or shrinking ice") joins
 * the noun's modifiers, not two directions of cause, so it frames no either/or choice; an "or"
 * between two clauses that each name a direction still does. Wordings of our own.
 *
 * The science: the orbit sets the timing of the glacial cycles and CO2 and the ice sheets amplify
 * and spread the change (Hays et al. 1976, Science 194, 1121-1132, doi 10.1126/science.194.4270.1121;
 * Shakun et al. 2012, Nature 484, 49-54, doi 10.1038/nature10915), a correct statement; setting
 * "CO2 drove the warming" against "the warming drove CO2" as alternatives is the either/or error.
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
  (await checkText(`${text}\n`, { packs, format: 'markdown' })).flags.filter((f) => f.level !== 'note').map((f) => f.ruleId);

describe('an "or" between two modifiers of a noun frames no choice of causes', () => {
  it.each([
    'Shifts in the orbit set the pace; carbon dioxide and growing or shrinking ice sheets then magnified the change across the planet.',
    'The orbit starts it; CO2 and advancing or retreating ice then amplify it around the world.',
    'Sunlight changes come first, and carbon dioxide with melting or spreading ice amplifies them everywhere.',
  ])('stays clean: %s', async (text) => {
    expect(await rules(text)).not.toContain(EITHER);
  });

  it.each([
    'Either rising CO2 drove the warming or rising temperatures drove CO2.',
    'Either the ocean warmed and released CO2, or CO2 warmed the ocean.',
  ])('two directions joined by "or" are still flagged: %s', async (text) => {
    expect(await rules(text)).toContain(EITHER);
  });
});
