/**
 * The two edges of a span of dates (src/claims/bind-edges.ts): in "from A to B" and "between A and
 * B" the first date is a start and the second an end, so the first never binds an event's end even
 * when an end is named elsewhere (in the sentence, or in the question the sentence answers); and a
 * date told with "starting", "beginning" or "ending" is that edge. Sentences of our own, through
 * the real parser, binder and check.
 *
 * Reference values: the Younger Dryas (Greenland Stadial 1) from about 12,900 to 11,700 years ago
 * (Rasmussen, S. O. et al. 2014, Quaternary Science Reviews 106, 14-28; Walker, M. et al. 2009,
 * J. Quaternary Science 24, 3-17); the last deglaciation from about 18,000 to 11,500 years ago
 * (Clark, P. U. et al. 2012, PNAS 109, E1134; Walker et al. 2009).
 */
import { describe, expect, it } from 'vitest';
import { judgeAt } from './judge-at.js';

describe('the head of a span of dates is a start, its tail an end', () => {
  it.each([
    // Rasmussen et al. 2014; Walker et al. 2009.
    ['The Younger Dryas chill ran from roughly 12,900 to 11,700 years ago.', 'roughly 12,900', 'younger-dryas-start', 'agrees'],
    ['The Younger Dryas chill ran from roughly 12,900 to 11,700 years ago.', '11,700 years ago', 'younger-dryas-end', 'agrees'],
    ['Greenland froze again in the Younger Dryas, from 12,900 years ago to 11,700 years ago.', '11,700 years ago', 'younger-dryas-end', 'agrees'],
    // The errors that must still be caught: a start too early, an end too late.
    ['The Younger Dryas chill ran from roughly 14,000 to 11,700 years ago.', 'roughly 14,000', 'younger-dryas-start', 'conflicts'],
    ['The Younger Dryas chill ran from roughly 12,900 to 10,000 years ago.', '10,000 years ago', 'younger-dryas-end', 'conflicts'],
    // Clark et al. 2012.
    ['The last deglaciation stretched from about 18,000 to about 8,000 years ago.', 'about 8,000 years ago', 'termination-1-end', 'conflicts'],
  ])('%s (%s)', (sentence, text, value, verdict) => {
    expect(judgeAt(sentence, text)).toEqual({ value, verdict });
  });
});

describe('an end named in the question before does not reach the head of the span', () => {
  it.each([
    // Rasmussen et al. 2014: 12,900 is the start of the Younger Dryas, not its end.
    ['Was the way out of the ice age smooth to the end?', 'No: the Younger Dryas set the north back into the cold from about 12,900 to 11,700 years ago.', 'about 12,900'],
    ['When did the cold finally end?', 'The Younger Dryas lasted from about 12,900 to 11,700 years ago.', 'about 12,900'],
    // Clark et al. 2012: 18,000 is when the deglaciation began.
    ['How long did the last ice age take to end?', 'The deglaciation took about 6,500 years, from about 18,000 to about 11,500 years ago.', 'about 18,000'],
  ])('%s / %s', (before, sentence, text) => {
    const { value } = judgeAt(sentence, text, before);
    expect(value.endsWith('-end')).toBe(false);
  });
});

describe('"starting", "beginning" and "ending" name the edge of the date they introduce', () => {
  it.each([
    // Rasmussen et al. 2014; Walker et al. 2009.
    ['Towards the end of the thaw came a cold relapse, the Younger Dryas, starting about 12,900 years ago.', 'about 12,900 years ago', 'younger-dryas-start', 'agrees'],
    ['Late in the thaw came a cold spell, the Younger Dryas, beginning some 14,500 years ago.', 'some 14,500 years ago', 'younger-dryas-start', 'conflicts'],
    ['The Younger Dryas, ending about 11,700 years ago, was the last cold snap of the glacial.', 'about 11,700 years ago', 'younger-dryas-end', 'agrees'],
    ['The Younger Dryas, ending about 10,000 years ago, was the last cold snap of the glacial.', 'about 10,000 years ago', 'younger-dryas-end', 'conflicts'],
  ])('%s', (sentence, text, value, verdict) => {
    expect(judgeAt(sentence, text)).toEqual({ value, verdict });
  });
});
