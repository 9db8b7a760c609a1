/**
 * A sentence's words as the pack lexicon cuts them: letters and digits (and the subscript two of
 * CO₂), an apostrophe inside a word kept ("didn't", "Earth's"), hyphens and other marks separating
 * words; lower case, the typographic apostrophe as "'", each with its offsets in the text.
 */
export interface LexiconWord {
  text: string;
  start: number;
  end: number;
}

const WORD = /[\p{L}\p{N}₂]+(?:['’][\p{L}]+)*/gu;

export function lexiconWords(text: string): LexiconWord[] {
  return [...text.matchAll(WORD)].map((m) => ({ text: m[0].toLowerCase().replace(/’/gu, "'"), start: m.index, end: m.index + m[0].length }));
}
