import type { ProseBlock } from '../types.js';
import { isEscape } from './block-text.js';
import { decodeReference, matchReference } from './character-reference.js';

/**
 * The original UTF-16 range `[start, end)` of the block text `block.text[start..end)`: it starts at
 * the first character and ends just past the last one, so closing markup after a word is left out
 * (`offsets[end]` would reach past it). `original` is the draft's full text.
 *
 *     // original 'The **EPICA** core', block text 'The EPICA core'
 *     blockRange(original, block, 4, 9)  // { start: 6, end: 11 }: "EPICA" without the `**`
 */
export function blockRange(original: string, block: ProseBlock, start: number, end: number): { start: number; end: number } {
  const from = block.offsets[start] ?? block.offsets[block.offsets.length - 1] ?? 0;
  if (end <= start) return { start: from, end: from };
  const at = block.offsets[end - 1] ?? from;
  return { start: from, end: Math.max(from, at + originalWidth(original, at, block.text[end - 1] ?? '')) };
}

/** How many original units the block character `unit` found at `at` stands for. */
function originalWidth(original: string, at: number, unit: string): number {
  // A decoded character reference (`&amp;` → `&`) stands for the whole reference.
  const reference = original[at] === '&' ? matchReference(original, at) : undefined;
  if (reference !== undefined && decodeReference(reference) !== reference) return reference.length;
  // A backslash escape (`\*` → `*`) stands for both halves.
  if (isEscape(original, at) && original[at + 1] === unit) return 2;
  // A line end normalised to `\n` may stand for `\r\n`.
  if (unit === '\n' && original[at] === '\r' && original[at + 1] === '\n') return 2;
  return 1;
}
