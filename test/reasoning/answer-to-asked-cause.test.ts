/**
 * An answer to a question that asks for the agent (session 16): "What brought the last glaciation to
 * an end? The orbit, all by itself." names one thing and restricts it, so the answer borrows the
 * question's predicate and names that thing the one cause (src/propositions/answers.ts). An answer
 * naming two things, or one without a restriction, or a question that asks for something other than
 * the agent, names no one cause. Sentences of our own.
 *
 * The science behind the expected flags: the orbital cycles paced the ice ages and started each
 * deglaciation (Hays, Imbrie & Shackleton 1976, Science 194, 1121-1132); CO2 amplified the warming
 * and spread it over the globe (Shakun et al. 2012, Nature 484, 49-54), so neither ended an ice age
 * alone.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { checkReasoning } from '../../src/checks/reasoning/index.js';
import { loadPacks } from '../../src/rulepack/index.js';
import type { LoadedPacks } from '../../src/rulepack/types.js';

let packs: LoadedPacks;
beforeAll(async () => {
  packs = await loadPacks([]);
});

/** The rule ids raised as warnings or errors on the last sentence of the paragraph. */
function serious(paragraph: string[]): string[] {
  return checkReasoning(paragraph, paragraph.length - 1, packs)
    .filter((f) => f.level !== 'note')
    .map((f) => f.ruleId);
}

describe('an answer to a question asking what caused it', () => {
  it.each([
    ['What brought the last glaciation to an end?', 'The orbit, all by itself.'],
    ['What ended the ice ages?', 'Carbon dioxide alone, every single time.'],
    ['Which thing ended the last ice age?', 'Rising CO2 and nothing else.'],
  ])('flags the one cause: %s %s', (question, answer) => {
    expect(serious([question, answer])).toContain('logic.single-cause');
  });

  it.each([
    // two things named: the answer gives both a part
    ['What ended the last ice age?', 'The orbit, with rising CO2 amplifying it.'],
    // one thing, no restriction
    ['What ended the last ice age?', 'Mostly the orbit, at first.'],
    // the question asks when, not what
    ['When did the last ice age end?', 'Around 11,700 years ago, on its own terms.'],
  ])('names no one cause: %s %s', (question, answer) => {
    expect(serious([question, answer])).not.toContain('logic.single-cause');
  });
});
