// The bound words (claims/bind-bound.ts: "peaked at", "never rose above", "as low as") and the state
// words (claims/bind-events.ts: "at their greatest extent") are searched by walking their trie
// (src/claims/forms-trie.ts, src/prose/phrase-trie.ts `hyphens`) instead of large expressions; the
// walk must find exactly what `text.matchAll` of those expressions found (ECMAScript RegExp
// semantics under the `giu` flags: simple case folding, `\p{L}`/`\p{N}` look-arounds, a `[\s-]+` run
// between words, the first alternative that matches winning; ECMA-262 §22.2). Differential test:
// the expression is the reference.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { phrasesTrie } from '../../src/claims/forms-trie.js';
import { phraseWords, variantsOf } from '../../src/propositions/lexicon.js';
import type { PhraseTrie } from '../../src/prose/phrase-trie.js';
import { loadPacks } from '../../src/rulepack/index.js';

const packs = await loadPacks([]);

/** The expression the bound reader used before the walk: its words' forms joined by `[\s-]+`, longer sources first. */
function expressionOf(phrases: readonly string[]): RegExp {
  const forms = new Set<string>();
  for (const phrase of phrases) for (const words of variantsOf(phraseWords(phrase))) forms.add(words.map((w) => w.replace(/[.*+?^${}()|[\]\\]/gu, '\\$&')).join('[\\s-]+'));
  const sorted = [...forms].sort((a, b) => b.length - a.length);
  return new RegExp(`(?<![\\p{L}\\p{N}])(?:${sorted.join('|')})(?![\\p{L}\\p{N}])`, 'giu');
}

const matchesOf = (re: RegExp, text: string): [number, number][] => [...text.matchAll(re)].map((m): [number, number] => [m.index, m.index + m[0].length]);

// Code points where case folding, letters and white space differ from the ASCII view (Unicode
// CaseFolding.txt: Kelvin sign, long s, dotless i; no-break and line-separator spaces; an astral
// letter; a lone surrogate), hyphens and dashes that are and are not `-`.
const TRICKY = ['\u212a', '\u017f', '\u0131', '\u00a0', '\u2028', '\u{1d400}', '\ud800', '-', '--', ' - ', '\u2010', '\u2013', '.', ' ', '\n', '2', "'", '’'];

function textOf(words: readonly string[]): fc.Arbitrary<string> {
  const pieces = words.flatMap((w) => [w, w.toUpperCase(), w.slice(0, Math.ceil(w.length / 2)), w.slice(1)]);
  const piece = fc.oneof(fc.constantFrom(...pieces), fc.constantFrom(...TRICKY), fc.string({ maxLength: 3 }));
  return fc.array(piece, { maxLength: 14 }).map((parts) => parts.join(''));
}

function differential(phrases: readonly string[], runs: number): void {
  const trie = phrasesTrie(phrases) as PhraseTrie;
  const re = expressionOf(phrases);
  const words = [...new Set(phrases.flatMap((p) => variantsOf(phraseWords(p)).flat()))];
  fc.assert(
    fc.property(textOf(words), (text) => {
      expect(trie.occurrences(text)).toEqual(matchesOf(re, text));
    }),
    { numRuns: runs, seed: 20261204 },
  );
}

describe('PhraseTrie with hyphens: the bound words are found as their expression found them', () => {
  it.each(Object.keys(packs.lexicon['bounds'] ?? {}))("on the built-in pack's %s words", (key) => {
    differential(packs.lexicon['bounds']?.[key] ?? [], 600);
  });

  it.each(Object.keys(packs.lexicon['states'] ?? {}))("on the built-in pack's state words %s", (key) => {
    differential(packs.lexicon['states']?.[key] ?? [], 400);
  });

  it('on a small list where one phrase is a prefix of another', () => {
    differential(['peak', 'peak at', 'as low as', 'low', 'top out', 'never above'], 3000);
  });

  it.each([
    // common practice: hyphens and white space between words are one joiner; a letter after a
    // phrase, or before it, is no match; the next search starts where a match ended.
    ['It peaked-at 280 and bottomed - out near 180', [[3, 12], [21, 35]]],
    ['peakedat 280; topped  OUT at 300', [[14, 25]]],
    ['as low as as low as', [[0, 9], [10, 19]]],
  ])('%j', (text, expected) => {
    const phrases = ['peak at', 'bottom out', 'top out', 'as low as'];
    expect(phrasesTrie(phrases)?.occurrences(text)).toEqual(expected);
    expect(matchesOf(expressionOf(phrases), text)).toEqual(expected);
  });
});
