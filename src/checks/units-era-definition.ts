/**
 * An age scale defined with the wrong reference year: "ages in years BP (before AD 2000)", "11,700
 * years BP, where present means the year 2000", "b2k, counted back from 1950". BP counts years before
 * AD 1950 (Stuiver & Polach 1977) and b2k years before AD 2000 (Walker et al. 2009); each scale's year
 * comes from the unit table's offset (the CE year whose age on the scale is 0), not from this file.
 *
 *   "Greenland ages are given in years BP (before AD 2000)"
 *                                     ^^ scale   ^^^^^^^ its zero, written wrong → AD 1950
 *
 * What ties the year to the scale is data: the scale's names, then a few words that end in a phrase
 * of REFERENCE_LINKS ("before", "counted back from", "means the year"), then the year.
 */
import { convert, findUnit, rewriteQuantity } from '../quantities/index.js';
import type { Quantity, Source } from '../types.js';
import { B2K_CONVENTION, BP_CONVENTION } from './standard-sources.js';
import type { UnitFinding } from './units-rules.js';

/** The age scales a draft defines, by the unit table's id, with the names it writes them by and the convention's source. */
const ERA_SCALES: readonly { unit: string; names: readonly string[]; source: Source }[] = [
  { unit: 'yr BP', names: ['bp', 'b.p', 'before present'], source: BP_CONVENTION },
  { unit: 'yr b2k', names: ['b2k'], source: B2K_CONVENTION },
];

/** Phrases that make the year after them a scale's zero ("before AD 2000", "where present means the year 2000"). */
const REFERENCE_LINKS: readonly string[] = [
  'before',
  'before the year',
  'counted from',
  'counted back from',
  'counting from',
  'counting back from',
  'counts from',
  'counts back from',
  'measured from',
  'reckoned from',
  'means',
  'means the year',
  'meaning',
  'meaning the year',
  'is the year',
  'relative to',
  'taken as',
  'set at',
];

/** At most this many words stand between a scale's name and its year ("BP, where present means the year"). */
const MAX_GAP_WORDS = 6;

const wordsOf = (text: string): string[] => text.toLowerCase().replace(/[“”"'‘’()[\],:;=]/gu, ' ').split(/[\s\u00A0]+/u).filter((w) => w !== '');

/** The CE year whose age on `unit` is 0: 1950 for BP, 2000 for b2k (from the unit table's offsets). */
function zeroYear(unit: string): number | undefined {
  if (findUnit(unit, 'age') === undefined) return undefined;
  return convert(convert(0, unit, 'yr BP', 'age'), 'yr BP', 'CE', 'age');
}

/** Where each scale's name is written in `text`, as a whole word. */
function scaleNames(text: string): { unit: string; end: number; source: Source }[] {
  const lower = text.toLowerCase();
  const found: { unit: string; end: number; source: Source }[] = [];
  for (const scale of ERA_SCALES) {
    for (const name of scale.names) {
      for (let at = lower.indexOf(name); at >= 0; at = lower.indexOf(name, at + 1)) {
        const before = lower[at - 1];
        const after = lower[at + name.length];
        if ((before === undefined || !/[\p{L}\d]/u.test(before)) && (after === undefined || !/[\p{L}\d]/u.test(after))) found.push({ unit: scale.unit, end: at + name.length, source: scale.source });
      }
    }
  }
  return found.sort((a, b) => a.end - b.end);
}

/** Each calendar year in `qs` written as a scale's zero, when it is not that scale's year. */
export function eraDefinitionSlips(text: string, qs: Quantity[]): UnitFinding[] {
  const names = scaleNames(text);
  if (names.length === 0) return [];
  return qs.flatMap((q): UnitFinding[] => {
    if (q.statedUnit !== 'CE') return [];
    const year = convert(q.value, 'yr BP', 'CE', 'age');
    // The nearest scale named before the year, with only a short gap of words between.
    const scale = names.filter((n) => n.end <= q.start).at(-1);
    if (scale === undefined) return [];
    const gap = wordsOf(text.slice(scale.end, q.start));
    if (gap.length > MAX_GAP_WORDS) return [];
    const tail = gap.join(' ');
    if (!REFERENCE_LINKS.some((link) => tail === link || tail.endsWith(` ${link}`))) return [];
    const right = zeroYear(scale.unit);
    if (right === undefined || Math.abs(right - year) < 1) return [];
    const correction = rewriteQuantity(q, convert(right, 'CE', 'yr BP', 'age'));
    const other = ERA_SCALES.find((s) => s.unit !== scale.unit && zeroYear(s.unit) === year);
    const swap = other === undefined ? '' : ` AD ${year} is the zero of ${other.names[0] === 'bp' ? 'BP' : other.names[0]}.`;
    const name = scale.unit === 'yr BP' ? 'BP' : 'b2k';
    return [{ stated: q, computed: { value: convert(right, 'CE', 'yr BP', 'age'), low: convert(right, 'CE', 'yr BP', 'age'), high: convert(right, 'CE', 'yr BP', 'age') }, level: 'error', correction,
      reason: `${name} counts years before AD ${right}, not ${year}.${swap}`, sources: other === undefined ? [scale.source] : [scale.source, other.source] }];
  });
}
