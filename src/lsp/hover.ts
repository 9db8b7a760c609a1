/**
 * The hover on a flagged claim (LSP 3.17, "Hover", Markdown content): what the draft says and how
 * Firnline read it (the draft's interval), the reference range, the correction or rewording
 * advice, and the short citations with their DOI links; then the caution that flags are
 * suggestions for an editor to judge.
 */
import { formatReference } from '../report/describe-flag.js';
import { isFromMemory } from '../report/format-source.js';
import { formatClaimed } from '../report/format-value.js';
import type { Flag } from '../types.js';
import { signedOffWords } from './diagnostics.js';
import { shortCitationWithLink } from './short-citation.js';

/** The caution every hover ends with (README, "Cautions"). */
export const HOVER_CAUTION = 'Firnline supports, and does not replace, expert review; reference values carry uncertainty and dates.';

/** The Markdown of a hover over `flags` (those whose range holds the cursor). */
export function hoverMarkdown(flags: Flag[]): string {
  return [...flags.map(flagMarkdown), `_${HOVER_CAUTION}_`].join('\n\n---\n\n');
}

function flagMarkdown(flag: Flag): string {
  const lines = [`**${flag.ruleId}** (${flag.level}${flag.signoff === undefined ? '' : `, ${signedOffWords(flag.signoff)}`})`, '', flag.reason, ''];
  if (flag.claimed !== undefined) lines.push(`- draft says: ${formatClaimed(flag.claimed)}`);
  if (flag.reference !== undefined) lines.push(`- reference: ${formatReference(flag.reference)}`);
  if (flag.correction !== undefined) lines.push(`- correction: "${flag.correction}"`);
  else if (flag.suggestion !== undefined) lines.push(`- suggestion: ${flag.suggestion}`);
  for (const source of flag.sources) {
    lines.push(`- source: ${shortCitationWithLink(source)}${isFromMemory(source) ? ' (from memory)' : ''}`);
  }
  return lines.join('\n').trimEnd();
}
