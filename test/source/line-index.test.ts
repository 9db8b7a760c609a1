import { describe, it, expect } from 'vitest';
import fc from 'fast-check';
import { createLineIndex } from '../../src/source/index.js';
import type { Point } from '../../src/types.js';

// Line ends as CommonMark 0.31.2 §2.1 defines them: "a line feed (U+000A), a carriage return
// (U+000D) not followed by a line feed, or a carriage return and a following line feed".
// Columns count Unicode code points, SARIF 2.1.0's `columnKind: unicodeCodePoints` (the enum is in
// node_modules/@microsoft/sarif-multitool-linux/sarif-2.1.0.json). UTF-16 lengths per the Unicode
// Standard: U+00E9 é, U+2082 ₂ and U+0301 are one unit; U+1F9CA 🧊 is a surrogate pair.
const cases: { name: string; text: string; index: number; point: Point }[] = [
  { name: 'first character', text: 'Firn', index: 0, point: { line: 1, column: 1, offset: 0 } },
  { name: 'after a line feed', text: 'ab\ncd', index: 3, point: { line: 2, column: 1, offset: 3 } },
  { name: 'after \\r\\n (one line end)', text: 'ab\r\ncd', index: 4, point: { line: 2, column: 1, offset: 4 } },
  { name: 'the \\n of a \\r\\n stays on its line', text: 'ab\r\ncd', index: 3, point: { line: 1, column: 4, offset: 3 } },
  { name: 'after a lone \\r', text: 'ab\rcd', index: 4, point: { line: 2, column: 2, offset: 4 } },
  { name: '\\r\\r\\n is two line ends', text: 'a\r\r\nb', index: 4, point: { line: 3, column: 1, offset: 4 } },
  { name: '\\n\\r is two line ends', text: 'a\n\rb', index: 3, point: { line: 3, column: 1, offset: 3 } },
  { name: 'a tab is one column', text: '\tCO2\t280', index: 5, point: { line: 1, column: 6, offset: 5 } },
  { name: 'é (U+00E9) is one column', text: 'é 8', index: 2, point: { line: 1, column: 3, offset: 2 } },
  { name: 'e + U+0301 is two code points', text: 'e\u0301 8', index: 3, point: { line: 1, column: 4, offset: 3 } },
  { name: 'CO₂ subscript is one column', text: 'x\nCO₂ 280', index: 6, point: { line: 2, column: 5, offset: 6 } },
  { name: 'after a surrogate pair', text: 'a🧊b', index: 3, point: { line: 1, column: 3, offset: 2 } },
  { name: 'inside a surrogate pair: the pair', text: 'a🧊b', index: 2, point: { line: 1, column: 2, offset: 1 } },
  { name: 'pairs on earlier lines do not shift columns', text: '🧊🧊\n🧊b', index: 7, point: { line: 2, column: 2, offset: 4 } },
  { name: 'a lone high surrogate is one code point', text: '\ud83ex', index: 1, point: { line: 1, column: 2, offset: 1 } },
  { name: 'a BOM takes no column but is in the offset', text: '\ufeffIce', index: 1, point: { line: 1, column: 1, offset: 1 } },
  { name: 'the BOM itself', text: '\ufeffIce', index: 0, point: { line: 1, column: 1, offset: 0 } },
  { name: 'end of text', text: 'ab\n', index: 3, point: { line: 2, column: 1, offset: 3 } },
  { name: 'empty text', text: '', index: 0, point: { line: 1, column: 1, offset: 0 } },
  { name: 'past the end is clamped', text: 'ab', index: 99, point: { line: 1, column: 3, offset: 2 } },
  { name: 'before the start is clamped', text: 'ab', index: -4, point: { line: 1, column: 1, offset: 0 } },
];

/**
 * The reference the index is checked against: walk the code points one by one, counting lines
 * and columns, with no table and no search. A low surrogate gets its pair's point.
 */
function naivePoints(text: string): Point[] {
  const points: Point[] = [];
  const chars = [...text];
  let [line, column, offset] = [1, 1, 0];
  for (const [n, char] of chars.entries()) {
    for (let unit = 0; unit < char.length; unit += 1) points.push({ line, column, offset });
    offset += 1;
    if (n === 0 && char === '\ufeff') continue;
    if (char === '\n' || (char === '\r' && chars[n + 1] !== '\n')) [line, column] = [line + 1, 1];
    else column += 1;
  }
  points.push({ line, column, offset });
  return points;
}

const anyUnit = fc.integer({ min: 0, max: 0xffff }).map((code) => String.fromCharCode(code));
const piece = fc.oneof(
  fc.string({ unit: 'binary', maxLength: 12 }),
  fc.string({ unit: anyUnit, maxLength: 6 }),
  fc.constantFrom('\r\n', '\r', '\n', '\t', '🧊', 'é', 'CO₂', '\ufeff'),
);

describe('createLineIndex', () => {
  it.each(cases)('$name', ({ text, index, point }) => {
    expect(createLineIndex(text).toPoint(index)).toEqual(point);
  });

  it('toSpan gives both ends, end exclusive', () => {
    const text = 'Vostok\r\n  reached 🧊 420 ppm';
    const start = text.indexOf('420');
    expect(createLineIndex(text).toSpan(start, start + 3)).toEqual({
      start: { line: 2, column: 13, offset: 20 },
      end: { line: 2, column: 16, offset: 23 },
    });
  });

  it('agrees with a naive code-point walk on arbitrary text with mixed line ends', () => {
    fc.assert(
      fc.property(fc.boolean(), fc.array(piece, { maxLength: 30 }), (bom, pieces) => {
        const text = (bom ? '\ufeff' : '') + pieces.join('');
        const index = createLineIndex(text);
        const expected = naivePoints(text);
        for (let i = 0; i <= text.length; i += 1) expect(index.toPoint(i)).toEqual(expected[i]);
      }),
      { numRuns: 500 },
    );
  });
});
