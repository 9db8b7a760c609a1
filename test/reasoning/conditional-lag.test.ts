/**
 * The lag put as a condition, in wordings of our own: "if it comes after, it cannot be the cause",
 * its latecomer a pronoun or a part's name that takes CO2 from the sentence before, or CO2 itself;
 * with the correct look-alikes that must stay clean (a denied start only, a granted amplifier, a
 * condition with no later arrival), a verb of starting before a change word ("started rising"),
 * which tells when a change began and causes nothing, and a question joined after a statement
 * ("..., so which is it?"), which leaves the statement asserted.
 *
 * The science behind the expected flags:
 * - Shakun et al. 2012 (Nature 484, 49-54, doi 10.1038/nature10915): orbital changes started the
 *   deglacial warming, and the CO2 it released amplified it; a lag does not rule CO2 out.
 * - Parrenin et al. 2013 (Science 339, 1060-1063, doi 10.1126/science.1226368): Antarctic
 *   temperature and CO2 rose within a few centuries of each other.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { checkText } from '../../src/engine.js';
import { loadPacks } from '../../src/rulepack/index.js';
import type { LoadedPacks } from '../../src/rulepack/types.js';

let packs: LoadedPacks;
beforeAll(async () => {
  packs = await loadPacks([]);
});

const LAG = 'logic.lag-rules-out-cause';

/** The logic rule ids raised as warnings or errors on each line of the draft, by line. */
const seriousByLine = async (text: string) => {
  const flags = (await checkText(text, { packs, format: 'text' })).flags.filter((f) => f.level !== 'note' && f.ruleId.startsWith('logic.'));
  return flags.map((f) => `${f.span.start.line} ${f.ruleId}`);
};

const PREMISE = 'In the Antarctic cores the carbon dioxide climbed some centuries after the temperature.';

describe('a condition with a later arrival, then a cause denied (wrong by Shakun et al. 2012)', () => {
  it.each([
    'If the effect turns up after, it cannot be the cause.',
    'If it comes afterwards, it is not driving anything.',
    'If it came after the warming it cannot also have been driving it.',
    'Given that it lags, it cannot be what warmed the planet.',
    'If the follower arrives later, it cannot have caused the thaw.',
  ])('after a premise: %s', async (maxim) => {
    expect(await seriousByLine(`${PREMISE}\n${maxim}\n`)).toContain(`2 ${LAG}`);
  });

  it.each([
    'If carbon dioxide really lagged then it cannot have done the warming.',
    'honestly if CO2 lagged then it cannot have done the warming, so maybe we drop the point?',
  ])('naming CO2 as the latecomer: %s', async (sentence) => {
    expect(await seriousByLine(`${sentence}\n`)).toContain(`1 ${LAG}`);
  });

  it('reads the statement before a joined question as asserted', async () => {
    expect(await seriousByLine(`${PREMISE}\nIf it came after the warming it cannot be driving it, so which is it?\n`)).toContain(`2 ${LAG}`);
  });
});

describe('correct look-alikes stay clean', () => {
  it.each([
    // only the start denied: the orbit started the warming
    'If it comes afterwards, it cannot have started the warming, but it amplified it.',
    'If the effect comes after, it can still be a cause.',
    'Even if it came after, it still amplified the warming.',
    // the condition names no later arrival
    'If the ice core data are right, the orbit cannot be the whole story.',
    // a reversed condition: temperature as the latecomer is no lag of CO2
    'If temperature rose after CO2 in the global stack, CO2 cannot be a mere passenger.',
  ])('%s', async (sentence) => {
    expect(await seriousByLine(`${PREMISE}\n${sentence}\n`)).toEqual([]);
  });

  it('a condition with no premise that puts temperature first, and no CO2 named, flags nothing', async () => {
    expect(await seriousByLine('The ice sheets shrank for ten thousand years.\nIf it comes afterwards, it is not driving anything.\n')).toEqual([]);
  });
});

describe('a verb of starting before a change word tells when the change began', () => {
  it.each([
    'The carbon dioxide only started rising two centuries after the Antarctic warming.',
    'Temperature only began to climb once the orbit had shifted.',
  ])('no single cause in: %s', async (sentence) => {
    expect(await seriousByLine(`${sentence}\n`)).toEqual([]);
  });

  it('a start or an end of the ice age itself is still a cause', async () => {
    expect(await seriousByLine('Carbon dioxide alone ended the last ice age.\n')).toContain('1 logic.single-cause');
  });
});
