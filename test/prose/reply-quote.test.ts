/**
 * A block quote that is a post under its byline (comment sections, forums) speaks in its writer's
 * own voice; a block quote with no byline, or nested deeper than the reply it sits in, is still a
 * quotation. Posts of our own invention.
 *
 * Source of the figure: the EPICA Dome C record spans about 800,000 years (Jouzel et al. 2007,
 * Science 317, 793-796; Lüthi et al. 2008, Nature 453, 379-382).
 */
import { describe, expect, it } from 'vitest';
import { checkText } from '../../src/engine.js';
import { loadPacks } from '../../src/rulepack/index.js';
import { readMarkdownBlocks } from '../../src/source/markdown.js';
import { isReplyQuote } from '../../src/prose/reply-quote.js';

const packs = await loadPacks([]);
const SPAN = 'value.edc-record-span';

async function levelsOf(text: string): Promise<string[]> {
  const result = await checkText(text, { path: 'comments.md', packs });
  return result.flags.filter((f) => f.ruleId === SPAN).map((f) => f.level);
}

describe('a block quote under a byline is a reply', () => {
  it.each([
    // The byline is the quote's own first paragraph.
    'Great article.\n\n> **frost_owl** · 3 hours ago\n>\n> The Dome C core only covers about 400,000 years.\n',
    // The byline stands on the line just above the quote.
    'Great article.\n\n**skeptic_sam** · 2 days ago\n> The Dome C core only covers about 400,000 years.\n',
    // A second paragraph of the same reply.
    '> **frost_owl** · 3h\n>\n> Loved the photos.\n>\n> The Dome C core only covers about 400,000 years.\n',
    // A nested reply with its own byline.
    '> **frost_owl** · 3h\n>\n> Loved the photos.\n>\n> > **deb_h** · 2h\n> >\n> > The Dome C core only covers about 400,000 years.\n',
  ])('flags the figure: %j', async (text) => {
    expect(await levelsOf(text)).toContain('error');
  });

  it.each([
    // No byline: a quotation.
    'A reader wrote in:\n\n> The Dome C core only covers about 400,000 years.\n\nIt covers about 800,000.\n',
    // Someone else's words quoted inside a reply, one level deeper than its byline.
    '> **frost_owl** · 3h\n>\n> > The Dome C core only covers about 400,000 years.\n>\n> That is wrong, it is about 800,000.\n',
  ])('keeps a quotation a note: %j', async (text) => {
    const levels = await levelsOf(text);
    expect(levels).not.toContain('error');
  });

  it('stays clean with the right figure', async () => {
    expect(await levelsOf('**skeptic_sam** · 2 days ago\n> The Dome C core covers about 800,000 years.\n')).toEqual([]);
  });

  it('reads the structure: byline block before, same depth or one out', () => {
    const text = '**sam** · 2d\n> First line of the reply.\n\nplain paragraph\n\n> quoted without byline\n';
    const blocks = readMarkdownBlocks(text);
    const kinds = blocks.map((b, i) => [b.kind, isReplyQuote(text, blocks, i)]);
    expect(kinds).toEqual([['paragraph', false], ['blockquote', true], ['paragraph', false], ['blockquote', false]]);
  });
});
