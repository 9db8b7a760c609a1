/**
 * A team's own pattern rules: a phrase in compromise match syntax or a regular expression, each
 * matched under the time limit of time-limit.ts, on sentences up to MAX_SENTENCE_LENGTH long.
 */
import type { CompromiseView } from '../../claims/frames-tokens.js';
import { FirnlineError } from '../../errors.js';
import type { FlagDraft } from '../../types.js';
import type { CompiledPacks } from './compile-packs.js';
import { guardedMatches, MAX_SENTENCE_LENGTH, TIME_LIMIT_MS, withTimeLimit } from './time-limit.js';

/**
 * The whole run's budget for pattern rules, in milliseconds. The time limit of time-limit.ts bounds
 * one sentence; this bounds the sum, so a pattern just under the per-sentence limit cannot make a
 * run's time grow with the number of sentences without end (600 sentences × 60 ms).
 */
export const RUN_BUDGET_MS = 20_000;

// Time spent per rule id, per set of compiled packs (one set per run of the CLI).
const budgets = new WeakMap<CompiledPacks, Map<string, number>>();

function spentOn(compiled: CompiledPacks): Map<string, number> {
  let spent = budgets.get(compiled);
  if (spent === undefined) {
    spent = new Map();
    budgets.set(compiled, spent);
  }
  return spent;
}

function chargeBudget(spent: Map<string, number>, ruleId: string, file: string, ms: number, budgetMs: number): void {
  spent.set(ruleId, (spent.get(ruleId) ?? 0) + ms);
  let total = 0;
  let worst: [string, number] = [ruleId, 0];
  for (const [id, t] of spent) {
    total += t;
    if (t > worst[1]) worst = [id, t];
  }
  if (total <= budgetMs) return;
  throw new FirnlineError(
    'pack-pattern-budget',
    `pattern rules ran for more than ${budgetMs / 1000} s in this run, most of it in ${worst[0]} (${(worst[1] / 1000).toFixed(1)} s); simplify that pattern`,
    { file },
  );
}

interface Matched {
  offset?: { start: number; length: number };
}

/** Flags for every pattern rule that matches; `doc` is the sentence parsed by compromise (lazily). */
export function checkPatterns(sentence: string, compiled: CompiledPacks, doc: () => CompromiseView, budgetMs: number = RUN_BUDGET_MS): FlagDraft[] {
  if (sentence.length > MAX_SENTENCE_LENGTH) return [];
  const flags: FlagDraft[] = [];
  const spent = spentOn(compiled);
  for (const { rule, regex, file } of compiled.patterns) {
    const started = performance.now();
    const slow = () => new FirnlineError('pack-pattern-slow', `pattern ${rule.id}: ran longer than ${TIME_LIMIT_MS} ms on one sentence; simplify it`, { file });
    const spans: { start: number; end: number }[] = [];
    if (regex !== undefined) {
      const found = guardedMatches(regex, sentence);
      if (found === undefined) throw slow();
      spans.push(...found);
    }
    if (rule.match !== undefined) {
      const match = rule.match;
      // The sentence is parsed before the clock starts: the limit is for the team's pattern, and the
      // first parse of a run (compromise warming up, on a loaded CI machine) is not the pattern's doing.
      const view = doc();
      const run = withTimeLimit(() => view.match(match).json({ offset: true }) as Matched[]);
      if (!run.done) throw slow();
      for (const m of run.value) if (m.offset !== undefined) spans.push({ start: m.offset.start, end: m.offset.start + m.offset.length });
    }
    chargeBudget(spent, rule.id, file, performance.now() - started, budgetMs);
    for (const span of spans.slice(0, 1)) {
      flags.push({
        ruleId: rule.id,
        level: rule.level,
        ...span,
        reason: rule.reason,
        ...(rule.suggestion === undefined ? {} : { suggestion: rule.suggestion }),
        sources: rule.sources,
      });
    }
  }
  return flags;
}
