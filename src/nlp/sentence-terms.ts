/**
 * The NLP library's reading of one sentence, made once per distinct text. Several stages ask
 * compromise about the same sentence (the roots of its words for the sentence frames and the
 * reasoning detectors, the tags of its words for the subject of coordinated predicates); each used
 * to parse it again, and a paragraph re-checked in an editor was parsed again on every keystroke.
 * Here the sentence is parsed once, its roots computed, and the terms kept as plain data in a
 * bounded cache keyed by the exact text: compromise gives the same terms for the same text, so a
 * cached reading is the reading a fresh parse would give.
 *
 *   termsOf('CO2 lagged the warming.')
 *   → [{ text: 'CO2', start: 0, length: 3, root: 'co2', tags: ['Noun', ...] }, { text: 'lagged', root: 'lag', ... }, ...]
 */
import { compromiseTagger, countParse } from './compromise.js';
import { tagTerms } from './stored-tagger.js';

/** One term as compromise reads it; `start` and `length` are UTF-16 offsets into the sentence. */
export interface SentenceTerm {
  text: string;
  tags: readonly string[];
  /** The root (infinitive of a verb, singular of a noun), when compromise gives one. */
  root?: string;
  start: number;
  length: number;
}

/** Distinct sentences kept: a long draft's worth, a few megabytes. */
export const TERMS_CACHE_SIZE = 4096;

const cache = new Map<string, readonly SentenceTerm[]>();

/** The terms of `text` in order (every sentence compromise finds in it), from the cache when it is there. */
export function termsOf(text: string): readonly SentenceTerm[] {
  const hit = cache.get(text);
  if (hit !== undefined) {
    // Least recently used goes first: a hit moves to the back.
    cache.delete(text);
    cache.set(text, hit);
    return hit;
  }
  const terms = readTerms(text);
  cache.set(text, terms);
  if (cache.size > TERMS_CACHE_SIZE) cache.delete(cache.keys().next().value as string);
  return terms;
}

function readTerms(text: string): readonly SentenceTerm[] {
  // The tagger build has no chunker, whose chunks (noun, verb... phrases) nothing here reads: the
  // full build's last hook, it took about a third of each parse there.
  countParse();
  return Object.freeze(tagTerms(compromiseTagger(), text));
}
