/**
 * Unit slips grouped by how the sentence is built, with sentences written for this file (none taken
 * from the corpus). Factors from NIST SP 811 (2008): 1 ft = 0.3048 m; a °F interval is 5/9 K and
 * °F = 1.8 °C + 32 for readings only; K = °C + 273.15 for readings only; 1% = 10,000 ppm. b2k =
 * BP + 50 (Walker et al. 2009, doi:10.1002/jqs.1227).
 */
import { describe, expect, it } from 'vitest';
import { checkUnits } from '../../src/checks/units.js';
import { parseQuantities } from '../../src/quantities/index.js';

const check = (sentence: string, context: string[] = []) => checkUnits(sentence, parseQuantities(sentence), context);

/** [cause, sentence, rule id, flagged words, correction]. */
const WRONG: [string, string, string, string, string][] = [
  // Restatement joiners: "aka", ", so", a comma before the copula, a restating verb ("write as").
  // 300 ppm = 0.03%; 50 m = 164 ft; 14,500 b2k = 14,450 BP; a change of 7 °C is a change of 7 K.
  ['joiner', 'At the Harnby site CO2 sat near 300 ppm, aka 0.3% of the air.', 'unit.percent-ppm', '0.3%', '0.03%'],
  ['joiner', 'The Skarn shelf was raised by about 50 metres, so roughly 500 feet.', 'unit.length', 'roughly 500 feet', 'roughly 164 feet'],
  ['joiner', 'The Bølling onset, put in the Skarn core at 14,500 years b2k, is 14,550 years BP.', 'unit.age-era', '14,550 years BP', '14,450 years BP'],
  ['joiner', 'The Kell plateau warmed by about 7 °C, which physicists write as 280 kelvin.', 'unit.temperature-difference', '280 kelvin', '7 kelvin'],
  // A °F change after a change noun ("a jump of"), or read as a reading after "is" while it restates
  // a change: 8 × 1.8 = 14.4 °F; 3 × 1.8 = 5.4 °F.
  ['change in °F', 'The Vell valley warmed by 8 °C after the cold snap, a jump of 46 °F.', 'unit.temperature-difference', '46 °F', '14.4 °F'],
  ['change in °F', 'A 3 °C regional warm-up is about 37 °F.', 'unit.temperature-difference', 'about 37 °F', 'about 5.4 °F'],
];

const RIGHT: [string, string][] = [
  ['joiner', 'At the Harnby site CO2 sat near 300 ppm, aka 0.03% of the air.'],
  ['joiner', 'The Skarn shelf was raised by about 50 metres, so roughly 164 feet.'],
  ['joiner', 'The Bølling onset, put in the Skarn core at 14,500 years b2k, is 14,450 years BP.'],
  ['change in °F', 'A 3 °C regional warm-up is about 5.4 °F.'],
  // A reading in another clause is no restatement of the change.
  ['change in °F', 'The Vell valley was 6 °C colder and a summer day at the ice edge was 38 °F.'],
  ['change in °F', 'The Vell valley was 6 °C colder; a summer day at the ice edge was 38 °F.'],
  // A percentage after a copula that is a relative change, not a share of the air.
  ['joiner', 'Today\'s levels, above 420 ppm, are roughly 50 percent higher than in 1750.'],
];

describe('unit slips by the way the sentence is built', () => {
  it.each(WRONG)('%s: %s', (_cause, sentence, ruleId, flagged, correction) => {
    expect(check(sentence).map((f) => [f.ruleId, sentence.slice(f.start, f.end), f.correction])).toEqual([[ruleId, flagged, correction]]);
  });

  it.each(RIGHT)('%s, right: %s', (_cause, sentence) => {
    expect(check(sentence)).toEqual([]);
  });
});
