/**
 * scope.regional-record-as-global, session 17: what counts as the record's own figure, and how a
 * figure is handed on to the globe.
 *
 * - Only a temperature scales the record to the globe: a year ("funded in 2019"), a label ("panel
 *   3") or a span ("for 400,000 years") between the record and the globe is no swing of the record's,
 *   so the sentence is still read as the globe.
 * - "more than 20 °C colder during the ice age" bounds a figure; it compares no place with the globe.
 * - A figure handed on in the next sentence may lie inside the record's own range ("8 to 10 °C ...
 *   So the globe ... 9 °C"), and a restatement ("In other words, ...") hands it on as "so" does; a
 *   figure of the globe's own outside that range still scales, and passes.
 *
 * Sentences of our own. Sources: Antarctic glacial-interglacial swings of about 8-10 °C (Jouzel et
 * al. 2007, Science 317, 793-796); central Greenland about 20 °C colder at the LGM (Cuffey & Clow
 * 1997, JGR 102, 26383-26396, from memory); global LGM cooling about 5-7 °C (Tierney et al. 2020,
 * Nature 584, 569-573).
 */
import { describe, expect, it } from 'vitest';
import { checkText } from '../../src/engine.js';
import { loadPacks } from '../../src/rulepack/index.js';

const packs = await loadPacks([]);
const RULE = 'scope.regional-record-as-global';

async function rulesOf(text: string): Promise<string[]> {
  const result = await checkText(text, { path: 'draft.txt', packs });
  return result.flags.filter((f) => f.level === 'error' || f.level === 'warning').map((f) => f.ruleId);
}

describe('figures that are no temperature of the record', () => {
  it.each([
    // a year between the record and the globe
    'The Talos Dome series published in 2019 shows that the whole planet cooled by about 9 °C.',
    // a label
    'Panel 3 of the exhibit puts the Vostok curve on the wall and says the Earth swung 9 degrees each cycle.',
    // a span
    'Across 400,000 years of Vostok ice we can watch the whole world warm by 8 °C at each termination.',
    // "more than" bounding a figure set in a time
    'The GISP2 core tells us that the globe was more than 15 °C colder during the last glacial.',
  ])('flags %s', async (sentence) => {
    expect(await rulesOf(sentence)).toContain(RULE);
  });
  it.each([
    // a figure of the globe's own, unlike the record's temperature, still scales
    'The Vostok swing of 9 degrees in 2019 reconstructions corresponds to a global change of about 5.',
    // a size comparison of a place with the globe still compares
    'The Dome C swing of about 9 °C was larger than the change of the globe as a whole.',
  ])('leaves clean: %s', async (sentence) => {
    expect(await rulesOf(sentence)).not.toContain(RULE);
  });
});

describe('a record figure handed on to the globe in the next sentence', () => {
  it.each([
    'At Talos Dome the isotopes swing by 8 to 10 °C from glacial to interglacial. So the globe as a whole was about 9 °C colder in the glacials.',
    'The EDML record warms by about nine degrees at each termination. In other words, the whole Earth warmed by nine degrees.',
    'Greenland summit temperatures sat some 20 °C lower at the glacial maximum. Put another way, the entire planet was 20 °C colder.',
  ])('flags %s', async (text) => {
    expect(await rulesOf(text)).toContain(RULE);
  });
  it.each([
    // the globe's own figure, outside the record's range
    'At Talos Dome the isotopes swing by 8 to 10 °C from glacial to interglacial. So the globe as a whole was only about 6 °C colder.',
    'Greenland summit temperatures sat some 20 °C lower at the glacial maximum. In other words, the entire planet was about 6 °C colder, a third of it.',
  ])('leaves clean: %s', async (text) => {
    expect(await rulesOf(text)).not.toContain(RULE);
  });
});
