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

/** Auxiliaries of the present perfect, which make a past participle after them run up to today ("has reached"). */
const PERFECT_AUXILIARIES = new Set(['has', 'have', "'s", '’s', 've', "'ve", '’ve']);

/**
 * True when the verb that tells the figure starting at `at` is in the past tense: the last finite
 * verb before it ("the first core **covered** 160,000 years", "the record then **reached** 740,000
 * years"), not one in the present or the present perfect ("Vostok's record **goes** back 160,000
 * years", "it **has** reached back 740,000 years"). A participle opening a phrase set off by a comma
 * ("The Vostok core, drilled in the 1990s, ...") describes its noun and tells nothing; a figure with
 * no finite verb before it is told as it stands (common practice of English grammar, as toldInPast).
 */
export function figureToldInPast(sentence: string, at: number): boolean {
  const terms = termsOf(sentence);
  for (let k = terms.length - 1; k >= 0; k--) {
    const t = terms[k] as (typeof terms)[number];
    if (t.start >= at || !t.tags.includes('Verb') || t.tags.includes('Gerund') || t.tags.includes('Infinitive') || t.tags.includes('Participle') || t.tags.includes('Particle')) continue;
    const word = t.text.toLowerCase();
    if (PAST_AUXILIARIES.has(word)) return true;
    if (!t.tags.includes('PastTense') || t.tags.includes('Auxiliary')) return false;
    // "The Vostok core, drilled in the 1990s, covers ...": a participle after a comma describes its noun.
    if (/,\s*$/u.test(sentence.slice(0, t.start))) continue;
    const previous = terms[k - 1]?.text.toLowerCase();
    return previous === undefined || !PERFECT_AUXILIARIES.has(previous);
  }
  return false;
}
