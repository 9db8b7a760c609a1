/**
 * Sentence frames: the parts of a sentence an argument is made of, for the checklist and for
 * readers of a claim. Offsets are UTF-16 indices into the sentence.
 *
 *   "CO2 rose after the warming, so it cannot have caused it."
 *    order ─────────────────── inference ── causal (negated)
 */
import { compilePhrases, findPhrases, isNegated, type Phrase, type PhraseHit } from './frames-match.js';
import { nearestMention, orderFrames, subjectMentions } from './frames-order.js';
import { tokenizeSentence, type SentenceTokens } from './frames-tokens.js';
import { FRAME_WORDS, type FrameWords } from './frames-words.js';

interface FrameBase {
  start: number;
  end: number;
  /** The cue words as written. */
  text: string;
}

/** One frame of a sentence. */
export type Frame = FrameBase &
  (
    | { kind: 'causal'; negated: boolean; cause?: string; effect?: string }
    | { kind: 'order'; relation: 'before' | 'after'; first?: string; second?: string; amount?: string }
    | { kind: 'inference' }
    | { kind: 'either-or' }
    | { kind: 'scope'; region: keyof FrameWords['scope'] }
    | { kind: 'certainty'; negated: boolean }
    | { kind: 'stance'; stance: 'reported' }
  );

type Compiled = { [K in keyof FrameWords]: FrameWords[K] extends string[] ? Phrase[] : Record<string, Phrase[]> };

const compiled = new WeakMap<FrameWords, Compiled>();

function compile(words: FrameWords): Compiled {
  const hit = compiled.get(words);
  if (hit !== undefined) return hit;
  const out = Object.fromEntries(
    Object.entries(words).map(([key, value]) => [
      key,
      Array.isArray(value)
        ? compilePhrases(value)
        : Object.fromEntries(Object.entries(value as Record<string, string[]>).map(([k, v]) => [k, compilePhrases(v)])),
    ]),
  ) as Compiled;
  compiled.set(words, out);
  return out;
}

/**
 * The frames of one sentence: causal statements (negated or not, with cause and effect when the
 * subjects can be told), orders of events, inference links, either/or markers, scope, certainty
 * words, and whether the sentence reports somebody else's claim.
 */
export function extractFrames(sentence: string, words: FrameWords = FRAME_WORDS): Frame[] {
  const w = compile(words);
  const tokens = tokenizeSentence(sentence, words.clauseBreaks);
  const base = (hit: PhraseHit): FrameBase => ({ start: hit.start, end: hit.end, text: sentence.slice(hit.start, hit.end) });
  const mentions = subjectMentions(tokens, w.subjects);
  const frames: Frame[] = [
    ...findPhrases(tokens, w.causal).map((hit): Frame => causalFrame(tokens, hit, mentions, w.negation, base(hit))),
    ...orderFrames(tokens, { before: w.before, after: w.after, durations: w.durations, subjects: w.subjects }).map(
      (o): Frame => ({
        ...base(o.cue),
        kind: 'order',
        relation: o.relation,
        ...(o.first === undefined ? {} : { first: o.first }),
        ...(o.second === undefined ? {} : { second: o.second }),
        ...(o.amount === undefined ? {} : { amount: sentence.slice(o.amount.start, o.amount.end) }),
      }),
    ),
    ...findPhrases(tokens, w.inference).map((hit): Frame => ({ ...base(hit), kind: 'inference' })),
    ...findPhrases(tokens, w.eitherOr).map((hit): Frame => ({ ...base(hit), kind: 'either-or' })),
    ...Object.entries(w.scope).flatMap(([region, phrases]) =>
      findPhrases(tokens, phrases).map((hit): Frame => ({ ...base(hit), kind: 'scope', region: region as keyof FrameWords['scope'] })),
    ),
    ...findPhrases(tokens, w.certainty).map(
      (hit): Frame => ({ ...base(hit), kind: 'certainty', negated: isNegated(tokens, hit.first, w.negation) }),
    ),
    ...findPhrases(tokens, w.reported).map(
      (hit): Frame => ({ ...base(hit), kind: 'stance', stance: 'reported' }),
    ),
  ];
  return frames.sort((a, b) => a.start - b.start || b.end - a.end);
}

const PRONOUNS = new Set(['it', 'they', 'this', 'these', 'those']);

function causalFrame(tokens: SentenceTokens, hit: PhraseHit, mentions: ReturnType<typeof subjectMentions>, negation: Phrase[], base: FrameBase): Frame {
  // "X drives Y"; in the passive "Y is driven by X" the cause stands after "by".
  const passive = [1, 2].some((k) => tokens.tokens[tokens.words[hit.last + k] ?? -1]?.text === 'by');
  const leftMention = nearestMention(tokens, mentions, hit, -1);
  // "Temperature rose first, so it cannot have caused...": a pronoun stands for an unknown subject.
  const pronounBetween =
    leftMention !== undefined &&
    tokens.words.slice(leftMention.hit.last + 1, hit.first).some((w) => PRONOUNS.has(tokens.tokens[w]?.text ?? ''));
  const left = pronounBetween ? undefined : leftMention?.kind;
  const right = nearestMention(tokens, mentions, hit, 1)?.kind;
  const [cause, effect] = passive ? [right, left] : [left, right];
  return {
    ...base,
    kind: 'causal',
    negated: isNegated(tokens, hit.first, negation),
    ...(cause === undefined ? {} : { cause }),
    ...(effect === undefined ? {} : { effect }),
  };
}
