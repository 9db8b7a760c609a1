/**
 * The either/or framing told as a choice of CO2's part: a cause noun and an effect noun joined by
 * "or" ("a driver or a passenger", "the cause or the effect"), answered by picking one part, in the
 * same sentence past the choice or in the sentence after it (src/checks/reasoning/role-choice.ts);
 * a question reported before its answer ("People ask whether ..., and the cores answer: ...") leaves
 * the answer the writer's own (src/propositions/stance.ts); an answer under a question that offers
 * a choice is read whatever its length (engine.ts answersQuestion).
 * The science:
 * - CO2 was both a response to the first (orbitally paced) warming and an amplifier of it, and
 *   global temperature lagged CO2: Shakun et al. 2012, Nature 484, 49-54, doi 10.1038/nature10915.
 * - Antarctic temperature and CO2 rose within a few centuries of each other at the last
 *   termination: Parrenin et al. 2013, Science 339, 1060-1063, doi 10.1126/science.1226368.
 * - CO2 acts as a feedback and a forcing over the glacial cycles: IPCC AR6 WG1 chapter 5 (from memory).
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { checkText } from '../../src/engine.js';
import { loadPacks } from '../../src/rulepack/index.js';
import type { LoadedPacks } from '../../src/rulepack/types.js';

let packs: LoadedPacks;
beforeAll(async () => {
  packs = await loadPacks([]);
});

const logic = async (text: string) =>
  (await checkText(text, { packs, format: 'markdown' })).flags.filter((f) => f.level !== 'note' && f.ruleId.startsWith('logic.')).map((f) => f.ruleId);

describe('a choice of parts answered by picking one', () => {
  it.each([
    // In one sentence, past the choice.
    'Our reviewers debated whether carbon dioxide was a driver of the glacial terminations or a mere by-product, and settled on by-product.',
    'Students are asked whether the gas was a cause or a consequence of the deglacial warming, and the key says it was a consequence.',
    'Listeners keep asking me whether CO2 was the cause or the effect of the warming, and the ice gives a plain reply: the cause.',
    // In the sentence after the choice, one part only, however long the answer.
    'So, was CO2 the trigger of the last deglaciation or only a follower of it? Everything in the Antarctic record we have seen so far points to follower.',
    'Was carbon dioxide a cause or an effect of the ice-age warming? The honest reading of the evidence is that it was an effect.',
  ])('%s', async (text) => {
    expect(await logic(text)).toContain('logic.either-or-causation');
  });

  it.each([
    'Readers often ask whether CO2 was a cause or an effect of the deglacial warming, and the answer is that it was both.',
    'Was CO2 a driver of the warming, or merely a passenger? It was no passenger: released by the warming ocean, it amplified the change.',
    'Is carbon dioxide a cause or a consequence of the glacial cycles? The cores show it acted as both, a feedback on the orbital nudge.',
    'Readers ask whether CO2 is a cause or an effect. Shakun and colleagues found it was a consequence of the first warming and a cause of most of what followed.',
    'Scientists asked whether CO2 was a cause or an effect of the warming, and the cores show the two rose within a few centuries of each other.',
  ])('stays clean: %s', async (text) => {
    expect(await logic(text)).toEqual([]);
  });

  it('keeps a reported question itself a report, and only its answer the writer’s', async () => {
    const flags = (await checkText('People ask me whether CO2 was the cause or the effect, and the record answers it plainly: it was the effect.', { packs, format: 'markdown' })).flags;
    const flag = flags.find((f) => f.ruleId === 'logic.either-or-causation');
    expect(flag?.level).toBe('warning');
    expect(flag?.span.start.column).toBeGreaterThan('People ask me whether CO2 was the cause or the effect'.length);
  });
});
