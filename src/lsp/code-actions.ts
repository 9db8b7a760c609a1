/**
 * The code actions on a flag (LSP 3.17, "CodeAction"): a quick fix that puts the correction in
 * place of the flagged words (one TextEdit over the flag's exact range); in Markdown, a fix that
 * marks the paragraph as a deliberate quotation with `<!-- firnline: reported -->` on its own line
 * before it; and "copy citation", a command whose argument is the flag's citations as text.
 */
import { CodeActionKind, type CodeAction, type Diagnostic, type TextEdit } from 'vscode-languageserver';
import { formatSource } from '../report/format-source.js';
import type { Draft, Flag } from '../types.js';
import type { PositionMap } from './positions.js';
import { shortCitation } from './short-citation.js';

/** The line that marks a paragraph as a deliberate quotation of a claim (the engine honours it). */
export const REPORTED_MARKER = '<!-- firnline: reported -->';

/** The command of "copy citation": its one argument is the citation text. */
export const COPY_CITATION_COMMAND = 'firnline.copyCitation';

/** What the actions of one flag need to know about its document. */
export interface ActionContext {
  uri: string;
  draft: Draft;
  positions: PositionMap;
  /** The diagnostic the editor showed for the flag, if it sent it back. */
  diagnostic?: Diagnostic;
}

/** Every action on one flag, quick fixes first. */
export function codeActionsOf(flag: Flag, context: ActionContext): CodeAction[] {
  const actions: CodeAction[] = [];
  const diagnostics = context.diagnostic === undefined ? {} : { diagnostics: [context.diagnostic] };
  if (flag.correction !== undefined) {
    const edit: TextEdit = { range: context.positions.rangeOf(flag.span), newText: flag.correction };
    actions.push({
      title: `Replace "${flag.excerpt}" with "${flag.correction}"`,
      kind: CodeActionKind.QuickFix,
      isPreferred: true,
      ...diagnostics,
      edit: { changes: { [context.uri]: [edit] } },
    });
  }
  const marker = reportedMarkerEdit(flag, context);
  if (marker !== undefined) {
    actions.push({
      title: 'Mark this paragraph as a deliberate quotation (firnline: reported)',
      kind: CodeActionKind.QuickFix,
      ...diagnostics,
      edit: { changes: { [context.uri]: [marker] } },
    });
  }
  if (flag.sources.length > 0) {
    const text = flag.sources.map(formatSource).join('\n');
    const names = flag.sources.map((s) => shortCitation(s.cite)).join('; ');
    actions.push({
      title: `Copy citation: ${names}`,
      kind: CodeActionKind.Empty,
      command: { title: `Copy citation: ${names}`, command: COPY_CITATION_COMMAND, arguments: [text] },
    });
  }
  return actions;
}

/**
 * The edit that puts the marker on its own line before the paragraph (prose block) that holds the
 * flag: at the start of the block's first line, ended by the document's own line break. Markdown
 * only; undefined when the paragraph already carries the marker.
 */
export function reportedMarkerEdit(flag: Flag, context: Pick<ActionContext, 'draft' | 'positions'>): TextEdit | undefined {
  const { draft, positions } = context;
  if (draft.format !== 'markdown') return undefined;
  const at = positions.indexOf(flag.span.start.offset);
  const block = draft.blocks.find((b) => (b.offsets[0] ?? Infinity) <= at && at < (b.offsets[b.offsets.length - 1] ?? -Infinity));
  const blockStart = block?.offsets[0];
  if (blockStart === undefined) return undefined;
  const line = positions.positionOf(blockStart).line;
  const lineStart = positions.indexAt({ line, character: 0 });
  const previousLine = draft.text.slice(0, lineStart).replace(/(?:\r\n|\r|\n)$/u, '').split(/\r\n|\r|\n/u).pop() ?? '';
  if (lineStart > 0 && previousLine.trim() === REPORTED_MARKER) return undefined;
  return { range: { start: { line, character: 0 }, end: { line, character: 0 } }, newText: `${REPORTED_MARKER}${lineBreakOf(draft.text)}` };
}

/** The line break a text uses (its first one), `\n` when it has none. */
function lineBreakOf(text: string): string {
  const found = /\r\n|\r|\n/u.exec(text);
  return found?.[0] ?? '\n';
}
