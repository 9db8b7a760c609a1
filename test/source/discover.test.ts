import { describe, it, expect, beforeAll, afterAll } from 'vitest';
import { mkdtemp, mkdir, writeFile, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { dirname, join } from 'node:path';
import { findDrafts } from '../../src/source/index.js';
import { FirnlineError, FirnlineErrors } from '../../src/errors.js';

// A docs repository of the invented Kestrel Bay Science Centre. `.gitignore` patterns behave as
// git documents them (gitignore(5)): `dir/` matches folders only, `!` re-includes, and a
// `.gitignore` applies to the folder it is in and everything below it.
const TREE: Record<string, string> = {
  '.gitignore': 'drafts-old/\ndocs/private.md\n',
  'a.md': '# A',
  'b.markdown': 'B',
  'notes.txt': 'notes',
  'picture.png': 'not a draft',
  'README': 'no ending',
  '.hidden.md': 'hidden file',
  '.drafts/x.md': 'inside a hidden folder',
  'node_modules/pkg/readme.md': 'a dependency',
  'docs/guide.md': 'guide',
  'docs/private.md': 'ignored from the folder above',
  'docs/.gitignore': 'build/\n*.tmp.md\n!keep.tmp.md\n',
  'docs/build/out.md': 'ignored folder',
  'docs/skip.tmp.md': 'ignored by pattern',
  'docs/keep.tmp.md': 're-included',
  'docs/deep/Upper.MD': 'endings compare without case',
  'drafts-old/old.md': 'ignored by the root .gitignore',
  'pictures/cover.png': 'a folder without drafts',
};

let root = '';

beforeAll(async () => {
  root = await mkdtemp(join(tmpdir(), 'firnline-discover-'));
  for (const [path, content] of Object.entries(TREE)) {
    await mkdir(dirname(join(root, path)), { recursive: true });
    await writeFile(join(root, path), content);
  }
});

afterAll(async () => {
  await rm(root, { recursive: true, force: true });
});

describe('findDrafts', () => {
  it('walks a folder for .md, .markdown and .txt, passing over hidden, node_modules and ignored files', async () => {
    expect(await findDrafts(['.'], root)).toEqual({
      files: ['a.md', 'b.markdown', 'docs/deep/Upper.MD', 'docs/guide.md', 'docs/keep.tmp.md', 'notes.txt'],
    });
  });

  it('honours the .gitignore files above a folder it is asked to walk', async () => {
    expect(await findDrafts(['docs'], root)).toEqual({ files: ['docs/deep/Upper.MD', 'docs/guide.md', 'docs/keep.tmp.md'] });
  });

  it('takes a named file as given, whatever its ending, and lists each file once', async () => {
    expect(await findDrafts(['picture.png', '.hidden.md', 'a.md', './a.md', 'docs/build/out.md', '.'], root)).toEqual({
      files: ['.hidden.md', 'a.md', 'b.markdown', 'docs/build/out.md', 'docs/deep/Upper.MD', 'docs/guide.md', 'docs/keep.tmp.md', 'notes.txt', 'picture.png'],
    });
  });

  // Globs, like .gitignore patterns here, compare without case (git's core.ignorecase=true, its
  // default on macOS and Windows), so one setting reads the same on every editor's machine.
  it('regression: a folder whose drafts were already named is not a folder without drafts', async () => {
    expect(await findDrafts(['docs/deep/Upper.MD', 'docs/deep', 'docs/deep'], root)).toEqual({ files: ['docs/deep/Upper.MD'] });
  });

  it('applies exclude and include globs relative to the working folder', async () => {
    expect(await findDrafts(['.'], root, { exclude: ['docs/'] })).toEqual({ files: ['a.md', 'b.markdown', 'notes.txt'] });
    expect(await findDrafts(['.'], root, { include: ['*.md'] })).toEqual({
      files: ['a.md', 'docs/deep/Upper.MD', 'docs/guide.md', 'docs/keep.tmp.md'],
    });
    expect(await findDrafts(['.'], root, { include: ['docs/**'], exclude: ['*.tmp.md'] })).toEqual({
      files: ['docs/deep/Upper.MD', 'docs/guide.md'],
    });
  });

  it('reports paths relative to the working folder, also outside it', async () => {
    expect(await findDrafts(['../a.md', 'guide.md'], join(root, 'docs'))).toEqual({ files: ['../a.md', 'guide.md'] });
  });

  it('rejects a missing path with a one-line message naming it', async () => {
    const error = await findDrafts(['drafts/ice-ages.md'], root).catch((e: unknown) => e);
    expect(error).toBeInstanceOf(FirnlineError);
    expect((error as FirnlineError).code).toBe('path-missing');
    expect((error as FirnlineError).toLine()).toBe('drafts/ice-ages.md: no such file or folder; check the path');
  });

  it('rejects a folder with no drafts', async () => {
    const error = await findDrafts(['pictures'], root).catch((e: unknown) => e);
    expect((error as FirnlineError).code).toBe('no-drafts');
    expect((error as FirnlineError).toLine()).toMatch(/^pictures: no \.md, \.markdown, \.txt, \.html, \.htm or \.docx drafts in this folder/u);
  });

  it('reports every bad path at once', async () => {
    const error = await findDrafts(['gone.md', 'a.md', 'pictures', 'also-gone'], root).catch((e: unknown) => e);
    expect(error).toBeInstanceOf(FirnlineErrors);
    expect((error as FirnlineErrors).errors.map((e) => [e.code, e.where?.file])).toEqual([
      ['path-missing', 'gone.md'],
      ['no-drafts', 'pictures'],
      ['path-missing', 'also-gone'],
    ]);
    expect((error as FirnlineErrors).message.split('\n')).toHaveLength(3);
  });
});
