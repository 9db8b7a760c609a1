/**
 * Terms that name another subject held up for comparison neither bind nor veto
 * (src/claims/bind-others.ts). Sentences are our own; the quantities come from the real parser.
 */
import { describe, expect, it } from 'vitest';
import { bindQuantities, findTerms } from '../../src/claims/bind.js';
import { withoutOthers } from '../../src/claims/bind-others.js';
import { parseQuantities } from '../../src/quantities/index.js';
import { loadPacks } from '../../src/rulepack/index.js';

const packs = await loadPacks([]);

function bound(sentence: string): string[] {
  const quantities = parseQuantities(sentence);
  const { bindings } = bindQuantities(sentence, quantities, packs);
  return quantities.map((_, i) => bindings.find((b) => b.quantityIndex === i)?.referenceId ?? '-');
}

const ROWS: [sentence: string, expected: string[]][] = [
  // The site is not named in the packs: "other East Antarctic records" is the comparison, not the subject.
  ['The Tallow Ridge isotope record shows a local warming of about 9 °C across the deglaciation, comparable to other East Antarctic records.', ['-']],
  // "Unlike Vostok" sets Vostok aside: the span is EPICA Dome C's (Jouzel et al. 2007: about 800,000 years).
  ['Unlike Vostok, the EPICA Dome C record reaches back 800,000 years.', ['edc-record-span']],
  // Named as the subject, East Antarctica still binds (Buizert et al. 2021: East Antarctic LGM cooling about 4-7 °C).
  ['East Antarctica warmed by about 6 °C across the deglaciation.', ['east-antarctic-lgm-cooling-buizert2021']],
  // The standard of a rank is another subject: the span is Dome Fuji's, not Dome C's (Dome Fuji
  // Ice Core Project Members 2017: about 720,000 years; Jouzel et al. 2007: Dome C about 800,000).
  ['The Dome Fuji record, the second-longest from Antarctica after Dome C, reaches back about 720,000 years.', ['dome-fuji-record-span']],
  ['Dome Fuji holds a record reaching back about 720,000 years, second only to EPICA Dome C.', ['dome-fuji-record-span']],
];

describe('terms that name another subject', () => {
  it.each(ROWS)('%s', (sentence, expected) => expect(bound(sentence)).toEqual(expected));

  it('drops the term after "other" and every term inside it', () => {
    const s = 'comparable to other East Antarctic records';
    const hits = withoutOthers(s, findTerms(s, packs));
    expect(hits.has('east-antarctic')).toBe(false);
    expect(hits.has('antarctic')).toBe(false);
    expect(hits.has('record')).toBe(true);
  });
});
