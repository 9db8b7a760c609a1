/**
 * The generative bad-input run (fuzz-cases.ts). `npm test` runs FUZZ_RUNS_DEFAULT cases;
 * `npm run fuzz` sets FIRNLINE_FUZZ_RUNS=100000. It prints the count with crashes and hangs,
 * and fails on any of either.
 */
import fc from 'fast-check';
import { mkdtemp } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { loadPacks } from '../../src/rulepack/index.js';
import { fuzzCase, HANG_MS, runCase, type FuzzCase } from './fuzz-cases.js';

const FUZZ_RUNS_DEFAULT = 300;
const runs = Number(process.env['FIRNLINE_FUZZ_RUNS'] ?? FUZZ_RUNS_DEFAULT);

describe('generative bad input', () => {
  it(`${runs} cases over drafts, bytes, nesting, packs, settings, ledgers and checklists: no crash, no hang`, async () => {
    const packs = await loadPacks([]);
    const scratch = await mkdtemp(join(tmpdir(), 'firnline-fuzz-'));
    const crashes: { input: FuzzCase; error: string }[] = [];
    const hangs: { input: FuzzCase; ms: number }[] = [];
    let count = 0;
    const seed = Number(process.env['FIRNLINE_FUZZ_SEED'] ?? Date.now() % 2 ** 31);
    await fc.assert(
      fc.asyncProperty(fuzzCase, async (input) => {
        count += 1;
        const started = performance.now();
        try {
          await runCase(input, packs, scratch);
        } catch (error) {
          crashes.push({ input, error: error instanceof Error ? (error.stack ?? error.message) : String(error) });
        }
        const ms = performance.now() - started;
        if (ms > HANG_MS) hangs.push({ input, ms });
        if (runs >= 10_000 && count % 10_000 === 0) console.log(`fuzz: ${count} cases so far, ${crashes.length} crashes, ${hangs.length} hangs`);
        return true;
      }),
      { numRuns: runs, seed },
    );
    console.log(`fuzz: ${count} cases (seed ${seed}), ${crashes.length} crashes, ${hangs.length} hangs`);
    for (const c of crashes.slice(0, 5)) console.log(JSON.stringify(c.input), '\n', c.error);
    for (const h of hangs.slice(0, 5)) console.log(`hang ${Math.round(h.ms)} ms:`, JSON.stringify(h.input).slice(0, 300));
    expect(count).toBe(runs);
    expect(crashes).toEqual([]);
    expect(hangs).toEqual([]);
  }, Math.max(120_000, runs * 200));
});
