/**
 * The lines of each draft changed since a git revision, for pull requests: from
 * `git diff --unified=0 REV -- .` run in the working folder (paths come back relative to it), plus
 * untracked files, every line of which counts as changed. A pure deletion touches the lines either
 * side of it, since a sentence running across them has changed.
 *
 *   @@ -12,2 +12,3 @@   →  lines 12, 13, 14 of the new file changed
 */
import { execFile } from 'node:child_process';
import { readFile } from 'node:fs/promises';
import { join } from 'node:path';
import { promisify } from 'node:util';
import { FirnlineError } from '../errors.js';

const run = promisify(execFile);

/**
 * Stands in a file's set when every line counts as changed: a Word draft, which git diffs as a
 * binary file, not by line (lines are 1-based, so 0 is free to mean "all").
 */
export const EVERY_LINE = 0;

/** Changed line numbers (1-based, in the current file) per path relative to `cwd`, POSIX separators. */
export async function changedLines(rev: string, cwd: string): Promise<Map<string, Set<number>>> {
  await git(['rev-parse', '--verify', '--quiet', `${rev}^{commit}`], cwd, `unknown git revision '${rev}'; give a commit, branch or tag that exists here (in CI, fetch enough history)`);
  const diff = await git(
    ['-c', 'core.quotePath=false', 'diff', '--unified=0', '--no-color', '--no-ext-diff', '--no-renames', '--relative', '--src-prefix=a/', '--dst-prefix=b/', rev, '--', '.'],
    cwd,
    `git diff against '${rev}' failed`,
  );
  const changed = parseUnifiedDiff(diff);
  const untracked = await git(['-c', 'core.quotePath=false', 'ls-files', '--others', '--exclude-standard', '-z', '--', '.'], cwd, 'git ls-files failed');
  for (const file of untracked.split('\0').filter((f) => f !== '')) {
    if (file.toLowerCase().endsWith('.docx')) {
      changed.set(file, new Set([EVERY_LINE]));
      continue;
    }
    const text = await readFile(join(cwd, file), 'utf8').catch(() => '');
    const count = text.replace(/(\r\n|\r|\n)$/u, '').split(/\r\n|\r|\n/u).length;
    changed.set(file, new Set(Array.from({ length: count }, (_, i) => i + 1)));
  }
  return changed;
}

/** Reads `+++ b/<path>` headers and `@@ -a,b +c,d @@` hunk headers of a zero-context diff. */
export function parseUnifiedDiff(diff: string): Map<string, Set<number>> {
  const changed = new Map<string, Set<number>>();
  let lines: Set<number> | undefined;
  for (const raw of diff.split('\n')) {
    // git ends a `+++` line with a tab when the path holds a space.
    const line = raw.startsWith('+++ ') ? raw.replace(/\t$/u, '') : raw;
    const header = /^\+\+\+ (?:b\/(.*)|"b\/(.*)"|\/dev\/null)$/u.exec(line);
    if (header !== null) {
      const path = header[1] ?? (header[2] === undefined ? undefined : unquote(header[2]));
      lines = path === undefined ? undefined : new Set<number>();
      if (path !== undefined && lines !== undefined) changed.set(path, lines);
      continue;
    }
    // A changed binary file (a Word draft): git says only that it differs, so every claim in it counts.
    const binary = /^Binary files (?:a\/.*|\/dev\/null) and (?:b\/(.*)|"b\/(.*)") differ$/u.exec(line);
    if (binary !== null) {
      const path = binary[1] ?? unquote(binary[2] ?? '');
      changed.set(path, new Set([EVERY_LINE]));
      lines = undefined;
      continue;
    }
    const hunk = /^@@ -\d+(?:,\d+)? \+(\d+)(?:,(\d+))? @@/u.exec(line);
    if (hunk === null || lines === undefined) continue;
    const start = Number(hunk[1]);
    const count = hunk[2] === undefined ? 1 : Number(hunk[2]);
    if (count === 0) {
      // Nothing added: lines were deleted after line `start`.
      if (start > 0) lines.add(start);
      lines.add(start + 1);
    }
    for (let n = start; n < start + count; n += 1) lines.add(n);
  }
  return changed;
}

/** Undoes git's C-style quoting of unusual path names (`"b/caf\303\251.md"`). */
function unquote(quoted: string): string {
  const bytes: number[] = [];
  const escapes: Record<string, number> = { n: 10, t: 9, '"': 34, '\\': 92, a: 7, b: 8, f: 12, r: 13, v: 11 };
  for (let i = 0; i < quoted.length; i += 1) {
    const ch = quoted[i] as string;
    if (ch !== '\\') {
      bytes.push(...Buffer.from(ch, 'utf8'));
      continue;
    }
    const octal = /^[0-7]{3}/u.exec(quoted.slice(i + 1));
    if (octal !== null) {
      bytes.push(parseInt(octal[0], 8));
      i += 3;
    } else {
      bytes.push(escapes[quoted[i + 1] ?? ''] ?? 92);
      i += 1;
    }
  }
  return Buffer.from(bytes).toString('utf8');
}

async function git(args: string[], cwd: string, failure: string): Promise<string> {
  try {
    const { stdout } = await run('git', args, { cwd, maxBuffer: 64 * 1024 * 1024, encoding: 'utf8' });
    return stdout;
  } catch (error) {
    const code = (error as NodeJS.ErrnoException).code;
    if (code === 'ENOENT') throw new FirnlineError('git-missing', '--changed-since needs git, which was not found on the PATH');
    const stderr = String((error as { stderr?: unknown }).stderr ?? '');
    if (/not a git repository/iu.test(stderr)) throw new FirnlineError('git-not-repository', `--changed-since needs a git repository, and ${cwd} is not inside one`);
    throw new FirnlineError('git-revision', failure);
  }
}
