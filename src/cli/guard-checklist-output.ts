import { readFile } from 'node:fs/promises';
import { relative } from 'node:path';
import { FirnlineError } from '../errors.js';
import { CHECKLIST_MARKER } from '../report/checklist-markdown.js';
import { parseTickedChecklist } from '../report/checklist-ticks.js';
import { readLedger } from '../review/read-ledger.js';

/**
 * Refuses to overwrite what a person wrote: a file that is not a checklist Firnline made, or a
 * checklist whose ticked boxes are not all in the ledger yet (an expert's ticks would be lost).
 * A missing file, or a checklist whose ticks are all recorded, may be replaced.
 */
export async function guardChecklistOutput(target: string, ledgerFile: string, cwd: string): Promise<void> {
  let existing: string;
  try {
    existing = await readFile(target, 'utf8');
  } catch {
    return;
  }
  const shown = relative(cwd, target);
  if (!existing.trimStart().startsWith(CHECKLIST_MARKER)) {
    throw new FirnlineError('output-not-checklist', 'this file exists and is not a checklist Firnline wrote; choose another path, or pass --force to replace it', { file: shown });
  }
  const ticked = parseTickedChecklist(existing, shown);
  if (ticked.length === 0) return;
  const recorded = new Set((await readLedger(ledgerFile, cwd)).signoffs.map((s) => s.claim));
  const pending = ticked.filter((t) => !recorded.has(t.claimId));
  if (pending.length > 0) {
    throw new FirnlineError(
      'output-has-ticks',
      `this checklist has ${pending.length} ticked ${pending.length === 1 ? 'box' : 'boxes'} not yet in the ledger; run \`firnline signoff --from ${shown} --by NAME\` first, or pass --force to replace it`,
      { file: shown, line: pending[0]?.line ?? 1 },
    );
  }
}
