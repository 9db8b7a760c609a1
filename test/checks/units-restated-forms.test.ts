import { describe, expect, it } from 'vitest';
import { checkUnits } from '../../src/checks/units.js';
import { parseQuantities } from '../../src/quantities/index.js';

/** Checks the last sentence with the ones before it as its paragraph. */
const flagged = (...sentences: string[]) => {
  const sentence = sentences[sentences.length - 1] as string;
  return checkUnits(sentence, parseQuantities(sentence), sentences.slice(0, -1)).map((f) => [f.ruleId, sentence.slice(f.start, f.end), f.correction]);
};

// Factors from NIST SP 811 (2008): 1 ft = 0.3048 m; a temperature interval of 1 °C = 1 K = 1.8 °F;
// 273.15 and 32 are added to readings only.
describe('a restatement framed by the unit it is given in ("which in kelvin terms is")', () => {
  it.each([
    // 8 °C as a difference is 8 K, not 281 K.
    ['The Skelda plateau was some 8 °C colder at the glacial peak, which in kelvin terms is a drop of about 281 K.', 'about 281 K', 'about 8 K'],
    // 5 °C is 9 °F as a difference.
    ['The lake warmed by 5 °C over the thaw, which in Fahrenheit comes to about 41 °F.', 'about 41 °F', 'about 9 °F'],
    // 200 m = 656 ft.
    ['The shelf edge lay 200 m below the modern shore, which in old survey units is roughly 60 ft.', 'roughly 60 ft', 'roughly 656 ft'],
  ])('%s flags %s', (sentence, text, correction) => {
    expect(flagged(sentence)).toEqual([[expect.stringMatching(/^unit\./u), text, correction]]);
  });

  it.each([
    'The Skelda plateau was some 8 °C colder at the glacial peak, which in kelvin terms is a drop of about 8 K.',
    'The shelf edge lay 200 m below the modern shore, which in old survey units is roughly 656 ft.',
    // A second measure in its own clause is no restatement.
    'The shelf edge lay 200 m below the modern shore, and the cliff in the old survey is roughly 60 ft.',
  ])('leaves alone: %s', (sentence) => {
    expect(flagged(sentence)).toEqual([]);
  });
});

describe('one comparison written twice in two units ("130 m lower than now, 430 feet below")', () => {
  it.each([
    // 90 m = 295 ft; 60 m = 197 ft.
    ['The glacial shoreline sat about 90 metres lower than today, roughly 30 feet below the harbour wall.', 'roughly 30 feet', 'roughly 295 feet'],
    ['In the stadial the lake stood 60 m higher than now, some 600 ft above the present beach.', 'some 600 ft', 'some 197 ft'],
  ])('%s flags %s', (sentence, text, correction) => {
    expect(flagged(sentence)).toEqual([['unit.length', text, correction]]);
  });

  it.each([
    'The glacial shoreline sat about 90 metres lower than today, roughly 295 feet below the harbour wall.',
    // Two comparisons of two things: the second is not followed by a comparative.
    'The glacial shoreline sat about 90 metres lower than today, while 30 feet of silt covered the bay.',
  ])('leaves alone: %s', (sentence) => {
    expect(flagged(sentence)).toEqual([]);
  });
});

describe('a comparison whose conversion alone closes the clause ("130 m lower, about 430 feet.")', () => {
  it.each([
    // 90 m = 295 ft (1 ft = 0.3048 m); the conversion run backwards gives 90 × 0.3048 = 27 ft.
    ['At the stadial peak the fjord lay about 90 metres lower, some 27 feet.', 'some 27 feet', 'some 295 feet'],
    // 250 m = 820 ft.
    ['The moraine crest sits 250 m higher than the outwash plain, roughly 76 ft; the lake fills the hollow.', 'roughly 76 ft', 'roughly 820 ft'],
    // A change of 5 °C is 9 °F; 41 °F adds the offset of a reading.
    ['In the stadial the valley ran 5 °C colder than now, about 41 °F.', 'about 41 °F', 'about 9 °F'],
  ])('%s flags %s', (sentence, text, correction) => {
    expect(flagged(sentence)).toEqual([[expect.stringMatching(/^unit\./u), text, correction]]);
  });

  it.each([
    'At the stadial peak the fjord lay about 90 metres lower, some 295 feet.',
    'In the stadial the valley ran 5 °C colder than now, about 9 °F.',
    // The second figure goes on to a clause of its own: another measure, not the first again.
    'At the stadial peak the fjord lay about 90 metres lower, some 27 feet of mud settling on its floor.',
  ])('leaves alone: %s', (sentence) => {
    expect(flagged(sentence)).toEqual([]);
  });
});

describe('a Fahrenheit figure that points back at a change ("that six-degree drop works out to")', () => {
  it.each([
    // 4 °C as a difference is 7.2 °F; 39 °F adds 32.
    [['The Brenner valley cooled by 4 °C in the stadial.', 'In Fahrenheit, that four-degree drop comes to about 39 °F.'], 'about 39 °F', 'about 7.2 °F'],
    [['Summers at the site were 7 °C cooler in the glacial.', 'For American readers this cooling works out to roughly 45 °F.'], 'roughly 45 °F', 'roughly 12.6 °F'],
  ] as [string[], string, string][])('%j flags %s', (sentences, text, correction) => {
    expect(flagged(...sentences)).toEqual([['unit.temperature-difference', text, correction]]);
  });

  it.each([
    [['The Brenner valley cooled by 4 °C in the stadial.', 'In Fahrenheit, that four-degree drop comes to about 7 °F.']],
    // A reading, not a change, after the change: the afternoon high in °F.
    [['The Brenner valley cooled by 4 °C in the stadial.', 'Last July the afternoon high there reached 75 °F.']],
  ] as [string[]][])('leaves alone: %j', (sentences) => {
    expect(flagged(...sentences)).toEqual([]);
  });
});

// 1% of the air = 10,000 ppm (by definition of the units, common practice); 1 ft = 0.3048 m (NIST
// SP 811, 2008).
describe('a restatement after what the first amount is of, or behind a hedge', () => {
  it.each([
    ['The bubbles trapped about 185 ppm of carbon dioxide, barely 0.185 percent of the air.', '0.185 percent', '0.0185 percent'],
    ['Some 125 metres of sea-level fall is roughly 1,250 feet.', 'roughly 1,250 feet', '410 feet'],
  ])('%s flags %s', (sentence, text, correction) => {
    const found = flagged(sentence);
    expect(found.map(([, t]) => t)).toEqual([text]);
    expect(String(found[0]?.[2])).toContain(correction.split(' ')[0] as string);
  });

  it('across sentences, behind a hedge: "That is barely 0.185 percent of the air."', () => {
    expect(flagged('The bubbles trapped about 185 ppm of carbon dioxide.', 'That is barely 0.185 percent of the air.').map(([id]) => id)).toEqual(['unit.percent-ppm']);
  });

  it.each([
    'The bubbles trapped about 185 ppm of carbon dioxide, barely 0.0185 percent of the air.',
    'Some 125 metres of sea-level fall is roughly 410 feet.',
    'The glacial air held 185 ppm of carbon dioxide, 0.35 ppm of methane.',
  ])('leaves alone: %s', (sentence) => {
    expect(flagged(sentence)).toEqual([]);
  });
});
