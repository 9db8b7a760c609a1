/**
 * A subject carried from the previous sentence follows that sentence's subject, the more specific
 * reading wins, and a demonstrative ("in that record") refers back (src/claims/bind-context.ts).
 * Passages are our own; the quantities come from the real parser.
 */
import { describe, expect, it } from 'vitest';
import { bindQuantities } from '../../src/claims/bind.js';
import { subjectSpan } from '../../src/claims/bind-clauses.js';
import { checkText } from '../../src/index.js';
import { parseQuantities } from '../../src/quantities/index.js';
import { loadPacks } from '../../src/rulepack/index.js';

const packs = await loadPacks([]);

function bound(context: string, sentence: string): string[] {
  const quantities = parseQuantities(sentence);
  const { bindings, ambiguous } = bindQuantities(sentence, quantities, packs, context);
  return quantities.map((_, i) => bindings.find((b) => b.quantityIndex === i)?.referenceId ?? (ambiguous.includes(i) ? '?' : '-'));
}

const ROWS: [context: string, sentence: string, expected: string[]][] = [
  // "It" is the subject before, EPICA Dome C, not Vostok (Lüthi et al. 2008: EDC drilled to about 3,270 m).
  ['EPICA Dome C is about twice as old as Vostok, the Harwell display says.', 'It was drilled down to 3,623 metres.', ['edc-drilled-depth']],
  ['Vostok is about half as old as EPICA Dome C, the Harwell display says.', 'It was drilled down to 3,623 metres.', ['vostok-drilled-depth']],
  // "At that time" after the Last Glacial Maximum: the LGM level (Monnin et al. 2001; AR6: about 190 ppm), not the typical glacial one.
  ['About 21,000 years ago, at the Last Glacial Maximum, sea level stood some 130 metres below today.', 'Carbon dioxide at that time hovered near 240 parts per million.', ['co2-lgm']],
  // "In that record" refers back to the CO2 record (Lüthi et al. 2008: interglacial peaks about 240-300 ppm).
  ['Across the last 800,000 years, ice-core CO2 swung between roughly 180 and 300 ppm.', 'Interglacial peaks in that record reached 350 ppm.', ['co2-interglacial-maximum-typical']],
  // A bare measure as subject ("The global average") is the measure of the subject before (NOAA: 2019 global mean about 410 ppm).
  ['The Kestrel Bay newsletter charts carbon dioxide since 1958.', 'The global average for 2019 was 430 ppm.', ['-', 'co2-global-2019']],
  ['The Vostok team drilled through four Antarctic winters.', 'The total was 3,623 metres.', ['vostok-drilled-depth']],
  // A measure subject with no subject before it binds nothing.
  ['The Kestrel Bay newsletter has a new editor.', 'The average was 430 ppm.', ['-']],
  // A change word in the sentence before does not stop today's level (NOAA/WMO: about 420-430 ppm in 2023-2025).
  ['CO2 rose by about 80 ppm during the deglaciation.', 'Today it stands at 425 ppm.', ['co2-present-day']],
];

describe('the subject carried from the previous sentence', () => {
  it.each(ROWS)('%s / %s', (context, sentence, expected) => expect(bound(context, sentence)).toEqual(expected));

  it('reads the subject of a sentence up to its first verb, after an opening phrase', () => {
    const s = 'During the coldest spells, carbon dioxide fell to about 190 ppm.';
    const span = subjectSpan(s);
    expect(span === undefined ? '' : s.slice(...span)).toBe('carbon dioxide ');
  });

  it('checks a sentence with no topic word of its own when its number takes the subject before', async () => {
    // Lüthi et al. 2008: EPICA Dome C was drilled to about 3,270 m.
    // ("reaches" is a record word since the pack's record-reach term, so the sentence says "goes down".)
    const result = await checkText('The EPICA Dome C core was drilled by ten nations. It goes down 2,270 metres.\n');
    expect(result.flags.map((f) => [f.ruleId, f.excerpt])).toEqual([['value.edc-drilled-depth', '2,270 metres']]);
    expect(result.claims.map((c) => c.text)).toEqual(['It goes down 2,270 metres.']);
  });

  it('leaves a sentence with no topic word alone when its number takes no subject', async () => {
    const result = await checkText('The EPICA Dome C core was drilled by ten nations. It cost 40 million euros.\n');
    expect(result.flags).toEqual([]);
  });
});
