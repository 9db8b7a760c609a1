/**
 * A range told for the span of a record is checked end by end (pack field `ends`,
 * src/checks/reference-ends.ts, src/claims/bind-span.ts): its low end against the glacial minimum
 * and the lowest level, its high end against the interglacial maximum and the highest level. The
 * science behind every row:
 * - CO2 over the last 800,000 years spans about 172-300 ppm, lowest 172 ppm (Lüthi et al. 2008,
 *   Nature 453, 379-382, doi 10.1038/nature06949);
 * - glacial minima near 180-190 ppm and interglacial maxima near 280-300 ppm, lower (about 240-260 ppm)
 *   before 430,000 years ago (Siegenthaler et al. 2005, Science 310, 1313-1317,
 *   doi 10.1126/science.1120130): the pack's co2-glacial-minimum-typical (172-200 ppm) and
 *   co2-interglacial-maximum-typical (240-300 ppm);
 * - the rise of the last termination from about 190 to 270-280 ppm (Monnin et al. 2001, Science 291,
 *   112-114, doi 10.1126/science.291.5501.112), a change at one termination, not the span;
 * - a lag of Antarctic temperature and CO2 of some centuries (Caillon et al. 2003, Science 299,
 *   1728-1731, doi 10.1126/science.1078758): a duration, which no span of levels speaks of.
 * The sentences are our own.
 */
import { describe, expect, it } from 'vitest';
import { checkText } from '../../src/engine.js';

async function flagsOf(sentence: string) {
  return (await checkText(sentence)).flags;
}

async function boundTo(sentence: string): Promise<string[]> {
  const result = await checkText(sentence);
  return result.claims.flatMap((c) => c.bindings.map((b) => b.referenceId));
}

describe('a range told for the span of the glacial cycles is checked end by end', () => {
  it.each([
    // The high end is some 80 ppm above any interglacial, though 180-380 overlaps 172-300.
    ['Over the ice ages CO2 stayed between 180 and 380 ppm.', 'value.co2-glacial-interglacial-range', ['high']],
    ['Over the ice ages, CO2 stayed within a range of 180–380 ppm.', 'value.co2-glacial-interglacial-range', ['high']],
    // Both ends far off: the overlap test let it pass.
    ['Over the glacial cycles CO2 swung between 100 and 600 ppm.', 'value.co2-800kyr-range', ['low', 'high']],
    ['Across the ice-age cycles, carbon dioxide moved between 150 and 350 ppm.', 'value.co2-800kyr-range', ['low', 'high']],
    ['Through the ice ages, carbon dioxide has ranged from 200 ppm to 400 ppm.', 'value.co2-800kyr-range', ['high']],
    ['Over the ice ages CO2 stayed between 160 and 300 ppm.', 'value.co2-glacial-interglacial-range', ['low']],
    // A span of 800,000 years that never leaves the glacial levels misses the interglacials.
    ['Over the last 800,000 years CO2 varied between 180 and 200 ppm.', 'value.co2-800kyr-range', ['high']],
    ['The Dome C record shows carbon dioxide fluctuating between about 220 and 300 ppm.', 'value.co2-800kyr-range', ['low']],
  ])('%j → %s (%j end off)', async (sentence, ruleId, off) => {
    const flags = await flagsOf(sentence);
    expect(flags.map((f) => f.ruleId)).toEqual([ruleId]);
    const flag = flags[0]!;
    for (const side of ['low', 'high']) expect(flag.reason.includes(`its ${side} end`)).toBe(off.includes(side));
    // Both published ends are named: the glacial minima and the interglacial maxima.
    expect(flag.reason).toContain('170–200 ppm at the low end');
    expect(flag.reason).toContain('240–300 ppm at the high end');
    expect(flag.correction).toMatch(/172|180/u);
    expect(flag.correction).toMatch(/300/u);
    expect(flag.sources.map((s) => s.id)).toEqual(expect.arrayContaining(['luthi-2008', 'siegenthaler-2005']));
  });

  it('one end of a span written as two figures is checked against that end', async () => {
    const flags = await flagsOf('Over the past 800,000 years, CO2 levels swung from 120 to 300 ppm.');
    expect(flags.map((f) => [f.ruleId, f.claimed?.text])).toEqual([['value.co2-800kyr-range', '120']]);
    expect(flags[0]?.reason).toContain('as the low end of');
  });

  it.each([
    'Over the glacial cycles CO2 swung between about 180 and 280-300 ppm.',
    'Over the ice ages, CO2 went back and forth between 180 and 280 ppm.',
    'Over the glacial cycles, CO2 in the ice stayed between about 180 and 290 ppm.',
    'Carbon dioxide varied between 172 and 300 ppm over the last 800,000 years.',
    'Across eight glacial cycles, atmospheric CO2 oscillated between roughly 180 and 300 ppm.',
    'The Vostok record shows carbon dioxide fluctuating between 190 and 280 ppm.',
    'Over the past 800,000 years, CO2 levels swung from about 180 to 300 ppm.',
    'Through the glacial cycles CO2 stayed within 180–300 ppm.',
    // The older cycles peaked lower (Siegenthaler et al. 2005).
    'Before 430,000 years ago, CO2 varied between about 180 and 260 ppm over each cycle.',
    // Before industry is the natural span itself.
    'Before the industrial era, CO2 varied between 180 and 300 ppm.',
  ])('a right span stays clean: %j', async (sentence) => {
    expect(await flagsOf(sentence)).toEqual([]);
  });
});

describe('a range that is no span of the record is left to the values it was bound to before', () => {
  it.each([
    // One end's level told as a range.
    ['During the ice ages CO2 was between 180 and 200 ppm.', ['co2-glacial-minimum-typical']],
    ['In the glacial periods CO2 sat between 180 and 200 ppm, and in the interglacials between 270 and 300 ppm.', ['co2-glacial-minimum-typical', 'co2-interglacial-maximum-typical']],
    ['During ice ages carbon dioxide dropped to 180–200 ppm.', ['co2-glacial-minimum-typical']],
    // A level reached is no span, whatever it neighbours.
    ['In the coldest phases of the cycles, CO2 fell to between 180 and 220 ppm.', ['co2-glacial-minimum-typical']],
    ['Over the glacial cycles CO2 rose to 280–300 ppm in each interglacial.', ['co2-interglacial-maximum-typical']],
  ])('%j binds %j and is not flagged', async (sentence, bound) => {
    expect(await boundTo(sentence)).toEqual(bound);
    expect(await flagsOf(sentence)).toEqual([]);
  });

  it.each([
    // A rise at one termination, two figures: no span value binds either.
    'At the end of the last ice age CO2 rose from 190 to 280 ppm.',
    'At the last glacial termination, CO2 climbed from about 190 to 270 ppm.',
    // The industrial era's rise is no span of the ice-core record: about 278 ppm in 1750 and 410 ppm
    // in 2019 (Gulev et al. 2021, IPCC AR6 WGI chapter 2, section 2.2.3, doi 10.1017/9781009157896.004;
    // from memory, as the pack marks it).
    'Since 1750 the record shows CO2 moving between 280 and 420 ppm.',
    'Since the industrial revolution, CO2 has varied between 280 and 420 ppm.',
    // A range of years of a lag: no span of levels is a duration.
    'CO2 lagged Antarctic temperature by between 2,000 and 3,000 years.',
    'Between 2,000 and 3,000 years of lag separate the two records in some older studies.',
  ])('%j binds no span', async (sentence) => {
    const bound = await boundTo(sentence);
    expect(bound.filter((id) => id === 'co2-800kyr-range' || id === 'co2-glacial-interglacial-range')).toEqual([]);
    expect((await flagsOf(sentence)).filter((f) => f.ruleId === 'value.co2-800kyr-range' || f.ruleId === 'value.co2-glacial-interglacial-range')).toEqual([]);
  });

  it('the right figures in the wrong unit stay a unit slip', async () => {
    const flags = await flagsOf('Over the ice ages CO2 ranged between 180 and 300 parts per billion.');
    expect(flags.map((f) => f.ruleId)).toEqual(['unit.scale-slip']);
  });
});
