/**
 * Reads what a reviewer wrote on the boxes of a checklist besides the ticks that
 * `parseTickedChecklist` reads: `(needs change: ...)` on any box, a `(note: ...)` or a remark typed on
 * an unticked box, and which ticked boxes Firnline itself ticked because their sign-off already held
 * (they carry a `Signed off:` detail line and are not new decisions). Nothing a reviewer wrote on
 * a box is dropped: `firnline signoff` records it or says why not.
 *
 *   - [ ] **c9f3a0b12cd** line 3: Sea level was 50 m lower. wrong: about 120 to 130 m lower
 *     → { claimId: 'c9f3a0b12cd', ticked: false, boxText: 'Sea level was 50 m lower. wrong: about 120 to 130 m lower' }
 */

import { markdownText } from './markdown-escape.js';

/** One box of the checklist, with what the reviewer may have added to it. */
export interface ChecklistBox {
  claimId: string;
  ticked: boolean;
  /** The line of the box in the checklist (1-based). */
  line: number;
  /** The file section the box is under. */
  file?: string;
  /** The box line after `line N:` plus any line the reviewer added under it, white space folded. */
  boxText: string;
  /** The box was ticked by Firnline because a sign-off already held (a `Signed off:` detail line). */
  alreadySignedOff: boolean;
  /** The last `(needs change: ...)` in the item. */
  needsChange?: string;
  /** The last `(note: ...)` in the item. */
  note?: string;
  /** `(corrected: ...)` or `(waived: ...)` marks, which only a ticked box can record. */
  decisionMarks: string[];
}

const BOX = /^\s*(?:[-*+]|\d+[.)])\s+\[([ xX])\]/u;
const HEADING = /^\s{0,3}#{1,6}\s/u;
const FILE_HEADING = /^\s{0,3}##\s+File\s+(?:`([^`]+)`|("(?:[^"\\]|\\.)*"))\s*$/u;
const CLAIM_ID = /\bc[0-9a-f]{10}(?:-\d+)?\b/u;
const PLACE = /^\s*\*{0,2}c[0-9a-f]{10}(?:-\d+)?\*{0,2}\s+line\s+\d+:\s?/u;
/** The detail lines Firnline writes under a box (report/checklist-markdown). */
const DETAIL = /^\s+[-*+]\s+(Values read|Verdict|Flag \(|Sources:|Signed off:|Needs change:|Changed since sign-off:|What changed:)/u;
const SOURCE_ENTRY = /^\s{4,}[-*+]\s/u;
// A bracket escaped by the checklist writer (`\(`) is the draft's own text, never a mark.
const MARK = /(?<!\\)\((needs[ -]change|note|corrected|waived)\s*:\s*([^)]*)\)/giu;

/** Every box with a claim id, in checklist order. */
export function readChecklistBoxes(markdown: string): ChecklistBox[] {
  const lines = markdown.split(/\r\n|\r|\n/u);
  const boxes: ChecklistBox[] = [];
  let section: string | undefined;
  for (let i = 0; i < lines.length; i += 1) {
    const line = lines[i] ?? '';
    const heading = FILE_HEADING.exec(line);
    if (heading !== null) section = heading[1] ?? fileNameOf(heading[2] ?? '""');
    const box = BOX.exec(line);
    if (box === null) continue;
    const rest = line.slice(box[0].length);
    const id = CLAIM_ID.exec(rest);
    if (id === null) continue;
    let end = i + 1;
    while (end < lines.length && !BOX.test(lines[end] ?? '') && !HEADING.test(lines[end] ?? '')) end += 1;
    const item = lines.slice(i, end);
    const added: string[] = [];
    let inSources = false;
    let alreadySignedOff = false;
    for (const extra of item.slice(1)) {
      if (/^\s+[-*+]\s+Signed off:/u.test(extra)) alreadySignedOff = true;
      if (DETAIL.test(extra)) {
        inSources = /Sources:/u.test(extra);
        continue;
      }
      if (inSources && SOURCE_ENTRY.test(extra)) continue;
      inSources = false;
      if (extra.trim() !== '') added.push(extra.trim());
    }
    const whole = item.join(' ');
    const marks = [...whole.matchAll(MARK)].map((m) => ({ kind: (m[1] ?? '').toLowerCase().replace(' ', '-'), text: (m[2] ?? '').trim() }));
    const last = (kind: string) => marks.filter((m) => m.kind === kind).pop()?.text;
    const needsChange = last('needs-change');
    const note = last('note');
    boxes.push({
      claimId: id[0],
      ticked: box[1] !== ' ',
      line: i + 1,
      ...(section === undefined ? {} : { file: section }),
      boxText: [rest.replace(PLACE, ''), ...added].join(' ').replace(/\s+/gu, ' ').trim(),
      alreadySignedOff,
      ...(needsChange === undefined ? {} : { needsChange }),
      ...(note === undefined ? {} : { note }),
      decisionMarks: marks.filter((m) => m.kind === 'corrected' || m.kind === 'waived').map((m) => `${m.kind}: ${m.text}`),
    });
    i = end - 1;
  }
  return boxes;
}

/**
 * What a reviewer typed on a box besides the claim's sentence and the bracketed marks: the text
 * after the sentence, or the whole line when the sentence itself was edited. Empty when nothing.
 */
export function remarkOf(box: ChecklistBox, sentence: string): string {
  const fold = (t: string) => t.replace(/\s+/gu, ' ').trim();
  const text = fold(box.boxText.replace(MARK, ' '));
  // The checklist writes the sentence escaped (markdown-escape.ts); a reviewer's editor may show or keep either form.
  for (const claim of [fold(markdownText(sentence)), fold(sentence)]) {
    if (text === claim) return '';
    if (text.startsWith(claim)) return text.slice(claim.length).replace(/^[\s:;,.–—-]+/u, '').trim();
  }
  return `the reviewer changed the line to: ${text}`;
}

function fileNameOf(quoted: string): string {
  try {
    return String(JSON.parse(quoted));
  } catch {
    return quoted;
  }
}
