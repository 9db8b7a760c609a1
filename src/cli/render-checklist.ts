import { renderChecklistJson } from '../report/checklist-json.js';
import { renderChecklistMarkdown } from '../report/checklist-markdown.js';
import { packVersionOf } from '../review/plan-signoffs.js';
import { readLedger } from '../review/read-ledger.js';
import { REVIEW_STATUSES, reviewClaims, UNREVIEWED_STATUSES, type ReviewSummary } from '../review/review-claims.js';
import { ledgerDate } from '../review/signoff-entry.js';
import type { CheckResult } from '../types.js';
import { VERSION } from '../version.js';
import type { RunSettings } from './run-settings.js';

/** The checklist formats, each a pure renderer of the same input. */
export const CHECKLIST_RENDERERS = { markdown: renderChecklistMarkdown, json: renderChecklistJson } as const;
export type ChecklistFormat = keyof typeof CHECKLIST_RENDERERS;

/**
 * The sign-off checklist of a run, joined with the ledger: used by `firnline checklist` and by
 * `firnline check --format markdown`.
 */
export async function renderChecklistOf(
  result: CheckResult,
  run: RunSettings,
  format: ChecklistFormat,
  cwd: string,
  options: { openOnly?: boolean } = {},
): Promise<{ text: string; review: ReviewSummary }> {
  const full = reviewClaims(result.claims, await readLedger(run.ledger, cwd));
  // --open: only what still needs the expert (open, changed since sign-off, needs change).
  const review = options.openOnly === true ? keepUnreviewed(full) : full;
  const text = CHECKLIST_RENDERERS[format]({
    claims: review.claims.map((r) => r.claim),
    review,
    reference: (id) => run.packs.reference(id),
    // The packs with the date their values were last reviewed: a checklist states what it was checked against.
    packVersion: run.packs.packs.map((p) => `${p.id} ${p.version} (values as of ${p.asOf})`).join(', ') || packVersionOf(run.packs),
    toolVersion: VERSION,
    generated: ledgerDate(),
  });
  return { text, review };
}

function keepUnreviewed(review: ReviewSummary): ReviewSummary {
  const claims = review.claims.filter((r) => UNREVIEWED_STATUSES.includes(r.status));
  const counts = Object.fromEntries(REVIEW_STATUSES.map((s) => [s, claims.filter((r) => r.status === s).length])) as ReviewSummary['counts'];
  return { claims, counts };
}
