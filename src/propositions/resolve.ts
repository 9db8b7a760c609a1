/**
 * Which thing a word stands for: an entity as named, or a pronoun resolved to the subject of the
 * nearest earlier segment ("Since CO2 came after the warming, it cannot..." → it = CO2).
 */
import type { ReadSentence, Thing } from './sentence.js';

/**
 * The kind of `thing`, with pronouns resolved within the sentence, then in `previous`; a pronoun
 * stands for no thing that `unfit` rejects (an order's reader passes over the name of a core).
 */
export function kindOf(s: ReadSentence, thing: Thing | undefined, previous?: ReadSentence, passOver?: ReadonlySet<string>, unfit?: (r: ReadSentence, t: Thing) => boolean): string | undefined {
  if (thing === undefined) return undefined;
  if (thing.kind !== 'pronoun') return thing.kind;
  const segment = s.words[thing.first]?.segment ?? 0;
  // Kinds the pronoun cannot stand for here are passed over when the segment names another thing.
  // "Is CO2 a cause or an effect? In the ice, it is clearly an effect.": the sentence before may name the other thing.
  const other = (o: Thing) => o.kind !== 'pronoun' && passOver !== undefined && !passOver.has(o.kind);
  const elsewhere = s.things.some((o) => other(o) && o.first < thing.first) || (previous?.things.some(other) ?? false);
  const able = (t: Thing) => passOver === undefined || !passOver.has(t.kind) || !elsewhere;
  for (let seg = segment; seg >= 0; seg -= 1) {
    // The subject, not a thing in a phrase before it ("At the start of the deglaciation CO2 ...").
    const candidates = s.things.filter((t) => t.kind !== 'pronoun' && t.first < thing.first && s.words[t.first]?.segment === seg && able(t) && unfit?.(s, t) !== true);
    const subject = candidates.find((t) => !inPhrase(s, t)) ?? candidates[0];
    if (subject !== undefined) return subject.kind;
  }
  return previous?.things.find((t) => t.kind !== 'pronoun' && unfit?.(previous, t) !== true)?.kind;
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
  const before = s.things.filter((t) => t.last < i && s.words[t.first]?.segment === at.segment);
  // "In the Dome C record CO2 rose...": a thing inside an opening prepositional phrase is no subject
  // when a plain one follows it.
  return before.find((t) => !inPhrase(s, t)) ?? before[0];
}

/** The nearest thing after word `i` in the same clause, within `window` words. */
export function thingAfter(s: ReadSentence, i: number, window = 8): Thing | undefined {
  const clause = s.words[i]?.clause;
  const segment = s.words[i]?.segment;
  // A pronoun past a comma or a linking word ("..., and they are right") starts a clause of its own.
  // "the sunshine was sufficient in itself, and carbon dioxide simply kept time": ", and" with a new
  // subject starts a clause of its own, too.
  const ownClause = (t: Thing) => {
    const seg = s.words[t.first]?.segment;
    const opener = s.words.find((w) => w.segment === seg);
    return seg !== segment && opener !== undefined && ['and', 'but', 'yet'].includes(opener.text) && s.words.indexOf(opener) >= t.first - 3;
  };
  // "CO2 drives, and temperature never pushes CO2": the clause the new subject opens holds the rest,
  // so nothing past that subject is this word's object either.
  // "explains the whole thing and CO2 is just along for the ride": a thing after "and" with an
  // auxiliary or copula after it is the subject of a clause of its own.
  const opensClause = (t: Thing) => JOINING_WORDS.has(s.words[t.first - 1]?.text ?? '') && AUXILIARY_VERBS.has(s.words[t.last + 1]?.text ?? '');
  for (const t of s.things) {
    if (t.first <= i || t.first - i > window || s.words[t.first]?.clause !== clause) continue;
    if (opensClause(t)) return undefined;
    if (t.kind === 'pronoun') {
      if (s.words[t.first]?.segment === segment) return t;
      continue;
    }
    return ownClause(t) ? undefined : t;
  }
  return undefined;
}

/**
 * The first thing of the clause of word `i`, before it: a named thing before a pronoun ("I see it
 * differently, because carbon dioxide ... pulled"), unless the clause opens with a cleft "It was".
 */
export function clauseSubject(s: ReadSentence, i: number): Thing | undefined {
  const clause = s.words[i]?.clause;
  const before = s.things.filter((t) => t.last < i && s.words[t.first]?.clause === clause);
  const opener = before[0];
  if (opener?.kind === 'pronoun' && s.words[opener.first]?.text === 'it' && /^(?:is|was)$/u.test(s.words[opener.first + 1]?.text ?? '')) return opener;
  return before.find((t) => t.kind !== 'pronoun') ?? opener;
}

const JOINING_WORDS = new Set(['and', 'but', 'while', 'whereas', 'yet']);
const AUXILIARY_VERBS = new Set(['is', 'was', 'are', 'were', 'has', 'had', 'have', 'does', 'did', 'do', 'can', 'could', 'will', 'would', 'may', 'might', 'must', 'should']);

/** Words a subject search steps over on its way back from a verb. */
const SKIP = /^(?:the|a|an|only|merely|just|simply|also|then|alone|itself|themselves|solely|really|actually|clearly|probably|certainly|surely|had|has|have|was|were|is|are|be|been|did|does|do|can|could|will|would|may|might|must|should|not|never|first|turn|always|ever|indeed|largely|mostly|partly|mainly|chiefly|directly|helped|help|helps|to|all|nothing|else|in|itself|once|later|again|still|further|now|eventually|ultimately|finally|too|far|very)$/u;
export const PREPOSITIONS = new Set(['of', 'in', 'after', 'before', 'behind', 'from', 'with', 'than', 'like', 'by', 'on', 'at', 'to', 'into', 'over', 'during', 'about', 'for']);
const AUX_AFTER = /^(?:had|has|have|was|were|is|are|did|does|do|can|could|will|would|may|might|must|should|alone|only|itself|then|also)$/u;

/**
 * The subject of the verb at `i`: the nearest thing before it in its segment with nothing but
 * auxiliaries, adverbs and negations between; a thing inside a prepositional phrase ("the rise in
 * CO2") is passed over unless a verb follows it ("after the ice had started").
 */
export function subjectBefore(s: ReadSentence, i: number): Thing | undefined {
  const segment = s.words[i]?.segment;
  // "temperature started climbing before CO2": verbs of change and of starting stand between.
  const changeVerbs = [...s.of('changes'), ...s.of('causes', 'start')];
  // "CO2 obviously wasn't doing any of the warming": an adverb in -ly stands between as "clearly" does.
  const adverb = (k: number): boolean => /^\p{L}{3,}ly$/u.test(s.words[k]?.text ?? '') && !s.things.some((t) => t.first <= k && k <= t.last);
  const stepOver = (k: number): boolean => SKIP.test(s.words[k]?.text ?? '') || adverb(k) || changeVerbs.some((h) => h.first <= k && k <= h.last && !s.things.some((t) => t.first <= k && k <= t.last));
  for (let k = i - 1; k >= 0 && s.words[k]?.segment === segment; k -= 1) {
    const thing = s.things.find((t) => t.last === k);
    if (thing !== undefined) {
      const lead = s.words[thing.first - 1]?.text ?? '';
      const lead2 = s.words[thing.first - 2]?.text ?? '';
      const inPhrase = PREPOSITIONS.has(lead) || (['the', 'a', 'an'].includes(lead) && PREPOSITIONS.has(lead2));
      if (lead === 'not' || (inPhrase && !AUX_AFTER.test(s.words[thing.last + 1]?.text ?? ''))) {
        k = thing.first;
        continue;
      }
      return thing;
    }
    if (!stepOver(k)) return undefined;
  }
  return undefined;
}

/** ", a bystander to the warming": an apposition describes the previous segment's plain subject. */
export function appositionSubject(s: ReadSentence, i: number): Thing | undefined {
  const segment = s.words[i]?.segment ?? 0;
  const start = s.words.findIndex((w) => w.segment === segment);
  if (!['a', 'an', 'the', 'merely', 'just', 'only', 'simply'].includes(s.words[start]?.text ?? '')) return undefined;
  return s.things.find((t) => s.words[t.first]?.segment === segment - 1 && !PREPOSITIONS.has(s.words[t.first - 1]?.text ?? '') && !PREPOSITIONS.has(s.words[t.first - 2]?.text ?? '') && t.kind !== 'pronoun');
}


/** True when a thing stands in a prepositional phrase ("of the deglaciation", "in CO2"). */
export function inPhrase(s: ReadSentence, t: Thing): boolean {
  const lead = s.words[t.first - 1]?.text ?? '';
  const lead2 = s.words[t.first - 2]?.text ?? '';
  return PREPOSITIONS.has(lead) || (['the', 'a', 'an', 'every', 'each', 'this', 'that', 'its', 'their'].includes(lead) && PREPOSITIONS.has(lead2));
}
