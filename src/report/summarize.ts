import { LEVELS } from '../types.js';
import type { CheckResult, Level } from '../types.js';

/** The counts every report states: claims found, flags in all and by level, files skipped, claims marked as reported. */
export type ReportSummary = { claims: number; flags: number; skipped: number; marked: number } & Record<Level, number>;

/** Counts one run's claims, flags (in all and per level) and skipped files. */
export function summarize(result: CheckResult): ReportSummary {
  const byLevel = Object.fromEntries(LEVELS.map((level) => [level, 0])) as Record<Level, number>;
  for (const flag of result.flags) byLevel[flag.level] += 1;
  return {
    claims: result.claims.length,
    flags: result.flags.length,
    ...byLevel,
    skipped: result.skipped.length,
    marked: result.claims.filter((c) => c.marked === true).length,
  };
}

/** `1 file`, `2 files`: a count with its noun, plural by English rule for the nouns used here. */
export function countOf(count: number, noun: string): string {
  return `${count} ${noun}${count === 1 ? '' : 's'}`;
}
