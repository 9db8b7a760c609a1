import { readRegularText } from '../guard/read-regular-file.js';
import { relative } from 'node:path';
import { FirnlineError } from '../errors.js';
import { CHECKLIST_MARKER } from '../report/checklist-markdown.js';
import { isWriterLine } from '../report/checklist-lines.js';
import { parseTickedChecklist } from '../report/checklist-ticks.js';
import { readChecklistBoxes } from '../report/checklist-remarks.js';
import { readLedger } from '../review/read-ledger.js';

/**
 * Refuses to overwrite what a person wrote: a file that is not a checklist Firnline made, or a
 * checklist whose ticked boxes are not all in the ledger yet (an expert's ticks would be lost).
 * A missing file, or a checklist whose ticks are all recorded, may be replaced. With
 * `onlyChecklists` (`check --format markdown -o`, which like every report may replace any file),
 * only a checklist is guarded.
 */
export async function guardChecklistOutput(target: string, ledgerFile: string, cwd: string, regenerated = '', options: { onlyChecklists?: boolean } = {}): Promise<void> {
  let existing: string;
  try {
    existing = await readRegularText(target, { shown: relative(cwd, target) });
  } catch (error) {
    if (error instanceof FirnlineError) throw error;
    return;
  }
  const shown = relative(cwd, target);
  if (!existing.trimStart().startsWith(CHECKLIST_MARKER)) {
    if (options.onlyChecklists === true) return;
    throw new FirnlineError('output-not-checklist', 'this file exists and is not a checklist Firnline wrote; choose another path, or pass --force to replace it', { file: shown });
  }
  const ticked = parseTickedChecklist(existing, shown);
  const recorded = new Set((await readLedger(ledgerFile, cwd)).signoffs.map((s) => s.claim));
  const foreign = firstForeignLine(existing, regenerated, recorded);
  if (foreign !== undefined) {
    throw new FirnlineError(
      'output-has-notes',
      'this checklist holds a mark or text Firnline did not write (a reviewer\'s note, or a tick in another form); record it with `firnline signoff --from` or move it elsewhere, or pass --force to replace the file',
      { file: shown, line: foreign, column: 1 },
    );
  }
  // Boxes Firnline ticked itself (their sign-off held) are not the reviewer's; comments on unticked boxes are.
  const boxes = readChecklistBoxes(existing);
  const byLine = new Map(boxes.map((b) => [b.line, b]));
  const mine = ticked.filter((t) => byLine.get(t.line)?.alreadySignedOff !== true);
  const remarked = remarkedLines(existing, regenerated);
  const commented = boxes.filter((b) => !b.ticked && (b.needsChange !== undefined || b.note !== undefined || remarked.has(b.line)));
  const pending = [...mine, ...commented].filter((t) => !recorded.has(t.claimId)).sort((a, b) => a.line - b.line);
  if (pending.length > 0) {
    throw new FirnlineError(
      'output-has-ticks',
      `this checklist has ${pending.length} ticked or commented ${pending.length === 1 ? 'box' : 'boxes'} not yet in the ledger; run \`firnline signoff --from ${shown} --by NAME\` first, or pass --force to replace it`,
      { file: shown, line: pending[0]?.line ?? 1 },
    );
  }
}

const BOX_LINE = /^- \[([ xX])\] \*\*(c[0-9a-f]{10}(?:-\d+)?)\*\* (?:line|paragraph) \d+: /u;
const UNTICKED_ID = /^- \[ \] \*\*(c[0-9a-f]{10}(?:-\d+)?)\*\* /u;
const REVIEWER_MARK = /(?<!\\)\((?:approved|corrected|waived|note|needs[ -]change)\s*:/iu;

/**
 * The lines (1-based) of unticked boxes with words typed after their sentence ("wrong: about
 * 120 m"): the freshly written checklist has a box for the same claim whose line the old one extends.
 */
function remarkedLines(existing: string, regenerated: string): Set<number> {
  const fresh = new Map<string, string>();
  for (const line of regenerated.split('\n')) {
    const id = UNTICKED_ID.exec(line)?.[1];
    if (id !== undefined && !fresh.has(id)) fresh.set(id, line);
  }
  const found = new Set<number>();
  for (const [i, old] of existing.split(/\r\n|\r|\n/u).entries()) {
    const now = fresh.get(UNTICKED_ID.exec(old)?.[1] ?? '');
    if (now !== undefined && old !== now && old.startsWith(now) && old.slice(now.length).trim() !== '') found.add(i + 1);
  }
  return found;
}

/**
 * The line number of the first line a person added or changed, or undefined. A line counts as
 * Firnline's when the writer would produce it now, or when it has one of the writer's forms and no
 * unescaped reviewer mark; a box line, ticked or carrying a comment, counts when its claim is
 * already in the ledger (the decision or comment was recorded).
 */
function firstForeignLine(existing: string, regenerated: string, recorded: ReadonlySet<string>): number | undefined {
  const known = new Set(regenerated.split('\n'));
  const lines = existing.split(/\r\n|\r|\n/u);
  for (const [i, line] of lines.entries()) {
    if (known.has(line)) continue;
    const box = BOX_LINE.exec(line);
    if (box !== null && recorded.has(box[2] ?? '')) continue; // its decision or comment is in the ledger
    if (box !== null && box[1] !== ' ') continue; // a plain tick not yet recorded is reported below, by claim
    if (REVIEWER_MARK.test(line)) return i + 1;
    if (!isWriterLine(line)) return i + 1;
  }
  return undefined;
}
