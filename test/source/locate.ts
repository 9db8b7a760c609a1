import type { Draft, Point } from '../../src/types.js';
import { blockRange, createLineIndex } from '../../src/source/index.js';

/** Where a word found in a draft's prose blocks sits in the original file. */
export interface Found {
  block: number;
  start: Point;
  end: Point;
  /** The original text of the range, markup inside it included. */
  original: string;
}

/**
 * Finds the `nth` (0-based) occurrence of `word` in the draft's block texts, in block order, and
 * maps it back to the original file through the block offsets and the line index, as the engine
 * does. Throws when the word is not in the prose, so a test cannot pass on a missing word.
 */
export function locate(draft: Draft, word: string, nth = 0): Found {
  const index = createLineIndex(draft.text);
  let seen = 0;
  for (const [blockIndex, block] of draft.blocks.entries()) {
    for (let at = block.text.indexOf(word); at >= 0; at = block.text.indexOf(word, at + 1)) {
      if (seen === nth) {
        const range = blockRange(draft.text, block, at, at + word.length);
        const span = index.toSpan(range.start, range.end);
        return { block: blockIndex, ...span, original: draft.text.slice(range.start, range.end) };
      }
      seen += 1;
    }
  }
  throw new Error(`"${word}" (occurrence ${nth}) is not in the prose: ${JSON.stringify(draft.blocks.map((b) => b.text))}`);
}

/** Every block text of a draft, for asserting what is (and is not) prose. */
export function proseOf(draft: Draft): string[] {
  return draft.blocks.map((block) => block.text);
}
