/**
 * The relations among a paragraph's figures, checked with the same interval arithmetic as every
 * arithmetic rule (arithmetic-derive.ts). A figure the sentence states as a result (a change, a
 * relative change, a multiple, a span of time) is set against every value the figures before it
 * give for that relation: the difference of two levels of its family, a level's ratio to another,
 * the time between two dates. It is flagged only when it matches none of them (so a writer who
 * meant any reading of their figures is left alone), and the correction is the value of the two
 * figures nearest before it.
 *
 * A result must be tied to the figures before it: a link word ("so", "that's", "which is",
 * "in other words"), an apposition (", a span of", "(+"), a change word of its own with the levels
 * in the same clause run ("between A and B the air gained N"), or "later" after a span of time. It
 * must not be another quantity: one added on top ("another 140 ppm"), one that recurs ("2 ppm a
 * year"), one counted from a start of its own ("since 1750"), or one set in another time ("the
 * modern rise").
 */
import { writtenInterval as w } from '../../quantities/index.js';
import type { Quantity } from '../../types.js';
import { disjoint } from '../arithmetic-levels.js';
import { divide, facing, invert, minus, rangeSpan, size, type Derived } from '../arithmetic-derive.js';
import { readParagraph, type Figure } from './roles.js';
import { holdsPhrase, WORDS, wordsIn } from './word-classes.js';

/** A result the reader found wrong: the stated figure, the value its inputs give, what that value measures, and the rule it falls under. */
export interface ReaderFinding {
  ruleId: 'arith.change' | 'arith.ratio' | 'arith.duration';
  stated: Quantity;
  computed: Derived;
  measures: string;
  basis?: string;
}

/** One value a relation gives, with the words that name it and how near its inputs stand. */
interface Candidate {
  value: Derived;
  measures: string;
  /** Reading order of its nearer input: the larger, the nearer the result. */
  near: number;
  far: number;
}

/** How far a stated percentage or multiple may be rounded from the value of its figures (a tenth of itself). */
const ROUNDED = 0.1;
/** How many sentences before the one checked the reader takes figures from. */
const BACK = 2;
/** Words that turn a clause to another subject or time ("while", "but"): a change word after them is no result of the figures before. */
const CONTRAST = ['while', 'whereas', 'but', 'although', 'though', 'meanwhile', 'yet', 'unlike'];

/** The words of the checked sentence between two offsets. */
const between = (text: string, from: number, to: number) => wordsIn(text, from, to);

/**
 * True when the text between the last input and the result opens with an apposition mark (", a
 * span of", " (+") and goes on to the result in a few words that set nothing after it (", after
 * which came" opens a new stretch).
 */
function apposed(text: string, from: number, to: number): boolean {
  if (!/^\s*\)?\s*(?:[,(:—–]|\s-\s)/u.test(text.slice(from, to))) return false;
  const words = wordsIn(text, from, to);
  return words.length <= 6 && !words.some((w) => WORDS.sequence.has(w.text));
}

/**
 * True when the result follows a clause mark after the inputs and a few words that name the
 * relation it measures ("..., against 0.013 ppm per year then: a ratio of roughly 18 to 1",
 * "... — a difference of 3,300 years"): the figure is set in apposition to the clause of its inputs.
 */
function namedAfterMark(text: string, from: number, to: number): boolean {
  const stretch = text.slice(from, to);
  const mark = Math.max(stretch.lastIndexOf(':'), stretch.lastIndexOf(','), stretch.lastIndexOf('—'), stretch.lastIndexOf('–'), stretch.lastIndexOf(' - '));
  if (mark < 0 || /[.;!?]\s/u.test(stretch)) return false;
  const words = wordsIn(text, from + mark, to);
  return words.length > 0 && words.length <= 5 && !words.some((w) => WORDS.sequence.has(w.text)) && words.some((w) => WORDS.askedNouns.has(w.text));
}

/** True when a negation stands just before the figure ("not 87", "no adding 32"). */
const denied = (f: Figure): boolean => f.before.slice(-3).some((w) => WORDS.negations.has(w.text));

/**
 * True when a figure is of the present: its words say so ("today's level of 420 ppm") or its
 * sentence dates it to 1950 or later.
 */
function isPresent(figures: Figure[], g: Figure): boolean {
  return g.before.some((w) => WORDS.ownTime.has(w.text)) || WORDS.ownTime.has(g.after[0]?.text ?? '') || figures.some((d) => d.sentence === g.sentence && d.role === 'date' && d.q.value <= 0 && rangeSpan(d.q) === undefined);
}

/** True when the result is another quantity than a consequence of the figures before it. */
function isOtherQuantity(f: Figure, figures: Figure[]): boolean {
  const prior = f.before.at(-1)?.text ?? '';
  if (denied(f) || WORDS.added.has(prior)) return true;
  // "today's air carries 190 ppm more": a result set in the present needs a level of the present among the figures.
  if (f.before.some((w) => WORDS.ownTime.has(w.text)) && !figures.some((g) => g !== f && g.order < f.order && g.role === 'level' && (f.family === '' || g.family === f.family) && isPresent(figures, g))) return true;
  const after = f.after.map((w) => w.text);
  if (after.some((w) => WORDS.ownPeriod.has(w)) || WORDS.baseAfter.has(after[0] ?? '')) return true;
  // "2 ppm a year", "a metre every century": a change that recurs is a rate.
  return after.some((w, i) => WORDS.timeUnits.has(w) && i > 0 && ['a', 'an', 'per', 'each', 'every', 'single', 'one'].includes(after[i - 1] ?? ''));
}

/**
 * True when the result is tied to inputs ending at `lastInput` (an offset in the checked sentence,
 * or -1 when every input stands in earlier sentences).
 */
function isTied(f: Figure, text: string, lastInput: number): boolean {
  const words = between(text, Math.max(0, lastInput), f.q.start);
  // Inputs only in the sentences before, set against each other by the multiple's own sentence
  // ("today's rise compared with the deglacial average": "with" here is no part word).
  if (lastInput < 0 && f.role === 'multiple' && holdsPhrase(words, WORDS.setAgainst)) return true;
  if (words.some((w) => CONTRAST.includes(w.text)) || holdsPhrase(words, WORDS.part)) return false;
  // A semicolon closes the clause of the figures, except for what is left of them ("...; the remaining 50")
  // and for a clause that says it draws on them ("...; the polar change was therefore three times").
  const stretch = text.slice(Math.max(0, lastInput), f.q.start);
  const semicolon = stretch.lastIndexOf(';');
  if (semicolon >= 0 && !f.remainder) {
    const from = Math.max(0, lastInput) + semicolon + 1;
    return holdsPhrase(wordsIn(text, from, f.q.start), WORDS.links);
  }
  if (f.remainder) return true;
  if (holdsPhrase(words, WORDS.links)) return true;
  // Inputs only in the sentences before: the sentence must say it draws on them.
  if (lastInput < 0) return false;
  if (apposed(text, lastInput, f.q.start) || namedAfterMark(text, lastInput, f.q.start)) return true;
  if (f.role === 'duration' && WORDS.later.has(f.after[0]?.text ?? '')) return true;
  // A change word of the result's own ("the air gained some 110 ppm", "is a jump of") in the clause run after its levels.
  return (f.role === 'change' || f.role === 'relative') && words.length <= 10;
}

/** The figures of `role` and `family` before `f`, oldest first (the last two may come from earlier sentences). */
function inputsBefore(figures: Figure[], f: Figure, accept: (g: Figure) => boolean): Figure[] {
  return figures.filter((g) => g !== f && g.order < f.order && accept(g));
}

/** Pairs among the inputs, nearest first; at most the last four inputs take part. */
function pairsOf(inputs: Figure[]): [Figure, Figure][] {
  const last = inputs.slice(-4);
  const pairs: [Figure, Figure][] = [];
  for (let i = 0; i < last.length; i++) for (let j = i + 1; j < last.length; j++) pairs.push([last[i] as Figure, last[j] as Figure]);
  return pairs.sort((x, y) => y[1].order - x[1].order || y[0].order - x[0].order);
}

/** The verdict on a result: the nearest candidate when every candidate contradicts it, else undefined. */
function verdict(stated: Quantity, candidates: Candidate[], like: (d: Derived) => Derived, slack = 0, within = 3): Candidate | undefined {
  // A relative figure is a rounded one ("about 50 percent" for 52.5): it is read to `slack` of itself at least.
  const v = Math.abs(stated.value);
  const read = { low: Math.min(stated.low, stated.value - v * slack), high: Math.max(stated.high, stated.value + v * slack) };
  if (candidates.length === 0 || candidates.some((c) => !disjoint(read, like(c.value)))) return undefined;
  const nearest = [...candidates].sort((a, b) => b.near - a.near || b.far - a.far)[0] as Candidate;
  const ratio = Math.abs(stated.value) / Math.abs(like(nearest.value).value);
  return ratio > 1 / within && ratio < within ? nearest : undefined;
}

/** The paragraph's figures in `sentences` and whether inputs before a result may come from earlier sentences. */
function usable(figures: Figure[], f: Figure, text: string, accept: (g: Figure) => boolean): { inputs: Figure[]; lastInput: number } | undefined {
  const all = inputsBefore(figures, f, accept);
  const own = all.filter((g) => g.sentence === 0);
  // Two inputs of its own sentence are enough; otherwise the sentence must refer back.
  const inputs = own.length >= 2 ? own : all;
  if (inputs.length < 2) return undefined;
  const last = own.at(-1);
  const lastInput = last === undefined ? -1 : (last.pace?.end ?? last.q.end);
  if (!isTied(f, text, lastInput)) return undefined;
  // An input from a sentence before: this one must refer back to it ("above that", "by then", "so").
  if (inputs.some((g) => g.sentence > 0)) {
    const head = wordsIn(text, 0, f.q.start);
    const later = f.role === 'duration' && WORDS.later.has(f.after[0]?.text ?? '');
    const against = f.role === 'multiple' && holdsPhrase(head, WORDS.setAgainst);
    if (!later && !against && !holdsPhrase(head, WORDS.links) && !holdsPhrase(head, WORDS.backReferences)) return undefined;
  }
  return { inputs, lastInput };
}

/** The basis the reason names: the paragraph's when an input stands in an earlier sentence. */
const basisOf = (inputs: Figure[]): { basis?: string } => (inputs.some((g) => g.sentence > 0) ? { basis: "the paragraph's" } : {});

/** A change against the differences of the levels before it (or, with "than", against the level it names after it). */
function checkChange(figures: Figure[], text: string, f: Figure): ReaderFinding[] {
  if (isOtherQuantity(f, figures)) return [];
  // A difference of times ("adds 280,000 years") is set against the spans and ages before it ("covers 800,000 years").
  const asLevel = (g: Figure): boolean => g.role === 'level' || (f.family === 'duration' && g.role === 'duration');
  const sameFamily = (g: Figure): boolean => asLevel(g) && g.family === f.family && (g.q.statedUnit === f.q.statedUnit || g.q.statedUnit === '' || f.q.statedUnit === '');
  const than = f.after.some((w) => w.text === 'than') ? figures.find((g) => g.sentence === 0 && g.order > f.order && sameFamily(g)) : undefined;
  const found = usable(figures, f, text, sameFamily) ?? (f.remainder ? usable(figures, f, text, (g) => (g.role === 'change' || g.role === 'level') && g.family === f.family) : undefined);
  if (found === undefined && than === undefined) return [];
  let pairs: [Figure, Figure][];
  if (than !== undefined) {
    const subjects = inputsBefore(figures, f, sameFamily).slice(-2);
    if (subjects.length === 0) return [];
    pairs = subjects.map((s) => [s, than]);
  } else pairs = pairsOf((found as { inputs: Figure[] }).inputs.filter(asLevel));
  // Two levels in different units ("6 °C is roughly 11 °F") restate one amount; they make no change.
  const sameUnit = ([a, b]: [Figure, Figure]): boolean => a.q.statedUnit === b.q.statedUnit || a.q.statedUnit === '' || b.q.statedUnit === '';
  // "Of the 95 ppm gained, 25 came from warming and the rest, some 90 ppm, ...": what is left of a stated whole.
  if (f.remainder) {
    // The whole is the largest figure of the family before it; every smaller one may be the part taken.
    const amounts = inputsBefore(figures, f, (g) => (g.role === 'change' || g.role === 'level') && g.family === f.family && g.sentence <= 1 && !g.remainder).slice(-3);
    const whole = [...amounts].sort((a, b) => b.q.value - a.q.value)[0];
    for (const part of amounts.filter((p) => whole !== undefined && p !== whole && p.q.value < whole.q.value)) pairs.push([part, whole as Figure]);
  }
  const candidates = pairs.filter(([a, b]) => a.q.value !== b.q.value && sameUnit([a, b])).map(([a, b]): Candidate => ({ value: size(minus(w(b.q), w(a.q))), measures: `the difference between ${a.q.text} and ${b.q.text}`, near: Math.max(a.order, b.order), far: Math.min(a.order, b.order) }));
  const nearest = verdict(f.q, candidates, (d) => facing(d, f.q.value));
  if (nearest === undefined) return [];
  return [{ ruleId: 'arith.change', stated: f.q, computed: facing(nearest.value, f.q.value), measures: nearest.measures, ...basisOf(pairs.flat()) }];
}

/** How many letters two words of a named base must share at their start to name one time ("industrial", "industrialisation"). */
const SAME_STEM = 7;

/**
 * The words that name the base a relative change is counted from, after "on", "over", "since"...
 * ("a 47% increase on 1750", "up 50 percent over pre-industrial levels"): a year, or the content
 * words of the phrase. Undefined when no base is named.
 */
function baseNamed(text: string, f: Figure): string[] | undefined {
  // The base word comes first, or after the change noun: "47% on 1750", "a 47% increase on 1750".
  // "32 percent higher than in 1750": after a comparative, "than" names it.
  const at = f.after.findIndex((x) => WORDS.baseAfter.has(x.text) || x.text === 'since' || x.text === 'than');
  const word = f.after[at];
  const first = f.after[0]?.text ?? '';
  if (word === undefined || at > 1 || (at === 1 && !WORDS.changeNouns.has(first) && !WORDS.comparatives.has(first)) || (word.text === 'than' && at !== 1)) return undefined;
  const rest = text.slice(word.end, word.end + 40).split(/[,;.:!?()]/u)[0] ?? '';
  const year = /^\s+(?:(?:the|its|in|about|around|c\.|circa)\s+)*(1[5-9]\d\d|20\d\d)\b/iu.exec(rest);
  if (year !== null) return [year[1] as string];
  const words = wordsIn(rest, 0, rest.length).map((x) => x.text).filter((x) => !WORDS.baseKind.has(x) && x.length >= 4).slice(0, 2);
  return words.length > 0 ? words : undefined;
}

/** True when a sentence names the base: the year itself, or a word of one stem ("industrial", "industrialisation"). */
function namesBase(sentence: string, base: string[]): boolean {
  if (/^\d{4}$/u.test(base[0] ?? '')) return new RegExp(`(?<!\\d)${base[0]}(?!\\d)`, 'u').test(sentence);
  const words = wordsIn(sentence, 0, sentence.length).map((x) => x.text);
  return base.every((b) => words.some((x) => x.slice(0, SAME_STEM) === b.slice(0, SAME_STEM) && x.length >= Math.min(b.length, SAME_STEM)));
}

/**
 * A relative change counted from a base it names by the time of its measurement ("410 ppm, a 47%
 * increase on 1750", "up 50 percent over pre-industrial levels"): the base is the paragraph's
 * level whose sentence names that time, and the change runs from it to the level nearest before
 * the result. Undefined when the base names no level of the paragraph (then it is another
 * quantity, counted from a start of its own).
 */
function checkNamedBase(figures: Figure[], texts: string[], text: string, f: Figure): ReaderFinding[] | undefined {
  const base = baseNamed(text, f);
  if (base === undefined || denied(f) || WORDS.added.has(f.before.at(-1)?.text ?? '')) return undefined;
  const levels = figures.filter((g) => g.order < f.order && g.role === 'level' && g.family !== '' && g.q.value > 0);
  // The base level: one of a sentence before that names the base's time, the nearest such; of a
  // sentence with two levels ("Glacial CO2 of 185 ppm rising to 280 ppm"), the one its own words name.
  const naming = levels.filter((g) => g.sentence > 0 && namesBase(texts[g.sentence] ?? '', base));
  const ownWords = naming.filter((g) => namesBase([...g.before, ...g.after].map((x) => x.text).join(' '), base));
  const from = (ownWords.length > 0 ? ownWords : naming).at(-1);
  if (from === undefined) return undefined;
  const to = levels.filter((g) => g !== from && g.family === from.family && g.order > from.order && (g.q.statedUnit === from.q.statedUnit || g.q.statedUnit === '' || from.q.statedUnit === '')).at(-1);
  if (to === undefined || to.q.value === from.q.value) return [];
  const r = divide(w(to.q), w(from.q));
  if (r === undefined) return [];
  const scale = f.q.dimension === 'percent' ? 100 : 1;
  const rel = r.value >= 1 ? { value: r.value - 1, low: r.low - 1, high: r.high - 1 } : { value: 1 - r.value, low: 1 - r.high, high: 1 - r.low };
  const candidate: Candidate = { value: { value: rel.value * scale, low: rel.low * scale, high: rel.high * scale }, measures: `the relative change from ${from.q.text} to ${to.q.text}`, near: to.order, far: from.order };
  const nearest = verdict(f.q, [candidate], (d) => d, ROUNDED);
  return nearest === undefined ? [] : [{ ruleId: 'arith.ratio', stated: f.q, computed: nearest.value, measures: nearest.measures, basis: "the paragraph's" }];
}

/**
 * True when level `g` of the sentence checked is named as the base of a comparison: the words of its
 * clause before it open with a base word ("Against the 1750 level of roughly 278 ppm, ...", "an
 * increase of about 75% on the pre-industrial 280 ppm", "relative to the glacial 190 ppm").
 */
function namedAsBase(text: string, g: Figure): boolean {
  const chunk = text.slice(Math.max(0, g.q.start - 50), g.q.start);
  const clause = chunk.slice(Math.max(...[',', ';', ':', '(', '—', '–'].map((m) => chunk.lastIndexOf(m))) + 1);
  const words = wordsIn(clause, 0, clause.length);
  // Up to six words of the base's own noun phrase may follow the base word ("on the pre-industrial", "against the 1750 level of").
  const at = words.findIndex((x) => WORDS.baseAfter.has(x.text) && x.text !== 'from');
  return at >= 0 && words.length - at <= 7;
}

/**
 * A relative change whose own sentence names the level it is counted from ("The 2024 average was
 * 424 ppm. That is an increase of about 75% on the pre-industrial 280 ppm."): it runs from that
 * base to a level before it (or beside it in the sentence), and to no other pair of the paragraph's
 * levels. Undefined when the sentence names no base level, or no other level stands with it.
 */
function checkOwnBase(figures: Figure[], text: string, f: Figure): ReaderFinding[] | undefined {
  const isLevel = (g: Figure): boolean => g !== f && g.role === 'level' && g.family !== '' && g.q.value > 0;
  const bases = figures.filter((g) => g.sentence === 0 && isLevel(g) && namedAsBase(text, g));
  const base = bases.length === 1 ? bases[0] : undefined;
  if (base === undefined || denied(f)) return undefined;
  const sameUnit = (g: Figure): boolean => g.q.statedUnit === base.q.statedUnit || g.q.statedUnit === '' || base.q.statedUnit === '';
  const others = figures.filter((g) => isLevel(g) && g !== base && g.family === base.family && sameUnit(g) && g.q.value !== base.q.value && (g.sentence === 0 || g.order < f.order) && g.sentence <= 2);
  if (others.length === 0) return undefined;
  // A level from a sentence before: this one must refer back to it ("That is", "so").
  if (others.every((g) => g.sentence > 0)) {
    const head = wordsIn(text, 0, f.q.start);
    if (!holdsPhrase(head, WORDS.links) && !holdsPhrase(head, WORDS.backReferences)) return undefined;
  }
  const scale = f.q.dimension === 'percent' ? 100 : 1;
  const candidates = others.map((to): Candidate => {
    const r = divide(w(to.q), w(base.q)) as Derived;
    const rel = r.value >= 1 ? { value: r.value - 1, low: r.low - 1, high: r.high - 1 } : { value: 1 - r.value, low: 1 - r.high, high: 1 - r.low };
    return { value: { value: rel.value * scale, low: rel.low * scale, high: rel.high * scale }, measures: `the relative change from ${base.q.text} to ${to.q.text}`, near: to.order, far: base.order };
  });
  const nearest = verdict(f.q, candidates, (d) => d, ROUNDED);
  return nearest === undefined ? [] : [{ ruleId: 'arith.ratio', stated: f.q, computed: nearest.value, measures: nearest.measures, ...basisOf(others) }];
}

/** A percentage or fraction stated as a change, against the relative changes between the levels before it. */
function checkRelative(figures: Figure[], text: string, f: Figure, texts: string[] = [text]): ReaderFinding[] {
  const named = checkNamedBase(figures, texts, text, f);
  if (named !== undefined) return named;
  const own = checkOwnBase(figures, text, f);
  if (own !== undefined) return own;
  if (isOtherQuantity(f, figures)) return [];
  const scale = f.q.dimension === 'percent' ? 100 : 1;
  const levels = (g: Figure): boolean => g.role === 'level' && g.family !== '' && g.q.value > 0;
  const found = usable(figures, f, text, levels);
  if (found === undefined) return [];
  const candidates: Candidate[] = [];
  for (const [a, b] of pairsOf(found.inputs)) {
    if (a.family !== b.family || a.q.value === b.q.value || (a.q.statedUnit !== b.q.statedUnit && a.q.statedUnit !== '' && b.q.statedUnit !== '')) continue;
    const [lo, hi] = a.q.value < b.q.value ? [a, b] : [b, a];
    const r = divide(w(hi.q), w(lo.q));
    if (r === undefined) continue;
    const near = Math.max(a.order, b.order);
    const far = Math.min(a.order, b.order);
    const shown = (d: Derived): Derived => ({ value: d.value * scale, low: d.low * scale, high: d.high * scale });
    if (f.sign >= 0) candidates.push({ value: shown({ value: r.value - 1, low: r.low - 1, high: r.high - 1 }), measures: `the relative change from ${lo.q.text} to ${hi.q.text}`, near, far });
    if (f.sign <= 0) {
      const down = invert(r);
      candidates.push({ value: shown({ value: 1 - down.value, low: 1 - down.high, high: 1 - down.low }), measures: `the relative change from ${hi.q.text} to ${lo.q.text}`, near, far });
    }
  }
  // A stated change before it, as a share of a level: "144 ppm above that, an increase of roughly a quarter".
  for (const c of figures.filter((g) => g.role === 'change' && g.order < f.order && g.sentence <= 1)) {
    // The base is where the change started: the level that the change takes to another level among the figures.
    const ends = (l: Figure, sign: number): boolean => found.inputs.some((m) => m !== l && m.family === l.family && Math.abs(m.q.value - (l.q.value + sign * Math.abs(c.q.value))) <= 0.1 * m.q.value);
    for (const l of found.inputs.filter((g) => g.family === c.family && ((f.sign >= 0 && ends(g, 1)) || (f.sign <= 0 && ends(g, -1))))) {
      const r = divide(size(w(c.q)), w(l.q));
      if (r !== undefined) candidates.push({ value: { value: r.value * scale, low: r.low * scale, high: r.high * scale }, measures: `${c.q.text} as a share of ${l.q.text}`, near: -Infinity, far: -Infinity });
    }
  }
  const nearest = verdict(f.q, candidates, (d) => d, ROUNDED);
  if (nearest === undefined) return [];
  return [{ ruleId: 'arith.ratio', stated: f.q, computed: nearest.value, measures: nearest.measures, ...basisOf(found.inputs) }];
}

/** Words that end the name of a multiple's comparand ("twice the global one in the record"). */
const NAME_ENDS = new Set(['of', 'in', 'at', 'on', 'for', 'to', 'and', 'or', 'than', 'from', 'by', 'with', 'during', 'since', 'is', 'was', 'which', 'that']);
/** Words of a comparand's name that say what kind of figure it is, not which one ("the global one", "the 1750 figure"). */
const NAME_KIND = new Set(['one', 'ones', 'record', 'records', 'core', 'cores', 'number', 'numbers']);

/**
 * What a multiple is a multiple of, when it names it after itself ("twice the global one", "two
 * and a half times the 1750 figure", "three times as long as Vostok's", "five times the 0.8 ppm a
 * year of the 1960s"): the offset of a figure that follows at once, or the words (and a year) of
 * the name. Undefined when no comparand is named so.
 */
function comparandOf(text: string, f: Figure): { at?: number; names: string[] } | undefined {
  const rest = (text.slice(f.q.end, f.q.end + 60).split(/[,;:!?()]|\.\s|\.$/u)[0] ?? '');
  const lead = /^\s+(?:as\s+\p{L}+\s+as\s+(?:the\s+|that\s+of\s+(?:the\s+)?)?|the\s+|that\s+of\s+(?:the\s+)?)/iu.exec(rest);
  if (lead === null) return undefined;
  const from = f.q.end + lead[0].length;
  const at = /^\d/u.test(text.slice(from, from + 1)) ? { at: from } : {};
  const names: string[] = [];
  for (const token of text.slice(from, f.q.end + rest.length).split(/[\s\u00A0]+/u).slice(0, 4)) {
    const year = /^(1[5-9]\d\d|20\d\d)$/u.exec(token);
    if (year !== null) {
      names.push(year[1] as string);
      continue;
    }
    const words = wordsIn(token.replace(/['’]s$/u, ''), 0, token.length).map((x) => x.text);
    if (words.some((x) => NAME_ENDS.has(x))) break;
    names.push(...words.filter((x) => x.length >= 4 && !WORDS.baseKind.has(x) && !NAME_KIND.has(x)));
  }
  return names.length > 0 || at.at !== undefined ? { ...at, names } : undefined;
}

/** True when one of `names` is a word of `words` (one stem: "Antarctic", "Antarctica") or, for a year, stands in `sentence`. */
function named(names: readonly string[], words: readonly string[], sentence: string): boolean {
  return names.some((n) => (/^\d{4}$/u.test(n) ? new RegExp(`(?<!\\d)${n}(?!\\d)`, 'u').test(sentence) : words.some((x) => x.slice(0, SAME_STEM) === n.slice(0, SAME_STEM) && x.length >= Math.min(n.length, SAME_STEM))));
}

/**
 * A multiple of a comparand it names after itself ("That Greenland swing is roughly twice the global
 * one"; "today's 420 ppm, about two and a half times the 1750 figure"): the comparand is the figure
 * of the paragraph its name points to (the words around it, or its sentence when that holds no
 * other figure of its family), the subject the figure the multiple's own clause names before it, or
 * else the nearest figure of that family before it. Undefined when the name points to no figure.
 */
function checkNamedComparand(figures: Figure[], texts: string[], text: string, f: Figure): ReaderFinding[] | undefined {
  const comparand = comparandOf(text, f);
  if (comparand === undefined) return undefined;
  // Only figures with a unit: bare numbers name no measure a name can point to.
  const measured = (g: Figure): boolean => (g.role === 'level' || g.role === 'change' || g.role === 'rate' || g.role === 'duration') && g.family !== '' && g.family !== 'number' && g.family !== 'count' && g.q.value > 0;
  // The multiple's own sentence up to the multiple: its name after it points to no figure of that sentence.
  const sentenceOf = (g: Figure): string => (g.sentence === 0 ? text.slice(0, f.q.start) : (texts[g.sentence] ?? ''));
  const wordsOf = (g: Figure): string[] => {
    const own = [...g.before, ...g.after].map((x) => x.text);
    const alone = figures.filter((h) => h.sentence === g.sentence && measured(h) && h.family === g.family).length === 1;
    const sentence = sentenceOf(g);
    return alone ? [...own, ...wordsIn(sentence, 0, sentence.length).map((x) => x.text)] : own;
  };
  const pointsTo = (g: Figure, names: readonly string[]): boolean => {
    const sentence = sentenceOf(g);
    const alone = figures.filter((h) => h.sentence === g.sentence && measured(h) && h.family === g.family).length === 1;
    return named(names, wordsOf(g), alone ? sentence : '');
  };
  const before = figures.filter((g) => g.order < f.order && measured(g) && g.sentence <= 2);
  // A figure right after it ("five times the 0.8 ppm a year"), else the figure its name points to (a year names its sentence's).
  const next = figures.filter((g) => g.sentence === 0 && g.q.start === comparand.at && measured(g));
  const targets = next.length > 0 ? next : comparand.names.length === 0 ? [] : before.filter((g) => pointsTo(g, comparand.names));
  if (targets.length === 0) return undefined;
  // The subject: what the multiple's clause names before it ("That Greenland swing", "Dome C's record").
  const head = text.slice(0, f.q.start);
  const clause = head.slice(Math.max(head.lastIndexOf(', '), head.lastIndexOf('; '), head.lastIndexOf(': ')) + 1);
  const subjectNames = wordsIn(clause, 0, clause.length).map((x) => x.text).filter((x) => x.length >= 4 && !WORDS.baseKind.has(x) && !WORDS.links.includes(x) && !WORDS.copulas.has(x));
  const candidates: Candidate[] = [];
  for (const c of targets) {
    const alike = before.filter((g) => g !== c && g.family === c.family && (g.q.statedUnit === c.q.statedUnit || g.q.statedUnit === '' || c.q.statedUnit === '' || g.q.unit === c.q.unit));
    const byName = alike.filter((g) => pointsTo(g, subjectNames) && !pointsTo(g, comparand.names));
    // Unnamed, the subject is a figure of the multiple's own sentence, else the nearest before it.
    const own = alike.filter((g) => g.sentence === 0);
    const subjects = byName.length > 0 ? byName : own.length > 0 ? own : alike.slice(-1);
    for (const s of subjects) {
      // The comparand restated is no subject of it.
      if (s.q.value === c.q.value) continue;
      const r = divide(s.pace?.value ?? w(s.q), c.pace?.value ?? w(c.q));
      if (r === undefined || r.value < 1) continue;
      candidates.push({ value: r, measures: `the ratio of ${s.q.text} to ${c.q.text}`, near: Math.max(s.order, c.order), far: Math.min(s.order, c.order) });
    }
  }
  if (candidates.length === 0) return undefined;
  const nearest = verdict(f.q, candidates, (d) => d, ROUNDED);
  // A reading that agrees settles it; one that disagrees beyond a rounding's reach leaves the other readings to judge.
  if (nearest === undefined) return verdict(f.q, candidates, (d) => d, ROUNDED, Infinity) === undefined ? [] : undefined;
  const inputs = figures.filter((g) => nearest.measures.includes(g.q.text) && g.order <= f.order);
  return [{ ruleId: 'arith.ratio', stated: f.q, computed: nearest.value, measures: nearest.measures, ...basisOf(inputs) }];
}

/** A multiple ("20 times faster", "two and a half times the 1750 figure") against the ratios of two rates or two levels. */
function checkMultiple(figures: Figure[], text: string, f: Figure, texts: string[] = [text]): ReaderFinding[] {
  if (f.q.value <= 1 || denied(f)) return [];
  const ofNamed = checkNamedComparand(figures, texts, text, f);
  if (ofNamed !== undefined) return ofNamed;
  // Spans of time compare as levels do: "800,000 against 420,000 years, so about twice as long";
  // so do two changes of one family: "warmed by 9 °C while the globe warmed by 6 °C, so 1.5 times".
  const compared = (g: Figure): boolean => (g.role === 'rate' || g.role === 'level' || g.role === 'duration' || g.role === 'change') && g.q.value !== 0;
  const found = usable(figures, f, text, compared);
  if (found === undefined) return [];
  const pace = f.after.some((w) => WORDS.pace.has(w.text));
  const candidates: Candidate[] = [];
  for (const [a, b] of pairsOf(found.inputs)) {
    if (a.role !== b.role || a.family !== b.family || (pace && a.role !== 'rate')) continue;
    if (a.q.statedUnit !== b.q.statedUnit && a.q.statedUnit !== '' && b.q.statedUnit !== '' && a.role === 'level') continue;
    // A pace worked out from an amount and its time ("100 ppm over 7,000 years") counts as a rate.
    const r = a.role === 'change' ? divide(size(w(a.q)), size(w(b.q))) : divide(a.pace?.value ?? w(a.q), b.pace?.value ?? w(b.q));
    if (r === undefined) continue;
    const up = r.value >= 1 ? r : invert(r);
    const named = (g: Figure): string => g.pace?.text ?? g.q.text;
    const measures = `the ratio of ${named(r.value >= 1 ? a : b)} to ${named(r.value >= 1 ? b : a)}`;
    const near = Math.max(a.order, b.order);
    const far = Math.min(a.order, b.order);
    candidates.push({ value: up, measures, near, far });
    // "three times more" is read by some as three times as much: both readings stand.
    if (f.sign > 0) candidates.push({ value: { value: up.value - 1, low: up.low - 1, high: up.high - 1 }, measures, near: -Infinity, far: -Infinity });
  }
  // Two paces set side by side with a pace word are one measure, so a slip of a factor ten is still a slip of it ("20 times" for 200).
  // So are two rates set against each other without a pace word ("2.4 ppm a year against 0.013 ppm a year: a ratio of 18 to 1").
  const rates = pairsOf(found.inputs).some(([a, b]) => a.role === 'rate' && b.role === 'rate' && a.family === b.family);
  const nearest = verdict(f.q, candidates, (d) => d, ROUNDED, pace || rates ? 30 : 3);
  if (nearest === undefined) return [];
  return [{ ruleId: 'arith.ratio', stated: f.q, computed: nearest.value, measures: nearest.measures, ...basisOf(found.inputs) }];
}

/** A span of time against the time between two dates before it (or a date and the present, or a range of dates). */
function checkDuration(figures: Figure[], text: string, f: Figure): ReaderFinding[] {
  if (denied(f) || WORDS.added.has(f.before.at(-1)?.text ?? '')) return [];
  const dates = (g: Figure): boolean => g.role === 'date';
  const all = inputsBefore(figures, f, dates);
  const ranged = all.filter((g) => rangeSpan(g.q) !== undefined);
  const found = usable(figures, f, text, (g) => dates(g) && rangeSpan(g.q) === undefined);
  const candidates: Candidate[] = [];
  if (found !== undefined) {
    for (const [a, b] of pairsOf(found.inputs)) candidates.push({ value: size(minus(w(a.q), w(b.q))), measures: `the time from ${a.q.text} to ${b.q.text}`, near: Math.max(a.order, b.order), far: Math.min(a.order, b.order) });
  }
  const lastRange = ranged.filter((g) => g.sentence === 0).at(-1);
  if (lastRange !== undefined && (found !== undefined || isTied(f, text, lastRange.q.end))) {
    candidates.push({ value: rangeSpan(lastRange.q) as Derived, measures: `the span of ${lastRange.q.text}`, near: lastRange.order, far: lastRange.order });
  }
  if (candidates.length === 0) return [];
  // A span that runs to the present from one of the dates: "the Holocene has lasted 11,700 years".
  for (const d of all) if (rangeSpan(d.q) === undefined) candidates.push({ value: size(w(d.q)), measures: `the time since ${d.q.text}`, near: -Infinity, far: -Infinity });
  const nearest = verdict(f.q, candidates, (d) => d);
  if (nearest === undefined) return [];
  return [{ ruleId: 'arith.duration', stated: f.q, computed: nearest.value, measures: nearest.measures, ...basisOf(all) }];
}

/**
 * Every result of the checked sentence that contradicts all the values its paragraph's figures
 * give it. `earlier` is the sentences before, nearest first.
 */
export function readArithmetic(text: string, qs: readonly Quantity[], earlier: readonly { text: string; quantities: Quantity[] }[]): ReaderFinding[] {
  const cached = memo.get(qs);
  if (cached !== undefined && cached.text === text) return cached.found;
  const found = readAll(text, qs, earlier);
  memo.set(qs, { text, found });
  return found;
}

/** The reader's findings per sentence's quantity list: the four arithmetic rules each ask for their own. */
const memo = new WeakMap<readonly Quantity[], { text: string; found: ReaderFinding[] }>();

function readAll(text: string, qs: readonly Quantity[], earlier: readonly { text: string; quantities: Quantity[] }[]): ReaderFinding[] {
  const { figures, texts } = readParagraph(text, qs, earlier, BACK);
  const own = figures.filter((f) => f.sentence === 0);
  return own.flatMap((f) => {
    if (f.role === 'change') return checkChange(figures, text, f);
    if (f.role === 'relative') return checkRelative(figures, text, f, texts);
    if (f.role === 'multiple') return checkMultiple(figures, text, f, texts);
    if (f.role === 'duration') return checkDuration(figures, text, f);
    return [];
  });
}
