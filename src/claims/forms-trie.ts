/**
 * A lexicon class's phrases with every inflection (propositions/lexicon.ts), searched as one trie:
 * the bound words (bind-bound.ts) and the state words (bind-events.ts).
 */
import { phraseWords, variantsOf } from '../propositions/lexicon.js';
import { asciiFoldOf, isWordCode, PhraseTrie } from '../prose/phrase-trie.js';

/** Restricted tries kept per list: one for each set of first words a text holds. */
const RESTRICTED_KEPT = 256;

/**
 * The written forms of `phrases` as a trie searched in code (prose/phrase-trie.ts), with exactly
 * the matches of `/(?<![\p{L}\p{N}])(?:form|form...)(?![\p{L}\p{N}])/giu`, each form its words
 * joined by `[\s-]+`, the longer forms first. Such expressions (the bound words' four, the state
 * words' two; hundreds of forms each, under `iu`) cost V8 some 250 ms of a 2 KB `check` to compile
 * and run; the walk needs no compilation. Undefined when there is no form.
 */
export function phrasesTrie(phrases: readonly string[], degree: readonly string[] = []): FormsTrie | undefined {
  const trie = new FormsTrie(phrases, degree);
  return trie.empty ? undefined : trie;
}

/**
 * The forms of a list, made and put in a trie only for the first words a text holds. With the
 * words of degree put inside every verb phrase ("never went much past") the bound words have some
 * 15,600 forms; making them all and their trie cost some 100 to 160 ms of a 2 KB `check`, when a
 * sentence holds the first word of a few dozen. A form can match at a place only where its first
 * word stands whole (no letter or digit on either side: the walk's own boundaries, and every word
 * of a form is followed by a joiner or the form's end), so the trie of the forms whose first word
 * the text holds, in the same order, finds what the whole trie finds. The same forms are made in
 * the same order as for the whole list (a form and its copies share their first word), so the
 * stable sort by length puts them in the whole list's order. A first word with a character other
 * than an ASCII letter or digit is taken as held by every text.
 */
export class FormsTrie {
  /** Each variant's words, in the order the forms were made. */
  private readonly variants: string[][] = [];
  /** Indices into `variants` by their first word. */
  private readonly byFirst = new Map<string, number[]>();
  /** Variants whose first word is not plain ASCII: in every selection. */
  private readonly always: number[] = [];
  private readonly degrees: string[][];
  private readonly tries = new Map<string, PhraseTrie | undefined>();

  constructor(phrases: readonly string[], degree: readonly string[]) {
    // `degree` words may stand between two words of a phrase ("never went much past", "did not rise far above").
    this.degrees = degree.map((d) => phraseWords(d));
    for (const phrase of phrases) {
      for (const words of variantsOf(phraseWords(phrase))) {
        const index = this.variants.push(words) - 1;
        const first = words[0] as string;
        if (/^[a-z0-9]+$/u.test(first)) {
          const list = this.byFirst.get(first);
          if (list === undefined) this.byFirst.set(first, [index]);
          else list.push(index);
        } else this.always.push(index);
      }
    }
  }

  get empty(): boolean {
    return this.variants.length === 0;
  }

  /**
   * Every occurrence as [start, end], as `text.matchAll` of the forms' expression (`giu`, the
   * longer forms first) finds them: PhraseTrie.occurrences on the forms whose first word `text` holds.
   */
  occurrences(text: string): [number, number][] {
    const held = this.firstWordsIn(text);
    if (held.length === 0 && this.always.length === 0) return [];
    const key = held.join(' ');
    let trie = this.tries.get(key);
    if (trie === undefined && !this.tries.has(key)) {
      trie = this.trieOf(held);
      if (this.tries.size >= RESTRICTED_KEPT) this.tries.delete(this.tries.keys().next().value as string);
      this.tries.set(key, trie);
    }
    return trie === undefined ? [] : trie.occurrences(text);
  }

  /** The first words of this list that stand whole in `text` (its words folded as `iu` folds them to ASCII), sorted. */
  private firstWordsIn(text: string): string[] {
    const held = new Set<string>();
    const n = text.length;
    let i = 0;
    while (i < n) {
      let c = text.codePointAt(i) as number;
      if (!isWordCode(c)) {
        i += c > 0xffff ? 2 : 1;
        continue;
      }
      let word = '';
      while (i < n) {
        c = text.codePointAt(i) as number;
        if (!isWordCode(c)) break;
        // A lone surrogate is a code point of its own, as the `u` flag reads it.
        const folded = asciiFoldOf(c);
        word += folded < 0 ? '\u0000' : String.fromCharCode(folded);
        i += c > 0xffff ? 2 : 1;
      }
      if (this.byFirst.has(word)) held.add(word);
    }
    return [...held].sort();
  }

  /** The trie of the forms of the variants under `held` first words (and of those always in), as the whole list orders them. */
  private trieOf(held: readonly string[]): PhraseTrie | undefined {
    const chosen = [...this.always];
    for (const word of held) chosen.push(...(this.byFirst.get(word) ?? []));
    chosen.sort((a, b) => a - b);
    // The form as the expression wrote it (its length orders the alternation), and as the trie takes it.
    const forms = new Map<string, string>();
    const add = (words: string[]) => {
      const source = words.map((w) => w.replace(/[.*+?^${}()|[\]\\]/gu, '\\$&')).join('[\\s-]+');
      if (!forms.has(source)) forms.set(source, words.join(' '));
    };
    for (const index of chosen) {
      const words = this.variants[index] as string[];
      add(words);
      for (let k = 1; k < words.length; k += 1) for (const d of this.degrees) add([...words.slice(0, k), ...d, ...words.slice(k)]);
    }
    if (forms.size === 0) return undefined;
    const sorted = [...forms].sort((a, b) => b[0].length - a[0].length).map(([, form]) => form);
    return new PhraseTrie(sorted, { hyphens: true });
  }
}
