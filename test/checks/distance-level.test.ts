import { describe, expect, it } from 'vitest';
import { factorOff, levelWithDistance } from '../../src/checks/distance-level.js';
import { checkText } from '../../src/engine.js';

describe('the level grows with how far a value is from the reference (docs/rule-packs.md)', () => {
  it.each([
    // claim interval, reference interval, factor
    [[25, 25], [180, 210], 7.2],
    [[400, 400], [180, 200], 2],
    [[190, 190], [180, 200], 1],
    [[-10, -10], [-6, -4], 10 / 6],
    [[-2, 2], [4, 6], 1],
  ])('%j against %j is %f times off', (claim, reference, factor) => {
    expect(factorOff(claim[0] ?? 0, claim[1] ?? 0, { low: reference[0] ?? 0, high: reference[1] ?? 0 })).toBeCloseTo(factor, 6);
  });

  it.each([
    [undefined, 1, undefined],
    ['note', 8, 'error'],
    ['note', 1.5, 'warning'],
    ['warning', 1.1, 'warning'],
    ['error', 1.3, 'error'],
  ] as const)('a pack level %s at a factor of %f becomes %s', (level, factor, expected) => {
    expect(levelWithDistance(level, factor)).toBe(expected);
  });

  it('makes a ratio off by a factor of about 8 an error, though its pack entry says note (issue 15)', async () => {
    // The 2010s CO2 growth rate is roughly 190 times the mean Termination I rate (pack value
    // co2-modern-vs-deglacial-rate-ratio, computed from Lan et al., NOAA GML growth rates, and
    // Monnin et al. 2001, Science 291, 112): "25 times" is off by 180/25 = 7.2.
    const result = await checkText('Today CO2 is rising 25 times faster than at the end of the last ice age.');
    const flag = result.flags.find((f) => f.ruleId === 'value.co2-modern-vs-deglacial-rate-ratio');
    expect(flag?.level).toBe('error');
  });
});
