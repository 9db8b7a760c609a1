/**
 * compromise, the NLP library, loaded on first use and from its single-file builds, never from its
 * ESM entry's some 440 modules (about half a second of start-up on our machine). A run whose drafts
 * need no sentence parse never loads it. Every caller shares these instances.
 *
 * Two builds of the same version (package.json pins it): the sentence readings (nlp/sentence-terms.ts:
 * tags, roots, offsets) come from `compromise/two`, the tokenizer, tagger and root computation
 * without the level-three plugins (chunker, nouns, verbs, numbers... APIs that nothing here reads),
 * some 20 ms less CPU to load; its terms equal the full build's parse without its chunker on every
 * sentence of our tuning sets, docs, demo drafts and the bench's prose (test/nlp/builds.test.ts). A
 * team's pattern rules match on the full build (`compromise`), whose match syntax reads chunks too.
 */
import { createRequire } from 'node:module';
import { fileURLToPath } from 'node:url';
import type nlpType from 'compromise';
import { loadStoredTagger } from './stored-tagger.js';

let full: typeof nlpType | undefined;
let tagger: typeof nlpType | undefined;
let parses = 0;

/** The full compromise function (`compromise()(text)` is `nlp(text)`): pattern rules only. */
export function compromise(): typeof nlpType {
  return (full ??= createRequire(import.meta.url)('compromise') as typeof nlpType);
}

/**
 * compromise's tagger build (`compromise/two`): the sentence readings' parse. From the build's
 * stored tagger (dist/generated/compromise-tagger.cjs, nlp/stored-tagger.ts: the same sources with
 * the model made at build time) while it was made from the compromise installed here.
 */
export function compromiseTagger(): typeof nlpType {
  return (tagger ??= taggerBuild());
}

function taggerBuild(): typeof nlpType {
  const require = createRequire(import.meta.url);
  const stored = loadStoredTagger(require, fileURLToPath(new URL('../generated/compromise-tagger.cjs', import.meta.url)));
  return stored ?? (require('compromise/two') as typeof nlpType);
}

/** Counts one parse; every caller that makes a compromise document calls it (see `nlpUse`). */
export function countParse(): void {
  parses += 1;
}

/**
 * Whether a build of compromise is loaded in this thread and how many texts it has parsed: read by
 * tests and by bench/nlp-parses.js, never printed by a run.
 */
export function nlpUse(): { loaded: boolean; parses: number } {
  return { loaded: full !== undefined || tagger !== undefined, parses };
}
