/**
 * A labelled corpus for the reasoning checks: our own writing, set in three invented scenarios
 * (the audio guide of the Halvard Ice Gallery, the Larchmoor Primary School newsletter and the
 * science desk of the Tidewater Courier). Each item is one paragraph, given as its sentences, and
 * the rule ids a careful reviewer expects on it (empty: the paragraph is correct and must pass).
 *
 * The science behind the labels (citations as in the shared reference-values file):
 * - Antarctic temperature and CO2 changed within a few centuries of each other in the last
 *   deglaciation: Pedro et al. 2012, Clim. Past 8, 1213-1221, doi 10.5194/cp-8-1213-2012;
 *   Parrenin et al. 2013, Science 339, 1060-1063, doi 10.1126/science.1226368.
 * - Global temperature generally lagged CO2: Shakun et al. 2012, Nature 484, 49-54,
 *   doi 10.1038/nature10915.
 * - The 800 +/- 200 yr lag belongs to Termination III at Vostok: Caillon et al. 2003, Science 299,
 *   1728-1731, doi 10.1126/science.1078758; the same paper explains that the trapped air is younger
 *   than the ice around it.
 * - Orbital cycles pace the ice ages: Hays, Imbrie & Shackleton 1976, Science 194, 1121-1132.
 * - Warmer water holds less dissolved CO2: Weiss 1974, Marine Chemistry 2, 203-215 (from memory).
 * Written before the detectors were tuned; hard items were kept.
 */
import { DIRECTIONS } from './corpus-directions.js';
import { PHRASINGS } from './corpus-phrasings.js';
import { toItems, type CorpusItem, type Row } from './corpus-item.js';

export type { CorpusItem } from './corpus-item.js';

const LAG = 'logic.lag-rules-out-cause';
const EITHER = 'logic.either-or-causation';
const CORR = 'logic.correlation-as-proof';
const REGIONAL = 'scope.regional-record-as-global';
const ANT_LAG = 'scope.antarctic-lag-as-global';
// Session 20: a figure handed across scales, and a short record stretched (global LGM cooling about
// 6 °C, central Greenland about 20 °C: Gulev et al. 2021, Dahl-Jensen et al. 1998; ice-core CO2 covers
// 800,000 years: Lüthi et al. 2008; the 2024 CO2 rise of 3.5 ppm a record: WMO 2025).
const SCALES = 'scope.figure-across-scales';
const STRETCHED = 'scope.short-record-stretched';
const SINGLE = 'logic.single-cause';
const CERTAIN = 'logic.ice-core-certainty';
const SOLUBILITY = 'direction.co2-solubility-falls-with-warming';
const AIR_AGE = 'direction.trapped-air-younger-than-ice';
const GLOBAL_ORDER = 'direction.global-co2-ahead-of-warming';


/** Errors: each paragraph makes (or reports without answering) at least one argument error. */
const errors: Row[] = [
  ['newsletter', 'At the glacial maximum the globe was about 6 °C colder, so our village green was 6 °C colder too.', [SCALES]],
  ['audio guide', ['Central Greenland was some 20 °C colder at the glacial maximum.', 'So the northern hemisphere must have been 20 °C colder as well.'], [SCALES]],
  ['science desk', 'The 800,000 years of Dome C air never held more than 300 ppm of CO2, so CO2 has never topped 300 ppm in the history of the planet.', [STRETCHED]],
  ['newsletter', 'The 2024 jump of 3.5 ppm in CO2 means we are adding 3.5 ppm every single year.', [STRETCHED]],
  ['science desk', 'In the Vostok core, CO2 rose about 800 years after Antarctic temperature, so CO2 cannot have caused the warming.', [LAG]],
  ['science desk', 'Carbon dioxide lagged the warming by centuries, which means it could not have been the cause.', [LAG]],
  ['newsletter', "Since CO2 came after the temperature rise, it can't be what drove the end of the ice age.", [LAG]],
  ['science desk', 'The CO2 increase trailed the warming at every termination, so carbon dioxide plays no role in climate.', [LAG]],
  ['audio guide', 'Because temperature changed first, CO2 is an effect of warming, not a cause.', [LAG]],
  ['science desk', 'Temperature led CO2 in the ice-core record, proving that CO2 does not drive temperature.', [LAG]],
  ['newsletter', 'Pupils learned that the CO2 rise came after the warming, so CO2 could not have warmed the planet.', [LAG]],
  ['science desk', 'The lag rules out carbon dioxide as a driver of the deglacial warming.', [LAG]],
  ['audio guide', 'If CO2 follows temperature, as the ice cores show, then it cannot be the cause of temperature change.', [LAG]],
  ['newsletter', 'CO2 only went up after the ice had started melting; therefore it had nothing to do with the warming.', [LAG]],
  ['science desk', 'Warming came first and CO2 second, so the greenhouse effect of CO2 must be negligible.', [LAG]],
  ['science desk', "Because CO2 lags temperature by hundreds of years, today's CO2 rise cannot be warming the planet.", [LAG]],
  ['science desk', 'So the lesson of the ice cores is simple: CO2 followed temperature and therefore cannot cause warming today.', [LAG]],

  ['science desk', 'Either CO2 drives temperature or temperature drives CO2, and the ice cores show it is the second.', [EITHER]],
  ['audio guide', 'The ice-core record shows that temperature drives CO2, not the other way round.', [EITHER]],
  ['science desk', ['Does carbon dioxide control temperature, or does temperature control carbon dioxide?', 'The cores give a clear answer: temperature.'], [EITHER]],
  ['newsletter', 'It is temperature that drives CO2 and not vice versa.', [EITHER]],
  ['science desk', 'The real driver of the glacial cycles was temperature rather than CO2.', [EITHER]],
  ['newsletter', 'You have to pick one: CO2 causes warming or warming causes CO2 release.', [EITHER]],
  ['audio guide', 'In the ice ages, warming was the cause and CO2 was the effect, never the other way around.', [EITHER]],
  ['science desk', 'The chicken-and-egg question has a clear answer: temperature came first, so temperature is the cause and CO2 only the consequence.', [EITHER, LAG]],
  ['science desk', 'The cores make it plain that warming drives CO2, and CO2 does not drive warming.', [EITHER]],

  ['science desk', 'The close match between the CO2 and temperature curves in the Dome C core proves that CO2 controls the climate.', [CORR]],
  ['newsletter', 'Because CO2 and temperature rise and fall together over 800,000 years, CO2 must be driving the temperature.', [CORR]],
  ['science desk', 'The two curves track each other so closely that there can be no doubt CO2 sets the temperature.', [CORR]],
  ['science desk', 'The correlation between carbon dioxide and Antarctic temperature shows that carbon dioxide causes the temperature changes.', [CORR]],
  ['audio guide', 'CO2 and temperature moved in lockstep, which demonstrates that temperature drives CO2.', [CORR]],
  ['audio guide', 'Look at the two lines on the wall rising and falling together: that is the proof that carbon dioxide controls our climate.', [CORR]],
  ['science desk', 'A correlation this strong is proof that CO2 is the thermostat of the planet.', [CORR]],
  ['science desk', 'The lines match so well that the correlation settles which one is the cause: temperature.', [CORR]],

  ['science desk', 'The Vostok ice core shows that global temperature swung by about 10 °C between ice ages and warm periods.', [REGIONAL]],
  ['audio guide', 'This Antarctic temperature curve is the temperature history of the whole planet for the last 800,000 years.', [REGIONAL]],
  ['audio guide', "The EPICA Dome C record tells us Earth's temperature over eight glacial cycles.", [REGIONAL]],
  ['newsletter', "Greenland's ice shows that the world warmed by 10 degrees in a few decades at the end of the Younger Dryas.", [REGIONAL]],
  ['science desk', 'According to the Vostok record, the planet was 8 degrees colder at the height of the last ice age.', [REGIONAL]],
  ['science desk', 'One ice core from Dome Fuji gives us the global temperature for the past 720,000 years.', [REGIONAL]],
  ['audio guide', 'The deuterium line in this display is the global temperature record, read from Antarctic ice.', [REGIONAL]],

  // A global order with no record and no figure ("centuries") is the direction fact (the blind writers key it so).
  ['science desk', 'Globally, temperature rose about 800 years before CO2 at the end of the last ice age.', [ANT_LAG]],
  ['science desk', 'Worldwide, the warming led carbon dioxide by 600 to 800 years.', [ANT_LAG]],
  ['newsletter', 'Ice cores show that CO2 lagged global temperature by about 800 years during each deglaciation.', [ANT_LAG]],
  ['audio guide', 'The planet warmed centuries before carbon dioxide began to rise.', [GLOBAL_ORDER]],
  ['science desk', 'Global temperatures started climbing roughly 1,000 years ahead of the CO2 rise.', [ANT_LAG]],
  ['science desk', 'Since Vostok shows Antarctica warming first, the whole Earth must have warmed before CO2 rose.', [ANT_LAG]],

  ['newsletter', "The ice ages ended because of changes in Earth's orbit alone.", [SINGLE]],
  ['science desk', 'Carbon dioxide alone ended the last ice age.', [SINGLE]],
  ['science desk', 'The deglacial warming was caused entirely by the Milankovitch cycles.', [SINGLE]],
  ['audio guide', 'Orbital changes, not CO2, caused the warming at the end of the ice age.', [SINGLE]],
  ['science desk', 'The only cause of the deglacial warming was the rise in carbon dioxide.', [SINGLE]],
  ['science desk', "The glacial cycles are driven solely by the wobbles of Earth's orbit.", [SINGLE]],
  ['newsletter', "The sun's changing position was the one and only reason the ice melted.", [SINGLE]],
  ['audio guide', 'It was the orbit, and nothing else, that warmed the planet out of the last ice age.', [SINGLE]],
  ['science desk', 'Milankovitch cycles alone explain the 100,000-year rhythm of the ice ages.', [SINGLE]],

  ['science desk', 'As the oceans warmed, they absorbed more CO2 from the air.', [SOLUBILITY]],
  ['newsletter', 'Warmer water can hold more dissolved carbon dioxide than cold water.', [SOLUBILITY]],
  ['science desk', 'Cold oceans release CO2, which is why glacial air held so much of it.', [SOLUBILITY]],
  ['science desk', 'Heating seawater increases how much CO2 it can dissolve.', [SOLUBILITY]],
  ['audio guide', 'When the sea cools it gives off carbon dioxide.', [SOLUBILITY]],
  ['science desk', 'Cooling water drives CO2 out of the ocean, which is why CO2 fell in glacial times.', [SOLUBILITY]],

  ['audio guide', 'The air bubbles in the ice are older than the ice that surrounds them.', [AIR_AGE]],
  ['science desk', 'The ice around each bubble is younger than the air trapped inside it.', [AIR_AGE]],
  ['science desk', 'Trapped air has the same age as the ice layer it sits in, so no correction is needed.', [AIR_AGE]],
  ['newsletter', 'Because the bubbles are sealed long before the ice forms, the gas is older than the ice.', [AIR_AGE]],

  ['science desk', 'Across the globe, warming came first and CO2 followed during the last deglaciation.', [GLOBAL_ORDER]],
  ['science desk', 'Global temperature rose before CO2 at the end of the last ice age.', [GLOBAL_ORDER]],
  ['newsletter', 'CO2 lagged behind global warming during the last deglaciation.', [GLOBAL_ORDER]],
  ['science desk', 'Global mean temperature led the CO2 rise out of the last glacial maximum.', [GLOBAL_ORDER]],

  ['science desk', "The ice cores prove beyond doubt that CO2 controls Earth's temperature.", [CERTAIN]],
  ['audio guide', 'The Vostok core settles the question of what caused the ice ages.', [CERTAIN]],
  ['science desk', 'Ice-core data alone conclusively show how sensitive the climate is to CO2.', [CERTAIN]],
  ['audio guide', 'The Dome C bubbles are definitive proof of the greenhouse effect.', [CERTAIN]],

  // Reported but left unanswered in the paragraph: still a problem, at warning level.
  // Reported and not the writer's own (DESIGN.md, stance): a note for the editor, not an error.
  ['science desk', 'Some argue that CO2 rose after the warming, so it cannot have caused it.', []],
  ['science desk', 'Critics say temperature drives CO2, not the other way round.', [EITHER]],
  ['audio guide', ['Visitors often ask us about a common claim.', "'CO2 lagged temperature by 800 years, so it can't be the cause.'"], [LAG]],
  ['science desk', 'A popular argument holds that the Vostok curve is the temperature of the whole planet.', [REGIONAL]],
  ['newsletter', ['Sceptics often claim that warmer oceans absorb more CO2.', 'We will look at this next week.'], [SOLUBILITY]],
];

/** Correct statements: lags, leads, feedbacks, Antarctic records, the orbital trigger, rebuttals. */
const correct: Row[] = [
  ['newsletter', 'At the glacial maximum the globe was about 6 °C colder, but our village, near the ice sheet, cooled far more.', []],
  ['audio guide', ['Central Greenland was some 20 °C colder at the glacial maximum.', 'The northern hemisphere as a whole cooled much less than that.'], []],
  ['science desk', 'The 800,000 years of Dome C air never held more than 300 ppm of CO2; older evidence puts today above any level in at least 2 million years.', []],
  ['newsletter', 'The 2024 jump of 3.5 ppm in CO2 was a record; through the 2010s CO2 rose about 2.4 ppm a year.', []],
  ['science desk', 'In Antarctic ice cores, CO2 rose within a few centuries of Antarctic temperature at the end of the last ice age.', []],
  ['science desk', 'The lag does not rule out CO2 as a cause: once the ocean began to release CO2, the extra CO2 amplified the warming.', []],
  ['audio guide', 'Orbital changes triggered the warming, and CO2 released from the Southern Ocean then amplified it and spread it around the globe.', []],
  ['science desk', 'Globally, temperature lagged CO2 during the last deglaciation (Shakun et al. 2012).', []],
  ['newsletter', 'CO2 acted as a feedback: warming released it, and it caused further warming.', []],
  ['science desk', 'A lag of CO2 behind Antarctic temperature is what we expect if CO2 is a feedback rather than the initial trigger.', []],
  ['science desk', 'It is not a case of either CO2 driving temperature or temperature driving CO2: each drives the other.', []],
  ['science desk', ['You may hear that CO2 rose after the warming, so it cannot have caused it.', 'That argument mixes up the trigger and the amplifier: the orbit started the warming and CO2 made it larger.'], []],
  ['science desk', ["'Temperature drives CO2, not the other way round,' one reader wrote to us.", 'In fact both are true at once: warming released CO2 and the CO2 warmed the planet further.'], []],
  ['audio guide', 'The Vostok record shows Antarctic temperature, which changed roughly twice as much as the global average.', []],
  ['science desk', 'Antarctic cores record the local temperature at the drill site, not the global mean.', []],
  ['science desk', 'The CO2 in Antarctic ice is a global signal, because the gas mixes through the whole atmosphere within a year or two.', []],
  ['science desk', 'The correlation between CO2 and temperature does not by itself show which one drives the other.', []],
  ['newsletter', 'CO2 and temperature rose and fell together in the Dome C record; physics, not the correlation alone, tells us that CO2 traps heat.', []],
  ['audio guide', 'The air in the bubbles is younger than the surrounding ice, because snow stays open to the atmosphere until it is buried deep enough to seal.', []],
  ['science desk', 'Warmer water holds less dissolved CO2, so a warming Southern Ocean gave some of its carbon back to the air.', []],
  ['science desk', 'Orbital changes alone were too weak to end the ice age; the CO2 feedback and shrinking ice sheets did much of the work.', []],
  ['science desk', 'Ice cores alone cannot prove how much warming CO2 causes; that estimate also needs physics and other records.', []],
  ['science desk', 'In the Dome C core, Antarctic warming and the CO2 rise started within a few centuries of each other (Parrenin et al. 2013).', []],
  ['science desk', 'Antarctic temperature may have led CO2 by a few hundred years at the very start of the deglaciation, but global temperature followed CO2.', []],
  ['science desk', 'The 800-year lag reported for Termination III applies to Antarctica, not to the whole planet.', []],
  ['audio guide', 'The blue line is the temperature at Dome C in Antarctica, and the red line is carbon dioxide.', []],
  ['science desk', 'Some people argue that the lag proves CO2 is unimportant, but a lag is exactly what a feedback produces.', []],
  ['science desk', ['A common myth says the ice cores show CO2 cannot cause warming.', 'The cores show nothing of the kind: they show CO2 and temperature reinforcing each other.'], []],
  ['newsletter', 'After the orbit nudged northern summers warmer, ice sheets began to melt and CO2 started to rise.', []],
  ['newsletter', 'Warming can release CO2, and CO2 can cause warming; the two are not alternatives.', []],
  ['science desk', 'Temperature and CO2 rose together, and that fits the picture of a feedback, although the match alone does not prove it.', []],
  ['science desk', 'The Greenland record shows abrupt regional warming of about 10 °C at the end of the Younger Dryas.', []],
  ['science desk', 'Because the air is younger than the ice, scientists correct the gas ages before comparing CO2 with temperature.', []],
  ['science desk', 'The lag in Antarctica does not mean CO2 cannot cause warming; it means something else started the warming.', []],
  ['science desk', 'Most of the global warming came after CO2 began to rise, which is consistent with CO2 amplifying it.', []],
  ['newsletter', "Year 6 learned that CO2 and the Earth's orbit worked together to end the last ice age.", []],
  ['audio guide', 'No single ice core can tell us the temperature of the whole planet.', []],
  ['science desk', 'The claim that warming came first so CO2 cannot matter is wrong, because the two feed each other.', []],
  ['science desk', 'Scientists combined more than 80 records from around the world to build a global temperature curve.', []],
  ['audio guide', 'At Vostok, the air in the bubbles can be thousands of years younger than the ice around it.', []],
  ['science desk', 'Carbon dioxide is not the trigger of the ice-age cycles; the orbit is, and CO2 then amplifies the change.', []],
  ['audio guide', 'The sequence runs like this: orbital forcing first, then warming in the south and CO2 release, then global warming.', []],
  ['science desk', 'Earlier studies put the Antarctic lag at about 800 years, and later work with better dating cut it to a few centuries or less.', []],
  ['science desk', 'The orbit paces the ice ages, but it cannot explain their size without the CO2 and ice-sheet feedbacks.', []],
  ['science desk', 'The Southern Hemisphere warmed first, while the Northern Hemisphere and the global average warmed after CO2 rose.', []],
  ['newsletter', 'Cold seawater dissolves more CO2 than warm seawater, which helps explain the low CO2 of glacial times.', []],
  ['audio guide', 'The ice records CO2 for the whole atmosphere, but its temperature signal is Antarctic.', []],
  ['science desk', ['Does CO2 drive temperature, or does temperature drive CO2?', 'During the deglaciation the answer is both: each amplified the other.'], []],
  ['science desk', 'The CO2 curve lags the Antarctic temperature curve slightly, which the feedback explanation predicts.', []],
  ['science desk', "Saying 'CO2 lagged, so it cannot be a cause' confuses what started the warming with what sustained it.", []],
  ['audio guide', 'The close match between the curves is striking, but it cannot by itself tell us which change came first.', []],
  ['audio guide', 'This display shows Antarctic temperatures, which swung more widely than the global mean.', []],
  ['science desk', 'CO2 rose by about 80 to 100 ppm during the last deglaciation while Antarctica warmed.', []],
  ['science desk', 'The warming that ended the last ice age was set off by orbital changes and amplified by CO2.', []],
  ['science desk', 'Greenland and Antarctica did not warm in step: when one warmed, the other often cooled.', []],
  ['science desk', 'The planet warmed by roughly 5 to 6 °C from the Last Glacial Maximum to the pre-industrial period.', []],
  ['science desk', 'Taken together, the ice cores and ocean sediments show that CO2 rose before most of the global warming.', []],
  ['science desk', ['Some say the ice cores prove that CO2 does not matter.', 'They do not: the same cores show CO2 amplifying every deglaciation.'], []],
  ['science desk', 'Only part of the deglacial CO2 rise can be explained by warmer water releasing gas; changes in ocean circulation did the rest.', []],
  ['science desk', 'Temperature changes in Antarctica came slightly earlier than the CO2 changes, but this lead was a few centuries at most.', []],
  ['science desk', 'If CO2 were only an effect and never a cause, the glacial cycles would be much weaker than the records show.', []],
  ['science desk', 'The old 800-year figure comes from Termination III, about 240,000 years ago, and should not be quoted as the lag for the last deglaciation.', []],
  ['newsletter', 'Warming oceans hold less CO2, so they released some of it to the atmosphere as they warmed.', []],
  ['audio guide', 'Feedbacks work both ways: warming releases CO2, and CO2 causes more warming.', []],
];

/**
 * Every labelled item: errors first (`err-001`...), then correct statements (`ok-001`...), then
 * the items written for later phrasing families (corpus-phrasings.ts).
 */
export const CORPUS: CorpusItem[] = [...toItems(errors, 'err'), ...toItems(correct, 'ok'), ...PHRASINGS, ...DIRECTIONS];
