/**
 * Two framings unseen writers used that the reader missed, restated in sentences of our own:
 * - an answer to a choice of agents ("whether the orbit or CO2 ended the ice ages") that names one
 *   and sets the other aside with no verb of its own (src/propositions/answers.ts);
 * - CO2 told as an effect of the warming in the ice ages and a cause only today
 *   (src/checks/reasoning/role-for-today.ts, lexicon `causes.present-time`).
 * The science: the orbit paced the glacial cycles and CO2 amplified and globalised the warming, so
 * neither alone ended them, and the glacial CO2 was both released by the warming and a cause of
 * more: Hays, Imbrie & Shackleton 1976, Science 194, 1121-1132, doi 10.1126/science.194.4270.1121;
 * Shakun et al. 2012, Nature 484, 49-54, doi 10.1038/nature10915; IPCC AR6 WG1 chapter 5 (from memory).
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { checkText } from '../../src/engine.js';
import { compileLexicon, readSentence } from '../../src/propositions/index.js';
import { readCauses } from '../../src/propositions/causes.js';
import { loadPacks, mergePacks } from '../../src/rulepack/index.js';
import type { LoadedPacks, RulePack } from '../../src/rulepack/types.js';

let packs: LoadedPacks;
beforeAll(async () => {
  packs = await loadPacks([]);
});

const serious = async (text: string) =>
  (await checkText(text, { packs, format: 'markdown' })).flags.filter((f) => f.level !== 'note').map((f) => f.ruleId);

describe('an answer to a choice of agents borrows the choice’s predicate', () => {
  it.each([
    "Geologists once argued over whether changes in Earth's orbit or changes in CO2 ended the ice ages. The cores settled it: it was the orbit, not CO2.",
    'Was it the orbit or carbon dioxide that ended the last ice age? The orbit, not the carbon dioxide.',
    'Researchers long asked whether CO2 or the orbit ended the glacial cycles. The answer is CO2 rather than the orbit.',
    'People wonder whether the orbit or the gas brought the glaciations to an end. Our answer: the gas, not the orbit.',
  ])('one side named and the other set aside → logic.single-cause: %s', async (text) => {
    expect(await serious(text)).toContain('logic.single-cause');
  });

  it.each([
    "Geologists once argued over whether changes in Earth's orbit or changes in CO2 ended the ice ages. The cores settled it: the orbit paced it and CO2 amplified it.",
    "Geologists once argued over whether changes in Earth's orbit or changes in CO2 ended the ice ages. The cores settled it: it was both, the orbit and CO2.",
    "Geologists once argued over whether changes in Earth's orbit or changes in CO2 ended the ice ages. Not the orbit alone, the cores say, but the orbit and CO2 together.",
    'Was it the orbit or carbon dioxide that ended the last ice age? Not one or the other: the orbit started it and the gas amplified it.',
    // No choice before: a sentence that only names the gas answers nothing.
    'Geologists once argued over the age of the ice. It was the orbit, not CO2, that they dated first.',
  ])('a shared answer, or no choice, stays clean: %s', async (text) => {
    expect(await serious(text)).not.toContain('logic.single-cause');
  });

  it('reads the answer as one asserted and one denied cause of the same effect', () => {
    const lexicon = compileLexicon(packs);
    const question = readSentence('Scientists asked whether the orbit or CO2 ended the ice ages.', lexicon);
    const answer = readSentence('It was the orbit, not CO2.', lexicon);
    const causes = readCauses(answer, question).map((c) => [c.agent, c.patient, c.polarity]);
    expect(causes).toEqual([
      ['orbit', 'ice-age', 'asserted'],
      ['co2', 'ice-age', 'denied'],
    ]);
  });
});

describe('an effect then, a cause only now', () => {
  it.each([
    'In the ice ages, then, CO2 was the effect of the warming; only today, with fossil fuels, has it become a cause.',
    "Back then the CO2 was a result of the warming; today it's the cause.",
    'During the glacial cycles carbon dioxide was a consequence of the warming. Nowadays it is the driver.',
    'In glacial times the gas was merely a by-product of the warming, and at present it is the cause.',
  ])('→ logic.either-or-causation: %s', async (text) => {
    expect(await serious(text)).toContain('logic.either-or-causation');
  });

  it.each([
    'In the ice ages CO2 was released by the warming and then amplified it; today it is the main cause of warming.',
    'In the ice ages CO2 was both an effect of the warming and a cause of more; today it is the main cause.',
    'In the ice ages the orbit started the warming and CO2 amplified it; today CO2 is the cause.',
    'CO2 rose as an effect of the warming, and today it is still rising.',
    'During the glacial cycles carbon dioxide was a consequence of the warming. Nowadays it is the driver, and back then it amplified the warming too.',
  ])('a part granted in the past, or no cause now, stays clean: %s', async (text) => {
    expect(await serious(text)).not.toContain('logic.either-or-causation');
  });

  it('takes its words for the present from the pack lexicon', async () => {
    const text = 'In the ice ages CO2 was a result of the warming; in the Anthropocene it is the cause.';
    expect(await serious(text)).not.toContain('logic.either-or-causation');
    // A team pack adds a phrase to `causes.present-time`; lexicons join class by class.
    const team: RulePack = {
      id: 'house', version: '1.0.0', asOf: '2026-01-01', file: '/docs/house-rules.yaml',
      sources: [], terms: [], references: [], directions: [], reasoning: [], patterns: [],
      lexicon: { causes: { 'present-time': ['in the Anthropocene'] } },
    };
    const joined = mergePacks([...packs.packs, team]);
    const flags = (await checkText(text, { packs: joined, format: 'markdown' })).flags.map((f) => f.ruleId);
    expect(flags).toContain('logic.either-or-causation');
  });
});

describe('one cause named by counting, and a subject set against a rival in an aside', () => {
  it.each([
    ['The ice cores show that the ice ages were ended by one thing: rising CO2.', 'logic.single-cause'],
    ['The last ice age ended because of one thing, stronger summer sunshine from the orbit.', 'logic.single-cause'],
    ['The glaciations were ended by a single factor: the orbit.', 'logic.single-cause'],
    // "X, not Y, VERB" after an opening clause of its own: the subject is X, Y is denied.
    ['Because CO2 lagged Antarctic warming by centuries, the lag shows that orbital forcing, not CO2, explains the deglacial warming.', 'logic.lag-rules-out-cause'],
    ['Since the gas trailed the warmth, the cores prove that the orbit, rather than CO2, ended the ice ages.', 'logic.lag-rules-out-cause'],
  ])('%s → %s', async (text, ruleId) => {
    expect(await serious(text)).toContain(ruleId);
  });

  it.each([
    'The ice ages were not ended by one thing: the orbit started the warming and CO2 amplified it.',
    'The ice ages ended because of more than one thing: the orbit set them off and CO2 spread the warming.',
    // The rival as a clause of its own, with no comma before its verb, keeps its own subject.
    'Although the gas trailed the warmth in Antarctica, the orbit, not CO2 alone, set the pace, and CO2 amplified the warming.',
  ])('stays clean: %s', async (text) => {
    const flags = await serious(text);
    expect(flags).not.toContain('logic.single-cause');
    expect(flags).not.toContain('logic.lag-rules-out-cause');
  });

  it('keeps a rival that opens its own clause as that clause’s subject', () => {
    const lexicon = compileLexicon(packs);
    const s = readSentence('It is temperature that controls CO2, rather than CO2 controlling temperature.', lexicon);
    const controlling = readCauses(s).find((c) => s.text.slice(c.start, c.end) === 'CO2 controlling');
    expect(controlling).toMatchObject({ agent: 'co2', patient: 'temperature' });
  });
});
