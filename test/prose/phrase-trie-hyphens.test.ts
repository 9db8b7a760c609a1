// The bound words (claims/bind-bound.ts: "peaked at", "never rose above", "as low as") and the state
// words (claims/bind-events.ts: "at their greatest extent") are searched by walking their trie
// (src/claims/forms-trie.ts, src/prose/phrase-trie.ts `hyphens`) instead of large expressions; the
// walk must find exactly what `text.matchAll` of those expressions found (ECMAScript RegExp
// semantics under the `giu` flags: simple case folding, `\p{L}`/`\p{N}` look-arounds, a `[\s-]+` run
// between words, the first alternative that matches winning; ECMA-262 §22.2). Differential test:
// the expression is the reference.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { type FormsTrie, phrasesTrie } from '../../src/claims/forms-trie.js';
import { PhraseTrie } from '../../src/prose/phrase-trie.js';
import { phraseWords, variantsOf } from '../../src/propositions/lexicon.js';
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
  const trie = phrasesTrie(phrases) as FormsTrie;
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

// The forms are made and put in a trie only for the first words a text holds (claims/forms-trie.ts).
// Reference: the expression of every form, the words of degree put inside each phrase as the bound
// reader puts them, longer sources first (ECMA-262 §22.2: the first alternative that matches wins).
/** Every form as [source, words joined by a space], longer sources first, as the bound reader ordered them. */
function formsWithDegree(phrases: readonly string[], degree: readonly string[]): [string, string][] {
  const forms = new Map<string, string>();
  const add = (words: string[]) => {
    const source = words.map((w) => w.replace(/[.*+?^${}()|[\]\\]/gu, '\\$&')).join('[\\s-]+');
    if (!forms.has(source)) forms.set(source, words.join(' '));
  };
  const degrees = degree.map((d) => phraseWords(d));
  for (const phrase of phrases) {
    for (const words of variantsOf(phraseWords(phrase))) {
      add(words);
      for (let k = 1; k < words.length; k += 1) for (const d of degrees) add([...words.slice(0, k), ...d, ...words.slice(k)]);
    }
  }
  return [...forms].sort((x, y) => y[0].length - x[0].length);
}

function expressionWithDegree(phrases: readonly string[], degree: readonly string[]): RegExp {
  const sources = formsWithDegree(phrases, degree).map(([source]) => source);
  return new RegExp(`(?<![\\p{L}\\p{N}])(?:${sources.join('|')})(?![\\p{L}\\p{N}])`, 'giu');
}

describe('the forms of a list, made only for the first words a text holds', () => {
  const bounds = packs.lexicon['bounds'] ?? {};
  // Words whose letters the Kelvin sign and the long s stand for under case folding (CaseFolding.txt).
  const folded = (w: string) => [w.replaceAll('k', '\u212a'), w.replaceAll('s', '\u017f'), w.toUpperCase().replaceAll('S', '\u017f')];

  /** Every form of the list in the expression's order, the words of degree inside: the whole trie the bound reader walked before. */
  /** The whole trie of every form, which the bound reader walked before. */
  const wholeTrie = (phrases: readonly string[], degree: readonly string[]) =>
    new PhraseTrie(formsWithDegree(phrases, degree).map(([, form]) => form), { hyphens: true });

  function textsOf(phrases: readonly string[], degree: readonly string[]): fc.Arbitrary<string> {
    const words = [...new Set([...phrases, ...degree].flatMap((p) => variantsOf(phraseWords(p)).flat()))];
    const pieces = [...words, ...words.flatMap(folded), ' ', ' ', ' ', '-'];
    return fc.array(fc.oneof(fc.constantFrom(...pieces), fc.constantFrom(...TRICKY)), { maxLength: 12 }).map((parts) => parts.join(''));
  }

  it.each(['ceiling-verb', 'floor-verb'])("finds what the whole trie of every form finds, degree words inside (the built-in pack's %s)", (key) => {
    const phrases = bounds[key] ?? [];
    const degree = bounds['degree'] ?? [];
    const trie = phrasesTrie(phrases, degree) as FormsTrie;
    const whole = wholeTrie(phrases, degree);
    fc.assert(
      fc.property(textsOf(phrases, degree), (text) => {
        expect(trie.occurrences(text)).toEqual(whole.occurrences(text));
      }),
      { numRuns: 500, seed: 20261204 },
    );
  });

  it.each(['ceiling-verb', 'floor-verb'])("finds what the expression finds, degree words inside (a part of the built-in pack's %s)", (key) => {
    // The expression of the whole list backtracks too long for a property test; a part of it, every degree word.
    const phrases = (bounds[key] ?? []).filter((_, i) => i % 4 === 0);
    const degree = bounds['degree'] ?? [];
    const trie = phrasesTrie(phrases, degree) as FormsTrie;
    const re = expressionWithDegree(phrases, degree);
    fc.assert(
      fc.property(textsOf(phrases, degree), (text) => {
        expect(trie.occurrences(text)).toEqual(matchesOf(re, text));
      }),
      { numRuns: 300, seed: 20261204 },
    );
  });

  it.each([
    // common practice: a negated verb with a word of degree inside it, in several wordings; the
    // long s and the Kelvin sign fold to "s" and "k" (Unicode CaseFolding.txt).
    ['levels never went much past 290 ppm', 'go past', [[13, 27]]],
    ['it did not climb a great deal above that', 'climb above', [[11, 35]]],
    ['the curve never RO\u017fE far above it', 'rise above', [[16, 30]]],
    ['values stayed put; none \u212aept rising over the line', 'rise over', [[29, 40]]],
    ['the reading rose, then fell; nothing rose past the line', 'rise past', [[37, 46]]],
  ])('%j (%s)', (text, phrase, expected) => {
    const trie = phrasesTrie([phrase], bounds['degree'] ?? []);
    expect(trie?.occurrences(text)).toEqual(expected);
    expect(matchesOf(expressionWithDegree([phrase], bounds['degree'] ?? []), text)).toEqual(expected);
  });

  it('a first word without the rest of its phrase is no match', () => {
    // common practice: "rose" and "fell" alone are no bound; "above" is the list's own one-word phrase.
    const trie = phrasesTrie(bounds['ceiling-verb'] ?? [], bounds['degree'] ?? []) as FormsTrie;
    expect(trie.occurrences('CO2 rose and fell with the seasons')).toEqual([]);
    expect(trie.occurrences('CO2 was never above 300 ppm')).toEqual([[14, 19]]);
  });
});
