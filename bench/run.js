#!/usr/bin/env node
// Benchmark: a synthetic docs repository (most files off-topic, as in a real one) checked end to end
// through the built library. Prints files/s, sentences/s and peak memory; the README quotes these.
// Invented demo text only. Run with `npm run bench` (builds first through `prepare` on install).
import { mkdtemp, mkdir, writeFile, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { performance } from 'node:perf_hooks';
import { checkPaths, loadPacks } from '../dist/index.js';

const FILES = Number(process.env.BENCH_FILES ?? 2000);
const ON_TOPIC_SHARE = 0.1;

const offTopic = [
  'The volunteer rota for the spring fair is pinned in the staff kitchen.',
  'Please return the gallery keys to the front desk before six.',
  'Our new accessibility guide explains the lift and the quiet room.',
  'The café will close early on Thursday for a private event.',
];
const onTopic = [
  'The Vostok core holds a climate record of about 420,000 years.',
  'EPICA Dome C reaches back roughly 800,000 years.',
  'At the Last Glacial Maximum, CO2 stood near 190 ppm.',
  'Ice cores show that CO2 rose about 800 years after the warming, so CO2 cannot have caused it.',
  'Global mean temperature was about 6 °C lower at the peak of the last ice age.',
  'Before the industrial era, CO2 was about 280 ppm.',
];

function page(i, topical) {
  const lines = [`# Page ${i}`, ''];
  for (let p = 0; p < 12; p += 1) {
    const pool = topical && p % 3 === 0 ? onTopic : offTopic;
    lines.push(`${pool[(i + p) % pool.length]} ${pool[(i + p + 1) % pool.length]}`, '');
  }
  return lines.join('\n');
}

const root = await mkdtemp(join(tmpdir(), 'firnline-bench-'));
try {
  let sentences = 0;
  for (let i = 0; i < FILES; i += 1) {
    const dir = join(root, 'docs', `section-${i % 40}`);
    await mkdir(dir, { recursive: true });
    const topical = i % Math.round(1 / ON_TOPIC_SHARE) === 0;
    await writeFile(join(dir, `page-${i}.md`), page(i, topical));
    sentences += 24;
  }
  const packs = await loadPacks([]);
  const runs = [];
  let peak = 0;
  for (let r = 0; r < 3; r += 1) {
    const t0 = performance.now();
    const result = await checkPaths(['docs'], { cwd: root, packs });
    runs.push({ ms: performance.now() - t0, claims: result.claims.length, flags: result.flags.length });
    peak = Math.max(peak, process.memoryUsage().rss);
  }
  const best = Math.min(...runs.map((r) => r.ms));
  console.log(`firnline bench: ${FILES} Markdown files (${ON_TOPIC_SHARE * 100}% on topic), ${sentences} sentences`);
  console.log(`  best of 3: ${best.toFixed(0)} ms  → ${(FILES / (best / 1000)).toFixed(0)} files/s, ${(sentences / (best / 1000)).toFixed(0)} sentences/s`);
  console.log(`  claims found: ${runs[0].claims}, flags: ${runs[0].flags}`);
  console.log(`  peak resident memory: ${(peak / 1024 / 1024).toFixed(0)} MiB`);
} finally {
  await rm(root, { recursive: true, force: true });
}
