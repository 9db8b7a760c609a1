import { describe, expect, it } from 'vitest';
import { checkText } from '../../src/engine.js';
import { draftFromText } from '../../src/source/index.js';
import { locate } from './locate.js';

// An invented exhibit page of the "Tarnbrook Museum of the Cold" (demo wording) with a number in each
// place a page publishes outside its paragraphs. Front matter between `---` lines is common practice
// (static site generators publish `title` and `description`); tables follow the GFM spec 0.29 §4.10;
// images CommonMark 0.31.2 §6.4; `alt` and `<figcaption>` are HTML Living Standard elements.
// The seeded values are wrong on purpose: Vostok spans ~420,000 years (Petit et al. 1999, Nature 399,
// 429-436); EPICA Dome C ~800,000 years (Jouzel et al. 2007, Science 317, 793-796); glacial-maximum
// CO2 ~180-190 ppm (Lüthi et al. 2008, Nature 453, 379-382).
const PAGE = [
  '---', //                                                                                   1
  'title: Ice that remembers', //                                                             2
  'description: "The Vostok core spans about 2 million years."', //                          3
  'tags: [vostok, 999]', //                                                                   4
  '---', //                                                                                   5
  '', //                                                                                      6
  '| Core | Span (years) |', //                                                              7
  '| --- | --- |', //                                                                        8
  '| EPICA Dome C | 420,000 |', //                                                            9
  '', //                                                                                     10
  '![CO2 stood near 1,000 ppm in the last ice age](co2.png "Vostok spans about 420,000 years")', // 11
  '', //                                                                                     12
  '<figure><img src="a.png" alt="CO2 near 100 ppm"><figcaption>Sea level was <em>50 m</em> lower.</figcaption></figure>', // 13
].join('\n');

describe('published text outside paragraphs (issue 15)', () => {
  const draft = draftFromText('exhibit.md', PAGE, 'markdown');

  it('reads published front-matter fields, image alt text, titles and captions, and table cells with their headers', () => {
    expect(draft.blocks.map((b) => [b.kind, b.text])).toEqual([
      ['front-matter', 'Ice that remembers'],
      ['front-matter', 'The Vostok core spans about 2 million years.'],
      ['table-cell', 'Core'],
      ['table-cell', 'Span (years)'],
      ['table-cell', 'EPICA Dome C'],
      ['table-cell', 'EPICA Dome C, Span: 420,000 years'],
      ['image-text', 'CO2 stood near 1,000 ppm in the last ice age'],
      ['image-text', 'Vostok spans about 420,000 years'],
      ['image-text', 'CO2 near 100 ppm'],
      ['image-text', 'Sea level was  50 m  lower.'],
    ]);
  });

  /** Where `original` (as spelled in the file) stands on 1-based `line`: found by a plain search of the file's text. */
  function placeOf(line: number, original: string): [{ line: number; column: number; offset: number }, { line: number; column: number; offset: number }] {
    const lines = PAGE.split('\n');
    const column = (lines[line - 1] ?? '').indexOf(original) + 1;
    const offset = lines.slice(0, line - 1).reduce((n, l) => n + l.length + 1, 0) + column - 1;
    return [
      { line, column, offset },
      { line, column: column + original.length, offset: offset + original.length },
    ];
  }

  it.each([
    // prose words, which of them, the line, and how the file spells them there
    ['2 million years', 0, 3, '2 million years'],
    // A unit moved out of the column header ("Span (years)") ends with the cell: the flag points at the cell.
    ['420,000 years', 0, 9, '420,000'],
    ['1,000 ppm', 0, 11, '1,000 ppm'],
    ['420,000 years', 1, 11, '420,000 years'],
    ['100 ppm', 0, 13, '100 ppm'],
    ['50 m', 0, 13, '50 m'],
  ])('"%s" (#%i) keeps its exact place on line %i', (words, nth, line, original) => {
    const found = locate(draft, words, nth);
    expect(found.original).toBe(original);
    expect([found.start, found.end]).toEqual(placeOf(line, original));
  });

  it('makes each seeded error a claim with a flag at the number', async () => {
    const result = await checkText(PAGE, { path: 'exhibit.md' });
    const flagged = result.flags.map((f) => [f.ruleId, f.span.start.line, f.excerpt]);
    expect(flagged).toEqual([
      ['value.vostok-record-span', 3, 'about 2 million years'],
      ['value.edc-record-span', 9, '420,000 years'],
      ['value.co2-glacial-minimum-typical', 11, '1,000 ppm'],
    ]);
    expect(result.claims.map((c) => c.text)).toContain('EPICA Dome C, Span: 420,000 years');
  });
});

// A myth-busting page's two-column table of invented demo wording: what is often said, what the
// record shows. The left column's statements are wrong on purpose and stated as someone else's; the
// right column is correct: Vostok spans ~420,000 years and four glacial cycles (Petit et al. 1999,
// Nature 399, 429-436); EPICA Dome C ~800,000 years (Jouzel et al. 2007, Science 317, 793-796);
// glacial cycles roughly every 100,000 years over the last 800,000 (Lisiecki & Raymo 2005,
// Paleoceanography 20, PA1003).
describe('a table whose first column holds statements, not labels', () => {
  const TABLE = [
    '| What the leaflet said | What the cores show |', //                                         1
    '| --- | --- |', //                                                                             2
    '| "Vostok holds two million years of ice." | Vostok reaches back about 420,000 years, four glacial cycles. |', // 3
    '| "Ice ages return every 10,000 years or so." | Over the last 800,000 years they came roughly every 100,000 years. |', // 4
    '| "Dome C covers only 100,000 years." | EPICA Dome C spans some 800,000 years. |', //     5
  ].join('\n');

  it('reads every cell with its column header and no cell with a statement as its row label', () => {
    const texts = draftFromText('myths.md', TABLE, 'markdown').blocks.map((b) => b.text);
    expect(texts).toContain('What the leaflet said: "Vostok holds two million years of ice."');
    expect(texts).toContain('What the cores show: Vostok reaches back about 420,000 years, four glacial cycles.');
    expect(texts.some((t) => t.includes('ice.", '))).toBe(false);
  });

  it('leaves the correct column unflagged and the quoted statements as notes only', async () => {
    const result = await checkText(TABLE, { path: 'myths.md' });
    expect(result.flags.filter((f) => f.level === 'error' || f.level === 'warning').map((f) => [f.ruleId, f.span.start.line])).toEqual([]);
    expect(result.flags.filter((f) => f.level === 'note').length).toBeGreaterThanOrEqual(2);
  });

  it('still reads a table of labels with its row headers (common practice: a first column of names)', () => {
    const texts = draftFromText('t.md', '| Core | Span |\n| --- | --- |\n| Vostok | 420,000 years |\n| EPICA Dome C | 800,000 years |', 'markdown').blocks.map((b) => b.text);
    expect(texts).toContain('Vostok, Span: 420,000 years');
    expect(texts).toContain('EPICA Dome C, Span: 800,000 years');
  });
});
