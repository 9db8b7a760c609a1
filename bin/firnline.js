#!/usr/bin/env node
// Thin launcher: the CLI lives in dist/cli/main.js, built by `npm run build` (run on `prepare`).
// This file is CommonJS (bin/package.json): Node starts a CommonJS script without setting up its
// ES module loader, some 10 to 15 ms of CPU less per run on our 2-core machine, so
// `firnline --version` alone costs about what `node -e 0` costs. It is answered here, as commander
// would answer it (the version from package.json, the file dist/version.js reads, and a newline,
// exit 0), without loading the command line's modules: it is the cheapest call a script makes.
// Every other command runs the bundled command line: dist/bundle/cli.cjs (scripts/build-bundle.js: the
// same modules in one CommonJS file, which a `check` compiles with V8's code cache made by the
// build, bin/bundle-loader.js), else dist/bundle/cli.js (the same as ES modules in a few files),
// each only while it is not older than dist/cli/main.js, as after a build by tsc alone; then dist/
// itself runs, with the same results, only slower to start.
const { readFileSync, statSync } = require('node:fs');
const { join } = require('node:path');
const { pathToFileURL } = require('node:url');

const args = process.argv.slice(2);
const root = join(__dirname, '..');
if (args.length === 1 && (args[0] === '--version' || args[0] === '-V')) {
  process.stdout.write(`${JSON.parse(readFileSync(join(root, 'package.json'), 'utf8')).version}\n`);
} else {
  const single = join(root, 'dist', 'bundle', 'cli.cjs');
  const bundle = join(root, 'dist', 'bundle', 'cli.js');
  const plain = join(root, 'dist', 'cli', 'main.js');
  let entry = plain;
  // A bundle runs only while it is not older than dist/cli/main.js (without dist/, the import
  // below says so).
  const ok = (file) => {
    try {
      return statSync(file).mtimeMs >= statSync(plain).mtimeMs;
    } catch {
      return false;
    }
  };
  let main;
  if (ok(single)) {
    // The one-file bundle, with V8's code cache for a check (bin/bundle-loader.js).
    main = require('./bundle-loader.js').loadBundle(single, join(root, 'dist', 'bundle', 'cli.code-cache'), args[0] === 'check').exports.main;
  } else if (ok(bundle)) {
    entry = bundle;
  }
  // A CommonJS script has no top-level await; a failure to load is thrown as before.
  void (main !== undefined ? Promise.resolve({ main }) : import(pathToFileURL(entry).href)).then(async ({ main: run }) => {
    process.exitCode = await run(args);
  });
}
