import type { Document, Element, Node } from '@xmldom/xmldom';
import { W_NS } from '../../source/word/word-package.js';
import { childElements, isW, readParagraphText } from '../../source/word/word-paragraphs.js';

const XML_NS = 'http://www.w3.org/XML/1998/namespace';

/**
 * Makes character `index` of a paragraph's text the first thing in its run, splitting a `w:t` and
 * its run where needed (the new run copies the run's properties, so the text looks the same), and
 * returns that run. Undefined when `index` is at or past the end of the text.
 *
 *     <w:r><w:rPr><w:b/></w:rPr><w:t>spans 800,000</w:t></w:r>, index at "800"
 *     // <w:r><w:rPr><w:b/></w:rPr><w:t>spans </w:t></w:r><w:r><w:rPr><w:b/></w:rPr><w:t>800,000</w:t></w:r>
 */
export function runStartingAt(paragraph: Element, index: number): Element | undefined {
  const piece = readParagraphText(paragraph).pieces[index];
  if (piece === undefined) return undefined;
  let node = piece.node;
  if (piece.index > 0) node = splitText(node, piece.index);
  const run = node.parentNode as Element;
  return splitRunBefore(run, node);
}

/** The run holding character `index` of a paragraph's text. */
export function runAt(paragraph: Element, index: number): Element | undefined {
  return readParagraphText(paragraph).pieces[index]?.node.parentNode as Element | undefined;
}

/** Splits `<w:t>` at `at`: the first part stays, the rest goes into a new `<w:t>` after it, which is returned. */
function splitText(text: Element, at: number): Element {
  const value = text.textContent ?? '';
  const document = ownerOf(text);
  const rest = document.createElementNS(W_NS, text.tagName);
  rest.setAttributeNS(XML_NS, 'xml:space', 'preserve');
  rest.appendChild(document.createTextNode(value.slice(at)));
  text.textContent = value.slice(0, at);
  text.setAttributeNS(XML_NS, 'xml:space', 'preserve');
  text.parentNode?.insertBefore(rest, text.nextSibling);
  return rest;
}

/** Moves `child` and what follows it into a new run after `run`, unless it already starts the run. */
function splitRunBefore(run: Element, child: Element): Element {
  const content = childElements(run).filter((e) => !isW(e, 'rPr'));
  if (content[0] === child) return run;
  const document = ownerOf(run);
  const next = document.createElementNS(W_NS, run.tagName);
  const properties = childElements(run).find((e) => isW(e, 'rPr'));
  if (properties !== undefined) next.appendChild(properties.cloneNode(true));
  for (let node: Node | null = child; node !== null; ) {
    const following: Node | null = node.nextSibling;
    next.appendChild(node);
    node = following;
  }
  run.parentNode?.insertBefore(next, run.nextSibling);
  return next;
}

/** The document an element belongs to (every parsed element has one). */
export function ownerOf(element: Element): Document {
  const document = element.ownerDocument;
  if (document === null) throw new Error('internal: a parsed element has no document');
  return document;
}
