/**
 * termsOf reads compromise's terms straight from its document instead of through `doc.json()`: the
 * two readings must be equal, term by term, on every sentence (the tags that decide a shared
 * subject and the roots the cue phrases match). The sentences are the prose of our own docs and
 * demo drafts, split at sentence ends, plus hand-written ones with contractions, possessives,
 * hyphens, symbols and several sentences in one text, where compromise's terms and offsets differ
 * from a plain word split (common practice: compare a fast path with the reference it replaces).
 * termsOf also parses without compromise's chunker, whose chunks it never reads; the library's own
 * parses (a pattern rule's document) must keep them.
 */
import { readFileSync, readdirSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { compromise } from '../../src/nlp/compromise.js';
import { termsOf } from '../../src/nlp/sentence-terms.js';

function viaJson(text: string) {
  const doc = compromise()(text);
  doc.compute('root');
  const sentences = doc.json({ offset: true, terms: { offset: true } }) as {
    terms: { text: string; tags?: string[]; root?: string; offset?: { start: number; length: number } }[];
  }[];
  return sentences.flatMap((s) => s.terms.filter((t) => t.offset !== undefined).map((t) => ({
    text: t.text, tags: [...(t.tags ?? [])], ...(typeof t.root === 'string' ? { root: t.root } : {}), start: t.offset?.start, length: t.offset?.length,
  })));
}

const OWN = [
  "The ice cores don't prove that CO₂ alone drove the warming; they show it rose ~800 years later.",
  "Vostok's record ends near 420,000 years BP, and EPICA Dome C's reaches 800,000 years.",
  'Sea level rose 120 m (about 394 ft) after the Last Glacial Maximum. It kept rising! Did it stop?',
  'Warmer oceans hold less CO2, so they released it as they warmed — a feedback, not a trigger.',
  '“It’s settled,” the guide said: the bubbles were sealed 2,000–6,000 years after the snow fell.',
  'Temperatures at Dome Fuji were roughly 8–10 °C colder; the orbit\'s tilt (obliquity) swings over 41 kyr.',
];

function proseSentences(): string[] {
  const root = join(import.meta.dirname, '..', '..');
  const texts: string[] = [];
  for (const dir of ['docs', 'examples']) {
    for (const name of readdirSync(join(root, dir)).filter((n) => n.endsWith('.md')).sort()) {
      texts.push(readFileSync(join(root, dir, name), 'utf8'));
    }
  }
  const lines = texts.join('\n').split(/\n\s*\n/u).filter((p) => /^[A-Z]/u.test(p) && !p.includes('|'));
  return lines.flatMap((p) => p.replace(/\s+/gu, ' ').match(/[^.!?]+[.!?]+/gu) ?? []).map((s) => s.trim()).filter((s) => s.length > 20);
}

describe('termsOf, read from the document', () => {
  it('equals compromise\'s json reading on hand-written sentences', () => {
    for (const text of OWN) expect(termsOf(text)).toEqual(viaJson(text));
  });

  it('equals compromise\'s json reading on the prose of our docs and demo drafts', () => {
    const sentences = proseSentences().filter((_s, i) => i % 3 === 0).slice(0, 400);
    expect(sentences.length).toBeGreaterThan(100);
    for (const text of sentences) expect(termsOf(text)).toEqual(viaJson(text));
  });

  it('leaves compromise\'s own parse with its chunker', () => {
    termsOf('The thick ice sheets melted and sea level rose.');
    expect((compromise().world() as { hooks: string[] }).hooks).toContain('chunks');
    const doc = compromise()('The thick ice sheets melted.');
    expect((doc.docs[0] ?? []).some((t: { chunk?: string }) => t.chunk === 'Noun')).toBe(true);
  });
});
