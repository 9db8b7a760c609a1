const ESCAPES: Record<string, string> = { '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' };

/**
 * Text safe both inside an HTML element and inside a quoted attribute: `<b>"x" & y</b>` gives
 * `&lt;b&gt;&quot;x&quot; &amp; y&lt;/b&gt;`. Every piece of draft text on the review page goes through it.
 */
export function escapeHtml(text: string): string {
  return text.replace(/[&<>"']/gu, (c) => ESCAPES[c] ?? c);
}

/** A link target the page may use: only http and https addresses (never `javascript:` or `data:`). */
export function safeHref(url: string | undefined): string | undefined {
  if (url === undefined) return undefined;
  return /^https?:\/\/[^\s]+$/iu.test(url.trim()) ? url.trim() : undefined;
}
