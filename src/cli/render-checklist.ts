import { renderChecklistJson } from '../report/checklist-json.js';
import { renderChecklistMarkdown } from '../report/checklist-markdown.js';
import { packVersionOf } from '../review/plan-signoffs.js';
import { readLedger } from '../review/read-ledger.js';
import { reviewClaims, type ReviewSummary } from '../review/review-claims.js';
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
): Promise<{ text: string; review: ReviewSummary }> {
  const review = reviewClaims(result.claims, await readLedger(run.ledger, cwd));
  const text = CHECKLIST_RENDERERS[format]({
    claims: result.claims,
    review,
    reference: (id) => run.packs.reference(id),
    // The packs with the date their values were last reviewed: a checklist states what it was checked against.
    packVersion: run.packs.packs.map((p) => `${p.id} ${p.version} (values as of ${p.asOf})`).join(', ') || packVersionOf(run.packs),
    toolVersion: VERSION,
    generated: ledgerDate(),
  });
  return { text, review };
}
