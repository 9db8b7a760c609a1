import { FirnlineError } from '../errors.js';
import { visibleLine } from '../guard/visible-text.js';
import type { CheckResult } from '../types.js';
import type { CliContext } from './context.js';

/**
 * Prints one line per draft that was named or walked but could not be checked (not UTF-8, a
 * special file, too large, nested too deep) and returns how many there were: such a run must not
 * pass, so the caller sets exit status 2. Excluded files are never read and never listed.
 */
export function reportUnchecked(result: CheckResult, ctx: Pick<CliContext, 'stderr'>): number {
  const unchecked = result.skipped.filter((s) => s.unchecked === true);
  for (const s of unchecked) {
    const where = s.line === undefined ? { file: s.file } : { file: s.file, line: s.line, ...(s.column === undefined ? {} : { column: s.column }) };
    ctx.stderr(`${visibleLine(new FirnlineError('draft-unchecked', `${s.reason} (not checked)`, where).toLine())}\n`);
  }
  return unchecked.length;
}
