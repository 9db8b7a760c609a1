/**
 * The two edges of a span of dates. In "from A to B" and "between A and B", with A and B dates,
 * A is where the span starts and B where it ends: A speaks of a start as if the sentence said
 * "started A", and B of an end. So a date at the head of a span never binds an event's end (nor
 * the one at its tail a start), even when an end is named elsewhere in the sentence or in the
 * question it answers ("Did it end all at once? ... lasted from about 12,900 to 11,700 years ago").
 *
 *   "The cold spell lasted from about 12,900 to 11,700 years ago."
 *                          ^^^^ start: 12,900   ^^ end: 11,700
 *
 * A date that an edge word introduces ("starting about 12,900 years ago", "ending some 11,700
 * years ago") is that edge's, and an edge word of the other kind elsewhere in the sentence ("Towards
 * the end of the thaw came a cold relapse, ..., starting about 12,900 years ago") does not reach it; one after the date still does ("ended about 5,000 years ago, when the
 * Holocene began").
 *
 * The edges are the pack's terms `start` and `end`; a pack without them reads no edges.
 */
import type { LoadedPacks } from '../rulepack/types.js';
import type { Quantity } from '../types.js';
import type { EndpointPair } from './bind-role.js';
import type { TermHits } from './bind-view.js';

/** The start and end terms of the packs. */
const EDGES = { start: 'start', end: 'end' } as const;

/** What may stand between an edge word and its date: "starting about", "ended at roughly", "began c.". */
const EDGE_LINK = /^[\s,]*(?:(?:about|around|roughly|some|approximately|nearly|perhaps|at|in|by|only|just|~|∼|≈|c\.|ca\.)\s*)*$/iu;

/** Where the word that opens a pair ("from", "between") stands before its first quantity. */
const OPENER = /(?:from|between)\s*$/iu;

/**
 * Adds to the view of each date at a span's head the `start` term (at its opening word) and to the
 * date at its tail the `end` term (at the joining word); a view that already names the other edge
 * for that date loses it.
 */
export function addSpanEdges(sentence: string, quantities: readonly Quantity[], pairs: readonly EndpointPair[], views: TermHits[], packs: LoadedPacks): void {
  if (packs.term(EDGES.start) === undefined || packs.term(EDGES.end) === undefined) return;
  quantities.forEach((q, i) => {
    if (q.dimension !== 'age') return;
    for (const [edge, other] of [[EDGES.start, EDGES.end], [EDGES.end, EDGES.start]] as const) {
      const view = views[i];
      const own = view?.get(edge)?.find(([, end]) => end <= q.start && EDGE_LINK.test(sentence.slice(end, q.start)));
      if (view === undefined || own === undefined) continue;
      // Only the other edge's words before the own one give way: "ended about 5,000 years ago, when the Holocene began" keeps both.
      const left = (view.get(other) ?? []).filter(([start]) => start > own[0]);
      if (left.length > 0) view.set(other, left);
      else view.delete(other);
    }
  });
  for (const pair of pairs) {
    const a = quantities[pair.first];
    const b = quantities[pair.second];
    if (a?.dimension !== 'age' || b?.dimension !== 'age') continue;
    const head = sentence.slice(Math.max(0, a.start - 20), a.start);
    const open = OPENER.exec(head);
    const openAt = open === null ? a.start : a.start - head.length + open.index;
    mark(views[pair.first], EDGES.start, EDGES.end, [openAt, openAt + (open?.[0].trimEnd().length ?? 0)]);
    mark(views[pair.second], EDGES.end, EDGES.start, [pair.join, pair.join + 1]);
  }
}

function mark(view: TermHits | undefined, edge: string, other: string, span: [number, number]): void {
  if (view === undefined) return;
  view.delete(other);
  view.set(edge, [...(view.get(edge) ?? []), span]);
}
