import { parse, parseFragment, type DefaultTreeAdapterTypes } from 'parse5';
import type { BlockKind, ProseBlock } from '../types.js';
import { appendGap, appendValue, finishBlock, startBlockText, type BlockText, type ValueSyntax } from './block-text.js';

type ParentNode = DefaultTreeAdapterTypes.ParentNode;
type ChildNode = DefaultTreeAdapterTypes.ChildNode;

/** Elements whose content is never prose: scripts, styles, navigation, code, templates, metadata. */
const NOT_PROSE = new Set([
  'head', 'script', 'style', 'nav', 'code', 'pre', 'template', 'noscript', 'svg', 'math',
  'textarea', 'select', 'button', 'iframe', 'object', 'canvas', 'audio', 'video', 'kbd', 'samp',
]);

/** Phrasing elements: their text continues the block around them (HTML Living Standard §3.2.5.2.5). */
const INLINE = new Set([
  'a', 'abbr', 'b', 'bdi', 'bdo', 'cite', 'data', 'del', 'dfn', 'em', 'font', 'i', 'ins', 'label',
  'mark', 'q', 'ruby', 'rb', 'rt', 's', 'small', 'span', 'strong', 'sub', 'sup', 'time', 'u', 'var',
]);

/** Inline elements that are not text but still part words. */
const GAPS = new Set(['br', 'wbr', 'img', 'input', 'code', 'kbd', 'samp']);

/** Block elements whose own text makes a block of a given kind; any other block is a paragraph. */
const BLOCK_KINDS: Record<string, BlockKind> = {
  h1: 'heading', h2: 'heading', h3: 'heading', h4: 'heading', h5: 'heading', h6: 'heading',
  li: 'list-item', dt: 'list-item', dd: 'list-item',
  td: 'table-cell', th: 'table-cell',
  blockquote: 'blockquote',
};

// `&name;`, `&#123;`, `&#x1F;`, and the legacy names HTML also accepts without the semicolon.
const REFERENCE = /&(?:#[xX][0-9a-fA-F]+;?|#[0-9]+;?|[A-Za-z][A-Za-z0-9]*;?)/y;
const decoded = new Map<string, string>();

/** HTML's spelling: character references only, decoded by the HTML parser itself. */
const HTML_SYNTAX: ValueSyntax = {
  isEscape: () => false,
  reference(original, k) {
    if (original[k] !== '&') return undefined;
    REFERENCE.lastIndex = k;
    const reference = REFERENCE.exec(original)?.[0];
    if (reference === undefined) return undefined;
    let value = decoded.get(reference);
    if (value === undefined) {
      const node = parseFragment(reference).childNodes[0];
      value = node !== undefined && node.nodeName === '#text' ? (node as DefaultTreeAdapterTypes.TextNode).value : reference;
      decoded.set(reference, value);
    }
    return value === reference ? undefined : { length: reference.length, decoded: value };
  },
};

/**
 * The prose of an HTML page (parse5, the WHATWG parsing algorithm, with source positions): one
 * block per paragraph, heading, list item, table cell or other block element, in document order.
 * Script, style, nav, code, pre, template and comments are not prose; character references are
 * decoded, each character keeping the UTF-16 index of its source spelling in `text`.
 *
 *     readHtmlBlocks('<h2>Cores</h2><p>Vostok &amp; Dome C</p>')
 *     // [{ kind: 'heading', text: 'Cores', ... },
 *     //  { kind: 'paragraph', text: 'Vostok & Dome C', offsets: [17, ..., 24, 29, ...], heading: 'Cores' }]
 */
export function readHtmlBlocks(text: string): ProseBlock[] {
  const tree = parse(text, { sourceCodeLocationInfo: true });
  const walk: Walk = { text, heading: '', blocks: [] };
  const open = { builder: startBlockText(), kind: 'paragraph' as BlockKind };
  visit(tree, open, 'paragraph', walk);
  flush(open, walk);
  return walk.blocks;
}

interface Walk {
  text: string;
  heading: string;
  blocks: ProseBlock[];
}

/** The block being filled: inline content goes to it; a block element closes it and opens its own. */
interface OpenBlock {
  builder: BlockText;
  kind: BlockKind;
}

function visit(parent: ParentNode, open: OpenBlock, containerKind: BlockKind, walk: Walk): void {
  for (const node of parent.childNodes) visitNode(node, open, containerKind, walk);
}

function visitNode(node: ChildNode, open: OpenBlock, containerKind: BlockKind, walk: Walk): void {
  const location = node.sourceCodeLocation;
  if (node.nodeName === '#text') {
    if (location === null || location === undefined) return;
    const value = (node as DefaultTreeAdapterTypes.TextNode).value;
    appendValue(open.builder, value, walk.text, location.startOffset, location.endOffset, HTML_SYNTAX);
    return;
  }
  if (!('tagName' in node)) return; // comments and doctypes are not prose
  const name = node.tagName;
  if (NOT_PROSE.has(name) || GAPS.has(name)) {
    // Code and the like inside a sentence still part the words around them.
    if (location !== null && location !== undefined && open.builder.units.length > 0) appendGap(open.builder, location.startOffset, location.endOffset);
    return;
  }
  if (INLINE.has(name)) {
    visit(node, open, containerKind, walk);
    return;
  }
  // A block element: what came before it is one block, its own content another.
  flush(open, walk);
  const own = BLOCK_KINDS[name];
  const kind = own === 'blockquote' ? 'blockquote' : (own ?? containerKind);
  const inner: OpenBlock = { builder: startBlockText(), kind };
  visit(node, inner, own === 'blockquote' ? 'blockquote' : containerKind, walk);
  flush(inner, walk);
  open.builder = startBlockText();
  open.kind = containerKind;
}

function flush(open: OpenBlock, walk: Walk): void {
  const isHeading = open.kind === 'heading';
  const block = finishBlock(open.builder, open.kind, isHeading ? '' : walk.heading);
  open.builder = startBlockText();
  if (block === undefined) return;
  if (isHeading) walk.heading = block.text;
  walk.blocks.push(isHeading ? { ...block, heading: block.text } : block);
}
