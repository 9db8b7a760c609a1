/**
 * Joins the claims of a run with the ledger: each claim is `signed off` (its id has a sign-off),
 * `stale` (it has none, but a sign-off in the same file was given to a wording like it that no
 * current claim carries any more: the claim changed since sign-off) or `open` (never signed off).
 * The latest ledger entry for an id counts. Stale matches are made best score first, and each
 * ledger claim id is matched to one current claim at most, so two edits never share one sign-off.
 */
import type { Claim } from '../types.js';
import type { Ledger, SignoffEntry } from './signoff-entry.js';
import { SAME_CLAIM_THRESHOLD, wordingSimilarity } from './wording-similarity.js';

/** Where a claim stands with the ledger. */
export const REVIEW_STATUSES = ['signed off', 'stale', 'open'] as const;
export type ReviewStatus = (typeof REVIEW_STATUSES)[number];

/** One claim with its review status; `signoff` is the current one, or for `stale` the one given to the old wording. */
export interface ReviewedClaim {
  claim: Claim;
  status: ReviewStatus;
  signoff?: SignoffEntry;
}

/** Every claim reviewed, in the order given, with counts per status. */
export interface ReviewSummary {
  claims: ReviewedClaim[];
  counts: Record<ReviewStatus, number>;
}

/** Reviews `claims` against `ledger`. */
export function reviewClaims(claims: Claim[], ledger: Ledger): ReviewSummary {
  const latest = new Map<string, SignoffEntry>();
  for (const entry of ledger.signoffs) latest.set(entry.claim, entry);

  const current = new Set(claims.map((c) => c.id));
  const orphans = [...latest.values()].filter((e) => !current.has(e.claim));
  const unsigned = claims.filter((c) => !latest.has(c.id));
  const staleFor = matchStale(unsigned, orphans);

  const reviewed = claims.map((claim): ReviewedClaim => {
    const signed = latest.get(claim.id);
    if (signed !== undefined) return { claim, status: 'signed off', signoff: signed };
    const old = staleFor.get(claim);
    return old === undefined ? { claim, status: 'open' } : { claim, status: 'stale', signoff: old };
  });
  const counts: Record<ReviewStatus, number> = { 'signed off': 0, stale: 0, open: 0 };
  for (const r of reviewed) counts[r.status] += 1;
  return { claims: reviewed, counts };
}

/** Pairs claims without a sign-off with orphaned sign-offs of the same file, best score first. */
function matchStale(claims: Claim[], orphans: SignoffEntry[]): Map<Claim, SignoffEntry> {
  const pairs: { claim: Claim; entry: SignoffEntry; score: number; order: number }[] = [];
  claims.forEach((claim, order) => {
    for (const entry of orphans) {
      if (entry.file !== (claim.projectPath ?? claim.file)) continue;
      const score = wordingSimilarity(claim.text, entry.text);
      if (score >= SAME_CLAIM_THRESHOLD) pairs.push({ claim, entry, score, order });
    }
  });
  // Ties go to the earlier claim in the draft, so the outcome does not depend on ledger order.
  pairs.sort((a, b) => b.score - a.score || a.order - b.order);
  const matched = new Map<Claim, SignoffEntry>();
  const used = new Set<string>();
  for (const { claim, entry } of pairs) {
    if (matched.has(claim) || used.has(entry.claim)) continue;
    matched.set(claim, entry);
    used.add(entry.claim);
  }
  return matched;
}
