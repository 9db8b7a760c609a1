/**
 * A term phrase with words a writer put inside it: a **gapped match** (docs/binding.md). A pack lists
 * "longest ice-core record" and "goes back"; drafts write
 *
 *   "the longest peer-reviewed ice-core record"    a modifier inside a noun phrase
 *        ^^^^^^^ ~~~~~~~~~~~~~ ^^^^^^^^^^^^^^^^^
 *   "EPICA Dome C takes us all the way back"        an object pronoun and an adverb inside a phrasal verb
 *                 ^^^^^ ~~~~~~~~~~~~~~~~~~ ^^^^
 *
 * The match spans the inserted words, so nearness and vetoes see them. Two kinds of gap, decided per
 * pair of neighbouring words of a phrase from the words alone (word classes kept as data here):
 *
 * - a **modifier gap** after a word that modifies a noun (a superlative or comparative, a word with
 *   an adjective's ending, a participle, a hyphenated compound, a closed list of short adjectives),
 *   before another content word: one or two inserted words, each a modifier or a noun used as one,
 *   never a function word (determiner, preposition, conjunction, pronoun, auxiliary: a closed list),
 *   a number, a word with a capital (a name: another core, site or region), a plural or third-person
 *   form ("ice holds records"), a possessive, a region or period word of the pack's lexicon, or a
 *   word that is (part of) any term's match in the sentence ("Greenland", "CO2", a veto term);
 *   white space only between the words (no punctuation, so no clause break). Two nouns of a
 *   compound ("ice age", "sea level") take nothing between them: "the ice core age" is no ice age.
 * - a **particle gap** between a verb and its particle ("back", "up", "out", "off", "down"): an
 *   object pronoun, a short adverb from a closed list, or both ("takes us right back").
 * - a **clause gap** after "than": the subject pronoun and auxiliary of a comparison clause whose
 *   verb is left out ("lower than **it does** today", "colder than **it is** now", "lower than
 *   **they were** at present" for the pack's "lower than today", "lower than at present").
 *
 * Common practice of English grammar (pre-modifiers of a noun; the object of a phrasal verb stands
 * before its particle when it is a pronoun; a comparison clause after "than" keeps its subject and
 * auxiliary and drops the rest, "than it does today" = "than today"); the lists are closed classes,
 * not sentences.
 */
import { NUMBER_WORDS } from '../quantities/number-words.js';
import { isWordCode } from '../prose/phrase-trie.js';
import { phraseWords, variantsOf } from '../propositions/lexicon.js';
import type { LoadedPacks } from '../rulepack/types.js';

/** Words that never stand inside a noun phrase between its modifiers and its head (closed classes). */
const FUNCTION_WORDS = new Set([
  // determiners, quantifiers and pronouns
  'a', 'an', 'the', 'this', 'that', 'these', 'those', 'its', 'their', 'his', 'her', 'our', 'your', 'my', 'it', 'they', 'them', 'he', 'she',
  'we', 'us', 'you', 'i', 'me', 'him', 'one', 'ones', 'some', 'any', 'no', 'none', 'all', 'both', 'each', 'every', 'either', 'neither',
  'few', 'several', 'many', 'much', 'more', 'most', 'less', 'least', 'other', 'another', 'such', 'same', 'what', 'which', 'who', 'whom',
  'whose', 'whatever', 'itself', 'themselves',
  // prepositions and particles
  'of', 'in', 'on', 'at', 'by', 'for', 'with', 'from', 'to', 'into', 'onto', 'over', 'under', 'about', 'around', 'across', 'through',
  'throughout', 'during', 'before', 'after', 'since', 'until', 'till', 'between', 'among', 'against', 'toward', 'towards', 'within',
  'without', 'beyond', 'below', 'above', 'behind', 'near', 'like', 'unlike', 'than', 'as', 'per', 'via', 'back', 'up', 'down', 'out',
  'off', 'away', 'along', 'upon',
  // conjunctions and clause words
  'and', 'or', 'but', 'nor', 'so', 'yet', 'if', 'because', 'while', 'whereas', 'although', 'though', 'when', 'where', 'whether', 'then',
  'there', 'here', 'how', 'why', 'thus', 'hence', 'however', 'also', 'still', 'only', 'just', 'even', 'already', 'ever', 'never', 'not',
  'now', 'too', 'very', 'again', 'once',
  // auxiliaries and modals
  'is', 'are', 'was', 'were', 'be', 'been', 'being', 'am', 'has', 'have', 'had', 'having', 'do', 'does', 'did', 'will', 'would', 'shall',
  'should', 'can', 'could', 'may', 'might', 'must',
  ...NUMBER_WORDS,
]);

/** Short adjectives that modify a noun without an adjective's ending (a closed list). */
const ADJECTIVES = new Set([
  'last', 'first', 'next', 'late', 'early', 'old', 'new', 'long', 'short', 'deep', 'high', 'low', 'warm', 'cold', 'cool', 'mean', 'full',
  'big', 'great', 'whole', 'entire', 'past', 'modern', 'present', 'recent', 'current', 'main', 'true', 'total', 'average',
]);

/** Endings of words that modify a noun: superlatives, comparatives, adjectives, participles. */
const MODIFIER_ENDINGS = ['est', 'er', 'al', 'ic', 'ical', 'ous', 'ive', 'ary', 'ful', 'less', 'ent', 'ant', 'ern', 'ed', 'ing', 'ian', 'ible', 'able'];

/** Particles of a phrasal verb: a pronoun object or a short adverb may stand before them. */
const PARTICLES = new Set(['back', 'up', 'out', 'off', 'down']);
/** Object pronouns that stand between a phrasal verb and its particle ("takes us back"). */
const OBJECT_PRONOUNS = new Set(['us', 'you', 'them', 'me', 'him', 'her', 'it']);
/** Short adverbs that stand before a particle ("goes all the way back", "reaches right back"). */
const PARTICLE_ADVERBS = [['all', 'the', 'way'], ['right'], ['straight'], ['way'], ['well'], ['even'], ['much'], ['far'], ['nearly'], ['almost'], ['fully']];

/** Subject pronouns that open a comparison clause after "than" ("than it does today"). */
const CLAUSE_SUBJECTS = new Set(['it', 'they', 'we', 'he', 'she', 'you', 'i']);
/** Auxiliaries that stand for a comparison clause's verb ("than it does today", "than they were then"). */
const CLAUSE_AUXILIARIES = new Set(['is', 'are', 'was', 'were', 'am', 'does', 'do', 'did', 'has', 'have', 'had']);

/** Words a modifier gap may hold at most, in all. */
const MAX_INSERTED = 2;

type Gap = 'none' | 'modifier' | 'particle' | 'clause';

/** A term phrase with at least one pair of neighbouring words that may take words between them. */
interface GappedPhrase {
  term: string;
  words: string[];
  /** `gaps[k]`: what may stand between `words[k]` and `words[k + 1]`. */
  gaps: Gap[];
}

/** One word of a sentence: lower case, with its offsets and whether only white space stands before it. */
interface Token {
  text: string;
  start: number;
  end: number;
  /** Only white space between this word and the one before. */
  joined: boolean;
  capital: boolean;
}

/** A phrase word that is one token of tokensOf. */
const ONE_TOKEN = /^[\p{L}\p{N}]+(?:[-'][\p{L}\p{N}]+)*$/u;

const isContent = (w: string): boolean => !FUNCTION_WORDS.has(w) && !/\d/u.test(w);

/** True when `w` is a word that modifies the noun after it. */
function modifies(w: string): boolean {
  if (w.includes('-')) return true;
  return ADJECTIVES.has(w) || MODIFIER_ENDINGS.some((e) => w.length > e.length + 2 && w.endsWith(e));
}

/** What may stand between neighbouring words `a` and `b` of a phrase. */
function gapBetween(a: string, b: string): Gap {
  if (a === 'than') return 'clause';
  if (PARTICLES.has(b) && isContent(a)) return 'particle';
  if (isContent(a) && isContent(b) && !PARTICLES.has(a) && modifies(a)) return 'modifier';
  return 'none';
}

/** True when `text` from `from` to `to` is white space alone (and not empty). */
function onlySpace(text: string, from: number, to: number): boolean {
  if (from >= to) return false;
  for (let i = from; i < to; i += 1) {
    const c = text.charCodeAt(i);
    if (c === 32 || (c >= 9 && c <= 13)) continue;
    if (c < 128 || !/\s/u.test(text[i] as string)) return false;
  }
  return true;
}

/** The words of `text` as the gapped search cuts them: letters and digits, joined inside a word by a hyphen or an apostrophe. */
export function tokensOf(text: string): Token[] {
  const out: Token[] = [];
  const n = text.length;
  let i = 0;
  let last = 0;
  while (i < n) {
    const c = text.codePointAt(i) as number;
    if (!isWordCode(c)) {
      i += c > 0xffff ? 2 : 1;
      continue;
    }
    const start = i;
    for (;;) {
      while (i < n && isWordCode(text.codePointAt(i) as number)) i += (text.codePointAt(i) as number) > 0xffff ? 2 : 1;
      const joiner = text[i];
      if ((joiner === '-' || joiner === "'" || joiner === '’') && i + 1 < n && isWordCode(text.codePointAt(i + 1) as number)) i += 1;
      else break;
    }
    const word = text.slice(start, i);
    const lower = word.toLowerCase();
    out.push({ text: lower.includes('’') ? lower.replaceAll('’', "'") : lower, start, end: i, joined: out.length > 0 && onlySpace(text, last, start), capital: word !== lower });
    last = i;
  }
  return out;
}

/** The pack's term phrases that may take words inside, indexed by their first word; and the lexicon's region and period words. */
export class GappedTerms {
  private readonly byFirst = new Map<string, GappedPhrase[]>();
  /**
   * The phrases of each first word not yet read into `byFirst`: a word's entries are made when a
   * sentence first holds it (a 2 KB draft meets a few dozen of the some 3,800 phrases' first
   * words), in the order the constructor met them, so each list is the one made up front before.
   */
  private readonly pending = new Map<string, { term: string; words: string[]; names: () => ReadonlySet<string> }[]>();
  private placesMade: Set<string> | undefined;

  /**
   * `terms`: each term (its id as its hits count), with its forms (variants and inflections) and
   * the phrases the pack wrote: a word the pack writes with a capital is a name ("Dronning Maud
   * Land", "Younger Dryas"), which takes no modifier beside it.
   */
  constructor(
    terms: Iterable<{ term: string; forms: readonly string[]; written: readonly string[] }>,
    private readonly packs: LoadedPacks,
  ) {
    for (const { term, forms, written } of terms) {
      let names: Set<string> | undefined;
      const namesOf = (): ReadonlySet<string> => (names ??= new Set(written.flatMap((p) => p.split(/\s+/u).filter((w) => w !== w.toLowerCase()).map((w) => w.toLowerCase()))));
      for (const phrase of forms) {
        if (!phrase.includes(' ')) continue;
        const words = phrase.toLowerCase().replaceAll('’', "'").split(/\s+/u);
        const list = this.pending.get(words[0] as string);
        const entry = { term, words, names: namesOf };
        if (list === undefined) this.pending.set(words[0] as string, [entry]);
        else list.push(entry);
      }
    }
  }

  /** The phrases that start with `word` and may take words inside, made on the word's first question. */
  entriesOf(word: string): readonly GappedPhrase[] | undefined {
    const made = this.byFirst.get(word);
    if (made !== undefined) return made;
    const waiting = this.pending.get(word);
    if (waiting === undefined) return undefined;
    this.pending.delete(word);
    const list: GappedPhrase[] = [];
    for (const { term, words, names } of waiting) {
      // Only words the sentence's tokens can equal: letters and digits, joined by a hyphen or an apostrophe.
      if (!words.every((w) => ONE_TOKEN.test(w))) continue;
      const gaps = words.slice(1).map((b, k) => {
        const gap = gapBetween(words[k] as string, b);
        return gap === 'modifier' && (names().has(words[k] as string) || names().has(b)) ? 'none' : gap;
      });
      if (gaps.every((g) => g === 'none')) continue;
      list.push({ term, words, gaps });
    }
    if (list.length === 0) return undefined;
    this.byFirst.set(word, list);
    return list;
  }

  /** "the longest polar record", "the oldest deglacial record": a region or a period narrows the subject. */
  private get places(): Set<string> {
    if (this.placesMade === undefined) {
      const lexicon = this.packs.lexicon;
      const phrases = [...Object.values(lexicon['regions'] ?? {}), ...Object.values(lexicon['periods'] ?? {})].flat();
      this.placesMade = new Set(phrases.flatMap((p) => variantsOf(phraseWords(p)).map((w) => w.join(' '))));
    }
    return this.placesMade;
  }

  /** How many phrases may take words inside (for tests). */
  get size(): number {
    for (const word of [...this.pending.keys()]) this.entriesOf(word);
    return [...this.byFirst.values()].reduce((n, l) => n + l.length, 0);
  }

  /**
   * The gapped matches in `sentence` by term id: only matches with words inside (the exact search
   * finds the rest). `taken` are the spans of every term's exact matches: an inserted word inside
   * one names something of its own.
   */
  search(sentence: string, taken: readonly [number, number][]): Map<string, [number, number][]> {
    const found = new Map<string, [number, number][]>();
    const tokens = tokensOf(sentence);
    for (let i = 0; i < tokens.length; i += 1) {
      const entries = this.entriesOf((tokens[i] as Token).text);
      if (entries === undefined) continue;
      for (const entry of entries) {
        const end = this.matchFrom(tokens, i, entry, taken);
        if (end === undefined) continue;
        const span: [number, number] = [(tokens[i] as Token).start, (tokens[end] as Token).end];
        const spans = found.get(entry.term) ?? [];
        if (!spans.some(([s, e]) => s === span[0] && e === span[1])) spans.push(span);
        found.set(entry.term, spans);
      }
    }
    return found;
  }

  /** The index of the last word of `entry` matched from token `i` with at least one word inside, else undefined. */
  private matchFrom(tokens: readonly Token[], i: number, entry: GappedPhrase, taken: readonly [number, number][]): number | undefined {
    let at = i;
    let inserted = 0;
    for (let k = 1; k < entry.words.length; k += 1) {
      const want = entry.words[k] as string;
      const next = tokens[at + 1];
      if (next === undefined || !next.joined) return undefined;
      if (next.text === want) {
        at += 1;
        continue;
      }
      const gap = entry.gaps[k - 1];
      const width = gap === 'modifier' ? this.modifierGap(tokens, at + 1, want, MAX_INSERTED - inserted, taken) : gap === 'particle' ? particleGap(tokens, at + 1, want) : gap === 'clause' ? clauseGap(tokens, at + 1, want) : undefined;
      if (width === undefined) return undefined;
      inserted += width;
      at += width + 1;
    }
    return inserted > 0 ? at : undefined;
  }

  /** How many words from `from` form a modifier gap before a word `want`, at most `room`; undefined for none. */
  private modifierGap(tokens: readonly Token[], from: number, want: string, room: number, taken: readonly [number, number][]): number | undefined {
    for (let width = 1; width <= room; width += 1) {
      const inside = tokens.slice(from, from + width);
      const after = tokens[from + width];
      if (inside.length < width || !inside.every((t) => t.joined && this.mayModify(t)) || after === undefined || !after.joined || after.text !== want) continue;
      // "the oldest ice preserved records": a participle after a noun inside the gap is a verb.
      if (width === 2 && (inside[1] as Token).text.endsWith('ed') && !(inside[0] as Token).text.endsWith('ly') && !(inside[1] as Token).text.includes('-')) continue;
      if (width === 2 && this.places.has(inside.map((t) => t.text).join(' '))) continue;
      const [s, e] = [(inside[0] as Token).start, (inside.at(-1) as Token).end];
      // An inserted word that is (part of) a term's match names a subject, a place or a veto of its own.
      if (taken.some(([ts, te]) => ts < e && te > s)) continue;
      return width;
    }
    return undefined;
  }

  /** An inserted word of a modifier gap: a content word in lower case that is no plural or verb in -s, no possessive, no place or period. */
  private mayModify(t: Token): boolean {
    const w = t.text;
    if (t.capital || !isContent(w) || w.includes("'") || this.places.has(w)) return false;
    return !w.endsWith('s') || ['ss', 'us', 'is'].some((e) => w.endsWith(e));
  }
}

/** How many words from `from` form a particle gap before the particle `want` (a pronoun, an adverb, or both); undefined for none. */
function particleGap(tokens: readonly Token[], from: number, want: string): number | undefined {
  const pronoun = OBJECT_PRONOUNS.has(tokens[from]?.text ?? '') ? 1 : 0;
  for (const adverb of [[], ...PARTICLE_ADVERBS]) {
    const width = pronoun + adverb.length;
    if (width === 0) continue;
    const inside = tokens.slice(from, from + width);
    const after = tokens[from + width];
    if (inside.length < width || !inside.every((t) => t.joined) || after === undefined || !after.joined || after.text !== want) continue;
    if (adverb.every((w, k) => inside[pronoun + k]?.text === w)) return width;
  }
  return undefined;
}

/** Two words from `from` that are a comparison clause's subject pronoun and auxiliary before `want` ("than it does today"); undefined for none. */
function clauseGap(tokens: readonly Token[], from: number, want: string): number | undefined {
  const [subject, auxiliary, after] = [tokens[from], tokens[from + 1], tokens[from + 2]];
  if (subject === undefined || auxiliary === undefined || after === undefined) return undefined;
  if (!subject.joined || !auxiliary.joined || !after.joined || after.text !== want) return undefined;
  return CLAUSE_SUBJECTS.has(subject.text) && CLAUSE_AUXILIARIES.has(auxiliary.text) ? 2 : undefined;
}
