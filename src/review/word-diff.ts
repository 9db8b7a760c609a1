/**
 * A word-level diff of a claim's signed-off wording against its wording now, with every change
 * marked, for a reopened claim. Words are compared after copy-edits are folded away
 * (review/copy-edit), so a changed dash or spelling is not shown as a change; what is shown is the
 * words that changed the meaning.
 *
 *   markWordChanges('The core spans 420,000 years.', 'The core spans 800,000 years.')
 *     === 'The core spans [420,000 → 800,000] years.'
 *   markWordChanges('CO2 was a cause.', 'CO2 was not a cause.') === 'CO2 was [+ not] a cause.'
 */
import { canonicalWording } from './copy-edit.js';

/** One run of the diff: words in both, only in the old wording, or only in the new. */
export interface WordChange {
  kind: 'same' | 'removed' | 'added';
  words: string[];
}

/** The diff as runs, in order (a longest common subsequence over words). */
export function diffWords(before: string, after: string): WordChange[] {
  const a = wordsOf(before);
  const b = wordsOf(after);
  const ka = a.map(canonicalWording);
  const kb = b.map(canonicalWording);
  // lcs[i][j]: the longest common run of a[i..] and b[j..].
  const lcs = Array.from({ length: a.length + 1 }, () => new Array<number>(b.length + 1).fill(0));
  for (let i = a.length - 1; i >= 0; i -= 1) {
    for (let j = b.length - 1; j >= 0; j -= 1) {
      const row = lcs[i] as number[];
      row[j] = ka[i] === kb[j] ? (lcs[i + 1]?.[j + 1] ?? 0) + 1 : Math.max(lcs[i + 1]?.[j] ?? 0, row[j + 1] ?? 0);
    }
  }
  const runs: WordChange[] = [];
  const push = (kind: WordChange['kind'], word: string) => {
    const last = runs[runs.length - 1];
    if (last !== undefined && last.kind === kind) last.words.push(word);
    else runs.push({ kind, words: [word] });
  };
  let i = 0;
  let j = 0;
  while (i < a.length || j < b.length) {
    if (i < a.length && j < b.length && ka[i] === kb[j]) {
      push('same', b[j] as string);
      i += 1;
      j += 1;
    } else if (i < a.length && (j >= b.length || (lcs[i + 1]?.[j] ?? 0) >= (lcs[i]?.[j + 1] ?? 0))) {
      // Removals first, so a replacement reads old → new.
      push('removed', a[i] as string);
      i += 1;
    } else {
      push('added', b[j] as string);
      j += 1;
    }
  }
  return runs;
}

/**
 * The new wording with each change in brackets: `[old → new]` for a replacement, `[- old]` for
 * words taken out, `[+ new]` for words put in. Plain text, so it reads the same in a terminal,
 * a CI log and a checklist.
 */
export function markWordChanges(before: string, after: string): string {
  const runs = diffWords(before, after);
  const out: string[] = [];
  for (let k = 0; k < runs.length; k += 1) {
    const run = runs[k] as WordChange;
    const next = runs[k + 1];
    if (run.kind === 'same') out.push(run.words.join(' '));
    else if (run.kind === 'removed' && next?.kind === 'added') {
      out.push(`[${run.words.join(' ')} → ${next.words.join(' ')}]`);
      k += 1;
    } else out.push(`[${run.kind === 'removed' ? '-' : '+'} ${run.words.join(' ')}]`);
  }
  return out.join(' ');
}

/** Words split at white space; punctuation stays on its word, as a reader sees it. */
function wordsOf(text: string): string[] {
  return text.split(/\s+/u).filter((w) => w !== '');
}
