import { createHash } from 'node:crypto';
import { FirnlineError } from '../errors.js';

/** One part of a file set split for a CI matrix: shard `index` (1-based) of `count`. */
export interface Shard {
  index: number;
  count: number;
}

/** Reads `K/N` (1 ≤ K ≤ N); anything else is a usage error. */
export function parseShard(text: string): Shard {
  const m = /^(\d+)\/(\d+)$/u.exec(text.trim());
  const index = Number(m?.[1]);
  const count = Number(m?.[2]);
  if (m === null || !Number.isSafeInteger(count) || count < 1 || index < 1 || index > count) {
    throw new FirnlineError('usage', `--shard ${text}: expected K/N with 1 ≤ K ≤ N, e.g. --shard 2/4`);
  }
  return { index, count };
}

/**
 * True when the file belongs to the shard. The split depends only on the file's path relative to
 * the project root (the first 32 bits of its SHA-256), so every machine of a matrix agrees on it
 * whatever folder it runs in and whatever other files it sees.
 */
export function inShard(projectPath: string, shard: Shard): boolean {
  const n = createHash('sha256').update(projectPath).digest().readUInt32BE(0);
  return n % shard.count === shard.index - 1;
}
