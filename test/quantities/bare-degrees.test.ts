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
