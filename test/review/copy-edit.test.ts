import { describe, expect, it } from 'vitest';
import { canonicalWording, isCopyEdit } from '../../src/review/copy-edit.js';
import { markWordChanges } from '../../src/review/word-diff.js';

// Sentences of an invented gallery guide (demo wording). The values are the accepted ones: LGM sea
// level about 120-130 m below present (Lambeck et al. 2014, PNAS 111, 15296-15303); the Vostok record
// about 420,000 years (Petit et al. 1999, Nature 399, 429-436).
const BASE = 'At the Last Glacial Maximum, sea level was about 120–130 metres lower than “today”.';

describe('copy-edits that keep a sign-off', () => {
  it.each([
    ['an en dash for a hyphen', BASE.replace('–', '-')],
    ['an em dash with spaces', BASE.replace('–', ' — ')],
    ['American spelling (metres/meters; Merriam-Webster lists both, common practice)', BASE.replace('metres', 'meters')],
    ['straight quotes for curly ones', BASE.replace('“today”', '"today"')],
    ['white space and a line break', BASE.replace('sea level', 'sea\n  level')],
    ['case', BASE.replace('At the Last', 'AT THE LAST')],
  ])('keeps %s', (_what, edited) => {
    expect(isCopyEdit(BASE, edited)).toBe(true);
  });

  it('keeps a thin space for a comma between digit groups (SI Brochure, 9th ed., 5.4.4)', () => {
    expect(isCopyEdit('The Vostok record spans about 420,000 years.', 'The Vostok record spans about 420\u2009000 years.')).toBe(true);
    expect(isCopyEdit('The Vostok record spans about 420,000 years.', 'The Vostok record spans about 420,500 years.')).toBe(false);
  });

  it.each([
    ['a number', BASE.replace('120', '100')],
    ['a unit', BASE.replace('metres', 'feet')],
    ['a direction word', BASE.replace('lower', 'higher')],
    ['a negation', BASE.replace('was about', 'was not about')],
    ['a hedge', BASE.replace('about', 'at least')],
  ])('reopens on a change of %s', (_what, edited) => {
    expect(isCopyEdit(BASE, edited)).toBe(false);
  });

  it('folds -ise spellings of listed verbs, and leaves other words alone', () => {
    expect(canonicalWording('CO2 helped stabilise the climate')).toBe(canonicalWording('CO2 helped stabilize the climate'));
    expect(canonicalWording('temperatures rise')).toBe('temperatures rise');
  });
});

describe('markWordChanges', () => {
  it.each([
    ['The core spans 420,000 years.', 'The core spans 800,000 years.', 'The core spans [420,000 → 800,000] years.'],
    ['CO2 was a cause.', 'CO2 was not a cause.', 'CO2 was [+ not] a cause.'],
    ['Sea level was about 120 m lower.', 'Sea level was 120 m lower.', 'Sea level was [- about] 120 m lower.'],
    // A copy-edit beside a real change is not marked: only the meaning change is.
    ['Sea level was 120 metres lower.', 'Sea level was 120 meters higher.', 'Sea level was 120 meters [lower. → higher.]'],
  ])('%s → %s', (before, after, marked) => {
    expect(markWordChanges(before, after)).toBe(marked);
  });
});
