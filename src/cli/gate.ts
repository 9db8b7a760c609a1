/**
 * What the ledger and `check --require-signoff` / `--changed-since` add to a run: keep only the
 * claims on changed lines, join claims with the sign-off ledger (on every run: a waived or approved
 * flag shows as signed off and does not fail a plain `check`, and a "needs change" comment is a
 * flag on its claim), and under the gate fail while any claim is open, changed since sign-off or
 * marked "needs change". The sign-off state becomes `signoff.*` flags, so every report agrees with
 * the exit status.
 */
import { relative } from 'node:path';
import { changedLines, EVERY_LINE } from '../review/changed-lines.js';
import { describeReview } from '../review/describe-review.js';
import { readLedger } from '../review/read-ledger.js';
import { reviewClaims, type ReviewSummary } from '../review/review-claims.js';
import { SIGNOFF_RULES, signoffFlags } from '../review/review-flags.js';
import { sortById } from '../report/sort.js';
import type { CheckResult, Claim, Flag } from '../types.js';

/** How the gate is set up; `ledgerFile` is absolute. */
export interface GateOptions {
  requireSignoff: boolean;
  changedSince?: string;
  ledgerFile: string;
  cwd: string;
}

/** The run as reported after the gate, and whether the gate fails it. */
export interface GateOutcome {
  /** Claims and flags left after `--changed-since`; flags on signed-off claims carry their `signoff`. */
  result: CheckResult;
  /** Flags that may still fail the run (those on signed-off claims are left out). */
  failingFlags: Flag[];
  /** True when some claim is marked "needs change", or sign-off is required and some claim is open or stale. */
  failed: boolean;
  /** Lines for the reader: counts, stale claims with old and new wording, open claims. */
  summary: string[];
  /** The review, when sign-off was required. */
  review?: ReviewSummary;
}

/** Applies `--changed-since` and `--require-signoff` to a run. */
export async function applyGate(result: CheckResult, options: GateOptions): Promise<GateOutcome> {
  const summary: string[] = [];
  let scoped = result;
  if (options.changedSince !== undefined) {
    const changed = await changedLines(options.changedSince, options.cwd);
    scoped = onChangedLines(result, changed);
    summary.push(`Changed since ${options.changedSince}: ${scoped.claims.length} of ${result.claims.length} claims are on changed lines.`);
  }
  const review = reviewClaims(scoped.claims, await readLedger(options.ledgerFile, options.cwd));
  const signedOff = new Map(review.claims.filter((r) => r.status === 'signed off').map((r) => [r.claim.id, r.signoff]));
  const failingFlags: Flag[] = [];
  const flags = scoped.flags.map((flag) => {
    const entry = flag.claimId === undefined ? undefined : signedOff.get(flag.claimId);
    if (entry === undefined) {
      failingFlags.push(flag);
      return flag;
    }
    return { ...flag, signoff: { reviewer: entry.reviewer, date: entry.date, decision: entry.decision } };
  });
  const stateFlags = signoffFlags(review.claims, options.requireSignoff);
  failingFlags.push(...stateFlags);
  const allFlags = [...flags, ...stateFlags];
  // Grouped in one pass (a filter per claim was quadratic: minutes on megabytes of on-topic prose).
  const flagsOf = new Map<string, Flag[]>();
  for (const f of allFlags) {
    if (f.claimId === undefined) continue;
    const list = flagsOf.get(f.claimId);
    if (list === undefined) flagsOf.set(f.claimId, [f]);
    else list.push(f);
  }
  const claims = scoped.claims.map((c) => ({ ...c, flags: flagsOf.get(c.id) ?? [] }));
  const ruleIds = new Set(stateFlags.map((f) => f.ruleId));
  const rules = sortById([...scoped.rules, ...SIGNOFF_RULES.filter((r) => ruleIds.has(r.id))]);
  const excused = flags.length - (failingFlags.length - stateFlags.length);
  if (options.requireSignoff) {
    summary.push(...describeReview(review));
  } else if (review.counts['needs change'] > 0) {
    summary.push(`${review.counts['needs change']} claim${review.counts['needs change'] === 1 ? ' is' : 's are'} marked "needs change" by a reviewer; they fail the run until changed and signed off again.`);
  }
  if (excused > 0) summary.push(`${excused} flag${excused === 1 ? '' : 's'} on signed-off claims shown as signed off; they do not fail the run.`);
  if (options.requireSignoff || excused > 0 || stateFlags.length > 0) summary.push(`Ledger: ${relative(options.cwd, options.ledgerFile) || options.ledgerFile}`);
  return {
    result: { ...scoped, claims, flags: allFlags, rules },
    failingFlags,
    failed: stateFlags.length > 0,
    summary,
    review,
  };
}

/** Keeps claims with a line in `changed`, and the flags that belong to them. */
export function onChangedLines(result: CheckResult, changed: Map<string, Set<number>>): CheckResult {
  const touches = (file: string, from: number, to: number) => {
    const lines = changed.get(file);
    if (lines === undefined) return false;
    if (lines.has(EVERY_LINE)) return true;
    for (let n = from; n <= to; n += 1) if (lines.has(n)) return true;
    return false;
  };
  const claims: Claim[] = result.claims.filter((c) => touches(c.file, c.span.start.line, c.span.end.line));
  const kept = new Set(claims.map((c) => c.id));
  const flags = result.flags.filter((f) =>
    f.claimId === undefined ? touches(f.file, f.span.start.line, f.span.end.line) : kept.has(f.claimId),
  );
  const ruleIds = new Set(flags.map((f) => f.ruleId));
  return { ...result, claims, flags, rules: result.rules.filter((r) => ruleIds.has(r.id)) };
}
