/**
 * "we're at", "we've passed": a speaker's own present takes its subject from the sentence before
 * (src/claims/bind-context.ts), as talks, call-in shows and threads say it. Sentences are our own.
 * Global mean CO2 about 424 ppm in 2024 (Lan et al., NOAA GML global annual means); the highest
 * natural level of the 800,000-year ice-core record about 300 ppm (Lüthi et al. 2008, Nature 453,
 * 379-382).
 */
import { describe, expect, it } from 'vitest';
import { checkText } from '../../src/engine.js';

const rules = async (text: string) => (await checkText(`${text}\n`, { format: 'markdown' })).flags.map((f) => f.ruleId);

describe('a speaker\'s own present takes the subject before', () => {
  it.each([
    // ppb for ppm: a scale slip once the figure is CO2's.
    ["CO2 in the ice never went above about 300 parts per million. Right now we're at about 424 parts per billion.", 'unit.scale-slip'],
    // A present level far off the measured one.
    ["Carbon dioxide in the ice never went above about 300 ppm. These days we're at about 524 ppm.", 'value.co2-present-day'],
    ["Carbon dioxide in the ice never went above about 300 ppm. Today we've reached 610 ppm.", 'value.co2-present-day'],
  ])('flags %j', async (text, rule) => {
    expect(await rules(text)).toContain(rule);
  });

  it.each([
    "CO2 in the ice never went above about 300 parts per million. Right now we're at about 424 ppm.",
    // A number of the speaker's own, in another dimension, binds to nothing.
    'CO2 in the ice never went above about 300 ppm. We have run this podcast for 14 years.',
  ])('passes %j', async (text) => {
    expect(await rules(text)).toEqual([]);
  });
});

describe("the writer's present in other words", () => {
  // The present CO2 level, about 424 ppm in 2024 (Lan et al., NOAA GML): "this spring", "at the
  // moment", "last month" date a level to now, as "today" does.
  it.each([
    'Last month the CO2 level at the observatory hit 610 ppm.',
    'This spring carbon dioxide reached 610 ppm.',
    'As of this writing, CO2 stands at 610 ppm.',
    'At the moment CO2 sits at about 610 ppm.',
  ])('flags %j', async (text) => {
    expect(await rules(text)).toContain('value.co2-present-day');
  });

  it.each(['At present CO2 sits at about 424 ppm.', 'This summer carbon dioxide averaged about 426 ppm.'])('passes %j', async (text) => {
    expect(await rules(text)).toEqual([]);
  });
});

describe('a parenthesis right after a number labels that number', () => {
  // Orbital periods: obliquity about 41,000 years, precession about 19,000-23,000 years, eccentricity
  // about 100,000 and 400,000 years (Berger 1988, Reviews of Geophysics 26, 624-657; from memory).
  it('binds each number to its own label, not to the next one', async () => {
    expect(await rules('Ice-age rhythms follow the orbit: about 100,000 years (orbit shape), 41,000 (tilt) and about 23,000 (precession).')).toEqual([]);
    expect(await rules('Ice-age rhythms follow the orbit: 23,000 years (tilt) and about 41,000 (precession).')).toContain('value.milankovitch-obliquity-period');
  });
});
