import { describe, expect, it } from 'vitest';
import { checkUnits } from '../../src/checks/units.js';
import { parseQuantities } from '../../src/quantities/index.js';

/** Checks the last sentence with the ones before it as its paragraph. */
const flagged = (...sentences: string[]) => {
  const sentence = sentences[sentences.length - 1] as string;
  return checkUnits(sentence, parseQuantities(sentence), sentences.slice(0, -1)).map((f) => [f.ruleId, sentence.slice(f.start, f.end), f.correction]);
};

// Factors from NIST SP 811 (2008), Appendix B.8: 1 ft = 0.3048 m, 1 mile = 1609.344 m exactly.
describe('a conversion spoken or posted with fillers between the pointing word and the amount', () => {
  it.each([
    // 450 m = 1,476 ft, not 4,500.
    [['The Hallow Ridge borehole stopped at about 450 metres.', "GUEST: So for the folks in the States, that's, uh, roughly 4,500 feet."], 'roughly 4,500 feet', 'roughly 1,480 feet'],
    // 2,000 m = 1.24 miles.
    [['The survey hole on the saddle bottomed out at roughly 2,000 m.', '[20:14] pikelet: so thats like 2 miles of ice lol'], 'like 2 miles', 'like 1.24 miles'],
    // 60 m = 197 ft; "what," is a filler of speech.
    [['The lake stood sixty metres higher.', "Sixty metres, that's, what, six hundred feet of water."], 'six hundred feet', '197 feet'],
  ])('%j flags %s', (sentences, text, correction) => {
    expect(flagged(...sentences)).toEqual([['unit.length', text, correction]]);
  });

  it.each([
    [['The Hallow Ridge borehole stopped at about 450 metres.', "GUEST: So for the folks in the States, that's, uh, roughly 1,480 feet."]],
    [['The survey hole on the saddle bottomed out at roughly 2,000 m.', '[20:14] pikelet: so thats like 1.2 miles of ice lol']],
    // A bare number of its own sentence is what "which is, um," points at, not the figure before.
    [['Each winter the lake rose by some eighty to a hundred metres.', 'In the dry years it sat at about 280, which is, um, 900 feet below the rim.']],
  ])('leaves alone: %j', (sentences) => {
    expect(flagged(...sentences)).toEqual([]);
  });

  it("reads past a post's counter before the pointing word", () => {
    // 900 m = 0.56 miles, not 90.
    expect(flagged('- Tue 3/ and the drill on the saddle went down ~900 m', "- Tue 4/ that's well over 90 miles of ice if you laid it out")).toEqual([
      ['unit.length', 'well over 90 miles', '0.559 miles'],
    ]);
  });
});

describe('a restatement that names the thing measured before the amount ("that is a column of ice roughly")', () => {
  it('flags a wrong conversion after a noun phrase', () => {
    // 1,200 m = 3,937 ft.
    expect(flagged('The Kessel core was drilled to about 1,200 metres.', 'For readers who think in feet, that is a column of ice roughly 390 feet long.')).toEqual([
      ['unit.length', 'roughly 390 feet', 'roughly 3,940 feet'],
    ]);
  });

  it('leaves a right one alone', () => {
    expect(flagged('The Kessel core was drilled to about 1,200 metres.', 'For readers who think in feet, that is a column of ice roughly 3,900 feet long.')).toEqual([]);
  });
});

describe('a sentence opening with "so" before a hedged amount in another unit', () => {
  it('reads it as the amount before, converted', () => {
    // 1,500 m = 0.93 miles.
    expect(flagged('[09:12] Ines: the guide said the Tarn core went down 1,500 m.', '[09:13] Bo: So about three miles of ice, wild.')).toEqual([['unit.length', 'about three miles', 'about 0.932 miles']]);
  });

  it.each([
    // No hedge: a "so" that draws a new figure, not the amount again.
    [['[09:12] Ines: the guide said the Tarn core went down 1,500 m.', '[09:13] Bo: So 3 miles from camp to the drill tent.']],
    [['[09:12] Ines: the guide said the Tarn core went down 1,500 m.', '[09:13] Bo: So about 0.9 miles of ice, wild.']],
  ])('leaves alone: %j', (sentences) => {
    expect(flagged(...sentences)).toEqual([]);
  });
});
