/**
 * Reads a file only when it is a regular file of bounded size. A FIFO, a device (`/dev/zero`), a
 * socket or a folder is refused before a single byte is read: the file is opened without blocking
 * (O_NONBLOCK, so opening a FIFO with no writer returns at once) and its type is taken from the
 * open handle, so a file swapped between a check and the read cannot slip through.
 */
import { closeSync, constants, fstatSync, openSync, readSync } from 'node:fs';
import { open } from 'node:fs/promises';
import { FirnlineError } from '../errors.js';

/** The largest draft, pack, settings file, ledger or checklist read, in bytes (16 MiB). */
export const MAX_INPUT_BYTES = 16 * 1024 * 1024;

/** What the caller calls the file in messages ("draft", "rule pack", ...) and its size limit. */
export interface RegularFileOptions {
  /** The name shown in messages (the path as the user gave it). */
  shown: string;
  /** Bytes; default MAX_INPUT_BYTES. */
  maxBytes?: number;
  /** The error code for a file that cannot be read (default `file-unreadable`). */
  code?: string;
}

/**
 * The bytes of `file`. Throws FirnlineError `not-regular-file` for anything but a regular file,
 * `file-too-large` over the limit, and `code` (with the system's reason) when it cannot be read;
 * a missing file throws an Error whose `code` is `ENOENT`, so callers can treat it as absent.
 */
export async function readRegularFile(file: string, options: RegularFileOptions): Promise<Buffer> {
  const maxBytes = options.maxBytes ?? MAX_INPUT_BYTES;
  let handle;
  try {
    handle = await open(file, constants.O_RDONLY | constants.O_NONBLOCK);
  } catch (error) {
    const code = (error as NodeJS.ErrnoException).code;
    if (code === 'ENOENT') throw error;
    throw new FirnlineError(options.code ?? 'file-unreadable', `cannot read this file (${whyNot(code)}); check that it is a readable file`, { file: options.shown });
  }
  try {
    const info = await handle.stat();
    if (info.isDirectory()) throw new FirnlineError(options.code ?? 'file-unreadable', 'cannot read this file (it is a folder); check that it is a readable file', { file: options.shown });
    if (!info.isFile()) throw new FirnlineError('not-regular-file', `not a regular file (${kindOf(info)}); name a regular file`, { file: options.shown });
    if (info.size > maxBytes) throw tooLarge(options.shown, maxBytes);
    // Read at most one byte past the limit, so a file that grows while it is read is still bounded.
    const buffer = Buffer.alloc(Math.min(info.size, maxBytes) + 1);
    let length = 0;
    for (;;) {
      const { bytesRead } = await handle.read(buffer, length, buffer.length - length, null);
      if (bytesRead === 0) break;
      length += bytesRead;
      if (length === buffer.length) {
        if (length > maxBytes) throw tooLarge(options.shown, maxBytes);
        break;
      }
    }
    return buffer.subarray(0, length);
  } catch (error) {
    if (error instanceof FirnlineError) throw error;
    throw new FirnlineError(options.code ?? 'file-unreadable', `cannot read this file (${whyNot((error as NodeJS.ErrnoException).code)}); check that it is a readable file`, { file: options.shown });
  } finally {
    await handle.close();
  }
}

/**
 * The same, synchronously: drafts are read this way, since every later stage of a draft is
 * synchronous work anyway and a trip through the thread pool costs more than the read itself.
 */
export function readRegularFileSync(file: string, options: RegularFileOptions): Buffer {
  const maxBytes = options.maxBytes ?? MAX_INPUT_BYTES;
  let fd: number;
  try {
    fd = openSync(file, constants.O_RDONLY | constants.O_NONBLOCK);
  } catch (error) {
    const code = (error as NodeJS.ErrnoException).code;
    if (code === 'ENOENT') throw error;
    throw new FirnlineError(options.code ?? 'file-unreadable', `cannot read this file (${whyNot(code)}); check that it is a readable file`, { file: options.shown });
  }
  try {
    const info = fstatSync(fd);
    if (info.isDirectory()) throw new FirnlineError(options.code ?? 'file-unreadable', 'cannot read this file (it is a folder); check that it is a readable file', { file: options.shown });
    if (!info.isFile()) throw new FirnlineError('not-regular-file', `not a regular file (${kindOf(info)}); name a regular file`, { file: options.shown });
    if (info.size > maxBytes) throw tooLarge(options.shown, maxBytes);
    // Not zero-filled: only the bytes read are returned (a docs folder is tens of megabytes).
    const buffer = Buffer.allocUnsafe(Math.min(info.size, maxBytes) + 1);
    let length = 0;
    for (;;) {
      const bytesRead = readSync(fd, buffer, length, buffer.length - length, null);
      if (bytesRead === 0) break;
      length += bytesRead;
      if (length === buffer.length) {
        if (length > maxBytes) throw tooLarge(options.shown, maxBytes);
        break;
      }
    }
    return buffer.subarray(0, length);
  } catch (error) {
    if (error instanceof FirnlineError) throw error;
    throw new FirnlineError(options.code ?? 'file-unreadable', `cannot read this file (${whyNot((error as NodeJS.ErrnoException).code)}); check that it is a readable file`, { file: options.shown });
  } finally {
    closeSync(fd);
  }
}

/** The same, decoded as UTF-8 text (packs, settings, ledgers and checklists are UTF-8 YAML or Markdown). */
export async function readRegularText(file: string, options: RegularFileOptions): Promise<string> {
  return (await readRegularFile(file, options)).toString('utf8');
}

function tooLarge(shown: string, maxBytes: number): FirnlineError {
  return new FirnlineError('file-too-large', `larger than ${Math.round(maxBytes / 1024 / 1024)} MiB, the most Firnline reads from one file; split it`, { file: shown });
}

function whyNot(code: string | undefined): string {
  if (code === 'EACCES' || code === 'EPERM') return 'permission denied';
  if (code === 'EISDIR') return 'it is a folder';
  if (code === 'ELOOP') return 'a symbolic link that loops';
  return code ?? 'read failed';
}

function kindOf(info: { isFIFO(): boolean; isCharacterDevice(): boolean; isBlockDevice(): boolean; isSocket(): boolean }): string {
  if (info.isFIFO()) return 'a named pipe';
  if (info.isCharacterDevice() || info.isBlockDevice()) return 'a device';
  if (info.isSocket()) return 'a socket';
  return 'a special file';
}
