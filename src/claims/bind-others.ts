/**
 * Words that name another subject, held up for comparison: "comparable to other East Antarctic
 * records", "unlike Vostok", "similar to that of Greenland", or denied: "Termination III, not the end
 * of the last ice age", or set as the standard of a rank: "second only to EPICA Dome C", "the
 * second-longest record after Dome C". Such a term says what the number is compared with or is not
 * about, not what it is about, so it neither binds nor vetoes.
 *
 *   "a local warming of about 9 °C, comparable to other East Antarctic isotope records"
 *                                                  ^^^^^^^^^^^^^^ another subject: not bound
 */
import type { Quantity } from '../types.js';
import type { TermHits } from './bind-view.js';

const ANOTHER = /(?:^|[^\p{L}])(?:other|not(?:\s+(?:at|in|during|for|from|of|about))?(?:\s+the)?|rather\s+than(?:\s+(?:at|in|during))?(?:\s+the)?|instead\s+of(?:\s+the)?|unlike(?:\s+(?:the|those\s+of|that\s+of))?|(?:comparable|similar)\s+(?:to|with)(?:\s+(?:the|those\s+of|that\s+of|other))?|like\s+(?:the|those\s+of|that\s+of)|second\s+only\s+to(?:\s+the)?|(?:second|third|next)(?:[\s-]+[\p{L}-]+){0,3}\s+(?:after|behind)(?:\s+the)?)\s+$/iu;

/** `hits` without the terms that name a subject held up for comparison (and the terms inside those). */
export function withoutOthers(sentence: string, hits: TermHits): TermHits {
  const others = [...hits.values()].flat().filter(([start]) => ANOTHER.test(sentence.slice(Math.max(0, start - 40), start)));
  if (others.length === 0) return hits;
  const kept: TermHits = new Map();
  for (const [id, spans] of hits) {
    const left = spans.filter(([start, end]) => !others.some(([s, e]) => start < e && s < end));
    if (left.length > 0) kept.set(id, left);
  }
  return kept;
}

/** A relative clause that opens after a comma: ", which ...", ", whose ...". */
const RELATIVE_OPEN = /,\s*(?:which|whose)\s/giu;
/** What may stand between the compared term and the comma: the rest of its noun phrase ("core", "in the last deglaciation"). */
const REST_OF_PHRASE = /^(?:\s+[\p{L}’'-]+){0,4}\s*$/u;
/** A clause ends at punctuation; a comma or point between digits ("420,000", "3.5") is part of a number. */
const CLAUSE_END = /[;:!?()]|[.,](?!\d)/u;

/**
 * A relative clause on a subject held up for comparison speaks of that subject: in "Unlike the EPICA
 * Dome C core, which goes back about 800,000 years, the Vostok core ..." the number in the clause is
 * Dome C's. `all` are the sentence's terms, `kept` the ones withoutOthers left; each quantity inside
 * such a clause gets back the compared terms (returned per quantity index, to add to its view), and
 * the clause's words leave the `views` of the quantities outside it.
 */
export function comparedInRelativeClauses(sentence: string, all: TermHits, kept: TermHits, quantities: readonly Pick<Quantity, 'start' | 'end'>[], views: TermHits[]): Map<number, TermHits> {
  const out = new Map<number, TermHits>();
  if (all === kept) return out;
  for (const m of sentence.matchAll(RELATIVE_OPEN)) {
    const comma = m.index;
    const dropped: [string, [number, number]][] = [...all].flatMap(([id, spans]) =>
      spans.filter((s) => !(kept.get(id) ?? []).some((k) => k[0] === s[0]) && s[1] <= comma).map((s): [string, [number, number]] => [id, s]),
    );
    const antecedent = dropped.filter(([, [, end]]) => REST_OF_PHRASE.test(sentence.slice(end, comma)));
    if (antecedent.length === 0) continue;
    const from = Math.min(...antecedent.map(([, [start]]) => start));
    const phrase = dropped.filter(([, [start]]) => start >= from);
    const rest = sentence.slice(comma + m[0].length);
    const stop = CLAUSE_END.exec(rest);
    const end = comma + m[0].length + (stop === null ? rest.length : stop.index);
    const inside = quantities.map((q) => q.start >= comma && q.end <= end);
    if (!inside.some(Boolean)) continue;
    quantities.forEach((_, i) => {
      if (!inside[i]) return;
      const add = out.get(i) ?? new Map<string, [number, number][]>();
      for (const [id, span] of phrase) add.set(id, [...(add.get(id) ?? []), span]);
      out.set(i, add);
    });
    // Its words are the compared subject's: they neither name nor veto what a number outside it measures.
    views.forEach((view, i) => {
      if (inside[i]) return;
      for (const [id, spans] of view) {
        const left = spans.filter(([start, stop]) => stop <= comma || start >= end);
        if (left.length > 0) view.set(id, left);
        else view.delete(id);
      }
    });
  }
  return out;
}
