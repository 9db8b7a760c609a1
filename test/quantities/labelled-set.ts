/**
 * The labelled set: sentences of our own writing, set in invented scenarios (the Halden Ice
 * Gallery, the "Firn & Flux" newsletter, the Northmoor coring team), each with the quantities a
 * careful reader finds in it. Expected intervals were worked out by hand from the interval table
 * (docs/quantities.md) and the unit factors (NIST SP 811 for ft, mile, °F; BP = before AD 1950;
 * b2k = before AD 2000; Y BCE = 1949 + Y BP). Each expected quantity is
 * [text as written, low, high, dimension, canonical unit].
 */
import type { Dimension } from '../../src/types.js';

export type Expected = [text: string, low: number, high: number, dimension: Dimension, unit: string];
export interface LabelledSentence {
  sentence: string;
  expect: Expected[];
}

const d = (text: string, low: number, high: number): Expected => [text, low, high, 'duration', 'yr'];
const age = (text: string, low: number, high: number): Expected => [text, low, high, 'age', 'yr BP'];
const ppm = (text: string, low: number, high: number): Expected => [text, low, high, 'concentration', 'ppm'];
const dT = (text: string, low: number, high: number): Expected => [text, low, high, 'temperature-change', 'K'];
const T = (text: string, low: number, high: number): Expected => [text, low, high, 'temperature', 'degC'];
const m = (text: string, low: number, high: number): Expected => [text, low, high, 'length', 'm'];
const cRate = (text: string, low: number, high: number): Expected => [text, low, high, 'concentration-rate', 'ppm/yr'];
const tRate = (text: string, low: number, high: number): Expected => [text, low, high, 'temperature-rate', 'K/yr'];
const n = (text: string, low: number, high: number): Expected => [text, low, high, 'count', 'count'];
const r = (text: string, low: number, high: number): Expected => [text, low, high, 'ratio', 'ratio'];
const pc = (text: string, low: number, high: number): Expected => [text, low, high, 'percent', '%'];
const num = (text: string, low: number, high: number): Expected => [text, low, high, 'number', 'number'];
const s = (sentence: string, ...expect: Expected[]): LabelledSentence => ({ sentence, expect });

/** The labelled sentences. */
export const LABELLED_SET: LabelledSentence[] = [
  // Durations
  s("The Halden Ice Gallery's centrepiece core covers 800,000 years of snowfall.", d('800,000 years', 795000, 805000)),
  s('Our newsletter once said the record spans about 800,000 years.', d('about 800,000 years', 775000, 825000)),
  s('The EPICA Dome C record reaches back roughly 800 kyr.', d('roughly 800 kyr', 775000, 825000)),
  s('A glacial cycle lasted nearly 100,000 years.', d('nearly 100,000 years', 92500, 100000)),
  s('The older cycles lasted some 41,000 years each.', d('some 41,000 years', 39475, 42525)),
  s('Interglacials typically lasted 10,000 to 30,000 years.', d('10,000 to 30,000 years', 10000, 30000)),
  s('The Holocene has lasted more than 11,000 years.', d('more than 11,000 years', 11000, 16500)),
  s("Greenland's deepest ice holds at least 100 kyr of layers.", d('at least 100 kyr', 100000, 200000)),
  s('The warming took a few centuries in some places.', d('a few centuries', 200, 500)),
  s('The ice sheets grew over several millennia.', d('several millennia', 3000, 7000)),
  s('Thousands of years of snow are packed into each metre.', d('Thousands of years', 2000, 10000)),
  s('Those layers took tens of thousands of years to form.', d('tens of thousands of years', 20000, 100000)),
  s("The 1.5 million year record is the museum's next goal.", d('1.5 million year', 1450000, 1550000)),
  s('The Allan Hills blue ice yielded ice about 2 million years old.', d('about 2 million years', 1450000, 2550000)),
  s('Each layer represents one year of snowfall.', d('one year', 0.5, 1.5)),
  s('The deglaciation took about 7,000 years.', d('about 7,000 years', 6775, 7225)),
  s('It took decades, not centuries, to change.'),
  s('The tour lasts 45 minutes.', num('45', 44.5, 45.5)),
  s('The Dome Fuji team drilled for 3 decades.', d('3 decades', 25, 35)),
  s('Sea level rose for roughly a dozen millennia.', d('roughly a dozen millennia', 11200, 12800)),
  s('The warm spell lasted 1,500 years or so.', d('1,500 years or so', 1412.5, 1587.5)),
  s('A 100-kyr rhythm dominates the late record.', d('100-kyr', 95000, 105000)),
  s('Cycles of 41 ka dominated before the shift.', d('41 ka', 40500, 41500)),
  s('Each cycle lasted 8e4 to 1.2e5 years.', d('8e4 to 1.2e5 years', 80000, 120000)),
  // Ages
  s('The Last Glacial Maximum peaked about 21,000 years ago.', age('about 21,000 years ago', 19975, 22025)),
  s('The Younger Dryas ended 11,700 years ago.', age('11,700 years ago', 11650, 11750)),
  s('Our panel dates the peak to 21 ka.', age('21 ka', 20500, 21500)),
  s('The Holocene began 11.7 ka b2k.', age('11.7 ka b2k', 11600, 11700)),
  s('Ice from 130,000 years BP records the last interglacial.', age('130,000 years BP', 125000, 135000)),
  s('The sample dates to 14,700 cal yr BP.', age('14,700 cal yr BP', 14650, 14750)),
  s('The first farms appeared around 9500 BCE.', age('around 9500 BCE', 11112.775, 11785.225)),
  s('Pyramids rose around 2500 BC, long after the ice retreated.', age('around 2500 BC', 4287.775, 4610.225)),
  s('CO2 began its modern climb in 1750.', age('1750', 199.5, 200.5)),
  s('By 2019 the level had passed 410 ppm.', age('2019', -69.5, -68.5), ppm('410 ppm', 405, 415)),
  s('The gallery opened in AD 1998.', age('AD 1998', -48.5, -47.5)),
  s('Sampling began in 1957 CE at the South Pole.', age('1957 CE', -7.5, -6.5)),
  s('The ice at 2,000 m is about 140,000 years old.', m('2,000 m', 1950, 2050), d('about 140,000 years', 131500, 148500)),
  s('Between 20 and 18 ka the ice sheets stood at their largest.', age('Between 20 and 18 ka', 18000, 20000)),
  s('Termination II happened about 130 ka.', age('about 130 ka', 121750, 138250)),
  s('The mid-Pleistocene transition came roughly 1.2 Ma.', age('roughly 1.2 Ma', 1120000, 1280000)),
  s('Mammoths lived on Wrangel Island until 4,000 years ago.', age('4,000 years ago', 3950, 4050)),
  s('The drill reached ice 2.6 million years old.', d('2.6 million years', 2550000, 2650000)),
  s('The glacial inception began 115,000 years ago.', age('115,000 years ago', 114500, 115500)),
  s('A volcanic layer from 74 ka marks the Toba eruption.', age('74 ka', 73500, 74500)),
  s('The Laacher See eruption left ash 12,900 years before present.', age('12,900 years before present', 12850, 12950)),
  // "before the present" is the same age as "before present" (common practice), never a span of years.
  s('The cold spell set in 12,900 years before the present and held for 1,200 years.', age('12,900 years before the present', 12850, 12950), d('1,200 years', 1150, 1250)),
  s('Ash from 74 ka before the present marks the eruption.', age('74 ka before the present', 73500, 74500)),
  s('Dates given as 12,850 b2k appear in the Greenland tables.', age('12,850 b2k', 12795, 12805)),
  s('The sea began to rise after 19 kyr BP.', age('19 kyr BP', 18500, 19500)),
  s('Since 1958 the Mauna Loa record has grown each year.', age('1958', -8.5, -7.5)),
  s('The event occurred more than 800,000 years ago.', age('more than 800,000 years ago', 800000, 1200000)),
  s('The old ice is at least 1 Ma.', age('at least 1 Ma', 1000000, 2000000)),
  // Concentrations
  s('Glacial CO2 fell to about 180 ppm.', ppm('about 180 ppm', 170.5, 189.5)),
  s('Interglacial peaks reached 280 to 300 ppm.', ppm('280 to 300 ppm', 280, 300)),
  s('Levels stayed between 180 and 300 ppmv for 800,000 years.', ppm('between 180 and 300 ppmv', 180, 300), d('800,000 years', 795000, 805000)),
  s('Today CO2 exceeds 420 ppm.', ppm('420 ppm', 415, 425)),
  s("Today's air holds more than 420 ppm of CO2.", ppm('more than 420 ppm', 420, 630)),
  s('Methane peaked near 700 ppb in warm times.', ppm('700 ppb', 0.695, 0.705)),
  s('Modern methane stands at roughly 1,900 ppb.', ppm('roughly 1,900 ppb', 1.8025, 1.9975)),
  s('The panel quotes 280 parts per million for 1750.', ppm('280 parts per million', 275, 285), age('1750', 199.5, 200.5)),
  s('CO2 was near 190 ppm at the glacial maximum.', ppm('190 ppm', 185, 195)),
  s('The rise of 100 ppm ended the ice age.', ppm('100 ppm', 95, 105)),
  s('A jump of about 10 ppm marks each warm event.', ppm('about 10 ppm', 9.25, 10.75)),
  s('CO2 is 0.04 percent of the air.', pc('0.04 percent', 0.035, 0.045)),
  s('That is about 0.04% of the atmosphere.', pc('about 0.04%', 0.034, 0.046)),
  s('Values of 170–300 ppm bracket the whole record.', ppm('170–300 ppm', 170, 300)),
  s('Nitrous oxide sat at 200 to 280 ppb.', ppm('200 to 280 ppb', 0.2, 0.28)),
  s('The 2019 annual mean was 411 ppm.', num('2019', 2018.5, 2019.5), ppm('411 ppm', 410.5, 411.5)),
  s('CO2 climbed by up to 20 ppm in some intervals.', ppm('up to 20 ppm', 10, 20)),
  s('At least 80 ppm separates glacial and interglacial air.', ppm('At least 80 ppm', 80, 160)),
  s('Some 2,500 ppm filled the Eocene air.', ppm('Some 2,500 ppm', 2387.5, 2612.5)),
  s('Less than 300 ppm was normal before industry.', ppm('Less than 300 ppm', 0, 300)),
  s('Just over 400 ppm was first logged at the station in 2013.', ppm('Just over 400 ppm', 400, 415), age('2013', -63.5, -62.5)),
  s('The record low was just under 175 ppm.', ppm('just under 175 ppm', 170.125, 175)),
  s('CO2 was c. 280 ppm for millennia.', ppm('c. 280 ppm', 268, 292)),
  s('We rounded 278.6 ppm to 280 ppm on the panel.', ppm('278.6 ppm', 278.55, 278.65), ppm('280 ppm', 275, 285)),
  s('The air is ~420 ppm CO2.', ppm('~420 ppm', 404.5, 435.5)),
  // Temperatures
  s('Antarctica was 8 °C colder at the glacial maximum.', dT('8 °C', 7.5, 8.5)),
  s('Global temperatures were about 6 °C lower.', dT('about 6 °C', 5.35, 6.65)),
  s('The air at Vostok averages -55 °C.', T('-55 °C', -55.5, -54.5)),
  s('Winter air there falls to −80 °C.', T('−80 °C', -80.5, -79.5)),
  s('The world warmed by 1.1 °C since 1850.', dT('1.1 °C', 1.05, 1.15), age('1850', 99.5, 100.5)),
  s('A warming of 4 to 7 °C ended the ice age.', dT('4 to 7 °C', 4, 7)),
  s('Greenland swung by up to 15 °C in decades.', dT('up to 15 °C', 7.5, 15)),
  s('The shift was 10 K in under a century.', dT('10 K', 9.5, 10.5)),
  s('A 5 °F rise equals a small fraction of glacial change.', dT('5 °F', 2.5, 5.5 * (5 / 9))),
  s('Summer air on the ice sheet can reach 0 °C.', T('0 °C', -0.5, 0.5)),
  s("The ice sheet's base sits at −2 °C.", T('−2 °C', -2.5, -1.5)),
  s('Ocean bottom water cooled by 2 to 3 °C.', dT('2 to 3 °C', 2, 3)),
  s('Tropical seas were 2 °C cooler.', dT('2 °C', 1.5, 2.5)),
  s('The museum keeps its cores at -25 °C.', T('-25 °C', -25.5, -24.5)),
  s('That freezer holds −13 °F.', T('−13 °F', (-13.5 - 32) * (5 / 9), (-12.5 - 32) * (5 / 9))),
  s('Warming of roughly 3 °C per century is projected in the worst case.', tRate('roughly 3 °C per century', 0.02425, 0.03575)),
  s('Deglacial warming ran at about 1 °C per millennium.', tRate('about 1 °C per millennium', 0.000475, 0.001525)),
  s('A rise of 0.2 K per decade is now measured.', tRate('0.2 K per decade', 0.015, 0.025)),
  s('Glacial Antarctica was 9 ± 1 °C colder.', dT('9 ± 1 °C', 8, 10)),
  s('Temperatures of −30 °C keep the firn dry.', T('−30 °C', -30.5, -29.5)),
  s('The air there was -40 °C, or -40 °F.', T('-40 °C', -40.5, -39.5), T('-40 °F', (-40.5 - 32) * (5 / 9), (-39.5 - 32) * (5 / 9))),
  s('A swing of nearly 10 °C shook Greenland.', dT('nearly 10 °C', 9.25, 10)),
  s('Warming of more than 2 °C worries the curators.', dT('more than 2 °C', 2, 3)),
  s('The anomaly reached 0.8 K.', dT('0.8 K', 0.75, 0.85)),
  s('Ice melts at 273.15 K.', T('273.15 K', -0.005, 0.005)),
  // Lengths
  s('The Dome C core is 3,270 m long.', m('3,270 m', 3265, 3275)),
  s('The drill went down 3,200 metres.', m('3,200 metres', 3150, 3250)),
  s('Ice there is about 3 km thick.', m('about 3 km', 2425, 3575)),
  s('The core went 10,700 feet deep.', m('10,700 feet', 10650 * 0.3048, 10750 * 0.3048)),
  s('Our display case holds 2 m of ice.', m('2 m', 1.5, 2.5)),
  s('The ice sheet stood 2 miles high over Chicago.', m('2 miles', 1.5 * 1609.344, 2.5 * 1609.344)),
  s('Sea level was 120 m lower.', m('120 m', 115, 125)),
  s("Sea level was some 120 to 130 metres below today's.", m('some 120 to 130 metres', 116.875, 133.125)),
  s('The firn layer is 50 to 100 m deep.', m('50 to 100 m', 50, 100)),
  s('Bubbles close off at about 70 m depth.', m('about 70 m', 67.75, 72.25)),
  s('Each metre of the core holds decades of snow.'),
  s('A 3,000-metre core took eight seasons to drill.', m('3,000-metre', 2950, 3050)),
  s('Buried under 3,000 m of ice, the lake stays liquid.', m('3,000 m', 2950, 3050)),
  s('The ice flows 10 m per year.', m('10 m', 9.5, 10.5)),
  s('The sheet thinned by 1.5 km.', m('1.5 km', 1450, 1550)),
  // Rates
  s('CO2 now rises about 2.5 ppm per year.', cRate('about 2.5 ppm per year', 2.3875, 2.6125)),
  s('Deglacial CO2 rose 0.01 ppm/yr on average.', cRate('0.01 ppm/yr', 0.005, 0.015)),
  s('That is 10 ppm per thousand years.', cRate('10 ppm per thousand years', 0.0095, 0.0105)),
  s('Methane climbed 8 ppb a year in the 1980s.', cRate('8 ppb a year', 0.0075, 0.0085)),
  s('A pace of 1 ppm per decade was typical of the Holocene.', cRate('1 ppm per decade', 0.05, 0.15)),
  s('Warming reached 0.2 °C per decade.', tRate('0.2 °C per decade', 0.015, 0.025)),
  s('Ice ages ended at up to 1 °C per century.', tRate('up to 1 °C per century', 0.005, 0.01)),
  s('Glacial cooling crept along at 0.1 K per kyr.', tRate('0.1 K per kyr', 0.00005, 0.00015)),
  s('CO2 grew 2 ppm yr⁻¹ in the last decade.', cRate('2 ppm yr⁻¹', 1.5, 2.5)),
  s('Sea ice shrank 13 percent per decade.', pc('13 percent', 12.5, 13.5)),
  // Counts, ratios, percentages
  s('The core records eight glacial cycles.', n('eight glacial cycles', 7.5, 8.5)),
  s('There have been about 50 ice ages in 2.6 million years.', n('about 50 ice ages', 48.25, 51.75), d('2.6 million years', 2550000, 2650000)),
  s('Eleven interglacials appear in the Dome C ice.', n('Eleven interglacials', 10.5, 11.5)),
  s('CO2 has more than doubled since the ice age.', r('more than doubled', 2, 3)),
  s('Methane tripled after 1750.', r('tripled', 2.85, 3.15), age('1750', 199.5, 200.5)),
  s('The rise was three times faster than before.', r('three times', 2.85, 3.15)),
  s('The swing was 2.5-fold larger in Antarctica.', r('2.5-fold', 2.45, 2.55)),
  s("Today's rate is roughly 100 times the deglacial one.", r('roughly 100 times', 92.5, 107.5)),
  s('Some posts claim CO2 now climbs 1,000 times faster than at any time before.', r('1,000 times', 950, 1050)),
  s('CO2 is up about 50 percent since 1750.', pc('about 50 percent', 48.25, 51.75), age('1750', 199.5, 200.5)),
  s('Half of that rise came after 1980.', r('Half', 0.475, 0.525), age('1980', -30.5, -29.5)),
  s('The ice lost a third of its volume.', r('a third', 0.95 / 3, 1.05 / 3)),
  s('A 40% rise in CO2 is well documented.', pc('40%', 39.5, 40.5)),
  s('Dust rose twentyfold in glacial times.', r('twentyfold', 19, 21)),
  s('Only a quarter of visitors read the panel.', r('a quarter', 0.2375, 0.2625)),
  s('Methane roughly doubled at each warming.', r('roughly doubled', 1.85, 2.15)),
  // Sentences with no quantity, labels, pairs, forms
  s('Ice cores trap ancient air in tiny bubbles.'),
  s('CO2 and temperature moved together.'),
  s('See Figure 3 and MIS 11 for details.'),
  s('The 1990s saw the first deep Antarctic cores.'),
  s('Marine Isotope Stage 5e was warmer than today.'),
  s('The δ18O record from core GISP2 shows the change.'),
  s('CO2 rose from 180 to 280 ppm.', ppm('180', 175, 185), ppm('280 ppm', 275, 285)),
  s('Temperatures fell from 15 °C to 9 °C.', T('15 °C', 14.5, 15.5), T('9 °C', 8.5, 9.5)),
  s('The deglaciation ran from 18,000 to 11,700 years ago.', age('18,000', 17500, 18500), age('11,700 years ago', 11650, 11750)),
  s('From 1750 to 2019 CO2 climbed steadily.', age('1750', 199.5, 200.5), age('2019', -69.5, -68.5)),
  s('A drop from 280 ppm to 180 ppm took 10,000 years.', ppm('280 ppm', 275, 285), ppm('180 ppm', 175, 185), d('10,000 years', 9500, 10500)),
  s('Eight hundred thousand years of air sit in the freezer.', d('Eight hundred thousand years', 795000, 805000)),
  s('Half a million years ago the ice was thinner.', age('Half a million years ago', 495000, 505000)),
  s('Scientists estimate 8 × 10^5 years for the record.', d('8 × 10^5 years', 750000, 850000)),
  s('The record spans 8.0 × 10^5 years.', d('8.0 × 10^5 years', 795000, 805000)),
  s('It holds 1,000,000 snowflakes per litre.', num('1,000,000', 950000, 1050000)),
  s('The ice is 800 000 years old.', d('800 000 years', 795000, 805000)),
  s('Some 420\u2009000 years are covered by Vostok.', d('Some 420\u2009000 years', 404500, 435500)),
  s('Between two and three million years ago the ice age began.', age('Between two and three million years ago', 2000000, 3000000)),
  s('CO2 varied from 180 to 300 ppm.', ppm('180 to 300 ppm', 180, 300)),
  s('The range ran 7-8 thousand years.', d('7-8 thousand years', 7000, 8000)),
  s('Temperatures were 4–7 °C lower globally.', dT('4–7 °C', 4, 7)),
  s('Ice cores show CO2 at 280 ppm in 1750 and 410 ppm in 2019.', ppm('280 ppm', 275, 285), age('1750', 199.5, 200.5), ppm('410 ppm', 405, 415), age('2019', -69.5, -68.5)),
  s('A 5 °C (9 °F) warming is glacial-scale.', dT('5 °C', 4.5, 5.5), dT('9 °F', 8.5 * (5 / 9), 9.5 * (5 / 9))),
  s('The pack says 8,000 years, i.e. 8 kyr.', d('8,000 years', 7950, 8050), d('8 kyr', 7500, 8500)),
  // The far end of a from-to pair may carry its own hedge; the near end still takes its unit.
  s('At Halden the panel says CO2 went from about 185 to about 290 ppm.', ppm('about 185', 179.875, 190.125), ppm('about 290 ppm', 277.75, 302.25)),
  s('The Northmoor log has CO2 going from 190 to nearly 300 ppm.', ppm('190', 185, 195), ppm('nearly 300 ppm', 287.5, 300)),
  // A calendar year is a date, not the low end of a ppm range: "in 1850 to 300 ppm" is two things.
  // A °F figure after "that is" or "which is" is a difference when its partner is (NIST SP 811: °F interval = 5/9 K).
  s('The Halden guide puts the ice-age world about 6 °C colder than before industry, that is, roughly 43 °F colder.', dT('about 6 °C', 5.35, 6.65), dT('roughly 43 °F', 23.013888889, 24.763888889)),
  s('The tropics cooled by 3 °C, which is 5.4 °F.', dT('3 °C', 2.5, 3.5), dT('5.4 °F', (5.35 * 5) / 9, (5.45 * 5) / 9)),
  s('Firn & Flux charts CO2 from 285 ppm in 1850 to 300 ppm in 1910.', ppm('285 ppm', 284.5, 285.5), age('1850', 99.5, 100.5), ppm('300 ppm', 295, 305), age('1910', 39.5, 40.5)),
];
