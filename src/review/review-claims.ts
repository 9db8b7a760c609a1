/**
 * Joins the claims of a run with the ledger. Each claim is
 * - `signed off`: its id has a sign-off, or a sign-off was given to the same wording up to
 *   copy-edits (review/copy-edit), in this file, in a file it moved from, or in another file where
 *   the same sentence stands (one sign-off covers the same sentence in several files);
 * - `needs change`: the sign-off that holds for it says the claim must change;
 * - `stale`: none holds, but a sign-off was given to a wording like it that no current claim carries
 *   any more (the claim changed since sign-off), in the same file or in one that is gone;
 * - `open`: never signed off.
 * The latest ledger entry for a wording counts. Stale matches are made best score first, and each
 * ledger claim id is matched to one current claim at most, so two edits never share one sign-off.
 */
import type { Claim } from '../types.js';
import { canonicalWording } from './copy-edit.js';
import type { Ledger, SignoffEntry } from './signoff-entry.js';
import { markWordChanges } from './word-diff.js';
import { SAME_CLAIM_THRESHOLD, wordingSimilarity } from './wording-similarity.js';

/** Where a claim stands with the ledger. */
export const REVIEW_STATUSES = ['signed off', 'needs change', 'stale', 'open'] as const;
export type ReviewStatus = (typeof REVIEW_STATUSES)[number];

/** Statuses that keep the sign-off gate red. */
export const UNREVIEWED_STATUSES: readonly ReviewStatus[] = ['needs change', 'stale', 'open'];

/** One claim with its review status; `signoff` is the one that holds, or for `stale` the one given to the old wording. */
export interface ReviewedClaim {
  claim: Claim;
  status: ReviewStatus;
  signoff?: SignoffEntry;
  /** The sign-off was given in another file: the claim moved from it (that file has no such claim now). */
  movedFrom?: string;
  /** The sign-off was given to the same sentence in another file that still holds it. */
  sharedWith?: string;
  /** The sign-off was given to a wording that differs by copy-edits only. */
  copyEdited?: boolean;
  /** For `stale`: the current wording with the words changed since sign-off marked. */
  changes?: string;
}

/** Every claim reviewed, in the order given, with counts per status. */
export interface ReviewSummary {
  claims: ReviewedClaim[];
  counts: Record<ReviewStatus, number>;
}

/** Reviews `claims` against `ledger`. */
export function reviewClaims(claims: Claim[], ledger: Ledger): ReviewSummary {
  const latest = new Map<string, SignoffEntry>();
  for (const entry of ledger.signoffs) {
    latest.delete(entry.claim); // keep ledger order: the latest entry sits last
    latest.set(entry.claim, entry);
  }
  const byWording = new Map<string, SignoffEntry[]>();
  for (const entry of latest.values()) {
    const key = canonicalWording(entry.text);
    byWording.set(key, [...(byWording.get(key) ?? []), entry]);
  }
  const currentIds = new Set(claims.map((c) => c.id));
  const wordingsByFile = new Map<string, Set<string>>();
  for (const c of claims) {
    const file = pathOf(c);
    if (!wordingsByFile.has(file)) wordingsByFile.set(file, new Set());
    wordingsByFile.get(file)?.add(canonicalWording(c.text));
  }

  const held = new Map<Claim, ReviewedClaim>();
  const used = new Set<string>();
  for (const claim of claims) {
    const exact = latest.get(claim.id);
    if (exact !== undefined) {
      held.set(claim, withStatus({ claim, signoff: exact }));
      used.add(exact.claim);
      continue;
    }
    const match = sameWording(claim, byWording.get(canonicalWording(claim.text)) ?? [], wordingsByFile);
    if (match === undefined) continue;
    used.add(match.signoff.claim);
    held.set(claim, withStatus({ claim, ...match }));
  }

  const orphans = [...latest.values()].filter((e) => !currentIds.has(e.claim) && !used.has(e.claim));
  const staleFor = matchStale(claims.filter((c) => !held.has(c)), orphans, wordingsByFile);
  const reviewed = claims.map((claim): ReviewedClaim => {
    const found = held.get(claim);
    if (found !== undefined) return found;
    const old = staleFor.get(claim);
    if (old === undefined) return { claim, status: 'open' };
    return { claim, status: 'stale', signoff: old, changes: markWordChanges(old.text, claim.text), ...movedFrom(claim, old) };
  });
  const counts = Object.fromEntries(REVIEW_STATUSES.map((s) => [s, 0])) as Record<ReviewStatus, number>;
  for (const r of reviewed) counts[r.status] += 1;
  return { claims: reviewed, counts };
}

/** The path a claim is known by in the ledger. */
function pathOf(claim: Claim): string {
  return claim.projectPath ?? claim.file;
}

function withStatus(r: Omit<ReviewedClaim, 'status'> & { signoff: SignoffEntry }): ReviewedClaim {
  return { ...r, status: r.signoff.decision === 'needs-change' ? 'needs change' : 'signed off' };
}

/**
 * The sign-off given to the same wording (up to copy-edits): in this file first, then in a file
 * that no longer holds that wording (the claim moved), then in a file that still does (the same
 * sentence in several files). Latest first within each.
 */
function sameWording(
  claim: Claim,
  entries: SignoffEntry[],
  wordingsByFile: Map<string, Set<string>>,
): Omit<ReviewedClaim, 'claim' | 'status'> & { signoff: SignoffEntry } | undefined {
  if (entries.length === 0) return undefined;
  const here = pathOf(claim);
  const copyEdited = (e: SignoffEntry) => (e.text.replace(/\s+/gu, ' ').trim() === claim.text.replace(/\s+/gu, ' ').trim() ? {} : { copyEdited: true });
  const newest = [...entries].reverse();
  const same = newest.find((e) => e.file === here);
  if (same !== undefined) return { signoff: same, ...copyEdited(same) };
  const wording = canonicalWording(claim.text);
  const moved = newest.find((e) => !(wordingsByFile.get(e.file)?.has(wording) ?? false));
  if (moved !== undefined) return { signoff: moved, movedFrom: moved.file, ...copyEdited(moved) };
  const shared = newest[0] as SignoffEntry;
  return { signoff: shared, sharedWith: shared.file, ...copyEdited(shared) };
}

function movedFrom(claim: Claim, entry: SignoffEntry): { movedFrom?: string } {
  return entry.file === pathOf(claim) ? {} : { movedFrom: entry.file };
}

/**
 * Pairs claims without a sign-off with orphaned sign-offs of the same file, or of a file that is not
 * in this run any more (moved or renamed), best score first.
 */
function matchStale(claims: Claim[], orphans: SignoffEntry[], wordingsByFile: Map<string, Set<string>>): Map<Claim, SignoffEntry> {
  const pairs: { claim: Claim; entry: SignoffEntry; score: number; order: number }[] = [];
  claims.forEach((claim, order) => {
    for (const entry of orphans) {
      const sameFile = entry.file === pathOf(claim);
      if (!sameFile && wordingsByFile.has(entry.file)) continue;
      const similarity = wordingSimilarity(claim.text, entry.text);
      if (similarity < SAME_CLAIM_THRESHOLD) continue;
      // A claim in its own file wins over one that may have moved with its file.
      pairs.push({ claim, entry, score: similarity - (sameFile ? 0 : 0.01), order });
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
