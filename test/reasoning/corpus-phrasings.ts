/**
 * More labelled items for the reasoning corpus, written for the phrasing families added after the
 * first corpus: a denial of any CO2 role after a lag ("played no part", "merely followed"), a
 * single cause named after a colon ("had one cause: ..."), a thermometer record or an "around the
 * globe" lag read as the planet's, and the CO2 solubility stated the wrong way round for warming
 * and for cooling seas, in either word order. Each family has errors, near-miss correct sentences
 * (the trigger denied but not the role, "one cause of several", "no single cause", questions,
 * concessions) and answered rebuttals, so the false-flag rate stays honest. Our own writing, in
 * the same invented scenarios as corpus.ts.
 *
 * The science behind the labels:
 * - Orbital changes started each deglaciation and CO2 amplified the warming and spread it over the
 *   globe; global temperature generally lagged CO2: Shakun et al. 2012, Nature 484, 49-54,
 *   doi 10.1038/nature10915. Neither cause alone explains the record: Masson-Delmotte et al. 2013
 *   (IPCC AR5 WG1 chapter 5).
 * - The ~800-year lag compares CO2 with Antarctic temperature (Caillon et al. 2003, Science 299,
 *   1728-1731); Antarctic and CO2 changes were within a few centuries of each other (Parrenin et
 *   al. 2013, Science 339, 1060-1063). An ice core's isotope thermometer records temperature near
 *   the drill site, and polar swings are larger than the global mean (Masson-Delmotte et al. 2013).
 * - CO2 solubility falls as water warms, so warming water gives CO2 off and cooling water takes it
 *   up: Weiss 1974, Marine Chemistry 2, 203-215, doi 10.1016/0304-4203(74)90015-2 (from memory).
 * - The CO2 rise since 1850 comes from fossil fuels and land use (common practice; IPCC AR6 WG1).
 */
import { toItems, type CorpusItem, type Row } from './corpus-item.js';

const LAG = 'logic.lag-rules-out-cause';
const REGIONAL = 'scope.regional-record-as-global';
const ANT_LAG = 'scope.antarctic-lag-as-global';
const SINGLE = 'logic.single-cause';
const CERTAIN = 'logic.ice-core-certainty';
const SOLUBILITY = 'direction.co2-solubility-falls-with-warming';


const errors: Row[] = [
  // A lag, then a denial of any role.
  ['science desk', 'Carbon dioxide rose only after the ice sheets had begun to shrink, so it played no part in the warming.', [LAG]],
  ['newsletter', 'The warming came first; carbon dioxide had nothing to do with ending the glaciation.', [LAG]],
  ['science desk', 'Since temperature led, CO2 was not involved in bringing the ice age to a close.', [LAG]],
  ['audio guide', 'In every termination CO2 merely followed the temperature, a bystander to the warming.', [LAG]],
  ['science desk', 'CO2 trailed Antarctic warming by centuries and played no role in the deglaciation.', [LAG]],
  ['newsletter', 'Because carbon dioxide went up later than temperature, it had no part in melting the ice sheets.', [LAG]],
  ['science desk', 'The gas simply followed the temperature, so CO2 cannot be blamed for any of the warming.', [LAG]],
  // One cause, often named after a colon or a dash.
  ['newsletter', 'The last glacial period ended for one reason: the orbit tilted the northern summers toward the sun.', [SINGLE]],
  ['science desk', 'The ice sheets retreated for a single reason — the rise in carbon dioxide.', [SINGLE]],
  ['science desk', 'Rising CO2 was the sole cause of the warming that ended the ice age.', [SINGLE]],
  ['audio guide', "The ice ages came and went entirely because of shifts in Earth's orbit.", [SINGLE]],
  ['science desk', 'The deglaciation was driven by nothing but the extra sunshine from the orbit.', [SINGLE]],
  ['newsletter', 'Only one cause ended the ice age: carbon dioxide.', [SINGLE]],
  ['audio guide', 'The Earth climbed out of the last ice age because of one thing only: carbon dioxide.', [SINGLE]],
  // A regional record, or the Antarctic lag, read as the planet's.
  ['audio guide', 'The Vostok thermometer, read from the ice, tells us how warm the whole globe was.', [REGIONAL]],
  ['science desk', "Whatever the EPICA core shows for Antarctica is the story of the entire planet's temperature.", [REGIONAL]],
  ['science desk', 'The deuterium thermometer at Dome C records the temperature of the Earth as a whole.', [REGIONAL]],
  ['science desk', 'All over the world, temperatures rose roughly 800 years ahead of carbon dioxide.', [ANT_LAG]],
  ['newsletter', 'Around the world, warming began several centuries before the CO2 rise.', [ANT_LAG]],
  ['science desk', 'On a global scale the warming came centuries before carbon dioxide.', [ANT_LAG]],
  // Solubility the wrong way round: warming seas taking up more, cooling seas giving CO2 off.
  ['science desk', 'As the oceans warmed at the end of the ice age, they took up more CO2 from the atmosphere.', [SOLUBILITY]],
  ['newsletter', 'Seawater holds more carbon dioxide when it warms.', [SOLUBILITY]],
  ['audio guide', 'The warmer the ocean, the more CO2 it can store.', [SOLUBILITY]],
  ['science desk', 'When the seas cooled during glacial times, they gave off carbon dioxide to the air.', [SOLUBILITY]],
  ['newsletter', 'The oceans release CO2 as they cool.', [SOLUBILITY]],
  ['science desk', 'Colder seawater gave up its carbon dioxide to the atmosphere during the ice age.', [SOLUBILITY]],
  ['newsletter', 'As the seas get warmer, they hold more carbon dioxide.', [SOLUBILITY]],
  ['science desk', 'Warming seas released less CO2 than cold ones.', [SOLUBILITY]],
  // Reported and left unanswered.
  ['newsletter', ['Some say the oceans took up more carbon dioxide as they warmed.', 'Our next issue looks at the evidence.'], [SOLUBILITY]],
  ['audio guide', ["'The seas absorb more carbon dioxide when they warm,' a visitor told our guide.", 'The tour then moved on to the next gallery.'], [SOLUBILITY]],
  ['audio guide', "These bubbles alone prove that today's CO2 level is the highest in three million years.", [CERTAIN]],
];

const correct: Row[] = [
  // The start denied, not the role.
  ['science desk', 'Carbon dioxide played no part in starting the deglaciation, but once it rose it amplified the warming.', []],
  ['science desk', 'CO2 rose after the first warming, so it played no part in triggering it; it did, however, strengthen what followed.', []],
  ['science desk', 'The lag shows CO2 did not start the warming, not that it played no part in it.', []],
  ['science desk', 'Some claim CO2 merely followed the temperature, but it then amplified the warming and spread it around the globe.', []],
  ['audio guide', 'At the start of the deglaciation CO2 merely followed Antarctic temperature; within a few centuries it was amplifying the warming.', []],
  ['newsletter', 'It is a myth that, because CO2 lagged, it had nothing to do with ending the ice ages; it amplified the orbital nudge.', []],
  ['science desk', 'CO2 was not involved in starting the deglaciation, which the orbit did, but it was involved in everything after.', []],
  ['science desk', 'Before the warming reached the north, carbon dioxide had already begun to rise, so it was involved from early on.', []],
  ['science desk', ['A listener wrote in: "CO2 rose after the warming, so it played no part in ending the ice ages."', 'That is wrong: the CO2 amplified a warming that the orbit began.'], []],
  // Several causes, or one cause denied.
  ['science desk', 'Orbital changes were one cause of the deglaciation; rising CO2 and shrinking ice sheets were others.', []],
  ['newsletter', 'One reason the ice sheets melted was rising carbon dioxide; another was the extra summer sunshine.', []],
  ['science desk', 'No single cause ended the ice age: the orbit started it and CO2 amplified it.', []],
  ['newsletter', ['Did the ice age end for one reason only?', 'No: the orbit started the warming and carbon dioxide amplified it.'], []],
  ['science desk', 'The rise of CO2 since 1850 has a single cause: our burning of coal, oil and gas.', []],
  ['science desk', 'The ice sheets did not melt for one reason only: the orbit and CO2 worked together.', []],
  ['science desk', "The warming that ended the last ice age had one trigger: the extra summer sunlight from Earth's orbit.", []],
  ['science desk', 'Carbon dioxide alone cannot explain the ice ages, and neither can the orbit alone.', []],
  ['science desk', 'Rising CO2 was not the sole cause of the warming; the orbit and the ice sheets mattered too.', []],
  // Regional records and lags kept regional.
  ['audio guide', 'The Dome C thermometer tells us about Antarctica, not about the planet as a whole.', []],
  ['audio guide', 'A thermometer in the ice at Vostok records local conditions; the globe as a whole warmed about half as much.', []],
  ['audio guide', 'The CO2 trapped at Dome C tells us what the whole globe was breathing.', []],
  ['science desk', 'Around the globe, temperatures rose after carbon dioxide did during the last deglaciation.', []],
  ['science desk', 'In Antarctica, temperature rose a few centuries before CO2, while around the world most warming came after it.', []],
  ['science desk', 'Antarctic temperature climbed some centuries before CO2, and the extra CO2 then warmed the globe.', []],
  ['science desk', "Greenland's thermometer in the ice, the isotope record, swung far more than the globe as a whole.", []],
  ['science desk', 'All over the world, temperatures rose in the centuries after carbon dioxide began to climb.', []],
  ['audio guide', 'At Dome C, temperature and CO2 rose within a few centuries of each other: for the planet as a whole, most of the warming came after the CO2.', []],
  // Solubility the right way round, denied, asked, conceded, or about heat.
  ['science desk', 'As the seas warm they absorb less CO2, so a warmer ocean gives some back to the air.', []],
  ['science desk', 'Even as the oceans warm, they absorb more CO2 every year, because there is more of it in the air.', []],
  ['newsletter', ['Do warmer seas absorb more CO2?', 'No: warm water holds less of it.'], []],
  ['newsletter', 'It is not true that warmer seas absorb more carbon dioxide.', []],
  ['science desk', 'As the oceans cooled going into each glacial, they took up carbon dioxide from the air.', []],
  ['science desk', 'As the oceans cooled, they released heat to the atmosphere and drew down CO2.', []],
  ['science desk', 'Cold water releases CO2 when it warms at the surface of the Southern Ocean.', []],
  ['science desk', "The oceans absorb more CO2 as the air's CO2 rises, even though warming reduces how much they can hold.", []],
  ['newsletter', ['A common myth holds that the oceans give off CO2 as they cool.', 'In fact cooling water takes CO2 up.'], []],
  ['audio guide', 'As the seas warmed, they absorbed more heat than the land did.', []],
  ['newsletter', 'Warming seas give off more CO2, and cooling seas take more up.', []],
  ['science desk', 'Colder water can hold more dissolved CO2, which is why the glacial ocean stored extra carbon.', []],
  ['audio guide', 'The warmer the water, the less CO2 it can hold.', []],
];

/** The added items: errors (`err-p-001`...), then correct statements (`ok-p-001`...). */
export const PHRASINGS: CorpusItem[] = [...toItems(errors, 'err-p'), ...toItems(correct, 'ok-p')];
