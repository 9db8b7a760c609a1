/**
 * CO2 told as an effect of the warming in one time and a cause only in another: "In the ice ages
 * CO2 was the effect of the warming; only today has it become a cause." The cause role kept for the
 * present (lexicon `causes.present-time`: "today", "now", "these days") denies it to the glacial
 * CO2, which the sources give both parts: the warming released it and it amplified the warming
 * (Shakun et al. 2012, Nature 484, 49-54; IPCC AR6 WG1 chapter 5, from memory).
 *
 * A sentence that grants the glacial CO2 a part of its own ("...and then amplified it"; a loop,
 * "both") is no such framing, and passes.
 */
import type { Cause, ReadSentence } from '../../propositions/index.js';
import type { Cue } from './detector.js';
import type { SentenceReading } from './reading.js';
import { isWarmingOnCo2 } from './queries.js';

/** Keys of the lexicon's `causes` that name a cause in words: a verb or a part noun. */
const CAUSE_WORDS = new Set(['verbs', 'nouns']);
/** Keys that frame a thing as an effect: "the effect", "a result", "a by-product". */
const EFFECT_WORDS = new Set(['effects']);

/** The cause's span holds a `causes` word of one of `keys`. */
function holds(s: ReadSentence, c: Cause, keys: ReadonlySet<string>): boolean {
  return s.of('causes').some((h) => keys.has(h.key) && (s.words[h.first]?.start ?? -1) >= c.start && (s.words[h.last]?.end ?? Infinity) <= c.end);
}

/** Subject pronouns that carry the thing of the clause before. */
const PRONOUNS = new Set(['it', 'its']);

/** The clauses of `s` that name the present (lexicon `causes.present-time`). */
function presentClauses(s: ReadSentence): Set<number> {
  return new Set(s.of('causes', 'present-time').map((h) => s.words[h.first]?.clause ?? -1));
}

const clauseAt = (s: ReadSentence, offset: number) => s.words.find((w) => w.end > offset)?.clause ?? -1;

/** A part of CO2's own, granted in words: an amplifier, a feedback, a loop. */
const grantsPart = (c: Cause) => c.polarity === 'asserted' && (c.role === 'amplify' || c.role === 'feedback');

/** A cause asserted of CO2, or of a subject left unnamed ("today it's the cause"), inside one of `clauses`. */
function presentCause(r: SentenceReading, clauses: Set<number>): Cause | undefined {
  const inside = r.props.causes.filter((c) => c.polarity === 'asserted' && c.role === 'cause' && clauses.has(clauseAt(r.s, c.start)) && holds(r.s, c, CAUSE_WORDS));
  // "Nowadays it is the driver": the pronoun continues the CO2 the effect clause was about,
  // whatever thing the resolver took it for.
  const pronoun = (c: Cause) => PRONOUNS.has(r.s.words.find((w) => w.start >= c.start)?.text ?? '');
  return inside.find((c) => c.agent === 'co2') ?? inside.find((c) => c.agent === undefined || pronoun(c));
}

/**
 * The cue of an effect-then, cause-now framing in sentence `here`, whose present may be in its own
 * later clause or open the next sentence (`next`).
 */
export function roleKeptForToday(here: SentenceReading, next: SentenceReading | undefined): Cue | undefined {
  if (here.props.causes.some(grantsPart)) return undefined;
  const now = presentClauses(here.s);
  const effect = here.props.causes.find((c) => c.polarity === 'asserted' && isWarmingOnCo2(c) && holds(here.s, c, EFFECT_WORDS) && !now.has(clauseAt(here.s, c.start)));
  if (effect === undefined) return undefined;
  const own = now.size > 0 ? presentCause(here, now) : undefined;
  if (own !== undefined && own.start > effect.start) return { start: effect.start, end: own.end };
  if (next === undefined || next.props.causes.some(grantsPart)) return undefined;
  const later = presentClauses(next.s);
  const first = next.s.words[next.s.opening]?.clause;
  // The next sentence speaks of the present from its opening clause: "Today it is the cause."
  if (first === undefined || !later.has(first)) return undefined;
  return presentCause(next, new Set([first])) === undefined ? undefined : { start: effect.start, end: here.s.text.length };
}
