// One `firnline` command run as the launcher runs it (bin/firnline.js: the bundled command line,
// dist/bundle/cli.js, unless it is missing or older than dist/cli/main.js), reporting its peak
// resident memory (all threads: the pool's workers live in this process) on the last line of stderr.
import { statSync } from 'node:fs';
import { fileURLToPath } from 'node:url';

const bundle = new URL('../dist/bundle/cli.js', import.meta.url);
const plain = new URL('../dist/cli/main.js', import.meta.url);
let entry = plain;
try {
  if (statSync(fileURLToPath(bundle)).mtimeMs >= statSync(fileURLToPath(plain)).mtimeMs) entry = bundle;
} catch {
  // No bundle: run dist/ itself, as the launcher does.
}
const { main } = await import(entry.href);
process.exitCode = await main(process.argv.slice(2));
process.stderr.write(`\nBENCH-MAXRSS-KB ${process.resourceUsage().maxRSS}\n`);
