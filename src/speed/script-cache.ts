/**
 * A generated CommonJS file required with V8's code cache made for it by the build (docs/speed.md,
 * Start-up). The one-file command line has had one since the fifteenth round (bin/bundle-loader.js);
 * this gives the same to the files it requires that the build generates, the stored compromise
 * tagger first (dist/generated/compromise-tagger.cjs, nlp/stored-tagger.ts: 360 KB of code that a
 * fresh process compiled before its first parse).
 *
 * `requireCached(file)` compiles the file as Node's CommonJS loader would (the same wrapper
 * arguments) with the cache `<file>.code-cache` when its header matches: format
 * `firnline-code-cache/1`, the SHA-256 of the file's bytes as read now, this Node and V8 version and
 * architecture, and the SHA-256 of the payload as read now; V8 then checks its own version, flags and
 * source length and may still refuse it. Anything else compiles from the text, with the same
 * results. The cache is written only by the build (`writeScriptCaches`, in the process that makes
 * the command line's cache, after it has checked the demo drafts); a run never writes a file.
 */
import { createHash } from 'node:crypto';
import { readFileSync, renameSync, writeFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { dirname } from 'node:path';
import { Script } from 'node:vm';

/** The cache file's format, as the command line's (bin/bundle-loader.js) names it. */
export const SCRIPT_CACHE_FORMAT = 'firnline-code-cache/1';

interface Loaded {
  file: string;
  source: Buffer;
  script: Script;
  /** The cache passed every check, V8's included. */
  cacheUsed: boolean;
}

const loaded: Loaded[] = [];

/**
 * The names Node's CommonJS loader gives a module's wrapper, the last two put together so that the
 * ES module bundle, which may not name them (scripts/build-bundle.js), does not.
 */
const WRAPPER_PARAMETERS = ['exports', 'require', 'module', `__file${'name'}`, `__dir${'name'}`].join(', ');

const sha256 = (data: Buffer): string => createHash('sha256').update(data).digest('hex');

/** The header a cache of `payload` made now for the file of `source` carries. */
function headerFor(source: Buffer, payload: Buffer): Record<string, string> {
  return { format: SCRIPT_CACHE_FORMAT, source: sha256(source), node: process.version, v8: process.versions.v8, arch: process.arch, payload: sha256(payload) };
}

/** The cache file's bytes: its header as one line of JSON, then V8's payload. */
export function encodeScriptCache(source: Buffer, payload: Buffer): Buffer {
  return Buffer.concat([Buffer.from(`${JSON.stringify(headerFor(source, payload))}\n`), payload]);
}

/** V8's payload from a cache file's bytes, or undefined when anything about it does not match `source`. */
export function decodeScriptCache(bytes: Buffer | undefined, source: Buffer): Buffer | undefined {
  if (bytes === undefined) return undefined;
  const end = bytes.indexOf(10);
  if (end < 0 || end > 4096) return undefined;
  let header: unknown;
  try {
    header = JSON.parse(bytes.subarray(0, end).toString('utf8'));
  } catch {
    return undefined;
  }
  if (header === null || typeof header !== 'object') return undefined;
  const payload = bytes.subarray(end + 1);
  const expected = headerFor(source, payload);
  for (const [key, value] of Object.entries(expected)) if ((header as Record<string, unknown>)[key] !== value) return undefined;
  return payload;
}

/** The file's cache file. */
export const cacheFileOf = (file: string): string => `${file}.code-cache`;

/**
 * The exports of the CommonJS file `file`, compiled with its code cache when that matches (see
 * above). Each call runs the file again, as a fresh `require` would: callers keep what it returns.
 */
export function requireCached(file: string): unknown {
  const source = readFileSync(file);
  let bytes: Buffer | undefined;
  try {
    bytes = readFileSync(cacheFileOf(file));
  } catch {
    // No cache: compile from the text.
  }
  const cachedData = decodeScriptCache(bytes, source);
  const script = new Script(`(function (${WRAPPER_PARAMETERS}) {${source.toString('utf8')}\n})`, { filename: file, cachedData });
  const module = { exports: {} as unknown };
  const run = script.runInThisContext() as (exports: unknown, require: NodeJS.Require, module: { exports: unknown }, filename: string, dirname: string) => void;
  run(module.exports, createRequire(file), module, file, dirname(file));
  loaded.push({ file, source, script, cacheUsed: cachedData !== undefined && !script.cachedDataRejected });
  return module.exports;
}

/** Each file required so far with whether its cache was taken: read by tests, never printed by a run. */
export function scriptCacheUse(): { file: string; cacheUsed: boolean }[] {
  return loaded.map(({ file, cacheUsed }) => ({ file, cacheUsed }));
}

/**
 * Writes the code cache of every file required so far beside it, or of those of `only` (the build's
 * step, after a check of the demo drafts compiled the functions a check uses); returns the files
 * written.
 */
export function writeScriptCaches(only?: readonly string[]): string[] {
  const written: string[] = [];
  for (const { file, source, script } of loaded) {
    if (only !== undefined && !only.includes(file)) continue;
    const target = cacheFileOf(file);
    writeFileSync(`${target}.tmp`, encodeScriptCache(source, script.createCachedData()));
    renameSync(`${target}.tmp`, target);
    written.push(file);
  }
  return written;
}
