/**
 * A bare capital C after a number in a clause about temperature is a Celsius figure, as people post
 * it ("~6C colder", "warmed something like 8-10 C"): a comparative, warming word or noun of change
 * right after it, or a temperature word shortly before it (src/quantities/unit-table.ts, BARE_C;
 * common practice of chat and comment threads). With no such cue, and always in "14C" written
 * solid (radiocarbon), it is no unit. "deg F" is the abbreviated Fahrenheit degree. Sentences of
 * our own.
 */
import { describe, expect, it } from 'vitest';
import { parseQuantities } from '../../src/quantities/index.js';
import { checkUnits } from '../../src/checks/units.js';

describe('a bare C in a temperature clause', () => {
  it.each([
    ['the fjord was ~4C colder back then', '~4C', 4],
    ['lake temperatures dropped something like 3-5 C over the winter', 'something like 3-5 C', 4],
    ['honestly a 7C swing is massive for a valley', '7C', 7],
    ['the models put the cooling at around 2.5 C for that stadial', 'around 2.5 C', 2.5],
  ])('%s', (sentence, text, value) => {
    const [q] = parseQuantities(sentence);
    expect(q).toMatchObject({ text, statedUnit: 'degC', dimension: 'temperature-change', value });
  });
});

describe('a bare C with no temperature cue, or radiocarbon, is no unit', () => {
  it.each([
    ['we met at gate 4 C near the ferry'],
    ['14C dating of the warm layer gave a clear answer'],
    ['the 14C drop across the boundary is well known'],
    ['classes 9C and 10C went on the trip'],
  ])('%s', (sentence) => {
    expect(parseQuantities(sentence).filter((q) => q.statedUnit === 'degC')).toEqual([]);
  });
});

describe('"deg F" is a Fahrenheit degree', () => {
  it('reads the abbreviation', () => {
    const [q] = parseQuantities('the pass was ~9 deg F colder that winter');
    expect(q).toMatchObject({ text: '~9 deg F', statedUnit: 'degF', dimension: 'temperature-change' });
  });
});

// NIST SP 811 (2008), B.8 and B.9: a change of 1 °C is a change of 1.8 °F; 32 is added to readings only.
describe('a posted change in C restated in F with the offset of a reading', () => {
  it('flags 4C colder written as 39F colder', () => {
    const sentence = 'the fjord was 4C colder, thats like 39F colder for the americans';
    const flags = checkUnits(sentence, parseQuantities(sentence));
    expect(flags.map((f) => [f.ruleId, sentence.slice(f.start, f.end), f.correction])).toEqual([['unit.temperature-difference', 'like 39F', 'like 7.2F']]);
  });

  it('leaves 4C colder as 7F colder alone', () => {
    const sentence = 'the fjord was 4C colder, thats like 7F colder for the americans';
    expect(checkUnits(sentence, parseQuantities(sentence))).toEqual([]);
  });
});
