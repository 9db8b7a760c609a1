import { readFile } from 'node:fs/promises';
import { relative } from 'node:path';
import { FirnlineError } from '../errors.js';
import { CHECKLIST_MARKER } from '../report/checklist-markdown.js';
import { parseTickedChecklist } from '../report/checklist-ticks.js';
import { readChecklistBoxes } from '../report/checklist-remarks.js';
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
  // Boxes Firnline ticked itself (their sign-off held) are not the reviewer's; comments on unticked boxes are.
  const boxes = new Map(readChecklistBoxes(existing).map((b) => [b.line, b]));
  const ticked = parseTickedChecklist(existing, shown).filter((t) => boxes.get(t.line)?.alreadySignedOff !== true);
  const commented = [...boxes.values()].filter((b) => !b.ticked && (b.needsChange !== undefined || b.note !== undefined));
  if (ticked.length + commented.length === 0) return;
  const recorded = new Set((await readLedger(ledgerFile, cwd)).signoffs.map((s) => s.claim));
  const pending = [...ticked, ...commented].filter((t) => !recorded.has(t.claimId)).sort((a, b) => a.line - b.line);
  if (pending.length > 0) {
    throw new FirnlineError(
      'output-has-ticks',
      `this checklist has ${pending.length} ticked or commented ${pending.length === 1 ? 'box' : 'boxes'} not yet in the ledger; run \`firnline signoff --from ${shown} --by NAME\` first, or pass --force to replace it`,
      { file: shown, line: pending[0]?.line ?? 1 },
    );
  }
}
