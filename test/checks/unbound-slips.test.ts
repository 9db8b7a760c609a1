/**
 * A figure that binds nothing is held to the one value its passage names, read in a confused unit
 * (src/checks/unbound-slips.ts). Values: Vostok 5G drilling stopped at 3,623 m in January 1998
 * (Petit et al. 1999, Nature 399); EPICA Dome C drilled to about 3,270 m (EPICA community members
 * 2004, Nature 429); global mean sea level at the Last Glacial Maximum some 120-135 m below present
 * (Lambeck et al. 2014, PNAS 111); the Holocene begins 11,700 years before AD 2000 (Walker et al.
 * 2009, Journal of Quaternary Science 24); the Pleistocene begins 2.58 million years ago (Gibbard
 * et al. 2010, Journal of Quaternary Science 25). Factors: 1 ft = 0.3048 m (NIST SP 811, 2008,
 * Appendix B.8); Y BCE = (1,949 + Y) years before 1950 (common practice).
 */
import { describe, expect, it } from 'vitest';
import { unboundSlips } from '../../src/checks/unbound-slips.js';
import { checkText } from '../../src/engine.js';
import { parseQuantities } from '../../src/quantities/index.js';
import { loadPacks } from '../../src/rulepack/index.js';

const packs = await loadPacks([]);
const flagsOf = async (text: string) => (await checkText(text, { packs, format: 'markdown' })).flags.map((f): [string, string] => [f.ruleId, f.correction ?? '']);
const slipsOf = async (text: string) => (await flagsOf(text)).filter(([id]) => id === 'unit.scale-slip');

describe('a figure that binds nothing, read in the unit it was meant in', () => {
  it.each([
    // Vostok is named but no word for depth: the drilled depth and the lake borehole are both Vostok lengths.
    ['Our guide said the Vostok borehole went down 3,623 ft before the Russians paused above the water.', '3,623 m'],
    ['At Dome C the team drilled for eight summers. They drove the drill down through the ice sheet until they stood some 3,270 feet below the snow.', '3,270 m'],
  ])('flags a depth in feet that is the metres figure of the core the passage names: %s', async (text, meant) => {
    const slips = await slipsOf(text);
    expect(slips).toHaveLength(1);
    expect(slips[0]?.[1]).toContain(meant);
  });

  it('reads the period from the sentence before a sea-level figure', async () => {
    const text = 'The coldest part of the Last Glacial Maximum came around 21,000 years ago. So much water sat in the ice that sea level fell by roughly 125 feet.';
    const slips = await slipsOf(text);
    expect(slips).toHaveLength(1);
    expect(slips[0]?.[1]).toContain('125 m');
  });

  it('answers the question above it', async () => {
    const text = 'How deep did the Vostok drill reach in 1998?\n\nAbout 3,623 feet.';
    expect(await slipsOf(text)).toHaveLength(1);
  });

  it('reads an era written for "ago" against the period its passage names', async () => {
    const text = 'Our own warm interval is the Holocene. It opened in 11,700 BCE, after the last cold snap ended.';
    const slips = await slipsOf(text);
    expect(slips).toHaveLength(1);
    expect(slips[0]?.[1]).toContain('11,700 years ago');
  });
});

describe('what it leaves alone', () => {
  it.each([
    // As written the figure fits: right, only unbound (420 ft is 128 m).
    'At the Last Glacial Maximum sea level fell by roughly 420 feet.',
    // The writer gives the right figure beside the slip it denies.
    'The quiz said 3,623 feet, which cannot be right: the Vostok core is 3,623 metres.',
    // A restatement of another figure of the sentence is that figure's (3,623 m is about 11,900 ft).
    'The Vostok borehole reached 3,623 metres, about 11,900 feet, before it stopped.',
    // No subject named: "four metres long" is a chart, not a core.
    'The chart on the wall is four metres long and shows two wobbly lines.',
    // Another measure of the dimension is named: a lag is no record span.
    'The Dome C lag was once put at 800 years, a figure later revised.',
    // A time told vaguely names no figure to mistake.
    'Snow at Vostok takes a few thousand years to close off its air.',
  ])('no unit slip: %s', async (text) => {
    expect(await slipsOf(text)).toEqual([]);
  });

  it('does not read a figure a rebound slip has already flagged', () => {
    const text = 'The Vostok borehole went down 3,623 ft.';
    const qs = parseQuantities(text);
    const taken = [{ ruleId: 'unit.scale-slip', level: 'error', start: 0, end: text.length, reason: '' }] as never;
    expect(unboundSlips(text, qs, [], taken, packs, [])).toEqual([]);
    expect(unboundSlips(text, qs, [], [], packs, [])).toHaveLength(1);
  });
});

/**
 * A figure that is one value's own figure in a confused unit, the value named only in part.
 * Values: global mean cooling at the Last Glacial Maximum about 6 °C, within about 4-7 °C (IPCC AR6
 * WG1, Gulev et al. 2021; Tierney et al. 2020, Nature 584); the base of the Quaternary 2.58 million
 * years ago (Gibbard et al. 2010, Journal of Quaternary Science 25); the Last Glacial Maximum
 * chronozone centred on about 21,000 years ago (Clark et al. 2009, Science 325, from memory).
 * Factors: a difference of 1 °F = 5/9 K (NIST SP 811, 2008, Appendix B.9); k = 10^3, M = 10^6 (SI).
 */
describe("a figure that is one value's own figure in a confused unit", () => {
  const onTopic = 'Ice cores from Antarctica hold bubbles of old air.';
  it.each([
    [`${onTopic}\n\nAveraged over the whole planet, it was about 6 °F colder than in the eighteenth century.`, '6 °C'],
    [`${onTopic} Geologists date the start of the present run of ice ages to some 2.58 thousand years ago.`, '2.58 million years ago'],
    [`${onTopic} The great freeze peaked around 21 Ma, when ice buried most of Canada.`, '21 ka'],
  ])('flags it against that value: %s', async (text, meant) => {
    const slips = await slipsOf(text);
    expect(slips).toHaveLength(1);
    expect(slips[0]?.[1]).toContain(meant);
  });

  it.each([
    // Right as written: 11 °F is 6.1 °C.
    `${onTopic}\n\nAveraged over the whole planet, it was about 11 °F colder than in the eighteenth century.`,
    // Read as °C, 4 lies in the range but is no value's own figure: a wrong number, not a slip.
    `${onTopic}\n\nAveraged over the whole planet, it was roughly 4 °F colder than in the eighteenth century.`,
    // 1.8 million years ago was the Pleistocene's older base, no figure of the pack's.
    `${onTopic} Geologists date the start of the present run of ice ages to some 1.8 thousand years ago.`,
    // 800 years is the lag the passage speaks of, as written; read as 800,000 it would be a record span.
    'The thread turned to the CO2 lag. That 800 yr number is old, and it came from a different record.',
  ])('no unit slip: %s', async (text) => {
    expect(await slipsOf(text)).toEqual([]);
  });
});
