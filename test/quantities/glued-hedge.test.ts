/**
 * "-ish" written onto a number ("420ish ppm", "280-ish", "a 9-ish degree swing") is an approximation,
 * as people write one in posts and chats (common practice): the interval table's "about" row reads
 * it, and the unit after it is the number's own (src/quantities/find-atoms.ts, find-hedge.ts gluedHedge).
 * Sentences of our own.
 */
import { describe, expect, it } from 'vitest';
import { writtenInterval } from '../../src/quantities/written-interval.js';
import { parseQuantities } from '../../src/quantities/index.js';

describe('a hedge glued onto the digits', () => {
  it.each([
    ['the gauge by the harbour read 415ish ppm this spring', '415ish ppm', 'ppm', 415],
    ['the bore went down 3,000-ish metres before the drill stuck', '3,000-ish metres', 'm', 3000],
    ['the pond felt 5-ish degrees colder once the sun went', '5-ish degrees', 'degC', 5],
  ])('%s', (sentence, text, statedUnit, value) => {
    const [q] = parseQuantities(sentence);
    expect(q).toMatchObject({ text, statedUnit, value, hedge: '-ish' });
  });

  it('widens the figure as "about" does, and the written figure drops the hedge again', () => {
    const [ish] = parseQuantities('the bay sat at 350ish ppm');
    const [about] = parseQuantities('the bay sat at about 350 ppm');
    expect([ish?.low, ish?.high]).toEqual([about?.low, about?.high]);
    expect(writtenInterval(ish as NonNullable<typeof ish>)).toMatchObject({ low: 345, high: 355 });
  });

  it('reads a bare number with the suffix, which a neighbouring unit or term may complete later', () => {
    expect(parseQuantities('the reading was 212ish by noon')[0]).toMatchObject({ text: '212ish', value: 212, hedge: '-ish' });
  });

  it.each(['the fish were biggish this year', 'a 12-ishy word is no number hedge'])('%s: no glued hedge', (sentence) => {
    expect(parseQuantities(sentence).filter((q) => q.hedge === '-ish')).toEqual([]);
  });
});
