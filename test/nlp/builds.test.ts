/**
 * The sentence readings (nlp/sentence-terms.ts) parse with compromise's tagger build
 * (`compromise/two`), which loads faster than the full build; the full build's readings were the
 * reference until now (its parse without the chunker, as termsOf made it). The two must give the
 * same terms, tags, roots and offsets on every sentence of our prose (common practice: compare a
 * fast path with the reference it replaces, on the inputs it will see).
 */
import { createRequire } from 'node:module';
import { describe, expect, it } from 'vitest';
import { compromise } from '../../src/nlp/compromise.js';
import { termsOf } from '../../src/nlp/sentence-terms.js';
import { corpusSentences } from './corpus-sentences.js';

type Nlp = ReturnType<typeof compromise>;

/** The full build's reading of `text` without its chunker, in termsOf's shape. */
function fullReading(text: string) {
  const nlp = compromise();
  const world = nlp.world() as { hooks: string[] };
  const hooks = world.hooks;
  world.hooks = hooks.filter((hook) => hook !== 'chunks');
  let doc: ReturnType<Nlp>;
  try {
    doc = nlp(text);
  } finally {
    world.hooks = hooks;
  }
  doc.compute('root');
  doc.compute('offset');
  const terms = (doc as unknown as { docs: { text: string; tags?: Set<string>; root?: unknown; offset?: { start: number; length: number } }[][] }).docs.flat();
  return terms.filter((t) => t.offset !== undefined).map((t) => ({ text: t.text, tags: [...(t.tags ?? [])], ...(typeof t.root === 'string' ? { root: t.root } : {}), start: t.offset?.start, length: t.offset?.length }));
}

describe('compromise/two for the sentence readings', () => {
  it('is the same version as the full build', () => {
    const require = createRequire(import.meta.url);
    expect((require('compromise/two') as Nlp).version).toBe(compromise().version);
  });

  // Every fifth sentence, to keep the test within some 20 s on our shared machine; all of them
  // (14,910 with 256 KB of the bench's prose) were compared once when the switch was made.
  it('reads the sentences of our prose as the full build does', () => {
    const sentences = corpusSentences(8).filter((_s, i) => i % 5 === 0);
    expect(sentences.length).toBeGreaterThan(1000);
    const differ = sentences.filter((text) => JSON.stringify(termsOf(text)) !== JSON.stringify(fullReading(text)));
    expect(differ).toEqual([]);
  }, 300_000);
});
