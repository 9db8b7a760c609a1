/**
 * Direction-fact patterns for a whole paragraph at once. The engine asks about one sentence at a
 * time, but each guarded call has a fixed cost (waking the worker thread) well above the matching
 * itself, so the first question about a paragraph runs the patterns on that sentence and on every
 * later sentence of the paragraph that the engine will also ask about (those with a topic word),
 * in one guarded call; later questions read the answer. A lot that runs past the time limit is
 * not kept, and each sentence then runs on its own as before, so a slow pattern is still named.
 */
import { createTopicMatcher, type TopicMatcher } from '../../prose/topic-matcher.js';
import type { LoadedPacks } from '../../rulepack/types.js';
import { directionPatterns } from './check-directions.js';
import type { CompiledPacks } from './compile-packs.js';
import { guardedMatchesOfTexts, MAX_SENTENCE_LENGTH, type Span } from './time-limit.js';

const answers = new WeakMap<readonly string[], Map<number, { text: string; found: Span[][] }>>();
const topics = new WeakMap<LoadedPacks, TopicMatcher>();

/**
 * The matches of every direction pattern (in `directionPatterns` order) in `paragraph[index]`,
 * from a paragraph-wide guarded call; undefined when the sentence is left to its own call.
 */
export function paragraphDirectionMatches(paragraph: readonly string[], index: number, compiled: CompiledPacks, packs: LoadedPacks): Span[][] | undefined {
  const text = paragraph[index];
  if (text === undefined || text.length > MAX_SENTENCE_LENGTH || compiled.directions.length === 0) return undefined;
  const known = answers.get(paragraph)?.get(index);
  // The text is compared too, so a caller that reuses an array with new sentences gets no stale answer.
  if (known !== undefined && known.text === text) return known.found;

  let topic = topics.get(packs);
  if (topic === undefined) {
    topic = createTopicMatcher(packs.topicWords);
    topics.set(packs, topic);
  }
  const indices = [index];
  for (let i = index + 1; i < paragraph.length; i += 1) {
    const later = paragraph[i] as string;
    if (later.length <= MAX_SENTENCE_LENGTH && topic.test(later)) indices.push(i);
  }
  const texts = indices.map((i) => paragraph[i] as string);
  const found = guardedMatchesOfTexts(directionPatterns(compiled), texts);
  if (found === undefined) return undefined;
  const stored = answers.get(paragraph) ?? new Map<number, { text: string; found: Span[][] }>();
  indices.forEach((i, k) => stored.set(i, { text: texts[k] as string, found: found[k] ?? [] }));
  answers.set(paragraph, stored);
  return found[0];
}
