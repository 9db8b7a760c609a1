/**
 * Operands the arithmetic readers used to miss, and correct worked figures they used to flag.
 * Sentences of our own, each wrong one beside a right look-alike that must stay clean.
 *
 * Figures: CO2 about 278 ppm in 1750 and 410 ppm in 2019, a rise of about 47 per cent (IPCC AR6
 * WG1, Summary for Policymakers A.2.1 and chapter 2); glacial CO2 about 190 ppm, interglacial about
 * 280 ppm (Lüthi et al. 2008, Nature 453, 379-382); the deglacial rise of about 76 ppm over some
 * 6,000-6,500 years, about 0.012 ppm a year (Monnin et al. 2001, Science 291, 112-114); growth of
 * about 2.4 ppm a year in the 2010s (NOAA Global Monitoring Laboratory annual mean growth rates,
 * from memory); CO2 forcing 5.35 ln(C/C0) W/m2, so 5.35 ln(280/190) ≈ 2.1 W/m2 (Myhre et al.
 * 1998, GRL 25, 2715-2718); the obliquity cycle of about 41,000 years (Berger 1978, J. Atmos. Sci.
 * 35, 2362-2367). Other figures are the sentence's own arithmetic (common practice).
 */
import { describe, expect, it } from 'vitest';
import { checkText, loadPacks } from '../../src/index.js';

const packs = await loadPacks([]);
/** An opening sentence that puts the draft on topic. */
const TOPIC = '# Notes\n\nAt the end of the last ice age, CO2 in the ice cores rose from about 190 to 280 ppm.\n\n';

async function rulesOn(body: string, figure: string): Promise<string[]> {
  const text = TOPIC + body;
  const report = await checkText(text, { packs, path: 'x.md' });
  const at = text.indexOf(figure, TOPIC.length);
  return report.claims
    .flatMap((c) => c.flags)
    .filter((f) => f.span.start.offset <= at && at < f.span.end.offset)
    .map((f) => f.ruleId)
    .sort();
}

describe('a multiple of two changes of one family', () => {
  it.each([
    ['Antarctica warmed by about 9 °C while the globe warmed by about 6 °C; the polar change was therefore roughly three times the global one.', 'three times'],
    ['The poles warmed by some 12 °C and the tropics warmed by 3 °C, so the polar warming was about twice the tropical.', 'twice'],
  ])('flags a wrong one: %s', async (body, figure) => {
    expect(await rulesOn(body, figure)).toEqual(['arith.ratio']);
  });
  it.each([
    ['Antarctica warmed by about 9 °C while the globe warmed by about 6 °C; the polar change was therefore roughly one and a half times the global one.', 'one and a half'],
    ['The poles warmed by some 12 °C and the tropics warmed by 3 °C, so the polar warming was about four times the tropical.', 'four times'],
  ])('keeps a right or unlinked one clean: %s', async (body, figure) => {
    expect(await rulesOn(body, figure)).toEqual([]);
  });
});

describe('a share that restates a change', () => {
  const lead = 'Around 1750 CO2 stood at about 278 ppm.\nBy 2019 the global average had reached roughly 410 ppm.\n';
  it('flags a wrong share after ", or"', async () => {
    expect(await rulesOn(`${lead}That is a rise of 132 ppm, or about 32 per cent.\n`, '32 per cent')).toContain('arith.ratio');
  });
  it('keeps the right share clean of arithmetic flags', async () => {
    expect(await rulesOn(`${lead}That is a rise of 132 ppm, or about 47 per cent.\n`, '47 per cent')).not.toContain('arith.ratio');
  });
});

describe('a relative change counted from a base named by its time', () => {
  it.each([
    ['In 1750, before industrialisation, the level was about 278 ppm.\nBy 2019 it had reached 410 ppm, a 32% increase on 1750.\n', '32%'],
    ['Before the industrial revolution CO2 stood near 280 ppm.\nToday it is about 420 ppm, up 32 percent on pre-industrial levels.\n', '32 percent'],
    ['In 1750 CO2 stood near 280 ppm.\nToday it is about 420 ppm, 32 percent higher than in 1750.\n', '32 percent'],
  ])('flags a wrong one: %s', async (body, figure) => {
    expect(await rulesOn(body, figure)).toContain('arith.ratio');
  });
  it.each([
    ['In 1750, before industrialisation, the level was about 278 ppm.\nBy 2019 it had reached 410 ppm, a 47% increase on 1750.\n', '47%'],
    ['Before the industrial revolution CO2 stood near 280 ppm.\nToday it is about 420 ppm, up 50 percent on pre-industrial levels.\n', '50 percent'],
    ['In 1750 CO2 stood near 280 ppm.\nToday it is about 420 ppm, 50 percent higher than in 1750.\n', '50 percent'],
    // A base the paragraph gives no level for is a start of its own.
    ['Before the industrial revolution CO2 stood near 280 ppm.\nToday it is about 420 ppm, up 32 percent over the 1990 level.\n', '32 percent'],
  ])('keeps a right or unrelated one clean: %s', async (body, figure) => {
    expect(await rulesOn(body, figure)).not.toContain('arith.ratio');
  });
});

describe('a multiple of rates set against each other in rows or items before it', () => {
  const table = (multiple: string) => `| What | Roughly |\n|---|---|\n| CO2 growth in the 2010s | 2.4 ppm a year |\n| Average CO2 growth across the last deglaciation | 0.012 ppm a year |\n| Today's rise compared with the deglacial average | ${multiple} |\n`;
  it('flags a wrong multiple in a table row below its rates', async () => {
    expect(await rulesOn(table('about 20 times faster'), 'about 20 times')).toEqual(['arith.ratio']);
  });
  it('keeps the right multiple in a table clean', async () => {
    expect(await rulesOn(table('about 200 times faster'), 'about 200 times')).toEqual([]);
  });
  it.each([
    ['- In the 2010s CO2 grew by about 2.4 ppm a year.\n- Across the last deglaciation it grew by about 0.012 ppm a year.\n- Set against each other, the modern pace is some 20 times faster.\n', 'some 20 times', ['arith.ratio']],
    ['- In the 2010s CO2 grew by about 2.4 ppm a year.\n- Across the last deglaciation it grew by about 0.012 ppm a year.\n- Set against each other, the modern pace is some 200 times faster.\n', 'some 200 times', []],
  ])('list items: %s', async (body, figure, expected) => {
    expect(await rulesOn(body, figure)).toEqual(expected);
  });
});

describe('a part of one unit written with "of a"', () => {
  it.each([
    ['The world as a whole warmed from 6 degrees colder to today over about 8,000 years, so about 0.75 of a degree per century.\n', '0.75 of a degree', ['arith.rate']],
    ['The world as a whole warmed by 6 degrees over about 8,000 years, so about 0.075 of a degree per century.\n', '0.075 of a degree', []],
    ['Sea level rose by about 120 m over some 12,000 years, roughly 0.1 of a metre a century.\n', '0.1 of a metre', ['arith.rate']],
    ['Sea level rose by about 120 m over some 12,000 years, roughly 1 metre a century.\n', '1 metre', []],
  ])('%s', async (body, figure, expected) => {
    expect(await rulesOn(body, figure)).toEqual(expected);
  });
});

describe('a span divided into equal members', () => {
  it.each([
    ["The mural's left edge is 800,000 years ago and the right edge is today; the wall is split into 16 panels, so each panel spans 100,000 years.\n", '100,000 years', ['arith.duration']],
    ["The mural's left edge is 800,000 years ago and the right edge is today; the wall is split into 16 panels, so each panel spans 50,000 years.\n", '50,000 years', []],
    ['The record runs from 800,000 years ago to today and is cut into 8 sections, so each one covers about 50,000 years.\n', 'about 50,000 years', ['arith.duration']],
    ['The record runs from 800,000 years ago to today and is cut into 8 sections, so each one covers about 100,000 years.\n', 'about 100,000 years', []],
  ])('%s', async (body, figure, expected) => {
    expect(await rulesOn(body, figure)).toEqual(expected);
  });
});

describe('correct worked figures stay clean', () => {
  it('the operands of a formula are no claims', async () => {
    expect(await rulesOn('- glacial-interglacial CO2 forcing = 5.35 ln(280/190) = approx. 2.1 W/m2\n', '190')).toEqual([]);
    expect(await rulesOn('- The forcing is 5.35 × ln(190/280), about -2.1 W/m2, from glacial CO2.\n', '190/280')).toEqual([]);
  });
  it('a level outside a formula is still checked', async () => {
    expect(await rulesOn('- Interglacial CO2 peaked near 190 ppm.\n', '190 ppm')).toEqual(['value.co2-interglacial-maximum-typical']);
  });
  it.each([
    ['- CO2 up ~76 ppm over ~6.5 kyr = approx. 0.012 ppm/yr (vs ~2.4 ppm/yr in the 2010s!!)\n', '~2.4 ppm/yr', []],
    ['- CO2 up ~76 ppm over ~6.5 kyr = approx. 0.12 ppm/yr (vs ~2.4 ppm/yr in the 2010s!!)\n', '0.12 ppm/yr', ['arith.rate']],
    ['- CO2 rose about 76 ppm over some 6,500 years, roughly 0.012 ppm a year, against 2.4 ppm a year today.\n', '2.4 ppm a year', []],
    ['- CO2 rose about 76 ppm over some 6,500 years, roughly 0.12 ppm a year, against 2.4 ppm a year today.\n', '0.12 ppm a year', ['arith.rate']],
  ])('a rate set against another is no result: %s', async (body, figure, expected) => {
    expect(await rulesOn(body, figure)).toEqual(expected);
  });
  it.each([
    ['Shifts in the orbit, including the 41,000-year wobble in the tilt of its axis, set the thaw going.\n', '41,000-year', []],
    ['Shifts in the orbit, including the 41,000-year wobble of the axis, set the thaw going.\n', '41,000-year', ['value.milankovitch-precession-period']],
    ['Shifts in the orbit, including the 23,000-year wobble of the axis, set the thaw going.\n', '23,000-year', []],
  ])('a wobble in the tilt is obliquity: %s', async (body, figure, expected) => {
    expect(await rulesOn(body, figure)).toEqual(expected);
  });
});

describe('an agent alone giving an amount of the effect claims a part', () => {
  // Warming seawater holds less CO2, but solubility explains only part of the glacial-interglacial
  // rise (Sigman and Boyle 2000, Nature 407, 859-869).
  it.each([
    ['At the end of the last ice age, ocean warming alone can explain perhaps 15 to 30 ppm of the CO2 rise.\n', 'ocean warming', []],
    ['Ocean warming by itself accounts for only about 20 ppm of the deglacial CO2 rise.\n', 'Ocean warming', []],
    ['At the end of the last ice age, ocean warming alone can explain the CO2 rise.\n', 'ocean warming', ['logic.single-cause']],
    ['At the end of the last ice age, ocean warming alone explains the whole 80 ppm of the CO2 rise.\n', 'ocean warming', ['logic.single-cause']],
  ])('%s', async (body, figure, expected) => {
    expect(await rulesOn(body, figure)).toEqual(expected);
  });
});
