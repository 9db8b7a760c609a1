/**
 * The thousand-for-million check read through structure (session 9): an ordered list's item reads
 * on from the item before (its label is no sentence, and it is no break between the two blocks), a
 * core named by its head noun alone, and a numbered glacial termination. Every sentence is our own;
 * each wrong one has a right twin in the same wording that must stay clean.
 */
import { describe, expect, it } from 'vitest';
import { checkText } from '../../src/engine.js';
import { loadPacks } from '../../src/rulepack/index.js';

const packs = await loadPacks([]);

/** The rule ids and corrections of every flag on the draft's last paragraph's lines. */
async function flagsOf(text: string, format: 'markdown' | 'text' = 'text'): Promise<{ rule: string; correction: string }[]> {
  const result = await checkText(text, { path: format === 'markdown' ? 'draft.md' : 'draft.txt', packs });
  const last = text.split('\n').length;
  return result.flags.filter((f) => f.span.start.line === last).map((f) => ({ rule: f.ruleId, correction: f.correction ?? '' }));
}

describe('an ordered list item reads on from the item before', () => {
  // EPICA Dome C reaches back about 800,000 years (Jouzel et al. 2007; Lüthi et al. 2008): "800
  // million" in the next item, told with "its" or "that core", is a thousand-for-million slip.
  const WRONG: [string, 'markdown' | 'text'][] = [
    ['1. The EPICA Dome C core was drilled on the East Antarctic plateau.\n2. Its ice spans about 800 million years.', 'markdown'],
    ['1. Our gallery shows a slice of the Dome C ice core.\n2. That core reaches back some 800 million years.', 'text'],
    ['3. The Vostok core was drilled by a Russian, French and American team.\n4. Its record runs to about 420 million years.', 'markdown'],
  ];
  const RIGHT: [string, 'markdown' | 'text'][] = [
    ['1. The EPICA Dome C core was drilled on the East Antarctic plateau.\n2. Its ice spans about 800,000 years.', 'markdown'],
    ['1. Our gallery shows a slice of the Dome C ice core.\n2. That core reaches back some 800 thousand years.', 'text'],
    // A list item about deep time keeps its millions (Antarctica's ice sheet formed about 34 million years ago, from memory).
    ['1. The EPICA Dome C core was drilled on the East Antarctic plateau.\n2. The ice sheet it was drilled from formed some 34 million years ago.', 'markdown'],
  ];
  it.each(WRONG)('flags the second item of %s', async (text, format) => {
    expect((await flagsOf(text, format)).map((f) => f.rule)).toContain('unit.age-scale');
  });
  it.each(RIGHT)('leaves clean: %s', async (text, format) => {
    expect(await flagsOf(text, format)).toEqual([]);
  });
});

describe('cores named by their head noun, and numbered terminations', () => {
  // No ice core reaches back ten million years (the oldest ice dated is about 2.7 million years old,
  // Yan et al. 2019); Termination V is about 430,000 years ago (Lüthi et al. 2008, EPICA Dome C).
  const WRONG = [
    'Antarctic cores tell us that over the last 800 million years the air never held much more than 300 ppm of CO2.',
    'The deep core from the plateau was finished in 2004. Taken whole, it holds some 800 million years of snowfall.',
    'We will push the noble-gas series back to Termination V, about 430 Ma.',
    'The dust peak at Termination IV, roughly 340 million years ago, is the strongest in the record.',
  ];
  const RIGHT = [
    'Antarctic cores tell us that over the last 800,000 years the air never held much more than 300 ppm of CO2.',
    'We will push the noble-gas series back to Termination V, about 430 ka.',
    // Other cores and deep time keep their millions (common practice).
    'Sediment cores from the Pacific floor reach back 50 million years.',
    "The Earth's core formed more than four billion years ago.",
  ];
  it.each(WRONG)('flags %s', async (text) => {
    expect((await flagsOf(text)).map((f) => f.rule)).toContain('unit.age-scale');
  });
  it.each(RIGHT)('leaves clean: %s', async (text) => {
    expect((await flagsOf(text)).map((f) => f.rule)).not.toContain('unit.age-scale');
  });
});

