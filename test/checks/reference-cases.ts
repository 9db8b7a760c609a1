/**
 * One agreeing and one conflicting sentence per reference value of the built-in pack, in our own
 * words (invented museums, newsletters and teams), each with the quantity the parser should read
 * as an interval in the canonical unit. The source of each reference range is named beside it.
 */
import type { Dimension } from '../../src/types.js';

/** A sentence and the one quantity in it: its text, dimension, interval, and stated unit. */
export type Said = [sentence: string, text: string, dimension: Dimension, low: number, high: number, statedUnit?: string];

/** Reference id, agreeing sentence, conflicting sentence. */
export type Case = [id: string, agrees: Said, conflicts: Said];

const Y = 'duration';
const A = 'age';
const C = 'concentration';
const T = 'temperature-change';
const L = 'length';

export const CASES: Case[] = [
  // Petit et al. 1999, Nature 399, 429-436 (doi 10.1038/20859)
  ['vostok-record-span', ['The Vostok record at the Harbour Museum reaches back about 420,000 years.', 'about 420,000 years', Y, 400_000, 440_000], ['Our newsletter claimed the Vostok record spans 800,000 years.', '800,000 years', Y, 795_000, 805_000]],
  // Vostok 5G review abstract and CNRS dossier (verified pages)
  ['vostok-drilled-depth', ['The Vostok drill reached 3,623 metres in January 1998.', '3,623 metres', L, 3622.5, 3623.5], ['The Vostok drill reached 2,000 metres before stopping.', '2,000 metres', L, 1950, 2050]],
  // NSF Ice Core Facility inventory: Vostok
  ['vostok-undisturbed-depth', ['Vostok ice stays undisturbed down to about 3,350 metres.', 'about 3,350 metres', L, 3300, 3400], ['Vostok ice stays undisturbed down to 3,600 metres.', '3,600 metres', L, 3550, 3650]],
  // Petit et al. 1999
  ['vostok-glacial-cycles', ['Vostok holds four glacial cycles.', 'four', 'count', 4, 4], ['Vostok holds eight glacial cycles.', 'eight', 'count', 8, 8]],
  // Jouzel et al. 2007 (doi 10.1126/science.1141038); Lüthi et al. 2008 (doi 10.1038/nature06949)
  // Lüthi et al. 2008 (doi 10.1038/nature06949): the lowest 200 m of Dome C hold about 150,000 years.
  ['edc-bottom-200m-span', ['The lowest 200 metres of the EPICA Dome C core hold about 150,000 years.', 'about 150,000 years', Y, 141_000, 159_000], ['The bottom 200 metres of the Dome C core hold only 15,000 years.', '15,000 years', Y, 14_500, 15_500]],
  ['edc-record-span', ['The EPICA Dome C record reaches back about 800,000 years.', 'about 800,000 years', Y, 780_000, 820_000], ['The EPICA Dome C record reaches back 400,000 years.', '400,000 years', Y, 395_000, 405_000]],
  // Lüthi et al. 2008; EPICA project page
  ['edc-drilled-depth', ['At Dome C the drill stopped at 3,270 metres.', '3,270 metres', L, 3265, 3275], ['At Dome C the drill stopped at 4,500 metres.', '4,500 metres', L, 4450, 4550]],
  // EPICA community members 2004 (doi 10.1038/nature02599)
  ['edc-glacial-cycles', ['The Dome C core spans eight glacial cycles.', 'eight', 'count', 8, 8], ['The Dome C core spans four glacial cycles.', 'four', 'count', 4, 4]],
  // Oerter & EPICA team 2008
  ['edml-drilled-depth', ['At Kohnen the EDML drill reached 2,774 metres.', '2,774 metres', L, 2773.5, 2774.5], ['At Kohnen the EDML drill reached 3,500 metres.', '3,500 metres', L, 3450, 3550]],
  // Motoyama 2007 (doi 10.2204/iodp.sd.5.05.2007)
  ['dome-fuji-drilled-depth', ['The second Dome Fuji core ended at 3,035 metres.', '3,035 metres', L, 3034.5, 3035.5], ['The second Dome Fuji core ended at 2,500 metres.', '2,500 metres', L, 2450, 2550]],
  // Motoyama 2007; Dome Fuji Ice Core Project Members 2017 (from memory)
  ['dome-fuji-record-span', ['The Dome Fuji record spans about 720,000 years.', 'about 720,000 years', Y, 700_000, 740_000], ['The Dome Fuji record spans 300,000 years.', '300,000 years', Y, 295_000, 305_000]],
  // Dansgaard et al. 1996 (verified page)
  ['grip-depth-and-span', ['The GRIP core is 3,029 metres long.', '3,029 metres', L, 3028.5, 3029.5], ['The GRIP core is 1,200 metres long.', '1,200 metres', L, 1150, 1250]],
  // Lüthi et al. 2008 and later reports
  ['oldest-continuous-ice-core-record', ['The oldest continuous ice-core record so far covers about 800,000 years.', 'about 800,000 years', Y, 780_000, 820_000], ['The oldest continuous ice-core record covers 3 million years.', '3 million years', Y, 2_500_000, 3_500_000]],
  // Beyond EPICA - Oldest Ice consortium 2025 (verified page)
  ['beyond-epica-drilled-depth', ['Beyond EPICA hit bedrock at about 2,800 metres.', 'about 2,800 metres', L, 2750, 2850], ['Beyond EPICA hit bedrock at 3,900 metres.', '3,900 metres', L, 3850, 3950]],
  // IPEV press release on Beyond EPICA, 24 March 2025 (read): ice at least 1.2 million years old, preliminary
  ['beyond-epica-ice-age', ['The Beyond EPICA ice is at least 1.2 million years old.', 'at least 1.2 million years', Y, 1_200_000, 2_400_000], ['The Beyond EPICA ice is about 300,000 years old.', 'about 300,000 years', Y, 250_000, 350_000]],
  // Yan et al. 2019 (doi 10.1038/s41586-019-1692-3)
  ['allan-hills-oldest-ice', ['Ice from the Allan Hills is up to 2.7 million years old.', '2.7 million years', A, 2_650_000, 2_750_000], ['Ice from the Allan Hills is 10 million years old.', '10 million years', A, 9_500_000, 10_500_000]],
  // Caillon et al. 2003 (doi 10.1126/science.1078758)
  ['delta-age-vostok', ['At Vostok the gas age trails the ice by about 4,000 years.', 'about 4,000 years', Y, 3500, 4500], ['At Vostok the gas age trails the ice by 20 years.', '20 years', Y, 15, 25]],
  // Loulergue et al. 2007 (from memory)
  ['delta-age-edc', ['At Dome C the gas age trails the ice by 2,000 to 5,000 years.', '2,000 to 5,000 years', Y, 2000, 5000], ['At Dome C the gas age trails the ice by 50 years.', '50 years', Y, 45, 55]],
  // Lüthi et al. 2008; Bereiter et al. 2015 (doi 10.1002/2014GL061957)
  ['co2-lowest-800kyr', ['The lowest CO2 in the ice was about 172 ppm.', 'about 172 ppm', C, 165, 179], ['The lowest CO2 in the ice was 100 ppm.', '100 ppm', C, 99.5, 100.5]],
  // Forster et al. 2021 (IPCC AR6 WG1 ch. 7); Monnin et al. 2001
  ['co2-lgm', ['During the Last Glacial Maximum CO2 stood near 190 ppm.', 'near 190 ppm', C, 185, 195], ['During the Last Glacial Maximum CO2 stood at 250 ppm.', '250 ppm', C, 249.5, 250.5]],
  // Lüthi et al. 2008; Siegenthaler et al. 2005
  ['co2-glacial-minimum-typical', ['In each ice age CO2 sank to about 185 ppm.', 'about 185 ppm', C, 180, 190], ['In each ice age CO2 sank to 120 ppm.', '120 ppm', C, 119.5, 120.5]],
  // Lüthi et al. 2008; Siegenthaler et al. 2005
  ['co2-interglacial-maximum-typical', ['In warm periods CO2 reached about 280 ppm.', 'about 280 ppm', C, 270, 290], ['In warm periods CO2 reached 400 ppm.', '400 ppm', C, 399.5, 400.5]],
  // Lüthi et al. 2008
  ['co2-highest-preindustrial-800kyr', ['Natural CO2 in the ice never rose above about 300 ppm.', 'about 300 ppm', C, 290, 310], ['Natural CO2 in the ice never rose above 350 ppm.', '350 ppm', C, 349.5, 350.5]],
  // Fischer et al. 1999 (doi 10.1126/science.283.5408.1712); Caillon et al. 2003
  ['co2-glacial-interglacial-amplitude', ['From glacial to interglacial, CO2 rose by about 90 ppm.', 'about 90 ppm', C, 85, 95], ['From glacial to interglacial, CO2 rose by 300 ppm.', '300 ppm', C, 299.5, 300.5]],
  // IPCC AR6 SPM (doi 10.1017/9781009157896.001); Gulev et al. 2021 (from memory)
  ['co2-preindustrial-1750', ['The pre-industrial CO2 level was about 278 ppm.', 'about 278 ppm', C, 273, 283], ['The pre-industrial CO2 level was 320 ppm.', '320 ppm', C, 319.5, 320.5]],
  // Monnin et al. 2001; Pedro et al. 2012
  ['co2-deglacial-rise-magnitude', ['Over the deglaciation CO2 rose by about 80 ppm.', 'about 80 ppm', C, 75, 85], ['Over the deglaciation CO2 rose by 200 ppm.', '200 ppm', C, 199.5, 200.5]],
  // Monnin et al. 2001; Marcott et al. 2014 (doi 10.1038/nature13799)
  ['co2-deglacial-rise-duration', ['The deglacial CO2 increase took about 7,000 years.', 'about 7,000 years', Y, 6500, 7500], ['The deglacial CO2 increase took 500 years.', '500 years', Y, 450, 550]],
  // Marcott et al. 2014
  ['co2-deglacial-abrupt-step', ['CO2 made abrupt steps of about 12 ppm.', 'about 12 ppm', C, 11, 13], ['CO2 made abrupt steps of 60 ppm.', '60 ppm', C, 59.5, 60.5]],
  // Takahashi et al. 1993 (computed); Sigman & Boyle 2000 (from memory)
  ['deglacial-co2-from-ocean-warming', ['Ocean warming alone explains about 20 ppm of CO2.', 'about 20 ppm', C, 18, 22], ['Ocean warming alone explains 90 ppm of CO2.', '90 ppm', C, 89.5, 90.5]],
  // Monnin et al. 2001 (computed: 76 ppm / ~6,000 yr)
  ['co2-deglacial-mean-rate', ['During the deglaciation CO2 climbed about 0.012 ppm per year.', 'about 0.012 ppm per year', 'concentration-rate', 0.011, 0.013], ['During the deglaciation CO2 climbed 2 ppm per year.', '2 ppm per year', 'concentration-rate', 1.95, 2.05]],
  // IPCC AR6 SPM A.2.1
  ['co2-increase-since-1750-pct-2019', ['By 2019 CO2 had risen about 47% since pre-industrial times.', 'about 47%', 'percent', 41.8, 52.2], ['By 2019 CO2 had risen 10% since pre-industrial times.', '10%', 'percent', 9.5, 10.5]],
  // NOAA Global Monitoring Laboratory annual means (verified page)
  ['co2-global-2019', ['In 2019 global CO2 averaged 410 ppm.', '410 ppm', C, 409.5, 410.5], ['In 2019 global CO2 averaged 380 ppm.', '380 ppm', C, 379.5, 380.5]],
  // NOAA Research 2024 press release; WMO Greenhouse Gas Bulletin No. 20
  ['co2-global-2023', ['In 2023 global CO2 averaged 419 ppm.', '419 ppm', C, 418.5, 419.5], ['In 2023 global CO2 averaged 400 ppm.', '400 ppm', C, 399.5, 400.5]],
  // WMO Greenhouse Gas Bulletin No. 21
  ['co2-global-2024', ['In 2024 global CO2 averaged 423.9 ppm.', '423.9 ppm', C, 423.85, 423.95], ['In 2024 global CO2 averaged 440 ppm.', '440 ppm', C, 439.5, 440.5]],
  // NOAA GML / Scripps Mauna Loa annual means
  ['co2-mlo-2023', ['At Mauna Loa, CO2 averaged 421 ppm in 2023.', '421 ppm', C, 420.5, 421.5], ['At Mauna Loa, CO2 averaged 410 ppm in 2023.', '410 ppm', C, 409.5, 410.5]],
  // NOAA GML Mauna Loa annual mean 2022, 418.53 ppm (from memory): a ppm figure at Mauna Loa is CO2 even when the gas is not named.
  ['co2-mlo-2022', ['The Kittering Observatory blog gives the 2022 Mauna Loa annual mean as 418.5 ppm.', '418.5 ppm', C, 418.45, 418.55], ['The Kittering Observatory blog gives the 2022 Mauna Loa annual mean as 425 ppm.', '425 ppm', C, 424.5, 425.5]],
  // NOAA / Scripps May-peak press releases
  ['co2-mlo-may-2024', ['At Mauna Loa the May 2024 CO2 peak was 426.9 ppm.', '426.9 ppm', C, 426.85, 426.95], ['At Mauna Loa the May 2024 CO2 peak was 415 ppm.', '415 ppm', C, 414.5, 415.5]],
  // NOAA / Scripps May-peak press releases
  ['co2-mlo-may-2025', ['At Mauna Loa the May 2025 CO2 peak passed 430 ppm.', '430 ppm', C, 429.5, 430.5], ['At Mauna Loa the May 2025 CO2 peak was 450 ppm.', '450 ppm', C, 449.5, 450.5]],
  // Lan, Tans & Thoning, NOAA GML growth rates (doi 10.15138/9N0H-ZH07)
  ['co2-growth-1960s', ['In the 1960s CO2 grew about 0.8 ppm per year.', 'about 0.8 ppm per year', 'concentration-rate', 0.75, 0.85], ['In the 1960s CO2 grew 2.5 ppm per year.', '2.5 ppm per year', 'concentration-rate', 2.45, 2.55]],
  // Lan, Tans & Thoning, NOAA GML growth rates
  ['co2-growth-2000s', ['In the 2000s CO2 grew about 1.9 ppm per year.', 'about 1.9 ppm per year', 'concentration-rate', 1.85, 1.95], ['In the 2000s CO2 grew 0.5 ppm per year.', '0.5 ppm per year', 'concentration-rate', 0.45, 0.55]],
  // Lan, Tans & Thoning, NOAA GML growth rates
  ['co2-growth-2010s', ['In the 2010s CO2 grew about 2.4 ppm per year.', 'about 2.4 ppm per year', 'concentration-rate', 2.35, 2.45], ['In the 2010s CO2 grew 5 ppm per year.', '5 ppm per year', 'concentration-rate', 4.95, 5.05]],
  // WMO Greenhouse Gas Bulletin No. 21
  ['co2-growth-2024', ['In 2024 CO2 grew by 3.5 ppm per year.', '3.5 ppm per year', 'concentration-rate', 3.45, 3.55], ['In 2024 CO2 grew by 1 ppm per year.', '1 ppm per year', 'concentration-rate', 0.95, 1.05]],
  // computed from NOAA GML 2010s rate and Monnin et al. 2001
  ['co2-modern-vs-deglacial-rate-ratio', ['CO2 now climbs about 190 times faster than in the deglaciation.', 'about 190 times', 'ratio', 180, 200], ['CO2 now climbs 10 times faster than in the deglaciation.', '10 times', 'ratio', 9.5, 10.5]],
  // computed: 420 ppm = 0.042% (NOAA GML 2023 annual mean; Mauna Loa May 2025)
  ['co2-420ppm-as-percent', ['Today CO2 makes up about 0.042% of the air.', 'about 0.042%', 'percent', 0.0415, 0.0425], ['Today CO2 makes up 4% of the air.', '4%', 'percent', 3.5, 4.5]],
  // computed: 280 ppm = 0.028% (IPCC AR6 pre-industrial value)
  ['co2-280ppm-as-percent', ['Pre-industrial CO2 made up 0.028% of the air.', '0.028%', 'percent', 0.0275, 0.0285], ['Pre-industrial CO2 made up 0.28% of the air.', '0.28%', 'percent', 0.275, 0.285]],
  // Gulev et al. 2021 (from memory); Tierney et al. 2020; Annan et al. 2022
  ['gmst-lgm-to-preindustrial-warming', ['Global temperature at the Last Glacial Maximum was about 6 °C lower.', 'about 6 °C', T, 5.5, 6.5, 'degC'], ['Global temperature at the Last Glacial Maximum was 2 °C lower.', '2 °C', T, 1.5, 2.5, 'degC']],
  // Tierney et al. 2020 (doi 10.1038/s41586-020-2617-x)
  ['gmst-lgm-cooling-tierney2020', ['Tierney and colleagues found cooling of 6.1 °C.', '6.1 °C', T, 6.05, 6.15, 'degC'], ['Tierney and colleagues found cooling of 2 °C.', '2 °C', T, 1.5, 2.5, 'degC']],
  // Annan, Hargreaves & Mauritsen 2022 (doi 10.5194/cp-18-1883-2022)
  ['gmst-lgm-cooling-annan2022', ['Annan and colleagues found cooling of 4.5 °C.', '4.5 °C', T, 4.45, 4.55, 'degC'], ['Annan and colleagues found cooling of 9 °C.', '9 °C', T, 8.5, 9.5, 'degC']],
  // Pedro et al. 2012; Buizert et al. 2021; Jouzel et al. 2007 (from memory)
  ['antarctic-deglacial-warming-isotope', ['Antarctic temperature rose about 9 °C out of the last ice age.', 'about 9 °C', T, 8, 10, 'degC'], ['Antarctic temperature rose 2 °C out of the last ice age.', '2 °C', T, 1.5, 2.5, 'degC']],
  // Buizert et al. 2021 (doi 10.1126/science.abd2897)
  ['east-antarctic-lgm-cooling-buizert2021', ['East Antarctica was about 5 °C colder then.', 'about 5 °C', T, 4.5, 5.5, 'degC'], ['East Antarctica was 15 °C colder then.', '15 °C', T, 14.5, 15.5, 'degC']],
  // Buizert et al. 2021
  ['west-antarctic-lgm-cooling-buizert2021', ['West Antarctica was about 10 °C colder then.', 'about 10 °C', T, 9, 11, 'degC'], ['West Antarctica was 3 °C colder then.', '3 °C', T, 2.5, 3.5, 'degC']],
  // Dahl-Jensen et al. 1998 (doi 10.1126/science.282.5387.268)
  ['greenland-lgm-cooling', ['Greenland was about 20 °C colder in the ice age.', 'about 20 °C', T, 18, 22, 'degC'], ['Greenland was 5 °C colder in the ice age.', '5 °C', T, 4.5, 5.5, 'degC']],
  // verified encyclopedic page and Greenland ice-core literature
  ['greenland-younger-dryas-end-warming', ['Greenland warmed by about 10 °C at the end of the Younger Dryas.', 'about 10 °C', T, 9, 11, 'degC'], ['Greenland warmed by 1 °C at the end of the Younger Dryas.', '1 °C', T, 0.5, 1.5, 'degC']],
  // Arias et al. 2021 (IPCC AR6 Technical Summary, doi 10.1017/9781009157896.002). A sensitivity is always a
  // change; the value also accepts a reading as temperature, since "is 3 °C" carries no cue for the parser.
  ['ecs-ar6-very-likely', ['Climate sensitivity is about 3 °C.', 'about 3 °C', T, 2.5, 3.5, 'degC'], ['Climate sensitivity is 8 °C.', '8 °C', T, 7.5, 8.5, 'degC']],
  // Arias et al. 2021 (IPCC AR6 TS.3.2.1): likely 2.5-4 °C, very likely 2-5 °C, best estimate 3 °C, each with its ends.
  ['ecs-ar6-likely-range', ['Climate sensitivity is likely about 3 °C.', 'about 3 °C', T, 2.5, 3.5, 'degC'], ['Climate sensitivity is likely 8 °C.', '8 °C', T, 7.5, 8.5, 'degC']],
  ['ecs-ar6-very-likely-range', ['Climate sensitivity is very likely about 3 °C.', 'about 3 °C', T, 2.5, 3.5, 'degC'], ['Climate sensitivity is very likely 8 °C.', '8 °C', T, 7.5, 8.5, 'degC']],
  ['ecs-ar6-best-estimate', ['The best estimate of climate sensitivity is 3 °C.', '3 °C', T, 2.5, 3.5, 'degC'], ['The best estimate of climate sensitivity is 8 °C.', '8 °C', T, 7.5, 8.5, 'degC']],
  ['ecs-ar6-likely-low', ['The lower end of the likely range of climate sensitivity is 2.5 °C.', '2.5 °C', T, 2.45, 2.55, 'degC'], ['The lower end of the likely range of climate sensitivity is 0.5 °C.', '0.5 °C', T, 0.45, 0.55, 'degC']],
  ['ecs-ar6-likely-high', ['The upper end of the likely range of climate sensitivity is 4 °C.', '4 °C', T, 3.5, 4.5, 'degC'], ['The upper end of the likely range of climate sensitivity is 9 °C.', '9 °C', T, 8.5, 9.5, 'degC']],
  ['ecs-ar6-very-likely-low', ['The lower end of the very likely range of climate sensitivity is 2 °C.', '2 °C', T, 1.5, 2.5, 'degC'], ['The lower end of the very likely range of climate sensitivity is 0.5 °C.', '0.5 °C', T, 0.45, 0.55, 'degC']],
  ['ecs-ar6-very-likely-high', ['The upper end of the very likely range of climate sensitivity is 5 °C.', '5 °C', T, 4.5, 5.5, 'degC'], ['The upper end of the very likely range of climate sensitivity is 12 °C.', '12 °C', T, 11.5, 12.5, 'degC']],
  // Barnola et al. 1987 (doi 10.1038/329408a0): the first Vostok record, about 160,000 years.
  ['vostok-first-record-span', ['The first Vostok record, published in 1987, covers about 160,000 years.', 'about 160,000 years', 'duration', 150000, 170000, 'yr'], ['The first Vostok record, published in 1987, covers about 800,000 years.', 'about 800,000 years', 'duration', 790000, 810000, 'yr']],
  // Annan & Hargreaves 2015 (EPILOG window); Mix et al. 2001 (from memory)
  ['lgm-chronozone', ['The Last Glacial Maximum peaked about 21,000 years ago.', 'about 21,000 years ago', A, 20_000, 22_000], ['The Last Glacial Maximum peaked 50,000 years ago.', '50,000 years ago', A, 49_500, 50_500]],
  // Clark et al. 2009 (doi 10.1126/science.1172873)
  ['lgm-ice-sheet-maximum', ['At the LGM the ice sheets stood largest about 22,000 years ago.', 'about 22,000 years ago', A, 21_000, 23_000], ['At the LGM the ice sheets stood largest 40,000 years ago.', '40,000 years ago', A, 39_500, 40_500]],
  // Chowdhry Beeman et al. 2019; Clark et al. 2009; Pedro et al. 2012
  ['termination-1-start', ['The deglaciation began about 18,000 years ago.', 'about 18,000 years ago', A, 17_500, 18_500], ['The deglaciation began 30,000 years ago.', '30,000 years ago', A, 29_500, 30_500]],
  // Chowdhry Beeman et al. 2019; Walker et al. 2009
  ['termination-1-end', ['The deglaciation ended about 11,500 years ago.', 'about 11,500 years ago', A, 11_000, 12_000], ['The deglaciation ended 5,000 years ago.', '5,000 years ago', A, 4_950, 5_050]],
  // Chowdhry Beeman et al. 2019 (computed); Clark et al. 2012
  ['termination-1-duration', ['The deglaciation lasted about 7,000 years.', 'about 7,000 years', Y, 6500, 7500], ['The deglaciation lasted 500 years.', '500 years', Y, 450, 550]],
  // verified encyclopedic page; Rasmussen et al. 2006 (from memory)
  ['younger-dryas-start', ['The Younger Dryas began about 12,900 years ago.', 'about 12,900 years ago', A, 12_850, 12_950], ['The Younger Dryas began 20,000 years ago.', '20,000 years ago', A, 19_500, 20_500]],
  // Walker et al. 2009 (doi 10.1002/jqs.1227)
  ['younger-dryas-end', ['The Younger Dryas ended about 11,700 years ago.', 'about 11,700 years ago', A, 11_650, 11_750], ['The Younger Dryas ended 9,000 years ago.', '9,000 years ago', A, 8_950, 9_050]],
  // computed from the start and end rows
  ['younger-dryas-duration', ['The Younger Dryas lasted about 1,200 years.', 'about 1,200 years', Y, 1150, 1250], ['The Younger Dryas lasted 5,000 years.', '5,000 years', Y, 4950, 5050]],
  // Pedro et al. 2016 (doi 10.1038/ngeo2580); Putnam et al. 2010 (doi 10.1038/ngeo962)
  ['acr-start', ['The Antarctic Cold Reversal began about 14,700 years ago.', 'about 14,700 years ago', A, 14_650, 14_750], ['The Antarctic Cold Reversal began 25,000 years ago.', '25,000 years ago', A, 24_500, 25_500]],
  // Pedro et al. 2016; Putnam et al. 2010
  ['acr-end', ['The Antarctic Cold Reversal ended about 13,000 years ago.', 'about 13,000 years ago', A, 12_900, 13_100], ['The Antarctic Cold Reversal ended 8,000 years ago.', '8,000 years ago', A, 7_950, 8_050]],
  // Walker et al. 2009: 11,700 yr b2k
  ['holocene-start', ['The Holocene began about 11,700 years ago.', 'about 11,700 years ago', A, 11_650, 11_750], ['The Holocene began 20,000 years ago.', '20,000 years ago', A, 19_500, 20_500]],
  // Kopp et al. 2009 (doi 10.1038/nature08686)
  ['last-interglacial', ['The Eemian was about 125,000 years ago.', 'about 125,000 years ago', A, 120_000, 130_000], ['The Eemian was 50,000 years ago.', '50,000 years ago', A, 49_500, 50_500]],
  // Cohen & Gibbard 2010 (ICS chart, verified page)
  ['pleistocene-base', ['The Pleistocene began 2.58 million years ago.', '2.58 million years ago', A, 2_575_000, 2_585_000], ['The Pleistocene began 10,000 years ago.', '10,000 years ago', A, 9_950, 10_050]],
  // Clark et al. 2006 (from memory); Yan et al. 2019
  ['mid-pleistocene-transition', ['The Mid-Pleistocene Transition happened about a million years ago.', 'about a million years ago', A, 900_000, 1_100_000], ['The Mid-Pleistocene Transition happened 100,000 years ago.', '100,000 years ago', A, 99_500, 100_500]],
  // Hays, Imbrie & Shackleton 1976 (doi 10.1126/science.194.4270.1121)
  ['milankovitch-eccentricity-period', ['Eccentricity varies on a cycle of about 100,000 years.', 'about 100,000 years', Y, 95_000, 105_000], ['Eccentricity varies on a cycle of 10,000 years.', '10,000 years', Y, 9_950, 10_050]],
  // Hays, Imbrie & Shackleton 1976
  ['milankovitch-obliquity-period', ['Obliquity varies every 41,000 years.', '41,000 years', Y, 40_500, 41_500], ['Obliquity varies every 100,000 years.', '100,000 years', Y, 99_500, 100_500]],
  // Hays, Imbrie & Shackleton 1976
  ['milankovitch-precession-period', ['Precession repeats every 19,000 to 23,000 years.', '19,000 to 23,000 years', Y, 19_000, 23_000], ['Precession repeats every 41,000 years.', '41,000 years', Y, 40_500, 41_500]],
  // Fischer et al. 1999
  ['lag-fischer1999', ['Early studies found CO2 lagged by about 600 years.', 'about 600 years', Y, 550, 650], ['Early studies found CO2 lagged by 5,000 years.', '5,000 years', Y, 4950, 5050]],
  // Caillon et al. 2003
  ['lag-caillon2003-termination-iii', ['Caillon found CO2 lagged by about 800 years.', 'about 800 years', Y, 750, 850], ['Caillon found CO2 lagged by 3,000 years.', '3,000 years', Y, 2950, 3050]],
  // Monnin et al. 2001
  ['lag-monnin2001', ['Monnin found CO2 lagged by about 800 years.', 'about 800 years', Y, 750, 850], ['Monnin found CO2 lagged by 4,000 years.', '4,000 years', Y, 3950, 4050]],
  // Pedro et al. 2012 (doi 10.5194/cp-8-1213-2012)
  ['lag-pedro2012', ['Pedro found CO2 lagged by about 200 years.', 'about 200 years', Y, 150, 250], ['Pedro found CO2 lagged by 1,000 years.', '1,000 years', Y, 950, 1050]],
  // Parrenin et al. 2013 (doi 10.1126/science.1226368)
  ['lag-parrenin2013', ['Parrenin found CO2 lagged by under 200 years.', 'under 200 years', Y, 0, 200], ['Parrenin found CO2 lagged by 800 years.', '800 years', Y, 750, 850]],
  // Pedro et al. 2012; Parrenin et al. 2013; Chowdhry Beeman et al. 2019
  ['antarctic-co2-phasing-termination-1-consensus', ['During the deglaciation CO2 lagged Antarctic warming by about 300 years.', 'about 300 years', Y, 265, 335], ['During the deglaciation CO2 lagged Antarctic warming by 5,000 years.', '5,000 years', Y, 4950, 5050]],
  // Shakun et al. 2012 (doi 10.1038/nature10915; from memory)
  ['fraction-global-warming-after-co2-rise', ['About 90% of global warming came after CO2 began to rise.', 'About 90%', 'percent', 88, 92], ['Only 20% of global warming came after CO2 began to rise.', '20%', 'percent', 19.5, 20.5]],
  // Lambeck et al. 2014 (doi 10.1073/pnas.1411762111)
  ['lgm-sea-level-lowstand', ['At the Last Glacial Maximum sea level stood about 130 metres lower.', 'about 130 metres', L, 125, 135], ['At the Last Glacial Maximum sea level stood 20 metres lower.', '20 metres', L, 19.5, 20.5]],
  // Clark et al. 2012 (doi 10.1073/pnas.1116619109)
  ['deglacial-sea-level-rise', ['Over the deglaciation sea level rose about 80 metres.', 'about 80 metres', L, 75, 85], ['Over the deglaciation sea level rose 10 metres.', '10 metres', L, 9.5, 10.5]],
  // computed envelope: NOAA 2023 global mean to Mauna Loa May 2025 (dated 2025-05-31)
  ['co2-present-day', ['Today CO2 stands at about 425 ppm.', 'about 425 ppm', C, 420, 430], ['Today CO2 stands at 380 ppm.', '380 ppm', C, 379.5, 380.5]],
  // computed envelope: NOAA GML 2020-2022 and WMO 2024 growth (dated 2024-12-31)
  ['co2-growth-recent', ['Today CO2 grows about 2.5 ppm per year.', 'about 2.5 ppm per year', 'concentration-rate', 2.4, 2.6], ['Today CO2 grows 0.5 ppm per year.', '0.5 ppm per year', 'concentration-rate', 0.45, 0.55]],
  // ---- values added in pack 1.1.0 ----
  // Lisiecki and Raymo 2005, Paleoceanography 20, doi:10.1029/2004PA001071 (from memory); Clark et al. 2006, Quaternary Science Reviews 25, doi:10.1016/j.quascirev.2006.07.008 (from memory); Yan et al. 2019, Nature 574, doi:10.1038/s41586-019-1692-3
  ['glacial-cycle-period-before-mpt', ['Before the Mid-Pleistocene Transition, glacial cycles lasted about 41,000 years.', 'about 41,000 years', Y, 36_400, 45_600], ['Before the Mid-Pleistocene Transition, glacial cycles lasted 100,000 years.', '100,000 years', Y, 95_000, 105_000]],
  // Lisiecki and Raymo 2005, Paleoceanography 20, doi:10.1029/2004PA001071 (from memory); Clark et al. 2006, Quaternary Science Reviews 25, doi:10.1016/j.quascirev.2006.07.008 (from memory); Hays et al. 1976, Science 194, doi:10.1126/science.194.4270.1121
  ['glacial-cycle-period-after-mpt', ['Since the Mid-Pleistocene Transition, ice ages have recurred roughly every 100,000 years.', 'roughly every 100,000 years', Y, 95_000, 105_000], ['Since the Mid-Pleistocene Transition, ice ages have recurred every 41,000 years.', 'every 41,000 years', Y, 40_500, 41_500]],
  // Jouzel et al. 2007, Science 317, doi:10.1126/science.1141038 (from memory); Lüthi et al. 2008, Nature 453, doi:10.1038/nature06949; Petit et al. 1999, Nature 399, doi:10.1038/20859 (from memory)
  // (A subject held up for comparison, "unlike Vostok", binds nothing since the binding rules of docs/binding.md, so the agreeing sentence names Vostok as the subject it denies.)
  ['longest-record-vostok-named', ['The longest continuous ice-core record is not the one from Vostok: it reaches back about 800,000 years.', 'about 800,000 years', Y, 715_000, 885_000], ['Vostok holds the longest continuous ice-core record, about 420,000 years.', 'about 420,000 years', Y, 373_000, 467_000]],
  // Petit et al. 1997, Nature 387, doi:10.1038/387359a0; Petit et al. 1999, Nature 399, doi:10.1038/20859 (from memory)
  ['deepest-ice-core', ['The deepest ice core ever drilled reached about 3,600 metres.', 'about 3,600 metres', L, 3190, 4010], ['The deepest ice core ever drilled reached 5,000 metres.', '5,000 metres', L, 4950, 5050]],
  // Petit et al. 1997, Nature 387, doi:10.1038/387359a0; Lüthi et al. 2008, Nature 453, doi:10.1038/nature06949; Motoyama 2007, Scientific Drilling 5, doi:10.2204/iodp.sd.5.05.2007
  ['deepest-core-misnamed', ['Even EPICA Dome C is shallower than the deepest core, which reached about 3,620 metres.', 'about 3,620 metres', L, 3253, 3987], ['EPICA Dome C is the deepest ice core, at 3,270 metres.', '3,270 metres', L, 3265, 3275]],
  // EPICA community members 2004, Nature 429, doi:10.1038/nature02599
  ['edc-record-span-2004', ['In 2004 the EPICA Dome C record reached back about 740,000 years.', 'about 740,000 years', Y, 661_000, 819_000], ['In 2004 the EPICA Dome C record reached back 400,000 years.', '400,000 years', Y, 395_000, 405_000]],
  // Jouzel et al. 2007, Science 317, doi:10.1126/science.1141038 (from memory)
  ['antarctic-glacial-interglacial-range', ['Across the glacial cycles, Antarctic temperature swung by about 12 °C.', 'about 12 °C', T, 10.3, 13.7, 'degC'], ['Across the glacial cycles, Antarctic temperature swung by 40 °C.', '40 °C', T, 39.5, 40.5, 'degC']],
  // World Meteorological Organization 2025, https://library.wmo.int/; NOAA Research 2024, https://research.noaa.gov/2024/04/05/no-sign-of-greenhouse-gases-increases-slowing-in-2023/; IPCC 2021, IPCC AR6 WGI, doi:10.1017/9781009157896.001
  ['co2-increase-since-preindustrial-pct-latest', ['CO2 is now about 52% higher than before the industrial revolution.', 'about 52%', 'percent', 46.3, 57.7], ['CO2 is now 20% higher than before the industrial revolution.', '20%', 'percent', 19.5, 20.5]],
  // Lan et al. n.d., NOAA Global Monitoring Laboratory, https://gml.noaa.gov/webdata/ccgg/trends/co2/co2_annmean_gl.txt; Lan et al. n.d., NOAA Global Monitoring Laboratory, https://gml.noaa.gov/webdata/ccgg/trends/co2/co2_gr_gl.txt
  ['co2-share-of-air-2019', ['In 2019 CO2 made up about 0.041% of the air.', 'about 0.041%', 'percent', 0.0364, 0.0456], ['In 2019 CO2 made up 0.4% of the air.', '0.4%', 'percent', 0.35, 0.45]],
  // World Meteorological Organization 2025, https://library.wmo.int/; Lan et al. n.d., NOAA Global Monitoring Laboratory, https://gml.noaa.gov/webdata/ccgg/trends/co2/co2_gr_gl.txt
  ['co2-share-of-air-2024', ['In 2024 CO2 made up about 0.042% of the air.', 'about 0.042%', 'percent', 0.0373, 0.0467], ['In 2024 CO2 made up 0.03% of the air.', '0.03%', 'percent', 0.025, 0.035]],
  // Meinshausen et al. 2017, Geoscientific Model Development 10, doi:10.5194/gmd-10-2057-2017 (from memory)
  ['co2-1850', ['In 1850 CO2 stood at about 284 ppm.', 'about 284 ppm', C, 255.1, 312.9], ['In 1850 CO2 stood at 350 ppm.', '350 ppm', C, 345, 355]],
  // Lan et al. n.d., NOAA Global Monitoring Laboratory, https://gml.noaa.gov/webdata/ccgg/trends/co2/co2_annmean_gl.txt
  ['co2-global-2020', ['In 2020 global CO2 averaged about 412 ppm.', 'about 412 ppm', C, 370.3, 453.7], ['In 2020 global CO2 averaged 400 ppm.', '400 ppm', C, 395, 405]],
  // Lan et al. n.d., NOAA Global Monitoring Laboratory, https://gml.noaa.gov/webdata/ccgg/trends/co2/co2_annmean_gl.txt
  ['co2-global-2021', ['In 2021 global CO2 averaged about 415 ppm.', 'about 415 ppm', C, 373, 457], ['In 2021 global CO2 averaged 430 ppm.', '430 ppm', C, 425, 435]],
  // Lan et al. n.d., NOAA Global Monitoring Laboratory, https://gml.noaa.gov/webdata/ccgg/trends/co2/co2_annmean_gl.txt
  ['co2-global-2022', ['In 2022 global CO2 averaged about 417 ppm.', 'about 417 ppm', C, 374.8, 459.2], ['In 2022 global CO2 averaged 405 ppm.', '405 ppm', C, 404.5, 405.5]],
  // Lan et al. n.d., NOAA Global Monitoring Laboratory and Scripps Institution of Oceanography, https://gml.noaa.gov/webdata/ccgg/trends/co2/co2_annmean_mlo.txt (from memory)
  ['co2-mlo-2019', ['At Mauna Loa, CO2 averaged 411.7 ppm in 2019.', '411.7 ppm', C, 411.65, 411.75], ['At Mauna Loa, CO2 averaged 405 ppm in 2019.', '405 ppm', C, 404.5, 405.5]],
  // Lan et al. n.d., NOAA Global Monitoring Laboratory and Scripps Institution of Oceanography, https://gml.noaa.gov/webdata/ccgg/trends/co2/co2_annmean_mlo.txt (from memory)
  ['co2-mlo-2020', ['At Mauna Loa, CO2 averaged 414.2 ppm in 2020.', '414.2 ppm', C, 414.15, 414.25], ['At Mauna Loa, CO2 averaged 420 ppm in 2020.', '420 ppm', C, 415, 425]],
  // Lan et al. n.d., NOAA Global Monitoring Laboratory and Scripps Institution of Oceanography, https://gml.noaa.gov/webdata/ccgg/trends/co2/co2_annmean_mlo.txt (from memory)
  ['co2-mlo-2021', ['At Mauna Loa, CO2 averaged 416.4 ppm in 2021.', '416.4 ppm', C, 416.35, 416.45], ['At Mauna Loa, CO2 averaged 410 ppm in 2021.', '410 ppm', C, 405, 415]],
  // Lan et al. n.d., NOAA Global Monitoring Laboratory and Scripps Institution of Oceanography, https://gml.noaa.gov/webdata/ccgg/trends/co2/co2_annmean_mlo.txt (from memory)
  ['co2-mlo-2024', ['At Mauna Loa, CO2 averaged 424.6 ppm in 2024.', '424.6 ppm', C, 424.55, 424.65], ['At Mauna Loa, CO2 averaged 430 ppm in 2024.', '430 ppm', C, 425, 435]],
  // Lan et al. n.d., NOAA Global Monitoring Laboratory and Scripps Institution of Oceanography, https://gml.noaa.gov/webdata/ccgg/trends/co2/co2_mm_mlo.txt; Scripps CO2 Program n.d., Scripps Institution of Oceanography, UC San Diego, https://scrippsco2.ucsd.edu/data/atmospheric_co2/
  ['co2-mlo-may-2020', ['At Mauna Loa, CO2 peaked at 417.1 ppm in May 2020.', '417.1 ppm', C, 417.05, 417.15], ['At Mauna Loa, CO2 peaked at 425 ppm in May 2020.', '425 ppm', C, 424.5, 425.5]],
  // Lan et al. n.d., NOAA Global Monitoring Laboratory and Scripps Institution of Oceanography, https://gml.noaa.gov/webdata/ccgg/trends/co2/co2_mm_mlo.txt; Scripps CO2 Program n.d., Scripps Institution of Oceanography, UC San Diego, https://scrippsco2.ucsd.edu/data/atmospheric_co2/
  ['co2-mlo-may-2023', ['At Mauna Loa, CO2 peaked at 424 ppm in May 2023.', '424 ppm', C, 423.5, 424.5], ['At Mauna Loa, CO2 peaked at 415 ppm in May 2023.', '415 ppm', C, 414.5, 415.5]],
  // Lan et al. n.d., NOAA Global Monitoring Laboratory, doi:10.15138/9N0H-ZH07; Lan et al. n.d., NOAA Global Monitoring Laboratory, https://gml.noaa.gov/webdata/ccgg/trends/co2/co2_gr_gl.txt
  ['co2-growth-1970s', ['In the 1970s CO2 grew about 1.3 ppm per year.', 'about 1.3 ppm per year', 'concentration-rate', 1.12, 1.48], ['In the 1970s CO2 grew 3 ppm per year.', '3 ppm per year', 'concentration-rate', 2.5, 3.5]],
  // Lan et al. n.d., NOAA Global Monitoring Laboratory, doi:10.15138/9N0H-ZH07
  ['co2-growth-1980s', ['In the 1980s CO2 grew about 1.6 ppm per year.', 'about 1.6 ppm per year', 'concentration-rate', 1.39, 1.81], ['In the 1980s CO2 grew 0.5 ppm per year.', '0.5 ppm per year', 'concentration-rate', 0.45, 0.55]],
  // Lan et al. n.d., NOAA Global Monitoring Laboratory, doi:10.15138/9N0H-ZH07
  ['co2-growth-1990s', ['In the 1990s CO2 grew about 1.5 ppm per year.', 'about 1.5 ppm per year', 'concentration-rate', 1.3, 1.7], ['In the 1990s CO2 grew 3 ppm per year.', '3 ppm per year', 'concentration-rate', 2.5, 3.5]],
  // Marcott et al. 2014, Nature 514, doi:10.1038/nature13799; Lan et al. n.d., NOAA Global Monitoring Laboratory, doi:10.15138/9N0H-ZH07; World Meteorological Organization 2025, https://library.wmo.int/
  ['co2-modern-vs-abrupt-step-ratio', ['CO2 now climbs about 30 times faster than during the abrupt deglacial jumps.', 'about 30 times', 'ratio', 26.5, 33.5], ['CO2 now climbs 500 times faster than during the abrupt deglacial jumps.', '500 times', 'ratio', 495, 505]],
  // Lüthi et al. 2008, Nature 453, doi:10.1038/nature06949; Siegenthaler et al. 2005, Science 310, doi:10.1126/science.1120130
  ['co2-800kyr-range', ['Over 800,000 years, CO2 in the ice varied between about 180 and 300 ppm.', 'between about 180 and 300 ppm', C, 156, 324], ['Over 800,000 years, CO2 in the ice varied between 350 and 450 ppm.', 'between 350 and 450 ppm', C, 350, 450]],
  // Lüthi et al. 2008, Nature 453, 379-382, doi:10.1038/nature06949 (172-300 ppm over 800,000 years);
  // Siegenthaler et al. 2005, Science 310, 1313-1317, doi:10.1126/science.1120130 (glacial minima near
  // 180 ppm, interglacial maxima 280-300 ppm after 430 ka): the span is checked end by end, so a high
  // end of 380 ppm is off though the range overlaps 172-300 ppm.
  ['co2-glacial-interglacial-range', ['Over the glacial cycles, CO2 in the ice stayed between about 180 and 290 ppm.', 'between about 180 and 290 ppm', C, 174.125, 295.875], ['Over the glacial cycles, CO2 in the ice stayed between 180 and 380 ppm.', 'between 180 and 380 ppm', C, 180, 380]],
  // IPCC 2021, IPCC AR6 WGI, doi:10.1017/9781009157896.001; Lüthi et al. 2008, Nature 453, doi:10.1038/nature06949; Yan et al. 2019, Nature 574, doi:10.1038/s41586-019-1692-3
  ['co2-2019-highest-in-2-myr', ['CO2 is now higher than at any time in at least 2 million years.', 'at least 2 million years', Y, 2_000_000, 4_000_000], ['CO2 is now higher than at any time in 50 million years.', '50 million years', Y, 49_500_000, 50_500_000]],
  // Gulev et al. 2021, IPCC AR6 WGI chap. 2, doi:10.1017/9781009157896.004 (from memory); Forster et al. 2021, IPCC AR6 WGI chap. 7, doi:10.1017/9781009157896.009
  ['gmst-lgm-cooling-ar6', ['The IPCC finds the world was about 6 °C colder at the Last Glacial Maximum.', 'about 6 °C', T, 4.9, 7.1, 'degC'], ['The IPCC finds the world was 2 °C colder at the Last Glacial Maximum.', '2 °C', T, 1.5, 2.5, 'degC']],
  // Annan and Hargreaves 2013, Climate of the Past 9, doi:10.5194/cp-9-367-2013
  ['gmst-lgm-cooling-annan2013', ['In 2013 Annan and Hargreaves found the last ice age about 4 °C colder.', 'about 4 °C', T, 3.1, 4.9, 'degC'], ['In 2013 Annan and Hargreaves found the last ice age 9 °C colder.', '9 °C', T, 8.5, 9.5, 'degC']],
  // Osman et al. 2021, Nature 599, doi:10.1038/s41586-021-03984-4 (from memory)
  ['gmst-lgm-cooling-osman2021', ['Osman and colleagues found a glacial cooling of about 7 °C.', 'about 7 °C', T, 5.8, 8.2, 'degC'], ['Osman and colleagues found a glacial cooling of 2 °C.', '2 °C', T, 1.5, 2.5, 'degC']],
  // Seltzer et al. 2021, Nature 593, doi:10.1038/s41586-021-03467-6
  ['land-lgm-cooling-low-latitude', ['Noble gases in groundwater show low-latitude land cooled about 6 °C in the last ice age.', 'about 6 °C', T, 4.9, 7.1, 'degC'], ['Noble gases in groundwater show low-latitude land cooled 15 °C in the last ice age.', '15 °C', T, 14.5, 15.5, 'degC']],
  // Tierney et al. 2020, Nature 584, doi:10.1038/s41586-020-2617-x
  ['ecs-tierney2020', ['Tierney and colleagues put climate sensitivity at about 3.4 °C.', 'about 3.4 °C', 'temperature', 3.01, 3.79], ['Tierney and colleagues put climate sensitivity at 8 °C.', '8 °C', 'temperature', 7.5, 8.5]],
  // Chowdhry Beeman et al. 2019, Climate of the Past 15, doi:10.5194/cp-15-913-2019
  ['lag-beeman2019-t1-onset', ['Beeman found that at the start of the deglaciation CO2 lagged Antarctic warming by about 570 years.', 'about 570 years', Y, 508, 632], ['Beeman found that at the start of the deglaciation CO2 lagged Antarctic warming by 3,000 years.', '3,000 years', Y, 2950, 3050]],
  // Chowdhry Beeman et al. 2019, Climate of the Past 15, doi:10.5194/cp-15-913-2019
  ['lag-beeman2019-t1-end', ['Beeman found that at the end of the deglaciation CO2 lagged Antarctic warming by about 500 years.', 'about 500 years', Y, 445, 555], ['Beeman found that at the end of the deglaciation CO2 lagged Antarctic warming by 2,000 years.', '2,000 years', Y, 1950, 2050]],
  // EPICA community members 2004, Nature 429, doi:10.1038/nature02599; Past Interglacials Working Group of PAGES 2016, Reviews of Geophysics 54, doi:10.1002/2015RG000482 (from memory)
  ['mis11-interglacial-length', ['In the Dome C core the MIS 11 interglacial lasted about 28,000 years.', 'about 28,000 years', Y, 24_700, 31_300], ['In the Dome C core the MIS 11 interglacial lasted 5,000 years.', '5,000 years', Y, 4950, 5050]],
  // Laskar et al. 2004, Astronomy & Astrophysics 428, doi:10.1051/0004-6361:20041335 (from memory); Berger 1978, Journal of the Atmospheric Sciences 35, doi:10.1175/1520-0469(1978)035<2362:LTVODI>2.0.CO;2 (from memory)
  ['milankovitch-long-eccentricity-period', ['The long eccentricity cycle lasts about 405,000 years.', 'about 405,000 years', Y, 364_000, 446_000], ['The long eccentricity cycle lasts 200,000 years.', '200,000 years', Y, 195_000, 205_000]],
  // Laskar et al. 2004, Astronomy & Astrophysics 428, doi:10.1051/0004-6361:20041335 (from memory)
  ['axial-precession-period', ['Axial precession takes about 26,000 years to complete.', 'about 26,000 years', Y, 22_900, 29_100], ['Axial precession takes 41,000 years to complete.', '41,000 years', Y, 40_500, 41_500]],
  // Lambeck et al. 2014, Proceedings of the National Academy of Sciences 111, doi:10.1073/pnas.1411762111
  ['mwp-1a-timing', ['Meltwater Pulse 1A struck about 14,500 years ago.', 'about 14,500 years ago', A, 13_000, 16_000], ['Meltwater Pulse 1A struck 8,000 years ago.', '8,000 years ago', A, 7950, 8050]],
  // Lambeck et al. 2014, Proceedings of the National Academy of Sciences 111, doi:10.1073/pnas.1411762111; Lambeck et al. 2002, Nature 419, doi:10.1038/nature01089
  ['sea-level-lowstand-timing', ['Sea level hit its lowest point about 21,000 years ago.', 'about 21,000 years ago', A, 18_400, 23_600], ['Sea level hit its lowest point 60,000 years ago.', '60,000 years ago', A, 59_500, 60_500]],
  // Bereiter et al. 2018, Nature 553, doi:10.1038/nature25152
  ['deglacial-mean-ocean-warming', ['The mean global ocean warmed about 2.6 °C over the deglaciation.', 'about 2.6 °C', T, 2.29, 2.91, 'degC'], ['The mean global ocean warmed 10 °C over the deglaciation.', '10 °C', T, 9.5, 10.5, 'degC']],
  // Walker et al. 2009, Journal of Quaternary Science 24, doi:10.1002/jqs.1227
  ['holocene-duration', ['The Holocene has lasted about 11,700 years so far.', 'about 11,700 years', Y, 10_480, 12_920], ['The Holocene has lasted 50,000 years so far.', '50,000 years', Y, 49_500, 50_500]],
  // Jouzel et al. 1999, Science 286, doi:10.1126/science.286.5447.2138 (from memory)
  ['vostok-lake-borehole-depth', ['In 2012 the Vostok borehole reached the lake at about 3,770 metres.', 'about 3,770 metres', L, 3388, 4152], ['In 2012 the Vostok borehole reached the lake at 2,000 metres.', '2,000 metres', L, 1950, 2050]],
  // Jouzel et al. 1999, Science 286, doi:10.1126/science.286.5447.2138 (from memory)
  ['vostok-ice-thickness', ['At Vostok the ice sheet is about 3,750 metres thick.', 'about 3,750 metres', L, 3370, 4130], ['At Vostok the ice sheet is 1,000 metres thick.', '1,000 metres', L, 950, 1050]],
  // Dansgaard et al. 1993, Nature 364, doi:10.1038/364218a0
  ['grip-record-span', ['The GRIP record reaches back about 250,000 years.', 'about 250,000 years', Y, 220_000, 280_000], ['The GRIP record reaches back 800,000 years.', '800,000 years', Y, 795_000, 805_000]],
];
