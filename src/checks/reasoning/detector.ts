/**
 * What a reasoning detector is: a plain function from a tokenized sentence and the cue words of
 * its check (from the rule pack) to the stretches of the sentence that carry the error.
 */
import { compilePhrases, type Phrase, type PhraseHit } from '../../claims/frames-match.js';
import type { SentenceTokens } from '../../claims/frames-tokens.js';
import type { Reader } from './reading.js';

/** The cue-word lists of one check, by name; a list the pack leaves out is empty. */
export type Slots = (name: string) => Phrase[];

/** What a detector sees. `paragraph[index]` is the sentence; the rest is context. */
export interface DetectInput {
  sentence: SentenceTokens;
  words: Slots;
  paragraph: readonly string[];
  index: number;
  /** The first sentence of the block itself: those before it are its lead-in (the blocks just before). */
  own: number;
  /** The propositions and stance of sentence `i` of the paragraph. */
  read: Reader;
  /**
   * False when no phrase of the cue list `name` can be in the sentence, whatever compromise's roots
   * (claims/frames-match.ts `mayMatchPhrase`, on the words alone): `findPhrases` of that list on
   * `sentence` is then empty, and the detector need not ask for `sentence` for it.
   */
  mayHold: (name: string) => boolean;
}

/** A stretch of the sentence to flag (UTF-16 offsets). */
export interface Cue {
  start: number;
  end: number;
}

/**
 * One prefilter key: the name of a cue list of the check, or several names of which any one will do
 * (`['all-history', 'every-year', 'spans']`). A name `lexicon.<class>` or `lexicon.<class>.<key>` is
 * a class of the pack's lexicon (`lexicon.regions`, `lexicon.entities.ice-core`), held when the
 * sentence's reading has a hit of it; the reading is made for every sentence anyway, so such a key
 * costs nothing more.
 */
export type DetectorKey = string | readonly string[];

/** The prefix of a key that names a class of the pack's lexicon. */
export const LEXICON_KEY = 'lexicon.';

/** A detector and the keys that must all hold for it to fire (the cheap prefilter). */
export interface DetectorEntry {
  detect: (input: DetectInput) => Cue[];
  keys: readonly DetectorKey[];
}

/** The names of one key: itself, or the names any one of which will do. */
export function keyNames(key: DetectorKey): readonly string[] {
  return typeof key === 'string' ? [key] : key;
}

/** Compiles a check's `words` once. */
export function compileSlots(words: Record<string, string[]>): Slots {
  const compiled = new Map(Object.entries(words).map(([name, list]) => [name, compilePhrases(list)]));
  return (name) => compiled.get(name) ?? [];
}

/** True when a hit of `blockers` overlaps `hit` or ends within `window` words before it, in its clause. */
export function isBlocked(sentence: SentenceTokens, hit: PhraseHit, blockers: readonly PhraseHit[], window = 4): boolean {
  const clause = sentence.tokens[sentence.words[hit.first] ?? 0]?.clause;
  return blockers.some((b) => {
    const sameClause = sentence.tokens[sentence.words[b.first] ?? 0]?.clause === clause;
    const overlaps = b.first <= hit.last && b.last >= hit.first;
    return overlaps || (sameClause && b.last < hit.first && hit.first - b.last <= window);
  });
}

/** The stretch from one hit to another. */
export function spanOf(from: { start: number }, to: { end: number }): Cue {
  return { start: from.start, end: to.end };
}
