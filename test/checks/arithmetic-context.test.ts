import { describe, expect, it } from 'vitest';
import { checkArithmetic } from '../../src/checks/arithmetic.js';
import { parseQuantities } from '../../src/quantities/index.js';

/** Checks `sentence` with `before` as the one sentence ahead of it in the paragraph. */
const check = (before: string, sentence: string) => checkArithmetic(sentence, parseQuantities(sentence), [before]);

// A change whose start stands in the sentence before: [earlier sentence, sentence, flagged text,
// correction, earlier value named in the reason]. The right values are the two sentences' own
// numbers worked by hand: 280 − 190 = 90; 415 − 280 = 135; 9 − 4 = 5; 300 − 120 = 180; 250 − 200 = 50; 265 − 185 = 80.
const WRONG: [string, string, string, string, string][] = [
  ['At the last glacial maximum CO2 stood near 190 ppm.', 'By the start of the Holocene it had climbed to about 280 ppm, a rise of 110 ppm.', '110 ppm', '90 ppm', '190 ppm'],
  ['The Kettlewood museum panel puts pre-industrial CO2 at 280 ppm.', 'Since then it has reached 415 ppm, an increase of 100 ppm.', '100 ppm', '135 ppm', '280 ppm'],
  ['Midges in the Tarnhollow cores give a July air temperature of 4 °C for the cold spell.', 'By then it had warmed to 9 °C, a rise of 3 °C.', '3 °C', '5 °C', '4 °C'],
  ['The Orrin glacier was 300 m thick at its last advance, says the Saltmarsh Society newsletter.', 'By the start of the Holocene it had thinned to 120 m, a loss of 150 m.', '150 m', '180 m', '300 m'],
  ['In the Lowfold cores CO2 sits at 185 ppm through the coldest millennia.', 'By the close of the deglaciation CO2 had risen to 265 ppm, a rise of 100 ppm.', '100 ppm', '80 ppm', '185 ppm'],
  ['The Fenbridge team reads 200 ppm in the oldest layer.', 'Later it reached 250 ppm, 70 ppm more.', '70 ppm', '50 ppm', '200 ppm'],
];

// Never flagged: right sums, and look-alikes where the earlier number is not the start.
const RIGHT: [string, string, string][] = [
  ['right sum', 'At the last glacial maximum CO2 stood near 190 ppm.', 'By the start of the Holocene it had climbed to about 280 ppm, a rise of 90 ppm.'],
  ['right sum, hedged change', 'The Kettlewood museum panel puts pre-industrial CO2 at 280 ppm.', 'Since then it has reached 415 ppm, an increase of about 135 ppm.'],
  ['right sum, temperature', 'Midges in the Tarnhollow cores give a July air temperature of 4 °C for the cold spell.', 'By then it had warmed to 9 °C, a rise of 5 °C.'],
  ['different units (ppb after ppm)', 'At the last glacial maximum CO2 stood near 190 ppm.', 'By then it had climbed to 700 ppb, a rise of 350 ppb.'],
  ['different units (°F after °C)', 'Midges in the Tarnhollow cores give a July air temperature of 4 °C.', 'By then it had warmed to 50 °F, a rise of 5 °F.'],
  ['two levels in the earlier sentence', 'CO2 stood near 190 ppm at the glacial maximum and 260 ppm early in the Holocene.', 'By then it had climbed to 280 ppm, a rise of 20 ppm.'],
  ['no back-reference', 'At the last glacial maximum CO2 stood near 190 ppm.', 'The Orrin Hall display says CO2 climbed to 280 ppm, a rise of 40 ppm.'],
  ['"by the end of" with no change stated', 'In the Lowfold cores CO2 sits at 185 ppm through the coldest millennia.', 'By the end of the deglaciation CO2 had risen to 265 ppm.'],
  ['a change of something else', 'At the last glacial maximum CO2 stood near 190 ppm.', 'By then methane had climbed to 600 ppm, a rise of 100 ppm.'],
  ['a change of something else, same unit', 'In the Saltmarsh Society newsletter, the ice over the bay was 900 m thick.', 'By then the sea had risen to -40 m, a rise of 80 m.'],
  ['the earlier number is itself a change', 'Over the thaw CO2 rose by 90 ppm.', 'By then it had reached 280 ppm, a rise of 50 ppm.'],
  ['no end value, only a change', 'At the last glacial maximum CO2 stood near 190 ppm.', 'Since then it has gone up by 230 ppm.'],
  ['the start is in this sentence', 'At the last glacial maximum CO2 stood near 190 ppm.', 'By then it had climbed from 200 to 280 ppm, a rise of 80 ppm.'],
  ['a level without "to" or "reached"', 'At the last glacial maximum CO2 stood near 190 ppm.', 'By then it was 280 ppm, a rise of 40 ppm over the ice age.'],
];

describe('checkArithmetic across two sentences', () => {
  it.each(WRONG)('%s / %s: flags %s, corrects to %s', (before, sentence, flagged, correction, earlier) => {
    const flags = check(before, sentence);
    expect(flags).toHaveLength(1);
    const [flag] = flags;
    expect(flag?.ruleId).toBe('arith.change');
    expect(sentence.slice(flag?.start, flag?.end)).toBe(flagged);
    expect(flag?.start).toBe(sentence.lastIndexOf(flagged));
    expect(flag?.correction).toBe(correction);
    expect(flag?.reason).toContain(`from ${earlier} in the sentence before`);
    expect(flag?.reason).toMatch(/^By the paragraph's own numbers/u);
  });

  it.each(RIGHT)('leaves alone: %s', (_why, before, sentence) => {
    expect(check(before, sentence)).toEqual([]);
  });

  it('reads only the last sentence of the context', () => {
    const sentence = 'By the start of the Holocene it had climbed to about 280 ppm, a rise of 110 ppm.';
    const older = 'At the last glacial maximum CO2 stood near 190 ppm.';
    expect(checkArithmetic(sentence, parseQuantities(sentence), [older, 'The Orrin Hall cores were drilled in a dry summer.'])).toEqual([]);
  });

  it('gives the exact flag for the opening example', () => {
    const before = 'At the last glacial maximum CO2 stood near 190 ppm.';
    const sentence = 'By the start of the Holocene it had climbed to about 280 ppm, a rise of 110 ppm.';
    // "110" is read to the nearest ten (105–115); 280 − 190 written to the nearest ten is 80–100:
    // disjoint by 5, less than the two widths (10 + 20), so a warning.
    const [flag] = check(before, sentence);
    expect(flag).toMatchObject({
      level: 'warning',
      start: 72,
      end: 79,
      reason: "By the paragraph's own numbers, the change from 190 ppm in the sentence before to about 280 ppm is 90 ppm, not 110 ppm.",
      claimed: { text: '110 ppm', low: 105, high: 115, unit: 'ppm' },
      reference: { text: '90 ppm', unit: 'ppm' },
    });
  });

  it('keeps the one-sentence checks as they were when given no context', () => {
    const sentence = 'CO2 rose from 180 to 280 ppm at the end of the ice age, a rise of 120 ppm.';
    expect(checkArithmetic(sentence, parseQuantities(sentence), ['At the last glacial maximum CO2 stood near 190 ppm.'])).toEqual(checkArithmetic(sentence, parseQuantities(sentence)));
  });
});
