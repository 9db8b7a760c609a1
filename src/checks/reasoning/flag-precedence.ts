/**
 * Which explanation a stretch of text gets when two rules flag overlapping words. By default the
 * first flag in pack order wins (reasoning checks, then direction facts, then pattern rules); this
 * table names the exceptions, where a later, more specific flag should win over an earlier one.
 *
 *   "As the oceans warm they absorb more CO2, so warming drives CO2 and CO2 does not drive it."
 *   An either/or flag over the whole stretch would hide the wrong-way-round solubility statement
 *   inside it; the direction fact says exactly what is wrong, so it wins.
 */
import type { FlagDraft } from '../../types.js';

/** One exception: a flag whose rule id starts with `winner` beats an overlapping `loser` flag. */
export interface Precedence {
  winner: string;
  loser: string;
}

/** The built-in exceptions. */
export const PRECEDENCE: readonly Precedence[] = [{ winner: 'direction.', loser: 'logic.either-or-causation' }];

const overlaps = (a: FlagDraft, b: FlagDraft) => a.start < b.end && b.start < a.end;

/**
 * `found` without the flags that an overlapping flag outranks by `table`; the others keep
 * their order, so the first-in-pack-order rule still settles every other overlap.
 */
export function dropOutranked<T extends { flag: FlagDraft }>(found: readonly T[], table: readonly Precedence[] = PRECEDENCE): T[] {
  return found.filter(({ flag }) =>
    !found.some(({ flag: other }) =>
      other !== flag && overlaps(flag, other) && table.some((p) => flag.ruleId === p.loser && other.ruleId.startsWith(p.winner)),
    ),
  );
}
