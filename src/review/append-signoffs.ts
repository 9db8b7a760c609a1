/**
 * Adds sign-offs to the end of the ledger. Earlier entries are never dropped, reordered or
 * reformatted: in the usual layout (`signoffs:` the last top-level key, a block list) the new
 * entries are appended as text, so every byte before them stays as it was and a diff shows only
 * added lines. Other layouts are edited through the yaml Document API, which keeps comments, key
 * order and keys Firnline does not know. The write is atomic and runs under `<ledger>.lock`.
 */
import { stat } from 'node:fs/promises';
import { readRegularText } from '../guard/read-regular-file.js';
import { foldClaimText } from './claim-id.js';
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

/**
 * Appends `entries` to the ledger at `file` (created when missing), safely against concurrent
 * runs, and returns how many were written. Under the lock, an entry whose decision the ledger
 * already holds word for word (another run recorded it meanwhile) is left out. The ledger keeps its
 * file mode and line endings; a read-only ledger is refused. Just before the final rename the run
 * checks that the lock is still its own and the ledger unchanged since it read it, and starts again
 * if not, so no other run's sign-off is ever overwritten.
 */
export async function appendSignoffs(file: string, entries: SignoffEntry[]): Promise<number> {
  return (await appendSignoffEntries(file, entries)).length;
}

/** As `appendSignoffs`, returning the entries actually written (the caller reports them by decision). */
export async function appendSignoffEntries(file: string, entries: SignoffEntry[]): Promise<SignoffEntry[]> {
  if (entries.length === 0) return [];
  for (let attempt = 0; attempt < 5; attempt += 1) {
    const written = await withFileLock(file, async (lock) => {
      const before = await readOrEmpty(file);
      const ledger = parseLedger(before, file); // refuse to touch a ledger that is already broken
      await refuseReadOnly(file);
      const fresh = entries.filter((entry) => !alreadyRecorded(ledger.signoffs, entry));
      if (fresh.length === 0) return [];
      let after = appendToLedgerText(before, fresh);
      if (before.includes('\r\n')) after = after.replace(/\r?\n/gu, '\r\n');
      if (!(await lock.stillHeld()) || (await readOrEmpty(file)) !== before) return undefined;
      await writeFileAtomic(file, after, 'the sign-off ledger');
      return fresh;
    });
    if (written !== undefined) return written;
  }
  throw new FirnlineError('ledger-busy', 'the ledger kept changing while this run wrote to it; run the command again', { file });
}

/** The latest entry for the claim records the same decision, by the same reviewer, on the same wording. */
function alreadyRecorded(signoffs: readonly SignoffEntry[], next: SignoffEntry): boolean {
  const old = signoffs.findLast((s) => s.claim === next.claim);
  return (
    old !== undefined &&
    old.reviewer === next.reviewer &&
    old.decision === next.decision &&
    old.reason === next.reason &&
    old.note === next.note &&
    foldClaimText(old.text) === foldClaimText(next.text)
  );
}

async function refuseReadOnly(file: string): Promise<void> {
  const info = await stat(file).catch(() => undefined);
  if (info !== undefined && (info.mode & 0o200) === 0) {
    throw new FirnlineError('ledger-read-only', 'the sign-off ledger is read-only; make it writable to record sign-offs', { file });
  }
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
    return await readRegularText(file, { shown: file, code: 'ledger-unreadable' });
  } catch (error) {
    if ((error as NodeJS.ErrnoException).code === 'ENOENT') return '';
    if (error instanceof FirnlineError) throw error;
    throw new FirnlineError('ledger-unreadable', 'cannot read the sign-off ledger; check its permissions', { file });
  }
}
