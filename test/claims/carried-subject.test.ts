/**
 * A subject carried along a chain of back-references (back-reference.ts, carriedContext): "That core
 * goes back 800,000 years. It records ten glacial cycles": "It" takes up "that core", which took up
 * Dome C. The science behind the rows:
 * - EPICA Dome C: eight glacial cycles (EPICA community members 2004, Nature 429, 623-628,
 *   doi 10.1038/nature02599; Lüthi et al. 2008, Nature 453, 379-382), about 800,000 years;
 * - Vostok: four glacial cycles, about 420,000 years (Petit et al. 1999, Nature 399, 429-436,
 *   doi 10.1038/20859).
 * The sentences are our own.
 */
import { describe, expect, it } from 'vitest';
import { checkText } from '../../src/engine.js';

async function valueFlags(text: string): Promise<string[]> {
  return (await checkText(text)).flags.filter((f) => f.ruleId.startsWith('value.')).map((f) => f.ruleId);
}

describe('a pronoun takes up the subject the sentence before took from further back', () => {
  it.each([
    ['Later, a European team drilled at Dome C.\nThat core goes back about 800,000 years.\nIt records ten glacial cycles, one after another.', 'value.edc-glacial-cycles'],
    ['Our next stop is the Dome C drill site.\nThat core reached bedrock in 2004.\nIts ice holds twelve full glacial cycles.', 'value.edc-glacial-cycles'],
    ['The Russians drilled at Vostok station.\nThe core reached 3,623 metres.\nAnd it preserves eight complete glacial cycles.', 'value.vostok-glacial-cycles'],
  ])('%j → %s', async (text, ruleId) => {
    expect(await valueFlags(text)).toEqual([ruleId]);
  });

  it.each([
    // The right counts, through the same chains.
    'Later, a European team drilled at Dome C.\nThat core goes back about 800,000 years.\nIt records eight glacial cycles, one after another.',
    'The Russians drilled at Vostok station.\nThe core reached 3,623 metres.\nAnd it preserves four complete glacial cycles.',
    // A pronoun late in the sentence takes up a nearer noun, not the core carried from before.
    'The European core at Dome C goes back about 800,000 years.\nThe bottom of that core is the oldest part.\nBubbles are younger than the snow around them, since the firn stays open until it lies some 50 to 100 metres deep.',
    // A sentence that names its own subject carries nothing from before it.
    'Later, a European team drilled at Dome C.\nThat core goes back about 800,000 years.\nVostok, the older core, holds four glacial cycles.',
  ])('%j stays clean', async (text) => {
    expect(await valueFlags(text)).toEqual([]);
  });
});

// The Younger Dryas lasted about 1,200 years, from about 12,900 to 11,700 years ago (Rasmussen et al.
// 2006, J. Geophys. Res. 111, D06102, doi 10.1029/2005JD006079).
describe('a chat line carries its subject past the time stamp and speaker that open it', () => {
  it('reads "it" after a speaker label as the pronoun that opens the line', async () => {
    const chat = '[3 Mar, 20:01] Ferg: my bit of the poster is the younger dryas. it kicked off about 12,900 years ago\n[3 Mar, 20:02] Ferg: it lasted about 4,000 years in the end';
    expect(await valueFlags(chat)).toEqual(['value.younger-dryas-duration']);
  });

  it('reads it in prose with no label too, and passes the right figure', async () => {
    expect(await valueFlags('Our poster covers the Younger Dryas. It kicked off about 12,900 years ago. It lasted about 4,000 years.')).toEqual(['value.younger-dryas-duration']);
    expect(await valueFlags('[3 Mar, 20:01] Ferg: my bit of the poster is the younger dryas. it kicked off about 12,900 years ago\n[3 Mar, 20:02] Ferg: it lasted about 1,200 years in the end')).toEqual([]);
  });
});
