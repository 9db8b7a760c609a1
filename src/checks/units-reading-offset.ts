/**
 * A temperature change converted as if it were a reading: "about 6 °C colder ... in Fahrenheit
 * that's about 43 degrees" (6 × 1.8 + 32 = 42.8), "a 6 °C drop ... as 279 K" (6 + 273.15). A change
 * of C degrees Celsius is a change of 1.8 × C degrees Fahrenheit and of C kelvin; the 32 and the
 * 273.15 belong to readings (NIST SP 811, the Fahrenheit, Celsius and kelvin scales).
 *
 * The evidence is the number itself, whatever the wording between the two figures: a °F (or K)
 * figure that is exactly the reading conversion of a change stated before it, in its own sentence
 * or the few before it in the paragraph, and not its change conversion. The °C figure must be a
 * change by the words of its sentence (a change cue of the cue table, or a change word anywhere in
 * the sentence: "6 degrees C is about 43 Fahrenheit, so that's a big drop"); a figure the cue
 * table reads as a reading ("summers averaged 10 °C, which is 50 °F") is a reading rightly
 * converted. A °F figure cued as a reading of its own ("a summer day there can reach 50 °F") is
 * another reading, not the change restated.
 */
import { fromCanonical, toCanonical, parseQuantities, TEMPERATURE_CUES, CANONICAL_UNIT } from '../quantities/index.js';
import { afterMatcher, beforeMatcher, RESTATING_VERB_PATTERN } from '../quantities/reading-cues.js';
import { findAtoms } from '../quantities/find-atoms.js';
import type { Quantity } from '../types.js';
import { isDeniedFigure } from './denied-figure.js';
import type { Derived } from './arithmetic-derive.js';

/** A change stated in °C (or a small K figure), as its written ends in degrees. */
interface StatedChange {
  quantity: Quantity;
  ends: number[];
}

/** A °F or K figure that is a change read as a reading, with the change it should restate. */
export interface ReadingOffsetSlip {
  /** The figure as a temperature change (canonical K). */
  stated: Quantity;
  /** The right change in K (the canonical unit of a temperature change). */
  computed: Derived;
  change: Quantity;
  /** What was added: 32 (°F) or 273.15 (K). */
  offset: number;
}

/** Single words of the cue table that make a temperature a change (not "by", "a", "more"...). */
const CHANGE_WORDS = [
  ...new Set(
    TEMPERATURE_CUES.filter((c) => c.reading === 'temperature-change')
      .flatMap((c) => c.words)
      .filter((w) => /^\p{L}[\p{L}-]{2,}$/u.test(w) && !['above', 'below', 'more', 'less'].includes(w)),
  ),
];
const CHANGE_WORD = new RegExp(String.raw`(?:^|[^\p{L}-])(?:${CHANGE_WORDS.join('|')})(?![\p{L}])`, 'iu');

/** The cue table's change cues, before and after a figure ("by 9 °C", "6 °C colder"); not "a"/"an". */
const CHANGE_BEFORE = beforeMatcher(TEMPERATURE_CUES.filter((c) => c.reading === 'temperature-change' && c.where === 'before').flatMap((c) => c.words).filter((w) => w !== 'a' && w !== 'an'));
const CHANGE_AFTER = afterMatcher(TEMPERATURE_CUES.filter((c) => c.reading === 'temperature-change' && c.where === 'after').flatMap((c) => c.words));

/**
 * Reading cues that put a figure in a clause of its own ("reach", "averaged", "stood at"): the
 * cue table's reading words less the copulas and "to", which also join a restatement ("which is",
 * "works out to").
 */
const OWN_READING = beforeMatcher(
  TEMPERATURE_CUES.filter((c) => c.reading === 'temperature' && c.where === 'before')
    .flatMap((c) => c.words)
    .filter((w) => !['was', 'were', 'is', 'are', 'to', 'of'].includes(w)),
);

/** Words that open another clause, whose reading is its own. */
const NEW_CLAUSE = /(?:^|[^\p{L}])(?:and|but|while|whereas|when|where|though|although)(?![\p{L}])/iu;
/** Words that point back at a figure said before, or that restate it ("in other words", "works out"). */
const POINTER = new RegExp(String.raw`(?:^|[^\p{L}])(?:that|this|which|it|its|it['’]s|that['’]s|in[\s\u00A0]+other[\s\u00A0]+words|${RESTATING_VERB_PATTERN})(?![\p{L}])`, 'iu');
/** A scale named in words: the sentence says which one it converts to. */
const SCALE_WORD = /(?:^|[^\p{L}])(?:fahrenheit|kelvin)(?![\p{L}])/iu;

/** The number as written in its own unit: 43 for "about 43 °F". */
const written = (q: Quantity, x: number): number => fromCanonical(x, q.statedUnit, q.dimension);

/** The written values of a figure's numbers: one, or the two ends of a range ("5-7 degrees C"). */
function writtenEnds(q: Quantity): number[] {
  const atoms = findAtoms(q.text).filter((a) => a.form === 'digits' || a.form === 'words');
  if (atoms.length === 2) return atoms.map((a) => a.value);
  return [written(q, q.value)];
}

/** Each written end of `q` as an interval: a range's ends at their last place, one figure with its hedge. */
function endIntervals(q: Quantity): [number, number][] {
  const atoms = findAtoms(q.text).filter((a) => a.form === 'digits' || a.form === 'words');
  if (atoms.length === 2) return atoms.map((a) => [a.value - Math.max(a.half, 0.5), a.value + Math.max(a.half, 0.5)]);
  const ends = [written(q, q.low), written(q, q.high)].sort((a, b) => a - b) as [number, number];
  return [ends];
}

/** True when `q` is a change in °C (or a small K figure) by the words of `text`. */
function isStatedChange(text: string, q: Quantity): boolean {
  if (q.dimension !== 'temperature-change') return false;
  if (q.statedUnit !== 'degC' && !(q.statedUnit === 'K' && q.value < 100)) return false;
  return CHANGE_WORD.test(text) || CHANGE_BEFORE.test(text.slice(Math.max(0, q.start - 32), q.start)) || CHANGE_AFTER.test(text.slice(q.end, q.end + 32));
}

/** The changes of one sentence, in order. */
const changesOf = (text: string, qs: readonly Quantity[]): StatedChange[] =>
  qs.filter((q) => isStatedChange(text, q)).map((q) => ({ quantity: q, ends: writtenEnds(q) }));

/** `q` read as a temperature change of the same written number of degrees. */
function asChange(q: Quantity): Quantity {
  if (q.dimension === 'temperature-change') return q;
  const again = (x: number): number => toCanonical(fromCanonical(x, q.statedUnit, 'temperature'), q.statedUnit, 'temperature-change');
  return { ...q, dimension: 'temperature-change', unit: CANONICAL_UNIT['temperature-change'], value: again(q.value), low: again(q.low), high: again(q.high) };
}

/**
 * Every °F or K figure of `text` that is a change stated before it converted as a reading.
 * `earlier` is the sentences before it in the paragraph, nearest last.
 */
export function readingOffsetSlips(text: string, qs: readonly Quantity[], earlier: readonly string[] = []): ReadingOffsetSlip[] {
  // Only a Fahrenheit or kelvin figure can be a slip: without one, the sentences before are not read.
  if (!qs.some((q) => q.statedUnit === 'degF' || q.statedUnit === 'K')) return [];
  const before = earlier.flatMap((s) => changesOf(s, parseQuantities(s)));
  const here = changesOf(text, qs);
  const out: ReadingOffsetSlip[] = [];
  for (const q of qs) {
    const offset = q.statedUnit === 'degF' ? 32 : q.statedUnit === 'K' && written(q, q.value) > 150 ? 273.15 : undefined;
    if (offset === undefined) continue;
    if (q.dimension === 'temperature' && OWN_READING.test(text.slice(Math.max(0, q.start - 32), q.start))) continue;
    // "a 6 °C difference is about 10.8 °F, not 43": the draft names the slip to deny it.
    if (isDeniedFigure(text, q)) continue;
    const factor = offset === 32 ? 1.8 : 1;
    const intervals = endIntervals(q);
    const fits = (c: StatedChange, add: number): boolean =>
      c.ends.length === intervals.length && c.ends.every((x, i) => {
        const [lo, hi] = intervals[i] as [number, number];
        const target = x * factor + add;
        return lo - 1e-9 <= target && target <= hi + 1e-9;
      });
    // "Convert the reading: 6 °C is 42.8 °F": a °C figure of its own sentence that is no change and
    // that the figure converts rightly as a reading is what it restates.
    const readings = qs.filter((o) => o.end <= q.start && (o.statedUnit === 'degC' || o.statedUnit === 'K') && o !== q && !here.some((c) => c.quantity === o));
    if (readings.some((o) => fits({ quantity: o, ends: writtenEnds(o) }, offset))) continue;
    const head = text.slice(0, q.start);
    // The nearest change before the figure that it restates as a reading, and does not restate
    // rightly: in its own sentence, unless another clause with no word pointing back stands between
    // ("was 6 °C colder and a summer day there was 43 °F"); in a sentence before, only when this one
    // points back or names the scale it converts to ("In Fahrenheit, that's about 43 degrees").
    const own = here.filter((c) => c.quantity.end <= q.start && !(NEW_CLAUSE.test(text.slice(c.quantity.end, q.start)) && !POINTER.test(text.slice(c.quantity.end, q.start))));
    const back = POINTER.test(head) || SCALE_WORD.test(head) ? before : [];
    const change = [...back, ...own].reverse().find((c) => fits(c, offset) && !fits(c, 0));
    if (change === undefined) continue;
    const lows = change.ends.map((x) => toCanonical(x, change.quantity.statedUnit, 'temperature-change'));
    const value = lows.reduce((a, b) => a + b, 0) / lows.length;
    out.push({ stated: asChange(q), computed: { value, low: Math.min(...lows), high: Math.max(...lows) }, change: change.quantity, offset });
  }
  return out;
}
