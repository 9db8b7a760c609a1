import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { INTERVAL_RULES, parseQuantities, renderIntervalTable } from '../../src/quantities/index.js';

const DOC = new URL('../../docs/quantities.md', import.meta.url);
const README = new URL('../../README.md', import.meta.url);

describe('the interval table', () => {
  it('is shown in docs/quantities.md exactly as the code has it', () => {
    const doc = readFileSync(DOC, 'utf8');
    const between = /<!-- interval-table:start -->\n([\s\S]*?)\n<!-- interval-table:end -->/.exec(doc);
    expect(between?.[1]).toBe(renderIntervalTable());
  });

  it('is shown in the README exactly as the code has it, so an editor sees why a number was judged', () => {
    const readme = readFileSync(README, 'utf8');
    const between = /<!-- interval-table:start -->\n([\s\S]*?)\n<!-- interval-table:end -->/.exec(readme);
    expect(between?.[1]).toBe(renderIntervalTable());
  });

  it('has one row per id, and every hedge word belongs to one row only', () => {
    const ids = INTERVAL_RULES.map((r) => r.id);
    expect(new Set(ids).size).toBe(ids.length);
    const words = INTERVAL_RULES.filter((r) => r.kind === 'hedge').flatMap((r) => r.words.map((w) => w.toLowerCase()));
    expect(new Set(words).size).toBe(words.length);
  });

  // Each row at work on one written number: [sentence, quantity text, low, high] in canonical units.
  const ROWS: [string, string, string, number, number][] = [
    ['precision', 'The core holds 420,000 years.', '420,000 years', 415000, 425000],
    ['precision', 'It was 0.5 °C warmer.', '0.5 °C', 0.45, 0.55],
    ['calendar-year', 'The rise began in 1750.', '1750', 199.5, 200.5],
    ['plus-minus', 'It was 9 ± 1 °C colder.', '9 ± 1 °C', 8, 10],
    ['plus-minus', 'The swing was 90 ppm, give or take 10.', '90 ppm, give or take 10', 80, 100],
    ['range', 'Peaks reached 280–300 ppm.', '280–300 ppm', 280, 300],
    ['range', 'It took six or seven thousand years.', 'six or seven thousand years', 6000, 7000],
    ['multiplier-word', 'Dust rose threefold.', 'threefold', 2.85, 3.15],
    ['plural-magnitude', 'It took thousands of years.', 'thousands of years', 2000, 10000],
    ['a-few', 'It took a few centuries.', 'a few centuries', 200, 500],
    ['a-couple', 'It took a couple of millennia.', 'a couple of millennia', 2000, 3000],
    ['a-couple', 'Summers ran a couple degrees warmer.', 'a couple degrees', 2, 3],
    ['several', 'It took several millennia.', 'several millennia', 3000, 7000],
    ['about', 'It spans about 420,000 years.', 'about 420,000 years', 404500, 435500], // 420,000 ± (5,000 + 2.5% of 420,000)
    ['nearly', 'It spans nearly 100,000 years.', 'nearly 100,000 years', 92500, 100000],
    ['just-over', 'It holds just over 400 ppm.', 'just over 400 ppm', 400, 415],
    ['just-over', 'It comes to a little over one ppm per century.', 'a little over one ppm per century', 0.01, 0.01525],
    ['nearly', 'The shelf is a little under 1,000 feet thick.', 'a little under 1,000 feet', 281.94, 304.8],
    ['more-than', 'It spans more than 800,000 years.', 'more than 800,000 years', 800000, 1200000],
    ['at-least', 'It spans at least 800,000 years.', 'at least 800,000 years', 800000, 1600000],
    ['up-to', 'It swung up to 15 °C.', 'up to 15 °C', 7.5, 15],
    ['less-than', 'It was less than 300 ppm.', 'less than 300 ppm', 0, 300],
  ];
  it.each(ROWS)('row %s: %s', (_row, sentence, text, low, high) => {
    const [q] = parseQuantities(sentence);
    expect(q?.text).toBe(text);
    expect(q?.low).toBeCloseTo(low, 9);
    expect(q?.high).toBeCloseTo(high, 9);
  });
});
