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
  // A CO2 share with the gas named after the percentage. 1% = 10,000 ppm, so 0.3 percent would be
  // 3,000 ppm, never measured (172-300 ppm in the ice cores: Lüthi et al. 2008, doi:10.1038/nature06949).
  ['share, gas after', 'At the glacial peak the air above Harnby held about 0.3 percent carbon dioxide.', 'unit.percent-ppm', 'about 0.3 percent', 'about 0.03 percent'],
  // Thousand-for-million slips on an orbital cycle: obliquity about 41,000 years, precession about
  // 19,000-23,000 years (Hays, Imbrie & Shackleton 1976, doi:10.1126/science.194.4270.1121).
  ['orbital cycle', 'The wobble of the axis, the precession, runs on a cycle of about 23 million years.', 'unit.age-scale', 'about 23 million years', 'about 23 thousand years'],
  ['orbital cycle', 'Obliquity swings the tilt between two extremes every 41 Myr.', 'unit.age-scale', '41 Myr', '41 kyr'],
];

const RIGHT: [string, string][] = [
  ['orbital cycle', 'The wobble of the axis, the precession, runs on a cycle of about 23 thousand years.'],
  ['share, gas after', 'At the glacial peak the air above Harnby held about 0.03 percent carbon dioxide.'],
  // A change in percent is no share of the air.
  ['share, gas after', 'Since 1750 the air has gained about 50 percent carbon dioxide.'],
  // A deep-time age beside an orbital cycle is no slip: the figure is not the cycle's length.
  ['orbital cycle', 'Eccentricity cycles are traced in Triassic lake beds laid down 215 million years ago.'],
  ['orbital cycle', 'The tilt cycle shows up in rocks 50 million years old.'],
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

// A subject named in the sentence before, when this one refers back ("That core", "it"). The EPICA
// Dome C record covers about 800,000 years (Jouzel et al. 2007, doi:10.1126/science.1141038); no ice
// core reaches ten million years (oldest ice about 2.7 million: Yan et al. 2019, doi:10.1038/s41586-019-1692-3).
const ACROSS: [string, string, string, string, string | undefined][] = [
  ['The ice core from Skarn Dome was drilled to 2,600 metres.', 'That core\'s record goes back roughly 600 Ma.', 'roughly 600 Ma', 'roughly 600 ka', 'unit.age-scale'],
  ['The ice core from Skarn Dome was drilled to 2,600 metres.', 'Think of it: some 600 million years of snow in one column.', 'some 600 million years', 'some 600 thousand years', 'unit.age-scale'],
  // No word refers back: the figure may be about something else.
  ['The ice core from Skarn Dome was drilled to 2,600 metres.', 'Antarctica first froze over some 34 million years ago.', '', '', undefined],
];

describe('unit slips by the way the sentence is built', () => {
  it.each(ACROSS)('takes the subject from the sentence before: %s %s', (previous, sentence, flagged, correction, ruleId) => {
    const found = check(sentence, [previous]).map((f) => [f.ruleId, sentence.slice(f.start, f.end), f.correction]);
    expect(found).toEqual(ruleId === undefined ? [] : [[ruleId, flagged, correction]]);
  });

  it.each(WRONG)('%s: %s', (_cause, sentence, ruleId, flagged, correction) => {
    expect(check(sentence).map((f) => [f.ruleId, sentence.slice(f.start, f.end), f.correction])).toEqual([[ruleId, flagged, correction]]);
  });

  it.each(RIGHT)('%s, right: %s', (_cause, sentence) => {
    expect(check(sentence)).toEqual([]);
  });
});
