#!/usr/bin/env node
// Thin launcher: the CLI lives in dist/cli/main.js, built by `npm run build` (run on `prepare`).
// `firnline --version` alone is answered here, as commander would answer it ("0.1.0" and a newline,
// exit 0), without loading the command line's modules: it is the cheapest call a script makes.
const args = process.argv.slice(2);
if (args.length === 1 && (args[0] === '--version' || args[0] === '-V')) {
  const { VERSION } = await import('../dist/version.js');
  process.stdout.write(`${VERSION}\n`);
} else {
  const { main } = await import('../dist/cli/main.js');
  process.exitCode = await main(args);
}
