import type { Document } from '@xmldom/xmldom';
import { childElements, isW } from './word-paragraphs.js';
import { W_NS } from './word-package.js';

// The built-in heading style ids a word processor writes when the package has no styles part.
const BUILT_IN = ['Title', 'Heading1', 'Heading2', 'Heading3', 'Heading4', 'Heading5', 'Heading6', 'Heading7', 'Heading8', 'Heading9'];

/**
 * The ids of the paragraph styles that make a heading: a style named `heading 1`...`heading 9` or
 * `Title` (the names are fixed in every language; the ids are not, e.g. `berschrift1`), a style with
 * an outline level, or a style based on one of those.
 */
export function findHeadingStyles(styles: Document | undefined): Set<string> {
  const headings = new Set(BUILT_IN);
  if (styles === undefined) return headings;
  const basedOn = new Map<string, string>();
  for (const style of childElements(styles.documentElement).filter((e) => isW(e, 'style'))) {
    if (style.getAttributeNS(W_NS, 'type') !== 'paragraph') continue;
    const id = style.getAttributeNS(W_NS, 'styleId') ?? '';
    const children = childElements(style);
    const name = children.find((e) => isW(e, 'name'))?.getAttributeNS(W_NS, 'val') ?? '';
    const properties = children.find((e) => isW(e, 'pPr'));
    const outline = properties === undefined ? undefined : childElements(properties).find((e) => isW(e, 'outlineLvl'));
    if (/^(heading [1-9]|title)$/iu.test(name) || Number(outline?.getAttributeNS(W_NS, 'val') ?? '9') < 9) headings.add(id);
    const parent = children.find((e) => isW(e, 'basedOn'))?.getAttributeNS(W_NS, 'val');
    if (parent !== undefined && parent !== null) basedOn.set(id, parent);
  }
  // A style based on a heading style is a heading too (a few steps up is enough in practice).
  for (let step = 0; step < 5; step += 1) {
    for (const [id, parent] of basedOn) if (headings.has(parent)) headings.add(id);
  }
  return headings;
}
