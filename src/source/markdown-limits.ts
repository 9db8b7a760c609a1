/**
 * Size bounds on a Markdown draft, checked on the raw text before the parser sees it.
 *
 * The Markdown parser (micromark) keeps every event of a file in memory at once, about 1 KB per
 * byte of a table, and its inline pass scans or shifts the whole of a paragraph once per emphasis
 * mark or unmatched bracket, so its time grows with the square of a paragraph's length (32,000
 * `*marked*` words in one paragraph took 37 s; measured on the shared 2-core machine). Runs of
 * plain text are linear already (micromark-linear-text.ts). Two bounds keep the whole read linear
 * in the file's length and its memory bounded:
 *
 * - a Markdown file is at most MAX_MARKDOWN_BYTES;
 * - in one paragraph (a run of lines with no blank line, no list item or heading starting within
 *   it), the characters times the marks that make the inline pass scan or shift the paragraph
 *   (`*`, `_`, `]`, `!`, `\\`, `~`) is at most MAX_PARAGRAPH_WORK: a long paragraph of plain prose
 *   passes, a long one dense with marks does not. A table counts row by row, so a long table of
 *   ordinary rows passes; fenced code (not read as prose) does not count.
 *
 * Real drafts stay far below both: a long feature is about 50 KB; a long paragraph of 3,000
 * characters with 20 emphasis marks does 60,000 of the 50,000,000 units of work allowed.
 */
import { FirnlineError } from '../errors.js';

/** The largest Markdown file Firnline parses. */
export const MAX_MARKDOWN_BYTES = 2 * 1024 * 1024;
/**
 * The most work one Markdown paragraph (or table row) may cost: its characters times its marks.
 * At this bound the worst paragraph (about 28,000 characters, one `]` in every 16) parses in about
 * 0.3 s on the shared 2-core machine.
 */
export const MAX_PARAGRAPH_WORK = 50_000_000;
const MARKS = /[*_\]!\\~]/gu;

/** Block-quote markers and indentation before a line's content (lists are handled apart). */
const QUOTES = /^(?:[ \t]*>)+[ \t]?/u;
/** A list item with content, or an ATX heading: these start a new block even right after a paragraph line. */
const NEW_BLOCK = /^[ \t]*(?:[-*+][ \t]+\S|\d{1,9}[.)][ \t]+\S|#{1,6}(?:[ \t]|$))/u;
const HEADING = /^[ \t]*#{1,6}(?:[ \t]|$)/u;
/** A fence at column 0 is always a top-level fence (it cannot continue a list item or a quote). */
const FENCE = /^(`{3,}|~{3,})/u;
const DELIMITER_ROW = /^[ \t]*\|?[ \t]*:?-+:?[ \t]*(?:\|[ \t]*:?-+:?[ \t]*)*\|?[ \t]*$/u;
/** A line that ends a table: it starts another block. */
const NOT_A_ROW = /^[ \t]*(?:>|#|<|`{3}|~{3}|[-*+][ \t]|\d{1,9}[.)][ \t])/u;

/** Throws FirnlineError `draft-too-large` when the draft is over either bound (see the module). */
export function checkMarkdownLimits(text: string, file = '-'): void {
  if (text.length > MAX_MARKDOWN_BYTES / 3 && Buffer.byteLength(text, 'utf8') > MAX_MARKDOWN_BYTES) {
    throw new FirnlineError('draft-too-large', `larger than ${MAX_MARKDOWN_BYTES / 1024 / 1024} MiB, the most Firnline reads as Markdown from one file; split it into several files`, { file });
  }
  let lineNumber = 0;
  let start = 0;
  let fence: string | undefined;
  let table = false;
  let segment = { line: 0, chars: 0, marks: 0, lines: 0, header: '' };
  const finish = () => {
    segment = { line: 0, chars: 0, marks: 0, lines: 0, header: '' };
  };
  while (start <= text.length) {
    lineNumber += 1;
    let end = text.indexOf('\n', start);
    if (end < 0) end = text.length;
    const line = text.slice(start, end);
    start = end + 1;
    if (fence !== undefined) {
      const close = FENCE.exec(line.trimEnd());
      if (close !== null && close[1]?.[0] === fence[0] && (close[1]?.length ?? 0) >= fence.length && line.trim() === close[1]) fence = undefined;
      continue;
    }
    const open = FENCE.exec(line);
    if (open !== null) {
      fence = open[1];
      table = false;
      finish();
      continue;
    }
    const content = line.replace(QUOTES, '');
    if (content.trim() === '') {
      table = false;
      finish();
      continue;
    }
    if (table && NOT_A_ROW.test(line)) {
      table = false;
      finish();
    }
    if (table || NEW_BLOCK.test(content)) finish();
    if (segment.lines === 1 && !table && DELIMITER_ROW.test(line) && line.includes('|') && cellCount(line) === cellCount(segment.header)) {
      // The line before was a table's header row: from here on every row is read on its own.
      table = true;
      finish();
    }
    if (segment.lines === 0) segment = { line: lineNumber, chars: 0, marks: 0, lines: 0, header: line };
    segment.lines += 1;
    segment.chars += line.length + 1;
    segment.marks += line.match(MARKS)?.length ?? 0;
    if (segment.chars * segment.marks > MAX_PARAGRAPH_WORK) {
      throw new FirnlineError(
        'draft-too-large',
        `a ${table ? 'table row' : 'paragraph'} too long and too dense with marks (${segment.marks.toLocaleString('en')} of * _ ] ! \\ ~ in ${segment.chars.toLocaleString('en')} characters) for Firnline to read as Markdown in bounded time; add blank lines between its paragraphs`,
        { file, line: segment.line, column: 1 },
      );
    }
    if (HEADING.test(content)) finish();
  }
}

/** The cells of a table row: `|` splits cells unless escaped; outer pipes are optional. */
function cellCount(row: string): number {
  const inner = row.trim().replace(/^\|/u, '').replace(/(?<!\\)\|$/u, '');
  return inner.split(/(?<!\\)\|/u).length;
}
