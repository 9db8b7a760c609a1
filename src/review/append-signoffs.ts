/**
 * Adds sign-offs to the end of the ledger. Earlier entries are never dropped, reordered or
 * reformatted: in the usual layout (`signoffs:` the last top-level key, a block list) the new
 * entries are appended as text, so every byte before them stays as it was and a diff shows only
 * added lines. Other layouts are edited through the yaml Document API, which keeps comments, key
 * order and keys Firnline does not know. The write is atomic and runs under `<ledger>.lock`.
 */
import { readFile } from 'node:fs/promises';
import { isMap, isScalar, isSeq, parseDocument, stringify, type Pair, type YAMLMap } from 'yaml';
import { FirnlineError } from '../errors.js';
import { writeFileAtomic } from '../write-file-atomic.js';
import { parseLedger } from './read-ledger.js';
import { entryToYaml, type SignoffEntry } from './signoff-entry.js';
import { withFileLock } from './with-file-lock.js';

/** The first lines of a new ledger. */
export const LEDGER_HEADER = `${[
  '# Firnline sign-off ledger: one entry per expert decision on a claim, oldest first.',
  '# Add entries with `firnline signoff`; leave earlier entries as they are. Format: docs/sign-off.md',
].join('\n')}\n\n`;

/** Appends `entries` to the ledger at `file` (created when missing), safely against concurrent runs. */
export async function appendSignoffs(file: string, entries: SignoffEntry[]): Promise<void> {
  if (entries.length === 0) return;
  await withFileLock(file, async () => {
    const before = await readOrEmpty(file);
    parseLedger(before, file); // refuse to touch a ledger that is already broken
    await writeFileAtomic(file, appendToLedgerText(before, entries), 'the sign-off ledger');
  });
}

/** The ledger text with `entries` added at the end of its `signoffs` list. Pure: used by the writer and the tests. */
export function appendToLedgerText(text: string, entries: SignoffEntry[]): string {
  const doc = parseDocument(text);
  const root = doc.contents;
  const items = (indent: number) => indentLines(stringify(entries.map(entryToYaml), { lineWidth: 0 }), indent);
  const base = text === '' ? LEDGER_HEADER : text.endsWith('\n') ? text : `${text}\n`;

  if (root === null || (isScalar(root) && root.value === null)) return `${base}signoffs:\n${items(2)}`;
  if (!isMap(root) || root.flow === true) return editWithDocument(text, entries);
  const pair = root.items.find((p) => keyOf(p) === 'signoffs');
  const isLast = pair !== undefined && pair === root.items[root.items.length - 1];
  const column = (offset: number) => offset - (text.lastIndexOf('\n', offset - 1) + 1);

  if (pair === undefined) return `${base}signoffs:\n${items(2)}`;
  if (isLast && (pair.value === null || (isScalar(pair.value) && pair.value.value === null && pair.value.source === ''))) {
    return `${base}${items(column(keyStart(pair, root)) + 2)}`;
  }
  if (isLast && isSeq(pair.value) && pair.value.flow !== true && pair.value.range !== null && pair.value.range !== undefined) {
    return `${base}${items(column(pair.value.range[0]))}`;
  }
  return editWithDocument(text, entries);
}

/** The fallback for unusual layouts: the Document API keeps comments and unknown keys. */
function editWithDocument(text: string, entries: SignoffEntry[]): string {
  const doc = parseDocument(text);
  const list = doc.get('signoffs');
  if (isSeq(list)) {
    list.flow = false;
    for (const entry of entries) list.add(doc.createNode(entryToYaml(entry)));
  } else {
    doc.set('signoffs', doc.createNode(entries.map(entryToYaml)));
  }
  return doc.toString({ lineWidth: 0 });
}

function keyOf(pair: Pair): unknown {
  return isScalar(pair.key) ? pair.key.value : pair.key;
}

function keyStart(pair: Pair, root: YAMLMap): number {
  return (isScalar(pair.key) ? pair.key.range?.[0] : undefined) ?? root.range?.[0] ?? 0;
}

function indentLines(block: string, indent: number): string {
  const pad = ' '.repeat(indent);
  return block
    .split('\n')
    .map((line) => (line === '' ? line : pad + line))
    .join('\n');
}

async function readOrEmpty(file: string): Promise<string> {
  try {
    return await readFile(file, 'utf8');
  } catch (error) {
    if ((error as NodeJS.ErrnoException).code === 'ENOENT') return '';
    throw new FirnlineError('ledger-unreadable', 'cannot read the sign-off ledger; check its permissions', { file });
  }
}
