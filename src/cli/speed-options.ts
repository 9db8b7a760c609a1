/**
 * The speed options of `firnline check` (--jobs, --no-cache, --shard) and its progress line. Kept
 * apart from the command so that its module stays light: the engine loads only when a command runs.
 */
import { join } from 'node:path';
import { setFlagsFromString } from 'node:v8';
import type { CheckOptions } from '../engine.js';
import { FirnlineError } from '../errors.js';
import { parseShard } from '../speed/shard.js';
import { VERSION } from '../version.js';
import type { CliContext } from './context.js';

/** The report formats (report/index.ts REPORT_FORMATS), plus `markdown`: the sign-off checklist (GLOSSARY.md). */
export const CHECK_FORMATS = ['text', 'json', 'sarif', 'junit', 'html', 'markdown'] as const;

export interface SpeedFlags {
  jobs?: string;
  /** False with --no-cache. */
  cache?: boolean;
  shard?: string;
}

/** --jobs and --shard, checked before anything heavy loads (a usage error is one line, exit 2). */
export function parseSpeedFlags(flags: SpeedFlags): Partial<CheckOptions> {
  const options: Partial<CheckOptions> = {};
  if (flags.jobs !== undefined) {
    const jobs = Number(flags.jobs);
    if (!/^\d+$/u.test(flags.jobs.trim()) || jobs < 1) throw new FirnlineError('usage', `--jobs ${flags.jobs}: expected a whole number of at least 1`);
    options.jobs = jobs;
  }
  if (flags.shard !== undefined) options.shard = parseShard(flags.shard);
  return options;
}

/**
 * How much V8 lets a heap grow past what its last full collection kept, in percent. V8 picks a
 * factor of up to 4 when collecting is cheap; a run over megabytes of on-topic prose keeps its
 * claims and flags until the report, so each of its threads' heaps then grew to some three times
 * what it held (2 MB of the bench's topical prose: 76 MiB kept in one thread at the end, 273 MiB of
 * heap). At 50 percent the same run peaked at about 335 MiB instead of 400 to 455 (with the pool,
 * CPU time within the noise of the machine); 20 percent gave 315 MiB and more collections. Set by
 * the command line only (a process-wide V8 flag; the pool's workers start after it and share it),
 * never by the library, whose host process keeps its own settings; and only once a run is large
 * (speed/run-files.ts LARGE_RUN_BYTES, boundHeapGrowth below): a check of a 2.1 KB draft ran four full
 * collections with it and two without, some 8 percent of its CPU time (docs/speed.md, Session 20).
 */
export const HEAP_GROWING_PERCENT = 50;

/**
 * How much V8 multiplies a heap's young generation by each time it grows it. V8 starts the main
 * thread's two semi-spaces at 1 MiB each and doubles them, up to 16 MiB each, whenever much of the
 * young data survives a scavenge: a check's start-up (the packs, the tagger's model, the word lists,
 * all kept) grows them to their largest within seconds, and they stay resident at 32 MiB. The limit
 * can only be lowered when Node starts (`--max-semi-space-size`, which the launcher cannot give its
 * own process); a factor of 1, set at run time, keeps them at their first size instead. V8 refuses
 * a factor under 2 on the command line (a flag implication), not at run time, and reads the factor
 * each time it grows the space (Node 20, V8 11.3), and making a worker's heap raises it to 2 again,
 * so a pooled run sets it once more when its workers are running (speed/run-files.ts
 * onWorkersStarted); test/speed/young-generation.test.ts fails if a Node release stops honouring it. Session 19 (docs/speed.md): one 128 KB file of the bench's topical
 * prose in one thread peaked at 150 instead of 195 MiB for 6 percent more CPU (more scavenges);
 * the pool's workers share the flag (their young generation is bounded anyway, WORKER_YOUNG_MB).
 */
export const YOUNG_GROWTH_FACTOR = 1;

/**
 * The V8 flag `firnline check` sets from its start, before the bundle loads (bin/bundle-loader.js
 * CHECK_FLAG, which V8 hashes into the code caches the build makes with it) and again here.
 */
export const CHECK_V8_FLAGS = `--semi-space-growth-factor=${YOUNG_GROWTH_FACTOR}`;

/** The V8 flag a large run sets besides (speed/run-files.ts onLargeRun). */
export const LARGE_RUN_V8_FLAGS = `--heap-growing-percent=${HEAP_GROWING_PERCENT}`;

/** Bounds the young generation for this process (YOUNG_GROWTH_FACTOR); the findings are not affected. */
export function boundYoungGeneration(): void {
  setFlagsFromString(CHECK_V8_FLAGS);
}

/**
 * Bounds the heap's growth for this process (HEAP_GROWING_PERCENT) once a run is large; the findings
 * are not affected. A code cache made before (the stored tagger's, speed/script-cache.ts) no longer
 * matches V8's flags after it, so a large run that has not yet loaded the tagger compiles it from its
 * text, with the same results.
 */
export function boundHeapGrowth(): void {
  setFlagsFromString(LARGE_RUN_V8_FLAGS);
}

/** How long a run goes before it shows progress, and how often the line is redrawn. */
const PROGRESS_AFTER_MS = 1000;
const PROGRESS_EVERY_MS = 100;

/** The engine options the flags ask for, and `done()` to clear the progress line. */
export async function speedOptionsOf(
  flags: SpeedFlags,
  projectRoot: string,
  ctx: Pick<CliContext, 'env' | 'stderr' | 'stderrIsTTY'>,
): Promise<{ options: Partial<CheckOptions>; done: () => void }> {
  const options = parseSpeedFlags(flags);
  // Making a worker's heap sets V8's flags back to their bounds: the young generation's is set again.
  options.onWorkersStarted = boundYoungGeneration;
  // A run past LARGE_RUN_BYTES of on-topic text bounds its heap's growth from there on.
  options.onLargeRun = boundHeapGrowth;
  if (flags.cache !== false) {
    const { CACHE_FOLDER, ResultCache } = await import('../speed/cache.js');
    options.cache = new ResultCache(join(projectRoot, CACHE_FOLDER), VERSION);
  }
  // Progress only on a terminal, never in a CI log (CI is set by the common CI services).
  const ci = ctx.env.CI !== undefined && ctx.env.CI !== '' && ctx.env.CI !== 'false';
  if (ctx.stderrIsTTY !== true || ci) return { options, done: () => undefined };
  const started = Date.now();
  let drawn = 0;
  options.onProgress = (done, total) => {
    const now = Date.now();
    if (now - started < PROGRESS_AFTER_MS || (now - drawn < PROGRESS_EVERY_MS && done < total)) return;
    drawn = now;
    ctx.stderr(`\rfirnline: ${done.toLocaleString('en-US')} of ${total.toLocaleString('en-US')} files checked`);
  };
  return { options, done: () => (drawn > 0 ? ctx.stderr('\r\x1b[K') : undefined) };
}
