import type { ProseBlock } from '../types.js';
import { readMarkdownParts } from './markdown.js';

const LINE = /[^\r\n]*(?:\r\n|\r|\n|$)/gy;

/**
 * The prose of a plain-text draft: one block per paragraph, paragraphs being separated by blank
 * (or whitespace-only) lines. Each block runs from its first to its last non-blank character.
 * Offsets are the identity, except that a `\r\n` or `\r` line end inside a paragraph becomes one
 * `\n` mapped to its first unit, so blocks read the same whatever the file's line ends.
 *
 *     readPlainTextBlocks('Ice cores\r\nhold air.\r\n\r\nSecond.')
 *     // [{ kind: 'text', text: 'Ice cores\nhold air.', offsets: [0, ..., 9, 11, ..., 20] },
 *     //  { kind: 'text', text: 'Second.', offsets: [24, ..., 31] }]
 *
 * A pipe table pasted into plain text (a header row, a delimiter row of dashes, then rows: the GFM
 * table form people paste into posts, notes and panel texts) is read as a Markdown draft reads it,
 * each data cell with its row and column headers, so a row's figure stays with its own row's
 * subject; the lines of its paragraph before and after it stay plain text.
 */
export function readPlainTextBlocks(text: string): ProseBlock[] {
  const blocks: ProseBlock[] = [];
  let paragraph: { start: number; end: number } | undefined;
  // A leading byte-order mark is not prose.
  LINE.lastIndex = text.charCodeAt(0) === 0xfeff ? 1 : 0;
  while (LINE.lastIndex < text.length) {
    const lineStart = LINE.lastIndex;
    const line = LINE.exec(text)?.[0] ?? '';
    if (line === '') break;
    const content = line.replace(/[\r\n]+$/u, '');
    const first = content.search(/\S/u);
    if (first < 0) {
      if (paragraph !== undefined) blocks.push(...paragraphBlocks(text, paragraph.start, paragraph.end));
      paragraph = undefined;
    } else {
      const end = lineStart + content.trimEnd().length;
      paragraph = { start: paragraph?.start ?? lineStart + first, end };
    }
  }
  if (paragraph !== undefined) blocks.push(...paragraphBlocks(text, paragraph.start, paragraph.end));
  return blocks;
}

/** A delimiter row of a pipe table: cells of dashes with optional alignment colons, at least one pipe. */
const DELIMITER_ROW = /^[ \t]*\|?[ \t]*:?-{3,}:?[ \t]*(?:\|[ \t]*:?-{3,}:?[ \t]*)*\|?[ \t]*$/u;

/** The cells of a row: `|` splits them, outer pipes optional. */
function cellCount(line: string): number {
  return line.trim().replace(/^\|/u, '').replace(/\|$/u, '').split('|').length;
}

/** One paragraph's blocks: plain text, but for a pipe table inside it (read as Markdown reads it). */
function paragraphBlocks(text: string, start: number, end: number): ProseBlock[] {
  const lines: { start: number; end: number; text: string }[] = [];
  for (let at = start; at < end; ) {
    const cut = text.slice(at, end).search(/\r\n|\r|\n/u);
    const stop = cut < 0 ? end : at + cut;
    lines.push({ start: at, end: stop, text: text.slice(at, stop) });
    at = cut < 0 ? end : stop + (text.startsWith('\r\n', stop) ? 2 : 1);
  }
  const delimiter = lines.findIndex((l, i) => i > 0 && l.text.includes('|') && DELIMITER_ROW.test(l.text) && cellCount(l.text) === cellCount(lines[i - 1]?.text ?? ''));
  const header = lines[delimiter - 1];
  if (delimiter < 1 || header === undefined || !header.text.includes('|')) return [makeBlock(text, start, end)];
  let last = delimiter;
  while (lines[last + 1]?.text.includes('|') === true) last += 1;
  const tableEnd = (lines[last] as { end: number }).end;
  const out: ProseBlock[] = [];
  if (delimiter > 1) out.push(makeBlock(text, start, trimmedEnd(text, start, header.start)));
  out.push(...(readMarkdownParts(text, [[header.start, tableEnd]])[0] ?? []));
  const after = lines[last + 1];
  if (after !== undefined) out.push(...paragraphBlocks(text, after.start, end));
  return out;
}

/** Where the text before `to` ends, past its line breaks and spaces. */
function trimmedEnd(text: string, from: number, to: number): number {
  return from + text.slice(from, to).trimEnd().length;
}

function makeBlock(text: string, start: number, end: number): ProseBlock {
  const units: string[] = [];
  const offsets: number[] = [];
  for (let i = start; i < end; i += 1) {
    const unit = text[i] ?? '';
    if (unit === '\r' && text[i + 1] === '\n') {
      units.push('\n');
      offsets.push(i);
      i += 1;
    } else {
      units.push(unit === '\r' ? '\n' : unit);
      offsets.push(i);
    }
  }
  offsets.push(end);
  return { kind: 'text', text: units.join(''), offsets, heading: '' };
}
