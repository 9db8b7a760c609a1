/**
 * Evidence propositions: co-variation offered as proof of a cause.
 *
 *   "The two curves rise and fall together, which proves that CO2 controls the climate."
 *    correlation ──────────────────────   proof ──  cause ───────────────────────
 */
import type { LexHit } from './lexicon.js';
import { denialsBefore, type ReadSentence } from './sentence.js';
import type { Cause, Evidence } from './types.js';

/** Each correlation followed by an undenied proof word and then a cause. */
export function readEvidence(s: ReadSentence, causes: readonly Cause[]): Evidence[] {
  const out: Evidence[] = [];
  for (const c of s.of('correlation')) {
    if (denialsBefore(s, c.first, 4) % 2 === 1) continue;
    const proof = s.of('proof', 'all').find((p) => p.first > c.last && denialsBefore(s, p.first, 4) % 2 === 0 && !hedged(s, p.first) && !deniedObject(s, p.last));
    if (proof === undefined) continue;
    const proofEnd = s.words[proof.last]?.end ?? 0;
    const cause = causes.find((k) => k.end > proofEnd && k.polarity !== 'open' && k.role !== 'feedback');
    const end = cause?.end ?? (provedByCorrelation(s, c, proof) ? causalObjectEnd(s, proof) : undefined);
    if (end === undefined) continue;
    out.push({ kind: 'evidence', start: s.words[c.first]?.start ?? 0, end });
  }
  if (out.length === 0) out.push(...causeOnItsGrounds(s, causes));
  if (out.length === 0) out.push(...proofWithGroundAfter(s, causes));
  return out;
}

/**
 * "the ice cores prove CO2 causes ice ages, the lines on your graph match perfectly", "the record on
 * its own proves that CO2 controls temperature: the two curves move in lockstep": a proof of a cause
 * whose ground, a co-variation, is set beside it after a comma or a colon with no joining word (an
 * asyndetic clause gives the reason for the one before it; English grammar, common practice), in the
 * proof's clause or after a colon (a contrast, "but the curves match", sets the match against the proof). The
 * proof word is one word that takes the claim as its object ("prove that", "proves CO2 ..."): no adverb
 * of certainty ("clearly") or modal ("must be").
 */
function proofWithGroundAfter(s: ReadSentence, causes: readonly Cause[]): Evidence[] {
  for (const proof of s.of('proof', 'all')) {
    const word = s.words[proof.first]?.text ?? '';
    // A verb of proving takes its claim as its object: "that" or the claim's subject follows it ("must be" does not).
    const takesClaim = s.words[proof.last + 1]?.text === 'that' || s.things.some((t) => t.first === proof.last + 1);
    if (proof.first !== proof.last || word.endsWith('ly') || !takesClaim) continue;
    if (denialsBefore(s, proof.first, 4) % 2 === 1 || hedged(s, proof.first) || deniedObject(s, proof.last)) continue;
    const proofEnd = s.words[proof.last]?.end ?? 0;
    const cause = causes.find((k) => k.start >= proofEnd - 1 && k.polarity === 'asserted' && k.role !== 'feedback' && k.role !== 'amplify');
    if (cause === undefined) continue;
    const ground = s.of('correlation').find((c) => {
      const first = s.words[c.first];
      if (first === undefined || first.start < cause.end || denialsBefore(s, c.first, 4) % 2 === 1) return false;
      // The ground's clause opens after a comma or a colon, with no joining word before its subject.
      const opening = s.words.findIndex((w) => w.segment === first.segment);
      const gap = s.text.slice(s.words[opening - 1]?.end ?? 0, s.words[opening]?.start ?? 0);
      return opening > proof.last && (first.clause === s.words[proof.first]?.clause || gap.includes(':')) && /[,:]/u.test(gap) && !s.of('proof', 'reasons').some((r) => r.first === opening);
    });
    if (ground !== undefined) return [{ kind: 'evidence', start: s.words[proof.first]?.start ?? 0, end: s.words[ground.last]?.end ?? proofEnd }];
  }
  return [];
}

/**
 * "We know CO2 warms the planet because the two lines go up and down together": an asserted cause,
 * then a word that gives its ground (lexicon `proof.reasons`), then an undenied co-variation as
 * that ground, in the reason word's own segment. A ground that is not a co-variation ("because CO2
 * traps heat, and the curves match") is no such evidence.
 */
function causeOnItsGrounds(s: ReadSentence, causes: readonly Cause[]): Evidence[] {
  // "..., though a match alone proves nothing": the sentence itself denies that the match proves it.
  if (s.of('proof', 'all').some((p) => deniedObject(s, p.last) || denialsBefore(s, p.first, 4) % 2 === 1)) return [];
  for (const reason of s.of('proof', 'reasons')) {
    const at = s.words[reason.first]?.start ?? 0;
    const cause = causes.find((k) => k.end <= at && k.polarity === 'asserted' && k.role !== 'feedback');
    if (cause === undefined || hedged(s, reason.first)) continue;
    const ground = s.of('correlation').find((c) => c.first > reason.last && s.words[c.first]?.segment === s.words[reason.first]?.segment && denialsBefore(s, c.first, 4) % 2 === 0);
    if (ground !== undefined) return [{ kind: 'evidence', start: cause.start, end: s.words[ground.last]?.end ?? at }];
  }
  return [];
}

/**
 * "That's proof CO2 controls temperature.", "This proves the gas sets the climate.": a sentence that
 * opens by pointing back ("that", "this", "which", "it") and offers proof of a cause; its evidence is
 * the sentence before. Returns the span from the pointer to the cause, or undefined.
 */
export function proofOfWhatCameBefore(s: ReadSentence, causes: readonly Cause[]): { start: number; end: number } | undefined {
  const pointer = s.words.findIndex((w, i) => i <= 1 && POINTERS.has(w.text));
  if (pointer < 0) return undefined;
  const proof = s.of('proof', 'all').find((p) => p.first > pointer && p.first <= pointer + 4 && denialsBefore(s, p.first, 4) % 2 === 0 && !hedged(s, p.first) && !deniedObject(s, p.last));
  if (proof === undefined) return undefined;
  const proofEnd = s.words[proof.last]?.end ?? 0;
  const cause = causes.find((k) => k.end > proofEnd && k.polarity === 'asserted' && k.role !== 'feedback');
  return cause === undefined ? undefined : { start: s.words[pointer]?.start ?? 0, end: cause.end };
}

const POINTERS = new Set(['that', 'this', 'which', 'it', 'that’s', "that's"]);

/** Words that open a segment by pointing back to what the segment before said ("..., which settles ..."). */
const POINTING_BACK = new Set(['which', 'that', 'this', 'it']);

/**
 * Whether the proof word's subject is the co-variation: both stand in one segment ("the tight match
 * ... proves the link"), or the proof's segment opens by pointing back ("..., which on its own settles
 * that"). "The curves match, and physics establishes the link" gives the proof another subject.
 */
function provedByCorrelation(s: ReadSentence, correlation: LexHit, proof: LexHit): boolean {
  const segment = s.words[proof.first]?.segment;
  const opening = s.words.findIndex((w) => w.segment === segment);
  if (POINTING_BACK.has(s.words[opening]?.text ?? '')) return true;
  // An aside between them ("is, by itself, proof of ...") keeps the subject; a clause joined by a
  // coordinator ("..., and physics establishes the link") brings its own.
  const between = s.words.slice(correlation.last + 1, proof.first + 1);
  const joined = between.some((w, k) => k > 0 && w.segment !== between[k - 1]?.segment && JOINERS.has(w.text));
  return s.words[correlation.first]?.clause === s.words[proof.first]?.clause && !joined;
}

/** Coordinators that open a clause of its own (English grammar, common practice). */
const JOINERS = new Set(['and', 'but', 'so', 'yet', 'while', 'whereas', 'although', 'though']);

/** How many words after a proof word its object's noun may stand ("proof of how sensitive ..."). */
const OBJECT_REACH = 3;

/**
 * Where the object of a proof word ends when it names the causal claim instead of stating it, or
 * undefined: the causal question itself after a determiner ("settles the question", "that matter":
 * lexicon `proof.questions`), or the causal relation as a noun ("proves the link", "proof of how
 * sensitive the climate is to CO2": `proof.links`), within a few words after a proof verb or noun of
 * its clause. An adverb of certainty ("clearly") or a modal ("must") takes no object.
 */
function causalObjectEnd(s: ReadSentence, proof: LexHit): number | undefined {
  const word = s.words[proof.last]?.text ?? '';
  if (word.endsWith('ly') || word === 'must') return undefined;
  const clause = s.words[proof.last]?.clause;
  const near = (h: LexHit) => h.first > proof.last && h.first <= proof.last + OBJECT_REACH && s.words[h.first]?.clause === clause;
  const question = s.of('proof', 'questions').find((h) => near(h) && /^(?:the|this|that)$/u.test(s.words[h.first - 1]?.text ?? ''));
  const link = s.of('proof', 'links').find((h) => near(h) && denialsBefore(s, h.first, 3) % 2 === 0);
  const hit = question ?? link;
  return hit === undefined ? undefined : s.words[hit.last]?.end;
}

/** "proves nothing", "proves no such thing": the proof word's object denies it. */
function deniedObject(s: ReadSentence, i: number): boolean {
  const next = s.words[i + 1]?.text ?? '';
  return ['nothing', 'no', 'none', 'neither', 'little'].includes(next) && s.words[i + 1]?.segment === s.words[i]?.segment;
}

/** "hardly proves", "need not prove", "may suggest": no claim of proof. */
function hedged(s: ReadSentence, i: number): boolean {
  return s.words.slice(Math.max(0, i - 3), i).some((w) => ['necessarily', 'hardly', 'need', 'may', 'might', 'whether'].includes(w.text));
}

/**
 * A co-variation called proof with nothing said to be proved: "the correlation itself is the proof",
 * "That tight match is the proof we need", "the lines move in lockstep, that's all the proof anyone
 * needs". The proof word is a noun (the lexicon's `proof.all` words that are no verb or adverb)
 * whose clause states no object: no "that", "of" or "for" after it. Both are undenied and unhedged,
 * in one clause, either order; "a match is no proof", "the match alone proves nothing" pass.
 * Returns the span from the first of the two to the last, or undefined.
 */
export function proofWithoutObject(s: ReadSentence): { start: number; end: number } | undefined {
  const correlation = s.of('correlation').find((c) => denialsBefore(s, c.first, 4) % 2 === 0);
  if (correlation === undefined) return undefined;
  const clause = s.words[correlation.first]?.clause;
  // "correlation-as-proof" is a compound's name, no claim: a proof word joined by a hyphen is part of a word.
  const hyphened = (i: number) => s.text[(s.words[i]?.start ?? 0) - 1] === '-';
  // "the viewer won't need any more proof than that", "no further proof is needed": more proof denied
  // is a verdict that the proof at hand is enough, said of the co-variation before it in the sentence.
  const enough = (p: LexHit) => moreOf(s, p.first) && denialsBefore(s, p.first - 1, 6) % 2 === 1 && (s.words[correlation.first]?.start ?? 0) < (s.words[p.first]?.start ?? 0);
  const proof = s.of('proof', 'all').find((p) => !hyphened(p.first) && (s.words[p.last]?.clause === clause || enough(p)) && PROOF_NOUNS.has(s.words[p.last]?.text ?? '') && (denialsBefore(s, p.first, 4) % 2 === 0 || enough(p)) && !hedged(s, p.first) && !deniedObject(s, p.last) && !statesObject(s, p.last));
  if (proof === undefined) return undefined;
  const first = Math.min(correlation.first, proof.first);
  const last = Math.max(correlation.last, proof.last);
  return { start: s.words[first]?.start ?? 0, end: s.words[last]?.end ?? 0 };
}

/** Word `i` is preceded by one of more ("more proof", "further proof", "extra evidence": lexicon `changes` `up` or `increment`). */
function moreOf(s: ReadSentence, i: number): boolean {
  return s.of('changes').some((h) => h.first === h.last && h.last === i - 1 && (h.key === 'up' || h.key === 'increment'));
}

/** The nouns of proof ("the proof", "the smoking gun"): a proof word that can stand as a predicate noun. */
const PROOF_NOUNS = new Set(['proof', 'proofs', 'gun']);

/** Words that open what a proof proves: "proof that ...", "proof of ...", "proof for ...". */
const PROOF_OBJECTS = new Set(['that', 'of', 'for', 'to']);

/** Whether the proof noun at word `i` is followed, at most past one word ("proof enough that"), by what it proves. */
function statesObject(s: ReadSentence, i: number): boolean {
  // "more proof than that": a "that" after "than" points back to the proof at hand; it opens no object.
  return s.words.slice(i + 1, i + 3).some((w, k) => PROOF_OBJECTS.has(w.text) && s.words[i + k]?.text !== 'than');
}
