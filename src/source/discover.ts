import { readdir, realpath, stat } from 'node:fs/promises';
import type { Dirent } from 'node:fs';
import { isAbsolute, join, relative, resolve } from 'node:path';
import { FirnlineError, FirnlineErrors } from '../errors.js';
import { createPathFilter, isIgnored, rulesForFolder, toPosixPath, type IgnoreRules } from './ignore-rules.js';

/** File endings taken when walking a folder (any file named directly is taken whatever its ending). */
export const DRAFT_EXTENSIONS = ['.md', '.markdown', '.txt', '.html', '.htm', '.docx'] as const;

/** Which files a folder walk keeps: gitignore-style globs relative to `root` (default: the working folder). */
export interface DraftFilters {
  include?: string[];
  exclude?: string[];
  /** The folder the patterns are relative to: the settings file's folder. */
  root?: string;
}

type PathFilter = ReturnType<typeof createPathFilter>;

/**
 * The drafts to check, as sorted, deduplicated POSIX paths relative to `cwd`. A file is taken as
 * given. A folder is walked for `.md`, `.markdown`, `.txt`, `.html`, `.htm` and `.docx` files, passing
 * over hidden names, a word processor's `~$` lock files, `node_modules`, whatever the `.gitignore` files from `cwd` down say, and whatever
 * `include`/`exclude` leave out. Every missing path and every folder without drafts is reported
 * together (FirnlineError codes `path-missing`, `no-drafts`).
 */
export async function findDrafts(paths: string[], workingFolder: string, options: DraftFilters = {}): Promise<{ files: string[]; outside?: string[] }> {
  const cwd = resolve(workingFolder);
  const filter = createPathFilter(options.root === undefined ? cwd : resolve(options.root), options.include, options.exclude);
  const found = new Set<string>();
  const outside = new Set<string>();
  const errors: FirnlineError[] = [];
  for (const given of paths) {
    const path = resolve(cwd, given);
    const info = await stat(path).catch((error: unknown) => error as NodeJS.ErrnoException);
    if (info instanceof Error) {
      errors.push(statError(info, given));
    } else if (info.isDirectory()) {
      const walk: Walk = { cwd, filter, found: new Set(), outside };
      await walkFolder(path, await rulesAbove(cwd, path), walk);
      for (const file of walk.found) found.add(file);
      if (walk.found.size === 0) {
        errors.push(new FirnlineError('no-drafts', 'no .md, .markdown, .txt, .html, .htm or .docx drafts in this folder (hidden and ignored files are passed over); name a file or another folder', { file: given }));
      }
    } else {
      found.add(path);
    }
  }
  if (errors.length === 1 && errors[0] !== undefined) throw errors[0];
  if (errors.length > 1) throw new FirnlineErrors(errors);
  const files = [...found].map((path) => toPosixPath(cwd, path)).sort();
  return outside.size === 0 ? { files } : { files, outside: [...outside].map((path) => toPosixPath(cwd, path)).sort() };
}

function statError(error: NodeJS.ErrnoException, given: string): FirnlineError {
  if (error.code === 'ENOENT' || error.code === 'ENOTDIR') {
    return new FirnlineError('path-missing', 'no such file or folder; check the path', { file: given });
  }
  const hint = error.code === 'ELOOP' ? 'a symbolic link that points back to itself; remove or fix the link' : 'check its permissions';
  return new FirnlineError('file-unreadable', `cannot read this path (${error.code ?? error.message}); ${hint}`, { file: given });
}

/** The `.gitignore` rules of the folders from `cwd` down to the parent of `folder`, if it is inside `cwd`. */
async function rulesAbove(cwd: string, folder: string): Promise<IgnoreRules> {
  const rel = toPosixPath(cwd, folder);
  if (rel === '' || rel.startsWith('../') || rel === '..' || isAbsolute(rel)) return [];
  let rules = await rulesForFolder([], cwd);
  let parent = cwd;
  for (const name of rel.split('/').slice(0, -1)) {
    parent = join(parent, name);
    rules = await rulesForFolder(rules, parent);
  }
  return rules;
}

interface Walk {
  cwd: string;
  filter: PathFilter;
  found: Set<string>;
  /** Links met in a walk whose target lies outside the working folder: not followed, but reported. */
  outside: Set<string>;
}

async function walkFolder(folder: string, parents: IgnoreRules, walk: Walk): Promise<void> {
  const rules = await rulesForFolder(parents, folder);
  const entries = await readdir(folder, { withFileTypes: true }).catch((error: unknown) => {
    const code = (error as NodeJS.ErrnoException).code ?? 'error';
    throw new FirnlineError('file-unreadable', `cannot read this folder (${code}); check its permissions`, { file: toPosixPath(walk.cwd, folder) });
  });
  for (const entry of entries) {
    if (entry.name.startsWith('.') || entry.name.startsWith('~$') || entry.name === 'node_modules') continue;
    const path = join(folder, entry.name);
    const kind = await entryKind(entry, path);
    if (kind === 'file' && entry.isSymbolicLink() && !(await linksInside(path, walk.cwd))) {
      if (isDraftName(entry.name) && !isIgnored(rules, path, false) && walk.filter(path, false)) walk.outside.add(path);
      continue;
    }
    if (kind === undefined || isIgnored(rules, path, kind === 'folder') || !walk.filter(path, kind === 'folder')) continue;
    if (kind === 'folder') await walkFolder(path, rules, walk);
    else if (DRAFT_EXTENSIONS.some((ending) => entry.name.toLowerCase().endsWith(ending))) walk.found.add(path);
  }
}

/** True when the link at `path` resolves to a file inside `cwd` (a pull request may add a link to any file). */
async function linksInside(path: string, cwd: string): Promise<boolean> {
  const [target, root] = await Promise.all([realpath(path).catch(() => path), realpath(cwd).catch(() => cwd)]);
  const rel = relative(root, target);
  return rel !== '' && !rel.startsWith('..') && !isAbsolute(rel);
}

function isDraftName(name: string): boolean {
  return DRAFT_EXTENSIONS.some((ending) => name.toLowerCase().endsWith(ending));
}

/** Files, folders and links to files; a link to a folder is not followed, so walks cannot loop. */
async function entryKind(entry: Dirent, path: string): Promise<'file' | 'folder' | undefined> {
  if (entry.isDirectory()) return 'folder';
  if (entry.isFile()) return 'file';
  if (!entry.isSymbolicLink()) return undefined;
  const target = await stat(path).catch(() => undefined);
  return target?.isFile() === true ? 'file' : undefined;
}
