/**
 * The prefilter keys of the reasoning detectors (session 21): a key names a cue list of the check,
 * a class of the pack's lexicon, or several names of which any one will do; a detector reads only a
 * sentence that holds all its keys. The two scope checks that read every sentence before now have
 * keys that every flag of theirs needs, so they skip the rest and lose no flag. Sentences of our own.
 *
 * Sources: the 2024 CO2 rise of about 3.5 ppm (WMO 2025, Greenhouse Gas Bulletin 21); the ice-core
 * CO2 record covers about 800,000 years (Lüthi et al. 2008, Nature 453, 379-382); the global mean
 * cooling at the Last Glacial Maximum was about 6 °C (Gulev et al. 2021, IPCC AR6 WGI ch. 2, from memory).
 */
import { afterEach, describe, expect, it, vi } from 'vitest';
import { checkReasoning, DETECTORS } from '../../src/checks/reasoning/index.js';
import { keyNames } from '../../src/checks/reasoning/detector.js';
import { checkText } from '../../src/engine.js';
import { loadPacks } from '../../src/rulepack/index.js';

const packs = await loadPacks([]);

/** How many times the detector of `id` is asked about the last sentence of `text`. */
function callsOn(id: string, text: string): number {
  const entry = DETECTORS[id];
  if (entry === undefined) throw new Error(`no detector ${id}`);
  const spy = vi.spyOn(entry, 'detect');
  const paragraph = text.split('\n');
  checkReasoning(paragraph, paragraph.length - 1, packs);
  const calls = spy.mock.calls.length;
  spy.mockRestore();
  return calls;
}

afterEach(() => {
  vi.restoreAllMocks();
});

describe('a key of several names', () => {
  it('holds when any one of its names does', () => {
    expect(keyNames('events')).toEqual(['events']);
    expect(keyNames(['all-history', 'spans'])).toEqual(['all-history', 'spans']);
  });
});

describe('scope.short-record-stretched reads only a sentence with a span, a claim of all history or every year', () => {
  it.each([
    'CO2 rose by about 3.5 ppm over the twelve months to January.',
    'The Vostok core shows CO2 and temperature moving together.',
  ])('skips %s', (text) => {
    expect(callsOn('scope.short-record-stretched', text)).toBe(0);
  });
  it.each([
    'The core holds 800,000 years of air.',
    'CO2 never went above 300 ppm in 800kyr of ice.',
    'It has never been this high in the history of the planet.',
    'We add about 2.5 ppm annually.',
    'At that pace CO2 climbs 250 ppm in a century.',
  ])('reads %s', (text) => {
    expect(callsOn('scope.short-record-stretched', text)).toBe(1);
  });
  it('flags a span written onto its number', async () => {
    const text = 'The 2024 increase of 3.5 ppm sets the pace, so CO2 will climb by roughly 350 ppm over the next 100yrs.';
    const result = await checkText(text, { path: 'draft.txt', packs });
    expect(result.flags.map((f) => f.ruleId)).toContain('scope.short-record-stretched');
  });
});

describe('scope.figure-across-scales reads only a sentence that names a scale', () => {
  it.each([
    'CO2 rose by about 100 ppm as the ice age ended.',
    'Temperatures were about 6 °C lower then.',
  ])('skips %s', (text) => {
    expect(callsOn('scope.figure-across-scales', text)).toBe(0);
  });
  it.each([
    'The whole planet was about 6 °C colder.',
    'Dome C shows a swing of 9 °C.',
    'Our valley was 6 °C colder too.',
    'It was 6 °C colder round here.',
  ])('reads %s', (text) => {
    expect(callsOn('scope.figure-across-scales', text)).toBe(1);
  });
});
