#!/usr/bin/env node
// Thin launcher: the CLI lives in dist/cli/main.js, built by `npm run build` (run on `prepare`).
// This file is CommonJS (bin/package.json): Node starts a CommonJS script without setting up its
// ES module loader, some 10 to 15 ms of CPU less per run on our 2-core machine, so
// `firnline --version` alone costs about what `node -e 0` costs. It is answered here, as commander
// would answer it (the version from package.json, the file dist/version.js reads, and a newline,
// exit 0), without loading the command line's modules: it is the cheapest call a script makes.
// Every other command runs the bundled command line (dist/bundle/cli.js, scripts/build-bundle.js:
// the same modules in a few files), unless it is missing or older than dist/cli/main.js, as after a
// build by tsc alone; then dist/ itself runs, with the same results, only slower to start.
const { readFileSync, statSync } = require('node:fs');
const { join } = require('node:path');
const { pathToFileURL } = require('node:url');

const args = process.argv.slice(2);
const root = join(__dirname, '..');
if (args.length === 1 && (args[0] === '--version' || args[0] === '-V')) {
  process.stdout.write(`${JSON.parse(readFileSync(join(root, 'package.json'), 'utf8')).version}\n`);
} else {
  const bundle = join(root, 'dist', 'bundle', 'cli.js');
  const plain = join(root, 'dist', 'cli', 'main.js');
  let entry = plain;
  try {
    if (statSync(bundle).mtimeMs >= statSync(plain).mtimeMs) entry = bundle;
  } catch {
    // No bundle: run dist/ itself.
  }
  // A CommonJS script has no top-level await; a failure to load is thrown as before.
  void import(pathToFileURL(entry).href).then(async ({ main }) => {
    process.exitCode = await main(args);
  });
}
