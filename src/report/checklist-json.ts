/**
 * The sign-off checklist as data: every claim of a run, flagged or not, with the values read, the
 * verdict, the flags, the reference values it was compared with, the sources, and where it stands
 * with the ledger. The Markdown checklist is written from this; `checklist --format json` writes it
 * as it is (described by schemas/checklist.schema.json).
 */
import type { ReviewSummary, ReviewStatus } from '../review/review-claims.js';
import type { ReferenceValue } from '../rulepack/types.js';
import type { Claim, Level, Source, Verdict } from '../types.js';

/** What the checklist is made from. */
export interface ChecklistInput {
  claims: Claim[];
  /** The claims joined with the ledger; without it every claim is `open`. */
  review?: ReviewSummary;
  /** Looks up a bound reference value (for its range and sources). */
  reference?: (id: string) => ReferenceValue | undefined;
  /** The rule packs checked against, e.g. `paleoclimate 1.0.0`. */
  packVersion: string;
  toolVersion: string;
  /** ISO 8601 date the checklist was made. */
  generated: string;
}

/** An interval with JSON-safe ends (`null` for an open end). */
export interface ChecklistRange {
  low: number | null;
  high: number | null;
  unit: string;
}

/** One claim to sign off. */
export interface ChecklistItem {
  id: string;
  file: string;
  line: number;
  column: number;
  /** In a Word draft, the paragraph number (`line` is then the same number; there are no lines). */
  paragraph?: number;
  heading: string;
  sentence: string;
  values: (ChecklistRange & { text: string })[];
  verdict: Verdict;
  references: (ChecklistRange & { id: string; measures: string; wording: string; asOf?: string })[];
  flags: { ruleId: string; level: Level; reason: string; correction?: string; suggestion?: string }[];
  sources: Source[];
  signoff: {
    status: ReviewStatus;
    reviewer?: string;
    date?: string;
    decision?: string;
    reason?: string;
    signedOffText?: string;
    changes?: string;
    movedFrom?: string;
    sharedWith?: string;
  };
}

/** The whole checklist. */
export interface Checklist {
  checklist: 1;
  tool: { name: 'firnline'; version: string };
  generated: string;
  packs: string;
  cautions: string;
  counts: { claims: number; files: number } & Record<Verdict, number> & Record<ReviewStatus, number>;
  claims: ChecklistItem[];
}

/** Stated at the head of every checklist, whatever the format. */
export const CHECKLIST_CAUTIONS =
  'Firnline supports, and does not replace, expert review. Reference values carry uncertainty and dates, and new literature can move them; read the sources before you tick a box.';

const bound = (n: number): number | null => (Number.isFinite(n) ? n : null);

/** Builds the checklist: claims sorted by file, then line and column. */
export function toChecklist(input: ChecklistInput): Checklist {
  const status = new Map(input.review?.claims.map((r) => [r.claim.id, r]) ?? []);
  const sorted = [...input.claims].sort(
    (a, b) => (a.file < b.file ? -1 : a.file > b.file ? 1 : 0) || a.span.start.offset - b.span.start.offset,
  );
  const claims = sorted.map((claim): ChecklistItem => {
    const references = claim.bindings.flatMap((b) => {
      const ref = input.reference?.(b.referenceId);
      return ref === undefined ? [] : [{ id: ref.id, measures: ref.measures, wording: ref.wording, low: bound(ref.low), high: bound(ref.high), unit: ref.unit, ...(ref.asOf === undefined ? {} : { asOf: ref.asOf }) }];
    });
    const sources = new Map<string, Source>();
    for (const b of claim.bindings) for (const s of input.reference?.(b.referenceId)?.sources ?? []) sources.set(s.id, s);
    for (const f of claim.flags) for (const s of f.sources) sources.set(s.id, s);
    const reviewed = status.get(claim.id);
    const signoff: ChecklistItem['signoff'] = { status: reviewed?.status ?? 'open' };
    if (reviewed?.signoff !== undefined) {
      Object.assign(signoff, { reviewer: reviewed.signoff.reviewer, date: reviewed.signoff.date, decision: reviewed.signoff.decision });
      if (reviewed.signoff.reason !== undefined) signoff.reason = reviewed.signoff.reason;
      if (reviewed.status === 'stale') signoff.signedOffText = reviewed.signoff.text;
      if (reviewed.changes !== undefined) signoff.changes = reviewed.changes;
      if (reviewed.movedFrom !== undefined) signoff.movedFrom = reviewed.movedFrom;
      if (reviewed.sharedWith !== undefined) signoff.sharedWith = reviewed.sharedWith;
    }
    return {
      id: claim.id,
      file: claim.file,
      line: claim.span.start.line,
      column: claim.span.start.column,
      ...(claim.paragraph === undefined ? {} : { paragraph: claim.paragraph.number }),
      heading: claim.heading,
      sentence: claim.text.replace(/\s+/gu, ' ').trim(),
      values: claim.quantities.map((q) => ({ text: q.text, low: bound(q.low), high: bound(q.high), unit: q.unit })),
      verdict: claim.verdict,
      references: dedupeById(references),
      flags: claim.flags.map((f) => ({ ruleId: f.ruleId, level: f.level, reason: f.reason, ...(f.correction === undefined ? {} : { correction: f.correction }), ...(f.suggestion === undefined ? {} : { suggestion: f.suggestion }) })),
      sources: [...sources.values()],
      signoff,
    };
  });
  const counts: Checklist['counts'] = { claims: claims.length, files: new Set(claims.map((c) => c.file)).size, agrees: 0, conflicts: 0, 'no reference': 0, 'signed off': 0, 'needs change': 0, stale: 0, open: 0 };
  for (const c of claims) {
    counts[c.verdict] += 1;
    counts[c.signoff.status] += 1;
  }
  return { checklist: 1, tool: { name: 'firnline', version: input.toolVersion }, generated: input.generated, packs: input.packVersion, cautions: CHECKLIST_CAUTIONS, counts, claims };
}

/** `checklist --format json`: the checklist, pretty-printed, ending with a newline. */
export function renderChecklistJson(input: ChecklistInput): string {
  return `${JSON.stringify(toChecklist(input), null, 2)}\n`;
}

function dedupeById<T extends { id: string }>(items: T[]): T[] {
  return [...new Map(items.map((i) => [i.id, i])).values()];
}
