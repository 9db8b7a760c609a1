#!/usr/bin/env node
// `npm run bench` (after `npm run build`: it runs dist/). Generates two corpora deterministically
// (bench/corpus.js) and measures Firnline beside two references in the same run:
//   1. a sparse docs repository, 2,000 Markdown files of ~25 KB (~50 MB), 1% on topic, against the
//      scan limit: a Node process that reads every file and runs one compiled topic regex over it;
//      then the same at 2x and 4x the corpus, to show that time grows linearly;
//   2. 2 MB of prose in which every paragraph is on topic, against the naive design: the NLP
//      library (compromise) on every sentence, reading its numbers;
// and the start-up figures: `firnline --version`, `firnline check` of a 2 KB draft, and (from
// bench/warm-recheck.js, the editor server's bench) a warm re-check of a 5,000-word draft.
// Settings: BENCH_FILES (2000), BENCH_PAGE_KB (25), BENCH_PROSE_KB (2048), BENCH_RUNS (3),
// BENCH_SCALE=0 to leave out the 2x and 4x runs.
import { spawnSync } from 'node:child_process';
import { mkdtemp, mkdir, writeFile, rm, readFile } from 'node:fs/promises';
import { availableParallelism, cpus, loadavg, tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { performance } from 'node:perf_hooks';
import nlp from 'compromise';
import { loadPacks } from '../dist/index.js';
import { topicPattern } from '../dist/prose/topic-matcher.js';
import { subjectWordsOf } from '../dist/propositions/index.js';
import { docsPage, topicalProse } from './corpus.js';
import { measureWarmRecheck } from './warm-recheck.js';

const FILES = Number(process.env.BENCH_FILES ?? 2000);
const PAGE_BYTES = Number(process.env.BENCH_PAGE_KB ?? 25) * 1000;
const PROSE_BYTES = Number(process.env.BENCH_PROSE_KB ?? 2048) * 1024;
const RUNS = Number(process.env.BENCH_RUNS ?? 3);
const SCALE = process.env.BENCH_SCALE !== '0';
const ON_TOPIC_EVERY = 100; // 1% of files
const PROSE_FILES = 16;

const here = (name) => fileURLToPath(new URL(name, import.meta.url));
const BIN = here('../bin/firnline.js');
const CHILD = here('./child.js');
const SCAN = here('./scan-limit.js');
const mb = (bytes) => (bytes / 1e6).toFixed(1);
const ms = (n) => `${n.toFixed(0)} ms`;
const median = (xs) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];

/** Runs node with `args` in `cwd`; wall time from spawn to exit, stdout, and the child's peak memory if it reports it. */
function timed(args, cwd) {
  const t0 = performance.now();
  const run = spawnSync(process.execPath, args, { cwd, encoding: 'utf8', maxBuffer: 1 << 30, env: { ...process.env, CI: '1', NO_COLOR: '1' } });
  const wall = performance.now() - t0;
  if (run.status !== 0 && run.status !== 1) throw new Error(`${args.join(' ')} exited ${run.status}: ${run.stderr}`);
  const rss = /BENCH-MAXRSS-KB (\d+)/u.exec(run.stderr ?? '');
  return { ms: wall, stdout: run.stdout, rssMiB: rss === null ? undefined : Number(rss[1]) / 1024 };
}

/** Firnline's `check` over `paths` (JSON to a file, no cache): best of `runs`, with flags found and peak memory. */
async function firnline(paths, cwd, runs) {
  const out = join(cwd, 'report.json');
  const all = [];
  for (let r = 0; r < runs; r += 1) all.push(timed([CHILD, 'check', ...paths, '--format', 'json', '--no-cache', '-o', out], cwd));
  const report = JSON.parse(await readFile(out, 'utf8'));
  return { ms: Math.min(...all.map((r) => r.ms)), rssMiB: Math.max(...all.map((r) => r.rssMiB ?? 0)), claims: report.claims.length, flags: report.flags.length };
}

const packs = await loadPacks([]);
// The engine's own subject matcher (engine.passOver): the lexicon's subject names.
const subject = topicPattern(subjectWordsOf(packs.lexicon), 'iu');
const root = await mkdtemp(join(tmpdir(), 'firnline-bench-'));
const started = performance.now();
try {
  console.log(`machine: ${availableParallelism()} cores (${cpus()[0]?.model ?? 'unknown'}), node ${process.version}, load average ${loadavg()[0].toFixed(1)}`);

  // 1. The sparse docs repository, in four parts of FILES files (1x = part 1, 2x = parts 1-2, 4x = all).
  const parts = SCALE ? 4 : 1;
  let bytes = 0;
  for (let part = 1; part <= parts; part += 1) {
    for (let i = 0; i < FILES; i += 1) {
      const n = (part - 1) * FILES + i;
      const dir = join(root, `docs-${part}`, `section-${i % 40}`);
      await mkdir(dir, { recursive: true });
      const page = docsPage(n, PAGE_BYTES, n % ON_TOPIC_EVERY === 0);
      await writeFile(join(dir, `page-${i}.md`), page);
      if (part === 1) bytes += Buffer.byteLength(page);
    }
  }
  const scanRuns = [];
  for (let r = 0; r < RUNS; r += 1) scanRuns.push(timed([SCAN, subject.source, subject.flags, 'docs-1'], root));
  const scan = Math.min(...scanRuns.map((r) => r.ms));
  const sparse = await firnline(['docs-1'], root, RUNS);
  console.log(`\nsparse docs repository: ${FILES} Markdown files, ${mb(bytes)} MB, ${FILES / ON_TOPIC_EVERY} on topic (best of ${RUNS}, each a fresh process)`);
  console.log(`  scan limit (read every file, one compiled topic regex, in Node): ${ms(scan)}, ${scanRuns[0].stdout.trim()} files match`);
  console.log(`  firnline check: ${ms(sparse.ms)}, ${sparse.claims} claims, ${sparse.flags} flags, peak ${sparse.rssMiB.toFixed(0)} MiB`);
  console.log(`  firnline at ${(scan / sparse.ms).toFixed(2)} of the scan limit (target: at least 0.25)`);

  if (SCALE) {
    const one = sparse.ms;
    const two = await firnline(['docs-1', 'docs-2'], root, 1);
    const four = await firnline(['docs-1', 'docs-2', 'docs-3', 'docs-4'], root, 1);
    console.log(`  growth: 1x ${ms(one)}, 2x ${ms(two.ms)} (${(two.ms / one).toFixed(2)}x), 4x ${ms(four.ms)} (${(four.ms / one).toFixed(2)}x); peak at 4x ${four.rssMiB.toFixed(0)} MiB`);
  }

  // 2. Topical prose: every paragraph on topic, in PROSE_FILES files.
  const proseTexts = [];
  for (let f = 0; f < PROSE_FILES; f += 1) proseTexts.push(topicalProse(f + 1, PROSE_BYTES / PROSE_FILES));
  await mkdir(join(root, 'prose'));
  await Promise.all(proseTexts.map((t, f) => writeFile(join(root, 'prose', `part-${f}.md`), t)));
  const proseBytes = proseTexts.reduce((n, t) => n + Buffer.byteLength(t), 0);
  const topical = await firnline(['prose'], root, 1);
  const t0 = performance.now();
  let sentences = 0;
  let numbers = 0;
  for (const text of proseTexts) {
    for (const paragraph of text.split(/\n\s*\n/u)) {
      for (const sentence of paragraph.match(/[^.!?]+(?:[.!?]+|$)/gu) ?? []) {
        numbers += nlp(sentence).numbers().get().length;
        sentences += 1;
      }
    }
  }
  const naive = performance.now() - t0;
  console.log(`\ntopical prose: ${mb(proseBytes)} MB in ${PROSE_FILES} files, every paragraph on topic`);
  console.log(`  naive design (compromise on each of ${sentences} sentences, reading its ${numbers} numbers): ${ms(naive)}`);
  console.log(`  firnline check: ${ms(topical.ms)}, ${topical.claims} claims, ${topical.flags} flags, peak ${topical.rssMiB.toFixed(0)} MiB`);
  console.log(`  firnline is ${(naive / topical.ms).toFixed(2)}x the naive design's speed (target: at least 10x; peak under 250 MiB)`);

  // 3. Start-up and the editor case.
  const version = median(Array.from({ length: 7 }, () => timed([BIN, '--version'], root).ms));
  const bare = median(Array.from({ length: 7 }, () => timed(['-e', '0'], root).ms));
  const draft = topicalProse(99, 2048);
  await writeFile(join(root, 'draft.md'), draft);
  const small = median(Array.from({ length: 3 }, () => timed([BIN, 'check', 'draft.md', '--no-cache'], root).ms));
  console.log('\nstart-up and the editor case');
  console.log(`  firnline --version: ${ms(version)} (median of 7; node -e 0 takes ${ms(bare)} here) (target: under 150 ms)`);
  console.log(`  firnline check of a ${(Buffer.byteLength(draft) / 1024).toFixed(1)} KB draft: ${ms(small)} (median of 3) (target: under 500 ms)`);
  console.log('');
  // The editor case is the LSP server's bench (bench/warm-recheck.js): target under 150 ms.
  await measureWarmRecheck(packs);
  console.log(`\nbench total: ${((performance.now() - started) / 1000).toFixed(0)} s`);
} finally {
  await rm(root, { recursive: true, force: true });
}
