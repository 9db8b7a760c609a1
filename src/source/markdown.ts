import type { Nodes, Parents } from 'mdast';
import { fromMarkdown } from 'mdast-util-from-markdown';
import { frontmatterFromMarkdown } from 'mdast-util-frontmatter';
import { gfmFromMarkdown } from 'mdast-util-gfm';
import { frontmatter } from 'micromark-extension-frontmatter';
import { gfm } from 'micromark-extension-gfm';
import type { BlockKind, ProseBlock } from '../types.js';
import { appendGap, appendValue, finishBlock, startBlockText, type BlockText } from './block-text.js';
import { frontMatterBlocks, htmlTextBlocks, imageBlocks, isTable, tableBlocks } from './markdown-published.js';
// Installs the linear merge of inline text runs before the first parse (see the module).
import './micromark-linear-text.js';

const PARSE_OPTIONS = {
  extensions: [gfm(), frontmatter(['yaml', 'toml'])],
  mdastExtensions: [gfmFromMarkdown(), frontmatterFromMarkdown(['yaml', 'toml'])],
};

/** Nodes whose phrasing content is one prose block, with the kind of block they make. */
const PROSE_NODES: Partial<Record<Nodes['type'], BlockKind>> = {
  paragraph: 'paragraph',
  heading: 'heading',
  tableCell: 'table-cell',
};

/** Containers whose paragraphs take the container's kind (the nearest container wins). */
const CONTAINER_KINDS: Partial<Record<Nodes['type'], BlockKind>> = {
  listItem: 'list-item',
  blockquote: 'blockquote',
};

/**
 * The marker an editor puts before a passage that quotes a claim on purpose (a myth being answered,
 * a reader's letter): `<!-- firnline: reported -->`, on its own line before a block. It marks that
 * block (a whole quotation, list or table when it stands before one); within a line of a paragraph
 * (where Markdown keeps it inline), it marks that paragraph.
 */
export const REPORTED_MARKER = /^<!--\s*firnline:\s*reported\s*-->$/u;

/** Nodes that are never prose: code, HTML, front matter, link definitions. */
const NOT_PROSE = new Set<string>(['code', 'html', 'yaml', 'toml', 'definition', 'thematicBreak']);

/** Inline elements replaced by one space: their text is not prose, but they still part words. */
const REMOVED_INLINE = new Set<string>(['inlineCode', 'html', 'break', 'image', 'imageReference', 'footnoteReference']);

/**
 * The prose of a Markdown draft (CommonMark + GFM tables, strikethrough and autolinks, YAML or TOML
 * front matter), one block per paragraph, heading or table cell, in document order, with markup
 * removed and every character mapped to its UTF-16 index in `text`. Text a page publishes outside
 * its paragraphs is read too (source/markdown-published): published YAML front-matter fields,
 * image alt text and captions, and table cells read with their row and column headers.
 *
 *     readMarkdownBlocks('# Cores\n\nThe **EPICA** core')
 *     // [{ kind: 'heading', text: 'Cores', ... }, { kind: 'paragraph', text: 'The EPICA core',
 *     //    offsets: [9, 10, 11, 12, 15, ...], heading: 'Cores' }]
 */
export function readMarkdownBlocks(text: string): ProseBlock[] {
  return readMarkdownParts(text, [[0, text.length]])[0] ?? [];
}

/**
 * The prose blocks of some parts of a Markdown draft, each part `[from, to)` parsed on its own, in
 * order, with offsets in the whole `text` and the heading carried from one part to the next. The
 * caller vouches that each part starts and ends where a top-level block does, that the parts left
 * out hold no heading, and that the draft defines no link references (speed/sparse-markdown.ts):
 * then each part's blocks are exactly those a parse of the whole draft gives there. `plain` lists
 * pieces of the parts, each starting where a top-level block does, that the caller vouches are
 * plain: one fenced code block (no blocks) or one paragraph of plain lines, each
 * followed only by empty lines; they are read without the parser.
 */
export function readMarkdownParts(text: string, parts: readonly (readonly [number, number])[], plain: readonly PlainPiece[] = []): ProseBlock[][] {
  const walk: Walk = { text, base: 0, heading: '', blocks: [], pendingMark: false, marking: false };
  const parse = (from: number, to: number): void => {
    // The parser drops a leading byte-order mark and counts its offsets from after it.
    const bom = from === 0 && text.charCodeAt(0) === 0xfeff ? 1 : 0;
    walk.base = from + bom;
    visitBlocks(fromMarkdown(text.slice(from + bom, to), PARSE_OPTIONS), 'paragraph', walk);
  };
  return parts.map(([from, to]) => {
    walk.blocks = [];
    walk.pendingMark = false;
    let at = from;
    for (const piece of plain) {
      if (piece.start < from || piece.end > to) continue;
      if (at < piece.start) parse(at, piece.start);
      if (piece.kind === 'paragraph') walk.blocks.push(plainParagraph(text, piece.start, piece.end, walk.heading));
      at = piece.end;
    }
    if (at < to) parse(at, to);
    return walk.blocks;
  });
}

/** A piece of a draft read without the parser (`plainParagraphKind`). */
export interface PlainPiece {
  start: number;
  end: number;
  kind: 'paragraph' | 'code';
}

/**
 * `paragraph` for a piece of Markdown that is one paragraph a parser reads character for character,
 * but for code spans: lines that start with an ASCII letter and hold no character Markdown or its
 * GFM extensions give a meaning to (`* _ ~ [ ] \ & < > | # @`, `://`, `www.`), no whitespace but
 * single spaces inside a line (no tab, trailing space, hard break or other space character), no
 * control character, and backticks only as pairs of single backticks on one line (code spans), then
 * only empty lines. Its block is its text with each code span as one space, as the parser gives it.
 * `code` for a piece the caller knows is one fenced code block (no prose). Undefined otherwise.
 */
export function plainParagraphKind(piece: string): 'paragraph' | undefined {
  if (!PLAIN_LINES.test(piece) || PLAIN_BREAKERS.test(piece)) return undefined;
  if (piece.includes('``') || piece.split('\n').some((line) => (line.match(/`/gu)?.length ?? 0) % 2 !== 0)) return undefined;
  return 'paragraph';
}

const PLAIN_LINES = /^[A-Za-z][^\n]*(?:\n[A-Za-z][^\n]*)*\n*$/u;
// eslint-disable-next-line no-control-regex -- a control character makes a piece not plain
const PLAIN_BREAKERS = /[*_~[\]\\&<>|#@]|:\/\/|www\.|[^\S \n]|[\x00-\x09\x0b-\x1f\x7f]| (?:\n|$)/u;

/** The block of a plain paragraph (`plainParagraphKind`) at `[start, end)` of `text`, as the parser's nodes give it. */
function plainParagraph(text: string, start: number, end: number, heading: string): ProseBlock {
  const stop = start + text.slice(start, end).replace(/\n+$/u, '').length;
  const builder = startBlockText();
  let at = start;
  while (at < stop) {
    const open = text.indexOf('`', at);
    if (open < 0 || open >= stop) {
      appendValue(builder, text.slice(at, stop), text, at, stop);
      break;
    }
    if (open > at) appendValue(builder, text.slice(at, open), text, at, open);
    // A code span (a pair of single backticks on its line) is one space, like any removed inline element.
    const close = text.indexOf('`', open + 1);
    appendGap(builder, open, close + 1);
    at = close + 1;
  }
  return finishBlock(builder, 'paragraph', heading) as ProseBlock;
}

interface Walk {
  text: string;
  base: number;
  heading: string;
  blocks: ProseBlock[];
  /** A marker stood just before: the next block (or container) is reported. */
  pendingMark: boolean;
  /** Inside a marked container. */
  marking: boolean;
}

function visitBlocks(parent: Parents, containerKind: BlockKind, walk: Walk): void {
  for (const node of parent.children) {
    if (node.type === 'html' && REPORTED_MARKER.test(node.value.trim())) {
      walk.pendingMark = true;
      continue;
    }
    // Published text outside paragraphs: front-matter fields, alt text and captions in HTML, tables.
    const start = (node.position?.start.offset ?? 0) + walk.base;
    if (node.type === 'yaml') walk.blocks.push(...frontMatterBlocks(node, walk.text, start));
    if (node.type === 'html') walk.blocks.push(...htmlTextBlocks(node, walk.text, start, walk.heading));
    if (isTable(node)) {
      const cells = node.children.map((row) => row.children.map((cell) => proseBlockOf(cell, 'table-cell', walk)));
      const marked = walk.marking || walk.pendingMark;
      walk.pendingMark = false;
      walk.blocks.push(...tableBlocks(cells).map((b) => (marked ? { ...b, marked: true } : b)));
      continue;
    }
    if (NOT_PROSE.has(node.type)) continue;
    const proseKind = PROSE_NODES[node.type];
    if (proseKind !== undefined && 'children' in node) {
      const kind = proseKind === 'paragraph' ? containerKind : proseKind;
      const first = node.children[0];
      const inlineMark = first?.type === 'html' && REPORTED_MARKER.test(first.value.trim());
      const marked = walk.marking || walk.pendingMark || inlineMark;
      walk.pendingMark = false;
      const isHeading = node.type === 'heading';
      const block = proseBlockOf(node, kind, walk);
      if (isHeading) walk.heading = block?.text ?? '';
      if (block !== undefined) walk.blocks.push({ ...block, ...(isHeading ? { heading: block.text } : {}), ...(marked ? { marked: true } : {}) });
      walk.blocks.push(...inlineImageText(node, walk));
    } else if ('children' in node) {
      const outer = walk.marking;
      walk.marking = outer || walk.pendingMark;
      walk.pendingMark = false;
      visitBlocks(node, CONTAINER_KINDS[node.type] ?? containerKind, walk);
      walk.marking = outer;
    }
  }
}

/** One prose block from a node's phrasing content (undefined when it holds no text). */
function proseBlockOf(node: Parents, kind: BlockKind, walk: Walk): ProseBlock | undefined {
  const builder = startBlockText();
  for (const child of node.children) collectInline(child as Nodes, builder, walk);
  return finishBlock(builder, kind, node.type === 'heading' ? '' : walk.heading);
}

/** The alt text and titles of images, and alt text and captions in inline HTML, inside a block. */
function inlineImageText(node: Nodes, walk: Walk): ProseBlock[] {
  if (!('children' in node)) return [];
  const blocks: ProseBlock[] = [];
  for (const child of node.children as Nodes[]) {
    const start = (child.position?.start.offset ?? 0) + walk.base;
    const end = (child.position?.end.offset ?? 0) + walk.base;
    if (child.type === 'image') blocks.push(...imageBlocks(child, walk.text, start, end, walk.heading));
    else if (child.type === 'html') blocks.push(...htmlTextBlocks(child, walk.text, start, walk.heading));
    else blocks.push(...inlineImageText(child, walk));
  }
  return blocks;
}

function collectInline(node: Nodes, builder: BlockText, walk: Walk): void {
  const position = node.position;
  if (position?.start.offset === undefined || position.end.offset === undefined) return;
  const start = position.start.offset + walk.base;
  const end = position.end.offset + walk.base;
  if (node.type === 'text') {
    appendValue(builder, node.value, walk.text, start, end);
  } else if (REMOVED_INLINE.has(node.type) || isBareUrl(node, walk.text, start)) {
    appendGap(builder, start, end);
  } else if ('children' in node) {
    for (const child of node.children) collectInline(child, builder, walk);
  } else {
    appendGap(builder, start, end);
  }
}

/**
 * An autolink (`<https://...>`, a literal `www.` or `https://` link) or a link whose text is its
 * own address: the words are an address, not prose.
 */
function isBareUrl(node: Nodes, text: string, start: number): boolean {
  if (node.type !== 'link') return false;
  if (text[start] !== '[') return true;
  const only = node.children.length === 1 ? node.children[0] : undefined;
  return only?.type === 'text' && only.value === node.url;
}
