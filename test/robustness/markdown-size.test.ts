/**
 * Markdown size (ROBUSTNESS-REPORT B8, B9, B10, B11, B14 for `.md` drafts): the parse is linear in
 * the file's length. Plain runs of text are merged in one pass (micromark-linear-text.ts); a table
 * is read row by row; a paragraph whose marks would make the inline pass quadratic, or a file
 * larger than the Markdown limit, is one clear line with its place and exit 2. Bounds are asserted
 * by counts (elements moved, limits), never by time; `npm run bench` times the growth.
 */
import { describe, expect, it } from 'vitest';
import { checkMarkdownLimits, MAX_MARKDOWN_BYTES, MAX_PARAGRAPH_WORK } from '../../src/source/markdown-limits.js';
import { readMarkdownBlocks } from '../../src/source/markdown.js';
import type { FirnlineError } from '../../src/errors.js';
import { expectUserError, folderWith, runCli } from './helpers.js';
import { spliceWork } from '../source/splice-work.js';

const VOSTOK = 'The Vostok core spans 800,000 years of CO2 history.';
const table = (rows: number) => `| Core | Span | Note |\n|---|---|---|\n${Array.from({ length: rows }, (_, i) => `| Site ${i} | ${i} years | *rota* [${i}] |`).join('\n')}\n`;

const thrown = (work: () => void): FirnlineError | undefined => {
  try {
    work();
    return undefined;
  } catch (error) {
    return error as FirnlineError;
  }
};

describe('tables (B14)', () => {
  it('a 20,000-row table is within the limits: it is read row by row', () => {
    expect(thrown(() => checkMarkdownLimits(table(20_000), 't.md'))).toBeUndefined();
  });

  it('the work of parsing a table grows linearly with its rows', () => {
    const small = spliceWork(() => readMarkdownBlocks(table(500)));
    const large = spliceWork(() => readMarkdownBlocks(table(1_000)));
    expect(large / small).toBeLessThan(2.5);
  });

  it('every cell of a long table is still read', () => {
    expect(readMarkdownBlocks(table(2_000)).filter((b) => b.kind === 'table-cell')).toHaveLength(3 * 2_001);
  });
});

describe('long paragraphs (B9, B11)', () => {
  it('a 200 KB paragraph of plain prose is within the limits (its parse is linear)', () => {
    const prose = Array.from({ length: 5_000 }, (_, i) => `Line ${i} of the volunteer rota was updated.`).join('\n');
    expect(prose.length).toBeGreaterThan(180_000);
    expect(thrown(() => checkMarkdownLimits(prose, 'p.md'))).toBeUndefined();
  });

  it('a paragraph dense with emphasis marks and brackets is refused at its first line, and the other drafts are checked', async () => {
    const dense = Array.from({ length: 20_000 }, (_, i) => `Vostok site *${i}* has ${i}] marks.`).join(' ');
    const dir = await folderWith({ 'dense.md': `# Notes\n\nAn opening paragraph.\n\n${dense}\n`, 'ok.md': `${VOSTOK}\n` });
    const run = await runCli(['check', '.', '--format', 'json'], dir);
    expectUserError(run, /^dense\.md:5:1: a paragraph too long and too dense with marks \([\d,]+ of \* _ \] ! \\ ~ in [\d,]+ characters\) for Firnline to read as Markdown in bounded time; add blank lines between its paragraphs/u);
    expect((JSON.parse(run.stdout) as { files: string[] }).files).toEqual(['ok.md']);
  });

  it('the same marks spread over paragraphs, or inside fenced code, are within the limits', () => {
    const paragraphs = Array.from({ length: 20_000 }, (_, i) => `Site *${i}* has ${i}] marks.`).join('\n\n');
    expect(thrown(() => checkMarkdownLimits(paragraphs, 'p.md'))).toBeUndefined();
    const code = `\`\`\`\n${'*_]!'.repeat(50_000)}\n\`\`\`\n`;
    expect(thrown(() => checkMarkdownLimits(code, 'c.md'))).toBeUndefined();
  });

  it('a table row dense with marks is refused as a row', () => {
    const row = `| ${'*a* ]'.repeat(20_000)} | b |`;
    const error = thrown(() => checkMarkdownLimits(`| x | y |\n|---|---|\n| 1 | 2 |\n${row}\n`, 't.md'));
    expect(error?.toLine()).toMatch(/^t\.md:4:1: a table row too long and too dense with marks/u);
  });

  it('a line that only looks like a delimiter row does not exempt a paragraph', () => {
    // Two header cells against three delimiter cells: GFM forms no table (GFM spec, "Tables (extension)").
    const lines = ['a | b', '-|-|-', ...Array.from({ length: 20_000 }, (_, i) => `Site *${i}* has ${i}] marks.`)].join('\n');
    expect(thrown(() => checkMarkdownLimits(lines, 'p.md'))?.code).toBe('draft-too-large');
  });

  it('the bound is a product of length and marks, and real paragraphs stay far below it', () => {
    // A long paragraph of a real feature: about 3,000 characters with 20 emphasis marks (common practice).
    expect(3_000 * 20).toBeLessThan(MAX_PARAGRAPH_WORK / 100);
  });
});

describe('the Markdown file limit (B8, B10)', () => {
  it(`a Markdown draft over ${MAX_MARKDOWN_BYTES / 1024 / 1024} MiB is refused by name before the parse`, async () => {
    const paragraph = `${VOSTOK}\n\n`;
    const dir = await folderWith({ 'big.md': paragraph.repeat(Math.ceil((MAX_MARKDOWN_BYTES + 1) / paragraph.length)), 'ok.md': `${VOSTOK}\n` });
    const run = await runCli(['check', '.', '--format', 'json'], dir);
    expectUserError(run, /^big\.md: larger than 2 MiB, the most Firnline reads as Markdown from one file; split it into several files/u);
    expect((JSON.parse(run.stdout) as { files: string[] }).files).toEqual(['ok.md']);
  });

  it('the same text as a plain-text draft is read (plain text has the 16 MiB file limit)', () => {
    const text = `${VOSTOK}\n\n`.repeat(Math.ceil((MAX_MARKDOWN_BYTES + 1) / 53));
    expect(thrown(() => checkMarkdownLimits(text.slice(0, 1_000), 'small.md'))).toBeUndefined();
    expect(thrown(() => checkMarkdownLimits(text, 'big.md'))?.code).toBe('draft-too-large');
  });
});
