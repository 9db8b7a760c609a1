/**
 * Runs the check over a list of files: the least work first, in this thread (read each file and run
 * the compiled subject matcher over its raw text; a file with no hit is done), then the cache, then
 * the files that need the full check, in this thread when they are few, and when they are many in
 * this thread and `jobs - 1` pool workers side by side. Outcomes come back in the order of the input whatever ran them, so the report does
 * not depend on the pool, the cache or the number of cores.
 */
import { EventEmitter } from 'node:events';
import { existsSync, statSync } from 'node:fs';
import { availableParallelism } from 'node:os';
import { fileURLToPath } from 'node:url';
import type { Tinypool as TinypoolType } from 'tinypool';
import { checkFileText, passOver, uncheckedOf, type DraftOptions } from '../engine.js';
import { BUILTIN_PACK_FILE } from '../rulepack/index.js';
import type { LoadedPacks } from '../rulepack/types.js';
import { readDraftText, readWordDraft } from '../source/index.js';
import type { Draft, Flag, Level, Source } from '../types.js';
import { VERSION } from '../version.js';
import { cacheKeyOf, packsDigest, type FileOutcome, type ResultCache } from './cache.js';
import type { PoolTask } from './pool-worker.js';

export type { FileOutcome } from './cache.js';

/** One file to check. */
export interface FileTask {
  path: string;
  projectPath: string;
  format: Draft['format'];
}

export interface RunFilesOptions {
  cwd: string;
  packs: LoadedPacks;
  levels: Record<string, Level | 'off'>;
  topic: DraftOptions['topic'];
  jobs?: number;
  cache?: ResultCache;
  onProgress?: (done: number, total: number) => void;
  /**
   * Called once the pool's workers are running, before this thread checks a file beside them. V8
   * sets its process-wide flags back to their bounds when it makes a worker's heap, so the command
   * line sets its young generation's flag again here (cli/speed-options.ts YOUNG_GROWTH_FACTOR).
   */
  onWorkersStarted?: () => void;
  /**
   * Called once, before this thread or a worker checks more, when the on-topic text the run has
   * met reaches LARGE_RUN_BYTES: the command line bounds its heap's growth from there on
   * (cli/speed-options.ts boundHeapGrowth). A smaller run never calls it.
   */
  onLargeRun?: () => void;
}

/**
 * How much on-topic text (UTF-16 code units, as read) a run meets before it is a large run
 * (RunFilesOptions.onLargeRun). A run of a draft or a few keeps little to its report, and the bound on
 * its heap's growth only cost it full collections: a 2.1 KB check ran four where it runs two without
 * it (docs/speed.md, Session 20). A run past this keeps its claims and flags file after file and
 * bounds its heap from the next file on, before its peak.
 */
export const LARGE_RUN_BYTES = 64 * 1024;

/**
 * How many on-topic files must wait before a pool is worth its start: below this, one thread does
 * the lot.
 */
export const POOL_MIN_FILES = 8;

/**
 * Without `--jobs`, how much on-topic text must wait as well. Each worker loads the packs (YAML and
 * schema) and the NLP library, measured at 1 to 4 s of CPU on this 2-core machine under load, about
 * what checking half a megabyte of on-topic text costs in one thread: a docs repository with a few
 * on-topic pages is faster without a pool. `--jobs N` (N > 1) starts one at POOL_MIN_FILES.
 */
export const POOL_MIN_BYTES = 1_000_000;

/**
 * The young generation of each pool worker's heap, in MiB. A worker's garbage is the per-sentence
 * readings, which die before the next sentence; V8's default young generation (semi-spaces of up to
 * 16 MiB each on 64-bit) is sized for throughput and kept its full size resident in each worker.
 * With 12 MiB, 1 MB of the bench's topical prose in this thread and one worker peaked at 342 instead
 * of 385 MiB, its CPU time the same (44.4 against 46.1 s, load average 11, one run each) and its
 * report byte-identical. The main thread's young generation is set when Node starts and cannot be
 * changed from here.
 */
export const WORKER_YOUNG_MB = 12;

/**
 * The worker's module: the bundled one (dist/bundle/pool-worker.js, scripts/build-bundle.js: the
 * same modules in a few files, some half a second less for a worker to start on our machine) while
 * it is not older than dist/'s, as the launcher chooses the command line's; absent when running
 * from the TypeScript sources (tests), then no pool.
 */
function workerFile(): string {
  const plain = fileURLToPath(new URL('./pool-worker.js', import.meta.url));
  try {
    const bundled = fileURLToPath(new URL('../bundle/pool-worker.js', import.meta.url));
    if (statSync(bundled).mtimeMs >= statSync(plain).mtimeMs) return bundled;
  } catch {
    // No bundle (or no dist/): the plain module, if any.
  }
  return plain;
}

export async function runFiles(tasks: FileTask[], options: RunFilesOptions): Promise<(FileOutcome | undefined)[]> {
  const outcomes: (FileOutcome | undefined)[] = new Array<FileOutcome | undefined>(tasks.length);
  const packsKey = options.cache === undefined ? '' : packsDigest(options.packs);
  const jobs = Math.max(1, Math.floor(options.jobs ?? availableParallelism()));
  const worker = jobs > 1 ? workerFile() : '';
  const poolable = jobs > 1 && existsSync(worker) && options.packs.packs.every((p) => existsSync(p.file));
  let done = 0;
  // The source entries of outcomes that were copied (from a worker or the cache), one object each.
  const sources = new Map<string, Source>();
  const finish = (index: number, outcome: FileOutcome, key?: string): void => {
    outcomes[index] = outcome;
    if (key !== undefined && options.cache !== undefined && outcome.unchecked === undefined) void options.cache.set(key, outcome);
    done += 1;
    options.onProgress?.(done, tasks.length);
  };
  // A run over files keeps no sentence's findings for a re-check (engine DraftOptions.reuseSentences).
  const draftOptions = (task: FileTask): DraftOptions => ({
    levels: options.levels,
    reuseSentences: false,
    ...(options.topic === undefined ? {} : { topic: options.topic }),
    ...(task.projectPath === task.path ? {} : { projectPath: task.projectPath }),
  });

  // Files that wait for the full check, in input order. Once a pool runs, its workers and this
  // thread take them from the front: this thread is one of the `jobs` threads, so a 2-core machine
  // starts one worker (its own packs and NLP library), not two beside an idle main thread.
  const waiting: { index: number; text: string; key: string | undefined }[] = [];
  let waitingBytes = 0;
  let onTopicBytes = 0;
  let large = false;
  const enough = (): boolean => waiting.length >= POOL_MIN_FILES && (options.jobs !== undefined || waitingBytes >= POOL_MIN_BYTES);
  const workers = jobs - 1;
  let pool: TinypoolType | undefined;
  let inFlight = 0;
  const running: Promise<void>[] = [];
  const dispatch = async (item: { index: number; text: string; key: string | undefined }): Promise<void> => {
    const task = tasks[item.index] as FileTask;
    const message: PoolTask = {
      path: task.path, projectPath: task.projectPath, format: task.format, text: item.text, levels: options.levels,
      packFiles: options.packs.packs.map((p) => p.file).filter((f) => f !== BUILTIN_PACK_FILE),
      builtin: options.packs.packs[0]?.file === BUILTIN_PACK_FILE,
    };
    const outcome = (await (pool as TinypoolType).run(message)) as FileOutcome;
    finish(item.index, shareSources(outcome, sources), item.key);
  };
  // Each worker has one file running and one queued, so it never waits for this thread to hand on the next.
  const pump = (): void => {
    while (pool !== undefined && inFlight < workers * 2 && waiting.length > 0) {
      inFlight += 1;
      const done = dispatch(waiting.shift() as (typeof waiting)[number]).finally(() => {
        inFlight -= 1;
        pump();
      });
      // Awaited below; a failure is thrown there, not left unhandled if the run stops first.
      done.catch(() => undefined);
      running.push(done);
    }
  };
  const checkHere = (item: { index: number; text: string; key: string | undefined }): void => {
    const task = tasks[item.index] as FileTask;
    const outcome = checkFileText({ path: task.path, text: item.text, format: task.format }, options.packs, draftOptions(task));
    shareOutcomeStrings(outcome);
    finish(item.index, outcome, item.key);
  };
  // Between two files this thread lets the workers' answers in, and with them the next dispatches.
  const nextTurn = (): Promise<void> => new Promise((resolve) => setImmediate(resolve));
  try {
    for (let index = 0; index < tasks.length; index += 1) {
      const task = tasks[index] as FileTask;
      if (task.format === 'docx') {
        // A Word package is read and checked here (a file that is not one fails the run, as before).
        finish(index, checkFileText(await readWordDraft(task.path, options.cwd), options.packs, draftOptions(task)));
        continue;
      }
      const text = await readDraftText(task.path, options.cwd);
      if (typeof text !== 'string') {
        finish(index, { claims: [], flags: [], unchecked: uncheckedOf(text.problem) });
        continue;
      }
      // The raw-text look (a checklist, or no subject named) is done here: most files end at it.
      const passed = passOver(text, options.packs);
      if (passed !== undefined) {
        finish(index, passed);
        continue;
      }
      // An on-topic file's outcome is held to the report whether checked or taken from the cache.
      onTopicBytes += text.length;
      if (!large && onTopicBytes >= LARGE_RUN_BYTES) {
        large = true;
        options.onLargeRun?.();
      }
      const key = options.cache === undefined ? undefined
        : cacheKeyOf({ version: VERSION, packs: packsKey, path: task.path, projectPath: task.projectPath, format: task.format, levels: options.levels, text });
      const cached = key === undefined ? undefined : options.cache?.get(key);
      if (cached !== undefined) {
        finish(index, shareSources(cached, sources));
        continue;
      }
      waiting.push({ index, text, key });
      waitingBytes += text.length;
      if (pool === undefined && poolable && enough()) {
        const { Tinypool } = await import('tinypool');
        pool = new Tinypool({ filename: worker, minThreads: workers, maxThreads: workers, idleTimeout: 1000, resourceLimits: { maxYoungGenerationSizeMb: WORKER_YOUNG_MB } });
        if (options.onWorkersStarted !== undefined) {
          await workersOnline(pool);
          options.onWorkersStarted();
        }
      }
      if (pool !== undefined) {
        pump();
        // Hold at most a few files per thread in memory at once: this thread checks one meanwhile.
        if (waiting.length >= jobs * 2) {
          checkHere(waiting.shift() as (typeof waiting)[number]);
          await nextTurn();
        }
      }
    }
    pump();
    while (waiting.length > 0) {
      checkHere(waiting.shift() as (typeof waiting)[number]);
      if (pool !== undefined) await nextTurn();
    }
    // Each dispatch adds its follower to `running` before it settles, so this waits for them all.
    for (let settled = 0; settled < running.length;) {
      const batch = running.slice(settled);
      settled = running.length;
      await Promise.all(batch);
    }
  } finally {
    await pool?.destroy();
  }
  return outcomes;
}

/**
 * Resolves once each thread of `pool` runs its code (Node's `online`), or has ended or failed:
 * its heap is made by then. Listened for in the tick the pool was made in, so none is missed.
 */
function workersOnline(pool: TinypoolType): Promise<void> {
  return Promise.all(pool.threads.map((worker) => {
    // tinypool's worker keeps its Node thread as `thread` (not in its types).
    const thread = (worker as unknown as { thread?: unknown }).thread;
    if (!(thread instanceof EventEmitter)) return undefined;
    return new Promise<void>((resolve) => {
      const done = (): void => {
        for (const event of ['online', 'exit', 'error']) thread.off(event, done);
        resolve();
      };
      for (const event of ['online', 'exit', 'error']) thread.once(event, done);
    });
  })).then(() => undefined);
}

/**
 * An outcome from a worker or the cache holds its own copy of every source entry each flag cites
 * (some 3 KB of JSON a flag on the bench's on-topic prose, 53 MiB over its 17,186 flags): each flag is given
 * the run's one object for an entry of the same content instead, as flags checked in this thread
 * share the packs' entries. Reports tell entries apart by content, so they do not change.
 *
 * Its strings are copies too: a copied message holds one string per place, so a sentence with two
 * flags is held three times (the claim's text and each flag's sentence), and the file's path, the
 * heading, the rule ids and the units once per claim or flag. Each distinct string of the outcome
 * is kept once (`shareStrings`; some 0.75 of the 3.3 MiB one 128 KB file of the bench's on-topic
 * prose took in this thread), as in an outcome checked here, whose objects share them already.
 */
function shareSources(outcome: FileOutcome, shared: Map<string, Source>): FileOutcome {
  for (const flag of shareOutcomeStrings(outcome)) {
    flag.sources = flag.sources.map((source) => {
      const key = JSON.stringify(source);
      const one = shared.get(key);
      if (one !== undefined) return one;
      shared.set(key, source);
      return source;
    });
  }
  return outcome;
}

/**
 * Gives the claims and flags of `outcome` one string per content (their flags' sources aside), and
 * returns its flags, each once. An outcome checked in this thread needs it too: its quantities'
 * units and dimensions, its paths and rule ids are strings made per reading, some 2.5 MiB per
 * 512 KB of the bench's topical prose kept to the report.
 */
function shareOutcomeStrings(outcome: FileOutcome): Set<Flag> {
  const seen = new Set<Flag>();
  const strings = new Map<string, string>();
  for (const claim of outcome.claims) {
    shareStrings(claim, strings, 'flags');
    for (const flag of claim.flags) seen.add(flag);
  }
  for (const flag of outcome.flags) seen.add(flag);
  for (const flag of seen) shareStrings(flag, strings, 'sources');
  return seen;
}

/**
 * Replaces each string held by `value` (own members at any depth, but not under its member `skip`)
 * by the first equal one `strings` met.
 */
export function shareStrings(value: object, strings: Map<string, string>, skip?: string): void {
  const record = value as Record<string, unknown>;
  // A frozen object (a pack's own data that a finding may hold) keeps its strings.
  const fixed = Object.isFrozen(record);
  for (const key of Object.keys(record)) {
    if (key === skip) continue;
    const member = record[key];
    if (typeof member === 'string') {
      const one = strings.get(member);
      if (one === undefined) strings.set(member, member);
      else if (!fixed) record[key] = one;
    } else if (typeof member === 'object' && member !== null) {
      shareStrings(member, strings);
    }
  }
}
