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
