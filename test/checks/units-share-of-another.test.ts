/**
 * A percentage of a named whole that is not the air (session 10, false flags of unit.percent-ppm):
 * "a rise of 90 ppm, about 47 percent of the starting value" gives a share of another figure, not the
 * 90 ppm again in percent; "420 ppm, or 0.42 percent of the air" is still a restatement, and a slip
 * (1% of the air = 10,000 ppm, so 420 ppm is 0.042 percent: NIST SP 811 for the SI convention, common
 * practice for ppm by volume). Sentences of our own.
 */
import { describe, expect, it } from 'vitest';
import { checkText } from '../../src/engine.js';
import { loadPacks } from '../../src/rulepack/index.js';

const packs = await loadPacks([]);

async function rulesOnLast(text: string): Promise<string[]> {
  const result = await checkText(text, { path: 'draft.txt', packs });
  const last = text.split('\n').length;
  return result.flags.filter((f) => f.span.start.line === last && (f.level === 'error' || f.level === 'warning')).map((f) => f.ruleId);
}

const LEAD = 'Worked examples for the class.\nFirst: from 21,000 years ago to 11,700 years ago is 9,300 years.\n';

describe('a share of another figure', () => {
  // Both were flagged before: 90 ppm read as restated in percent of the air.
  it.each([
    'Second: carbon dioxide going from 180 ppm to 270 ppm is a rise of 90 ppm, about 50 percent of the starting value.',
    'Second: CO2 went from 190 ppm to 280 ppm, a rise of 90 ppm, which is about 47 percent of where it began.',
  ])('leaves clean: %s', async (line) => {
    expect(await rulesOnLast(LEAD + line)).not.toContain('unit.percent-ppm');
  });
});

describe('a share of the air', () => {
  it.each([
    'Carbon dioxide today stands at 420 ppm, or 0.42 percent of the air.',
    'CO2 rose 90 ppm, which is 0.9 percent of the atmosphere.',
    'At 420 ppm, CO2 makes up 4.2 percent of the air we breathe.',
    "Carbon dioxide today stands at 420 ppm, or 0.42 percent of the atmosphere's molecules.",
  ])('flags %s', async (sentence) => {
    expect(await rulesOnLast(sentence)).toContain('unit.percent-ppm');
  });
});
