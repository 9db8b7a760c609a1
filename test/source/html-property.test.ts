import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { readHtmlBlocks } from '../../src/source/html.js';

/** A generated piece of HTML: its source, and the prose it carries with where that starts in the source. */
interface Piece {
  source: string;
  prose?: { text: string; at: number };
}

const letter = fc.constantFrom(...'abcXYZ0189éß₂', '🧊');
const word = fc.array(letter, { minLength: 1, maxLength: 6 }).map((letters) => letters.join(''));

// Phrasing content and character references per the HTML Living Standard (§13.1.4 character
// references, §13.2.5.72 named references without a semicolon); code and comments are not prose.
const piece: fc.Arbitrary<Piece> = fc.oneof(
  word.map((w) => ({ source: w, prose: { text: w, at: 0 } })),
  word.map((w) => ({ source: `<em>${w}</em>`, prose: { text: w, at: 4 } })),
  word.map((w) => {
    const open = `<a href="https://example.org/${w.length}">`;
    return { source: `${open}${w}</a>`, prose: { text: w, at: open.length } };
  }),
  word.map((w) => ({ source: `<strong class="x">${w}</strong>`, prose: { text: w, at: '<strong class="x">'.length } })),
  word.map((w) => ({ source: `<code>${w}</code>` })),
  word.map((w) => ({ source: `<!-- ${w} -->` })),
  fc.constant({ source: '&amp;', prose: { text: '&', at: 0 } }),
  fc.constant({ source: '&#8217;', prose: { text: '’', at: 0 } }),
  fc.constant({ source: '&lt;', prose: { text: '<', at: 0 } }),
  fc.constant({ source: '\\*', prose: { text: '\\*', at: 0 } }),
);
const block = fc.tuple(fc.constantFrom('p', 'li', 'dd', 'h2', 'blockquote', 'div'), fc.array(piece, { minLength: 1, maxLength: 6 }), fc.constantFrom('\n', '\r\n', ''));

describe('HTML blocks, property', () => {
  it('maps every prose character back to where its spelling starts in the original HTML', () => {
    fc.assert(
      fc.property(fc.array(block, { minLength: 1, maxLength: 4 }), (blocks) => {
        let html = '<!doctype html><body>';
        const words: { text: string; at: number }[] = [];
        for (const [tag, pieces, lineEnd] of blocks) {
          html += `${lineEnd}<${tag}>`;
          for (const [m, { source, prose }] of pieces.entries()) {
            if (m > 0) html += ' ';
            if (prose !== undefined) words.push({ text: prose.text, at: html.length + prose.at });
            html += source;
          }
          html += `</${tag}>`;
        }
        const found = readHtmlBlocks(html);
        const text = found.map((b) => b.text).join('\n');
        for (const { text: wordText } of words) expect(text).toContain(wordText);
        // Each word's first prose character maps to the first unit of its source spelling.
        const starts = new Set(found.flatMap((b) => b.offsets.slice(0, -1)));
        for (const { at } of words) expect(starts.has(at)).toBe(true);
        for (const b of found) {
          for (let i = 1; i < b.offsets.length; i += 1) expect(b.offsets[i]).toBeGreaterThanOrEqual(b.offsets[i - 1] ?? 0);
        }
      }),
    );
  });
});
