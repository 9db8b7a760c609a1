// The key-word test in findTerms skips a term's regular expression only when it cannot match. Under
// the `iu` flags a character matches an ASCII letter when their simple case foldings agree
// (ECMAScript 2024, 22.2.2.7.3 Canonicalize; Unicode CaseFolding.txt, status C and S): of all
// characters outside ASCII only U+212A KELVIN SIGN (folds to "k") and U+017F LATIN SMALL LETTER
// LONG S (folds to "s") do. Each sentence here is checked against every term's expression run
// without the test.
import { describe, expect, it } from 'vitest';
import { findTerms } from '../../src/claims/bind.js';
import { loadPacks } from '../../src/rulepack/index.js';
import type { LoadedPacks } from '../../src/rulepack/types.js';

/** What every term's expression finds, run on the sentence with no key-word test (grouped as findTerms groups). */
function everyExpression(sentence: string, packs: LoadedPacks): Map<string, [number, number][]> {
  const out = new Map<string, [number, number][]>();
  for (const term of packs.terms) {
    const escaped = [...term.words].sort((a, b) => b.length - a.length).map((w) => w.replace(/[.*+?^${}()|[\]\\]/gu, '\\$&').replace(/\s+/gu, '\\s+'));
    const regex = new RegExp(`(^|[^\\p{L}\\p{N}])(?:${escaped.join('|')})(?![\\p{L}\\p{N}])`, 'giu');
    const spans = [...sentence.matchAll(regex)].map((m): [number, number] => [m.index + (m[1] ?? '').length, m.index + m[0].length]);
    if (spans.length === 0) continue;
    const dot = term.id.indexOf('.');
    const as = dot >= 0 && packs.term(term.id.slice(0, dot)) !== undefined ? term.id.slice(0, dot) : term.id;
    out.set(as, [...(out.get(as) ?? []), ...spans].sort((a, b) => a[0] - b[0]));
  }
  return out;
}

describe('findTerms skips no expression that would match', () => {
  it.each([
    'At the Last Glacial Maximum CO2 stood near 190 ppm, and the café ran out of scones.',
    'CO₂ rose by about 80 ppm as the ice sheets shrank — a slow change.',
    'Today CO2 ma\u212Aes up about 0.04 percent of the air; the ice cores reach bac\u212A 800,000 years.',
    // The long s for s.
    'Ice core\u017F \u017Fhow that CO2 lagged the warming at the end of the la\u017Ft glacial period.',
    'ÉPICA DOME C REACHES BACK 800,000 YEARS AND İCE CORES SHOW CO2 AT 180 PPM.',
  ])('%s', async (sentence) => {
    const packs = await loadPacks([]);
    expect(findTerms(sentence, packs)).toEqual(everyExpression(sentence, packs));
    expect(findTerms(sentence, packs).size).toBeGreaterThan(0);
  });
});
