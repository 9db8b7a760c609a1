/**
 * A statement that only ends in a question, as posters write it: a question after the statement
 * ("..., so what's the fuss?"), a trailing tag ("..., right?", "... right??", "..., doesn't it?"),
 * and a statement in statement order with a question mark (a declarative question, English grammar,
 * common practice). The poster puts the statement forward as their own, so its figure keeps its flag.
 * A real question (auxiliary or question word first, "what if", "is it true that") and a tag that the
 * next sentence answers outright ("Not quite.", as a guest answers an interviewer) stay notes; the
 * same wordings with the right figure stay clean. Sentences of our own invention.
 *
 * Sources: the EPICA Dome C record spans about 800,000 years (Jouzel et al. 2007, Science 317,
 * 793-796; Lüthi et al. 2008, Nature 453, 379-382); glacial CO2 minima of about 180-190 ppm in the
 * ice cores (Lüthi et al. 2008, Nature 453, 379-382; Petit et al. 1999, Nature 399, 429-436).
 */
import { describe, expect, it } from 'vitest';
import { checkText } from '../../src/engine.js';
import { loadPacks } from '../../src/rulepack/index.js';

const packs = await loadPacks([]);

async function levelsOf(text: string, ruleId: string): Promise<string[]> {
  const result = await checkText(text, { path: 'thread.txt', packs });
  return result.flags.filter((f) => f.ruleId === ruleId).map((f) => f.level);
}

const SPAN = 'value.edc-record-span';
const GLACIAL = 'value.co2-glacial-minimum-typical';

describe('a statement before a question is the poster\'s own', () => {
  it.each([
    ['The ice cores put glacial CO2 at about 280 ppm, so what\'s all the fuss?', GLACIAL],
    ['Glacial CO2 sat at about 280 ppm in the ice cores, so who cares?', GLACIAL],
    ['Dome C only goes back about 400,000 years, right?', SPAN],
    ['the dome c core only covers like 400,000 years right??', SPAN],
    ['The Dome C record covers about 400,000 years, doesn\'t it?', SPAN],
    ['so the EPICA Dome C record is only about 400,000 years long??', SPAN],
    // Another poster goes on without answering yes or no: the statement stands.
    ['[10:01] Ana: the Dome C record covers about 400,000 years, right?\n[10:02] Ben: the graph on the slide goes further back than that.', SPAN],
  ])('flags: %s', async (text, rule) => {
    expect(await levelsOf(text, rule)).toContain('error');
  });

  it.each([
    ['Does the Dome C record cover only 400,000 years?', SPAN],
    ['What if the Dome C record covered only 400,000 years?', SPAN],
    ['Is it true that Dome C covers only 400,000 years?', SPAN],
    // Answered outright by the next voice: a question put up to be answered.
    ['HOST: The Dome C core goes back 400,000 years, right?\nGUEST: Not quite. Dome C covers about 800,000 years.', SPAN],
  ])('keeps a real question a note: %s', async (text, rule) => {
    const levels = await levelsOf(text, rule);
    expect(levels).toContain('note');
    expect(levels).not.toContain('error');
  });

  it.each([
    ['so the EPICA Dome C record is about 800,000 years long??', SPAN],
    ['Glacial CO2 sat at about 185 ppm in the ice cores, so what\'s all the fuss?', GLACIAL],
    ['Dome C goes back about 800,000 years, right?', SPAN],
  ])('stays clean with the right figure: %s', async (text, rule) => {
    expect(await levelsOf(text, rule)).toEqual([]);
  });
});
