/**
 * A global temperature change whose size is a regional one: the regional record told as global,
 * read from the number (pack field `regional_version_of`) and from a read-from phrase ("Going by
 * Vostok, ..."). The science behind the rows:
 * - global mean cooling at the Last Glacial Maximum about 6 °C (Tierney et al. 2020, Nature 584,
 *   569-573, doi 10.1038/s41586-020-2617-x: 6.1 °C, 95% 5.7-6.5; Annan et al. 2022, Clim. Past 18,
 *   1883-1896, doi 10.5194/cp-18-1883-2022: 4.5 ± 0.9 °C);
 * - Antarctic deglacial warming of about 8 to 11 °C from water isotopes (Jouzel et al. 2007,
 *   Science 317, 793-796, doi 10.1126/science.1141038; Pedro et al. 2012, Clim. Past 8, 1213-1221);
 * - central Greenland about 23 K colder at the LGM (Dahl-Jensen et al. 1998, Science 282, 268-271,
 *   doi 10.1126/science.282.5387.268).
 */
import { describe, expect, it } from 'vitest';
import { checkText } from '../../src/engine.js';

const SCENE = 'Ice cores from Antarctica and Greenland record the last ice age.\n\n';

async function rules(sentence: string): Promise<string[]> {
  const result = await checkText(SCENE + sentence);
  return result.flags.filter((f) => f.span.start.offset >= SCENE.length).map((f) => f.ruleId);
}

describe('a regional figure told as global', () => {
  it.each([
    // The Antarctic isotope warming (8-11 °C) given for the whole Earth, read from the record before.
    'This record tells us the whole Earth was about 9 °C colder during the last ice age.',
    // The Greenland LGM cooling (about 15-25 °C) given for the planet, with the record named.
    'At the glacial maximum, the Greenland cores show, the Earth as a whole was more than 20 degrees Celsius colder.',
    // A read-from phrase names the record the global figure comes from.
    'Going by Vostok, the planet as a whole was about nine degrees colder during the last glacial maximum.',
    'According to the Dome C ice core, the world warmed by ten degrees at the end of the last ice age.',
  ])('flags the scope in %j', async (sentence) => {
    expect(await rules(sentence)).toContain('scope.regional-record-as-global');
  });

  it('carries the global value as the correction, and both sources', async () => {
    const result = await checkText(`${SCENE}This record tells us the whole Earth was about 9 °C colder during the last ice age.`);
    const flag = result.flags.find((f) => f.ruleId === 'scope.regional-record-as-global');
    expect(flag?.correction).toMatch(/6 °C/u);
    expect(flag?.reason).toMatch(/Antarctic/u);
    expect(flag?.sources.map((s) => s.id)).toEqual(expect.arrayContaining(['tierney-2020', 'jouzel-2007']));
  });

  // A sentence that names no regional record states a wrong global value: the value check's flag,
  // whose reason still says whose size the figure is, with the same correction and sources.
  it.each([
    'The whole Earth was about 9 °C colder during the last ice age.',
    'At the glacial maximum the Earth as a whole was more than 20 degrees Celsius colder.',
  ])('a wrong global value when no record is named: %j', async (sentence) => {
    const result = await checkText(SCENE + sentence);
    const flag = result.flags.find((f) => f.span.start.offset >= SCENE.length && f.ruleId === 'value.gmst-lgm-to-preindustrial-warming');
    expect(flag?.correction).toMatch(/6 °C/u);
    expect(flag?.reason).toMatch(/Antarctic|Greenland/u);
    expect(flag?.sources.map((s) => s.id)).toEqual(expect.arrayContaining(['tierney-2020']));
    expect(await rules(sentence)).not.toContain('scope.regional-record-as-global');
  });

  it.each([
    // Out of the global range but no regional size: a plain value error (1-2 °C is far too small).
    ['The whole Earth was about 2 °C colder during the last ice age.', 'value.gmst-lgm-to-preindustrial-warming'],
  ])('leaves a global figure of no regional size to the value check: %j', async (sentence, rule) => {
    const found = await rules(sentence);
    expect(found).toContain(rule);
    expect(found).not.toContain('scope.regional-record-as-global');
  });

  it.each([
    'The whole Earth was about 6 °C colder during the last ice age.',
    'Going by Vostok, Antarctica was about nine degrees colder; the globe cooled by about 6 °C.',
    'Antarctica cooled by about 9 °C at the glacial maximum, while the planet as a whole cooled by about 6 °C.',
  ])('passes %j', async (sentence) => {
    expect(await rules(sentence)).toEqual([]);
  });
});
