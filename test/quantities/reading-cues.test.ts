/**
 * Which reading a temperature takes from the words around it: a change or a reading. A change in
 * °C restated in °F is 1.8 times the number with no 32 added (NIST SP 811, appendix B.8, for the
 * factors; that differences drop the offset is common practice).
 */
import { describe, expect, it } from 'vitest';
import { checkUnits } from '../../src/checks/units.js';
import { parseQuantities } from '../../src/quantities/index.js';

const readings = (text: string) => parseQuantities(text).map((q) => [q.text, q.dimension]);

describe('a figure that something is "put at" or "estimated at"', () => {
  it('is no reading because of its "at": a change unless the sign says otherwise', () => {
    expect(readings('The glacial cooling of the tropics was put at about 3 °C by the survey.')).toEqual([['about 3 °C', 'temperature-change']]);
    expect(readings('The coldest night at the station is estimated at −80 °C.')).toEqual([['−80 °C', 'temperature']]);
    expect(readings('The basin is reckoned at 4 °C colder than today.')).toEqual([['4 °C', 'temperature-change']]);
  });

  it('keeps "at" as a reading cue without such a verb', () => {
    expect(readings('The thermometer stood at 12 °C.')).toEqual([['12 °C', 'temperature']]);
  });
});

// Global LGM cooling about 6 °C (5 to 7 °C): IPCC AR6 WG1 ch. 7, doi 10.1017/9781009157896.009;
// about 6.1 °C: Tierney et al. 2020, Nature 584, doi 10.1038/s41586-020-2617-x.
describe('a change that an estimating verb puts "at" a figure, with words between', () => {
  it.each([
    ['The IPCC puts global cooling at the Last Glacial Maximum at about 6 °C.', 'about 6 °C'],
    ['Tierney and colleagues put the global cooling at about 6.1 °C.', 'about 6.1 °C'],
    ['One team estimated the Antarctic warming across the deglaciation at 9 °C.', '9 °C'],
    ['The survey placed the tropical cooling during the ice age at roughly 3 °C.', 'roughly 3 °C'],
  ])('%s', (text, figure) => {
    expect(readings(text)).toEqual([[figure, 'temperature-change']]);
  });

  it.each([
    ['The lab put the warming chamber at 20 °C.', '20 °C'],
    ['They put the samples at −25 °C after the cooling ended.', '−25 °C'],
  ])('leaves a reading alone: %s', (text, figure) => {
    expect(readings(text)).toEqual([[figure, 'temperature']]);
  });
});

describe('a relative clause on a change noun', () => {
  it('reads its figure as a change, and a °F figure with 32 added to it is flagged with the 1.8 factor', () => {
    const text = 'Greenland warming at the close of the cold spell, which the isotopes put at about 10 °C (roughly 42 °F), was abrupt.';
    expect(readings(text)).toEqual([['about 10 °C', 'temperature-change'], ['roughly 42 °F', 'temperature-change']]);
    const flags = checkUnits(text, parseQuantities(text));
    expect(flags.map((f) => [f.ruleId, f.correction])).toEqual([['unit.temperature-difference', 'roughly 18 °F']]);
  });

  it('leaves a reading alone when the relative clause hangs on no change', () => {
    expect(readings('The summit camp, which the crew reached at −30 °C, was quiet.')).toEqual([['−30 °C', 'temperature']]);
  });
});
