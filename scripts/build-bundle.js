#!/usr/bin/env node
// The third step of `npm run build`, after tsc and build-generated.js: bundles the command line
// (dist/cli/main.js and every module it imports, statically or by `import()`, with the packages they
// use) into a few files in dist/bundle/, so that a run reads and links about 50 modules instead of
// some 400 (docs/speed.md, Start-up). esbuild 0.28 (pinned), which needs no install script: its
// binary comes as an optional dependency package.
//
// What the bundle keeps exactly as dist/ does it:
//   - every `import.meta.url` of a module of dist/ is replaced by that module's own URL, computed
//     from the bundle's place, so each file it finds (rules/, schemas/, dist/generated/,
//     package.json, the pool's worker, dist/ for the cache's code digest) is the same file;
//   - packages loaded through createRequire (compromise, the citation processor, ajv and the
//     generated validators) are read from node_modules as before; tinypool (its workers are files
//     of its own) and the editor server's packages (they read __filename) stay external;
//   - micromark-initial-text.js is replaced by a static import of the bundled micromark's
//     initialize/text.js, so the linear-text wrapper patches the copy the bundle parses with.
// The bundle may not contain a top-level await (esbuild refuses one), nor __dirname or __filename.
//
// dist/bundle/inputs.json lists every input file with its SHA-256: test/build/bundle.test.ts fails
// when the bundle is older than dist/ or a dependency. The launcher (bin/firnline.js) runs dist/
// itself when the bundle is missing or older than dist/cli/main.js (a build by tsc alone).
import { createHash } from 'node:crypto';
import { readFile, rm, writeFile, rename } from 'node:fs/promises';
import { dirname, join, relative, sep } from 'node:path';
import { fileURLToPath } from 'node:url';
import { asciiSource } from './ascii-source.js';

const root = fileURLToPath(new URL('..', import.meta.url));
const dist = join(root, 'dist');
const out = join(dist, 'bundle');
const posix = (path) => path.split(sep).join('/');

/** Packages left to Node's loader at run time. */
export const EXTERNAL = ['tinypool', 'vscode-languageserver', 'vscode-languageserver/node', 'vscode-languageserver-textdocument'];

/** A module of dist/ as the bundle reads it (see above); `import.meta.url` left for the caller. */
async function keepPathsLoad(b, args) {
  if (args.path === join(dist, 'source', 'micromark-initial-text.js')) {
    const entry = await b.resolve('micromark', { kind: 'import-statement', resolveDir: dirname(args.path) });
    if (entry.errors.length > 0) throw new Error(`micromark: ${entry.errors[0].text}`);
    const file = posix(join(dirname(entry.path), 'lib', 'initialize', 'text.js'));
    return {
      contents: `import * as lib from ${JSON.stringify(file)};\nexport const initialTextModules = [lib];\n`,
      loader: 'js',
      resolveDir: dirname(args.path),
    };
  }
  const text = await readFile(args.path, 'utf8');
  const own = JSON.stringify(posix(relative(out, args.path)));
  return { contents: text.replaceAll('import.meta.url', `new URL(${own}, import.meta.url).href`), loader: 'js' };
}

const keepPaths = {
  name: 'firnline-paths',
  setup(b) {
    b.onLoad({ filter: /\.js$/ }, async (args) => {
      if (!args.path.startsWith(dist + sep) || args.path.startsWith(out + sep)) return undefined;
      return keepPathsLoad(b, args);
    });
  },
};

await rm(out, { recursive: true, force: true });
// esbuild's binary comes as a package for each platform; where npm found none, the command line
// runs from dist/ as it did before this step (slower to start, same results).
let esbuild;
try {
  esbuild = await import('esbuild');
  await esbuild.transform('', {});
} catch (error) {
  console.error(`build-bundle: esbuild cannot run here (${error instanceof Error ? error.message.split('\n')[0] : String(error)}); the command line will run from dist/`);
  process.exit(0);
}
const { build, transform } = esbuild;
const result = await build({
  absWorkingDir: root,
  // The second entry shares the bundle's modules (splitting): the tests read the linear-text
  // wrapper's call count through it, to see that the bundled parse goes through the wrapper.
  // The pool's worker (speed/pool-worker.js) is an entry too, so a worker starts from the bundle.
  entryPoints: { cli: join(dist, 'cli', 'main.js'), 'micromark-linear-text': join(dist, 'source', 'micromark-linear-text.js'), 'pool-worker': join(dist, 'speed', 'pool-worker.js') },
  outdir: out,
  bundle: true,
  splitting: true,
  format: 'esm',
  platform: 'node',
  target: 'node20',
  supported: { 'top-level-await': false },
  chunkNames: 'chunk-[hash]',
  external: EXTERNAL,
  // Packages written as CommonJS (commander, @xmldom/xmldom) call require() for Node's modules.
  banner: { js: "import { createRequire as __firnlineCreateRequire } from 'node:module'; const require = __firnlineCreateRequire(import.meta.url);" },
  plugins: [keepPaths],
  metafile: true,
  logLevel: 'warning',
  legalComments: 'none',
});

const inputs = {};
for (const input of Object.keys(result.metafile.inputs).sort()) {
  inputs[input] = createHash('sha256').update(await readFile(join(root, input))).digest('hex');
}
for (const output of Object.keys(result.metafile.outputs)) {
  // Read without comments (commander's mention __dirname).
  const { code } = await transform(await readFile(join(root, output), 'utf8'), { minifyWhitespace: true, format: 'esm', legalComments: 'none' });
  if (/\b__dirname\b|\b__filename\b/u.test(code)) throw new Error(`${output}: the bundle uses __dirname or __filename, which an ES module does not have`);
}
// The command line once more as one CommonJS file, dist/bundle/cli.cjs, which the launcher runs with
// V8's code cache (bin/bundle-loader.js): Node 20 takes a code cache only for a script, not for an ES
// module. Built from the same modules with the same paths; no splitting, so every `import()` of
// dist/ is bundled in. It exports the linear-text wrapper too, so the tests can see its parse go
// through it. Its one external dynamic import (tinypool) becomes the launcher's own import().
const cjsPaths = {
  name: 'firnline-paths-cjs',
  setup(b) {
    b.onLoad({ filter: /\.js$/ }, async (args) => {
      if (!args.path.startsWith(dist + sep) || args.path.startsWith(out + sep)) return undefined;
      const loaded = await keepPathsLoad(b, args);
      return { ...loaded, contents: loaded.contents.replaceAll('import.meta.url', '__firnlineUrl') };
    });
  },
};
const single = join(out, 'cli.cjs');
await build({
  absWorkingDir: root,
  stdin: {
    contents: "export { main } from './dist/cli/main.js';\nexport { linearTextResolver } from './dist/source/micromark-linear-text.js';\nexport { writeScriptCaches } from './dist/speed/script-cache.js';\n",
    resolveDir: root,
    sourcefile: 'cli-entry.js',
    loader: 'js',
  },
  outfile: single,
  // ES modules are strict code; so is the bundle made of them (esbuild adds no directive for an
  // entry read from stdin).
  // `__firnlineUrl` is the bundle's own URL, from which each module's is made (a module of dist/ may
  // name a `require` of its own, so the replacement names nothing a module could shadow).
  banner: { js: '"use strict";\nconst __firnlineUrl = require("node:url").pathToFileURL(__filename).href;' },
  bundle: true,
  format: 'cjs',
  platform: 'node',
  target: 'node20',
  external: EXTERNAL,
  plugins: [cjsPaths],
  logLevel: 'warning',
  legalComments: 'none',
});
{
  const code = await readFile(single, 'utf8');
  const imports = code.match(/\bimport\(/gu) ?? [];
  const tinypool = code.split('import("tinypool")').length - 1;
  if (!code.startsWith('"use strict";')) throw new Error('cli.cjs: expected to start with "use strict" (its modules are ES modules)');
  if (tinypool !== 1 || imports.length !== 1) throw new Error(`cli.cjs: expected one dynamic import, of tinypool; found ${imports.length}`);
  // Written in ASCII alone (scripts/ascii-source.js): V8 then keeps the text one byte a character and
  // the launcher reads it without decoding.
  const ascii = asciiSource(code.replace('import("tinypool")', '__firnlineImport("tinypool")'), 'cli.cjs');
  if (/\P{ASCII}/u.test(ascii)) throw new Error('cli.cjs: a character past ASCII is left');
  await writeFile(`${single}.tmp`, ascii);
  await rename(`${single}.tmp`, single);
}

const stamp = join(out, 'inputs.json');
await writeFile(`${stamp}.tmp`, `${JSON.stringify({ format: 'firnline-bundle/1', external: EXTERNAL, inputs }, null, 2)}\n`);
await rename(`${stamp}.tmp`, stamp);

// V8's code cache for cli.cjs (bin/bundle-loader.js), made in a child process that runs the bundled
// command line as the launcher does, with the check command's V8 flag, over the demo drafts
// (examples/, --no-cache, one thread, the report discarded), then asks V8 for the code of every
// function compiled so far. A build that cannot make it leaves none: the launcher then compiles.
{
  const { spawnSync } = await import('node:child_process');
  const cacheFile = join(out, 'cli.code-cache');
  const loader = join(root, 'bin', 'bundle-loader.js');
  const script = `
    const { writeFileSync, renameSync, readFileSync } = require('node:fs');
    const { loadBundle, encodeCache } = require(${JSON.stringify(loader)});
    const file = ${JSON.stringify(single)}, cacheFile = ${JSON.stringify(cacheFile)};
    const { exports, script } = loadBundle(file, cacheFile + '.none', true);
    exports.main(['check', 'examples', '--no-cache', '--jobs', '1', '--format', 'json']).then(() => {
      writeFileSync(cacheFile + '.tmp', encodeCache(readFileSync(file, 'utf8'), script.createCachedData()));
      renameSync(cacheFile + '.tmp', cacheFile);
      // The generated files the check required with speed/script-cache.ts (the stored tagger).
      exports.writeScriptCaches();
    });`;
  const made = spawnSync(process.execPath, ['-e', script], { cwd: root, stdio: ['ignore', 'ignore', 'pipe'], encoding: 'utf8' });
  if (made.status !== 0) console.error(`build-bundle: no code cache (${(made.stderr ?? '').split('\n')[0]}); the command line will compile at start`);
}
