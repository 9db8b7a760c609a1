// `firnline check` keeps the main thread's young generation at its first size with a V8 flag set at
// run time (cli/speed-options.ts YOUNG_GROWTH_FACTOR): V8 refuses that factor on the command line
// and takes it at run time. This fails if a Node release stops honouring it, so that the peak of a
// large run (docs/speed.md, Session 19) does not rise again unnoticed.
import { spawnSync } from 'node:child_process';
import { describe, expect, it } from 'vitest';
import { CHECK_V8_FLAGS, HEAP_GROWING_PERCENT } from '../../src/cli/speed-options.js';

/** The young generation's size in MiB after a loop whose objects partly survive, in a fresh Node with `flags` set at run time. */
function youngAfterWork(flags: string, worker: 'none' | 'started' | 'set again' = 'none'): number {
  const script = `
    const v8 = require('node:v8');
    const { Worker } = require('node:worker_threads');
    v8.setFlagsFromString(${JSON.stringify(flags)});
    (async () => {
    let thread;
    if (${JSON.stringify(worker)} !== 'none') {
      thread = new Worker('setTimeout(() => {}, 60000)', { eval: true, resourceLimits: { maxYoungGenerationSizeMb: 12 } });
      await new Promise((resolve) => thread.once('online', resolve));
      if (${JSON.stringify(worker)} === 'set again') v8.setFlagsFromString(${JSON.stringify(flags)});
    }
    const kept = [];
    for (let i = 0; i < 2e6; i += 1) {
      const o = { i, pair: [i, i + 1], name: 'n' + i };
      if (i % 3 === 0) kept.push(o);
      if (kept.length > 150000) kept.length = 0;
    }
    const young = v8.getHeapSpaceStatistics().find((s) => s.space_name === 'new_space');
    process.stdout.write(String(young.space_size / 1048576));
    await thread?.terminate();
    })();`;
  const child = spawnSync(process.execPath, ['-e', script], { encoding: 'utf8' });
  expect(child.status).toBe(0);
  return Number(child.stdout);
}

// Each case starts Node once or twice; on a loaded machine that takes tens of seconds.
const SLOW = 180_000;

describe('the check command bounds the young generation at run time', () => {
  it('keeps the young generation at its first size with the flags the check sets', () => {
    expect(CHECK_V8_FLAGS).toContain('--semi-space-growth-factor=1');
    expect(youngAfterWork(CHECK_V8_FLAGS)).toBeLessThanOrEqual(4);
  }, SLOW);

  it('loses the bound when a worker starts, and keeps it when the flags are set again then (run-files.ts onWorkersStarted)', () => {
    expect(youngAfterWork(CHECK_V8_FLAGS, 'started')).toBeGreaterThan(8);
    expect(youngAfterWork(CHECK_V8_FLAGS, 'set again')).toBeLessThanOrEqual(4);
  }, SLOW);

  it('lets it grow without them, so the test above measures the flag', () => {
    expect(youngAfterWork(`--heap-growing-percent=${HEAP_GROWING_PERCENT}`)).toBeGreaterThan(8);
  }, SLOW);
});
