import { describe, it, expect } from 'vitest';
import { draftFromText, readPlainTextBlocks } from '../../src/source/index.js';
import { locate, proseOf } from './locate.js';

// Plain text: paragraphs are separated by blank lines (common practice); line ends as CommonMark
// 0.31.2 §2.1 defines them. Positions are [line, column, offset], columns and offsets in code points.
const REPORT = 'Lake Orrin team notes\n\nThe core reached\t3,270 m.\n   \nCO₂ rose 🧊 by 100 ppm.\n';

describe('readPlainTextBlocks', () => {
  it('splits on blank and whitespace-only lines, trimming each paragraph', () => {
    expect(readPlainTextBlocks(REPORT)).toEqual([
      { kind: 'text', text: 'Lake Orrin team notes', offsets: [...range(0, 22)], heading: '' },
      { kind: 'text', text: 'The core reached\t3,270 m.', offsets: [...range(23, 49)], heading: '' },
      { kind: 'text', text: 'CO₂ rose 🧊 by 100 ppm.', offsets: [...range(53, 77)], heading: '' },
    ]);
  });

  it.each([
    { name: 'LF', text: REPORT, start: [5, 15, 67] },
    { name: 'CRLF (each earlier line end adds one to the offset)', text: REPORT.replaceAll('\n', '\r\n'), start: [5, 15, 71] },
    { name: 'lone CR', text: REPORT.replaceAll('\n', '\r'), start: [5, 15, 67] },
  ])('maps a word after an emoji back to its place: $name', ({ text, start }) => {
    const found = locate(draftFromText('notes.txt', text, 'text'), '100 ppm');
    expect(found.start).toEqual({ line: start[0], column: start[1], offset: start[2] });
    expect(found.original).toBe('100 ppm');
  });

  it('turns a line end inside a paragraph into one \\n mapped to its first unit', () => {
    const [block] = readPlainTextBlocks('Ice\r\nage\rends');
    expect(block?.text).toBe('Ice\nage\nends');
    expect(block?.offsets).toEqual([0, 1, 2, 3, 5, 6, 7, 8, 9, 10, 11, 12, 13]);
  });

  it('keeps a leading byte-order mark out of the prose', () => {
    expect(readPlainTextBlocks('\ufeffFirn\n\n  \n')).toEqual([{ kind: 'text', text: 'Firn', offsets: [1, 2, 3, 4, 5], heading: '' }]);
  });

  it('reads Markdown markup in a text file as plain characters', () => {
    expect(proseOf(draftFromText('notes.txt', '# Not a *heading*', 'text'))).toEqual(['# Not a *heading*']);
  });

  it('finds no blocks in empty or blank text', () => {
    expect(readPlainTextBlocks('')).toEqual([]);
    expect(readPlainTextBlocks(' \n\t\r\n')).toEqual([]);
  });
});

function range(from: number, to: number): number[] {
  return Array.from({ length: to - from }, (_, i) => from + i);
}
