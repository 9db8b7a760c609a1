/**
 * compromise, the NLP library, loaded on first use and from its single-file build: the package's
 * own `require` entry (builds/three/compromise-three.cjs), the same version's code as its ESM entry,
 * which Node would read as some 440 modules (about half a second of start-up on our machine). A run
 * whose drafts need no sentence parse never loads it. Every caller shares this one instance.
 */
import { createRequire } from 'node:module';
import type nlpType from 'compromise';

let loaded: typeof nlpType | undefined;

/** The compromise function (`compromise()(text)` is `nlp(text)`). */
export function compromise(): typeof nlpType {
  return (loaded ??= createRequire(import.meta.url)('compromise') as typeof nlpType);
}
