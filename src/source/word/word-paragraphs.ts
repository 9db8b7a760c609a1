import type { Document, Element, Node } from '@xmldom/xmldom';
import type { BlockKind } from '../../types.js';
import { W_NS } from './word-package.js';

/** Where one character of a paragraph's text came from: a `w:t` (at `index` in its text) or a `w:tab`. */
export interface WordPiece {
  node: Element;
  index: number;
}

/** One paragraph of a Word draft with text, in document order (body paragraphs and table cells). */
export interface WordParagraph {
  element: Element;
  /** The paragraph's visible text: runs joined, tabs as `\t`, line breaks as spaces. */
  text: string;
  /** `pieces[i]` is where `text[i]` came from. */
  pieces: WordPiece[];
  kind: BlockKind;
}

// Containers whose paragraphs are read in order.
const BODY_CONTAINERS = new Set(['body', 'tbl', 'tr', 'tc', 'sdt', 'sdtContent', 'customXml']);
// Containers inside a paragraph whose runs are part of its text (links, tracked insertions, fields...).
const RUN_CONTAINERS = new Set(['hyperlink', 'ins', 'moveTo', 'smartTag', 'sdt', 'sdtContent', 'fldSimple', 'customXml', 'dir', 'bdo']);
// Run children that stand for one character of text.
const CHARACTER_OF: Record<string, string> = { tab: '\t', br: ' ', cr: ' ', noBreakHyphen: '-', ptab: '\t' };

/**
 * The paragraphs of a Word main document that hold any text, in reading order. Deleted text
 * (tracked deletions), field instructions, text boxes, drawings, footnotes and comments are not
 * part of a paragraph's text; tracked insertions, hyperlinks and field results are.
 *
 *     <w:p><w:r><w:t>Vostok </w:t></w:r><w:r><w:rPr><w:b/></w:rPr><w:t>spans</w:t></w:r></w:p>
 *     // { text: 'Vostok spans', pieces: [{ node: <w:t>Vostok </w:t>, index: 0 }, ...] }
 */
export function readWordParagraphs(document: Document, headingStyles: ReadonlySet<string>): WordParagraph[] {
  const found: WordParagraph[] = [];
  const body = childElements(document.documentElement).find((e) => isW(e, 'body'));
  if (body !== undefined) visitBody(body, false, headingStyles, found);
  return found;
}

function visitBody(container: Element, inCell: boolean, headingStyles: ReadonlySet<string>, found: WordParagraph[]): void {
  for (const child of childElements(container)) {
    if (isW(child, 'p')) {
      const { text, pieces } = readParagraphText(child);
      if (/\S/u.test(text)) found.push({ element: child, text, pieces, kind: kindOf(child, inCell, headingStyles) });
    } else if (child.namespaceURI === W_NS && BODY_CONTAINERS.has(child.localName ?? '')) {
      visitBody(child, inCell || child.localName === 'tc', headingStyles, found);
    }
  }
}

/** One paragraph's text and where each of its characters came from (read again after an edit). */
export function readParagraphText(paragraph: Element): { text: string; pieces: WordPiece[] } {
  const pieces: WordPiece[] = [];
  const units: string[] = [];
  collectRuns(paragraph, { inInstruction: false }, pieces, units);
  return { text: units.join(''), pieces };
}

function collectRuns(container: Element, field: { inInstruction: boolean }, pieces: WordPiece[], units: string[]): void {
  for (const child of childElements(container)) {
    if (child.namespaceURI !== W_NS) continue;
    if (child.localName === 'r') collectRun(child, field, pieces, units);
    else if (RUN_CONTAINERS.has(child.localName ?? '')) collectRuns(child, field, pieces, units);
  }
}

function collectRun(run: Element, field: { inInstruction: boolean }, pieces: WordPiece[], units: string[]): void {
  for (const child of childElements(run)) {
    if (child.namespaceURI !== W_NS) continue;
    const name = child.localName ?? '';
    if (name === 'fldChar') {
      // A complex field: its instruction runs between `begin` and `separate`, its shown result after.
      const type = child.getAttributeNS(W_NS, 'fldCharType');
      if (type === 'begin') field.inInstruction = true;
      else if (type === 'separate' || type === 'end') field.inInstruction = false;
    } else if (field.inInstruction) {
      continue;
    } else if (name === 't') {
      const value = child.textContent ?? '';
      for (let i = 0; i < value.length; i += 1) {
        const unit = value[i] ?? '';
        // The line index splits lines at CR and LF, and one line must stay one paragraph.
        units.push(unit === '\r' || unit === '\n' ? ' ' : unit);
        pieces.push({ node: child, index: i });
      }
    } else if (CHARACTER_OF[name] !== undefined) {
      units.push(CHARACTER_OF[name] ?? ' ');
      pieces.push({ node: child, index: 0 });
    }
  }
}

function kindOf(paragraph: Element, inCell: boolean, headingStyles: ReadonlySet<string>): BlockKind {
  const properties = childElements(paragraph).find((e) => isW(e, 'pPr'));
  const style = properties === undefined ? undefined : childElements(properties).find((e) => isW(e, 'pStyle'));
  const styleId = style?.getAttributeNS(W_NS, 'val') ?? '';
  const outline = properties === undefined ? undefined : childElements(properties).find((e) => isW(e, 'outlineLvl'));
  const level = Number(outline?.getAttributeNS(W_NS, 'val') ?? '9');
  if (headingStyles.has(styleId) || level < 9) return 'heading';
  if (inCell) return 'table-cell';
  if (properties !== undefined && childElements(properties).some((e) => isW(e, 'numPr'))) return 'list-item';
  return 'paragraph';
}

/** The element children of a node, in order. */
export function childElements(node: Node | null | undefined): Element[] {
  const out: Element[] = [];
  for (let child = node?.firstChild ?? null; child !== null; child = child.nextSibling) {
    if (child.nodeType === 1) out.push(child as Element);
  }
  return out;
}

/** True when `element` is `w:<name>`. */
export function isW(element: Element, name: string): boolean {
  return element.namespaceURI === W_NS && element.localName === name;
}
