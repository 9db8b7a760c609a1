/**
 * Firnline's positions in LSP terms. Firnline counts 1-based lines and code-point columns, with a
 * 0-based code-point offset; the Language Server Protocol counts 0-based lines and, by default,
 * UTF-16 code units within a line (LSP 3.17, "Position" and "PositionEncodingKind": `utf-16` is the
 * encoding every client must support). So the offset is turned into a UTF-16 index first, and the
 * index into a line and character by the document's own line table (`\r\n`, `\r` and `\n` end a
 * line, as in both Firnline's line index and the LSP specification).
 */
import type { Position, Range } from 'vscode-languageserver';
import type { Span } from '../types.js';

/** Maps between code-point offsets and LSP positions of one text. */
export interface PositionMap {
  /** The UTF-16 index of the character at a code-point offset (clamped to the text). */
  indexOf(offset: number): number;
  /** The LSP position of a UTF-16 index. */
  positionOf(index: number): Position;
  /** The UTF-16 index of an LSP position (a character past the line end stops at the line end). */
  indexAt(position: Position): number;
  /** The LSP range of a Firnline span. */
  rangeOf(span: Span): Range;
}

/**
 * Builds the map once per text; look-ups are binary searches.
 *
 *     createPositionMap('a\r\n😀b').rangeOf(span of 'b')  // { line: 1, character: 2 } .. { line: 1, character: 3 }
 */
export function createPositionMap(text: string): PositionMap {
  const lineStarts = [0];
  // Code-point offset of the high half of each surrogate pair: each such pair adds one UTF-16 unit.
  const pairOffsets: number[] = [];
  let codePoints = 0;
  for (let i = 0; i < text.length; i += 1, codePoints += 1) {
    const code = text.charCodeAt(i);
    if (code === 0x0d) {
      if (text.charCodeAt(i + 1) === 0x0a) {
        i += 1;
        codePoints += 1;
      }
      lineStarts.push(i + 1);
    } else if (code === 0x0a) {
      lineStarts.push(i + 1);
    } else if (code >= 0xd800 && code <= 0xdbff) {
      const next = text.charCodeAt(i + 1);
      if (next >= 0xdc00 && next <= 0xdfff) {
        pairOffsets.push(codePoints);
        i += 1;
      }
    }
  }

  const indexOf = (offset: number): number => {
    const o = Math.max(0, Math.trunc(offset));
    return Math.min(text.length, o + countBelow(pairOffsets, o));
  };
  const positionOf = (rawIndex: number): Position => {
    const index = Math.min(Math.max(0, rawIndex), text.length);
    const line = Math.max(0, countBelow(lineStarts, index + 1) - 1);
    return { line, character: index - (lineStarts[line] ?? 0) };
  };
  const indexAt = (position: Position): number => {
    if (position.line < 0) return 0;
    if (position.line >= lineStarts.length) return text.length;
    const start = lineStarts[position.line] ?? 0;
    const next = lineStarts[position.line + 1] ?? text.length;
    let end = next;
    // The line's own text stops before its line end.
    if (end > start && text.charCodeAt(end - 1) === 0x0a) end -= 1;
    if (end > start && text.charCodeAt(end - 1) === 0x0d) end -= 1;
    return Math.min(start + Math.max(0, position.character), end);
  };
  return {
    indexOf,
    positionOf,
    indexAt,
    rangeOf: (span) => ({ start: positionOf(indexOf(span.start.offset)), end: positionOf(indexOf(span.end.offset)) }),
  };
}

/** How many values of the ascending array `sorted` are below `limit`. */
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
