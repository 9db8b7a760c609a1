/**
 * A scale letter written onto the digits, as people write figures in posts, chats and notes: "45k"
 * is 45 thousand, "1.2m years" 1.2 million years (common practice of informal writing). A capital
 * K alone stays kelvin and a lower-case m alone stays metres (NIST SP 811, unit symbols); "kyr" and
 * "Ma" stay units. Sentences of our own.
 */
import { describe, expect, it } from 'vitest';
import { restoreElidedUnits } from '../../src/claims/elided-units.js';
import { parseQuantities } from '../../src/quantities/index.js';

const read = (sentence: string) => parseQuantities(sentence).map((q) => [q.text, q.dimension, q.value]);

describe('parseQuantities: a scale letter on the digits', () => {
  it.each([
    ['the coldest bit was about 22k years ago', [['about 22k years ago', 'age', 22000]]],
    ['Talos Dome only gets you ~150k yrs', [['~150k yrs', 'duration', 150000]]],
    ['ice that is 2.7m years old', [['2.7m years', 'duration', 2.7e6]]],
    ['older than 1.5M years', [['1.5M years', 'duration', 1.5e6]]],
    ['obliquity 41k, precession 23k', [['41k', 'number', 41000], ['23k', 'number', 23000]]],
  ])('%s', (sentence, expected) => expect(read(sentence)).toEqual(expected));

  it.each([
    // Kelvin and metres keep their unit symbols (NIST SP 811).
    ['the cooling was 5K in Antarctica', [['5K', 'temperature-change', 5]]],
    ['sea level rose 10m after that', [['10m', 'length', 10]]],
    // Units that start with the same letters.
    ['Vostok reaches 420kyr back', [['420kyr', 'duration', 420000]]],
    ['the Pleistocene began 2.58 Ma ago', [['2.58 Ma ago', 'age', 2.58e6]]],
  ])('leaves %s to its unit', (sentence, expected) => expect(read(sentence)).toEqual(expected));
});

describe('restoreElidedUnits: a list whose members carry labels in brackets', () => {
  const units = (sentence: string) => restoreElidedUnits(sentence, parseQuantities(sentence)).map((q) => [q.text, q.dimension]);
  // Orbital periods about 100,000, 41,000 and 23,000 years (Hays, Imbrie & Shackleton 1976, doi:10.1126/science.194.4270.1121).
  it.each([
    ['Orbit beats: 100,000 years (stretch), 41,000 (lean) and 23,000 (wobble).', [['100,000 years', 'duration'], ['41,000', 'duration'], ['23,000', 'duration']]],
    ['cycles of ~100k yrs (shape), ~41k (tilt), ~23k (wobble)', [['~100k yrs', 'duration'], ['~41k', 'duration'], ['~23k', 'duration']]],
    ['CO2 was 280 ppm (pre-industrial) and 420 (now).', [['280 ppm', 'concentration'], ['420', 'concentration']]],
  ])('%s', (sentence, expected) => expect(units(sentence)).toEqual(expected));

  it('gives no unit to a number after a label when the number has no label of its own', () => {
    // "3" counts talks, not years: common practice (a list is parallel in its form).
    expect(units('The core spans 800,000 years (EPICA), and 3 talks covered it.')).toEqual([['800,000 years', 'duration'], ['3', 'number']]);
  });
});
