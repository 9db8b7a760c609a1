// The server's block-by-block re-check must give exactly what a full check gives, edit after edit
// (common practice for an incremental path: compare it with the plain one). Drafts: the demo
// drafts in examples/ and a draft of our own with repeated sentences (claim ids number repeats).
import { readFile } from 'node:fs/promises';
import { describe, expect, it } from 'vitest';
import { checkDocument, createCheckSetup, type CheckSetup } from '../../src/lsp/check-document.js';
import { createDocumentChecker } from '../../src/lsp/incremental-check.js';
import { loadPacks } from '../../src/rulepack/index.js';

const WRONG = 'The Vostok ice core spans 800,000 years of climate history.';
// Petit et al. (1999), Nature 399, 429-436: the Vostok record covers about 420,000 years.
const RIGHT = 'The Vostok ice core spans about 420,000 years of climate history.';

let setup: CheckSetup | undefined;
async function theSetup(): Promise<CheckSetup> {
  setup ??= createCheckSetup(await loadPacks([]), {}, { file: 'firnline-signoffs.yaml', signoffs: [] });
  return setup;
}

/** Each text in turn through one checker, compared with a full check of the same text. */
async function expectSameAsFull(texts: string[], format: 'markdown' | 'text' = 'markdown'): Promise<number> {
  const s = await theSetup();
  const checker = createDocumentChecker(s);
  let flags = 0;
  for (const text of texts) {
    const full = checkDocument(text, format, 'draft.md', 'drafts/draft.md', s);
    const incremental = checker.check(text, format, 'draft.md', 'drafts/draft.md');
    expect(incremental.flags).toEqual(full.flags);
    flags += full.flags.length;
  }
  return flags;
}

describe('createDocumentChecker', () => {
  it.each([
    ['winter-newsletter.md', 'markdown'],
    ['gallery-panels.md', 'markdown'],
    ['field-notes.txt', 'text'],
  ] as const)('re-checks %s after edits as a full check does', async (name, format) => {
    const text = await readFile(new URL(`../../examples/${name}`, import.meta.url), 'utf8');
    const paragraphs = text.split('\n\n');
    const edits = [
      text,
      `Intro line.\n\n${text}`, // everything moves down
      text.replace(/\n/gu, '\r\n'), // every offset moves
      paragraphs.slice(1).join('\n\n'), // the first block goes
      [...paragraphs.slice(0, 2), `${WRONG} 🧊`, ...paragraphs.slice(2)].join('\n\n'), // a new wrong claim in the middle
      `${text}\n\n${paragraphs.at(-1) ?? ''}`, // a repeated block at the end
      text,
    ];
    const flags = await expectSameAsFull(edits, format);
    if (name === 'winter-newsletter.md') expect(flags).toBeGreaterThan(edits.length * 5);
  });

  it('numbers repeated sentences as a full check does when a copy is added above', async () => {
    const flags = await expectSameAsFull([
      `# Panels\n\n${WRONG}\n\n${RIGHT}\n`,
      `# Panels\n\n${WRONG}\n\n${WRONG}\n\n${RIGHT}\n`,
      `# Panels\n\n${RIGHT}\n\n${WRONG}\n\n${WRONG}\n`,
      `# Panels\n\n${WRONG}\n`,
    ]);
    expect(flags).toBe(1 + 2 + 2 + 1);
  });

  it('works for plain text too', async () => {
    await expectSameAsFull([`${WRONG}\n\n${RIGHT}\n`, `Notes.\n\n${WRONG}\n\n${RIGHT}\n`], 'text');
  });
});
