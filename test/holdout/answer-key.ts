/**
 * Answer key for the hold-out drafts in ./drafts (a second blind set: measured, never tuned on).
 *
 * Written without reading the engine, its rule packs, its tests or its documentation. Every seeded
 * error is wrong by the ranges in /work/shared/REFERENCE-VALUES.md, and every correct claim lies
 * inside them. `why` names the reference row (its id in that table), its range and the published
 * source; "common practice" marks plain arithmetic on the draft's own numbers.
 *
 * `line` is the 1-based line in the original file where `text` appears (for a correct claim, where
 * the sentence starts); holdout.test.ts checks that the key still matches the drafts.
 */
import type { DraftKey } from '../evaluation/answer-key.js';

const DRAFTS = 'test/holdout/drafts/';

/** Seeded errors and correct claims, draft by draft. */
export const holdoutKey: readonly DraftKey[] = [
  {
    file: DRAFTS + 'festival-talk-handout.md',
    errors: [
      {
        file: DRAFTS + 'festival-talk-handout.md',
        line: 18,
        kind: 'unit',
        text: 'or roughly 33,000 feet',
        why: '3,270 m is about 10,700 ft, not 33,000 ft (1 ft = 0.3048 m; NIST SP 811 (2008): 1 ft = 0.3048 m exactly); the depth itself is inside edc-drilled-depth 3260-3270.2 m (Lüthi et al. 2008, Nature 453, 379-382, doi 10.1038/nature06949)',
      },
      {
        file: DRAFTS + 'festival-talk-handout.md',
        line: 19,
        kind: 'value',
        text: 'holds roughly 1.1 million years of climate history',
        why: 'The second Dome Fuji core spans 700,000-720,000 yr (dome-fuji-record-span; Motoyama 2007, Scientific Drilling 5, 41-43, doi 10.2204/iodp.sd.5.05.2007; Kawamura et al. 2017, Sci. Adv. 3, e1600446)',
      },
      {
        file: DRAFTS + 'festival-talk-handout.md',
        line: 33,
        kind: 'arith',
        text: 'a rise of roughly 80 ppm',
        why: 'The draft\'s own numbers give 280 - 180 = 100 ppm, not 80 (common practice); 100 ppm is inside co2-glacial-interglacial-amplitude 80-100 ppm (Caillon et al. 2003, Science 299, 1728-1731, doi 10.1126/science.1078758; Fischer et al. 1999)',
      },
      {
        file: DRAFTS + 'festival-talk-handout.md',
        line: 45,
        kind: 'logic',
        text: 'carbon dioxide cannot have contributed to the warming at all',
        why: 'A lag used to rule out a cause: Antarctic-CO2 offset is -200 to 750 yr (antarctic-co2-phasing-termination-1-consensus; Chowdhry Beeman et al. 2019, Clim. Past 15, 913-926, doi 10.5194/cp-15-913-2019; Parrenin et al. 2013, Science 339, 1060-1063, doi 10.1126/science.1226368) and global temperature followed CO2, which amplified the warming (Shakun et al. 2012, Nature 484, 49-54, doi 10.1038/nature10915)',
      },
      {
        file: DRAFTS + 'festival-talk-handout.md',
        line: 48,
        kind: 'scope',
        text: 'the whole planet was about 9 °C colder',
        why: 'Dome C deuterium is an Antarctic temperature (antarctic-deglacial-warming-isotope 8-10 K; Pedro et al. 2012, Clim. Past 8, 1213-1221, doi 10.5194/cp-8-1213-2012); the global LGM cooling is 3.6-7 K (gmst-lgm-to-preindustrial-warming; Gulev et al. 2021, IPCC AR6 WGI ch. 2, doi 10.1017/9781009157896.004; Tierney et al. 2020, Nature 584, 569-573, doi 10.1038/s41586-020-2617-x; Annan, Hargreaves & Mauritsen 2022, Clim. Past 18, 1883-1896, doi 10.5194/cp-18-1883-2022)',
      },
      {
        file: DRAFTS + 'festival-talk-handout.md',
        line: 52,
        kind: 'direction',
        text: 'Warmer seawater dissolves more carbon dioxide',
        why: 'Warmer water holds LESS dissolved CO2: solubility falls about 2.5-4 % per K (co2-solubility-temperature-sensitivity; Weiss 1974, Marine Chemistry 2, 203-215, doi 10.1016/0304-4203(74)90015-2); warming oceans release CO2 (Sigman & Boyle 2000, Nature 407, 859-869, doi 10.1038/35038000)',
      },
    ],
    correct: [
      { file: DRAFTS + 'festival-talk-handout.md', line: 15, text: 'The Vostok core from East Antarctica was drilled to 3,623 metres in January 1998, and its ice holds about 420,000 years of climate history.' },
      { file: DRAFTS + 'festival-talk-handout.md', line: 17, text: 'The EPICA Dome C core was finished at roughly 3,270 m and carries the record back to around 800 kyr, eight full glacial cycles.' },
      { file: DRAFTS + 'festival-talk-handout.md', line: 21, text: 'The lowest 200 metres of the Dome C core hold about 150,000 years, while near the surface a metre of snow covers only a few decades.' },
      { file: DRAFTS + 'festival-talk-handout.md', line: 26, text: 'That is why the air in a bubble is younger than the ice around it, by some thousands of years at a cold, dry site like Vostok.' },
      { file: DRAFTS + 'festival-talk-handout.md', line: 30, text: '| CO₂ in the air | about 180–190 ppm | about 280 ppm |' },
      { file: DRAFTS + 'festival-talk-handout.md', line: 34, text: 'A level of 280 ppm is only 0.028 percent of the air, yet it matters enormously for Earth\'s heat balance.' },
      { file: DRAFTS + 'festival-talk-handout.md', line: 38, text: 'You will hear it said that "the temperature rose first, so CO₂ cannot be the cause." The ice does not support that conclusion.' },
      { file: DRAFTS + 'festival-talk-handout.md', line: 39, text: 'A small orbital nudge warmed the south first, the warming ocean released CO₂, and the extra CO₂ trapped more heat and spread the warming around the globe: CO₂ was both a consequence and a cause.' },
      { file: DRAFTS + 'festival-talk-handout.md', line: 40, text: 'Newer, better-dated records put Antarctic warming and the CO₂ rise within a few centuries of each other over the last deglaciation, and at some points they cannot be told apart.' },
      { file: DRAFTS + 'festival-talk-handout.md', line: 49, text: 'Worldwide averages are smaller: recent reconstructions put the global cooling at the Last Glacial Maximum at roughly 4.5 to 6 °C.' },
      { file: DRAFTS + 'festival-talk-handout.md', line: 56, text: 'Orbital cycles of roughly 100,000, 41,000 and 23,000 years pace the ice ages.' },
      { file: DRAFTS + 'festival-talk-handout.md', line: 58, text: 'Today\'s global average, about 424 ppm in 2024, is far above anything in the 800,000-year ice record.' },
    ],
  },
  {
    file: DRAFTS + 'cruise-expedition-notes.md',
    errors: [
      {
        file: DRAFTS + 'cruise-expedition-notes.md',
        line: 22,
        kind: 'value',
        text: 'an unbroken climate history of roughly 650,000 years',
        why: 'The Vostok record spans 400,000-423,000 yr (vostok-record-span; Petit et al. 1999, Nature 399, 429-436); about 800 kyr belongs to EPICA Dome C',
      },
      {
        file: DRAFTS + 'cruise-expedition-notes.md',
        line: 32,
        kind: 'unit',
        text: 'or 2.8 percent',
        why: '280 ppm = 0.028 %, not 2.8 % (co2-280ppm-as-percent, unit-ppm-to-percent; NOAA GML co2_gr_gl.txt header (ppm = micromol/mol; 1 ppm = 0.0001 %))',
      },
      {
        file: DRAFTS + 'cruise-expedition-notes.md',
        line: 37,
        kind: 'arith',
        text: 'some 20 times faster than that deglacial average',
        why: 'The draft\'s own numbers: 2.4 ppm/yr = 240 ppm per century, about 240 times 1 ppm per century, not 20 (common practice); co2-modern-vs-deglacial-rate-ratio 180-210 (Lan, Tans & Thoning, NOAA GML global CO2 growth rates, doi 10.15138/9N0H-ZH07; Monnin et al. 2001, Science 291, 112-114, doi 10.1126/science.291.5501.112)',
      },
      {
        file: DRAFTS + 'cruise-expedition-notes.md',
        line: 43,
        kind: 'scope',
        text: 'Across the globe, temperatures rose about 800 years before CO₂',
        why: 'An Antarctic lag figure (800 yr: lag-monnin2001 / lag-caillon2003-termination-iii; Monnin et al. 2001, Science 291, 112-114, doi 10.1126/science.291.5501.112; Caillon et al. 2003, Science 299, 1728-1731, doi 10.1126/science.1078758) applied to global temperature, which generally lagged CO2 (global-temp-vs-co2-shakun2012; Shakun et al. 2012, Nature 484, 49-54, doi 10.1038/nature10915)',
      },
      {
        file: DRAFTS + 'cruise-expedition-notes.md',
        line: 47,
        kind: 'direction',
        text: 'always older than the ice that surrounds them',
        why: 'Ice-core air is YOUNGER than the surrounding ice (delta-age 2000-6500 yr at Vostok; delta-age-vostok; Caillon et al. 2003, Science 299, 1728-1731, doi 10.1126/science.1078758)',
      },
      {
        file: DRAFTS + 'cruise-expedition-notes.md',
        line: 49,
        kind: 'logic',
        text: 'on its own, proof that carbon dioxide controls the climate',
        why: 'Correlation presented as proof: the ice-core covariation (co2-800kyr-range 172-300 ppm; Lüthi et al. 2008, Nature 453, 379-382, doi 10.1038/nature06949) does not by itself establish causation; attribution needs physics and global proxy timing (Shakun et al. 2012, Nature 484, 49-54, doi 10.1038/nature10915; Myhre et al. 1998, GRL 25, 2715-2718, doi 10.1029/98GL01908)',
      },
    ],
    correct: [
      { file: DRAFTS + 'cruise-expedition-notes.md', line: 17, text: 'The longest continuous record published so far comes from **EPICA Dome C**, high on the East Antarctic plateau, where a European team recovered ice covering about 800,000 years.' },
      { file: DRAFTS + 'cruise-expedition-notes.md', line: 19, text: 'In early 2025 the *Beyond EPICA* team reached bedrock at Little Dome C, about 2,800 m (some 9,200 feet) down, and reported ice at least 1.2 million years old; analyses are still under way.' },
      { file: DRAFTS + 'cruise-expedition-notes.md', line: 21, text: 'Russian, French and American scientists drilled the Vostok core to 3,623 m, recovering a record that spans four ice-age cycles.' },
      { file: DRAFTS + 'cruise-expedition-notes.md', line: 24, text: 'Older ice turns up in odd places: in the Allan Hills blue-ice area, scientists have dated ice to around 2.7 million years, although those samples are snapshots rather than a continuous record.' },
      { file: DRAFTS + 'cruise-expedition-notes.md', line: 28, text: 'Across the past 800,000 years, CO₂ in the ice swung between roughly 172 ppm in the coldest glacials and about 300 ppm in the warmest interglacials.' },
      { file: DRAFTS + 'cruise-expedition-notes.md', line: 30, text: 'At the height of the last ice age, about 21,000 years ago, CO₂ stood at around 190 ppm.' },
      { file: DRAFTS + 'cruise-expedition-notes.md', line: 34, text: 'Today the global average is above 420 ppm, higher than at any time in at least two million years, according to the IPCC\'s 2021 assessment.' },
      { file: DRAFTS + 'cruise-expedition-notes.md', line: 36, text: 'During the last deglaciation CO₂ rose by about 80 ppm over roughly 7,000 years, an average of a little over 1 ppm per century.' },
      { file: DRAFTS + 'cruise-expedition-notes.md', line: 41, text: 'In Antarctic cores, temperature and CO₂ rose almost together during the last deglaciation, with Antarctica perhaps a few centuries ahead at the start.' },
      { file: DRAFTS + 'cruise-expedition-notes.md', line: 45, text: 'Averaged over the whole planet, the warming generally followed the CO₂ rise, as a 2012 study of 80 proxy records from around the world showed.' },
    ],
  },
  {
    file: DRAFTS + 'alumni-magazine-feature.md',
    errors: [
      {
        file: DRAFTS + 'alumni-magazine-feature.md',
        line: 21,
        kind: 'scope',
        text: 'the Northern Hemisphere as a whole was some 22 °C colder',
        why: 'About 22 K is the central Greenland (Summit) LGM cooling (greenland-lgm-cooling 15-25 K; Dahl-Jensen et al. 1998, Science 282, 268-271, doi 10.1126/science.282.5387.268), a local value 3-4 times the global 3.6-7 K (gmst-lgm-to-preindustrial-warming; Gulev et al. 2021, IPCC AR6 WGI ch. 2, doi 10.1017/9781009157896.004; Tierney et al. 2020, Nature 584, 569-573, doi 10.1038/s41586-020-2617-x)',
      },
      {
        file: DRAFTS + 'alumni-magazine-feature.md',
        line: 28,
        kind: 'arith',
        text: 'an average of roughly 1 ppm every decade',
        why: 'The draft\'s own numbers: 76 ppm / 6,500 yr = 0.012 ppm/yr = about 0.12 ppm per decade (about 1 ppm per century), not 1 ppm per decade (common practice); co2-deglacial-mean-rate 0.01-0.015 ppm/yr (Monnin et al. 2001, Science 291, 112-114, doi 10.1126/science.291.5501.112)',
      },
      {
        file: DRAFTS + 'alumni-magazine-feature.md',
        line: 29,
        kind: 'unit',
        text: '(about 48 °F)',
        why: 'A 9 °C difference is 16.2 °F; 48 °F comes from adding 32, which applies only to absolute temperatures (unit-celsius-to-fahrenheit-difference; BIPM SI Brochure 9th ed. 2019 and NIST SP 811 (2008): a 1 °C difference = 1 K = 1.8 °F)',
      },
      {
        file: DRAFTS + 'alumni-magazine-feature.md',
        line: 33,
        kind: 'logic',
        text: 'CO₂ was simply a response to the warming, not a driver of it',
        why: 'Either/or framing of a feedback: CO2 responded to the orbital warming and then amplified and spread it (direction fact 5; Shakun et al. 2012, Nature 484, 49-54, doi 10.1038/nature10915; Hays, Imbrie & Shackleton 1976, Science 194, 1121-1132, doi 10.1126/science.194.4270.1121)',
      },
      {
        file: DRAFTS + 'alumni-magazine-feature.md',
        line: 43,
        kind: 'direction',
        text: 'each added ppm heats the planet more than the one before',
        why: 'CO2 forcing grows with the logarithm of concentration (5.35 ln(C/C0) W/m2; co2-forcing-coefficient; Myhre et al. 1998, GRL 25, 2715-2718, doi 10.1029/98GL01908), so each added ppm adds LESS forcing than the one before',
      },
      {
        file: DRAFTS + 'alumni-magazine-feature.md',
        line: 45,
        kind: 'value',
        text: 'about 150 ppm, in a cold stage roughly 667,000 years ago',
        why: 'The lowest CO2 in the 800-kyr record is 170-180 ppm (172 ppmv; co2-lowest-800kyr; Lüthi et al. 2008, Nature 453, 379-382, doi 10.1038/nature06949; Bereiter et al. 2015, GRL 42, 542-549, doi 10.1002/2014GL061957)',
      },
    ],
    correct: [
      { file: DRAFTS + 'alumni-magazine-feature.md', line: 16, text: 'Osei\'s doctorate used the EPICA Dome C core, which at 3,270 m deep holds roughly 800,000 years of snowfall.' },
      { file: DRAFTS + 'alumni-magazine-feature.md', line: 17, text: 'Her current project works on Greenland ice, where the GRIP core is 3,029 m long but its dependable layering reaches back only into the last interglacial, about 120,000 years ago.' },
      { file: DRAFTS + 'alumni-magazine-feature.md', line: 19, text: 'The Greenland record is prized for its sharp detail of the Younger Dryas, a cold snap that began about 12,900 years ago and ended around 11,700 years ago.' },
      { file: DRAFTS + 'alumni-magazine-feature.md', line: 20, text: 'At the end of the Younger Dryas, central Greenland warmed by about 10 °C within a few decades.' },
      { file: DRAFTS + 'alumni-magazine-feature.md', line: 23, text: 'The Last Glacial Maximum, centred about 21,000 years ago, left sea level roughly 125 metres below today\'s.' },
      { file: DRAFTS + 'alumni-magazine-feature.md', line: 27, text: 'Osei\'s CO₂ work focuses on the last termination, which ran from roughly 18,000 to 11,500 years ago, about 6,500 years in all.' },
      { file: DRAFTS + 'alumni-magazine-feature.md', line: 35, text: 'Osei\'s own answer is that it was both. "Changes in Earth\'s orbit set things off, the Southern Ocean released carbon, and that CO₂ then amplified the warming and carried it around the globe."' },
      { file: DRAFTS + 'alumni-magazine-feature.md', line: 37, text: 'The lag question, she adds, is partly a matter of dating: the air in the bubbles is younger than the surrounding ice, and the difference has to be corrected before the curves are compared.' },
      { file: DRAFTS + 'alumni-magazine-feature.md', line: 41, text: 'Antarctic temperatures swing about one and a half to two times as far as the global average, so a 9 °C change at Dome C corresponds to roughly 5 °C worldwide.' },
      { file: DRAFTS + 'alumni-magazine-feature.md', line: 47, text: 'The same records help pin down climate sensitivity, which the IPCC\'s latest assessment puts at *likely* 2.5 to 4 °C per doubling of CO₂.' },
    ],
  },
  {
    file: DRAFTS + 'library-exhibition-leaflet.txt',
    errors: [
      {
        file: DRAFTS + 'library-exhibition-leaflet.txt',
        line: 24,
        kind: 'logic',
        text: 'Orbital changes on their own were enough to melt the great ice sheets',
        why: 'A single cause where two acted together: orbital forcing paced the cycles (Hays, Imbrie & Shackleton 1976, Science 194, 1121-1132, doi 10.1126/science.194.4270.1121) but CO2 amplified and globalised the warming (direction fact 5; Shakun et al. 2012, Nature 484, 49-54, doi 10.1038/nature10915)',
      },
      {
        file: DRAFTS + 'library-exhibition-leaflet.txt',
        line: 31,
        kind: 'scope',
        text: 'record the average temperature of the entire planet',
        why: 'Vostok isotopes record Antarctic (local) temperature, 8-10 K per cycle (antarctic-deglacial-warming-isotope; Petit et al. 1999, Nature 399, 429-436; Pedro et al. 2012, Clim. Past 8, 1213-1221, doi 10.5194/cp-8-1213-2012), about 1.5-2 times the global change (gmst-lgm-to-preindustrial-warming 3.6-7 K; Gulev et al. 2021, IPCC AR6 WGI ch. 2, doi 10.1017/9781009157896.004)',
      },
      {
        file: DRAFTS + 'library-exhibition-leaflet.txt',
        line: 33,
        kind: 'unit',
        text: 'reaches back roughly 800 Ma',
        why: '800 Ma is 800 million years; the EPICA Dome C record spans 790,000-810,000 yr = about 800 ka (edc-record-span; Lüthi et al. 2008, Nature 453, 379-382, doi 10.1038/nature06949; unit-ka-definition, unit-ma-definition; Aubry et al. 2009, Stratigraphy 6, 100-105)',
      },
      {
        file: DRAFTS + 'library-exhibition-leaflet.txt',
        line: 42,
        kind: 'value',
        text: 'raised global sea level by roughly 200 metres',
        why: 'Deglacial sea-level rise from ~19 to ~11 ka was 70-90 m (deglacial-sea-level-rise; Clark et al. 2012, PNAS 109, E1134-E1142 (from memory)); the whole LGM lowstand was only 120-135 m (lgm-sea-level-lowstand; Lambeck et al. 2014, PNAS 111, 15296-15303, doi 10.1073/pnas.1411762111)',
      },
      {
        file: DRAFTS + 'library-exhibition-leaflet.txt',
        line: 44,
        kind: 'direction',
        text: 'Antarctica warmed in step with it',
        why: 'Bipolar seesaw: during the Bølling-Allerød Antarctica COOLED in the Antarctic Cold Reversal, 14,500-14,700 to 12,700-13,000 yr BP (acr-start, acr-end; direction fact 8; Pedro et al. 2016, Nature Geoscience 9, 51-55, doi 10.1038/ngeo2580)',
      },
      {
        file: DRAFTS + 'library-exhibition-leaflet.txt',
        line: 46,
        kind: 'arith',
        text: 'some 2,200 years in all',
        why: 'The draft\'s own dates give 12,900 - 11,700 = 1,200 yr, not 2,200 (common practice); younger-dryas-duration 1100-1300 yr (Walker et al. 2009; encyclopedic Younger Dryas entry)',
      },
    ],
    correct: [
      { file: DRAFTS + 'library-exhibition-leaflet.txt', line: 16, text: 'A 1976 paper in Science called changes in Earth\'s orbit the "pacemaker of the ice ages", finding cycles of about 100,000, 41,000 and 23,000 years in deep-sea sediments.' },
      { file: DRAFTS + 'library-exhibition-leaflet.txt', line: 18, text: 'The 41,000-year rhythm comes from the changing tilt of Earth\'s axis, and the precession of the equinoxes adds cycles of about 19,000 and 23,000 years.' },
      { file: DRAFTS + 'library-exhibition-leaflet.txt', line: 20, text: 'For most of the Pleistocene, which began 2.58 million years ago, ice ages came and went every 41,000 years or so.' },
      { file: DRAFTS + 'library-exhibition-leaflet.txt', line: 22, text: 'The switch to longer cycles of about 100,000 years, the Mid-Pleistocene Transition, happened roughly one million years ago.' },
      { file: DRAFTS + 'library-exhibition-leaflet.txt', line: 29, text: 'The Vostok core, described in Nature in 1999, spans about 420,000 years.' },
      { file: DRAFTS + 'library-exhibition-leaflet.txt', line: 38, text: 'The Last Glacial Maximum, when the ice sheets stood at their largest, lasted from about 26,500 to 19,000 years ago.' },
      { file: DRAFTS + 'library-exhibition-leaflet.txt', line: 40, text: 'Global sea level was about 130 metres lower then.' },
      { file: DRAFTS + 'library-exhibition-leaflet.txt', line: 48, text: 'The end of that cold spell, 11,700 years before AD 2000, now marks the official start of the Holocene.' },
      { file: DRAFTS + 'library-exhibition-leaflet.txt', line: 53, text: 'A visitor\'s comment card asked: "If CO2 rose after the temperature, how can it be a cause?"' },
      { file: DRAFTS + 'library-exhibition-leaflet.txt', line: 55, text: 'Orbital changes started the warming in the south; the ocean then released CO2, and that extra CO2 amplified the warming and spread it worldwide.' },
      { file: DRAFTS + 'library-exhibition-leaflet.txt', line: 57, text: 'In Antarctic ice, temperature led CO2 by a few centuries at most during the last deglaciation, and the often-quoted 800-year figure comes from a different termination, about 240,000 years ago.' },
      { file: DRAFTS + 'library-exhibition-leaflet.txt', line: 59, text: 'In 1750 the air held about 278 ppm of CO2; by 2019 that had risen by some 47 percent.' },
    ],
  },
  {
    file: DRAFTS + 'hikers-climate-letter.md',
    errors: [
      {
        file: DRAFTS + 'hikers-climate-letter.md',
        line: 16,
        kind: 'unit',
        text: 'a drop of some 295 K',
        why: 'A 22 °C difference is 22 K; 295 K comes from adding 273.15, which applies only to absolute temperatures (unit-kelvin-celsius-difference; BIPM SI Brochure 9th ed. 2019 and NIST SP 811 (2008): a 1 °C difference = 1 K = 1.8 °F); the 22 K itself is inside greenland-lgm-cooling 15-25 K (Dahl-Jensen et al. 1998, Science 282, 268-271, doi 10.1126/science.282.5387.268)',
      },
      {
        file: DRAFTS + 'hikers-climate-letter.md',
        line: 22,
        kind: 'value',
        text: 'the air held only about 120 ppm of CO₂',
        why: 'LGM CO2 was 180-200 ppm (co2-lgm; Gulev et al. 2021, IPCC AR6 WGI ch. 2, doi 10.1017/9781009157896.004; Forster et al. 2021, AR6 WGI ch. 7, doi 10.1017/9781009157896.009); nothing in the 800-kyr record is below 170 ppm (Lüthi et al. 2008, Nature 453, 379-382, doi 10.1038/nature06949)',
      },
      {
        file: DRAFTS + 'hikers-climate-letter.md',
        line: 24,
        kind: 'arith',
        text: 'more than three times the 190 ppm of the ice age',
        why: 'The draft\'s own numbers give 420 / 190 = 2.2, not more than three (common practice)',
      },
      {
        file: DRAFTS + 'hikers-climate-letter.md',
        line: 35,
        kind: 'direction',
        text: 'Cold seawater holds less dissolved CO₂ than warm water',
        why: 'Cold water holds MORE dissolved CO2: solubility falls about 2.5-4 % per K of warming (co2-solubility-temperature-sensitivity; Weiss 1974, Marine Chemistry 2, 203-215, doi 10.1016/0304-4203(74)90015-2); the glacial ocean stored extra carbon (Sigman & Boyle 2000, Nature 407, 859-869, doi 10.1038/35038000)',
      },
      {
        file: DRAFTS + 'hikers-climate-letter.md',
        line: 44,
        kind: 'scope',
        text: 'the global average temperature swung by 8 to 10 °C',
        why: 'Vostok gives Antarctic temperature, 8-10 K (antarctic-deglacial-warming-isotope; Petit et al. 1999, Nature 399, 429-436; Pedro et al. 2012, Clim. Past 8, 1213-1221, doi 10.5194/cp-8-1213-2012); the global change is 3.6-7 K (gmst-lgm-to-preindustrial-warming; Gulev et al. 2021, IPCC AR6 WGI ch. 2, doi 10.1017/9781009157896.004; Tierney et al. 2020, Nature 584, 569-573, doi 10.1038/s41586-020-2617-x)',
      },
      {
        file: DRAFTS + 'hikers-climate-letter.md',
        line: 46,
        kind: 'logic',
        text: 'The ice cores alone prove beyond doubt that every past warming was caused by CO₂',
        why: 'Certainty overclaimed about what ice cores alone show: they give Antarctic covariation within a few centuries (antarctic-co2-phasing-termination-1-consensus; Chowdhry Beeman et al. 2019, Clim. Past 15, 913-926, doi 10.5194/cp-15-913-2019); orbital pacing (Hays, Imbrie & Shackleton 1976, Science 194, 1121-1132, doi 10.1126/science.194.4270.1121) and global proxy timing (Shakun et al. 2012, Nature 484, 49-54, doi 10.1038/nature10915) are needed for attribution',
      },
    ],
    correct: [
      { file: DRAFTS + 'hikers-climate-letter.md', line: 14, text: 'Most of the great ice sheets stood at their maximum from about 26,000 to 20,000 years ago.' },
      { file: DRAFTS + 'hikers-climate-letter.md', line: 15, text: 'Averaged over the globe, the Last Glacial Maximum was about 6 °C (11 °F) colder than the pre-industrial climate.' },
      { file: DRAFTS + 'hikers-climate-letter.md', line: 18, text: 'The ice age formally gave way to the Holocene around 9700 BCE, and walkers who see "11,700 b2k" on an information board are reading years before AD 2000, which is 11,650 years BP.' },
      { file: DRAFTS + 'hikers-climate-letter.md', line: 23, text: 'That compares with about 280 ppm before the industrial era and roughly 420 ppm today.' },
      { file: DRAFTS + 'hikers-climate-letter.md', line: 32, text: 'The 2024 jump of about 3.5 ppm in a single year was the largest since measurements began.' },
      { file: DRAFTS + 'hikers-climate-letter.md', line: 33, text: 'In the 2010s, CO₂ rose by about 2.4 ppm a year, roughly 190 times the average pace of the last deglaciation.' },
      { file: DRAFTS + 'hikers-climate-letter.md', line: 39, text: 'Small changes in Earth\'s orbit, especially the 41,000-year wobble in the tilt of its axis, shifted summer sunshine in the north and set the melt going.' },
      { file: DRAFTS + 'hikers-climate-letter.md', line: 40, text: 'CO₂ released from the Southern Ocean then amplified the warming and helped carry it around the world.' },
      { file: DRAFTS + 'hikers-climate-letter.md', line: 42, text: 'A reader wrote in to say that "CO₂ lagged temperature by 800 years, so it can\'t drive climate."' },
      { file: DRAFTS + 'hikers-climate-letter.md', line: 42, text: 'That mixes up two things: the 800-year figure comes from one Antarctic core across an older termination, and during the last deglaciation global temperature actually followed CO₂.' },
    ],
  },
];
