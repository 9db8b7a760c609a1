/**
 * Reasoning errors told in the wordings people use, restated in sentences of our own, beside
 * correct look-alikes that must stay clean. The structures: a part of mere consequence (a noun
 * restricted after it, "a consequence and nothing more"); a cause noun set aside by "rather than";
 * a conclusion whose premise (the lag) stands in the clause or the sentence before, past a fragment
 * that names nothing; a pseudo-cleft's copula subject ("the gas cannot have been what ended it");
 * "too late ... to have done"; "do" with a deed as its object ("did the rest of the work", "does
 * nothing"); a sufficiency predicate's copula subject; an answer that picks one side of an either/or
 * question; co-variation told as "the same wiggles".
 * The science:
 * - CO2 amplified a warming the orbit started, and global temperature lagged CO2: Shakun et al.
 *   2012, Nature 484, 49-54, doi 10.1038/nature10915.
 * - Antarctic temperature and CO2 rose within a few centuries of each other at the last termination:
 *   Parrenin et al. 2013, Science 339, 1060-1063, doi 10.1126/science.1226368.
 * - CO2 is both a feedback on the warming and a forcing of it over the glacial cycles: IPCC AR6 WG1
 *   chapter 5 (from memory).
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

describe('CO2 told as a mere effect', () => {
  it.each([
    ['Over the glacial cycles the gas was a by-product of the warming, nothing more.', 'logic.either-or-causation'],
    ['In the ice-core era CO2 was a response to the warming rather than a driver of it.', 'logic.either-or-causation'],
    ['Carbon dioxide was a consequence of the deglacial warming and nothing else.', 'logic.either-or-causation'],
    ['The warming pushed the gas around, and the gas had no say over the temperature.', 'logic.either-or-causation'],
    // An effect noun answering the question before it is said of the question's subject.
    ['Was carbon dioxide a driver of the deglacial warming, or a passenger? The cores point to passenger.', 'logic.either-or-causation'],
    ['Is CO2 a cause of the glacial warming or an effect of it? In the ice, it is plainly an effect.', 'logic.either-or-causation'],
  ])('%s → %s', async (text, ruleId) => {
    expect(await serious(text)).toContain(ruleId);
  });

  it.each([
    'CO2 acted as both cause and effect during the deglaciation.',
    'CO2 was a consequence of the warming and then a cause of more of it.',
    'Rather than a mere effect, CO2 was a cause of further warming.',
    'CO2 was a cause of the warming rather than just an effect of it.',
    'Some say the gas was a by-product of the warming and nothing more. It was not: it amplified the warming.',
    'Was CO2 a cause of the deglacial warming, or an effect? It was both: the warming released CO2, and the CO2 added to the warming.',
  ])('stays clean: %s', async (text) => {
    expect((await serious(text)).filter((r) => r.startsWith('logic.'))).toEqual([]);
  });
});

describe('a cause ruled out by a conclusion drawn from the lag before it', () => {
  it.each([
    ['Antarctic temperature turned upward first. So the gas cannot have been what ended the glacial.', 'logic.lag-rules-out-cause'],
    ['Since the warmth came first, carbon dioxide cannot have been what pulled the Earth out of the glaciation.', 'logic.lag-rules-out-cause'],
    ['The cores show the gas climbing after the temperature. Every time. So CO2 cannot be what drives the warming.', 'logic.lag-rules-out-cause'],
    ['Temperature climbed first, so carbon dioxide obviously wasn\'t doing any of the heating.', 'logic.lag-rules-out-cause'],
    ['The warming came first, and the gas turned up far too late in the thaw to have done any of the melting.', 'logic.lag-rules-out-cause'],
    ['Since the warmth came first, how on earth could the gas have caused it?', 'logic.lag-rules-out-cause'],
    ['The gas rose after the warming. That lag settles it: it was a consequence and nothing more.', 'logic.lag-rules-out-cause'],
  ])('%s → %s', async (text, ruleId) => {
    expect(await serious(text)).toContain(ruleId);
  });

  it.each([
    'The lag does not mean CO2 had no role in the warming.',
    'Temperature rose first in Antarctica, but that does not mean the gas did none of the warming.',
    // Only the trigger denied: the orbit started each deglaciation (Shakun et al. 2012).
    'Since the orbit started the warming, CO2 cannot have been what started it.',
    'Myth: "The gas rose after the warming, so it cannot have been what ended the ice age." In fact it amplified the warming the orbit began.',
    'Does the lag mean CO2 cannot have ended the glacial? No: the gas amplified a warming it did not start.',
  ])('stays clean: %s', async (text) => {
    expect((await serious(text)).filter((r) => r.startsWith('logic.'))).toEqual([]);
  });
});

describe('one driver told as enough by itself', () => {
  it.each([
    ['Stronger northern summer sunshine was, on its own, sufficient to end the last ice age.', 'logic.single-cause'],
    ['The orbit wobbles; that is the whole story of the ice ages.', 'logic.single-cause'],
    ['Carbon dioxide alone did the rest of the work of ending the ice age.', 'logic.single-cause'],
    ['The sun drives both curves; CO2 itself does nothing.', 'logic.single-cause'],
    ['The orbit alone explains the ice ages and CO2 is just along for the ride.', 'logic.single-cause'],
  ])('%s → %s', async (text, ruleId) => {
    expect(await serious(text)).toContain(ruleId);
  });

  it.each([
    'The orbit set the timing, but it is not the whole story: CO2 amplified the warming.',
    'On its own, the orbital nudge was too small to end the ice age; CO2 did much of the warming.',
    'The orbit alone was not enough to end the last ice age.',
    'What ended the last ice age? The orbit started it, and CO2 and the ice sheets amplified the warming.',
  ])('stays clean: %s', async (text) => {
    expect((await serious(text)).filter((r) => r.startsWith('logic.'))).toEqual([]);
  });
});

describe('proof claimed from matching curves', () => {
  it.each([
    ['Same wiggles in both records, so that settles it: CO2 runs the climate.', 'logic.correlation-as-proof'],
    ['The two curves have the same shape, which proves CO2 sets the temperature.', 'logic.correlation-as-proof'],
  ])('%s → %s', async (text, ruleId) => {
    expect(await serious(text)).toContain(ruleId);
  });

  it.each([
    'The same wiggles in both curves do not prove that CO2 drives the warming.',
    'The two curves have the same shape because each amplifies the other.',
  ])('stays clean: %s', async (text) => {
    expect((await serious(text)).filter((r) => r.startsWith('logic.'))).toEqual([]);
  });
});
