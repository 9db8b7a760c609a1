/**
 * A figure whose unit says what it measures. Writers name the subject and give the number, with no
 * word for the attribute, because the unit tells it:
 *
 *   "EPICA Dome C reached 3,623 metres."      a core and a length: its drilled depth
 *    ^^^^^^^^^^^^ subject      └ length ┘
 *   "Dome Fuji gives us some 720,000 years."  a core and a span of years: its record's span
 *
 * Read from the pack alone. A term names a subject when the first phrase the pack gives it holds a
 * subject word of the lexicon (a core, the gas, a period, the orbit: `lexicon.subjects` and
 * `lexicon.periods`); a value's group with no such term is an attribute group ("depth", "record").
 * A quantity with no value in its own words may bind a value of two groups, a subject and an
 * attribute, whose subject its view names before the number and whose attribute it lacks, when among
 * ALL the pack's values whose groups the view fills but for one attribute group, exactly one accepts
 * the quantity's dimension (the value's own, not one it may also be stated in: a date beside a core
 * or a period says when something happened there) and its role. A value that needs a word another
 * such value vetoes is the marked reading and gives way, as in an apposition (the record span vetoes
 * "delta-age", so the delta-age yields). Two or more left: nothing binds, as before. A word past a
 * clause break after the number speaks of that clause, and counts for none of this.
 *
 * Never when the sentence names another measure of the figure's dimension: a word of the lexicon's
 * `other-measures` for that dimension ("above sea level", "km from", "took"; every inflection), or
 * a word of the view that some value of that dimension needs as its attribute and this value does
 * not ("thick" is the ice thickness at Vostok, not a depth of EPICA Dome C). Never against a value's
 * vetoes, never for a value whose `binds_when.implied` is false, and only at the value's scale
 * (within a factor of ten of its range): "Dome Fuji was drilled over ten years" is no record span.
 */
import { subjectWordsOf, phraseWords } from '../propositions/lexicon.js';
import type { LoadedPacks, ReferenceValue } from '../rulepack/types.js';
import type { Quantity } from '../types.js';
import { phrasesTrie, type FormsTrie } from './forms-trie.js';
import { canState } from './bind-match.js';
import { roleFits, type ReadRole } from './bind-role.js';
import type { TermHits } from './bind-view.js';

/** How far outside a value's range a figure may lie and still be read as stating it: a factor of ten. */
const SCALE = 10;

interface ImpliedData {
  /** Term ids that name a subject. */
  subjects: Set<string>;
  /** Per dimension, the attribute terms that some value of that dimension needs. */
  attributes: Map<string, Set<string>>;
  /** Per dimension, the words of measures no value holds. */
  others: Map<string, FormsTrie>;
}

const compiledData = new WeakMap<LoadedPacks, ImpliedData>();

/** Whether the words of `phrase` hold a run that `subjectWords` lists. */
function namesSubject(phrase: string, subjectWords: Set<string>): boolean {
  const words = phraseWords(phrase);
  for (let i = 0; i < words.length; i += 1) {
    for (let j = i + 1; j <= words.length; j += 1) if (subjectWords.has(words.slice(i, j).join(' '))) return true;
  }
  return false;
}

function dataOf(packs: LoadedPacks): ImpliedData {
  let data = compiledData.get(packs);
  if (data !== undefined) return data;
  const subjectWords = new Set(subjectWordsOf(packs.lexicon).map((w) => w.toLowerCase()));
  // A term's first phrase is its name: "Lake Vostok" names a subject, "depth" and "record" do not.
  const subjects = new Set(packs.terms.filter((t) => t.words[0] !== undefined && namesSubject(t.words[0], subjectWords)).map((t) => t.id));
  const attributes = new Map<string, Set<string>>();
  for (const r of packs.references) {
    const set = attributes.get(r.dimension) ?? new Set<string>();
    for (const group of r.binding.all) if (!group.some((id) => subjects.has(id))) for (const id of group) set.add(id);
    attributes.set(r.dimension, set);
  }
  const others = new Map<string, FormsTrie>();
  for (const [dimension, phrases] of Object.entries(packs.lexicon['other-measures'] ?? {})) {
    const trie = phrasesTrie(phrases);
    if (trie !== undefined) others.set(dimension, trie);
  }
  data = { subjects, attributes, others };
  compiledData.set(packs, data);
  return data;
}

/**
 * The pack's subject terms (a term whose name holds a subject word: "Vostok", "sea level") and, for
 * `dimension`, the attribute terms some value of that dimension needs ("depth", "lag"), as this
 * reading sorts them; checks/unbound-slips.ts sorts a figure's named values by them.
 */
export function termSorts(packs: LoadedPacks, dimension: string): { subjects: ReadonlySet<string>; attributes: ReadonlySet<string> } {
  const { subjects, attributes } = dataOf(packs);
  return { subjects, attributes: attributes.get(dimension) ?? new Set<string>() };
}

/** The groups of `r` that `view` fills none of. */
function missingGroups(r: ReferenceValue, view: TermHits): string[][] {
  return r.binding.all.filter((g) => !g.some((id) => view.has(id)));
}

/** Whether `q`'s interval lies within a factor of SCALE of `r`'s range (a range reaching zero or below: always). */
function atScale(r: ReferenceValue, q: Pick<Quantity, 'low' | 'high'>): boolean {
  if (r.low <= 0) return true;
  return q.high >= r.low / SCALE && q.low <= r.high * SCALE;
}

/**
 * The value `q` states by its unit beside a subject with no word for the attribute, or undefined.
 * `view` is the quantity's words, `vetoes` the words that may veto a value for it, `difference` true
 * when it states a difference (only a change value may take it), `breaks` the sentence's clause breaks.
 */
export function bindImplied(sentence: string, q: Quantity, role: ReadRole, view: TermHits, vetoes: TermHits, packs: LoadedPacks, difference: boolean, breaks: number[]): string | undefined {
  // A calendar year dates the sentence, and a date beside a core or a period says when something
  // happened there ("About 12,900 years ago, just as the thaw ..."): neither measures the subject.
  if (q.statedUnit === 'CE' || q.dimension === 'age') return undefined;
  // A multiple ("ten times", "a factor of ten") has no unit that says what it multiplies: a pace, a
  // level, a slip in a figure. Only words that name the measure ("faster") bind it.
  if (q.dimension === 'ratio') return undefined;
  const { subjects, attributes, others } = dataOf(packs);
  const named = [...view.keys()];
  if (!named.some((id) => subjects.has(id))) return undefined;
  // A word before the number, or after it in its clause: past a clause break after the number, a
  // word speaks of that clause ("Vostok comes second at 720,000 years, with Dome Fuji behind").
  const beside = ([start]: [number, number]): boolean => start < q.start || !breaks.some((b) => b >= q.end && b < start);
  const pool = packs.references.filter((r) => {
    if (r.dimension !== q.dimension || r.binding.implied === false || r.binding.all.length < 2) return false;
    if (!roleFits(r.binding.role, role, q) || (difference && r.binding.role !== 'change')) return false;
    const missing = missingGroups(r, view);
    if (missing.length !== 1 || (missing[0] as string[]).some((id) => subjects.has(id))) return false;
    return r.binding.all.some((g) => g.some((id) => subjects.has(id) && (view.get(id) ?? []).some(beside)));
  });
  // A value whose missing words another value vetoes is the marked reading: it gives way.
  const unmarked = pool.filter((r) => !pool.some((o) => o !== r && (missingGroups(r, view)[0] as string[]).every((id) => o.binding.none.includes(id))));
  // Two or more readings: nothing binds. What follows only blocks the one reading, never picks it.
  const r = unmarked.length === 1 ? unmarked[0] : undefined;
  // Only a value of a subject and one attribute: a third group ("today" in CO2's share of the air
  // today) qualifies the measure, and a figure stands for it only when the words say so.
  if (r === undefined || r.binding.all.length !== 2 || r.binding.none.some((id) => vetoes.has(id)) || !canState(r, q) || !atScale(r, q)) return undefined;
  const own = new Set(r.binding.all.flat());
  // The subject is what the clause speaks of before the figure: "... before the climate tipped into
  // the mild Holocene" names a period after it, not the subject of "three thousand years".
  if (!named.some((id) => subjects.has(id) && own.has(id) && (view.get(id) ?? []).some(([, end]) => end <= q.start))) return undefined;
  // "Vostok lies 560 km from Dome C": another subject is named beside the number.
  if (named.some((id) => subjects.has(id) && !own.has(id) && (view.get(id) ?? []).some(beside))) return undefined;
  // "EPICA Dome C's ice is 3,200 m thick": the view names another attribute of the dimension (a word
  // past a clause break after the number speaks of that clause).
  const attributesOfDimension = attributes.get(q.dimension) ?? new Set<string>();
  if (named.some((id) => attributesOfDimension.has(id) && !own.has(id) && (view.get(id) ?? []).some(beside))) return undefined;
  // "Dome C sits 3,233 m above sea level": the sentence names a measure no value holds.
  const other = others.get(q.dimension);
  if (other !== undefined && other.occurrences(sentence).length > 0) return undefined;
  return r.id;
}
