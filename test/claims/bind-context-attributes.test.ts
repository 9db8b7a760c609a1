/**
 * What a sentence that refers back may still say of its own (src/claims/bind-context.ts): words that
 * only describe the measure ("to date", "ended abruptly", "of the atmosphere") do not stop a number
 * from taking its subject from the sentence before; a subject, a region, a change, a date or the
 * measure of another value does. Passages of our own; quantities built by hand (quantity-at.ts).
 */
import { describe, expect, it } from 'vitest';
import { loadPacks } from '../../src/rulepack/index.js';
import { boundAfter, type ContextRow, type Written } from './quantity-at.js';

const packs = await loadPacks([]);

type Row = ContextRow;
const bound = (context: string, sentence: string, written: Written[]): string[] => boundAfter(packs, context, sentence, written);

const REACHED: Row[] = [
  // "ended abruptly" describes the spell; the Younger Dryas lasted about 1,200 years
  // (Rasmussen et al. 2006, doi:10.1029/2005JD006079).
  ['The Younger Dryas set in about 12,900 years ago.', 'That cold spell held on for some 2,500 years before it ended abruptly.', [['some 2,500 years', 'duration']], ['younger-dryas-duration']],
  // "of the atmosphere" says what the record holds; Dome C reaches back about 800,000 years
  // (Jouzel et al. 2007, doi:10.1126/science.1141038).
  ['The EPICA Dome C core was drilled by a team from ten nations.', 'Its ice holds a record of the atmosphere stretching back some 650,000 years.', [['some 650,000 years', 'duration']], ['edc-record-span']],
  // A gas named inside the possessive ("its ... CO2 series") belongs to the core before; Dome C
  // holds eight glacial cycles (EPICA community members 2004, doi:10.1038/nature02599).
  ['The Dome C core was drilled on a high, cold plateau.', 'Its deuterium and CO2 series trace eleven complete glacial cycles.', [['eleven complete glacial cycles', 'count']], ['edc-glacial-cycles']],
  // "covers" names the record span, not the cycles; Vostok holds four cycles (Petit et al. 1999, doi:10.1038/20859).
  ['The Vostok core was drilled by three nations.', 'Its trapped air covers six full ice-age cycles.', [['six full ice-age cycles', 'count']], ['vostok-glacial-cycles']],
  // The lowest 200 m of Dome C hold about 150,000 years (Lüthi et al. 2008, doi:10.1038/nature06949).
  ['The EPICA Dome C core reached about 3,270 metres.', 'Its lowest 200 metres hold only some 15,000 years, though the ice there is thinned.', [['some 15,000 years', 'duration']], ['edc-bottom-200m-span']],
];

const KEPT_APART: Row[] = [
  // A stretch of the core is not the whole core's record (Lüthi et al. 2008, doi:10.1038/nature06949).
  ['The EPICA Dome C core reached about 3,270 metres.', 'Its bottom 200 metres alone hold about 150,000 years.', [['about 150,000 years', 'duration']], ['edc-bottom-200m-span']],
  // A measure this number could state ("a record") is a subject of its own: the Younger Dryas is not borrowed.
  ['The Younger Dryas set in about 12,900 years ago.', 'These cores hold a record of 800,000 years.', [['800,000 years', 'duration']], ['-']],
  // The sentence states its own stretch of time: the year one sentence back does not date its CO2
  // range (IPCC AR6 SPM A.2.1 gives the 2019 level; Lüthi et al. 2008 the 172-300 ppm range).
  // The range, told for the span of the record ("reaches back"), binds that span of levels, checked end by end.
  ['In 2019 carbon dioxide averaged about 410 ppm across the globe.', 'The ice reaches back 800,000 years, and over that whole stretch CO2 stayed between about 180 and 300 ppm.', [['800,000 years', 'duration'], ['between about 180 and 300 ppm', 'concentration']], ['-', 'co2-glacial-interglacial-range']],
  // A region named in the sentence is a subject of its own, however the sentence refers back: the
  // number stays with Greenland (about 20-23 K colder at the LGM, Dahl-Jensen et al. 1998,
  // doi:10.1126/science.282.5387.268), not East Antarctica (4-7 K, Buizert et al. 2021, doi:10.1126/science.abd2897).
  ['East Antarctica cooled by some 4 to 7 °C at the Last Glacial Maximum.', "Greenland's summit, for its part, saw a local cooling of more than 20 °C.", [['more than 20 °C', 'temperature-change']], ['greenland-lgm-cooling']],
  // A region alone takes the measure and the period from the sentence before, never its region.
  ['East Antarctica cooled by some 4 to 7 °C at the Last Glacial Maximum.', 'In Greenland, for its part, the figure was more than 20 °C.', [['more than 20 °C', 'temperature-change']], ['greenland-lgm-cooling']],
];

describe('bindQuantities: attributes of a sentence that refers back', () => {
  it.each(REACHED)('binds: %s / %s', (context, sentence, written, expected) => expect(bound(context, sentence, written)).toEqual(expected));
  it.each(KEPT_APART)('keeps apart: %s / %s', (context, sentence, written, expected) => expect(bound(context, sentence, written)).toEqual(expected));
});
