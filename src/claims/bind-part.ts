/**
 * A part of a whole: "perhaps 15 to 30 ppm of the deglacial rise", "some 20 ppm of the roughly 80 ppm".
 * The number is a share of an amount named after it (a change, or another number of its kind) or
 * named before it and taken up by "of it" ("part of the deglacial rise, perhaps 20 ppm of it"), so the
 * words that name the whole ("the deglacial rise") are not the number's: the whole's value does not
 * bind it. A number that states the whole ("of the roughly 80 ppm") does not bind the value its part
 * binds.
 *
 *   "Warming alone explains about 20 ppm of the deglacial rise, because ..."
 *                           └ part ┘ └──── the whole: not this number's ┘
 */
import type { Binding, Quantity } from '../types.js';
import { CHANGE_NOUN, CHANGE_NOUNS } from './bind-role.js';
import type { TermHits } from './bind-view.js';

/** "of the", "of its", "of that" right after the number: what follows names the whole. */
const OF_WHOLE = /^\s*of\s+(?:the|its|their|this|that|these|those)(?![\p{L}])/iu;
/** "of it", "of them": the whole was named before the number. */
const OF_IT = /^\s*of\s+(?:it|them)(?![\p{L}])/iu;
/** A change named with up to two words before its noun: "the deglacial rise", "that increase". */
const NAMED_CHANGE = new RegExp(String.raw`(?:^|[^\p{L}])(?:[\p{L}-]+\s+){0,2}(?:${CHANGE_NOUNS})(?![\p{L}])`, 'giu');
/** Where the phrase naming the whole ends. */
const PHRASE_END = /[,;:.()!?–—]|\b(?:because|and|but|while|whereas|since|so|which|that)\b/iu;

interface Part {
  /** The quantity that is the part. */
  index: number;
  /** Where the phrase naming the whole lies: [start, end). */
  whole: [number, number];
  /** The quantity that states the whole, if the phrase holds one. */
  wholeIndex?: number;
}

/** The quantities of the sentence that are parts of a whole named after them. */
export function partsOfWholes(sentence: string, quantities: Quantity[]): Part[] {
  const parts: Part[] = [];
  quantities.forEach((q, index) => {
    // "only part of the deglacial rise, perhaps 20 ppm of it": the whole is the change named before.
    if (OF_IT.test(sentence.slice(q.end))) {
      const named = [...sentence.slice(0, q.start).matchAll(NAMED_CHANGE)].at(-1);
      if (named !== undefined) parts.push({ index, whole: [named.index + named[0].search(/\p{L}/u), named.index + named[0].length] });
      return;
    }
    const of = OF_WHOLE.exec(sentence.slice(q.end));
    if (of === null) return;
    const from = q.end + of[0].length;
    // A number inside the phrase ("of the roughly 80 to 90 ppm") is part of it, whatever its punctuation.
    const wholeIndex = quantities.findIndex((o, j) => j > index && o.dimension === q.dimension && o.start >= from && /^[\s\p{L}~≈]*$/u.test(sentence.slice(from, o.start)));
    const rest = sentence.slice(from);
    const end = wholeIndex >= 0 ? (quantities[wholeIndex] as Quantity).end : from + (PHRASE_END.exec(rest)?.index ?? rest.length);
    if (wholeIndex < 0 && !CHANGE_NOUN.test(sentence.slice(from, end))) return;
    parts.push({ index, whole: [from, end], ...(wholeIndex >= 0 ? { wholeIndex } : {}) });
  });
  return parts;
}

/** Takes the words naming each whole out of its part's view. */
export function withoutWholes(parts: Part[], views: TermHits[]): void {
  for (const { index, whole } of parts) {
    const view = views[index];
    if (view === undefined) continue;
    for (const [id, spans] of [...view]) {
      const kept = spans.filter(([s, e]) => !(s >= whole[0] && e <= whole[1]));
      if (kept.length === 0) view.delete(id);
      else view.set(id, kept);
    }
  }
}

/** `bindings` without a whole's binding to the value its part binds. */
export function wholesApart(parts: Part[], bindings: Binding[]): Binding[] {
  return bindings.filter((b) => !parts.some((p) => p.wholeIndex === b.quantityIndex && bindings.some((o) => o.quantityIndex === p.index && o.referenceId === b.referenceId)));
}
