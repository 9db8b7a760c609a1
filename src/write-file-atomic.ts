import { createHash, randomBytes } from 'node:crypto';
import { chmod, readdir, rename, rm, stat, writeFile } from 'node:fs/promises';
import { hostname } from 'node:os';
import { basename, dirname, join } from 'node:path';
import { FirnlineError } from './errors.js';
import { isProcessAlive } from './guard/process-alive.js';

/** This machine, shortened: temporary files name the machine and process that made them. */
const HOST = createHash('sha256').update(hostname()).digest('hex').slice(0, 8);

/**
 * Writes a whole file or nothing: the text goes to a temporary file in the same folder, which is
 * then renamed over the target, so a reader never sees half a report and a crash leaves the old file.
 *
 * The temporary file is `.<name>.<host>-<pid>.<random>.tmp`. A run killed while writing (kill -9,
 * a power cut) cannot remove its own; the next write to the same target removes every such file
 * whose process on this machine has gone, so none is left behind for long.
 */
export async function writeFileAtomic(file: string, text: string | Uint8Array | Iterable<string>, what = 'the file'): Promise<void> {
  await removeAbandonedTemps(dirname(file), `.${basename(file)}.`);
  const temp = temporaryFileFor(file);
  try {
    // Pieces of text (a long report) are written as they come, and the whole text is never held.
    await writeFile(temp, text, text instanceof Uint8Array ? { flag: 'wx' } : { encoding: 'utf8', flag: 'wx' });
    // The replaced file keeps its permissions (a shared ledger may be group-writable).
    const before = await stat(file).catch(() => undefined);
    if (before?.isFile() === true) await chmod(temp, before.mode & 0o7777);
    await rename(temp, file);
  } catch (error) {
    await rm(temp, { force: true });
    // A fault while making the pieces is not the file system's: it is not reported as a write failure.
    if (typeof text !== 'string' && !(text instanceof Uint8Array) && (error as NodeJS.ErrnoException).code === undefined) throw error;
    const reason = (error as NodeJS.ErrnoException).code ?? 'write failed';
    throw new FirnlineError('write-failed', `cannot write ${what} (${reason}); check the folder exists and is writable`, { file });
  }
}

/** A fresh temporary file name beside `file` for process `pid` of this machine. */
export function temporaryFileFor(file: string, pid = process.pid): string {
  return join(dirname(file), `.${basename(file)}.${HOST}-${pid}.${randomBytes(6).toString('hex')}.tmp`);
}

/** Removes the temporary files of `prefix` left by dead processes of this machine (best effort). */
async function removeAbandonedTemps(folder: string, prefix: string): Promise<void> {
  const names = await readdir(folder).catch(() => [] as string[]);
  for (const name of names) {
    if (!name.startsWith(prefix) || !name.endsWith('.tmp')) continue;
    const owner = /^([0-9a-f]{8})-(\d+)\.[0-9a-f]{12}\.tmp$/u.exec(name.slice(prefix.length));
    if (owner === null || owner[1] !== HOST || isProcessAlive(Number(owner[2]))) continue;
    await rm(join(folder, name), { force: true }).catch(() => undefined);
  }
}
