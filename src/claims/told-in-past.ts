/**
 * Whether a sentence is told in the past: its first finite verb is in the past tense ("Sea level
 * **was** about 120 metres lower", "the sea **stood** lower", "it **had** dropped"), not in the present
 * or the present perfect ("sea level **stands** 125 metres higher", "sea level **has** risen since").
 *
 * A figure told in the past is of a time before the writer's; one told in the present speaks from
 * today, even after a passage set in a past period (common practice of English grammar: the simple
 * past places an event before the time of writing, the present perfect runs up to it). Read from
 * compromise's tags of the sentence (nlp/sentence-terms.ts), parsed once and shared.
 */
import { termsOf } from '../nlp/sentence-terms.js';

/** Auxiliaries and copulas of the past, which compromise may tag only as auxiliaries. */
const PAST_AUXILIARIES = new Set(['was', 'were', 'had', 'did']);

/** True when the first finite verb of `sentence` is in the past tense. */
export function toldInPast(sentence: string): boolean {
  for (const t of termsOf(sentence)) {
    if (!t.tags.includes('Verb') || t.tags.includes('Gerund') || t.tags.includes('Infinitive') || t.tags.includes('Participle')) continue;
    const word = t.text.toLowerCase();
    return PAST_AUXILIARIES.has(word) || (t.tags.includes('PastTense') && !t.tags.includes('Auxiliary'));
  }
  return false;
}
