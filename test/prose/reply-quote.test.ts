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
import { isReplyQuote, quotesEarlierLine } from '../../src/prose/reply-quote.js';

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

describe('a plain-text line a reply quotes from the post it answers', () => {
  async function flagsOf(text: string): Promise<{ line: number; level: string }[]> {
    const result = await checkText(text, { path: 'thread.txt', packs });
    return result.flags.filter((f) => f.ruleId === SPAN).map((f) => ({ line: f.span.start.line, level: f.level }));
  }

  it('keeps the flag on the post and makes the quoted line a note', async () => {
    const thread = [
      'wren_k . 3h',
      'apparently the dome c ice only covers about 400,000 years of air',
      '',
      'pollard_j . 2h',
      '> the dome c ice only covers about 400,000 years of air',
      'nope, twice that, it goes back about 800,000',
    ].join('\n');
    expect(await flagsOf(thread)).toEqual([{ line: 2, level: 'error' }, { line: 5, level: 'note' }]);
  });

  it('reads quote marks before words said nowhere earlier as a voice of the draft (a forwarded message)', async () => {
    const mail = ['fwd from my cousin, thoughts?', '', '> From: Gil', '> the dome c ice only covers about 400,000 years of air', '> so the scientists are guessing'].join('\n');
    expect(await flagsOf(mail)).toEqual([{ line: 4, level: 'error' }]);
  });

  it('needs four words repeated: a short quote repeats by chance', () => {
    const text = 'not 800 years, more like 400\n\n> not 800\nwhy not?';
    expect(quotesEarlierLine(text, text.indexOf('> not'))).toBe(false);
    const longer = 'the core goes back 400,000 years\n\n>> the core goes back 400,000 years\nno it does not';
    expect(quotesEarlierLine(longer, longer.indexOf('>>'))).toBe(true);
    expect(quotesEarlierLine(longer, longer.indexOf('no it'))).toBe(false);
  });
});
