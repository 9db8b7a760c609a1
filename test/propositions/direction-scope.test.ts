/**
 * Direction facts and scope checks read from propositions, in sentences of our own (none taken from
 * the evaluation corpus): each mechanism with several phrasings that must be flagged, and correct
 * statements that look alike and must stay clean.
 *
 * The science:
 * - CO2 forcing grows with the logarithm of the concentration, so each added ppm warms a little less
 *   than the one before: Myhre et al. 1998, Geophysical Research Letters 25, 2715-2718 (from memory);
 *   Forster et al. 2021, IPCC AR6 WG1 chapter 7 (from memory).
 * - The bipolar seesaw: while Greenland and the North Atlantic were cold (Younger Dryas, Heinrich
 *   stadials), Antarctica warmed: EPICA Community Members 2006, Nature 444, 195-198; Pedro et al.
 *   2016, Nature Geoscience 9, 51-55 (both from memory).
 * - CO2 solubility falls as water warms, and the CO2 partial pressure of seawater rises with
 *   temperature (about 4 % per °C): Weiss 1974, Marine Chemistry 2, 203-215; Takahashi et al. 1993,
 *   Global Biogeochemical Cycles 7, 843-878 (both from memory).
 * - Ice-core air is younger than the ice around it (delta-age): Caillon et al. 2003, Science 299,
 *   1728-1731, doi 10.1126/science.1078758.
 * - Polar swings exceed the global mean: Jouzel et al. 2007, Science 317, 793-796; Tierney et al.
 *   2020, Nature 584, 569-573.
 * - The modern CO2 rise (about 2.4 ppm a year in the 2010s) is far faster than the deglacial rises
 *   (about 0.013 ppm a year over Termination I, at most about 0.15 ppm a year in the fastest
 *   century-scale jumps): Marcott et al. 2014, Nature 514, 616-619; NOAA GML growth rates
 *   (Lan et al.), computed.
 * - Antarctic temperature led CO2 by a few centuries at most, while global temperature mostly
 *   followed CO2: Shakun et al. 2012, Nature 484, 49-54, doi 10.1038/nature10915; Parrenin et al.
 *   2013, Science 339, 1060-1063.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { checkText } from '../../src/engine.js';
import { loadPacks } from '../../src/rulepack/index.js';
import type { LoadedPacks } from '../../src/rulepack/types.js';

let packs: LoadedPacks;
beforeAll(async () => {
  packs = await loadPacks([]);
});

/** A first sentence that puts the draft on topic (a draft that names no subject is not checked). */
const TOPIC = 'Ice cores keep a record of CO2. ';

const serious = async (text: string) =>
  (await checkText(TOPIC + text, { packs, format: 'markdown' })).flags.filter((f) => f.level !== 'note').map((f) => f.ruleId);

const cases = (rows: [string, string][]) => rows;

describe('the effect of one more unit of CO2 (logarithmic forcing)', () => {
  // Myhre et al. 1998; Forster et al. 2021 (from memory).
  it.each(cases([
    // An increment word, "of" and the gas make one more unit of CO2.
    ['Every additional dose of carbon dioxide warms the planet a bit more than the dose before it.', 'flag'],
    ['Each additional tonne of CO2 packs a bigger punch than the tonne before it.', 'flag'],
    // Ordinals: the higher one doing more is the effect per unit growing.
    ['The 500th ppm of CO2 heats the Earth more than the 300th did.', 'flag'],
    // Increments compared by the level they start from.
    ['Going from 450 to 460 ppm of CO2 warms the planet more than going from 280 to 290 ppm.', 'flag'],
    // A rate per unit said to grow with the concentration.
    ['The warming per ppm of CO2 rises as the concentration climbs.', 'flag'],
    ['Each added ppm of CO2 warms a little less than the one before.', 'clean'],
    ['Every extra puff of carbon dioxide warms the world a bit less than the puff before it.', 'clean'],
    ['The 300th ppm of CO2 warmed the planet more than the 400th will.', 'clean'],
    ['The warming per ppm of CO2 shrinks as the concentration climbs.', 'clean'],
    // No warming named: a cost, not an effect.
    ['Each extra ppm of CO2 costs more to remove than the one before.', 'clean'],
    // Amounts, not one more unit; and a total that rises, not the effect per unit.
    ['Additional emissions of CO2 will warm the planet more.', 'clean'],
    ['An additional dose of CO2 warms the planet more.', 'clean'],
    ['Each extra ppm of CO2 still adds warming, and the total keeps rising.', 'clean'],
    ['Each extra ppm of CO2 adds warming, and each one adds more than the last.', 'flag'],
  ]))('%s → %s', async (text, expected) => {
    const found = (await serious(text)).includes('direction.co2-forcing-logarithmic');
    expect(found).toBe(expected === 'flag');
  });
});

describe('the bipolar seesaw: the south echoing a northern cold event', () => {
  // EPICA Community Members 2006; Pedro et al. 2016 (from memory).
  it.each(cases([
    ['In the Younger Dryas the North Atlantic froze. Far to the south, Antarctica chilled in step.', 'flag'],
    // No period named: a northern cold event that the south is said to share.
    ['Greenland sank into a bitter stadial cold. Antarctica shared the same chill, its temperatures falling too.', 'flag'],
    // The clause's one region holds a cooling named as a noun.
    ['During the Younger Dryas, the cores from the far south record the same cold spell, Antarctica cooling alongside Greenland.', 'flag'],
    ['Greenland sank into a bitter cold snap. Antarctica meanwhile warmed slowly.', 'clean'],
    // The glacial maximum is no stadial: both poles were colder.
    ['At the glacial maximum Greenland was far colder than today. Antarctica cooled too, by about 9 °C.', 'clean'],
    ['Greenland plunged into a stadial cold. Across the Atlantic, Europe froze in step.', 'clean'],
  ]))('%s → %s', async (text, expected) => {
    const found = (await serious(text)).includes('direction.bipolar-seesaw-younger-dryas');
    expect(found).toBe(expected === 'flag');
  });
});

describe('solubility, delta-age and polar amplification in other words', () => {
  // Weiss 1974; Takahashi et al. 1993 (from memory); Caillon et al. 2003; Jouzel et al. 2007; Tierney et al. 2020.
  it.each(cases([
    ['As the ocean heats up, it snatches more carbon dioxide from the atmosphere.', 'direction.co2-solubility-falls-with-warming'],
    ['Warmer seawater draws more CO2 out of the air than cold seawater does.', 'direction.co2-solubility-falls-with-warming'],
    // The gas's partial pressure in the water is an uptake turned round.
    ['As the surface ocean warmed, the partial pressure of CO2 in it dropped.', 'direction.co2-solubility-falls-with-warming'],
    ['The gas in the bubbles has been sitting there longer than the ice around it.', 'direction.trapped-air-younger-than-ice'],
    ['The trapped air has been in place longer than the ice that encloses it.', 'direction.trapped-air-younger-than-ice'],
    ['The swing recorded at Dome C understates the change in global mean temperature.', 'direction.polar-swings-exceed-global'],
    // "Did you know...?" states its content.
    ['Did you know both poles warm and cool less than the planet as a whole?', 'direction.polar-swings-exceed-global'],
  ]))('%s → %s', async (text, rule) => {
    expect(await serious(text)).toContain(rule);
  });

  it.each([
    'Warmer seawater draws less CO2 out of the air than cold seawater does.',
    'As the surface ocean warmed, the partial pressure of CO2 in it rose and the sea gave gas back to the air.',
    // CO2 traps heat: no uptake of CO2.
    'Once the orbit nudged the warming along, the added carbon dioxide trapped more heat.',
    // "X, not Y, released the CO2" sets a cause aside; it does not turn the direction round.
    'Ocean circulation, not the warming of the surface water, released most of the CO2.',
    'The ice has been sitting there longer than the air sealed in its bubbles.',
    'The global mean change understates the swing recorded at Dome C.',
    'Did you know the two poles swing more than the rest of the planet?',
    // A teaser that reports someone else's view still asks.
    'Did you know some people claim the poles swing less than the planet as a whole?',
    'The Antarctic swing overstates the global change by roughly a factor of two.',
    // "They could hold more CO2" holds gas, not a view: the sentence stays the writer's own, and right.
    'As the seas cooled, they could hold more dissolved carbon dioxide.',
  ])('clean: %s', async (text) => {
    expect((await serious(text)).filter((r) => r.startsWith('direction.'))).toEqual([]);
  });
});

describe('the pace of the modern CO2 rise against the natural ones', () => {
  // Marcott et al. 2014; NOAA GML growth rates (computed).
  it.each(cases([
    ["What we're seeing today is a slower climb than the natural rises of the past.", 'flag'],
    ['The natural rise at the end of the last ice age was faster than the modern rise.', 'flag'],
    ['The modern rise is more gradual than the natural climb out of the last ice age.', 'flag'],
    ["Today's rise is far faster than any natural rise in the ice-core record.", 'clean'],
    ["The natural rise at the end of the last ice age was much slower than today's rise.", 'clean'],
  ]))('%s → %s', async (text, expected) => {
    const found = (await serious(text)).includes('direction.modern-co2-rise-faster-than-natural');
    expect(found).toBe(expected === 'flag');
  });
});

describe('a regional record or order carried over to the globe', () => {
  // Shakun et al. 2012; Parrenin et al. 2013; Jouzel et al. 2007; Tierney et al. 2020.
  it.each(cases([
    ['Because Dome C temperature turns up a few centuries before CO2 does, the same order holds for the globe as a whole.', 'scope.antarctic-lag-as-global'],
    ["Talos Dome shows the warming arriving first, and that's the sequence the whole world followed out of the ice age.", 'scope.antarctic-lag-as-global'],
    ['Since the EDML record warms ahead of CO2, the paper concludes that the entire planet warmed first and CO2 came after.', 'scope.antarctic-lag-as-global'],
    ['NGRIP warmed by about 12 °C in a few decades, so the entire world warmed 12 degrees as fast.', 'scope.regional-record-as-global'],
    ["The EDML site shows a deglacial warming of 8 °C, and that's the warming the whole planet went through.", 'scope.regional-record-as-global'],
    ['Greenland warmed by about ten degrees as the stadial ended. The whole globe warmed by those same ten degrees.', 'scope.regional-record-as-global'],
    ["Its deuterium profile doubles as a record of the globe's mean temperature.", 'scope.regional-record-as-global'],
    ['The Talos Dome site sits far from local influences, so its temperature curve measures global temperature.', 'scope.regional-record-as-global'],
  ]))('%s → %s', async (text, rule) => {
    expect(await serious(text)).toContain(rule);
  });

  it.each([
    'Antarctic temperature rose a few centuries before CO2. For the globe as a whole the order was the reverse.',
    'Greenland warmed by about 10 °C, so the globe as a whole warmed by far less, around 4 degrees.',
    'Vostok shows a glacial swing of about 9 °C. The global change was roughly half as large.',
    'Our new Dome C isotope series shows a warming of 9 °C, which the global models will then have to match.',
  ])('clean: %s', async (text) => {
    expect((await serious(text)).filter((r) => r.startsWith('scope.'))).toEqual([]);
  });
});
