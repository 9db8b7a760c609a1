/**
 * An age counted in millennia or centuries ("fifty millennia ago", "117 centuries ago") is an age,
 * not a span (src/quantities/unit-table.ts). 1 millennium = 1,000 years, 1 century = 100 years
 * (common practice). Sentences of our own.
 */
import { describe, expect, it } from 'vitest';
import { parseQuantities } from '../../src/quantities/index.js';

describe('ages in long units', () => {
  it.each([
    ['The ice sheets stood at their largest some twenty-one millennia ago.', 'age', 21000],
    ['The cold snap ended about 117 centuries ago.', 'age', 11700],
    ['Farming began roughly ten millennia ago in the Fertile Crescent.', 'age', 10000],
  ])('%s', (sentence, dimension, value) => {
    const [q] = parseQuantities(sentence);
    expect(q).toMatchObject({ dimension, value });
  });

  it.each([
    ['The cold snap lasted twelve centuries.', 1200],
    ['The rise took some seven millennia.', 7000],
  ])('a span stays a span: %s', (sentence, value) => {
    const [q] = parseQuantities(sentence);
    expect(q).toMatchObject({ dimension: 'duration', value });
  });
});
