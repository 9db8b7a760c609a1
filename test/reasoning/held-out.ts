/**
 * A second labelled set, written after the detectors were tuned on corpus.ts and never tuned
 * against: its figures estimate how the checks do on wording they have not seen. Same invented
 * scenarios (the Halvard Ice Gallery audio guide, the Larchmoor Primary newsletter, the Tidewater
 * Courier science desk) and the same sources as corpus.ts.
 *
 * Measured, never tuned on (corpus.test.ts prints the figures):
 * - before the round-2 changes: recall 93.3% (14/15), false flags 6.7% (1/15): missed the long
 *   either/or (held-005); flagged the answered "Some readers argue ..." (held-028).
 * - after them: recall 100.0% (15/15), false flags 6.7% (1/15): held-005 is now caught by the
 *   either ... or of any length; held-028 is still flagged ("some readers argue" is not a
 *   reporting phrase).
 */
import type { CorpusItem } from './corpus.js';

type Row = [CorpusItem['scenario'], string | string[], string[]];

const rows: Row[] = [
  ['science desk', 'The carbon dioxide curve trails the temperature curve by several centuries, so carbon dioxide cannot be what warms the climate.', ['logic.lag-rules-out-cause']],
  ['newsletter', 'Temperature went up first, which shows that CO2 had no role in ending the ice age.', ['logic.lag-rules-out-cause']],
  ['audio guide', 'As the cores reveal, carbon dioxide followed the warming, meaning it could not have caused it.', ['logic.lag-rules-out-cause']],
  ['science desk', 'Warming drives carbon dioxide, not the other way around, as the Vostok data make clear.', ['logic.either-or-causation']],
  ['science desk', 'Either the ocean warmed and released CO2, or CO2 warmed the ocean; the timing tells us which.', ['logic.either-or-causation']],
  ['science desk', 'The way CO2 and temperature correlate over eight glacial cycles proves that CO2 drives the climate.', ['logic.correlation-as-proof']],
  ['newsletter', 'Since the two lines move together, temperature must be controlling the carbon dioxide.', ['logic.correlation-as-proof']],
  ['audio guide', 'The EPICA record shows the world was about 9 °C colder during the last glacial maximum.', ['scope.regional-record-as-global']],
  ['science desk', 'Greenland ice cores reveal how global temperature jumped at the end of the Younger Dryas.', ['scope.regional-record-as-global']],
  ['science desk', 'Worldwide, temperatures rose some 600 years before carbon dioxide did.', ['scope.antarctic-lag-as-global']],
  ['science desk', 'The end of the last ice age was caused solely by carbon dioxide.', ['logic.single-cause']],
  ['newsletter', 'Changes in sunlight from the orbit alone melted the great ice sheets.', ['logic.single-cause']],
  ['science desk', 'Warmer seas take up more CO2, which is why interglacials had more of it.', ['direction.co2-solubility-falls-with-warming']],
  ['audio guide', 'The bubbles you see are older than the ice around them.', ['direction.trapped-air-younger-than-ice']],
  ['science desk', 'Ice cores settle beyond doubt how much a doubling of CO2 will warm the planet.', ['logic.ice-core-certainty']],

  ['science desk', 'The lag of a few centuries tells us that CO2 was a feedback, which does not mean it had no warming effect.', []],
  ['science desk', 'Rising CO2 did not start the deglaciation, but it amplified the warming that orbital changes began.', []],
  ['audio guide', 'The temperature line here comes from Dome C, so it shows Antarctic temperature rather than the global mean.', []],
  ['newsletter', 'CO2 and temperature rose together, and scientists use physics to explain why each pushed the other up.', []],
  ['science desk', 'Global mean temperature rose after CO2 during most of the last deglaciation, according to Shakun et al. (2012).', []],
  ['science desk', ['"CO2 lags temperature, so it cannot drive it," goes a familiar line.', 'The line confuses the trigger with the feedback.'], []],
  ['science desk', 'Ice cores are one strong line of evidence, and together with physics and other records they point to CO2 as an amplifier.', []],
  ['science desk', 'Warmer seas hold less CO2, so part of the deglacial CO2 rise came from the warming ocean itself.', []],
  ['audio guide', 'Air trapped in the ice is younger than the ice, because the bubbles close tens of metres below the surface.', []],
  ['science desk', 'Orbital changes alone cannot account for the size of the glacial cycles.', []],
  ['science desk', 'Antarctica warmed slightly ahead of CO2 at the start, while the globe as a whole warmed after it.', []],
  ['newsletter', 'The cores show CO2 and Antarctic temperature rising within a few centuries of each other.', []],
  ['science desk', ['Some readers argue that the close match proves temperature controls CO2.', 'It does not: the match fits a loop in which each drives the other.'], []],
  ['science desk', 'A lag does not rule out a cause; a kettle keeps heating after the steam appears.', []],
  ['audio guide', 'Greenland warmed by around 10 °C in a few decades, a regional jump far larger than the global change.', []],
];

/** The held-out items (`held-001`...). */
export const HELD_OUT: CorpusItem[] = rows.map(([scenario, text, expect], i) => ({
  id: `held-${String(i + 1).padStart(3, '0')}`,
  scenario,
  paragraph: typeof text === 'string' ? [text] : text,
  expect,
}));
