import { readFile } from 'node:fs/promises';
import { join, relative, sep } from 'node:path';
import ignore, { type Ignore } from 'ignore';

/** The `.gitignore` rules in force in one folder: each file's rules, outermost first. */
export type IgnoreRules = readonly { folder: string; rules: Ignore }[];

/** A relative path with forward slashes, as `.gitignore` patterns and reports use. */
export function toPosixPath(from: string, to: string): string {
  return relative(from, to).split(sep).join('/');
}

/** The rules of `folder` itself: those of its parents plus its own `.gitignore`, if any. */
export async function rulesForFolder(parents: IgnoreRules, folder: string): Promise<IgnoreRules> {
  const content = await readFile(join(folder, '.gitignore'), 'utf8').catch(() => undefined);
  return content === undefined ? parents : [...parents, { folder, rules: ignore().add(content) }];
}

/**
 * Whether git would ignore `path` (absolute): each `.gitignore` sees the path relative to its own
 * folder, and a deeper file may re-include (`!pattern`) what an outer one ignored.
 */
export function isIgnored(stack: IgnoreRules, path: string, isFolder: boolean): boolean {
  let ignored = false;
  for (const { folder, rules } of stack) {
    const result = rules.test(toPosixPath(folder, path) + (isFolder ? '/' : ''));
    if (result.ignored) ignored = true;
    else if (result.unignored) ignored = false;
  }
  return ignored;
}

/**
 * The include/exclude globs of the settings (gitignore syntax, relative to the working folder) as
 * one test. A path outside the working folder cannot match them, so it is always kept. `include`,
 * when not empty, keeps only files that match one of its patterns; it never prunes folders.
 */
export function createPathFilter(cwd: string, include: readonly string[] = [], exclude: readonly string[] = []) {
  const included = ignore().add([...include]);
  const excluded = ignore().add([...exclude]);
  return (path: string, isFolder: boolean): boolean => {
    const rel = toPosixPath(cwd, path);
    if (rel === '' || rel.startsWith('../') || rel === '..' || /^[A-Za-z]:|^\//u.test(rel)) return true;
    if (excluded.ignores(rel + (isFolder ? '/' : ''))) return false;
    return isFolder || include.length === 0 || included.ignores(rel);
  };
}
