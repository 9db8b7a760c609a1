/**
 * Control characters in report data are shown as their pictures from the Unicode Control Pictures
 * block (U+2400-U+243F: U+241B SYMBOL FOR ESCAPE, U+2407 SYMBOL FOR BELL; The Unicode Standard, code
 * chart U2400), so a file name or message cannot drive the terminal.
 */
import { describe, expect, it } from 'vitest';
import { visibleData } from '../../src/guard/visible-text.js';

describe('report data made visible', () => {
  it('gives back data with no control character as it is, not copied', () => {
    const data = { files: ['notes/ice.md'], flags: [{ message: 'The draft gives 204 ppm.\nSee below.', span: { start: { line: 3 } } }] };
    expect(visibleData(data)).toBe(data);
  });

  it('copies only what holds a control character, and leaves the data given alone', () => {
    const clean = { message: 'Sea level fell 120 m.' };
    const data = { files: ['a\u001b[31m.md', 'b.md'], flags: [clean, { message: 'bell\u0007 here' }] };
    const shown = visibleData(data);
    expect(shown).toEqual({ files: ['a\u241b[31m.md', 'b.md'], flags: [clean, { message: 'bell\u2407 here' }] });
    expect(shown.flags[0]).toBe(clean);
    expect(data.files[0]).toBe('a\u001b[31m.md');
    expect(data.flags[1]).toEqual({ message: 'bell\u0007 here' });
  });

  it('shows a file name\'s newline but keeps a message\'s', () => {
    expect(visibleData({ file: 'two\nlines.md', message: 'two\nlines' })).toEqual({ file: 'two\u240alines.md', message: 'two\nlines' });
  });
});
