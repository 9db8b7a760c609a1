#!/usr/bin/env node
// How many texts the NLP library (compromise) parses when Firnline checks the given paths, and
// whether it loads at all: the drafts are checked in this thread through the library API
// (checkPaths with jobs 1, no cache), as `firnline check PATHS --jobs 1 --no-cache` checks them, and
// the count is read from dist/nlp/compromise.js (docs/speed.md, "The NLP library only where a
// check uses it"). Run `npm run build` first. Usage: node bench/nlp-parses.js PATH...
import { checkPaths } from '../dist/index.js';
import { nlpUse } from '../dist/nlp/compromise.js';

const paths = process.argv.slice(2);
if (paths.length === 0) {
  console.error('usage: node bench/nlp-parses.js PATH...');
  process.exit(2);
}
const t0 = performance.now();
const result = await checkPaths(paths, { cwd: process.cwd(), jobs: 1 });
const use = nlpUse();
console.log(`${result.files.length} files, ${result.claims.length} claims, ${result.flags.length} flags in ${(performance.now() - t0).toFixed(0)} ms`);
console.log(`compromise ${use.loaded ? 'loaded' : 'not loaded'}, ${use.parses} texts parsed`);
