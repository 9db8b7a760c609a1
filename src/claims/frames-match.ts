/**
 * Finding cue phrases in a tokenized sentence. A phrase is written as plain words ("came after"),
 * with `word*` for any word starting so and `...` for a gap of up to six words inside one clause
 * ("either ... or"). A word matches a token's text or its compromise root, so "cause" also finds
 * "caused" and "causes".
 */
import type { SentenceTokens, Token } from './frames-tokens.js';

/** A compiled phrase: groups of word tests, with a gap allowed between groups. */
export interface Phrase {
  source: string;
  groups: string[][];
}

/** Where a phrase matched: positions in `SentenceTokens.words`, and UTF-16 offsets in the sentence. */
export interface PhraseHit {
  phrase: string;
  first: number;
  last: number;
  start: number;
  end: number;
}

const MAX_GAP = 6;

/** Compiles phrases once (lower-case, hyphens read as spaces, as the tokenizer does). */
export function compilePhrases(list: readonly string[]): Phrase[] {
  return list.map((source) => ({
    source,
    groups: source
      .toLowerCase()
      .replace(/-/gu, ' ')
      .split('...')
      .map((group) => group.trim().split(/\s+/u).filter((w) => w.length > 0))
      .filter((group) => group.length > 0),
  }));
}

function wordMatches(test: string, token: Token): boolean {
  if (test.endsWith('*')) return token.text.startsWith(test.slice(0, -1));
  return token.text === test || token.root === test;
}

function groupAt(sentence: SentenceTokens, group: string[], at: number): boolean {
  return group.every((test, k) => {
    const index = sentence.words[at + k];
    return index !== undefined && wordMatches(test, sentence.tokens[index] as Token);
  });
}

function matchFrom(sentence: SentenceTokens, phrase: Phrase, at: number): number | undefined {
  let position = at;
  const clause = sentence.tokens[sentence.words[at] ?? 0]?.clause;
  for (const [g, group] of phrase.groups.entries()) {
    const limit = g === 0 ? position : position + MAX_GAP;
    let found: number | undefined;
    for (let p = position; p <= limit && p < sentence.words.length; p += 1) {
      if (g > 0 && sentence.tokens[sentence.words[p] as number]?.clause !== clause) break;
      if (groupAt(sentence, group, p)) {
        found = p;
        break;
      }
    }
    if (found === undefined) return undefined;
    position = found + group.length;
  }
  return position - 1;
}

/** Every place where one of `phrases` matches, ordered by start; the longest first at one start. */
export function findPhrases(sentence: SentenceTokens, phrases: readonly Phrase[]): PhraseHit[] {
  const hits: PhraseHit[] = [];
  for (let at = 0; at < sentence.words.length; at += 1) {
    for (const phrase of phrases) {
      if (phrase.groups.length === 0) continue;
      const last = matchFrom(sentence, phrase, at);
      if (last === undefined) continue;
      const startToken = sentence.tokens[sentence.words[at] as number] as Token;
      const endToken = sentence.tokens[sentence.words[last] as number] as Token;
      hits.push({ phrase: phrase.source, first: at, last, start: startToken.start, end: endToken.end });
    }
  }
  hits.sort((a, b) => a.start - b.start || b.end - a.end);
  // "cause" and "caused" both find "caused": keep one hit per stretch.
  return hits.filter((h, i) => i === 0 || h.start !== hits[i - 1]?.start || h.end !== hits[i - 1]?.end);
}

/** The clause number of the word at position `position` of `sentence.words`. */
export function clauseOf(sentence: SentenceTokens, position: number): number {
  return sentence.tokens[sentence.words[position] ?? 0]?.clause ?? 0;
}

/** True when one of `negation` stands among the `window` words before `position`, in the same clause. */
export function isNegated(sentence: SentenceTokens, position: number, negation: readonly Phrase[], window = 3): boolean {
  const clause = clauseOf(sentence, position);
  for (let p = position - 1; p >= Math.max(0, position - window); p -= 1) {
    if (clauseOf(sentence, p) !== clause) return false;
    if (negation.some((phrase) => phrase.groups.length === 1 && groupAt(sentence, phrase.groups[0] as string[], p))) return true;
  }
  return false;
}
