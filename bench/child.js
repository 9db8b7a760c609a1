// One `firnline` command run as the launcher runs it (bin/firnline.js: the one-file bundle
// dist/bundle/cli.cjs with V8's code cache for a check, bin/bundle-loader.js; else the bundled
// command line dist/bundle/cli.js; each only while it is not older than dist/cli/main.js; else
// dist/ itself), reporting its peak resident memory (all threads: the pool's workers live in this
// process) on the last line of stderr.
import { statSync } from 'node:fs';
import { createRequire } from 'node:module';
import { fileURLToPath } from 'node:url';

const here = (name) => fileURLToPath(new URL(name, import.meta.url));
const single = here('../dist/bundle/cli.cjs');
const bundle = here('../dist/bundle/cli.js');
const plain = here('../dist/cli/main.js');
const args = process.argv.slice(2);
const ok = (file) => {
  try {
    return statSync(file).mtimeMs >= statSync(plain).mtimeMs;
  } catch {
    return false;
  }
};
let main;
if (ok(single)) {
  const { loadBundle } = createRequire(import.meta.url)('../bin/bundle-loader.js');
  main = loadBundle(single, here('../dist/bundle/cli.code-cache'), args[0] === 'check').exports.main;
} else {
  // No one-file bundle: the bundled ES modules, else dist/ itself, as the launcher does.
  ({ main } = await import(new URL(ok(bundle) ? '../dist/bundle/cli.js' : '../dist/cli/main.js', import.meta.url).href));
}
process.exitCode = await main(args);
process.stderr.write(`\nBENCH-MAXRSS-KB ${process.resourceUsage().maxRSS}\n`);
