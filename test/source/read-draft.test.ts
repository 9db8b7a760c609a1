import { describe, it, expect, beforeAll, afterAll } from 'vitest';
import { chmod, mkdtemp, mkdir, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { draftFormat, draftFromText, readDraft } from '../../src/source/index.js';
import type { FirnlineError } from '../../src/errors.js';

let root = '';

// Byte sequences: UTF-8 per RFC 3629 (0xC3 must be followed by a continuation byte 0x80-0xBF;
// EF BB BF is the UTF-8 byte-order mark; C3 A9 is é).
const FILES: Record<string, Uint8Array | string> = {
  'ice.md': '# Vostok\n\nThe core holds **420,000** years.\n',
  'ice.txt': 'Plain\n\nnotes',
  'with-bom.md': new Uint8Array([0xef, 0xbb, 0xbf, ...new TextEncoder().encode('Caf\u00e9 notes')]),
  'nul.md': new Uint8Array([0x49, 0x63, 0x65, 0x00, 0x20]),
  'latin1.txt': new Uint8Array([0x43, 0x61, 0x66, 0xe9]),
  'broken.md': new Uint8Array([0x41, 0xc3, 0x28]),
  'locked.md': 'secret',
};

beforeAll(async () => {
  root = await mkdtemp(join(tmpdir(), 'firnline-read-'));
  for (const [name, content] of Object.entries(FILES)) await writeFile(join(root, name), content);
  await mkdir(join(root, 'folder.md'));
});

afterAll(async () => {
  await rm(root, { recursive: true, force: true });
});

describe('readDraft', () => {
  it('reads a Markdown draft into its prose blocks, keeping the path as given', async () => {
    const draft = await readDraft('ice.md', root);
    expect(draft).toMatchObject({ path: 'ice.md', format: 'markdown', text: FILES['ice.md'] });
    expect('blocks' in draft && draft.blocks.map((b) => [b.kind, b.text, b.heading])).toEqual([
      ['heading', 'Vostok', 'Vostok'],
      ['paragraph', 'The core holds 420,000 years.', 'Vostok'],
    ]);
  });

  it('reads any other ending as plain text', async () => {
    const draft = await readDraft('ice.txt', root);
    expect('blocks' in draft && [draft.format, draft.blocks.map((b) => b.text)]).toEqual(['text', ['Plain', 'notes']]);
  });

  it('keeps a UTF-8 byte-order mark in the text, so offsets are the file as read', async () => {
    const draft = await readDraft('with-bom.md', root);
    expect('text' in draft && draft.text).toBe('\ufeffCafé notes');
    expect('blocks' in draft && draft.blocks[0]?.offsets[0]).toBe(1);
  });

  // Byte positions per RFC 3629: 0xE9 alone (Latin-1 é) and 0xC3 followed by 0x28 are not UTF-8.
  it.each([
    ['a NUL byte', 'nul.md', 'nul.md:1:4: holds a NUL byte'],
    ['Latin-1 bytes (not UTF-8)', 'latin1.txt', 'latin1.txt:1:4: not valid UTF-8 (byte 0xE9)'],
    ['a broken UTF-8 sequence', 'broken.md', 'broken.md:1:2: not valid UTF-8 (byte 0xC3)'],
  ])('does not check a file with %s, and says where the first bad byte is', async (_what, name, line) => {
    const read = await readDraft(name, root);
    expect('problem' in read && read.problem.toLine().startsWith(line)).toBe(true);
  });

  it('does not check a folder named as a draft (file-unreadable)', async () => {
    const read = await readDraft('folder.md', root);
    expect('problem' in read && read.problem.code).toBe('file-unreadable');
    expect('problem' in read && read.problem.toLine()).toBe('folder.md: cannot read this file (it is a folder); check that it is a readable file');
  });

  it('rejects a file that has gone with path-missing', async () => {
    const error = await readDraft('gone.md', root).catch((e: unknown) => e);
    expect((error as FirnlineError).toLine()).toBe('gone.md: no such file or folder; check the path');
  });

  // The superuser reads any file whatever its mode, so this runs only for other users.
  it.skipIf(process.getuid?.() === 0)('rejects a file without read permission with file-unreadable', async () => {
    await chmod(join(root, 'locked.md'), 0o000);
    const error = await readDraft('locked.md', root).catch((e: unknown) => e);
    expect((error as FirnlineError).toLine()).toBe('locked.md: cannot read this file (permission denied); check that it is a readable file');
  });
});

describe('draftFromText and draftFormat', () => {
  it.each([
    ['notes.md', 'markdown'],
    ['NOTES.MD', 'markdown'],
    ['chapter.markdown', 'markdown'],
    ['notes.txt', 'text'],
    ['notes.rst', 'text'],
    ['-', 'text'],
  ])('%s reads as %s', (path, format) => {
    expect(draftFormat(path)).toBe(format);
  });

  it('builds a draft from standard input text', () => {
    expect(draftFromText('-', 'Ice *cores*', 'markdown')).toEqual({
      path: '-',
      text: 'Ice *cores*',
      format: 'markdown',
      blocks: [{ kind: 'paragraph', text: 'Ice cores', offsets: [0, 1, 2, 3, 5, 6, 7, 8, 9, 10], heading: '' }],
    });
  });
});
