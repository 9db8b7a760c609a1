import { resolve } from 'node:path';
import { FirnlineError } from '../errors.js';
import { readRegularFileSync } from '../guard/read-regular-file.js';
import { decodeDraftBytes } from './decode-text.js';
import { checkNestingDepth } from './nesting-depth.js';
import type { Draft, ProseBlock } from '../types.js';
import { readMarkdownBlocks } from './markdown.js';
import { readPlainTextBlocks } from './plain-text.js';
import { WordPackageError } from './word/word-package-error.js';

const ENDINGS: [string, Draft['format']][] = [
  ['.md', 'markdown'],
  ['.markdown', 'markdown'],
  ['.html', 'html'],
  ['.htm', 'html'],
  ['.docx', 'docx'],
];

/**
 * The format a draft is read as, from its file name: `.md`/`.markdown` Markdown, `.html`/`.htm`
 * HTML, `.docx` a Word document, anything else plain text.
 */
export function draftFormat(path: string): Draft['format'] {
  const lower = path.toLowerCase();
  return ENDINGS.find(([ending]) => lower.endsWith(ending))?.[1] ?? 'text';
}

let htmlReader: ((text: string) => ProseBlock[]) | undefined;

/**
 * Loads the HTML reader (parse5) once. It is loaded only when an HTML draft is met, as the Word
 * reader is, so a run over Markdown never pays for it; `draftFromText(..., 'html')` needs it first.
 */
export async function loadHtmlReader(): Promise<void> {
  htmlReader ??= (await import('./html.js')).readHtmlBlocks;
}

/**
 * A draft from text already in memory (standard input, the library's `checkText`); not for Word
 * files. For HTML, `loadHtmlReader()` must have been awaited (checkPaths and checkText do).
 */
export function draftFromText(path: string, text: string, format: Exclude<Draft['format'], 'docx'>): Draft {
  if (format === 'html' && htmlReader === undefined) throw new Error('internal: draftFromText(html) before loadHtmlReader()');
  if (format === 'markdown') checkNestingDepth(text, path);
  const blocks = format === 'markdown' ? readMarkdownBlocks(text) : format === 'html' ? (htmlReader?.(text) ?? []) : readPlainTextBlocks(text);
  return { path, text, format, blocks };
}

/** A draft that was named or walked but could not be checked: the reason, and the one-line error. */
export interface UncheckedDraft {
  skipped: string;
  problem: FirnlineError;
}

/**
 * Reads a Word draft (`.docx`): its paragraphs, one per line of the draft's text (see
 * word/word-draft.ts). A file that is not a readable Word package throws FirnlineError
 * `draft-unreadable`, one line naming the file and what is wrong.
 */
export async function readWordDraft(path: string, cwd: string): Promise<Draft> {
  let bytes: Uint8Array;
  try {
    bytes = readRegularFileSync(resolve(cwd, path), { shown: path });
  } catch (error) {
    if (error instanceof FirnlineError) throw error;
    throw new FirnlineError('path-missing', 'no such file or folder; check the path', { file: path });
  }
  // The Word reader (zip and XML libraries) is loaded only when a Word draft is met.
  const { readWordDocument, wordDraftFrom } = await import('./word/word-draft.js');
  try {
    return wordDraftFrom(path, readWordDocument(bytes));
  } catch (error) {
    if (error instanceof WordPackageError) throw new FirnlineError('draft-unreadable', error.message, { file: path });
    throw error;
  }
}

/**
 * Reads one draft; `path` is kept as given (relative to `cwd`) for reports. A Word file is read as
 * a Word package; any other file that is not a regular file, is over the size limit, or is not
 * UTF-8 (or UTF-16 with a byte-order mark; see decode-text.ts) comes back as an UncheckedDraft,
 * which fails the run. A leading byte-order mark is kept in `text`. A file that has gone throws
 * FirnlineError `path-missing`.
 */
export async function readDraft(path: string, cwd: string): Promise<Draft | UncheckedDraft> {
  const format = draftFormat(path);
  if (format === 'docx') return readWordDraft(path, cwd);
  if (format === 'html') await loadHtmlReader();
  const text = await readDraftText(path, cwd);
  return typeof text === 'string' ? draftFromText(path, text, format) : text;
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
