#!/usr/bin/env node
// Thin launcher: the CLI lives in dist/cli/main.js, built by `npm run build` (run on `prepare`).
// `firnline --version` alone is answered here, as commander would answer it ("0.1.0" and a newline,
// exit 0), without loading the command line's modules: it is the cheapest call a script makes.
// Every other command runs the bundled command line (dist/bundle/cli.js, scripts/build-bundle.js:
// the same modules in a few files), unless it is missing or older than dist/cli/main.js, as after a
// build by tsc alone; then dist/ itself runs, with the same results, only slower to start.
const args = process.argv.slice(2);
if (args.length === 1 && (args[0] === '--version' || args[0] === '-V')) {
  const { VERSION } = await import('../dist/version.js');
  process.stdout.write(`${VERSION}\n`);
} else {
  const { statSync } = await import('node:fs');
  const bundle = new URL('../dist/bundle/cli.js', import.meta.url);
  const plain = new URL('../dist/cli/main.js', import.meta.url);
  let entry = plain;
  try {
    if (statSync(bundle).mtimeMs >= statSync(plain).mtimeMs) entry = bundle;
  } catch {
    // No bundle: run dist/ itself.
  }
  const { main } = await import(entry.href);
  process.exitCode = await main(args);
}
