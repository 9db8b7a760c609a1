import { describe, it, expect } from 'vitest';
import { draftFromText } from '../../src/source/index.js';
import { locate, proseOf } from './locate.js';

// An invented newsletter draft of the Larchmere Ice Museum. Line numbers on the right are the
// 1-based lines the expectations below use; columns and offsets count code points (SARIF 2.1.0
// `columnKind: unicodeCodePoints`). What Markdown means here follows CommonMark 0.31.2 (escapes
// §2.4, entity and numeric character references §2.5, code spans §6.1, raw HTML §6.6, autolinks
// §6.5) and the GFM spec 0.29 (tables §4.10, strikethrough §6.5, extended autolinks §6.9); YAML
// front matter between `---` lines is common practice (static site generators).
const NEWSLETTER = [
  '---', //                                                                          1
  'title: Firn notes 280 ppm', //                                                    2
  'tags: [ice]', //                                                                  3
  '---', //                                                                          4
  '', //                                                                             5
  '# Ice *cores* and CO₂', //                                                        6
  '', //                                                                             7
  'The **Vostok** core spans 420,000 years\\* of _air_.', //                         8
  'See [the EPICA record](https://example.org/epica) &amp; ~~old~~ more.', //        9
  'Dome C `holds 800 kyr` reached 3,270 m <!-- check 190 ppm --> deep.', //         10
  '', //                                                                            11
  '<!-- editor: check 280 ppm -->', //                                              12
  '', //                                                                            13
  '```', //                                                                         14
  'code 280 ppm', //                                                                15
  '```', //                                                                         16
  '', //                                                                            17
  '> Quoted 180 ppm', //                                                            18
  '> continues&#8217;s here', //                                                    19
  '', //                                                                            20
  '- Item one says 🧊 9 K', //                                                      21
  '  - nested item café 4 K', //                                                    22
  '', //                                                                            23
  '| Record | Span |', //                                                          24
  '| --- | --- |', //                                                              25
  '| Vostok | 420 kyr |', //                                                       26
  '| EPICA\\|C | 800 kyr |', //                                                    27
  '', //                                                                            28
  'Visit <https://example.org/x> or www.example.org today.', //                    29
  '![glacier 999](g.png) after.', //                                               30
].join('\n');

/** A word as it reads in the prose, where it starts and ends in the file, and how it is spelled there. */
const WORDS = [
  { prose: 'cores', nth: 0, start: [6, 8, 54], end: [6, 13, 59], original: 'cores' },
  { prose: 'CO₂', nth: 0, start: [6, 19, 65], end: [6, 22, 68], original: 'CO₂' },
  { prose: 'Vostok', nth: 0, start: [8, 7, 76], end: [8, 13, 82], original: 'Vostok' },
  { prose: '420,000 years*', nth: 0, start: [8, 27, 96], end: [8, 42, 111], original: '420,000 years\\*' },
  { prose: 'air', nth: 0, start: [8, 47, 116], end: [8, 50, 119], original: 'air' },
  { prose: 'EPICA record', nth: 0, start: [9, 10, 131], end: [9, 22, 143], original: 'EPICA record' },
  { prose: '& old more', nth: 0, start: [9, 51, 172], end: [9, 69, 190], original: '&amp; ~~old~~ more' },
  { prose: 'Dome C', nth: 0, start: [10, 1, 192], end: [10, 7, 198], original: 'Dome C' },
  { prose: 'reached 3,270 m', nth: 0, start: [10, 24, 215], end: [10, 39, 230], original: 'reached 3,270 m' },
  { prose: 'deep', nth: 0, start: [10, 63, 254], end: [10, 67, 258], original: 'deep' },
  { prose: 'Quoted 180 ppm', nth: 0, start: [18, 3, 317], end: [18, 17, 331], original: 'Quoted 180 ppm' },
  { prose: 'continues’s', nth: 0, start: [19, 3, 334], end: [19, 20, 351], original: 'continues&#8217;s' },
  { prose: '🧊 9 K', nth: 0, start: [21, 17, 374], end: [21, 22, 379], original: '🧊 9 K' },
  { prose: 'café 4 K', nth: 0, start: [22, 17, 396], end: [22, 25, 404], original: 'café 4 K' },
  { prose: 'Vostok', nth: 1, start: [26, 3, 440], end: [26, 9, 446], original: 'Vostok' },
  { prose: '420 kyr', nth: 0, start: [26, 12, 449], end: [26, 19, 456], original: '420 kyr' },
  { prose: 'EPICA|C', nth: 0, start: [27, 3, 461], end: [27, 11, 469], original: 'EPICA\\|C' },
  { prose: 'today', nth: 0, start: [29, 50, 532], end: [29, 55, 537], original: 'today' },
  { prose: 'after', nth: 0, start: [30, 23, 561], end: [30, 28, 566], original: 'after' },
] as const;

const point = ([line, column, offset]: readonly number[]) => ({ line, column, offset });

describe('readMarkdownBlocks: positions in the original file', () => {
  const draft = draftFromText('newsletter.md', NEWSLETTER, 'markdown');

  it.each(WORDS)('"$prose" (occurrence $nth) maps back to where it is written', ({ prose, nth, start, end, original }) => {
    const found = locate(draft, prose, nth);
    expect(found.start).toEqual(point(start));
    expect(found.end).toEqual(point(end));
    expect(found.original).toBe(original);
  });

  // A `\r\n` is one line end but two code points, so each earlier line adds one to the offset
  // and nothing to line or column; a lone `\r` is one line end and one code point, like `\n`.
  it.each(WORDS)('"$prose" keeps its line and column in a CRLF copy', ({ prose, nth, start, end }) => {
    const found = locate(draftFromText('crlf.md', NEWSLETTER.replaceAll('\n', '\r\n'), 'markdown'), prose, nth);
    const [line, column, offset] = start;
    expect(found.start).toEqual({ line, column, offset: offset + line - 1 });
    expect(found.end).toEqual({ line: end[0], column: end[1], offset: end[2] + end[0] - 1 });
  });

  it.each(WORDS)('"$prose" keeps line, column and offset in a lone-CR copy', ({ prose, nth, start, end }) => {
    const found = locate(draftFromText('cr.md', NEWSLETTER.replaceAll('\n', '\r'), 'markdown'), prose, nth);
    expect([found.start, found.end]).toEqual([point(start), point(end)]);
  });

  it('reads the same prose whatever the line ends', () => {
    const prose = proseOf(draft);
    expect(proseOf(draftFromText('a.md', NEWSLETTER.replaceAll('\n', '\r\n'), 'markdown'))).toEqual(prose);
    expect(proseOf(draftFromText('b.md', NEWSLETTER.replaceAll('\n', '\r'), 'markdown'))).toEqual(prose);
  });
});

describe('readMarkdownBlocks: what counts as prose', () => {
  const draft = draftFromText('newsletter.md', NEWSLETTER, 'markdown');

  it('keeps each block with markup removed, inline code and HTML as one space, soft breaks as \\n', () => {
    expect(draft.blocks.map(({ kind, text }) => [kind, text])).toEqual([
      ['front-matter', 'Firn notes 280 ppm'],
      ['heading', 'Ice cores and CO₂'],
      ['paragraph', 'The Vostok core spans 420,000 years* of air.\nSee the EPICA record & old more.\nDome C   reached 3,270 m   deep.'],
      ['blockquote', 'Quoted 180 ppm\ncontinues’s here'],
      ['list-item', 'Item one says 🧊 9 K'],
      ['list-item', 'nested item café 4 K'],
      ['table-cell', 'Record'],
      ['table-cell', 'Span'],
      ['table-cell', 'Vostok'],
      ['table-cell', 'Vostok, Span: 420 kyr'],
      ['table-cell', 'EPICA|C'],
      ['table-cell', 'EPICA|C, Span: 800 kyr'],
      ['paragraph', 'Visit   or   today.\n  after.'],
      ['image-text', 'glacier 999'],
    ]);
  });

  it.each([
    ['front matter that is not published', 'tags'],
    ['an HTML comment block', 'editor: check'],
    ['an inline HTML comment', '190 ppm'],
    ['a fenced code block', 'code 280'],
    ['inline code', 'holds 800'],
    ['an angle-bracket autolink', 'example.org/x'],
    ['a literal www autolink', 'www.example.org'],
    ['a link address', 'example.org/epica'],
    ['an image address', 'g.png'],
  ])('leaves out %s', (_what, words) => {
    expect(proseOf(draft).join('\n')).not.toContain(words);
  });

  it('gives every block the nearest heading above it, and a heading its own text', () => {
    const text = '# Cores\n\nFirst.\n\n## Air *bubbles*\n\n- Second.\n\nIntro before any heading is absent.';
    const blocks = draftFromText('h.md', 'Lead.\n\n' + text, 'markdown').blocks;
    expect(blocks.map(({ text: t, heading }) => [t, heading])).toEqual([
      ['Lead.', ''],
      ['Cores', 'Cores'],
      ['First.', 'Cores'],
      ['Air bubbles', 'Air bubbles'],
      ['Second.', 'Air bubbles'],
      ['Intro before any heading is absent.', 'Air bubbles'],
    ]);
  });

  it('ends every offsets array with one entry just past the block', () => {
    for (const block of draft.blocks) expect(block.offsets).toHaveLength(block.text.length + 1);
  });
});
