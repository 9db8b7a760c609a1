import { PhraseTrie } from './phrase-trie.js';

/**
 * A compiled matcher for the topic words of the loaded packs: one case-insensitive regular
 * expression, built once, run over a whole file to skip drafts that never mention the subject and
 * over each sentence to pick the candidates that the slower stages see.
 */
export interface TopicMatcher {
  /** True when the text contains at least one topic word on word boundaries. */
  test(text: string): boolean;
}

/**
 * Characters a matcher walks before it compiles its expression: the walk costs some 20 ms a
 * megabyte more than the compiled expression, which costs 50 to 90 ms once, so half a megabyte of
 * walking adds about 10 ms to a long run and a short `check` never compiles.
 */
const WALK_LIMIT = 500_000;

/** Matchers made in this run, by word list: the engine and the reasoning stage ask for the packs' one list. */
const made = new WeakMap<readonly string[], TopicMatcher>();

/**
 * Builds the matcher, once per word list. It answers exactly what `topicPattern(words, 'iu').test`
 * answers, walking the words' trie in code (prose/phrase-trie.ts) instead of compiling that
 * expression, which V8 did on its first use at 60 to 90 ms per word list, in every `check`, until
 * it has read enough text for the expression to pay.
 */
export function createTopicMatcher(words: readonly string[]): TopicMatcher {
  const known = made.get(words);
  if (known !== undefined) return known;
  const unique = uniqueWords(words);
  let matcher: TopicMatcher = { test: () => false };
  if (unique.length > 0) {
    // Both answer alike; the walk costs nothing to make and the expression runs some five times
    // faster per byte once compiled, so the expression takes over after half a megabyte of text
    // (a folder's raw files), and a short `check` never compiles it.
    const trie = new PhraseTrie(unique);
    let pattern: RegExp | undefined;
    let walked = 0;
    matcher = {
      test(text) {
        if (pattern !== undefined) return pattern.test(text);
        walked += text.length;
        if (walked > WALK_LIMIT) pattern = topicPattern(unique, 'iu');
        return trie.test(text);
      },
    };
  }
  made.set(words, matcher);
  return matcher;
}

/**
 * The matcher's one regular expression (with `flags`, e.g. `giu` to find every hit); undefined for
 * no words. The words are written as a trie ("co2|core|cores" as `co(?:2|re(?:s)?)`), so that at each
 * place in a text the engine tries a handful of first letters instead of every word: with a lexicon
 * of a thousand inflected phrases, a plain alternation ran at a few hundred KB/s. A longer word still
 * wins over its prefix (the optional rest is greedy), and the word-boundary checks are unchanged.
 */
export function topicPattern(words: readonly string[], flags: string): RegExp | undefined {
  const unique = uniqueWords(words);
  if (unique.length === 0) return undefined;
  const root: Trie = new Map();
  for (const word of unique) {
    let node = root;
    // A run of white space is one unit (`\s+`); every other code point is one unit.
    for (const [unit, space] of word.matchAll(UNIT)) {
      const key = space === undefined ? unit : ' ';
      let next = node.get(key);
      if (next === undefined) {
        next = new Map();
        node.set(key, next);
      }
      node = next;
    }
    node.set(END, new Map());
  }
  return new RegExp(`(?<![\\p{L}\\p{N}])(?:${trieSource(root)})(?![\\p{L}\\p{N}])`, flags);
}

function uniqueWords(words: readonly string[]): string[] {
  return [...new Set(words.map((w) => w.trim().toLowerCase()).filter((w) => w.length > 0))];
}

type Trie = Map<string, Trie>;
const END = '';
const UNIT = /(\s+)|[^\s]/gu;

// Written with loops and a cache of unit sources: a thousand inflected phrases make some ten
// thousand nodes, and this runs at the start of every run.
function trieSource(node: Trie): string {
  let first: string | undefined;
  let branches: string[] | undefined;
  for (const [key, child] of node) {
    if (key === END) continue;
    const branch = unitSource(key) + trieSource(child);
    if (first === undefined) first = branch;
    else (branches ??= [first]).push(branch);
  }
  if (first === undefined) return '';
  const body = branches === undefined ? first : `(?:${branches.join('|')})`;
  if (!node.has(END)) return body;
  return `${branches === undefined ? `(?:${body})` : body}?`;
}

const unitSources = new Map<string, string>();

function unitSource(unit: string): string {
  let source = unitSources.get(unit);
  if (source === undefined) {
    source = unit === ' ' ? '\\s+' : unit.replace(/[.*+?^${}()|[\]\\/]/gu, '\\$&');
    unitSources.set(unit, source);
  }
  return source;
}
