/**
 * Every rule id a run can report: those the loaded packs declare (reference values, direction
 * facts, reasoning checks, pattern rules), those written in code (the draft's own arithmetic and
 * units), and the sign-off states. Used to reject a misspelt id in the settings' `levels`, and by
 * `explain` to suggest close ids.
 */
import { SIGNOFF_RULE_IDS } from '../review/review-flags.js';
import type { LoadedPacks } from './types.js';

/** Rule ids that live in code (src/checks/arithmetic*.ts, units*.ts, reference-slips.ts). A test keeps this list complete. */
export const CODE_RULE_IDS: readonly string[] = [
  'arith.change', 'arith.duration', 'arith.rate', 'arith.ratio',
  'unit.age-era', 'unit.age-scale', 'unit.duration', 'unit.era-reference-year', 'unit.length', 'unit.percent-ppm', 'unit.ppb-ppm', 'unit.scale-slip', 'unit.temperature', 'unit.temperature-difference',
];

/** Every known rule id, sorted. */
export function knownRuleIds(packs: LoadedPacks): string[] {
  return [
    ...packs.references.map((r) => `value.${r.id}`),
    ...packs.directions.map((d) => `direction.${d.id}`),
    ...packs.reasoning.map((c) => c.id),
    ...packs.patterns.map((p) => p.id),
    ...CODE_RULE_IDS,
    ...Object.values(SIGNOFF_RULE_IDS),
  ].sort();
}

/** Edit distance (insert, delete, replace, swap of neighbours) between two ids. */
export function editDistance(a: string, b: string): number {
  const d = Array.from({ length: a.length + 1 }, (_, i) => [i, ...new Array<number>(b.length).fill(0)]);
  for (let j = 1; j <= b.length; j += 1) (d[0] as number[])[j] = j;
  for (let i = 1; i <= a.length; i += 1) {
    for (let j = 1; j <= b.length; j += 1) {
      const row = d[i] as number[];
      const cost = a[i - 1] === b[j - 1] ? 0 : 1;
      row[j] = Math.min((d[i - 1] as number[])[j] as number + 1, (row[j - 1] as number) + 1, ((d[i - 1] as number[])[j - 1] as number) + cost);
      if (i > 1 && j > 1 && a[i - 1] === b[j - 2] && a[i - 2] === b[j - 1]) row[j] = Math.min(row[j] as number, ((d[i - 2] as number[])[j - 2] as number) + 1);
    }
  }
  return (d[a.length] as number[])[b.length] as number;
}

/**
 * Up to `max` known ids close to `id`: within an edit distance of a third of its length, or
 * containing it (or its part after the group), closest first, and none more than one edit further
 * off than the closest.
 */
export function closeIds(id: string, known: readonly string[], max = 3): string[] {
  const wanted = id.toLowerCase();
  const tail = wanted.includes('.') ? wanted.slice(wanted.indexOf('.') + 1) : wanted;
  const limit = Math.max(2, Math.floor(wanted.length / 3));
  return known
    .map((k) => {
      const bare = k.slice(k.indexOf('.') + 1);
      const distance = Math.min(editDistance(wanted, k), editDistance(wanted, bare));
      const contains = tail.length >= 3 && k.includes(tail);
      return { k, score: contains ? Math.min(distance, limit) - 0.5 : distance };
    })
    .filter((x) => x.score <= limit)
    .sort((a, b) => a.score - b.score || a.k.localeCompare(b.k))
    // Only the nearest: beside a one-letter slip, an id four edits away is noise, not a hint.
    .filter((x, _, all) => x.score <= (all[0]?.score ?? 0) + 1)
    .slice(0, max)
    .map((x) => x.k);
}
