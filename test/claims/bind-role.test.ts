import { describe, expect, it } from 'vitest';
import { endpointPairs, quantityRoles, roleFits, type ReadRole } from '../../src/claims/bind-role.js';
import { checkText } from '../../src/engine.js';
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
  // A verb of staying at a value, or a noun of an extreme of the scale, before the number: a level
  // (the glacial low of about 180-190 ppm is a level, Lüthi et al. 2008, Nature 453, 379-382).
  ['In the cold phases CO2 sat around 190 ppm.', [['around 190 ppm', C]], ['level']],
  ['Through the long glacials the gas hovered near 200 ppm.', [['200 ppm', C]], ['level']],
  ['Carbon dioxide remained about 280 ppm for millennia.', [['about 280 ppm', C]], ['level']],
  ['The Orra bubbles climbed out of a glacial low near 185 ppm.', [['185 ppm', C]], ['level']],
  ['Each interglacial reached a peak of 290 ppm or so.', [['290 ppm', C]], ['level']],
  // How far a fall went, and a verb of reaching an extreme, name where it ended: a level (glacial
  // lows near 172-200 ppm and interglacial peaks near 280-300 ppm, Lüthi et al. 2008, Nature 453,
  // doi:10.1038/nature06949), unless "by" makes it the size of the fall.
  ['In the harshest glacials the gas fell as far as roughly 175 ppm.', [['roughly 175 ppm', C]], ['level']],
  ['Each warm spell peaked somewhere around 290 ppm.', [['around 290 ppm', C]], ['level']],
  ['The Orra record topped out near 295 ppm.', [['295 ppm', C]], ['level']],
  ['Across the thaw the gas rose by as much as 95 ppm.', [['as much as 95 ppm', C]], ['change']],
  // Words of change after the number still make it a difference: "sits 140 ppm above".
  ['Today the level sits 140 ppm above that interglacial peak.', [['140 ppm', C]], ['change']],
  ['The new high is 60 ppm higher than any before.', [['60 ppm', C]], ['change']],
  // A loose hedge between the role's words and the number keeps the role (common practice: English
  // approximators the quantity reader leaves outside the number).
  ['At the Orra site the gas went up by something like 70 ppm.', [['70 ppm', C]], ['change']],
  ['In every cold phase the gas dropped to somewhere near 190 ppm.', [['near 190 ppm', C]], ['level']],
  ['Over the thaw CO2 rose by on the order of 80 ppm.', [['80 ppm', C]], ['change']],
  // A figure signed with a plus is an amount added; what "from A to B" comes to is the difference.
  ['Cold phase 185 ppm, warm phase 275 ppm: +90 ppm in all.', [['185 ppm', C], ['275 ppm', C], ['+90 ppm', C]], ['unknown', 'unknown', 'change']],
  ['From a cold-phase 185 to a warm-phase 270 is roughly 85 ppm.', [['185', C], ['270', C], ['roughly 85 ppm', C]], ['unknown', 'unknown', 'change']],
  ['It went from 185 to 270, which was 85 ppm.', [['185', C], ['270', C], ['85 ppm', C]], ['level', 'level', 'unknown']],
];

describe('quantityRoles', () => {
  it.each(ROLES)('%s', (sentence, written, roles) => {
    expect(quantityRoles(sentence, quantitiesIn(sentence, written))).toEqual(roles);
  });
});

describe('a level reached told with "as far as" or "peaked" binds no size of a rise (built-in pack)', () => {
  // The glacial-interglacial CO2 rise is 80-100 ppm; the lowest glacial CO2 about 172 ppm (Lüthi et
  // al. 2008, Nature 453, doi:10.1038/nature06949).
  const serious = async (text: string) => (await checkText(text)).flags.filter((f) => f.level !== 'note').map((f) => [f.ruleId, f.excerpt]);
  it('a right level is clean; a wrong level and a wrong rise are still flagged', async () => {
    expect(await serious('In the glacial lows of each cycle, CO2 fell as far as about 180 ppm.')).toEqual([]);
    expect(await serious('In the glacial lows CO2 sank as far as about 240 ppm.')).toEqual([['value.co2-glacial-minimum-typical', 'about 240 ppm']]);
    expect(await serious('Across each glacial cycle, CO2 rose by about 150 ppm.')).toEqual([['value.co2-glacial-interglacial-amplitude', 'about 150 ppm']]);
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

describe('a level beside a change in one sentence (built-in pack)', () => {
  // The CO2 rise across a glacial termination is 80-100 ppm (Fischer et al. 1999, Science 283,
  // 1712-1714); its starting level is the glacial low of about 180-190 ppm (Lüthi et al. 2008,
  // Nature 453, 379-382). A starting level is not the size of the rise.
  it.each([
    'Across each termination CO2 climbed out of a glacial low near 185 ppm, a rise of about 90 ppm.',
    'In the cold phases of every cycle CO2 sat around 190 ppm, and the glacial swing was about 90 ppm.',
    'Glacial CO2 hovered at about 185 ppm before each termination added some 90 ppm.',
  ])('%s', async (sentence) => {
    const result = await checkText(`The Antarctic ice cores hold the CO2 record.\n\n${sentence}`, { path: 'panel.md' });
    expect(result.flags.map((f) => f.ruleId)).toEqual([]);
  });

  it('still flags a rise of the wrong size after the level', async () => {
    const result = await checkText('The Antarctic ice cores hold the CO2 record.\n\nAcross each glacial cycle CO2 climbed out of a glacial low near 185 ppm, a rise of about 190 ppm.', { path: 'panel.md' });
    expect(result.flags.map((f) => [f.ruleId, f.excerpt])).toEqual([['value.co2-glacial-interglacial-amplitude', 'about 190 ppm']]);
  });
});
