/**
 * A superseded figure is right for its day, and a sentence that dates it after the newer value was
 * published makes it wrong again (src/checks/dated-after.ts). The science behind the rows:
 * - the first Vostok CO2 record, from a 2,083 m core, reached back about 160,000 years (Barnola et
 *   al. 1987, Nature 329, 408-414, doi 10.1038/329408a0); the 3,623 m core, about 420,000 years
 *   (Petit et al. 1999, Nature 399, 429-436, doi 10.1038/20859);
 * - EPICA Dome C: about 740,000 years as first published (EPICA community members 2004, Nature 429,
 *   623-628), about 800,000 years since Jouzel et al. 2007 (Science 317, 793-796).
 * The sentences are our own.
 */
import { describe, expect, it } from 'vitest';
import { checkText } from '../../src/engine.js';

async function valueFlags(text: string): Promise<[string, string][]> {
  return (await checkText(text)).flags.filter((f) => f.ruleId.startsWith('value.')).map((f) => [f.ruleId, f.level]);
}

describe('an older figure dated by its own publication is right for its date', () => {
  it.each([
    'The star of the lesson was the first Vostok core, published in 1987, which went back about 160,000 years.',
    'In the 1980s the Vostok record reached back some 160,000 years.',
    // The early core's own depth is no depth of the 1998 borehole.
    'The original Vostok core, 2,083 m long, held a record of roughly 160,000 years.',
  ])('%j stays clean', async (text) => {
    expect(await valueFlags(text)).toEqual([]);
  });

  it.each([
    // The right figure for 1987 given for the later core, or dated after the newer work.
    ['The first Vostok record, published in 1987, already went back about 420,000 years.', 'value.vostok-first-record-span'],
    ['The older Vostok record, published by Petit and colleagues in 1999, reaches back about 160,000 years.', 'value.vostok-record-span'],
    ['In 2010 the Dome C record was said to reach about 740,000 years.', 'value.edc-record-span'],
  ])('%j → %s, no note', async (text, ruleId) => {
    const flags = await valueFlags(text);
    expect(flags.map(([id]) => id)).toEqual([ruleId]);
    expect(flags[0]?.[1]).not.toBe('note');
  });

  it('an older figure told in the past keeps its note, and one dated to its own year stays clean', async () => {
    expect(await valueFlags('The first Dome C record reached back about 740,000 years.')).toEqual([['value.edc-record-span', 'note']]);
    expect(await valueFlags('The 2004 EPICA paper put the Dome C record at about 740,000 years.')).toEqual([]);
  });

  // Told in the present with no date of its own, the older figure is given as today's, as
  // "currently" gives it: later work corrected it.
  it.each([
    ['The Dome C record reaches back about 740,000 years.', 'value.edc-record-span'],
    ['Our display explains that the Vostok record spans roughly 160,000 years of climate.', 'value.vostok-record-span'],
    ['The Vostok ice has given us a record that goes back some 160,000 years.', 'value.vostok-record-span'],
  ])('%j → %s, no note', async (text, ruleId) => {
    const flags = await valueFlags(text);
    expect(flags.map(([id]) => id)).toEqual([ruleId]);
    expect(flags[0]?.[1]).not.toBe('note');
  });

  it('a passage dated before the newer work tells its figures of that day, in the present or not', async () => {
    expect(await valueFlags('Panel 6: 2004.\nThe EPICA team announces a Dome C record of 740,000 years.')).toEqual([['value.edc-record-span', 'note']]);
  });
});
