/**
 * Reported claims: an argument the draft quotes or attributes in order to answer it. Answered in
 * the same paragraph, it is not the writer's error and the flag is dropped; left unanswered, it
 * stays as a warning (or a note, for a note-level rule) that says so.
 */
import type { SentenceTokens } from '../../claims/frames-tokens.js';
import { stanceOf, type StanceWords } from '../../claims/stance.js';
import type { FlagDraft, Level } from '../../types.js';

const SOFTER: Record<Level, Level> = { error: 'warning', warning: 'warning', note: 'note' };

/** The flag as it stands once the stance of its sentence is known; undefined when it is answered. */
export function applyStance(
  flag: FlagDraft,
  paragraph: readonly string[],
  index: number,
  sentence: SentenceTokens,
  words: StanceWords,
): FlagDraft | undefined {
  const stance = stanceOf(paragraph, index, sentence, flag, words);
  if (stance.stance === 'asserted') return flag;
  if (stance.answered) return undefined;
  return {
    ...flag,
    level: SOFTER[flag.level],
    reason: `This reports an argument (${stance.marker}) and the paragraph does not answer it. ${flag.reason}`,
  };
}
