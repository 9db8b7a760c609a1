/**
 * Hand-built quantities for binding tests: the parser's job done by hand, so that these tests
 * measure the binder alone. Only the place, the dimension and (for calendar years) the stated unit
 * matter to binding; the interval is a plain ±1% around the stated number.
 */
import { bindQuantities } from '../../src/claims/bind.js';
import type { LoadedPacks } from '../../src/rulepack/types.js';
import type { Dimension, Quantity } from '../../src/types.js';

/** One quantity: its text as written in the sentence, its dimension, and optionally its stated unit. */
export type Written = [text: string, dimension: Dimension, statedUnit?: string];

/** The quantities of `sentence`, found left to right from their written text. */
export function quantitiesIn(sentence: string, written: Written[]): Quantity[] {
  let from = 0;
  return written.map(([text, dimension, statedUnit]) => {
    const start = sentence.indexOf(text, from);
    if (start < 0) throw new Error(`"${text}" is not in "${sentence}"`);
    from = start + text.length;
    const value = Number((/[\d,.]+/u.exec(text)?.[0] ?? '0').replace(/,/gu, ''));
    return { text, start, end: start + text.length, value, low: value * 0.99, high: value * 1.01, dimension, unit: '', statedUnit: statedUnit ?? '' };
  });
}

/** Previous sentence, sentence, its quantities, and per quantity the reference id ('-' none, '?' ambiguous). */
export type ContextRow = [context: string, sentence: string, written: Written[], expected: string[]];

/** A sentence, its quantities, and per quantity the reference id ('-' none, '?' ambiguous). */
export type Row = [sentence: string, written: Written[], expected: string[]];

/** Per quantity of `sentence` (read after `context`, if any): the reference id it binds, '?' when ambiguous, '-' when none. */
export function boundIn(packs: LoadedPacks, sentence: string, written: Written[], context?: string): string[] {
  const { bindings, ambiguous } = bindQuantities(sentence, quantitiesIn(sentence, written), packs, context);
  return written.map((_, i) => bindings.find((b) => b.quantityIndex === i)?.referenceId ?? (ambiguous.includes(i) ? '?' : '-'));
}

/** Per quantity of `sentence` read after `context`: the reference id it binds, '?' when ambiguous, '-' when none. */
export function boundAfter(packs: LoadedPacks, context: string, sentence: string, written: Written[]): string[] {
  return boundIn(packs, sentence, written, context);
}
