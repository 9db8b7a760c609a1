/**
 * Digits and number words that count nothing the sentence measures, as people write in public: a
 * clock reading or a place in a recording ("at 6:30", "[21:17]"; ISO 8601 hh:mm[:ss]), the counter that
 * opens a post of a thread ("12/", "5/12"; common practice of threads), a multiple named by its
 * noun ("a factor of ten"; common practice of English) and the pronoun "one" after a determiner
 * ("a global one"; common practice of English grammar). Each is checked both ways: the correct
 * claim beside the label stays clean, and a wrong figure beside it is still flagged. Sentences of
 * our own.
 */
import { describe, expect, it } from 'vitest';
import { restoreElidedUnits } from '../../src/claims/elided-units.js';
import { checkText } from '../../src/index.js';
import { parseQuantities } from '../../src/quantities/index.js';

const texts = (sentence: string) => parseQuantities(sentence).map((q) => [q.text, q.dimension]);
const serious = async (text: string) => (await checkText(text)).flags.filter((f) => f.level !== 'note').map((f) => [f.ruleId, f.excerpt]);

describe('parseQuantities: labels are no quantities', () => {
  it.each([
    ['she shows the low point at 6:30 in the recording', []],
    ['[21:05] Marta: the bubbles held 185 ppm', [['185 ppm', 'concentration']]],
    ['around 1:02:45 he reads out 190 ppm', [['190 ppm', 'concentration']]],
    ['12/ Since then the air has gained 140 ppm', [['140 ppm', 'concentration']]],
    ['3/9 The core covers 800,000 years', [['800,000 years', 'duration']]],
    ['> 7/ cooling of 5 °C worldwide', [['5 °C', 'temperature-change']]],
  ])('%s', (sentence, expected) => expect(texts(sentence)).toEqual(expected));

  it.each([
    // A fraction, a ratio with one-digit parts and a decimal are numbers still.
    ['1/2 of the warming came after the CO2 rise', [['1', 'number'], ['2', 'number']]],
    ['the two records differ by 3:1 at most', [['3', 'number'], ['1', 'number']]],
    ['it rose 12.5 ppm then', [['12.5 ppm', 'concentration']]],
    // A counter only opens the sentence: "down 12/ 100" in the middle is nothing of the sort.
    ['a slope of 12/ 100 metres', [['12', 'number'], ['100 metres', 'length']]],
  ])('keeps %s', (sentence, expected) => expect(texts(sentence)).toEqual(expected));

  it('reads "a factor of ten" as a multiple', () => {
    expect(texts('the figure was off by a factor of ten')).toEqual([['factor of ten', 'ratio']]);
    expect(texts('a slip by a factor of 2.5, no more')).toEqual([['factor of 2.5', 'ratio']]);
  });
});

describe('restoreElidedUnits: the pronoun "one" takes no unit', () => {
  const units = (sentence: string) => restoreElidedUnits(sentence, parseQuantities(sentence)).map((q) => [q.text, q.dimension]);
  it.each([
    ['the cooling was 4 to 7 °C there, a local figure and not a global one', [['4 to 7 °C', 'temperature-change']]],
    ['Dome C reaches 800,000 years, the longest one', [['800,000 years', 'duration']]],
  ])('%s', (sentence, expected) => expect(units(sentence)).toEqual(expected));

  it('still gives a gapped count its unit', () => {
    // Vostok holds four glacial cycles (Petit et al. 1999, Nature 399, doi:10.1038/20859); "one" here counts.
    expect(units('Vostok covers four cycles, and the short core only one.')).toEqual([['four cycles', 'count'], ['one', 'count']]);
  });
});

describe('the whole engine: a label beside a claim', () => {
  // Lowest CO2 in the 800-kyr record about 172 ppm (Lüthi et al. 2008, Nature 453, doi:10.1038/nature06949).
  it('a recording time after the lowest CO2 figure flags nothing; a wrong figure still is', async () => {
    expect(await serious('The lowest CO2 in the whole EPICA Dome C record was about 172 ppm, she shows it at 4:15.')).toEqual([]);
    expect((await serious('The lowest CO2 in the whole EPICA Dome C record was about 120 ppm, she shows it at 4:15.')).length).toBeGreaterThan(0);
  });

  // East Antarctic LGM cooling 4-7 °C (Buizert et al. 2021, Science 372, doi:10.1126/science.abd2897).
  it('"a global one" after the East Antarctic cooling is no figure; a wrong cooling is still flagged', async () => {
    expect(await serious('Buizert and colleagues (2021) found the East Antarctic plateau cooled by 4 to 7 °C at the LGM, a regional value and not the global one.')).toEqual([]);
    expect(await serious('Buizert and colleagues (2021) found the East Antarctic plateau cooled by 12 to 14 °C at the LGM, a regional value and not the global one.')).toEqual([
      ['value.east-antarctic-lgm-cooling-buizert2021', '12 to 14 °C'],
    ]);
  });

  // Today's CO2 about 0.042 percent of the air: 420 ppm (NOAA GML, 1 ppm = 0.0001 percent).
  it('"a factor of ten" beside a percent of the air is no percent; a wrong share is still flagged', async () => {
    // A multiple names no measure of its own: it binds no value by its unit alone.
    expect(await serious('Carbon dioxide makes up 0.042 percent of the air today; the leaflet was off by a factor of ten.')).toEqual([]);
    expect((await serious('Carbon dioxide makes up 4.2 percent of the air today; the leaflet was off by a factor of ten.')).length).toBeGreaterThan(0);
    // Words that name the pace still bind a multiple: 100-300 times the deglacial mean rate (NOAA GML
    // growth rates against Monnin et al. 2001, Science 291, doi:10.1126/science.291.5501.112).
    expect(await serious('CO2 is rising a factor of 200 faster than at the end of the last ice age.')).toEqual([]);
    expect((await serious('CO2 is rising a factor of 2 faster than at the end of the last ice age.')).length).toBeGreaterThan(0);
  });
});
