// A generated CommonJS file (the stored compromise tagger) is required with the V8 code cache the build
// made for it (src/speed/script-cache.ts, docs/speed.md, Start-up). The cache is derived data: it is
// taken only when its header names this format, the file's bytes, this Node, V8 and architecture and
// its own payload, and what the file gives is the same with it or without it. Its time is measured
// by `npm run bench` and docs/speed.md, not here.
import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, describe, expect, it } from 'vitest';
import { CHECK_V8_FLAGS } from '../../src/cli/speed-options.js';
import { cacheFileOf, decodeScriptCache, encodeScriptCache, requireCached, scriptCacheUse, writeScriptCaches } from '../../src/speed/script-cache.js';

const root = fileURLToPath(new URL('../../', import.meta.url));
const tagger = join(root, 'dist', 'generated', 'compromise-tagger.cjs');
const scratch = mkdtempSync(join(tmpdir(), 'firnline-script-cache-'));
afterAll(() => rmSync(scratch, { recursive: true, force: true }));

/** A small module of our own: a function with a loop, so V8 has code to cache, and a use of require. */
const MODULE = `const { join } = require('node:path');
function count(text) { let n = 0; for (const ch of text) if (ch === 'e') n += 1; return n; }
module.exports = { count, here: join(__dirname, 'x'), name: __filename };`;

/** The module at a new path, required once (no cache yet) and its cache written. */
function freshModule(name: string): string {
  const file = join(scratch, name);
  writeFileSync(file, MODULE);
  (requireCached(file) as { count: (t: string) => number }).count('the winter ended');
  writeScriptCaches([file]);
  return file;
}

/** Whether the last requireCached took its cache, and what the module computes. */
function requireAgain(file: string): { used: boolean; count: number; here: string; name: string } {
  const loaded = requireCached(file) as { count: (t: string) => number; here: string; name: string };
  const last = scriptCacheUse().at(-1);
  return { used: last?.cacheUsed === true, count: loaded.count('three degrees colder'), here: loaded.here, name: loaded.name };
}

describe('a generated file required with its code cache', () => {
  it('takes an intact cache and computes what the text computes, with CommonJS names in place', () => {
    const file = freshModule('intact.cjs');
    const again = requireAgain(file);
    expect(again).toEqual({ used: true, count: 6, here: join(scratch, 'x'), name: file });
  });

  it('refuses a damaged, foreign or cut-short cache and compiles from the text with the same results', () => {
    const file = freshModule('damaged.cjs');
    const good = readFileSync(cacheFileOf(file));
    const end = good.indexOf(10);
    const flipped = Buffer.from(good);
    flipped.writeUInt8(flipped.readUInt8(flipped.length - 100) ^ 0xff, flipped.length - 100);
    const header = JSON.parse(good.subarray(0, end).toString('utf8')) as Record<string, string>;
    const withHeader = (changes: Record<string, string>): Buffer => Buffer.concat([Buffer.from(`${JSON.stringify({ ...header, ...changes })}\n`), good.subarray(end + 1)]);
    const variants: [string, Buffer][] = [
      ['a payload byte changed', flipped],
      ['cut short', good.subarray(0, good.length - 500)],
      ['made for other text', withHeader({ source: '0'.repeat(64) })],
      ['another Node', withHeader({ node: 'v0.0.0' })],
      ['another V8', withHeader({ v8: '0.0' })],
      ['another architecture', withHeader({ arch: 'none' })],
      ['another format', withHeader({ format: 'firnline-code-cache/0' })],
      ['no header', good.subarray(end + 1)],
      ['empty', Buffer.alloc(0)],
    ];
    for (const [what, bytes] of variants) {
      writeFileSync(cacheFileOf(file), bytes);
      expect({ what, ...requireAgain(file) }).toEqual({ what, used: false, count: 6, here: join(scratch, 'x'), name: file });
    }
    writeFileSync(cacheFileOf(file), good);
    expect(requireAgain(file).used).toBe(true);
  });

  it('reads a cache back only for the bytes it was made for', () => {
    const source = Buffer.from('module.exports = 1;');
    const payload = Buffer.from([1, 2, 3, 4]);
    const bytes = encodeScriptCache(source, payload);
    expect(decodeScriptCache(bytes, source)).toEqual(payload);
    expect(decodeScriptCache(bytes, Buffer.from('module.exports = 2;'))).toBeUndefined();
    expect(decodeScriptCache(undefined, source)).toBeUndefined();
  });

  it('has a current cache for the built tagger, which a check takes, reading sentences as without it', () => {
    expect(decodeScriptCache(readFileSync(cacheFileOf(tagger)), readFileSync(tagger))).toBeDefined();
    const script = (flags: string): string => `
      (await import('node:v8')).setFlagsFromString(${JSON.stringify(flags)});
      const { compromiseTagger } = await import(${JSON.stringify(join(root, 'dist', 'nlp', 'compromise.js'))});
      const { tagTerms } = await import(${JSON.stringify(join(root, 'dist', 'nlp', 'stored-tagger.js'))});
      const { scriptCacheUse } = await import(${JSON.stringify(join(root, 'dist', 'speed', 'script-cache.js'))});
      const terms = tagTerms(compromiseTagger(), 'Ice cores drilled in Antarctica show the gas lagging the warming by centuries.');
      process.stdout.write(JSON.stringify({ use: scriptCacheUse().map((u) => u.cacheUsed), terms }));`;
    const run = (flags: string): { use: boolean[]; terms: unknown } => {
      const child = spawnSync(process.execPath, ['--input-type=module', '-e', script(flags)], { cwd: root, encoding: 'utf8' });
      return JSON.parse(child.stdout) as { use: boolean[]; terms: unknown };
    };
    // The cache is made with the check command's V8 flags, which V8 hashes into it; they are set at
    // run time, as the command sets them (V8 would raise the young generation's factor given on the
    // command line to 2).
    const withCache = run(CHECK_V8_FLAGS);
    const without = run('--heap-growing-percent=20');
    expect(withCache.use).toEqual([true]);
    expect(without.use).toEqual([false]);
    expect(withCache.terms).toEqual(without.terms);
  });
});
