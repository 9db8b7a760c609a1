// phraseWords (propositions/lexicon.ts) takes a phrase's words with `String.prototype.match` under
// the global flag rather than matchAll and each match's text: the same words in the same order, with
// no match object per word. Compared here with the matchAll reading it replaced, on the built-in
// pack's lexicon phrases and on phrases of our own with apostrophes, subscripts, digits and no word.
import { describe, expect, it } from 'vitest';
import { loadPacks } from '../../src/rulepack/index.js';
import { phraseWords } from '../../src/propositions/lexicon.js';

/** The former reading: every match of the word expression, by matchAll. */
function byMatchAll(phrase: string): string[] {
  return [...phrase.toLowerCase().replace(/’/gu, "'").matchAll(/[\p{L}\p{N}₂]+(?:['’][\p{L}]+)*/gu)].map((m) => m[0]);
}

describe('phraseWords', () => {
  it("reads every phrase of the built-in pack's lexicon as matchAll did", async () => {
    const { lexicon } = await loadPacks([]);
    const phrases = Object.values(lexicon).flatMap((keys) => Object.values(keys).flat());
    expect(phrases.length).toBeGreaterThan(1000);
    for (const phrase of phrases) expect(phraseWords(phrase), phrase).toEqual(byMatchAll(phrase));
  });

  it('reads apostrophes, subscripts, digits and empty phrases as matchAll did', () => {
    const samples = ['Earth’s tilted axis', "the glacier's snout", 'CO₂ and N2O', 'MIS 5e', '  ', '', '--', "o'er the ice", 'Δ¹⁸O record', 'sea-level lowstand'];
    for (const phrase of samples) expect(phraseWords(phrase), phrase).toEqual(byMatchAll(phrase));
    expect(phraseWords('Earth’s tilted axis')).toEqual(["earth's", 'tilted', 'axis']);
    expect(phraseWords('')).toEqual([]);
  });
});
