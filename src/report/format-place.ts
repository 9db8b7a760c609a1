import type { ParagraphPlace, Span } from '../types.js';

/** Anything with a place in a draft: a flag or a claim. */
export interface HasPlace {
  file: string;
  span: Span;
  paragraph?: ParagraphPlace;
}

// A heading is named to help find the paragraph, so a long one is cut where a reader still knows it.
const HEADING_LENGTH = 48;

/**
 * Where to look, as an editor reads it: `notes/vostok.md:12:5` for a text draft, and
 * `draft.docx, paragraph 4 (under "Ice cores")` for a Word draft, which has no lines.
 */
export function formatPlace(item: HasPlace): string {
  if (item.paragraph === undefined) return `${item.file}:${item.span.start.line}:${item.span.start.column}`;
  return `${item.file}, ${formatParagraph(item.paragraph)}`;
}

/** `paragraph 4 (under "Ice cores")`, or `paragraph 4` when no heading is above it. */
export function formatParagraph(paragraph: ParagraphPlace): string {
  const heading = [...paragraph.heading.replace(/\s+/gu, ' ').trim()];
  if (heading.length === 0) return `paragraph ${paragraph.number}`;
  const shown = heading.length > HEADING_LENGTH ? `${heading.slice(0, HEADING_LENGTH - 1).join('')}…` : heading.join('');
  return `paragraph ${paragraph.number} (under "${shown}")`;
}

/** The place within its file: `12:5`, or `paragraph 4` in a Word draft. */
export function formatPlaceInFile(item: HasPlace): string {
  return item.paragraph === undefined ? `${item.span.start.line}:${item.span.start.column}` : `paragraph ${item.paragraph.number}`;
}
