// `firnline check` bounds its heap's growth only once a run is large (speed/run-files.ts
// LARGE_RUN_BYTES, cli/speed-options.ts boundHeapGrowth): a check of a draft or a few runs without
// the bound, which only cost it full collections (docs/speed.md, Session 20). These cases fail if a
// small run is bounded again, if a large run is not bounded before this thread checks its files, if
// off-topic text counts toward a large run, or if Node stops honouring the flag set at run time.
import { spawnSync } from 'node:child_process';
import { mkdirSync, mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { CHECK_V8_FLAGS, LARGE_RUN_V8_FLAGS, boundHeapGrowth, boundYoungGeneration, speedOptionsOf } from '../../src/cli/speed-options.js';
import { checkPaths } from '../../src/engine.js';
import { loadPacks } from '../../src/rulepack/index.js';
import { ResultCache, type FileOutcome } from '../../src/speed/cache.js';
import { LARGE_RUN_BYTES } from '../../src/speed/run-files.js';
import { VERSION } from '../../src/version.js';

const packs = await loadPacks([]);

// On-topic prose of our own (figures from memory, only there to be read): about 600 characters.
const ON_TOPIC = [
  'The ice core from the high plateau holds air bubbles trapped over many glacial cycles.',
  'During the coldest glacial phases the carbon dioxide in that trapped air stood near 190 ppm.',
  'In the warm interglacial phases it rose to about 280 ppm, and the ice sheets shrank.',
  'Antarctic temperature and carbon dioxide rose and fell together across those cycles.',
  'Today the air holds more than 420 ppm of carbon dioxide, far above any interglacial level.',
].join(' ');
const OFF_TOPIC = 'The team met on Tuesday to plan the spring release of the garden guide and its photographs. ';

/** A result cache that counts the outcomes it gives and lets a test wait for its writes. */
class CountingCache extends ResultCache {
  hits = 0;
  private readonly writes: Promise<void>[] = [];
  override get(key: string): FileOutcome | undefined {
    const found = super.get(key);
    if (found !== undefined) this.hits += 1;
    return found;
  }
  override set(key: string, outcome: FileOutcome): Promise<void> {
    const write = super.set(key, outcome);
    this.writes.push(write);
    return write;
  }
  async written(): Promise<void> {
    await Promise.all(this.writes);
  }
}

/** A folder of `files` drafts of `each` characters made from `paragraph` (or `root`'s, made before), and the run's hook calls. */
async function runOver(files: number, each: number, paragraph: string, reuse?: { root?: string; cache: CountingCache }): Promise<{ large: number; doneAtLarge: number[]; root: string }> {
  const root = reuse?.root ?? mkdtempSync(join(tmpdir(), 'firnline-large-run-'));
  if (reuse?.root === undefined) {
    mkdirSync(join(root, 'drafts'));
    const text = `# Notes\n\n${`${paragraph}\n\n`.repeat(Math.ceil(each / (paragraph.length + 2)))}`.slice(0, each);
    for (let f = 0; f < files; f += 1) writeFileSync(join(root, 'drafts', `part-${f}.md`), text);
  }
  let done = 0;
  const doneAtLarge: number[] = [];
  await checkPaths(['drafts'], {
    cwd: root, packs, jobs: 1,
    ...(reuse === undefined ? {} : { cache: reuse.cache }),
    onProgress: (n) => {
      done = n;
    },
    onLargeRun: () => {
      doneAtLarge.push(done);
    },
  });
  return { large: doneAtLarge.length, doneAtLarge, root };
}

/** Full collections in a fresh Node that sets `flags` at run time and then keeps a growing heap. */
function fullCollections(flags: string[]): number {
  const script = `
    const v8 = require('node:v8');
    const { PerformanceObserver, constants } = require('node:perf_hooks');
    for (const f of ${JSON.stringify(flags)}) v8.setFlagsFromString(f);
    let majors = 0;
    const seen = new PerformanceObserver((list) => {
      for (const e of list.getEntries()) if (e.detail.kind === constants.NODE_PERFORMANCE_GC_MAJOR) majors += 1;
    });
    seen.observe({ entryTypes: ['gc'] });
    const kept = [];
    for (let i = 0; i < 1.5e6; i += 1) kept.push({ i, name: 'n' + i });
    setTimeout(() => { seen.disconnect(); process.stdout.write(String(majors) + ' ' + kept.length); }, 300);`;
  const child = spawnSync(process.execPath, ['-e', script], { encoding: 'utf8' });
  expect(child.status).toBe(0);
  return Number(child.stdout.split(' ')[0]);
}

// Each case checks up to some 80 KB of on-topic text or starts Node twice; slow on a loaded machine.
const SLOW = 300_000;

describe('a run bounds its heap growth only once it is large', () => {
  it('leaves a run of one small draft unbounded', async () => {
    const run = await runOver(1, 2_000, ON_TOPIC);
    expect(run.large).toBe(0);
  }, SLOW);

  it('bounds a run once its on-topic text reaches LARGE_RUN_BYTES, once, before this thread checks a file', async () => {
    const each = Math.ceil(LARGE_RUN_BYTES / 3) + 1_000;
    const run = await runOver(4, each, ON_TOPIC);
    expect(run.large).toBe(1);
    expect(run.doneAtLarge).toEqual([0]);
  }, SLOW);

  it('counts on-topic text whose outcome comes from the result cache, since the run holds it as well', async () => {
    const each = Math.ceil(LARGE_RUN_BYTES / 3) + 1_000;
    const cache = new CountingCache(mkdtempSync(join(tmpdir(), 'firnline-large-run-cache-')), VERSION);
    const first = await runOver(4, each, ON_TOPIC, { cache });
    await cache.written();
    expect(cache.hits).toBe(0);
    const warm = await runOver(4, each, ON_TOPIC, { root: first.root, cache });
    expect(cache.hits).toBe(4);
    expect(warm.large).toBe(1);
  }, SLOW);

  it('does not count text that is passed over (no subject of the packs)', async () => {
    const run = await runOver(3, LARGE_RUN_BYTES, OFF_TOPIC);
    expect(run.large).toBe(0);
  }, SLOW);

  it('is wired by the command line: the young generation from the start, the heap growth for a large run', async () => {
    const speed = await speedOptionsOf({}, tmpdir(), { env: {}, stderr: () => undefined, stderrIsTTY: false });
    expect(speed.options.onLargeRun).toBe(boundHeapGrowth);
    expect(speed.options.onWorkersStarted).toBe(boundYoungGeneration);
    expect(CHECK_V8_FLAGS).not.toContain('heap-growing-percent');
    expect(LARGE_RUN_V8_FLAGS).toContain('--heap-growing-percent=');
  });

  it('collects more often once the large run\'s flag is set at run time, so the bound is real', () => {
    const small = fullCollections([CHECK_V8_FLAGS]);
    const large = fullCollections([CHECK_V8_FLAGS, LARGE_RUN_V8_FLAGS]);
    expect(large).toBeGreaterThan(small);
  }, SLOW);
});
