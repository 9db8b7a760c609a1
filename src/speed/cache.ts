/**
 * The result cache: what one file's check found, stored under a key made of everything the finding
 * depends on (the file's text, its path and project path, the loaded packs' content, the level
 * overrides, Firnline's version and a digest of its code), so a CI re-run or an editor's re-check skips files that did not
 * change. Entries live in `.firnline-cache/` in the project root, one JSON file each. An entry that
 * does not parse, names another version or another key, or has the wrong shape is ignored (and
 * overwritten by the fresh result): the cache can make a run faster, never different.
 */
import { createHash } from 'node:crypto';
import { mkdirSync, readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import type { LoadedPacks } from '../rulepack/types.js';
import type { Claim, Flag, Level } from '../types.js';
import { writeFileAtomic } from '../write-file-atomic.js';

/** The folder name, in the project root. */
export const CACHE_FOLDER = '.firnline-cache';

/** What one file's check found: its claims and flags, why it was passed over, or why it could not be checked. */
export interface FileOutcome {
  claims: Claim[];
  flags: Flag[];
  /** Passed over with a note ("names no subject of the packs", "sign-off checklist"). */
  skipped?: string;
  /** Could not be checked (not UTF-8, too large, nested too deep...): the run fails (exit 2). */
  unchecked?: { reason: string; line?: number; column?: number };
}

const ENTRY_FORMAT = 'firnline-cache/1';

/** One cache folder. Reads are synchronous (small files); writes go through writeFileAtomic. */
export class ResultCache {
  constructor(
    readonly dir: string,
    private readonly version: string,
  ) {}

  /** The stored outcome for `key`, or undefined when there is none that can be trusted. */
  get(key: string): FileOutcome | undefined {
    let raw: string;
    try {
      raw = readFileSync(this.pathOf(key), 'utf8');
    } catch {
      return undefined;
    }
    try {
      const entry = JSON.parse(raw, revive) as { format?: unknown; version?: unknown; key?: unknown; outcome?: FileOutcome };
      if (entry.format !== ENTRY_FORMAT || entry.version !== this.version || entry.key !== key) return undefined;
      const o = entry.outcome;
      if (o === undefined || !Array.isArray(o.claims) || !Array.isArray(o.flags)) return undefined;
      if (o.skipped !== undefined && typeof o.skipped !== 'string') return undefined;
      // Only findings are stored; a file that could not be checked is read again every run.
      if (o.unchecked !== undefined) return undefined;
      return o;
    } catch {
      return undefined;
    }
  }

  /** Stores an outcome; a cache that cannot be written (read-only folder, full disk) is left alone. */
  async set(key: string, outcome: FileOutcome): Promise<void> {
    const file = this.pathOf(key);
    try {
      mkdirSync(join(this.dir, key.slice(0, 2)), { recursive: true });
      await writeFileAtomic(file, JSON.stringify({ format: ENTRY_FORMAT, version: this.version, key, outcome }, replace));
    } catch {
      // A cache is an optimisation: failing to write one never fails a run.
    }
  }

  private pathOf(key: string): string {
    return join(this.dir, key.slice(0, 2), `${key}.json`);
  }
}

/** The digest of the loaded packs: each pack file's content, in load order. */
export function packsDigest(packs: LoadedPacks): string {
  const hash = createHash('sha256');
  for (const pack of packs.packs) {
    let content: string;
    try {
      content = readFileSync(pack.file, 'utf8');
    } catch {
      // Packs built in memory have no file: their data stands in for it.
      content = JSON.stringify(pack);
    }
    hash.update(`${pack.file}\0${content}\0`);
  }
  return hash.digest('hex');
}

let code: string | undefined;

/**
 * The digest of Firnline's own code (every module of the folder this one was loaded from: dist/ or,
 * under the tests, src/), so that a changed engine never reuses results of the old one, even while
 * the version number stays the same between releases.
 */
export function codeDigest(): string {
  if (code !== undefined) return code;
  const root = fileURLToPath(new URL('..', import.meta.url));
  const hash = createHash('sha256');
  const files = (readdirSync(root, { recursive: true }) as string[]).filter((f) => /\.(?:js|ts)$/u.test(f)).sort();
  for (const file of files) hash.update(`${file}\0`).update(readFileSync(join(root, file))).update('\0');
  code = hash.digest('hex');
  return code;
}

/** The key of one file's outcome. */
export function cacheKeyOf(parts: {
  version: string;
  packs: string;
  path: string;
  projectPath: string;
  format: string;
  levels: Record<string, Level | 'off'>;
  text: string;
}): string {
  const levels = Object.entries(parts.levels).sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0));
  const head = JSON.stringify([parts.version, codeDigest(), parts.packs, parts.path, parts.projectPath, parts.format, levels]);
  return createHash('sha256').update(head).update('\0').update(parts.text).digest('hex');
}

// JSON has no Infinity (open interval ends) nor NaN: they are stored as marked objects.
const NUMBER_MARK = 'firnline:number';

function replace(_key: string, value: unknown): unknown {
  if (typeof value === 'number' && !Number.isFinite(value)) return { [NUMBER_MARK]: String(value) };
  return value;
}

function revive(_key: string, value: unknown): unknown {
  if (value !== null && typeof value === 'object' && NUMBER_MARK in value) {
    const n = Number((value as Record<string, string>)[NUMBER_MARK]);
    return n;
  }
  return value;
}
