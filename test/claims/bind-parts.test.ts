/**
 * A part of a whole (src/claims/bind-part.ts) and a bare year beside a measured number
 * (src/claims/elided-units.ts). Sentences of our own, read by the real parser and binder.
 */
import { describe, expect, it } from 'vitest';
import { bindQuantities } from '../../src/claims/bind.js';
import { restoreElidedUnits } from '../../src/claims/elided-units.js';
import { parseQuantities } from '../../src/quantities/index.js';
import { loadPacks } from '../../src/rulepack/index.js';

const packs = await loadPacks([]);

/** What each quantity of `sentence` binds: its text → reference id, '?' when ambiguous, '-' when none. */
function read(sentence: string): Record<string, string> {
  const quantities = restoreElidedUnits(sentence, parseQuantities(sentence));
  const { bindings, ambiguous } = bindQuantities(sentence, quantities, packs);
  return Object.fromEntries(quantities.map((q, i) => [q.text, bindings.find((b) => b.quantityIndex === i)?.referenceId ?? (ambiguous.includes(i) ? '?' : '-')]));
}

function at(sentence: string, text: string): string {
  const found = read(sentence);
  if (!(text in found)) throw new Error(`no quantity "${text}" in ${JSON.stringify(found)}`);
  return found[text] as string;
}

// The deglacial CO2 rise was about 80-100 ppm (Monnin et al. 2001, doi:10.1126/science.291.5501.112);
// ocean warming alone explains only some 15-30 ppm of it (Sigman & Boyle 2000, doi:10.1038/35038000, from memory).
describe('a part of a whole', () => {
  it('does not read a share of the deglacial rise as the whole rise', () => {
    expect(at('Colder water releasing gas explains perhaps 25 ppm of the deglacial rise of CO2.', '25 ppm')).not.toBe('co2-deglacial-rise-magnitude');
    expect(at('Southern Ocean upwelling supplied roughly 40 ppm of that CO2 increase at the end of the ice age.', 'roughly 40 ppm')).not.toBe('co2-deglacial-rise-magnitude');
    expect(at('The deglacial rise in CO2 was large, and sea-ice retreat gave maybe 10 ppm of it.', '10 ppm')).not.toBe('co2-deglacial-rise-magnitude');
  });

  it('does not read the whole as the share its part states', () => {
    const found = read('Warming of the ocean alone gave about 20 ppm of the roughly 85 ppm deglacial rise in CO2.');
    expect(found['about 20 ppm']).toBe('deglacial-co2-from-ocean-warming');
    expect(found['roughly 85 ppm']).not.toBe('deglacial-co2-from-ocean-warming');
  });

  it('still reads the whole rise when no part is stated', () => {
    expect(at('During the deglaciation CO2 rose by about 150 ppm.', 'about 150 ppm')).toBe('co2-deglacial-rise-magnitude');
    // "of the record" names no change: a span, not a share.
    // EPICA Dome C spans about 800,000 years (Jouzel et al. 2007, doi:10.1126/science.1141038).
    expect(at('EPICA Dome C holds 600,000 years of the climate record.', '600,000 years')).toBe('edc-record-span');
  });
});

describe('a bare year beside a measured number', () => {
  // Low-latitude land cooled about 6 °C at the LGM (Seltzer et al. 2021, doi:10.1038/s41586-021-03467-6).
  it('takes no unit from its neighbour', () => {
    const s = 'Tropical land cooled by about 6 °C at the glacial maximum (Seltzer and colleagues, 2021).';
    expect(restoreElidedUnits(s, parseQuantities(s)).filter((q) => q.dimension === 'temperature-change')).toHaveLength(1);
    const t = 'The new team reached bedrock about 2.8 km down, in Jan 2025.';
    expect(restoreElidedUnits(t, parseQuantities(t)).filter((q) => q.dimension === 'length')).toHaveLength(1);
  });

  it('still gives a gapped number with a separator its neighbour\'s unit', () => {
    // Vostok about 420,000 years (Petit et al. 1999, doi:10.1038/20859); EPICA Dome C about 800,000 years (Jouzel et al. 2007).
    const s = 'Vostok covers 420,000 years, and EPICA Dome C 800,000.';
    expect(restoreElidedUnits(s, parseQuantities(s)).map((q) => q.dimension)).toEqual(['duration', 'duration']);
  });
});
