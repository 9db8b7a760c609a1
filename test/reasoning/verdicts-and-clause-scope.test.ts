/**
 * Round 20, logic and stance: the structures behind misses in letters the engine had not seen.
 * - A verdict about evidence: a proof of a cause with its co-variation set beside it after a comma or
 *   a colon; more proof denied ("won't need any more proof than that"), which says the proof at hand
 *   is enough; a proof with no object whose passage named CO2 some sentences back.
 * - A negative question opened after a joining word ("..., so doesn't that prove ...?"): nobody
 *   answers it, so it asserts what it asks, and its "not" denies nothing.
 * - A denial's scope: "it didn't drive anything, the orbit did all the work" denies the first clause
 *   only; the clause spliced on by a comma has a subject of its own.
 * - "did all of it", "did essentially all the work": a form of "do" with a pronoun after a
 *   quantifier's "of", or an adverb of degree before its object, is a causal verb phrase.
 * The science: two curves that co-vary do not by themselves show which drives which, and the glacial
 * terminations were paced by the orbit and amplified by CO2 (Shakun et al. 2012, Nature 484, 49-54,
 * doi 10.1038/nature10915; that a correlation is no proof of a cause is common practice in statistics).
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

describe('a verdict about evidence', () => {
  it.each([
    // The proof first, its co-variation set beside it after a comma or a colon.
    'Honestly the Vostok record proves carbon dioxide sets the temperature, the two traces rise and fall together.',
    'Put simply, this chart proves that CO2 drives the climate: both curves rise and fall in step.',
    // More proof denied: the proof at hand is called enough.
    'CO2 and temperature in the Dome C core rise and fall together for eight cycles; nobody needs any further proof than that.',
    // A negative question after a joining word asserts its answer.
    'The two lines go up and down together for hundreds of millennia, so doesn\'t that prove carbon dioxide runs the climate?',
  ])('%s', async (text) => {
    expect(await serious(text)).toContain('logic.correlation-as-proof');
  });

  it('reads a proof with no object in a passage that named CO2 several sentences back', async () => {
    const text = [
      'Carbon dioxide sat near 190 ppm at the glacial peak.',
      'The ice sheets then reached far south.',
      'Sea level was much lower.',
      'Winters were long.',
      'Forests shrank to refuges.',
      'The two lines on the poster shadow each other so closely, that is all the proof anyone could want.',
    ].join(' ');
    expect(await serious(text)).toContain('logic.correlation-as-proof');
  });

  it.each([
    // A proof joined by "and": no ground given.
    'The Vostok record proves the air is younger than the ice, and the two CO2 traces from different cores line up well.',
    // More proof asked for is no verdict.
    'CO2 and temperature rise and fall together in the core, but we need more proof than that before saying which drives which.',
    // A certainty word, not a verb of proving.
    'CO2 must have amplified the warming, the curves move together so closely.',
    // A negative question answered at once.
    'The curves go up and down together, so doesn\'t that prove CO2 runs the climate? No: a match alone cannot tell which drives which.',
  ])('stays clean: %s', async (text) => {
    expect((await serious(text)).filter((r) => r === 'logic.correlation-as-proof')).toEqual([]);
  });
});

describe('a denial does not reach into a clause spliced on with its own subject', () => {
  it.each([
    'For what it is worth, carbon dioxide did not push anything, the orbital cycles did all the work.',
    'In my view the wobbles of the orbit did essentially all the work on their own.',
    'It was the sun all along. Milankovitch cycles did all of it; carbon dioxide had no part in it.',
  ])('%s', async (text) => {
    expect(await serious(text)).toContain('logic.single-cause');
  });

  it.each([
    // The denial stays in its own clause when the second has no subject of its own.
    'Carbon dioxide did not, by any measure, start the warming; the orbit set the timing and CO2 amplified it.',
    // A partial deed keeps the other factor's part.
    'The orbit set the pace, and CO2 did most of it by amplifying the warming.',
    'The orbit did not end the ice age on its own, the CO2 feedback did much of the warming.',
  ])('stays clean: %s', async (text) => {
    expect((await serious(text)).filter((r) => r === 'logic.single-cause')).toEqual([]);
  });
});

describe('a negative question after a joining word, and one set out to be answered', () => {
  it('asserts what a negative question after "but" asks', async () => {
    expect(await serious("I could be wrong, but doesn't carbon dioxide arriving after the warmth show it was an effect and not a cause?")).toContain('logic.lag-rules-out-cause');
  });

  it('leaves a question that a saying\'s name introduces after a speaker\'s label to be answered', async () => {
    const text = "**HOST:** Right, the question listeners always send: doesn't CO2 trail the Antarctic warming, so it can't be a cause?";
    expect(await serious(text)).toEqual([]);
  });
});
