/**
 * A team's pattern rules (compromise match syntax or regular expressions) and the guard that keeps
 * a slow pattern from hanging a run; and the stance of a claim in its paragraph.
 */
import { describe, expect, it } from 'vitest';
import { tokenizeSentence } from '../../src/claims/frames-tokens.js';
import { stanceOf } from '../../src/claims/stance.js';
import { checkReasoning } from '../../src/checks/reasoning/index.js';
import { withTimeLimit } from '../../src/checks/reasoning/time-limit.js';
import { FirnlineError } from '../../src/errors.js';
import { mergePacks } from '../../src/rulepack/index.js';
import type { PatternRule, RulePack } from '../../src/rulepack/types.js';

function teamPack(patterns: PatternRule[]): ReturnType<typeof mergePacks> {
  const pack: RulePack = {
    id: 'house', version: '1.0.0', asOf: '2026-01-01', file: '/docs/house-rules.yaml',
    sources: [], terms: [], references: [], directions: [], reasoning: [], patterns, lexicon: {},
  };
  return mergePacks([pack]);
}

const rule = (extra: Partial<PatternRule>): PatternRule => ({ id: 'house.rule', level: 'warning', reason: 'House style.', sources: [], ...extra });

describe('pattern rules', () => {
  it.each([
    ['regex', rule({ id: 'house.no-ppmv', regex: '\\bppmv\\b' }), 'CO2 stood at 280 ppmv before 1750.', [['house.no-ppmv', 17, 21]]],
    ['compromise match', rule({ id: 'house.co2-trailed', match: 'carbon dioxide (lagged|trailed)' }), 'Carbon dioxide trailed the warming.', [['house.co2-trailed', 0, 22]]],
    ['no match', rule({ id: 'house.no-ppmv', regex: '\\bppmv\\b' }), 'CO2 stood at 280 ppm.', []],
  ])('%s', (_name, pattern, sentence, expected) => {
    const flags = checkReasoning([sentence], 0, teamPack([pattern]));
    expect(flags.map((f) => [f.ruleId, f.start, f.end])).toEqual(expected);
  });

  it('refuses a nested quantifier before running it', () => {
    const run = () => checkReasoning(['aaaa'], 0, teamPack([rule({ regex: '(a+)+b' })]));
    expect(run).toThrow(FirnlineError);
    expect(run).toThrow(/pattern house\.rule: regular expression repeats a repeated group/u);
  });

  it('stops a slow pattern that the static check lets through, and names it', () => {
    // `(?:a|aa)*c` has no nested quantifier but backtracks exponentially on a run of a's (common practice).
    const sentence = `${'a'.repeat(60)}b`;
    const started = Date.now();
    expect(() => checkReasoning([sentence], 0, teamPack([rule({ regex: '(?:a|aa)*c' })]))).toThrow(/pattern house\.rule: ran longer than 100 ms/u);
    expect(Date.now() - started).toBeLessThan(2000);
  });

  it('gives no sentence over 2,000 characters to pattern rules', () => {
    const long = `${'word '.repeat(420)}ppmv.`;
    expect(checkReasoning([long], 0, teamPack([rule({ regex: '\\bppmv\\b' })]))).toEqual([]);
  });

  it('withTimeLimit returns the value when the task finishes in time', () => {
    expect(withTimeLimit(() => 6 * 7)).toEqual({ done: true, value: 42 });
  });
});

describe('stanceOf', () => {
  const cue = (s: string, words: string) => ({ start: s.indexOf(words), end: s.indexOf(words) + words.length });
  // [paragraph, index of the claim, its cue words, expected stance]
  it.each([
    [['Temperature drives CO2, not the other way round.'], 0, 'not the other', { stance: 'asserted', answered: false }],
    [['Critics say temperature drives CO2, not the other way round.'], 0, 'not the other', { stance: 'reported', marker: 'critics say', answered: false }],
    [['Critics say temperature drives CO2, not the other way round.', 'In fact each drives the other.'], 0, 'not the other', { stance: 'reported', marker: 'critics say', answered: true }],
    [["'CO2 lagged, so it cannot be a cause' confuses the trigger with the feedback."], 0, 'cannot be', { stance: 'reported', marker: 'quotation', answered: true }],
    [['Visitors ask about this.', "'CO2 lagged, so it cannot be the cause.'"], 1, 'cannot be', { stance: 'reported', marker: 'quotation', answered: false }],
  ] as const)('%j, sentence %i', (paragraph, index, words, expected) => {
    const sentence = paragraph[index] as string;
    const stance = stanceOf(paragraph, index, tokenizeSentence(sentence, ['but']), cue(sentence, words));
    expect(stance).toEqual(expected);
  });
});
