import { describe, it, expect } from 'vitest';
import { draftFromText } from '../../src/source/index.js';
import { locate, proseOf } from './locate.js';

// Small drafts, one feature each. `prose` is every block's text; `word` is found in it and must map
// back to `start`/`end` as [line, column, offset] (1-based line and column, 0-based offset, all in
// code points) and to the `original` spelling. Markdown meaning per CommonMark 0.31.2 and GFM 0.29
// (section numbers beside each case); TOML front matter between `+++` lines is common practice.
const CASES = [
  {
    name: 'TOML front matter is not prose (common practice)',
    markdown: '+++\ntitle = "Firn 280 ppm"\n+++\n\nIce at 3,270 m.',
    prose: ['Ice at 3,270 m.'],
    word: '3,270 m', start: [5, 8, 39], end: [5, 15, 46], original: '3,270 m',
  },
  {
    name: 'a tab is one column, in a paragraph and after a list marker (CommonMark §2.2)',
    markdown: 'Warming\tof 4 K\n\n-\tTab item 6 K',
    prose: ['Warming\tof 4 K', 'Tab item 6 K'],
    word: '6 K', start: [3, 12, 27], end: [3, 15, 30], original: '6 K',
  },
  {
    name: 'a numeric character reference spans its whole spelling (CommonMark §2.5)',
    markdown: 'CO&#x2082; rose \\_fast\\_ by 100&nbsp;ppm',
    prose: ['CO₂ rose _fast_ by 100\u00a0ppm'],
    word: 'CO₂', start: [1, 1, 0], end: [1, 11, 10], original: 'CO&#x2082;',
  },
  {
    name: 'an escaped character spans its backslash (CommonMark §2.4)',
    markdown: 'CO&#x2082; rose \\_fast\\_ by 100&nbsp;ppm',
    prose: ['CO₂ rose _fast_ by 100\u00a0ppm'],
    word: '_fast_', start: [1, 17, 16], end: [1, 25, 24], original: '\\_fast\\_',
  },
  {
    name: 'a named reference before a word (CommonMark §2.5)',
    markdown: 'CO&#x2082; rose \\_fast\\_ by 100&nbsp;ppm',
    prose: ['CO₂ rose _fast_ by 100\u00a0ppm'],
    word: '100\u00a0ppm', start: [1, 29, 28], end: [1, 41, 40], original: '100&nbsp;ppm',
  },
  {
    name: 'strong emphasis with underscores and nested emphasis (CommonMark §6.2)',
    markdown: '__cold__ and ***both*** and *nested **strong** text*',
    prose: ['cold and both and nested strong text'],
    word: 'strong', start: [1, 39, 38], end: [1, 45, 44], original: 'strong',
  },
  {
    name: 'inline code between words becomes one space (CommonMark §6.1)',
    markdown: 'Air `bubble` trapped',
    prose: ['Air   trapped'],
    word: 'trapped', start: [1, 14, 13], end: [1, 21, 20], original: 'trapped',
  },
  {
    name: 'surrogate pairs are one column each (Unicode: U+1F9CA is two UTF-16 units)',
    markdown: '🧊🧊 then 5 K',
    prose: ['🧊🧊 then 5 K'],
    word: '5 K', start: [1, 9, 8], end: [1, 12, 11], original: '5 K',
  },
  {
    name: 'nested list items (CommonMark §5.2)',
    markdown: '- a\n  - b\n    - deep 7 K',
    prose: ['a', 'b', 'deep 7 K'],
    word: 'deep 7 K', start: [3, 7, 16], end: [3, 15, 24], original: 'deep 7 K',
  },
  {
    name: 'nested block quotes drop their markers (CommonMark §5.1)',
    markdown: '> > inner 2 K\n> > more',
    prose: ['inner 2 K\nmore'],
    word: 'more', start: [2, 5, 18], end: [2, 9, 22], original: 'more',
  },
  {
    name: 'a lazy continuation line of a block quote (CommonMark §5.1)',
    markdown: '> first\nlazy line',
    prose: ['first\nlazy line'],
    word: 'lazy', start: [2, 1, 8], end: [2, 5, 12], original: 'lazy',
  },
  {
    name: 'a setext heading (CommonMark §4.3)',
    markdown: 'Ice ages\n========\n\nText.',
    prose: ['Ice ages', 'Text.'],
    word: 'ages', start: [1, 5, 4], end: [1, 9, 8], original: 'ages',
  },
  {
    name: 'a byte-order mark takes no column but counts in the offset',
    markdown: '\ufeff# Title\n\nIce 5 K',
    prose: ['Title', 'Ice 5 K'],
    word: 'Title', start: [1, 3, 3], end: [1, 8, 8], original: 'Title',
  },
  {
    name: 'hard line breaks become one space (CommonMark §6.7)',
    markdown: 'one 1 K  \ntwo 2 K\\\nthree',
    prose: ['one 1 K two 2 K three'],
    word: 'three', start: [3, 1, 19], end: [3, 6, 24], original: 'three',
  },
  {
    name: 'a task list checkbox is not prose (GFM §5.3)',
    markdown: '- [x] done 3 K',
    prose: ['done 3 K'],
    word: 'done', start: [1, 7, 6], end: [1, 11, 10], original: 'done',
  },
  {
    name: 'a reference link keeps its text, the definition is not prose (CommonMark §4.7, §6.3)',
    markdown: 'See [Petit et al.][p].\n\n[p]: https://example.org',
    prose: ['See Petit et al..'],
    word: 'Petit et al.', start: [1, 6, 5], end: [1, 18, 17], original: 'Petit et al.',
  },
  {
    name: 'inline HTML tags are removed, the text between them stays (CommonMark §6.6)',
    markdown: 'A <span>warm 2 K</span> spell',
    prose: ['A  warm 2 K  spell'],
    word: 'warm 2 K', start: [1, 9, 8], end: [1, 17, 16], original: 'warm 2 K',
  },
  {
    name: 'a link whose text is its own address is not prose',
    markdown: '[https://example.org](https://example.org) and more',
    prose: ['and more'],
    word: 'more', start: [1, 48, 47], end: [1, 52, 51], original: 'more',
  },
  {
    name: 'a footnote reference is removed, its definition is prose (GFM footnotes)',
    markdown: 'Text[^n] end.\n\n[^n]: Source note.',
    prose: ['Text  end.', 'Source note.'],
    word: 'Source', start: [3, 7, 21], end: [3, 13, 27], original: 'Source',
  },
] as const;

describe('readMarkdownBlocks: one feature at a time', () => {
  it.each(CASES)('$name', ({ markdown, prose, word, start, end, original }) => {
    const draft = draftFromText('case.md', markdown, 'markdown');
    expect(proseOf(draft)).toEqual(prose);
    const found = locate(draft, word);
    expect([found.start, found.end, found.original]).toEqual([
      { line: start[0], column: start[1], offset: start[2] },
      { line: end[0], column: end[1], offset: end[2] },
      original,
    ]);
  });
});
