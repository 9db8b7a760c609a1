/**
 * A description with a count of one between its determiner and its kind's noun ("that one core",
 * "this single record", "that lone core") refers back as "that core" does (lexicon
 * `back-references.modifiers`; src/claims/back-reference.ts). Sentences of our own.
 *
 * Reference values: EPICA Dome C covers eight glacial cycles (EPICA community members 2004, Nature
 * 429, 623-628, doi:10.1038/nature02599); Vostok four (Petit, J. R. et al. 1999, Nature 399,
 * 429-436, doi:10.1038/20859).
 */
import { describe, expect, it } from 'vitest';
import { judgeAt } from './judge-at.js';

describe('a count of one inside a description of a kind', () => {
  it.each([
    ['That one core spans four complete glacial cycles.', 'four complete glacial cycles', 'The team drilled at Dome C for eight seasons.', 'edc-glacial-cycles', 'conflicts'],
    ['That single core holds eight glacial cycles.', 'eight glacial cycles', 'The drill at Vostok stopped above the lake.', 'vostok-glacial-cycles', 'conflicts'],
    ['This lone core records six glacial cycles.', 'six glacial cycles', 'The EPICA team worked at Dome C.', 'edc-glacial-cycles', 'conflicts'],
    // Correct look-alikes stay clean (EPICA 2004; Petit et al. 1999).
    ['That one core spans eight complete glacial cycles.', 'eight complete glacial cycles', 'The team drilled at Dome C for eight seasons.', 'edc-glacial-cycles', 'agrees'],
    ['That single core holds four glacial cycles.', 'four glacial cycles', 'The drill at Vostok stopped above the lake.', 'vostok-glacial-cycles', 'agrees'],
  ])('%s', (sentence, text, before, value, verdict) => {
    expect(judgeAt(sentence, text, before)).toEqual({ value, verdict });
  });
});
