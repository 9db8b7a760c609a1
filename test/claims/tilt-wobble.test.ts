/**
 * A tilt that wobbles is the tilt's own cycle (obliquity), not precession's wobble of the axis's
 * direction: "the tilt wobble", "Earth's tilt wobbles" name obliquity (pack data, every inflection
 * derived). A wobble with no tilt stays precession. Sentences of our own invention.
 *
 * Source: obliquity period about 41,000 years, climatic precession about 19,000-23,000 years
 * (Berger 1978, Journal of the Atmospheric Sciences 35, 2362-2367; Hays, Imbrie & Shackleton 1976,
 * Science 194, 1121-1132).
 */
import { describe, expect, it } from 'vitest';
import { checkText } from '../../src/engine.js';
import { loadPacks } from '../../src/rulepack/index.js';

const packs = await loadPacks([]);
const PRECESSION = 'value.milankovitch-precession-period';

async function rulesOf(text: string): Promise<string[]> {
  const result = await checkText(text, { path: 'post.txt', packs });
  return result.flags.map((f) => f.ruleId);
}

describe('a tilt that wobbles is obliquity', () => {
  it.each(['Tilt wobbles on a 41,000-year cycle.', 'The tilt wobble comes round about every 41,000 years.', "Earth's tilt wobbles on a cycle of about 41,000 years."])(
    'no precession flag: %s',
    async (text) => {
      expect(await rulesOf(text)).not.toContain(PRECESSION);
    },
  );

  it.each(['The wobble repeats every 41,000 years.', 'Precession, the wobble, repeats about every 41,000 years.'])('a wobble alone is still precession: %s', async (text) => {
    expect(await rulesOf(text)).toContain(PRECESSION);
  });
});
