/**
 * Results a draft draws from its own figures, in wordings the arithmetic reader learned to read in
 * this round: a ratio written "N to 1" or "N:1", a change as a fraction in words ("up by a third"),
 * a change noun as the subject of its figure ("the swing was 110 ppm"), an amount each year set
 * against a rate, ages named by a noun, bare figures that take the unit of the paragraph, inputs
 * past a short sentence with no figure, and a later sum on a result the draft itself got wrong.
 * Every sentence is written for this test (places and sites are invented; figures are of the sizes
 * the ice-core literature reports) and appears in no corpus file. The sums are subtraction and
 * division (common practice); each case states its sum. Tolerances are the interval table's
 * (src/quantities/interval-rules.ts: a stated result keeps its hedge, and a relative figure is read
 * to a tenth of itself), so a rounded right answer stays clean.
 */
import { describe, expect, it } from 'vitest';
import { checkText, loadPacks } from '../../src/index.js';
import { flagged } from './arithmetic-at.js';

const packs = await loadPacks([]);

const rules = (...sentences: string[]) => flagged(...sentences).map(([id, words]) => [id, words]);

describe('a ratio written as "N to 1"', () => {
  // Sums (common practice): 2.5 ÷ 0.012 = 208; 3.0 ÷ 0.015 = 200; 1.9 ÷ 0.011 = 173.
  it.each([
    ['a ratio of ... to 1', ['Methane-adjusted CO2 at the Orrin station climbs about 2.5 ppm per year now, against 0.012 ppm per year through the thaw: a ratio of roughly 20 to 1.'], 'roughly 20 to 1'],
    ['N:1 after a dash', ['The Kessel record gives 0.015 ppm per year for the deglaciation and 3.0 ppm per year for the last decade — a ratio of about 20:1.'], 'about 20:1'],
    ['the ratio is', ['Growth in the 2000s averaged 1.9 ppm per year, set against 0.011 ppm per year in the old thaw, so the ratio is near 17 to 1.'], '17 to 1'],
  ] as [string, string[], string][])('%s', (_why, sentences, words) => {
    expect(rules(...sentences)).toEqual([['arith.ratio', words]]);
  });

  it.each([
    ['right, rounded', ['Methane-adjusted CO2 at the Orrin station climbs about 2.5 ppm per year now, against 0.012 ppm per year through the thaw: a ratio of roughly 200 to 1.']],
    ['right, colon form', ['The Kessel record gives 0.015 ppm per year for the deglaciation and 3.0 ppm per year for the last decade — a ratio of about 200:1.']],
    ['a range that ends at 1 is no ratio', ['Over the century the gauge fell from 10 to 1 ppm of the tracer, a drop of 9 ppm.']],
    ['a clock time is no ratio', ['The Tarrow sampler logged 412 ppm at 10:15 and 415 ppm at 11:40.']],
  ] as [string, string[]][])('%s stays clean', (_why, sentences) => {
    expect(flagged(...sentences)).toEqual([]);
  });
});

describe('a change as a fraction or a multiple in words, from bare or unit-less figures', () => {
  // Sums (common practice): 420 ÷ 280 = 1.5 (up a half); 300 → 200 is down a third; 0.9 → 2.7 is ×3; 1.1 → 2.2 is ×2.
  it.each([
    ['bare levels, "now"', ['Before the mills it was 280, it is about 420 now, so up by roughly a third.'], 'roughly a third'],
    ['down by', ['The Orrin glacier was 300 m thick then and is 200 m thick today, down by about two thirds.'], 'about two thirds'],
    ['an amount each year against a rate', ['In the 1970s the annual increase was about 0.9 ppm.', 'By the 2010s it had reached around 2.7 ppm a year, so the growth rate has roughly doubled.'], 'roughly doubled'],
    ['yearly growth, tripled', ['Yearly growth at the Orrin station was some 1.1 ppm in the 1980s.', 'It is now 2.2 ppm a year, so it has about tripled.'], 'about tripled'],
  ] as [string, string[], string][])('%s', (_why, sentences, words) => {
    expect(rules(...sentences)).toEqual([['arith.ratio', words]]);
  });

  it.each([
    ['right fraction', ['Before the mills it was 280, it is about 420 now, so up by roughly a half.']],
    ['right multiple', ['In the 1970s the annual increase was about 0.9 ppm.', 'By the 2010s it had reached around 2.7 ppm a year, so the growth rate has roughly tripled.']],
    ['a fraction of something else', ['It was 280 before the mills and 420 now; oceans took up a third of the emissions.']],
    ['a multiple of no figure before', ['The annual increase was about 2.4 ppm, and the Orrin team doubled its sampling.']],
  ] as [string, string[]][])('%s stays clean', (_why, sentences) => {
    expect(flagged(...sentences)).toEqual([]);
  });
});

describe('a change noun as the subject of its figure', () => {
  // Sums (common practice): 282 − 186 = 96; 4.6 − 3.1 = 1.5.
  it.each([
    ['of the order of, a bare level before', ['In the coldest phases the Hallin air held about 186 parts per million.', 'In the warm spells it came back to something like 282.', 'So from cold to warm the swing was of the order of 130 ppm.'], '130 ppm'],
    ['the rise was', ['The gauge read 3.1 m at dawn and 4.6 m at noon, so the rise was about 2.5 m.'], 'about 2.5 m'],
  ] as [string, string[], string][])('%s', (_why, sentences, words) => {
    expect(rules(...sentences)).toEqual([['arith.change', words]]);
  });

  it.each([
    ['right', ['In the coldest phases the Hallin air held about 186 parts per million.', 'In the warm spells it came back to something like 282.', 'So from cold to warm the swing was of the order of 100 ppm.']],
    ['a figure of another size is no level of it', ['In the coldest phases the Hallin air held about 186 parts per million.', 'The Hallin core has 14 sections.', 'So the spread was about 20 ppm between sections.']],
  ] as [string, string[]][])('%s stays clean', (_why, sentences) => {
    expect(flagged(...sentences).filter(([id]) => id === 'arith.change')).toEqual([]);
  });
});

describe('ages and spans named by their nouns', () => {
  // Sums (common practice): 17,500 − 14,200 = 3,300; 800,000 ÷ 420,000 = 1.9; 12,900 − 11,700 = 1,200.
  it.each([
    ['two ages named by "age"', ['For the first Orrin samples: gas age 14,200, ice age 17,500, so the offset is about 2,300 years.'], 'arith.duration', 'about 2,300 years'],
    ['a bare span beside a span', ["The Tarn core's 420,000 years against the Vell core's 800,000: the newer record is nearly three times as long."], 'arith.ratio', 'nearly three times'],
    ['past a naming sentence', ['As the ice melted, the north plunged back into cold, starting about 12,900 years ago.', 'Geologists call it the Younger Dryas.', 'It ended 11,700 years ago, so it lasted some 2,200 years.'], 'arith.duration', 'some 2,200 years'],
    ['past an item label', ['The Orrin thaw ran from about 18,000 to about 11,500 years ago.', 'D2.', 'So the thaw lasted roughly 3,500 years.'], 'arith.duration', 'roughly 3,500 years'],
  ] as [string, string[], string, string][])('%s', (_why, sentences, id, words) => {
    expect(rules(...sentences)).toEqual([[id, words]]);
  });

  it.each([
    ['right ages', ['For the first Orrin samples: gas age 14,200, ice age 17,500, so the offset is about 3,300 years.']],
    ['right multiple', ["The Tarn core's 420,000 years against the Vell core's 800,000: the newer record is nearly twice as long."]],
    ['right span past a naming sentence', ['As the ice melted, the north plunged back into cold, starting about 12,900 years ago.', 'Geologists call it the Younger Dryas.', 'It ended 11,700 years ago, so it lasted some 1,200 years.']],
    ['a long sentence with no figure ends the reach', ['As the ice melted, the north plunged back into cold, starting about 12,900 years ago.', 'Pollen from the lake beds shows the forests retreating southward while tundra plants spread across the lowlands again.', 'Then the Orrin glacier advanced for some 2,200 years.']],
    ['a rule between posts ends the reach', ['It was about 2.4 ppm a year then.', '----', 'Ruth wrote on 03 Nov:', 'The Orrin swing is three or four times the global one.']],
  ] as [string, string[]][])('%s stays clean', (_why, sentences) => {
    expect(flagged(...sentences)).toEqual([]);
  });
});

describe('a later sum on a result the draft got wrong, and times that are no operands', () => {
  // Sums (common practice): 80 ÷ 6,500 = 0.0123 ppm a year; 2.4 ÷ 0.0123 = 195.
  it('a multiple of a wrong mean rate is read from the right one', () => {
    const sentences = ['Across the Orrin thaw, CO2 rose by about 80 ppm in roughly 6,500 years.', 'That is a mean rate of 0.12 ppm per year.', 'Today\u2019s 2.4 ppm per year is therefore only some 20 times faster.'];
    expect(rules(...sentences.slice(0, 2))).toEqual([['arith.rate', '0.12 ppm per year']]);
    const [flag] = flagged(...sentences);
    expect(flag?.slice(0, 2)).toEqual(['arith.ratio', 'some 20 times']);
  });

  it('a multiple of a right mean rate stays clean', () => {
    expect(flagged('Across the Orrin thaw, CO2 rose by about 80 ppm in roughly 6,500 years.', 'That is a mean rate of 0.012 ppm per year.', 'Today\u2019s 2.4 ppm per year is therefore some 200 times faster.')).toEqual([]);
  });

  // A vague time ("several centuries", "thousands of years") is no operand (common practice of English).
  it.each([
    ['a lag told vaguely', ['In the Orrin core, CO2 trailed the warming by several centuries.', 'Over the whole thaw, CO2 rose by about 80 ppm in roughly 6,500 years.', 'That is a mean rate of 0.012 ppm per year.']],
    ['a change with a vague time of its own', ['AR6 puts the present level above any in at least 2 million years.', 'Over the thaw CO2 climbed about 180 ppm, and it took thousands of years.', 'The average works out to something like 1 ppm per century.']],
    ['a metre near the top holds a few decades', ['Depth and age part ways: the lowest 200 m of the Orrin core hold about 150,000 years, roughly 750 years in every metre, while near the surface a metre covers only a few decades.']],
  ] as [string, string[]][])('%s stays clean', (_why, sentences) => {
    expect(flagged(...sentences)).toEqual([]);
  });

  // 150,000 ÷ 200 = 750 years per metre (common practice).
  it.each([
    ['a gradient beside a vague one', ['Depth and age part ways: the lowest 200 m of the Orrin core hold about 150,000 years, roughly 75 years in every metre, while near the surface a metre covers only a few decades.'], 'roughly 75 years in every metre'],
    ['a gradient past a by-line', ['In the lowest 200 m of the Orrin core they found about 150,000 years of ice', 'orrin_amy - 4 Jun', 'so roughly 75 years per metre down there'], 'roughly 75 years per metre'],
  ] as [string, string[], string][])('%s', (_why, sentences, words) => {
    expect(rules(...sentences)).toEqual([['arith.rate', words]]);
  });
});

describe('the draft\'s own dates disprove a duration before a reference does (src/engine.ts, preferSpecific)', () => {
  // The Younger Dryas ran from about 12,900 to 11,700 years before present (Rasmussen et al. 2014,
  // Quaternary Science Reviews 106, 14-28, doi:10.1016/j.quascirev.2014.09.007): 12,900 − 11,700 = 1,200.
  const rulesOn = async (text: string, figure: string): Promise<string[]> => {
    const report = await checkText(text, { packs, path: 'x.md' });
    const at = text.indexOf(figure);
    return report.claims.flatMap((c) => c.flags).filter((f) => f.span.start.offset <= at && at < f.span.end.offset).map((f) => f.ruleId).sort();
  };

  it('a span its own start and end contradict is an arithmetic flag alone', async () => {
    const text = 'As the ice melted, the north plunged back into cold, starting about 12,900 years ago. We call it the Younger Dryas. It ended 11,700 years ago, so it lasted some 2,200 years.\n';
    expect(await rulesOn(text, 'some 2,200 years')).toEqual(['arith.duration']);
  });
  it('the right span stays clean', async () => {
    const text = 'As the ice melted, the north plunged back into cold, starting about 12,900 years ago. We call it the Younger Dryas. It ended 11,700 years ago, so it lasted some 1,200 years.\n';
    expect(await rulesOn(text, 'some 1,200 years')).toEqual([]);
  });
});
