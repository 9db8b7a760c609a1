import { resolve } from 'node:path';
import { FirnlineError } from '../errors.js';
import { readRegularFileSync } from '../guard/read-regular-file.js';
import { decodeDraftBytes } from './decode-text.js';
import { checkNestingDepth } from './nesting-depth.js';
import type { Draft } from '../types.js';
import { readMarkdownBlocks } from './markdown.js';
import { readPlainTextBlocks } from './plain-text.js';

const MARKDOWN_ENDINGS = ['.md', '.markdown'];

/** The format a draft is read as, from its file name: `.md`/`.markdown` is Markdown, anything else text. */
export function draftFormat(path: string): Draft['format'] {
  const lower = path.toLowerCase();
  return MARKDOWN_ENDINGS.some((ending) => lower.endsWith(ending)) ? 'markdown' : 'text';
}

/** A draft from text already in memory (standard input, the library's `checkText`). */
export function draftFromText(path: string, text: string, format: Draft['format']): Draft {
  if (format === 'markdown') checkNestingDepth(text, path);
  const blocks = format === 'markdown' ? readMarkdownBlocks(text) : readPlainTextBlocks(text);
  return { path, text, format, blocks };
}

/** A draft that was named or walked but could not be checked: the reason, and the one-line error. */
export interface UncheckedDraft {
  skipped: string;
  problem: FirnlineError;
}

/**
 * Reads one draft; `path` is kept as given (relative to `cwd`) for reports. A file that is not a
 * regular file, is over the size limit, or is not UTF-8 (or UTF-16 with a byte-order mark; see
 * decode-text.ts) comes back as an UncheckedDraft, which fails the run. A leading byte-order mark
 * is kept in `text`. A file that has gone throws FirnlineError `path-missing`.
 */
export async function readDraft(path: string, cwd: string): Promise<Draft | UncheckedDraft> {
  const text = await readDraftText(path, cwd);
  return typeof text === 'string' ? draftFromText(path, text, draftFormat(path)) : text;
}

/**
 * Reads a draft's text without parsing it, so a caller can skip off-topic files before the
 * (much slower) Markdown parse. Same rules as `readDraft`.
 */
export async function readDraftText(path: string, cwd: string): Promise<string | UncheckedDraft> {
  let bytes: Uint8Array;
  try {
    // Read synchronously: every later stage of a draft is synchronous work anyway, and a trip
    // through the thread pool costs about 0.15 ms per file against 0.005 ms for the read itself
    // (measured on 2,000 small drafts, see bench/), the larger share of a run over a docs folder.
    bytes = readRegularFileSync(resolve(cwd, path), { shown: path });
  } catch (error) {
    if (error instanceof FirnlineError) return { skipped: error.code === 'file-unreadable' ? 'cannot be read' : error.message.split(';')[0] ?? error.message, problem: error };
    throw new FirnlineError('path-missing', 'no such file or folder; check the path', { file: path });
  }
  const decoded = decodeDraftBytes(bytes);
  if ('problem' in decoded) {
    const { problem, line, column } = decoded;
    const where = line === undefined ? { file: path } : { file: path, line, ...(column === undefined ? {} : { column }) };
    return { skipped: problem.split(';')[0] ?? problem, problem: new FirnlineError('draft-encoding', problem, where) };
  }
  return decoded.text;
}
