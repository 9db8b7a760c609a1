/**
 * Turns a reviewed checklist into sign-off requests, and says what it leaves out and why: a ticked
 * box records its decision; a box Firnline ticked because its sign-off already held records nothing
 * new; `(needs change: ...)` on any box records `needs-change` with that comment; a `(note: ...)` or
 * a remark typed on an unticked box records `needs-change` too, so the comment reaches the editor
 * and the gate stays red (an unticked box is not an approval); a decision mark on an unticked box is
 * not recorded, and is reported.
 */
import { parseTickedChecklist } from '../report/checklist-ticks.js';
import { readChecklistBoxes, remarkOf } from '../report/checklist-remarks.js';
import type { SignoffRequest } from '../review/plan-signoffs.js';
import type { Claim } from '../types.js';

/** What a checklist asks for, and what it holds that is not recorded, with the reason. */
export interface ChecklistRequests {
  requests: SignoffRequest[];
  notRecorded: string[];
  /** Boxes ticked because their sign-off already held. */
  alreadySignedOff: number;
}

/** Reads `markdown` (shown as `file`) against the claims as the drafts stand now. */
export function checklistRequests(markdown: string, file: string, claims: readonly Claim[]): ChecklistRequests {
  const byId = new Map(claims.map((c) => [c.id, c]));
  const boxes = new Map(readChecklistBoxes(markdown).map((b) => [b.line, b]));
  const requests: SignoffRequest[] = [];
  const notRecorded: string[] = [];
  let alreadySignedOff = 0;
  const ticked = parseTickedChecklist(markdown, file);
  for (const t of ticked) {
    const box = boxes.get(t.line);
    const where = { file, line: t.line, column: 1 };
    if (box?.needsChange !== undefined) {
      requests.push({ claimId: t.claimId, decision: 'needs-change', reason: box.needsChange, ...(t.note === undefined ? {} : { note: t.note }), where });
      notRecorded.push(`${file}:${t.line}: the box is ticked and also marked "needs change"; recorded as needs-change, not as ${t.decision}.`);
      continue;
    }
    if (box?.alreadySignedOff === true && t.decision === 'approved' && t.note === undefined) {
      alreadySignedOff += 1;
      continue;
    }
    const claim = byId.get(t.claimId);
    const remark = box === undefined || claim === undefined ? '' : remarkOf(box, claim.text);
    const note = t.note ?? (remark === '' ? undefined : remark);
    requests.push({ ...t, ...(note === undefined ? {} : { note }), where });
  }
  for (const box of boxes.values()) {
    if (box.ticked) continue;
    const claim = byId.get(box.claimId);
    const remark = claim === undefined ? '' : remarkOf(box, claim.text);
    const comment = box.needsChange ?? [box.note, remark].filter((x) => x !== undefined && x !== '').join('; ');
    for (const mark of box.decisionMarks) {
      notRecorded.push(`${file}:${box.line}: "(${mark})" is on an unticked box; tick the box to record it.`);
    }
    if (comment === '' && claim !== undefined) continue;
    if (claim === undefined) {
      if (comment !== '' || box.needsChange !== undefined || box.note !== undefined || box.decisionMarks.length > 0) {
        notRecorded.push(`${file}:${box.line}: the comment on claim ${box.claimId} was not recorded: the claim is not in the drafts as they stand now (changed or removed); make the checklist again and copy the comment over.`);
      }
      continue;
    }
    if (comment === '') continue;
    requests.push({ claimId: box.claimId, decision: 'needs-change', reason: comment, where: { file, line: box.line, column: 1 } });
  }
  return { requests, notRecorded, alreadySignedOff };
}
