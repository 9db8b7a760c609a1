/**
 * The first characters of the unit table's matchers (first-chars.ts), read once at build time
 * instead of on every run. matchUnit needs all 73 sets before it reads its first unit, and reading
 * them from the matchers' sources (some 28,000 characters) cost 40 to 70 ms of every `check` on our
 * machine, the same answers each time. scripts/build-generated.js writes them to
 * dist/generated/unit-first-chars.json, keyed by each matcher's own source, with the SHA-256 of
 * package.json and of the reader (first-chars.js). A run reads the file when match-unit.js loads and
 * takes a set only for a source it holds, and only while the digest matches; else (a changed reader,
 * a build by `tsc` alone, a run from src/) the sets are read from the sources as before.
 * test/quantities/stored-first-chars.test.ts compares the stored sets with the reader's.
 */
import { createHash } from 'node:crypto';
import { readFileSync } from 'node:fs';

/** The `format` of the stored file; a file of another format is ignored. */
export const FIRST_CHARS_FORMAT = 'firnline-unit-first-chars/1';

/** The stored file: each matcher's source with its first characters (code points), null for any. */
export interface FirstCharsFile {
  format: typeof FIRST_CHARS_FORMAT;
  /** SHA-256 of package.json and of first-chars.js. */
  code: string;
  sets: [string, number[] | null][];
}

/** The digest of the reader beside `moduleUrl` (a module of dist/quantities/); undefined when a file is missing. */
export function firstCharsCode(moduleUrl: string | URL): string | undefined {
  try {
    return createHash('sha256')
      .update(readFileSync(new URL('../../package.json', moduleUrl)))
      .update('\0first-chars.js\0')
      .update(readFileSync(new URL('first-chars.js', moduleUrl)))
      .digest('hex');
  } catch {
    return undefined;
  }
}

/**
 * The stored sets at `file`, by source, when the reader beside `moduleUrl` made them; else an empty
 * map. A file that cannot be read or parsed, of another format or made by other code is ignored.
 */
export function readFirstChars(file: URL, moduleUrl: string | URL): Map<string, ReadonlySet<number> | undefined> {
  const sets = new Map<string, ReadonlySet<number> | undefined>();
  let stored: FirstCharsFile;
  try {
    stored = JSON.parse(readFileSync(file, 'utf8')) as FirstCharsFile;
  } catch {
    return sets;
  }
  if (stored === null || typeof stored !== 'object' || stored.format !== FIRST_CHARS_FORMAT || !Array.isArray(stored.sets)) return sets;
  const code = firstCharsCode(moduleUrl);
  if (code === undefined || code !== stored.code) return sets;
  for (const entry of stored.sets) {
    const [source, chars] = Array.isArray(entry) ? entry : [];
    const ok = typeof source === 'string' && (chars === null || (Array.isArray(chars) && chars.every((c) => Number.isInteger(c) && c >= 0 && c <= 0x10ffff)));
    if (!ok) return new Map();
    sets.set(source, chars === null ? undefined : new Set(chars));
  }
  return sets;
}

/** The file's text for the sets of `sources` (read by `read`), made by the reader whose digest is `code`. */
export function firstCharsText(sources: readonly string[], read: (source: string) => ReadonlySet<number> | undefined, code: string): string {
  const out: FirstCharsFile = {
    format: FIRST_CHARS_FORMAT,
    code,
    sets: sources.map((source) => {
      const set = read(source);
      return [source, set === undefined ? null : [...set]];
    }),
  };
  return `${JSON.stringify(out)}\n`;
}
