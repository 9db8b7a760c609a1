/**
 * A period or event named by description rather than by name: "the close of the most recent
 * glaciation", "as the last ice age drew to a close", "the warm spells between ice ages", "before
 * people began burning coal on a large scale". The pack's lexicon class `time-parts` holds the parts
 * such descriptions are made of (phases, period nouns, qualifiers, verbs of a period's course), and
 * `time-descriptions` the sequences of parts that make one, each mapped to the terms it names. Every
 * inflection of every part is derived (propositions/lexicon.ts), so a part listed once is found in
 * every form, and a description is read by walking the sentence's words part by part: the forms are
 * never multiplied out.
 *
 *   "The close of the most recent glaciation saw CO2 climb ~300 ppm"
 *        ^^^^^^^^ ^^^^^^^^^^^^^^^ ^^^^^^^^^^  end · last · glacial  → deglaciation, end
 *
 * A description names its terms over its whole span; a term of its own words that its list leaves
 * out names nothing there ("ice age" in "the end of the last ice age" is not the glacial). A
 * description whose last word begins a longer term ("the end of the last glacial cycle") is not one.
 */
import { phraseWords, variantsOf } from '../propositions/lexicon.js';
import { plural } from '../propositions/inflect.js';
import type { Lexicon, LoadedPacks } from '../rulepack/types.js';
import type { TermHits } from './bind-view.js';
import { lexiconWords } from '../prose/lexicon-words.js';

type Number = 'any' | 'one' | 'many';

/** One place of a sequence: a part, with the forms it may take there and whether it may be left out. */
interface Item {
  part: string;
  number: Number;
  optional: boolean;
}

/** One phrase of a part: runs of literal words (their forms by first word) and references to other parts. */
type Piece = { forms: Map<string, string[][]> } | { ref: Item };

interface Description {
  items: Item[];
  terms: string[];
  /** The words a description may begin with (made on first use): only these places are tried. */
  firsts?: Set<string>;
}

interface Grammar {
  parts: Map<string, string[]>;
  descriptions: Description[];
  /**
   * For each word, the parts a description needs that may begin with it, as [description, need]
   * (made on first use): a sentence with no word for one of a description's needed parts holds none.
   */
  needs?: { byWord: Map<string, [number, number][]>; counts: number[] };
  /** The pieces of each part's phrases, per number, made on first use. */
  pieces: Map<string, Piece[][]>;
}

const REF = /^<([a-z][a-z0-9-]*)>$/u;
const ITEM = /^([a-z][a-z0-9-]*)(?::(one|many))?(\?)?$/u;

/** The words a part's phrases may begin with, in one number. */
function firstWordsOfPart(grammar: Grammar, part: string, number: Number, depth = 0): Set<string> {
  const out = new Set<string>();
  if (depth > 4) return out;
  for (const pieces of piecesOf(grammar, part, number)) {
    const head = pieces[0];
    if (head === undefined) continue;
    if ('ref' in head) for (const w of firstWordsOfPart(grammar, head.ref.part, head.ref.number, depth + 1)) out.add(w);
    else for (const w of head.forms.keys()) out.add(w);
  }
  return out;
}

/** The words a sequence of items may begin with: those of its leading optional items and of the first one it needs. */
function firstWordsOf(grammar: Grammar, items: readonly Item[]): Set<string> {
  const out = new Set<string>();
  for (const item of items) {
    for (const w of firstWordsOfPart(grammar, item.part, item.number)) out.add(w);
    if (!item.optional) break;
  }
  return out;
}

/** Which needed part of which description each word may begin. */
function needsOf(grammar: Grammar): { byWord: Map<string, [number, number][]>; counts: number[] } {
  const byWord = new Map<string, [number, number][]>();
  const counts = grammar.descriptions.map((d, di) => {
    const needed = d.items.filter((item) => !item.optional);
    needed.forEach((item, ni) => {
      for (const w of firstWordsOfPart(grammar, item.part, item.number)) {
        const list = byWord.get(w);
        if (list === undefined) byWord.set(w, [[di, ni]]);
        else list.push([di, ni]);
      }
    });
    return needed.length;
  });
  return { byWord, counts };
}

/** Parses one place of a description key ("glacial:one", "the?"). */
function itemOf(text: string): Item | undefined {
  const m = ITEM.exec(text);
  if (m === null) return undefined;
  return { part: m[1] as string, number: (m[2] as Number | undefined) ?? 'any', optional: m[3] === '?' };
}

const grammars = new WeakMap<Lexicon, Grammar | null>();

function grammarOf(lexicon: Lexicon): Grammar | undefined {
  const known = grammars.get(lexicon);
  if (known !== undefined) return known ?? undefined;
  const parts = new Map(Object.entries(lexicon['time-parts'] ?? {}));
  const descriptions: Description[] = [];
  for (const [key, terms] of Object.entries(lexicon['time-descriptions'] ?? {})) {
    const items = key.split(/\s+/u).map(itemOf);
    if (items.some((i) => i === undefined || !parts.has(i.part))) continue;
    descriptions.push({ items: items as Item[], terms });
  }
  const grammar = descriptions.length === 0 ? null : { parts, descriptions, pieces: new Map() };
  grammars.set(lexicon, grammar);
  return grammar ?? undefined;
}

/** The forms of a run of literal words in one number: as written, every inflection, or the plural. */
function formsOf(words: string[], number: Number): string[][] {
  if (number === 'one') return [words];
  if (number === 'any') return variantsOf(words);
  const last = words.at(-1) as string;
  return [[...words.slice(0, -1), plural(last)]];
}

function byFirst(forms: string[][]): Map<string, string[][]> {
  const out = new Map<string, string[][]>();
  for (const f of forms) {
    const first = f[0];
    if (first === undefined) continue;
    const list = out.get(first);
    if (list === undefined) out.set(first, [f]);
    else list.push(f);
  }
  return out;
}

/** A part's phrases cut into pieces for one number (a reference inside a phrase takes any form of its part). */
function piecesOf(grammar: Grammar, part: string, number: Number): Piece[][] {
  const id = `${part}:${number}`;
  let known = grammar.pieces.get(id);
  if (known !== undefined) return known;
  known = (grammar.parts.get(part) ?? []).map((phrase) => {
    const pieces: Piece[] = [];
    let run: string[] = [];
    const flush = () => {
      if (run.length > 0) pieces.push({ forms: byFirst(formsOf(run, number)) });
      run = [];
    };
    for (const token of phrase.split(/\s+/u)) {
      const ref = REF.exec(token);
      if (ref === null) run.push(...phraseWords(token));
      else {
        flush();
        pieces.push({ ref: { part: ref[1] as string, number: 'any', optional: false } });
      }
    }
    flush();
    return pieces;
  });
  grammar.pieces.set(id, known);
  return known;
}

interface Token {
  word: string;
  start: number;
  end: number;
}

/** The sentence's words as the lexicon cuts them, a possessive read as its word ("Earth's" is "earth"). */
function tokensOf(sentence: string): Token[] {
  return lexiconWords(sentence).map((w) => ({ word: w.text.replace(/'s$/u, ''), start: w.start, end: w.end }));
}

const ARTICLES = new Set(['the', 'a', 'an']);

/** A description's words follow one another with nothing but spaces and hyphens between: no clause break. */
const JOIN = /^[\s-]*$/u;

/** Reads one sentence's words against the grammar, remembering each part's ends at each place. */
class Reader {
  private readonly memo = new Map<string, number[]>();
  private readonly joined: boolean[];

  constructor(
    private readonly grammar: Grammar,
    private readonly sentence: string,
    private readonly tokens: Token[],
  ) {
    this.joined = tokens.map((t, i) => i === 0 || JOIN.test(sentence.slice((tokens[i - 1] as Token).end, t.start)));
  }

  /** The token indices where a sequence of items started at `at` may end (the start of the sequence needs no join). */
  sequence(items: readonly Item[], at: number, depth: number): number[] {
    let places = [at];
    for (const item of items) {
      const next = new Set<number>();
      for (const p of places) {
        if (item.optional) next.add(p);
        if (p !== at && p < this.tokens.length && !this.joined[p]) continue;
        for (const e of this.part(item, p, depth)) next.add(e);
      }
      places = [...next];
      if (places.length === 0) break;
    }
    return places.filter((p) => p > at);
  }

  private part(item: Item, at: number, depth: number): number[] {
    if (at >= this.tokens.length || depth > 4) return [];
    const id = `${item.part}:${item.number}:${at}`;
    let ends = this.memo.get(id);
    if (ends !== undefined) return ends;
    const found = new Set<number>();
    for (const pieces of piecesOf(this.grammar, item.part, item.number)) {
      let places = [at];
      for (const piece of pieces) {
        const next: number[] = [];
        for (const p of places) {
          if (p !== at && (p >= this.tokens.length || !this.joined[p])) continue;
          if ('ref' in piece) next.push(...this.sequence([piece.ref], p, depth + 1));
          else next.push(...this.words(piece.forms, p));
        }
        places = next;
        if (places.length === 0) break;
      }
      for (const p of places) found.add(p);
    }
    ends = [...found];
    this.memo.set(id, ends);
    return ends;
  }

  /** Where the forms whose first word stands at `at` end, each word joined to the one before. */
  private words(forms: Map<string, string[][]>, at: number): number[] {
    const out: number[] = [];
    for (const form of forms.get((this.tokens[at] as Token).word) ?? []) {
      let k = 1;
      for (; k < form.length; k += 1) {
        const t = this.tokens[at + k];
        if (t === undefined || t.word !== form[k] || !this.joined[at + k]) break;
      }
      if (k === form.length) out.push(at + form.length);
    }
    return out;
  }
}

/** One description found: its span in the sentence and the terms it names. */
export interface FoundDescription {
  start: number;
  end: number;
  terms: string[];
}

/**
 * The descriptions of periods and events in `sentence`: the longest at each place, the first listed
 * of equally long ones, and none inside a longer one.
 */
export function describedTimes(sentence: string, lexicon: Lexicon): FoundDescription[] {
  const grammar = grammarOf(lexicon);
  if (grammar === undefined) return [];
  const tokens = tokensOf(sentence);
  // Most sentences hold a word for every needed part of none of the descriptions: they are not read at all.
  const needs = (grammar.needs ??= needsOf(grammar));
  const met = grammar.descriptions.map(() => new Set<number>());
  for (const word of new Set(tokens.map((t) => t.word))) for (const [d, n] of needs.byWord.get(word) ?? []) (met[d] as Set<number>).add(n);
  const possible = grammar.descriptions.filter((_, d) => (met[d] as Set<number>).size === needs.counts[d]);
  if (possible.length === 0) return [];
  const reader = new Reader(grammar, sentence, tokens);
  const found: FoundDescription[] = [];
  for (let i = 0; i < tokens.length; i += 1) {
    let best: { last: number; terms: string[] } | undefined;
    const word = (tokens[i] as Token).word;
    for (const d of possible) {
      if (!(d.firsts ??= firstWordsOf(grammar, d.items)).has(word)) continue;
      const ends = reader.sequence(d.items, i, 0);
      const last = Math.max(...ends);
      if (ends.length > 0 && (best === undefined || last > best.last)) best = { last, terms: d.terms };
    }
    if (best === undefined) continue;
    // "The last ice age peaked": the span names the period from its first word after an article.
    const first = ARTICLES.has((tokens[i] as Token).word) && best.last > i + 1 ? i + 1 : i;
    found.push({ start: (tokens[first] as Token).start, end: (tokens[best.last - 1] as Token).end, terms: best.terms });
  }
  // Two descriptions over the same words are one (the first found); one inside a longer one is none.
  return found.filter((f, k) => !found.some((o, j) => o !== f && o.start <= f.start && o.end >= f.end && (o.end - o.start > f.end - f.start || j < k)));
}

/**
 * `hits` with the terms that the descriptions of periods and events in `sentence` name (a new map
 * when any): each description's terms over its span, the terms of its own words it leaves out gone.
 */
export function withDescribedTimes(sentence: string, hits: TermHits, packs: LoadedPacks): TermHits {
  const found = describedTimes(sentence, packs.lexicon);
  if (found.length === 0) return hits;
  const out: TermHits = new Map([...hits].map(([id, spans]) => [id, [...spans]]));
  for (const d of found) {
    // "the end of the last glacial cycle": a term that begins inside and runs on past the description
    // ("glacial cycle") is what the words name.
    if ([...hits.values()].some((spans) => spans.some(([s, e]) => s > d.start && s < d.end && e > d.end))) continue;
    for (const [id, spans] of out) {
      if (d.terms.includes(id)) continue;
      // A term over the whole description ("the last ice age came to an end") names it as well.
      const kept = spans.filter(([s, e]) => !(s >= d.start && e <= d.end && e - s < d.end - d.start));
      if (kept.length === 0) out.delete(id);
      else out.set(id, kept);
    }
    for (const id of d.terms) {
      if (packs.term(id) === undefined) continue;
      const spans = out.get(id) ?? [];
      if (!spans.some(([s, e]) => s === d.start && e === d.end)) spans.push([d.start, d.end]);
      out.set(id, spans.sort((a, b) => a[0] - b[0]));
    }
  }
  return out;
}
