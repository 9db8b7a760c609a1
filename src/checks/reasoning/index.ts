/**
 * The reasoning stage: argument errors about CO2 and temperature, found with sentence frames and
 * the cue words, direction facts and pattern rules of the loaded packs.
 */
import nlp from 'compromise';
import { tokenizeSentence, type CompromiseView, type SentenceTokens } from '../../claims/frames-tokens.js';
import { FRAME_WORDS } from '../../claims/frames-words.js';
import { DEFAULT_STANCE_WORDS } from '../../claims/stance.js';
import type { LoadedPacks } from '../../rulepack/types.js';
import type { FlagDraft } from '../../types.js';
import { checkDirections } from './check-directions.js';
import { checkPatterns } from './check-patterns.js';
import { compilePacks } from './compile-packs.js';
import { dropOutranked } from './flag-precedence.js';
import { paragraphDirectionMatches } from './paragraph-matches.js';
import { applyStance } from './reported-claims.js';

export { compilePacks, unknownReasoningChecks } from './compile-packs.js';
export { DETECTORS } from './registry.js';
export { MAX_PATTERN_LENGTH, MAX_SENTENCE_LENGTH, TIME_LIMIT_MS } from './time-limit.js';

/**
 * Checks `paragraph[index]` for argument errors; the other sentences of the paragraph are the
 * context that can answer a reported argument. Offsets are UTF-16 indices into `paragraph[index]`.
 * compromise runs at most once, and only when a check's cue words pass the cheap prefilter (or a
 * pattern rule needs it). Overlapping flags keep the first in pack order (checks, then direction
 * facts, then pattern rules), so one stretch of text gets one explanation; the exceptions, where a
 * more specific flag wins, are listed in flag-precedence.ts.
 */
export function checkReasoning(paragraph: string[], index: number, packs: LoadedPacks): FlagDraft[] {
  const text = paragraph[index];
  if (text === undefined) return [];
  const compiled = compilePacks(packs);
  let doc: CompromiseView | undefined;
  const parsed = () => (doc ??= nlp(text));
  let tokens: SentenceTokens | undefined;
  const sentence = () => (tokens ??= tokenizeSentence(text, FRAME_WORDS.clauseBreaks, parsed()));

  const found: { flag: FlagDraft; stance: typeof DEFAULT_STANCE_WORDS }[] = [];
  for (const { check, entry, words, stance, prefilter } of compiled.checks) {
    if (!prefilter.every((re) => re.test(text))) continue;
    for (const cue of entry.detect({ sentence: sentence(), words, paragraph, index })) {
      const flag: FlagDraft = { ruleId: check.id, level: check.level, ...cue, reason: check.reason, suggestion: check.suggestion, sources: check.sources };
      found.push({ flag, stance });
    }
  }
  const directions = checkDirections(text, compiled, paragraphDirectionMatches(paragraph, index, compiled, packs));
  for (const flag of [...directions, ...checkPatterns(text, compiled, parsed)]) {
    found.push({ flag, stance: DEFAULT_STANCE_WORDS });
  }

  const kept: FlagDraft[] = [];
  for (const { flag, stance } of dropOutranked(found)) {
    if (kept.some((k) => k.start < flag.end && flag.start < k.end)) continue;
    const judged = applyStance(flag, paragraph, index, sentence(), stance);
    if (judged !== undefined) kept.push(judged);
  }
  return kept;
}
