/**
 * The proposition stage: what each candidate sentence asserts (causes, orders, signed relations,
 * comparisons, changes, evidence) and how it holds them (stance), read with the packs' lexicon.
 * Checks read these, never the words.
 */
import { readCauses } from './causes.js';
import { readChanges, readDirected, readRelations } from './changes.js';
import { readComparisons } from './comparisons.js';
import { readEvidence } from './evidence.js';
import { readOrders } from './orders.js';
import type { ReadSentence } from './sentence.js';
import type { SentenceStance } from './stance.js';
import type { Cause, Propositions } from './types.js';

export { compileLexicon, compile, formsOf, phraseWords, subjectWordsOf, entityWordsOf, classWordsOf, type CompiledLexicon, type LexHit } from './lexicon.js';
export { readSentence, type ReadSentence, type Word, type Thing } from './sentence.js';
export { isOwnClaim, stanceOf, STANCES, type SentenceStance, type StanceContext, type StanceKind } from './stance.js';
export type * from './types.js';

/**
 * Reads the propositions of `s`; `previous` resolves a pronoun that points back one sentence,
 * `earlier` and `scene` (the period the block before named) set the time a change happened in.
 */
export function readPropositions(s: ReadSentence, previous?: ReadSentence, stance?: SentenceStance, earlier: readonly ReadSentence[] = [], scene?: string): Propositions {
  let causes = readCauses(s, previous);
  // Only what the question asks flips or opens; a premise before it stands.
  const asks = (c: Cause) => stance?.questionFrom === undefined || c.start >= stance.questionFrom;
  if (stance?.kind === 'rhetorical' && stance.flips) causes = causes.map((c) => (asks(c) ? flip(c) : c));
  if (stance?.kind === 'asked') causes = causes.map((c) => (asks(c) ? { ...c, polarity: 'open' as const } : c));
  const directed = readDirected(s, previous);
  return {
    causes,
    orders: readOrders(s, previous),
    relations: readRelations(s, directed),
    comparisons: readComparisons(s, previous),
    changes: readChanges(s, directed, previous, earlier, scene),
    evidence: readEvidence(s, causes),
  };
}

/** "How could it be the cause?" asserts that it is not. */
function flip(c: Cause): Cause {
  return c.polarity === 'open' ? c : { ...c, polarity: c.polarity === 'asserted' ? 'denied' : 'asserted' };
}
