/**
 * `scope.short-record-stretched`: what a record of one length shows, told of a far longer span.
 *
 *   "The ice holds 800,000 years of air, so CO2 has never been this high in the whole history of the Earth."
 *                                                                       ^^^^^^^^^^^^^^^^^^^^^^^^^^^^^^^^^ flagged
 *   "The 2023 rise of 3 ppm shows that we now add 3 ppm every single year."
 *                                                  ^^^^^^^^^^^^^^^^^^^^^^ flagged
 *
 * Two structures:
 *   - A record's span, a number of years said of a record (a record word, cue words `record`, or a
 *     record of the lexicon: an ice core, a CO2 station, within its clause) or the years since its
 *     first year in a clause naming a record ("running since 1958"), and in the sentence a CO2 claim
 *     over a span at least three times as long: all of the Earth's history (cue words `all-history`:
 *     "the whole history of the planet"; a span of a billion
 *     years or more, "Earth's 4.5-billion-year history"), whose record may stand in one of the two
 *     sentences before, or any span named before it in its sentence; or a number of years ("for the
 *     last million years"), whose record must stand before it in its own sentence. A sentence that
 *     names an ice core beside a station's years passes.
 *   - One year's change of CO2 ("the 2024 jump of 3.5 ppm": a year beside a change word and a ppm
 *     figure), in the sentence or the one before, told as every year's (cue words `every-year`:
 *     "every single year", "year after year") with the same figure or "that fast" (cue words
 *     `as-fast`), or multiplied over a span ("some 350 ppm over the coming century": the year's figure
 *     times the span's years).
 */
import { findPhrases } from '../../claims/frames-match.js';
import { tokenizeSentence } from '../../claims/frames-tokens.js';
import { parseQuantities } from '../../quantities/index.js';
import type { ReadSentence } from '../../propositions/index.js';
import type { Cue, DetectInput, DetectorEntry } from './detector.js';

/**
 * A span of years written with its number ("800,000 years", "800k years", "800kyr", "4.5-billion-year",
 * "the last million years"); its year word is one of the cue words `spans`, the check's prefilter.
 */
const YEARS = /(?<![\p{L}\d.,])(?:(\d[\d,]*(?:\.\d+)?)\s*-?\s*)?(k|kyr|(?:thousand|million|billion)(?!\p{L}))?\+?\s*-?\s*(?:years?|yrs?)(?![\p{L}])(?!\s+(?:ago|old|before|bp)\b)/giu;
const SCALE: Readonly<Record<string, number>> = { k: 1e3, kyr: 1e3, thousand: 1e3, million: 1e6, billion: 1e9 };
/** A record's first year ("running since 1958", "records began in 1958"). */
const SINCE = /\bsince\s+(?:the\s+)?((?:1[89]|20)\d\d)\b/iu;
/** Span nouns that count years ("over the coming century"). */
const SPAN_NOUNS: Readonly<Record<string, number>> = { century: 100, centuries: 100, decade: 10, decades: 10 };
/** A year of the calendar as a word. */
const CALENDAR_YEAR = /^(?:19[5-9]\d|20\d\d)$/u;

/** The spans of years written in `text`: their values and where they stand. */
function spansIn(text: string): { years: number; start: number; end: number }[] {
  const out: { years: number; start: number; end: number }[] = [];
  for (const m of text.matchAll(YEARS)) {
    const number = m[1] === undefined ? undefined : Number(m[1].replace(/,/gu, ''));
    const scale = m[2] === undefined ? 1 : (SCALE[m[2].toLowerCase()] ?? 1);
    if (number === undefined && m[2] === undefined) continue;
    const start = m.index ?? 0;
    out.push({ years: (number ?? 1) * scale, start, end: start + m[0].length });
  }
  return out;
}

/** The span of a record named in `s`: years said beside a record word, or the years since its first year. */
function recordSpan(s: ReadSentence, isRecord: (i: number) => boolean, now: number): number | undefined {
  const spans = spansIn(s.text).filter((span) => {
    const at = s.words.findIndex((w) => w.start >= span.start);
    const clause = s.words[at]?.clause;
    return s.words.some((w, i) => w.clause === clause && isRecord(i) && Math.abs(i - at) <= 8);
  });
  // "running since 1958" counts only for a record named in its clause ("careful dating since 2012" is none).
  const since = SINCE.exec(s.text);
  const sinceAt = since === null ? -1 : s.words.findIndex((w) => w.start >= (since.index ?? 0));
  const sinceRecord = since !== null && s.words.some((w, i) => w.clause === s.words[sinceAt]?.clause && isRecord(i));
  const fromSince = since === null || !sinceRecord ? [] : [now - Number(since[1])];
  const all = [...spans.map((x) => x.years), ...fromSince].filter((y) => y > 0);
  return all.length === 0 ? undefined : Math.min(...all);
}

function detectLongerSpan(input: DetectInput, now: number): Cue[] {
  const { index, read } = input;
  const here = read(index);
  if (here === undefined) return [];
  const s = here.s;
  const co2 = s.of('entities', 'co2').length > 0 || /\bppm\b/iu.test(s.text) || s.of('entities', 'co2-station').length > 0;
  if (!co2) return [];
  const claimSpans = spansIn(s.text);
  const history = input.mayHold('all-history') ? findPhrases(input.sentence, input.words('all-history')) : [];
  const claims = [
    ...history.map((h) => ({ years: Infinity, start: h.start, end: h.end, all: true })),
    // "Earth's whole 4.5-billion-year history": a span of the Earth's age is all of its history.
    ...claimSpans.map((c) => ({ ...c, all: c.years >= 1e9 })),
  ];
  if (claims.length === 0) return [];
  // The record words are found (and compromise's roots read) only when a span before a claim asks.
  let recordWords: number[] | undefined;
  const recordWordsHere = () => (recordWords ??= input.mayHold('record') ? findPhrases(input.sentence, input.words('record')).map((r) => r.start) : []);
  const isRecordHere = (i: number) => s.inside(i, 'entities', 'ice-core') || s.inside(i, 'entities', 'co2-station') || recordWordsHere().includes(s.words[i]?.start ?? -1);
  // A sentence before is read for the same record words, as written (its words alone: no compromise roots).
  const isRecordElsewhere = (b: ReadSentence) => {
    let starts: Set<number> | undefined;
    const recordWord = (i: number) => (starts ??= new Set(findPhrases(tokenizeSentence(b.text, [], null), input.words('record')).map((r) => r.start))).has(b.words[i]?.start ?? -1);
    return (i: number) => b.inside(i, 'entities', 'ice-core') || b.inside(i, 'entities', 'co2-station') || recordWord(i);
  };
  for (const claim of claims) {
    // The record's span: in this sentence before the claim, else in one of the two sentences before.
    const before = s.text.slice(0, claim.start);
    const beforeSpans = spansIn(before);
    const recordHere = beforeSpans.length > 0 || SINCE.test(before) ? recordSpan({ ...s, text: before, words: s.words.filter((w) => w.end <= claim.start) } as ReadSentence, isRecordHere, now) : undefined;
    // "Never above 300 ppm in 800,000 years; so never in Earth's whole history": before a claim of all
    // history, a span the sentence names first is what it reasons from, record word or not.
    const ownSpan = recordHere ?? (claim.all && beforeSpans.length > 0 ? Math.min(...beforeSpans.map((x) => x.years)) : undefined);
    const earlier = [read(index - 1), read(index - 2)].flatMap((r) => (r === undefined ? [] : [r.s]));
    // A number of years is set against a record's span of its own sentence only: spans of the sentences
    // before ("the age gap is only about 50 years") need not be the record's whole reach.
    // Before a claim of all history, a sentence about CO2 that names a span ("CO2 never went above
    // 300 ppm in all those 800,000 years. So 300 ppm was never beaten in the history of the planet")
    // is what it reasons from, record word or not.
    const reasonedFrom = (b: ReadSentence) => recordSpan(b, isRecordElsewhere(b), now) ?? (b.of('entities', 'co2').length > 0 ? minimum(spansIn(b.text).map((x) => x.years)) : undefined);
    const span = ownSpan ?? (claim.all ? earlier.map(reasonedFrom).find((x) => x !== undefined) : undefined);
    if (span === undefined || claim.years < 3 * span) continue;
    // A record of the longer span named beside a station's years ("Mauna Loa since 1958 and the ice cores").
    if (ownSpan !== undefined && span < 1000 && s.of('entities', 'ice-core').length > 0) continue;
    return [{ start: claim.start, end: claim.end }];
  }
  return [];
}

/** The least of `values`, or undefined when there are none. */
function minimum(values: readonly number[]): number | undefined {
  return values.length === 0 ? undefined : Math.min(...values);
}

/** One year's change of CO2 in `s`: the ppm figure of "the 2024 jump of 3.5 ppm" or "rose 3.5 ppm in 2024". */
function oneYearChange(s: ReadSentence): number | undefined {
  const years = s.words.flatMap((w, i) => (CALENDAR_YEAR.test(w.text) ? [i] : []));
  if (years.length === 0) return undefined;
  const ups = s.of('changes', 'up');
  const ppm = parseQuantities(s.text).filter((q) => q.unit === 'ppm' || q.unit === 'ppm/yr');
  for (const q of ppm) {
    const at = s.words.findIndex((w) => w.start >= q.start);
    const dated = years.some((y) => Math.abs(y - at) <= 5 && ups.some((u) => Math.min(y, at) - 2 <= u.first && u.first <= Math.max(y, at) + 1));
    if (dated) return q.value;
  }
  return undefined;
}

function detectOneYear(input: DetectInput): Cue[] {
  const { index, read } = input;
  const here = read(index);
  if (here === undefined) return [];
  const s = here.s;
  const rate = oneYearChange(s) ?? (read(index - 1) === undefined ? undefined : oneYearChange(read(index - 1)!.s));
  if (rate === undefined || rate <= 0) return [];
  const ppm = parseQuantities(s.text).filter((q) => q.unit === 'ppm' || q.unit === 'ppm/yr');
  const every = input.mayHold('every-year') ? findPhrases(input.sentence, input.words('every-year')) : [];
  for (const e of every) {
    // The year's own figure repeated before the phrase, or "that fast" standing for it.
    const same = ppm.find((q) => q.end <= e.start && Math.abs(q.value - rate) <= 0.02 * rate && !yearBeside(s, q.start));
    const fast = input.mayHold('as-fast') ? findPhrases(input.sentence, input.words('as-fast')).find((f) => f.end <= e.start) : undefined;
    const from = same?.start ?? fast?.start;
    if (from !== undefined) return [{ start: from, end: e.end }];
  }
  // "some 350 ppm over the coming century": the year's figure times the span's years.
  for (const q of ppm) {
    if (yearBeside(s, q.start)) continue;
    const after = s.words.filter((w) => w.start >= q.end).slice(0, 6);
    const noun = after.find((w) => SPAN_NOUNS[w.text] !== undefined);
    const counted = spansIn(s.text.slice(q.end, after.at(-1)?.end ?? q.end)).map((x) => x.years)[0];
    const years = counted ?? (noun === undefined ? undefined : SPAN_NOUNS[noun.text]);
    if (years !== undefined && years >= 10 && Math.abs(q.value - rate * years) <= 0.15 * rate * years) {
      return [{ start: q.start, end: (noun ?? after.at(-1))?.end ?? q.end }];
    }
  }
  return [];
}

/** True when a calendar year stands within five words of the figure at `offset` (the year's own figure). */
function yearBeside(s: ReadSentence, offset: number): boolean {
  const at = s.words.findIndex((w) => w.start >= offset);
  return s.words.some((w, i) => CALENDAR_YEAR.test(w.text) && Math.abs(i - at) <= 5);
}

/** `scope.short-record-stretched` for the registry. */
export const shortRecordStretched: DetectorEntry = {
  detect: (input) => {
    const longer = detectLongerSpan(input, new Date().getUTCFullYear());
    return longer.length > 0 ? longer : detectOneYear(input);
  },
  // Every flag needs a claim of all history, one year's change told as every year's, or a span of
  // years or a span noun (cue words `spans`) in the sentence.
  keys: [['all-history', 'every-year', 'spans']],
};
