/**
 * Direction facts: an effect stated the wrong way round ("warmer water holds more CO2"). Each
 * fact in the packs lists regular expressions for wrong phrasings and, optionally, right ones;
 * a sentence that states the right direction is left alone even when a wrong pattern also matches,
 * and so is a wrong phrasing that the sentence denies, asks about or concedes (direction-guards.ts).
 */
import { FirnlineError } from '../../errors.js';
import type { FlagDraft } from '../../types.js';
import { directionFlag } from './check-facts.js';
import type { CompiledPacks } from './compile-packs.js';
import { isGuarded } from './direction-guards.js';
import { guardedMatches, guardedMatchesEach, MAX_SENTENCE_LENGTH, TIME_LIMIT_MS, type Span } from './time-limit.js';

/**
 * Flags (with offsets into `sentence`) for every direction fact stated the wrong way round.
 * `batched` holds the matches of every pattern (right then wrong, fact by fact) when a caller has
 * run them already; otherwise they run here, in one guarded call.
 */
export function checkDirections(sentence: string, compiled: CompiledPacks, batched?: Span[][]): FlagDraft[] {
  if (sentence.length > MAX_SENTENCE_LENGTH || compiled.directions.length === 0) return [];
  const flags: FlagDraft[] = [];
  // When the guarded call is stopped, each pattern runs on its own below, in the order the facts
  // give, so the slow one is found and named.
  const all = directionPatterns(compiled);
  const batch = batched ?? guardedMatchesEach(all, sentence);
  const matched = batch === undefined ? undefined : new Map(all.map((regex, i) => [regex, batch[i] ?? []]));
  for (const { fact, wrong, right, file } of compiled.directions) {
    const run = (regex: RegExp) => {
      const found = matched?.get(regex) ?? guardedMatches(regex, sentence);
      if (found === undefined) {
        throw new FirnlineError('pack-regex-slow', `direction fact ${fact.id}: /${regex.source}/ ran longer than ${TIME_LIMIT_MS} ms on one sentence; simplify it`, { file });
      }
      return found;
    };
    if (right.some((regex) => run(regex).length > 0)) continue;
    const hit = wrong.flatMap(run).find((span) => !isGuarded(sentence, span));
    if (hit !== undefined) flags.push(directionFlag(fact, hit));
  }
  return flags;
}

const patternLists = new WeakMap<CompiledPacks, RegExp[]>();

/** Every pattern of the direction facts in one list, right before wrong, fact by fact. */
export function directionPatterns(compiled: CompiledPacks): RegExp[] {
  let all = patternLists.get(compiled);
  if (all === undefined) {
    all = compiled.directions.flatMap((d) => [...d.right, ...d.wrong]);
    patternLists.set(compiled, all);
  }
  return all;
}
