/**
 * A compiled matcher for the topic words of the loaded packs: one case-insensitive regular
 * expression, built once, run over a whole file to skip drafts that never mention the subject and
 * over each sentence to pick the candidates that the slower stages see.
 */
export interface TopicMatcher {
  /** True when the text contains at least one topic word on word boundaries. */
  test(text: string): boolean;
}

/** Builds the matcher; longer words first so "carbon dioxide" wins over "carbon". */
export function createTopicMatcher(words: readonly string[]): TopicMatcher {
  const pattern = topicPattern(words, 'iu');
  if (pattern === undefined) return { test: () => false };
  return { test: (text) => pattern.test(text) };
}

/** The matcher's one regular expression (with `flags`, e.g. `giu` to find every hit); undefined for no words. */
export function topicPattern(words: readonly string[], flags: string): RegExp | undefined {
  const unique = [...new Set(words.map((w) => w.trim().toLowerCase()).filter((w) => w.length > 0))];
  if (unique.length === 0) return undefined;
  unique.sort((a, b) => b.length - a.length);
  const body = unique.map(escapeForPattern).join('|');
  return new RegExp(`(?<![\\p{L}\\p{N}])(?:${body})(?![\\p{L}\\p{N}])`, flags);
}

function escapeForPattern(word: string): string {
  return word.replace(/[.*+?^${}()|[\]\\]/gu, '\\$&').replace(/\s+/gu, '\\s+');
}
