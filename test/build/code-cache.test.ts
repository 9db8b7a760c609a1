// The launcher runs a `check` from the one-file bundle dist/bundle/cli.cjs with V8's code cache made
// by the build (bin/bundle-loader.js, scripts/build-bundle.js). The bundle must be the command line
// of dist/, and the cache derived data that is used only when it matches: these check that it is
// taken when intact and current, refused when damaged or made for other code, and that the findings
// are the same either way. Its time is measured by `npm run bench`, not here.
import { spawnSync } from 'node:child_process';
import { createHash } from 'node:crypto';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { afterAll, describe, expect, it } from 'vitest';
import { CHECK_V8_FLAGS } from '../../src/cli/speed-options.js';
import { type Main, run } from './run-main.js';

const root = fileURLToPath(new URL('../../', import.meta.url));
const bundleDir = join(root, 'dist', 'bundle');
const single = join(bundleDir, 'cli.cjs');
const cacheFile = join(bundleDir, 'cli.code-cache');
const loaderPath = join(root, 'bin', 'bundle-loader.js');
const loader = createRequire(import.meta.url)(loaderPath) as {
  CHECK_FLAG: string;
  FORMAT: string;
  decodeCache: (bytes: Buffer | undefined, source: string) => Buffer | undefined;
};

/** A check of one demo draft in a fresh process, as the launcher runs it, with the cache file given. */
function checkWith(cache: string): { used: boolean; code: number; stdout: string; stderr: string } {
  const script = `
    const { loadBundle } = require(${JSON.stringify(loaderPath)});
    const { exports, cacheUsed } = loadBundle(${JSON.stringify(single)}, ${JSON.stringify(cache)}, true);
    let out = '';
    exports.main(['check', 'examples/gallery-panels.md', '--format', 'json', '--no-cache'], { cwd: ${JSON.stringify(root)}, env: {}, isTTY: false, stdout: (t) => { out += t; }, stderr: (t) => process.stderr.write(t), readStdin: async () => '' })
      .then((code) => process.stdout.write(JSON.stringify({ used: cacheUsed, code, stdout: out })));`;
  const child = spawnSync(process.execPath, ['-e', script], { cwd: root, encoding: 'utf8' });
  return { ...(JSON.parse(child.stdout) as { used: boolean; code: number; stdout: string }), stderr: child.stderr };
}

const scratch = mkdtempSync(join(tmpdir(), 'firnline-code-cache-'));
afterAll(() => rmSync(scratch, { recursive: true, force: true }));

describe('the one-file bundle and its code cache', () => {
  it('prints the same reports as dist/ on the demo drafts, and parses Markdown through its linear-text wrapper', async () => {
    const bundled = createRequire(import.meta.url)(loaderPath).loadBundle(single, join(scratch, 'none'), false).exports as { main: Main; linearTextResolver: { calls: number } };
    const plain = (await import(pathToFileURL(join(root, 'dist', 'cli', 'main.js')).href)) as { main: Main };
    for (const format of ['json', 'text']) {
      const argv = ['check', 'examples', '--format', format, '--no-cache', '--jobs', '1'];
      const before = bundled.linearTextResolver.calls;
      const a = await run(bundled.main, argv);
      expect(bundled.linearTextResolver.calls).toBeGreaterThan(before);
      expect(a.code).toBe(1); // the newsletter holds errors (README)
      expect(a).toEqual(await run(plain.main, argv));
    }
  });

  it('is made with the V8 flags the check command sets', () => {
    expect(loader.CHECK_FLAG).toBe(CHECK_V8_FLAGS);
  });

  it('was made for the bundle as it is now', () => {
    const bytes = readFileSync(cacheFile);
    const header = JSON.parse(bytes.subarray(0, bytes.indexOf(10)).toString('utf8')) as Record<string, string>;
    expect(header.format).toBe(loader.FORMAT);
    expect(header.source).toBe(createHash('sha256').update(readFileSync(single, 'utf8')).digest('hex'));
    const source = readFileSync(single, 'utf8');
    expect(loader.decodeCache(bytes, source)).toBeDefined();
    // Any other field of the header refuses it: another Node or V8, architecture, flag or format.
    const payload = bytes.subarray(bytes.indexOf(10) + 1);
    for (const [key, value] of [['node', 'v0.0.0'], ['v8', '0.0'], ['arch', 'none'], ['flag', '--heap-growing-percent=20'], ['format', 'firnline-code-cache/0']]) {
      const other = Buffer.concat([Buffer.from(`${JSON.stringify({ ...header, [key as string]: value })}\n`), payload]);
      expect({ key, taken: loader.decodeCache(other, source) !== undefined }).toEqual({ key, taken: false });
    }
    expect(loader.decodeCache(bytes, `${source} `)).toBeUndefined();
  });

  it('is taken when intact, refused when damaged or made for other code, with the same findings', () => {
    const intact = checkWith(cacheFile);
    expect(intact.used).toBe(true);
    expect((JSON.parse(intact.stdout) as { claims: unknown[] }).claims.length).toBeGreaterThan(0);
    expect(intact.stderr).toBe('');
    const bytes = readFileSync(cacheFile);
    const end = bytes.indexOf(10);
    const header = JSON.parse(bytes.subarray(0, end).toString('utf8')) as Record<string, string>;
    const payload = bytes.subarray(end + 1);
    const flipped = Buffer.from(payload);
    flipped[Math.floor(flipped.length / 2)] = (flipped[Math.floor(flipped.length / 2)] as number) ^ 0xff;
    const variants: Record<string, Buffer> = {
      'a payload byte changed': Buffer.concat([bytes.subarray(0, end + 1), flipped]),
      'cut short': bytes.subarray(0, bytes.length - 1000),
      'made for another bundle': Buffer.concat([Buffer.from(`${JSON.stringify({ ...header, source: '0'.repeat(64) })}\n`), payload]),
      'no header': payload,
      empty: Buffer.alloc(0),
    };
    for (const [name, variant] of Object.entries(variants)) {
      const file = join(scratch, `${name.replaceAll(' ', '-')}.code-cache`);
      writeFileSync(file, variant);
      const result = checkWith(file);
      expect({ name, used: result.used }).toEqual({ name, used: false });
      expect({ name, ...result, used: true }).toEqual({ name, ...intact });
    }
    expect(checkWith(join(scratch, 'missing.code-cache'))).toEqual({ ...intact, used: false });
    // Seven fresh processes, each loading the packs: slow on a shared machine.
  }, 300_000);
});
