/**
 * Subjects named one sentence back. Drafts often name a subject and give its number in the next
 * sentence of the same paragraph:
 *
 *   "The GRIP team drilled at Summit. They drilled down just over 2,000 metres."
 *        ^^^^ ──────────────────────────────────────────────────── 2,000 metres (GRIP depth)
 *
 * Only a quantity with no candidate in its own sentence looks back; only when its sentence refers
 * back (back-reference.ts, from the pack lexicon's `back-references` and `kinds`: a pronoun, a time
 * phrase such as "at that time", a description of a kind such as "that core"), as a
 * sentence that takes its subject from the one before does (a sentence that names its own subject,
 * "The EPICA Dome C core, 560 km away, ...", does not look back); and only when its own words name no
 * other subject: every term it can see that some value binds on must serve the value, unless it is
 * the baseline of a comparison ("colder than in pre-industrial times", "below today's") or qualifies
 * a term that serves ("global sea level"). The previous sentence may fill the groups the quantity's own sentence
 * lacks, never lift a veto, and brings its own vetoes; a group filled from there counts as far. Two values reachable this way
 * with the same score tie, and bind nothing.
 */
import { createTopicMatcher, type TopicMatcher } from '../prose/topic-matcher.js';
import { lexiconWords, type LexiconWord } from '../prose/lexicon-words.js';
import { afterDemonstrative, measureSubject, refersBack, termsOfKind } from './back-reference.js';
import { formsOf, subjectWordsOf } from '../propositions/lexicon.js';
import type { LoadedPacks, ReferenceValue } from '../rulepack/types.js';
import type { Quantity } from '../types.js';
import { canState, nearness } from './bind-match.js';
import { roleFits, type ReadRole } from './bind-role.js';
import { CLAUSE_PENALTY, type TermHits } from './bind-view.js';

/** What a group filled from the previous sentence adds to a value's distance. */
export const CONTEXT_PENALTY = 3 * CLAUSE_PENALTY;
/** The baseline of a comparison: "colder than in pre-industrial times", "40 metres below today's". */
const BASELINE = /(?:^|[^\p{L}])(?:than|below|above|beneath)(?:\s+[\p{L}-]+){0,2}\s*$/iu;
/** How many words a comparison's baseline noun phrase may hold between "than" and its "of". */
const BASELINE_WORDS = 6;

/**
 * Whether the figure at `start` closes the noun phrase a comparison holds up as its baseline: "than",
 * a noun phrase of words (no figure), "of", then the figure ("longer than a very long human life of
 * 100 years"). Cut into the lexicon's words, so no list of determiners is needed.
 */
function inBaselinePhrase(sentence: string, start: number): boolean {
  const before = lexiconWords(sentence.slice(0, start));
  const last = before.at(-1);
  if (last?.text !== 'of' || /\S/u.test(sentence.slice(last.end, start))) return false;
  for (let i = before.length - 2, n = 0; i >= 0 && n <= BASELINE_WORDS; i -= 1, n += 1) {
    const word = before[i] as LexiconWord;
    if (/[.;:!?]/u.test(sentence.slice(word.end, (before[i + 1] as LexiconWord).start))) return false;
    if (word.text === 'than') return n > 0;
    if (/^\p{N}/u.test(word.text)) return false;
  }
  return false;
}
/** What may stand between a qualifier and the subject it qualifies: "global sea level", "global-mean". */
const QUALIFIES = /^[\s-]*$/u;

const bindingTerms = new WeakMap<object, Set<string>>();
const subjectMatchers = new WeakMap<object, TopicMatcher>();

/** Lexicon classes whose words name what a number is about: a place, or a change rather than a level. */
const OTHER_SUBJECT_CLASSES: [string, string[]][] = [
  ['regions', []],
  ['changes', ['up', 'down']],
];
/** A year in a term's words ("2023", "the 2010s", "1750") dates the sentence: a time frame of its own. */
const YEAR = /(?<!\d)\d{4}(?:s|'s)?(?!\d)/u;

/**
 * Whether a term's words name a subject of their own: a core, a gas, a period (the lexicon's subject
 * words), a region, a change, or a date. An attribute ("record", "the longest", "to date", "of the
 * atmosphere", "ended abruptly") says what is measured or how, and speaks of the subject before as
 * well as of any other.
 */
function namesSubject(words: string, packs: LoadedPacks): boolean {
  let matcher = subjectMatchers.get(packs);
  if (matcher === undefined) {
    const lexicon = packs.lexicon;
    const others = OTHER_SUBJECT_CLASSES.flatMap(([cls, keys]) =>
      Object.entries(lexicon[cls] ?? {})
        .filter(([key]) => keys.length === 0 || keys.includes(key))
        .flatMap(([, phrases]) => phrases.flatMap((p) => (/\s/u.test(p.trim()) ? [p] : formsOf(p.toLowerCase())))),
    );
    matcher = createTopicMatcher([...subjectWordsOf(lexicon), ...others]);
    subjectMatchers.set(packs, matcher);
  }
  return YEAR.test(words) || matcher.test(words);
}

const timeTerms = new WeakMap<object, { dates: Set<string>; times: Set<string> }>();

/** The pack's date terms (every word a year or a decade: "2019", "2000s") and time terms (`kind-members.time`, and every term with a year in a word). */
function timeTermsOf(packs: LoadedPacks): { dates: Set<string>; times: Set<string> } {
  let known = timeTerms.get(packs);
  if (known === undefined) {
    const dates = new Set(packs.terms.filter((t) => t.words.length > 0 && t.words.every((w) => DATE.test(w.trim()))).map((t) => t.id));
    const times = new Set([...termsOfKind(packs, 'time'), ...packs.terms.filter((t) => t.words.some((w) => YEAR.test(w))).map((t) => t.id)]);
    known = { dates, times };
    timeTerms.set(packs, known);
  }
  return known;
}

/** Whether a term is a date: every word of it a year or a decade. */
function isDate(id: string, packs: LoadedPacks): boolean {
  return timeTermsOf(packs).dates.has(id);
}

/** Whether the value fills a group made of time terms only (its period) from the sentence before. */
function takesTime(r: ReferenceValue, view: TermHits, context: TermHits, packs: LoadedPacks): boolean {
  const { times } = timeTermsOf(packs);
  return r.binding.all.some((g) => g.length > 0 && g.every((id) => times.has(id)) && !g.some((id) => view.has(id)) && g.some((id) => context.has(id)));
}

/** A preposition of time opening a sentence, after an adverb of nearness: "By the eve of ...", "Just before ...". */
const OPENS_ON_TIME = /^[\s"'“‘*_(-]*(?:(?:just|shortly|right|soon|long|not\s+long|well|only)\s+)?(?:by|before|after|until|till|since|prior\s+to)(?![\p{L}])/iu;

/**
 * Whether the sentence opens on a time of its own: a preposition of time whose phrase (up to the first
 * comma, or the whole sentence) does not refer back ("By the eve of the industrial age it had reached
 * ...", "Just before the first factories, it stood at ..."; not "By then, it had ...").
 */
export function opensOnOwnTime(sentence: string, packs: LoadedPacks): boolean {
  const open = OPENS_ON_TIME.exec(sentence);
  if (open === null) return false;
  const rest = sentence.slice(open[0].length);
  const comma = rest.search(/[,;:]/u);
  // Without a comma the phrase runs to the subject pronoun: read up to the first pronoun of the sentence.
  const phrase = comma >= 0 ? rest.slice(0, comma) : rest.split(/\s+(?=(?:it|they|this|these|those|there)\s)/iu)[0] ?? rest;
  return /\p{L}{3}/u.test(phrase) && !refersBack(`${open[0]}${phrase}`, packs);
}

/** A year or a decade written alone. */
const DATE = /^\d{4}(?:s|'s)?$/u;

/**
 * Whether a value is dated: one of its groups is made of time terms only (the level of 2019, of
 * today, of pre-industrial times, of the LGM). A date in its sentence then speaks of the value's time.
 */
function isDated(r: ReferenceValue, packs: LoadedPacks): boolean {
  const { times } = timeTermsOf(packs);
  return r.binding.all.some((g) => g.length > 0 && g.every((id) => times.has(id)));
}

/** The sentence before, and whether the quantity's own sentence states a stretch or point of time of its own. */
export interface OwnFrame {
  context: string;
  ownTime: boolean;
}

/**
 * True when `sentence` may take a subject from the sentence before (a back-reference, a bare measure
 * subject, an answer to a question: "Sea level at the LGM? About 120 m lower than today.", or what a
 * sentence ending in a colon introduces: "How deep the two boreholes go:" before "- Vostok, 3,623 m");
 * bindFromContext binds nothing otherwise.
 */
export function mayReferBack(sentence: string, packs: LoadedPacks, before?: string): boolean {
  return refersBack(sentence, packs) || (before !== undefined && (ASKS.test(before) || INTRODUCES.test(before)));
}

/** A sentence that asks: the next one answers it, and its subject is the question's. */
const ASKS = /\?[\s"'”’)\]*_]*$/u;
/**
 * A sentence that ends in a colon introduces what follows (a list, its items): each item is elliptic,
 * the measure or the subject the lead-in names is its own. The sentence splitter ends no sentence at a
 * colon inside a paragraph, so this is a lead-in before another block.
 */
const INTRODUCES = /:[\s"'”’)\]*_]*$/u;

/** The reference value the previous sentence's terms let the quantity bind, `ambiguous`, or undefined. */
export function bindFromContext(
  sentence: string,
  q: Quantity,
  role: ReadRole,
  view: TermHits,
  context: TermHits,
  packs: LoadedPacks,
  breaks: number[],
  vetoes: TermHits = view,
  contextSubject?: [number, number] | (() => [number, number] | undefined),
  frame?: OwnFrame,
): string | 'ambiguous' | undefined {
  if (!mayReferBack(sentence, packs, frame?.context)) return undefined;
  // "That's 800,000 years, about 8,000 times longer than a human life of 100 years": a figure in the
  // noun phrase a comparison holds up as its baseline measures that phrase's own head, not the subject before.
  if (inBaselinePhrase(sentence, q.start)) return undefined;
  // "The ice goes back 800,000 years, and over that entire span CO2 stayed between 170 and 300 ppm":
  // a sentence that states its own stretch of time takes no date ("in 2019") from the one before.
  const dated = (id: string): boolean => frame !== undefined && (context.get(id) ?? []).some(([start, end]) => YEAR.test(frame.context.slice(start, end)));
  const takesDate = (r: ReferenceValue): boolean => r.binding.all.some((g) => !g.some((id) => view.has(id)) && g.every((id) => !context.has(id) || dated(id)));
  const own = subjectTerms(sentence, vetoes, packs, q.dimension);
  const contextText = frame?.context ?? '';
  const attribute = (id: string): boolean => (context.get(id) ?? []).some(([start, end]) => !namesSubject(contextText.slice(start, end), packs));
  const borrowsAttribute = (r: ReferenceValue): boolean => r.binding.all.some((g) => !g.some((id) => view.has(id)) && g.some((id) => attribute(id)));
  const candidates = packs.references
    .filter((r) => r.dimensions.includes(q.dimension) && roleFits(r.binding.role, role) && canState(r, q))
    .filter((r) => !r.binding.none.some((id) => vetoes.has(id)))
    // "The core was drilled through the early 2000s until it reached 3,623 metres": a date is the
    // time frame of what the sentence tells, not a subject of its own, unless the value is itself dated.
    .filter((r) => ownSubjectsServe(sentence, r, view, own, packs))
    .filter((r) => r.binding.all.every((g) => g.some((id) => view.has(id) || context.has(id))))
    // What a value takes from the sentence before besides a subject (an attribute such as "the
    // longest") comes with that sentence's vetoes: "The longest record comes from Dome C. Vostok got
    // us to 420 kyr." takes "longest" with "Dome C", which rules out a longest record told of Vostok.
    // A subject taken up by a pronoun ("CO2 ... It lagged by ...") brings only itself.
    .filter((r) => !borrowsAttribute(r) || !r.binding.none.some((id) => context.has(id)))
    .filter((r) => frame?.ownTime !== true || !takesDate(r))
    // "At the peak of the last ice age it stood near 190 ppm. By the eve of the industrial age it had
    // reached about 280 ppm": a sentence that opens on a time of its own takes no time from the one before.
    .filter((r) => !takesTime(r, view, context, packs) || !opensOnOwnTime(sentence, packs));
  // The more specific reading wins: a value that vetoes a word present in either sentence gives way
  // to one that needs it ("at that time" after "the Last Glacial Maximum": the LGM level, not the typical glacial one).
  const present = (id: string): boolean => view.has(id) || context.has(id);
  const specific = candidates.filter((r) => !candidates.some((o) => o !== r && r.binding.none.some((id) => present(id) && o.binding.all.some((g) => g.includes(id)))));
  // A lone candidate needs no score: the subject of the sentence before (compromise's reading of
  // it, given as a function) is read only when two candidates are ranked by it.
  if (specific.length < 2) return specific[0]?.id;
  let subject: [number, number] | undefined | null = typeof contextSubject === 'function' ? null : contextSubject;
  const subjectBefore = (): [number, number] | undefined => (subject === null ? (subject = (contextSubject as () => [number, number] | undefined)()) : subject);
  const scored = specific
    .map((r) => ({ r, score: scoreWithContext(r, view, q, breaks, context, subjectBefore) }))
    .sort((a, b) => a.score - b.score);
  const [best, next] = scored;
  if (best === undefined) return undefined;
  return next !== undefined && next.score === best.score ? 'ambiguous' : best.r.id;
}

/**
 * Whether every subject the sentence names of its own (`own`, from `ownSubjects`) serves the value:
 * one of its groups holds it, it is a date and the value is of no time, or it qualifies a term that
 * serves or is a word of one. A sentence that names another subject keeps its own.
 */
export function ownSubjectsServe(sentence: string, r: ReferenceValue, view: TermHits, own: [string, [number, number][]][], packs: LoadedPacks): boolean {
  const serves = (id: string): boolean => r.binding.all.some((g) => g.includes(id));
  return own.every(([id, spans]) => serves(id) || (isDate(id, packs) && !isDated(r, packs)) || spans.every((span) => qualifiesServing(sentence, span, view, serves) || withinServing(span, view, serves)));
}

/** The terms of its own sentence that name a subject a quantity could be about (see subjectTerms). */
export function ownSubjects(sentence: string, vetoes: TermHits, packs: LoadedPacks, dimension: Quantity['dimension']): [string, [number, number][]][] {
  return subjectTerms(sentence, vetoes, packs, dimension);
}

/**
 * Whether a term stands directly before a term that serves the value, qualifying it, or inside one:
 * in "global sea level" the word "global" names no subject of its own, so it does not stop a
 * sea-level value.
 */
function qualifiesServing(sentence: string, [from, end]: [number, number], view: TermHits, serves: (id: string) => boolean): boolean {
  // "40 m lower than today": a change word inside a term that serves ("lower than today") is part of it.
  return [...view].some(([id, spans]) => serves(id) && spans.some(([start, stop]) => (start >= end && QUALIFIES.test(sentence.slice(end, start))) || (start <= from && stop >= end)));
}

/**
 * Whether a term is a word of a longer term that serves the value: "ice age" in "the end of the last
 * ice age" (the deglaciation) names no subject of its own.
 */
function withinServing([start, end]: [number, number], view: TermHits, serves: (id: string) => boolean): boolean {
  return [...view].some(([id, spans]) => serves(id) && spans.some(([s, e]) => s <= start && e >= end && e - s > end - start));
}

/**
 * The terms a quantity sees that some value binds on and that name a subject (with their own
 * spans), leaving out the baselines of comparisons and the back-references themselves.
 */
function subjectTerms(sentence: string, view: TermHits, packs: LoadedPacks, dimension: Quantity['dimension']): [string, [number, number][]][] {
  let binding = bindingTerms.get(packs);
  if (binding === undefined) {
    binding = new Set(packs.references.flatMap((r) => r.binding.all.flat()));
    bindingTerms.set(packs, binding);
  }
  const used = binding;
  // The words of a bare measure subject ("The global average", "the level") are the back-reference itself.
  const measure = measureSubject(sentence, packs);
  const inMeasure = ([start, end]: [number, number]): boolean => measure !== undefined && start >= measure[0] && end <= measure[1];
  // An attribute that names a measure this number could state ("a record of 800,000 years": the
  // measure of a subject, a value bound by the subject and one more group, as in a measure family)
  // is as much the number's own subject as a core or a gas; one that cannot ("to date", "of the
  // atmosphere" beside a span of years, "ended abruptly") is not.
  const namesMeasure = (id: string): boolean =>
    packs.references.some((r) => r.binding.all.length <= 2 && r.dimensions.includes(dimension) && r.binding.all.some((g) => g.includes(id)));
  const ownSubject = (id: string, [start, end]: [number, number]): boolean =>
    !inMeasure([start, end]) &&
    (namesMeasure(id) || namesSubject(sentence.slice(start, end), packs)) &&
    !BASELINE.test(sentence.slice(Math.max(0, start - 40), start)) &&
    !afterDemonstrative(sentence, start, packs);
  return [...view]
    .map(([id, spans]): [string, [number, number][]] => [id, used.has(id) ? spans.filter((span) => ownSubject(id, span)) : []])
    .filter(([, spans]) => spans.length > 0);
}

/**
 * Own groups count by nearness; a group only the previous sentence fills counts `CONTEXT_PENALTY`,
 * and a `CLAUSE_PENALTY` more when none of its words stands in that sentence's subject: a pronoun
 * follows the subject of the sentence before, not any word of it.
 */
function scoreWithContext(r: ReferenceValue, view: TermHits, q: Quantity, breaks: number[], context: TermHits, subjectBefore: () => [number, number] | undefined): number {
  const ownGroups = r.binding.all.filter((g) => g.some((id) => view.has(id)));
  const inSubject = (g: string[]): boolean => {
    const subject = subjectBefore();
    return subject !== undefined && g.some((id) => (context.get(id) ?? []).some(([start, end]) => start >= subject[0] && end <= subject[1]));
  };
  const fromContext = r.binding.all.filter((g) => !ownGroups.includes(g)).reduce((sum, g) => sum + CONTEXT_PENALTY + (inSubject(g) ? 0 : CLAUSE_PENALTY), 0);
  return nearness({ ...r, binding: { ...r.binding, all: ownGroups } }, view, q, breaks) + fromContext;
}
