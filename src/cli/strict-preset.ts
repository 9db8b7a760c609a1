/**
 * The strict preset for publication (`check --strict`, or `fail_on: strict` in firnline.yaml):
 * every conflicting value and every reasoning error is an error, whatever level a pack or the
 * settings gave it, and errors fail the run. Raising the flags' levels (rather than the fail level)
 * keeps the text, JSON, SARIF and JUnit reports in agreement with the exit status.
 */
import type { CheckResult, Flag } from '../types.js';

/** Rule groups the preset raises: values out of range, the draft's own arithmetic and units, and reasoning. */
export const STRICT_GROUPS = ['value.', 'arith.', 'unit.', 'logic.', 'scope.', 'direction.'] as const;

/** True when the preset makes `flag` an error. */
export function isStrictFlag(flag: Pick<Flag, 'ruleId'>): boolean {
  return STRICT_GROUPS.some((group) => flag.ruleId.startsWith(group));
}

/** The result with every flag of a strict group raised to `error`. */
export function applyStrictPreset(result: CheckResult): CheckResult {
  const raise = (flag: Flag): Flag => (isStrictFlag(flag) && flag.level !== 'error' ? { ...flag, level: 'error' } : flag);
  return {
    ...result,
    flags: result.flags.map(raise),
    claims: result.claims.map((c) => ({ ...c, flags: c.flags.map(raise) })),
  };
}
