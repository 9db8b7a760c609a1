/**
 * A bound on how deeply a Markdown draft nests block quotes and lists, checked on the raw text
 * before the parser sees it. Thousands of levels (`>>>>…`, `- - - …`) make the parse slow and the
 * tree too deep to walk; no real draft nests more than a handful. The count is generous: every
 * container marker at the start of a line (`>`, `-`, `*`, `+`, `1.`, `1)`) and every two columns
 * of indentation count as one level.
 */
import { FirnlineError } from '../errors.js';

/** The deepest nesting of block quotes and lists a Markdown draft may have. */
export const MAX_NESTING_DEPTH = 100;

const MARKER = /^[ \t]*(?:>|[-*+](?=[ \t]|$)|\d{1,9}[.)](?=[ \t]|$))[ \t]?/u;

/** Throws FirnlineError `draft-too-deep` at the first line nested deeper than MAX_NESTING_DEPTH. */
export function checkNestingDepth(text: string, file = '-'): void {
  let lineNumber = 0;
  let start = 0;
  while (start <= text.length) {
    lineNumber += 1;
    let end = text.indexOf('\n', start);
    if (end < 0) end = text.length;
    let line = text.slice(start, end);
    let depth = 0;
    let indent = 0;
    for (;;) {
      const m = MARKER.exec(line);
      if (m === null) break;
      indent += m[0].length - m[0].trimStart().length;
      depth += 1;
      if (depth > MAX_NESTING_DEPTH) break;
      line = line.slice(m[0].length);
    }
    indent += line.length - line.trimStart().length;
    if (depth + Math.floor(indent / 2) > MAX_NESTING_DEPTH) {
      throw new FirnlineError('draft-too-deep', `block quotes or lists nested more than ${MAX_NESTING_DEPTH} levels deep; flatten them`, { file, line: lineNumber, column: 1 });
    }
    start = end + 1;
  }
}
