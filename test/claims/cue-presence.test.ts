/**
 * The test on a sentence's words alone that lets the reasoning checks skip compromise
 * (claims/frames-match.ts `mayMatchWord`, `mayMatchPhrase`): a word of a cue phrase matches a
 * token's text or its compromise root, so the test must hold for every word whose root can be a cue
 * word. compromise picks the root by the word's tag (tests/docs of compromise 14: plural → singular,
 * past, present and gerund → infinitive, comparative and superlative → adjective, adverb →
 * adjective, possessive, copula), so each rule is tried on every word form of its lexicon, whatever
 * tag the word would get; and the roots compromise gives in context, on the sentences of our prose.
 * The test is allowed to say "may match" too often (a parse more), never too seldom (a flag lost).
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { compilePhrases, findPhrases, mayMatchPhrase, mayMatchWord } from '../../src/claims/frames-match.js';
import { tokenizeSentence } from '../../src/claims/frames-tokens.js';
import { compromiseTagger } from '../../src/nlp/compromise.js';
import { loadPacks } from '../../src/rulepack/index.js';
import type { LoadedPacks } from '../../src/rulepack/types.js';
import { corpusSentences } from '../nlp/corpus-sentences.js';

let packs: LoadedPacks;
beforeAll(async () => {
  packs = await loadPacks([]);
});

/** Every cue list of the built-in pack's reasoning checks. */
function cueLists(): string[][] {
  return packs.reasoning.flatMap((check) => Object.values(check.words ?? {}));
}

/** The single words of those lists (no `word*`: those match the text alone). */
function cueWords(): Set<string> {
  return new Set(compilePhrases(cueLists().flat()).flatMap((p) => p.groups.flat()).filter((w) => !w.endsWith('*')));
}

interface Transforms {
  noun: { toSingular: (s: string, model: unknown) => string };
  verb: { toInfinitive: (s: string, model: unknown, tense: string) => string };
  adjective: { fromComparative: (s: string, model: unknown) => string; fromSuperlative: (s: string, model: unknown) => string; fromAdverb: (s: string) => string };
}

describe('a cue word in some inflection, on the words alone', () => {
  it('holds for every form of compromise\'s lexicon whose root under any rule is a cue word', () => {
    const world = compromiseTagger().world() as unknown as { model: { one: { lexicon: Record<string, unknown> } }; methods: { two: { transform: Transforms } } };
    const { model } = world;
    const t = world.methods.two.transform;
    const rules: ((s: string) => string)[] = [
      (s) => t.noun.toSingular(s, model),
      (s) => t.verb.toInfinitive(s, model, 'PastTense'),
      (s) => t.verb.toInfinitive(s, model, 'PresentTense'),
      (s) => t.verb.toInfinitive(s, model, 'Gerund'),
      (s) => t.adjective.fromComparative(s, model),
      (s) => t.adjective.fromSuperlative(s, model),
      (s) => t.adjective.fromAdverb(s),
      (s) => s.replace(/'s$/u, ''),
    ];
    const cues = cueWords();
    expect(cues.size).toBeGreaterThan(100);
    const forms = Object.keys(model.one.lexicon).filter((w) => /^[a-z']+$/u.test(w));
    expect(forms.length).toBeGreaterThan(10_000);
    const missed: string[] = [];
    let tried = 0;
    for (const form of forms) {
      for (const rule of rules) {
        const root = rule(form);
        if (root === form || !cues.has(root)) continue;
        tried += 1;
        if (!mayMatchWord(root, form)) missed.push(`${form} → ${root}`);
      }
    }
    // Irregular forms such as "went" → "go", "told" → "tell", "swung" → "swing" are among them.
    expect(tried).toBeGreaterThan(100);
    expect(missed).toEqual([]);
  });

  it('holds for the roots compromise gives in context, on the sentences of our prose', () => {
    const lists = cueLists().map((list) => compilePhrases(list));
    const english = new Set(Object.keys((compromiseTagger().world() as unknown as { model: { one: { lexicon: Record<string, unknown> } } }).model.one.lexicon));
    // Every fifth sentence, to keep the test within half a minute on our shared machine.
    const sentences = corpusSentences(8).filter((_s, i) => i % 5 === 0);
    const missed: string[] = [];
    let rooted = 0;
    for (const text of sentences) {
      const withRoots = tokenizeSentence(text, []);
      const plain = tokenizeSentence(text, [], null);
      for (const w of withRoots.words) {
        const token = withRoots.tokens[w];
        if (token === undefined || token.root === token.text) continue;
        rooted += 1;
        // Any root that is an English word (in compromise's lexicon) could be some pack's cue word.
        if (english.has(token.root) && !mayMatchPhrase(plain, { source: token.root, groups: [[token.root]] })) missed.push(`${token.text} → ${token.root}`);
      }
      for (const list of lists) {
        for (const phrase of list) {
          if (findPhrases(withRoots, [phrase]).length > 0 && !mayMatchPhrase(plain, phrase)) missed.push(`${phrase.source} in ${text}`);
        }
      }
    }
    expect(sentences.length).toBeGreaterThan(1000);
    expect(rooted).toBeGreaterThan(500);
    expect(missed).toEqual([]);
  }, 300_000);

  it('finds irregular and shortened forms, and tells a missing word', () => {
    const phrase = (source: string) => compilePhrases([source])[0] as ReturnType<typeof compilePhrases>[number];
    const words = (text: string) => tokenizeSentence(text, [], null);
    // Invented sentences (the certainty cue words of the built-in pack).
    expect(mayMatchPhrase(words('The cores told us exactly how warm it was.'), phrase('tell us exactly'))).toBe(true);
    expect(mayMatchPhrase(words('Ageing ice hides the signal.'), phrase('age'))).toBe(true);
    expect(mayMatchPhrase(words('It was proven beyond any doubt.'), phrase('prove'))).toBe(true);
    expect(mayMatchPhrase(words("The core's bubbles say little."), phrase('core'))).toBe(true);
    // "show" without "exactly" holds no "show exactly"; nothing here settles or proves.
    expect(mayMatchPhrase(words('Ice cores show that CO2 rose about 800 years after the warming.'), phrase('show exactly'))).toBe(false);
    expect(mayMatchPhrase(words('Ice cores show that CO2 rose about 800 years after the warming.'), phrase('prove'))).toBe(false);
    // "can't" is "can" + "not" as the tokenizer writes it.
    expect(mayMatchPhrase(words("The cores can't settle it."), phrase('not'))).toBe(true);
  });
});
