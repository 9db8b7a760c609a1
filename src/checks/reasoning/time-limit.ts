/**
 * The guard that keeps a team's pattern from hanging a run. Patterns are checked when loaded
 * (length, syntax, no repeated repeated group such as `(a+)+`: see rulepack/regex-problem.ts), but
 * a static check cannot catch every slow pattern (`(a|aa)*b`, or many `.*` in a row over a long
 * sentence). So every pattern match runs inside `node:vm` with a time limit: V8 stops the script,
 * even in the middle of a regular-expression backtrack, and throws. We then report the rule as
 * a pack error (exit 2) instead of waiting for ever. Sentences over MAX_SENTENCE_LENGTH are not
 * given to pattern rules at all, which bounds the work of the patterns that pass.
 */
import { createContext, runInContext } from 'node:vm';

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
export function guardedMatches(regex: RegExp, text: string, ms: number = TIME_LIMIT_MS): { start: number; end: number }[] | undefined {
  const global = new RegExp(regex.source, regex.flags.includes('g') ? regex.flags : `${regex.flags}g`);
  const run = withTimeLimit(() => [...text.matchAll(global)].filter((m) => m[0].length > 0).map((m) => ({ start: m.index, end: m.index + m[0].length })), ms);
  return run.done ? run.value : undefined;
}
