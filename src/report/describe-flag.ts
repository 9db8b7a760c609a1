import type { Flag } from '../types.js';
import { midSentence } from '../rulepack/describe-range.js';
import { asSentence, formatClaimed, formatRange } from './format-value.js';

/** The reference part of a flag in words: `790,000 to 810,000 yr for the time span of ... (as of 2007)`. */
export function formatReference(reference: NonNullable<Flag['reference']>): string {
  const range = formatRange(reference.low, reference.high, reference.unit);
  const asOf = reference.asOf === undefined ? '' : ` (as of ${reference.asOf})`;
  return `${range} for ${midSentence(reference.measures)}${asOf}`;
}

/**
 * A flag's words as one paragraph: the reason, what the draft claims, the reference range, and
 * the correction (or, when no exact replacement exists, the rewording advice). Reporters that
 * carry one message per flag (SARIF, JUnit) use this text.
 *
 * For a record span flag it reads: `The span given for the EPICA Dome C record is about half the
 * published one. The draft says "400,000 years" (read as 395,000 to 405,000 yr). Reference:
 * 790,000 to 810,000 yr for the time span of the EPICA Dome C ice-core record (as of 2007).
 * Correction: replace "400,000 years" with "800,000 years".`
 */
export function describeFlag(flag: Flag): string {
  const parts = [asSentence(flag.reason)];
  if (flag.claimed !== undefined) parts.push(`The draft says ${formatClaimed(flag.claimed)}.`);
  if (flag.reference !== undefined) parts.push(`Reference: ${formatReference(flag.reference)}.`);
  if (flag.correction !== undefined) {
    parts.push(`Correction: replace "${flag.excerpt}" with "${flag.correction}".`);
  } else if (flag.suggestion !== undefined) {
    parts.push(`Suggestion: ${asSentence(flag.suggestion)}`);
  }
  return parts.join(' ');
}
