/**
 * The small cue tables that decide between two readings of one written unit, from the words next
 * to the quantity. Data first, so docs/quantities.md can show them and an editor can see why.
 *  - °C, °F, K: a temperature change ("5 °C warmer", "warmed by 5 °C") or a temperature ("was −30 °C").
 *  - ka, Ma: a date ("at 21 ka") or a duration ("lasting 10 ka", "a 100 ka cycle").
 *  - a bare four-digit whole number: a calendar year ("in 1750", "by 2019") or just a number.
 */
import type { Dimension } from '../types.js';

/** One cue: words that, found just before or just after the quantity, pick a reading. */
export interface Cue {
  reading: Dimension;
  where: 'before' | 'after';
  words: string[];
}

/** Temperature cues, tried in order; the first that matches decides. */
export const TEMPERATURE_CUES: readonly Cue[] = [
  { reading: 'temperature-change', where: 'after', words: ['warmer', 'cooler', 'colder', 'hotter', 'higher', 'lower', 'rise', 'increase', 'drop', 'fall', 'decline', 'change', 'shift', 'difference', 'swing', 'warming', 'cooling', 'anomaly', 'above', 'below', 'more', 'less', 'of warming', 'of cooling', 'amplitude', 'warm-up', 'warmup', 'cool-down', 'jump', 'leap', 'per doubling', 'for a doubling', 'for each doubling', 'for every doubling', 'for such a doubling', 'of eventual warming', 'of equilibrium warming', 'of long-term warming'] },
  { reading: 'temperature-change', where: 'before', words: ['by', 'warmed', 'cooled', 'rose', 'fell', 'dropped', 'climbed', 'increased', 'decreased', 'changed', 'rise of', 'drop of', 'fall of', 'change of', 'increase of', 'decrease of', 'swing of', 'difference of', 'warming of', 'cooling of', 'anomaly of', 'amplitude of', 'shift of', 'jump of', 'leap of', 'climb of', 'plunge of', 'warm-up of', 'chill of', 'cool-down of', 'cooldown of', 'warmup of', 'dip of', 'slide of', 'slump of', 'a', 'an'] },
  { reading: 'temperature', where: 'before', words: ['was', 'were', 'is', 'are', 'at', 'reach', 'reaches', 'reached', 'hit', 'hits', 'averaged', 'averages', 'stood at', 'of', 'to', 'from', 'between', 'minus', 'reads', 'read', 'registered', 'recorded'] },
];

/**
 * Words that put a size on something without saying what kind of figure it is: "which the isotopes
 * put at about 9 °C", "estimated at 6 °C". The "at" in them is no reading cue; the figure is read
 * by the words after it ("estimated at 6 °C colder") or, with none, as if no cue were there (a
 * change, unless signed negative).
 */
export const ESTIMATE_WORDS: readonly string[] = ['put at', 'puts at', 'putting at', 'estimated at', 'estimates at', 'estimate at', 'reckoned at', 'placed at', 'places at', 'pegged at', 'pegs at', 'set at', 'sets at', 'judged at', 'reconstructed at', 'assessed at', 'calculated at', 'figured at', 'given as', 'quoted at', 'quoted as'];

/**
 * A change named as the subject of the clause, then its value: "the temperature change in
 * Antarctica between glacial and interglacial was about 9 °C", "the warming across the
 * deglaciation amounted to 8 °C". The value is a change even after "was" or "is".
 */
export const CHANGE_SUBJECT_NOUNS: readonly string[] = ['change', 'difference', 'warming', 'cooling', 'rise', 'drop', 'fall', 'swing', 'amplitude', 'anomaly', 'shift', 'increase', 'decrease', 'jump', 'leap', 'climb', 'plunge', 'dip', 'warm-up', 'cool-down'];
const CHANGE_SUBJECT = new RegExp(
  String.raw`(?:^|[^\p{L}])(?:${CHANGE_SUBJECT_NOUNS.join('|')})(?:[\s\u00A0]+(?:in|of|between|across|from|during|over|at)[\s\u00A0][^,;:()]{0,80}?)?[\s\u00A0]+(?:was|were|is|are|amounted[\s\u00A0]+to|amounts[\s\u00A0]+to|came[\s\u00A0]+to|comes[\s\u00A0]+to|reached|measured)[\s\u00A0]*$`,
  'iu',
);

/**
 * A change named as the object of an estimating verb, its value after "at": "Tierney and colleagues
 * put the global cooling at the Last Glacial Maximum at about 6 °C". The verbs are those of
 * ESTIMATE_WORDS without their "at"; at most two words (an article, an adjective) stand
 * between the verb and the change noun.
 */
const ESTIMATE_VERBS = [...new Set(ESTIMATE_WORDS.filter((w) => w.endsWith(' at')).map((w) => w.slice(0, -3)).filter((w) => !w.includes(' ')))];
const ESTIMATED_CHANGE = new RegExp(
  String.raw`(?:^|[^\p{L}])(?:${ESTIMATE_VERBS.join('|')})[\s\u00A0]+(?:[\p{L}'’-]+[\s\u00A0]+){0,2}?(?:${CHANGE_SUBJECT_NOUNS.join('|')})(?:[\s\u00A0]+(?:in|of|between|across|from|during|over|at)[\s\u00A0][^,;:()]{0,80}?)?[\s\u00A0]+at[\s\u00A0]*$`,
  'iu',
);

const CHANGE_NOUN = new RegExp(String.raw`(?:^|[^\p{L}])(?:${CHANGE_SUBJECT_NOUNS.join('|')})(?![\p{L}])`, 'iu');
const RELATIVE_START = /^[\s\u00A0]*(?:which|that)(?![\p{L}])/iu;

/**
 * True when the clause before a temperature names a change as its subject and the verb joins them,
 * as the object of an estimating verb ("put the cooling at 6 °C"), or is a relative clause on a
 * change ("Antarctic warming, which the isotopes put at about 9 °C").
 */
export function namesChangeBefore(clause: string): boolean {
  const cut = (text: string) => Math.max(0, ...[',', ';', ':', '(', '.'].map((c) => text.lastIndexOf(c) + 1));
  const at = cut(clause);
  const own = clause.slice(at);
  if (CHANGE_SUBJECT.test(own) || ESTIMATED_CHANGE.test(own)) return true;
  if (!RELATIVE_START.test(own) || at === 0) return false;
  const head = clause.slice(0, at - 1);
  return CHANGE_NOUN.test(head.slice(cut(head)));
}

/**
 * Words that say the next amount is the one before in other words, when a verb does it: "which
 * works out at", "equals", "corresponds to". A change noun may follow: "equals a warming of".
 */
export const RESTATING_VERBS: readonly string[] = ['write as', 'written as', 'expressed as', ...['convert', 'converts', 'converted', 'converting'].flatMap((v) => [`${v} to`, `${v} into`]), 'works out at', 'works out to', 'work out at', 'work out to', 'comes to', 'come to', 'amounts to', 'amount to', 'corresponds to', 'correspond to', 'equals', 'equal to', 'is equal to', 'is the same as', 'the same as', 'translates to', 'translates into', 'becomes', 'which makes it', 'that makes it', 'making it'];
/** The restating verbs as one pattern, with an optional "a warming of" after them. */
export const RESTATING_VERB_PATTERN = String.raw`(?:${[...RESTATING_VERBS].sort((a, b) => b.length - a.length).map((w) => w.replace(/ /g, String.raw`[\s\u00A0]+`)).join('|')})(?:[\s\u00A0]+(?:a|an)[\s\u00A0]+(?:${CHANGE_SUBJECT_NOUNS.join('|')}|reading|temperature|date|level|depth)[\s\u00A0]+of)?`;

/**
 * What comes before the cues and what the cues do not settle. A kelvin value below 100 is a change
 * whatever the words (no air on Earth is that cold); then the cue tables; then the sign.
 */
export const TEMPERATURE_DEFAULT = 'a value in K below 100 is a change before any cue is read; with no cue, a leading + reads as a change, a negative number as a temperature, anything else as a change (most temperatures in ice-age writing are differences)';

/** Cues that make "ka" or "Ma" a duration; without one they are dates (ka = thousand years before present). */
export const DURATION_CUES: readonly Cue[] = [
  { reading: 'duration', where: 'before', words: ['for', 'lasted', 'lasting', 'lasts', 'span', 'spans', 'spanned', 'spanning', 'every', 'took', 'takes', 'period of', 'duration of', 'interval of', 'cycle of', 'cycles of', 'periodicity of', 'within', 'length of'] },
  { reading: 'duration', where: 'after', words: ['long', 'cycle', 'cycles', 'periodicity', 'period', 'record', 'interval'] },
];

/** Words before a bare four-digit whole number (1000–2100) that make it a calendar year (CE). */
export const CALENDAR_CUES: readonly string[] = ['in', 'by', 'for', 'since', 'from', 'until', 'till', 'to', 'after', 'before', 'around', 'about', 'circa', 'c.', 'ca.', 'of', 'between', 'and', 'during', 'year', 'early', 'late', 'mid', 'mid-', 'through', '–', '—', '-', 'january', 'february', 'march', 'april', 'may', 'june', 'july', 'august', 'september', 'october', 'november', 'december', 'spring', 'summer', 'autumn', 'winter'];

/** Words before a bare number that make it a label, not a quantity ("MIS 11", "Figure 3"). */
export const LABEL_CUES: readonly string[] = ['MIS', 'stage', 'termination', 'figure', 'fig.', 'table', 'page', 'p.', 'pp.', 'chapter', 'section', 'no.', 'issue', 'volume', 'vol.', 'panel', 'room', 'gallery', '#', 'worked example', 'exercise', 'question', 'step', 'slide', 'episode'];

const escape = (s: string): string => s.replace(/[.*+?^${}()|[\]\\]/g, '\\$&').replace(/ /g, String.raw`[\s\u00A0]+`);
const wordList = (words: readonly string[]): string => [...words].sort((a, b) => b.length - a.length).map(escape).join('|');

/** A matcher for `words` ending the text before a quantity, compiled once. */
export function beforeMatcher(words: readonly string[]): RegExp {
  return new RegExp(String.raw`(?:^|[^\p{L}\p{N}])(?:${wordList(words)})[\s\u00A0]*$`, 'iu');
}

/** A matcher for `words` starting the text after a quantity (a hyphen may join: "100-kyr-long"). */
export function afterMatcher(words: readonly string[]): RegExp {
  return new RegExp(String.raw`^[\s\u00A0-]*(?:${wordList(words)})(?![\p{L}])`, 'iu');
}

const compiled = (cues: readonly Cue[]): { cue: Cue; re: RegExp }[] =>
  cues.map((cue) => ({ cue, re: cue.where === 'before' ? beforeMatcher(cue.words) : afterMatcher(cue.words) }));
const TEMPERATURE = compiled(TEMPERATURE_CUES);
const TEMPERATURE_AFTER = TEMPERATURE.filter(({ cue }) => cue.where === 'after');
const ESTIMATE = beforeMatcher(ESTIMATE_WORDS);
const DURATION = compiled(DURATION_CUES);
const CALENDAR = beforeMatcher(CALENDAR_CUES);
const LABEL = beforeMatcher(LABEL_CUES);

/** The first cue matching `before` / `after`, or undefined. */
function firstCue(table: { cue: Cue; re: RegExp }[], before: string, after: string): Cue | undefined {
  return table.find(({ cue, re }) => re.test(cue.where === 'before' ? before : after))?.cue;
}

/** Temperature or temperature change, from the unit and value, the words around the quantity, and its sign. */
export function readTemperature(before: string, after: string, sign: string, unitId: string, value: number, clause = before): Dimension {
  if (unitId === 'K' && Math.abs(value) < 100) return 'temperature-change';
  if (namesChangeBefore(clause)) return 'temperature-change';
  const cue = firstCue(ESTIMATE.test(before) ? TEMPERATURE_AFTER : TEMPERATURE, before, after);
  if (cue !== undefined) return cue.reading;
  if (sign === '+') return 'temperature-change';
  return sign === '-' ? 'temperature' : 'temperature-change';
}

/** Duration or age for "ka" and "Ma". */
export function readKiloAnnum(before: string, after: string): Dimension {
  return firstCue(DURATION, before, after)?.reading ?? 'age';
}

/** True when the words before a bare four-digit number make it a calendar year. */
export function isCalendarCue(before: string): boolean {
  return CALENDAR.test(before);
}

/** True when the words before a bare number make it a label. */
export function isLabelCue(before: string): boolean {
  return LABEL.test(before);
}
