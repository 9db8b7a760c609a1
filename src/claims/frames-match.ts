/**
 * Finding cue phrases in a tokenized sentence. A phrase is written as plain words ("came after"),
 * with `word*` for any word starting so and `...` for a gap of up to six words inside one clause
 * ("either ... or"). A word matches a token's text or its compromise root, so "cause" also finds
 * "caused" and "causes".
 */
import { IRREGULAR } from '../propositions/inflect.js';
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

/**
 * Irregular forms that compromise reads back to a root and that the lexicon's verb table
 * (propositions/inflect.ts `IRREGULAR`) does not list: noun plurals, compared adjectives and a few
 * more verbs (English grammar, common practice). Root → forms.
 */
const MORE_IRREGULAR: Readonly<Record<string, readonly string[]>> = {
  foot: ['feet'], tooth: ['teeth'], goose: ['geese'], man: ['men'], woman: ['women'], child: ['children'], person: ['people'],
  mouse: ['mice'], ox: ['oxen'], die: ['dice'], good: ['better', 'best'], well: ['better', 'best'], bad: ['worse', 'worst'],
  far: ['further', 'furthest', 'farther', 'farthest'], little: ['less', 'least'], many: ['more', 'most'], much: ['more', 'most'],
  sit: ['sat'], meet: ['met'], bind: ['bound'], blow: ['blew', 'blown'], fly: ['flew', 'flown'], eat: ['ate', 'eaten'],
  buy: ['bought'], choose: ['chose', 'chosen'], arise: ['arose', 'arisen'], dig: ['dug'], fling: ['flung'], kneel: ['knelt'],
  sing: ['sang', 'sung'], ring: ['rang', 'rung'], spring: ['sprang', 'sprung'], sting: ['stung'], stink: ['stank', 'stunk'],
  steal: ['stole', 'stolen'], strive: ['strove', 'striven'], sneak: ['snuck'], speed: ['sped'], bleed: ['bled'], creep: ['crept'],
  cling: ['clung'], wring: ['wrung'], dive: ['dove'], behold: ['beheld'], uphold: ['upheld'], seek: ['sought'],
  // Roots compromise's suffix rules give words of another stem: "fold" read as a past "fell", "look" as "lake".
  fell: ['fold'], lake: ['look'],
};

/**
 * True when a word written `text` (as the tokenizer writes it) may match the cue word `test` once
 * compromise's root of it is read, so that a sentence without such a word for some word of a
 * phrase cannot hold the phrase, whatever compromise says. compromise takes a word's root from the
 * word by its tag (plural, past, gerund, present, comparative, superlative, adverb, possessive,
 * copula), with suffix rules that keep the word's first letters, and tables of irregular forms.
 * So a word may match when it is the cue word, when it starts with the cue word's first three
 * letters (all but the last of a word of three or fewer: "aging" for "age"), when it is one of
 * the cue word's irregular forms (propositions/inflect.ts and `MORE_IRREGULAR`: "went" for "go",
 * "feet" for "foot"), when it is the plural in -es of a cue word in -is ("axes" for "axis"), when the cue word is the copula ("is", "be": any form of it, "'s" too),
 * and whenever the word holds an apostrophe (compromise splits "it's" and "we've" and gives the
 * word the root of a part). A word ending in `*` matches the text alone, as `wordMatches` does.
 * test/claims/cue-presence.test.ts tries every word form of compromise's lexicon under each root
 * rule against the built-in pack's cue words, and the roots compromise gives in context on the
 * sentences of our prose.
 */
export function mayMatchWord(test: string, text: string): boolean {
  if (test.endsWith('*')) return text.startsWith(test.slice(0, -1));
  if (text === test || test === 'is' || test === 'be' || text.includes("'") || text.includes('’')) return true;
  if (text.startsWith(test.slice(0, Math.max(1, Math.min(3, test.length - 1))))) return true;
  // Greek and Latin plurals in -es of a word in -is ("axes" of "axis", "bases" of "basis").
  if (test.endsWith('is') && text === `${test.slice(0, -2)}es`) return true;
  return (IRREGULAR[test]?.includes(text) ?? false) || (MORE_IRREGULAR[test]?.includes(text) ?? false);
}

/**
 * False when some word of `phrase` has no word of the sentence that may match it (`mayMatchWord`):
 * then `findPhrases` finds no hit of it, with compromise's roots or without. `sentence` needs no
 * roots (tokenizeSentence with `null`). compromise reads a word with a prefix before a hyphen as one
 * term ("re-read"), and its root ("reread") goes to the first word: such a word is tried joined
 * with the words after it, up to the last hyphen.
 */
export function mayMatchPhrase(sentence: SentenceTokens, phrase: Phrase): boolean {
  if (phrase.groups.length === 0) return false;
  const texts = wordTexts(sentence);
  return phrase.groups.every((group) => group.every((test) => texts.some((text) => mayMatchWord(test, text))));
}

const HYPHENS = new Set(['-', '\u2010', '\u2011']);
const textsOf = new WeakMap<SentenceTokens, string[]>();

/** The words of a sentence (and the letters of a word that opens with a number), and each word joined with the words after it across hyphens. */
function wordTexts(sentence: SentenceTokens): string[] {
  const known = textsOf.get(sentence);
  if (known !== undefined) return known;
  const texts: string[] = [];
  const words = sentence.words.map((w) => sentence.tokens[w] as Token);
  words.forEach((t, i) => {
    texts.push(t.text);
    // A unit written onto its number ("800kyr", "6c"): its letters are a word too.
    const tail = /^\d[\d.,]*(\p{L}.*)$/u.exec(t.text)?.[1];
    if (tail !== undefined) texts.push(tail);
    let joined = t.text;
    for (let j = i; j + 1 < words.length && HYPHENS.has(sentence.text.charAt((words[j] as Token).end)); j += 1) {
      joined += (words[j + 1] as Token).text;
      texts.push(joined);
    }
  });
  textsOf.set(sentence, texts);
  return texts;
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
