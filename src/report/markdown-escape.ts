/**
 * Draft text as it is written into the Markdown checklist. The checklist is opened in Markdown
 * viewers, so draft text must stay text: `&lt;img onerror=...&gt;` in a draft (harmless there)
 * must not become a live tag, and `*`, `_`, `[`, `` ` `` must not start emphasis, links or code.
 * Every ASCII punctuation character that Markdown or HTML reads is backslash-escaped (CommonMark
 * 0.31, section 2.4: any ASCII punctuation may be backslash-escaped), control characters become
 * visible (guard/visible-text.ts) and line breaks a space. The parentheses are escaped too, so a
 * sentence holding "(waived: ...)" is never read back as a reviewer's decision.
 *
 *     markdownText('CO2 <b>rose</b> (waived: x)')   // 'CO2 \<b\>rose\</b\> \(waived: x\)'
 */
import { visibleLine } from '../guard/visible-text.js';

const ACTIVE = /[\\`*_[\]<>()|~&]/gu;

/** One line of draft text, safe in Markdown and HTML. */
export function markdownText(text: string): string {
  return visibleLine(text.replace(/\r\n|[\r\n\t]/gu, ' ')).replace(ACTIVE, (c) => `\\${c}`);
}

/**
 * A file name in a checklist heading: in backticks as before when that is safe, else as a JSON
 * string (`"new\nline.md"`), which the checklist reader decodes back to the same name.
 */
export function markdownFileName(file: string): string {
  // eslint-disable-next-line no-control-regex -- finding control characters is the point
  return /^[^`\u0000-\u001f\u007f-\u009f"\\]+$/u.test(file) && !file.startsWith(' ') && !file.endsWith(' ') ? `\`${file}\`` : JSON.stringify(file).replace(/[\u007f-\u009f\u202a-\u202e\u2066-\u2069]/gu, (c) => `\\u${c.charCodeAt(0).toString(16).padStart(4, '0')}`);
}
