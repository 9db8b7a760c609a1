/**
 * The subject words stay names of things (DESIGN, Performance by design: a draft is on topic because
 * it names a subject, never a generic word). The subjects added so that every reference value can be
 * reached (reach.test.ts) must neither make generic words subjects nor put the bench's off-topic docs
 * pages on topic.
 */
import { describe, expect, it } from 'vitest';
import { namesSubject, passOver } from '../../src/engine.js';
import { loadPacks } from '../../src/rulepack/index.js';
// @ts-expect-error the bench is plain JavaScript without types
import { docsPage } from '../../bench/corpus.js';

const packs = await loadPacks([]);

describe('generic words are no subjects', () => {
  it.each([
    'It started in 1998.',
    'Today the rota starts at nine.',
    'The temperature of the storage room is 19 °C.',
    'Sales rose 12 percent on the record weekend.',
    'The hotel stands 1,200 metres above sea level.',
    'Sea level rise is a topic for the next meeting.',
    'The lowest bid reached its lowest point on Friday.',
    'Our deepest thanks to the 40 volunteers, and to the sensitivity readers.',
    'The glacial pace of the permit office cost us 3 weeks.',
    'The pulse of the city slowed in August.',
  ])('%s', (text) => {
    expect(namesSubject(text, packs)).toBe(false);
  });
});

describe('the subjects added for the reference values name their thing, in any form', () => {
  it.each([
    'The Holocene began about 11,700 years ago.',
    'Equilibrium climate sensitivity is likely 2.5 to 4 °C.',
    'The Mid-Pleistocene Transition changed the rhythm.',
    'Meltwater pulse 1A raised the sea quickly.',
    'Meltwater pulses came in bursts.',
    'The Eemian was warmer than today.',
    'During MIS 11 the interglacial lasted long.',
    'The glacial lowstand exposed the shelf.',
    'Sea level reached its lowest point then.',
    'Sea levels were at their lowest then.',
    'The ice-age globe was colder.',
    'In glacial times the shelf was dry land.',
  ])('%s', (text) => {
    expect(namesSubject(text, packs)).toBe(true);
  });
});

describe("the bench's off-topic docs pages stay off topic", () => {
  it.each([1, 2, 3, 4, 5, 6, 7, 8])('page %i is passed over unread', (i) => {
    const page = docsPage(i, 8_000, false) as string;
    expect(passOver(page, packs)?.skipped).toBe('names no subject of the packs');
  });
});
