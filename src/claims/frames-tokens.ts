/**
 * One sentence as tokens with offsets, roots from compromise, clause numbers and quotation state:
 * the common ground of sentence frames and reasoning detectors. compromise reads each distinct
 * sentence once (nlp/sentence-terms.ts).
 */
import type nlp from 'compromise';
import { termsOf } from '../nlp/sentence-terms.js';

/** One word or punctuation mark; `start`/`end` are UTF-16 indices into the sentence. */
export interface Token {
  /** Lower-case text; contractions are split ("can't" → "can" + "not"). */
  text: string;
  /** compromise's root (infinitive of a verb, singular of a noun), else the text. */
  root: string;
  start: number;
  end: number;
  isWord: boolean;
  /** Clause number: grows at ; : ( ) and at clause-break words such as "but" and "while". */
  clause: number;
  /** True inside quotation marks. */
  quoted: boolean;
}

/** A tokenized sentence. `words` are the indices of the word tokens, in order. */
export interface SentenceTokens {
  text: string;
  tokens: Token[];
  words: number[];
}

// Words keep inner apostrophes ("Earth's") and the subscript in "CO₂"; hyphens separate words.
const PIECE = /[\p{L}\p{N}₂]+(?:['’][\p{L}]+)*|[^\s\p{L}\p{N}-]/gu;
const CONTRACTION = /^(.+?)(n['’]t)$/u;
const CONTRACTION_BASE: Record<string, string> = { ca: 'can', wo: 'will', sha: 'shall', ai: 'is' };
/**
 * Negative contractions written without the apostrophe, as informal posts do ("cant", "doesnt"):
 * English's closed class of auxiliaries with "nt". "cant" and "wont" are also nouns ("as was his
 * wont"), so those two count only before another word.
 */
const BARE_CONTRACTION = /^(ca|could|would|should|must|do|does|did|is|are|was|were|has|have|had|wo|ai)(nt)$/u;
const BARE_AMBIGUOUS = new Set(['cant', 'wont']);
const CLAUSE_PUNCT = new Set([';', ':', '(', ')', '—', '–']);
const OPENERS = new Set(['“', '‘']);
const CLOSERS = new Set(['”', '’']);
const TOGGLES = new Set(['"', "'"]);
// "nothing but the orbit", "all but certain": here "but" means "except" and joins, not a new clause.
const EXCEPT_WORDS = new Set(['nothing', 'anything', 'everything', 'all', 'none']);

/**
 * Tokenizes a sentence. `clauseBreaks` are the words that start a new clause. Roots come from
 * compromise's reading of the sentence (nlp/sentence-terms.ts); `null` skips compromise, and roots
 * are then the words themselves.
 *
 *   tokenizeSentence("CO2 lagged, so it can't", ['but']).tokens.map((t) => t.text)
 *   → ['co2', 'lagged', ',', 'so', 'it', 'can', 'not']
 */
export function tokenizeSentence(text: string, clauseBreaks: readonly string[], nlpRoots: null | undefined = undefined): SentenceTokens {
  // Context sentences only need plain words (null); compromise reads the sentence being checked.
  const roots = nlpRoots === null ? new Map<number, string>() : rootsByOffset(text);
  const breaks = new Set(clauseBreaks);
  const tokens: Token[] = [];
  let clause = 0;
  let quoted = false;
  for (const m of text.matchAll(PIECE)) {
    const raw = m[0];
    const start = m.index;
    const isWord = /[\p{L}\p{N}]/u.test(raw);
    if (!isWord) {
      if (OPENERS.has(raw)) quoted = true;
      else if (CLOSERS.has(raw)) quoted = false;
      // "the panels' labels": a straight apostrophe right after a word, outside a quotation, is a
      // plural's possessive; a quotation opens after a space or a bracket, never inside a word's end.
      else if (TOGGLES.has(raw) && !(raw === "'" && !quoted && /\p{L}/u.test(text[start - 1] ?? ''))) quoted = !quoted;
      if (CLAUSE_PUNCT.has(raw)) clause += 1;
      tokens.push({ text: raw, root: raw, start, end: start + raw.length, isWord, clause, quoted });
      continue;
    }
    const lower = raw.toLowerCase();
    if (breaks.has(lower) && !(lower === 'but' && EXCEPT_WORDS.has(tokens.filter((t) => t.isWord).at(-1)?.text ?? ''))) clause += 1;
    const bare = BARE_CONTRACTION.exec(lower);
    const contraction = CONTRACTION.exec(lower) ?? (bare !== null && (!BARE_AMBIGUOUS.has(lower) || /^\s+\p{L}/u.test(text.slice(start + raw.length))) ? bare : null);
    if (contraction !== null && contraction[1] !== undefined && contraction[2] !== undefined) {
      const base = CONTRACTION_BASE[contraction[1]] ?? contraction[1];
      const cut = start + contraction[1].length;
      tokens.push({ text: base, root: base, start, end: cut, isWord, clause, quoted });
      tokens.push({ text: 'not', root: 'not', start: cut, end: start + raw.length, isWord, clause, quoted });
      continue;
    }
    if (lower === 'cannot') {
      tokens.push({ text: 'can', root: 'can', start, end: start + 3, isWord, clause, quoted });
      tokens.push({ text: 'not', root: 'not', start: start + 3, end: start + 6, isWord, clause, quoted });
      continue;
    }
    tokens.push({ text: lower, root: roots.get(start) ?? lower, start, end: start + raw.length, isWord, clause, quoted });
  }
  const words = tokens.flatMap((t, i) => (t.isWord ? [i] : []));
  return { text, tokens, words };
}

/** compromise's root of each term, keyed by the term's start offset in the sentence. */
function rootsByOffset(text: string): Map<number, string> {
  const roots = new Map<number, string>();
  for (const term of termsOf(text)) {
    if (term.root !== undefined && term.root.length > 0) roots.set(term.start, term.root.toLowerCase());
  }
  return roots;
}

/** A compromise document (the value `nlp(text)` returns). */
export type CompromiseView = ReturnType<typeof nlp>;

