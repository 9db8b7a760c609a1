import { describe, expect, it } from 'vitest';
import { B2K_CONVENTION, BP_CONVENTION, NIST_SP_811 } from '../../src/checks/standard-sources.js';
import { checkUnits } from '../../src/checks/units.js';
import { parseQuantities } from '../../src/quantities/index.js';

const check = (sentence: string) => checkUnits(sentence, parseQuantities(sentence));

// Unit slips: [rule id, sentence, flagged text, correction, source id]. Right values from
// NIST SP 811 (1 ft = 0.3048 m; °F interval = 5/9 K; °F = 1.8 °C + 32; 1% = 10^4 ppm) and the
// BP (before AD 1950) and b2k (before AD 2000) definitions.
const WRONG: [string, string, string, string, string][] = [
  ['unit.temperature-difference', 'A 5 °C (41 °F) warming of Antarctica is glacial-scale.', '41 °F', '9 °F', NIST_SP_811.id],
  ['unit.temperature-difference', 'Antarctica was 8 °C, or 46 °F, colder at the maximum.', '46 °F', '14.4 °F', NIST_SP_811.id],
  ['unit.temperature', 'At -30 °C (-54 °F) the snow squeaks.', '-54 °F', '-22 °F', NIST_SP_811.id],
  ['unit.percent-ppm', 'CO2 reached 0.4 percent (400 ppm) of the atmosphere.', '400 ppm', '4,000 ppm', NIST_SP_811.id],
  ['unit.percent-ppm', 'CO2 stood at 280 percent before industrialisation.', '280 percent', '280 ppm', NIST_SP_811.id],
  ['unit.percent-ppm', 'Pre-industrial CO2 was 0.028 ppm in the air.', '0.028 ppm', '0.028%', NIST_SP_811.id],
  ['unit.age-era', 'The ice sheet melted back in 10,000 BCE (10,000 years ago).', '10,000 years ago', '11,900 years ago', BP_CONVENTION.id],
  ['unit.age-era', 'The Holocene began 11,703 years b2k (11,703 years BP).', '11,703 years BP', '11,653 years BP', BP_CONVENTION.id],
  ['unit.length', 'The core is 3,270 m (9,750 ft) long.', '9,750 ft', '10,700 ft', NIST_SP_811.id],
  ['unit.length', 'The ice is 2 miles (2,000 m) thick there.', '2,000 m', '3,220 m', NIST_SP_811.id],
  ['unit.duration', 'The record spans 800 kyr (80,000 years).', '80,000 years', '800,000 years', NIST_SP_811.id],
];

// Right conversions, never flagged.
const RIGHT: string[] = [
  'A 5 °C (9 °F) warming of Antarctica is glacial-scale.',
  'At -30 °C (-22 °F) the snow squeaks.',
  'The air there was -40 °C, or -40 °F.',
  'CO2 reached 0.04 percent (400 ppm) of the atmosphere.',
  'CO2 rose by 40 percent since 1750.',
  'CO2 levels are 50 percent higher than before industry.',
  'The ice sheet melted back around 10,000 BCE, some 12,000 years ago.',
  'In 1750, about 270 years ago, CO2 was 280 ppm.',
  'The Holocene began 11,700 years b2k (11,650 years BP).',
  'The core is 3,270 m (10,700 ft) long.',
  'The record spans 800 kyr (800,000 years).',
  'Methane was 0.7 ppm in warm times.',
];

describe('checkUnits', () => {
  it.each(WRONG)('%s flags: %s', (ruleId, sentence, flagged, correction, source) => {
    const flags = check(sentence);
    expect(flags).toHaveLength(1);
    const [f] = flags;
    expect(f?.ruleId).toBe(ruleId);
    expect(sentence.slice(f?.start, f?.end)).toBe(flagged);
    expect(f?.correction).toBe(correction);
    expect(f?.sources.map((s) => s.id)).toContain(source);
  });

  it.each(RIGHT)('leaves correct units alone: %s', (sentence) => {
    expect(check(sentence)).toEqual([]);
  });

  it('cites both conventions when b2k is involved', () => {
    const [f] = check('The Holocene began 11,703 years b2k (11,703 years BP).');
    expect(f?.sources).toEqual([BP_CONVENTION, B2K_CONVENTION]);
  });

  it('says why a temperature change takes no 32', () => {
    const [f] = check('A 5 °C (41 °F) warming of Antarctica is glacial-scale.');
    expect(f?.reason).toContain('9 °F');
    expect(f?.level).toBe('error');
  });

  it('names the published definitions with where to read them', () => {
    expect(NIST_SP_811.url).toBe('https://physics.nist.gov/cuu/pdf/sp811.pdf');
    expect(BP_CONVENTION.doi).toBe('10.1017/S0033822200003672');
    expect(B2K_CONVENTION.doi).toBe('10.1002/jqs.1227');
  });
});
