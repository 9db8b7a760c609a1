import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { FirnlineError } from '../errors.js';
import type { Draft, ProseBlock } from '../types.js';
import { readMarkdownBlocks } from './markdown.js';
import { readPlainTextBlocks } from './plain-text.js';
import { WordPackageError } from './word/word-package-error.js';

/** How many leading bytes are searched for a NUL byte, the mark of a binary file. */
const SNIFF_BYTES = 8192;

// One decoder for every file: without `stream`, decode() keeps no state between calls.
const UTF8 = new TextDecoder('utf-8', { fatal: true, ignoreBOM: true });

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
  const blocks = format === 'markdown' ? readMarkdownBlocks(text) : format === 'html' ? (htmlReader?.(text) ?? []) : readPlainTextBlocks(text);
  return { path, text, format, blocks };
}

/**
 * Reads a Word draft (`.docx`): its paragraphs, one per line of the draft's text (see
 * word/word-draft.ts). A file that is not a readable Word package throws FirnlineError
 * `draft-unreadable`, one line naming the file and what is wrong.
 */
export async function readWordDraft(path: string, cwd: string): Promise<Draft> {
  let bytes: Uint8Array;
  try {
    bytes = readFileSync(resolve(cwd, path));
  } catch (error) {
    throw readError(error as NodeJS.ErrnoException, path);
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
 * Reads one draft; `path` is kept as given (relative to `cwd`) for reports. A file with a NUL byte
 * in its first 8 KB or that is not valid UTF-8 is passed over as `{ skipped: 'binary file' }`; a
 * leading byte-order mark is kept in `text`. A file that cannot be read throws FirnlineError
 * `file-unreadable` (or `path-missing` when it has gone).
 */
export async function readDraft(path: string, cwd: string): Promise<Draft | { skipped: string }> {
  const format = draftFormat(path);
  if (format === 'docx') return readWordDraft(path, cwd);
  if (format === 'html') await loadHtmlReader();
  const text = await readDraftText(path, cwd);
  return typeof text === 'string' ? draftFromText(path, text, format) : text;
}

/**
 * Reads a draft's text without parsing it, so a caller can skip off-topic files before the
 * (much slower) Markdown parse. Same rules for binary and unreadable files as `readDraft`.
 */
export async function readDraftText(path: string, cwd: string): Promise<string | { skipped: string }> {
  let bytes: Uint8Array;
  try {
    // Read synchronously: every later stage of a draft is synchronous work anyway, and a trip
    // through the thread pool costs about 0.15 ms per file against 0.005 ms for the read itself
    // (measured on 2,000 small drafts, see bench/), the larger share of a run over a docs folder.
    bytes = readFileSync(resolve(cwd, path));
  } catch (error) {
    throw readError(error as NodeJS.ErrnoException, path);
  }
  if (bytes.subarray(0, SNIFF_BYTES).includes(0)) return { skipped: 'binary file' };
  let text: string;
  try {
    // ignoreBOM keeps a byte-order mark in the text, so the text is the file exactly.
    text = UTF8.decode(bytes);
  } catch {
    return { skipped: 'binary file' };
  }
  return text;
}

function readError(error: NodeJS.ErrnoException, path: string): FirnlineError {
  if (error.code === 'ENOENT') return new FirnlineError('path-missing', 'no such file or folder; check the path', { file: path });
  const why = error.code === 'EISDIR' ? 'it is a folder' : error.code === 'EACCES' || error.code === 'EPERM' ? 'permission denied' : (error.code ?? error.message);
  return new FirnlineError('file-unreadable', `cannot read this file (${why}); check that it is a readable file`, { file: path });
}
