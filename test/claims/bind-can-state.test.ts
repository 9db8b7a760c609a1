/**
 * Vague durations ("a few centuries", "several thousand years") bind only to values whose range they
 * could state, and an end told as a state reached ("was complete by") is an end, not a start.
 * Sentences are our own; the quantities come from the real parser, so the vague intervals are the
 * interval table's ("a few" = 2 to 5 of the unit, "several" = 3 to 7).
 */
import { describe, expect, it } from 'vitest';
import { bindQuantities } from '../../src/claims/bind.js';
import { canState } from '../../src/claims/bind-match.js';
import { parseQuantities } from '../../src/quantities/index.js';
import { loadPacks } from '../../src/rulepack/index.js';

const packs = await loadPacks([]);

/** Sentence, a quantity's text in it, and the reference id it binds ('-' for none). */
type Row = [sentence: string, quantity: string, expected: string];

function boundTo(sentence: string, text: string): string {
  const quantities = parseQuantities(sentence);
  const index = quantities.findIndex((q) => q.text.includes(text));
  if (index < 0) throw new Error(`"${text}" not parsed in "${sentence}"`);
  const { bindings } = bindQuantities(sentence, quantities, packs);
  return bindings.find((b) => b.quantityIndex === index)?.referenceId ?? '-';
}

const ROWS: Row[] = [
  // A lag told vaguely is not the length of the CO2 rise (Monnin et al. 2001: the rise took ~6,000 years).
  ['At the Kelderby ice lab, Antarctic CO2 and temperature climbed within a few centuries of one another during the deglaciation.', 'a few centuries', '-'],
  // A figure in the same sentence still binds: the rule is about vague words only (Monnin et al. 2001).
  ['At the Kelderby ice lab, the deglacial CO2 rise lasted about 3,000 years.', '3,000 years', 'co2-deglacial-rise-duration'],
  // "Several thousand years" (3,000-7,000) can state the ~6,000-7,500-year rise (Monnin et al. 2001; Marcott et al. 2014).
  ['The Kelderby team says the deglacial CO2 rise took several thousand years.', 'several thousand years', 'co2-deglacial-rise-duration'],
  // An end reached, not a start: Termination I ended about 11,700-11,000 years ago (Clark et al. 2009, from memory).
  ['The Pellow Heritage Trust notes that the deglaciation was complete by about 11,600 years ago.', '11,600', 'termination-1-end'],
  ['The Pellow Heritage Trust notes that the deglaciation was over by about 11,400 years ago.', '11,400', 'termination-1-end'],
  // Start and end in one sentence: the end date never binds the start value (Beeman et al. 2019: start ~18 ka).
  // "began" belongs to the first of two predicates that share the subject (bind-clauses.ts), so the end
  // date binds the end: Termination I ended about 11,700-11,000 years ago (Walker et al. 2009; Beeman et al. 2019).
  ['The deglaciation, the Pellow Trust writes, began some 19,000 years ago and was completed by about 11,400 years ago.', '11,400', 'termination-1-end'],
  ['The deglaciation, the Pellow Trust writes, began some 19,000 years ago and was completed by about 11,400 years ago.', '19,000', 'termination-1-start'],
  // With no start word, "completed by" alone makes the later date the end.
  ['The deglaciation, the Pellow Trust writes, got under way some 19,000 years ago and was completed by about 11,400 years ago.', '11,400', 'termination-1-end'],
];

describe('vague durations and end words in binding', () => {
  it.each(ROWS)('%s [%s]', (sentence, text, expected) => {
    expect(boundTo(sentence, text)).toBe(expected);
  });
});

describe('canState', () => {
  // Interval table: "a few centuries" = 200-500 years (docs/quantities.md).
  const fewCenturies = { text: 'a few centuries', low: 200, high: 500 };
  it('lets a vague phrase state only a range its interval meets', () => {
    expect(canState({ low: 6000, high: 7500 }, fewCenturies)).toBe(false);
    expect(canState({ low: 400, high: 900 }, fewCenturies)).toBe(true);
  });
  it('lets any figure state any range (the check then judges it)', () => {
    expect(canState({ low: 6000, high: 7500 }, { text: 'about 300 years', low: 250, high: 350 })).toBe(true);
  });
});
