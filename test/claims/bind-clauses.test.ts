/**
 * Predicates joined by "and"/"but" that share one subject (src/claims/bind-clauses.ts). Sentences are
 * our own; the quantities come from the real parser.
 * Termination I: began about 18,000 years ago (Chowdhry Beeman et al. 2019, Clim. Past 15, 913-926)
 * and ended about 11,700 years ago (Walker et al. 2009, J. Quaternary Sci. 24, 3-17, doi:10.1002/jqs.1227).
 * Younger Dryas: about 12,900 to 11,700 years ago (Rasmussen et al. 2006; Walker et al. 2009).
 * Vostok: about 420,000 years, 3,623 m (Petit et al. 1999, Nature 399, 429-436).
 */
import { describe, expect, it } from 'vitest';
import { bindQuantities } from '../../src/claims/bind.js';
import { sharedSubjects } from '../../src/claims/bind-clauses.js';
import { checkText } from '../../src/index.js';
import { parseQuantities } from '../../src/quantities/index.js';
import { loadPacks } from '../../src/rulepack/index.js';

const packs = await loadPacks([]);

function bound(sentence: string): string[] {
  const quantities = parseQuantities(sentence);
  const { bindings } = bindQuantities(sentence, quantities, packs);
  return quantities.map((_, i) => bindings.find((b) => b.quantityIndex === i)?.referenceId ?? '-');
}

const ROWS: [sentence: string, expected: string[]][] = [
  ['The last ice age began to fade 18,000 years ago and was over by 3,000 years ago.', ['termination-1-start', 'termination-1-end']],
  ['The Younger Dryas began 12,900 years ago and ended 11,700 years ago.', ['younger-dryas-start', 'younger-dryas-end']],
  ['Vostok reaches back 420,000 years and is 3,623 m deep.', ['vostok-record-span', 'vostok-drilled-depth']],
  ['The last ice age started to wane about 18,000 years ago but was over by about 11,700 years ago.', ['termination-1-start', 'termination-1-end']],
  // A clause with a subject of its own: its later predicate shares that subject (orbital periods of
  // about 41,000 and 100,000 years: Hays et al. 1976, Science 194, 1121-1132).
  ['The tilt of the axis swings back and forth over about 41,000 years, and the shape of the orbit stretches and rounds on a cycle of roughly 100,000 years.', ['milankovitch-obliquity-period', 'milankovitch-eccentricity-period']],
];

// A stretch of the ice is not the core's depth (EPICA Dome C drilled to 3,270 m: EPICA community
// members 2004, Nature 429, 623-628): "the lowest 200 metres" binds to no depth value.
describe('a stretch of the core', () => {
  it.each([
    'The lowest 200 metres of the Dome C core hold about 150,000 years.',
    'Deep ice is squeezed thin: the bottom 200 metres of the EPICA core span a long time.',
  ])('%s', (sentence) => expect(bound(sentence)[0]).toBe('-'));

  it('still binds the depth itself: EPICA Dome C reaches a depth of 3,270 metres', () => {
    expect(bound('EPICA Dome C reaches a depth of 3,270 metres.')).toEqual(['edc-drilled-depth']);
  });
});

describe('predicates that share a subject', () => {
  it.each(ROWS)('%s', (sentence, expected) => expect(bound(sentence)).toEqual(expected));

  it('finds the subject, the predicates before, and the clause of the number', () => {
    const s = 'The last ice age began to fade 18,000 years ago and was over by 3,000 years ago.';
    const [c] = sharedSubjects(s, parseQuantities(s));
    expect(c === undefined ? [] : [s.slice(...c.subject), s.slice(...c.before), s.slice(...c.clause)]).toEqual([
      'The last ice age ',
      'began to fade 18,000 years ago ',
      'was over by 3,000 years ago.',
    ]);
  });

  it('reads clauses with subjects of their own as they are', () => {
    const s = 'Vostok covers four cycles and EPICA Dome C covers eight cycles.';
    expect(sharedSubjects(s, parseQuantities(s))).toEqual([]);
    expect(bound(s)).toEqual(['vostok-glacial-cycles', 'edc-glacial-cycles']);
  });

  it('flags the end of the deglaciation given in a coordinated clause', async () => {
    const result = await checkText('The last ice age began to fade 18,000 years ago and was over by 3,000 years ago.\n');
    expect(result.flags.map((f) => [f.ruleId, f.excerpt, f.correction])).toEqual([['value.termination-1-end', '3,000 years ago', 'about 11,500 to 11,700 years ago']]);
  });
});
