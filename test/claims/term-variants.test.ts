/**
 * A pack's term phrase in the forms informal writing gives it (src/claims/term-variants.ts): a
 * compound modifier with hyphens ("ice-age CO2") and a clipped word ("the glacial max"). Sentences
 * of our own; quantities built by hand (quantity-at.ts) so that only the binder is measured, plus
 * whole checks for the claims that need a subject.
 */
import { describe, expect, it } from 'vitest';
import { bindQuantities } from '../../src/claims/bind.js';
import { termVariants } from '../../src/claims/term-variants.js';
import { checkText } from '../../src/engine.js';
import { loadPacks } from '../../src/rulepack/index.js';
import { quantitiesIn, type Written } from './quantity-at.js';

const packs = await loadPacks([]);

const bound = (sentence: string, written: Written[]): string => bindQuantities(sentence, quantitiesIn(sentence, written), packs).bindings[0]?.referenceId ?? '-';

describe('termVariants', () => {
  it('adds the hyphenated compound and the clipped word, once each', () => {
    expect(termVariants(['glacial maximum', 'LGM'])).toEqual(['glacial maximum', 'LGM', 'glacial-maximum', 'glacial max']);
  });
  it('leaves a long phrase and a phrase with digits as they are', () => {
    expect(termVariants(['Termination I', 'Marine Isotope Stage 5e'])).toEqual(['Termination I', 'Marine Isotope Stage 5e', 'Termination-I']);
  });
  // Nouns that name an end as "end" does (common practice of English): "the close of the last ice age".
  it('gives "end of X" the other nouns of an end, and nothing else', () => {
    expect(termVariants(['end of the last ice age'])).toEqual(['end of the last ice age', 'close of the last ice age', 'closing of the last ice age', 'tail end of the last ice age', 'conclusion of the last ice age', 'finish of the last ice age']);
    expect(termVariants(['the end'])).toEqual(['the end', 'the-end']);
  });
});

type Row = [sentence: string, written: Written[], expected: string];

const ROWS: Row[] = [
  // Glacial CO2 about 172-200 ppm (Lüthi et al. 2008, doi:10.1038/nature06949).
  ['Ice-age carbon dioxide hovered near 240 ppm.', [['240 ppm', 'concentration']], 'co2-glacial-minimum-typical'],
  ['Those ice-age CO2 lows of about 230 ppm are the baseline.', [['about 230 ppm', 'concentration']], 'co2-glacial-minimum-typical'],
  // The Last Glacial Maximum about 19,000-26,500 years ago (Clark et al. 2009, doi:10.1126/science.1172873).
  ['The last glacial max came roughly 60,000 years ago.', [['roughly 60,000 years ago', 'age']], 'lgm-chronozone'],
  ['Last-glacial-maximum ice covered Canada about 35,000 years ago.', [['about 35,000 years ago', 'age']], 'lgm-chronozone'],
];

describe('bindQuantities: hyphenated and clipped forms of the pack terms', () => {
  it.each(ROWS)('%s', (sentence, written, expected) => expect(bound(sentence, written)).toBe(expected));

  it('a clipped word that is no term word binds nothing', () => {
    // "max" alone names no period (common practice).
    expect(bound('The gauge read a max of 40,000 years ago.', [['40,000 years ago', 'age']])).toBe('-');
  });
});

describe('a clipped subject makes a sentence a claim', () => {
  // The Last Glacial Maximum about 19,000-26,500 years ago (Clark et al. 2009, doi:10.1126/science.1172873).
  it.each(['That glacial max, for what it is worth, was about 55k years ago.', 'honestly the glacial max was like 50k years ago'])('%s', async (text) => {
    const ids = (await checkText(text)).flags.map((f) => f.ruleId);
    expect(ids).toContain('value.lgm-chronozone');
  });
  it('the right date stays clean', async () => {
    expect((await checkText('That glacial max was about 21,000 years ago.')).flags).toEqual([]);
  });
});
