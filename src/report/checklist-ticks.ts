/**
 * Reads a sign-off checklist back after a reviewer ticked it. A ticked box is any list item that
 * starts with `[x]` or `[X]`; its claim id is the first `c` + 10 hex digits on the box line. The
 * item runs on until the next list box or heading, so an editor's reflowing or extra remarks do
 * not matter. Within it, `(corrected: ...)`, `(waived: ...)` and `(note: ...)` are read (the last of
 * each counts, so a sentence that itself holds "(note: ..." is not mistaken when the reviewer's
 * own remark follows it). Unticked boxes are left alone.
 *
 *   - [x] **c9f3a0b12cd** line 3: The Dome C core ... (waived: quoted in order to answer it)
 */
import { FirnlineError } from '../errors.js';
import type { Decision } from '../review/signoff-entry.js';

/** One ticked box. `file` is the file section it was under; `line` is its line in the checklist. */
export interface TickedClaim {
  claimId: string;
  file?: string;
  decision: Decision;
  reason?: string;
  note?: string;
  line: number;
}

const BOX = /^\s*(?:[-*+]|\d+[.)])\s+\[([ xX])\]/u;
const HEADING = /^\s{0,3}#{1,6}\s/u;
const FILE_HEADING = /^\s{0,3}##\s+File\s+(?:`([^`]+)`|("(?:[^"\\]|\\.)*"))\s*$/u;
/** Anything a reviewer may have meant as a tick: a bracket pair of up to three characters at the start of a line. */
const BOX_LIKE = /^\s*(?:[-*+]|\d+[.)])?\s*\[([^\]]{0,3})\]/u;
const CLAIM_ID = /\bc[0-9a-f]{10}(?:-\d+)?\b/u;
// A bracket escaped by the checklist writer (`\(`) is the draft's own text, never a mark.
const MARK = /(?<!\\)\((approved|corrected|waived|note)\s*:\s*([^)]*)\)/giu;

/** Every ticked box, in checklist order; `file` names the checklist in error messages. */
export function parseTickedChecklist(markdown: string, file = 'checklist'): TickedClaim[] {
  const lines = markdown.split(/\r\n|\r|\n/u);
  const ticked: TickedClaim[] = [];
  let section: string | undefined;
  for (let i = 0; i < lines.length; i += 1) {
    const line = lines[i] ?? '';
    const heading = FILE_HEADING.exec(line);
    if (heading !== null) section = heading[1] ?? fileNameOf(heading[2] ?? '""');
    const box = BOX.exec(line);
    if (box === null) {
      const odd = BOX_LIKE.exec(line);
      // A box ticked in a form this reader does not take ([x ], [✓], -[x]) must not pass unnoticed.
      if (odd !== null && isOddBox(line)) {
        throw new FirnlineError('checklist-odd-tick', `this box reads [${odd[1] ?? ''}], which is not a tick Firnline reads; write - [x] to tick it, or - [ ] to leave it open`, { file, line: i + 1, column: line.indexOf('[') + 1 });
      }
      continue;
    }
    if (box[1] === ' ') continue;
    let end = i + 1;
    while (end < lines.length && !BOX.test(lines[end] ?? '') && !isOddBox(lines[end] ?? '') && !HEADING.test(lines[end] ?? '')) end += 1;
    const id = CLAIM_ID.exec(line.slice(box[0].length));
    const column = line.indexOf('[') + 1;
    if (id === null) {
      throw new FirnlineError('checklist-no-id', 'this ticked box has no claim id (c followed by 10 hex digits); make the checklist again with `firnline checklist`', { file, line: i + 1, column });
    }
    const item: TickedClaim = { claimId: id[0], decision: 'approved', line: i + 1, ...(section === undefined ? {} : { file: section }) };
    readMarks(lines.slice(i, end).join(' ').replace(/\s+/gu, ' '), item, { file, line: i + 1, column });
    const twin = ticked.find((t) => t.claimId === item.claimId && t.file === item.file);
    if (twin !== undefined && (twin.decision !== item.decision || twin.reason !== item.reason)) {
      throw new FirnlineError('checklist-twice', `claim ${item.claimId} is ticked twice with different decisions (see line ${twin.line}); keep one`, { file, line: i + 1, column });
    }
    if (twin === undefined) ticked.push(item);
    i = end - 1;
  }
  return ticked;
}

/** Fills decision, reason and note from the reviewer's bracketed marks. */
function readMarks(text: string, item: TickedClaim, where: { file: string; line: number; column: number }): void {
  const found = new Map<string, string>();
  for (const m of text.matchAll(MARK)) found.set((m[1] ?? '').toLowerCase(), (m[2] ?? '').trim());
  const decisions = (['corrected', 'waived'] as const).filter((d) => found.has(d));
  if (decisions.length > 1) {
    throw new FirnlineError('checklist-two-decisions', 'this box is marked both corrected and waived; keep one', where);
  }
  const decision = decisions[0];
  if (decision !== undefined) {
    const reason = found.get(decision) ?? '';
    if (reason === '') {
      throw new FirnlineError('checklist-no-reason', `say why after "(${decision}:", e.g. (${decision}: ${decision === 'waived' ? 'quoted in order to answer it' : 'now gives 800,000 years'})`, where);
    }
    item.decision = decision;
    item.reason = reason;
  }
  const note = found.get('note') ?? found.get('approved');
  if (note !== undefined && note !== '') item.note = note;
}

/** A box with a claim id whose tick is neither `[ ]` nor a form BOX reads. */
function isOddBox(line: string): boolean {
  const odd = BOX_LIKE.exec(line);
  return odd !== null && odd[1] !== ' ' && odd[1] !== '' && !BOX.test(line) && CLAIM_ID.test(line);
}

function fileNameOf(quoted: string): string {
  try {
    return String(JSON.parse(quoted));
  } catch {
    return quoted;
  }
}
