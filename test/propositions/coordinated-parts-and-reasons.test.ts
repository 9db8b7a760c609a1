/**
 * Three structures of the proposition reader, each in sentences of our own and several wordings,
 * beside correct look-alikes that must stay clean:
 * - a part noun joined to an earlier one ("a response to the warming rather than a driver of it")
 *   shares that noun's subject however long the phrase between, so a modifier before the subject
 *   ("the ice-age CO2") or a clause before it ("This shows ...") no longer takes the agent's place;
 * - a cause noun with a relative clause before its copula ("the one and only reason ice ages end is
 *   the orbit") is a predicate noun whose agent follows the copula and whose patient is the clause's
 *   subject; a demonstrative before a thing ("this wobble") is its determiner, not a pronoun;
 * - a verb of coming from (lexicon `causes.source-verbs`: "came entirely from the oceans warming up")
 *   names the thing after its "from" as the cause of its subject; the ocean's warming said to be the
 *   one source of the glacial-interglacial CO2 rise is a single cause, while the ocean named as the
 *   reservoir the CO2 came from, or a share of the rise, is not;
 * - "..., and nothing more was needed" after a cause closes it as the one cause it took (lexicon
 *   `exclusive`);
 * - a record named after a read-from phrase (lexicon cue words `read-from`: "straight out of",
 *   "taken from") is where a global temperature is read from.
 * The science:
 * - CO2 both followed the Antarctic warming and amplified it, and global temperature lagged CO2
 *   over the last deglaciation: Shakun et al. 2012, Nature 484, 49-54, doi 10.1038/nature10915.
 * - CO2 is a feedback on the orbitally paced glacial cycles and a forcing of them: IPCC AR6 WG1
 *   chapters 5 and 7 (from memory).
 * - Warming seawater's lower solubility explains only part (a few tens of ppm) of the 80-100 ppm
 *   glacial-interglacial CO2 rise; ocean circulation, marine life and carbonate chemistry the rest:
 *   Sigman and Boyle 2000, Nature 407, 859-869, doi 10.1038/35038000; IPCC AR6 WG1 chapter 5 (from memory).
 * - Antarctic temperature from the EPICA Dome C deuterium record is regional, its glacial change
 *   roughly twice the global one: Jouzel et al. 2007, Science 317, 793-796, doi 10.1126/science.1141038.
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
const reasoning = async (text: string) => (await serious(text)).filter((r) => r.startsWith('logic.') || r.startsWith('scope.'));

describe('a part noun coordinated with an earlier one shares its subject', () => {
  it.each([
    'The ice-age CO2 was a response to the warming rather than a driver of it.',
    'Over the glacial cycles the glacial carbon dioxide was a product of the warming instead of a cause of it.',
    'Averaged over the globe, temperature mostly rose after the CO2.\nThis shows the gas was a result of the warming rather than a cause of it.',
    'So the deglacial CO2 was an outcome of the ocean warming rather than a driver of it, as the presenter sums up.',
  ])('%s → logic.either-or-causation', async (text) => {
    expect(await serious(text)).toContain('logic.either-or-causation');
  });

  it.each([
    'CO2 was a consequence of the warming and then a cause of more of it.',
    'The ice-age CO2 was a response to the warming and also a driver of it: a feedback.',
    'Some claim the gas was a by-product of the warming rather than a cause of it. In fact it was both: the warming released it, and it amplified the warming.',
    'Rather than a mere effect, the glacial CO2 was a cause of further warming.',
  ])('stays clean: %s', async (text) => {
    expect((await serious(text)).filter((r) => r.startsWith('logic.'))).toEqual([]);
  });
});

describe('a cause noun with a relative clause before its copula', () => {
  it.each([
    'The one and only reason ice ages end is the orbit.',
    'So the one and only reason glaciations end is this wobble of the Earth\'s orbit.',
    'The sole reason the ice ages ended was the orbit.',
    'The only reason why the glaciations ended was carbon dioxide.',
  ])('%s → logic.single-cause', async (text) => {
    expect(await serious(text)).toContain('logic.single-cause');
  });

  it.each([
    'One reason the ice ages ended was the orbit; the CO2 feedback amplified the warming.',
    'The main reason the ice ages ended was the orbit, with CO2 amplifying the warming it started.',
    'The reason the last ice age ended is still debated by climate scientists.',
  ])('stays clean: %s', async (text) => {
    expect((await serious(text)).filter((r) => r === 'logic.single-cause')).toEqual([]);
  });
});

describe('a verb of coming from', () => {
  it.each([
    'The glacial-to-interglacial rise of 80 to 100 ppm came entirely from the oceans warming up.',
    'The whole 90 ppm rise at each termination stemmed solely from warming seawater giving up its gas.',
    'Each 90 ppm climb out of a glacial came only from the seas warming and releasing gas.',
  ])('%s → logic.single-cause', async (text) => {
    expect(await serious(text)).toContain('logic.single-cause');
  });

  it.each([
    'The extra carbon dioxide at the end of the ice age came entirely from the deep ocean.',
    'Part of the rise came from the oceans warming up; the rest came from changes in Southern Ocean circulation.',
    'Warming of the water alone can only account for something like 20 to 30 ppm of the rise.',
    'Spring came early to the coring camp, and the drill crew arrived from the coast.',
  ])('stays clean: %s', async (text) => {
    expect((await serious(text)).filter((r) => r.startsWith('logic.'))).toEqual([]);
  });
});

describe('a cause closed by "and nothing more was needed"', () => {
  it.each([
    'The ice age ended because the Earth\'s orbit changed, and nothing more was needed.',
    'The glaciation ended because the orbit shifted, and nothing else was required.',
    'Stronger summer sunshine in the north ended the last glacial, and nothing else was needed.',
  ])('%s → logic.single-cause', async (text) => {
    expect(await serious(text)).toContain('logic.single-cause');
  });

  it.each([
    'The orbit started the warming, and nothing more was needed to set it off.',
    'The orbit started the thaw and CO2 amplified it, and nothing more was needed to explain the curves.',
  ])('stays clean: %s', async (text) => {
    expect((await serious(text)).filter((r) => r.startsWith('logic.'))).toEqual([]);
  });
});

describe('a record named after a read-from phrase', () => {
  it.each([
    'This red curve is the planet\'s temperature over the last 800,000 years, straight out of Dome C.',
    'Here is the temperature of the whole Earth through four glacial cycles, taken from the Vostok core.',
    'The global temperature on this panel is drawn from the EPICA Dome C record.',
  ])('%s → scope.regional-record-as-global', async (text) => {
    expect(await reasoning(text)).toContain('scope.regional-record-as-global');
  });

  it.each([
    'This red curve is Antarctic temperature over the last 800,000 years, straight out of Dome C.',
    'Global temperature, drawn from a stack of records around the world, was about 6 °C colder at the glacial maximum.',
    'The temperature at the site, taken from the Vostok core, swung by about nine degrees.',
  ])('stays clean: %s', async (text) => {
    expect((await reasoning(text)).filter((r) => r === 'scope.regional-record-as-global')).toEqual([]);
  });
});
