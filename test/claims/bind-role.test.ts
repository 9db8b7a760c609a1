import { describe, expect, it } from 'vitest';
import { endpointPairs, quantityRoles, roleFits, type ReadRole } from '../../src/claims/bind-role.js';
import { quantitiesIn, type Written } from './quantity-at.js';

const C = 'concentration';
const L = 'length';

// Our own sentences (invented newsletters and panels); the roles are read from the words around each number.
const ROLES: [sentence: string, written: Written[], roles: ReadRole[]][] = [
  ['At Lake Orra station the rise was 85 ppm, from about 185 ppm to about 270 ppm.', [['85 ppm', C], ['about 185 ppm', C], ['about 270 ppm', C]], ['change', 'level', 'level']],
  ['Across the thaw, CO2 climbed by roughly 75 ppm.', [['roughly 75 ppm', C]], ['change']],
  ['The panel shows an increase of 90 ppm at every termination.', [['90 ppm', C]], ['change']],
  ['The glacial swing of 80 to 100 ppm repeats in every cycle.', [['80 to 100 ppm', C]], ['change']],
  ['The cores show CO2 rose 70 ppm in a few thousand years.', [['70 ppm', C]], ['change']],
  ['Our leaflet says CO2 was up 3 ppm on the year.', [['3 ppm', C]], ['change']],
  ['A 90 ppm swing separates the cold and warm phases.', [['90 ppm', C]], ['change']],
  ['The drill stopped at 3,200 metres, 20 metres above the bedrock.', [['3,200 metres', L], ['20 metres', L]], ['level', 'change']],
  ['CO2 swung between about 185 ppm in the cold phases and about 275 ppm in the warm ones.', [['about 185 ppm', C], ['about 275 ppm', C]], ['level', 'level']],
  ['The Orra borehole ends 2,950 metres below the surface.', [['2,950 metres', L]], ['level']],
  ['The camp sits 3,200 m above sea level, 150 m below the summit.', [['3,200 m', L], ['150 m', L]], ['level', 'change']],
  ['In the cold phases CO2 fell to 185 ppm.', [['185 ppm', C]], ['level']],
  ['The natural peaks never rose above 300 ppm.', [['above 300 ppm', C]], ['level']],
  ['CO2 stood at 280 ppm in 1750.', [['280 ppm', C], ['1750', 'age', 'CE']], ['level', 'unknown']],
  ['The Harbour Museum core holds about 280 ppm air samples.', [['about 280 ppm', C]], ['unknown']],
];

describe('quantityRoles', () => {
  it.each(ROLES)('%s', (sentence, written, roles) => {
    expect(quantityRoles(sentence, quantitiesIn(sentence, written))).toEqual(roles);
  });
});

describe('endpointPairs', () => {
  it('pairs from…to and between…and, with the joining word placed exactly', () => {
    const s = 'CO2 went from 185 ppm in the cold phases to 275 ppm.';
    expect(endpointPairs(s, quantitiesIn(s, [['185 ppm', C], ['275 ppm', C]]))).toEqual([{ first: 0, second: 1, join: s.indexOf('to 275') }]);
    const t = 'It moved between 185 ppm and 275 ppm.';
    expect(endpointPairs(t, quantitiesIn(t, [['185 ppm', C], ['275 ppm', C]]))).toEqual([{ first: 0, second: 1, join: t.indexOf('and') }]);
  });

  it('pairs nothing across a sentence break or without an opening "from" or "between"', () => {
    const s = 'CO2 was 185 ppm; to 275 ppm it later rose.';
    expect(endpointPairs(s, quantitiesIn(s, [['185 ppm', C], ['275 ppm', C]]))).toEqual([]);
    const t = 'From 185 ppm; and 275 ppm.';
    expect(endpointPairs(t, quantitiesIn(t, [['185 ppm', C], ['275 ppm', C]]))).toEqual([]);
  });
});

describe('roleFits', () => {
  it.each([
    [undefined, 'level', true],
    ['level', 'unknown', true],
    ['level', 'level', true],
    ['level', 'change', false],
    ['change', 'level', false],
    ['change', 'change', true],
  ] as const)('a value accepting %s takes a number read as %s: %s', (accepted, read, fits) => {
    expect(roleFits(accepted, read)).toBe(fits);
  });
});
