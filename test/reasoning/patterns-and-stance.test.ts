/**
 * A team's pattern rules (compromise match syntax or regular expressions) and the guard that keeps
 * a slow pattern from hanging a run; and the stance of a claim in its paragraph.
 */
import { describe, expect, it } from 'vitest';
import { compileLexicon, isOwnClaim, readSentence, stanceOf, type StanceContext } from '../../src/propositions/index.js';
import { checkReasoning } from '../../src/checks/reasoning/index.js';
import { withTimeLimit } from '../../src/checks/reasoning/time-limit.js';
import { FirnlineError } from '../../src/errors.js';
import { loadPacks, mergePacks } from '../../src/rulepack/index.js';
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

// The stance of a sentence (src/propositions/stance.ts): DESIGN.md, "Stance decides: a myth that is
// reported, quoted, labelled as a myth or answered is not an error; one that the draft asserts is.
// A rhetorical question asserts its answer." Sentences of our own.
describe('stanceOf', () => {
  const read = async (paragraph: string[], index: number, context: StanceContext = {}) => {
    const lexicon = compileLexicon(await loadPacks([]));
    const next = paragraph[index + 1];
    return stanceOf(readSentence(paragraph[index] as string, lexicon), { ...context, ...(next === undefined ? {} : { next: readSentence(next, lexicon) }) });
  };
  it.each([
    [['Temperature drives CO2, not the other way round.'], 0, {}, 'asserted'],
    [['Critics say temperature drives CO2, not the other way round.'], 0, {}, 'reported'],
    [['Mr Okafor writes that CO2 always trailed the warming.'], 0, {}, 'reported'],
    [['Researchers write that CO2 rose within a few centuries of Antarctic temperature.'], 0, {}, 'asserted'],
    [["'CO2 lagged, so it cannot be a cause,' one caller told us."], 0, {}, 'quoted'],
    [['Myth: CO2 lags temperature, so it cannot be the cause.'], 0, {}, 'myth'],
    [['Fact: CO2 amplified a warming that orbital changes began.'], 0, {}, 'asserted'],
    [['It is a myth that the lag rules CO2 out as a cause.'], 0, {}, 'myth'],
    [['CO2 lags, so it cannot be the cause.'], 0, { heading: 'The myth' }, 'myth'],
    [['CO2 lags, so it cannot be the cause.'], 0, { heading: 'Myths we hear' }, 'myth'],
    // "Claims" alone names what a section discusses, the writer's own answers included (show notes'
    // "Claims we discussed", a review's "Claims checked"): the heading marks no sentence as a myth.
    [['CO2 lags, so it cannot be the cause.'], 0, { heading: 'Claims we discussed' }, 'asserted'],
    [['CO2 lags, so it cannot be the cause.'], 0, { heading: 'The claim' }, 'myth'],
    [['CO2 lags, so it cannot be the cause.'], 0, { blockKind: 'blockquote' as const }, 'quoted'],
    [['CO2 lags, so it cannot be the cause.'], 0, { marked: true }, 'marked'],
    [['If CO2 trails temperature, how could it be the cause?'], 0, {}, 'rhetorical'],
    [["Doesn't the lag show CO2 is not a cause?", 'No: it shows that CO2 did not start the warming.'], 0, {}, 'asked'],
    [['Does the lag show CO2 is not a cause?'], 0, {}, 'asked'],
    [['Early studies suggested a lag of about 800 years for the last deglaciation.'], 0, {}, 'superseded'],
    [['If warm water held more CO2, the oceans would have absorbed the deglacial rise.'], 0, {}, 'hypothetical'],
  ] as const)('%j, sentence %i, %j', async (paragraph, index, context, expected) => {
    expect((await read([...paragraph], index, context)).kind).toBe(expected);
  });

  it("keeps a reported claim the draft endorses as the draft's own", async () => {
    const stance = await read(['Critics say the lag rules CO2 out, and they are right.'], 0);
    expect([stance.kind, stance.endorsed, isOwnClaim(stance)]).toEqual(['reported', true, true]);
  });
});
