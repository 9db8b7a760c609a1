/**
 * A myth/fact layout whose label ends with a full stop ("**Myth.** CO2 lags, so ..."): the label
 * is split off as a sentence of its own, and labels the sentence after it (src/propositions/stance.ts,
 * `previous` in the stance context). A myth so labelled gets a note, not a warning; a fact so
 * labelled stays the writer's own claim and is checked as one; without a label the reasoning error
 * is flagged as before.
 *
 * The science: CO2 trailing Antarctic temperature at the start of a deglaciation does not show it
 * had no warming effect (Shakun, J. D. et al. 2012, Nature 484, 49-54; IPCC AR6 WG1 ch. 5); CO2 is
 * less soluble in warmer water (Weiss, R. F. 1974, Marine Chemistry 2, 203-215). The myth/fact
 * layout itself is common practice in explainers.
 */
import { describe, expect, it } from 'vitest';
import { checkReasoning } from '../../src/checks/reasoning/index.js';
import { loadPacks } from '../../src/rulepack/index.js';

const packs = await loadPacks([]);

/** The rule ids and levels of the flags on the paragraph's last sentence. */
function flagsOnLast(paragraph: string[]): [string, string][] {
  return checkReasoning(paragraph, paragraph.length - 1, packs).map((f) => [f.ruleId, f.level]);
}

const LAG = 'logic.lag-rules-out-cause';

describe('a bare myth label before the sentence turns its error into a note', () => {
  it.each([
    ['Myth.', 'Because carbon dioxide rose only after the Antarctic warming, it cannot have caused any of that warming.'],
    ['Misconception.', 'The gas came centuries late in the ice record, so it could not have warmed the climate.'],
    ['The claim.', 'Since CO2 lagged temperature in the cores, carbon dioxide cannot drive temperature.'],
  ])('%s %s', (label, sentence) => {
    const flags = flagsOnLast([label, sentence]);
    expect(flags.some(([id]) => id === LAG)).toBe(true);
    expect(flags.filter(([id]) => id === LAG).every(([, level]) => level === 'note')).toBe(true);
  });
});

describe('without the label, or under a fact label, the error is the writer\'s own and stays a warning', () => {
  it.each([
    [['Because carbon dioxide rose only after the Antarctic warming, it cannot have caused any of that warming.']],
    [['Fact.', 'Because carbon dioxide rose only after the Antarctic warming, it cannot have caused any of that warming.']],
    // A label needs to be the whole sentence: a longer sentence before is no label.
    [['This myth is common.', 'Because carbon dioxide rose only after the Antarctic warming, it cannot have caused any of that warming.']],
  ])('%j', (paragraph) => {
    expect(flagsOnLast(paragraph)).toContainEqual([LAG, 'warning']);
  });

  it('a fact label keeps a wrong direction flagged (Weiss 1974)', () => {
    expect(flagsOnLast(['Fact.', 'Warm seawater dissolves more carbon dioxide than cold seawater does.']).some(([id, level]) => id.startsWith('direction.') && level === 'warning')).toBe(true);
  });
});
