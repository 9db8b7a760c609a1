// The bundled command line (scripts/build-bundle.js, dist/bundle/) must be the command line of dist/
// in fewer files: built from the current dist/ and packages, holding every module the command line
// loads, and giving the same output. These run after `npm run build` (as `npm test` does); the
// start-up time it saves is measured by `npm run bench`, not here.
import { createHash } from 'node:crypto';
import { existsSync, readFileSync, statSync } from 'node:fs';
import { dirname, join, relative, resolve } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { describe, expect, it } from 'vitest';
import { type Main, run } from './run-main.js';

const root = fileURLToPath(new URL('../../', import.meta.url));
const dist = join(root, 'dist');
const bundle = join(dist, 'bundle');

interface Stamp {
  format: string;
  inputs: Record<string, string>;
}

const stamp = (): Stamp => JSON.parse(readFileSync(join(bundle, 'inputs.json'), 'utf8')) as Stamp;

/** The modules of dist/ that `entry` loads, following relative static and dynamic imports. */
function moduleGraph(entry: string): string[] {
  const seen = new Set<string>();
  const todo = [resolve(dist, entry)];
  while (todo.length > 0) {
    const file = todo.pop() as string;
    if (seen.has(file)) continue;
    seen.add(file);
    const text = readFileSync(file, 'utf8');
    for (const m of text.matchAll(/(?:\bfrom\s*|\bimport\s*\(\s*|\bimport\s+)['"](\.{1,2}\/[^'"]+)['"]/gu)) todo.push(resolve(dirname(file), m[1] as string));
  }
  return [...seen].map((f) => relative(root, f).split('\\').join('/')).sort();
}

describe('the bundled command line (dist/bundle/)', () => {
  it('is built from the dist/ and the packages there are now (not stale)', () => {
    expect(existsSync(join(bundle, 'cli.js')), 'run `npm run build` first').toBe(true);
    const { format, inputs } = stamp();
    expect(format).toBe('firnline-bundle/1');
    const changed = Object.entries(inputs).filter(([file, digest]) => createHash('sha256').update(readFileSync(join(root, file))).digest('hex') !== digest);
    expect(changed.map(([file]) => file)).toEqual([]);
    // The launcher runs the bundle only while it is not older than dist/cli/main.js.
    expect(statSync(join(bundle, 'cli.js')).mtimeMs).toBeGreaterThanOrEqual(statSync(join(dist, 'cli', 'main.js')).mtimeMs);
  });

  it('holds every module of dist/ that the command line imports', () => {
    const inputs = new Set(Object.keys(stamp().inputs));
    const missing = moduleGraph('cli/main.js').filter((file) => !inputs.has(file));
    expect(missing).toEqual([]);
    // and the packages the Markdown reader is made of, bundled rather than loaded from node_modules
    expect([...inputs].some((file) => /node_modules\/micromark\/lib\/initialize\/text\.js$/u.test(file))).toBe(true);
  });

  it('prints the same reports as dist/ on the demo drafts, and parses Markdown through the linear-text wrapper', async () => {
    const bundled = (await import(pathToFileURL(join(bundle, 'cli.js')).href)) as { main: Main };
    const plain = (await import(pathToFileURL(join(dist, 'cli', 'main.js')).href)) as { main: Main };
    const wrapper = (await import(pathToFileURL(join(bundle, 'micromark-linear-text.js')).href)) as { linearTextResolver: { calls: number } };
    let wrapped = 0;
    for (const format of ['json', 'text', 'sarif']) {
      const argv = ['check', 'examples', '--format', format, '--no-cache', '--jobs', '1'];
      // Counted over the bundled run alone: dist/'s own wrapper counts on a copy of its own.
      const before = wrapper.linearTextResolver.calls;
      const a = await run(bundled.main, argv);
      wrapped += wrapper.linearTextResolver.calls - before;
      const b = await run(plain.main, argv);
      expect(a.code).toBe(1); // the newsletter holds errors (README)
      expect(a).toEqual(b);
    }
    expect(wrapped).toBeGreaterThan(0);
  });

  it('holds the pool worker, which checks a draft as the worker of dist/ does', async () => {
    // The pool starts its workers from dist/bundle/pool-worker.js while it is not older than dist/'s.
    expect(statSync(join(bundle, 'pool-worker.js')).mtimeMs).toBeGreaterThanOrEqual(statSync(join(dist, 'speed', 'pool-worker.js')).mtimeMs);
    expect(moduleGraph('speed/pool-worker.js').filter((file) => !(file in stamp().inputs))).toEqual([]);
    type Worker = { default: (task: Record<string, unknown>) => Promise<unknown> };
    const bundled = (await import(pathToFileURL(join(bundle, 'pool-worker.js')).href)) as Worker;
    const plain = (await import(pathToFileURL(join(dist, 'speed', 'pool-worker.js')).href)) as Worker;
    const path = 'examples/gallery-panels.md';
    const task = { path, projectPath: path, format: 'markdown', text: readFileSync(join(root, path), 'utf8'), levels: {}, packFiles: [], builtin: true };
    const a = await bundled.default(task);
    expect((a as { claims: unknown[] }).claims.length).toBeGreaterThan(0);
    expect(JSON.stringify(a)).toBe(JSON.stringify(await plain.default(task)));
  });

  it('reports a user error the same way (one line, exit 2)', async () => {
    const bundled = (await import(pathToFileURL(join(bundle, 'cli.js')).href)) as { main: Main };
    const result = await run(bundled.main, ['check', 'no-such-draft.md']);
    expect(result.code).toBe(2);
    expect(result.stderr.trim().split('\n')).toHaveLength(1);
  });
});
