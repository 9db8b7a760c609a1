/**
 * A block quote that is a post, not a quotation: comment and forum software (and writers pasting
 * from it) put a reply's body in a block quote under its byline, either as the quote's own first
 * paragraph or on the line just above the quote (common practice of comment sections):
 *
 *   > **frostbyte_77** · 3 hours ago        **skeptic_sandra** · 2 days ago
 *   >                                       > Either CO2 drives temperature or ...
 *   > Sounds right. And 280 ppm is ...
 *
 * Such a block speaks in its writer's own voice. A quote nested deeper than a byline inside a quote
 * (someone else's words quoted inside the reply) stays a quotation.
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
