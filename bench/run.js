#!/usr/bin/env node
// Benchmark: two synthetic scenarios checked end to end through the built library (`npm run build`
// first: it reads dist/). (1) A docs repository of many small Markdown files, most of them off
// topic, as a real one is. (2) One long Markdown draft, mostly on topic. For each: best of N runs,
// files/s, sentences/s, peak resident memory, and (from one further run) the time per stage.
// Invented demo text only (bench/corpus.js). Settings: BENCH_FILES (2000), BENCH_LARGE_KB (500),
// BENCH_RUNS (3), BENCH_STAGES=0 to leave out the stage table. (3) The editor server's warm
// re-check: one 5,000-word draft checked again through the library API, as `firnline lsp` does
// after each pause in typing (bench/warm-recheck.js).
import { mkdtemp, mkdir, writeFile, rm } from 'node:fs/promises';
import { availableParallelism, cpus, tmpdir } from 'node:os';
import { join } from 'node:path';
import { performance } from 'node:perf_hooks';
import { checkPaths, loadPacks } from '../dist/index.js';
import { docsPage, largeDraft } from './corpus.js';
import { formatStages, timeStages } from './stages.js';
import { measureWarmRecheck } from './warm-recheck.js';

const FILES = Number(process.env.BENCH_FILES ?? 2000);
const LARGE_KB = Number(process.env.BENCH_LARGE_KB ?? 500);
const RUNS = Number(process.env.BENCH_RUNS ?? 3);
const STAGES = process.env.BENCH_STAGES !== '0';
const ON_TOPIC_SHARE = 0.1;

const packs = await loadPacks([]);
let peak = 0;

/** Best of RUNS for `paths`, then one more run with a clock per stage. */
async function measure(label, paths, cwd, files, sentences) {
  const runs = [];
  for (let r = 0; r < RUNS; r += 1) {
    const t0 = performance.now();
    const result = await checkPaths(paths, { cwd, packs });
    runs.push({ ms: performance.now() - t0, claims: result.claims.length, flags: result.flags.length });
    peak = Math.max(peak, process.memoryUsage().rss);
  }
  const best = Math.min(...runs.map((r) => r.ms));
  console.log(label);
  const perSecond = (n) => (n < 10 ? n.toFixed(2) : n.toFixed(0));
  console.log(`  best of ${RUNS}: ${best.toFixed(0)} ms  → ${perSecond(files / (best / 1000))} files/s, ${perSecond(sentences / (best / 1000))} sentences/s`);
  console.log(`  claims found: ${runs[0].claims}, flags: ${runs[0].flags}`);
  console.log(`  peak resident memory: ${(peak / 1024 / 1024).toFixed(0)} MiB`);
  if (!STAGES) return;
  const staged = await timeStages(paths, cwd, packs);
  const drift = staged.claims === runs[0].claims ? '' : ` (stage walk found ${staged.claims} claims: out of step with the engine)`;
  console.log(`  time per stage (one further run)${drift}:\n${formatStages(staged.ms)}`);
}

const root = await mkdtemp(join(tmpdir(), 'firnline-bench-'));
try {
  console.log(`machine: ${availableParallelism()} cores (${cpus()[0]?.model ?? 'unknown'}), node ${process.version}`);
  let sentences = 0;
  for (let i = 0; i < FILES; i += 1) {
    const dir = join(root, 'docs', `section-${i % 40}`);
    await mkdir(dir, { recursive: true });
    const topical = i % Math.round(1 / ON_TOPIC_SHARE) === 0;
    await writeFile(join(dir, `page-${i}.md`), docsPage(i, topical));
    sentences += 24;
  }
  await measure(`firnline bench: ${FILES} Markdown files (${ON_TOPIC_SHARE * 100}% on topic), ${sentences} sentences`, ['docs'], root, FILES, sentences);

  if (LARGE_KB > 0) {
    const text = largeDraft(LARGE_KB * 1024);
    await writeFile(join(root, 'long-draft.md'), text);
    // Sentences counted as the engine splits them, over every prose block of the draft.
    const { draftFromText } = await import('../dist/source/index.js');
    const { splitSentences } = await import('../dist/prose/index.js');
    const blocks = draftFromText('long-draft.md', text, 'markdown').blocks;
    const count = blocks.reduce((n, b, i) => n + splitSentences(b.text, i).length, 0);
    const kb = (Buffer.byteLength(text) / 1024).toFixed(0);
    await measure(`firnline bench: one ${kb} KB Markdown draft (mostly on topic), ${count} sentences`, ['long-draft.md'], root, 1, count);
  }
  await measureWarmRecheck(packs);
} finally {
  await rm(root, { recursive: true, force: true });
}
