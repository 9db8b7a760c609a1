/**
 * What a unit correction says, so an editor can put it in place of the draft's words: a range is
 * put right end by end (src/quantities/rewrite-ends.ts), a figure moved into the unit it was meant
 * in keeps the draft's hedge (reference-slips.ts hedgeOf), and a difference read off an absolute
 * temperature keeps the draft's decimal places in its own unit.
 * Values: CO2 180-300 ppm over 800,000 years of ice cores (Lüthi et al. 2008, Nature 453, 379-382,
 * doi 10.1038/nature06949); East Antarctic glacial cooling 4 to 7 °C (Buizert et al. 2021, Science
 * 372, 1097-1101); global glacial cooling about 6 °C, 5 to 7 °C (IPCC AR6 WGI, ch. 2); glacial sea
 * level some 120-135 m below today's (the pack's lgm-sea-level-lowstand); delta-age at Dome C
 * 1,500-5,500 years (the pack's delta-age-edc). Factors: 1% = 10,000 ppm, 1 °F difference = 5/9 K,
 * 1 ft = 0.3048 m (NIST SP 811, 2008). Rounding: a correction within one percent of the worked value (common practice).
 */
import { describe, expect, it } from 'vitest';
import { checkText } from '../../src/engine.js';
import { closeFigures, parseQuantities, rewriteEnds, writtenEnds } from '../../src/quantities/index.js';
import { loadPacks } from '../../src/rulepack/index.js';

const packs = await loadPacks([]);
const flagsOf = async (text: string) => (await checkText(text, { packs, format: 'text' })).flags.map((f): [string, string] => [f.ruleId, f.correction ?? '']);

describe('a range corrected end by end, not by its middle', () => {
  it.each([
    // 0.18-0.28% of the air is 1,800-2,800 ppm; the ice cores' 180-280 ppm is ten times less.
    ['Through the glacial cycles, CO2 made up between 1.8 and 2.8 percent of the atmosphere.', 'unit.percent-ppm', 'between 0.018 and 0.028 percent'],
    // kyr written for years: each end keeps its number, in years.
    ['At Dome C the bubbles are younger than the ice by 1,500 to 5,500 kyr.', 'unit.scale-slip', '1,500 to 5,500 years'],
    // °F written for °C: the range in °C, and in the draft's °F beside it (4 °C = 7.2 °F, 7 °C = 12.6 °F).
    ['East Antarctica cooled by 4 to 7 °F at the Last Glacial Maximum.', 'unit.scale-slip', '4 to 7 °C (7.2 to 13 °F)'],
    // 5-7 °C converted as readings is 41-45 °F; as a difference it is 9-12.6 °F.
    ['The global cooling at the Last Glacial Maximum was 5 to 7 °C. In Fahrenheit that is 41 to 45 °F of cooling.', 'unit.temperature-difference', '9 to 13 °F'],
  ])('%s', async (text, rule, correction) => {
    expect(await flagsOf(text)).toContainEqual([rule, correction]);
  });

  it('keeps the words around and between the ends, and the draft\'s order', () => {
    const [q] = parseQuantities('between 30 and 20 percent');
    expect(q).toBeDefined();
    if (q === undefined) return;
    expect(writtenEnds(q)).toEqual([20, 30]);
    expect(rewriteEnds(q, (x) => x / 10)).toBe('between 3 and 2 percent');
    // The right ends given low then high go to the draft's ends in their own order.
    expect(rewriteEnds(q, [2.5, 3.5])).toBe('between 3.5 and 2.5 percent');
  });

  it('leaves one figure, and a figure with its uncertainty, to the one-figure rewrite', () => {
    for (const text of ['about 280 ppm', '280 ± 10 ppm']) {
      const [q] = parseQuantities(text);
      expect(q).toBeDefined();
      if (q !== undefined) expect(rewriteEnds(q, (x) => x * 2)).toBeUndefined();
    }
  });
});

describe('a figure moved into the unit it was meant in keeps the draft\'s hedge', () => {
  it.each([
    ['The seas of the last glacial maximum sat roughly 125 feet below where they sit now.', 'roughly 125 m (roughly 410 feet)'],
    ['Drillers at Vostok bored close to 3,600 miles into the ice sheet.', 'close to 3,600 m (close to 2.2 miles)'],
  ])('%s', async (text, correction) => {
    expect(await flagsOf(text)).toContainEqual(['unit.scale-slip', correction]);
  });

  it('adds no hedge the draft did not write', async () => {
    const flags = await flagsOf('The seas of the last glacial maximum sat 125 feet below where they sit now.');
    expect(flags).toContainEqual(['unit.scale-slip', '125 m (410 feet)']);
  });
});

describe('a difference read off an absolute temperature keeps the draft\'s decimal places in its own unit', () => {
  it.each([
    // 42.8 °F is 6 °C as a reading (× 1.8 + 32); as a difference 6 °C is 10.8 °F, one decimal as written.
    ['Averaged over the whole Earth, the Last Glacial Maximum was 42.8 °F colder than the pre-industrial climate.', /^10\.8 °F \(42\.8 °F is an absolute temperature, 6 °C/u],
    // 48 °F is about 9 °C as a reading; as a difference 9 °C is 16 °F, not rounded to one figure (20 °F).
    ['Antarctica warmed by 48 °F as the last ice age ended.', /^16 °F \(48 °F is an absolute temperature, 9 °C/u],
  ])('%s', async (text, correction) => {
    const slip = (await flagsOf(text)).find(([id]) => id === 'unit.scale-slip');
    expect(slip?.[1]).toMatch(correction);
  });
});

describe('a large multiple and a share of the air rounded as a writer rounds, never more than one percent off', () => {
  it.each([
    // 2.5 ÷ 0.0131 = 190.8 times: two figures are within one percent, so no third (was "191 times").
    ['CO2 now rises by 2.5 ppm a year, about 20 times faster than the 0.0131 ppm a year of the deglaciation.', 'arith.ratio', 'about 190 times'],
    // 418 ppm is 0.0418 percent of the air (1% = 10,000 ppm), given as the draft gives a share: two figures.
    ['Mauna Loa read 418 ppm of carbon dioxide last spring, or 0.42 percent of the air.', 'unit.percent-ppm', '0.042 percent'],
  ])('%s', async (text, rule, correction) => {
    expect(await flagsOf(text)).toContainEqual([rule, correction]);
  });

  it('adds figures only while rounding would move the value more than one percent', () => {
    expect(closeFigures(244.6, 2)).toBe(3);
    expect(closeFigures(188.98, 2)).toBe(2);
    expect(closeFigures(0.0418, 2)).toBe(2);
    expect(closeFigures(1.2698, 2)).toBe(3);
  });
});

describe('a bare change corrected with the unit of the figures it is the difference of', () => {
  it.each([
    // Glacial to interglacial CO2, 190 to 270 ppm, is a rise of 80 ppm (numbers of our own, inside Lüthi et al. 2008's range).
    ['CO2 climbed from 190 to 270 parts per million as the glacial ended; that is 100 more.', 'arith.change', '80 ppm'],
    // A relative change has no unit of its operands: 200 to 300 ppm is a rise of 50 percent.
    ['CO2 went from 200 to 300 ppm over the termination, a rise of 20 percent.', 'arith.ratio', '50 percent'],
  ])('%s', async (text, rule, correction) => {
    expect(await flagsOf(text)).toContainEqual([rule, correction]);
  });
});
