// Firnline spans (1-based line, code-point column, code-point offset) as LSP positions (LSP 3.17,
// "Position": 0-based line, character counted in UTF-16 code units; `\r\n`, `\r` and `\n` end a
// line). Checked against vscode-languageserver-textdocument, the LSP project's own implementation.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { TextDocument } from 'vscode-languageserver-textdocument';
import { createPositionMap } from '../../src/lsp/positions.js';
import { createLineIndex } from '../../src/source/line-index.js';

/** The UTF-16 index of code-point offset `offset`, counted the slow, obvious way. */
const utf16At = (text: string, offset: number) => [...text].slice(0, offset).join('').length;

describe('createPositionMap', () => {
  it.each([
    // [text, code-point offset, expected LSP position]
    ['abc', 2, { line: 0, character: 2 }],
    ['a\r\nb', 3, { line: 1, character: 0 }],
    ['a\rb\nc', 4, { line: 2, character: 0 }],
    // U+1F9CA (ice cube) is one code point and two UTF-16 units (a surrogate pair).
    ['🧊 x', 2, { line: 0, character: 3 }],
    ['x\r\n🧊🧊 y', 6, { line: 1, character: 5 }],
    // U+2744 U+FE0F (snowflake with a variation selector): two code points, two UTF-16 units.
    ['❄️y', 2, { line: 0, character: 2 }],
  ])('%j at code point %i is %j', (text, offset, expected) => {
    const map = createPositionMap(text);
    expect(map.positionOf(map.indexOf(offset))).toEqual(expected);
  });

  it('turns a Firnline span into the LSP range of the same characters', () => {
    const text = '# Notes\r\n\r\n🧊 The core spans 800,000 years.\r\n';
    const start = text.indexOf('800,000');
    const end = start + '800,000 years'.length;
    const span = createLineIndex(text).toSpan(start, end);
    expect(span.start).toMatchObject({ line: 3, column: 18 }); // code points: the emoji is one column
    expect(createPositionMap(text).rangeOf(span)).toEqual({ start: { line: 2, character: 18 }, end: { line: 2, character: 31 } });
  });

  it('agrees with the LSP text document at every code point (property)', () => {
    const piece = fc.constantFrom('a', ' ', '\n', '\r', '\r\n', '🧊', '❄️', 'é', '\t', '\uFEFF', '😀');
    fc.assert(
      fc.property(fc.array(piece, { maxLength: 40 }), (pieces) => {
        const text = pieces.join('');
        const map = createPositionMap(text);
        const document = TextDocument.create('file:///x.md', 'markdown', 1, text);
        const codePoints = [...text].length;
        for (let offset = 0; offset <= codePoints; offset += 1) {
          const index = utf16At(text, offset);
          expect(map.indexOf(offset)).toBe(index);
          // The middle of a `\r\n` is no place a span starts or ends; the text document moves it back.
          if (text[index - 1] === '\r' && text[index] === '\n') continue;
          expect(map.positionOf(index)).toEqual(document.positionAt(index));
          expect(map.indexAt(document.positionAt(index))).toBe(index);
        }
      }),
    );
  });

  it('stops a character past the line end at the line end, as the specification asks', () => {
    const map = createPositionMap('ab\r\ncd');
    expect(map.indexAt({ line: 0, character: 99 })).toBe(2);
    expect(map.indexAt({ line: 9, character: 0 })).toBe(6);
  });
});
