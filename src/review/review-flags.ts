/**
 * The sign-off state of claims as flags, so that every report (text, JSON, SARIF, JUnit) and the
 * exit status say the same thing: under the sign-off gate an open claim, a claim changed since
 * sign-off and a claim marked "needs change" is each an error-level flag on the claim's sentence.
 * A "needs change" flag is made on every run, gate or not: it is the reviewer's comment reaching
 * the editor. These flags fail a run whatever `--fail-on` says, as the gate does.
 *
 *   signoff.needs-change  drafts/hall.md:5:1  Dr A. Rahman marked this claim as needing a change
 *                         on 2026-03-02: sea level was about 120 to 130 m lower.
 */
import type { Flag, RuleInfo } from '../types.js';
import type { ReviewedClaim, ReviewStatus } from './review-claims.js';

/** The rule id of each status that holds a claim back; `signed off` has none. */
export const SIGNOFF_RULE_IDS: Record<Exclude<ReviewStatus, 'signed off'>, string> = {
  open: 'signoff.open',
  stale: 'signoff.changed',
  'needs change': 'signoff.needs-change',
};

/** The rules of the sign-off flags, for `tool.driver.rules`, `explain` and the checklist. */
export const SIGNOFF_RULES: readonly RuleInfo[] = [
  {
    id: SIGNOFF_RULE_IDS.open,
    summary: 'A claim no expert has signed off yet.',
    description: 'Under the sign-off gate (check --require-signoff) every claim that will be published needs an expert sign-off in the ledger. Make the checklist (firnline checklist), have an expert tick it, and record it (firnline signoff).',
    defaultLevel: 'error',
    sources: [],
  },
  {
    id: SIGNOFF_RULE_IDS.stale,
    summary: 'A claim changed since an expert signed it off.',
    description: 'The sentence differs from the wording that was signed off in more than copy-edits (a number, unit, direction word, negation, hedge or other word changed). The words that changed are marked. Have an expert sign off the new wording.',
    defaultLevel: 'error',
    sources: [],
  },
  {
    id: SIGNOFF_RULE_IDS['needs change'],
    summary: 'An expert marked this claim as needing a change.',
    description: "The reviewer's comment says what must change. The claim stays failing until its wording changes and an expert signs off the new wording.",
    defaultLevel: 'error',
    sources: [],
  },
];

/** True for a flag made from the sign-off state rather than from the packs. */
export function isSignoffFlag(flag: Pick<Flag, 'ruleId'>): boolean {
  return flag.ruleId.startsWith('signoff.');
}

/**
 * The flags of reviewed claims: every `needs change` claim, and with `gate` every `open` and
 * `stale` claim too.
 */
export function signoffFlags(reviewed: readonly ReviewedClaim[], gate: boolean): Flag[] {
  const flags: Flag[] = [];
  for (const r of reviewed) {
    if (r.status === 'signed off' || (!gate && r.status !== 'needs change')) continue;
    const { claim } = r;
    const text = claim.text.replace(/\s+/gu, ' ').trim();
    flags.push({
      ruleId: SIGNOFF_RULE_IDS[r.status],
      level: 'error',
      file: claim.file,
      span: claim.span,
      excerpt: text,
      sentence: text,
      ...wordsFor(r),
      sources: [],
      claimId: claim.id,
    });
  }
  return flags;
}

function wordsFor(r: ReviewedClaim): Pick<Flag, 'reason' | 'suggestion'> {
  const s = r.signoff;
  const by = s === undefined ? '' : `${s.reviewer} on ${s.date.slice(0, 10)}`;
  const moved = r.movedFrom === undefined ? '' : ` (moved from ${r.movedFrom})`;
  if (r.status === 'needs change') {
    return {
      reason: `${by} marked this claim as needing a change: ${s?.reason ?? ''}${moved}`,
      suggestion: 'Change the claim as the reviewer asks, then have the new wording signed off.',
    };
  }
  if (r.status === 'stale') {
    const earlier = s?.decision === 'needs-change' ? `was marked as needing a change by ${by} (${s.reason ?? ''})` : `was signed off by ${by}`;
    return {
      reason: `This claim changed since it ${earlier}${moved}. What changed: ${r.changes ?? ''}`,
      suggestion: 'Have an expert check the new wording and sign it off.',
    };
  }
  return { reason: 'No expert has signed off this claim yet.', suggestion: 'Put it on the checklist (firnline checklist) for an expert to tick.' };
}
