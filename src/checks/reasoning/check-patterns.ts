/**
 * A team's own pattern rules: a phrase in compromise match syntax or a regular expression, each
 * matched under the time limit of time-limit.ts, on sentences up to MAX_SENTENCE_LENGTH long.
 */
import type { CompromiseView } from '../../claims/frames-tokens.js';
import { FirnlineError } from '../../errors.js';
import type { FlagDraft } from '../../types.js';
import type { CompiledPacks } from './compile-packs.js';
import { guardedMatches, MAX_SENTENCE_LENGTH, TIME_LIMIT_MS, withTimeLimit } from './time-limit.js';

interface Matched {
  offset?: { start: number; length: number };
}

/** Flags for every pattern rule that matches; `doc` is the sentence parsed by compromise (lazily). */
export function checkPatterns(sentence: string, compiled: CompiledPacks, doc: () => CompromiseView): FlagDraft[] {
  if (sentence.length > MAX_SENTENCE_LENGTH) return [];
  const flags: FlagDraft[] = [];
  for (const { rule, regex, file } of compiled.patterns) {
    const slow = () => new FirnlineError('pack-pattern-slow', `pattern ${rule.id}: ran longer than ${TIME_LIMIT_MS} ms on one sentence; simplify it`, { file });
    const spans: { start: number; end: number }[] = [];
    if (regex !== undefined) {
      const found = guardedMatches(regex, sentence);
      if (found === undefined) throw slow();
      spans.push(...found);
    }
    if (rule.match !== undefined) {
      const match = rule.match;
      const run = withTimeLimit(() => doc().match(match).json({ offset: true }) as Matched[]);
      if (!run.done) throw slow();
      for (const m of run.value) if (m.offset !== undefined) spans.push({ start: m.offset.start, end: m.offset.start + m.offset.length });
    }
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
