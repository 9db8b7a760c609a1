/**
 * A figure the draft denies ("not 420,000 years but 800,000") is not its claim: no value flag on
 * it, while the figure it does claim is checked as ever.
 * Values: the EPICA Dome C record spans about 800,000 years (Jouzel et al. 2007, Science 317,
 * 793-796, doi 10.1126/science.1141038); Vostok's about 420,000 years (Petit et al. 1999, Nature
 * 399, 429-436, doi 10.1038/20859); CO2 at the Last Glacial Maximum about 190 ppm (Monnin et al.
 * 2001, Science 291, 112-114, doi 10.1126/science.291.5501.112). The pack's own sources.
 */
import { describe, expect, it } from 'vitest';
import { isDeniedFigure } from '../../src/checks/denied-figure.js';
import { checkText } from '../../src/engine.js';
import { loadPacks } from '../../src/rulepack/index.js';

const packs = await loadPacks([]);
const flagged = async (text: string) =>
  (await checkText(text, { packs, format: 'markdown' })).flags.filter((f) => f.level !== 'note').map((f) => [f.ruleId, text.slice(f.span.start.offset, f.span.end.offset)]);

describe('a figure the draft denies', () => {
  it.each([
    // The wrong figure denied, the right one claimed: nothing to flag.
    ['The EPICA Dome C record is not 420,000 years long but 800,000 years.', []],
    ['EPICA Dome C spans 800,000 years, not 420,000.', []],
    ['EPICA Dome C spans about 800,000 years rather than 420,000 years.', []],
    ['The Vostok record is not 800,000 years long.', []],
    ["The Vostok record isn't about 800,000 years long; it is about 420,000.", []],
    ['At the glacial maximum CO2 stood near 190 ppm instead of 280 ppm.', []],
    // The right figure denied, a wrong one claimed: the claimed one is flagged.
    ['The EPICA Dome C record is not 800,000 years long but 420,000 years.', [['value.edc-record-span', '420,000 years']]],
    ['At the glacial maximum CO2 was around 280 ppm rather than 190 ppm.', [['value.co2-lgm', 'around 280 ppm']]],
    // A hedge or a bound after "not" claims its figure.
    ['The Vostok record is not quite 800,000 years long.', [['value.vostok-record-span', 'not quite 800,000 years']]],
  ])('%s', async (text, expected) => {
    expect(await flagged(text)).toEqual(expected);
  });

  it('reads only a denial right before the number, in its own clause', () => {
    const at = (s: string, n: string) => isDeniedFigure(s, { start: s.indexOf(n) });
    expect(at('It was not 420,000 years.', '420')).toBe(true);
    expect(at("It wasn't 420,000 years.", '420')).toBe(true);
    expect(at('It was 800,000 years, as opposed to 420,000.', '420')).toBe(true);
    expect(at('It did not begin until 11,700 years ago.', '11')).toBe(false);
    expect(at('It was not even 200 ppm.', '200')).toBe(false);
    expect(at('It was not; 420,000 years is right.', '420')).toBe(false);
  });
});
