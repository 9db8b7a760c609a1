#!/usr/bin/env node
// Rewrites the README's example output from a real run of `firnline check examples` (built CLI),
// between the example-output markers. test/cli/readme.test.ts fails when the two drift apart.
import { execFileSync } from 'node:child_process';
import { readFileSync, writeFileSync } from 'node:fs';

const root = new URL('..', import.meta.url);
let out = '';
try {
  execFileSync(process.execPath, ['bin/firnline.js', 'check', 'examples'], { cwd: root, encoding: 'utf8', env: { ...process.env, NO_COLOR: '1' } });
} catch (error) {
  out = error.stdout; // exit status 1: the newsletter has flags, as intended
}
const blocks = out.trimEnd().split('\n\n');
const summary = blocks.pop();
const shown = blocks.filter((b) => /value\.edc-record-span|logic\.lag-rules-out-cause/u.test(b.split('\n')[0]));
const rest = blocks.filter((b) => !shown.includes(b)).map((b) => `  ${b.split('\n')[0]}`);
const text = [
  '```text',
  shown.join('\n\n'),
  '',
  `… and ${rest.length} more flags, at:`,
  ...rest,
  '',
  summary,
  '```',
].join('\n');
const readme = readFileSync(new URL('README.md', root), 'utf8');
const updated = readme.replace(/(<!-- example-output:start -->\n)[\s\S]*?(\n<!-- example-output:end -->)/u, `$1${text}$2`);
writeFileSync(new URL('README.md', root), updated);
console.log(`README example: ${shown.length} flags in full, ${rest.length} listed`);
