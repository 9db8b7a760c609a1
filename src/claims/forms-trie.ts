/**
 * A lexicon class's phrases with every inflection (propositions/lexicon.ts), searched as one trie:
 * the bound words (bind-bound.ts) and the state words (bind-events.ts).
 */
import { phraseWords, variantsOf } from '../propositions/lexicon.js';
import { PhraseTrie } from '../prose/phrase-trie.js';

/**
 * The written forms of `phrases` as a trie searched in code (prose/phrase-trie.ts), with exactly
 * the matches of `/(?<![\p{L}\p{N}])(?:form|form...)(?![\p{L}\p{N}])/giu`, each form its words
 * joined by `[\s-]+`, the longer forms first. Such expressions (the bound words' four, the state
 * words' two; hundreds of forms each, under `iu`) cost V8 some 250 ms of a 2 KB `check` to compile
 * and run; the walk needs no compilation.
 */
export function phrasesTrie(phrases: readonly string[], degree: readonly string[] = []): PhraseTrie | undefined {
  // The form as the expression wrote it (its length orders the alternation), and as the trie takes it.
  const forms = new Map<string, string>();
  const add = (words: string[]) => {
    const source = words.map((w) => w.replace(/[.*+?^${}()|[\]\\]/gu, '\\$&')).join('[\\s-]+');
    if (!forms.has(source)) forms.set(source, words.join(' '));
  };
  // `degree` words may stand between two words of a phrase ("never went much past", "did not rise far above").
  const degrees = degree.map((d) => phraseWords(d));
  for (const phrase of phrases) {
    for (const words of variantsOf(phraseWords(phrase))) {
      add(words);
      for (let k = 1; k < words.length; k += 1) for (const d of degrees) add([...words.slice(0, k), ...d, ...words.slice(k)]);
    }
  }
  if (forms.size === 0) return undefined;
  const sorted = [...forms].sort((a, b) => b[0].length - a[0].length).map(([, form]) => form);
  return new PhraseTrie(sorted, { hyphens: true });
}
