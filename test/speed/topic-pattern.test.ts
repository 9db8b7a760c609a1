import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { topicPattern, topicWordsOf } from '../../src/prose/index.js';
import { loadPacks } from '../../src/rulepack/index.js';

const packs = await loadPacks([]);
const words = topicWordsOf(packs);

/** The plain alternation the trie replaces: longest word first, the same word boundaries. */
function plain(list: string[]): RegExp {
  const unique = [...new Set(list.map((w) => w.trim().toLowerCase()))].sort((a, b) => b.length - a.length);
  const body = unique.map((w) => w.replace(/[.*+?^${}()|[\]\\]/gu, '\\$&').replace(/\s+/gu, '\\s+')).join('|');
  return new RegExp(`(?<![\\p{L}\\p{N}])(?:${body})(?![\\p{L}\\p{N}])`, 'giu');
}

describe('topicPattern: the words as a trie', () => {
  it('finds exactly the matches of the plain alternation, in our demo drafts and README', () => {
    const texts = ['examples/winter-newsletter.md', 'examples/gallery-panels.md', 'examples/field-notes.txt', 'README.md', 'docs/speed.md'].map((f) =>
      readFileSync(new URL(`../../${f}`, import.meta.url), 'utf8'),
    );
    const trie = topicPattern(words, 'giu') as RegExp;
    for (const text of texts) {
      const found = (re: RegExp) => [...text.matchAll(re)].map((m) => `${m.index}:${m[0]}`);
      expect(found(trie)).toEqual(found(plain(words)));
    }
  });

  it('prefers the longer word and keeps word boundaries and case', () => {
    const re = topicPattern(['core', 'cores', 'ice cores', 'CO2', 'a.b'], 'giu') as RegExp;
    expect([...'Ice  Cores, cored, co2x, CO2; a.b axb'.matchAll(re)].map((m) => m[0])).toEqual(['Ice  Cores', 'CO2', 'a.b']);
  });
});
