/**
 * Whether a sentence dates its figure after the work that replaced an older one. A superseded figure
 * is right for its day ("the first Vostok core, published in 1987, went back about 160,000 years"),
 * so a claim matching it gets a note; but one the sentence dates to the year the newer value was
 * published or later ("the Vostok record, published in 1999, covers about 160,000 years") is no older
 * figure told as it was: the newer value's own sources were out by then.
 *
 *   newer value's sources issued 1999, 2001 → replaced in 1999
 *   "published by Petit and colleagues in 1999, ... 160,000 years" → dated after: an error
 *   "the 1987 paper ... 160,000 years"                               → right for its day: a note
 */
import type { ReferenceValue } from '../rulepack/types.js';
import type { Quantity } from '../types.js';

/** A calendar year as written. */
const YEAR = /(?<!\d)(1[6-9]\d\d|20\d\d)(?!\d)/u;

/** The year the newer value's earliest source was issued, when its sources carry dates. */
export function replacedIn(newer: ReferenceValue): number | undefined {
  const years = newer.sources.flatMap((s) => {
    const year = s.csl?.issued?.['date-parts'][0]?.[0];
    return typeof year === 'number' && Number.isFinite(year) ? [year] : [];
  });
  return years.length === 0 ? undefined : Math.min(...years);
}

/** True when one of the sentence's calendar years (quantities read in CE) is `newer`'s year of replacement or later. */
export function datedAfterReplacement(quantities: readonly Quantity[], newer: ReferenceValue): boolean {
  const since = replacedIn(newer);
  if (since === undefined) return false;
  return quantities.some((q) => {
    if (q.statedUnit !== 'CE') return false;
    const year = YEAR.exec(q.text)?.[1];
    return year !== undefined && Number(year) >= since;
  });
}
