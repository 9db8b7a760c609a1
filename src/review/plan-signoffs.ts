/**
 * Turns requested sign-offs (ticked boxes, or ids on the command line) into ledger entries, checked
 * against the claims as the drafts stand now. Everything is checked before anything is written, so a
 * mistake in one box leaves the ledger untouched. A request that repeats the claim's current
 * sign-off word for word is skipped: importing one checklist twice adds nothing.
 */
import { FirnlineError } from '../errors.js';
import type { Claim } from '../types.js';
import { foldClaimText } from './claim-id.js';
import { DECISIONS_NEEDING_REASON, type Decision, type Ledger, type SignoffEntry } from './signoff-entry.js';

/** What the reason of each decision says, for the error when it is missing. */
const REASON_WORDS: Partial<Record<Decision, string>> = { waived: 'why the claim stands', corrected: 'what was corrected', 'needs-change': 'what must change' };

/** One sign-off asked for; `where` places errors (a checklist line, or the command line). */
export interface SignoffRequest {
  claimId: string;
  decision: Decision;
  reason?: string;
  note?: string;
  where?: { file: string; line?: number; column?: number };
}

/** Who signs, when, and against which packs. */
export interface SignoffContext {
  reviewer: string;
  date: string;
  packVersion: string;
}

/** The entries to append, and how many requests were already recorded. */
export interface SignoffPlan {
  entries: SignoffEntry[];
  unchanged: number;
}

/** Checks every request, then builds its entry. Throws the first mistake, nothing written. */
export function planSignoffs(requests: SignoffRequest[], claims: Claim[], ledger: Ledger, context: SignoffContext): SignoffPlan {
  const byId = new Map(claims.map((c) => [c.id, c]));
  const latest = new Map(ledger.signoffs.map((e) => [e.claim, e]));
  const entries: SignoffEntry[] = [];
  let unchanged = 0;
  const planned = new Set<string>();
  for (const request of requests) {
    const claim = byId.get(request.claimId);
    if (claim === undefined) {
      throw new FirnlineError('signoff-unknown-claim', `claim ${request.claimId} is not in the drafts as they stand now (changed or removed?); make the checklist again with \`firnline checklist\``, request.where);
    }
    if (DECISIONS_NEEDING_REASON.includes(request.decision) && (request.reason ?? '').trim() === '') {
      throw new FirnlineError('signoff-no-reason', `a ${request.decision} sign-off needs a reason: say ${REASON_WORDS[request.decision] ?? 'why'}`, request.where);
    }
    const entry: SignoffEntry = {
      claim: claim.id,
      file: claim.projectPath ?? claim.file,
      text: foldClaimText(claim.text),
      decision: request.decision,
      ...(request.reason === undefined || request.decision === 'approved' ? {} : { reason: request.reason.trim() }),
      reviewer: context.reviewer,
      date: context.date,
      ...(request.note === undefined ? {} : { note: request.note }),
      packVersion: context.packVersion,
    };
    if (planned.has(entry.claim) || sameDecision(latest.get(entry.claim), entry)) {
      unchanged += 1;
      continue;
    }
    planned.add(entry.claim);
    entries.push(entry);
  }
  return { entries, unchanged };
}

function sameDecision(old: SignoffEntry | undefined, next: SignoffEntry): boolean {
  return (
    old !== undefined &&
    old.reviewer === next.reviewer &&
    old.decision === next.decision &&
    old.reason === next.reason &&
    old.note === next.note &&
    foldClaimText(old.text) === next.text
  );
}

/** The packs a run checked against, as the ledger records them: `paleoclimate 1.0.0, house 2.1`. */
export function packVersionOf(packs: { packs: { id: string; version: string }[] }): string {
  return packs.packs.map((p) => `${p.id} ${p.version}`).join(', ') || 'no packs';
}
