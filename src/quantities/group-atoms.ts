/**
 * Joins numbers that belong together and shares units between them:
 *  - ranges, one quantity: "7,000 to 8,000 years", "180–190 ppm", "7-8 thousand", "between 180 and 190";
 *  - "±": "5 ± 1 °C" is one quantity with a stated uncertainty, and so is "90 ppm, give or take 10";
 *  - two neighbouring counts joined by "or", the unit written once after the second: "six or seven
 *    thousand years", "2 or 3 °C" is one quantity, a range (a writer who means two readings of one
 *    figure writes a unit after each: "6,000 years, or 6 kyr");
 *  - from-to pairs, two quantities (the ends of a change): "rose from [180] to [280 ppm]".
 * A number with no unit of its own takes its partner's unit and scale ("7-8 thousand years").
 */
import type { Atom } from './find-atoms.js';
import { HEDGE_PREFIX_PATTERN } from './find-hedge.js';
import { matchUnit, type UnitMatch } from './match-unit.js';
import { isCalendarCue, isLabelCue } from './reading-cues.js';

/** A number and the unit that applies to it (written after it, or shared from its partner). */
export interface Part {
  atom: Atom;
  unit: UnitMatch | undefined;
  /** True when the unit is written after this very number (so it belongs in this quantity's text). */
  ownUnit: boolean;
}

/** One quantity to be: a single number, a range, or a value ± uncertainty; from-to ends are singles with a role. */
export interface Group {
  kind: 'single' | 'range' | 'plus-minus';
  parts: Part[];
  role: 'alone' | 'from' | 'to';
  /** Where a leading "between" starts, for ranges written that way. */
  prefixStart: number | undefined;
}

const S = String.raw`[\s\u00A0]`;
const PLUS_MINUS = new RegExp(String.raw`^${S}*(?:±|\+\/-|\+\/−)${S}*$`, 'u');
/** "90 ppm, give or take 10", "278 ppm plus or minus about 3": the uncertainty stated in words. */
const PLUS_MINUS_WORDS = new RegExp(String.raw`^${S}*,?${S}*(?:give${S}+or${S}+take|plus${S}+or${S}+minus)${S}+(?:(?:about|around|roughly|some|perhaps|maybe)${S}+)?$`, 'iu');
/** "six or seven thousand years": " or " alone between the two numbers (no comma, no hedge). */
const OR_JOIN = new RegExp(String.raw`^${S}+or${S}+$`, 'iu');
const RANGE_JOIN = new RegExp(String.raw`^(?:${S}*(?:to|through|until|till)${S}+|-|${S}*[–—]${S}*)$`, 'iu');
const AND_JOIN = new RegExp(String.raw`^${S}+and${S}+$`, 'iu');
const BETWEEN = new RegExp(String.raw`(?:^|[^\p{L}])(?<word>between)${S}+(?:[^\s\d]+${S}*){0,2}$`, 'iu');
const FROM = new RegExp(String.raw`(?:^|[^\p{L}])from${S}+(?:[^\s\d]+${S}*){0,2}$`, 'iu');
/** "to about", "to more than": the far end of a from-to pair may carry its own hedge (a range may not). */
const TO_HEDGED = new RegExp(String.raw`^${S}*(?:to|through|until|till)${S}+(?:${HEDGE_PREFIX_PATTERN})${S}*$`, 'iu');
/** "from 190 up to 280", "from 280 down to 190": the far end of a from-to pair after a direction word. */
const TO_DIRECTED = new RegExp(String.raw`^${S}*(?:up|down)${S}+to${S}+(?:(?:about|around|roughly|some|nearly|almost)${S}+)?$`, 'iu');
/** A dash between two numbers, the joiner of a written range ("1.5–4.5"), not the word "to". */
const DASH_JOIN = new RegExp(String.raw`^(?:-|${S}*[–—]${S}*)$`, 'u');
/** After a dashed pair, "to" and another number, a bracketed note first allowed: "from 1.5–4.5 °C (AR5) to 2.5–4 °C". */
const THEN_TO = new RegExp(String.raw`^(?:${S}*\([^()]{0,40}\))?${S}*,?${S}*(?:to|up${S}+to|down${S}+to)${S}+(?:(?:about|around|roughly|some)${S}+)?\d`, 'iu');
const RANGE_VERB = new RegExp(String.raw`(?:rang(?:e|es|ed|ing)|var(?:y|ies|ied|ying)|anywhere|estimates?)${S}+from${S}+(?:[^\s\d]+${S}*){0,2}$`, 'iu');

const joinable = (a: Atom): boolean => a.form === 'digits' || a.form === 'words';
const TIME_DIMENSIONS = new Set(['age', 'duration']);

/**
 * True when bare `p` is a calendar year ("in 1750") and `q` a number in a unit that is not a time:
 * in "from 280 ppm in 1750 to 420 ppm" the year is a date, not the low end of a ppm range.
 */
function yearBeforeOtherUnit(text: string, p: Part, q: Part): boolean {
  if (p.unit !== undefined || q.unit === undefined || !p.atom.plainInteger || p.atom.value < 1000 || p.atom.value > 2100) return false;
  return isCalendarCue(text.slice(Math.max(0, p.atom.start - 16), p.atom.start)) && !q.unit.defs.some((d) => TIME_DIMENSIONS.has(d.dimension));
}
/**
 * "six or seven thousand years", "2 or 3 °C": a bare count, " or ", and a larger count no more than
 * twice it that carries the unit: the writer gives a span of two neighbouring values (common practice).
 */
function orRange(joiner: string, p: Part, q: Part): boolean {
  if (!OR_JOIN.test(joiner) || p.unit !== undefined || q.unit === undefined || p.atom.form !== q.atom.form) return false;
  const low = shareScale(p.atom, q.atom).value;
  return low > 0 && q.atom.value > low && q.atom.value <= 2 * low;
}
const sameUnit = (a: UnitMatch | undefined, b: UnitMatch | undefined): boolean =>
  a === undefined || b === undefined || a.defs[0]?.id === b.defs[0]?.id;

/** "0.75 of a degree", "0.3 of a metre": a part of one unit, written with "of a" between. */
const OF_A = /^[\s\u00A0]+of[\s\u00A0]+an?(?=[\s\u00A0])/u;

/** The unit after "of a" when the number is a part of one (above 0, below 1), or undefined. */
function partOfUnit(text: string, atom: Atom): UnitMatch | undefined {
  if (!(atom.value > 0 && atom.value < 1)) return undefined;
  const gap = OF_A.exec(text.slice(atom.end, atom.end + 12));
  return gap === null ? undefined : matchUnit(text, atom.end + gap[0].length);
}

/** The numbers of `text` with their units, dropping labels ("MIS 11") and numbers glued to words ("1990s"). */
export function partsOf(text: string, atoms: Atom[]): Part[] {
  const parts: Part[] = [];
  for (const atom of atoms) {
    const unit = atom.form === 'multiplier' ? undefined : (matchUnit(text, atom.end) ?? partOfUnit(text, atom));
    const glued = /[\p{L}\p{N}]/u.test(text[atom.end] ?? '');
    if (glued && unit?.start !== atom.end) continue;
    // "Figure 3C", "Room 2F": a label's number with its letter, no temperature.
    const bareLetter = unit !== undefined && unit.end - unit.start === 1;
    if ((unit === undefined || bareLetter) && atom.form === 'digits' && isLabelCue(text.slice(Math.max(0, atom.start - 16), atom.start))) continue;
    parts.push({ atom, unit, ownUnit: unit !== undefined });
  }
  return parts;
}

function shareScale(from: Atom, to: Atom): Atom {
  if (from.scale !== 1 || to.scale === 1 || Math.abs(from.value) >= to.scale) return from;
  return { ...from, value: from.value * to.scale, half: from.half * to.scale, scale: to.scale, plainInteger: false };
}

/**
 * True when a dashed pair after "from" is itself the first end of a change whose far end follows:
 * in "narrowed from 1.5–4.5 °C to 2.5–4 °C" the pair 1.5–4.5 is a range, not 1.5 rising to 4.5.
 */
function rangeThenTo(text: string, joiner: string, second: Part): boolean {
  return DASH_JOIN.test(joiner) && THEN_TO.test(text.slice(second.unit?.end ?? second.atom.end, (second.unit?.end ?? second.atom.end) + 60));
}

/** Groups the parts of `text` into quantities-to-be, in order. */
export function groupParts(text: string, parts: Part[]): Group[] {
  const groups: Group[] = [];
  for (let i = 0; i < parts.length; i++) {
    const p = parts[i] as Part;
    const q = parts[i + 1];
    if (q === undefined || !joinable(p.atom) || !joinable(q.atom) || !sameUnit(p.unit, q.unit) || yearBeforeOtherUnit(text, p, q)) {
      groups.push({ kind: 'single', parts: [p], role: 'alone', prefixStart: undefined });
      continue;
    }
    const joiner = text.slice(p.unit?.end ?? p.atom.end, q.atom.start);
    const before = text.slice(Math.max(0, p.atom.start - 48), p.atom.start);
    const between = AND_JOIN.test(joiner) ? BETWEEN.exec(before) : null;
    const shared: Part = { atom: shareScale(p.atom, q.atom), unit: p.unit ?? q.unit, ownUnit: p.ownUnit };
    const second: Part = { ...q, unit: q.unit ?? p.unit };
    if (PLUS_MINUS.test(joiner) || PLUS_MINUS_WORDS.test(joiner)) {
      groups.push({ kind: 'plus-minus', parts: [shared, second], role: 'alone', prefixStart: undefined });
    } else if ((RANGE_JOIN.test(joiner) || TO_HEDGED.test(joiner) || TO_DIRECTED.test(joiner)) && FROM.test(before) && !RANGE_VERB.test(before) && !rangeThenTo(text, joiner, second)) {
      groups.push({ kind: 'single', parts: [shared], role: 'from', prefixStart: undefined });
      groups.push({ kind: 'single', parts: [second], role: 'to', prefixStart: undefined });
    } else if (RANGE_JOIN.test(joiner) || between !== null || orRange(joiner, p, q)) {
      const prefixStart = between === null ? undefined : p.atom.start - before.length + between.index + between[0].indexOf(between.groups?.['word'] ?? '');
      groups.push({ kind: 'range', parts: [shared, second], role: 'alone', prefixStart });
    } else {
      groups.push({ kind: 'single', parts: [p], role: 'alone', prefixStart: undefined });
      continue;
    }
    i++;
  }
  return groups;
}
