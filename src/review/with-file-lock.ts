/**
 * A lock between Firnline runs that write the same file: `<file>.lock`, created with the exclusive
 * flag so only one run can hold it. Other runs wait with a growing back-off. A lock older than
 * `staleAfterMs` is taken to be left by a crashed run and is cleared.
 */
import { open, rename, rm, stat } from 'node:fs/promises';
import { randomBytes } from 'node:crypto';
import { FirnlineError } from '../errors.js';

/** How long to wait, and when a lock counts as abandoned. */
export interface LockTiming {
  timeoutMs: number;
  staleAfterMs: number;
}

const DEFAULT_TIMING: LockTiming = { timeoutMs: 15_000, staleAfterMs: 30_000 };

/** Runs `work` while holding the lock on `file`; the lock is removed afterwards, even on error. */
export async function withFileLock<T>(file: string, work: () => Promise<T>, timing: LockTiming = DEFAULT_TIMING): Promise<T> {
  const lock = `${file}.lock`;
  await acquire(lock, timing);
  try {
    return await work();
  } finally {
    await rm(lock, { force: true });
  }
}

async function acquire(lock: string, timing: LockTiming): Promise<void> {
  const started = Date.now();
  for (let attempt = 0; ; attempt += 1) {
    try {
      const handle = await open(lock, 'wx');
      await handle.writeFile(`${process.pid} ${new Date().toISOString()}\n`);
      await handle.close();
      return;
    } catch (error) {
      if ((error as NodeJS.ErrnoException).code !== 'EEXIST') {
        throw new FirnlineError('ledger-lock', 'cannot create the lock file; check the folder is writable', { file: lock });
      }
    }
    await clearIfStale(lock, timing.staleAfterMs);
    if (Date.now() - started > timing.timeoutMs) {
      throw new FirnlineError('ledger-locked', 'another run holds this lock; wait for it, or delete the file if no run is active', { file: lock });
    }
    // Random jitter keeps runs that collided from retrying in lock step.
    await sleep(Math.min(200, 5 * 2 ** Math.min(attempt, 6)) + Math.random() * 10);
  }
}

/** Moves an abandoned lock aside first: a rename succeeds for one run only, so two runs never both clear it. */
async function clearIfStale(lock: string, staleAfterMs: number): Promise<void> {
  try {
    const info = await stat(lock);
    if (Date.now() - info.mtimeMs < staleAfterMs) return;
    const aside = `${lock}.${randomBytes(4).toString('hex')}.stale`;
    await rename(lock, aside);
    await rm(aside, { force: true });
  } catch {
    // The lock went away in the meantime: the next attempt will take it.
  }
}

function sleep(ms: number): Promise<void> {
  return new Promise((done) => setTimeout(done, ms));
}
