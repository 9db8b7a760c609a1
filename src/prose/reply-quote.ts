/**
 * Whose voice a block quote speaks in. Comment and forum software (and writers pasting from it) put a
 * reply's body in a block quote under its byline, either as the quote's own first paragraph or on the
 * line just above the quote (common practice of comment sections); a reader's letter, a comment or a
 * speaker's lines in a script stand in a block quote as a passage of their own. Both are voices of
 * the draft, read like any utterance (propositions/stance.ts):
 *
 *   > **frostbyte_77** · 3 hours ago        **skeptic_sandra** · 2 days ago
 *   >                                       > Either CO2 drives temperature or ...
 *   > Sounds right. And 280 ppm is ...
 *
 * A block quote that repeats words said earlier in the draft quotes them (a reply quoting the post it
 * answers), whatever stands above it; so does a block quote of one sentence pulled out to be
 * answered, and a quote nested deeper than a byline inside a quote (someone else's words inside the
 * reply):
 *
 *   harlan_v: So CO2 can't be what's driving the warming now, end of story.
 *   MOkafor: > So CO2 can't be what's driving the warming now      ← repeats harlan_v: a quotation
 */
import type { ProseBlock } from '../types.js';
import { isByline } from './byline.js';

/** The number of block-quote marks that open the line where `offset` stands in `text`. */
function quoteDepth(text: string, offset: number): number {
  const lineStart = text.lastIndexOf('\n', offset - 1) + 1;
  const prefix = /^[ \t>]*/u.exec(text.slice(lineStart, offset))?.[0] ?? '';
  return prefix.split('>').length - 1;
}

/** Only blank lines and block-quote marks stand in `text` between `from` and `to`. */
function adjacent(text: string, from: number, to: number): boolean {
  return from <= to && /^[\s>]*$/u.test(text.slice(from, to));
}

/** True when block `index` of `blocks` is a block quote that a post's byline opens or heads. */
export function isReplyQuote(text: string, blocks: readonly ProseBlock[], index: number): boolean {
  const block = blocks[index];
  if (block?.kind !== 'blockquote') return false;
  const depth = quoteDepth(text, block.offsets[0] ?? 0);
  let start = block.offsets[0] ?? 0;
  for (let k = index - 1; k >= 0; k--) {
    const before = blocks[k];
    if (before === undefined) return false;
    const end = before.offsets.at(-1) ?? 0;
    if (!adjacent(text, end, start)) return false;
    const at = quoteDepth(text, before.offsets[0] ?? 0);
    // A byline at the quote's own depth opens it; one in plain text just above a first-level quote
    // heads it. Inside a reply, a deeper quote is someone else's words.
    if (isByline(before.text) && !before.text.includes('\n')) return at === depth || (at === 0 && depth === 1);
    // Another paragraph of the same reply: read on up to its byline.
    if (before.kind !== 'blockquote' || at !== depth) return false;
    start = before.offsets[0] ?? 0;
  }
  return false;
}

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

/** The reply-quote marks that open a line of plain text ("> ", ">> "), after any indent. */
const QUOTE_MARKS = /^[ \t]*(?:>[ \t]*)+/u;

/**
 * True when the line of `text` where `at` stands, in a plain-text draft, is a line a reply quotes: it
 * opens with the quote marks mail and forum software put before quoted words ("> so the core goes
 * back 800,000 years"), and the words after them stand earlier in the draft, where the post it
 * answers said them. Quote marks before words said nowhere earlier set a post under another or
 * forward a message: those words are a voice of the draft.
 *
 *   dave.k: so the vostok core goes back like 800,000 yrs, which is nuts
 *   tamsin_w: > so the vostok core goes back like 800,000 yrs      ← repeats dave.k: a quotation
 */
export function quotesEarlierLine(text: string, at: number): boolean {
  const lineStart = text.lastIndexOf('\n', at - 1) + 1;
  const lineEnd = text.indexOf('\n', at);
  const line = text.slice(lineStart, lineEnd < 0 ? text.length : lineEnd);
  const marks = QUOTE_MARKS.exec(line);
  if (marks === null) return false;
  const opening = wordsOf(line.slice(marks[0].length)).slice(0, MAX_WORDS);
  if (opening.length < MIN_WORDS) return false;
  const before = ` ${wordsOf(text.slice(0, lineStart)).join(' ')} `;
  return before.includes(` ${opening.join(' ')} `);
}

/**
 * True when block `index` of `blocks`, a block quote of `sentences` sentences, speaks in a voice of the
 * draft: it repeats nothing said earlier, and a post's byline opens or heads it or it holds a passage
 * of two sentences or more.
 */
export function isVoicedQuote(text: string, blocks: readonly ProseBlock[], index: number, sentences: number): boolean {
  const block = blocks[index];
  if (block?.kind !== 'blockquote' || repeatsEarlierText(text, block)) return false;
  return sentences >= 2 || isReplyQuote(text, blocks, index);
}
