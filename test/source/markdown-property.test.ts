import { describe, it, expect } from 'vitest';
import fc from 'fast-check';
import { readMarkdownBlocks } from '../../src/source/index.js';

/** A generated piece of Markdown: its source, and the prose word it carries with the word's index. */
interface Piece {
  source: string;
  /** The word as it reads in the prose, and where its first character is in `source`; none for code. */
  prose?: { text: string; at: number };
}

const letter = fc.constantFrom(...'abcXYZ0189éß₂', '🧊');
const word = fc.array(letter, { minLength: 1, maxLength: 6 }).map((letters) => letters.join(''));

// Inline forms per CommonMark 0.31.2 (emphasis §6.2, links §6.3, code spans §6.1, escapes §2.4,
// references §2.5) and GFM strikethrough (§6.5). `at` is where the prose starts in the source: an
// escape maps to its backslash, a reference to its `&`.
const piece: fc.Arbitrary<Piece> = fc.oneof(
  word.map((w) => ({ source: w, prose: { text: w, at: 0 } })),
  word.map((w) => ({ source: `*${w}*`, prose: { text: w, at: 1 } })),
  word.map((w) => ({ source: `**${w}**`, prose: { text: w, at: 2 } })),
  word.map((w) => ({ source: `_${w}_`, prose: { text: w, at: 1 } })),
  word.map((w) => ({ source: `~~${w}~~`, prose: { text: w, at: 2 } })),
  word.map((w) => ({ source: `[${w}](https://example.org/${w.length})`, prose: { text: w, at: 1 } })),
  word.map((w) => ({ source: `\`${w}\`` })),
  fc.constant({ source: '\\*', prose: { text: '*', at: 0 } }),
  fc.constant({ source: '&amp;', prose: { text: '&', at: 0 } }),
  fc.constant({ source: '&#8217;', prose: { text: '’', at: 0 } }),
);
const line = fc.array(piece, { minLength: 1, maxLength: 6 });
const block = fc.tuple(fc.constantFrom('', '> ', '- ', '# ', '1. '), fc.array(line, { minLength: 1, maxLength: 3 }), fc.constantFrom('\n', '\r\n', '\r'));

/** Joins generated blocks into a draft, recording where each prose word went. */
function assemble(blocks: [string, Piece[][], string][]): { markdown: string; words: { text: string; at: number }[] } {
  let markdown = '';
  const words: { text: string; at: number }[] = [];
  for (const [prefix, lines, lineEnd] of blocks) {
    if (markdown !== '') markdown += lineEnd + lineEnd;
    markdown += prefix;
    for (const [n, pieces] of lines.entries()) {
      if (n > 0) markdown += lineEnd;
      for (const [m, { source, prose }] of pieces.entries()) {
        if (m > 0) markdown += ' ';
        if (prose !== undefined) words.push({ text: prose.text, at: markdown.length + prose.at });
        markdown += source;
      }
    }
  }
  return { markdown, words };
}

const wordChar = /[\p{L}\p{N}]/u;

describe('readMarkdownBlocks on generated Markdown', () => {
  it('maps every prose word back to where it was written', () => {
    fc.assert(
      fc.property(fc.array(block, { minLength: 1, maxLength: 4 }), (blocks) => {
        const { markdown, words } = assemble(blocks);
        const read = readMarkdownBlocks(markdown);
        for (const { text, at } of words) {
          const hit = read.some((b) => [...b.text.matchAll(new RegExp(escapeRegExp(text), 'gu'))].some((m) => b.offsets[m.index] === at));
          expect(hit, `${JSON.stringify(text)} at ${at} in ${JSON.stringify(markdown)}`).toBe(true);
        }
        for (const b of read) {
          // Letters and digits are never markup, so each must be the very character it maps to.
          for (let i = 0; i < b.text.length; i += 1) {
            if (wordChar.test(b.text[i] ?? '')) expect(markdown[b.offsets[i] ?? -1]).toBe(b.text[i]);
          }
        }
      }),
      { numRuns: 400 },
    );
  });

  const markup = fc.constantFrom(...'*_`\\&#;[]()<>!|-~+=: \t\n\r', 'a', '1', 'é', '🧊', '\ufeff', '&amp;', '&#128512;', '\r\n', '---\n', '```');
  it.each([
    ['arbitrary Unicode', fc.string({ unit: 'binary', maxLength: 80 })],
    ['Markdown punctuation soup', fc.array(markup, { maxLength: 60 }).map((parts) => parts.join(''))],
  ])('never throws on %s, and keeps offsets in order and inside the file', (_name, text) => {
    fc.assert(
      fc.property(text, (markdown) => {
        for (const b of readMarkdownBlocks(markdown)) {
          expect(b.offsets).toHaveLength(b.text.length + 1);
          b.offsets.forEach((offset, i) => {
            expect(offset).toBeGreaterThanOrEqual(i === 0 ? 0 : (b.offsets[i - 1] ?? 0));
            expect(offset).toBeLessThanOrEqual(markdown.length);
          });
        }
      }),
      { numRuns: 1000 },
    );
  });
});

function escapeRegExp(text: string): string {
  return text.replace(/[.*+?^${}()|[\]\\]/gu, '\\$&');
}
