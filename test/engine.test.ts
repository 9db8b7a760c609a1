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
    expect(result).toMatchObject({ claims: [], flags: [], skipped: [{ file: '-', reason: 'no topic term' }] });
  });

  it('reads plain text when asked, with positions in the original', async () => {
    // EPICA Dome C spans about 800,000 years (Jouzel et al. 2007, doi 10.1126/science.1141038).
    const result = await checkText('Notes\r\n\r\nThe EPICA Dome C record covers 400,000 years.\r\n', { path: 'notes.txt' });
    const flag = result.flags.find((f) => f.ruleId === 'value.edc-record-span');
    expect(flag?.span.start).toEqual({ line: 3, column: 32, offset: 40 });
    expect(flag?.file).toBe('notes.txt');
  });
});
