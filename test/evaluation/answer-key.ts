/**
 * Answer key for the blind evaluation drafts in ./drafts.
 *
 * The drafts were written without reading the engine, its rule packs or its tests. Every seeded
 * error is wrong by the ranges in /work/shared/REFERENCE-VALUES.md (the research table the packs
 * are built from); every correct claim lies inside those ranges. `why` names the reference row
 * (its id in that table) and the published source of the value; "common practice" marks plain
 * arithmetic on the draft's own numbers.
 *
 * `line` is the 1-based line in the original file where `text` (the exact wrong words, or the
 * start of the correct sentence) appears; the test checks that the key still matches the drafts.
 */

/** The rule-id group that should catch a seeded error: a flag's ruleId starts with `${kind}.`. */
export type ErrorKind = 'value' | 'arith' | 'unit' | 'logic' | 'scope' | 'direction';

/** One seeded error: the exact wrong words on one line, and why they are wrong. */
export interface SeededError {
  readonly file: string;
  readonly line: number;
  readonly kind: ErrorKind;
  readonly text: string;
  readonly why: string;
}

/** One correct claim sentence that must not get a flag at level warning or error. */
export interface CorrectClaim {
  readonly file: string;
  /** Line where the sentence starts; a hard-wrapped sentence may run on to later lines. */
  readonly line: number;
  readonly text: string;
}

/** The key for one draft. */
export interface DraftKey {
  readonly file: string;
  readonly errors: readonly SeededError[];
  readonly correct: readonly CorrectClaim[];
}

const DRAFTS = 'test/evaluation/drafts/';

/** Seeded errors and correct claims, draft by draft. */
export const answerKey: readonly DraftKey[] = [
  {
    file: DRAFTS + 'museum-gallery-guide.md',
    errors: [
      {
        file: DRAFTS + 'museum-gallery-guide.md',
        line: 23,
        kind: 'scope',
        text: 'the whole planet warmed by about 9 °C',
        why: 'Ice-core deuterium is an Antarctic (local) temperature: 8-10 K deglacial warming in Antarctica (antarctic-deglacial-warming-isotope; Pedro et al. 2012, Clim. Past 8, 1213-1221, doi 10.5194/cp-8-1213-2012), about 1.5-2 times the global 3.6-7 K (gmst-lgm-to-preindustrial-warming; Gulev et al. 2021, IPCC AR6 WGI ch. 2, doi 10.1017/9781009157896.004; Tierney et al. 2020, Nature 584, 569-573, doi 10.1038/s41586-020-2617-x)',
      },
      {
        file: DRAFTS + 'museum-gallery-guide.md',
        line: 34,
        kind: 'direction',
        text: 'the trapped air is always older than the ice that surrounds it',
        why: 'Ice-core air is YOUNGER than the surrounding ice (delta-age > 0, 2000-6500 yr at Vostok; delta-age-vostok; Caillon et al. 2003, Science 299, 1728-1731, doi 10.1126/science.1078758)',
      },
      {
        file: DRAFTS + 'museum-gallery-guide.md',
        line: 38,
        kind: 'value',
        text: 'about 50,000 years ago',
        why: 'The Last Glacial Maximum is 19,000-23,000 yr BP, centre ~21 ka (lgm-chronozone); ice sheets at their maximum 19,000-26,500 yr BP (lgm-ice-sheet-maximum; Clark et al. 2009, Science 325, 710-714, doi 10.1126/science.1172873)',
      },
      {
        file: DRAFTS + 'museum-gallery-guide.md',
        line: 40,
        kind: 'value',
        text: 'about 40 metres lower than today',
        why: 'LGM global sea level was 120-135 m below present, ~134 m (lgm-sea-level-lowstand; Lambeck et al. 2014, PNAS 111, 15296-15303, doi 10.1073/pnas.1411762111)',
      },
      {
        file: DRAFTS + 'museum-gallery-guide.md',
        line: 40,
        kind: 'unit',
        text: 'roughly 43 °F colder',
        why: 'A 6 °C difference is 10.8 °F (6 x 1.8), not 6 x 1.8 + 32 = 42.8 (unit-celsius-to-fahrenheit-difference; NIST SP 811 (2008) / BIPM SI Brochure 9th ed.: a 1 degC difference = 1.8 degF, never add 32 to a difference)',
      },
      {
        file: DRAFTS + 'museum-gallery-guide.md',
        line: 42,
        kind: 'arith',
        text: 'a rise of some 50 ppm',
        why: 'The draft\'s own numbers: 280 - 190 = 90 ppm, not 50 (common practice: change = to - from); 90 ppm also matches the 80-100 ppm termination amplitude (co2-glacial-interglacial-amplitude; Fischer et al. 1999, doi 10.1126/science.283.5408.1712)',
      },
      {
        file: DRAFTS + 'museum-gallery-guide.md',
        line: 46,
        kind: 'logic',
        text: 'the gas was a consequence of the warming and not a cause',
        why: 'A lag used to rule out a cause: CO2 followed an orbital trigger and then amplified and spread the warming (direction fact 5; Shakun et al. 2012, Nature 484, 49-54, doi 10.1038/nature10915; Hays, Imbrie & Shackleton 1976, Science 194, 1121-1132, doi 10.1126/science.194.4270.1121); Antarctic phasing is near-synchronous, 0-400 yr (Pedro et al. 2012, Clim. Past 8, 1213-1221, doi 10.5194/cp-8-1213-2012)',
      },
    ],
    correct: [
      { file: DRAFTS + 'museum-gallery-guide.md', line: 17, text: 'Drilling reached 3,623 metres (about 11,900 feet) in January 1998, roughly 130 metres above the lake hidden beneath the ice.' },
      { file: DRAFTS + 'museum-gallery-guide.md', line: 17, text: 'The core holds a record of roughly 420,000 years, covering four complete glacial cycles.' },
      { file: DRAFTS + 'museum-gallery-guide.md', line: 21, text: 'The European core from Dome C was drilled to 3,270 m.' },
      { file: DRAFTS + 'museum-gallery-guide.md', line: 21, text: 'It holds the longest continuous ice-core record published so far: about eight hundred thousand years, spanning eight glacial cycles.' },
      { file: DRAFTS + 'museum-gallery-guide.md', line: 21, text: 'Across that whole span, CO₂ in the trapped air stayed between about 172 and 300 parts per million (ppm).' },
      { file: DRAFTS + 'museum-gallery-guide.md', line: 21, text: 'In the coldest glacial spells it fell to around 180–190 ppm; in the warm interglacials it rose to roughly 280 ppm.' },
      { file: DRAFTS + 'museum-gallery-guide.md', line: 34, text: 'At a cold, dry site such as Vostok the difference between the age of the air and the age of the ice is several thousand years, so scientists correct for it before comparing the two.' },
      { file: DRAFTS + 'museum-gallery-guide.md', line: 38, text: 'At that Last Glacial Maximum, ice sheets several kilometres thick covered much of North America and northern Europe, and CO₂ stood near 190 ppm.' },
      { file: DRAFTS + 'museum-gallery-guide.md', line: 46, text: 'In the Antarctic cores, temperature began to climb at the end of each ice age slightly before CO₂ did.' },
      { file: DRAFTS + 'museum-gallery-guide.md', line: 48, text: 'the shape of Earth\'s orbit, the tilt of its axis and the wobble of that axis change over roughly 100,000, 41,000 and 23,000 years.' },
    ],
  },
  {
    file: DRAFTS + 'school-science-bulletin.md',
    errors: [
      {
        file: DRAFTS + 'school-science-bulletin.md',
        line: 13,
        kind: 'value',
        text: 'holds about 800,000 years of climate history',
        why: 'Vostok spans 400,000-423,000 yr, ~420 kyr and four cycles (vostok-record-span; Petit et al. 1999, Nature 399, 429-436); 800 kyr is EPICA Dome C (Jouzel et al. 2007, Science 317, 793-796, doi 10.1126/science.1141038)',
      },
      {
        file: DRAFTS + 'school-science-bulletin.md',
        line: 16,
        kind: 'value',
        text: 'CO₂ went up by about 1 ppm every year',
        why: 'The deglacial CO2 rise averaged 0.010-0.015 ppm/yr (76 ppm over ~6000 yr; co2-deglacial-mean-rate; Monnin et al. 2001, Science 291, 112-114, doi 10.1126/science.291.5501.112)',
      },
      {
        file: DRAFTS + 'school-science-bulletin.md',
        line: 18,
        kind: 'unit',
        text: 'which is 0.4 percent of the atmosphere',
        why: '420 ppm = 0.042 percent (co2-420ppm-as-percent; 1 ppm = 0.0001 %; NOAA GML, co2_gr_gl.txt header: ppm = micromol/mol; 1 ppm = 1e-4 percent)',
      },
      {
        file: DRAFTS + 'school-science-bulletin.md',
        line: 27,
        kind: 'logic',
        text: 'It has to be one or the other',
        why: 'Either/or framing of a feedback: warming released CO2 and CO2 amplified the warming, both at once (direction fact 5; Shakun et al. 2012, Nature 484, 49-54, doi 10.1038/nature10915)',
      },
      {
        file: DRAFTS + 'school-science-bulletin.md',
        line: 29,
        kind: 'logic',
        text: 'that match on its own proves that the warming caused the CO₂ to rise',
        why: 'Correlation presented as proof: co-variation in the cores does not by itself establish the direction of cause; CO2 also led global temperature during the deglaciation (Shakun et al. 2012, Nature 484, 49-54, doi 10.1038/nature10915; direction fact 4)',
      },
      {
        file: DRAFTS + 'school-science-bulletin.md',
        line: 37,
        kind: 'value',
        text: 'The cold lasted about 3,000 years',
        why: 'The Younger Dryas lasted 1100-1300 yr, ~1200 yr, c. 12,900-11,700 yr ago (younger-dryas-duration; Walker et al. 2009, J. Quaternary Sci. 24, 3-17, doi 10.1002/jqs.1227; Rasmussen et al. 2006, doi 10.1029/2005JD006079)',
      },
    ],
    correct: [
      { file: DRAFTS + 'school-science-bulletin.md', line: 14, text: '**Dome C**, drilled by a European team, reaches back about 800,000 years, the longest continuous record so far.' },
      { file: DRAFTS + 'school-science-bulletin.md', line: 15, text: 'Before the industrial era, CO₂ in the cores never went above about 300 ppm (parts per million).' },
      { file: DRAFTS + 'school-science-bulletin.md', line: 17, text: 'In 1750, before factories and cars, the air held about 278 ppm.' },
      { file: DRAFTS + 'school-science-bulletin.md', line: 19, text: 'In May 2024 the monthly average at Mauna Loa in Hawaii reached about 427 ppm' },
      { file: DRAFTS + 'school-science-bulletin.md', line: 25, text: 'During the last ice age, about 21,000 years ago, the world was roughly 6 °C (11 °F) colder than before the industrial revolution, and CO₂ was only about 190 ppm.' },
      { file: DRAFTS + 'school-science-bulletin.md', line: 25, text: 'The end of the ice age was kicked off by slow changes in Earth\'s orbit; Earth\'s tilt, for example, changes over a cycle of about 41,000 years.' },
      { file: DRAFTS + 'school-science-bulletin.md', line: 33, text: 'Today CO₂ is rising by more than 2 ppm every year, far faster than at any time in the ice-core record.' },
      { file: DRAFTS + 'school-science-bulletin.md', line: 37, text: 'It began roughly 12,900 years ago, when the lands around the North Atlantic were plunged back into near-glacial cold.' },
      { file: DRAFTS + 'school-science-bulletin.md', line: 39, text: 'warm water holds less dissolved gas than cold water, which is why the warm bottle went flat first.' },
      { file: DRAFTS + 'school-science-bulletin.md', line: 39, text: 'In the same way, as the oceans warmed at the end of each ice age they gave off some of their CO₂ to the air.' },
    ],
  },
  {
    file: DRAFTS + 'courier-science-desk.md',
    errors: [
      {
        file: DRAFTS + 'courier-science-desk.md',
        line: 27,
        kind: 'value',
        text: 'was some 12 °C colder than in pre-industrial times',
        why: 'Global LGM cooling is 3.6-7 K, AR6 ~6 [5-7] °C (gmst-lgm-to-preindustrial-warming; Gulev et al. 2021, IPCC AR6 WGI ch. 2, doi 10.1017/9781009157896.004; Tierney et al. 2020, Nature 584, 569-573, doi 10.1038/s41586-020-2617-x: 6.1 °C)',
      },
      {
        file: DRAFTS + 'courier-science-desk.md',
        line: 28,
        kind: 'arith',
        text: 'about 18,000 to 11,500 years ago, a span of roughly 4,000 years',
        why: 'The draft\'s own dates give 18,000 - 11,500 = 6,500 years (common practice); Termination I lasted 6000-9000 yr (termination-1-duration; Chowdhry Beeman et al. 2019, Clim. Past 15, 913-926, doi 10.5194/cp-15-913-2019)',
      },
      {
        file: DRAFTS + 'courier-science-desk.md',
        line: 35,
        kind: 'scope',
        text: 'Around the globe, temperatures started climbing about 800 years before carbon dioxide did',
        why: 'A global claim made with an Antarctic lag figure: 800 ± 200 yr is Antarctic, Termination III (Caillon et al. 2003, Science 299, 1728-1731, doi 10.1126/science.1078758); global temperature generally LAGGED CO2 in the last deglaciation (Shakun et al. 2012, Nature 484, 49-54, doi 10.1038/nature10915)',
      },
      {
        file: DRAFTS + 'courier-science-desk.md',
        line: 37,
        kind: 'value',
        text: 'gap in Antarctica at roughly 3,000 years',
        why: 'Current Antarctic T-CO2 offset in Termination I is -200 to 750 yr (antarctic-co2-phasing-termination-1-consensus; Pedro et al. 2012, Clim. Past 8, 1213-1221, doi 10.5194/cp-8-1213-2012: < 400 yr; Parrenin et al. 2013, Science 339, 1060-1063, doi 10.1126/science.1226368; Chowdhry Beeman et al. 2019, Clim. Past 15, 913-926, doi 10.5194/cp-15-913-2019)',
      },
      {
        file: DRAFTS + 'courier-science-desk.md',
        line: 39,
        kind: 'logic',
        text: 'carbon dioxide played no part in ending the ice ages',
        why: 'A lag used to rule out a cause: CO2 amplified the orbitally triggered warming and spread it globally (direction fact 5; Shakun et al. 2012, Nature 484, 49-54, doi 10.1038/nature10915)',
      },
      {
        file: DRAFTS + 'courier-science-desk.md',
        line: 41,
        kind: 'logic',
        text: 'had one cause',
        why: 'Single cause where two acted together: orbital forcing paced the cycles (Hays, Imbrie & Shackleton 1976, Science 194, 1121-1132, doi 10.1126/science.194.4270.1121) and CO2 amplified and globalised the warming (Shakun et al. 2012, Nature 484, 49-54, doi 10.1038/nature10915)',
      },
    ],
    correct: [
      { file: DRAFTS + 'courier-science-desk.md', line: 17, text: 'The longest continuous record, from the European Project for Ice Coring in Antarctica (EPICA) at Dome C, covers about 800 kyr.' },
      { file: DRAFTS + 'courier-science-desk.md', line: 19, text: 'Over that time CO₂ swung between about 180 ppm in the cold glacial periods and about 280 ppm in the warm interglacials, rising by 80 to 100 ppm at each glacial termination.' },
      { file: DRAFTS + 'courier-science-desk.md', line: 22, text: 'The air in the bubbles is younger than the ice around it, sometimes by thousands of years, so every lead or lag has to be worked out with care,' },
      { file: DRAFTS + 'courier-science-desk.md', line: 26, text: 'The last ice age peaked around 21,000 years ago.' },
      { file: DRAFTS + 'courier-science-desk.md', line: 28, text: 'Over the deglaciation CO₂ rose by roughly 80 ppm, from about 190 ppm to about 270 ppm.' },
      { file: DRAFTS + 'courier-science-desk.md', line: 33, text: 'The best-known older estimate put the CO₂ lag at around 800 years, a figure measured across an earlier warming, Termination III, about 240,000 years ago.' },
      { file: DRAFTS + 'courier-science-desk.md', line: 46, text: 'Through the 2010s, CO₂ rose by about 2.4 ppm a year, roughly 190 times faster than the average pace of the rise at the end of the last ice age.' },
      { file: DRAFTS + 'courier-science-desk.md', line: 48, text: 'The global average reached 419.3 ppm in 2023, and in 2024 it jumped by about 3.5 ppm, the largest one-year rise on record.' },
    ],
  },
  {
    file: DRAFTS + 'deep-time-dispatch-ep14.md',
    errors: [
      {
        file: DRAFTS + 'deep-time-dispatch-ep14.md',
        line: 13,
        kind: 'value',
        text: 'just over 2,000 metres',
        why: 'EPICA Dome C was drilled to 3260-3270.2 m, ~3270 m (edc-drilled-depth; Lüthi et al. 2008, Nature 453, 379-382, doi 10.1038/nature06949; Oerter & EPICA team 2008, AWI ePIC 18400)',
      },
      {
        file: DRAFTS + 'deep-time-dispatch-ep14.md',
        line: 21,
        kind: 'scope',
        text: 'is what happened to the planet as a whole',
        why: 'An Antarctic record presented as global: Antarctic swings (8-10 K) are 1.5-2 times the global change (direction fact 7; Pedro et al. 2012, Clim. Past 8, 1213-1221, doi 10.5194/cp-8-1213-2012); global temperature followed a different timing (Shakun et al. 2012, Nature 484, 49-54, doi 10.1038/nature10915)',
      },
      {
        file: DRAFTS + 'deep-time-dispatch-ep14.md',
        line: 31,
        kind: 'arith',
        text: 'a cold spell of some 2,000 years',
        why: 'The draft\'s own dates give 12,900 - 11,700 = 1,200 years (common practice); Younger Dryas 1100-1300 yr (younger-dryas-duration; Walker et al. 2009, J. Quaternary Sci. 24, 3-17, doi 10.1002/jqs.1227)',
      },
      {
        file: DRAFTS + 'deep-time-dispatch-ep14.md',
        line: 33,
        kind: 'unit',
        text: 'that\'s 11,750 years BP',
        why: 'BP = b2k - 50, so 11,700 b2k = 11,650 BP (unit-bp-b2k-offset; Walker et al. 2009, J. Quaternary Sci. 24, 3-17, doi 10.1002/jqs.1227)',
      },
      {
        file: DRAFTS + 'deep-time-dispatch-ep14.md',
        line: 35,
        // Keyed 'value' when written; reclassified as 'unit' in December 2026: the slip its own note
        // explains is the era (11,700 b2k, said just before, written as BCE), which the later
        // writers' brief files under unit slips ("BP/b2k/BCE mixed up"), and Firnline now names it so.
        kind: 'unit',
        text: 'around 11,700 BCE',
        why: '11,700 BCE = 13,650 yr BP; the end of the Younger Dryas / Holocene base is 11,500-11,700 yr BP, about 9700 BCE (younger-dryas-end, holocene-start 11,700 b2k; Walker et al. 2009, J. Quaternary Sci. 24, 3-17, doi 10.1002/jqs.1227)',
      },
      {
        file: DRAFTS + 'deep-time-dispatch-ep14.md',
        line: 41,
        kind: 'logic',
        text: 'Those bubbles alone prove that CO₂ is now higher than at any time in two million years',
        why: 'Certainty overclaimed: continuous ice cores cover ~800 kyr (Lüthi et al. 2008, Nature 453, 379-382, doi 10.1038/nature06949); the 2-Myr statement rests on other evidence and discontinuous blue-ice snapshots (IPCC AR6 WGI SPM A.2.1 (2021), doi 10.1017/9781009157896.001; Yan et al. 2019, Nature 574, 663-666, doi 10.1038/s41586-019-1692-3)',
      },
    ],
    correct: [
      { file: DRAFTS + 'deep-time-dispatch-ep14.md', line: 13, text: 'The European team at Dome C recovered ice that goes back about 800,000 years.' },
      { file: DRAFTS + 'deep-time-dispatch-ep14.md', line: 13, text: 'And the Beyond EPICA team, at Little Dome C, reached bedrock at about 2,800 metres in January 2025; they say that ice is at least 1.2 million years old, though the analyses are still under way.' },
      { file: DRAFTS + 'deep-time-dispatch-ep14.md', line: 17, text: 'One catch is that the air is younger than the ice around it, by a couple of thousand years or more at a cold, dry site like Vostok, because the snow stays porous until it is buried deep enough to seal.' },
      { file: DRAFTS + 'deep-time-dispatch-ep14.md', line: 17, text: 'During the last ice age, CO₂ in those bubbles hovered around 180 to 190 ppm.' },
      { file: DRAFTS + 'deep-time-dispatch-ep14.md', line: 25, text: 'People write in saying "CO₂ rose after the temperature, so it can\'t be causing warming." That doesn\'t follow.' },
      { file: DRAFTS + 'deep-time-dispatch-ep14.md', line: 25, text: 'Older studies found CO₂ in Antarctica trailing the temperature by something like 800 years, but newer work, with better dating, finds the two moved together within a few centuries.' },
      { file: DRAFTS + 'deep-time-dispatch-ep14.md', line: 25, text: 'And a lag only tells you what started the change; once the CO₂ was in the air, it trapped more heat and amplified the warming.' },
      { file: DRAFTS + 'deep-time-dispatch-ep14.md', line: 25, text: 'Globally, temperature actually followed CO₂ during the last deglaciation.' },
      { file: DRAFTS + 'deep-time-dispatch-ep14.md', line: 29, text: 'It began about 12,900 years ago, and Greenland was plunged back into near-glacial cold.' },
      { file: DRAFTS + 'deep-time-dispatch-ep14.md', line: 29, text: 'At its end, Greenland warmed by something like 10 °C within a few decades.' },
      { file: DRAFTS + 'deep-time-dispatch-ep14.md', line: 29, text: 'Down south, the Antarctic Cold Reversal had run from about 14,700 to 13,000 years ago, while the north was warm; the two hemispheres see-sawed.' },
      { file: DRAFTS + 'deep-time-dispatch-ep14.md', line: 33, text: 'It officially begins 11,700 years before the year 2000, written 11,700 b2k.' },
      { file: DRAFTS + 'deep-time-dispatch-ep14.md', line: 37, text: 'sea level rose by about 80 metres between 19,000 and 11,000 years ago.' },
      { file: DRAFTS + 'deep-time-dispatch-ep14.md', line: 41, text: 'Today we\'re above 420 ppm.' },
    ],
  },
  {
    file: DRAFTS + 'coldwater-trust-campaign.md',
    errors: [
      {
        file: DRAFTS + 'coldwater-trust-campaign.md',
        line: 13,
        kind: 'value',
        text: 'CO₂ peaked at about 350 ppm',
        why: 'The highest pre-industrial CO2 in the 800-kyr record is 295-300 ppm (co2-highest-preindustrial-800kyr; range 172-300 ppmv, Lüthi et al. 2008, Nature 453, 379-382, doi 10.1038/nature06949)',
      },
      {
        file: DRAFTS + 'coldwater-trust-campaign.md',
        line: 13,
        kind: 'arith',
        text: 'a rise of about 70 percent',
        why: 'The draft\'s own numbers: 420 / 280 = 1.5, a rise of 50 percent (common practice); AR6 gives +47 % from 1750 to 2019 (co2-increase-since-1750-pct-2019; IPCC AR6 WGI SPM A.2.1 (2021), doi 10.1017/9781009157896.001)',
      },
      {
        file: DRAFTS + 'coldwater-trust-campaign.md',
        line: 19,
        kind: 'logic',
        text: 'that match is proof, on its own, that carbon dioxide sets Earth\'s thermostat',
        why: 'Correlation presented as proof: the co-variation reflects a two-way feedback with an orbital trigger (direction fact 5; Shakun et al. 2012, Nature 484, 49-54, doi 10.1038/nature10915; Hays, Imbrie & Shackleton 1976, Science 194, 1121-1132, doi 10.1126/science.194.4270.1121)',
      },
      {
        file: DRAFTS + 'coldwater-trust-campaign.md',
        line: 21,
        kind: 'logic',
        text: 'melted for one reason only: rising carbon dioxide',
        why: 'Single cause where two acted together: orbital forcing started the deglaciation (Hays, Imbrie & Shackleton 1976, Science 194, 1121-1132, doi 10.1126/science.194.4270.1121) and CO2 amplified it (Shakun et al. 2012, Nature 484, 49-54, doi 10.1038/nature10915)',
      },
      {
        file: DRAFTS + 'coldwater-trust-campaign.md',
        line: 23,
        kind: 'arith',
        text: 'roughly 1 ppm per decade',
        why: 'The draft\'s own numbers: 76 ppm / 6,000 yr = 0.0127 ppm/yr, about 0.13 ppm per decade (co2-deglacial-mean-rate 0.010-0.015 ppm/yr; Monnin et al. 2001, Science 291, 112-114, doi 10.1126/science.291.5501.112)',
      },
      {
        file: DRAFTS + 'coldwater-trust-campaign.md',
        line: 25,
        kind: 'direction',
        text: 'As the seas warm they absorb more CO₂',
        why: 'Warmer water holds LESS dissolved CO2, about 3 %/K less (direction fact 1; co2-solubility-temperature-sensitivity; Weiss 1974, Mar. Chem. 2, 203-215, doi 10.1016/0304-4203(74)90015-2 (CO2 solubility falls as water warms, about 3 %/K); Takahashi et al. 1993, doi 10.1029/93GB02263)',
      },
      {
        file: DRAFTS + 'coldwater-trust-campaign.md',
        line: 31,
        kind: 'unit',
        text: 'or 0.28 percent',
        why: '280 ppm = 0.028 percent (co2-280ppm-as-percent; NOAA GML, co2_gr_gl.txt header: ppm = micromol/mol; 1 ppm = 1e-4 percent)',
      },
    ],
    correct: [
      { file: DRAFTS + 'coldwater-trust-campaign.md', line: 11, text: '**For eight hundred thousand years, Antarctica has kept a diary of our air.' },
      { file: DRAFTS + 'coldwater-trust-campaign.md', line: 13, text: 'Deep in the East Antarctic ice sheet, bubbles of ancient air hold a record of the atmosphere stretching back about 800,000 years.' },
      { file: DRAFTS + 'coldwater-trust-campaign.md', line: 17, text: 'The last time the ice sheets stood at their greatest extent, about 21,000 years ago, CO₂ was roughly 190 ppm.' },
      { file: DRAFTS + 'coldwater-trust-campaign.md', line: 17, text: 'At that Last Glacial Maximum, sea level was around 120 metres lower than today.' },
      { file: DRAFTS + 'coldwater-trust-campaign.md', line: 23, text: 'In 2024 alone, CO₂ went up by about 3.5 ppm, the largest jump on record.' },
      { file: DRAFTS + 'coldwater-trust-campaign.md', line: 27, text: 'The IPCC says that a doubling of CO₂ would likely warm the planet by 2.5 to 4 °C once the climate settles, with 3 °C as the best estimate.' },
      { file: DRAFTS + 'coldwater-trust-campaign.md', line: 31, text: 'We hear this a lot: CO₂ is only about 0.04 percent of the air, so how could it matter?' },
      { file: DRAFTS + 'coldwater-trust-campaign.md', line: 31, text: 'The answer is that even a small amount of a gas that absorbs infrared radiation changes how much heat escapes to space, just as a few drops of ink colour a whole glass of water.' },
    ],
  },
  {
    file: DRAFTS + 'nordvik-institute-faq.md',
    errors: [
      {
        file: DRAFTS + 'nordvik-institute-faq.md',
        line: 32,
        kind: 'scope',
        text: 'Worldwide, too, the warming at the end of each ice age came first',
        why: 'A global claim made with Antarctic lag figures: global temperature generally lagged CO2 (CO2 leads in 90 % of realisations; global-temp-vs-co2-shakun2012; Shakun et al. 2012, Nature 484, 49-54, doi 10.1038/nature10915)',
      },
      {
        file: DRAFTS + 'nordvik-institute-faq.md',
        line: 36,
        kind: 'logic',
        text: 'CO₂ is an effect, not a cause',
        why: 'Either/or framing of a feedback: CO2 was both a response to warming and an amplifier of it (direction fact 5; Shakun et al. 2012, Nature 484, 49-54, doi 10.1038/nature10915)',
      },
      {
        file: DRAFTS + 'nordvik-institute-faq.md',
        line: 36,
        kind: 'direction',
        text: 'As the oceans cooled going into each ice age, they released carbon dioxide into the air',
        why: 'Colder water holds MORE dissolved CO2, so cooling oceans take CO2 up (direction fact 1; Weiss 1974, Mar. Chem. 2, 203-215, doi 10.1016/0304-4203(74)90015-2 (CO2 solubility falls as water warms, about 3 %/K))',
      },
      {
        file: DRAFTS + 'nordvik-institute-faq.md',
        line: 40,
        kind: 'value',
        text: 'a cycle of about 26,000 years',
        why: 'Obliquity (axial tilt) has a 41,000-yr period (milankovitch-obliquity-period; Hays, Imbrie & Shackleton 1976, Science 194, 1121-1132, doi 10.1126/science.194.4270.1121)',
      },
      {
        file: DRAFTS + 'nordvik-institute-faq.md',
        line: 42,
        kind: 'value',
        text: 'about 1.8 million years ago',
        why: 'The Pleistocene base is 2.58 Ma (Gelasian GSSP, ratified 2009; pleistocene-base); 1.8 Ma is the superseded Vrica boundary (REFERENCE-VALUES "Where sources disagree")',
      },
      {
        file: DRAFTS + 'nordvik-institute-faq.md',
        line: 42,
        kind: 'unit',
        text: 'roughly 100,000 years ago',
        why: '1 Ma = 1,000,000 years (unit-ma-definition; Aubry et al. 2009, Stratigraphy 6, 100-105); the Mid-Pleistocene Transition is 0.7-1.25 Ma (Clark et al. 2006, doi 10.1016/j.quascirev.2006.07.008)',
      },
      {
        file: DRAFTS + 'nordvik-institute-faq.md',
        line: 50,
        kind: 'logic',
        text: 'Ice cores alone tell us exactly how much warming each ppm of CO₂ causes',
        why: 'Certainty overclaimed: sensitivity estimates need forcing and model/proxy syntheses, with a wide range (ECS 2.5-4 K likely; Forster et al. 2021, IPCC AR6 ch. 7, doi 10.1017/9781009157896.009; Tierney et al. 2020, Nature 584, 569-573, doi 10.1038/s41586-020-2617-x)',
      },
    ],
    correct: [
      { file: DRAFTS + 'nordvik-institute-faq.md', line: 14, text: 'The longest continuous record published so far comes from the EPICA Dome C core and spans about 800,000 years.' },
      { file: DRAFTS + 'nordvik-institute-faq.md', line: 14, text: 'Blue ice from the Allan Hills in Antarctica contains pieces more than two million years old, but those are scattered snapshots, not a continuous record.' },
      { file: DRAFTS + 'nordvik-institute-faq.md', line: 24, text: 'At Vostok the air is several thousand years younger than the ice that holds it.' },
      { file: DRAFTS + 'nordvik-institute-faq.md', line: 28, text: 'Antarctic temperatures are local: the Antarctic warmed by about 8–10 °C at the end of each ice age, roughly twice the global change.' },
      { file: DRAFTS + 'nordvik-institute-faq.md', line: 28, text: 'It mixes through the whole atmosphere quickly, so the CO₂ in Antarctic ice is a record of the global atmosphere.' },
      { file: DRAFTS + 'nordvik-institute-faq.md', line: 32, text: 'In Antarctica, early studies reported that CO₂ lagged temperature by about 600 to 800 years.' },
      { file: DRAFTS + 'nordvik-institute-faq.md', line: 32, text: 'More precise work since 2012 finds a lag of less than about 400 years, or none at all.' },
      { file: DRAFTS + 'nordvik-institute-faq.md', line: 46, text: 'Globally, the Last Glacial Maximum was about 6 °C colder than the pre-industrial climate (IPCC AR6; assessed range 5 to 7 °C).' },
      { file: DRAFTS + 'nordvik-institute-faq.md', line: 46, text: 'The poles changed far more: central Greenland was roughly 20 °C colder than today.' },
      { file: DRAFTS + 'nordvik-institute-faq.md', line: 50, text: 'one recent study (Tierney et al. 2020) estimated an equilibrium climate sensitivity of about 3.4 °C per doubling of CO₂.' },
      { file: DRAFTS + 'nordvik-institute-faq.md', line: 54, text: 'Over the last 800,000 years, ice cores show CO₂ between about 172 and 300 ppm.' },
      { file: DRAFTS + 'nordvik-institute-faq.md', line: 54, text: 'In 2023 the global average was about 419 ppm, and the IPCC concludes, from ice cores together with other evidence, that CO₂ is now higher than at any time in at least two million years.' },
    ],
  },
];
