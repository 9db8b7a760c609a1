import { execFileSync } from 'node:child_process';
import { mkdtemp, mkdir, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { FirnlineError } from '../../src/errors.js';
import { changedLines, parseUnifiedDiff } from '../../src/review/changed-lines.js';

// Hunk header form from the git documentation of the unified diff format ("@@ -l,s +l,s @@",
// a missing count means 1): https://git-scm.com/docs/git-diff#_combined_diff_format and GNU diffutils manual.
describe('parseUnifiedDiff', () => {
  it.each([
    ['lines replaced', '@@ -12,2 +12,3 @@', [12, 13, 14]],
    ['one line, count left out', '@@ -4 +4 @@', [4]],
    ['a pure deletion touches the lines either side', '@@ -7,2 +6,0 @@', [6, 7]],
    ['a deletion at the top of the file', '@@ -1,2 +0,0 @@', [1]],
  ])('%s: %s', (_name, hunk, lines) => {
    const diff = `diff --git a/x.md b/x.md\n--- a/x.md\n+++ b/x.md\n${hunk}\n`;
    expect([...(parseUnifiedDiff(diff).get('x.md') ?? [])]).toEqual(lines);
  });

  it('reads quoted paths and leaves deleted files out', () => {
    const diff = '+++ "b/caf\\303\\251 notes.md"\n@@ -1 +1 @@\n--- a/gone.md\n+++ /dev/null\n@@ -1,3 +0,0 @@\n';
    expect([...parseUnifiedDiff(diff).keys()]).toEqual(['café notes.md']);
  });
});

function git(cwd: string, ...args: string[]): string {
  return execFileSync('git', args, { cwd, encoding: 'utf8' });
}

async function repo(): Promise<string> {
  const dir = await mkdtemp(join(tmpdir(), 'firnline-git-'));
  git(dir, 'init', '-q');
  git(dir, 'config', 'user.email', 'desk@harrow-vale.example');
  git(dir, 'config', 'user.name', 'Science desk');
  await mkdir(join(dir, 'drafts'));
  await writeFile(join(dir, 'drafts', 'a b.md'), 'one\ntwo\nthree\nfour\n');
  git(dir, 'add', '.');
  git(dir, 'commit', '-q', '-m', 'first draft');
  return dir;
}

describe('changedLines', () => {
  it('lists edited lines of tracked files and every line of untracked ones, relative to the folder', async () => {
    const dir = await repo();
    await writeFile(join(dir, 'drafts', 'a b.md'), 'one\nTWO\nthree\nfour\nfive\n');
    await writeFile(join(dir, 'drafts', 'new.md'), 'alpha\nbeta\n');
    const changed = await changedLines('HEAD', join(dir, 'drafts'));
    expect(Object.fromEntries([...changed].map(([f, s]) => [f, [...s]]))).toEqual({ 'a b.md': [2, 5], 'new.md': [1, 2] });
  });

  it('rejects a revision that does not exist with one line', async () => {
    const dir = await repo();
    const error = await changedLines('no-such-branch', dir).catch((e: unknown) => e);
    expect(error).toBeInstanceOf(FirnlineError);
    expect((error as FirnlineError).toLine()).toBe(
      "unknown git revision 'no-such-branch'; give a commit, branch or tag that exists here (in CI, fetch enough history)",
    );
  });

  it('says so outside a git repository', async () => {
    const dir = await mkdtemp(join(tmpdir(), 'firnline-nogit-'));
    await expect(changedLines('HEAD', dir)).rejects.toMatchObject({ code: 'git-not-repository' });
  });
});
