import { XMLSerializer, type Document, type Element } from '@xmldom/xmldom';
import { strToU8, zipSync } from 'fflate';
import type { Flag } from '../../types.js';
import { DOCUMENT_PART, W_NS, parseXmlPart } from '../../source/word/word-package.js';
import { readWordDocument } from '../../source/word/word-draft.js';
import { childElements, isW, readParagraphText } from '../../source/word/word-paragraphs.js';
import { sortByPlace } from '../sort.js';
import { commentParagraphs } from './comment-text.js';
import { ownerOf, runAt, runStartingAt } from './split-run.js';

const COMMENTS_TYPE = 'http://schemas.openxmlformats.org/officeDocument/2006/relationships/comments';
const COMMENTS_CONTENT_TYPE = 'application/vnd.openxmlformats-officedocument.wordprocessingml.comments+xml';
const RELS_NS = 'http://schemas.openxmlformats.org/package/2006/relationships';
const TYPES_NS = 'http://schemas.openxmlformats.org/package/2006/content-types';
const RELS_PART = 'word/_rels/document.xml.rels';
const DECLARATION = '<?xml version="1.0" encoding="UTF-8" standalone="yes"?>\r\n';

/** Who the comments are from, and when (ISO 8601, e.g. `2026-12-03T06:00:00Z`). */
export interface AnnotateOptions {
  date: string;
  author?: string;
}

/**
 * A copy of a Word package with each flag as a comment anchored on the flagged words
 * (ECMA-376 Part 1 §17.13.4: `w:commentRangeStart`, `w:commentRangeEnd` and a run holding
 * `w:commentReference` in the document; the comment itself in the comments part, which the
 * document's relationships and the package's content types name). Comments already in the file are
 * kept. Flags must come from checking these same bytes (they carry paragraph places). Pure: bytes in,
 * bytes out; the caller writes the file.
 */
export function annotateWord(bytes: Uint8Array, flags: readonly Flag[], options: AnnotateOptions): Uint8Array {
  const word = readWordDocument(bytes);
  const { parts, document } = word.pack;
  const target = commentsTarget(parts);
  const comments = parts[target.part] === undefined ? newComments() : parseXmlPart(parts[target.part] ?? new Uint8Array(), target.part);
  let nextId = highestCommentId(document, comments) + 1;
  for (const flag of sortByPlace(flags)) {
    const paragraph = flag.paragraph === undefined ? undefined : word.paragraphs[flag.paragraph.number - 1];
    if (paragraph === undefined) continue;
    const { start, end } = paragraphRange(paragraph.element, flag);
    anchorComment(paragraph.element, start, end, nextId);
    rootOf(comments).appendChild(commentElement(comments, nextId, flag, options));
    nextId += 1;
  }
  const serializer = new XMLSerializer();
  const xml = (doc: Document) => {
    const text = serializer.serializeToString(doc);
    return strToU8(text.startsWith('<?xml') ? text : DECLARATION + text);
  };
  const out: Record<string, Uint8Array> = { ...parts };
  out[DOCUMENT_PART] = xml(document);
  out[target.part] = xml(comments);
  if (target.rels !== undefined) out[RELS_PART] = xml(target.rels);
  const types = withCommentsType(parts['[Content_Types].xml'], `/${target.part}`);
  if (types !== undefined) out['[Content_Types].xml'] = xml(types);
  return zipSync(out);
}

/** The flag's words as UTF-16 indices into its paragraph's text (the span's columns count code points). */
function paragraphRange(paragraph: Element, flag: Flag): { start: number; end: number } {
  const { text } = readParagraphText(paragraph);
  const toIndex = (column: number) => {
    let index = 0;
    for (let seen = 1; seen < column && index < text.length; seen += 1) index += text.codePointAt(index)! > 0xffff ? 2 : 1;
    return index;
  };
  const start = toIndex(flag.span.start.column);
  const sameLine = flag.span.end.line === flag.span.start.line;
  const end = sameLine ? Math.max(start + 1, toIndex(flag.span.end.column)) : text.length;
  return { start, end: Math.min(end, text.length) };
}

/** Marks `[start, end)` of a paragraph's text as the range of comment `id`, with its reference after it. */
function anchorComment(paragraph: Element, start: number, end: number, id: number): void {
  const document = ownerOf(paragraph);
  const marker = (name: string) => {
    const element = document.createElementNS(W_NS, `w:${name}`);
    element.setAttributeNS(W_NS, 'w:id', String(id));
    return element;
  };
  const first = runStartingAt(paragraph, start);
  if (first === undefined) return;
  first.parentNode?.insertBefore(marker('commentRangeStart'), first);
  // Split so that the last flagged character ends its run; the range ends just after that run.
  runStartingAt(paragraph, end);
  const last = runAt(paragraph, end - 1) ?? first;
  const rangeEnd = marker('commentRangeEnd');
  last.parentNode?.insertBefore(rangeEnd, last.nextSibling);
  const reference = document.createElementNS(W_NS, 'w:r');
  reference.appendChild(marker('commentReference'));
  rangeEnd.parentNode?.insertBefore(reference, rangeEnd.nextSibling);
}

function commentElement(comments: Document, id: number, flag: Flag, options: AnnotateOptions): Element {
  const author = options.author ?? 'Firnline';
  const comment = comments.createElementNS(W_NS, 'w:comment');
  comment.setAttributeNS(W_NS, 'w:id', String(id));
  comment.setAttributeNS(W_NS, 'w:author', author);
  comment.setAttributeNS(W_NS, 'w:date', options.date);
  comment.setAttributeNS(W_NS, 'w:initials', author.slice(0, 2).toUpperCase());
  commentParagraphs(flag).forEach((line, index) => {
    const paragraph = comments.createElementNS(W_NS, 'w:p');
    if (index === 0) {
      // The comment's own mark, as a word processor writes it at the start of a comment.
      const mark = comments.createElementNS(W_NS, 'w:r');
      mark.appendChild(comments.createElementNS(W_NS, 'w:annotationRef'));
      paragraph.appendChild(mark);
    }
    const run = comments.createElementNS(W_NS, 'w:r');
    if (line.bold === true) {
      const properties = comments.createElementNS(W_NS, 'w:rPr');
      properties.appendChild(comments.createElementNS(W_NS, 'w:b'));
      run.appendChild(properties);
    }
    const text = comments.createElementNS(W_NS, 'w:t');
    text.setAttributeNS('http://www.w3.org/XML/1998/namespace', 'xml:space', 'preserve');
    text.appendChild(comments.createTextNode(line.text));
    run.appendChild(text);
    paragraph.appendChild(run);
    comment.appendChild(paragraph);
  });
  return comment;
}

function rootOf(document: Document): Element {
  const root = document.documentElement;
  if (root === null) throw new Error('internal: a parsed part has no root element');
  return root;
}

function newComments(): Document {
  return parseXmlPart(strToU8(`<w:comments xmlns:w="${W_NS}"/>`), 'word/comments.xml');
}

/** The largest comment id in use (in the document's markers or the comments part), or -1. */
function highestCommentId(document: Document, comments: Document): number {
  let highest = -1;
  for (const doc of [document, comments]) {
    for (const name of ['comment', 'commentRangeStart', 'commentRangeEnd', 'commentReference']) {
      const found = doc.getElementsByTagNameNS(W_NS, name);
      for (let i = 0; i < found.length; i += 1) {
        const id = Number(found.item(i)?.getAttributeNS(W_NS, 'id'));
        if (Number.isInteger(id)) highest = Math.max(highest, id);
      }
    }
  }
  return highest;
}

/**
 * Where the comments part is: the one the document's relationships already name, or
 * `word/comments.xml` with a new relationship (returned in `rels` when one was added).
 */
function commentsTarget(parts: Record<string, Uint8Array>): { part: string; rels?: Document } {
  const existing = parts[RELS_PART];
  const rels = existing === undefined ? parseXmlPart(strToU8(`<Relationships xmlns="${RELS_NS}"/>`), RELS_PART) : parseXmlPart(existing, RELS_PART);
  const relationships = childElements(rels.documentElement);
  const named = relationships.find((r) => r.getAttribute('Type') === COMMENTS_TYPE);
  if (named !== null && named !== undefined) {
    const target = named.getAttribute('Target') ?? 'comments.xml';
    return { part: target.startsWith('/') ? target.slice(1) : `word/${target}` };
  }
  const ids = new Set(relationships.map((r) => r.getAttribute('Id')));
  let n = relationships.length + 1;
  while (ids.has(`rId${n}`)) n += 1;
  const relationship = rels.createElementNS(RELS_NS, 'Relationship');
  relationship.setAttribute('Id', `rId${n}`);
  relationship.setAttribute('Type', COMMENTS_TYPE);
  relationship.setAttribute('Target', 'comments.xml');
  rootOf(rels).appendChild(relationship);
  return { part: 'word/comments.xml', rels };
}

/** The content types with an override for the comments part, or undefined when it is already there. */
function withCommentsType(bytes: Uint8Array | undefined, partName: string): Document | undefined {
  const types = bytes === undefined ? parseXmlPart(strToU8(`<Types xmlns="${TYPES_NS}"/>`), '[Content_Types].xml') : parseXmlPart(bytes, '[Content_Types].xml');
  const present = childElements(types.documentElement).some((e) => e.localName === 'Override' && e.getAttribute('PartName')?.toLowerCase() === partName.toLowerCase());
  if (present) return undefined;
  const override = types.createElementNS(TYPES_NS, 'Override');
  override.setAttribute('PartName', partName);
  override.setAttribute('ContentType', COMMENTS_CONTENT_TYPE);
  rootOf(types).appendChild(override);
  return types;
}

/** True when a run is a comment reference run this module added (for tests and re-annotation). */
export function isCommentReferenceRun(run: Element): boolean {
  return childElements(run).some((e) => isW(e, 'commentReference'));
}
