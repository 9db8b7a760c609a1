/**
 * An event of the pack named by the state of a thing: "the ice sheets were at their greatest
 * extent" is the Last Glacial Maximum, "the great ice sheets only began their retreat" the
 * deglaciation. The pack's lexicon class `states` keys a thing's term and an event's term
 * (`ice-sheets:lgm`); a word of the key (every inflection derived) that follows the thing's term in
 * its clause, with at most a few words between, adds a hit of the event's term over both.
 * The state's word is then a word of the event's name and names nothing of its own: "the tilt
 * wobbles" is the tilt's cycle (obliquity:obliquity), and its "wobbles" no precession.
 *
 *   "The ice sheets of the north reached their greatest size some 45,000 years ago"
 *        ^^^^^^^^^^ ─────────────────────── ^^^^^^^^^^^^^ → lgm (with ice-sheets: the ice-sheet maximum)
 */
import type { LoadedPacks } from '../rulepack/types.js';
import type { TermHits } from './bind-view.js';
import { type FormsTrie, phrasesTrie } from './forms-trie.js';

/** What may stand between the thing and its state: a few words, no clause boundary. */
const BETWEEN = /^[^.;:!?,()–—]*$/u;
/** The most words between the thing and its state ("of the northern hemisphere reached their"). */
const MAX_WORDS = 7;

interface StateRule {
  thing: string;
  event: string;
  words: FormsTrie;
}

const compiledStates = new WeakMap<LoadedPacks, StateRule[]>();

function statesOf(packs: LoadedPacks): StateRule[] {
  let rules = compiledStates.get(packs);
  if (rules !== undefined) return rules;
  rules = [];
  for (const [key, phrases] of Object.entries(packs.lexicon['states'] ?? {})) {
    const [thing, event] = key.split(':');
    if (thing === undefined || event === undefined || packs.term(thing) === undefined || packs.term(event) === undefined) continue;
    const words = phrasesTrie(phrases);
    if (words === undefined) continue;
    rules.push({ thing, event, words });
  }
  compiledStates.set(packs, rules);
  return rules;
}

/** `hits` with the events that the states of things in `sentence` name (a new map when any). */
export function withStateEvents(sentence: string, hits: TermHits, packs: LoadedPacks): TermHits {
  const rules = statesOf(packs);
  let out: TermHits | undefined;
  for (const { thing, event, words } of rules) {
    const things = hits.get(thing);
    if (things === undefined) continue;
    for (const [start, end] of things) {
      const rest = sentence.slice(end);
      // The first occurrence only, as before: a later one is too far or across a clause boundary.
      const first = words.occurrences(rest)[0];
      if (first === undefined) continue;
      const between = rest.slice(0, first[0]);
      if (!BETWEEN.test(between) || between.trim().split(/\s+/u).filter(Boolean).length > MAX_WORDS) continue;
      out ??= new Map(hits);
      const word: [number, number] = [end + first[0], end + first[1]];
      for (const [id, spans] of out) {
        if (id === thing || id === event) continue;
        const left = spans.filter(([s, e]) => !(word[0] <= s && e <= word[1]));
        if (left.length === spans.length) continue;
        if (left.length === 0) out.delete(id);
        else out.set(id, left);
      }
      out.set(event, [...(out.get(event) ?? []), [start, end + first[1]] as [number, number]].sort((a, b) => a[0] - b[0]));
    }
  }
  return out ?? hits;
}
