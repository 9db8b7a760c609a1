import { randomBytes } from 'node:crypto';
import { chmod, rename, rm, stat, writeFile } from 'node:fs/promises';
import { basename, dirname, join } from 'node:path';
import { FirnlineError } from './errors.js';

/**
 * Writes a whole file or nothing: the text goes to a temporary file in the same folder, which is
 * then renamed over the target, so a reader never sees half a report and a crash leaves the old file.
 */
export async function writeFileAtomic(file: string, text: string | Uint8Array, what = 'the file'): Promise<void> {
  const temp = join(dirname(file), `.${basename(file)}.${randomBytes(6).toString('hex')}.tmp`);
  try {
    await writeFile(temp, text, typeof text === 'string' ? { encoding: 'utf8', flag: 'wx' } : { flag: 'wx' });
    // The replaced file keeps its permissions (a shared ledger may be group-writable).
    const before = await stat(file).catch(() => undefined);
    if (before?.isFile() === true) await chmod(temp, before.mode & 0o7777);
    await rename(temp, file);
  } catch (error) {
    await rm(temp, { force: true });
    const reason = (error as NodeJS.ErrnoException).code ?? 'write failed';
    throw new FirnlineError('write-failed', `cannot write ${what} (${reason}); check the folder exists and is writable`, { file });
  }
}
