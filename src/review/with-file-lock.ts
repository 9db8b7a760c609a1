/**
 * A lock between Firnline runs that write the same file: `<file>.lock`, created with the exclusive
 * flag so only one run can hold it. The lock names its holder (`pid host token time`). Other runs
 * wait with a growing back-off, and clear the lock at once when its holder is gone (same host, and
 * no process with that PID), or when it is empty and a few seconds old (a run that died while
 * creating it). A lock whose holder is alive is never taken, however long it is held: a paused
 * run (a laptop asleep, a CI job stopped) keeps its lock. A lock from another host is cleared only
 * after `staleAfterMs`. Before its final write the holder checks that the lock is still its own
 * (`stillHeld`), so even a cleared lock cannot make two runs overwrite each other.
 */
import { hostname } from 'node:os';
import { open, readFile, rename, rm, stat } from 'node:fs/promises';
import { randomBytes } from 'node:crypto';
import { FirnlineError } from '../errors.js';

/** How long to wait, and when a lock from another host counts as abandoned. */
export interface LockTiming {
  timeoutMs: number;
  staleAfterMs: number;
}

/** What the work inside the lock may ask. */
export interface HeldLock {
  /** True while the lock file is still the one this run created. */
  stillHeld(): Promise<boolean>;
}

const DEFAULT_TIMING: LockTiming = { timeoutMs: 15_000, staleAfterMs: 30_000 };
/** An empty lock older than this was left by a run that died while creating it. */
const EMPTY_LOCK_GRACE_MS = 2_000;

/** Runs `work` while holding the lock on `file`; the lock is removed afterwards (if still ours), even on error. */
export async function withFileLock<T>(file: string, work: (lock: HeldLock) => Promise<T>, timing: LockTiming = DEFAULT_TIMING): Promise<T> {
  const lock = `${file}.lock`;
  const token = randomBytes(8).toString('hex');
  await acquire(lock, token, timing);
  const held: HeldLock = { stillHeld: async () => (await readHolder(lock))?.token === token };
  try {
    return await work(held);
  } finally {
    if (await held.stillHeld()) await rm(lock, { force: true });
  }
}

interface Holder {
  pid: number;
  host: string;
  token: string;
}

async function acquire(lock: string, token: string, timing: LockTiming): Promise<void> {
  const started = Date.now();
  for (let attempt = 0; ; attempt += 1) {
    let handle;
    try {
      handle = await open(lock, 'wx');
    } catch (error) {
      if ((error as NodeJS.ErrnoException).code !== 'EEXIST') {
        throw new FirnlineError('ledger-lock', 'cannot create the lock file; check the folder is writable', { file: lock });
      }
    }
    if (handle !== undefined) {
      try {
        await handle.writeFile(`${process.pid} ${hostname()} ${token} ${new Date().toISOString()}\n`);
        await handle.close();
        return;
      } catch {
        // A full disk: leave no empty lock behind to block the next run.
        await handle.close().catch(() => undefined);
        await rm(lock, { force: true });
        throw new FirnlineError('ledger-lock', 'cannot write the lock file (is the disk full?); free some space and try again', { file: lock });
      }
    }
    const holder = await clearIfAbandoned(lock, timing.staleAfterMs);
    if (Date.now() - started > timing.timeoutMs) {
      const who = holder === undefined ? 'another run' : `another run (process ${holder.pid} on ${holder.host})`;
      throw new FirnlineError('ledger-locked', `${who} holds this lock and is still running; wait for it to finish`, { file: lock });
    }
    // Random jitter keeps runs that collided from retrying in lock step.
    await sleep(Math.min(200, 5 * 2 ** Math.min(attempt, 6)) + Math.random() * 10);
  }
}

/** Clears an abandoned lock (see the module comment) and returns the live holder otherwise. */
async function clearIfAbandoned(lock: string, staleAfterMs: number): Promise<Holder | undefined> {
  try {
    const info = await stat(lock);
    const holder = await readHolder(lock);
    const age = Date.now() - info.mtimeMs;
    const abandoned =
      holder === undefined ? age > EMPTY_LOCK_GRACE_MS : holder.host === hostname() ? !isAlive(holder.pid) : age > staleAfterMs;
    if (!abandoned) return holder;
    // Move it aside first: a rename succeeds for one run only, so two runs never both clear it.
    const aside = `${lock}.${randomBytes(4).toString('hex')}.stale`;
    await rename(lock, aside);
    await rm(aside, { force: true });
  } catch {
    // The lock went away in the meantime: the next attempt will take it.
  }
  return undefined;
}

async function readHolder(lock: string): Promise<Holder | undefined> {
  const text = await readFile(lock, 'utf8').catch(() => '');
  const [pid, host, token] = text.trim().split(/\s+/u);
  if (pid === undefined || !/^\d+$/u.test(pid) || host === undefined || token === undefined) return undefined;
  return { pid: Number(pid), host, token };
}

function isAlive(pid: number): boolean {
  if (pid === process.pid) return true;
  try {
    process.kill(pid, 0);
    return true;
  } catch (error) {
    // EPERM: the process exists but belongs to someone else.
    return (error as NodeJS.ErrnoException).code === 'EPERM';
  }
}

function sleep(ms: number): Promise<void> {
  return new Promise((done) => setTimeout(done, ms));
}
