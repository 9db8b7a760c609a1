/**
 * A count of glacial cycles told with a partitive ("eight of those ice-age cycles", "ten of these
 * cycles") or a partitive pronoun after a gapped clause ("and Vostok covers six of them") is the
 * count a record holds (src/quantities/unit-table.ts, src/claims/elided-units.ts); a partitive that
 * picks members out ("one of those cycles lasted ...", "Two of these cycles had ...") counts no total
 * (src/claims/partitive-counts.ts). Sentences of our own, through the whole engine.
 *
 * Reference values: the Vostok core records four glacial cycles over about 420,000 years (Petit et
 * al. 1999, Nature 399, 429-436, doi:10.1038/20859); EPICA Dome C eight over about 800,000 years
 * (EPICA community members 2004, Nature 429, 623-628; Lüthi et al. 2008, Nature 453, 379-382).
 */
import { describe, expect, it } from 'vitest';
import { checkText } from '../../src/engine.js';
import { loadPacks } from '../../src/rulepack/index.js';

const packs = await loadPacks([]);
const valueFlags = async (text: string): Promise<string[]> =>
  (await checkText(text, { packs, format: 'markdown' })).flags.filter((f) => f.ruleId.startsWith('value.')).map((f) => f.ruleId);

describe('a partitive count is the count a record holds', () => {
  it.each([
    // Petit et al. 1999: four cycles at Vostok.
    ['The Vostok core has eight of those ice-age cycles in it.', 'value.vostok-glacial-cycles'],
    ['An older core from Vostok covers ten of these cycles.', 'value.vostok-glacial-cycles'],
    ['Vostok records six of the glacial cycles, one after another.', 'value.vostok-glacial-cycles'],
    // EPICA 2004, Lüthi et al. 2008: eight cycles at Dome C.
    ['The Dome C ice holds twelve of those glacial cycles.', 'value.edc-glacial-cycles'],
    // A partitive pronoun after a gapped clause takes the count noun before it.
    ['Dome C holds eight glacial cycles, and Vostok covers six of them.', 'value.vostok-glacial-cycles'],
  ])('flags a wrong count: %s', async (sentence, rule) => {
    expect(await valueFlags(sentence)).toContain(rule);
  });

  it.each([
    'The Vostok core holds four of those glacial cycles.',
    'Dome C covers eight of the glacial cycles.',
    'Dome C holds eight glacial cycles, and Vostok covers four of them.',
  ])('leaves the right count clean: %s', async (sentence) => {
    expect(await valueFlags(sentence)).toEqual([]);
  });

  it.each([
    // Members picked out of the whole, not the count of the whole (common practice in English).
    'At Vostok, one of those glacial cycles lasted about 100,000 years.',
    'Two of these glacial cycles in the Vostok record had peaks warmer than today.',
    'In the Dome C record, three of the glacial cycles ended with a sharp rise in CO2.',
  ])('counts no total in a partitive that picks members: %s', async (sentence) => {
    const flags = await valueFlags(sentence);
    expect(flags).not.toContain('value.vostok-glacial-cycles');
    expect(flags).not.toContain('value.edc-glacial-cycles');
  });
});
