/**
 * Numbers in an apposition state measures of the subject they stand beside:
 *
 *   "EPICA Dome C (3,270 m deep, about 800,000 years) is the reference core."
 *    ^^^^^^^^^^^^ head ──────────── about 800,000 years: the span of the EPICA Dome C record
 *
 * A quantity in brackets, between dashes or between commas right after a term (the head) may bind a
 * value of that head even when the value's other term groups are missing, if exactly one such value
 * fits its dimension and role. A value that needs a word another candidate vetoes is the marked
 * reading (a delta-age needs "delta-age", which the record span vetoes) and gives way to the
 * unmarked one. Only a quantity with no candidate in its own words reads its apposition.
 */
import type { LoadedPacks, ReferenceValue } from '../rulepack/types.js';
import type { Quantity } from '../types.js';
import { canState } from './bind-match.js';
import { roleFits, type ReadRole } from './bind-role.js';
import type { TermHits } from './bind-view.js';

const OPENERS = ['(', '[', '–', '—', ','];
const CLOSERS: Record<string, RegExp> = { '(': /\)/u, '[': /\]/u, '–': /[–—.;]/u, '—': /[–—.;]/u, ',': /[,.;:()]/u };

/** The term the apposition holding `q` stands beside, or undefined when `q` is not in one. */
export function appositionHead(sentence: string, q: Pick<Quantity, 'start' | 'end'>, hits: TermHits): string | undefined {
  const before = sentence.slice(0, q.start);
  const open = Math.max(...OPENERS.map((o) => before.lastIndexOf(o)));
  if (open < 0) return undefined;
  const opener = sentence[open] as string;
  // Inside brackets every item shares the head: "(3,270 m deep, about 800,000 years)".
  const bracket = Math.max(before.lastIndexOf('('), before.lastIndexOf('['));
  const at = bracket >= 0 && !/[)\]]/u.test(sentence.slice(bracket, q.start)) ? bracket : open;
  const mark = sentence[at] as string;
  if (mark === ',' || mark === '–' || mark === '—') {
    // Between commas or dashes only the first item is an apposition: "Vostok, 3,623 m deep, …".
    if (/[,;:()]/u.test(sentence.slice(at + 1, q.start))) return undefined;
  }
  const rest = sentence.slice(q.end);
  if (!(CLOSERS[mark] ?? CLOSERS[opener] as RegExp).test(rest) && mark !== ',') return undefined;
  // The item must be the quantity alone (or with words of the packs): "about 560 km away" is not a measure of the head.
  const itemStart = Math.max(at, sentence.lastIndexOf(',', q.start - 1)) + 1;
  const close = /[,)\];:.–—]/u.exec(rest);
  const itemEnd = q.end + (close === null ? rest.length : close.index);
  let residue = sentence.slice(itemStart, q.start) + ' '.repeat(q.end - q.start) + sentence.slice(q.end, itemEnd);
  for (const spans of hits.values()) {
    for (const [start, end] of spans) {
      if (start >= itemStart && end <= itemEnd) residue = residue.slice(0, start - itemStart) + ' '.repeat(end - start) + residue.slice(end - itemStart);
    }
  }
  if (/\p{L}/u.test(residue)) return undefined;
  // An apposition is short: "CO2 rose about 800 years after Antarctic temperature" after a comma is a
  // clause of its own, though every word of it is a pack term.
  const words = (sentence.slice(itemStart, q.start) + ' ' + sentence.slice(q.end, itemEnd)).match(/\p{L}[\p{L}\p{N}'’-]*/gu) ?? [];
  if (words.length > 4) return undefined;
  const headEnd = sentence.slice(0, at).trimEnd().length;
  const heads = [...hits].filter(([, spans]) => spans.some(([, end]) => end === headEnd || sentence.slice(end, headEnd).match(/^['’]s?$|^\s+(?:core|ice\s+core|record|site|station)$/iu)));
  return heads.length === 1 ? heads[0]?.[0] : undefined;
}

/** The value of the apposition's head that `q` states, or undefined when none or several fit. */
export function bindApposition(sentence: string, q: Quantity, role: ReadRole, view: TermHits, hits: TermHits, packs: LoadedPacks): string | undefined {
  const head = appositionHead(sentence, q, hits);
  if (head === undefined) return undefined;
  const candidates = packs.references.filter(
    (r) =>
      r.binding.all.some((g) => g.includes(head)) &&
      r.dimensions.includes(q.dimension) &&
      roleFits(r.binding.role, role) &&
      canState(r, q) &&
      !r.binding.none.some((id) => view.has(id)),
  );
  const missing = (r: ReferenceValue): string[][] => r.binding.all.filter((g) => !g.some((id) => view.has(id)));
  const unmarked = candidates.filter((r) => !candidates.some((o) => o !== r && missing(r).some((g) => g.every((id) => o.binding.none.includes(id)))));
  return unmarked.length === 1 ? unmarked[0]?.id : undefined;
}
