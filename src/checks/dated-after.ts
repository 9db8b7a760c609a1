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
import { figureToldInPast } from '../claims/told-in-past.js';
import { parseQuantities } from '../quantities/index.js';

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

/** A bare year, four digits with nothing else: "T15  2004", "(EPICA 2004)". */
const BARE_YEAR = /^(?:1[6-9]\d\d|20\d\d)$/u;

/** The calendar years the sentence's quantities read in CE state, and with `bare`, its bare years. */
function calendarYears(quantities: readonly Quantity[], bare = false): number[] {
  return quantities.flatMap((q) => {
    const year = q.statedUnit === 'CE' || (bare && q.statedUnit === '' && BARE_YEAR.test(q.text)) ? YEAR.exec(q.text)?.[1] : undefined;
    return year === undefined ? [] : [Number(year)];
  });
}

/** True when one of the sentence's calendar years (quantities read in CE) is `newer`'s year of replacement or later. */
export function datedAfterReplacement(quantities: readonly Quantity[], newer: ReferenceValue): boolean {
  const since = replacedIn(newer);
  return since !== undefined && calendarYears(quantities).some((year) => year >= since);
}

/**
 * Whether a sentence tells an older figure of its own day: it names a calendar year before the newer
 * value's replacement ("Copy from 2004 says 740,000 years") or tells the figure in the past tense
 * ("the first record covered about 160,000 years"). One told in the present with no such year
 * ("Vostok's record goes back about 160,000 years", "Dome C reaches back 740,000 years") gives it as
 * today's figure, as "currently" does: later work corrected it, so it is an error, no note. The
 * sentences `before` it in its passage date it too.
 */
export function toldOfItsDay(sentence: string, quantities: readonly Quantity[], q: Pick<Quantity, 'start'>, newer: ReferenceValue, before: readonly string[] = []): boolean {
  const since = replacedIn(newer);
  // A passage dated before the replacement ("T15  2004" heading a timeline's caption, "In 2004 ...
  // The team reports ...") tells its figures of that day, in the present of a timeline or not.
  const passage = since === undefined ? [] : before.flatMap((s) => calendarYears(parseQuantities(s), true));
  if (since !== undefined && [...calendarYears(quantities, true), ...passage].some((year) => year < since)) return true;
  return figureToldInPast(sentence, q.start);
}
