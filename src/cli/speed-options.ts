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
 * never by the library, whose host process keeps its own settings.
 */
export const HEAP_GROWING_PERCENT = 50;

/** Bounds heap growth for this process (see HEAP_GROWING_PERCENT); the findings are not affected. */
export function boundHeapGrowth(): void {
  setFlagsFromString(`--heap-growing-percent=${HEAP_GROWING_PERCENT}`);
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
