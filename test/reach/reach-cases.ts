/**
 * Every reference value of the built-in pack, told in sentences of our own: each sentence alone is
 * a whole draft, so it must name what it measures in words that put a draft on topic. A `right`
 * sentence states a value inside the reference range and must stay clean; a `wrong` one states a
 * clearly wrong value and must be flagged (`value.<id>` unless another rule is named) with the
 * reference number (its `key`, any one form) in the correction. Wordings vary on purpose: plain,
 * with a lead-in, with the value in a clause or in brackets. The source of each reference value,
 * as the pack cites it, is named in the comment above its row.
 */

/** One sentence: right (clean) or wrong (flagged, its correction carrying one of `key`). */
export type ReachRow = { text: string; right: true } | { text: string; right: false; key: string[]; rule?: string };

/** A reference id and its sentences. */
export type ReachCase = [id: string, rows: ReachRow[]];

/** A reference value that no sentence can state as a number of its own, and why. */
export type Skipped = [id: string, why: string];

const right = (text: string): ReachRow => ({ text, right: true });
const wrong = (text: string, key: string | string[], rule?: string): ReachRow => ({ text, right: false, key: typeof key === 'string' ? [key] : key, ...(rule === undefined ? {} : { rule }) });

export const REACH: ReachCase[] = [
  // Petit et al. 1999, Nature 399, doi 10.1038/20859; Petit et al. 2001, IGBP PAGES/World Data Center for Paleoclimatology Data Contribution Series
  // Barnola et al. 1987, Nature 329, doi 10.1038/329408a0; Petit et al. 1999, Nature 399, doi 10.1038/20859
  ['vostok-first-record-span', [
    right('The first Vostok core, published in 1987, went back about 160,000 years.'),
    wrong('The first Vostok record, published in 1987, already went back about 800,000 years.', '160,000'),
  ]],
  ['vostok-record-span', [
    right('The Vostok ice core holds a climate record covering about 420,000 years.'),
    wrong('Put simply, the Vostok record goes back two million years.', '420,000'),
    wrong('The Vostok core (whose record spans some 90,000 years) was drilled by a Russian team.', '420,000'),
  ]],
  // Petit et al. 1997, Nature 387, doi 10.1038/387359a0; Petit et al. 1999, Nature 399, doi 10.1038/20859; Centre national de la recherche scientifique (CNRS), CNRS
  ['vostok-drilled-depth', [
    right('In January 1998 the Vostok drill reached a depth of 3,623 metres.'),
    wrong('At Vostok, drilling stopped at a depth of 1,200 metres.', '3,623'),
  ]],
  // U.S. National Science Foundation Ice Core Facility (NSF-ICF), NSF Ice Core Facility; Petit & Jouzel 1999, PANGAEA, doi 10.1594/PANGAEA.55505
  ['vostok-undisturbed-depth', [
    right('Vostok ice lies in undisturbed layers down to a depth of about 3,350 metres.'),
    wrong('Below the surface, Vostok ice stays undisturbed down to a depth of 1,000 metres.', '3,350'),
  ]],
  // Petit et al. 1999, Nature 399, doi 10.1038/20859
  ['vostok-glacial-cycles', [
    right('The Vostok core records four glacial cycles.'),
    wrong('As the museum panel puts it, the Vostok core records nine glacial cycles.', 'four'),
  ]],
  // Jouzel et al. 2007, Science 317, doi 10.1126/science.1141038; Lüthi et al. 2008, Nature 453, doi 10.1038/nature06949
  ['edc-record-span', [
    right('The EPICA Dome C record reaches back about 800,000 years.'),
    wrong('For the record, the Dome C core spans only 300,000 years.', '800,000'),
    wrong('EPICA Dome C (a record reaching back 3 million years) is the longest we have.', '800,000'),
  ]],
  // Lüthi et al. 2008, Nature 453, doi 10.1038/nature06949
  ['edc-bottom-200m-span', [
    right('The lowest 200 metres of the Dome C core hold about 150,000 years.'),
    wrong('The bottom 200 metres of the EPICA Dome C core hold just 2,000 years.', '150,000'),
  ]],
  // Lüthi et al. 2008, Nature 453, doi 10.1038/nature06949; Bouchet et al. 2023, Climate of the Past 19, doi 10.5194/cp-19-2257-2023
  ['edc-drilled-depth', [
    right('At Dome C the drill reached a depth of about 3,270 metres.'),
    wrong('In the end, drilling at Dome C reached a depth of 5,100 metres.', '3,270'),
  ]],
  // EPICA community members 2004, Nature 429, doi 10.1038/nature02599; Lüthi et al. 2008, Nature 453, doi 10.1038/nature06949
  ['edc-glacial-cycles', [
    right('The EPICA Dome C core covers eight glacial cycles.'),
    wrong('All told, the EPICA Dome C core covers twenty glacial cycles.', 'eight'),
  ]],
  // Lüthi et al. 2008, Nature 453, doi 10.1038/nature06949; Wilhelms et al. 2014, Annals of Glaciology 55, doi 10.3189/2014AoG68A189
  ['edml-drilled-depth', [
    right('The EDML core was drilled to a depth of 2,774 metres.'),
    wrong('At Kohnen station, the EDML core was drilled to a depth of 4,400 metres.', '2,774'),
  ]],
  // Motoyama 2007, Scientific Drilling 5, doi 10.2204/iodp.sd.5.05.2007; Motoyama et al. 2021, Annals of Glaciology 62, doi 10.1017/aog.2020.84
  ['dome-fuji-drilled-depth', [
    right('The second Dome Fuji core was drilled to a depth of about 3,035 metres.'),
    wrong('In 2007 the Dome Fuji drill reached a depth of 1,500 metres.', '3,035'),
  ]],
  // Motoyama 2007, Scientific Drilling 5, doi 10.2204/iodp.sd.5.05.2007; Dome Fuji Ice Core Project Members 2017, Science Advances 3, doi 10.1126/sciadv.1600446
  ['dome-fuji-record-span', [
    right('The Dome Fuji record reaches back about 720,000 years.'),
    wrong('According to the panel, the Dome Fuji record reaches back 150,000 years.', '720,000'),
  ]],
  // Johnsen 2003, PANGAEA, doi 10.1594/PANGAEA.89007; Dansgaard et al. 1993, Nature 364, doi 10.1038/364218a0
  ['grip-depth-and-span', [
    right('The GRIP core in Greenland was drilled to a depth of about 3,029 metres.'),
    wrong('On the Greenland summit, the GRIP drill reached a depth of 1,800 metres.', '3,029'),
  ]],
  // Lüthi et al. 2008, Nature 453, doi 10.1038/nature06949; French Polar Institute (IPEV) 2025-03-24, Institut polaire français Paul-Émile Victor
  ['oldest-continuous-ice-core-record', [
    right('The oldest continuous ice-core record now spans about 1.2 million years.'),
    wrong('Today the oldest continuous ice core record spans just 100,000 years.', ['1.2 million', '800,000']),
  ]],
  // French Polar Institute (IPEV) 2025-03-24, Institut polaire français Paul-Émile Victor
  ['beyond-epica-ice-age', [
    right('The Beyond EPICA core holds a record reaching back at least 1.2 million years.'),
    wrong('The Beyond EPICA core holds a record reaching back only 50,000 years.', '1.2 million'),
  ]],
  // French Polar Institute (IPEV) 2025-03-24, Institut polaire français Paul-Émile Victor
  ['beyond-epica-drilled-depth', [
    right('At Little Dome C the drill reached a depth of about 2,800 metres.'),
    wrong('In January 2025 the Beyond EPICA drill reached a depth of 5,000 metres.', '2,800'),
  ]],
  // Yan et al. 2019, Nature 574, doi 10.1038/s41586-019-1692-3; Higgins et al. 2015, Proceedings of the National Academy of Sciences 112, doi 10.1073/pnas.1420232112
  ['allan-hills-oldest-ice', [
    right('Ice from the Allan Hills has been dated to about 6 million years old.'),
    wrong('Blue ice from the Allan Hills is only 50,000 years old.', ['6 million', '2 million']),
  ]],
  // Caillon et al. 2003, Science 299, doi 10.1126/science.1078758; Bender et al. 2006, Journal of Geophysical Research: Atmospheres 111, doi 10.1029/2005JD006488
  ['delta-age-vostok', [
    right('At Vostok the delta-age between gas and ice ranges from 2,000 to 6,500 years.'),
    wrong('In the Vostok core, the gas age difference is only 20 years.', '2,000'),
  ]],
  // Loulergue et al. 2007, Climate of the Past 3, doi 10.5194/cp-3-527-2007; Veres et al. 2013, Climate of the Past 9, doi 10.5194/cp-9-1733-2013
  ['delta-age-edc', [
    right('At Dome C the gas is younger than the ice by about 1,500 to 5,500 years.'),
    wrong('At EPICA Dome C, the delta-age reaches 40,000 years.', '5,500'),
  ]],
  // Lüthi et al. 2008, Nature 453, doi 10.1038/nature06949; Bereiter et al. 2015, Geophysical Research Letters 42, doi 10.1002/2014GL061957
  ['co2-lowest-800kyr', [
    right('The lowest CO2 level in the ice-core record is about 172 ppm.'),
    wrong('Over 800,000 years, the lowest CO2 level was 240 ppm.', '172'),
  ]],
  // Forster et al. 2021, Climate Change 2021: The Physical Science Basis. Contribution of Working Group I to the Sixth Assessment Report of the Intergovernmental Panel on Climate Change, doi 10.1017/9781009157896.009; Kageyama et al. 2017, Geoscientific Model Development 10, doi 10.5194/gmd-10-4035-2017; Masson-Delmotte et al. 2013, Climate Change 2013: The Physical Science Basis. Contribution of Working Group I to the Fifth Assessment Report of the Intergovernmental Panel on Climate Change, doi 10.1017/CBO9781107415324.013; Monnin et al. 2001, Science 291, doi 10.1126/science.291.5501.112
  ['co2-lgm', [
    right('At the Last Glacial Maximum, CO2 stood at about 190 ppm.'),
    wrong('CO2 during the Last Glacial Maximum was around 320 ppm.', '190'),
    wrong('The LGM (when carbon dioxide was roughly 100 ppm) ended about 19,000 years ago.', '190'),
  ]],
  // Lüthi et al. 2008, Nature 453, doi 10.1038/nature06949; Siegenthaler et al. 2005, Science 310, doi 10.1126/science.1120130
  ['co2-glacial-minimum-typical', [
    right('During glacial periods CO2 fell to about 180 to 200 ppm.'),
    wrong('In each glacial period, CO2 fell to about 100 ppm.', ['180', '200']),
  ]],
  // Lüthi et al. 2008, Nature 453, doi 10.1038/nature06949; Siegenthaler et al. 2005, Science 310, doi 10.1126/science.1120130
  ['co2-interglacial-maximum-typical', [
    right('In interglacials CO2 rose to about 280 ppm.'),
    wrong('During past interglacials, CO2 stood at about 400 ppm.', '280'),
  ]],
  // Lüthi et al. 2008, Nature 453, doi 10.1038/nature06949; Petit et al. 1999, Nature 399, doi 10.1038/20859
  ['co2-highest-preindustrial-800kyr', [
    right('The highest natural CO2 level in the ice cores is about 300 ppm.'),
    wrong('Over the past 800,000 years the highest CO2 level in the cores was 380 ppm.', '300'),
  ]],
  // Fischer et al. 1999, Science 283, doi 10.1126/science.283.5408.1712; Caillon et al. 2003, Science 299, doi 10.1126/science.1078758; Siegenthaler et al. 2005, Science 310, doi 10.1126/science.1120130
  ['co2-glacial-interglacial-amplitude', [
    right('Between glacial and interglacial times CO2 changed by about 90 ppm.'),
    wrong('Across each glacial cycle, CO2 rose by some 300 ppm.', ['80', '100']),
  ]],
  // Gulev et al. 2021, Climate Change 2021: The Physical Science Basis. Contribution of Working Group I to the Sixth Assessment Report of the Intergovernmental Panel on Climate Change, doi 10.1017/9781009157896.004; IPCC 2021, Climate Change 2021: The Physical Science Basis. Contribution of Working Group I to the Sixth Assessment Report of the Intergovernmental Panel on Climate Change, doi 10.1017/9781009157896.001; Meinshausen et al. 2017, Geoscientific Model Development 10, doi 10.5194/gmd-10-2057-2017; Prentice et al. 2001, Climate Change 2001: The Scientific Basis. Contribution of Working Group I to the Third Assessment Report of the Intergovernmental Panel on Climate Change
  ['co2-preindustrial-1750', [
    right('Before the industrial revolution, CO2 was about 280 ppm.'),
    wrong('Pre-industrial CO2 stood at about 350 ppm.', '278'),
    wrong('In 1750 (before factories) carbon dioxide was around 200 ppm.', '278'),
  ]],
  // Monnin et al. 2001, Science 291, doi 10.1126/science.291.5501.112; Pedro et al. 2012, Climate of the Past 8, doi 10.5194/cp-8-1213-2012
  ['co2-deglacial-rise-magnitude', [
    right('During the last deglaciation CO2 rose by about 80 ppm.'),
    wrong('Across the deglaciation, CO2 rose by 250 ppm.', '80'),
  ]],
  // Monnin et al. 2001, Science 291, doi 10.1126/science.291.5501.112; Marcott et al. 2014, Nature 514, doi 10.1038/nature13799
  ['co2-deglacial-rise-duration', [
    right('The deglacial CO2 rise took about 6,500 years.'),
    wrong('In the deglaciation, the CO2 rise took only 300 years.', '6,500'),
  ]],
  // Marcott et al. 2014, Nature 514, doi 10.1038/nature13799
  ['co2-deglacial-abrupt-step', [
    right('CO2 jumped abruptly by about 12 ppm within a century.'),
    wrong('In one abrupt step, CO2 jumped by 80 ppm within a century.', ['10', '15']),
  ]],
  // Takahashi et al. 1993, Global Biogeochemical Cycles 7, doi 10.1029/93GB02263; Sigman & Boyle 2000, Nature 407, doi 10.1038/35038000
  ['deglacial-co2-from-ocean-warming', [
    right('Ocean warming alone raised CO2 by about 20 ppm (through solubility).'),
    wrong('Through solubility, ocean warming alone raised CO2 by 90 ppm.', '20'),
  ]],
  // Monnin et al. 2001, Science 291, doi 10.1126/science.291.5501.112; Pedro et al. 2012, Climate of the Past 8, doi 10.5194/cp-8-1213-2012
  ['co2-deglacial-mean-rate', [
    right('During the deglaciation CO2 rose at about 0.013 ppm per year on average.'),
    wrong('On average, deglacial CO2 rose by about 2 ppm per year.', '0.013'),
  ]],
  // IPCC 2021, Climate Change 2021: The Physical Science Basis. Contribution of Working Group I to the Sixth Assessment Report of the Intergovernmental Panel on Climate Change, doi 10.1017/9781009157896.001
  ['co2-increase-since-1750-pct-2019', [
    right('By 2019, CO2 had increased by about 47% since pre-industrial times.'),
    wrong('By 2019, CO2 had increased by 150% since pre-industrial times.', '47'),
  ]],
  // Lan et al., NOAA Global Monitoring Laboratory; Gulev et al. 2021, Climate Change 2021: The Physical Science Basis. Contribution of Working Group I to the Sixth Assessment Report of the Intergovernmental Panel on Climate Change, doi 10.1017/9781009157896.004
  ['co2-global-2019', [
    right('In 2019 the global mean CO2 concentration was about 410 ppm.'),
    wrong('In 2019, global CO2 averaged 390 ppm.', '410'),
  ]],
  // NOAA Research 2024-04-05, National Oceanic and Atmospheric Administration; Lan et al., NOAA Global Monitoring Laboratory; World Meteorological Organization 2024-10-28, World Meteorological Organization
  ['co2-global-2023', [
    right('The global average CO2 level in 2023 was about 419 ppm.'),
    wrong('Globally, CO2 averaged 440 ppm in 2023.', '419'),
  ]],
  // World Meteorological Organization 2025-10-15, World Meteorological Organization; Lan et al., NOAA Global Monitoring Laboratory
  ['co2-global-2024', [
    right('In 2024 the global mean CO2 level was about 423.9 ppm.'),
    wrong('In 2024, global CO2 averaged 400 ppm.', '424'),
  ]],
  // Lan et al., NOAA Global Monitoring Laboratory and Scripps Institution of Oceanography
  ['co2-mlo-2023', [
    right('At Mauna Loa, CO2 averaged about 421 ppm in 2023.'),
    wrong('The 2023 annual mean of CO2 at Mauna Loa was 405 ppm.', '421'),
  ]],
  // Lan et al., NOAA Global Monitoring Laboratory and Scripps Institution of Oceanography
  ['co2-mlo-2022', [
    right('At Mauna Loa the 2022 annual mean was about 418.5 ppm.'),
    wrong('At Mauna Loa, CO2 averaged 430 ppm in 2022.', '418.5'),
  ]],
  // Lan et al., NOAA Global Monitoring Laboratory and Scripps Institution of Oceanography; Scripps CO2 Program, Scripps Institution of Oceanography, UC San Diego
  ['co2-mlo-may-2024', [
    right('In May 2024 CO2 at Mauna Loa peaked at about 426.9 ppm.'),
    wrong('At Mauna Loa, CO2 reached 415 ppm in May 2024.', '427'),
  ]],
  // Lan et al., NOAA Global Monitoring Laboratory and Scripps Institution of Oceanography; Scripps CO2 Program, Scripps Institution of Oceanography, UC San Diego
  ['co2-mlo-may-2025', [
    right('In May 2025 CO2 at Mauna Loa reached about 430.3 ppm.'),
    wrong('At Mauna Loa in May 2025, carbon dioxide reached 445 ppm.', '430'),
  ]],
  // Lan et al., NOAA Global Monitoring Laboratory, doi 10.15138/9N0H-ZH07; Lan et al., NOAA Global Monitoring Laboratory
  ['co2-growth-1960s', [
    right('In the 1960s CO2 grew by about 0.8 ppm per year.'),
    wrong('In the 1960s, CO2 rose by about 3 ppm per year.', '0.8'),
  ]],
  // Lan et al., NOAA Global Monitoring Laboratory, doi 10.15138/9N0H-ZH07
  ['co2-growth-2000s', [
    right('In the 2000s CO2 grew by about 1.9 ppm per year.'),
    wrong('Over the 2000s, CO2 rose by about 0.5 ppm per year.', '1.9'),
  ]],
  // Lan et al., NOAA Global Monitoring Laboratory, doi 10.15138/9N0H-ZH07
  ['co2-growth-2010s', [
    right('In the 2010s CO2 grew by about 2.4 ppm a year.'),
    wrong('During the 2010s, CO2 rose by about 5 ppm a year.', '2.4'),
  ]],
  // World Meteorological Organization 2025-10-15, World Meteorological Organization; Lan et al., NOAA Global Monitoring Laboratory, doi 10.15138/9N0H-ZH07
  ['co2-growth-2024', [
    right('In 2024 CO2 grew by about 3.5 ppm per year.'),
    wrong('In 2024, CO2 grew by about 1 ppm per year.', '3.5'),
  ]],
  // Lan et al., NOAA Global Monitoring Laboratory, doi 10.15138/9N0H-ZH07; Monnin et al. 2001, Science 291, doi 10.1126/science.291.5501.112; Pedro et al. 2012, Climate of the Past 8, doi 10.5194/cp-8-1213-2012
  ['co2-modern-vs-deglacial-rate-ratio', [
    right('CO2 is rising about 200 times faster than during the last deglaciation.'),
    wrong('Today CO2 is rising about 5 times faster than in the deglaciation.', '100'),
  ]],
  // Lan et al., NOAA Global Monitoring Laboratory; World Meteorological Organization 2025-10-15, World Meteorological Organization; Lan et al., NOAA Global Monitoring Laboratory and Scripps Institution of Oceanography
  ['co2-420ppm-as-percent', [
    right('Today CO2 makes up about 0.042% of the atmosphere.'),
    wrong('Today carbon dioxide makes up about 4% of the air.', '0.04', 'unit.'),
  ]],
  // Lan et al., NOAA Global Monitoring Laboratory; Gulev et al. 2021, Climate Change 2021: The Physical Science Basis. Contribution of Working Group I to the Sixth Assessment Report of the Intergovernmental Panel on Climate Change, doi 10.1017/9781009157896.004; IPCC 2021, Climate Change 2021: The Physical Science Basis. Contribution of Working Group I to the Sixth Assessment Report of the Intergovernmental Panel on Climate Change, doi 10.1017/9781009157896.001; Prentice et al. 2001, Climate Change 2001: The Scientific Basis. Contribution of Working Group I to the Third Assessment Report of the Intergovernmental Panel on Climate Change
  ['co2-280ppm-as-percent', [
    right('Before the industrial revolution, CO2 made up about 0.028% of the air.'),
    wrong('Pre-industrial CO2 made up about 0.28% of the atmosphere.', '0.028', 'unit.'),
  ]],
  // Gulev et al. 2021, Climate Change 2021: The Physical Science Basis. Contribution of Working Group I to the Sixth Assessment Report of the Intergovernmental Panel on Climate Change, doi 10.1017/9781009157896.004; Tierney et al. 2020, Nature 584, doi 10.1038/s41586-020-2617-x; Annan et al. 2022, Climate of the Past 18, doi 10.5194/cp-18-1883-2022; Osman et al. 2021, Nature 599, doi 10.1038/s41586-021-03984-4
  ['gmst-lgm-to-preindustrial-warming', [
    right('Since the Last Glacial Maximum, global temperature has risen by about 6 °C.'),
    wrong('From the Last Glacial Maximum to pre-industrial times, the globe warmed by only 1 °C.', '6'),
  ]],
  // Tierney et al. 2020, Nature 584, doi 10.1038/s41586-020-2617-x
  ['gmst-lgm-cooling-tierney2020', [
    right('Tierney and colleagues found the globe about 6.1 °C cooler at the Last Glacial Maximum.'),
    right('Tierney and colleagues put the global cooling of the last ice age at about 6.1 °C.'),
    wrong('Tierney and colleagues found that global temperature was 2 °C cooler at the LGM.', '6.1'),
  ]],
  // Annan et al. 2022, Climate of the Past 18, doi 10.5194/cp-18-1883-2022
  ['gmst-lgm-cooling-annan2022', [
    right('Annan and colleagues (2022) found the globe about 4.5 °C colder at the Last Glacial Maximum.'),
    wrong('For Annan and colleagues (2022), the ice-age globe was about 9 °C cooler.', '4.5'),
  ]],
  // Pedro et al. 2012, Climate of the Past 8, doi 10.5194/cp-8-1213-2012; Buizert et al. 2021, Science 372, doi 10.1126/science.abd2897; Jouzel et al. 2007, Science 317, doi 10.1126/science.1141038
  ['antarctic-deglacial-warming-isotope', [
    right('Across the last deglaciation, Antarctica warmed by about 9 °C.'),
    wrong('Across the deglaciation, Antarctic temperature rose by just 2 °C.', ['8', '11']),
  ]],
  // Buizert et al. 2021, Science 372, doi 10.1126/science.abd2897
  ['east-antarctic-lgm-cooling-buizert2021', [
    right('At the glacial maximum, East Antarctica was about 5 °C colder than today.'),
    wrong('East Antarctic temperature at the LGM was 15 °C colder than today.', ['4', '7']),
  ]],
  // Buizert et al. 2021, Science 372, doi 10.1126/science.abd2897; Cuffey et al. 2016, Proceedings of the National Academy of Sciences 113, doi 10.1073/pnas.1609132113
  ['west-antarctic-lgm-cooling-buizert2021', [
    right('At the glacial maximum, West Antarctica was about 10 °C colder than today.'),
    wrong('West Antarctic temperature at the LGM was only 3 °C colder than today.', ['10', '11']),
  ]],
  // Dahl-Jensen et al. 1998, Science 282, doi 10.1126/science.282.5387.268; Cuffey & Clow 1997, Journal of Geophysical Research: Oceans 102, doi 10.1029/97JC00880
  ['greenland-lgm-cooling', [
    right('At the Last Glacial Maximum, Greenland was about 20 °C colder than today.'),
    wrong('Greenland temperature at the LGM was only 5 °C colder than today.', '20'),
  ]],
  // Grachev & Severinghaus 2005, Quaternary Science Reviews 24, doi 10.1016/j.quascirev.2004.10.016; Buizert et al. 2014, Science 345, doi 10.1126/science.1254961
  ['greenland-younger-dryas-end-warming', [
    right('At the end of the Younger Dryas, Greenland warmed by about 10 °C.'),
    wrong('When the Younger Dryas ended, Greenland temperature rose by 40 °C.', '10'),
  ]],
  // Arias et al. 2021, Climate Change 2021: The Physical Science Basis. Contribution of Working Group I to the Sixth Assessment Report of the Intergovernmental Panel on Climate Change, doi 10.1017/9781009157896.002
  ['ecs-ar6-very-likely', [
    right('Equilibrium climate sensitivity is about 3 °C.'),
    wrong('Equilibrium climate sensitivity is between 0.5 and 1 °C.', '3'),
    wrong('According to one blog, climate sensitivity is about 9 °C.', '3'),
  ]],
  // Arias et al. 2021, Climate Change 2021: The Physical Science Basis. Contribution of Working Group I to the Sixth Assessment Report of the Intergovernmental Panel on Climate Change, doi 10.1017/9781009157896.002, TS.3.2.1
  ['ecs-ar6-very-likely-range', [
    right('Equilibrium climate sensitivity is very likely between 2 and 5 °C.'),
    wrong('The IPCC now gives a very likely range of 1 to 3 °C for climate sensitivity.', ['2 to 5', '2 °C to 5 °C', '2–5']),
  ]],
  // Arias et al. 2021, Climate Change 2021: The Physical Science Basis. Contribution of Working Group I to the Sixth Assessment Report of the Intergovernmental Panel on Climate Change, doi 10.1017/9781009157896.002, TS.3.2.1
  ['ecs-ar6-likely-range', [
    right('Climate sensitivity is likely between 2.5 and 4 °C, the latest IPCC report says.'),
    // The AR5 likely range told as AR6's: it overlaps 2.5-4 °C, but both ends are off.
    wrong('IPCC AR6 assessed equilibrium climate sensitivity as likely 1.5 to 4.5 °C.', ['2.5 to 4', '2.5 °C to 4 °C', '2.5–4']),
    wrong('Equilibrium climate sensitivity is likely between 0.5 and 1 °C.', ['2.5 to 4', '2.5 °C to 4 °C', '2.5–4']),
  ]],
  // Arias et al. 2021, Climate Change 2021: The Physical Science Basis. Contribution of Working Group I to the Sixth Assessment Report of the Intergovernmental Panel on Climate Change, doi 10.1017/9781009157896.002, TS.3.2.1
  ['ecs-ar6-best-estimate', [
    right('The IPCC best estimate of climate sensitivity is 3 °C per doubling of CO2.'),
    wrong('Its best estimate of climate sensitivity is 4.5 °C per doubling of CO2.', '3'),
  ]],
  // Arias et al. 2021, Climate Change 2021: The Physical Science Basis. Contribution of Working Group I to the Sixth Assessment Report of the Intergovernmental Panel on Climate Change, doi 10.1017/9781009157896.002, TS.3.2.1
  ['ecs-ar6-likely-low', [
    right('The lower end of the likely range of climate sensitivity is 2.5 °C.'),
    wrong('The lower end of the likely range of climate sensitivity is now 0.5 °C.', '2.5'),
  ]],
  // Arias et al. 2021, Climate Change 2021: The Physical Science Basis. Contribution of Working Group I to the Sixth Assessment Report of the Intergovernmental Panel on Climate Change, doi 10.1017/9781009157896.002, TS.3.2.1
  ['ecs-ar6-likely-high', [
    right('The upper end of the likely range of climate sensitivity is 4 °C.'),
    wrong('The upper end of the likely range of climate sensitivity is now 9 °C.', '4'),
  ]],
  // Arias et al. 2021, Climate Change 2021: The Physical Science Basis. Contribution of Working Group I to the Sixth Assessment Report of the Intergovernmental Panel on Climate Change, doi 10.1017/9781009157896.002, TS.3.2.1
  ['ecs-ar6-very-likely-low', [
    right('The lower end of the very likely range of climate sensitivity is 2 °C.'),
    wrong('The lower end of the very likely range of climate sensitivity is 0.5 °C.', '2'),
  ]],
  // Arias et al. 2021, Climate Change 2021: The Physical Science Basis. Contribution of Working Group I to the Sixth Assessment Report of the Intergovernmental Panel on Climate Change, doi 10.1017/9781009157896.002, TS.3.2.1
  ['ecs-ar6-very-likely-high', [
    right('The upper end of the very likely range of climate sensitivity is 5 °C.'),
    wrong('The upper end of the very likely range of climate sensitivity is 12 °C.', '5'),
  ]],
  // Annan & Hargreaves 2015, Quaternary Science Reviews 107, doi 10.1016/j.quascirev.2014.09.019; Mix et al. 2001, Quaternary Science Reviews 20, doi 10.1016/S0277-3791(00)00145-1; Clark et al. 2009, Science 325, doi 10.1126/science.1172873; Lambeck et al. 2002, Nature 419, doi 10.1038/nature01089; Masson-Delmotte et al. 2013, Climate Change 2013: The Physical Science Basis. Contribution of Working Group I to the Fifth Assessment Report of the Intergovernmental Panel on Climate Change, doi 10.1017/CBO9781107415324.013
  ['lgm-chronozone', [
    right('The Last Glacial Maximum was about 21,000 years ago.'),
    wrong('The Last Glacial Maximum was about 60,000 years ago.', '21,000'),
  ]],
  // Clark et al. 2009, Science 325, doi 10.1126/science.1172873
  ['lgm-ice-sheet-maximum', [
    right('The ice sheets reached their LGM positions about 22,000 years ago.'),
    wrong('Ice sheets stood at their Last Glacial Maximum about 5,000 years ago.', ['26,500', '19,000']),
  ]],
  // Chowdhry Beeman et al. 2019, Climate of the Past 15, doi 10.5194/cp-15-913-2019; Clark et al. 2009, Science 325, doi 10.1126/science.1172873; Pedro et al. 2012, Climate of the Past 8, doi 10.5194/cp-8-1213-2012
  ['termination-1-start', [
    right('The last deglaciation began about 18,000 years ago.'),
    wrong('The last deglaciation began about 40,000 years ago.', '18,000'),
  ]],
  // Chowdhry Beeman et al. 2019, Climate of the Past 15, doi 10.5194/cp-15-913-2019; Walker et al. 2009, Journal of Quaternary Science 24, doi 10.1002/jqs.1227
  ['termination-1-end', [
    right('The last deglaciation ended about 11,500 years ago.'),
    wrong('By most accounts, the last ice age ended about 2,000 years ago.', '11,500'),
  ]],
  // Chowdhry Beeman et al. 2019, Climate of the Past 15, doi 10.5194/cp-15-913-2019; Clark et al. 2012, Proceedings of the National Academy of Sciences 109, doi 10.1073/pnas.1116619109
  ['termination-1-duration', [
    right('The last deglaciation took about 7,000 years.'),
    wrong('The last deglaciation took only 500 years.', '7,000'),
  ]],
  // Rasmussen et al. 2006, Journal of Geophysical Research: Atmospheres 111, doi 10.1029/2005JD006079; Rasmussen et al. 2014, Quaternary Science Reviews 106, doi 10.1016/j.quascirev.2014.09.007
  ['younger-dryas-start', [
    right('The Younger Dryas began about 12,900 years ago.'),
    wrong('The Younger Dryas began about 20,000 years ago.', '12,900'),
  ]],
  // Walker et al. 2009, Journal of Quaternary Science 24, doi 10.1002/jqs.1227; Rasmussen et al. 2014, Quaternary Science Reviews 106, doi 10.1016/j.quascirev.2014.09.007
  ['younger-dryas-end', [
    right('The Younger Dryas ended about 11,700 years ago.'),
    wrong('The Younger Dryas ended about 8,000 years ago.', '11,700'),
  ]],
  // Rasmussen et al. 2014, Quaternary Science Reviews 106, doi 10.1016/j.quascirev.2014.09.007; Rasmussen et al. 2006, Journal of Geophysical Research: Atmospheres 111, doi 10.1029/2005JD006079
  ['younger-dryas-duration', [
    right('The Younger Dryas lasted about 1,200 years.'),
    wrong('The Younger Dryas lasted about 100 years.', '1,200'),
    wrong('The Younger Dryas (a cold snap that lasted some 5,000 years) hit Europe hard.', '1,200'),
  ]],
  // Pedro et al. 2016, Nature Geoscience 9, doi 10.1038/ngeo2580; Putnam et al. 2010, Nature Geoscience 3, doi 10.1038/ngeo962
  ['acr-start', [
    right('The Antarctic Cold Reversal began about 14,700 years ago.'),
    wrong('The Antarctic Cold Reversal began about 30,000 years ago.', '14,700'),
  ]],
  // Pedro et al. 2016, Nature Geoscience 9, doi 10.1038/ngeo2580; Putnam et al. 2010, Nature Geoscience 3, doi 10.1038/ngeo962
  ['acr-end', [
    right('The Antarctic Cold Reversal ended about 12,900 years ago.'),
    wrong('The Antarctic Cold Reversal ended about 5,000 years ago.', '13,000'),
  ]],
  // Walker et al. 2009, Journal of Quaternary Science 24, doi 10.1002/jqs.1227
  ['holocene-start', [
    right('The Holocene began about 11,700 years ago.'),
    wrong('The Holocene began 40,000 years ago.', '11,700'),
    wrong('Our own epoch, the Holocene, began some 3,000 years ago.', '11,700'),
  ]],
  // Kopp et al. 2009, Nature 462, doi 10.1038/nature08686; Past Interglacials Working Group of PAGES 2016, Reviews of Geophysics 54, doi 10.1002/2015RG000482
  ['last-interglacial', [
    right('The last interglacial lasted from about 130,000 to 115,000 years ago.'),
    wrong('The Eemian interglacial was about 40,000 years ago.', ['130,000', '115,000']),
  ]],
  // Gibbard et al. 2010, Journal of Quaternary Science 25, doi 10.1002/jqs.1338; Gibbard & Head 2010, Episodes 33, doi 10.18814/epiiugs/2010/v33i3/002
  ['pleistocene-base', [
    right('The Pleistocene began about 2.58 million years ago.'),
    wrong('The Pleistocene began about 10,000 years ago.', '2.58'),
  ]],
  // Clark et al. 2006, Quaternary Science Reviews 25, doi 10.1016/j.quascirev.2006.07.008; Yan et al. 2019, Nature 574, doi 10.1038/s41586-019-1692-3; Snyder 2016, Nature 538, doi 10.1038/nature19798; Bol'shakov & Kuzmin 2014, Russian Journal of Earth Sciences 14, doi 10.2205/2014ES000537
  ['mid-pleistocene-transition', [
    right('The Mid-Pleistocene Transition happened between about 1.25 million and 700,000 years ago.'),
    wrong('The Mid-Pleistocene Transition happened about 100,000 years ago.', ['1.25 million', '700,000']),
  ]],
  // Hays et al. 1976, Science 194, doi 10.1126/science.194.4270.1121; Berger 1978, Journal of the Atmospheric Sciences 35, doi 10.1175/1520-0469(1978)035<2362:LTVODI>2.0.CO;2
  ['milankovitch-eccentricity-period', [
    right('Eccentricity varies over a cycle of about 100,000 years.'),
    wrong('The eccentricity cycle lasts about 10,000 years.', '100,000'),
  ]],
  // Berger 1978, Journal of the Atmospheric Sciences 35, doi 10.1175/1520-0469(1978)035<2362:LTVODI>2.0.CO;2; Hays et al. 1976, Science 194, doi 10.1126/science.194.4270.1121
  ['milankovitch-obliquity-period', [
    right('Obliquity varies with a period of about 41,000 years.'),
    wrong('The tilt of Earth\'s axis changes over a cycle of 80,000 years.', '41,000'),
  ]],
  // Hays et al. 1976, Science 194, doi 10.1126/science.194.4270.1121; Berger 1978, Journal of the Atmospheric Sciences 35, doi 10.1175/1520-0469(1978)035<2362:LTVODI>2.0.CO;2
  ['milankovitch-precession-period', [
    right('Precession runs on cycles of about 19,000 to 23,000 years.'),
    wrong('Precession runs on a cycle of about 60,000 years.', ['19,000', '23,000']),
  ]],
  // Fischer et al. 1999, Science 283, doi 10.1126/science.283.5408.1712
  ['lag-fischer1999', [
    right('Early studies found that CO2 lagged temperature by about 600 years.'),
    wrong('Early studies found that CO2 lagged temperature by 5,000 years.', ['600', '1,000']),
  ]],
  // Caillon et al. 2003, Science 299, doi 10.1126/science.1078758
  ['lag-caillon2003-termination-iii', [
    right('Caillon and colleagues found that CO2 lagged Antarctic warming by about 800 years at Termination III.'),
    wrong('Caillon and colleagues found that CO2 lagged Antarctic warming by 4,000 years at Termination III.', '800'),
  ]],
  // Monnin et al. 2001, Science 291, doi 10.1126/science.291.5501.112; Uemura et al. 2018, Nature Communications 9, doi 10.1038/s41467-018-03328-3
  ['lag-monnin2001', [
    right('Monnin and colleagues found a CO2 lag of about 800 years behind Antarctic temperature.'),
    wrong('Monnin and colleagues found a CO2 lag of about 5,000 years behind Antarctic temperature.', '800'),
  ]],
  // Pedro et al. 2012, Climate of the Past 8, doi 10.5194/cp-8-1213-2012
  ['lag-pedro2012', [
    right('Pedro and colleagues found that CO2 lagged Antarctic temperature by less than 400 years.'),
    wrong('Pedro and colleagues found that CO2 lagged Antarctic temperature by 2,000 years.', '400'),
  ]],
  // Parrenin et al. 2013, Science 339, doi 10.1126/science.1226368
  ['lag-parrenin2013', [
    right('Parrenin and colleagues found a CO2 lag of no more than 200 years.'),
    wrong('Parrenin and colleagues found a CO2 lag of about 1,500 years.', '200'),
  ]],
  // Pedro et al. 2012, Climate of the Past 8, doi 10.5194/cp-8-1213-2012; Parrenin et al. 2013, Science 339, doi 10.1126/science.1226368; Chowdhry Beeman et al. 2019, Climate of the Past 15, doi 10.5194/cp-15-913-2019
  ['antarctic-co2-phasing-termination-1-consensus', [
    right('During the last deglaciation, CO2 lagged Antarctic temperature by a few centuries at most, perhaps 200 years.'),
    wrong('During the last deglaciation, CO2 lagged Antarctic temperature by 3,000 years.', ['200', '600']),
  ]],
  // Shakun et al. 2012, Nature 484, doi 10.1038/nature10915
  ['fraction-global-warming-after-co2-rise', [
    right('About 93% of global warming came after the CO2 rise began.'),
    wrong('Only about 10% of global warming came after the CO2 rise began.', '90'),
  ]],
  // Lambeck et al. 2014, Proceedings of the National Academy of Sciences 111, doi 10.1073/pnas.1411762111; Lambeck et al. 2002, Nature 419, doi 10.1038/nature01089
  ['lgm-sea-level-lowstand', [
    right('At the Last Glacial Maximum, sea level stood about 125 metres lower than today.'),
    wrong('During the last ice age, sea level was about 10 metres lower than today.', '120'),
    wrong('Sea level at glacial times (about 400 metres below present) exposed land bridges.', '120', 'unit.scale-slip'),
  ]],
  // Clark et al. 2012, Proceedings of the National Academy of Sciences 109, doi 10.1073/pnas.1116619109
  ['deglacial-sea-level-rise', [
    right('During the deglaciation, sea level rose by about 80 metres.'),
    wrong('Across the last deglaciation, sea level rose by about 5 metres.', '80'),
  ]],
  // World Meteorological Organization 2025-10-15, World Meteorological Organization; Lan et al., NOAA Global Monitoring Laboratory; Lan et al., NOAA Global Monitoring Laboratory and Scripps Institution of Oceanography; Scripps CO2 Program, Scripps Institution of Oceanography, UC San Diego
  ['co2-present-day', [
    right('Today CO2 stands at about 425 ppm.'),
    wrong('Currently, carbon dioxide in the air stands at 350 ppm.', '424'),
  ]],
  // Lan et al., NOAA Global Monitoring Laboratory, doi 10.15138/9N0H-ZH07; NOAA Research 2024-04-05, National Oceanic and Atmospheric Administration; World Meteorological Organization 2025-10-15, World Meteorological Organization
  ['co2-growth-recent', [
    right('Today CO2 is rising by about 2.5 ppm per year.'),
    wrong('Currently CO2 is rising by about 10 ppm per year.', ['2', '3.5']),
  ]],
  // Lisiecki & Raymo 2005, Paleoceanography 20, doi 10.1029/2004PA001071; Clark et al. 2006, Quaternary Science Reviews 25, doi 10.1016/j.quascirev.2006.07.008; Yan et al. 2019, Nature 574, doi 10.1038/s41586-019-1692-3
  ['glacial-cycle-period-before-mpt', [
    right('Before the Mid-Pleistocene Transition, glacial cycles recurred every 41,000 years.'),
    wrong('Before the MPT, glacial cycles recurred every 100,000 years.', '41,000'),
  ]],
  // Lisiecki & Raymo 2005, Paleoceanography 20, doi 10.1029/2004PA001071; Clark et al. 2006, Quaternary Science Reviews 25, doi 10.1016/j.quascirev.2006.07.008; Hays et al. 1976, Science 194, doi 10.1126/science.194.4270.1121
  ['glacial-cycle-period-after-mpt', [
    right('Since the Mid-Pleistocene Transition, glacial cycles have recurred about every 100,000 years.'),
    wrong('Since the MPT, glacial cycles have recurred every 20,000 years.', '100,000'),
  ]],
  // Jouzel et al. 2007, Science 317, doi 10.1126/science.1141038; Lüthi et al. 2008, Nature 453, doi 10.1038/nature06949; Petit et al. 1999, Nature 399, doi 10.1038/20859
  ['longest-record-vostok-named', [
    wrong('Vostok holds the longest continuous record, about 800,000 years.', '800,000', 'value.rank.'),
  ]],
  // Petit et al. 1997, Nature 387, doi 10.1038/387359a0; Petit et al. 1999, Nature 399, doi 10.1038/20859
  ['deepest-ice-core', [
    right('The deepest ice core ever drilled reached about 3,620 metres.'),
    wrong('The deepest ice core ever drilled reached about 10,000 metres.', '3,620'),
  ]],
  // Petit et al. 1997, Nature 387, doi 10.1038/387359a0; Lüthi et al. 2008, Nature 453, doi 10.1038/nature06949; Motoyama 2007, Scientific Drilling 5, doi 10.2204/iodp.sd.5.05.2007
  ['deepest-core-misnamed', [
    wrong('EPICA Dome C is the deepest ice core, at about 5,000 metres.', '3,620'),
  ]],
  // EPICA community members 2004, Nature 429, doi 10.1038/nature02599
  ['edc-record-span-2004', [
    right('In 2004 the EPICA Dome C record was published as reaching back about 740,000 years.'),
    wrong('In 2004 the EPICA Dome C record was published as reaching back 200,000 years.', ['740,000', '800,000']),
  ]],
  // Jouzel et al. 2007, Science 317, doi 10.1126/science.1141038
  ['antarctic-glacial-interglacial-range', [
    right('Over the glacial cycles, Antarctic temperature swung by about 12 °C.'),
    wrong('Over each glacial cycle, Antarctic temperature swung by about 40 °C.', ['10', '15']),
  ]],
  // World Meteorological Organization 2025-10-15, World Meteorological Organization; NOAA Research 2024-04-05, National Oceanic and Atmospheric Administration; IPCC 2021, Climate Change 2021: The Physical Science Basis. Contribution of Working Group I to the Sixth Assessment Report of the Intergovernmental Panel on Climate Change, doi 10.1017/9781009157896.001
  ['co2-increase-since-preindustrial-pct-latest', [
    right('CO2 has increased by about 52% since pre-industrial times.'),
    wrong('Carbon dioxide has risen by 200% since pre-industrial times.', '52'),
  ]],
  // Lan et al., NOAA Global Monitoring Laboratory; Lan et al., NOAA Global Monitoring Laboratory
  ['co2-share-of-air-2019', [
    right('In 2019 CO2 made up about 0.041% of the atmosphere.'),
    wrong('In 2019 carbon dioxide made up about 4% of the air.', '0.04', 'unit.'),
  ]],
  // World Meteorological Organization 2025-10-15, World Meteorological Organization; Lan et al., NOAA Global Monitoring Laboratory
  ['co2-share-of-air-2024', [
    right('In 2024 CO2 made up about 0.042% of the atmosphere.'),
    wrong('In 2024, carbon dioxide made up 0.42% of the air.', '0.042', 'unit.'),
  ]],
  // Meinshausen et al. 2017, Geoscientific Model Development 10, doi 10.5194/gmd-10-2057-2017
  ['co2-1850', [
    right('In 1850 CO2 stood at about 284 ppm.'),
    wrong('In 1850, carbon dioxide stood at about 330 ppm.', '284'),
  ]],
  // Lan et al., NOAA Global Monitoring Laboratory
  ['co2-global-2020', [
    right('In 2020 the global mean CO2 level was about 412 ppm.'),
    wrong('In 2020, global CO2 averaged 390 ppm.', '412'),
  ]],
  // Lan et al., NOAA Global Monitoring Laboratory
  ['co2-global-2021', [
    right('In 2021 the global mean CO2 level was about 415 ppm.'),
    wrong('In 2021, global CO2 averaged 440 ppm.', '415'),
  ]],
  // Lan et al., NOAA Global Monitoring Laboratory
  ['co2-global-2022', [
    right('In 2022 the global mean CO2 level was about 417 ppm.'),
    wrong('In 2022, global CO2 averaged 395 ppm.', '417'),
  ]],
  // Lan et al., NOAA Global Monitoring Laboratory and Scripps Institution of Oceanography
  ['co2-mlo-2019', [
    right('At Mauna Loa, CO2 averaged about 411.7 ppm in 2019.'),
    wrong('At Mauna Loa, CO2 averaged 395 ppm in 2019.', '411.7'),
  ]],
  // Lan et al., NOAA Global Monitoring Laboratory and Scripps Institution of Oceanography
  ['co2-mlo-2020', [
    right('At Mauna Loa, CO2 averaged about 414 ppm in 2020.'),
    wrong('At Mauna Loa, CO2 averaged 440 ppm in 2020.', '414'),
  ]],
  // Lan et al., NOAA Global Monitoring Laboratory and Scripps Institution of Oceanography
  ['co2-mlo-2021', [
    right('At Mauna Loa, CO2 averaged about 416.4 ppm in 2021.'),
    wrong('At Mauna Loa, CO2 averaged 398 ppm in 2021.', '416'),
  ]],
  // Lan et al., NOAA Global Monitoring Laboratory and Scripps Institution of Oceanography
  ['co2-mlo-2024', [
    right('At Mauna Loa, CO2 averaged about 424.6 ppm in 2024.'),
    wrong('At Mauna Loa, CO2 averaged 405 ppm in 2024.', '424.6'),
  ]],
  // Lan et al., NOAA Global Monitoring Laboratory and Scripps Institution of Oceanography; Scripps CO2 Program, Scripps Institution of Oceanography, UC San Diego
  ['co2-mlo-may-2020', [
    right('In May 2020 CO2 at Mauna Loa peaked at about 417.1 ppm.'),
    wrong('In May 2020, CO2 at Mauna Loa peaked at 400 ppm.', '417'),
  ]],
  // Lan et al., NOAA Global Monitoring Laboratory and Scripps Institution of Oceanography; Scripps CO2 Program, Scripps Institution of Oceanography, UC San Diego
  ['co2-mlo-may-2023', [
    right('In May 2023 CO2 at Mauna Loa peaked at about 424 ppm.'),
    wrong('In May 2023, CO2 at Mauna Loa peaked at 440 ppm.', '424'),
  ]],
  // Lan et al., NOAA Global Monitoring Laboratory, doi 10.15138/9N0H-ZH07; Lan et al., NOAA Global Monitoring Laboratory
  ['co2-growth-1970s', [
    right('In the 1970s CO2 grew by about 1.3 ppm per year.'),
    wrong('In the 1970s, CO2 grew by about 4 ppm per year.', '1.3'),
  ]],
  // Lan et al., NOAA Global Monitoring Laboratory, doi 10.15138/9N0H-ZH07
  ['co2-growth-1980s', [
    right('In the 1980s CO2 grew by about 1.6 ppm per year.'),
    wrong('In the 1980s, CO2 grew by about 0.2 ppm per year.', '1.6'),
  ]],
  // Lan et al., NOAA Global Monitoring Laboratory, doi 10.15138/9N0H-ZH07
  ['co2-growth-1990s', [
    right('In the 1990s CO2 grew by about 1.5 ppm per year.'),
    wrong('In the 1990s, CO2 grew by about 4 ppm per year.', '1.5'),
  ]],
  // Marcott et al. 2014, Nature 514, doi 10.1038/nature13799; Lan et al., NOAA Global Monitoring Laboratory, doi 10.15138/9N0H-ZH07; World Meteorological Organization 2025-10-15, World Meteorological Organization
  ['co2-modern-vs-abrupt-step-ratio', [
    right('CO2 is rising about 30 times faster than during the most abrupt deglacial jumps.'),
    wrong('CO2 is rising about 500 times faster than during the abrupt deglacial steps.', ['15', '70']),
    wrong('By one estimate, CO2 is rising about 1,000 times faster than during the abrupt deglacial steps.', ['15', '70']),
  ]],
  // Lüthi et al. 2008, Nature 453, doi 10.1038/nature06949; Siegenthaler et al. 2005, Science 310, doi 10.1126/science.1120130
  ['co2-800kyr-range', [
    right('Over the past 800,000 years CO2 ranged between about 172 and 300 ppm.'),
    wrong('Over the past 800,000 years, CO2 ranged between 350 and 600 ppm.', ['172', '300']),
  ]],
  // Lüthi et al. 2008, Nature 453, doi 10.1038/nature06949; Siegenthaler et al. 2005, Science 310, doi 10.1126/science.1120130
  ['co2-glacial-interglacial-range', [
    right('Through the ice ages, the Vostok record shows CO2 between about 180 and 300 ppm.'),
    wrong('Through the ice ages, the Vostok record shows CO2 between about 100 and 600 ppm.', ['172', '300']),
  ]],
  // IPCC 2021, Climate Change 2021: The Physical Science Basis. Contribution of Working Group I to the Sixth Assessment Report of the Intergovernmental Panel on Climate Change, doi 10.1017/9781009157896.001; Lüthi et al. 2008, Nature 453, doi 10.1038/nature06949; Yan et al. 2019, Nature 574, doi 10.1038/s41586-019-1692-3
  ['co2-2019-highest-in-2-myr', [
    right('CO2 is now higher than at any time in at least 2 million years.'),
    wrong('CO2 is now higher than at any time in the last 100 years.', '2 million'),
  ]],
  // Gulev et al. 2021, Climate Change 2021: The Physical Science Basis. Contribution of Working Group I to the Sixth Assessment Report of the Intergovernmental Panel on Climate Change, doi 10.1017/9781009157896.004; Forster et al. 2021, Climate Change 2021: The Physical Science Basis. Contribution of Working Group I to the Sixth Assessment Report of the Intergovernmental Panel on Climate Change, doi 10.1017/9781009157896.009
  ['gmst-lgm-cooling-ar6', [
    right('The IPCC finds the globe was about 6 °C colder at the Last Glacial Maximum.'),
    wrong('The IPCC finds the globe was about 15 °C colder at the Last Glacial Maximum.', '6'),
    wrong('The IPCC puts global cooling at the Last Glacial Maximum at about 15 °C.', '6'),
  ]],
  // Annan & Hargreaves 2013, Climate of the Past 9, doi 10.5194/cp-9-367-2013
  ['gmst-lgm-cooling-annan2013', [
    right('In 2013 Annan and Hargreaves found the globe about 4 °C colder at the LGM.'),
    wrong('In 2013 Annan and Hargreaves found the globe about 12 °C colder at the LGM.', '4'),
  ]],
  // Osman et al. 2021, Nature 599, doi 10.1038/s41586-021-03984-4
  ['gmst-lgm-cooling-osman2021', [
    right('Osman and colleagues found the globe about 7 °C colder at the Last Glacial Maximum.'),
    right('Osman and colleagues put global cooling at the Last Glacial Maximum at about 7 °C.'),
    wrong('Osman and colleagues found the globe only 2 °C cooler during the last ice age.', '7'),
  ]],
  // Seltzer et al. 2021, Nature 593, doi 10.1038/s41586-021-03467-6
  ['land-lgm-cooling-low-latitude', [
    right('Noble gases in groundwater show low-latitude land cooled by about 6 °C at the glacial maximum.'),
    wrong('Noble gases in groundwater show low-latitude land cooled by only 1 °C at the glacial maximum.', '6'),
  ]],
  // Tierney et al. 2020, Nature 584, doi 10.1038/s41586-020-2617-x
  ['ecs-tierney2020', [
    right('Tierney and colleagues put climate sensitivity at about 3.4 °C.'),
    wrong('Tierney and colleagues put climate sensitivity at about 8 °C.', '3.4'),
  ]],
  // Chowdhry Beeman et al. 2019, Climate of the Past 15, doi 10.5194/cp-15-913-2019
  ['lag-beeman2019-t1-onset', [
    right('Beeman and colleagues found that CO2 lagged Antarctic warming by about 570 years at the start of the deglaciation.'),
    wrong('Beeman and colleagues found that CO2 lagged Antarctic warming by 3,000 years at the start of the deglaciation.', '570'),
  ]],
  // Chowdhry Beeman et al. 2019, Climate of the Past 15, doi 10.5194/cp-15-913-2019
  ['lag-beeman2019-t1-end', [
    right('Beeman and colleagues found that CO2 lagged Antarctic warming by about 500 years at the end of the deglaciation.'),
    wrong('Beeman and colleagues found that CO2 lagged Antarctic warming by 3,000 years at the end of the deglaciation.', '530'),
  ]],
  // EPICA community members 2004, Nature 429, doi 10.1038/nature02599; Past Interglacials Working Group of PAGES 2016, Reviews of Geophysics 54, doi 10.1002/2015RG000482
  ['mis11-interglacial-length', [
    right('The MIS 11 interglacial lasted about 28,000 years.'),
    wrong('The MIS 11 interglacial lasted only 3,000 years.', '28,000'),
  ]],
  // Laskar et al. 2004, Astronomy & Astrophysics 428, doi 10.1051/0004-6361:20041335; Berger 1978, Journal of the Atmospheric Sciences 35, doi 10.1175/1520-0469(1978)035<2362:LTVODI>2.0.CO;2
  ['milankovitch-long-eccentricity-period', [
    right('The long eccentricity cycle lasts about 405,000 years.'),
    wrong('The long eccentricity cycle lasts about 50,000 years.', '405,000'),
  ]],
  // Laskar et al. 2004, Astronomy & Astrophysics 428, doi 10.1051/0004-6361:20041335
  ['axial-precession-period', [
    right('Axial precession takes about 25,800 years.'),
    wrong('The precession of the equinoxes takes about 2,000 years.', '25,800'),
  ]],
  // Lambeck et al. 2014, Proceedings of the National Academy of Sciences 111, doi 10.1073/pnas.1411762111
  ['mwp-1a-timing', [
    right('Meltwater pulse 1A happened about 14,500 years ago.'),
    wrong('Meltwater pulse 1A happened about 30,000 years ago.', ['14,500', '14,000']),
  ]],
  // Lambeck et al. 2014, Proceedings of the National Academy of Sciences 111, doi 10.1073/pnas.1411762111; Lambeck et al. 2002, Nature 419, doi 10.1038/nature01089
  ['sea-level-lowstand-timing', [
    right('Sea level reached its lowest point about 21,000 years ago.'),
    wrong('Sea level reached its lowest point about 60,000 years ago.', '21,000'),
  ]],
  // Bereiter et al. 2018, Nature 553, doi 10.1038/nature25152
  ['deglacial-mean-ocean-warming', [
    right('The mean ocean warmed by about 2.6 °C across the last deglaciation.'),
    wrong('The mean ocean warmed by about 10 °C across the last deglaciation.', '2.6'),
  ]],
  // Walker et al. 2009, Journal of Quaternary Science 24, doi 10.1002/jqs.1227
  ['holocene-duration', [
    right('The Holocene has lasted about 11,700 years so far.'),
    wrong('So far the Holocene has lasted about 4,000 years.', '11,700'),
  ]],
  // Jouzel et al. 1999, Science 286, doi 10.1126/science.286.5447.2138
  ['vostok-lake-borehole-depth', [
    right('In 2012 the Vostok borehole reached the lake at about 3,769 metres.'),
    wrong('In 2012 the Vostok drill reached the lake at about 1,000 metres.', '3,770'),
  ]],
  // Jouzel et al. 1999, Science 286, doi 10.1126/science.286.5447.2138
  ['vostok-ice-thickness', [
    right('At Vostok the ice is about 3,750 metres thick.'),
    wrong('At Vostok the ice is only 500 metres thick.', '3,750'),
  ]],
  // Dansgaard et al. 1993, Nature 364, doi 10.1038/364218a0
  ['grip-record-span', [
    right('The GRIP record spans about 250,000 years.'),
    wrong('The GRIP record spans about 2 million years.', '250,000'),
  ]],
];
