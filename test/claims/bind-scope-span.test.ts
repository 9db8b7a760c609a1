/**
 * Two readings of a span told as an adjective ("the 800,000-year record"), src/claims/bind-view.ts:
 *
 * - The comma that groups a number's digits ("800,000") ends no clause, so the words before such a
 *   number still stand in the clause of the figure after it ("The highest CO2 anywhere in the
 *   800,000-year record was roughly 300 ppm, so today's air ..." speaks of the highest natural CO2,
 *   not of today's air).
 * - A span inside a prepositional phrase ("anywhere in the 800,000-year record", "across the whole
 *   420,000-year archive") sets the scope of the sentence and claims none of its words; it still
 *   binds the span of the record it names.
 *
 * Sentences of our own through the real parser and binder. Reference values: CO2 in the 800,000-year
 * Dome C record ranged from about 172 to about 300 ppm (Lüthi, D. et al. 2008, Nature 453,
 * 379-382); the Dome C record spans about 800,000 years (EPICA community members 2004, Nature 429,
 * 623-628; Jouzel, J. et al. 2007, Science 317, 793-796); the last deglaciation took about 7,000
 * years (Clark, P. U. et al. 2012, PNAS 109, E1134).
 */
import { describe, expect, it } from 'vitest';
import { judgeAt } from './judge-at.js';

describe("a number's digit-group comma ends no clause", () => {
  it.each([
    // Lüthi et al. 2008.
    ["The highest CO2 anywhere in the 800,000-year ice record was roughly 300 ppm, so today's air is far outside it.", 'roughly 300 ppm', 'co2-highest-preindustrial-800kyr', 'agrees'],
    ['The lowest value across the 800,000-year Dome C archive is about 172 ppm, and today we are far above it.', 'about 172 ppm', 'co2-lowest-800kyr', 'agrees'],
    // The error that must still be caught.
    ["The highest CO2 anywhere in the 800,000-year ice record was roughly 360 ppm, so today's air is far outside it.", 'roughly 360 ppm', 'co2-highest-preindustrial-800kyr', 'conflicts'],
  ])('%s', (sentence, text, value, verdict) => {
    expect(judgeAt(sentence, text)).toEqual({ value, verdict });
  });
});

describe('a span inside a prepositional phrase sets the scope and takes no words of the sentence before', () => {
  it.each([
    // Clark et al. 2012 is about the deglaciation; the 800,000-year span is the record's, not the thaw's.
    ['The whole deglaciation took about 7,000 years.', "Nothing in the 800,000-year record comes close to the level of today's air.", '800,000-year'],
    ['Across the last deglaciation the thaw took some seven thousand years.', 'No level within the entire 800,000-year archive matches what we breathe now.', '800,000-year'],
  ])('%s / %s', (before, sentence, text) => {
    expect(judgeAt(sentence, text, before).value).not.toBe('termination-1-duration');
  });

  it.each([
    // EPICA community members 2004; Jouzel et al. 2007: a wrong span of the record it names is still caught.
    ['Across the whole 400,000-year Dome C record, CO2 never dipped below 172 ppm.', '400,000-year', 'edc-record-span', 'conflicts'],
    ['Scientists found, in the 420,000-year EPICA Dome C record, eight glacial cycles.', '420,000-year', 'edc-record-span', 'conflicts'],
    ['The lowest value across the 800,000-year Dome C archive is about 172 ppm.', '800,000-year', 'edc-record-span', 'agrees'],
  ])('%s', (sentence, text, value, verdict) => {
    expect(judgeAt(sentence, text)).toEqual({ value, verdict });
  });
});
