/**
 * "That's ..." opening a sentence is a demonstrative pronoun: the figure it gives is of the subject
 * before (the pack lexicon's back-references.pronouns). A figure inside the noun phrase a
 * comparison holds up as its baseline ("longer than a human life of 100 years") measures that
 * phrase's head and borrows no subject (src/claims/bind-context.ts). Passages are our own.
 * EPICA Dome C: eight glacial cycles over about 800,000 years (EPICA community members 2004, Nature
 * 429, 623-628, DOI 10.1038/nature02599; Lüthi et al. 2008, Nature 453, 379-382, DOI 10.1038/nature06949).
 */
import { describe, expect, it } from 'vitest';
import { bindQuantities } from '../../src/claims/bind.js';
import { parseQuantities } from '../../src/quantities/index.js';
import { loadPacks } from '../../src/rulepack/index.js';

const packs = await loadPacks([]);

function bound(context: string, sentence: string): string[] {
  const quantities = parseQuantities(sentence);
  const { bindings, ambiguous } = bindQuantities(sentence, quantities, packs, context);
  return quantities.map((_, i) => bindings.find((b) => b.quantityIndex === i)?.referenceId ?? (ambiguous.includes(i) ? '?' : '-'));
}

describe('"that\'s" refers back', () => {
  it.each([
    ['The EPICA Dome C core covers 800,000 years.', "That's eleven full glacial cycles.", ['edc-glacial-cycles']],
    ['The EPICA Dome C core covers 800,000 years.', 'That’s eight complete glacial cycles.', ['edc-glacial-cycles']],
    ['The Vostok team drilled through four Antarctic winters.', "That's 3,623 metres of ice in the end.", ['vostok-drilled-depth']],
  ])('%s / %s', (context, sentence, expected) => expect(bound(context, sentence)).toEqual(expected));

  it('a sentence with "that" as a relative pronoun does not refer back', () => {
    expect(bound('The EPICA Dome C core covers 800,000 years.', 'The museum panel that opened in May shows eleven glacial cycles.')).toEqual(['-']);
  });
});

describe('a figure in a comparison baseline', () => {
  it('measures the baseline, not the subject before', () => {
    expect(bound('The oldest ice from the Dome C core is about 800,000 years old.', "That's eight hundred thousand years, about 8,000 times longer than a very long human life of 100 years!")).toEqual([
      'edc-record-span',
      '-',
      '-',
    ]);
  });
  it('the figure the sentence states of the subject still binds', () => {
    expect(bound('The oldest ice from the Dome C core is about 800,000 years old.', "That's six hundred thousand years.")).toEqual(['edc-record-span']);
  });
});
