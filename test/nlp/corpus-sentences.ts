/**
 * The sentences of our own prose, for tests that compare two readings of the NLP library: the
 * drafts of every tuning set (test/corpus/tuning-*, never a hold-out set), the pages of docs/, the
 * demo drafts of examples/ and some of the bench's generated topical prose. Paragraphs are split at
 * blank lines and sentences at . ! ? followed by a space (a rough split, as the engine's own is not
 * needed to compare readings of the same texts); each distinct sentence once.
 */
import { readFileSync, readdirSync } from 'node:fs';
import { join } from 'node:path';
// @ts-expect-error: the bench's corpus generator is plain JavaScript without types.
import { topicalProse } from '../../bench/corpus.js';

const ROOT = join(import.meta.dirname, '..', '..');

function draftsIn(dir: string): string[] {
  return readdirSync(join(ROOT, dir), { withFileTypes: true })
    .filter((e) => e.isFile() && /\.(?:md|txt)$/u.test(e.name))
    .map((e) => readFileSync(join(ROOT, dir, e.name), 'utf8'));
}

/** Every distinct sentence of our prose, plus `proseKb` KB of the bench's topical prose. */
export function corpusSentences(proseKb = 32): string[] {
  const sets = readdirSync(join(ROOT, 'test', 'corpus')).filter((d) => d.startsWith('tuning-')).sort();
  const texts = [...sets.flatMap((d) => draftsIn(join('test', 'corpus', d))), ...draftsIn('docs'), ...draftsIn('examples'), (topicalProse as (seed: number, bytes: number) => string)(7, proseKb * 1024)];
  const sentences = new Set<string>();
  for (const text of texts) {
    for (const paragraph of text.split(/\n\s*\n/u)) {
      for (const s of paragraph.replace(/\s+/gu, ' ').split(/(?<=[.!?])\s+/u)) {
        const sentence = s.trim();
        if (/\p{L}/u.test(sentence)) sentences.add(sentence);
      }
    }
  }
  return [...sentences];
}
