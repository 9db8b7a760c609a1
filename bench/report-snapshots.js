#!/usr/bin/env node
// Writes the JSON reports whose findings must not change when the engine is made faster: each
// demo draft in examples/, each page of docs/, each draft of the tuning sets in test/corpus (never a
// hold-out set), and the bench's topical prose (bench/corpus.js, BENCH_PROSE_KB, default 2048).
// Run it (after `npm run build`) before and after a change, into two folders, and compare them
// with `diff -r`. Usage: node bench/report-snapshots.js OUT_DIR
import { spawnSync } from 'node:child_process';
import { mkdir, readdir, writeFile } from 'node:fs/promises';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { topicalProse } from './corpus.js';

const out = process.argv[2];
if (out === undefined) {
  console.error('usage: node bench/report-snapshots.js OUT_DIR');
  process.exit(2);
}
const root = fileURLToPath(new URL('..', import.meta.url));
const BIN = join(root, 'bin', 'firnline.js');
const PROSE_BYTES = Number(process.env.BENCH_PROSE_KB ?? 2048) * 1024;
const DRAFT = /\.(md|markdown|txt|html?|docx)$/u;

async function draftsIn(dir) {
  const entries = await readdir(join(root, dir), { withFileTypes: true });
  return entries.filter((e) => e.isFile() && DRAFT.test(e.name)).map((e) => join(dir, e.name)).sort();
}

function report(name, args, cwd) {
  const run = spawnSync(process.execPath, [BIN, 'check', ...args, '--format', 'json', '--no-cache', '-o', join(out, `${name}.json`)], { cwd, encoding: 'utf8', env: { ...process.env, CI: '1', NO_COLOR: '1' } });
  if (run.status !== 0 && run.status !== 1) throw new Error(`${name}: exit ${run.status}: ${run.stderr}`);
}

await mkdir(out, { recursive: true });
const sets = (await readdir(join(root, 'test', 'corpus'), { withFileTypes: true }))
  .filter((d) => d.isDirectory() && d.name.startsWith('tuning-'))
  .map((d) => join('test', 'corpus', d.name))
  .sort();
// One report per folder (one process each: start-up is most of a small draft's time); every draft
// of the folder is in it. --jobs 1: the same thread checks them all, as on a small run.
for (const dir of ['examples', 'docs', ...sets]) report(dir.replaceAll('/', '_'), [...(await draftsIn(dir)), '--jobs', '1'], root);
const prose = join(out, 'topical-prose');
await mkdir(prose, { recursive: true });
for (let f = 0; f < 16; f += 1) await writeFile(join(prose, `part-${f}.md`), topicalProse(f + 1, PROSE_BYTES / 16));
report('topical-prose', ['topical-prose'], out);
console.log(`reports written to ${out}`);
