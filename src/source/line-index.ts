import type { Point, Span } from '../types.js';

/** Turns UTF-16 indices into one file's text into the points Firnline reports. */
export interface LineIndex {
  /** The point of the character at `index` (a UTF-16 index, clamped to `0..text.length`). */
  toPoint(index: number): Point;
  /** The span from `start` to just before `end` (both UTF-16 indices). */
  toSpan(start: number, end: number): Span;
}

const BOM = 0xfeff;

/**
 * Builds the line index of one file once; each look-up is then a binary search.
 * Lines end at `\r\n`, `\r` or `\n` (`\r\n` is one line end). Columns and offsets count code points,
 * so a surrogate pair is one column and a tab is one column. A leading byte-order mark is counted
 * in `offset` (it is in the file) but takes no column, as editors do not show it.
 *
 *     createLineIndex('ab\r\nc😀d').toPoint(7)  // 'd' → { line: 2, column: 3, offset: 6 }
 */
export function createLineIndex(text: string): LineIndex {
  const lineStarts = findLineStarts(text);
  const pairs = findSurrogatePairs(text);
  // Code points before `index`: each surrogate pair whose high half lies before `index` is one
  // code point made of two units. An index inside a pair maps to the pair itself.
  const codePointsBefore = (index: number): number => index - countBelow(pairs, index);

  const toPoint = (rawIndex: number): Point => {
    const index = Math.min(Math.max(0, Math.trunc(rawIndex)), text.length);
    // Lines whose start is <= index; an index on a byte-order mark still belongs to line 1.
    const line = Math.max(1, countBelow(lineStarts, index + 1));
    const lineStart = lineStarts[line - 1] ?? 0;
    const offset = codePointsBefore(index);
    const column = Math.max(1, offset - codePointsBefore(lineStart) + 1);
    return { line, column, offset };
  };

  return { toPoint, toSpan: (start, end) => ({ start: toPoint(start), end: toPoint(end) }) };
}

/** UTF-16 index where each line starts; the first line starts after a byte-order mark. */
function findLineStarts(text: string): number[] {
  const starts = [text.charCodeAt(0) === BOM ? 1 : 0];
  for (let i = 0; i < text.length; i += 1) {
    const code = text.charCodeAt(i);
    if (code === 0x0d) {
      if (text.charCodeAt(i + 1) === 0x0a) i += 1;
      starts.push(i + 1);
    } else if (code === 0x0a) {
      starts.push(i + 1);
    }
  }
  return starts;
}

/** UTF-16 index of the high half of every well-formed surrogate pair, ascending. */
function findSurrogatePairs(text: string): number[] {
  const highs: number[] = [];
  for (let i = 0; i + 1 < text.length; i += 1) {
    const code = text.charCodeAt(i);
    if (code >= 0xd800 && code <= 0xdbff) {
      const next = text.charCodeAt(i + 1);
      if (next >= 0xdc00 && next <= 0xdfff) {
        highs.push(i);
        i += 1;
      }
    }
  }
  return highs;
}

/** How many values of the ascending array `sorted` are below `limit` (binary search). */
function countBelow(sorted: readonly number[], limit: number): number {
  let low = 0;
  let high = sorted.length;
  while (low < high) {
    const middle = (low + high) >>> 1;
    if ((sorted[middle] ?? Infinity) < limit) low = middle + 1;
    else high = middle;
  }
  return low;
}
