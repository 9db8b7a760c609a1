/**
 * The reasoning stage: argument errors about CO2 and temperature, found with sentence frames and
 * the cue words, direction facts and pattern rules of the loaded packs.
 */
import { compromise, countParse } from '../../nlp/compromise.js';
import { tokenizeSentence, type CompromiseView, type SentenceTokens } from '../../claims/frames-tokens.js';
import { mayMatchPhrase } from '../../claims/frames-match.js';
import { FRAME_WORDS } from '../../claims/frames-words.js';
import type { LoadedPacks } from '../../rulepack/types.js';
import type { FlagDraft } from '../../types.js';
import { checkDirections } from './check-directions.js';
import { checkFacts } from './check-facts.js';
import { checkPatterns } from './check-patterns.js';
import { compilePacks } from './compile-packs.js';
import { keyNames, LEXICON_KEY } from './detector.js';
import { dropOutranked } from './flag-precedence.js';
import { paragraphDirectionMatches } from './paragraph-matches.js';
import { paragraphReader, type ParagraphContext, type SentenceReading } from './reading.js';
import { judgeByStance } from './stance-flags.js';

export { compilePacks, unknownReasoningChecks } from './compile-packs.js';
export { DETECTORS } from './registry.js';
export { MAX_PATTERN_LENGTH, MAX_SENTENCE_LENGTH, TIME_LIMIT_MS } from './time-limit.js';
export { paragraphReader, type ParagraphContext, type SentenceReading } from './reading.js';
export { judgeByStance } from './stance-flags.js';

/**
 * Checks `paragraph[index]` for argument errors; the other sentences of the paragraph are context
 * (a conclusion drawn from the sentence before, an answer in the sentence after). Offsets are
 * UTF-16 indices into `paragraph[index]`. Checks and direction facts read the propositions of the
 * sentence (src/propositions); compromise runs only for the checks that still read cue words, and
 * only when their cue words pass the cheap prefilter. Overlapping flags keep the first in pack
 * order (checks, then direction facts, then pattern rules); the exceptions are in
 * flag-precedence.ts. A flag on a claim the draft does not hold as its own (reported, quoted,
 * labelled a myth, asked...) becomes a note that says so.
 */
export function checkReasoning(own: string[], at: number, packs: LoadedPacks, context: ParagraphContext = {}): FlagDraft[] {
  // A lead-in stands before the paragraph: the sentence before a block's first is its last one.
  const lead = context.leadIn ?? [];
  const paragraph = lead.length === 0 ? own : [...lead, ...own];
  const index = at + lead.length;
  const text = paragraph[index];
  if (text === undefined) return [];
  const compiled = compilePacks(packs);
  const read = paragraphReader(paragraph, packs, context);
  const reading = read(index);
  let tokens: SentenceTokens | undefined;
  const sentence = () => (tokens ??= tokenizeSentence(text, FRAME_WORDS.clauseBreaks));
  // The words alone, without compromise's roots: enough to tell that a key list cannot match.
  let plain: SentenceTokens | undefined;
  const plainWords = () => (plain ??= tokenizeSentence(text, [], null));
  // Pattern rules match on a compromise document of their own, made only when a pack has one, with
  // its roots computed so that a root pattern ("{be}") matches whichever detectors ran before.
  let doc: CompromiseView | undefined;
  const parsed = () => {
    if (doc === undefined) {
      countParse();
      doc = compromise()(text);
      doc.compute('root');
    }
    return doc;
  };

  const found: { flag: FlagDraft }[] = [];
  for (const { check, entry, words, prefilter } of compiled.checks) {
    if (!prefilter.every((re) => re.test(text))) continue;
    // Every key list must match for the detector to fire: compromise reads the sentence only when
    // each list has a phrase all of whose words may be there in some inflection ("show" alone is
    // no "show exactly").
    const mayHold = (name: string) => words(name).some((phrase) => mayMatchPhrase(plainWords(), phrase));
    // A key names a cue list, or a class of the lexicon the sentence's reading holds; a list of names, any one of them.
    const holds = (name: string) => (name.startsWith(LEXICON_KEY) ? readingHolds(reading, name.slice(LEXICON_KEY.length)) : mayHold(name));
    if (!entry.keys.every((key) => keyNames(key).some(holds))) continue;
    const input = { get sentence() { return sentence(); }, words, paragraph, index, own: lead.length, read, mayHold };
    for (const cue of entry.detect(input)) {
      found.push({ flag: { ruleId: check.id, level: check.level, ...cue, reason: check.reason, suggestion: check.suggestion, sources: check.sources } });
    }
  }
  const facts = reading === undefined ? [] : checkFacts(reading.props, packs.directions);
  const directions = checkDirections(text, compiled, paragraphDirectionMatches(paragraph, index, compiled, packs));
  for (const flag of [...facts, ...directions, ...checkPatterns(text, compiled, parsed)]) found.push({ flag });

  const kept: FlagDraft[] = [];
  for (const { flag } of dropOutranked(found)) {
    if (kept.some((k) => k.start < flag.end && flag.start < k.end)) continue;
    kept.push(flag);
  }
  return reading === undefined ? kept : judgeByStance(kept, reading.stance);
}

/** True when the reading has a hit of the lexicon class `name` ("regions", "entities.ice-core"). */
function readingHolds(reading: SentenceReading | undefined, name: string): boolean {
  if (reading === undefined) return false;
  const dot = name.indexOf('.');
  return (dot < 0 ? reading.s.of(name) : reading.s.of(name.slice(0, dot), name.slice(dot + 1))).length > 0;
}
