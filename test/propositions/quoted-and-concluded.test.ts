/**
 * Who holds a lag argument: a quotation named as the subject of a sentence ('"..." is a myth') is
 * mentioned, not asserted; "Some visitors conclude that ..." and "Mr X's central point is that ..."
 * report someone else's view; "we conclude that ..." and an assessment's conclusion stay the draft's.
 * The science: CO2 and Antarctic temperature rose within a few centuries of each other at the last
 * deglaciation, and CO2 amplified the orbitally paced warming (Parrenin et al. 2013, Science 339,
 * 1060-1063, doi 10.1126/science.1226368; Shakun et al. 2012, Nature 484, 49-54, doi
 * 10.1038/nature10915): a lag does not rule CO2 out as a cause.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { checkText } from '../../src/engine.js';
import { loadPacks } from '../../src/rulepack/index.js';
import type { LoadedPacks } from '../../src/rulepack/types.js';

let packs: LoadedPacks;
beforeAll(async () => {
  packs = await loadPacks([]);
});

const TOPIC = 'The Antarctic ice cores hold the CO2 record.\n\n';
const levels = async (text: string) =>
  (await checkText(TOPIC + text, { packs, format: 'markdown' })).flags.filter((f) => f.ruleId === 'logic.lag-rules-out-cause').map((f) => f.level);

describe('a lag argument someone else holds', () => {
  it.each([
    '"CO2 lagged so it cannot have warmed anything" is the oldest one in the book.',
    '"Since CO2 came after the warming, it cannot have caused it" remains a favourite of our letters page.',
    "Mr Hallam's central point is that CO2 rose only after the Antarctic warming, and so could not have caused it.",
    'Some visitors conclude that, because the Antarctic warming came first, carbon dioxide cannot have caused any of it.',
  ])('%s', async (text) => {
    const found = await levels(text);
    expect(found.length).toBeGreaterThan(0);
    expect(found.every((l) => l === 'note')).toBe(true);
  });
});

describe('the same argument in the draft’s own voice', () => {
  it.each([
    'CO2 lagged the warming by centuries, so it cannot have caused any of it.',
    'We conclude that CO2 lagged the warming, so it cannot have caused any of it.',
    'So, as the cores show, CO2 came after the warming and cannot have caused it.',
  ])('%s', async (text) => {
    const found = await levels(text);
    expect(found.length).toBeGreaterThan(0);
    expect(found.some((l) => l !== 'note')).toBe(true);
  });
});
