/**
 * A turn of contrast to a subject of its own. In "Mauna Loa passed 430 ppm, while the global mean
 * for 2024 was about 424 ppm" and "Dome C spans about 800,000 years, whereas Vostok covers about
 * 420,000" the clause after ", while" or ", whereas" names its own subject right at its head, so
 * the words before the turn speak of the other side: they neither name nor veto what a number after
 * the turn measures. A turn whose clause opens with no subject of its own ("..., while each was
 * more like 10 ppm") still speaks of the subject before; "but" mostly qualifies the same subject
 * ("Greenland ice is superb ..., but the deepest layers ... are folded") and is no turn here.
 *
 *   "Mauna Loa passed 430 ppm, while the global mean for 2024 was about 424 ppm"
 *    ^^^^^^^^^ other side      ^^^^^ turn ^^^^^^ own subject      └ the global mean's
 */
import type { LoadedPacks } from '../rulepack/types.js';
import type { Quantity } from '../types.js';
import type { TermHits } from './bind-view.js';

/**
 * A clause that turns to a contrasting subject: ", while", ", whereas", a semicolon ("Vostok reaches
 * back 420,000 years; EPICA Dome C, 800,000") or an opening bracket ("(EPICA Dome C: 800,000)").
 */
const CONTRAST_TURN = /[,;]\s*(?:while|whereas)\s+|;\s*|\(\s*/giu;
/** What may stand between the turn and its subject's first word: a determiner or two. */
const HEAD = /^(?:(?:the|a|an|its|their|this|that|these|those|at|in)\s+)*$/iu;

/**
 * Removes from each quantity's view the words before a turn to a subject named at the turn's head.
 * After ", while" or ", whereas" all of them go. A semicolon or a bracket is often a gap ("; EPICA
 * Dome C, 800,000": the verb and the measure are the clause before's), so it turns only when its head
 * names an alternate of a subject before it, and only those alternates go: two terms are alternates
 * when the pack's values pair each with the same other group (Vostok and EPICA Dome C with [record],
 * glacial and interglacial with [co2]), as in a measure family. A bracket's turn ends where it closes.
 * Returns, per quantity after such a gapped turn, where the turn stands.
 */
export function withoutOtherSide(sentence: string, quantities: readonly Quantity[], views: TermHits[], packs: LoadedPacks, hits: TermHits): Map<number, number> {
  const gaps = new Map<number, number>();
  const turns = [...sentence.matchAll(CONTRAST_TURN)].map((m) => {
    const head = m.index + m[0].length;
    const bracket = m[0].startsWith('(');
    const close = bracket ? sentence.indexOf(')', head) : -1;
    return { at: m.index, head, gapped: !/while|whereas/iu.test(m[0]), close: bracket ? (close < 0 ? sentence.length : close) : Infinity };
  });
  if (turns.length === 0) return gaps;
  const alternates = alternatesOf(packs);
  quantities.forEach((q, i) => {
    const view = views[i];
    if (view === undefined) return;
    type Turn = (typeof turns)[number];
    // The words of the clause a turn opens, up to the number: "; interglacial carbon dioxide, about 280 ppm".
    const clause = (t: Turn): [string, [number, number][]][] =>
      [...hits].map(([id, spans]): [string, [number, number][]] => [id, spans.filter(([start, end]) => start >= t.head && end <= q.start)]).filter(([, spans]) => spans.length > 0);
    const heads = (t: Turn): string[] => clause(t).filter(([, spans]) => spans.some(([start]) => HEAD.test(sentence.slice(t.head, start)))).map(([id]) => id);
    const replaced = (t: Turn, id: string): boolean => heads(t).some((h) => alternates.get(h)?.has(id) === true);
    const before = (t: Turn): string[] => [...view].filter(([, spans]) => spans.some(([, end]) => end <= t.at)).map(([id]) => id);
    const own = turns.filter((t) => t.head <= q.start && q.end <= t.close && heads(t).length > 0 && (!t.gapped || before(t).some((id) => replaced(t, id))));
    const turn = own.at(-1);
    if (turn === undefined) return;
    for (const [id, spans] of view) {
      const left = turn.gapped && !replaced(turn, id) ? spans : spans.filter(([, end]) => end > turn.at);
      if (left.length > 0) view.set(id, left);
      else view.delete(id);
    }
    if (!turn.gapped) return;
    gaps.set(i, turn.at);
    // The clause a semicolon or a bracket opens owns its words: they are no number's before the turn,
    // however near it stands ("about 190 ppm; interglacial ...").
    for (const [id, spans] of clause(turn)) {
      view.set(id, [...(view.get(id) ?? []).filter((s) => !spans.some(([start]) => start === s[0])), ...spans]);
      quantities.forEach((o, j) => {
        const other = views[j];
        if (o.end > turn.at || other === undefined) return;
        const left = (other.get(id) ?? []).filter(([start]) => !spans.some(([s]) => s === start));
        if (left.length > 0) other.set(id, left);
        else other.delete(id);
      });
    }
  });
  return gaps;
}

const alternatesCache = new WeakMap<object, Map<string, Set<string>>>();

/** Per term, the terms the pack's values pair with the same other group (values of two groups). */
function alternatesOf(packs: LoadedPacks): Map<string, Set<string>> {
  const cached = alternatesCache.get(packs);
  if (cached !== undefined) return cached;
  const byPartner = new Map<string, Set<string>>();
  for (const r of packs.references) {
    if (r.binding.all.length !== 2) continue;
    r.binding.all.forEach((group, k) => {
      const partner = JSON.stringify([...(r.binding.all[1 - k] as string[])].sort());
      const members = byPartner.get(partner) ?? new Set<string>();
      for (const id of group) members.add(id);
      byPartner.set(partner, members);
    });
  }
  const out = new Map<string, Set<string>>();
  for (const members of byPartner.values()) {
    for (const id of members) {
      const set = out.get(id) ?? new Set<string>();
      for (const other of members) if (other !== id) set.add(other);
      out.set(id, set);
    }
  }
  alternatesCache.set(packs, out);
  return out;
}
