/**
 * The word filter in front of the term expressions (claims/bind.ts): a term is tried only when one
 * of its key words is in the sentence's lower-case form. That is sound only if every character a
 * case-insensitive Unicode expression matches with an ASCII letter turns into that letter there.
 * ECMA-262 (RegExp Canonicalize, flags `iu`) folds characters with Unicode's simple case folding
 * (CaseFolding.txt, status C and S); the checks below try every code point against it.
 */
import { describe, expect, it } from 'vitest';
import { compiledTerms, findTerms, foldedLower, keyWordsIn } from '../../src/claims/bind.js';
import { loadPacks } from '../../src/rulepack/index.js';

const packs = await loadPacks([]);

describe('the key-word filter of term expressions', () => {
  it('keeps, for every code point outside ASCII, the ASCII letter a case-insensitive expression matches it with', () => {
    const folding: string[] = [];
    for (let cp = 0x80; cp <= 0x10ffff; cp += 1) {
      if (cp >= 0xd800 && cp <= 0xdfff) continue;
      const ch = String.fromCodePoint(cp);
      if (!/[a-z]/iu.test(ch)) continue;
      const letter = [...'abcdefghijklmnopqrstuvwxyz'].find((l) => new RegExp(l, 'iu').test(ch)) as string;
      folding.push(`U+${cp.toString(16).toUpperCase()}`);
      expect(foldedLower(ch)).toContain(letter);
    }
    // The kelvin sign and the long s: the only two, per CaseFolding.txt (Unicode 15).
    expect(folding).toEqual(['U+17F', 'U+212A']);
  });

  it('finds terms in sentences with characters outside ASCII, as the expressions alone do', () => {
    // The long s and the kelvin sign fold to s and k; the degree sign and dashes stand beside the words.
    expect(findTerms('The Vo\u017ftok core reaches back 420,000 years, when it was 8 °C colder.', packs).get('vostok')).toEqual([[4, 10]]);
    expect(findTerms('LA\u212AE VOSTO\u212A — sealed for millions of years.', packs).get('lake')).toEqual([[0, 11]]);
    expect(findTerms('The VOSTOK record — about 420,000 years at −55 °C.', packs).get('vostok')).toEqual([[4, 10]]);
  });

  it('passes over a term none of whose words is in the sentence', () => {
    expect(findTerms('The café ran out of scones — again.', packs).size).toBe(0);
  });
});

describe('the one-pass key-word finder', () => {
  // It must find exactly the key words `includes` finds (common practice: compare a fast path with
  // the plain one it replaces), at a sentence's start and end, overlapping, repeated, and next to
  // characters outside ASCII.
  const terms = compiledTerms(packs);
  const keys = [...new Set([...terms.values()].flatMap((t) => t.keyWords ?? []))];
  const sentences = [
    'Our own line: the Taylor Dome record and a lake under Vostok, 3,750 m down, at −89 °C.',
    'co2co2 ppmv ppm, ice-age cores; EPICA-Dome C; WAIS Divide and NGRIP and GISP2 and the LGM.',
    'k', 'ka', 'kyr', 'Ma', 'm.', '', 'Ice\u212A cores ſ over 800 kyr BP (b2k) and δ18O.',
    ...keys.map((k) => `x${k}`), ...keys.map((k) => `${k.slice(0, -1)} ${k}`),
  ];
  it('finds the key words that includes finds, and no other', () => {
    expect(keys.length).toBeGreaterThan(100);
    for (const sentence of sentences) {
      const lower = foldedLower(sentence);
      expect([...keyWordsIn(lower, terms)].sort()).toEqual(keys.filter((k) => lower.includes(k)).sort());
    }
  });
});
