/**
 * An event of the pack named by the state of a thing: "the ice sheets were at their greatest
 * extent" is the Last Glacial Maximum, "the great ice sheets only began their retreat" the
 * deglaciation. The pack's lexicon class `states` keys a thing's term and an event's term
 * (`ice-sheets:lgm`); a word of the key (every inflection derived) that follows the thing's term in
 * its clause, with at most a few words between, adds a hit of the event's term over both.
 *
 *   "The ice sheets of the north reached their greatest size some 45,000 years ago"
 *        ^^^^^^^^^^ ─────────────────────── ^^^^^^^^^^^^^ → lgm (with ice-sheets: the ice-sheet maximum)
 */
import { phraseWords, variantsOf } from '../propositions/lexicon.js';
import type { LoadedPacks } from '../rulepack/types.js';
import type { TermHits } from './bind-view.js';

/** What may stand between the thing and its state: a few words, no clause boundary. */
const BETWEEN = /^[^.;:!?,()–—]*$/u;
/** The most words between the thing and its state ("of the northern hemisphere reached their"). */
const MAX_WORDS = 7;

interface StateRule {
  thing: string;
  event: string;
  regex: RegExp;
}

const compiledStates = new WeakMap<LoadedPacks, StateRule[]>();

function statesOf(packs: LoadedPacks): StateRule[] {
  let rules = compiledStates.get(packs);
  if (rules !== undefined) return rules;
  rules = [];
  for (const [key, phrases] of Object.entries(packs.lexicon['states'] ?? {})) {
    const [thing, event] = key.split(':');
    if (thing === undefined || event === undefined || packs.term(thing) === undefined || packs.term(event) === undefined) continue;
    const forms = new Set<string>();
    for (const phrase of phrases) for (const words of variantsOf(phraseWords(phrase))) forms.add(words.map((w) => w.replace(/[.*+?^${}()|[\]\\]/gu, '\\$&')).join('[\\s-]+'));
    if (forms.size === 0) continue;
    const sorted = [...forms].sort((a, b) => b.length - a.length);
    rules.push({ thing, event, regex: new RegExp(`(?<![\\p{L}\\p{N}])(?:${sorted.join('|')})(?![\\p{L}\\p{N}])`, 'giu') });
  }
  compiledStates.set(packs, rules);
  return rules;
}

/** `hits` with the events that the states of things in `sentence` name (a new map when any). */
export function withStateEvents(sentence: string, hits: TermHits, packs: LoadedPacks): TermHits {
  const rules = statesOf(packs);
  let out: TermHits | undefined;
  for (const { thing, event, regex } of rules) {
    const things = hits.get(thing);
    if (things === undefined) continue;
    for (const [start, end] of things) {
      const rest = sentence.slice(end);
      for (const m of rest.matchAll(regex)) {
        const between = rest.slice(0, m.index);
        if (!BETWEEN.test(between) || between.trim().split(/\s+/u).filter(Boolean).length > MAX_WORDS) break;
        out ??= new Map(hits);
        out.set(event, [...(out.get(event) ?? []), [start, end + m.index + m[0].length] as [number, number]].sort((a, b) => a[0] - b[0]));
        break;
      }
    }
  }
  return out ?? hits;
}
