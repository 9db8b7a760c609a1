/**
 * What the binder derives instead of a list someone wrote out: a unit that names its quantity ("°C"
 * is a temperature), every inflection of a pack term's words ("rise" → "rising", "borehole" →
 * "boreholes"), and the span a quantity moved over read as its levels ("swung between 180 and 300
 * ppm"). Sentences of our own, each checked end to end; the published value each row rests on is
 * named beside it.
 */
import { describe, expect, it } from 'vitest';
import { checkText } from '../../src/engine.js';
import { findTerms } from '../../src/claims/bind.js';
import { loadPacks } from '../../src/rulepack/index.js';

const packs = await loadPacks([]);

/** The rule ids flagged on a one-paragraph draft. */
async function flagged(text: string): Promise<string[]> {
  const result = await checkText(text, { packs, path: 'draft.md' });
  return result.flags.map((f) => f.ruleId);
}

describe('a figure in degrees names a temperature without the word', () => {
  // Global mean cooling at the LGM: about 6 °C, estimates from about 4 to 7 °C (Tierney et al. 2020,
  // Nature 584, 569-573, DOI 10.1038/s41586-020-2617-x; Annan et al. 2022, Clim. Past 18, 1883, DOI 10.5194/cp-18-1883-2022).
  it('flags a global mean told only in °C that is far too small', async () => {
    expect(await flagged('At the Last Glacial Maximum the world was on average only about 2 °C below pre-industrial.')).toContain('value.gmst-lgm-to-preindustrial-warming');
    expect(await flagged('The global mean was just 1 to 2 °C lower at the peak of the last ice age.')).toContain('value.gmst-lgm-to-preindustrial-warming');
  });
  it('leaves the published figure, and a site figure, alone', async () => {
    expect(await flagged('At the Last Glacial Maximum the global mean was about 6 °C below pre-industrial.')).toEqual([]);
    // A figure at one Antarctic site is that site's own, not the global mean's (the pack's veto).
    expect(await flagged('At Dome C the glacial maximum was about 9 °C below the Holocene.')).not.toContain('value.gmst-lgm-to-preindustrial-warming');
  });
});

describe("a pack term's words in every inflection", () => {
  it('finds the forms the pack did not write out', () => {
    // The pack lists "jump", "borehole" and "rhythm"; drafts write "jumping", "boreholes", "rhythms".
    expect(findTerms('CO2 kept jumping', packs).has('change')).toBe(true);
    expect(findTerms('the two boreholes', packs).has('depth')).toBe(true);
    expect(findTerms('its rhythms', packs).has('recur')).toBe(true);
    // Symbols, numbers and written-out forms stay as written: "CO2" gives no "CO2s", "1750" no "1750s".
    expect(findTerms('the 1750s', packs).has('preindustrial')).toBe(false);
  });
  // The glacial-interglacial CO2 rise: 80-100 ppm per termination over the last four cycles
  // (Fischer et al. 1999, Science 283, 1712-1714, DOI 10.1126/science.283.5408.1712; Siegenthaler et al. 2005).
  it('binds a swing told with a derived form to the glacial-interglacial rise', async () => {
    expect(await flagged('In the warm interglacials CO2 sat near 280 ppm, rising by only 30 ppm from each cold phase.')).toContain('value.co2-glacial-interglacial-amplitude');
    expect(await flagged('In the warm interglacials CO2 sat near 280 ppm, rising by 80 to 100 ppm from each cold phase.')).toEqual([]);
  });
});

describe('the span a quantity moved over is its levels', () => {
  // 800,000 years of CO2 between about 172 and 300 ppm (Lüthi et al. 2008, Nature 453, 379-382, DOI 10.1038/nature06949).
  it('never reads "between A and B" after a verb of change as the size of the change', async () => {
    expect(await flagged('Over eight glacial cycles, CO2 swung between roughly 180 and 300 parts per million.')).toEqual([]);
    expect(await flagged('Over eight glacial cycles, CO2 rose and fell between roughly 180 and 300 parts per million.')).toEqual([]);
  });
  it('still reads "by between A and B" as a change', async () => {
    expect(await flagged('At each glacial termination CO2 rose by between 30 and 40 ppm.')).toContain('value.co2-deglacial-rise-magnitude');
  });
});

describe("Earth's orbit named as the pacemaker", () => {
  // Orbital periods of about 100,000, 41,000 and 23,000 years (Hays, Imbrie & Shackleton 1976, Science
  // 194, 1121-1132, DOI 10.1126/science.194.4270.1121): periods told beside the orbit are the orbit's.
  it('does not read periods beside the orbit as the length of the ice-age cycle', async () => {
    expect(await flagged("Ice ages came and went, keeping time with slow changes in Earth's orbit, with rhythms near 100,000, 41,000 and 23,000 years.")).toEqual([]);
  });
});

describe('a block reads on from the block before it and from its heading', () => {
  // Vostok's record spans about 420,000 years (Petit et al. 1999, Nature 399, 429-436, DOI 10.1038/20859).
  it('gives a list item the subject of the item before', async () => {
    expect(await flagged('- The Vostok core in East Antarctica was drilled to 3,623 m.\n- Its climate record covers about the last 800,000 years.')).toContain('value.vostok-record-span');
    expect(await flagged('- The Vostok core in East Antarctica was drilled to 3,623 m.\n- Its climate record covers about the last 420,000 years.')).toEqual([]);
  });
  // The Younger Dryas: about 12,900 to 11,700 years ago, some 1,200 years (Rasmussen et al. 2006,
  // J. Geophys. Res. 111, D06102, DOI 10.1029/2005JD006079).
  it("gives a section's first sentence the subject its heading names", async () => {
    expect(await flagged('### What was the Younger Dryas?\n\nA cold snap centred on the North Atlantic, it lasted about 3,000 years.')).toContain('value.younger-dryas-duration');
    expect(await flagged('### What was the Younger Dryas?\n\nA cold snap centred on the North Atlantic, it lasted about 1,200 years.')).toEqual([]);
  });
  it('takes only the subject from a heading that states a myth, never its claim', async () => {
    // The heading's "now" would make the range a present-day level.
    expect(await flagged('## Myth: CO2 was as high in the past as it is now\n\nAcross those 800 millennia, carbon dioxide wandered between about 172 and 300 ppm.')).not.toContain('value.co2-present-day');
  });
  it('never carries a subject from a post before into a sentence that names none', async () => {
    expect(await flagged('**1/9** ok, a thread on the last deglaciation.\n\n**2/9** housekeeping: I have been doing these threads for 3 years.')).toEqual([]);
  });
  // EPICA Dome C holds the longest continuous record, about 800,000 years (Jouzel et al. 2007, Science
  // 317, 793-796, DOI 10.1126/science.1141038); Vostok's about 420,000 (Petit et al. 1999).
  it('takes an attribute from the sentence before together with what that sentence rules out', async () => {
    expect(await flagged('The longest continuous ice-core record comes from Dome C and reaches about 800,000 years. Vostok got us to 420,000 years back in 1999.')).toEqual([]);
  });
  // Sea level at the LGM: about 120-130 m below today (Lambeck et al. 2014, PNAS 111, 15296, DOI 10.1073/pnas.1411762111).
  it('never gives a part of a change the value of the whole one sentence back', async () => {
    expect(await flagged('- At the glacial maximum, the oceans stood about 120 metres below their present level.\n- About 80 metres of that rise came between 19,000 and 11,000 years ago.')).toEqual([]);
  });
});
