// Reading a Markdown draft only around its subjects must give the claims a parse of the whole
// gives (common practice for a shortcut: compare it with the plain path). The property test
// checks what that rests on, for drafts made of fragments of our own: every block read is the
// block a whole parse gives there, with the same subject-beside bit, and every block left out
// names no subject, stands beside no block that does, and has no sentence with two numbers.
import fc from 'fast-check';
import { readFile } from 'node:fs/promises';
import { describe, expect, it } from 'vitest';
import { checkDraft, namesSubject, subjectBeside } from '../../src/engine.js';
import { splitSentences } from '../../src/prose/index.js';
import { loadPacks } from '../../src/rulepack/index.js';
import { draftFromText } from '../../src/source/index.js';
import { sparseMarkdownDraft } from '../../src/speed/sparse-markdown.js';
import type { LoadedPacks } from '../../src/rulepack/types.js';

const FRAGMENTS = [
  'The print shop needs 52 days to deliver the new posters.',
  'Ticket sales rose 12 percent on the record weekend.',
  'Staff meet in room 4 on Tuesdays. Doors open at 9 and close at 17.',
  'The gallery was open from 1990 to 2000, some 30 years in all.',
  'Build the site with `npm run docs 3` and open page 2.',
  'The Vostok core holds a record of about 420,000 years.',
  'CO2 stood near 180 ppm at the Last Glacial Maximum.',
  'It reaches down 3,270 metres.',
  'A note with *emphasis* and 2 or 3 marks.',
  'C**O2** rose by 100 ppm.',
  'See [the map](https://example.org/1) for room 5 and 6.',
  'Keep it near 18 &deg;C and 50 percent.',
  '- The print shop needs 52 days.\n- Staff meet in room 4.',
  '- EPICA Dome C reaches back 800,000 years.\n- Staff meet in room 4 and 5.',
  '1. First step 1\n2. Second step 2',
  '## Section 2',
  '# The ice ages #',
  'Heading text 3\n---',
  '> A quoted line 4 and 5.',
  '```sh\nnpm run docs -- --page 7\n\nmore 8 lines 9\n```',
  '    indented code 1 and 2',
  '| Room | Temperature |\n| --- | --- |\n| 4 | 18 °C |',
  '***',
  'Then 2024. Next 2025 came.',
  'in 1990. then 2000',
  'In e.g. 1990 and 2000.',
  '<!-- firnline: reported -->',
  'See www.example.org for rooms 5 and 6.',
  'Term 1\n: a colon 2',
  'Line one 1  \nline two 2 with a hard break.',
  '~~~\ncode 1\n\n2 more\n~~~',
  '- item 1\n\n  continued 2 after a blank line\n\n- item 3',
  'A lazy line 1\ncontinues 2 here.',
  '2024. The year 2025 began.',
  'Title 3 and 4\n===',
  'Émile counted 5 and 6 bottles.',
  '\tTabbed 1 and 2',
  'Greenland ice, the ice-age era and 2 or 3 cores.',
];

let packs: LoadedPacks | undefined;
async function thePacks(): Promise<LoadedPacks> {
  packs ??= await loadPacks([]);
  return packs;
}

/** The invariants above for one draft; the number of blocks left out. */
function expectSparseHolds(text: string, p: LoadedPacks): number {
  const names = (t: string): boolean => namesSubject(t, p);
  const sparse = sparseMarkdownDraft('draft.md', text, names);
  if (sparse === undefined) return 0;
  const full = draftFromText('draft.md', text, 'markdown').blocks;
  const beside = subjectBeside(full, p);
  // Each block read is the next equal block of the whole parse (a table gives several blocks per place).
  const kept = new Set<number>();
  let last = -1;
  sparse.draft.blocks.forEach((block, k) => {
    const shown = JSON.stringify(block);
    let i = last + 1;
    while (i < full.length && JSON.stringify(full[i]) !== shown) i += 1;
    expect(full[i]).toEqual(block);
    expect(sparse.subjectBeside[k]).toBe(beside[i]);
    kept.add(i);
    last = i;
  });
  const left = full.filter((_b, i) => !kept.has(i));
  for (const block of left) {
    const i = full.indexOf(block);
    expect(names(block.text)).toBe(false);
    expect(beside[i]).toBe(false);
    expect(splitSentences(block.text, i).some((s) => /\d[^\d]+\d/u.test(s.text))).toBe(false);
  }
  return left.length;
}

describe('sparseMarkdownDraft', () => {
  it('reads exactly the blocks a whole parse gives, and leaves out only blocks that cannot hold a claim', async () => {
    const p = await thePacks();
    let leftOut = 0;
    fc.assert(
      fc.property(
        fc.array(fc.tuple(fc.constantFrom(...FRAGMENTS), fc.constantFrom('\n\n', '\n\n\n', '\r\n\r\n', '\n', '\n  \n')), { minLength: 3, maxLength: 14 }),
        fc.boolean(),
        (parts, frontMatter) => {
          const text = `${frontMatter ? '---\ntitle: Room 4\n\nnotes: 5 and 6\n---\n\n' : ''}${parts.map(([part, gap]) => part + gap).join('')}`;
          leftOut += expectSparseHolds(text, p);
        },
      ),
      { numRuns: 300, seed: 20261203 },
    );
    // The shortcut is taken: plain chunks far from any subject were left out (of drafts that do not
    // name their subject throughout; those are read whole, below).
    expect(leftOut).toBeGreaterThan(10);
  });

  it('reads every block of a draft about its subject throughout, exactly as a whole parse does', async () => {
    const p = await thePacks();
    // Drafts of our fragments in which most blocks name a subject (prose/topical-throughout.ts): the
    // sparse reader parses all chunks, its plain paragraphs and fenced code without the parser.
    const onTopic = FRAGMENTS.filter((f) => namesSubject(f, p));
    let throughout = 0;
    fc.assert(
      fc.property(
        fc.array(fc.tuple(fc.constantFrom(...onTopic, ...onTopic, ...FRAGMENTS), fc.constantFrom('\n\n', '\n\n\n', '\n')), { minLength: 3, maxLength: 14 }),
        (parts) => {
          const text = `# The long winter\n\n${parts.map(([part, gap]) => part + gap).join('')}`;
          const sparse = sparseMarkdownDraft('draft.md', text, (t) => namesSubject(t, p));
          if (sparse?.throughout !== true) return;
          throughout += 1;
          expect(sparse.draft.blocks).toEqual(draftFromText('draft.md', text, 'markdown').blocks);
        },
      ),
      { numRuns: 200, seed: 20261204 },
    );
    expect(throughout).toBeGreaterThan(50);
  });

  it('makes the block of a plain paragraph without the parser exactly as the parser does', async () => {
    const p = await thePacks();
    // Plain paragraphs and fenced code skip the parser (source/markdown.ts plainParagraphKind); these
    // sit at its edges: non-ASCII letters, two spaces inside a line, a trailing space, a tab, a line
    // starting with a digit, code spans (at a line's end, doubled, unpaired).
    const plain = [
      'Keep the loan near 18 °C, the CO₂ note says 2 times.\nThe café sold 3 and 4 scones.',
      'Two  spaces inside 5 and 6.',
      'A trailing space 1 \nand 2 more.',
      'A tab\t1 and 2.',
      'Counted 3 cores\n4 of them deep.',
      'The Vostok core holds a record of about 420,000 years.\nIt reaches down 3,270 metres.',
      'Run `npm test` 2 times\nthen `npm run docs` 3 times.',
      'Ends with code 4 and `x`',
      'A `` double `` tick 5 and 6.',
      'Odd ` tick 1 and 2.',
      '```\ncode 7 and 8\n```',
    ];
    fc.assert(
      fc.property(fc.array(fc.constantFrom(...plain, ...FRAGMENTS.slice(0, 8)), { minLength: 3, maxLength: 10 }), fc.constantFrom('\n\n', '\n\n\n'), (parts, gap) => {
        expectSparseHolds(['# Notes', ...parts].join(gap), p);
      }),
      { numRuns: 200, seed: 20261203 },
    );
  });

  it('gives the same claims as a whole parse on our demo drafts and on a generated docs page', async () => {
    const p = await thePacks();
    // A docs page as the bench makes them: mostly plain paragraphs, one in ten naming the subject.
    const page = ['# Visitor pages', ...Array.from({ length: 40 }, (_v, i) => FRAGMENTS[i % 10 === 3 ? 5 + (i % 2) : i % 5] ?? '')].join('\n\n');
    const texts = [page, await readFile(new URL('../../examples/winter-newsletter.md', import.meta.url), 'utf8')];
    const pageBlocks = draftFromText('page.md', page, 'markdown').blocks.length;
    expect(sparseMarkdownDraft('page.md', page, (t) => namesSubject(t, p))?.draft.blocks.length).toBeLessThan(pageBlocks);
    for (const text of texts) {
      const sparse = sparseMarkdownDraft('draft.md', text, (t) => namesSubject(t, p));
      const whole = checkDraft(draftFromText('draft.md', text, 'markdown'), p).claims;
      const parts = sparse === undefined ? whole : checkDraft(sparse.draft, p, sparse.throughout ? {} : { subjectBeside: sparse.subjectBeside }).claims;
      expect(parts).toEqual(whole);
      expect(whole.length).toBeGreaterThan(0);
    }
  });
});
