/**
 * Changes the arithmetic reader ties to the levels before them (src/checks/arithmetic-reader:
 * roles.ts LOOSE_HEDGES, word-classes.ts links and back references): a loose hedge between a
 * change word and its figure ("went up by something like 120 ppm"), "thats" written without its
 * apostrophe, and "from there" pointing back to the level before.
 * Every sentence is written for this test; the cores are invented. Levels: about 185-190 ppm at
 * glacial maxima and about 275-280 ppm in interglacials (Lüthi et al. 2008, Nature 453). Sums
 * (common practice): 275 − 185 = 90.
 */
import { describe, expect, it } from 'vitest';
import { flagged } from './arithmetic-at.js';

describe('a loose hedge between a change word and its figure', () => {
  it('"went up by something like" keeps the figure a change', () => {
    // "something like" is a hedge of the figure (as "about" is), so it stands in the words and the correction.
    expect(flagged('In the coldest stretch the Tarn core holds close to 185 ppm.', 'By the Holocene it was about 275, so over the thaw it went up by something like 120 ppm.')).toEqual([['arith.change', 'something like 120 ppm', 'something like 90 ppm']]);
  });

  it('a right change is left alone', () => {
    expect(flagged('In the coldest stretch the Tarn core holds close to 185 ppm.', 'By the Holocene it was about 275, so over the thaw it went up by something like 90 ppm.')).toEqual([]);
  });
});

describe('words that tie a change to the levels before it', () => {
  it('"thats" without its apostrophe is a link', () => {
    expect(flagged('ok so 185 to 275 thats +120 ppm')).toEqual([['arith.change', '+120 ppm', '90 ppm']]);
  });

  it('"from there" points back to the level of the sentence before', () => {
    expect(flagged('In the coldest stretch the gas stood near 185 ppm.', 'From there to the Holocene level of about 275 ppm was a climb of some 50 ppm.')).toEqual([['arith.change', 'some 50 ppm', 'some 90 ppm']]);
  });

  it('a sentence that does not point back leaves the change alone', () => {
    expect(flagged('In the coldest stretch the gas stood near 185 ppm.', 'Across the Holocene the lake level of the basin saw a climb of some 50 ppm.')).toEqual([]);
  });
});
