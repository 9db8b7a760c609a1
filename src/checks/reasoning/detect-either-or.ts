/**
 * `logic.either-or-causation`: CO2 and temperature framed as alternatives, when each drives the other.
 *
 *   "The ice-core record shows that temperature drives CO2, not the other way round."
 *                                                           ^^^^^^^^^^^^^^^^^^^^^^^ flagged
 *   "...warming drives CO2, and CO2 does not drive warming."   (one direction asserted, the
 *        ^^^^^^^^^^^^^^^^^^^^^^^^^^^^^^^^^^^^^^^^^^^^^^^^      other denied: flagged)
 *
 * Fires on an either/or marker (`either-or`, or an "either" with an "or" anywhere later in its
 * clause) in a sentence that names CO2, temperature and a
 * causal word (`causal`), or on two causal statements in opposite directions joined by "or" or
 * with one of them denied. A veto (`both`: "each drives the other", "feedback", "not either/or")
 * anywhere in the sentence, or for a question anywhere in the paragraph, lets it pass; a denied
 * veto ("it cannot be both") does not.
 */
import { clauseOf, findPhrases, isNegated, type PhraseHit } from '../../claims/frames-match.js';
import { nearestMention, subjectMentions } from '../../claims/frames-order.js';
import { tokenizeSentence, type SentenceTokens } from '../../claims/frames-tokens.js';
import { spanOf, type Cue, type DetectInput, type DetectorEntry } from './detector.js';

interface Causal {
  hit: PhraseHit;
  cause?: string;
  effect?: string;
  negated: boolean;
}

function causalStatements({ sentence, words }: DetectInput): Causal[] {
  const mentions = subjectMentions(sentence, { co2: words('co2'), temperature: words('temperature') });
  return findPhrases(sentence, words('causal')).map((hit) => {
    const passive = [1, 2].some((k) => sentence.tokens[sentence.words[hit.last + k] ?? -1]?.text === 'by');
    const left = nearestMention(sentence, mentions, hit, -1)?.kind;
    const right = nearestMention(sentence, mentions, hit, 1)?.kind;
    const [cause, effect] = passive ? [right, left] : [left, right];
    return { hit, negated: isNegated(sentence, hit.first, words('negation')), ...(cause ? { cause } : {}), ...(effect ? { effect } : {}) };
  });
}

// "Either the ocean warmed and gave off CO2 or CO2 warmed the ocean": the two halves of an
// either/or can be longer than the six-word gap of a cue phrase, so any "either" with an "or"
// later in the same clause is a marker too.
function longEitherOr(sentence: SentenceTokens): PhraseHit | undefined {
  const text = (w: number) => sentence.tokens[sentence.words[w] ?? -1]?.text.toLowerCase();
  const either = sentence.words.findIndex((_, w) => text(w) === 'either');
  if (either === -1) return undefined;
  const or = sentence.words.findIndex((_, w) => w > either && text(w) === 'or' && clauseOf(sentence, w) === clauseOf(sentence, either));
  const first = sentence.tokens[sentence.words[either] ?? -1];
  const last = sentence.tokens[sentence.words[or] ?? -1];
  if (or === -1 || first === undefined || last === undefined) return undefined;
  return { phrase: 'either ... or', first: either, last: or, start: first.start, end: last.end };
}

function detect(input: DetectInput): Cue[] {
  const { sentence, words, paragraph, index } = input;
  // "should not pretend it can be both" denies the veto, so it does not count as one.
  const vetoes = findPhrases(sentence, words('both')).filter((hit) => !isNegated(sentence, hit.first, words('negation'), 5));
  if (vetoes.length > 0) return [];
  if (sentence.text.trimEnd().endsWith('?')) {
    const answered = paragraph.some((s, i) => i !== index && findPhrases(tokenizeSentence(s, [], null), words('both')).length > 0);
    if (answered) return [];
  }
  const causal = causalStatements(input);
  const names = (kind: string) => findPhrases(sentence, words(kind)).length > 0;
  const marker = findPhrases(sentence, words('either-or'))[0] ?? longEitherOr(sentence);
  if (marker !== undefined && causal.length > 0 && names('co2') && names('temperature')) return [spanOf(marker, marker)];
  for (const [i, a] of causal.entries()) {
    for (const b of causal.slice(i + 1)) {
      const opposite = a.cause !== undefined && a.cause === b.effect && a.effect !== undefined && a.effect === b.cause && a.cause !== a.effect;
      const joinedByOr = sentence.words.slice(a.hit.last + 1, b.hit.first).some((w) => sentence.tokens[w]?.text === 'or');
      if (opposite && (joinedByOr || a.negated !== b.negated)) return [spanOf(a.hit, b.hit)];
    }
  }
  return [];
}

/** The detector entry for the registry. */
export const eitherOrCausation: DetectorEntry = { detect, keys: ['co2', 'temperature', 'causal'] };
