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
