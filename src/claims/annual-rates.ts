/**
 * A change in a concentration told over one year is that year's growth rate: "CO2 rose 1.2 ppm
 * between 2023 and 2024", "the 2024 increase over 2023 was 1.5 ppm", "in 2024 it jumped by about
 * 1.5 ppm", "the annual rise averaged about 2 ppm in the 1960s" state ppm per year as surely as
 * "1.5 ppm a year" does, and bind to the pack's growth-rate values (which are in ppm/yr), not to its
 * levels. A writer marks the year in one of three ways:
 *   - a word of the lexicon's `rates.one-year` ("annual", "year-on-year", "in a single year") with a
 *     noun of change in the sentence, or the number read as a change;
 *   - two calendar years a year apart ("between 2023 and 2024", "2024, from 2023"), the number read
 *     as a change or named by a noun of change;
 *   - one calendar year after a word of `rates.within-year` ("in 2024", "during 2024"), the number
 *     read as a change ("went up about 1 ppm in 2024").
 * A sentence that also names another time (a period, pre-industrial times, a year beyond the pair)
 * may count its change from there ("a rise of 140 ppm since 1750 ... in 2024"): no rate is read.
 * A level ("reached 424 ppm in 2024", "the annual mean was 424 ppm") stays a level.
 */
import type { LoadedPacks } from '../rulepack/types.js';
import type { Quantity } from '../types.js';
import { findTerms } from './bind.js';
import { CHANGE_NOUN, isChangeVerb, quantityRoles } from './bind-role.js';
import { settingKindsOf } from './bind-setting.js';
import { type FormsTrie, phrasesTrie } from './forms-trie.js';

/** Units of a level of a gas whose change per year is told in the same unit per year. */
const GAS_UNITS = new Set(['ppm', 'ppb']);
/** A calendar year as written: four digits of the instrumental era, no decade ("1960s") and no digit beside it. */
const CALENDAR_YEAR = /(?<![\p{N},.])(?:1[89]\d\d|20\d\d)(?![\p{N}]|s\b|'s\b)/gu;
/** Dimensions a year is read as when it stands alone ("in 2024" is a date, "2024" a bare number). */
const YEAR_DIMENSIONS = new Set(['age', 'number']);

interface RateWords {
  oneYear: FormsTrie | undefined;
  withinYear: FormsTrie | undefined;
  afterChange: FormsTrie | undefined;
}

const compiled = new WeakMap<LoadedPacks, RateWords>();

function rateWordsOf(packs: LoadedPacks): RateWords {
  let found = compiled.get(packs);
  if (found === undefined) {
    const rates = packs.lexicon['rates'] ?? {};
    found = { oneYear: phrasesTrie(rates['one-year'] ?? []), withinYear: phrasesTrie(rates['within-year'] ?? []), afterChange: phrasesTrie(rates['after-change'] ?? []) };
    compiled.set(packs, found);
  }
  return found;
}

interface Year {
  year: number;
  start: number;
}

/** The calendar years `sentence` names, leaving out digits inside a quantity of another kind ("1900 metres"). */
function calendarYears(sentence: string, quantities: readonly Quantity[]): Year[] {
  const years: Year[] = [];
  for (const m of sentence.matchAll(CALENDAR_YEAR)) {
    const start = m.index;
    const inside = quantities.find((q) => q.start <= start && q.end >= start + m[0].length);
    if (inside !== undefined && !YEAR_DIMENSIONS.has(inside.dimension)) continue;
    years.push({ year: Number(m[0]), start });
  }
  return years;
}

/**
 * The quantities with each concentration change told over one year read as a rate per year
 * (same numbers, dimension `concentration-rate`); the others as they were, index for index.
 */
export function readAnnualRates(sentence: string, quantities: Quantity[], packs: LoadedPacks): Quantity[] {
  const gas = quantities.map((q) => q.dimension === 'concentration' && GAS_UNITS.has(q.statedUnit));
  if (!gas.includes(true)) return quantities;
  const { oneYear, withinYear, afterChange } = rateWordsOf(packs);
  const years = calendarYears(sentence, quantities);
  const distinct = [...new Set(years.map((y) => y.year))];
  const pair = distinct.length === 2 && Math.abs((distinct[0] as number) - (distinct[1] as number)) === 1;
  const marks = oneYear?.occurrences(sentence) ?? [];
  const yearly = marks.length > 0;
  const within =
    distinct.length === 1 &&
    withinYear !== undefined &&
    years.some((y) => withinYear.occurrences(sentence.slice(0, y.start)).some(([, to]) => /^\s*(?:the\s+year\s+)?$/u.test(sentence.slice(to, y.start))));
  if (!pair && !yearly && !within) return quantities;
  if (distinct.length > 2 || (distinct.length === 2 && !pair)) return quantities;
  // Another time named in the sentence may be where the change was counted from.
  const times = settingKindsOf(packs).get('time') ?? new Set<string>();
  const hits = findTerms(sentence, packs);
  if ([...hits.keys()].some((id) => times.has(id) && id !== 'today')) return quantities;
  const roles = quantityRoles(sentence, quantities);
  // A noun of change names the number a change ("the 2024 increase ... was 1.5 ppm"), and so does a
  // verb of change just before it, with at most two words of `rates.after-change` between ("rose
  // just 1.2 ppm", "went up by only 1.2 ppm"; "climbed past 424 ppm" is a level).
  const noun = CHANGE_NOUN.test(sentence);
  const filler = (word: string): boolean => afterChange?.occurrences(word).some(([at, to]) => at === 0 && to === word.length) ?? false;
  const afterVerb = (q: Quantity): boolean => {
    const words = sentence.slice(0, q.start).split(/[^\p{L}'-]+/u).filter((w) => w !== '');
    // Up to two such words: "went up by only 1.2 ppm".
    for (let skipped = 0; skipped <= 2; skipped++) {
      const word = words.at(-1 - skipped);
      if (word === undefined) return false;
      if (isChangeVerb(word)) return true;
      if (!filler(word)) return false;
    }
    return false;
  };
  // A noun of change names one figure: the first gas figure after it, else the last one before it.
  // "the mean was about 419 ppm in 2023, and the 2024 increase was about 3.5 ppm" names 3.5 ppm; the
  // level before the noun stays a level.
  const named = noun ? namedByNoun(sentence, quantities, gas) : new Set<number>();
  let rated = false;
  const out = quantities.map((q, i) => {
    if (gas[i] !== true) return q;
    const role = roles[i];
    const change = role === 'change' || (role !== 'level' && ((noun && (pair || yearly) && named.has(i)) || afterVerb(q)));
    if (!change) return q;
    rated = true;
    return { ...q, dimension: 'concentration-rate' as const, unit: 'ppm/yr' };
  });
  if (!rated) return quantities;
  // "the largest one-year jump": the year of a one-year word is the rate's own "per year", no span of time claimed.
  return out.map((q) => (q.dimension === 'duration' && marks.some(([at, to]) => at <= q.start && to >= q.end) ? { ...q, dimension: 'number' as const, unit: '' } : q));
}

/** The gas figures each noun of change of `sentence` names: the first after it, else the last before it. */
function namedByNoun(sentence: string, quantities: readonly Quantity[], gas: readonly boolean[]): Set<number> {
  const named = new Set<number>();
  const gases = quantities.map((q, i) => ({ q, i })).filter(({ i }) => gas[i] === true);
  for (const m of sentence.matchAll(new RegExp(CHANGE_NOUN.source, 'giu'))) {
    const at = m.index + m[0].length;
    const after = gases.find(({ q }) => q.start >= at);
    const before = gases.filter(({ q }) => q.end <= m.index).at(-1);
    const pick = after ?? before;
    if (pick !== undefined) named.add(pick.i);
  }
  return named;
}
