/**
 * Issue 9's failures, restated in sentences of our own: the reader must catch what a sentence
 * asserts in wordings no cue list holds, and leave alone what a debunking piece quotes.
 * The science:
 * - CO2 solubility falls as water warms: Weiss 1974, Marine Chemistry 2, 203-215 (from memory).
 * - Ice-core air is younger than the ice around it (delta-age): Caillon et al. 2003, Science 299,
 *   1728-1731, doi 10.1126/science.1078758.
 * - CO2 amplified a warming the orbit started, and global temperature lagged CO2: Shakun et al.
 *   2012, Nature 484, 49-54, doi 10.1038/nature10915.
 * - Polar swings exceed the global mean: Jouzel et al. 2007, Science 317, 793-796; Tierney et al.
 *   2020, Nature 584, 569-573.
 * - Antarctica warmed during the Younger Dryas (bipolar seesaw): Pedro et al. 2016, Nature
 *   Geoscience 9, 51-55 (from memory).
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { checkText } from '../../src/engine.js';
import { loadPacks } from '../../src/rulepack/index.js';
import type { LoadedPacks } from '../../src/rulepack/types.js';

let packs: LoadedPacks;
beforeAll(async () => {
  packs = await loadPacks([]);
});

const serious = async (text: string) =>
  (await checkText(text, { packs, format: 'markdown' })).flags.filter((f) => f.level !== 'note').map((f) => f.ruleId);

describe('claims read as propositions, in wordings of our own', () => {
  it.each([
    ['Ocean water that heats up soaks in extra carbon dioxide.', 'direction.co2-solubility-falls-with-warming'],
    ['The colder the sea, the less CO2 it manages to keep dissolved.', 'direction.co2-solubility-falls-with-warming'],
    ['The gas sealed in the bubbles is more ancient than the ice that surrounds it.', 'direction.trapped-air-younger-than-ice'],
    ['If the gas only rose after the warming, how could it have driven anything?', 'logic.lag-rules-out-cause'],
    ['That lag tells us the ice cores reveal nothing about climate sensitivity.', 'logic.lag-rules-out-cause'],
    ['CO2 was a product of the warming and never a driver of it.', 'logic.either-or-causation'],
    ['Worldwide, the thermometers climbed first and CO2 trailed along behind.', 'direction.global-co2-ahead-of-warming'],
    ['High latitudes swung less than the world as a whole between glacial and interglacial times.', 'direction.polar-swings-exceed-global'],
    ['In the Younger Dryas the Antarctic grew colder along with Greenland.', 'direction.bipolar-seesaw-younger-dryas'],
    ['Every additional part per million of CO2 heats the planet more than the previous one did.', 'direction.co2-forcing-logarithmic'],
    ['The two curves shadow each other so closely that CO2 must be the thermostat.', 'logic.correlation-as-proof'],
    ['It was the tilt of the orbit, and nothing else, that brought the last glaciation to an end.', 'logic.single-cause'],
    // Pseudo-clefts, "purely because", "all it took": one agent singled out without "alone".
    ['What finished off the last glaciation was carbon dioxide and nothing else.', 'logic.single-cause'],
    ['Carbon welling up from the deep ocean was, on its own, what ended the last ice age.', 'logic.single-cause'],
    ['The glaciers retreated purely because the orbit shifted; the air had no hand in it.', 'logic.single-cause'],
    ["A change in Earth's tilt is all it took to end the last ice age.", 'logic.single-cause'],
    // A role ruled out by degree ("too faint to find"), beside the other direction asserted.
    ["Warming drives CO2, and CO2's influence on temperature is too weak to detect in the cores.", 'logic.either-or-causation'],
    // "once" orders two events; "carbon" is the gas.
    ['Since the carbon only appears once the warming is well under way, none of that warming can be blamed on it.', 'logic.lag-rules-out-cause'],
    // A dismissal ("so much for"), a role put at nothing far after its noun, and a pronoun that
    // acts standing for the gas, not for the ice that records it.
    ['The cores say the warm-up came first and the CO2 only afterwards, so much for CO2 driving the warming.', 'logic.lag-rules-out-cause'],
    ['Since carbon dioxide trails the temperature by centuries, its part in the deglacial warming must surely have been next to nothing.', 'logic.lag-rules-out-cause'],
    ['As the Dome C ice shows carbon dioxide lagging the warmth, it cannot have been a driver of that warmth.', 'logic.lag-rules-out-cause'],
    // Both directions set against each other in one sentence, then one picked.
    ['Put the question of whether the gas pushed the temperature or the temperature pushed the gas to the ice, and the reply is short: temperature.', 'logic.either-or-causation'],
    ['Over the glacial cycles it was the warmth that moved the CO2, not the CO2 that moved the warmth.', 'logic.either-or-causation'],
    // A regional record read as the globe, with a "than" that compares two times, not two places,
    // and a "not just" that widens the claim (Antarctic swing about twice the global mean:
    // Jouzel et al. 2007; global LGM cooling about 6 °C: Tierney et al. 2020).
    ['The deuterium in the Vostok ice shows that Earth as a whole was about 9 °C colder at the glacial peak than before industry.', 'scope.regional-record-as-global'],
    ['The Talos Dome core shows it was far colder in the last glacial, and that is the whole world, not just Antarctica.', 'scope.regional-record-as-global'],
    // A global figure handed to one place, and a short record told of all history (global LGM
    // cooling about 6 °C: Gulev et al. 2021; ice-core CO2 spans 800,000 years: Lüthi et al. 2008).
    ['Earth as a whole ran about 6 °C cooler in the last glacial maximum, hence the Brenmoor fells were exactly 6 °C cooler too.', 'scope.figure-across-scales'],
    ['Our ice holds 800,000 years of CO2, all under 300 ppm, so CO2 has not been this high at any time in the history of the earth.', 'scope.short-record-stretched'],
    // A global order stated in its own words is a direction error, even after a sentence that
    // named an Antarctic record (global temperature lagged CO2: Shakun et al. 2012).
    ['Antarctic temperature rose by about 9 °C in that time. Averaged over the globe, temperature started rising before the carbon dioxide did.', 'direction.global-co2-ahead-of-warming'],
    // A period named two sentences back still sets the scene (Antarctica warmed during the
    // Younger Dryas: Pedro et al. 2016, from memory).
    ['The Younger Dryas was a sharp return to the cold in the north. It lasted from about 12,900 to 11,700 years ago. While Greenland froze, Antarctica cooled too.', 'direction.bipolar-seesaw-younger-dryas'],
    // A °F figure that points back to the °C change of the sentence before, with "readers" inside a
    // phrase that reports nobody's view (NIST SP 811: a change of 1 °C is a change of 1.8 °F).
    ['Global mean temperature at the Last Glacial Maximum was about 6 °C below pre-industrial. For readers who think in Fahrenheit, that makes the ice-age world about 43 °F colder.', 'unit.temperature-difference'],
    // A co-variation said to settle "the question" (the causal one the piece is about).
    ['Temperature and CO2 rise and fall together in the Dome C ice, and a fit that tight settles the matter.', 'logic.correlation-as-proof'],
    // A cause phrase that holds its object; the other factor denied any part; another single agent;
    // idioms of doing the whole work ("did the whole job").
    ['The tilt of the orbit on its own hauled the planet out of the last ice age, and carbon dioxide had no part in it.', 'logic.single-cause'],
    ['The deglaciation happened for one reason only: the deep ocean currents started up again.', 'logic.single-cause'],
    ['Forget the gas: the orbit did the whole job by itself.', 'logic.single-cause'],
  ])('%s → %s', async (text, ruleId) => {
    expect(await serious(text)).toContain(ruleId);
  });

  // A sentence that names only what a direction fact is about (the air, the ice), in a draft
  // whose earlier sentence names the subject, and a verb that compares ages with its object.
  it.each([
    ['The Dome Fuji core was drilled in the 1990s. The air in the bubbles is older than the ice that holds it.', 'direction.trapped-air-younger-than-ice'],
    ['The Dome Fuji core was drilled in the 1990s. The gas in each bubble predates the ice that traps it.', 'direction.trapped-air-younger-than-ice'],
  ])('%s → %s', async (text, ruleId) => {
    expect(await serious(text)).toContain(ruleId);
  });

  it.each([
    'The Dome Fuji core was drilled in the 1990s. The ice predates the air bubbles sealed inside it.',
    'The Dome Fuji core was drilled in the 1990s. The air in the bubbles postdates the ice around it.',
  ])('passes the right way round: %s', async (text) => {
    expect(await serious(text)).not.toContain('direction.trapped-air-younger-than-ice');
  });

  it.each([
    // A share is not a single cause; "global warming" is a noun, not the orbit warming anything.
    'Warmer seas alone account for only part of the glacial-to-interglacial CO2 rise, perhaps a quarter of it.',
    'On their own, the orbital changes cannot account for several degrees of global warming.',
  ])('no single cause: %s', async (text) => {
    expect(await serious(text)).not.toContain('logic.single-cause');
  });

  it('a record set against the global mean passes: Antarctic swings are larger than the global mean', async () => {
    expect(await serious('The Vostok record swings by about 9 °C, larger than the global mean change of about 5 °C.')).not.toContain('scope.regional-record-as-global');
  });

  it('a co-variation that settles nothing causal passes: the match settles the dating question', async () => {
    expect(await serious('Temperature and CO2 rise and fall together in the Dome C ice; the match does not settle the question on its own.')).not.toContain('logic.correlation-as-proof');
  });

  // The choice answered with both directions is the right answer.
  it('passes a choice answered with both: each pushed the other', async () => {
    expect(await serious('Ask whether CO2 pushed the temperature or the temperature pushed CO2, and the answer is both: each pushed the other.')).not.toContain('logic.either-or-causation');
  });

  it.each([
    // "holds less", "keeps more": the size word is the uptake's, not a change of temperature.
    'Sea water that heats up holds less dissolved CO2, not more, so a warming ocean hands some gas back to the air.',
    'Ocean water that warms can keep less carbon dioxide in solution.',
    // A warmth of nothing named, in another clause; an uptake set aside with "rather than".
    'Cold water holds more dissolved CO2 than warm water, which is why a fizzy drink goes flat on a hot day.',
    'A warmer ocean gives up carbon dioxide rather than absorbing more of it.',
    // A region past a comma that has its own verb is that clause's subject (Antarctica warmed
    // during the Younger Dryas: Pedro et al. 2016, from memory).
    'During the Younger Dryas, while Greenland was plunged back into the cold, Antarctica was slowly warming.',
  ])('the solubility fact the right way round: %s', async (text) => {
    expect(await serious(text)).toEqual([]);
  });

  it('the solubility fact the wrong way round, with a size word on the verb: a colder sea keeps less CO2', async () => {
    expect(await serious('A colder ocean keeps less carbon dioxide dissolved, and a warmer one keeps more.')).toContain('direction.co2-solubility-falls-with-warming');
  });

  it.each([
    'Warm ocean water holds less CO2, so the warming seas gave some of it back to the air.',
    'The trapped air is younger than the ice around it, because bubbles close only deep in the firn.',
    'CO2 rose after the first Antarctic warming, and then it amplified the warming and spread it around the globe.',
    'Orbital changes started the warming; CO2 then amplified it, each driving the other.',
    'Antarctic temperature climbed a few centuries before CO2, while global temperature mostly followed the CO2 rise.',
    'Polar regions swung two or three times more than the planet as a whole.',
    'Each additional ppm adds a little less warming than the one before.',
    'The curves move together, as expected when each amplifies the other, but the match alone proves nothing.',
    'The orbit alone was too weak to end the ice age.',
    'What ended the ice ages was a combination of orbital changes and CO2.',
    'The orbit was what set the pace of the ice ages.',
    'It was CO2 that pulled the planet out of the ice age, after the orbit set things in motion.',
  ])('passes: %s', async (text) => {
    expect(await serious(text)).toEqual([]);
  });
});

describe('what a debunking piece quotes is not its own claim', () => {
  it('passes a Myth/Fact layout and flags the same claim asserted', async () => {
    const myth = 'Myth: Carbon dioxide trailed the warming, so it cannot have caused any of it.\n\nFact: it amplified a warming that orbital changes began.\n';
    expect(await serious(myth)).toEqual([]);
    expect(await serious('Carbon dioxide trailed the warming, so it cannot have caused any of it.\n')).toContain('logic.lag-rules-out-cause');
  });

  it('passes a section headed as the myth, a block quote and an attributed claim, but not an endorsed one', async () => {
    expect(await serious('## What you may hear\n\nThe lag proves CO2 is a passenger.\n\n## What the cores show\n\nCO2 amplified the warming.\n')).toEqual([]);
    expect(await serious('> Because CO2 lagged by 800 years, it cannot have warmed anything.\n')).toEqual([]);
    expect(await serious('Some bloggers insist that CO2 lagged, so it cannot have warmed anything.\n')).toEqual([]);
    expect(await serious('Some bloggers insist that CO2 lagged, so it cannot have warmed anything, and they are right.\n')).toContain('logic.lag-rules-out-cause');
  });

  it('reads a report whose verb has an object or a time before its "that", and keeps "tells us that" as the record speaking', async () => {
    // Orbital changes alone were too weak to end the ice age (Shakun et al. 2012): reported here.
    expect(await serious('Another correspondent wrote last month that the orbit alone ended the ice age; nobody who has read the literature believes that.\n')).toEqual([]);
    expect(await serious('The council\'s leaflet told residents that the ice cores prove CO2 is a passenger, never a driver.\n')).toEqual([]);
    // A record telling the writer is no outside report: Antarctic 8-10 °C is not the global change (Tierney et al. 2020).
    expect(await serious('The Vostok layers tell us that the Earth as a whole was about 9 °C colder at the glacial maximum.\n')).toContain('scope.regional-record-as-global');
  });

  it('holds a statement before a question in the same sentence as the draft\'s own, and the question as asked', async () => {
    // The premise is asserted ("..., so how can you trust any of it?"); delta-age: Caillon et al. 2003.
    expect(await serious('The gas in the bubbles is older than the ice around it, so how can anyone trust the record?\n')).toContain('direction.trapped-air-younger-than-ice');
    expect(await serious('The gas in the bubbles is younger than the ice around it, so how can anyone distrust the record?\n')).toEqual([]);
    // A question from its first word asks, and asserts nothing.
    expect(await serious('Is the gas in the bubbles older than the ice around it?\n\nNo: it is younger, by centuries to millennia.\n')).toEqual([]);
  });

  it('counts claims under the reported marker and keeps their flags as notes', async () => {
    const result = await checkText('<!-- firnline: reported -->\nThe Vostok ice core spans 800,000 years.\n', { packs, format: 'markdown' });
    expect(result.claims.map((c) => c.marked)).toEqual([true]);
    expect(result.flags.map((f) => [f.ruleId, f.level])).toEqual([['value.vostok-record-span', 'note']]);
  });
});

describe('a draft is on topic because it names the subject', () => {
  it('skips a file whose only numbers have nothing to do with ice ages or CO2', async () => {
    const result = await checkText('The newsletter budget rose 2.5 percent, and 40 percent of readers renewed.\n', { packs });
    expect(result.claims).toEqual([]);
    expect(result.skipped).toEqual([{ file: '-', reason: 'names no subject of the packs' }]);
  });

  it('does not make a claim of an unrelated percentage in a draft that is on topic', async () => {
    const result = await checkText('The Vostok core spans about 420,000 years.\n\nThe shop handles 2.5 percent of our budget.\n', { packs });
    expect(result.claims.map((c) => c.text)).toEqual(['The Vostok core spans about 420,000 years.']);
  });
});

describe('order and comparison read past verbs of change and adverbs of degree', () => {
  // Shakun et al. 2012 (global temperature lagged CO2); Caillon et al. 2003 (air younger than its
  // ice); Jouzel et al. 2007 and Tierney et al. 2020 (polar swings exceed the global mean).
  it.each([
    ['In the last deglaciation the global mean temperature started climbing before CO2 did.', 'direction.global-co2-ahead-of-warming'],
    ['In the ice-core era the poles respond more sluggishly than the planet as a whole.', 'direction.polar-swings-exceed-global'],
    ['In an ice core the trapped air has been around longer than the ice that surrounds it.', 'direction.trapped-air-younger-than-ice'],
  ])('%s → %s', async (text, ruleId) => {
    expect(await serious(text)).toContain(ruleId);
  });
});

describe('a record named in a closing "as" clause is the record the sentence reads', () => {
  // Regional polar records are not global temperature: Jouzel et al. 2007 (EPICA Dome C, Antarctic
  // swings of about 8-10 °C); Tierney et al. 2020 (global LGM cooling about 6 °C); Buizert et al. 2014
  // (Greenland's abrupt warmings far larger than the global mean).
  it.each([
    'At the end of the Younger Dryas the whole planet warmed by about 10 °C in a few decades, as the Greenland ice records.',
    'Follow this line and you follow the temperature of the entire Earth for 800,000 years, as preserved in the EPICA Dome C ice.',
  ])('flags: %s', async (text) => {
    expect(await serious(text)).toContain('scope.regional-record-as-global');
  });
  it.each([
    'The global mean fell by about 6 °C in the last ice age, as ocean sediment records show.',
    'Antarctica warmed by about 9 °C, as the Dome C ice records, while the global mean rose by about 5 °C.',
  ])('passes: %s', async (text) => {
    expect(await serious(text)).not.toContain('scope.regional-record-as-global');
  });
});

describe('the time and the places of a change read past the sentence and the comma', () => {
  // Antarctica warmed slightly during the Younger Dryas while Greenland cooled (bipolar seesaw):
  // Pedro et al. 2016, Nature Geoscience 9, 51-55 (from memory); WAIS Divide Project Members 2015,
  // Nature 520, 661-665, doi 10.1038/nature14401 (from memory).
  it('takes the period the block before named, for a speaker\'s next turn or the next paragraph', async () => {
    const turns = 'HOST: Then came the Younger Dryas, when the north slid back into the cold.\n\nGUEST: And through that stretch Antarctica was plunging into the cold as well.\n';
    expect(await serious(turns)).toContain('direction.bipolar-seesaw-younger-dryas');
    const right = 'HOST: Then came the Younger Dryas, when the north slid back into the cold.\n\nGUEST: Meanwhile Antarctica was slowly warming.\n';
    expect(await serious(right)).toEqual([]);
  });

  it('does not carry a period past a new heading', async () => {
    const text = '## The Younger Dryas\n\nThe north slid back into the cold for about 1,200 years.\n\n## The last glacial maximum\n\nAntarctica was far colder than today.\n';
    expect(await serious(text)).toEqual([]);
  });

  it('gives a change said "alongside" another place to the place that holds it', async () => {
    expect(await serious('In the Younger Dryas, Antarctica shivered too, cooling alongside Greenland.\n')).toContain('direction.bipolar-seesaw-younger-dryas');
    expect(await serious('In the Younger Dryas, Greenland shivered, cooling alongside Scandinavia, while Antarctica warmed a little.\n')).toEqual([]);
  });
});

describe('a timing is no feedback', () => {
  // Antarctic temperature and CO2 within a few centuries in the last deglaciation: Parrenin et al.
  // 2013, Science 339, 1060-1063, doi 10.1126/science.1226368. Each amplified the other (Shakun et
  // al. 2012), so "temperature drives CO2, not the other way round" is the either/or error.
  it('flags the either/or after a sentence that puts the two "within a few centuries of each other"', async () => {
    const text = 'Better-dated cores put Antarctic warming and the CO2 rise within a few centuries of each other. The ice settles it: temperature drives CO2, not the other way round.\n';
    expect(await serious(text)).toContain('logic.either-or-causation');
    const loop = 'Antarctic warming and the CO2 rise fed each other. Temperature drives CO2, and CO2 drives temperature in return.\n';
    expect(await serious(loop)).not.toContain('logic.either-or-causation');
  });
});

describe('the lag put as a maxim about latecomers', () => {
  // A lag of CO2 behind Antarctic temperature does not rule CO2 out as a cause; it amplified the
  // warming: Shakun et al. 2012, Nature 484, 49-54, doi 10.1038/nature10915; Parrenin et al. 2013.
  it.each([
    'In the Dome C ice, CO2 climbed centuries after Antarctic temperature. Anything that arrives after the fire is lit cannot be what started the blaze.',
    'The record shows CO2 rising after the warming, and a gas that shows up that late can\'t have done any of the heating.',
  ])('flags %j', async (text) => {
    expect(await serious(`${text}\n`)).toContain('logic.lag-rules-out-cause');
  });

  it.each([
    // The same maxim with no lag before it is not about CO2.
    'The museum opened its doors in 1998. A visitor who arrives after closing cannot be let in.',
    // A latecomer granted a part is the right reading.
    'In the Dome C ice, CO2 climbed centuries after Antarctic temperature. Something that turns up late can still amplify what started before it.',
  ])('passes %j', async (text) => {
    expect(await serious(`${text}\n`)).not.toContain('logic.lag-rules-out-cause');
  });
});

describe('the lag argument as informal posts write it', () => {
  // A lag of CO2 behind Antarctic temperature does not rule CO2 out as a cause; it amplified the
  // warming: Shakun et al. 2012, Nature 484, 49-54, doi 10.1038/nature10915; Parrenin et al. 2013,
  // Science 339, 1060-1063, doi 10.1126/science.1226368.
  it.each([
    // Negative contractions with no apostrophe (common practice in posts and chats).
    'The cores have CO2 going up after the heat, so CO2 cant be the cause of the heat.',
    'Carbon dioxide trails the temperature in the Vostok ice, so it doesnt cause the warming at all.',
    'CO2 lagged the warming by centuries, which means it couldnt have caused any of it.',
    // "late" with no object: later than the warming the sentence is about.
    'The gas always arrives late, so it cannot be responsible for the thaw.',
    'CO2 turned up late in the ice-core record and therefore played no part in warming the planet.',
    // "too ADJ to VERB": the verb did not happen, whatever the adjective.
    'Carbon dioxide climbed far too late to have warmed anything at the end of the ice age.',
    'In the Dome C record CO2 rose too late to be a cause of the warming.',
  ])('flags %j', async (text) => {
    expect(await serious(`${text}\n`)).toContain('logic.lag-rules-out-cause');
  });

  it.each([
    // "late" before its noun names a time.
    'In the late Pleistocene, CO2 and Antarctic temperature rose and fell together, each amplifying the other.',
    // Arrived late and still amplified: the right reading.
    'CO2 arrived late in the thaw and then amplified the warming the orbit had begun.',
    // "too" as "also", with a comma after it.
    'Antarctic temperature rose, and CO2 rose too, to about 280 ppm, adding to the warming.',
    // "cant" and "wont" as nouns are no negation.
    'As is her wont, the curator ends the tour at the Vostok core, where CO2 drove part of the warming.',
  ])('passes %j', async (text) => {
    expect(await serious(`${text}\n`)).not.toContain('logic.lag-rules-out-cause');
  });
});

describe('comparisons and causes past interrupting phrases and loose forms', () => {
  // Polar temperature swings exceed the global mean's (polar amplification): Jouzel et al. 2007,
  // Science 317, 793-796; Tierney et al. 2020, Nature 584, 569-573. The orbit paced the ice ages and
  // CO2 amplified the change: Shakun et al. 2012, Nature 484, 49-54, doi 10.1038/nature10915.
  it.each([
    // The subject past a phrase set off by commas.
    ['Over the ice ages, polar regions, shielded by their ice caps, varied less than the world as a whole.', 'direction.polar-swings-exceed-global'],
    ['Greenland, for all its glaciers, swung less than the global mean between glacial and interglacial times.', 'direction.polar-swings-exceed-global'],
    // "those of X", "that of X": the thing after "of" is what is compared.
    ['In the glacial cycles, the swings at the poles were milder than those of the global average.', 'direction.polar-swings-exceed-global'],
    ["Across the ice ages, Antarctica's temperature changes were smaller than that of the planet as a whole.", 'direction.polar-swings-exceed-global'],
    // "all of the" is "all the".
    ['The tilt of the orbit did all of the work by itself.', 'logic.single-cause'],
    ['Orbital changes did all of the work on their own at the end of the last ice age.', 'logic.single-cause'],
  ])('flags %j', async (text, rule) => {
    expect(await serious(`${text}\n`)).toContain(rule);
  });

  it.each([
    ['Over the ice ages, polar regions, shielded by their ice caps, varied more than the world as a whole.', 'direction.polar-swings-exceed-global'],
    ['In the glacial cycles, the swings at the poles were larger than those of the global average.', 'direction.polar-swings-exceed-global'],
    ['The orbit did some of the work, and CO2 did much of the rest.', 'logic.single-cause'],
  ])('passes %j', async (text, rule) => {
    expect(await serious(`${text}\n`)).not.toContain(rule);
  });
});

describe('proof that points back to a correlation stated just before', () => {
  // Co-variation of CO2 and Antarctic temperature in the cores does not by itself show which drives
  // which; each amplified the other (Shakun et al. 2012, Nature 484, 49-54; Parrenin et al. 2013,
  // Science 339, 1060-1063).
  it.each([
    'The gas and the temperature move in lockstep in the Dome C ice. That is proof carbon dioxide runs the climate.',
    'In the Vostok record the two curves rise and fall together. This proves that carbon dioxide sets the temperature.',
    'CO2 and Antarctic temperature track each other for 800,000 years. Which is conclusive evidence that CO2 controls the ice ages.',
  ])('flags %j', async (text) => {
    expect(await serious(`${text}\n`)).toContain('logic.correlation-as-proof');
  });

  it.each([
    // The proof denied, or no cause offered, or a feedback stated.
    'The gas and the temperature move in lockstep in the Dome C ice. That does not prove carbon dioxide runs the climate.',
    'In the Vostok record the two curves rise and fall together. This is what we expect when each amplifies the other.',
    'In the Vostok record the two curves rise and fall together. It shows the orbit paced the cycles.',
  ])('passes %j', async (text) => {
    expect(await serious(`${text}\n`)).not.toContain('logic.correlation-as-proof');
  });
});
