/**
 * A period's course told with an adverb between the period and its verb ("the last ice age only
 * finally ended", "the last glacial eventually drew to a close", "was at its very worst"): the
 * description still names the event (lexicon `time-parts.course-adverb`, `peak-verb`;
 * src/claims/bind-descriptions.ts). Sentences of our own.
 *
 * Reference values: the last deglaciation ended about 11,700-11,000 years ago (Walker, M. et al.
 * 2009, J. Quaternary Sci. 24, 3-17, doi:10.1002/jqs.1227; Chowdhry Beeman et al. 2019, Clim. Past
 * 15, 913-926); the Last Glacial Maximum about 26,500-19,000 years ago (Clark, P. U. et al. 2009,
 * Science 325, 710-714, doi:10.1126/science.1172873).
 */
import { describe, expect, it } from 'vitest';
import { judgeAt } from './judge-at.js';

describe('an adverb between a period and the verb of its course', () => {
  it.each([
    ['The last ice age only finally ended about 5,000 years ago.', 'about 5,000 years ago', 'termination-1-end', 'conflicts'],
    ['The last glacial eventually drew to a close around 4,000 years ago.', 'around 4,000 years ago', 'termination-1-end', 'conflicts'],
    ['The last ice age finally ended about 11,500 years ago.', 'about 11,500 years ago', 'termination-1-end', 'agrees'],
    ['For a timeline, the last ice age was at its very worst about 50,000 years ago.', 'about 50,000 years ago', 'lgm-chronozone', 'conflicts'],
    ['The last ice age was at its harshest roughly 21,000 years ago.', 'roughly 21,000 years ago', 'lgm-chronozone', 'agrees'],
  ])('%s', (sentence, text, value, verdict) => {
    expect(judgeAt(sentence, text)).toEqual({ value, verdict });
  });
});
