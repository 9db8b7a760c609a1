import type { Nodes, Parents } from 'mdast';
import { fromMarkdown } from 'mdast-util-from-markdown';
import { frontmatterFromMarkdown } from 'mdast-util-frontmatter';
import { gfmFromMarkdown } from 'mdast-util-gfm';
import { frontmatter } from 'micromark-extension-frontmatter';
import { gfm } from 'micromark-extension-gfm';
import type { BlockKind, ProseBlock } from '../types.js';
import { appendGap, appendValue, finishBlock, startBlockText, type BlockText } from './block-text.js';

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
 * a reader's letter): `<!-- firnline: reported -->`. Before a block, it marks that block (a whole
 * quotation, list or table when it stands before one); at the start of a paragraph, that paragraph.
 */
export const REPORTED_MARKER = /^<!--\s*firnline:\s*reported\s*-->$/u;

/** Nodes that are never prose: code, HTML, front matter, link definitions. */
const NOT_PROSE = new Set<string>(['code', 'html', 'yaml', 'toml', 'definition', 'thematicBreak']);

/** Inline elements replaced by one space: their text is not prose, but they still part words. */
const REMOVED_INLINE = new Set<string>(['inlineCode', 'html', 'break', 'image', 'imageReference', 'footnoteReference']);

/**
 * The prose of a Markdown draft (CommonMark + GFM tables, strikethrough and autolinks, YAML or TOML
 * front matter), one block per paragraph, heading or table cell, in document order, with markup
 * removed and every character mapped to its UTF-16 index in `text`.
 *
 *     readMarkdownBlocks('# Cores\n\nThe **EPICA** core')
 *     // [{ kind: 'heading', text: 'Cores', ... }, { kind: 'paragraph', text: 'The EPICA core',
 *     //    offsets: [9, 10, 11, 12, 15, ...], heading: 'Cores' }]
 */
export function readMarkdownBlocks(text: string, heading = ''): ProseBlock[] {
  // The parser drops a leading byte-order mark and counts its offsets from after it.
  const base = text.charCodeAt(0) === 0xfeff ? 1 : 0;
  const tree = fromMarkdown(base === 1 ? text.slice(1) : text, PARSE_OPTIONS);
  // `heading`: the heading above `text` when `text` is a window of a longer file (source/windows.ts).
  const walk = { text, base, heading, blocks: [] as ProseBlock[], pendingMark: false, marking: false };
  visitBlocks(tree, 'paragraph', walk);
  return walk.blocks;
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
    if (NOT_PROSE.has(node.type)) continue;
    const proseKind = PROSE_NODES[node.type];
    if (proseKind !== undefined && 'children' in node) {
      const kind = proseKind === 'paragraph' ? containerKind : proseKind;
      const first = node.children[0];
      const inlineMark = first?.type === 'html' && REPORTED_MARKER.test(first.value.trim());
      const marked = walk.marking || walk.pendingMark || inlineMark;
      walk.pendingMark = false;
      const builder = startBlockText();
      for (const child of node.children) collectInline(child, builder, walk);
      const isHeading = node.type === 'heading';
      const block = finishBlock(builder, kind, isHeading ? '' : walk.heading);
      if (isHeading) walk.heading = block?.text ?? '';
      if (block !== undefined) walk.blocks.push({ ...block, ...(isHeading ? { heading: block.text } : {}), ...(marked ? { marked: true } : {}) });
    } else if ('children' in node) {
      const outer = walk.marking;
      walk.marking = outer || walk.pendingMark;
      walk.pendingMark = false;
      visitBlocks(node, CONTAINER_KINDS[node.type] ?? containerKind, walk);
      walk.marking = outer;
    }
  }
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
