import type { Draft, ProseBlock } from '../../types.js';
import { parseXmlPart, openWordPackage, type WordPackage } from './word-package.js';
import { readWordParagraphs, type WordParagraph } from './word-paragraphs.js';
import { findHeadingStyles } from './word-styles.js';

/** A Word package with its paragraphs read, for the draft reader and for `annotate`. */
export interface WordDocument {
  pack: WordPackage;
  paragraphs: WordParagraph[];
}

/** Opens a `.docx` file's bytes and reads its paragraphs (throws WordPackageError when it cannot). */
export function readWordDocument(bytes: Uint8Array): WordDocument {
  const pack = openWordPackage(bytes);
  const stylesPart = pack.parts['word/styles.xml'];
  const styles = stylesPart === undefined ? undefined : parseXmlPart(stylesPart, 'word/styles.xml');
  return { pack, paragraphs: readWordParagraphs(pack.document, findHeadingStyles(styles)) };
}

/**
 * A Word draft as Firnline checks it. A Word file has no lines, so the draft's `text` is made of its
 * paragraphs with text, one per line: line N is paragraph N, and a column counts characters within
 * the paragraph. Reports name the place as a paragraph (and the heading above it), never as a line.
 *
 *     paragraphs 'Ice cores' (heading), 'Vostok spans 420,000 years.'
 *     // text 'Ice cores\nVostok spans 420,000 years.'; the second block has heading 'Ice cores'
 */
export function wordDraftFrom(path: string, document: WordDocument): Draft {
  const blocks: ProseBlock[] = [];
  let heading = '';
  let start = 0;
  for (const paragraph of document.paragraphs) {
    const first = paragraph.text.search(/\S/u);
    const last = paragraph.text.length - (/\s*$/u.exec(paragraph.text)?.[0].length ?? 0);
    const text = paragraph.text.slice(first, last);
    const offsets = Array.from({ length: text.length + 1 }, (_, i) => start + first + i);
    if (paragraph.kind === 'heading') heading = text;
    blocks.push({ kind: paragraph.kind, text, offsets, heading });
    start += paragraph.text.length + 1;
  }
  return { path, text: document.paragraphs.map((p) => p.text).join('\n'), format: 'docx', blocks };
}
