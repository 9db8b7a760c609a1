/**
 * Labelled items for the direction facts and phrasing families added for the third blind set:
 * polar swings stated as smaller than the global change, CO2 forcing stated as growing faster than
 * the concentration, the Younger Dryas seesaw reversed, colder seas said to hold less CO2 and a
 * warming ocean said to take up ever more, global temperature said to lead CO2; and for the checks,
 * a long either/or with its veto denied, a record read as "the Earth as a whole ... colder than
 * today", and a reported lag argument answered by "That is not right" in the next sentence. Each
 * family has errors, correct look-alikes and answered rebuttals. Our own writing, in the invented
 * scenarios of corpus.ts, written before these items were run.
 *
 * The science behind the labels:
 * - Polar swings exceed the global mean: Antarctic glacial-interglacial change about 8-10 °C
 *   (Jouzel et al. 2007, Science 317, 793-796, doi 10.1126/science.1141038) against a global
 *   change of about 5-6 °C (Tierney et al. 2020, Nature 584, 569-573, doi 10.1038/s41586-020-2617-x).
 * - CO2 forcing grows with the logarithm of concentration, 5.35 ln(C/C0) W/m2: Myhre et al. 1998,
 *   GRL 25, 2715-2718, doi 10.1029/98GL01908 (from memory).
 * - Bipolar seesaw: the north cooled in the Younger Dryas while Antarctica warmed slightly; the
 *   Antarctic Cold Reversal came earlier, while the north was warm: Pedro et al. 2016, Nature
 *   Geoscience 9, 51-55, doi 10.1038/ngeo2580 (DOI from memory).
 * - CO2 solubility falls as water warms: Weiss 1974, Marine Chemistry 2, 203-215,
 *   doi 10.1016/0304-4203(74)90015-2 (from memory).
 * - Global temperature generally lagged CO2 in the last deglaciation: Shakun et al. 2012, Nature
 *   484, 49-54, doi 10.1038/nature10915.
 */
import { toItems, type CorpusItem, type Row } from './corpus-item.js';

const POLAR = 'direction.polar-swings-exceed-global';
const LOG = 'direction.co2-forcing-logarithmic';
const SEESAW = 'direction.bipolar-seesaw-younger-dryas';
const SOLUBILITY = 'direction.co2-solubility-falls-with-warming';
const GLOBAL_LEAD = 'direction.global-co2-ahead-of-warming';
const EITHER = 'logic.either-or-causation';
const REGIONAL = 'scope.regional-record-as-global';
const ANT_LAG = 'scope.antarctic-lag-as-global';
const CORRELATION = 'logic.correlation-as-proof';


const errors: Row[] = [
  ['newsletter', 'The poles warm and cool less than the rest of the planet, which is why the ice there has lasted so long.', [POLAR]],
  ['audio guide', 'Polar temperatures swing less than the global average between ice ages and warm spells.', [POLAR]],
  ['science desk', 'Antarctic temperature changes were smaller than the global mean change at every termination.', [POLAR]],
  ['science desk', 'The global temperature change at the end of the ice age was larger than the change in Antarctica.', [POLAR]],
  ['science desk', 'Each additional ppm of carbon dioxide traps more heat than the last one did.', [LOG]],
  ['newsletter', 'Every new ppm we put into the air has a bigger warming effect than the previous one.', [LOG]],
  ['science desk', 'The warming effect of CO2 grows exponentially as its concentration climbs.', [LOG]],
  ['audio guide', 'When Europe plunged back into the cold of the Younger Dryas, Antarctica cooled as well.', [SEESAW]],
  ['science desk', 'The southern hemisphere cooled too during the Younger Dryas, in step with the north.', [SEESAW]],
  ['science desk', 'In the Antarctic Cold Reversal, Greenland cooled too, as the whole planet chilled.', [SEESAW]],
  ['newsletter', 'Cold polar oceans hold less CO2 than the warm tropical seas do.', [SOLUBILITY]],
  ['science desk', 'The polar regions warmed less than the rest of the planet at the end of each ice age.', [POLAR]],
  ['science desk', 'As the sea warms through this century, it will absorb ever more carbon dioxide from the air.', [SOLUBILITY]],
  ['science desk', 'Warmer surface waters hold more dissolved CO2 than cold deep water.', [SOLUBILITY]],
  ['science desk', 'Worldwide, temperature led and carbon dioxide followed at the end of the last ice age.', [GLOBAL_LEAD]],
  // A global order with a lag figure is the scope check's own case; it wins the overlap.
  ['newsletter', 'Globally the warming came first, and CO2 lagged behind by several centuries.', [ANT_LAG]],
  ['science desk', 'Either warming pulled CO2 out of the deep ocean or the extra CO2 caused the warming; it cannot be both.', [EITHER]],
  ['audio guide', 'From these Dome C layers we learn that the planet was about 9 °C colder than today.', [REGIONAL]],
  ['science desk', 'The EPICA record shows the whole Earth swinging by some ten degrees between glacial and interglacial times.', [REGIONAL]],
  ['newsletter', 'The two curves match so closely that the match proves carbon dioxide drives the climate.', [CORRELATION]],
];

const correct: Row[] = [
  ['newsletter', 'The poles change temperature more than the rest of the world, roughly twice as much in Antarctica.', []],
  ['science desk', 'Antarctic temperature changes were larger than the global mean change, by a factor of about 1.5 to 2.', []],
  ['science desk', 'Greenland warmed far more than the globe as a whole at the end of the Younger Dryas.', []],
  ['audio guide', 'The polar regions hold less than a tenth of the world population of seabirds.', []],
  // Added after the first run, as look-alikes for the tightened polar and seesaw patterns.
  ['newsletter', 'The poles receive less sunlight than the tropics over a whole year.', []],
  ['science desk', 'The Younger Dryas hit the north hard, and Antarctica, far away, cooled only later in the Holocene.', []],
  ['science desk', 'Each extra ppm of CO2 warms the planet a little less than the one before, because the forcing is logarithmic.', []],
  ['newsletter', 'Every extra ppm we add now costs more to remove later than the one before.', []],
  ['science desk', 'Each doubling of CO2 adds about the same forcing, which is why the effect is called logarithmic.', []],
  ['science desk', 'It is not true that every extra ppm warms the planet more than the last one.', []],
  ['audio guide', 'During the Younger Dryas the north cooled sharply while Antarctica warmed slightly.', []],
  ['science desk', 'Antarctica cooled during the Antarctic Cold Reversal, before the Younger Dryas began in the north.', []],
  ['science desk', 'In the Antarctic Cold Reversal the south cooled while Greenland stayed warm.', []],
  ['newsletter', 'Cold polar oceans hold more CO2 than warm tropical seas.', []],
  ['science desk', 'As the sea warms through this century, it will absorb less of the carbon dioxide we emit.', []],
  ['science desk', 'Even as the ocean warms, it will take up more CO2 each year, because the air holds ever more of it.', []],
  ['science desk', 'In Antarctica, temperature led and CO2 followed by a few centuries at the onset of the deglaciation.', []],
  ['science desk', 'Globally, CO2 led and temperature followed during most of the last deglaciation.', []],
  ['science desk', 'Either way, the extra CO2 amplified the warming that the orbit started.', []],
  ['science desk', 'Warming released CO2 from the ocean and the CO2 then warmed the planet: it was both.', []],
  ['audio guide', 'These Dome C layers tell us Antarctica was about 9 °C colder than today, roughly twice the global change.', []],
  ['science desk', 'The EPICA record shows the Antarctic plateau swinging by some ten degrees between glacial and interglacial times.', []],
  ['newsletter', 'Ice cores will keep telling us about the past climate of the whole planet through the CO2 they hold.', []],
  ['science desk', ['Some people say that because CO2 went up after the warming in Antarctica, it could not have warmed the world.', 'That is not right: the extra CO2 made the warming bigger and spread it around the globe.'], []],
  ['newsletter', ['It is often said that the polar regions change temperature less than the rest of the world.', 'That is incorrect: polar swings are larger than the global mean.'], []],
  ['newsletter', 'The two curves match closely, but the match by itself does not prove which one drives the other.', []],
];

/** The added items: errors (`err-d-001`...), then correct statements (`ok-d-001`...). */
export const DIRECTIONS: CorpusItem[] = [...toItems(errors, 'err-d'), ...toItems(correct, 'ok-d')];
