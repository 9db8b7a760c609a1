/**
 * A value told as a range whose events an editor names by one date carries that date in its
 * correction, before or beside the range (rules/paleoclimate.yaml: mid-pleistocene-transition,
 * lgm-ice-sheet-maximum, last-interglacial). Sentences of our own, read by the whole engine.
 */
import { describe, expect, it } from 'vitest';
import { checkText } from '../../src/engine.js';

const correctionOf = async (text: string, rule: string): Promise<string | undefined> =>
  (await checkText(text, { path: 'draft.md' })).flags.find((f) => f.ruleId === rule)?.correction;

describe('a range value carries the date an editor names it by', () => {
  // Clark et al. (2006, Quaternary Science Reviews 25:3150-3184): the Mid-Pleistocene Transition ran
  // from about 1.25 million to 700,000 years ago, about a million years ago (from memory).
  it('the Mid-Pleistocene Transition: about 1 million years ago', async () => {
    const said = await correctionOf('Ocean sediments show the glacial rhythm slowing. The Mid-Pleistocene Transition took place some 3 million years ago.', 'value.mid-pleistocene-transition');
    expect(said).toContain('about 1 million years ago');
    expect(said).toContain('1.25 million');
  });
  // Clark et al. (2009, Science 325:710-714): ice sheets near their maximum 26,500 to 19,000 years ago;
  // the LGM's usual date, about 21,000 years ago (PMIP; from memory).
  it('the ice sheets at their Last Glacial Maximum: about 21,000 years ago', async () => {
    const said = await correctionOf('The great northern ice sheets reached their Last Glacial Maximum about 60,000 years ago.', 'value.lgm-ice-sheet-maximum');
    expect(said).toContain('21,000 years ago');
    expect(said).toContain('26,500');
  });
  // Kopp et al. (2009, Nature 462:863-867): the last interglacial, about 130,000 to 115,000 years ago,
  // warmest about 125,000 years ago (from memory).
  it('the last interglacial: about 125,000 years ago', async () => {
    const said = await correctionOf('Hippos swam in the Thames during the last interglacial, roughly 300,000 years ago.', 'value.last-interglacial');
    expect(said).toContain('125,000 years ago');
    expect(said).toContain('130,000 to 115,000');
  });
});
