/**
 * Binding precision on our own sentences: the role of a number (level or change), which words each
 * number may use, and parallel lists read in order. Each row names the bug it guards against.
 * Quantities are built by hand (quantity-at.ts) so that only the binder is measured.
 */
import { describe, expect, it } from 'vitest';
import { bindQuantities } from '../../src/claims/bind.js';
import { loadPacks } from '../../src/rulepack/index.js';
import { quantitiesIn, type Written } from './quantity-at.js';

const packs = await loadPacks([]);
const C = 'concentration';
const Y = 'duration';
const T = 'temperature-change';
const L = 'length';

/** Sentence, its quantities, and per quantity the reference id it binds ('-' for none, '?' for ambiguous). */
type Row = [sentence: string, written: Written[], expected: string[]];

function bound(sentence: string, written: Written[]): string[] {
  const { bindings, ambiguous } = bindQuantities(sentence, quantitiesIn(sentence, written), packs);
  return written.map((_, i) => bindings.find((b) => b.quantityIndex === i)?.referenceId ?? (ambiguous.includes(i) ? '?' : '-'));
}

const ROLES: Row[] = [
  // Endpoints of a rise are levels: they never bind the size of the rise.
  ['Across the deglaciation at the Orra field site, CO2 rose by about 75 ppm, from about 190 ppm to about 265 ppm.', [['about 75 ppm', C], ['about 190 ppm', C], ['about 265 ppm', C]], ['co2-deglacial-rise-magnitude', '-', '-']],
  // The size of a swing is a change: it never binds the interglacial level, and with "rising" (an
  // inflection the binder derives from the pack's "rise") it binds the glacial-interglacial swing.
  ['In the warm interglacials CO2 sat near 280 ppm, rising by 80 to 100 ppm from each cold phase.', [['280 ppm', C], ['80 to 100 ppm', C]], ['co2-interglacial-maximum-typical', 'co2-glacial-interglacial-amplitude']],
  // A height above the bedrock is a difference, not the drilled depth.
  ['The Vostok drill reached 3,623 metres, roughly 130 metres above the lake.', [['3,623 metres', L], ['roughly 130 metres', L]], ['vostok-drilled-depth', '-']],
  // A modern annual rise is not an abrupt deglacial step.
  ['In 2024 CO2 went up by about 3.5 ppm, a record jump.', [['2024', 'age', 'CE'], ['about 3.5 ppm', C]], ['-', '-']],
  // A level after "up" from the year before is a change, not the annual mean.
  ['The 2023 global mean CO2 was 419 ppm, up 2.8 ppm on the year before.', [['2023', 'age', 'CE'], ['419 ppm', C], ['2.8 ppm', C]], ['-', 'co2-global-2023', '-']],
];

const WORDS: Row[] = [
  // Glacial and interglacial words each speak for the number beside them.
  ['At the Tarn Museum panel, CO2 varies between about 185 ppm in the glacial phases and about 285 ppm in the interglacials.', [['about 185 ppm', C], ['about 285 ppm', C]], ['co2-glacial-minimum-typical', 'co2-interglacial-maximum-typical']],
  // A veto word of a later number ("glacial termination") does not stop an earlier one.
  ['CO2 stood near 185 ppm in the glacials, and climbed 85 ppm at each glacial termination.', [['185 ppm', C], ['85 ppm', C]], ['co2-glacial-minimum-typical', 'co2-deglacial-rise-magnitude']],
  // The baseline of a temperature comparison is not the subject of a later CO2 level.
  ['In the last ice age the world was about 5 °C (9 °F) colder than before the industrial era, and CO2 was about 185 ppm.', [['about 5 °C', T], ['9 °F', T], ['about 185 ppm', C]], ['gmst-lgm-to-preindustrial-warming', 'gmst-lgm-to-preindustrial-warming', 'co2-glacial-minimum-typical']],
  // A gas-age word after a second number no longer vetoes the record span before it.
  ['The Vostok record spans 420,000 years, and its gas-age offset reaches 5,000 years.', [['420,000 years', Y], ['5,000 years', Y]], ['vostok-record-span', 'delta-age-vostok']],
  // An opening time phrase owns no words: "CO2" still speaks for the level after it.
  ['Over the last 800,000 years CO2 never rose above 300 ppm.', [['800,000 years', Y], ['above 300 ppm', C]], ['-', 'co2-highest-preindustrial-800kyr']],
];

const LISTS: Row[] = [
  // Three subjects and three numbers bind in order, never the last number to the first subject.
  ['Orbital rhythms: eccentricity, obliquity and precession vary over about 100,000, 41,000 and 23,000 years.', [['about 100,000', 'number'], ['41,000', 'number'], ['23,000 years', Y]], ['-', '-', 'milankovitch-precession-period']],
  ['The Vostok and Dome C records reach back 420,000 years and 800,000 years.', [['420,000 years', Y], ['800,000 years', Y]], ['vostok-record-span', 'edc-record-span']],
  // Three subjects and two numbers: no order can be trusted, so neither binds.
  ['Vostok, Dome C and Dome Fuji reach back 420,000 years and 800,000 years.', [['420,000 years', Y], ['800,000 years', Y]], ['?', '?']],
  // A subject of an earlier clause is not part of a later list.
  ['Obliquity varies over 41,000 years, precession over 23,000 years and 19,000 years.', [['41,000 years', Y], ['23,000 years', Y], ['19,000 years', Y]], ['milankovitch-obliquity-period', 'milankovitch-precession-period', 'milankovitch-precession-period']],
  // Each period beside its own subject, with no list: nearness decides.
  ['The shape of the orbit varies over 100,000 years, the tilt of the axis over about 41,000 years, and the wobble over about 21,000 years.', [['100,000 years', Y], ['about 41,000 years', Y], ['about 21,000 years', Y]], ['milankovitch-eccentricity-period', 'milankovitch-obliquity-period', 'milankovitch-precession-period']],
];

describe('bindQuantities: the role of a number', () => {
  it.each(ROLES)('%s', (sentence, written, expected) => expect(bound(sentence, written)).toEqual(expected));
});

describe('bindQuantities: which words each number may use', () => {
  it.each(WORDS)('%s', (sentence, written, expected) => expect(bound(sentence, written)).toEqual(expected));
});

describe('bindQuantities: parallel lists bind in order or not at all', () => {
  it.each(LISTS)('%s', (sentence, written, expected) => expect(bound(sentence, written)).toEqual(expected));
});
