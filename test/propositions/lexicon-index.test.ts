// The lexicon's index is made one first word at a time (propositions/lexicon.ts, lexiconIndex), to
// spare a short draft the forms of phrases it never uses. Here it is compared, word by word, with
// the whole index made up front as the engine made it before: the same entries in the same order
// under every first word of the built-in pack's lexicon, and none under other words.
import { describe, expect, it } from 'vitest';
import { loadPacks } from '../../src/rulepack/index.js';
import { lexiconIndex, phraseWords, variantsOf, type Entry } from '../../src/propositions/lexicon.js';
import type { Lexicon } from '../../src/rulepack/types.js';

/** The whole index, every form of every phrase in lexicon order, each once (the former compile). */
function wholeIndex(lexicon: Lexicon): Map<string, Entry[]> {
  const index = new Map<string, Entry[]>();
  const seen = new Set<string>();
  for (const [cls, keys] of Object.entries(lexicon)) {
    for (const [key, phrases] of Object.entries(keys)) {
      for (const phrase of phrases) {
        for (const words of variantsOf(phraseWords(phrase))) {
          const id = `${cls}\u0000${key}\u0000${words.join(' ')}`;
          if (seen.has(id)) continue;
          seen.add(id);
          const [head, ...rest] = words;
          if (head === undefined) continue;
          index.set(head, [...(index.get(head) ?? []), { rest, cls, key, base: phraseWords(phrase).join(' ') }]);
        }
      }
    }
  }
  return index;
}

describe('the lexicon index, made one first word at a time', () => {
  it('holds, under each first word, the entries of the whole index in its order (built-in pack)', async () => {
    const { lexicon } = await loadPacks([]);
    const whole = wholeIndex(lexicon);
    const lazy = lexiconIndex(lexicon);
    expect(whole.size).toBeGreaterThan(1000);
    // Asked in reverse order, so no word's entries depend on which words were asked before.
    for (const head of [...whole.keys()].reverse()) expect(lazy(head), head).toEqual(whole.get(head));
    // Words no phrase begins with, including forms of a phrase's later words.
    for (const word of ['volcano', 'percent', 'bubbles', 'co2s', '', 'constructor', '__proto__']) {
      if (!whole.has(word)) expect(lazy(word), word).toEqual([]);
    }
  });

  it('does the same for a small lexicon with repeated and multi-word phrases', () => {
    const lexicon: Lexicon = { causes: { verbs: ['drive', 'drive', 'take up', 'rise and fall together'] }, order: { before: ['lead', 'leads the way in the record'] } };
    const whole = wholeIndex(lexicon);
    const lazy = lexiconIndex(lexicon);
    for (const head of whole.keys()) expect(lazy(head), head).toEqual(whole.get(head));
    expect(lazy('up')).toEqual([]);
  });
});
