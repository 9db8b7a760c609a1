/**
 * A post's byline in a comment section, a forum or a thread (src/prose/byline.ts): a line of its own,
 * so the post starts on the next line; and a block quote that opens with one is a reply in its
 * writer's voice, checked like any other claim. Bylines and posts of our own; the shapes (name or
 * handle, a separator, an elapsed time, a date, a clock time, a count of posts or votes) are common
 * practice of comment and forum software.
 */
import { describe, expect, it } from 'vitest';
import { checkText } from '../../src/engine.js';
import { isByline } from '../../src/prose/byline.js';
import { splitSentences } from '../../src/prose/index.js';

describe('isByline', () => {
  it.each([
    'wintergreen_77 · 3h',
    '**Maud Pellew** · 40m',
    '@stonechat · 4 days ago · ♥ 9',
    'Ostler Finch — Feb 11, 2026',
    '> **quarry.dave** · Regular · 1,204 posts',
    '↳ @nightjar | 12 votes',
    'Tamsin R. · 07:45',
    'glenrothes · yesterday',
  ])('reads %s as a byline', (line) => expect(isByline(line)).toBe(true));

  it.each([
    // Headings and panels cut by a middle dot name no time and no count.
    'Panel 3 · Bubbles of old air',
    'Year 8 Science · Earth and Atmosphere',
    // A sentence with a separator in it is a sentence.
    'The core is 3,270 m long · and it took 8 years.',
    'Dome C holds about 800,000 years of ice',
    // A field list without a name in front.
    '3h · 4 replies and then some more words in a long line about the ice cores of Antarctica',
  ])('leaves %s alone', (line) => expect(isByline(line)).toBe(false));
});

describe('splitSentences: a byline is a line of its own', () => {
  it('cuts the post from the byline above it, with offsets', () => {
    const text = '@stonechat · 4 days ago · ♥ 9\nGlacial CO2 hovered near 190 ppm, give or take';
    const pieces = splitSentences(text, 0).map((s) => [s.text, s.start]);
    expect(pieces).toEqual([
      ['@stonechat · 4 days ago · ♥ 9', 0],
      ['Glacial CO2 hovered near 190 ppm, give or take', 30],
    ]);
  });

  it('keeps two lines of one sentence together when the first is no byline', () => {
    const text = 'The Vostok core reaches back\nsome 420,000 years.';
    expect(splitSentences(text, 0).map((s) => s.text)).toEqual([text]);
  });
});

describe('a block quote that opens with a byline is a reply, not a quotation', () => {
  // The Vostok record spans about 420,000 years (Petit et al. 1999, doi:10.1038/20859).
  const wrong = 'the Vostok record reaches back about 800,000 years.';
  const levelOf = async (markdown: string) => (await checkText(markdown, { path: 'thread.md' })).flags.find((f) => f.ruleId === 'value.vostok-record-span')?.level;

  it.each([
    `> **wintergreen_77** · 3h\n> Honestly ${wrong}`,
    `> @stonechat · 4 days ago · ♥ 9\n> Not to nitpick but ${wrong}`,
    `> Ostler Finch — Feb 11, 2026\n> If memory serves, ${wrong}`,
  ])('%s is flagged at full level', async (markdown) => expect(await levelOf(markdown)).toBe('error'));

  it('a block quote with no byline stays a quotation (a note)', async () => {
    expect(await levelOf(`> Honestly ${wrong}`)).toBe('note');
  });
});

describe('splitSentences: a byline that leads its post on one line, and a site letter before a full stop', () => {
  it.each([
    ['↳ @nightjar · 5 hours ago · ♥ 31: Glacial CO2 was near 185 ppm.', ['↳ @nightjar · 5 hours ago · ♥ 31:', 'Glacial CO2 was near 185 ppm.']],
    ['Tamsin R. · 07:45: The thaw took ages.', ['Tamsin R. · 07:45:', 'The thaw took ages.']],
    // Site names that end in a capital letter ("Dome C", "Site A") end a sentence before a word that names nobody.
    ['It goes deeper than Dome C. The ice there is older.', ['It goes deeper than Dome C.', 'The ice there is older.']],
    ['We cored Site B. It held 40,000 years.', ['We cored Site B.', 'It held 40,000 years.']],
  ])('%s', (text, expected) => expect(splitSentences(text, 0).map((s) => s.text)).toEqual(expected));

  it.each([
    // An initial before a surname, and a speaker label, stay as they were (common practice).
    ['The work of J. R. Petit set the record.'],
    ['ROSA: I asked C. Lorius about it.'],
    ['C. 1750 the air held 280 ppm.'],
  ])('keeps %s whole', (text) => expect(splitSentences(text, 0).map((s) => s.text)).toEqual([text]));
});

// Round 20: headers of threads in the shapes their software writes (common practice of comment,
// chat, mail and wiki software; names and posts are our own).
describe('isByline: wider headers of public threads', () => {
  it.each([
    '@heron_watch . 9:41 am', // a full stop with space around it as the separator
    '↪ @saltpan_sue · 5h', // a reply arrow before the handle
    'Puffin & Pine 🐧 @puffin_pine · 2h', // a display name with "&" and a pictograph
    'Orla_Geo  ·  12 Apr 2026 08:15', // a date and a clock time in one field
    '[Teodor M] 2 Nov, 7:05pm', // a bracketed name and its stamp with no separator
    'Fenwick.Ray  ·  4h  ↳ replying to moss_lamp', // a reply arrow as a separator
    '--Cairn_Walker (talk) 17:40, 9 June 2024 (UTC)', // a wiki signature
    '— Larkspur (talk) 08:02, 1 July 2024 (UTC)',
    'Ines Okafor (3 hours ago):', // a name and a stamp in brackets, before its post
  ])('reads %s as a byline', (line) => expect(isByline(line)).toBe(true));

  it.each([
    'Doors open 9:30 am', // a notice: its words are no name
    'Meeting at 10:30',
    'EPICA Dome C (Antarctica) 3 May 2025', // a date with no clock time and no separator
    'Vostok . 3,623 m', // a separator, but no time stamp after it
    'The thaw began about 18,000 years ago',
  ])('leaves %s alone', (line) => expect(isByline(line)).toBe(false));
});

describe('splitSentences: a thread header or signature is cut on both sides', () => {
  it('cuts a wiki signature line from the post under it', () => {
    const text = 'Tilt sets the beat. --Cairn_Walker (talk) 17:40, 9 June 2024 (UTC)\n--Larkspur (talk) 18:02, 9 June 2024 (UTC)\nthe co2 peak was near 280 ppm';
    const pieces = splitSentences(text, 0).map((s) => s.text);
    expect(pieces.at(-1)).toBe('the co2 peak was near 280 ppm');
  });

  it('cuts a byline from the unmarked line above it', () => {
    const text = 'the lag was a few centuries at most\n@heron_watch · 9:41 am\nglacial co2 sat near 190 ppm';
    expect(splitSentences(text, 0).map((s) => s.text)).toEqual([
      'the lag was a few centuries at most',
      '@heron_watch · 9:41 am',
      'glacial co2 sat near 190 ppm',
    ]);
  });
});
