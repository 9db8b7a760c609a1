/**
 * The quantity reader: one sentence in, its quantities out, each as an interval in the canonical
 * unit of its dimension. Example:
 *   "CO2 rose from [about 180] to [280 ppm] over [some 8,000 years]."
 * Numbers are found (find-atoms), given units (match-unit), grouped (group-atoms), read by the cue
 * tables (reading-cues), and turned into intervals by the interval table (interval-rules).
 */
import type { Dimension, Quantity } from '../types.js';
import { toCanonical } from './convert.js';
import { findAtoms } from './find-atoms.js';
import { gluedHedge, HEDGE_PREFIX_PATTERN, hedgeAfter, hedgeBefore, type HedgeMatch } from './find-hedge.js';
import { groupParts, partsOf, type Group } from './group-atoms.js';
import { applyRule, intervalRule } from './interval-rules.js';
import { isCalendarCue, readKiloAnnum, readTemperature, RESTATING_VERB_PATTERN } from './reading-cues.js';
import { CANONICAL_UNIT, UNIT_TABLE, type UnitDef } from './unit-table.js';
import { readPerMillion } from './per-million.js';

const S = String.raw`[\s\u00A0]`;
const AD_BEFORE = new RegExp(String.raw`(?:^|[^\p{L}])(?<ad>AD|A\.D\.)${S}*$`, 'u');
/** Words that restate the quantity before in another unit ("5 °C (about 9 °F)", "3 °C, which is 5.4 °F"). */
const EQUIVALENT = new RegExp(
  String.raw`^${S}*(?:\(|,?${S}*or${S}+|\/|,?${S}*i\.e\.,?${S}*|,?${S}*that is,?${S}*|,?${S}*that['’]s${S}+|,?${S}*which is${S}+|,?${S}*in other words,?${S}*|=${S}*|,${S}*)(?:(?:${HEDGE_PREFIX_PATTERN})${S}*)?$`,
  'iu',
);
/** A looser restatement: a few words, then a restating verb ("colder than before, which works out at 38 °F"). */
const EQUIVALENT_BY_VERB = new RegExp(String.raw`^[^\d;:!?]{0,60}?(?:^|[^\p{L}])(?:${RESTATING_VERB_PATTERN})${S}+(?:(?:${HEDGE_PREFIX_PATTERN})${S}*)?$`, 'iu');
const CE = UNIT_TABLE.find((d) => d.id === 'CE') as UnitDef;
const NUMBER = UNIT_TABLE.find((d) => d.dimension === 'number') as UnitDef;
const RATIO = UNIT_TABLE.find((d) => d.dimension === 'ratio') as UnitDef;

interface Reading {
  def: UnitDef;
  rule: string;
  prefixStart: number | undefined;
}

const first = (g: Group) => g.parts[0] as Group['parts'][number];
const last = (g: Group) => g.parts[g.parts.length - 1] as Group['parts'][number];

const SPOKEN_HUNDREDS = /^(?:one|two|three|four|five|six|seven|eight|nine)-(?:twenty|thirty|forty|fifty|sixty|seventy|eighty|ninety)$/iu;

/** Which unit definition applies, or undefined when the group is not a quantity (number words with no unit). */
function readGroup(text: string, g: Group, previous: Quantity | undefined): Reading | undefined {
  const a = first(g).atom;
  const unit = last(g).unit;
  // Cue words are read before the hedge: in "up to 2 °C", "to" belongs to the hedge, not a cue.
  const cueEnd = hedgeBefore(text, g.prefixStart ?? a.start, 'temperature')?.start ?? g.prefixStart ?? a.start;
  const before = text.slice(Math.max(0, cueEnd - 48), cueEnd);
  const rawBefore = text.slice(Math.max(0, a.start - 48), a.start);
  // Cue words after a restatement still count: in "8 °C, or 46 °F, colder", "colder" is the cue.
  const after = text
    .slice(unit?.end ?? last(g).atom.end, (unit?.end ?? last(g).atom.end) + 64)
    .replace(/^[\s\u00A0]*(?:\([^)]{0,24}\)|,?[\s\u00A0]*or[\s\u00A0]+[^,;]{0,24},)/u, '');
  const rule = g.kind === 'range' ? 'range' : g.kind === 'plus-minus' ? 'plus-minus' : a.rule;
  if (unit === undefined) {
    if (a.form === 'multiplier') return { def: RATIO, rule, prefixStart: g.prefixStart };
    // Number words with no unit are no quantity, except a spoken three-figure number ("two-eighty").
    if (a.form !== 'digits' && !(a.form === 'words' && SPOKEN_HUNDREDS.test(text.slice(a.start, a.end)))) return undefined;
    const years = g.parts.every((p) => p.atom.plainInteger && p.atom.value >= 1000 && p.atom.value <= 2100);
    const ad = AD_BEFORE.exec(rawBefore);
    if (ad !== null) return { def: CE, rule: g.kind === 'single' ? 'calendar-year' : rule, prefixStart: a.start - rawBefore.length + ad.index + ad[0].indexOf(ad.groups?.['ad'] ?? '') };
    if (years && isCalendarCue(rawBefore)) return { def: CE, rule: g.kind === 'single' ? 'calendar-year' : rule, prefixStart: g.prefixStart };
    return { def: NUMBER, rule, prefixStart: g.prefixStart };
  }
  let def = unit.defs[0] as UnitDef;
  if (unit.defs.length > 1) {
    const dims = unit.defs.map((d) => d.dimension);
    const gap = previous === undefined ? '' : text.slice(previous.end, g.prefixStart ?? a.start);
    const equivalent = previous !== undefined && (EQUIVALENT.test(gap) || EQUIVALENT_BY_VERB.test(gap));
    let wanted: Dimension;
    if (dims.includes('temperature')) {
      wanted = equivalent && (previous.dimension === 'temperature' || previous.dimension === 'temperature-change')
        ? previous.dimension
        : readTemperature(before, after, a.sign, unit.defs[0]?.id ?? '', a.value, text.slice(Math.max(0, cueEnd - 160), cueEnd));
    } else wanted = readKiloAnnum(before, after);
    def = unit.defs.find((d) => d.dimension === wanted) ?? def;
  }
  const calendar = def.id === 'CE' && g.kind === 'single';
  return { def, rule: calendar ? 'calendar-year' : rule, prefixStart: g.prefixStart };
}

/**
 * The interval: the stated row works on the number as written (precision, range, vague words),
 * then the result goes to the canonical unit, where the hedge row works. Hedging in the canonical
 * unit keeps "around 1750" at 200 ± 20 years before 1950 rather than ± 175 years.
 */
function interval(g: Group, rule: string, def: UnitDef, hedge: HedgeMatch | undefined): { value: number; low: number; high: number } {
  const a = first(g).atom;
  const b = last(g).atom;
  const L = Math.min(a.value, b.value);
  const H = Math.max(a.value, b.value);
  const inputs = g.kind === 'range'
    ? { v: (L + H) / 2, h: 0, L, H, s: 1 }
    : { v: a.value, h: g.kind === 'plus-minus' ? Math.abs(b.value) : a.half, L: a.value, H: a.value, s: a.scale };
  const [l0, h0] = applyRule(intervalRule(rule), inputs);
  const canonical = (x: number): number => toCanonical(x, def.id, def.dimension);
  const v = canonical(a.form === 'vague' ? (l0 + h0) / 2 : inputs.v);
  const [low, high] = [canonical(l0), canonical(h0)].sort((x, y) => x - y) as [number, number];
  if (hedge === undefined) return { value: v, low, high };
  const [hl, hh] = applyRule(hedge.rule, { v, h: 0, L: low, H: high, s: 1 });
  return { value: v, low: hl, high: hh };
}

/** Texts whose quantities are kept, and the longest text kept (a sentence, not a whole draft). */
const KEPT_TEXTS = 4096;
const KEPT_LENGTH = 2000;
const kept = new Map<string, readonly Quantity[]>();

/**
 * Every quantity in one sentence, in order. `start`/`end` are UTF-16 indices into `text`, and
 * `text.slice(start, end)` is the quantity as written, with its hedge and unit. The reading depends
 * on the text alone, so it is kept for the last few thousand texts (the engine, the binder's unit
 * restorer and the checks of the next sentence read the same sentence, and drafts repeat sentences);
 * each call gets its own copies.
 */
export function parseQuantities(text: string): Quantity[] {
  let found = kept.get(text);
  if (found === undefined) {
    // "300 CO2 molecules in every million molecules of air": a share of the air in ppm.
    found = readPerMillion(text, readQuantities(text));
    if (text.length <= KEPT_LENGTH) {
      if (kept.size >= KEPT_TEXTS) kept.delete(kept.keys().next().value as string);
      kept.set(text, found);
    }
  }
  return found.map((q) => ({ ...q }));
}

function readQuantities(text: string): Quantity[] {
  const out: Quantity[] = [];
  for (const g of groupParts(text, partsOf(text, findAtoms(text)))) {
    const reading = readGroup(text, g, out[out.length - 1]);
    if (reading === undefined) continue;
    const { def } = reading;
    const a = first(g).atom;
    const numberStart = Math.min(a.start, reading.prefixStart ?? a.start);
    // A unit borrowed from a partner written before the number ("from −30 °C–8") ends before it:
    // the quantity then ends with its own number.
    const ownEnd = g.role === 'from' && !first(g).ownUnit ? a.end : Math.max(last(g).unit?.end ?? 0, last(g).atom.end);
    const hedge =
      hedgeBefore(text, numberStart, def.dimension) ??
      (numberStart < a.start ? hedgeBefore(text, a.start, def.dimension) : undefined) ??
      (g.role === 'from' ? undefined : hedgeAfter(text, ownEnd)) ??
      (last(g).atom.glued === undefined ? undefined : gluedHedge(text, last(g).atom.glued as number, last(g).atom.end));
    const start = Math.min(numberStart, hedge?.start ?? numberStart);
    const end = Math.max(ownEnd, hedge?.end ?? ownEnd);
    const { value, low, high } = interval(g, reading.rule, def, hedge);
    const q: Quantity = {
      text: text.slice(start, end),
      start,
      end,
      value,
      low,
      high,
      dimension: def.dimension,
      unit: CANONICAL_UNIT[def.dimension],
      statedUnit: def.id,
    };
    if (hedge !== undefined) q.hedge = hedge.word;
    out.push(q);
  }
  return out;
}
