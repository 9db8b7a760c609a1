/**
 * Unit slips that a checker misses when the figure never reaches its reference (binding, sentence
 * cuts, quotations) or that it misfiles (value instead of unit, unit instead of arithmetic), and
 * correct conversions it must leave alone. Sentences of our own, in several wordings.
 *
 * Conversion factors: NIST SP 811 (Thompson & Taylor 2008), Appendix B.8 and B.9: 1 ft = 0.3048 m
 * (so 120 feet is 36.6 m and 400 feet is 122 m); a difference of 1 °C is 1.8 °F (22 °F is 12.2 °C,
 * 10 °F is 5.6 °C); percent is 10^-2 and ppm 10^-6 of the air, so 420 ppm is 0.042 percent; SI
 * prefixes k = 10^3 and M = 10^6, so 800 ka is 800,000 years ago.
 * Reference values are the pack's, with the pack's sources: sea level at the LGM 120-135 m below
 * present (Lambeck et al. 2014, PNAS 111, 15296-15303); central Greenland 15-25 °C colder at the LGM,
 * best estimate 22 °C (Dahl-Jensen et al. 1998, Science 282, 268-271); Greenland warming at the end
 * of the Younger Dryas 6-14 °C, best estimate 10 °C (Grachev & Severinghaus 2005; Buizert et al.
 * 2014); CO2 about 278 ppm before industry and about 410 ppm in 2019 (IPCC AR6 WGI), a rise of
 * 132 ppm, 47% of where it started.
 */
import { describe, expect, it } from 'vitest';
import { checkText } from '../../src/engine.js';
import { loadPacks } from '../../src/rulepack/index.js';

const packs = await loadPacks([]);
const flagsOf = async (text: string) => (await checkText(text, { packs, format: 'markdown' })).flags.map((f) => [f.ruleId, f.correction ?? '']);
const idsOf = async (text: string) => (await flagsOf(text)).map(([id]) => id);

describe('the glacial lowstand in feet, wherever the sentence places it', () => {
  it.each([
    // A comparison clause after "than" ("than it does today") reads as "than today".
    'At the height of the last ice age so much water was locked in ice that the sea stood about 120 feet lower than it does today.',
    'During the last ice age the oceans stood some 120 feet lower than they do today.',
    // The period named in the sentence before fills the setting of a sentence told in the past.
    'The coldest part of the last ice age came about 21,000 years ago. Sea level was about 120 feet lower, so the island was a hill.',
    // An answer under its question.
    'How far below today was global sea level at the height of the last ice age?\n\nAbout 120 feet.',
  ])('%s', async (text) => {
    expect(await idsOf(text)).toEqual(['unit.scale-slip']);
  });

  it.each([
    ['At the height of the last ice age the sea stood about 120 metres lower than it does today.', []],
    ['During the last ice age the oceans stood some 400 feet lower than they do today.', []],
    ['The coldest part of the last ice age came about 21,000 years ago. Sea level was about 125 metres lower.', []],
    ['The coldest part of the last ice age came about 21,000 years ago. Sea level was about 50 metres lower.', ['value.lgm-sea-level-lowstand']],
    // Told from today, not from the period named before: no lowstand figure.
    ['The coldest part of the last ice age came about 21,000 years ago. Today sea level stands some 40 metres higher than a century ago.', []],
    ['How far below today was global sea level at the height of the last ice age?\n\nAbout 125 metres.', []],
  ])('%s', async (text, ids) => {
    expect(await idsOf(text)).toEqual(ids);
  });
});

describe('a post whose byline gives a name and a handle, and lines that end in an emoji', () => {
  const post = (depth: string) => `**Rowan Tait** @rowan_t · 12m\nfun fact for the thread: Greenland cores hold about 120,000 years of ice 🧊\nand Vostok was drilled down to ${depth}. wild`;
  it('reads the Vostok depth on its own line, not the byline\'s "12m"', async () => {
    expect(await idsOf(post('3,623 feet'))).toContain('unit.scale-slip');
    expect(await idsOf(post('3,623 metres'))).toEqual([]);
  });
});

describe('a difference in °F whose number is the best estimate in °C', () => {
  it.each([
    ['Greenland ice cores show that at the glacial peak, Summit ran some 22°F colder than today.', 'some 22 °C (some 40°F)'],
    ['When the Younger Dryas ended, Greenland warmed by about 10°F within a few decades.', 'about 10 °C (about 18°F)'],
  ])('%s is a unit slip', async (text, correction) => {
    expect(await flagsOf(text)).toEqual([['unit.scale-slip', correction]]);
  });

  it.each([
    'Greenland ice cores show that at the glacial peak, Summit ran some 40°F colder than today.',
    'When the Younger Dryas ended, Greenland warmed by about 18°F within a few decades.',
  ])('%s is right in °F and stays clean', async (text) => {
    expect(await idsOf(text)).toEqual([]);
  });

  it('keeps a wrong figure that is no other unit\'s best estimate a value flag', async () => {
    expect((await idsOf('Greenland ice cores show that at the glacial peak, Summit ran some 15°F colder than today.'))[0]).toMatch(/^value\./u);
  });
});

describe('a date restated a thousand times off', () => {
  it.each([
    "The mural shows the EPICA Dome C record. The panels' labels use ka, thousands of years, so the far left, 800 ka, is eight hundred million years ago.",
    'On the EPICA Dome C chart the oldest ice, 800 ka, is 800 million years ago.',
  ])('%s', async (text) => {
    const flags = await flagsOf(text);
    expect(flags.map(([id]) => id)).toEqual(['unit.age-era']);
  });

  it('corrects a figure written with the wrong prefix to the same digits with the other one', async () => {
    const flags = await flagsOf('The last ice age peaked around 21,000 years ago, or 21 Ma in the jargon.');
    expect(flags).toEqual([['unit.age-era', '21 ka']]);
  });

  it("keeps the right restatement clean", async () => {
    expect(await idsOf("The panels' labels use ka, so on the EPICA Dome C chart the far left, 800 ka, is eight hundred thousand years ago.")).toEqual([]);
  });
});

describe('CO2 in percent: a share of the air, or a relative change', () => {
  it.each([
    'CO2 went from 280 ppm before industry to about 420 now, a 50% increase. 420 ppm is only 0.042% of the air.',
    'Today the CO2 figure is past 420 ppm (about 0.042 percent) and still climbing.',
    'What is 420 ppm of CO2 as a percentage of the air?\n\n0.042 per cent. (One ppm is one ten-thousandth of one per cent.)',
  ])('%s is a right conversion and stays clean', async (text) => {
    expect(await idsOf(text)).toEqual([]);
  });

  it('flags a share a hundred times off as a unit slip', async () => {
    expect(await idsOf('Today the CO2 figure is past 420 ppm (about 4.2 percent) and still climbing.')).toEqual(['unit.percent-ppm']);
  });

  it.each([
    'Before industry CO2 stood at about 278 ppm. By 2019 it had reached roughly 410 ppm. That is a rise of 132 ppm, or about 32 per cent.',
    'Before industry CO2 stood at about 278 ppm. By 2019 it had reached roughly 410 ppm. That is a rise of about 32 per cent.',
  ])('%s is no percent-for-ppm slip', async (text) => {
    expect(await idsOf(text)).not.toContain('unit.percent-ppm');
  });
});
