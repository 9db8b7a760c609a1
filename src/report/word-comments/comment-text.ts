import type { Flag } from '../../types.js';
import { formatReference } from '../describe-flag.js';
import { asSentence, formatClaimed } from '../format-value.js';
import { shortCitation } from '../short-citation.js';

/** One paragraph of a comment. */
export interface CommentLine {
  text: string;
  bold?: boolean;
}

/**
 * A flag as the paragraphs of a Word comment: level and rule, what is wrong, what the draft says,
 * the reference range, the correction (or rewording advice), each source as a short citation with
 * its link, and a reminder that the flag is a suggestion.
 *
 *     error · value.vostok-record-span
 *     The draft gives 800,000 years for ...
 *     Draft says: "800,000 years" (read as 795,000 to 805,000 yr)
 *     Reference: 400,000 to 423,000 yr for ...
 *     Correction: about 420,000 years
 *     Source: Petit et al. 1999, https://doi.org/10.1038/20859
 */
export function commentParagraphs(flag: Flag): CommentLine[] {
  const lines: CommentLine[] = [{ text: `${flag.level} · ${flag.ruleId}`, bold: true }, { text: asSentence(flag.reason) }];
  lines.push({ text: `Draft says: ${flag.claimed === undefined ? `"${flag.excerpt}"` : formatClaimed(flag.claimed)}` });
  if (flag.reference !== undefined) lines.push({ text: `Reference: ${formatReference(flag.reference)}` });
  if (flag.correction !== undefined) lines.push({ text: `Correction: ${flag.correction}` });
  else if (flag.suggestion !== undefined) lines.push({ text: `Suggestion: ${asSentence(flag.suggestion)}` });
  for (const source of flag.sources) lines.push({ text: `Source: ${shortCitation(source)}` });
  lines.push({ text: 'Firnline suggests; an expert decides. Read the source before changing the text.' });
  return lines;
}
