/**
 * Titles, by-lines and labels on a line of their own inside a paragraph (src/prose/split-sentences.ts
 * labelCuts; src/engine.ts reads a sentence's opening label lines as context for its figures and
 * leaves them out of what the reasoning checks read). Passages of our own invention.
 */
import { describe, expect, it } from 'vitest';
import { checkText } from '../../src/index.js';
import { labelCuts, splitSentences } from '../../src/prose/split-sentences.js';
import { loadPacks } from '../../src/rulepack/index.js';

const packs = await loadPacks([]);

/** The lines a passage is cut after, as their text. */
function cutLines(text: string): string[] {
  return labelCuts(text, 0, text.length).map((at) => text.slice(0, at - 1).split('\n').at(-1) as string);
}

/** The label part of each sentence of a passage. */
function labels(text: string): string[] {
  return splitSentences(text, 0).filter((s) => s.label !== undefined).map((s) => s.text.slice(0, s.label).trim());
}

async function rules(text: string, format: 'markdown' | 'text' = 'text'): Promise<string[]> {
  const result = await checkText(text, { packs, format });
  return result.flags.map((f) => f.ruleId);
}

describe('a line broken on purpose stands on its own', () => {
  it('finds titles, by-lines and panel labels over the text under them', () => {
    const abstract = 'C-12  Why the cold seas kept their carbon\nR. Okafor, T. Lind (Westfjord Marine Lab)\nA colder ocean stores more dissolved gas, and its deep water mixed less often during glacial times.';
    expect(cutLines(abstract)).toEqual(['C-12  Why the cold seas kept their carbon', 'R. Okafor, T. Lind (Westfjord Marine Lab)']);
    const panel = 'Case 4 | 2004\nDome C, East Antarctica\nThe drill team recovers ice that holds a climate record running back about 740,000 years in that first account.';
    expect(labels(panel)).toEqual(['Case 4 | 2004\nDome C, East Antarctica']);
  });

  it('keeps hard-wrapped prose whole, even when the next line opens with a proper noun', () => {
    const wrapped = [
      'The teams that drilled at the top of the ice sheet in the early nineties found',
      'Greenland swinging between cold and mild states within a few decades, and the',
      'American team two valleys over confirmed the swings in its own parallel core.',
    ].join('\n');
    expect(cutLines(wrapped)).toEqual([]);
    expect(splitSentences(wrapped, 0)).toHaveLength(1);
    expect(labels(wrapped)).toEqual([]);
  });

  it('does not cut a short line that carries its sentence on', () => {
    const carried = 'Cores from the plateau, and\nVostok above all, hold the longest gas records ever recovered from any ice sheet on Earth.';
    expect(cutLines(carried)).toEqual([]);
    const preposition = 'The oldest air sits at the bottom of\nDome C, where the ice is nearly three and a quarter kilometres thick today.';
    expect(cutLines(preposition)).toEqual([]);
  });

  it('does not cut before a line that opens in lower case', () => {
    expect(cutLines('A short line here\nand the sentence runs on across a much longer second line of the paragraph.')).toEqual([]);
  });
});

describe('a title is not part of the claim under it', () => {
  // Colder water dissolves more CO2 (solubility pump; IPCC AR6 WG1 5.1.2, from memory): the abstract
  // states one cause among several, and its title only says solubility is not all of it.
  it('reads no either-or claim across a title and the sentence under it', async () => {
    const text = 'C-12  Solubility tells only part of the story\nR. Okafor, T. Lind (Westfjord Marine Lab)\nColder seawater holds more CO2, so a cooling ocean drew some carbon down from the air.\n';
    expect(await rules(text)).not.toContain('logic.either-or-causation');
  });
});

describe('a label gives the text under it its subject and its date', () => {
  // GRIP reached bedrock at 3,029 m in 1992; its record is undisturbed only to about 110,000 years and
  // is often quoted as some 250,000 years (GRIP members 1993, Nature 364; pack value grip-record-span).
  it('binds a figure under a label that names the core', async () => {
    const wrong = '**Stop 6 | 1992**\n**GRIP, central Greenland**\nThe European team hauls up ice that reaches back some 600,000 years, the oldest in the north.\n';
    expect(await rules(wrong, 'markdown')).toContain('value.grip-record-span');
  });

  // The Pleistocene began 2.58 million years ago (ICS 2009 ratification; Gibbard et al. 2010).
  it('dates the event under a label that gives the date', async () => {
    const wrong = '**Stop 1 | about 1.2 million years ago**\n**Where the ice ages start**\nThe Pleistocene opens, and with it the long swing of ice advancing and retreating across the north.\n';
    expect(await rules(wrong, 'markdown')).toContain('value.pleistocene-base');
    const right = '**Stop 1 | about 2.6 million years ago**\n**Where the ice ages start**\nThe Pleistocene opens, and with it the long swing of ice advancing and retreating across the north.\n';
    expect(await rules(right, 'markdown')).not.toContain('value.pleistocene-base');
  });
});
