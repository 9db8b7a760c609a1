/**
 * Whose voice a block quote is, and a cause that a clause cannot do without, in wordings of our own.
 *
 * A block quote that holds a passage of its own (a reader's letter signed at the end, a comment, a
 * narrator's lines) is a voice of the draft, and its argument errors are flagged like any
 * utterance's; one sentence pulled out to be answered, or a reply that repeats words said earlier
 * in the draft, stays a quotation (a note). How letters pages, comment threads and audio-guide
 * scripts lay out their speakers is common practice of editing, not a sourced fact.
 *
 * The science behind the expected flags:
 * - Shakun et al. 2012 (Nature 484, 49-54, doi 10.1038/nature10915): CO2 amplified the deglacial
 *   warming that orbital changes began, and global temperature mostly followed CO2; so a lag does
 *   not rule CO2 out, the match of two curves proves no direction, and neither factor acted alone.
 * - Parrenin et al. 2013 (Science 339, 1060-1063, doi 10.1126/science.1226368): Antarctic
 *   temperature and CO2 rose within a few centuries of each other.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { checkText } from '../../src/engine.js';
import { loadPacks } from '../../src/rulepack/index.js';
import type { LoadedPacks } from '../../src/rulepack/types.js';

let packs: LoadedPacks;
beforeAll(async () => {
  packs = await loadPacks([]);
});

/** The logic rule ids raised as warnings or errors anywhere in the draft. */
const serious = async (text: string) =>
  (await checkText(text, { packs, format: 'markdown' })).flags.filter((f) => f.level !== 'note' && f.ruleId.startsWith('logic.')).map((f) => f.ruleId);

/** The levels of the logic flags, so a quotation shows as a note rather than vanishing. */
const levels = async (text: string) =>
  (await checkText(text, { packs, format: 'markdown' })).flags.filter((f) => f.ruleId.startsWith('logic.')).map((f) => f.level);

describe('a block quote that holds a passage of its own is a voice of the draft', () => {
  it.each([
    // a reader's letter, signed at the end
    ['## Letters\n\n> Dear editor, I have looked hard at the Vostok chart. The gas climbs after the warmth every time, so carbon dioxide cannot have caused the warming. — *Ottilie, Marsh End*\n\nThank you, Ottilie; the lag shows what started the warming.\n', 'logic.lag-rules-out-cause'],
    // a comment set out as a block quote, with its speaker's label
    ['Comments\n\n> **comment** (fen_walker): I read the thread twice. The orbit by itself ended the last ice age.\n', 'logic.single-cause'],
    // a narrator's lines in a gallery script
    ['**Stop 4** *(narrator: the curator)*\n\n> Look at the two lines on the wall. They rise and fall together for 800,000 years, which proves that CO2 sets the temperature.\n', 'logic.correlation-as-proof'],
  ])('%s', async (text, rule) => {
    expect(await serious(text)).toContain(rule);
  });

  it('keeps a passage of correct claims clean', async () => {
    const text = '> Dear editor, I have looked hard at the Vostok chart. The gas climbed within a few centuries of the warmth, and it then amplified the warming the orbit began. — *Ottilie, Marsh End*\n';
    expect(await serious(text)).toEqual([]);
  });
});

describe('a block quote that quotes stays a quotation (a note)', () => {
  it('one sentence pulled out to be answered', async () => {
    const text = '> The orbit by itself ended the last ice age.\n\nThat is the line we hear most, and it leaves out the CO2 that amplified the warming.\n';
    expect(await levels(text)).toEqual(['note']);
  });

  it('a reply that repeats the words of the post it answers, however long the quotation', async () => {
    const text = [
      'fen_walker · 2h',
      '',
      'The cores show the gas rising after the warmth. So carbon dioxide cannot have caused the warming, end of story.',
      '',
      'moss_lantern · 1h · replying to fen_walker',
      '',
      '> The cores show the gas rising after the warmth. So carbon dioxide cannot have caused the warming',
      '',
      'A lag shows what started the warming, not what amplified it.',
      '',
    ].join('\n');
    const flags = (await checkText(text, { packs, format: 'markdown' })).flags.filter((f) => f.ruleId === 'logic.lag-rules-out-cause');
    // The post itself (line 3) is flagged; the reply's quotation of it (line 7) is a note.
    expect(flags.map((f) => [f.span.start.line, f.level])).toEqual([
      [3, 'warning'],
      [7, 'note'],
    ]);
  });

  it('a passage in quotation marks or under a myth label', async () => {
    expect(await serious('> **Myth:** The orbit by itself ended the last ice age. It needed no help.\n')).toEqual([]);
    expect(await serious('> "The gas climbs after the warmth every time, so carbon dioxide cannot have caused the warming." That is what the leaflet said.\n')).toEqual([]);
  });
});

describe('a cause denied save for a thing named after it grants that thing a part', () => {
  it.each([
    'Orbital changes set it going, but CO2 is one of several amplifiers, and the glacial cooling cannot be explained without it.',
    'The size of the glacial cooling cannot be explained without carbon dioxide.',
    'The ice sheets would not have melted back so far but for the extra carbon dioxide.',
  ])('clean: %s', async (sentence) => {
    expect(await serious(sentence)).toEqual([]);
  });

  it.each([
    ['CO2 rose after the warming, so it cannot have caused the warming.', 'logic.lag-rules-out-cause'],
    ['The ice age could not have ended without the orbit starting it, so CO2 did nothing.', 'logic.single-cause'],
  ])('still flags: %s', async (sentence, rule) => {
    expect(await serious(sentence)).toContain(rule);
  });
});
