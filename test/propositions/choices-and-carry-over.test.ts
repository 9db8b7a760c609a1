/**
 * Sentence structure read across wordings (session 9), each class in sentences of our own, with
 * clean counter-examples:
 * - an either/or choice is set up by an "or" between its two directions; an "or" elsewhere ("so it is
 *   not one or the other") joins no choice;
 * - a part noun (effect, driver, role) is a noun only as written or plural: "the resulting warming"
 *   names no effect; an -ing change after an article and a modifier is a noun;
 * - a casting verb with a predicate noun after its object ("makes the cores a confession") acts on nothing;
 * - only the orbit may alone *start* a deglaciation;
 * - a global order with no record and no counted lag figure is the direction fact; with a record or
 *   a figure in years named it is the Antarctic lag read as global;
 * - a list item or post reads on from the block just before it (its lead-in);
 * - an elliptic clause ("so did the planet") and manner anaphora ("that's how it went worldwide")
 *   carry a regional record's change or order over to the globe.
 * The science:
 * - Orbital forcing paced the glacial cycles and started each deglaciation; CO2 amplified the warming
 *   and spread it; global temperature lagged CO2 in the last deglaciation: Shakun et al. 2012,
 *   Nature 484, 49-54, doi 10.1038/nature10915; Hays, Imbrie and Shackleton 1976, Science 194,
 *   1121-1132.
 * - Antarctic temperature and CO2 changed within a few centuries of each other: Parrenin et al. 2013,
 *   Science 339, 1060-1063 (from memory); Pedro et al. 2012, Climate of the Past 8, 1213-1221.
 * - Antarctic swings exceed the global mean (polar amplification), so an Antarctic change is not the
 *   planet's: Masson-Delmotte et al. 2013, IPCC AR5 WG1 chapter 5; Tierney et al. 2020, Nature 584,
 *   569-573 (global LGM cooling about 6 °C).
 * - A correlation of two curves is not by itself proof of a cause (common practice).
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { checkText } from '../../src/engine.js';
import { loadPacks } from '../../src/rulepack/index.js';
import type { LoadedPacks } from '../../src/rulepack/types.js';

let packs: LoadedPacks;
beforeAll(async () => {
  packs = await loadPacks([]);
});

const TOPIC = 'The Antarctic ice cores hold the CO2 record.\n\n';
const serious = async (text: string) =>
  (await checkText(TOPIC + text, { packs, format: 'markdown' })).flags.filter((f) => f.level !== 'note').map((f) => f.ruleId);

describe('an either/or choice is joined by its own "or"', () => {
  it('still flags a choice set up between the two directions', async () => {
    expect(await serious('Either CO2 warmed the planet or the warming released CO2, and the cores tell us which.')).toContain('logic.either-or-causation');
  });

  it.each([
    'Shifts in the orbit set the rhythm, but CO2 and the spreading ice sheets amplify each swing and carry it worldwide, so it is not one or the other.',
    'The orbit starts each thaw and the released CO2 reinforces it around the globe; it was never one or the other.',
    'Sunlight changes pace the cycles, yet CO2 and the ice amplify them and spread them to every latitude, so it is not a case of one or the other.',
  ])('passes roles given to each factor: %s', async (text) => {
    expect(await serious(text)).not.toContain('logic.either-or-causation');
  });
});

describe('a part noun is no verb form, and "the resulting warming" is a noun', () => {
  it.each([
    'Small orbital shifts set the timing, and CO2 then amplified the resulting warming or cooling across the planet.',
    'The orbit paced the cycles; CO2 strengthened the ensuing warming or cooling and carried it worldwide.',
    'Orbital changes set things off, and the extra CO2 deepened the initial cooling or warming.',
  ])('passes: %s', async (text) => {
    expect(await serious(text)).toEqual([]);
  });
});

describe('a casting verb with a predicate noun acts on nothing', () => {
  it.each([
    'None of this makes the ice cores a signed confession: the close fit of CO2 and temperature is a correlation, and physics turns it into a cause.',
    'Nothing here turns the cores into a courtroom; the match of CO2 and temperature is a correlation, and the physics of absorption makes it a cause.',
    'The timing does not make the archive a witness statement: the fit of CO2 and temperature is a correlation, and radiative physics turns it into a cause.',
  ])('passes: %s', async (text) => {
    expect(await serious(text)).toEqual([]);
  });
});

describe('only the orbit may alone start a deglaciation', () => {
  it.each([
    'Carbon dioxide by itself set off the end of every glacial period.',
    'Rising CO2 alone kicked off each deglaciation.',
    "The ocean's CO2, on its own, triggered the end of the last ice age.",
  ])('flags: %s', async (text) => {
    expect(await serious(text)).toContain('logic.single-cause');
  });

  it('passes the orbit alone as the trigger', async () => {
    expect(await serious('The orbit alone triggered the start of each deglaciation; CO2 then amplified the warming.')).toEqual([]);
  });
});

describe('a global order: the direction fact without a record, the lag read as global with one', () => {
  it.each([
    'Across the whole globe, temperature climbed several centuries ahead of carbon dioxide.',
    'Averaged over the planet, warming began a few hundred years before CO2 rose.',
    'The world as a whole warmed some centuries before the CO2 went up.',
  ])('direction: %s', async (text) => {
    const ids = await serious(text);
    expect(ids).toContain('direction.global-co2-ahead-of-warming');
    expect(ids).not.toContain('scope.antarctic-lag-as-global');
  });

  it.each([
    'The Vostok core shows that worldwide, temperature rose centuries before CO2.',
    // The lag's own figure, a number of years as the Antarctic studies give it (Caillon et al. 2003, Science 299).
    'Over the whole planet the warming ran some 700 years ahead of the carbon dioxide.',
    'Earth as a whole heated up six hundred years before CO2 climbed.',
  ])('scope when the record or the lag figure is named: %s', async (text) => {
    expect(await serious(text)).toContain('scope.antarctic-lag-as-global');
  });
});

describe('a block reads on from the block just before it', () => {
  it.each([
    '- The EPICA Dome C core shows Antarctic temperature rising a few centuries before CO2.\n- This shows that the whole planet warmed first.',
    '- In the Vostok ice, the local warming began before the CO2 rise.\n\n- That tells us the entire Earth warmed first and CO2 followed.',
    'The Dome Fuji record has Antarctic temperature rising first.\n\nThis means the globe as a whole heated up before CO2 did.',
  ])('takes the record from the item before: %j', async (text) => {
    expect(await serious(text)).toContain('scope.antarctic-lag-as-global');
  });

  it('passes a correct global order after a regional one', async () => {
    expect(await serious('- The Dome C core shows Antarctic temperature rising a few centuries before CO2.\n- Averaged over the globe, though, CO2 rose first and temperature followed.')).toEqual([]);
  });

  it("a loop granted in the item before does not answer this item's either/or", async () => {
    const text = '- Temperature and CO2 each drive the other in a feedback loop.\n- The cores settle it: temperature drives CO2, and CO2 does not drive temperature.';
    expect(await serious(text)).toContain('logic.either-or-causation');
  });
});

describe("an elliptic clause repeats a record's change for the globe", () => {
  it.each([
    'When Vostok cooled by eight degrees, so did the planet.',
    'The Dome C site warmed ten degrees as the ice age ended, as did the whole Earth.',
    "Greenland's ice core records a 15-degree warming, and the globe did too.",
  ])('flags: %s', async (text) => {
    expect(await serious(text)).toContain('scope.regional-record-as-global');
  });

  it.each([
    'When Vostok cooled by eight degrees, the planet as a whole cooled by about five.',
    'When Dome C warmed by ten degrees, so did the Southern Ocean.',
  ])('passes: %s', async (text) => {
    expect(await serious(text)).not.toContain('scope.regional-record-as-global');
  });
});

describe('manner anaphora carries a regional order over to the globe', () => {
  it.each([
    "The Antarctic cores put temperature first and CO2 second, and that's how it went around the whole world.",
    'In the Vostok record warming leads CO2 by centuries; the planet as a whole went the same way.',
    'Antarctic ice shows the warmth arriving before the CO2, and this is how it happened across the globe.',
  ])('flags: %s', async (text) => {
    expect(await serious(text)).toContain('scope.antarctic-lag-as-global');
  });

  it.each([
    'The Antarctic cores put temperature first, but across the globe it went the other way.',
    // "end of story" restricts; its "end" ends nothing, and "says" is no role.
    'The Dome C core says warming first, CO2 later, end of story.',
  ])('passes: %s', async (text) => {
    expect(await serious(text)).toEqual([]);
  });
});

// CO2 forcing grows with the logarithm of the concentration, so each added ppm warms a little less
// than the one before: Myhre et al. 1998, Geophysical Research Letters 25, 2715-2718; Forster et al.
// 2021, IPCC AR6 WG1 chapter 7.
describe('a correlative comparison ("the more X, the Y-er Z")', () => {
  it.each([
    'The greater the concentration of CO2, the stronger the push from every additional ppm.',
    'The higher the CO2 level, the more warming each added ppm brings.',
    'The more carbon dioxide piles up, the larger the effect of each extra ppm.',
  ])('flags the effect per unit growing: %s', async (text) => {
    expect(await serious(text)).toContain('direction.co2-forcing-logarithmic');
  });

  it.each([
    'The more carbon dioxide already in the air, the less each extra ppm warms.',
    'The higher the CO2 level, the smaller the warming from each added ppm.',
    // No unit of CO2 in the second half: an amount, not the effect per unit.
    'The more CO2 the ocean released, the warmer the planet became.',
  ])('passes: %s', async (text) => {
    expect(await serious(text)).toEqual([]);
  });
});

// The air in an ice core is younger than the ice around it (it is sealed at the base of the firn):
// Schwander and Stauffer 1984, Nature 311, 45-47 (from memory); Parrenin et al. 2013, Science 339.
describe('a dating verb with a degree before its order word compares ages', () => {
  it.each([
    'The trapped gas dates from centuries before the ice that holds it.',
    'The air in each bubble dates from well before the surrounding ice.',
    'The bubbles date back to long before the snow layer around them.',
  ])('flags the air as older: %s', async (text) => {
    expect(await serious(text)).toContain('direction.trapped-air-younger-than-ice');
  });

  it.each([
    'The trapped air dates from a few centuries after the ice around it.',
    'The air in the bubbles dates from well after the snow that encloses it.',
  ])('passes: %s', async (text) => {
    expect(await serious(text)).toEqual([]);
  });
});

describe("a sentence's own opening is past its utterance label", () => {
  it.each([
    'NARRATOR: The Vostok record puts Antarctic warming first.\nNARRATOR: And this shows that the entire globe warmed before CO2.',
    'Thu 2/ The Dome C ice shows temperature leading CO2 by centuries.\n\nThu 3/ This means the whole world warmed first.',
    '[02:10] In the Dome F core the warming starts ahead of CO2.\n[02:20] And that tells us that across the whole planet the warming came first.',
  ])('reads back to the record: %j', async (text) => {
    expect(await serious(text)).toContain('scope.antarctic-lag-as-global');
  });

  it('passes a regional order read back', async () => {
    expect(await serious('[02:10] In the Dome F core the warming starts ahead of CO2.\n[02:20] And that tells us that in Antarctica the warming came first.')).toEqual([]);
  });
});

// A lag of CO2 behind Antarctic temperature does not show that CO2 had no warming effect: Shakun
// et al. 2012, Nature 484, 49-54; Parrenin et al. 2013, Science 339, 1060-1063 (from memory).
describe('a question from one voice answered by another', () => {
  it.each([
    '@kay: So how could CO2 be the cause if it came 800 years later?\n↳ @lin: Easily, it amplified what the orbit started.',
    '[18:20] Mo: how could CO2 warm anything if it came second?\n[18:21] Jess: Because it amplified what the orbit began.',
    'TARA: Why would CO2 matter when it trails the warming by centuries?\nODD: Because it amplifies that warming.',
  ])('is asked, not asserted: %j', async (text) => {
    expect(await serious(text)).toEqual([]);
  });

  it.each([
    // The same speaker goes on: the question stays rhetorical.
    '[18:20] Mo: how could CO2 warm anything if it came second?\n[18:22] Mo: exactly, it can not.',
    // A numbered thread is one writer's.
    '11/ So if CO2 only rose after the warming, how could it have caused any of it?\n12/ The orbit did the whole job.',
  ])('stays the writer’s own: %j', async (text) => {
    expect(await serious(text)).toContain('logic.lag-rules-out-cause');
  });
});

// Warmer water holds less dissolved CO2 (solubility falls with temperature): Weiss 1974, Marine
// Chemistry 2, 203-215. The air in a core is younger than its ice: Schwander and Stauffer 1984 (from
// memory). East Antarctic LGM cooling about 4-7 °C by the newer estimates: Buizert et al. 2021,
// Science 372, 1097-1101 (from memory).
describe('a view set in a time now past is an earlier view', () => {
  it.each([
    'At one time researchers believed that warm water holds more CO2.',
    'Until recently, many of us thought that warmer seas hold more dissolved CO2.',
    'For decades textbooks claimed that the air in the bubbles is older than the ice around it.',
  ])('becomes a note: %s', async (text) => {
    expect(await serious(text)).toEqual([]);
  });

  it.each([
    // A perfect ("we have known") is still held; a time with no report verb is no view at all.
    'For years we have known that warm water holds less CO2 than cold water, and warmer seas hold more CO2 too.',
    'For a long time now, warm water has held more CO2 than cold water.',
    'At first, the warmer ocean took up more CO2.',
  ])('stays the writer’s own: %s', async (text) => {
    expect(await serious(text)).toContain('direction.co2-solubility-falls-with-warming');
  });
});

// About the same forcing for each doubling of CO2, so a step at a higher level adds no more than
// the same step lower down: Myhre et al. 1998, Geophysical Research Letters 25, 2715-2718.
describe('a thousands separator joins its digits', () => {
  it.each([
    'Raising CO2 from 1,000 to 2,000 ppm would add much more forcing than raising it from 250 to 500 ppm.',
    'Going from 560 to 1,120 ppm traps far more heat than going from 280 to 560 ppm did.',
    'The step from 1,200 to 1,300 ppm warms more than the step from 300 to 400 ppm.',
  ])('reads the levels whole: %s', async (text) => {
    expect(await serious(text)).toContain('direction.co2-forcing-logarithmic');
  });

  it.each([
    'The step from 1,200 to 1,300 ppm warms less than the step from 300 to 400 ppm.',
    'Our museum welcomed 1,250 visitors, and CO2 in the cores rose from 190 to 280 ppm.',
  ])('passes: %s', async (text) => {
    expect(await serious(text)).toEqual([]);
  });
});

// A lag of CO2 behind Antarctic temperature does not show that CO2 had no warming effect: Shakun
// et al. 2012, Nature 484, 49-54; Pedro et al. 2012, Climate of the Past 8, 1213-1221.
describe('a denial inside a denied ground ("no evidence that ... cannot") is left open', () => {
  it.each([
    'A lag of a few centuries is no proof that CO2 could not have amplified the warming.',
    'A lag in Antarctica gives no reason to think that CO2 did not warm the planet.',
    'Trailing the warming by a few centuries is no sign that CO2 never added any warmth.',
  ])('passes: %s', async (text) => {
    expect(await serious(text)).toEqual([]);
  });

  it.each([
    'CO2 lagged temperature, so there is no evidence it can have caused any warming.',
    'The lag is proof that CO2 cannot have caused the warming.',
  ])('still flags: %s', async (text) => {
    expect(await serious(text)).toContain('logic.lag-rules-out-cause');
  });
});
