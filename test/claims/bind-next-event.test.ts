/**
 * The next event (src/claims/bind-next-event.ts): a clause opened by "before", "until" or "till"
 * right after a figure that a verb of lasting governs names what came next; its words neither bind
 * nor veto the figure. A figure that no verb of lasting governs keeps them ("warmed for ... before
 * CO2 began to rise" tells a lag). Sentences of our own; quantities built by hand (quantity-at.ts).
 */
import { describe, expect, it } from 'vitest';
import { nextEventClause } from '../../src/claims/bind-next-event.js';
import { loadPacks } from '../../src/rulepack/index.js';
import { boundIn, type Row, type Written } from './quantity-at.js';

const packs = await loadPacks([]);

const bound = (sentence: string, written: Written[]): string[] => boundIn(packs, sentence, written);

// The Younger Dryas lasted about 1,200 years, 12,900-11,700 years ago (Rasmussen et al. 2006,
// doi:10.1029/2005JD006079); the last deglaciation took about 7,000 years (Chowdhry Beeman et al. 2019,
// doi:10.5194/cp-15-913-2019).
const ROWS: Row[] = [
  // The warming word of the next event no longer vetoes the cold snap's length.
  ['The Younger Dryas persisted for some 2,000 years until the north warmed once more.', [['some 2,000 years', 'duration']], ['younger-dryas-duration']],
  // A phrasal verb of lasting, with a hedge between it and the figure.
  ['The Younger Dryas dragged on for perhaps 4,000 years before temperatures in Greenland leapt upward.', [['4,000 years', 'duration']], ['younger-dryas-duration']],
  // Without a verb of lasting the clause stays the figure's: "warming" still vetoes the cold snap's value.
  ['The Younger Dryas saw about 2,000 years before warming came back.', [['about 2,000 years', 'duration']], ['-']],
];

describe('bindQuantities: the next event after a lasting', () => {
  it.each(ROWS)('%s', (sentence, written, expected) => expect(bound(sentence, written)).toEqual(expected));
});

describe('nextEventClause', () => {
  it('spans the clause from the conjunction to its first mark', () => {
    const s = 'It lasted 900 years before the ice came back, then it ended.';
    const q = { start: s.indexOf('900'), end: s.indexOf('900') + '900 years'.length };
    expect(nextEventClause(s, q, [])).toEqual([s.indexOf('before'), s.indexOf(',')]);
  });
  it('reads no next event when the clause dates it with a figure of its own', () => {
    const s = 'It lasted 900 years until about 11,700 years ago.';
    const q = { start: s.indexOf('900'), end: s.indexOf('900') + '900 years'.length };
    const other = { start: s.indexOf('about'), end: s.indexOf('ago') + 3 };
    expect(nextEventClause(s, q, [other])).toBeUndefined();
  });
  it('reads none when words stand between the figure and the conjunction', () => {
    const s = 'It lasted 900 years or so before the ice came back.';
    const q = { start: s.indexOf('900'), end: s.indexOf('900') + '900 years'.length };
    expect(nextEventClause(s, q, [])).toBeUndefined();
  });
});
