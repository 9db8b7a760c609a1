/**
 * Which thing a word stands for: an entity as named, or a pronoun resolved to the subject of the
 * nearest earlier segment ("Since CO2 came after the warming, it cannot..." → it = CO2).
 */
import type { ReadSentence, Thing } from './sentence.js';

/** The kind of `thing`, with pronouns resolved within the sentence, then in `previous`. */
export function kindOf(s: ReadSentence, thing: Thing | undefined, previous?: ReadSentence): string | undefined {
  if (thing === undefined) return undefined;
  if (thing.kind !== 'pronoun') return thing.kind;
  const segment = s.words[thing.first]?.segment ?? 0;
  for (let seg = segment; seg >= 0; seg -= 1) {
    const subject = s.things.find((t) => t.kind !== 'pronoun' && t.first < thing.first && s.words[t.first]?.segment === seg);
    if (subject !== undefined) return subject.kind;
  }
  return previous?.things.find((t) => t.kind !== 'pronoun')?.kind;
}

/** The first thing in word range [from, to] of one segment (the subject side of a clause). */
export function firstThingIn(s: ReadSentence, from: number, to: number): Thing | undefined {
  return s.things.find((t) => t.first >= from && t.last <= to);
}

/** The nearest thing before word `i` in the same segment (`segment`) or clause. */
export function thingBefore(s: ReadSentence, i: number, scope: 'segment' | 'clause' = 'segment'): Thing | undefined {
  const at = s.words[i];
  if (at === undefined) return undefined;
  const same = (t: Thing) => (scope === 'segment' ? s.words[t.first]?.segment === at.segment : s.words[t.first]?.clause === at.clause);
  return s.things.filter((t) => t.last < i && same(t)).at(-1);
}

/** The subject of the segment of word `i`: its first thing before `i`. */
export function subjectOf(s: ReadSentence, i: number): Thing | undefined {
  const at = s.words[i];
  if (at === undefined) return undefined;
  return s.things.find((t) => t.last < i && s.words[t.first]?.segment === at.segment);
}

/** The nearest thing after word `i` in the same clause, within `window` words. */
export function thingAfter(s: ReadSentence, i: number, window = 8): Thing | undefined {
  const clause = s.words[i]?.clause;
  return s.things.find((t) => t.first > i && t.first - i <= window && s.words[t.first]?.clause === clause);
}

/** The first thing of the clause of word `i`, before it. */
export function clauseSubject(s: ReadSentence, i: number): Thing | undefined {
  const clause = s.words[i]?.clause;
  return s.things.find((t) => t.last < i && s.words[t.first]?.clause === clause);
}
