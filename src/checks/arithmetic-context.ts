/**
 * A change whose start value stands in the sentence before. "At the last glacial maximum CO2 stood
 * near [190 ppm]. By the start of the Holocene it had climbed to about [280 ppm], a rise of
 * [110 ppm]." The rise should be 90 ppm. Precision first: the earlier sentence must state exactly
 * one level of the same dimension and unit, this sentence must state the change, one end value
 * ("to Y", "reached Y") and no start, and it must refer back ("it", "by then", "since then"...).
 */
import { writtenInterval as w } from '../quantities/index.js';
import type { Dimension, Quantity } from '../types.js';
import { facing, minus, type Derived } from './arithmetic-derive.js';
import { isStatedChange, type Pair } from './arithmetic-frames.js';

/** The sentence before the one checked, with its quantities. */
export interface Previous {
  text: string;
  quantities: Quantity[];
}

/** A change found across two sentences: the stated change and the value the two levels give it. */
export interface AcrossFinding {
  stated: Quantity;
  computed: Derived;
  measures: string;
  basis: string;
}

/** Levels a draft follows from one sentence to the next, and the dimension of a change in them. */
const CHANGE_OF: Partial<Record<Dimension, Dimension>> = { concentration: 'concentration', temperature: 'temperature-change', length: 'length' };
/**
 * Words that carry the reader on from the sentence before; "by the end of" and the like name a
 * later time; "the level", "the concentration" name again what the sentence before measured.
 */
const BACK_REFERENCE = /(?:^|[^\p{L}])(?:it|by[\s\u00A0]+then|by[\s\u00A0]+the[\s\u00A0]+(?:start|end|eve|close|dawn|onset|beginning|time)[\s\u00A0]+(?:of|when|that|the)|from[\s\u00A0]+there|since[\s\u00A0]+then|later|(?:the|that|this)[\s\u00A0]+(?:level|concentration|value|figure|reading|amount|mean|average))(?![\p{L}])/iu;
/** "climbed to [280 ppm]", "reached [280 ppm]": the words that make a level the end of the change. */
const END_CUE = /(?:^|[^\p{L}])(?:to|reached|reaching)[\s\u00A0]*$/iu;
/**
 * Things a draft measures. When this sentence names one before its end value, the sentence before
 * must name it too, or the change is of something else ("Sea ice reached ..." after a CO2 level).
 */
const SUBJECTS = ['co2', 'carbon dioxide', 'methane', 'nitrous oxide', 'sea level', 'sea', 'ocean', 'temperature', 'air', 'ice', 'glacier', 'lake', 'snow line', 'tree line', 'water'];
const SUBJECT = (s: string): RegExp => new RegExp(String.raw`(?:^|[^\p{L}])${s.replace(/ /g, String.raw`[\s\u00A0]+`)}(?![\p{L}])`, 'iu');
const only = <T>(xs: T[]): T | undefined => (xs.length === 1 ? xs[0] : undefined);

/** True when every measured thing named in `clause` is named in `previous` too. */
function sameSubject(clause: string, previous: string): boolean {
  return SUBJECTS.every((s) => !SUBJECT(s).test(clause) || SUBJECT(s).test(previous));
}

/**
 * The stated change in `text` set against its end value here and its start value in `previous`,
 * or nothing when any condition fails. Only this sentence's quantities are ever `stated`.
 */
export function changesAcross(text: string, qs: Quantity[], pairs: Pair[], previous: Previous | undefined): AcrossFinding[] {
  if (previous === undefined || pairs.length > 0) return [];
  return qs.flatMap((end) => {
    const changeDim = CHANGE_OF[end.dimension];
    if (changeDim === undefined || isStatedChange(text, end) || !END_CUE.test(text.slice(Math.max(0, end.start - 12), end.start))) return [];
    if (qs.some((q) => q !== end && q.dimension === end.dimension && !isStatedChange(text, q))) return [];
    const stated = only(qs.filter((q) => q !== end && q.dimension === changeDim && isStatedChange(text, q)));
    const start = only(previous.quantities.filter((q) => q.dimension === end.dimension));
    if (stated === undefined || start === undefined || isStatedChange(previous.text, start)) return [];
    if (start.statedUnit !== end.statedUnit || stated.statedUnit !== end.statedUnit) return [];
    const before = text.slice(0, end.start);
    if (!BACK_REFERENCE.test(before) || !sameSubject(before, previous.text)) return [];
    return [{ stated, computed: facing(minus(w(end), w(start)), stated.value), measures: `the change from ${start.text} in the sentence before to ${end.text}`, basis: "the paragraph's" }];
  });
}
