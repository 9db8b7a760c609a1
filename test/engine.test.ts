import { describe, expect, it } from 'vitest';
import { checkText } from '../src/engine.js';

describe('checkText (the library entry point)', () => {
  it('gives one explanation per number: a subtraction error wins over a value out of range', async () => {
    // 280 − 190 = 90 ppm; the deglacial CO2 rise was 70–90 ppm (Monnin et al. 2001, Science 291,
    // 112-114, doi 10.1126/science.291.5501.112), so "50 ppm" is wrong twice over: say it once.
    const result = await checkText('Across the last deglaciation, CO2 rose from 190 to 280 ppm, a rise of 50 ppm.');
    const onFifty = result.flags.filter((f) => f.excerpt.includes('50 ppm'));
    expect(onFifty.map((f) => f.ruleId)).toEqual(['arith.change']);
    expect(onFifty[0]?.correction).toContain('90');
    expect(result.claims[0]?.verdict).toBe('conflicts');
  });

  it('finds nothing in text that never mentions the subject, without parsing it', async () => {
    const result = await checkText('The café closes early on Thursday.');
    expect(result).toMatchObject({ claims: [], flags: [], skipped: [{ file: '-', reason: 'names no subject of the packs' }] });
  });

  it('reads plain text when asked, with positions in the original', async () => {
    // EPICA Dome C spans about 800,000 years (Jouzel et al. 2007, doi 10.1126/science.1141038).
    const result = await checkText('Notes\r\n\r\nThe EPICA Dome C record covers 400,000 years.\r\n', { path: 'notes.txt' });
    const flag = result.flags.find((f) => f.ruleId === 'value.edc-record-span');
    expect(flag?.span.start).toEqual({ line: 3, column: 32, offset: 40 });
    expect(flag?.file).toBe('notes.txt');
  });

  it("checks a sentence's own arithmetic even when it names no subject, in a draft that is on topic", async () => {
    // 12,900 − 11,700 = 1,200 years (common practice: subtraction); the Younger Dryas lasted about
    // 1,200 years (Rasmussen et al. 2006, GICC05; REFERENCE-VALUES younger-dryas-duration).
    const text = 'The Younger Dryas was a cold return in the last deglaciation.\n\nIt ran from about 12,900 to 11,700 years ago: a cold spell of some 2,000 years.\n';
    const result = await checkText(text);
    const flag = result.flags.find((f) => f.ruleId === 'arith.duration');
    expect(flag?.span.start.line).toBe(3);
    expect(flag?.correction).toContain('1,200');
  });

  it('does not turn an off-topic sentence with correct arithmetic into a claim', async () => {
    const text = 'CO2 and the ice ages.\n\nThe gallery was open from 1990 to 2000, ten years in all.\n';
    const result = await checkText(text);
    expect(result.claims.map((c) => c.text)).toEqual([]);
  });
});
