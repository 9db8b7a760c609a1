/**
 * The guard that keeps a team's pattern from hanging a run. Patterns are checked when loaded
 * (length, syntax, no repeated repeated group such as `(a+)+`: see rulepack/regex-problem.ts), but
 * a static check cannot catch every slow pattern (`(a|aa)*b`, or many `.*` in a row over a long
 * sentence). So every pattern match runs under a time limit: regular expressions on a worker
 * thread that is ended when time runs out (worker-matches.ts), compromise matches inside
 * `node:vm`; either way V8 stops the work even in the middle of a backtrack. We then report the rule as
 * a pack error (exit 2) instead of waiting for ever. Sentences over MAX_SENTENCE_LENGTH are not
 * given to pattern rules at all, which bounds the work of the patterns that pass.
 */
import { createContext, runInContext } from 'node:vm';
import { workerMatches, type Span } from './worker-matches.js';

export type { Span } from './worker-matches.js';

/** The longest pattern (regex or compromise match) a rule may hold, in characters. */
export const MAX_PATTERN_LENGTH = 500;
/** Sentences longer than this (UTF-16 units) are not matched against pattern rules. */
export const MAX_SENTENCE_LENGTH = 2000;
/** How long one sentence may take for all the patterns of one rule, in milliseconds. */
export const TIME_LIMIT_MS = 100;

const sandbox = createContext({ task: undefined as undefined | (() => unknown) });

/** Runs `task`; returns `{ done: false }` when it ran longer than `ms` and was stopped. */
export function withTimeLimit<T>(task: () => T, ms: number = TIME_LIMIT_MS): { done: true; value: T } | { done: false } {
  sandbox['task'] = task;
  try {
    return { done: true, value: runInContext('task()', sandbox, { timeout: ms }) as T };
  } catch (error) {
    if ((error as { code?: string }).code === 'ERR_SCRIPT_EXECUTION_TIMEOUT') return { done: false };
    throw error;
  } finally {
    sandbox['task'] = undefined;
  }
}

/** Every match of a `g`-less regex in `text`, run under the time limit; undefined when stopped. */
export function guardedMatches(regex: RegExp, text: string, ms: number = TIME_LIMIT_MS): Span[] | undefined {
  return guardedMatchesEach([regex], text, ms)?.[0];
}

/**
 * The matches of every regex in `regexes` (in order), all run in one call under the time limit;
 * undefined when the whole batch was stopped. Callers batch first, and only when the batch is
 * stopped run each regex on its own to find (and name) the slow one.
 */
export function guardedMatchesEach(regexes: readonly RegExp[], text: string, ms: number = TIME_LIMIT_MS): Span[][] | undefined {
  return guardedMatchesOfTexts(regexes, [text], ms)?.[0];
}

/**
 * For each of `texts`, the matches of every regex in `regexes`, all under one time limit: when the
 * lot finishes within it, so did every text on its own. Undefined when the lot was stopped.
 */
export function guardedMatchesOfTexts(regexes: readonly RegExp[], texts: readonly string[], ms: number = TIME_LIMIT_MS): Span[][][] | undefined {
  // A worker thread is the cheap guard (worker-matches.ts); node:vm is the fallback.
  const found = workerMatches(regexes, texts, ms);
  if (found !== 'unavailable') return found;
  const globals = regexes.map(globalOf);
  const run = withTimeLimit(() => texts.map((text) => globals.map((g) => allMatches(g, text))), ms);
  return run.done ? run.value : undefined;
}

// The `g` twin of each pattern, made once: matchAll needs it, and the pattern objects live as long
// as their compiled packs.
const globalTwins = new WeakMap<RegExp, RegExp>();

function globalOf(regex: RegExp): RegExp {
  let twin = globalTwins.get(regex);
  if (twin === undefined) {
    twin = new RegExp(regex.source, regex.flags.includes('g') ? regex.flags : `${regex.flags}g`);
    globalTwins.set(regex, twin);
  }
  return twin;
}

// matchAll clones the regex, so the shared twin's lastIndex is never disturbed.
function allMatches(global: RegExp, text: string): Span[] {
  const spans: Span[] = [];
  for (const m of text.matchAll(global)) if (m[0].length > 0) spans.push({ start: m.index, end: m.index + m[0].length });
  return spans;
}
