/**
 * A figure told as coming from studies that a newer view then replaces (session 10, false flags):
 * "Papers published around 1999 reported ... 800 years. More recent work ... has narrowed the gap"
 * gives an earlier view, and its flag becomes a note (lexicon `stance.view-sources`, `stance.newer`,
 * `stance.confirming`, and the `older research` forms of `stance.superseded`). A newer view that
 * agrees keeps the figure the draft's own, and words after the view (an apposition of the writer's
 * own) stay checked. Every sentence is our own.
 *
 * The Antarctic temperature-CO2 offset across the last deglaciation is a few centuries at most
 * (Pedro, Rasmussen & van Ommen 2012, Clim. Past 8, 1213-1221; Parrenin et al. 2013, Science 339,
 * 1060-1063); the older estimate of about 800 years is Monnin et al. 2001 (Science 291, 112-114).
 * The last deglaciation ended about 11,700 years ago (Walker et al. 2009, J. Quat. Sci. 24, 3-17).
 */
import { describe, expect, it } from 'vitest';
import { checkText } from '../../src/engine.js';
import { loadPacks } from '../../src/rulepack/index.js';

const packs = await loadPacks([]);

async function flagsOf(text: string): Promise<{ rule: string; level: string }[]> {
  const result = await checkText(text, { path: 'draft.txt', packs });
  return result.flags.map((f) => ({ rule: f.ruleId, level: f.level }));
}

const LAG = 'value.antarctic-co2-phasing-termination-1-consensus';

describe('an earlier view, replaced by the newer one told after it', () => {
  it.each([
    'Papers published around 1999 reported that Antarctic CO2 trailed the local warming by roughly 800 years at the end of the last ice age. More recent work with better dating has narrowed the gap to a few centuries at most.',
    'The famous 800-year lag of CO2 behind Antarctic temperature in the last deglaciation comes from older research; studies since 2012 put the two nearly in step.',
    'This lag comes from estimates published in the late 1990s, which put CO2 some 800 years behind Antarctic temperature at the end of the last ice age. Those estimates have since been revised downwards.',
  ])('is a note, not an error: %s', async (text) => {
    const flags = await flagsOf(text);
    expect(flags).toContainEqual({ rule: LAG, level: 'note' });
    expect(flags.filter((f) => f.level === 'error' || f.level === 'warning')).toEqual([]);
  });
});

describe('what stays the draft\'s own', () => {
  it.each([
    // no newer view at all
    ['Recent studies put the lag between Antarctic temperature and CO2 at about 800 years in the last deglaciation.', LAG],
    // the newer view agrees
    ['Studies put the lag between Antarctic temperature and CO2 at about 800 years in the last deglaciation. Later work confirms this.', LAG],
    // the writer's own apposition after the view: the end of the deglaciation is no part of the old study's view
    ['The 800-year figure comes from a 1999 paper on the Vostok core across the last deglaciation, a warming that ended roughly 1,200 years ago. Newer work puts the Antarctic offset at a few centuries.', 'value.termination-1-end'],
  ])('flags %s', async (text, rule) => {
    const flags = await flagsOf(text);
    expect(flags.filter((f) => f.level === 'error' || f.level === 'warning').map((f) => f.rule)).toContain(rule);
  });
});
