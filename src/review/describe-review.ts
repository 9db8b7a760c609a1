/**
 * The words of the sign-off summary, made last from the review data: a count line, then each stale
 * claim with its signed-off wording beside the new one, then each open claim, one line each.
 *
 *   Sign-off: 1 of 3 claims signed off; 1 claim open, 1 changed since sign-off.
 *   changed since sign-off: drafts/ice-hall.md:3:1 c9f3a0b12cd (signed off by R. Okafor on 2025-02-11, approved)
 *     signed off: The Dome C core reaches back about 420,000 years.
 *     now:        The Dome C core reaches back about 800,000 years.
 *   open: drafts/ice-hall.md:5:1 c51d0e7a9b2 CO2 rose from about 180 ppm to 280 ppm.
 */
import type { ReviewSummary } from './review-claims.js';
import { foldClaimText } from './claim-id.js';
import { formatPlace } from '../report/format-place.js';

/** Open claims listed one by one, at most; stale claims are always all listed. */
export const MAX_OPEN_LINES = 20;

/** Summary lines for `check --require-signoff`. */
export function describeReview(review: ReviewSummary): string[] {
  const { counts } = review;
  const total = review.claims.length;
  const lines = [
    `Sign-off: ${counts['signed off']} of ${plural(total, 'claim')} signed off; ${plural(counts.open, 'claim')} open, ${counts.stale} changed since sign-off, ${counts['needs change']} marked needs change.`,
  ];
  for (const r of review.claims) {
    const place = `${formatPlace(r.claim)} ${r.claim.id}`;
    const moved = r.movedFrom === undefined ? '' : `, moved from ${r.movedFrom}`;
    if (r.status === 'stale' && r.signoff !== undefined) {
      lines.push(`changed since sign-off: ${place} (${signedBy(r.signoff)}${moved})`);
      lines.push(`  ${r.signoff.decision === 'needs-change' ? 'commented: ' : 'signed off:'} ${foldClaimText(r.signoff.text)}`);
      lines.push(`  now:        ${foldClaimText(r.claim.text)}`);
      if (r.changes !== undefined) lines.push(`  changed:    ${r.changes}`);
    }
    if (r.status === 'needs change' && r.signoff !== undefined) {
      lines.push(`needs change: ${place} (${r.signoff.reviewer} on ${r.signoff.date.slice(0, 10)}${moved}): ${r.signoff.reason ?? ''}`);
    }
    if (r.status === 'signed off' && r.movedFrom !== undefined) {
      lines.push(`signed off, moved from ${r.movedFrom}: ${place}`);
    }
  }
  // A first run on a large repository has hundreds of open claims: the checklist lists them all.
  const open = review.claims.filter((r) => r.status === 'open');
  for (const r of open.slice(0, MAX_OPEN_LINES)) {
    lines.push(`open: ${formatPlace(r.claim)} ${r.claim.id} ${foldClaimText(r.claim.text)}`);
  }
  if (open.length > MAX_OPEN_LINES) lines.push(`... and ${open.length - MAX_OPEN_LINES} more open claims.`);
  if (counts.open + counts.stale + counts['needs change'] > 0) {
    lines.push('To sign off: firnline checklist -o FILE, tick the boxes, then firnline signoff --from FILE --by "Your Name".');
  }
  return lines;
}

/** "signed off by R. Okafor on 2025-02-11, approved", or "marked needs change by ..." for a needs-change entry. */
export function signedBy(entry: { reviewer: string; date: string; decision: string }): string {
  if (entry.decision === 'needs-change') return `marked needs change by ${entry.reviewer} on ${entry.date.slice(0, 10)}`;
  return `signed off by ${entry.reviewer} on ${entry.date.slice(0, 10)}, ${entry.decision}`;
}

function plural(n: number, word: string): string {
  return `${n} ${word}${n === 1 ? '' : 's'}`;
}
