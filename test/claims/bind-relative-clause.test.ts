/**
 * A number in a relative clause (", which began about N years ago") speaks of the clause's
 * antecedent alone: a veto word before the antecedent ("CO2" in "how CO2 and Antarctic temperature
 * moved through the last deglaciation, which ...") does not stop the antecedent's value, while one
 * inside the relative clause still does (src/claims/bind.ts, withoutBeforeAntecedent). Sentences of
 * our own, read by the real parser, binder and check.
 *
 * Values: the last deglaciation began about 18,000 years ago and ended about 11,500 years ago
 * (Chowdhry Beeman, J. et al. (2019), Clim. Past 15, 913-926, doi:10.5194/cp-15-913-2019); the Younger
 * Dryas ended about 11,700 years ago (Rasmussen, S. O. et al. (2006), JGR 111, D06102,
 * doi:10.1029/2005JD006079).
 */
import { describe, expect, it } from 'vitest';
import { judge } from './judge-at.js';


describe('the relative clause speaks of its antecedent', () => {
  it.each([
    ['Our cores track how CO2 and Antarctic temperature moved through the last deglaciation, which began about 40,000 years ago.', 'termination-1-start', 'conflicts'],
    ['Carbon dioxide rose sharply during the deglaciation, which ended about 5,000 years ago.', 'termination-1-end', 'conflicts'],
    ['The project compares methane and CO2 across the Younger Dryas, which ended about 11,700 years ago.', 'younger-dryas-end', 'agrees'],
  ])('%s', (sentence, value, verdict) => {
    expect(judge(sentence)).toEqual({ value, verdict });
  });
});

describe('and nothing more', () => {
  it.each([
    // A veto inside the relative clause still speaks of its number.
    ['We study the last deglaciation, which began when CO2 rose about 18,000 years ago.'],
    // The antecedent is no event: nothing to bind.
    ['Carbon dioxide was measured on the new core, which reached bedrock about 30,000 years ago.'],
  ])('%s', (sentence) => {
    expect(judge(sentence).value).toBe('-');
  });
});
