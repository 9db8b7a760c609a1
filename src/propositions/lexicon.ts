/**
 * The packs' lexicon compiled for matching: every phrase with its inflections (inflect.ts, once
 * per run), indexed by first word. A sentence is matched word by word, so a
 * phrase matches wherever its words stand in sequence, whatever the sentence around it says.
 *
 *   lexicon.causes.verbs: [drive]  →  "drive", "drives", "drove", "driven", "driving"
 *   lexicon.uptake.in: [take up]   →  "took up", "takes up", "taking up", "taken up"
 */
import { termVariants } from '../claims/term-variants.js';
import { inflect } from './inflect.js';
import { readWordForms } from './word-forms.js';
import type { Lexicon, LoadedPacks } from '../rulepack/types.js';

/** One lexicon phrase found in a sentence: its class and key, and the word indices it covers. */
export interface LexHit {
  cls: string;
  key: string;
  first: number;
  last: number;
  /** The lexicon's phrase as written (its base form), whatever inflection the draft used. */
  base?: string;
}

/** A compiled lexicon: `find` returns every phrase hit in a list of lower-case words. */
export interface CompiledLexicon {
  find(words: readonly string[]): LexHit[];
  /** The phrases of one class and key as written, lower-case (for tests and docs). */
  phrases(cls: string, key: string): readonly string[];
}

/** One written form of a phrase, under its first word: the words after it, the phrase's class and key. */
export interface Entry {
  rest: string[];
  cls: string;
  key: string;
  /** The phrase as the lexicon writes it. */
  base: string;
}

/** Grammar words that keep their form inside a phrase ("take up" inflects "take", not "up"). */
const FIXED = new Set([
  'a', 'an', 'the', 'of', 'to', 'in', 'on', 'up', 'down', 'off', 'out', 'by', 'as', 'than', 'and', 'or', 'at',
  'for', 'with', 'into', 'from', 'that', 'it', 'its', 'each', 'every', 'more', 'less', 'most', 'least', 'no',
  'not', 'same', 'one', 'other', 'another', 'both', 'ways', 'all', 'only', 'just', 'ever', 'so', 'if', 'what',
  'be', 'is', 'are', 'was', 'were', 'had', 'has', 'have', 'would', 'might', 'could', 'can', 'we', 'they', 'you',
]);

/** A word or number token as the sentence tokenizer cuts it (hyphens separate words). */
const WORD = /[\p{L}\p{N}₂]+(?:['’][\p{L}]+)*/gu;

/** Splits a phrase into lower-case words the way sentences are split. */
export function phraseWords(phrase: string): string[] {
  // `match` with the global flag gives each match's text, as matchAll's m[0] would, without a
  // match object for each word (called for every phrase of the lexicon on a run's first sentence).
  return phrase.toLowerCase().replace(/’/gu, "'").match(WORD) ?? [];
}

/** A word with its inflections, unless it is a grammar word that keeps its form. */
export function formsOf(word: string): string[] {
  return FIXED.has(word) ? [word] : inflect(word);
}

/**
 * Every written form of a phrase ("all the work" is also "all of the work"). Up to three content words inflect together ("rise and fall
 * together" → "rising and falling together"); in longer phrases the first and last words inflect.
 */
export function variantsOf(words: string[]): string[][] {
  // Made once per phrase and process, shared by every caller (frozen: none may change them); the
  // built-in pack's terms and subject phrases come made from the build (word-forms.ts).
  if (words.some((w) => w.includes(' '))) return derivedVariants(words);
  const key = words.join(' ');
  variants ??= readWordForms(new URL('../generated/word-forms.json', import.meta.url), import.meta.url) ?? new Map();
  let forms = variants.get(key);
  if (forms === undefined) {
    forms = derivedVariants(words);
    variants.set(key, forms);
  }
  return forms;
}

/** The phrases whose forms this process made or read (scripts/build-generated.js stores them). */
export function variantsMade(): ReadonlyMap<string, string[][]> {
  return variants ?? new Map();
}

/** A phrase's forms, each a list of words: by the phrase's words joined by spaces. */
let variants: Map<string, string[][]> | undefined;

/** variantsOf's answer, made from the rules of inflection (frozen, as it is shared). */
export function derivedVariants(words: string[]): string[][] {
  const other = ofTurned(words);
  const forms = other === undefined ? formsOfWords(words) : [...formsOfWords(words), ...formsOfWords(other)];
  for (const form of forms) Object.freeze(form);
  return Object.freeze(forms) as string[][];
}

/** Quantifiers that take "the" with or without "of" ("all the work", "all of the work"). */
const OPTIONAL_OF = new Set(['all', 'both', 'half']);

/** The phrase with "of" put in after "all"/"both"/"half" before "the", or taken out; undefined when it has neither. */
function ofTurned(words: string[]): string[] | undefined {
  for (let i = 0; i + 1 < words.length; i += 1) {
    if (!OPTIONAL_OF.has(words[i] as string)) continue;
    if (words[i + 1] === 'the') return [...words.slice(0, i + 1), 'of', ...words.slice(i + 1)];
    if (words[i + 1] === 'of' && words[i + 2] === 'the') return [...words.slice(0, i + 1), ...words.slice(i + 2)];
  }
  return undefined;
}

function formsOfWords(words: string[]): string[][] {
  if (words.length === 0) return [];
  const content = words.filter((w) => !FIXED.has(w)).length;
  if (content <= 3) {
    // A word's forms are derived once, not once for each form of the words before it (inflect is a
    // pure function of the word): the same products in the same order.
    return words.reduce<string[][]>((acc, word) => {
      const forms = formsOf(word);
      return acc.flatMap((prefix) => forms.map((f) => [...prefix, f]));
    }, [[]]);
  }
  const first = formsOf(words[0] as string);
  if (words.length === 1) return first.map((f) => [f]);
  const last = formsOf(words.at(-1) as string);
  const middle = words.slice(1, -1);
  const out: string[][] = [];
  for (const f of first) out.push([f, ...middle, words.at(-1) as string]);
  for (const l of last) out.push([words[0] as string, ...middle, l]);
  return out;
}

const cache = new WeakMap<LoadedPacks, CompiledLexicon>();

/** The packs' lexicon compiled (once per packs object). */
export function compileLexicon(packs: LoadedPacks): CompiledLexicon {
  const hit = cache.get(packs);
  if (hit !== undefined) return hit;
  const compiled = compile(packs.lexicon);
  cache.set(packs, compiled);
  return compiled;
}

/** Compiles a lexicon given as data (tests use small ones). */
export function compile(lexicon: Lexicon): CompiledLexicon {
  const index = lexiconIndex(lexicon);
  return {
    // "Earth's orbit", "Greenland's cores": a possessive matches the word it is made from.
    find: (words) => findHits(index, words.map((w) => w.replace(/'s$/u, ''))),
    phrases: (cls, key) => (lexicon[cls]?.[key] ?? []).map((p) => p.toLowerCase()),
  };
}

const NO_ENTRIES: readonly Entry[] = [];

/** One phrase of the lexicon, with its written forms once they are asked for. */
interface Phrase {
  cls: string;
  key: string;
  words: string[];
  variants?: string[][];
}

/**
 * The lexicon's index (every written form of every phrase, by its first word), made one first word
 * at a time, when a sentence first holds that word: a short draft asks for a few dozen of the
 * thousands of first words, and making every form of every phrase up front cost more than checking
 * the draft. A phrase's forms all begin with a form of its first word (variantsOf), so the phrases
 * are listed under those at the start, and each word's entries are those the whole index would
 * hold, in the same order: phrases in lexicon order, forms in variantsOf's order, each once.
 */
export function lexiconIndex(lexicon: Lexicon): (head: string) => readonly Entry[] {
  const candidates = new Map<string, Phrase[]>();
  for (const [cls, keys] of Object.entries(lexicon)) {
    for (const [key, phrases] of Object.entries(keys)) {
      for (const phrase of phrases) {
        const words = phraseWords(phrase);
        const first = words[0];
        if (first === undefined) continue;
        const entry: Phrase = { cls, key, words };
        for (const head of new Set([first, ...formsOf(first)])) {
          const list = candidates.get(head);
          if (list === undefined) candidates.set(head, [entry]);
          else if (list.at(-1) !== entry) list.push(entry);
        }
      }
    }
  }
  const index = new Map<string, Entry[]>();
  return (head) => {
    const known = index.get(head);
    if (known !== undefined) return known;
    const listed = candidates.get(head);
    // Other words are not kept: an editor's session meets every word of its drafts.
    if (listed === undefined) return NO_ENTRIES;
    const entries: Entry[] = [];
    const seen = new Set<string>();
    for (const phrase of listed) {
      for (const words of (phrase.variants ??= variantsOf(phrase.words))) {
        if (words[0] !== head) continue;
        const id = `${phrase.cls}\u0000${phrase.key}\u0000${words.join(' ')}`;
        if (seen.has(id)) continue;
        seen.add(id);
        entries.push({ rest: words.slice(1), cls: phrase.cls, key: phrase.key, base: phrase.words.join(' ') });
      }
    }
    index.set(head, entries);
    return entries;
  };
}

/** Every hit; at one start, one class and key keeps only its longest phrase. */
function findHits(index: (head: string) => readonly Entry[], words: readonly string[]): LexHit[] {
  const hits: LexHit[] = [];
  words.forEach((word, i) => {
    const best = new Map<string, LexHit>();
    for (const entry of index(word)) {
      if (!entry.rest.every((w, k) => words[i + 1 + k] === w)) continue;
      const last = i + entry.rest.length;
      const id = `${entry.cls}\u0000${entry.key}`;
      const known = best.get(id);
      if (known === undefined || last > known.last) best.set(id, { cls: entry.cls, key: entry.key, first: i, last, base: entry.base });
    }
    hits.push(...best.values());
  });
  return hits;
}

/**
 * The words that put a draft on topic: every form of the phrases of the entity keys listed under
 * `lexicon.subjects`, and of every period. Generic words ("percent", "record", "years") are not
 * among them, so a file about something else is skipped before it is parsed.
 */
export function subjectWordsOf(lexicon: Lexicon): string[] {
  // Made once per lexicon (some 30 to 50 ms: every inflection of 1,677 forms); the engine's subject
  // matcher and the binder's context reader both ask. A lexicon is not changed once loaded.
  let words = subjectWords.get(lexicon);
  if (words === undefined) {
    const keys = (lexicon['subjects']?.['all'] ?? []).map((k) => k.toLowerCase());
    words = [...new Set([...entityWordsOf(lexicon, keys), ...formsOfPhrases(Object.values(lexicon['periods'] ?? {}).flat())])];
    subjectWords.set(lexicon, words);
  }
  return [...words];
}

const subjectWords = new WeakMap<Lexicon, string[]>();

/**
 * Every form of the phrases of the entity keys `keys` (lower-case keys of `lexicon.entities`):
 * "the air in the bubbles" names `trapped-air`, whatever inflection the draft uses.
 */
export function entityWordsOf(lexicon: Lexicon, keys: readonly string[]): string[] {
  const wanted = new Set(keys);
  return formsOfPhrases(Object.entries(lexicon['entities'] ?? {}).filter(([key]) => wanted.has(key)).flatMap(([, words]) => words));
}

/** The written forms of the phrases of lexicon class `cls` under `keys` ("causes", ["either-or"]). */
export function classWordsOf(lexicon: Lexicon, cls: string, keys: readonly string[]): string[] {
  const wanted = new Set(keys);
  return formsOfPhrases(Object.entries(lexicon[cls] ?? {}).filter(([key]) => wanted.has(key)).flatMap(([, words]) => words));
}

function formsOfPhrases(phrases: readonly string[]): string[] {
  // "that glacial max": a clipped word names the subject as the whole word does (claims/term-variants.ts).
  // A form of two or three words is also written as a compound ("the ice-age globe"): the words of a
  // phrase are cut at hyphens, so the hyphenated form is added back here.
  return [...new Set(termVariants(phrases).flatMap((p) => variantsOf(phraseWords(p)).flatMap((w) => (w.length >= 2 && w.length <= 3 && w.every((x) => /^\p{L}+$/u.test(x)) ? [w.join(' '), w.join('-')] : [w.join(' ')]))))];
}
