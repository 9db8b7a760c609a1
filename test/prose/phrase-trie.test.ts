// The topic matcher and the term binder walk their words' trie in code (src/prose/phrase-trie.ts)
// instead of compiling one large expression; they must answer exactly what those expressions answer (ECMAScript RegExp semantics under the `iu` flags:
// simple case folding, `\p{L}`/`\p{N}` look-arounds, `\s` runs; ECMA-262 §22.2). Differential test:
// the expression is the reference.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { termRegex } from '../../src/claims/bind.js';
import { PhraseTrie } from '../../src/prose/phrase-trie.js';
import { createTopicMatcher, topicPattern } from '../../src/prose/topic-matcher.js';
import { subjectWordsOf } from '../../src/propositions/index.js';
import { loadPacks } from '../../src/rulepack/index.js';

const packs = await loadPacks([]);

// Code points where case folding, letters, digits and white space differ from the ASCII view
// (ECMA-262 Canonicalize; Unicode CaseFolding.txt): Kelvin sign, long s, dotted/dotless i, final
// sigma, a combining mark that folds to a letter, Roman numeral, non-breaking and line-separator
// spaces, a combining acute, an astral letter and digit, lone surrogates, and a subscript two.
const TRICKY = ['\u212a', '\u017f', '\u0130', '\u0131', '\u03c2', '\u03a3', '\u0345', '\u2160', '\u00a0', '\u2028', '\u3000', '\u0301',
  '\u{1d400}', '\u{1d7ce}', '\ud800', '\udc00', '\u2082', '\u00e9', 'É', '-', '.', ' ', '\n', '\t', '2', '9', '_', '’'];

/** Text made of the words' pieces (their case changed, cut in half) and the tricky code points. */
function textOf(words: readonly string[]): fc.Arbitrary<string> {
  const pieces = words.flatMap((w) => [w, w.toUpperCase(), w.slice(0, Math.ceil(w.length / 2)), w.slice(1)]);
  const piece = fc.oneof(fc.constantFrom(...pieces), fc.constantFrom(...TRICKY), fc.string({ maxLength: 3 }), fc.string({ unit: 'binary', maxLength: 2 }));
  return fc.array(piece, { maxLength: 12 }).map((parts) => parts.join(''));
}

/** The spans the term binder took from its expression: the match after the group (the character before). */
function spansOf(words: string[], text: string): [number, number][] {
  return [...text.matchAll(termRegex(words))].map((m): [number, number] => [m.index + (m[1] ?? '').length, m.index + m[0].length]);
}

function termDifferential(words: string[], runs: number): void {
  const trie = new PhraseTrie([...words].sort((a, b) => b.length - a.length));
  fc.assert(
    fc.property(textOf(words), (text) => {
      expect(trie.spans(text)).toEqual(spansOf(words, text));
    }),
    { numRuns: runs, seed: 20261203 },
  );
}

function differential(words: readonly string[], runs: number): void {
  const pattern = topicPattern(words, 'iu') as RegExp;
  const matcher = createTopicMatcher(words);
  fc.assert(
    fc.property(textOf(words), (text) => {
      expect(matcher.test(text)).toBe(pattern.test(text));
    }),
    { numRuns: runs, seed: 20261203 },
  );
}

describe('createTopicMatcher: the trie walk answers as the expression does', () => {
  it('on a small list with white space, digits, subscripts and non-ASCII units', () => {
    differential(['co2', 'co₂', 'carbon dioxide', 'ice  core', 'vostok', 'δ18o', 'kelvin', 'ſtraße', 'σ', 'a.b', 'é'], 4000);
  });

  it("on the built-in pack's subject words", () => {
    differential(subjectWordsOf(packs.lexicon), 1500);
  });

  it("on the built-in pack's topic words", () => {
    differential(packs.topicWords, 1500);
  });

  it.each([
    ['\u212aELVIN scale', true], // Kelvin sign folds to k under `iu`
    ['\u017fTRASSE', false],
    ['Ice\u00a0\u2028 cores', true],
    ['a\u0345ice core', false], // U+0345 folds to a Greek letter: "ice" follows a letter
    ['\u{1d400}vostok', false], // astral letter before the word
    ['\u{1d400} vostok', true],
    ['co2\u{1d7ce}', false], // astral digit after the word
  ])('%j → %s', (text, expected) => {
    const words = ['kelvin', 'ice core', 'ice', 'vostok', 'co2'];
    expect(createTopicMatcher(words).test(text)).toBe(expected);
    expect((topicPattern(words, 'iu') as RegExp).test(text)).toBe(expected);
  });
});

describe('PhraseTrie.spans: the term binder finds what its expression found', () => {
  it('on a list with a phrase that is a prefix of another, white space, case and non-ASCII units', () => {
    termDifferential(['ice', 'ice core', 'Ice  Cores', 'CO2', 'co₂', 'u.s.', 'δ18O', 'K', 'ſ', 'a-b'], 4000);
  });

  it("on every term of the built-in pack", () => {
    for (const term of packs.terms) termDifferential(term.words, 150);
  });

  it.each([
    // The character before a phrase belongs to the match: phrases one character apart are each
    // found; "u.s." before a letter is not a match, so the next one starts the first hit; and ".b"
    // right after the match "a." is not found, since its character before was taken.
    ['ice ice,ice', [[0, 3], [4, 7], [8, 11]]],
    ['u.s.u.s. u.s.', [[4, 8], [9, 13]]],
    ['a..b .b', [[0, 2], [5, 7]]],
    ['Ice \n cores and ice-core', [[0, 11], [16, 19], [20, 24]]],
  ])('%j', (text, expected) => {
    const words = ['ice', 'ice cores', 'u.s.', 'core', 'a.', '.b'];
    expect(new PhraseTrie([...words].sort((a, b) => b.length - a.length)).spans(text)).toEqual(expected);
    expect(spansOf(words, text)).toEqual(expected);
  });
});
