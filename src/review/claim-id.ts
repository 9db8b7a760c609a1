import { createHash } from 'node:crypto';

/**
 * The stable id of a claim: a short hash of its file and its wording with white space folded and
 * markup already removed. Moving the sentence or reflowing its lines keeps the id; changing a number
 * or a word changes it. The same sentence twice in one file gets `-2`, `-3`... by order of appearance.
 *
 *   claimIdOf('notes/vostok.md', 'Vostok   spans\n420,000 years.') === claimIdOf('notes/vostok.md', 'Vostok spans 420,000 years.')
 */
export function claimIdOf(file: string, text: string, occurrence = 1): string {
  const folded = foldClaimText(text);
  const hash = createHash('sha256').update(`${file}\u0000${folded}`).digest('hex').slice(0, 10);
  return occurrence > 1 ? `c${hash}-${occurrence}` : `c${hash}`;
}

/** The wording a claim id is computed from: white space folded to single spaces, ends trimmed. */
export function foldClaimText(text: string): string {
  return text.replace(/\s+/gu, ' ').trim();
}
