// The index of term phrases that may take words inside (src/claims/term-gaps.ts GappedTerms) makes
// a first word's entries when a sentence first holds that word, not all up front, to keep a cold
// `check` short. What it finds must not depend on which words were asked for first: these compare
// an index asked word by word in another order, and one made whole before any search.
import { describe, expect, it } from 'vitest';
import { GappedTerms } from '../../src/claims/term-gaps.js';
import { variantsOf, phraseWords } from '../../src/propositions/lexicon.js';
import { loadPacks } from '../../src/rulepack/index.js';

const packs = await loadPacks([]);
// The built-in pack's terms with every written variant of their phrases, as the binder gives them.
const terms = packs.terms.map((t) => ({ term: t.id, forms: t.words.flatMap((w) => variantsOf(phraseWords(w)).map((v) => v.join(' '))), written: t.words }));
const firstWords = [...new Set(terms.flatMap((t) => t.forms.filter((f) => f.includes(' ')).map((f) => f.toLowerCase().replaceAll('’', "'").split(/\s+/u)[0] as string)))];

describe('the gapped-term index made one first word at a time', () => {
  it('gives each first word the same entries whatever was asked before it', () => {
    const whole = new GappedTerms(terms, packs);
    expect(whole.size).toBeGreaterThan(100);
    const lazy = new GappedTerms(terms, packs);
    const asked = [...firstWords].reverse();
    const entries = Object.fromEntries(asked.map((w) => [w, lazy.entriesOf(w)]));
    for (const w of firstWords) expect({ w, e: entries[w] }).toEqual({ w, e: whole.entriesOf(w) });
    expect(lazy.size).toBe(whole.size);
  });

  it('finds the same gapped matches as an index made whole first', () => {
    const sentences = [
      'The longest peer-reviewed ice-core record reaches back 800,000 years.',
      'That Antarctic core record takes us back to the last interglacial.',
      'The oldest continuous ice core drilled so far covers eight glacial cycles.',
      'Carbon dioxide in the air rose by a third since the industrial era began.',
      'The last glacial maximum sea level stood some 120 metres lower.',
    ];
    const whole = new GappedTerms(terms, packs);
    void whole.size;
    const lazy = new GappedTerms(terms, packs);
    let found = 0;
    for (const s of sentences) {
      const a = lazy.search(s, []);
      expect([...a]).toEqual([...whole.search(s, [])]);
      found += a.size;
    }
    expect(found).toBeGreaterThan(0);
  });
});
