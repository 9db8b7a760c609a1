/**
 * Unit slips read from what a figure measures rather than from a phrasing (session 19): a hedge
 * written "like" as people write it in public ("co2 is like 0.04 ppm"), and the age of ice itself
 * (its own age, or the span of history it holds) written in millions where thousands were meant.
 * Every sentence is our own; each wrong one has a right twin that must stay clean.
 */
import { describe, expect, it } from 'vitest';
import { checkText } from '../../src/engine.js';
import { loadPacks } from '../../src/rulepack/index.js';

const packs = await loadPacks([]);
const OPENING = 'Ice cores show CO2 and temperature rising and falling together through the ice ages.\n\n';

/** The rule ids and corrections of every flag on the draft's last line. */
async function flagsOf(text: string): Promise<{ rule: string; correction: string }[]> {
  const result = await checkText(text, { path: 'draft.txt', packs });
  const last = text.split('\n').length;
  return result.flags.filter((f) => f.span.start.line === last).map((f) => ({ rule: f.ruleId, correction: f.correction ?? '' }));
}

describe('"like" before a figure is a hedge, as "about" is', () => {
  // CO2 is about 420 ppm today, 0.042% of the air (NOAA 2024); 1% = 10,000 ppm (NIST SP 811).
  it('reads "like 0.04 ppm" of the air as a percentage written in ppm', async () => {
    const flags = await flagsOf(`${OPENING}honestly carbon dioxide is like 0.04 ppm of the whole atmosphere`);
    expect(flags.map((f) => f.rule)).toContain('unit.percent-ppm');
    expect(flags.find((f) => f.rule === 'unit.percent-ppm')?.correction).toContain('0.04%');
  });
  it('reads "something like 4 percent" of the air as a share far above any level', async () => {
    const flags = await flagsOf(`${OPENING}the CO2 in the air is something like 4 percent of the air these days`);
    expect(flags.map((f) => f.rule)).toContain('unit.percent-ppm');
  });
  it('leaves a right share hedged with "like" clean', async () => {
    expect(await flagsOf(`${OPENING}honestly carbon dioxide is like 0.04 percent of the whole atmosphere`)).toEqual([]);
  });
  it('leaves "like" as a verb before a count clean', async () => {
    expect(await flagsOf(`${OPENING}I would like 3 copies of the CO2 poster for the school.`)).toEqual([]);
  });
});

describe('the age of ice itself, in millions where thousands were meant', () => {
  // No ice on Earth is older than the first lasting Antarctic ice sheet, about 34 million years ago
  // (Zachos et al. 2001); the oldest dated ice is about 2.7 million years old (Yan et al. 2019).
  const WRONG = [
    'Greenland ice holds some 120 million years of weather.',
    'A visitor asked whether the blue ice by the door could really be 600 million years old.',
    'Bubbles sealed in Antarctic ice keep a record of the air spanning about 800 million years.',
  ];
  const RIGHT = [
    'Greenland ice holds some 120 thousand years of weather.',
    'A visitor asked whether the blue ice by the door could really be 600,000 years old.',
    // Deep-time ice ages and the ice sheet's own birth keep their millions (Zachos et al. 2001, from memory).
    'Antarctica has been covered by an ice sheet for about 34 million years.',
    'The ice ages of the Cryogenian, some 700 million years ago, were far harsher.',
    'Snowball Earth episodes left ice near the equator around 650 million years ago.',
    'The first ice age we know of struck about 2,400 million years ago.',
  ];
  it.each(WRONG)('flags %s', async (line) => {
    const flags = await flagsOf(`${OPENING}${line}`);
    expect(flags.map((f) => f.rule)).toContain('unit.age-scale');
    expect(flags.find((f) => f.rule === 'unit.age-scale')?.correction).toContain('thousand');
  });
  it.each(RIGHT)('leaves clean: %s', async (line) => {
    expect((await flagsOf(`${OPENING}${line}`)).filter((f) => f.rule.startsWith('unit.'))).toEqual([]);
  });
});

describe('a conversion told with the verb "convert"', () => {
  // 1 ft = 0.3048 m exactly (NIST SP 811): 90 m is about 295 ft, not 90 ft or 200 ft.
  it('checks the figure after "converts to" against the one before', async () => {
    const flags = await flagsOf(`${OPENING}For readers in the States, a 90 m drop in the ocean converts to about 200 feet.`);
    expect(flags.map((f) => f.rule)).toContain('unit.length');
    expect(flags.find((f) => f.rule === 'unit.length')?.correction).toContain('295');
  });
  it('checks the figure after "converted into"', async () => {
    const flags = await flagsOf(`${OPENING}The hole reached 2,000 m, converted into roughly 2,000 feet for the American edition.`);
    expect(flags.map((f) => f.rule)).toContain('unit.length');
  });
  it('leaves a right conversion clean', async () => {
    expect((await flagsOf(`${OPENING}For readers in the States, a 90 m drop in the ocean converts to about 295 feet.`)).filter((f) => f.rule.startsWith('unit.'))).toEqual([]);
  });
});

describe('a change converted as a reading', () => {
  // A change of C degrees Celsius is 1.8 × C degrees Fahrenheit; the 32 belongs to readings (NIST SP 811).
  it('reads a bare number followed by "in fahrenheit" on that scale', async () => {
    const flags = await flagsOf(`${OPENING}so 5 degrees C of warming comes out at 41 in fahrenheit`);
    expect(flags.map((f) => f.rule)).toContain('unit.temperature-difference');
    expect(flags.find((f) => f.rule === 'unit.temperature-difference')?.correction).toContain('9');
  });
  it('leaves the right change "in fahrenheit" clean', async () => {
    expect((await flagsOf(`${OPENING}so 5 degrees C of warming comes out at 9 in fahrenheit`)).filter((f) => f.rule.startsWith('unit.'))).toEqual([]);
  });
  it('reads a figure after a change noun such as "jump" or "plunge" as a change', async () => {
    const flags = await flagsOf(`${OPENING}The plunge at the onset of the cold spell was about 5 °C over a century, which is 41 °F on the other scale.`);
    expect(flags.map((f) => f.rule)).toContain('unit.temperature-difference');
  });
  it('leaves a reading converted as a reading clean', async () => {
    expect((await flagsOf(`${OPENING}The summer at the coring camp was about 5 °C at noon, which is 41 °F on the other scale.`)).filter((f) => f.rule.startsWith('unit.'))).toEqual([]);
  });
});

describe('a CO2 share the air holds, its gas named by the passage', () => {
  // CO2 is about 420 ppm today, 0.042% of the air (NOAA 2024); 1% = 10,000 ppm (NIST SP 811).
  it('flags a share the air holds of "it", the gas of the sentence before', async () => {
    const flags = await flagsOf(`${OPENING}People say carbon dioxide warms the planet.\nYet the modern atmosphere contains a tiny 0.4 percent of it.`);
    expect(flags.map((f) => f.rule)).toContain('unit.percent-ppm');
    expect(flags.find((f) => f.rule === 'unit.percent-ppm')?.correction).toContain('0.04');
  });
  it('flags a level stated as a percentage after lines on CO2 in ppm', async () => {
    const flags = await flagsOf(`${OPENING}at the glacial low CO2 was about 185 ppm\nand the current level is 0.42% isn't it`);
    expect(flags.map((f) => f.rule)).toContain('unit.percent-ppm');
  });
  it('leaves the right shares clean', async () => {
    expect((await flagsOf(`${OPENING}People say carbon dioxide warms the planet.\nYet the modern atmosphere contains a tiny 0.04 percent of it.`)).filter((f) => f.rule.startsWith('unit.'))).toEqual([]);
    expect((await flagsOf(`${OPENING}at the glacial low CO2 was about 185 ppm\nand the current level is 0.042% isn't it`)).filter((f) => f.rule.startsWith('unit.'))).toEqual([]);
  });
  it('leaves another gas the air holds alone', async () => {
    expect((await flagsOf(`${OPENING}People say carbon dioxide warms the planet.\nYet the air holds about 21 percent of oxygen.`)).filter((f) => f.rule.startsWith('unit.'))).toEqual([]);
  });
});
