/**
 * The linear merge of inline text runs (src/source/micromark-linear-text.ts): the Markdown reader
 * gives the same blocks with and without it, the parse really goes through it, and the work of
 * the parse grows linearly with a paragraph's length instead of quadratically. The work is counted
 * (elements moved by Array#splice), never timed; timings live in `npm run bench`.
 */
import fc from 'fast-check';
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterEach, describe, expect, it } from 'vitest';
import { readMarkdownBlocks } from '../../src/source/markdown.js';
import { linearTextResolver, mergeDataRuns } from '../../src/source/micromark-linear-text.js';
import { spliceWork } from './splice-work.js';

const ROOT = fileURLToPath(new URL('../../', import.meta.url));
const repoMarkdown = [
  'README.md',
  'DEVELOPERS.md',
  ...readdirSync(join(ROOT, 'docs')).filter((f) => f.endsWith('.md')).map((f) => join('docs', f)),
  ...readdirSync(join(ROOT, 'examples')).filter((f) => f.endsWith('.md')).map((f) => join('examples', f)),
];

function blocksBothWays(text: string): [unknown, unknown] {
  linearTextResolver.enabled = false;
  const library = readMarkdownBlocks(text);
  linearTextResolver.enabled = true;
  return [library, readMarkdownBlocks(text)];
}

const paragraph = (lines: number) => `${Array.from({ length: lines }, (_, i) => `Site ${i} has ${i} years on the rota, with the Vostok \`core\`, www.example.org and [notes](x).`).join('\n')}\n`;

afterEach(() => {
  linearTextResolver.enabled = true;
});

describe('the linear merge of inline text runs', () => {
  it.each(repoMarkdown)('%s reads to the same blocks as with the library resolver alone', (file) => {
    const [library, linear] = blocksBothWays(readFileSync(join(ROOT, file), 'utf8'));
    expect(linear).toEqual(library);
  });

  it('generated Markdown (inline marks, links, tables, breaks, entities) reads the same both ways', () => {
    const bits = ['The Vostok core', ' spans ', '800,000', ' years', '\n', '\n\n', '  \n', '\\\n', '*', '**', '_', '`', '[a](b)', '[x]', '![i](j)', '<b>', '&amp;', '&lt;', 'www.example.org', 'https://x.org/a', 'a@b.org', '~~', '| a | b |\n|---|---|\n| 1 | 2 |\n', '> ', '- ', '# ', '\t', '    ', 'h', 'w'];
    fc.assert(
      fc.property(fc.array(fc.oneof(fc.constantFrom(...bits), fc.string({ maxLength: 6 })), { maxLength: 60 }), (parts) => {
        const [library, linear] = blocksBothWays(parts.join(''));
        expect(linear).toEqual(library);
      }),
      { numRuns: 300 },
    );
  });

  it('merges a run of data events into its first token, and leaves single tokens and other events alone', () => {
    const token = (type: string, end: number) => ({ type, end });
    const a = token('data', 1);
    const b = token('data', 2);
    const c = token('data', 3);
    const e = token('emphasis', 4);
    const d = token('data', 5);
    const events = [['enter', a, 0], ['exit', a, 0], ['enter', b, 0], ['exit', b, 0], ['enter', c, 0], ['exit', c, 0], ['enter', e, 0], ['exit', e, 0], ['enter', d, 0], ['exit', d, 0]] as Parameters<typeof mergeDataRuns>[0];
    const merged = mergeDataRuns(events);
    expect(merged.map(([kind, t]) => `${kind}:${t.type}`)).toEqual(['enter:data', 'exit:data', 'enter:emphasis', 'exit:emphasis', 'enter:data', 'exit:data']);
    expect(a.end).toBe(3);
    expect(d.end).toBe(5);
  });

  it('the parse goes through the wrapped resolver', () => {
    const before = linearTextResolver.calls;
    readMarkdownBlocks('The Vostok core spans 800,000 years.\n');
    expect(linearTextResolver.calls).toBeGreaterThan(before);
  });

  it('the splice work of a one-paragraph draft grows linearly with its lines (it grew quadratically before; emphasis marks are bounded apart, markdown-limits.ts)', () => {
    const work = (lines: number, on: boolean) => {
      linearTextResolver.enabled = on;
      return spliceWork(() => readMarkdownBlocks(paragraph(lines)));
    };
    const [linear1, linear2] = [work(500, true), work(1_000, true)];
    const [library1, library2] = [work(500, false), work(1_000, false)];
    // Twice the lines: about twice the work now; about four times the work with the library alone.
    expect(linear2 / linear1).toBeLessThan(2.5);
    expect(library2 / library1).toBeGreaterThan(3.5);
    expect(linear2).toBeLessThan(library2 / 10);
  });
});
