/**
 * Every figure of a sentence (and of the sentences before it in its paragraph) with its role: a
 * level, a change, a relative change (a percentage or fraction of where it started), a multiple, a
 * rate, a span of time or a date. The role comes from the figure's dimension and the word classes
 * next to it (word-classes.ts), never from a frame of fixed words: "a jump of about 115", "up 124
 * ppm", "+115 ppm", "190 ppm more than", "the remaining 50" are all changes because a change word,
 * a comparative, a sign or a remainder word stands beside the figure.
 */
import { parseQuantities, writtenInterval as w } from '../../quantities/index.js';
import { divide, minus, size, type Derived } from '../arithmetic-derive.js';
import type { Dimension, Quantity } from '../../types.js';
import { WORDS, wordsIn, type Word } from './word-classes.js';

export type Role = 'level' | 'change' | 'relative' | 'multiple' | 'rate' | 'duration' | 'date' | 'other';

/** One figure as the reader sees it. */
export interface Figure {
  q: Quantity;
  role: Role;
  /** What it can be set against: levels and changes of one family share a unit ('concentration', 'temperature', 'length', 'number'...). */
  family: string;
  /** The direction its words give it: +1 up, -1 down, 0 none. */
  sign: number;
  /** 0 for the sentence checked, 1 for the one before, and so on. */
  sentence: number;
  /** Reading order across the sentences. */
  order: number;
  /** For an amount over the time it took ("100 ppm over 7,000 years"), the pace it gives and its words. */
  pace?: { value: Derived; text: string; end: number };
  /** True when a remainder word names it as what is left of a whole ("the remaining 50"). */
  remainder: boolean;
  /** The words just before it (back to the figure before or the clause's start) and just after it. */
  before: Word[];
  after: Word[];
}

const LEVEL_FAMILY: Partial<Record<Dimension, string>> = { concentration: 'concentration', temperature: 'temperature', 'temperature-change': 'temperature', length: 'length', count: 'count', number: 'number' };
const RATES: Dimension[] = ['concentration-rate', 'temperature-rate', 'length-rate'];
/** Words that may stand between a change word and its figure without changing what it is. */
/**
 * Loose hedges the quantity reader leaves outside the number ("went up by something like 130 ppm",
 * "added like 200 ppm", "rose somewhere about 90") (common practice: English approximators).
 */
const LOOSE_HEDGES = new Set(['something', 'like', 'somewhere']);
const FILLERS = new Set(['only', 'just', 'barely', 'merely', 'mere', 'a', 'an', 'the', 'by', 'of', 'some', 'another', 'good', 'full', 'whole', 'measly', 'extra', 'order', ...LOOSE_HEDGES]);

/** The first words after the figure, up to the next figure or the end of its clause. */
function wordsAfter(text: string, q: Quantity, next: Quantity | undefined): Word[] {
  const stop = Math.min(next?.start ?? text.length, q.end + 40);
  const clause = text.slice(q.end, stop).search(/[.;!?]\s|[.;!?]$/u);
  return wordsIn(text, q.end, clause < 0 ? stop : q.end + clause).slice(0, 4);
}

/** The words before the figure, back to the figure before it or the start of its clause. */
function wordsBefore(text: string, q: Quantity, prev: Quantity | undefined): Word[] {
  const from = Math.max(prev?.end ?? 0, q.start - 60);
  const head = text.slice(from, q.start);
  const cut = Math.max(head.lastIndexOf('. '), head.lastIndexOf('; '), head.lastIndexOf('? '), head.lastIndexOf('! '));
  return wordsIn(text, cut < 0 ? from : from + cut + 2, q.start);
}

/** The last word before the figure that is no filler ("rose by only" → rose). */
const lastMeaningful = (before: Word[]): Word | undefined => [...before].reverse().find((w) => !FILLERS.has(w.text));

/** The sign of a change word right before the figure (a verb, a particle, "a rise of"), or undefined. */
function changeBefore(before: Word[]): number | undefined {
  const last = before.at(-1)?.text;
  const word = lastMeaningful(before);
  if (word === undefined) return undefined;
  // "up to 280" is a bound or an end, not a change; "comes to", "amounts to" join a complement.
  if (last === 'to') return WORDS.copulas.has(before.at(-2)?.text ?? '') ? copulaSubject(before.slice(0, -1)) : undefined;
  const verb = WORDS.changeVerbs.get(word.text);
  if (verb !== undefined && last !== 'of') return verb;
  const particle = WORDS.particles.get(word.text);
  // "up 124 ppm", "up by a third", but not "has taken up a quarter": a particle of a phrasal verb is no change.
  const at = before.lastIndexOf(word);
  const byOnly = before.slice(at + 1).every((x) => x.text === 'by' || LOOSE_HEDGES.has(x.text));
  if (particle !== undefined && byOnly && !WORDS.phrasalHeads.has(before.at(at - 1)?.text ?? '')) return particle;
  // "a jump of about", "an increase of roughly".
  if (last === 'of') {
    const noun = WORDS.changeNouns.get(word.text);
    if (noun !== undefined) return noun;
  }
  if (WORDS.remainder.has(word.text)) return 0;
  return copulaSubject(before);
}

/**
 * "the swing was of the order of 110 ppm", "the rise is about 90": a change noun as the subject
 * of a copula whose complement is the figure. `before` ends at the copula or at fillers after it.
 */
function copulaSubject(before: Word[]): number | undefined {
  const word = lastMeaningful(before);
  if (word === undefined) return undefined;
  const k = before.lastIndexOf(word);
  if (WORDS.copulas.has(word.text) && k > 0) {
    const subject = lastMeaningful(before.slice(0, k));
    const noun = subject === undefined ? undefined : WORDS.changeNouns.get(subject.text);
    if (noun !== undefined) return noun;
  }
  return undefined;
}

/** True when the figure is written as a range ("172 to 300 ppm", "180–190"): a span of readings, no amount of change. */
const isRange = (q: Quantity): boolean => /\d[^\d]{0,12}?(?:to|–|—|-|and)\s*[~≈]?\d/u.test(q.text);

/** Words that open a noun's modifier after it: a preposition or a comma's parenthesis ("the jump out of each ice age"). */
const MODIFIER_OPENERS = new Set(['of', 'from', 'out', 'between', 'in', 'across', 'over', 'during', 'at', 'since', 'through', 'into', 'for', 'after', 'around']);
/** Modifier openers that may hold the levels the change runs between ("the swing from 185 to 280 ppm was"). */
const PAIR_OPENERS = new Set(['from', 'between']);
/** Words that end the subject of a copula looked back from it: a clause break, a verb, a relative word. */
const SUBJECT_BREAKS = new Set(['so', 'and', 'but', 'while', 'whereas', 'which', 'that', 'who', 'because', 'thus', 'hence', 'then', 'if', 'when', 'or', 'yet']);
/** Prepositions that put a noun after them in a phrase, not the subject ("during the rise", "by the end of the climb"). */
const SUBJECT_LEADS = new Set(['during', 'by', 'with', 'on', 'to', 'before', 'until', 'till', 'within', 'about', 'like', 'than', 'as']);
/** Change verbs whose base form is also an adjective ("a warm period", "cool water"): no verb inside a subject. */
const ADJECTIVE_FORMS = new Set(['warm', 'cool', 'thin', 'lower', 'deep', 'deepen']);
/** How many words the subject's noun may stand before its copula. */
const SUBJECT_REACH = 20;

/**
 * "A typical swing, from about 185 ppm in a cold phase to 280 ppm in a warm one, is some 90 ppm",
 * "the jump out of each glacial was roughly 100 ppm", "the swing between cold and warm, by my sums,
 * comes to 90 ppm": a change noun heads the subject of the copula before the figure, with a
 * modifier (a preposition's phrase or a parenthesis after a comma) between the noun and the copula.
 * The subject is read back from the copula to a clause break; figures in the modifier are allowed
 * only when it opens with "from" or "between" (the levels the change runs between).
 */
function subjectChange(text: string, q: Quantity, qs: readonly Quantity[]): number | undefined {
  const clauseStart = Math.max(0, ...['. ', '; ', '? ', '! ', ': '].map((m) => text.lastIndexOf(m, q.start) + 2));
  const words = wordsIn(text, clauseStart, q.start);
  let c = words.length - 1;
  while (c >= 0 && FILLERS.has((words[c] as Word).text)) c--;
  let copula = words[c];
  // "comes to", "amounts to": the copula is the word before "to".
  if (copula?.text === 'to' && WORDS.copulas.has(words[c - 1]?.text ?? '')) copula = words[--c];
  if (copula === undefined || !WORDS.copulas.has(copula.text)) return undefined;
  for (let i = c - 1; i >= 0 && c - i <= SUBJECT_REACH; i--) {
    const x = words[i] as Word;
    // "the swing between cold and warm": "and" inside a "between" phrase joins its two ends.
    const joinsBetween = x.text === 'and' && words.slice(Math.max(0, i - 6), i).some((y) => y.text === 'between');
    if ((SUBJECT_BREAKS.has(x.text) && !joinsBetween) || WORDS.copulas.has(x.text) || (WORDS.changeVerbs.has(x.text) && !WORDS.changeNouns.has(x.text) && !ADJECTIVE_FORMS.has(x.text))) return undefined;
    const noun = WORDS.changeNouns.get(x.text);
    if (noun === undefined) continue;
    const next = words[i + 1] as Word;
    // The noun right before the copula is copulaSubject's reading.
    if (i + 1 === c) return undefined;
    // A comma in the modifier must close it (", by my sums,"): "At the peak of the rise, CO2 was" has no subject noun.
    const modifier = text.slice(x.end, copula.start).trim();
    if (modifier.includes(',') && !modifier.endsWith(',')) return undefined;
    const opener = MODIFIER_OPENERS.has(next.text) || modifier.startsWith(',');
    if (!opener) return undefined;
    // A noun after a preposition ("during the rise in temperature") is no subject.
    const lead = words.slice(Math.max(0, i - 3), i).map((y) => y.text);
    if (lead.some((y) => MODIFIER_OPENERS.has(y) || SUBJECT_LEADS.has(y))) return undefined;
    const held = qs.filter((g) => g.start >= x.end && g.end <= copula.start);
    const pairOpener = PAIR_OPENERS.has(next.text);
    if (held.length > 0 && !pairOpener) return undefined;
    return noun;
  }
  return undefined;
}

/** The sign of a comparative or change noun right after the figure ("140 ppm more", "a 40 percent increase", "80 ppm of warming"). */
function changeAfter(after: Word[]): number | undefined {
  const [a, b, c] = after;
  if (a === undefined) return undefined;
  const comparative = WORDS.comparatives.get(a.text);
  // "80 ppm over 7,000 years" is an amount over a time, not a comparison.
  if (comparative !== undefined && !(a.text === 'over' || a.text === 'under') && !(a.text === 'up' && b?.text === 'to')) return comparative;
  // "185 ppm rising to 280 ppm", "190 ppm, climbing up to 280": a verb of change going on to an end
  // level makes the figure where the change starts, a level.
  if (/(?:ing|ed)$|^(?:rose|fell|grew|sank)$/u.test(a.text) && (b?.text === 'to' || (b?.text === 'up' && c?.text === 'to'))) return undefined;
  // "140 ppm more CO2 than", "190 ppm more carbon dioxide": a noun may stand between.
  const noun = WORDS.changeNouns.get(a.text) ?? (a.text === 'of' ? (WORDS.changeNouns.get(b?.text ?? '') ?? WORDS.changeNouns.get(c?.text ?? '')) : undefined);
  return noun;
}

/** True when the figure stands in a bracket of a list marker, a clock time or a heading number: no quantity of the sentence's claim. */
function isLabel(text: string, q: Quantity): boolean {
  return /[[:]\s*$/u.test(text.slice(Math.max(0, q.start - 2), q.start)) || /^:\d/u.test(text.slice(q.end, q.end + 2));
}

/** True when an operator of a written sum stands beside the figure ("280 − 190 = 90"): the sum is arithmetic-equations.ts's. */
function inWrittenSum(text: string, q: Quantity): boolean {
  const body = q.text.replace(/^[+−-]\s*/u, '');
  const at = q.start + q.text.length - body.length;
  return /[−+×÷=≈*/-]\s*$/u.test(text.slice(Math.max(0, at - 3), at)) && /\d\s*[−+×÷=≈*/-]\s*$/u.test(text.slice(Math.max(0, at - 12), at)) || /^\s*[−+×÷=≈*/]\s*\d/u.test(text.slice(q.end, q.end + 6)) || /[=≈]\s*$/u.test(text.slice(Math.max(0, at - 3), at));
}

/** The roles of one sentence's figures. */
export function readSentence(text: string, qs: readonly Quantity[], sentence: number, base: number): Figure[] {
  const figures = qs.map((q, i): Figure => {
    const before = wordsBefore(text, q, qs[i - 1]);
    const after = wordsAfter(text, q, qs[i + 1]);
    const f: Figure = { q, role: 'other', family: '', sign: 0, sentence, order: base + q.start, before, after, remainder: WORDS.remainder.has(lastMeaningful(before)?.text ?? '') };
    const d = q.dimension;
    if (inWrittenSum(text, q)) return f;
    if (d === 'age') return { ...f, role: 'date', family: 'age' };
    if (d === 'duration') {
      const lastWord = before.at(-1)?.text ?? '';
      // "the newer core adds roughly 280,000 years", "the gas is 6,000 years younger": a span of time
      // with a change word or a comparative of its own is a difference between two spans or ages.
      // Only a comparative names the difference after the figure: "23,000 years, change how sunlight
      // lands" is a verb of the clause, not a change noun of the span.
      // Before it, only a verb of change does: "a span of 2,200 years" is the span itself.
      const verb = before.at(-1)?.text === 'of' ? undefined : WORDS.changeVerbs.get(lastMeaningful(before)?.text ?? '');
      const grows = verb ?? (WORDS.timeComparatives.has(after[0]?.text ?? '') ? WORDS.comparatives.get(after[0]?.text ?? '') : undefined);
      if (grows !== undefined && !WORDS.notASpan.has(lastWord)) return { ...f, role: 'change', family: 'duration', sign: grows };
      // "if the ice is 25,000 years old": an age told as how old a thing is, a level of time.
      if (after[0]?.text === 'old') return { ...f, role: 'level', family: 'duration' };
      if (WORDS.notASpan.has(lastWord) || WORDS.notASpan.has(after[0]?.text ?? '')) return f;
      return { ...f, role: 'duration', family: 'duration' };
    }
    if (RATES.includes(d)) return { ...f, role: 'rate', family: d };
    // "about 420 ppm, up 50 percent": a comparative after a comma speaks of the figure after it.
    const up = changeBefore(before) ?? (/^\s*[,;:]/u.test(text.slice(q.end, q.end + 3)) ? undefined : changeAfter(after)) ?? (isRange(q) ? undefined : subjectChange(text, q, qs));
    // "a quarter of our emissions", "20 percent of the rise": a share of something named after it, not a change.
    if (d === 'percent' || (d === 'ratio' && q.value < 1)) return up === undefined || after[0]?.text === 'of' ? f : { ...f, role: 'relative', sign: up };
    // "per doubling", "each doubling", "a doubling": the multiple is a measure's unit, not a claim.
    if (d === 'ratio') return WORDS.yardstick.has(before.at(-1)?.text ?? '') ? f : { ...f, role: 'multiple', sign: up ?? 0 };
    const family = LEVEL_FAMILY[d];
    if (family === undefined || isLabel(text, q) || WORDS.bearings.has(after[0]?.text ?? '')) return f;
    // "+115 ppm" is a change; "−25 °C" is a temperature below zero, a change only in other families.
    const signed = /^\+\s*\d/u.test(q.text) ? 1 : /^[−-]\s*\d/u.test(q.text) && family !== 'temperature' ? -1 : undefined;
    const change = signed ?? up;
    // "the yearly increase was about 0.8 ppm", "annual growth of 2.4 ppm": an amount each year is a pace per year.
    const pace = PACE_OF[family];
    if (pace !== undefined && before.some((x) => WORDS.perYear.has(x.text))) return { ...f, role: 'rate', family: pace };
    return change === undefined ? { ...f, role: 'level', family } : { ...f, role: 'change', family, sign: change };
  });
  return withPaces(text, restatements(text, giveBareUnits(text, figures.flatMap((f) => (f.role === 'level' ? splitRange(f) : [f])))));
}

/**
 * "a rise of 47 percent, or roughly 70 ppm": a figure after ", or" restates the change before it,
 * so it is a change too, in its own unit.
 */
function restatements(text: string, figures: Figure[]): Figure[] {
  return figures.map((f, i) => {
    // A date of the change may stand between: "a rise of 47 percent since 1750, or roughly 130 ppm".
    const prev = figures.slice(0, i).reverse().find((g) => g.role !== 'date');
    // "a rise of 132 ppm, or about 47 per cent": a share after it restates the change as relative to where it started.
    const share = f.role === 'other' && (f.q.dimension === 'percent' || (f.q.dimension === 'ratio' && f.q.value < 1)) && prev?.role === 'change';
    if ((f.role !== 'level' && !share) || prev === undefined || (prev.role !== 'change' && prev.role !== 'relative')) return f;
    if (!/^\s*(?:(?:since|from|in|by|over)\s+[^,;.]{0,30})?,?\s*(?:or|i\.e\.,?|that is,?)\s*$/iu.test(text.slice(prev.q.end, f.q.start))) return f;
    return share ? { ...f, role: 'relative', sign: prev.sign } : { ...f, role: 'change', sign: prev.sign };
  });
}

const PACE_OF: Record<string, Dimension> = { concentration: 'concentration-rate', temperature: 'temperature-rate', length: 'length-rate' };

/**
 * "100 ppm over 7,000 years", "140 ppm in about 200 years": an amount followed at once by the time
 * it took also gives a pace, read as one more figure (a rate) where the time stands.
 */
function withPaces(text: string, figures: Figure[]): Figure[] {
  const paces = figures.flatMap((g, i): Figure[] => {
    const d = figures[i + 1];
    const family = PACE_OF[g.family];
    if (d?.role !== 'duration' || family === undefined || (g.role !== 'change' && g.role !== 'level')) return [];
    if (!/^\s+(?:over|in|across|within)\s+(?:(?:the|those|these|some)\s+)?$/iu.test(text.slice(g.q.end, d.q.start))) return [];
    // "~190 → 280 ppm over roughly 7,000 yrs": the end of a pair of levels went up by their difference in that time.
    const from = figures[i - 1];
    const paired = g.role === 'level' && from?.role === 'level' && from.family === g.family && /^\s*(?:to|→|->|–|-)\s*$/u.test(text.slice(from.q.end, g.q.start));
    const amount = paired ? size(minus(w(g.q), w(from.q))) : size(w(g.q));
    const value = divide(amount, w(d.q));
    const named = paired ? `${from.q.text} to ${g.q.text}` : g.q.text;
    return value === undefined ? [] : [{ ...g, role: 'rate', family, order: d.order, pace: { value, text: `${named} over ${d.q.text}`, end: d.q.end } }];
  });
  return [...figures, ...paces].sort((a, b) => a.order - b.order);
}

/**
 * "280 to 424", "about 190 to 280 ppm": a level written as a range from one end to the other is a
 * pair of levels, read in the order written. A range after "between" or with a dash is a spread of
 * readings and stays one figure.
 */
function splitRange(f: Figure): Figure[] {
  const m = /^(.*?\d)(\s+to\s+|\s*→\s*)(.*\d.*)$/u.exec(f.q.text);
  if (m === null || /between/iu.test(f.q.text)) return [f];
  const [, first = '', joint = '', second = ''] = m;
  const a = parseQuantities(first)[0];
  const b = parseQuantities(second)[0];
  if (a === undefined || b === undefined || a.text !== first.trim() || b.end > second.length) return [f];
  const at = (q: Quantity, offset: number): Quantity => ({ ...q, start: f.q.start + offset + q.start, end: f.q.start + offset + q.end });
  const qa = at(a, 0);
  const qb = at(b, first.length + joint.length);
  return [{ ...f, q: qa, order: f.order - f.q.start + qa.start }, { ...f, q: qb, order: f.order - f.q.start + qb.start }];
}

/** Units written as the canonical unit, so that a bare figure beside them means the same amount ("190 ... 280 ppm"). */
const asWritten = (q: Quantity): boolean => q.statedUnit !== '' && q.unit === q.statedUnit.replace(/^degC$/u, 'K');

/**
 * A bare figure takes the family of the sentence's figures with a unit when there is exactly one
 * such family written in its canonical unit ("from 190 at the bottom to about 265 ppm"). A
 * four-figure whole number from 1000 to 2100 written without a unit is a year, not a level.
 */
function giveBareUnits(text: string, figures: Figure[]): Figure[] {
  const rates = new Set(figures.filter((f) => f.role === 'rate' && /\/yr$/u.test(f.q.unit) && f.q.statedUnit === f.q.unit).map((f) => f.family));
  const families = new Set(figures.filter((f) => (f.role === 'level' || f.role === 'change') && f.family !== 'number' && f.family !== 'count' && asWritten(f.q)).map((f) => f.family));
  // "Vostok's 420,000 years against Dome C's 800,000": spans of time are the only figures with a unit.
  const spans = figures.some((f) => f.role === 'duration') && families.size === 0 && !figures.some((f) => f.role === 'date' || f.role === 'rate');
  return figures.map((f) => {
    if (f.family !== 'number') return f;
    if (/^\d{4}$/u.test(f.q.text.trim()) && f.q.value >= 1000 && f.q.value <= 2100) return { ...f, role: 'other', family: '' };
    // "gas age 14,200, ice age 17,500": a bare figure named by an age noun right before it is an age in years.
    if (f.role === 'level' && WORDS.ageNouns.has(lastMeaningful(f.before)?.text ?? '')) return { ...f, role: 'date', family: 'age' };
    if (f.role === 'level' && spans && f.q.value >= 100) return { ...f, role: 'duration', family: 'duration' };
    // "~0.012 a year" beside "~2.4 ppm a year": a bare figure per year takes the one per-year rate written.
    const [per, unit] = f.after.map((w) => w.text);
    if (rates.size === 1 && ['a', 'per', 'each', 'every'].includes(per ?? '') && (unit === 'year' || unit === 'yr')) return { ...f, role: 'rate', family: [...rates][0] as string };
    return families.size === 1 ? { ...f, family: [...families][0] as string } : f;
  });
}

/** The most words a sentence with no figure may have and still pass the figures before it on. */
const SHORT_BRIDGE = 8;

/**
 * The sentences before (nearest first) whose figures a sentence may draw on: back to `back`
 * sentences with figures, passing over one short sentence with none ("We call it the Younger
 * Dryas.", a by-line "frostfern_amy - 4 Jun", an item label "D2."). A second such sentence, a
 * longer one, or a line with no word at all (a rule between posts) ends them.
 */
export function reachBack<T extends { text: string; quantities: readonly Quantity[] }>(earlier: readonly T[], back: number): T[] {
  const bridge = (p: T): boolean => {
    const n = wordsIn(p.text, 0, p.text.length).length;
    return n >= 1 && n <= SHORT_BRIDGE;
  };
  const gap = earlier.slice(0, back + 1).findIndex((p, i) => p.quantities.length === 0 && (!bridge(p) || i >= back || earlier.slice(0, i).some((e) => e.quantities.length === 0)));
  return earlier.slice(0, gap < 0 ? back + 1 : gap);
}

/**
 * "... held about 190 parts per million. In the warm spells it came back to something like 280.":
 * a bare level of an earlier sentence takes the one family the paragraph's figures with a unit
 * (written in the canonical unit) give, as a bare figure of one sentence does (giveBareUnits).
 */
function paragraphFamilies(figures: Figure[]): Figure[] {
  const families = new Set(figures.filter((f) => (f.role === 'level' || f.role === 'change') && f.family !== 'number' && f.family !== 'count' && f.family !== 'duration' && asWritten(f.q)).map((f) => f.family));
  if (families.size !== 1) return figures;
  const family = [...families][0] as string;
  const written = figures.filter((f) => f.family === family && asWritten(f.q)).map((f) => Math.abs(f.q.value));
  // Of the same measure, so of its size: within a factor of three of a written figure. A numeral
  // with a leading zero ("03 Nov", "09:12") is a day, a code or a clock time (common practice).
  const alike = (f: Figure): boolean => !/^0\d/u.test(f.q.text.replace(/^\D+/u, '')) && written.some((v) => f.q.value > v / 3 && f.q.value < v * 3);
  return figures.map((f) => (f.family === 'number' && (f.role === 'level' || f.role === 'change') && alike(f) ? { ...f, family } : f));
}

/** The figures of the sentence checked and of up to `back` sentences before it, oldest first. */
export function readParagraph(text: string, qs: readonly Quantity[], earlier: readonly { text: string; quantities: Quantity[] }[], back: number): { figures: Figure[]; texts: string[] } {
  // The figures before run back without a break: a sentence with none ends them.
  // A short sentence with no figure that names or comments on the thing ("We call it the Younger
  // Dryas.") passes the figures on; a second one, or a long one, ends them.
  const reach = reachBack(earlier, back);
  const before = reach.filter((p) => p.quantities.length > 0).slice(0, back).map((p) => ({ p, i: reach.indexOf(p) }));
  const texts = [text, ...reach.map((p) => p.text)];
  const figures = [...before.map(({ p, i }) => readSentence(p.text, p.quantities, i + 1, -(i + 1) * 1e6)).reverse().flat(), ...readSentence(text, qs, 0, 0)];
  return { figures: paragraphFamilies(figures), texts };
}
