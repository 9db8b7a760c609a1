/**
 * The forms a pack's term phrase takes in informal writing, derived so that the pack lists each
 * phrase once:
 *
 *   "ice age"           → "ice-age"         a two- or three-word phrase written as a compound
 *                                           modifier ("ice-age CO2", "last-glacial-maximum levels")
 *   "glacial maximum"   → "glacial max"     a clipped word (max, min, temp, avg), as posts and notes
 *                                           write them ("that glacial max", "the temp record")
 *
 * Common practice of English spelling (compound modifiers are hyphenated before a noun) and of
 * informal writing (clippings). Only letters change: a variant matches on the same word boundaries.
 */

/** Clipped forms people write for a whole word (a closed class; each maps a whole word to its clipping). */
const CLIPPINGS: Record<string, string> = {
  maximum: 'max',
  minimum: 'min',
  temperature: 'temp',
  temperatures: 'temps',
  average: 'avg',
  averaged: 'avg',
  approximately: 'approx',
};

/**
 * Nouns that name the end of a span the way "end" does, in a phrase "the end of X" (a closed class;
 * common practice of English): "the close of the last ice age", "the tail end of the glacial".
 */
const END_NOUNS = ['close', 'closing', 'tail end', 'conclusion', 'finish'];

/** `words` and their derived variants, each phrase once, the originals first. */
export function termVariants(words: readonly string[]): string[] {
  const out = new Set(words);
  for (const phrase of words) {
    const parts = phrase.split(/\s+/u);
    if (parts.length >= 2 && parts.length <= 3 && parts.every((p) => /^\p{L}+$/u.test(p))) out.add(parts.join('-'));
    const clipped = parts.map((p) => CLIPPINGS[p.toLowerCase()] ?? p);
    if (clipped.some((p, i) => p !== parts[i])) out.add(clipped.join(' '));
    // "end of the last ice age" → "close of the last ice age", "conclusion of the last ice age".
    const end = parts.findIndex((p, i) => p.toLowerCase() === 'end' && parts[i + 1]?.toLowerCase() === 'of');
    if (end >= 0 && parts.length >= 3) for (const noun of END_NOUNS) out.add([...parts.slice(0, end), noun, ...parts.slice(end + 1)].join(' '));
  }
  return [...out];
}
