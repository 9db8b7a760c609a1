/**
 * Stance: is a sentence the writer's own claim (asserted), or somebody else's argument that the
 * writer reports (quoted, "some argue that", "a common myth"), and if reported, does the paragraph
 * answer it? A reported argument that the paragraph answers is not the writer's error.
 */
import { compilePhrases, findPhrases, type Phrase } from './frames-match.js';
import { tokenizeSentence, type SentenceTokens } from './frames-tokens.js';
import { FRAME_WORDS } from './frames-words.js';

/** The stance of one claim in its paragraph. */
export interface Stance {
  stance: 'asserted' | 'reported';
  /** How it is reported: a marker phrase, or `quotation`. */
  marker?: string;
  /** For a reported claim: whether the paragraph answers it. */
  answered: boolean;
}

/** Reporting and answering phrases, compiled. */
export interface StanceWords {
  reported: Phrase[];
  answered: Phrase[];
  clauseBreaks: string[];
}

/** The built-in stance words (see FRAME_WORDS), compiled once. */
export const DEFAULT_STANCE_WORDS: StanceWords = {
  reported: compilePhrases(FRAME_WORDS.reported),
  answered: compilePhrases(FRAME_WORDS.answered),
  clauseBreaks: FRAME_WORDS.clauseBreaks,
};

/**
 * The stance of the claim at `cue` (UTF-16 offsets into `paragraph[index]`, already tokenized as
 * `sentence`). Reported when the sentence carries a reporting marker, when the cue stands inside
 * quotation marks, or when the whole sentence is a quotation. Answered when an answering phrase
 * follows the cue in the same sentence, or stands anywhere in another sentence of the paragraph.
 *
 *   ["You may hear that CO2 rose after the warming, so it cannot have caused it.",
 *    "That argument mixes up the trigger and the amplifier."]  → reported, answered
 */
export function stanceOf(
  paragraph: readonly string[],
  index: number,
  sentence: SentenceTokens,
  cue: { start: number; end: number },
  words: StanceWords = DEFAULT_STANCE_WORDS,
): Stance {
  const marker = findPhrases(sentence, words.reported)[0]?.phrase;
  const cueTokens = sentence.tokens.filter((t) => t.isWord && t.start >= cue.start && t.end <= cue.end);
  const firstWord = sentence.tokens.find((t) => t.isWord);
  const quoted = cueTokens.some((t) => t.quoted) || firstWord?.quoted === true;
  if (marker === undefined && !quoted) return { stance: 'asserted', answered: false };
  const answeredHere = findPhrases(sentence, words.answered).some((hit) => hit.start >= cue.end);
  const answeredNearby = paragraph.some(
    (other, i) => i !== index && findPhrases(tokenizeSentence(other, words.clauseBreaks, null), words.answered).length > 0,
  );
  return { stance: 'reported', marker: marker ?? 'quotation', answered: answeredHere || answeredNearby };
}
