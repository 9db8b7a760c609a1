/**
 * How a sentence refers back to a subject named before it, read from the pack's lexicon
 * (`kinds`, `kind-members`, `back-references`; docs/binding.md, Back-references):
 *
 *   "They started on EPICA Dome C in 1996. That core was drilled to 3,623 metres."
 *                    ^^^^^^^^^^^^ ◀──────── ^^^^^^^^^ a demonstrative of the kind `core`
 *
 * A definite description or a demonstrative made of a kind's noun ("the core", "that cold snap",
 * "those two records", "the same period") and a time phrase ("back then": the kind `period`) take
 * up the most recent subject of their kind named before them: in the sentence's earlier clause, then
 * the sentences before, most recent first, skipping subjects of other kinds. Two subjects of the kind
 * named together ("Vostok and Dome C ... The core ...") leave a singular description ambiguous.
 * Pronouns, demonstratives after a preposition ("in that record") and a bare measure as the subject
 * ("the level was ...") refer back too, to the sentence before as a whole (bind-context.ts).
 */
import type { LoadedPacks, Lexicon } from '../rulepack/types.js';
import { compile, phraseWords, type CompiledLexicon } from '../propositions/lexicon.js';
import { findTerms } from './bind.js';
import { lexiconWords, type LexiconWord } from '../prose/lexicon-words.js';
import { utteranceLabelLength } from '../prose/split-sentences.js';

/** A word of a sentence: lower-case (’ as '), with its offsets. */
type Word = LexiconWord;
/** Words as the lexicon cuts them (hyphens separate words). */
const wordsOf = lexiconWords;

/** The back-reference words of a pack, compiled once per packs. */
interface Vocabulary {
  pronouns: Set<string>;
  possessives: Set<string>;
  determiners: Set<string>;
  demonstratives: string[][];
  prepositions: Set<string>;
  modifiers: Set<string>;
  restrictors: Set<string>;
  time: string[][];
  measures: Set<string>;
  /** The kinds' nouns: hits of class = kind. */
  nouns: CompiledLexicon;
  /** The kinds' member phrases: hits of class = kind, key = member reference. */
  members: CompiledLexicon;
  /** Per kind, the pack terms that are its members (`terms.<id>`). */
  memberTerms: Map<string, Set<string>>;
}

const vocabularies = new WeakMap<LoadedPacks, Vocabulary>();

function vocabularyOf(packs: LoadedPacks): Vocabulary {
  const known = vocabularies.get(packs);
  if (known !== undefined) return known;
  const lexicon = packs.lexicon;
  const words = (key: string): string[] => (lexicon['back-references']?.[key] ?? []).map((w) => w.toLowerCase().replace(/’/gu, "'"));
  const kinds = lexicon['kinds'] ?? {};
  const kindNouns = new Set(Object.values(kinds).flat().map((w) => w.toLowerCase()));
  const members: Lexicon = {};
  const memberTerms = new Map<string, Set<string>>();
  for (const [kind, refs] of Object.entries(lexicon['kind-members'] ?? {})) {
    const phrases: Record<string, string[]> = {};
    for (const ref of refs) {
      const [cls, key] = splitReference(ref);
      if (cls === 'terms') {
        if (key !== undefined) memberTerms.set(kind, new Set([...(memberTerms.get(kind) ?? []), key]));
        continue;
      }
      const keys = key === undefined ? Object.keys(lexicon[cls] ?? {}) : [key];
      // A kind's own nouns name no subject of it: "core" is the back-reference, "Dome C" the subject.
      for (const k of keys) phrases[`${cls}.${k}`] = (lexicon[cls]?.[k] ?? []).filter((p) => !kindNouns.has(p.toLowerCase()));
    }
    members[kind] = phrases;
  }
  const vocabulary: Vocabulary = {
    pronouns: new Set(words('pronouns')),
    possessives: new Set(words('possessives')),
    determiners: new Set(words('determiners')),
    demonstratives: words('demonstratives').map(phraseWords),
    prepositions: new Set(words('prepositions')),
    modifiers: new Set(words('modifiers')),
    restrictors: new Set(words('restrictors')),
    time: words('time').map(phraseWords),
    // A measure as written: "the figures" and "the levels" are many, the measure of no one subject before.
    measures: new Set(words('measures')),
    nouns: compile(Object.fromEntries(Object.entries(kinds).map(([kind, nouns]) => [kind, { noun: nouns }]))),
    members: compile(members),
    memberTerms,
  };
  vocabularies.set(packs, vocabulary);
  return vocabulary;
}

/** `entities.ice-core` → [entities, ice-core]; `periods` → [periods]. */
function splitReference(ref: string): [string, string | undefined] {
  const dot = ref.indexOf('.');
  return dot < 0 ? [ref, undefined] : [ref.slice(0, dot), ref.slice(dot + 1)];
}

/** Whether words `at` of `list` spell `phrase`, with only spaces between them. */
function spells(text: string, list: readonly Word[], at: number, phrase: readonly string[]): boolean {
  return phrase.every((w, k) => list[at + k]?.text === w && (k === 0 || joined(text, list[at + k - 1] as Word, list[at + k] as Word)));
}

/** Two words in one phrase: nothing but spaces (or a hyphen) between them. */
function joined(text: string, a: Word, b: Word): boolean {
  return /^(?:\s+|-)$/u.test(text.slice(a.end, b.start));
}

/** A description or time phrase that refers back to a subject of one kind. */
export interface Description {
  kind: string;
  start: number;
  end: number;
  /** "those two records", "both cores": it takes up every subject of its kind named together. */
  plural: boolean;
}

/**
 * The definite descriptions and demonstratives of a kind in a sentence ("the core", "that cold
 * snap", "the same two records"), and its time phrases ("back then": a period). A description
 * followed by a restrictor ("the core from Dome C", "at the time of the LGM") has a subject of its own.
 */
export function descriptionsIn(sentence: string, packs: LoadedPacks): Description[] {
  const v = vocabularyOf(packs);
  const list = wordsOf(sentence);
  const nouns = v.nouns.find(list.map((w) => w.text));
  const restricted = (last: number): boolean => {
    const next = list[last + 1];
    return next !== undefined && v.restrictors.has(next.text) && joined(sentence, list[last] as Word, next);
  };
  const found: Description[] = [];
  list.forEach((word, i) => {
    const time = v.time.find((phrase) => spells(sentence, list, i, phrase));
    if (time !== undefined && !restricted(i + time.length - 1)) {
      found.push({ kind: 'period', start: word.start, end: (list[i + time.length - 1] as Word).end, plural: false });
      return;
    }
    if (!v.determiners.has(word.text)) return;
    let k = i + 1;
    // Up to two modifiers ("the same period", "those two records"), each joined to the word before.
    while (k < i + 3 && list[k] !== undefined && v.modifiers.has((list[k] as Word).text) && joined(sentence, list[k - 1] as Word, list[k] as Word)) k += 1;
    const at = list[k];
    if (at === undefined || !joined(sentence, list[k - 1] as Word, at)) return;
    const noun = nouns.filter((h) => h.first === k).sort((a, b) => b.last - a.last)[0];
    if (noun === undefined || restricted(noun.last)) return;
    const head = (list[noun.last] as Word).text;
    const base = phraseWords(noun.base ?? '').at(-1) ?? head;
    const plural = head !== base && head.endsWith('s');
    // "that" and "this" take a singular noun; "these", "those", "both" a plural one: "found that cores
    // from Greenland ..." is a clause, not a demonstrative.
    if ((word.text === 'that' || word.text === 'this') && plural) return;
    if ((word.text === 'these' || word.text === 'those' || word.text === 'both') && !plural) return;
    // "the cold spells", "the records" name the kind in general; "the two records", "the same cores" refer back.
    if (word.text === 'the' && plural && k === i + 1) return;
    found.push({ kind: noun.cls, start: word.start, end: (list[noun.last] as Word).end, plural: plural || word.text === 'both' });
  });
  return found;
}

/**
 * True when a sentence refers back to the one before: a pronoun, a demonstrative after a
 * preposition ("in that record"), a description or time phrase of a kind, or a bare measure as its
 * subject ("The global average for 2019 was ...").
 */
export function refersBack(sentence: string, packs: LoadedPacks): boolean {
  const v = vocabularyOf(packs);
  const list = wordsOf(sentence);
  if (list.some((w) => v.pronouns.has(w.text))) return true;
  // "in that record", "over the same span": a noun after them ("from that 41,000-year beat" is a number).
  const opensNoun = (k: number): boolean => {
    const next = list[k];
    return next !== undefined && /^\p{L}/u.test(next.text) && joined(sentence, list[k - 1] as Word, next);
  };
  const afterPreposition = list.some((w, i) => v.prepositions.has(w.text) && v.demonstratives.some((d) => spells(sentence, list, i + 1, d) && opensNoun(i + 1 + d.length) && joined(sentence, list[i] as Word, list[i + 1] as Word)));
  return afterPreposition || descriptionsIn(sentence, packs).length > 0 || measureSubject(sentence, packs) !== undefined;
}

/**
 * The span of a bare measure subject ("The global average", "the level"): "the", up to two words,
 * a measure noun not followed by "of" (which gives it a subject of its own: "the level of the sea").
 */
export function measureSubject(sentence: string, packs: LoadedPacks): [number, number] | undefined {
  const v = vocabularyOf(packs);
  const list = wordsOf(sentence);
  for (let i = 0; i < list.length; i += 1) {
    if (list[i]?.text !== 'the') continue;
    // Words joined by a hyphen count as one ("the ice-core average").
    let spaced = 0;
    for (let k = i + 1; k < list.length && spaced <= 2; k += 1) {
      const word = list[k] as Word;
      const gap = sentence.slice((list[k - 1] as Word).end, word.start);
      if (!/^(?:\s+|-)$/u.test(gap)) break;
      if (/\s/u.test(gap)) spaced += 1;
      if (spaced > 3) break;
      const next = list[k + 1];
      if (v.measures.has(word.text) && !(next?.text === 'of' && joined(sentence, word, next))) return [(list[i] as Word).start, word.end];
    }
  }
  return undefined;
}

/**
 * Whether the words just before `start` make a term there the back-reference itself: a
 * demonstrative ("in that record", "this core"), a possessive opening its noun phrase ("Its
 * deuterium and CO2 series"), or the determiner of a description of a kind.
 */
export function afterDemonstrative(sentence: string, start: number, packs: LoadedPacks): boolean {
  const v = vocabularyOf(packs);
  if (descriptionsIn(sentence, packs).some((d) => d.start < start && d.end >= start)) return true;
  const before = sentence.slice(Math.max(0, start - 20), start);
  const list = wordsOf(before);
  const tail = list.length;
  if (tail === 0 || !/^\s+$/u.test(before.slice((list[tail - 1] as Word).end))) return false;
  if (v.demonstratives.some((d) => d.length <= tail && spells(before, list, tail - d.length, d))) return true;
  // "Its deuterium and CO2 series": a possessive up to three words back (a hyphenated word is one), spaces between.
  let spaced = 0;
  for (let k = tail - 1; k >= 0 && spaced <= 3; k -= 1) {
    if (v.possessives.has((list[k] as Word).text)) return true;
    const gap = k > 0 ? before.slice((list[k - 1] as Word).end, (list[k] as Word).start) : '';
    if (!/^(?:\s+|-)$/u.test(gap)) return false;
    if (gap !== '-') spaced += 1;
  }
  return false;
}

/** A description's subject: the words that name it, and where they were found. */
export interface Referent {
  /** The words naming the subject (joined for a plural description). */
  text: string;
  /** Which text named it: -1 the sentence's own earlier clause, else the index in the history. */
  source: number;
}

/** What a sentence's back-references resolve to. */
export type Resolution = { state: 'none' } | { state: 'ambiguous' } | { state: 'found'; referents: Referent[] };

/**
 * Resolves a sentence's descriptions and time phrases against the texts before it (`history`,
 * oldest first: the heading's subjects, the lead-in, the sentences before in the block). Each
 * takes the subjects of its kind in the nearest text that names any; a singular description meeting
 * two distinct subjects there is ambiguous, and so is the whole sentence.
 */
export function resolveBackReferences(sentence: string, history: readonly string[], packs: LoadedPacks): Resolution {
  const referents: Referent[] = [];
  for (const d of descriptionsIn(sentence, packs)) {
    const texts: [string, number][] = [[sentence.slice(0, d.start), -1], ...history.map((t, i): [string, number] => [t, i]).reverse()];
    for (const [text, source] of texts) {
      const subjects = subjectsOfKind(text, d.kind, packs);
      if (subjects.length === 0) continue;
      if (subjects.length > 1 && !d.plural) return { state: 'ambiguous' };
      referents.push({ text: subjects.join(' and '), source });
      break;
    }
  }
  return referents.length === 0 ? { state: 'none' } : { state: 'found', referents };
}

/**
 * The distinct subjects of a kind a text names, in order, each as its words: member phrases of the
 * kind and its member terms, merged when they overlap or share a pack term ("EPICA" and "Dome C" in
 * "EPICA Dome C" are one core).
 */
export function subjectsOfKind(text: string, kind: string, packs: LoadedPacks): string[] {
  const v = vocabularyOf(packs);
  const list = wordsOf(text);
  const spans: [number, number][] = v.members
    .find(list.map((w) => w.text))
    .filter((h) => h.cls === kind)
    .map((h) => [(list[h.first] as Word).start, (list[h.last] as Word).end]);
  const terms = findTerms(text, packs);
  for (const id of v.memberTerms.get(kind) ?? []) spans.push(...(terms.get(id) ?? []));
  if (spans.length === 0) return [];
  // Each mention with the pack terms it overlaps: mentions sharing a term are one subject.
  const groups: { span: [number, number]; ids: Set<string> }[] = [];
  for (const span of spans.sort((a, b) => a[0] - b[0])) {
    const ids = new Set([...terms].filter(([, ss]) => ss.some(([s, e]) => s < span[1] && e > span[0])).map(([id]) => id));
    const same = groups.find((g) => (g.span[0] < span[1] && g.span[1] > span[0]) || [...ids].some((id) => g.ids.has(id)));
    if (same === undefined) groups.push({ span: [...span], ids });
    else {
      same.span = [Math.min(same.span[0], span[0]), Math.max(same.span[1], span[1])];
      for (const id of ids) same.ids.add(id);
    }
  }
  // "EPICA" alone names no term, but it is a word of one of Dome C's terms ("EPICA Dome C"): the same core.
  const wordsOfTerm = (id: string): string[] => (packs.terms.find((t) => t.id === id)?.words ?? []).map((w) => ` ${phraseWords(w).join(' ')} `);
  const named = groups.filter((g) => g.ids.size > 0);
  const distinct = groups.filter((g) => {
    if (g.ids.size > 0) return true;
    const words = ` ${phraseWords(text.slice(g.span[0], g.span[1])).join(' ')} `;
    return !named.some((o) => [...o.ids].some((id) => wordsOfTerm(id).some((w) => w.includes(words))));
  });
  return distinct.map((g) => text.slice(g.span[0], g.span[1]));
}

/**
 * The pack terms a kind holds: its `terms.<id>` members and every term one of whose words is a
 * member phrase of the kind ("Younger Dryas" is a period, so the term `younger-dryas` is one).
 */
export function termsOfKind(packs: LoadedPacks, kind: string): Set<string> {
  const v = vocabularyOf(packs);
  const ids = new Set(v.memberTerms.get(kind) ?? []);
  for (const term of packs.terms) {
    if (term.words.some((w) => v.members.find(phraseWords(w)).some((h) => h.cls === kind))) ids.add(term.id);
  }
  return ids;
}

/** How many sentences back a chain of back-references is followed: "Dome C ... That core ... It ...". */
const CHAIN_STEPS = 2;
/** How many words may open a sentence before the pronoun that carries its subject ("And over that span it ..."). */
const OPENING_WORDS = 5;

/**
 * Whether a pronoun or possessive stands among the first words of a sentence, where its subject is:
 * "It records eight cycles", "And its bottom 200 metres ...". One later in the sentence ("... younger
 * than the snow around them") takes up a nearer noun, not the subject carried from further back.
 */
function opensWithPronoun(sentence: string, packs: LoadedPacks): boolean {
  const v = vocabularyOf(packs);
  // A chat line's time stamp and speaker ("[9 Nov, 19:13] Sinead: it lasted ...") are no words of its own.
  const label = utteranceLabelLength(sentence);
  return wordsOf(sentence)
    .filter((w) => w.start >= label)
    .slice(0, OPENING_WORDS)
    .some((w) => v.pronouns.has(w.text) || v.possessives.has(w.text));
}

/**
 * The sentence before as a pronoun in the next one reads it, with the subjects it took from further
 * back. "Later a team drilled at Dome C. That core goes back 800,000 years. It records eight glacial
 * cycles": "It" takes up "that core", which is Dome C; so the text a pronoun refers to is the sentence
 * before preceded by the subjects its own descriptions resolve to, and when it names no subject of any
 * kind and itself refers back by a pronoun ("The core was drilled at Dome C. It holds a record of
 * 800,000 years. Over that span it ..."), by the sentence before it, up to CHAIN_STEPS back. Only a
 * sentence that opens with its pronoun carries the subject so (opensWithPronoun). A sentence before
 * that names a subject of its own, or whose description is ambiguous, is read as written.
 */
export function carriedContext(sentence: string, context: string, history: readonly string[], packs: LoadedPacks): string {
  const at = history.lastIndexOf(context);
  if (at < 0 || !opensWithPronoun(sentence, packs)) return context;
  const carried: string[] = [];
  let index = at;
  for (let step = 0; step < CHAIN_STEPS && index >= 0; step += 1) {
    const text = history[index] as string;
    if (namesSubjectOfKind(text, packs)) break;
    const resolution = resolveBackReferences(text, history.slice(0, index), packs);
    if (resolution.state === 'ambiguous') break;
    if (resolution.state === 'found') {
      carried.unshift(...resolution.referents.map((r) => r.text));
      break;
    }
    // A pronoun alone: the subject is the one the sentence before it names.
    if (!refersBack(text, packs) || index === 0) break;
    const earlier = history[index - 1] as string;
    if (!namesSubjectOfKind(earlier, packs)) {
      index -= 1;
      continue;
    }
    carried.unshift(...Object.keys(packs.lexicon['kinds'] ?? {}).flatMap((kind) => subjectsOfKind(earlier, kind, packs)));
    break;
  }
  return carried.length === 0 ? context : `${carried.join(', ')}. ${context}`;
}

/** Whether a text names a subject of any kind of the lexicon (a core, a period, a gas, a record). */
function namesSubjectOfKind(text: string, packs: LoadedPacks): boolean {
  return Object.keys(packs.lexicon['kinds'] ?? {}).some((kind) => subjectsOfKind(text, kind, packs).length > 0);
}
