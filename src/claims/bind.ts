/**
 * Binds each quantity in a sentence to the reference value it speaks about. A value is a candidate
 * when the quantity's words (its view of the sentence, bind-view.ts) have a word of every one of
 * its term groups and none of its veto terms, the quantity's dimension is one the value accepts,
 * and its role (level or change, bind-role.ts) is one the value accepts. Among candidates the one
 * whose terms stand nearest the quantity wins, a clause boundary counting as far; a tie binds
 * nothing (the quantity is listed as ambiguous and goes to the checklist instead of raising a flag).
 * Numbers in a parallel list bind in order or not at all (bind-list.ts); a quantity with no
 * candidate may take its subject from the previous sentence of the paragraph (bind-context.ts).
 *
 *   "Vostok reaches back 420,000 years and EPICA Dome C 800,000 years"
 *    ^^^^^^ ─────────── 420,000 ──┘      ^^^^^^^^^^^^ ─── 800,000 (each binds its nearest core)
 */
import { PhraseTrie } from '../prose/phrase-trie.js';
import { termVariants } from './term-variants.js';
import { GappedTerms } from './term-gaps.js';
import { withDescribedTimes } from './bind-descriptions.js';
import { phraseWords, variantsOf } from '../propositions/lexicon.js';
import type { LoadedPacks, ReferenceValue } from '../rulepack/types.js';
import type { Binding, Quantity } from '../types.js';
import { bindApposition } from './bind-apposition.js';
import { bindImplied } from './bind-implied.js';
import { BOUND_TERMS, boundReadings, clauseStarts } from './bind-bound.js';
import { withStateEvents } from './bind-events.js';
import { clauseView, sharedSubjects, subjectSpan } from './bind-clauses.js';
import { carriedContext, resolveBackReferences, type Resolution } from './back-reference.js';
import { bindFromContext, mayReferBack } from './bind-context.js';
import { bindFromSetting, settingKindsOf } from './bind-setting.js';
import { comparedInRelativeClauses, withoutOthers } from './bind-others.js';
import { partsOfWholes, wholesApart, withoutWholes } from './bind-part.js';
import { addEarlierTime, addNearness, framesYield } from './bind-time.js';
import { withoutNextEvents } from './bind-next-event.js';
import { bindList, parallelLists } from './bind-list.js';
import { canState, nearness, satisfies } from './bind-match.js';
import { toldAsLength } from './bind-length.js';
import { endpointPairs, quantityRoles, roleFits } from './bind-role.js';
import { addSpanEdges } from './bind-edges.js';
import { withAmountWords } from './bind-amount-time.js';
import { spanOrEnds } from './bind-span.js';
import { withoutOtherSide } from './bind-turn.js';
import { vetoView } from './bind-veto.js';
import { clauseBreaks, termViews, type TermHits } from './bind-view.js';

export type { TermHits } from './bind-view.js';

/** A quantity whose best values tie: it binds nothing and goes to the checklist. */
const AMBIGUOUS = 'ambiguous';
/** Words that make a length a stretch of the ice ("the lowest 200 metres", "its top 50 m"). */
const SEGMENT = /\b(?:the|its|their|a|an)\s+(?:very\s+)?(?:lowest|bottom|bottommost|deepest|top|topmost|upper|uppermost|lower|last|final|first)\s+(?:(?:few|some|roughly|about|around)\s+)?$/iu;
/** A single unit, the base of a rate stated beside it ("one metre ... stores 750 years", "each metre holds"). */
const ONE_UNIT = /^(?:one|a|an|each|every|per|a\s+single)\s+\p{L}+$/iu;
/** One unit length named just before a figure, in its clause: "each metre there holds", "one metre near the bottom stores". */
/** The functions a written formula applies to its operands (common practice: the names of the mathematical functions). */
const FORMULA_FUNCTIONS = ['ln', 'log', 'log10', 'exp', 'sqrt'];
/**
 * True when a number is an operand of a written formula, not a measure the sentence states:
 * inside a function's brackets ("5.35 ln(280/190)") or beside a sign of multiplication or
 * division between numbers ("2 × 3.7", "76 ÷ 6,500"). "180/280 ppm" outside a function is a pair.
 */
export function isFormulaOperand(sentence: string, q: { start: number; end: number }): boolean {
  const head = sentence.slice(0, q.start);
  const open = head.lastIndexOf('(');
  if (open >= 0 && !head.slice(open).includes(')')) {
    const name = /([\p{L}\d]+)\s*$/u.exec(head.slice(0, open))?.[1]?.toLowerCase();
    if (name !== undefined && FORMULA_FUNCTIONS.includes(name)) return true;
  }
  return /\d\s*[×*÷]\s*$/u.test(head.slice(-8)) || /^\s*[×*÷]\s*\d/u.test(sentence.slice(q.end, q.end + 8));
}
const PER_UNIT_BEFORE = /(?:^|[^\p{L}])(?:each|every|one|a\s+single|a)\s+(?:metre|meter|m)(?![\p{L}])[^\d,;:.!?()]{0,36}$/iu;
const compiled = new WeakMap<object, Map<string, CompiledTerm>>();

/**
 * One term's search (termSearch: what its regular expression, termRegex, matches), and for each of
 * its phrases one piece of plain ASCII in lower case (the longest): a sentence whose lower-case form
 * contains none of them cannot match, and the search is not run (a few hundred terms were tried on
 * every sentence). Under the `iu` flags an
 * ASCII letter or digit matches itself in either case and, of all other characters, only the kelvin
 * sign (which `toLowerCase` turns into "k") and the long s (turned into "s" here); so the test never
 * skips a sentence the expression would match. A phrase with no ASCII piece makes its term always run.
 */
export interface CompiledTerm {
  words: string[];
  /** Made on first use. */
  search?: (sentence: string) => [number, number][];
  keyWords: string[] | undefined;
}

/** A sentence as the key-word test reads it: lower case, the long s as "s". */
export function foldedLower(sentence: string): string {
  return sentence.toLowerCase().replaceAll('\u017f', 's');
}

/**
 * Finds every term occurrence (case-insensitive, on word boundaries) in `sentence`. A term whose id
 * is another term's id, a dot and a name ("glacial.in-other-words") adds words to that term: its
 * hits count as the other term's, so a pack adds a synonym without editing an entry.
 */
export function findTerms(sentence: string, packs: LoadedPacks): TermHits {
  // The binder, the reference check, the rank check and the next sentence's context each ask for
  // the same sentence's terms: the answer is kept for the last few sentences (copies out).
  let found = foundTerms.get(packs);
  if (found === undefined) {
    found = new Map();
    foundTerms.set(packs, found);
  }
  let hits = found.get(sentence);
  if (hits === undefined) {
    hits = searchTerms(sentence, packs);
    if (found.size >= FOUND_TERMS_KEPT) found.delete(found.keys().next().value as string);
    found.set(sentence, hits);
  }
  return new Map([...hits].map(([id, spans]) => [id, spans.map(([s, e]): [number, number] => [s, e])]));
}

/**
 * Sentences whose terms are kept per packs: a paragraph's worth and the clauses the binder cuts from
 * them, and beyond that the sentences a draft or a folder of drafts repeats (a few megabytes).
 */
const FOUND_TERMS_KEPT = 4096;
const foundTerms = new WeakMap<LoadedPacks, Map<string, TermHits>>();

function searchTerms(sentence: string, packs: LoadedPacks): TermHits {
  const terms = compiledTerms(packs);
  const holding = termsHolding(keyWordsIn(foldedLower(sentence), terms), terms);
  const hits: TermHits = new Map();
  for (const [id, term] of terms) {
    if (term.keyWords !== undefined && !holding.has(id)) continue;
    const spans = (term.search ??= termSearch(term.words))(sentence);
    if (spans.length === 0) continue;
    const as = extendedTerm(id, packs);
    hits.set(as, [...(hits.get(as) ?? []), ...spans].sort((a, b) => a[0] - b[0]));
  }
  // "the longest peer-reviewed ice-core record", "takes us back": a phrase with words put inside it.
  const gapped = gappedTermsOf(packs, terms).search(sentence, [...hits.values()].flat());
  for (const [as, spans] of gapped) hits.set(as, withGapped(hits.get(as) ?? [], spans));
  // "the ice sheets were at their greatest extent": a thing's state names an event; "the close of the
  // most recent glaciation": a description names a period.
  return withDescribedTimes(sentence, withStateEvents(sentence, hits, packs), packs);
}

const gappedIndexes = new WeakMap<LoadedPacks, GappedTerms>();

/** The term phrases that may take words inside (term-gaps.ts), made once per packs from the compiled terms' forms. */
function gappedTermsOf(packs: LoadedPacks, terms: Map<string, CompiledTerm>): GappedTerms {
  let gapped = gappedIndexes.get(packs);
  if (gapped === undefined) {
    const written = new Map(packs.terms.map((t) => [t.id, t.words]));
    gapped = new GappedTerms([...terms].map(([id, t]) => ({ term: extendedTerm(id, packs), forms: t.words, written: written.get(id) ?? [] })), packs);
    gappedIndexes.set(packs, gapped);
  }
  return gapped;
}

/**
 * A term's exact spans with its gapped ones: a gapped match takes the place of the exact matches
 * inside it (the longer match wins, as the search's alternation prefers the longer phrase) and
 * gives way to an exact match it only overlaps.
 */
function withGapped(exact: [number, number][], gapped: [number, number][]): [number, number][] {
  let out = exact;
  for (const [s, e] of gapped) {
    if (out.some(([a, b]) => a < e && b > s && (a < s || b > e))) continue;
    out = [...out.filter(([a, b]) => !(a >= s && b <= e)), [s, e]];
  }
  return out.sort((a, b) => a[0] - b[0]);
}

/** The terms' key words by their first three code units (a shorter key under itself), made once per term map. */
const keyIndexes = new WeakMap<Map<string, CompiledTerm>, Map<number, string[]>>();

/** One number for the first `n` (1 to 3) code units of `text` from `at`: the length, then each unit, 16 bits each. */
function headKey(text: string, at: number, n: number): number {
  let key = n - 1;
  for (let k = 0; k < 3; k += 1) key = key * 65536 + (k < n ? text.charCodeAt(at + k) : 0);
  return key;
}

/**
 * The key words of `terms` that `lower` contains, found in one pass over it: at each position, the
 * keys whose first one, two or three code units stand there are tried there. The same set as
 * `lower.includes(key)` for every key, which took several hundred substring searches per sentence.
 */
export function keyWordsIn(lower: string, terms: Map<string, CompiledTerm>): Set<string> {
  let index = keyIndexes.get(terms);
  if (index === undefined) {
    index = new Map();
    for (const key of new Set([...terms.values()].flatMap((t) => t.keyWords ?? []))) {
      const head = headKey(key, 0, Math.min(3, key.length));
      // Appended in place: a list copied on every key cost some 4 MB of garbage per run.
      const keys = index.get(head);
      if (keys === undefined) index.set(head, [key]);
      else keys.push(key);
    }
    keyIndexes.set(terms, index);
  }
  const present = new Set<string>();
  for (let i = 0; i < lower.length; i += 1) {
    for (let n = 1; n <= 3 && i + n <= lower.length; n += 1) {
      const keys = index.get(headKey(lower, i, n));
      if (keys === undefined) continue;
      for (const key of keys) if (!present.has(key) && lower.startsWith(key, i)) present.add(key);
    }
  }
  return present;
}

const termsByKeyWord = new WeakMap<Map<string, CompiledTerm>, Map<string, string[]>>();

/**
 * The ids of the terms one of whose key words is in `present`: the same terms as asking each term
 * whether any of its key words is present, from the few words a sentence holds rather than the
 * key words of every term.
 */
function termsHolding(present: ReadonlySet<string>, terms: Map<string, CompiledTerm>): Set<string> {
  let byWord = termsByKeyWord.get(terms);
  if (byWord === undefined) {
    byWord = new Map();
    for (const [id, term] of terms) {
      for (const w of term.keyWords ?? []) {
        // Appended in place, in the same order: copying the list for each id made it quadratic.
        const ids = byWord.get(w);
        if (ids === undefined) byWord.set(w, [id]);
        else ids.push(id);
      }
    }
    termsByKeyWord.set(terms, byWord);
  }
  const ids = new Set<string>();
  for (const w of present) for (const id of byWord.get(w) ?? []) ids.add(id);
  return ids;
}

/** The compiled terms of `packs` (each with its key words), made once per packs. */
export function compiledTerms(packs: LoadedPacks): Map<string, CompiledTerm> {
  let terms = compiled.get(packs);
  if (terms === undefined) {
    // A form some term writes out is that term's: "swung" written under the ranging verbs is no
    // derived form of the change noun "swing".
    const writers = new Map<string, Set<string>>();
    for (const t of packs.terms) {
      for (const w of t.words) {
        const form = w.toLowerCase();
        const ids = writers.get(form) ?? new Set<string>();
        ids.add(extendedTerm(t.id, packs));
        writers.set(form, ids);
      }
    }
    terms = new Map(
      packs.terms.map((t): [string, CompiledTerm] => {
        const own = extendedTerm(t.id, packs);
        const othersWrite = (form: string): boolean => {
          for (const id of writers.get(form) ?? []) if (id !== own) return true;
          return false;
        };
        const words = inflectedTerm(termVariants(t.words), othersWrite);
        return [t.id, { words, keyWords: keyWordsOf(words) }];
      }),
    );
    compiled.set(packs, terms);
  }
  return terms;
}

/**
 * A term's phrases with every inflection of their words derived, as the lexicon's are
 * (propositions/inflect.ts): a pack lists "rise" and the draft may say "rising" or "rose". Only
 * phrases of plain letters inflect; symbols, numbers and forms the pack wrote out stay as written,
 * and a form another term writes out (`othersWrite`) stays that term's alone.
 */
function inflectedTerm(words: readonly string[], othersWrite: (form: string) => boolean): string[] {
  const out = new Set(words);
  for (const phrase of words) {
    if (!/^[A-Za-z]+(?: [A-Za-z]+){0,2}$/u.test(phrase)) continue;
    for (const form of variantsOf(phraseWords(phrase))) {
      const text = form.join(' ');
      if (!out.has(text) && !othersWrite(text)) out.add(text);
    }
  }
  return [...out];
}

function keyWordsOf(words: string[]): string[] | undefined {
  // Every ASCII piece of a phrase stands in a sentence the phrase matches; the longest rules out most.
  const keys = words.map((w) => (w.toLowerCase().match(/[\x21-\x7e]+/gu) ?? []).reduce((a, b) => (b.length > a.length ? b : a), ''));
  return keys.includes('') ? undefined : keys;
}

/** The term a dotted id extends ("glacial.in-other-words" → "glacial"), or the id itself. */
export function extendedTerm(id: string, packs: LoadedPacks): string {
  const dot = id.indexOf('.');
  if (dot < 0) return id;
  const base = id.slice(0, dot);
  return packs.term(base) === undefined ? id : base;
}

/**
 * A term's phrases, longest first, found case-insensitively on word boundaries: the spans of
 * `termRegex(words)`, found by walking the phrases' trie (prose/phrase-trie.ts), which needs no
 * compilation (each term's expression cost V8 about a millisecond on its first use, some 70 ms of a
 * short `check`). A list with an empty phrase keeps the expression.
 */
function termSearch(words: string[]): (sentence: string) => [number, number][] {
  const sorted = [...words].sort((a, b) => b.length - a.length);
  if (sorted.some((w) => w.length === 0)) {
    const regex = termRegex(words);
    return (sentence) => [...sentence.matchAll(regex)].map((m): [number, number] => [m.index + (m[1] ?? '').length, m.index + m[0].length]);
  }
  // The walk only, however much it has searched. The term's expression used to take over after
  // 50 KB, but the expressions over the derived inflections kept their compiled code for the rest
  // of the run: with the walk alone the peak of 1 MB of topical prose in one thread fell from 266
  // to 240 MiB and the run was no slower (docs/speed.md, Session 11). Both find the same spans.
  const trie = new PhraseTrie(sorted);
  return (sentence) => trie.spans(sentence);
}

/** The expression whose matches a term's search finds (the group is the character before a phrase). */
export function termRegex(words: string[]): RegExp {
  const escaped = [...words].sort((a, b) => b.length - a.length).map((w) => w.replace(/[.*+?^${}()|[\]\\]/gu, '\\$&').replace(/\s+/gu, '\\s+'));
  return new RegExp(`(^|[^\\p{L}\\p{N}])(?:${escaped.join('|')})(?![\\p{L}\\p{N}])`, 'giu');
}

/** A comparative of size right after a figure: "380,000 years longer", "350 m deeper". */
const COMPARED_AFTER = /^[\s\u00A0]*(?:longer|shorter|more|less|deeper|shallower|bigger|smaller|greater|larger)(?![\p{L}])/iu;
/** A comparative of age right after a figure: "4,000 years younger" (a delta-age when said of the air alone). */
const AGED_AFTER = /^[\s\u00A0]*(?:older|younger)(?![\p{L}])/iu;

/**
 * True when quantity `i` is stated as a difference: a comparative of size follows it ("380,000 years
 * longer than"), or a comparative of age or a change word ("adds") with two figures of its
 * dimension before it in the sentence, whose difference it states.
 */
function isDifference(sentence: string, quantities: Quantity[], i: number, role: string): boolean {
  const q = quantities[i] as Quantity;
  const after = sentence.slice(q.end, q.end + 24);
  if (COMPARED_AFTER.test(after)) return true;
  if (!AGED_AFTER.test(after) && role !== 'change') return false;
  return quantities.slice(0, i).filter((o) => o.dimension === q.dimension).length >= 2;
}

/** A quantity in a relative clause after a comma: "..., which started roughly 30,000 years ago". */
const RELATIVE_BEFORE = /,\s*which\s+[^,;:.!?()]*$/u;

/**
 * `vetoes` less the words before the antecedent of a relative clause the quantity stands in: in
 * "how Antarctic temperature and CO2 moved during the last deglaciation, which started roughly
 * 30,000 years ago" the clause speaks of the deglaciation alone, so "CO2" vetoes nothing for it.
 * The antecedent is a term that ends right before the comma; only a date is read so.
 */
function withoutBeforeAntecedent(sentence: string, vetoes: TermHits, q: Quantity, hits: TermHits): TermHits {
  // Only a date: the clause dates its antecedent event ("the deepest core, which reached 3,620 metres" keeps its words).
  if (q.dimension !== 'age') return vetoes;
  const m = RELATIVE_BEFORE.exec(sentence.slice(0, q.start));
  if (m === null) return vetoes;
  const comma = m.index;
  let antecedent: number | undefined;
  for (const spans of hits.values()) for (const [start, end] of spans) if (end <= comma && /^\s*$/u.test(sentence.slice(end, comma))) antecedent = Math.min(antecedent ?? start, start);
  if (antecedent === undefined) return vetoes;
  const from = antecedent;
  const kept: TermHits = new Map();
  for (const [id, spans] of vetoes) {
    const left = spans.filter(([, end]) => end > from);
    if (left.length > 0) kept.set(id, left);
  }
  return kept;
}

/** A bracket that opens right after a word and holds only a quantity: "the end of the deglaciation (about 11,500 years ago)". */
const OPENS_AFTER_WORD = /\p{L}[\s\u00A0]*\([\s\u00A0]*$/u;
const CLOSES = /^[\s\u00A0]*\)/u;

/** Where the bracket opens when `q` stands alone in brackets right after a word, else undefined. */
function bracketedAfterPhrase(sentence: string, q: Quantity): number | undefined {
  const head = sentence.slice(Math.max(0, q.start - 40), q.start);
  if (!OPENS_AFTER_WORD.test(head) || !CLOSES.test(sentence.slice(q.end))) return undefined;
  return sentence.lastIndexOf('(', q.start);
}

/** The hits that end before offset `at`. */
function before(hits: TermHits, at: number): TermHits {
  const kept: TermHits = new Map();
  for (const [id, spans] of hits) {
    const left = spans.filter(([, end]) => end <= at);
    if (left.length > 0) kept.set(id, left);
  }
  return kept;
}

/** The words inside `span` belong to quantity `j` alone: every other quantity's view loses them. */
function ownWords(views: TermHits[], j: number, [s, e]: [number, number]): void {
  views.forEach((view, i) => {
    if (i === j) return;
    for (const [id, spans] of view) {
      const left = spans.filter(([start, end]) => end <= s || start >= e);
      if (left.length === 0) view.delete(id);
      else view.set(id, left);
    }
  });
}

/**
 * `vetoes` less the words of the quantity's own unit: "300 CO2 molecules in every million molecules
 * of air" names the air as its unit, not as a share of the atmosphere told in percent. A mixing
 * ratio is a share of the air whatever its unit, so words that say so right after it ("420 ppm of
 * the air", "280 parts per billion of the atmosphere") complete the unit: they make the figure no
 * percentage (common practice: ppm and ppb are parts of the air by volume, WMO GAW reports).
 */
function withoutOwnUnitWords(vetoes: TermHits, q: Quantity, sentence: string): TermHits {
  if (q.statedUnit === 'CE' || q.dimension !== 'concentration' || q.statedUnit === '%') return vetoes;
  const kept: TermHits = new Map();
  for (const [id, spans] of vetoes) {
    const left = spans.filter(([start, end]) => !(start > q.start && end <= q.end) && !(start >= q.end && /^[\s\u00A0]*$/u.test(sentence.slice(q.end, start))));
    if (left.length > 0) kept.set(id, left);
  }
  return kept;
}

/**
 * `vetoes` less the words of earlier clauses, for a number stated as a bound whose words begin at
 * `from`: "Present-day levels are far above anything in the ice, where natural CO2 never exceeded
 * about 300 ppm" (the ceiling is the ice's, not today's).
 */
function withoutEarlierClauses(vetoes: TermHits, from: number | undefined, starts: number[]): TermHits {
  if (from === undefined) return vetoes;
  const kept: TermHits = new Map();
  for (const [id, spans] of vetoes) {
    const left = spans.filter(([, end]) => end > from || !starts.some((b) => b >= end && b <= from));
    if (left.length > 0) kept.set(id, left);
  }
  return kept;
}

/** A year or a decade written in digits ("in 2019", "the 2010s"): the sentence dates what it tells. */
const DATED = /(?<!\d)\d{4}(?:s|'s)?(?!\d)/gu;
/** The pack term of the writer's present ("today", "now", "these days"). */
const PRESENT_TERM = 'today';
/** Marks that close a clause or open an aside: a date beyond one dates another figure. */
const ASIDE = /[;:()[\]]/u;

/**
 * The amount unit of a yearly rate ("ppm" of "ppm/yr") when the unit may name its gas as the amount's
 * unit does: "it is now rising by about 2 ppm a year", "in the 2010s it averaged 2.4 ppm a year". The
 * growth of the instrumental era is told per year and dated to the present or to a year or decade,
 * with no other rate and no clause mark between the date and the figure ("2024 3.5 ppm/yr against
 * 0.013 ppm/yr" dates the first); a sentence that names a period of the past ("the deglacial
 * average"), or no time at all ("modern growth"), gives its pace against another, and the unit alone
 * does not say whose it is.
 */
function yearlyAmountUnit(sentence: string, quantities: readonly Quantity[], q: Quantity, hits: TermHits, times: ReadonlySet<string>): string | undefined {
  if (!q.dimension.endsWith('-rate') || !q.statedUnit.endsWith('/yr')) return undefined;
  if ([...hits.keys()].some((id) => id !== PRESENT_TERM && times.has(id))) return undefined;
  const marks: [number, number][] = [...(hits.get(PRESENT_TERM) ?? []), ...[...sentence.matchAll(DATED)].map((m): [number, number] => [m.index, m.index + m[0].length])];
  const reaches = ([start, end]: [number, number]): boolean => {
    const [from, to] = end <= q.start ? [end, q.start] : [q.end, start];
    if (from > to || ASIDE.test(sentence.slice(from, to))) return false;
    return !quantities.some((o) => o !== q && o.dimension === q.dimension && o.start >= from && o.end <= to);
  };
  if (!marks.some(reaches)) return undefined;
  return q.statedUnit.slice(0, q.statedUnit.indexOf('/'));
}

/** "at" right before a rate figure: the pace a time is worked from. */
const AT_PACE = /(?:^|[^\p{L}])at\s+$/iu;

/** A rate figure told as the pace something goes at ("at 2.4 ppm a year"). */
function isPace(sentence: string, q: Quantity): boolean {
  return q.dimension.endsWith('-rate') && AT_PACE.test(sentence.slice(Math.max(0, q.start - 12), q.start));
}

/**
 * `hits` less the spans that lie inside a longer term the value vetoes: "today" in "lower than
 * today" is the yardstick of a comparison, not the time the figure is of, so it does not name the
 * present for the present-day level, even where the veto itself stands in a later clause and so
 * stops nothing (bind-veto.ts).
 */
function withoutNestedInVetoes(r: ReferenceValue, hits: TermHits): TermHits {
  const vetoSpans = r.binding.none.flatMap((id) => hits.get(id) ?? []);
  if (vetoSpans.length === 0) return hits;
  const inside = ([s, e]: [number, number]): boolean => vetoSpans.some(([vs, ve]) => vs <= s && e <= ve && ve - vs > e - s);
  const out: TermHits = new Map();
  for (const [id, spans] of hits) {
    const left = spans.filter((span) => !inside(span));
    if (left.length > 0) out.set(id, left);
  }
  return out;
}

/**
 * Binds `quantities` (parsed from `sentence`) to reference values of `packs`. `context` is the
 * previous sentence of the same paragraph, if any: its terms may name the subject of a quantity
 * that has no candidate in its own sentence.
 */
export function bindQuantities(
  sentence: string,
  quantities: Quantity[],
  packs: LoadedPacks,
  context?: string,
  history: readonly string[] = context === undefined ? [] : [context],
): { bindings: Binding[]; ambiguous: number[] } {
  const pairs = endpointPairs(sentence, quantities);
  const roles = quantityRoles(sentence, quantities);
  const lists = parallelLists(sentence, quantities, pairs);
  const allHits = findTerms(sentence, packs);
  const hits = withoutOthers(sentence, allHits);
  const views = termViews(sentence, quantities, hits, pairs, lists);
  // "Unlike the EPICA Dome C core, which goes back 800,000 years, ...": the clause speaks of the compared subject.
  for (const [i, add] of comparedInRelativeClauses(sentence, allHits, hits, quantities, views)) {
    const view = views[i] as TermHits;
    for (const [id, spans] of add) view.set(id, [...(view.get(id) ?? []), ...spans]);
  }
  // "lasted from about 12,900 to 11,700 years ago": the head of a span of dates is a start, its tail an end.
  addSpanEdges(sentence, quantities, pairs, views, packs);
  // "..., while the global mean for 2024 was about 424 ppm": words before a turn to a new subject are the other side's.
  const gaps = withoutOtherSide(sentence, quantities, views, packs, hits);
  // "CO2 fell to about 190 ppm; in the interglacials, about 280 ppm": a gap with no change word of its
  // own repeats the verb before it, and states what its counterpart states: a level stays a level.
  for (const [i, at] of gaps) {
    const counterpart = quantities.findLastIndex((o) => o.end <= at);
    const view = views[i] as TermHits;
    if (counterpart < 0 || roles[counterpart] !== 'level' || (view.get('change') ?? []).some(([start]) => start >= at)) continue;
    roles[i] = 'level';
    view.delete('change');
  }
  // "at the warm peaks it topped out near 350 ppm": the unit names the gas; so does a dated yearly
  // rate of it, "in the 2010s the global level rose by about 2 ppm a year" (yearlyAmountUnit).
  quantities.forEach((q, i) => {
    const amount = yearlyAmountUnit(sentence, quantities, q, hits, settingKindsOf(packs).get('time') ?? new Set());
    for (const term of packs.terms) {
      if (term.units?.some((u) => u === q.statedUnit || u === amount) !== true || (term.unless ?? []).some((id) => hits.has(id))) continue;
      const view = views[i] as TermHits;
      if (!view.has(term.id)) view.set(term.id, [[q.start, q.end]]);
    }
  });
  // "10 to 15 ppm in under two centuries": the time an amount took speaks of the amount's gas or temperature.
  withAmountWords(sentence, quantities, views, packs);
  // "CO2 never climbed above 300 ppm": a bound's words are its number's alone, and name the extreme.
  const bounds = boundReadings(sentence, quantities, packs, hits);
  bounds.forEach((b, j) => {
    if (b === undefined) return;
    // "it dropped as low as about 100 ppm": a level reached, no change.
    if (b.carried === true && roles[j] === 'unknown') roles[j] = 'level';
    ownWords(views, j, b.span);
    const own = views[j] as TermHits;
    // "CO2 never fell below about 220 ppm": the verb of a bound states the extreme, not a change, so
    // the words inside it name no other term for its number (and veto none of its values).
    for (const [id, spans] of own) {
      const outside = spans.filter(([s0, e0]) => s0 < b.span[0] || e0 > b.span[1]);
      if (outside.length === 0) own.delete(id);
      else if (outside.length < spans.length) own.set(id, outside);
    }
    own.set(BOUND_TERMS[b.kind], [...(own.get(BOUND_TERMS[b.kind]) ?? []), b.span]);
  });
  // "~100,000 years (orbit shape), 41,000 (tilt) and 23,000 (precession)": a parenthesis right after a
  // number labels that number; its words are no other number's.
  quantities.forEach((q, j) => {
    const label = /^[\s\u00A0]*\(([^()]*)\)/u.exec(sentence.slice(q.end));
    if (label === null) return;
    const [s0, e0] = [q.end + label.index, q.end + label[0].length];
    // "about 800,000 years (four glacial cycles)": a parenthesis holding a number of its own is no label.
    if (quantities.some((o) => o.start >= s0 && o.end <= e0)) return;
    ownWords(views, j, [s0, e0]);
  });
  // "… began to fade 18,000 years ago and was over by 3,000 years ago": a predicate sharing the subject speaks for itself.
  for (const c of sharedSubjects(sentence, quantities)) {
    quantities.forEach((q, i) => {
      if (q.start >= c.clause[0] && q.end <= c.clause[1]) views[i] = clauseView(sentence, views[i] as TermHits, c, (text) => findTerms(text, packs));
    });
  }
  // "The bottom 200 metres of the Dome C core hold 15,000 years": the stretch names no measure of the
  // core, so the core's words are the next number's.
  const isStretch = (q: Quantity) => SEGMENT.test(sentence.slice(Math.max(0, q.start - 24), q.start));
  const isSegment = (q: Quantity) => q.dimension === 'length' && isStretch(q);
  quantities.forEach((q, i) => {
    const next = views[i + 1];
    if (!isSegment(q) || next === undefined) return;
    for (const [id, spans] of views[i] as TermHits) if (!next.has(id)) next.set(id, spans);
  });
  // "about 20 ppm of the deglacial rise": the whole's words are not the part's.
  const parts = partsOfWholes(sentence, quantities);
  withoutWholes(parts, views);
  // "Before about a million years ago, the cycles came every 41,000 years": a clause set at an earlier time.
  addEarlierTime(sentence, quantities, views, hits, packs);
  // "within about 400 years of Antarctic temperature": a nearness in time, not how long anything lasted.
  addNearness(sentence, quantities, views, packs);
  // "It lasted about 3,000 years before warming resumed": the clause after a lasting names the next event.
  withoutNextEvents(sentence, quantities, views);
  const breaks = clauseBreaks(sentence);
  // Per quantity: the value it binds, AMBIGUOUS, or null when its list left it unbound.
  const decided = new Map<number, string | null>();
  for (const list of lists) {
    const outcome = bindList(list, quantities, roles, views, packs.references);
    if (outcome === undefined) continue;
    for (const i of list) decided.set(i, outcome.ambiguous.includes(i) ? AMBIGUOUS : null);
    for (const b of outcome.bindings) decided.set(b.quantityIndex, b.referenceId);
  }
  let contextHits: TermHits | undefined;
  let fromApposition: string | undefined;
  const contextSubjects = new Map<string, [number, number] | null>();
  // compromise reads the sentence before for its subject only when bindFromContext ranks two values by it.
  const subjectBefore = (text: string) => (): [number, number] | undefined => {
    if (!contextSubjects.has(text)) contextSubjects.set(text, subjectSpan(text) ?? null);
    return contextSubjects.get(text) ?? undefined;
  };
  // "That core was drilled to 3,623 m": what the sentence's descriptions of a kind take up (back-reference.ts).
  let resolution: Resolution | undefined;
  const resolved = (): Resolution => (resolution ??= resolveBackReferences(sentence, history, packs));
  quantities.forEach((q, i) => {
    if (decided.has(i)) return;
    // "the lowest 200 metres hold 150,000 years": a stretch of the core, not its depth.
    if (isSegment(q)) return;
    // "one metre near the bottom stores some 750 years": one unit of a rate, not a measure of anything.
    if (ONE_UNIT.test(q.text)) return;
    // "forcing = 5.35 ln(280/190) = 2.1 W/m2": an operand of a formula is worked on, not claimed.
    if (isFormulaOperand(sentence, q)) return;
    // "each metre there holds about 750 years": the years of one unit length are that rate, no span of the core.
    if (q.dimension === 'duration' && PER_UNIT_BEFORE.test(sentence.slice(Math.max(0, q.start - 60), q.start))) return;
    // "At 2.4 ppm a year, a rise that size takes roughly 33 years": a time worked from a pace is that pace's, no event's length.
    if (q.dimension === 'duration' && quantities.some((o, j) => j < i && isPace(sentence, o))) return;
    const view = views[i] as TermHits;
    const role = roles[i] ?? 'unknown';
    const bound = bounds[i];
    const vetoes = withoutBeforeAntecedent(sentence, withoutOwnUnitWords(withoutEarlierClauses(vetoView(sentence, view, q, role), bound?.span[0], clauseStarts(sentence)), q, sentence), q, hits);
    // "Dome C spans 800,000 years and Vostok 420,000, so Dome C is 380,000 years longer": a difference
    // measures neither subject's span or level; only a value that states a change may bind it.
    const difference = isDifference(sentence, quantities, i, role);
    const scoreIn = (seen: TermHits, vetoed: TermHits) =>
      packs.references
        .filter((r) => r.dimensions.includes(q.dimension) && roleFits(r.binding.role, role, q) && (!difference || r.binding.role === 'change') && satisfies(r, withoutNestedInVetoes(r, seen), vetoed) && (canState(r, q) || toldAsLength(sentence, q, r, seen)))
        .map((r) => ({ r, score: nearness(r, seen, q, breaks) }))
        .sort((a, b) => a.score - b.score);
    // "The end of the last deglaciation (about 5,000 years ago) opened the Holocene": a number alone in
    // brackets after a noun phrase is that phrase's; the words before the bracket decide first.
    const phrase = bracketedAfterPhrase(sentence, q);
    const inPhrase = phrase === undefined ? [] : scoreIn(before(view, phrase), before(vetoes, phrase));
    let scored = inPhrase.length > 0 ? inPhrase : scoreIn(view, vetoes);
    // A ceiling binds the highest level when some value reads it, not the level of today or of a period.
    if (bound !== undefined) {
      const extreme = scored.filter(({ r }) => r.binding.all.some((g) => g.includes(BOUND_TERMS[bound.kind])));
      if (extreme.length > 0) scored = extreme;
    }
    // "Over the ice ages CO2 stayed between 180 and 380 ppm": a range that reaches both ends is the span.
    scored = spanOrEnds(scored, q, packs, sentence);
    const [best, next] = scored;
    if (best !== undefined) decided.set(i, next !== undefined && next.score === best.score ? AMBIGUOUS : best.r.id);
    else if ((fromApposition = bindApposition(sentence, q, role, view, hits, packs)) !== undefined) decided.set(i, fromApposition);
    // A calendar year ("before the year 2000") dates the sentence; it takes no subject from the one before.
    // Only a sentence that may refer back reads the one before (and only then compromise finds its subject).
    // A part of a whole ("80 metres of that rise") is no value of the whole, here or one sentence back.
    else if (q.statedUnit !== 'CE' && !parts.some((p) => p.index === i)) {
      const ownTime = quantities.some((o, j) => j !== i && (o.dimension === 'age' || o.dimension === 'duration') && o.statedUnit !== 'CE');
      const taken = resolved();
      // Two subjects of the kind named together ("Vostok and Dome C ... The core ..."): no reading.
      if (taken.state === 'ambiguous') return;
      // A subject named further back than the sentence before (or in this sentence's earlier clause)
      // lends its own words; one named in the sentence before lends that sentence, as a pronoun does.
      const far = taken.state === 'found' ? taken.referents.filter((r) => history[r.source] !== context) : [];
      if (far.length > 0) {
        const text = far.map((r) => r.text).join(', ');
        const found = bindFromContext(sentence, q, role, view, findTerms(text, packs), packs, breaks, vetoes, subjectBefore(text), { context: text, ownTime });
        if (found !== undefined) decided.set(i, found);
      } else if (context !== undefined && context.trim() !== '' && mayReferBack(sentence, packs, context)) {
        // "That core goes back 800,000 years. It records eight glacial cycles": the sentence before
        // took its subject from further back, and a pronoun here takes up that subject with it.
        const before = carriedContext(sentence, context, history, packs);
        contextHits ??= findTerms(before, packs);
        const found = bindFromContext(sentence, q, role, view, contextHits, packs, breaks, vetoes, subjectBefore(before), { context: before, ownTime });
        if (found !== undefined) decided.set(i, found);
      }
    }
    // "At the end of the last ice age, Antarctica warmed first. In the Antarctic cores CO2 trails
    // temperature by some 6,000 years": a period or region the passage set fills the value's setting.
    if (best === undefined && !decided.has(i) && q.statedUnit !== 'CE' && !parts.some((p) => p.index === i) && history.length > 0) {
      const ownTime = quantities.some((o, j) => j !== i && (o.dimension === 'age' || o.dimension === 'duration') && o.statedUnit !== 'CE');
      const others = quantities.filter((_, j) => j !== i);
      const referredTo = context !== undefined && mayReferBack(sentence, packs, context) ? context : undefined;
      const set = bindFromSetting(sentence, q, role, view, vetoes, packs, breaks, { hits, history, ownTime, others, ...(referredTo === undefined ? {} : { referredTo }) });
      if (set !== undefined) decided.set(i, set);
    }
    // "EPICA Dome C reached 3,623 metres": the subject is named and the unit says what is measured;
    // not after a stretch of it ("the lowest 200 m of Dome C hold 150,000 years": the stretch's years).
    if (best === undefined && !decided.has(i) && !quantities.slice(0, i).some(isStretch)) {
      const implied = bindImplied(sentence, q, role, view, vetoes, packs, difference, breaks);
      if (implied !== undefined) decided.set(i, implied);
    }
  });
  const bindings: Binding[] = [];
  const ambiguous: number[] = [];
  [...decided].sort(([a], [b]) => a - b).forEach(([quantityIndex, found]) => {
    if (found === AMBIGUOUS) ambiguous.push(quantityIndex);
    else if (found !== null) bindings.push({ quantityIndex, referenceId: found });
  });
  // "Over the past 800,000 years, the cycles came every 100,000 years": the frame sets the scene.
  return { bindings: wholesApart(parts, framesYield(sentence, quantities, bindings)), ambiguous };
}
