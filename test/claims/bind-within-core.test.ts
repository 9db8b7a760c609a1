/**
 * "Deepest" for a place within one core, not the deepest core (pack term within-core, rank check's
 * PART_OF_ONE), and one unit as the base of a rate (src/claims/bind.ts). Sentences of our own.
 */
import { describe, expect, it } from 'vitest';
import { bindQuantities } from '../../src/claims/bind.js';
import { restoreElidedUnits } from '../../src/claims/elided-units.js';
import { checkText } from '../../src/index.js';
import { parseQuantities } from '../../src/quantities/index.js';
import { loadPacks } from '../../src/rulepack/index.js';

const packs = await loadPacks([]);

function at(sentence: string, text: string): string {
  const quantities = restoreElidedUnits(sentence, parseQuantities(sentence));
  const { bindings } = bindQuantities(sentence, quantities, packs);
  const i = quantities.findIndex((q) => q.text === text);
  if (i < 0) throw new Error(`no quantity "${text}" in ${JSON.stringify(quantities.map((q) => q.text))}`);
  return bindings.find((b) => b.quantityIndex === i)?.referenceId ?? '-';
}

// Vostok 5G reached 3,623 m, the deepest ice core (Petit et al. 1999, doi:10.1038/20859); EPICA Dome C
// stopped at about 3,270 m (EPICA community members 2004, doi:10.1038/nature02599).
describe('deepest for a place within one core', () => {
  it('does not read the depth of a core\'s deepest ice or layers as the deepest core', async () => {
    expect(at('The deepest ice at EPICA Dome C lies about 3,260 metres below the surface.', 'about 3,260 metres')).not.toBe('deepest-core-misnamed');
    expect(at('In the Dome Fuji core the deepest layers sit near 3,030 metres.', '3,030 metres')).not.toBe('deepest-core-misnamed');
    expect(at('We logged each section, and the deepest one came up from about 3,000 metres.', 'about 3,000 metres')).not.toBe('deepest-ice-core');
    const result = await checkText('The deepest ice at Dome C, some 3,260 m down, is about 800,000 years old.');
    expect(result.flags.map((f) => f.ruleId)).toEqual([]);
  });

  it('still reads the deepest core as the deepest core', async () => {
    expect(at('The deepest ice core ever drilled reached about 3,270 metres.', 'about 3,270 metres')).toBe('deepest-ice-core');
    expect(at('EPICA Dome C is the deepest core, at 3,270 metres.', '3,270 metres')).toBe('deepest-core-misnamed');
  });
});

describe('one unit as the base of a rate', () => {
  // Near the bottom of EPICA Dome C a metre of ice holds several hundred years (EPICA community members 2004).
  it('binds nothing', () => {
    expect(at('Near the base of the deepest core, one metre of ice holds close to 1,000 years.', 'one metre')).toBe('-');
    expect(at('In the deepest ice core, one metre of ice can span some 2,000 years.', 'one metre')).toBe('-');
  });
});
