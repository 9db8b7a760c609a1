/**
 * Where `-o FILE` may write. `-` and `/dev/stdout` mean standard output (written in place, never
 * replaced). Otherwise the target must be a new path or an existing regular, writable file that is
 * not one of the drafts being checked: a symbolic link is refused (the atomic writer would replace
 * the link, and writing through it could reach any file), and so is a FIFO, a device or a socket.
 */
import { lstat, realpath } from 'node:fs/promises';
import { relative, resolve } from 'node:path';
import { FirnlineError } from '../errors.js';

/** Standard output, or a file path (absolute) that is safe to replace atomically. */
export type OutputTarget = { stdout: true } | { stdout: false; file: string };

/** Checks `given` (as typed, relative to `cwd`) against the rules above; `drafts` are the paths read. */
export async function outputTarget(given: string, cwd: string, drafts: readonly string[] = []): Promise<OutputTarget> {
  if (given === '-' || given === '/dev/stdout') return { stdout: true };
  const file = resolve(cwd, given);
  const shown = relative(cwd, file) || given;
  const info = await lstat(file).catch(() => undefined);
  if (info === undefined) return { stdout: false, file };
  if (info.isSymbolicLink()) {
    throw new FirnlineError('output-symlink', 'this is a symbolic link, and Firnline does not write through links; name the file itself, or - for standard output', { file: shown });
  }
  if (!info.isFile()) {
    throw new FirnlineError('output-not-regular', 'this is not a regular file (a folder, named pipe or device); name a file, or - for standard output', { file: shown });
  }
  if ((info.mode & 0o200) === 0) {
    throw new FirnlineError('output-read-only', 'this file is read-only; Firnline will not replace it (make it writable first if you mean to)', { file: shown });
  }
  const real = await realpath(file).catch(() => file);
  for (const draft of drafts) {
    if (draft === '-') continue;
    const other = await realpath(resolve(cwd, draft)).catch(() => resolve(cwd, draft));
    if (other === real) {
      throw new FirnlineError('output-is-draft', 'this is one of the drafts being checked; write the report somewhere else', { file: shown });
    }
  }
  return { stdout: false, file };
}
