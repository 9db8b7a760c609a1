/**
 * Prose a Markdown draft publishes outside its paragraphs, as blocks with exact positions:
 * - the published front-matter fields (`title`, `description`, `summary`, `subtitle`, `caption`);
 * - image alt text and titles (`![alt](src "title")`), and in raw HTML `alt="..."` attributes and
 *   `<figcaption>` text;
 * - each table data cell read with its row and column headers, as one claim would be read aloud:
 *
 *     | Core   | Span (years) |
 *     | ------ | ------------ |
 *     | Vostok | 420,000      |     → block "Vostok, Span: 420,000 years"
 *
 *   The headers' characters keep the headers' own positions; a unit moved out of the column header's
 *   brackets is placed at the end of the cell, so a flag on the number points at the cell.
 */
import type { Html, Image, Table, Yaml } from 'mdast';
import { isMap, isScalar, parseDocument } from 'yaml';
import type { BlockKind, ProseBlock } from '../types.js';
import { appendValue, finishBlock, startBlockText } from './block-text.js';

/** Front-matter keys whose values a site publishes (page title, description, summary...). */
export const PUBLISHED_FRONT_MATTER = ['title', 'subtitle', 'description', 'summary', 'caption', 'excerpt'] as const;

/** Makes one block from `value`, found in `original[from..to)`. */
function blockOf(value: string, original: string, from: number, to: number, kind: BlockKind, heading: string): ProseBlock | undefined {
  const builder = startBlockText();
  appendValue(builder, value, original, from, to);
  return finishBlock(builder, kind, heading);
}

/** The published front-matter fields of a YAML front matter node starting at `start` in `original`. */
export function frontMatterBlocks(node: Yaml, original: string, start: number): ProseBlock[] {
  const firstEnd = /\r\n|\r|\n/u.exec(original.slice(start));
  if (firstEnd === null) return [];
  const contentStart = start + firstEnd.index + firstEnd[0].length;
  // A lone \r ends a line in Markdown but not in YAML; \n in its place keeps every offset.
  const doc = parseDocument(node.value.replace(/\r(?!\n)/gu, '\n'));
  if (doc.errors.length > 0 || !isMap(doc.contents)) return [];
  const blocks: ProseBlock[] = [];
  for (const pair of doc.contents.items) {
    const key = isScalar(pair.key) ? String(pair.key.value) : '';
    if (!(PUBLISHED_FRONT_MATTER as readonly string[]).includes(key.toLowerCase())) continue;
    if (!isScalar(pair.value) || typeof pair.value.value !== 'string' || pair.value.range === null || pair.value.range === undefined) continue;
    const [from, to] = pair.value.range;
    const block = blockOf(pair.value.value, original, contentStart + from, contentStart + to, 'front-matter', '');
    if (block !== undefined) blocks.push(block);
  }
  return blocks;
}

/** The alt text and title of a Markdown image at `[start, end)` of `original`. */
export function imageBlocks(node: Image, original: string, start: number, end: number, heading: string): ProseBlock[] {
  const blocks: ProseBlock[] = [];
  const altEnd = original.indexOf('](', start);
  if (typeof node.alt === 'string' && node.alt !== '') {
    const block = blockOf(node.alt, original, start + 2, altEnd < 0 ? end : altEnd, 'image-text', heading);
    if (block !== undefined) blocks.push(block);
  }
  if (typeof node.title === 'string' && node.title !== '') {
    const block = blockOf(node.title, original, altEnd < 0 ? start : altEnd, end, 'image-text', heading);
    if (block !== undefined) blocks.push(block);
  }
  return blocks;
}

const ALT_ATTRIBUTE = /\balt\s*=\s*(?:"([^"]*)"|'([^']*)')/giu;
const FIGCAPTION = /<figcaption\b[^>]*>([\s\S]*?)<\/figcaption\s*>/giu;
const TAG = /<[^>]*>/gu;

/** `alt="..."` attribute values and `<figcaption>` text in a raw HTML node at `start` of `original`. */
export function htmlTextBlocks(node: Html, original: string, start: number, heading: string): ProseBlock[] {
  const found: { at: number; block: ProseBlock }[] = [];
  for (const m of node.value.matchAll(ALT_ATTRIBUTE)) {
    const value = m[1] ?? m[2] ?? '';
    const from = start + (m.index ?? 0) + m[0].length - value.length - 1;
    const block = blockOf(value, original, from, from + value.length, 'image-text', heading);
    if (block !== undefined) found.push({ at: from, block });
  }
  for (const m of node.value.matchAll(FIGCAPTION)) {
    const inner = m[1] ?? '';
    const from = start + (m.index ?? 0) + m[0].indexOf(inner, m[0].indexOf('>') + 1);
    // Tags inside the caption (<em>, <a>) are left out; the words between them keep their places.
    const builder = startBlockText();
    let last = 0;
    for (const tag of [...inner.matchAll(TAG), null]) {
      const upTo = tag === null ? inner.length : (tag.index ?? 0);
      appendValue(builder, inner.slice(last, upTo), original, from + last, from + upTo);
      if (tag !== null) {
        appendValue(builder, ' ', original, from + upTo, from + upTo);
        last = upTo + tag[0].length;
      }
    }
    const block = finishBlock(builder, 'image-text', heading);
    if (block !== undefined) found.push({ at: from, block });
  }
  return found.sort((a, b) => a.at - b.at).map((f) => f.block);
}

/** A number as a table cell holds it, with no unit of its own: "420,000", "~180", "120–130". */
const BARE_NUMBER = /^[~≈<>≤≥±]?\s*-?\d[\d.,\s\u2009\u202f–—-]*$/u;
const HEADER_UNIT = /^(.*?)\s*\(([^()]+)\)\s*$/u;

/**
 * The blocks of a GFM table: header cells and first-column cells as they are, and each other cell
 * read with its row header and column header. `cells[r][c]` holds the plain cell blocks already
 * read (undefined for an empty cell).
 *
 * A first column of whole sentences holds no row headers: it is a column of statements like any
 * other (the "what is often said | what the record shows" table of a myth-busting page), so each
 * of its cells is read with its column header, which gives it the stance its header states, and
 * no other cell takes it as a label.
 */
export function tableBlocks(cells: (ProseBlock | undefined)[][]): ProseBlock[] {
  const [header = [], ...rows] = cells;
  const blocks: ProseBlock[] = header.filter((b): b is ProseBlock => b !== undefined);
  const wide = header.length > 1;
  const labelled = wide && !firstColumnOfSentences(rows);
  for (const row of rows) {
    const rowHeader = labelled ? row[0] : undefined;
    if (rowHeader !== undefined) blocks.push(rowHeader);
    row.forEach((cell, c) => {
      if (cell === undefined || (labelled && c === 0)) return;
      blocks.push(readWithHeaders(cell, rowHeader, header[c]));
    });
  }
  return blocks;
}

/** A sentence ends with its full stop, question or exclamation mark, inside a closing quote or not. */
const SENTENCE_END = /[.!?]["'\u201d\u2019)]*$/u;

/** True when most filled first-column cells of the body rows are whole sentences, not labels. */
function firstColumnOfSentences(rows: (ProseBlock | undefined)[][]): boolean {
  let filled = 0;
  let sentences = 0;
  for (const row of rows) {
    const text = row[0]?.text.trim();
    if (text === undefined || text === '') continue;
    filled += 1;
    if (SENTENCE_END.test(text) && text.split(/\s+/u).length >= 4) sentences += 1;
  }
  return filled > 0 && sentences * 2 > filled;
}

function readWithHeaders(cell: ProseBlock, rowHeader: ProseBlock | undefined, columnHeader: ProseBlock | undefined): ProseBlock {
  const text: string[] = [];
  const offsets: number[] = [];
  const cellStart = cell.offsets[0] ?? 0;
  const cellLast = cell.offsets[cell.text.length - 1] ?? cellStart;
  const add = (part: string, at: (i: number) => number) => {
    for (let i = 0; i < part.length; i += 1) {
      text.push(part[i] ?? '');
      offsets.push(at(i));
    }
  };
  let unit: string | undefined;
  let columnWords = columnHeader;
  const split = columnHeader === undefined ? null : HEADER_UNIT.exec(columnHeader.text);
  if (split !== null && columnHeader !== undefined && BARE_NUMBER.test(cell.text) && (split[1] ?? '') !== '') {
    unit = split[2];
    const name = split[1] ?? '';
    columnWords = { ...columnHeader, text: name, offsets: [...columnHeader.offsets.slice(0, name.length), columnHeader.offsets[name.length] ?? 0] };
  }
  if (rowHeader !== undefined) {
    add(rowHeader.text, (i) => rowHeader.offsets[i] ?? cellStart);
    add(', ', () => cellStart);
  }
  if (columnWords !== undefined && columnWords.text !== '') {
    add(columnWords.text, (i) => columnWords.offsets[i] ?? cellStart);
    add(': ', () => cellStart);
  }
  add(cell.text, (i) => cell.offsets[i] ?? cellStart);
  if (unit !== undefined) add(` ${unit}`, () => cellLast);
  offsets.push(cell.offsets[cell.text.length] ?? cellLast + 1);
  return { kind: 'table-cell', text: text.join(''), offsets, heading: cell.heading };
}

/** True when `node` is a GFM table (for the block walk). */
export function isTable(node: { type: string }): node is Table {
  return node.type === 'table';
}
