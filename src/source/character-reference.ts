import { fromMarkdown } from 'mdast-util-from-markdown';

// `&name;`, `&#123;` or `&#x1F;` as CommonMark defines them (name up to 31 more alphanumerics,
// decimal up to 7 digits, hexadecimal up to 6).
const REFERENCE = /&(?:#[xX][0-9a-fA-F]{1,6}|#[0-9]{1,7}|[A-Za-z][A-Za-z0-9]{0,31});/y;

/** The character reference starting at `index` in `text`, e.g. `&amp;`; undefined when none. */
export function matchReference(text: string, index: number): string | undefined {
  REFERENCE.lastIndex = index;
  return REFERENCE.exec(text)?.[0];
}

const decoded = new Map<string, string>();

/**
 * What the Markdown parser turns a reference into (`&amp;` → `&`, `&#8217;` → `’`); an unknown
 * name comes back unchanged. The parser itself is asked, so its entity table and its rules for
 * invalid numbers (→ U+FFFD) are followed exactly; answers are cached as references repeat.
 */
export function decodeReference(reference: string): string {
  let result = decoded.get(reference);
  if (result === undefined) {
    const paragraph = fromMarkdown(reference).children[0];
    const text = paragraph?.type === 'paragraph' ? paragraph.children[0] : undefined;
    result = text?.type === 'text' ? text.value : reference;
    decoded.set(reference, result);
  }
  return result;
}
