/**
 * A block quote that repeats words said earlier in the draft: a reply quoting the post it answers.
 *
 *   harlan_v: So CO2 can't be what's driving the warming now, end of story.
 *   MOkafor: > So CO2 can't be what's driving the warming now      ← repeats harlan_v: a quotation
 *            Two things, Harlan. ...
 *
 * A block quote that repeats nothing (a reader's letter, a comment, a speaker's line in a script)
 * is a voice of the draft and is read like any utterance (propositions/stance.ts).
 */
import type { ProseBlock } from '../types.js';

/** Fewest words a repeated stretch needs: shorter ones ("CO2 lagged") repeat by chance. */
const MIN_WORDS = 4;
/** Words of the block's opening compared: a reply quotes the start of what it answers, or a part of it. */
const MAX_WORDS = 12;

/** Lower-case words joined by single spaces, punctuation and markup dropped. */
function wordsOf(text: string): string[] {
  return text.toLowerCase().split(/[^\p{L}\p{N}'’]+/u).filter((w) => w.length > 0);
}

/** True when the opening words of `block` (a block quote) stand earlier in `text`, the draft's original text. */
export function repeatsEarlierText(text: string, block: ProseBlock): boolean {
  const opening = wordsOf(block.text).slice(0, MAX_WORDS);
  if (opening.length < MIN_WORDS) return false;
  const before = ` ${wordsOf(text.slice(0, block.offsets[0] ?? 0)).join(' ')} `;
  return before.includes(` ${opening.join(' ')} `);
}
