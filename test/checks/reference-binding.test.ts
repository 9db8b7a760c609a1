/**
 * Reference values reached through the binder's wider reach and kept off by its precision, end to
 * end (parser, binder, reference check) on our own short passages. The source of each range is
 * named beside each case. Only `value.*` flags are read: other checks have their own tests.
 */
import { describe, expect, it } from 'vitest';
import { checkText } from '../../src/engine.js';
import { loadPacks } from '../../src/rulepack/index.js';

const packs = await loadPacks([]);

async function valueFlags(text: string): Promise<{ ruleId: string; excerpt: string }[]> {
  const result = await checkText(text, { packs, format: 'text' });
  return result.flags.filter((f) => f.ruleId.startsWith('value.')).map((f) => ({ ruleId: f.ruleId, excerpt: f.excerpt }));
}

const FLAGGED: [passage: string, ruleId: string, excerpt: string][] = [
  // LGM window 19-23 ka (Mix et al. 2001; Annan & Hargreaves 2015): "coldest point" names the LGM.
  ['The last ice age reached its coldest point about 35,000 years ago.', 'value.lgm-chronozone', 'about 35,000 years ago'],
  // End of Termination I 11.0-11.7 ka BP (Walker et al. 2009; Chowdhry Beeman et al. 2019): 13,000 BCE is about 14,950 BP.
  ['Our guide says the ice age finally ended around 13,000 BCE.', 'value.termination-1-end', 'around 13,000 BCE'],
  // Obliquity period 41 kyr (Hays et al. 1976), next to eccentricity and precession in one sentence.
  ['The shape of the orbit varies over about 100,000 years, the tilt of Earth\'s axis over a cycle of about 29,000 years, and the wobble over about 21,000 years.', 'value.milankovitch-obliquity-period', 'about 29,000 years'],
  // GRIP drilled 3,029 m (Dansgaard et al. 1996): the core is named one sentence back.
  ['The Nordfjell team worked at the GRIP camp for two seasons. They drilled down just over 2,000 metres.', 'value.grip-depth-and-span', 'just over 2,000 metres'],
  // LGM sea-level lowstand 120-135 m (Lambeck et al. 2014, PNAS 111): the LGM is named one sentence back, "at that time" refers to it.
  ["The Hollin Museum panel puts the Last Glacial Maximum at about 21,000 years ago. Global sea level at that time stood some 50 metres below today's.", 'value.lgm-sea-level-lowstand', 'some 50 metres'],
  // Mauna Loa annual mean 2022, 418.53 ppm (NOAA GML, from memory): a ppm figure at Mauna Loa is CO2 though the gas is not named.
  ['In 2022 the yearly mean at Mauna Loa, the Brackwater Almanac says, came to 412 ppm.', 'value.co2-mlo-2022', '412 ppm'],
  // End of Termination I 11.0-11.7 ka BP (Walker et al. 2009): an end told as "was over by".
  ['The Brackwater Almanac says the deglaciation was over by about 9,000 years ago.', 'value.termination-1-end', 'about 9,000 years ago'],
  // Global LGM cooling 3.6-7 K (Gulev et al. 2021, IPCC AR6 WGI ch. 2; Tierney et al. 2020): the ice age is named one sentence back.
  ['The last ice age peaked around 21,000 years ago. At its height, the global mean was some 2 °C colder than in pre-industrial times.', 'value.gmst-lgm-to-preindustrial-warming', 'some 2 °C'],
];

const QUIET: [passage: string][] = [
  // Deglacial rise 70-90 ppm, from about 190 to 265-270 ppm (Monnin et al. 2001): the endpoints are levels.
  ['Over the deglaciation CO2 rose by about 75 ppm, from about 190 ppm to about 265 ppm.'],
  // Glacial about 180-200 ppm, interglacial about 280 ppm, swings of 80-100 ppm (Lüthi et al. 2008; Fischer et al. 1999).
  ['Across the Tarn record CO2 varied between about 185 ppm in the cold glacial periods and about 280 ppm in the warm interglacials, rising by 80 to 100 ppm at each glacial termination.'],
  // 2023 to 2024 global CO2 rise about 3.5 ppm (WMO 2025): a modern annual rise, not a deglacial step.
  ['In 2024 alone, CO2 went up by about 3.5 ppm, the largest jump on record.'],
  // LGM CO2 about 190 ppm (Monnin et al. 2001) in a sentence whose temperature is compared with pre-industrial times.
  ['During the last ice age, about 21,000 years ago, the world was roughly 6 °C colder than before the industrial revolution, and CO2 was only about 190 ppm.'],
  // Orbital periods about 100, 41 and 23 kyr (Hays et al. 1976), told as a parallel list.
  ['The shape of Earth\'s orbit, the tilt of its axis and the wobble of that axis change over roughly 100,000, 41,000 and 23,000 years.'],
  // Vostok drilled 3,623 m (Vostok 5G review): the height above the lake is not the drilled depth.
  ['The Vostok drill reached 3,623 metres in January 1998, roughly 130 metres above the lake beneath the ice.'],
  // Global LGM-to-pre-industrial warming 3.6-7 K (Gulev et al. 2021) vs Antarctic 8-10 K (Jouzel et al. 2007): a figure read
  // from a named Antarctic core is the site's own; calling it global is the scope check's to explain, not the global value's.
  ['The Brackwater panel says the Vostok deuterium shows the whole planet warming by about 11 °C at each deglaciation.'],
  ['According to the Brackwater panel, the EPICA Dome C ice shows global temperature rising about 10 °C at the end of every glacial.'],
  // Methane at Mauna Loa, about 1.9 ppm in 2022 (NOAA GML, from memory): another gas never binds the CO2 value.
  ['In 2022 methane at Mauna Loa averaged about 1,910 ppb.'],
  // Start of Termination I 17-20 ka (Chowdhry Beeman et al. 2019), end 11.0-11.7 ka (Walker et al. 2009): the end date is not the start.
  ['The Brackwater deglaciation panel says it began about 18,500 years ago and was complete by about 11,300 years ago.'],
  // Deglacial CO2 rise took about 6,000-7,500 years (Monnin et al. 2001): a lag of a few centuries is not its length.
  ['In the Brackwater cores, CO2 and Antarctic temperature rose within a few centuries of each other during the deglaciation.'],
];

describe('reference values: wider reach', () => {
  it.each(FLAGGED)('%s', async (passage, ruleId, excerpt) => {
    expect(await valueFlags(passage)).toEqual([{ ruleId, excerpt }]);
  });
});

describe('reference values: no flag on correct claims the binder used to misread', () => {
  it.each(QUIET)('%s', async (passage) => {
    expect(await valueFlags(passage)).toEqual([]);
  });
});
