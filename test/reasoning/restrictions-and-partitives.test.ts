/**
 * Two readings of structure, in sentences of our own:
 * - a restriction read as such: "the one" before a cause noun ("the one driver", "the one thing in
 *   control") and a restriction just before a reason cue ("only because of", "solely due to") make
 *   the cause the one cause; "just because ... doesn't mean" is an idiom of denied inference and
 *   restricts nothing;
 * - a partitive after "rather than": "rather than one of its causes" sets the cause noun aside as
 *   "rather than a cause" does (a possessive determiner between is no rival thing).
 * The science: the orbit paced the glacial terminations and the CO2 rise amplified and spread the
 * warming, so neither is the one cause, and CO2 was both a response and a driver (Shakun et al.
 * 2012, Nature 484, 49-54, doi 10.1038/nature10915; IPCC AR6 WG1 chapter 5, from memory).
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

describe('a restriction that names the one cause', () => {
  it.each([
    'Reading the Vostok chart, carbon dioxide was plainly the one driver of every glacial cycle.',
    'The orbit was the one thing in control of the ice ages, as far as our guide was concerned.',
    'The great ice sheets melted away only because of the changing tilt of the orbit.',
    'Each glaciation ended solely due to rising CO2 in the air.',
  ])('%s', async (text) => {
    expect(await serious(text)).toContain('logic.single-cause');
  });

  it.each([
    'Carbon dioxide was one driver of the glacial cycles, alongside the orbit and the ice sheets.',
    'Just because CO2 rose late does not mean the orbit ended the ice ages on its behalf.',
    'The ice ages ended partly because of the orbit and partly because of CO2.',
    'Of the two curves, CO2 is the one that rose a few centuries later at Dome C.',
  ])('stays clean: %s', async (text) => {
    expect((await serious(text)).filter((r) => r === 'logic.single-cause')).toEqual([]);
  });
});

describe('a partitive set aside by "rather than"', () => {
  it.each([
    'Our reading is that CO2 was a product of the deglacial warming rather than one of its causes.',
    'The data cast carbon dioxide as an echo of the warming rather than its driver.',
  ])('%s', async (text) => {
    expect(await serious(text)).toContain('logic.either-or-causation');
  });

  it.each([
    'CO2 was a response to the warming and also one of its drivers, a feedback that amplified it.',
    'The orbit, rather than one of its many rivals, set the timing of each thaw.',
  ])('stays clean: %s', async (text) => {
    expect((await serious(text)).filter((r) => r.startsWith('logic.'))).toEqual([]);
  });
});
