import { describe, it, expect } from 'vitest';
import { draftFromText, readMarkdownBlocks, readPlainTextBlocks } from '../../src/source/index.js';
import { checkText } from '../../src/index.js';
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

describe('readPlainTextBlocks: a pipe table pasted into plain text', () => {
  // The GFM table form (header row, delimiter row, rows), read as a Markdown draft reads it: each
  // data cell with its row and column headers (common practice of posts and panel texts).
  const text = 'Which core reaches furthest?\n| Core | Reaches back |\n|---|---|\n| Vostok | 420,000 years |\n| Dome Fuji | 720,000 years |\nAfter the table.';
  const blocks = readPlainTextBlocks(text);

  it('reads the table as a Markdown draft does, each data cell with its headers, at its own place', () => {
    const table = text.slice(text.indexOf('| Core'), text.indexOf('\nAfter'));
    const markdown = readMarkdownBlocks(table).map((b) => b.text);
    expect(markdown).toContain('Vostok, Reaches back: 420,000 years');
    expect(blocks.map((b) => b.text)).toEqual(['Which core reaches furthest?', ...markdown, 'After the table.']);
    const vostok = blocks.find((b) => b.text.startsWith('Vostok,'));
    const at = vostok?.text.indexOf('420,000') ?? -1;
    expect(text.slice(vostok?.offsets[at], (vostok?.offsets[at] ?? 0) + 7)).toBe('420,000');
  });

  it('leaves lines with pipes but no delimiter row as plain text', () => {
    expect(readPlainTextBlocks('CO2 | 280 ppm | before 1750\nCO2 | 424 ppm | in 2024').map((b) => b.text)).toEqual(['CO2 | 280 ppm | before 1750\nCO2 | 424 ppm | in 2024']);
  });
});

describe('checkText: a pipe table in a plain-text draft keeps each figure with its row', () => {
  // Record spans: EPICA Dome C about 800,000 years (Jouzel et al. 2007, Science 317,
  // doi:10.1126/science.1141038), Vostok about 420,000 years (Petit et al. 1999, Nature 399, doi:10.1038/20859).
  const table = (edc: string, vostok: string) =>
    `Reach of the deep cores\n\n| Core | Site | Record reaches back |\n|---|---|---|\n| EPICA Dome C | East Antarctica | ${edc} |\n| Vostok | East Antarctica | ${vostok} |\n`;
  const serious = async (text: string) => (await checkText(text, { path: 'panel.txt' })).flags.filter((f) => f.level !== 'note').map((f) => [f.ruleId, f.excerpt]);

  it('the right spans flag nothing', async () => {
    expect(await serious(table('about 800,000 years', 'about 420,000 years'))).toEqual([]);
  });

  it('swapped spans are flagged, each against its own row', async () => {
    expect(await serious(table('about 420,000 years', 'about 800,000 years'))).toEqual([
      ['value.edc-record-span', 'about 420,000 years'],
      ['value.vostok-record-span', 'about 800,000 years'],
    ]);
  });
});
