/**
 * The sign-off checklist in Markdown: a short header (what the checklist is, its cautions, how to
 * sign off), then one section per file and one sub-section per heading, with one task-list box per
 * claim. The box line carries the claim id (bold) and the sentence; the details sit beneath it,
 * indented, so they survive an editor's reflowing. `parseTickedChecklist` reads the ticks back.
 *
 *   - [ ] **c9f3a0b12cd** line 3: The Dome C core reaches back about 420,000 years.
 *     - Values read: "about 420,000 years" (415,000 to 425,000 yr)
 */
import type { Checklist, ChecklistInput, ChecklistItem, ChecklistRange } from './checklist-json.js';
import { toChecklist } from './checklist-json.js';
import { formatRange } from './format-value.js';
import { formatSource } from './format-source.js';
import { markdownFileName, markdownText } from './markdown-escape.js';

/** How each verdict is put for the reviewer. */
const VERDICT_WORDS: Record<ChecklistItem['verdict'], (item: ChecklistItem) => string> = {
  agrees: (item) => `agrees with ${referenceWords(item)}`,
  conflicts: (item) => `conflicts with ${referenceWords(item)}`,
  'no reference': () => 'no reference (nothing in the rule packs covers this claim; judge it from the literature)',
};

/** The header's instructions; the words `corrected:`, `waived:` and `note:` are what the parser reads. */
export const SIGN_OFF_INSTRUCTIONS = [
  '**How to sign off.** Check each claim against its sources, then tick its box (`- [x]`). A tick on its',
  'own records the decision `approved`. For another decision, write it on the ticked line in brackets:',
  '`(corrected: what you changed)` or `(waived: why the claim stands as it is)`; add `(note: ...)` for a',
  'remark. If a claim must change before it can be signed off, leave its box empty and write',
  '`(needs change: what must change)` on its line: the editor sees it on the claim and the gate stays red.',
  'Then run `firnline signoff --from <this file> --by "Your Name"`. Leave the claim ids as they are.',
].join('\n');

/**
 * The checklist's first line. A checklist repeats the drafts' sentences, so a run over the folder
 * it sits in would read it as one more draft; this line lets a reader (and Firnline) tell it apart.
 */
export const CHECKLIST_MARKER = '<!-- firnline sign-off checklist: a review aid made from the drafts, not a draft -->';

/** `checklist --format markdown`. */
export function renderChecklistMarkdown(input: ChecklistInput): string {
  return checklistToMarkdown(toChecklist(input));
}

/** Writes a checklist already built. */
export function checklistToMarkdown(checklist: Checklist): string {
  const { counts } = checklist;
  const out = [
    CHECKLIST_MARKER,
    '# Sign-off checklist',
    '',
    `Made by Firnline ${checklist.tool.version} on ${checklist.generated.slice(0, 10)}, against the rule packs ${checklist.packs || '(none)'}.`,
    `${plural(counts.claims, 'claim')} in ${plural(counts.files, 'file')}. Verdicts: conflicts ${counts.conflicts}, agrees ${counts.agrees}, no reference ${counts['no reference']}. ` +
      `Sign-off: signed off ${counts['signed off']}, needs change ${counts['needs change']}, changed since sign-off ${counts.stale}, open ${counts.open}.`,
    '',
    `> ${checklist.cautions}`,
    '',
    SIGN_OFF_INSTRUCTIONS,
  ];
  let file: string | undefined;
  let heading: string | undefined;
  for (const item of checklist.claims) {
    if (item.file !== file) {
      out.push('', `## File ${markdownFileName(item.file)}`);
      file = item.file;
      heading = undefined;
    }
    if (item.heading !== heading) {
      out.push('', item.heading === '' ? '### Before the first heading' : `### Under "${markdownText(item.heading)}"`, '');
      heading = item.heading;
    }
    out.push(...itemLines(item));
  }
  return `${out.join('\n')}\n`;
}

function itemLines(item: ChecklistItem): string[] {
  // A claim whose sign-off holds is shown ticked, with who and when; `signoff --from` leaves it as it is.
  const box = item.signoff.status === 'signed off' ? '[x]' : '[ ]';
  const where = item.paragraph === undefined ? `line ${item.line}` : `paragraph ${item.paragraph}`;
  const lines = [`- ${box} **${item.id}** ${where}: ${markdownText(item.sentence)}`];
  const detail = (label: string, text: string) => lines.push(`  - ${label}: ${text}`);
  if (item.values.length > 0) detail('Values read', item.values.map((v) => `"${markdownText(v.text)}" (${range(v)})`).join('; '));
  detail('Verdict', VERDICT_WORDS[item.verdict](item));
  for (const f of item.flags) {
    const advice = f.correction === undefined ? (f.suggestion === undefined ? '' : ` Suggestion: ${f.suggestion}`) : ` Correction: "${f.correction}"`;
    detail(`Flag (${f.level}, ${f.ruleId})`, `${f.reason}${advice}`);
  }
  if (item.sources.length > 0) {
    lines.push('  - Sources:');
    for (const s of item.sources) lines.push(`    - ${formatSource(s)}`);
  }
  const s = item.signoff;
  // File names and reviewers' words come from the drafts and the ledger: kept as text, like the sentences.
  const from = s.movedFrom !== undefined ? ` (moved from ${markdownText(s.movedFrom)})` : s.sharedWith !== undefined ? ` (same sentence in ${markdownText(s.sharedWith)})` : '';
  const who = markdownText(s.reviewer ?? '?');
  if (s.status === 'signed off') detail('Signed off', `by ${who} on ${(s.date ?? '').slice(0, 10)}, ${s.decision ?? ''}${from}`);
  if (s.status === 'needs change') detail('Needs change', `${who} on ${(s.date ?? '').slice(0, 10)}: ${markdownText(s.reason ?? '')}${from}`);
  if (s.status === 'stale') {
    const earlier = s.decision === 'needs-change' ? `marked this wording as needing a change (${markdownText(s.reason ?? '')})` : 'signed off this wording';
    detail('Changed since sign-off', `${who} ${earlier} on ${(s.date ?? '').slice(0, 10)}${from}: "${markdownText(s.signedOffText ?? '')}"`);
    if (s.changes !== undefined) detail('What changed', markdownText(s.changes));
  }
  return lines;
}

function referenceWords(item: ChecklistItem): string {
  if (item.references.length === 0) return 'the rule packs';
  return item.references
    .map((r) => `${r.measures}: ${r.wording} (${range(r)}${r.asOf === undefined ? '' : `, as of ${r.asOf}`})`)
    .join('; ');
}

function plural(n: number, word: string): string {
  return `${n} ${word}${n === 1 ? '' : 's'}`;
}

function range(r: ChecklistRange): string {
  return formatRange(r.low ?? -Infinity, r.high ?? Infinity, r.unit);
}
