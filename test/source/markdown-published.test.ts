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
