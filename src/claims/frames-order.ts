/**
 * Order-of-events frames: which named thing came first, which second, and by how much.
 *
 *   "CO2 lagged global temperature by about 800 years"
 *    ^^^ ^^^^^^        ^^^^^^^^^^^          ^^^^^
 *    second  cue       first                amount
 */
import { clauseOf, findPhrases, type Phrase, type PhraseHit } from './frames-match.js';
import type { SentenceTokens } from './frames-tokens.js';

/** The words an order frame is read with; `subjects` maps a kind ("co2") to its words. */
export interface OrderWords {
  before: Phrase[];
  after: Phrase[];
  durations: Phrase[];
  subjects: Record<string, Phrase[]>;
}

/** One order-of-events statement. `first`/`second` are subject kinds, when they could be told. */
export interface OrderFrame {
  cue: PhraseHit;
  relation: 'before' | 'after';
  first?: string;
  second?: string;
  /** The duration word near the cue ("years", "centuries"), when one is given. */
  amount?: PhraseHit;
}

interface Mention {
  kind: string;
  hit: PhraseHit;
}

/** Every subject mention in the sentence, in order; a longer match wins over a shorter one inside it. */
export function subjectMentions(sentence: SentenceTokens, subjects: Record<string, Phrase[]>): Mention[] {
  const all = Object.entries(subjects).flatMap(([kind, phrases]) =>
    findPhrases(sentence, phrases).map((hit) => ({ kind, hit })),
  );
  all.sort((a, b) => a.hit.start - b.hit.start || b.hit.end - a.hit.end);
  return all.filter((m, i) => !all.slice(0, i).some((o) => o.hit.first <= m.hit.first && o.hit.last >= m.hit.last));
}

/** The nearest mention left (`-1`) or right (`1`) of a cue, inside the cue's clause. */
export function nearestMention(sentence: SentenceTokens, mentions: Mention[], cue: PhraseHit, side: -1 | 1): Mention | undefined {
  const clause = clauseOf(sentence, cue.first);
  const inClause = mentions.filter((m) => clauseOf(sentence, m.hit.first) === clause);
  if (side === -1) return inClause.filter((m) => m.hit.last < cue.first).at(-1);
  return inClause.find((m) => m.hit.first > cue.last);
}

/** Reads every order frame of a sentence. */
export function orderFrames(sentence: SentenceTokens, words: OrderWords): OrderFrame[] {
  const mentions = subjectMentions(sentence, words.subjects);
  const durations = findPhrases(sentence, words.durations);
  const cues = [
    ...findPhrases(sentence, words.before).map((cue) => ({ cue, relation: 'before' as const })),
    ...findPhrases(sentence, words.after).map((cue) => ({ cue, relation: 'after' as const })),
  ].filter(({ cue }) => !mentions.some((m) => m.hit.first <= cue.first && m.hit.last >= cue.last));
  return cues.map(({ cue, relation }) => {
    const left = nearestMention(sentence, mentions, cue, -1)?.kind;
    const right = nearestMention(sentence, mentions, cue, 1)?.kind;
    // "X before Y" / "Y after X"; with one side unnamed, the other kind the sentence mentions.
    const other = (kind: string | undefined) => mentions.find((m) => m.kind !== kind)?.kind;
    const leftSide = left === undefined ? other(right) : left;
    const rightSide = left === undefined ? right : (right ?? other(left));
    const [first, second] = relation === 'before' ? [leftSide, rightSide] : [rightSide, leftSide];
    const clause = clauseOf(sentence, cue.first);
    const amount = durations.find((d) => clauseOf(sentence, d.first) === clause && Math.abs(d.first - cue.first) <= 8);
    return {
      cue,
      relation,
      ...(first === undefined ? {} : { first }),
      ...(second === undefined ? {} : { second }),
      ...(amount === undefined ? {} : { amount }),
    };
  });
}
