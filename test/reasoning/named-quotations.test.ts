/**
 * Claims the draft names or sets out to be judged, not asserts, as people write them in public: a
 * quotation named as a saying ('His "CO2 follows" line', '"..." is the oldest one in the book',
 * '"...," goes the argument', 'The refrain I hear is "..."'), a true-or-false item of a quiz, an
 * indirect question ("asked whether ..."), a question introduced by its name before a colon, and
 * a report by someone of the writer's circle named with a compound noun. Each gives a note, not a
 * warning; the same claim asserted in the writer's voice is still flagged. Sentences of our own.
 *
 * The science the checks hold (Shakun et al. 2012, Nature 484, doi:10.1038/nature10915: CO2 as an
 * amplifying feedback, global temperature mostly after CO2; Weiss 1974, Marine Chemistry 2,
 * doi:10.1016/0304-4203(74)90015-2: CO2 solubility falls as water warms).
 */
import { describe, expect, it } from 'vitest';
import { checkText } from '../../src/index.js';

const levels = async (text: string, rule: string) => (await checkText(text)).flags.filter((f) => f.ruleId === rule).map((f) => f.level);

describe('a quotation the sentence names is the quoted speaker\'s claim', () => {
  it.each([
    ['"The gas came after the warmth, so it cannot have caused any of it," goes the argument on every comment thread.'],
    ['The refrain my uncle repeats is "CO2 trailed the warming by centuries, so it can\'t have caused anything."'],
    ['7/ "CO2 trailed the warming, so it can\'t be a cause" is a favourite of the comment section. It is wrong.'],
    ['@ferngully "CO2 trailed the warming, so it can\'t be a cause" keeps coming up, but the lag says nothing of the sort.'],
    ['The old "CO2 trailed the warming, so it can\'t be a cause" line turns up in every comment thread under every story about the ice.'],
  ])('%s', async (text) => {
    expect(await levels(text, 'logic.lag-rules-out-cause')).toEqual(['note']);
  });

  it.each([
    // The same claim in the writer's own voice, and in scare quotes the writer asserts.
    ['CO2 trailed the warming by centuries, so it can\'t have caused anything.'],
    ['The gas came after the warmth, so it "cannot have caused" any of it.'],
  ])('still flags %s', async (text) => {
    expect(await levels(text, 'logic.lag-rules-out-cause')).toEqual(['warning']);
  });
});

describe('a claim set out to be judged', () => {
  it('a true-or-false item of a worksheet is asked; the statement alone is flagged', async () => {
    expect(await levels('c) Cold seawater dissolves less CO2 than warm seawater. True or false?', 'direction.co2-solubility-falls-with-warming')).toEqual(['note']);
    expect(await levels('4. Warmer oceans can store more dissolved CO2 than colder ones. (T/F)', 'direction.co2-solubility-falls-with-warming')).toEqual(['note']);
    expect(await levels('Warmer oceans can store more dissolved CO2 than colder ones.', 'direction.co2-solubility-falls-with-warming')).toEqual(['warning']);
  });

  it('an indirect question ("wondered whether ...") asks; the claim asserted is flagged', async () => {
    const rule = 'logic.lag-rules-out-cause';
    expect(await levels('A listener wondered whether the lag of CO2 behind temperature means the gas cannot have warmed the planet.', rule)).not.toContain('warning');
    expect(await levels('The lag of CO2 behind temperature means the gas cannot have warmed the planet.', rule)).toEqual(['warning']);
  });

  it('a question between two alternatives that the sentence answers stays the either/or error', async () => {
    const text = 'Visitors to the gallery wonder whether CO2 drives temperature or temperature drives CO2, and the cores answer it: temperature drives CO2, never the reverse.';
    expect(await levels(text, 'logic.either-or-causation')).toEqual(['warning']);
  });

  it('a report by someone of the writer\'s circle named with a compound noun and a name is reported', async () => {
    const rule = 'logic.single-cause';
    expect(await levels('My sister-in-law Petra insists the orbit alone ended the last ice age.', rule)).toEqual(['note']);
    expect(await levels('The orbit alone ended the last ice age.', rule)).toEqual(['warning']);
  });
});
