/**
 * Parallel lists, read "respectively": a list of subjects and a list of numbers of one kind bind in
 * order, or not at all. Nearness alone would give every number the subject written last.
 *
 *   "the shape of Earth's orbit, the tilt of its axis and the wobble change over 100,000, 41,000 and 23,000 years"
 *        ^^^^^^^^^^^^^^^^^^^^^^ 1st      ^^^^ 2nd           ^^^^^^ 3rd        1st ─┘  2nd ─┘      3rd ─┘
 *
 * With as many subjects as numbers, ordered by where each subject's own words stand, the n-th number
 * binds the n-th subject; with a different count, or subjects that cannot be told apart, no number
 * of the list binds (each goes to the checklist as ambiguous). One subject with figures that cannot
 * all be one value ("the tilt ... rhythms near 100,000, 41,000 and 23,000 years") binds none either. A subject whose own words all stand
 * before an earlier number of the sentence belongs to that number's clause, not to the list.
 */
import type { ReferenceValue } from '../rulepack/types.js';
import type { Binding, Quantity } from '../types.js';
import { satisfies, usedTerms } from './bind-match.js';
import { roleFits, type EndpointPair, type ReadRole } from './bind-role.js';
import type { TermHits } from './bind-view.js';

const CLOSES_LIST = /(?:and|or)\s+$/iu;
const LIST_SEPARATOR = /^\s*(?:,\s*(?:and\s+|or\s+)?|and\s+|or\s+)$/iu;

/** Runs of two or more quantities joined only by commas, "and" or "or", closed by "and" or "or" (not the ends of a range). */
export function parallelLists(sentence: string, quantities: Quantity[], pairs: EndpointPair[]): number[][] {
  const lists: number[][] = [];
  let run: number[] = [0];
  for (let i = 1; i <= quantities.length; i++) {
    const a = quantities[i - 1];
    const b = quantities[i];
    const joined = a !== undefined && b !== undefined && !pairs.some((p) => p.first === i - 1) && LIST_SEPARATOR.test(sentence.slice(a.end, b.start));
    if (joined) run.push(i);
    else {
      // English closes a list with "and" or "or": "420 ppm, 140 ppm higher" is an aside, not a list.
      if (run.length >= 2 && CLOSES_LIST.test(sentence.slice((quantities[run.at(-2) as number] as Quantity).end, (quantities[run.at(-1) as number] as Quantity).start))) lists.push(run);
      run = [i];
    }
  }
  return lists;
}

/** What one list decides: bindings and ambiguous quantity indices, or undefined when it is not a parallel list. */
export function bindList(
  list: number[],
  quantities: Quantity[],
  roles: ReadRole[],
  views: TermHits[],
  references: ReferenceValue[],
): { bindings: Binding[]; ambiguous: number[] } | undefined {
  const items = list.map((i) => ({ i, q: quantities[i] as Quantity, role: roles[i] ?? 'unknown' }));
  const dimensions = new Set(items.map((it) => it.q.dimension).filter((d) => d !== 'number'));
  const [dimension] = dimensions;
  if (dimension === undefined || dimensions.size > 1) return undefined;
  const view = mergeViews(list.map((i) => views[i] ?? new Map()));
  const fits = (r: ReferenceValue): boolean => r.dimensions.includes(dimension) && items.some((it) => roleFits(r.binding.role, it.role));
  const strict = references.filter((r) => fits(r) && satisfies(r, view));
  const subjects = strict.length >= items.length ? strict : withContrasts(references.filter(fits), view, items.length) ?? strict;
  if (subjects.length === 0) return undefined;
  // "rhythms near 100,000, 41,000 and 23,000 years" with one subject named: several figures that
  // cannot all be one value are the list of things the sentence goes on to name, not that value.
  const measured = items.filter((it) => it.q.dimension !== 'number');
  if (subjects.length === 1) return measured.length >= 2 && pairwiseApart(measured.map((it) => it.q)) ? { bindings: [], ambiguous: measured.map((it) => it.i) } : undefined;
  const previous = quantities[(list[0] as number) - 1];
  const ordered = orderByOwnWords(subjects, view, previous === undefined ? 0 : previous.end);
  if (ordered !== undefined && ordered.length <= 1) return undefined;
  if (ordered === undefined || ordered.length !== items.length) return { bindings: [], ambiguous: measured.map((it) => it.i) };
  const bindings: Binding[] = [];
  items.forEach((it, n) => {
    const r = ordered[n] as ReferenceValue;
    if (r.dimensions.includes(it.q.dimension) && roleFits(r.binding.role, it.role)) bindings.push({ quantityIndex: it.i, referenceId: r.id });
  });
  return { bindings, ambiguous: [] };
}

/**
 * The subjects in the order their own words stand (words every subject uses, such as "CO2", do not
 * count); undefined when a subject has no word of its own or two subjects share a place.
 */
function orderByOwnWords(subjects: ReferenceValue[], view: TermHits, after: number): ReferenceValue[] | undefined {
  const used = subjects.map((r) => usedTerms(r, view));
  const common = (used[0] ?? []).filter((id) => used.every((u) => u.includes(id)));
  const placed = subjects.map((r, k) => {
    const own = (used[k] ?? []).filter((id) => !common.includes(id));
    const starts = own.flatMap((id) => (view.get(id) ?? []).map(([start]) => start));
    return { r, at: Math.min(...starts), inClause: starts.some((start) => start >= after) };
  });
  const listed = placed.filter((p) => p.inClause || !Number.isFinite(p.at));
  if (listed.some((p) => !Number.isFinite(p.at)) || new Set(listed.map((p) => p.at)).size !== listed.length) return undefined;
  return listed.sort((a, b) => a.at - b.at).map((p) => p.r);
}

/**
 * The subjects of a list whose members are each other's contrast: "began and ended 18,000 and 11,500
 * years ago respectively" names the start, which vetoes "ended", and the end, which vetoes "began".
 * In a parallel list each member's words are its own, so a veto word that another member needs (and
 * that member vetoes a word of the first) no longer stops it. Undefined unless exactly `count` such
 * subjects are found.
 */
function withContrasts(references: ReferenceValue[], view: TermHits, count: number): ReferenceValue[] | undefined {
  const named = references.filter((r) => r.binding.all.every((g) => g.some((id) => view.has(id))));
  const uses = (r: ReferenceValue, id: string): boolean => r.binding.all.some((g) => g.includes(id));
  const contrasts = (r: ReferenceValue, o: ReferenceValue): boolean => r.binding.none.some((id) => uses(o, id)) && o.binding.none.some((id) => uses(r, id));
  const found = named.filter((r) =>
    r.binding.none.filter((id) => view.has(id)).every((id) => named.some((o) => o !== r && uses(o, id) && contrasts(r, o))),
  );
  return found.length === count && found.some((r) => r.binding.none.some((id) => view.has(id))) ? found : undefined;
}

/** No two intervals meet: the figures are of different things (the ratio of neighbours is well over the hedges). */
function pairwiseApart(qs: Quantity[]): boolean {
  return qs.every((a, i) => qs.every((b, j) => j <= i || a.high < b.low || b.high < a.low));
}

function mergeViews(views: TermHits[]): TermHits {
  const merged: TermHits = new Map();
  for (const view of views) for (const [id, spans] of view) merged.set(id, [...(merged.get(id) ?? []), ...spans.filter((s) => !(merged.get(id) ?? []).some((m) => m[0] === s[0]))]);
  return merged;
}
