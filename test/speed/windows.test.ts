import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { draftAroundHits, markdownSegments, readMarkdownBlocks, readWindowBlocks } from '../../src/source/index.js';

const ROOT = fileURLToPath(new URL('../..', import.meta.url));

/** Markdown drafts of our own (demo and tuning drafts); the blind hold-out sets are never read. */
function ownDrafts(): string[] {
  const found: string[] = [];
  const walk = (dir: string): void => {
    for (const name of readdirSync(dir)) {
      if (name.includes('holdout') || name === 'node_modules') continue;
      const path = join(dir, name);
      if (statSync(path).isDirectory()) walk(path);
      else if (name.endsWith('.md')) found.push(path);
    }
  };
  for (const dir of ['examples', 'test/evaluation', 'test/tuning', 'test/fixtures', 'test/corpus']) walk(join(ROOT, dir));
  return found;
}

describe('markdownSegments: cut points that are true block boundaries', () => {
  const drafts = ownDrafts();
  it('finds drafts to try', () => expect(drafts.length).toBeGreaterThan(5));

  // CommonMark 0.31 (spec.commonmark.org): a blank line followed by a line in the first column ends
  // every open paragraph, list item and block quote, except inside a fenced code or an HTML block of
  // kinds 1 to 5. Parsing each segment on its own must then give exactly the blocks of the whole.
  it.each(drafts.map((d) => [d.slice(ROOT.length)]))('every segment of %s parsed alone gives the whole file\'s blocks', (relative) => {
    const text = readFileSync(join(ROOT, relative), 'utf8');
    const segments = markdownSegments(text);
    if (!segments.safe) return;
    const windows = segments.starts.map((start, i) => ({ start, end: segments.starts[i + 1] ?? text.length }));
    expect(readWindowBlocks(text, windows, segments.headings)).toEqual(readMarkdownBlocks(text));
  });
});

describe('markdownSegments on the constructs that hold blank lines', () => {
  it('does not cut inside a code fence, an HTML comment or front matter', () => {
    const text = '---\ntitle: x\n\nmore: y\n---\n\nIntro.\n\n```\ncode\n\nVostok 3,000 m\n```\n\n<!-- a\n\nb -->\n\nLast.\n';
    const { starts, safe } = markdownSegments(text);
    expect(safe).toBe(true);
    expect(starts.map((s) => text.slice(s, s + 5))).toEqual(['---\nt', 'Intro', '```\nc', '<!-- ', 'Last.']);
  });

  it('parses whole what it cannot cut safely: link definitions and setext headings', () => {
    expect(markdownSegments('A [core][v].\n\n[v]: https://example.org\n').safe).toBe(false);
    expect(markdownSegments('Cores\n=====\n\nText.\n').safe).toBe(false);
  });
});

describe('draftAroundHits: only the blocks around a subject, positions exact', () => {
  const subjects = /(?<![\p{L}\p{N}])(?:vostok|co2)(?![\p{L}\p{N}])/giu;
  const filler = (n: number) => Array.from({ length: n }, (_, i) => `Opening hours for room ${i} change in spring.`).join('\n\n');

  it('skips a file that names no subject', () => {
    expect(draftAroundHits('a.md', filler(20), 'markdown', subjects)).toBeUndefined();
  });

  it('keeps the hit block and one block on each side, with offsets into the original file', () => {
    const text = `# Visitor notes\n\n${filler(10)}\n\nThe Vostok core holds air from 400,000 years ago.\n\n${filler(10)}\n`;
    const draft = draftAroundHits('a.md', text, 'markdown', subjects);
    expect(draft?.blocks.map((b) => b.text)).toEqual([
      'Opening hours for room 9 change in spring.',
      'The Vostok core holds air from 400,000 years ago.',
      'Opening hours for room 0 change in spring.',
    ]);
    for (const block of draft?.blocks ?? []) {
      expect(block.heading).toBe('Visitor notes');
      for (let i = 0; i < block.text.length; i += 1) expect(text[block.offsets[i] ?? -1]).toBe(block.text[i]);
    }
  });

  it('takes a whole section when its heading names the subject', () => {
    const text = `${filler(3)}\n\n## CO2 in the cores\n\n${filler(4)}\n\n## Shop\n\n${filler(3)}\n`;
    const kept = draftAroundHits('a.md', text, 'markdown', subjects)?.blocks.map((b) => b.text) ?? [];
    expect(kept[0]).toBe('Opening hours for room 2 change in spring.');
    expect(kept).toContain('CO2 in the cores');
    expect(kept.filter((t) => t.startsWith('Opening')).length).toBe(1 + 4);
    expect(kept).not.toContain('Shop');
  });

  it('gives a plain-text draft the same windows', () => {
    const text = `${filler(5)}\n\nCO2 stood near 190 ppm.\n\n${filler(5)}\n`;
    expect(draftAroundHits('a.txt', text, 'text', subjects)?.blocks.map((b) => b.text)).toEqual([
      'Opening hours for room 4 change in spring.',
      'CO2 stood near 190 ppm.',
      'Opening hours for room 0 change in spring.',
    ]);
  });
});
