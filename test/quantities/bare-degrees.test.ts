/**
 * A bare "degrees" in a clause about temperature is a temperature (src/quantities/unit-table.ts,
 * BARE_DEGREES): a comparative or a warming word right after it ("four degrees cooler", "six
 * degrees of warming") or a temperature word shortly before ("temperatures fell by some twelve
 * degrees"). Science writing gives bare degrees in Celsius (common practice). Near an angle (tilt,
 * axis, latitude) or with a compass point it stays a plain number. Sentences of our own.
 */
import { describe, expect, it } from 'vitest';
import { bindQuantities } from '../../src/claims/bind.js';
import { checkReferences } from '../../src/checks/reference.js';
import { parseQuantities } from '../../src/quantities/index.js';
import { loadPacks } from '../../src/rulepack/index.js';

const packs = await loadPacks([]);

describe('bare degrees in a temperature clause', () => {
  it.each([
    ['Summers there were roughly four degrees cooler than today.', 'roughly four degrees', 4],
    ['The valley warmed by eight degrees as the glaciers withdrew.', 'eight degrees', 8],
    ['Winter temperatures fell by some twelve degrees.', 'some twelve degrees', 12],
    ['Six degrees of warming separate a glacial world from ours.', 'Six degrees', 6],
    ['The sea surface was 3 degrees colder off Iberia.', '3 degrees', 3],
  ])('%s', (sentence, text, value) => {
    const [q] = parseQuantities(sentence);
    expect(q).toMatchObject({ text, dimension: 'temperature-change', statedUnit: 'degC', value });
  });
});

describe('degrees of angle stay plain numbers', () => {
  it.each([
    // Obliquity varies between about 22.1 and 24.5 degrees (Berger 1978, J. Atmos. Sci. 35, 2362-2367; from memory).
    ["Earth's tilt swings between 22.1 and 24.5 degrees over 41,000 years, which changes how warm the summers get."],
    ['The core site lies at 75 degrees south, one of the coldest places on Earth.'],
    ['Turn the sample through ninety degrees before cutting.'],
    ['The axis tilts 23.4 degrees, which makes the winters colder.'],
  ])('%s', (sentence) => {
    expect(parseQuantities(sentence).filter((q) => q.dimension.startsWith('temperature'))).toEqual([]);
  });
});

// Global mean surface temperature at the Last Glacial Maximum about 6 °C (5-7 °C) below
// pre-industrial: Gulev, S. K. et al. (2021), IPCC AR6 WGI Chapter 2, doi:10.1017/9781009157896.004;
// Tierney, J. E. et al. (2020), Nature 584, 569-573, doi:10.1038/s41586-020-2617-x.
describe('a global cooling in bare degrees is checked like one in °C', () => {
  function verdictOf(sentence: string): string[] {
    const quantities = parseQuantities(sentence);
    const { bindings } = bindQuantities(sentence, quantities, packs);
    return checkReferences(sentence, quantities, bindings, packs).verdicts;
  }
  it('flags two degrees', () => {
    expect(verdictOf('At the height of the last ice age the world was only about two degrees colder than today.')).toEqual(['conflicts']);
  });
  it('passes six degrees', () => {
    expect(verdictOf('At the height of the last ice age the world was about six degrees colder than today.')).toEqual(['agrees']);
  });
});

describe('bare degrees of warming per doubling of CO2 (climate sensitivity)', () => {
  // Equilibrium climate sensitivity: best estimate 3 °C, very likely 2-5 °C (IPCC AR6 WGI SPM A.4.4,
  // doi:10.1017/9781009157896.001); bare degrees in science writing are Celsius (common practice).
  it.each([
    ['Her figure is 2.5 degrees per doubling.', '2.5 degrees'],
    ['Models give about 4 degrees for each doubling of carbon dioxide.', 'about 4 degrees'],
    ['The sensitivity works out to roughly 3.2 degrees.', 'roughly 3.2 degrees'],
    ['A doubling of CO2 would bring some 2.8 degrees.', 'some 2.8 degrees'],
    ['That is 1.2 degrees of eventual warming for a doubling.', '1.2 degrees'],
  ])('%s', (sentence, text) => {
    const [q] = parseQuantities(sentence).filter((x) => x.text.includes('degree'));
    expect(q).toMatchObject({ text, statedUnit: 'degC' });
  });

  it('reads per doubling as a change, so the sensitivity binds and is checked', () => {
    const sentence = 'The IPCC best estimate is about 1.5 degrees per doubling of CO2.';
    const quantities = parseQuantities(sentence);
    const { bindings } = bindQuantities(sentence, quantities, packs);
    const { verdicts } = checkReferences(sentence, quantities, bindings, packs);
    // "best estimate" names the AR6 best estimate (3 °C; IPCC AR6 WGI TS.3.2.1), a value of its own.
    expect(bindings[0]?.referenceId).toBe('ecs-ar6-best-estimate');
    expect(verdicts[0]).toBe('conflicts');
  });

  it.each([
    // Angles keep their degrees: obliquity varies between about 22.1 and 24.5 degrees (Berger 1978, doi:10.1175/1520-0469(1978)035<2362:LTVODI>2.0.CO;2).
    'Doubling back, the tilt swings by 2.4 degrees.',
    'The axis doubles back through 23.5 degrees.',
  ])('%s stays an angle', (sentence) => {
    expect(parseQuantities(sentence).filter((q) => q.statedUnit === 'degC')).toEqual([]);
  });
});

// People type a Celsius figure with no degree sign in posts and chats ("about 6C colder", "2.5 to 4 C");
// a bare capital C after a number is then the scale, as a bare F already is (common practice), in a
// clause about temperature (a temperature word before it, a comparative or change after it) or after a
// minus sign; a bare C with none of these is not read.
describe('a bare capital C after a number', () => {
  it.each([
    ['our allotment froze at about 3C colder than the forecast', 'about 3C', 'temperature-change', 3],
    ['the reservoir ran 7 C warmer than last spring', '7 C', 'temperature-change', 7],
    ['models put the warming somewhere in the 2-4 C range', '2-4 C', 'temperature-change', 3],
    ['it hit -12 C on the plateau that night', '-12 C', 'temperature', -12],
  ])('%s', (sentence, text, dimension, value) => {
    const [q] = parseQuantities(sentence);
    expect(q).toMatchObject({ text, dimension, statedUnit: 'degC', value });
  });

  it.each([
    // Radiocarbon is written 14C (the isotope's mass number before its symbol; IUPAC, common practice).
    'the 14C dates put the peat at the end of the cold spell',
    // A label's number and letter.
    'see Figure 3C for the drill log',
    'the talk is in Room 12C after lunch',
  ])('%s reads no temperature', (sentence) => {
    expect(parseQuantities(sentence).filter((q) => q.statedUnit === 'degC')).toEqual([]);
  });

  it('reads "deg" and "degs" as bare degrees in a temperature clause', () => {
    expect(parseQuantities('the bay was about 5 degs warmer by evening')[0]).toMatchObject({ text: 'about 5 degs', statedUnit: 'degC' });
    expect(parseQuantities('the slope ran 3-6deg cooler in the shade')[0]).toMatchObject({ statedUnit: 'degC', low: 3, high: 6 });
  });

  // Global mean LGM cooling about 6 °C (5-7 °C): Gulev et al. (2021), IPCC AR6 WGI Chapter 2, doi:10.1017/9781009157896.004.
  it('checks a global cooling typed with a bare C like one with a degree sign', () => {
    const sentence = 'at the last glacial maximum the globe was only about 2C colder than now';
    const quantities = parseQuantities(sentence);
    const { bindings } = bindQuantities(sentence, quantities, packs);
    expect(checkReferences(sentence, quantities, bindings, packs).verdicts).toEqual(['conflicts']);
  });
});
