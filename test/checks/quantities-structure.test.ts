/**
 * Numbers read through sentence structure (session 9): the words that complete an air-fraction unit,
 * verbs of composition, a share in percent written as ppm, and differences of spans of time (in the
 * arithmetic reader, and as no span of either subject in the binder). Every sentence is our own;
 * each wrong one has a right twin in the same wording that must stay clean.
 */
import { describe, expect, it } from 'vitest';
import { checkText } from '../../src/engine.js';
import { loadPacks } from '../../src/rulepack/index.js';

const packs = await loadPacks([]);

/** The rule ids and corrections of every flag on the draft's last paragraph's lines. */
async function flagsOf(text: string, format: 'markdown' | 'text' = 'text'): Promise<{ rule: string; correction: string }[]> {
  const result = await checkText(text, { path: format === 'markdown' ? 'draft.md' : 'draft.txt', packs });
  const last = text.split('\n').length;
  return result.flags.filter((f) => f.span.start.line === last).map((f) => ({ rule: f.ruleId, correction: f.correction ?? '' }));
}

describe('an air-fraction unit and the words that complete it', () => {
  // CO2 levels: about 278 ppm in 1750 (Gulev et al. 2021, IPCC AR6 WG1 ch. 2), 423.9 ppm as the 2024
  // global mean (WMO Greenhouse Gas Bulletin 2025). "of the air" after ppm says what ppm already
  // means (a part of the air by volume: common practice), so it makes the figure no percentage.
  const WRONG: [string, string][] = [
    ['These days carbon dioxide is roughly 520 parts per million of the air.', 'value.co2-present-day'],
    ['Carbon dioxide today amounts to 510 ppm of the atmosphere, the monitoring network reports.', 'value.co2-present-day'],
    // "made up" tells what the air was made of; it is no rise.
    ['In the air of the pre-industrial world, CO2 made up about 350 ppm.', 'value.co2-preindustrial-1750'],
    ['Before the factories, carbon dioxide took up some 340 ppm of the air.', 'value.co2-preindustrial-1750'],
    // A level in ppb where ppm is meant: read through "makes up" (1 ppm = 1,000 ppb, NIST SP 811 for SI prefixes).
    ['Before industry, carbon dioxide made up about 280 parts per billion.', 'unit.scale-slip'],
  ];
  const RIGHT = [
    'These days carbon dioxide is roughly 424 parts per million of the air.',
    'Carbon dioxide today amounts to 424 ppm of the atmosphere, the monitoring network reports.',
    'In the air of the pre-industrial world, CO2 made up about 280 ppm.',
    'Before the factories, carbon dioxide took up some 280 ppm of the air.',
    // A rise stays a rise: "went up" is no verb of composition (NOAA GML: about 2.4 ppm a year in the 2010s).
    'Through the 2010s CO2 went up about 2.4 ppm every year.',
    // Methane is measured in ppb (about 700 ppb before industry, IPCC AR6 WG1 ch. 2): no slip.
    'Before industry, methane made up about 700 parts per billion of the air.',
  ];
  it.each(WRONG)('flags %s', async (sentence, rule) => {
    expect((await flagsOf(sentence)).map((f) => f.rule)).toContain(rule);
  });
  it.each(RIGHT)('leaves clean: %s', async (sentence) => {
    expect(await flagsOf(sentence)).toEqual([]);
  });
});

describe('a share in percent written as parts per million', () => {
  // 1% = 10,000 ppm (common practice; NIST SP 811 for the prefixes): about 0.04 percent of the air is
  // about 420 ppm of CO2 today (WMO 2025), so "0.04 ppm" is the percentage with the wrong unit.
  const WRONG = [
    'Carbon dioxide today makes up barely 0.04 parts per million of the air.',
    'These days CO2 is a mere 0.042 ppm of the atmosphere.',
    'Right now carbon dioxide forms only about 0.043 ppm of the air we breathe.',
  ];
  it.each(WRONG)('flags %s as a unit slip that names the percentage', async (sentence) => {
    const flags = await flagsOf(sentence);
    expect(flags.map((f) => f.rule)).toContain('unit.scale-slip');
    expect(flags.find((f) => f.rule === 'unit.scale-slip')?.correction).toMatch(/^(?<hedge>(?:about )?)0\.04\d?% \(\k<hedge>4\d\d (?:ppm|parts per million)\)$/u);
  });
  it.each([
    'Carbon dioxide today makes up barely 0.04 percent of the air.',
    'These days CO2 is a mere 0.042 percent of the atmosphere.',
    // A growth of under 1 ppm is a rate in ppm, not a slip (NOAA GML: about 0.7-0.9 ppm a year in the 1960s).
    'In the early 1960s CO2 grew by about 0.8 ppm a year.',
  ])('leaves clean: %s', async (sentence) => {
    expect((await flagsOf(sentence)).map((f) => f.rule)).not.toContain('unit.scale-slip');
  });
});

describe('a difference of spans of time in the arithmetic reader', () => {
  // Record spans: EPICA Dome C about 800,000 years (Jouzel et al. 2007), Vostok about 420,000 years
  // (Petit et al. 1999); their difference is 380,000 years and their ratio about 1.9 (common practice).
  const WRONG: [string, string, string][] = [
    ['Dome C spans about 800,000 years and Vostok about 420,000, so the European core adds some 280,000 years.', 'arith.change', '380,000'],
    ['Vostok holds about 420,000 years and Dome C about 800,000, which makes Dome C roughly 480,000 years longer.', 'arith.change', '380,000'],
    // Ages of a layer told as how old it is: 24,000 - 20,500 = 3,500 years.
    ['The ice of that layer is 24,000 years old and the gas in it 20,500, so the gas is 5,000 years younger.', 'arith.change', '3,500'],
    ['Dome C spans about 800,000 years and Vostok about 420,000, so the European core is about three times as long.', 'arith.ratio', '1.9'],
  ];
  const RIGHT = [
    'Dome C spans about 800,000 years and Vostok about 420,000, so the European core adds some 380,000 years.',
    'Vostok holds about 420,000 years and Dome C about 800,000, which makes Dome C roughly 380,000 years longer.',
    'The ice of that layer is 24,000 years old and the gas in it 20,500, so the gas is 3,500 years younger.',
    'Dome C spans about 800,000 years and Vostok about 420,000, so the European core is about twice as long.',
    // A span with no pair of spans before it is no result of theirs (Jouzel et al. 2007).
    'Dome C spans about 800,000 years, some 40,000 years longer than first published.',
    // A verb after a list of periods is no change of the last one (orbital periods near 100,000,
    // 41,000 and 23,000 years: Hays et al. 1976).
    'The orbital rhythms of roughly 100,000, 41,000 and 23,000 years change where the sunshine falls.',
  ];
  it.each(WRONG)('flags %s', async (text, rule, right) => {
    const flags = await flagsOf(text);
    expect(flags.map((f) => f.rule)).toContain(rule);
    expect(flags.find((f) => f.rule === rule)?.correction).toContain(right);
  });
  it.each(RIGHT)('leaves clean: %s', async (text) => {
    expect(await flagsOf(text)).toEqual([]);
  });
});

describe('a span named as such is no difference', () => {
  // The Younger Dryas lasted about 1,200 years, from about 12,900 to 11,700 years ago (Rasmussen et
  // al. 2006); "a span of" names the span itself, which the span-of-dates check reads.
  it('flags a span of dates worked out wrong', async () => {
    const flags = await flagsOf('The Younger Dryas ran from about 12,900 to 11,700 years ago, a span of 2,200 years.');
    expect(flags.map((f) => f.rule)).toContain('arith.duration');
  });
  it('leaves a right span clean', async () => {
    expect(await flagsOf('The Younger Dryas ran from about 12,900 to 11,700 years ago, a span of 1,200 years.')).toEqual([]);
  });
});

describe('a temperature change named by a noun of cooling or warming', () => {
  // A change of 1 °C is a change of 1.8 °F, with no 32 added (NIST SP 811, 2008, B.9): 22 °C of
  // change is 39.6 °F, 10 °C is 18 °F, 6 °C is 10.8 °F. "chill of", "cool-down of" make the
  // figure a change, and the °F figure restating it follows.
  const WRONG = [
    'At the Last Glacial Maximum the Greenland chill of about 22 °C equals roughly 72 °F.',
    'At the Last Glacial Maximum, a cool-down of 6 °C works out at about 43 °F.',
    'The glacial chill of about 10 °C at Dome C comes to roughly 50 °F.',
  ];
  const RIGHT = [
    'At the Last Glacial Maximum the Greenland chill of about 22 °C equals roughly 40 °F.',
    'At the Last Glacial Maximum, a cool-down of 6 °C works out at about 11 °F.',
    'The glacial chill of about 10 °C at Dome C comes to roughly 18 °F.',
  ];
  it.each(WRONG)('flags %s', async (text) => {
    expect((await flagsOf(text)).map((f) => f.rule)).toContain('unit.temperature-difference');
  });
  it.each(RIGHT)('leaves clean: %s', async (text) => {
    expect((await flagsOf(text)).map((f) => f.rule)).not.toContain('unit.temperature-difference');
  });
});

describe('a lag told with any form of trail, lag or follow, at the close of the last ice age', () => {
  // The Antarctic temperature-CO2 offset at the last deglaciation: a few centuries at most (Pedro et
  // al. 2012; Parrenin et al. 2013; Chowdhry Beeman et al. 2019). "close", "conclusion", "tail end"
  // of a span name its end as "end of" does (common practice of English).
  const WRONG = [
    'At the close of the last ice age, the Antarctic cores show carbon dioxide trailing the warming by about three thousand years.',
    'Toward the conclusion of the last ice age, Antarctic ice shows CO2 lagging temperature by some 4,000 years.',
    'At the tail end of the last ice age, Antarctic records have CO2 following the temperature rise by roughly 2,500 years.',
  ];
  const RIGHT = [
    'At the close of the last ice age, the Antarctic cores show carbon dioxide trailing the warming by about 300 years.',
    'Toward the conclusion of the last ice age, Antarctic ice shows CO2 lagging temperature by some 400 years.',
    'At the tail end of the last ice age, Antarctic records have CO2 following the temperature rise by roughly 200 years.',
  ];
  it.each(WRONG)('flags %s', async (text) => {
    expect((await flagsOf(text)).map((f) => f.rule)).toContain('value.antarctic-co2-phasing-termination-1-consensus');
  });
  it.each(RIGHT)('leaves clean: %s', async (text) => {
    expect(await flagsOf(text)).toEqual([]);
  });
});

describe('years per metre with "each metre", and drawn from the sentence before', () => {
  // The lowest 200 m of EPICA Dome C hold about 150,000 years (Lüthi et al. 2008; Jouzel et al.
  // 2007 for the core's 3,270 m and 800,000 years): about 750 years per metre (common practice:
  // years over metres). "each", "every" and "a single" metre name one metre as "one metre" does.
  const WRONG = [
    'With 150,000 years packed into the lowest 200 metres of the Dome C core, each metre there holds about 75 years.',
    'The bottom 200 metres of the Dome C core cover some 150,000 years, so every metre covers roughly 7,500 years.',
    'The lowest 200 metres of the Dome C core hold about 150,000 years, so a single metre stores some 75 years.',
    'The lowest 200 metres of the Dome C core hold about 150,000 years. That works out to about 75 years per metre of ice.',
  ];
  const RIGHT = [
    'With 150,000 years packed into the lowest 200 metres of the Dome C core, each metre there holds about 750 years.',
    'The bottom 200 metres of the Dome C core cover some 150,000 years, so every metre covers roughly 750 years.',
    'The lowest 200 metres of the Dome C core hold about 150,000 years. That works out to about 750 years per metre of ice.',
    // Another place in the ice: near the surface a metre of firn holds a few years (common practice).
    'The lowest 200 metres of the Dome C core hold about 150,000 years; near the surface a metre holds only about 10 years.',
    'The lowest 200 metres of the Dome C core hold about 150,000 years, while near the top a metre holds only about 10 years.',
  ];
  it.each(WRONG)('flags %s', async (text) => {
    const flags = await flagsOf(text);
    expect(flags.map((f) => f.rule)).toContain('arith.rate');
    expect(flags.find((f) => f.rule === 'arith.rate')?.correction).toContain('750');
  });
  it.each(RIGHT)('leaves clean: %s', async (text) => {
    expect(await flagsOf(text)).toEqual([]);
  });
});

describe('a sentence that opens by naming a system of units restates the figure before', () => {
  // 1 ft = 0.3048 m (NIST SP 811, 2008): Vostok's 3,623 m (Petit et al. 1999) is about 11,900 feet;
  // 120 m (the glacial sea-level fall, Lambeck et al. 2014) is about 394 feet.
  const WRONG = [
    'The Vostok core was drilled to a depth of 3,623 metres. In imperial units the core runs to about 1,200 feet.',
    'The Vostok core was drilled to a depth of 3,623 metres. Converted to feet, the core is some 1,190 feet long.',
    'At the Last Glacial Maximum sea level stood about 120 metres lower than today. In feet, the sea stood about 120 feet lower.',
  ];
  const RIGHT = [
    'The Vostok core was drilled to a depth of 3,623 metres. In imperial units the core runs to about 11,900 feet.',
    'The Vostok core was drilled to a depth of 3,623 metres. Converted to feet, the core is some 11,890 feet long.',
    'At the Last Glacial Maximum sea level stood about 120 metres lower than today. In feet, the sea stood about 390 feet lower.',
    // Another thing measured in the other system: nothing of the sentence before is restated (common practice).
    'The Vostok core was drilled to a depth of 3,623 metres. In imperial units the ice sheet above the lake is some 12,500 feet thick.',
  ];
  it.each(WRONG)('flags %s', async (text) => {
    expect((await flagsOf(text)).map((f) => f.rule)).toContain('unit.length');
  });
  it.each(RIGHT)('leaves clean: %s', async (text) => {
    expect((await flagsOf(text)).map((f) => f.rule)).not.toContain('unit.length');
  });
});

describe('a ceiling under a fronted negation with inversion', () => {
  // The highest natural CO2 of the last 800,000 years is about 300 ppm (Lüthi et al. 2008); a
  // negation fronted with its auxiliary inverted ("Not once ... did CO2 rise above") states the
  // ceiling as "never rose above" does (common practice of English grammar: negative inversion).
  const WRONG = [
    'Not once in those eight hundred thousand years did natural CO2 rise above 250 ppm.',
    'At no time in the last 800,000 years was natural CO2 higher than 250 ppm.',
    'Nor did the ice-core CO2 ever climb above 250 ppm before the factories.',
  ];
  const RIGHT = [
    'Not once in those eight hundred thousand years did natural CO2 rise above 300 ppm.',
    'At no time in the last 800,000 years was natural CO2 higher than 300 ppm.',
    // The negation speaks of the main verb, not of the level in its complement (WMO 2025: about 424 ppm in 2024).
    'Nor do I dispute that today\'s level, well above 400 parts per million, is higher than anything in the cores.',
    'No one doubts that CO2 rose above 400 ppm at Mauna Loa in 2015.',
  ];
  it.each(WRONG)('flags %s', async (text) => {
    expect((await flagsOf(text)).map((f) => f.rule)).toContain('value.co2-highest-preindustrial-800kyr');
  });
  it.each(RIGHT)('leaves clean: %s', async (text) => {
    expect(await flagsOf(text)).toEqual([]);
  });
});

describe('words of the pack for the globe, the seas and ice sheets at their peak', () => {
  // Global mean cooling at the Last Glacial Maximum about 6 °C (4-7 °C; Tierney et al. 2020,
  // Osman et al. 2021); global ice volume greatest about 26,500-19,000 years ago (Clark et al.
  // 2009); sea level about 120-135 m lower (Lambeck et al. 2014).
  const WRONG: [string, string][] = [
    ['At the Last Glacial Maximum the globe was on average just 1 °C colder than before industry.', 'value.gmst-lgm-to-preindustrial-warming'],
    ['The northern ice sheets peaked about 50,000 years ago.', 'value.lgm-ice-sheet-maximum'],
    ['The great ice sheets topped out some 70,000 years ago.', 'value.lgm-ice-sheet-maximum'],
    ['At the glacial maximum, oceans stood roughly 300 metres below their present level.', 'value.lgm-sea-level-lowstand'],
    ['At the glacial maximum the seas fell by no more than 30 metres.', 'value.lgm-sea-level-lowstand'],
  ];
  const RIGHT = [
    'At the Last Glacial Maximum the globe was on average about 6 °C colder than before industry.',
    'The northern ice sheets peaked about 21,000 years ago.',
    'The great ice sheets topped out some 22,000 years ago.',
    'At the glacial maximum, oceans stood roughly 125 metres below their present level.',
    'At the glacial maximum the seas fell by some 120 metres.',
    // A gas at its peak is no ice sheet at its peak (common practice).
    'Carbon dioxide peaked about 128,000 years ago, in the last interglacial.',
  ];
  it.each(WRONG)('flags %s', async (text, rule) => {
    expect((await flagsOf(text)).map((f) => f.rule)).toContain(rule);
  });
  it.each(RIGHT)('leaves clean: %s', async (text) => {
    expect(await flagsOf(text)).toEqual([]);
  });
});
