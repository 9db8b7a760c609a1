/**
 * Formulas written out with brackets or a natural logarithm (src/checks/arithmetic-formulas.ts).
 * Every sentence is written for this test. The forcing expression ΔF = 5.35 ln(C/C0) W/m² is the
 * simplified fit of Myhre et al. (1998), Geophysical Research Letters 25, 2715; the sums are
 * checkable by hand (common practice): ln 2 = 0.693, so 5.35 × ln 2 = 3.71; ln(300/200) = ln 1.5 =
 * 0.405, so 5.35 × ln 1.5 = 2.17; ln(270/180) = ln 1.5 as well; (300 − 200) / 200 = 0.5;
 * (260 − 200) / 200 = 0.3; 4 × (12 + 3) = 60.
 */
import { describe, expect, it } from 'vitest';
import { writtenFormulas } from '../../src/checks/arithmetic-formulas.js';
import { parseQuantities } from '../../src/quantities/index.js';
import { flagged } from './arithmetic-at.js';

const read = (text: string) => writtenFormulas(text, parseQuantities(text)).map((f) => [f.stated.text, Number(f.computed.value.toFixed(3)), f.measures]);

describe('a formula and its stated result', () => {
  it.each([
    ['a logarithm with a sign of the result', 'A doubling gives 5.35 × ln(2) ≈ 4.2 W/m² at the top of the air.', '≈ 4.2', '≈ 3.7'],
    ['a quotient inside the logarithm', 'From 200 to 300 ppm the push is 5.35 × ln(300/200) ≈ 3.2 W/m².', '≈ 3.2', '≈ 2.2'],
    ['a multiplication sign written as x', 'Using 5.35 x ln(1.5), a rise by half adds about 3.1 W/m² of forcing.', 'about 3.1', 'about 2.2'],
    ['the logarithm in words', 'Take 5.35 times the natural log of 270 over 180, and that comes out at about 1.4 watts per square metre.', 'about 1.4', 'about 2.2'],
    ['a coefficient written beside its function', 'Between the two levels the forcing, 5.35 ln(270/180), comes to about 3.3 W/m².', 'about 3.3', 'about 2.2'],
    ['a relative change worked in brackets', 'Worked: (300 − 200) / 200 ≈ 0.25 of the starting level.', '≈ 0.25', '≈ 0.5'],
    ['the last step of a chain', 'The push is 5.35 × ln(300/200) = 5.35 × 0.405 ≈ 3.2 W/m².', '≈ 3.2', '≈ 2.2'],
    ['a bracketed sum multiplied', 'Four cores of (12 + 3) metres each make 4 × (12 + 3) = 45 metres of ice in all.', '45 metres', '60 metres'],
  ])('%s', (_why, sentence, words, correction) => {
    expect(flagged(sentence)).toEqual([['arith.change', words, correction]]);
  });

  it.each([
    ['right, with a sign of the result', 'A doubling gives 5.35 × ln(2) ≈ 3.7 W/m² at the top of the air.'],
    ['right, a quotient, rounded', 'From 200 to 300 ppm the push is 5.35 × ln(300/200) ≈ 2.2 W/m².'],
    ['right, a whole number', 'From 200 to 300 ppm the push is 5.35 × ln(300/200), about 2 W/m².'],
    ['right, in words', 'Take 5.35 times the natural log of 270 over 180, and that comes out at about 2.2 watts per square metre.'],
    ['right, a chain', 'The push is 5.35 × ln(300/200) = 5.35 × 0.405 ≈ 2.2 W/m².'],
    ['right, a fraction given as a percentage', 'Worked: (260 − 200) / 200 = 30% above the starting level.'],
    ['symbols make no expression', 'The fit is 5.35 ln(C/C0) W/m², which gives about 3.7 W/m² for a doubling.'],
    ['a plain log, of either base, is not read', 'The fit is 5.35 × log(2) ≈ 3.7 W/m² for a doubling.'],
    ['a range of years is no subtraction', 'The warm spell (1750–2019) saw 140 ppm added.'],
    ['a bracket with words is no expression', 'CO2 rose (from 190 to 280 ppm) over 7,000 years, about 0.013 ppm a year.'],
    ['a figure after a full stop is no result', 'The push is 5.35 × ln(300/200). About 40 models agree.'],
  ])('leaves alone: %s', (_why, sentence) => {
    expect(flagged(sentence)).toEqual([]);
  });

  it('names the expression it worked, and gives the exact value', () => {
    expect(read('Here 5.35 × ln(2) ≈ 4.2 W/m².')).toEqual([['≈ 4.2', 3.708, '5.35 × ln(2)']]);
    expect(read('Worked: (300 − 200) / 200 ≈ 0.25.')).toEqual([['≈ 0.25', 0.5, '(300 − 200) / 200']]);
  });
});
