/**
 * The subject words added to the built-in pack, and the look-alikes they must not catch.
 * Terms: the LGM (Clark et al. 2009 place it at 26.5-19 ka; the words are common practice in
 * explainers), the end of the last ice age, and the orbital cycles (Hays et al. 1976).
 */
import { describe, expect, it } from 'vitest';
import { findTerms } from '../../src/claims/bind.js';
import { loadPacks } from '../../src/rulepack/index.js';

const packs = await loadPacks([]);

const CAUGHT: [sentence: string, term: string, words: string][] = [
  ['The last ice age reached its coldest point long ago.', 'lgm', 'last ice age reached its coldest point'],
  ['At the coldest point of the last ice age, ice covered Canada.', 'lgm', 'coldest point of the last ice age'],
  ['The last ice age peaked long ago.', 'lgm', 'last ice age peaked'],
  ['Ice sheets were largest at the glacial maximum.', 'lgm', 'the glacial maximum'],
  ['So the ice age finally ended, and the Holocene began.', 'ice-age-end', 'the ice age finally ended'],
  ['When the last ice age came to an end, seas rose.', 'ice-age-end', 'the last ice age came to an end'],
  ['The shape of the orbit changes slowly.', 'eccentricity', 'shape of the orbit'],
  ['The Earth wobbles like a top.', 'precession', 'wobbles'],
];

const NOT_CAUGHT: [sentence: string, term: string][] = [
  ['The penultimate glacial maximum came about 140,000 years ago.', 'lgm'],
  ['The penultimate ice age ended about 130,000 years ago.', 'ice-age-end'],
  ['Each ice age ended when northern summers grew strong.', 'ice-age-end'],
  ['The shape of the ice sheet changed.', 'eccentricity'],
];

describe('built-in subject words', () => {
  it.each(CAUGHT)('%s', (sentence, term, words) => {
    const start = sentence.indexOf(words);
    expect(findTerms(sentence, packs).get(term)).toEqual([[start, start + words.length]]);
  });
  it.each(NOT_CAUGHT)('not: %s', (sentence, term) => {
    expect(findTerms(sentence, packs).has(term)).toBe(false);
  });
});
