/**
 * Per-rule and per-file counts of a run, for large runs where one block per flag is too much to
 * read: which rules fire most, and which files need most work.
 *
 *   Flags by rule (3 rules):
 *     value.co2-lgm            12  (error 12)
 *   Flags by file (40 files with flags; most first):
 *     drafts/hall-a.md          9  (error 2, warning 7)
 */
import { LEVELS, type CheckResult, type Flag, type Level } from '../types.js';

/** Runs with at least this many files with flags get the breakdown after the flags. */
export const BREAKDOWN_MIN_FILES = 20;

/** How many files the per-file list shows at most. */
export const BREAKDOWN_MAX_FILES = 25;

/** The breakdown lines of `result` (empty when there are no flags). */
export function describeBreakdown(result: Pick<CheckResult, 'flags'>): string[] {
  if (result.flags.length === 0) return [];
  const byRule = groupCounts(result.flags, (f) => f.ruleId);
  const byFile = groupCounts(result.flags, (f) => f.file);
  const width = Math.max(...[...byRule, ...byFile.slice(0, BREAKDOWN_MAX_FILES)].map((g) => g.key.length));
  const row = (g: Group) => `  ${g.key.padEnd(width)}  ${String(g.total).padStart(4)}  (${LEVELS.filter((l) => g.levels[l] > 0).map((l) => `${l} ${g.levels[l]}`).join(', ')})`;
  const lines = [`Flags by rule (${byRule.length} rule${byRule.length === 1 ? '' : 's'}):`, ...byRule.map(row)];
  lines.push(`Flags by file (${byFile.length} file${byFile.length === 1 ? '' : 's'} with flags; most first):`, ...byFile.slice(0, BREAKDOWN_MAX_FILES).map(row));
  if (byFile.length > BREAKDOWN_MAX_FILES) lines.push(`  ... and ${byFile.length - BREAKDOWN_MAX_FILES} more files.`);
  return lines;
}

/** True when a run is large enough that the breakdown is shown without being asked for. */
export function wantsBreakdown(result: Pick<CheckResult, 'flags'>): boolean {
  return new Set(result.flags.map((f) => f.file)).size >= BREAKDOWN_MIN_FILES;
}

interface Group {
  key: string;
  total: number;
  levels: Record<Level, number>;
}

/** Counts per key, most flags first, then by key. */
function groupCounts(flags: readonly Flag[], keyOf: (f: Flag) => string): Group[] {
  const groups = new Map<string, Group>();
  for (const flag of flags) {
    const key = keyOf(flag);
    const group = groups.get(key) ?? { key, total: 0, levels: { error: 0, warning: 0, note: 0 } };
    group.total += 1;
    group.levels[flag.level] += 1;
    groups.set(key, group);
  }
  return [...groups.values()].sort((a, b) => b.total - a.total || a.key.localeCompare(b.key));
}
