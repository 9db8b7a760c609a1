/**
 * The line forms the Markdown checklist writer produces (checklist-markdown.ts), so a reader can
 * tell a checklist Firnline wrote from a draft that merely starts with the checklist's marker line,
 * and a reviewer's additions from the writer's own lines.
 */
import { CHECKLIST_MARKER, SIGN_OFF_INSTRUCTIONS } from './checklist-markdown.js';

const WRITER_LINES = [
  /^$/u,
  /^#{1,3} /u,
  /^> /u,
  /^Made by Firnline /u,
  /^\d+ claims? in \d+ files?\. /u,
  /^- \[ \] \*\*c[0-9a-f]{10}(?:-\d+)?\*\* (?:line|paragraph) \d+: /u,
  /^ {2}- (?:Values read|Verdict|Flag \(|Sources:|Signed off|Needs change|Changed since sign-off|What changed)/u,
  /^ {4}- /u,
];
const INSTRUCTIONS = new Set(SIGN_OFF_INSTRUCTIONS.split('\n'));
/** A box line in any tick form a reviewer may use. */
const ANY_BOX = /^\s*(?:[-*+]|\d+[.)])?\s*\[[^\]]{0,3}\]\s*\*\*c[0-9a-f]{10}(?:-\d+)?\*\*/u;

/** True for a line the checklist writer produces (with its box unticked). */
export function isWriterLine(line: string): boolean {
  return line === CHECKLIST_MARKER || INSTRUCTIONS.has(line) || WRITER_LINES.some((form) => form.test(line));
}

/**
 * True when `text` is a checklist: it starts with the marker line and every other line is the
 * writer's, a box in any tick form, or an indented continuation of a box (a reviewer's remark).
 * A draft that only borrows the marker line is not a checklist, and is checked.
 */
export function isChecklistText(text: string): boolean {
  const lines = text.trimStart().split(/\r\n|\r|\n/u);
  if (lines[0] !== CHECKLIST_MARKER) return false;
  let inBox = false;
  for (const line of lines) {
    if (ANY_BOX.test(line)) inBox = true;
    else if (isWriterLine(line)) inBox = inBox && line !== '' && !line.startsWith('#');
    else if (!(inBox && /^\s{2,}\S/u.test(line))) return false;
  }
  return true;
}
