/** Sentences per window of a long paragraph, and the context kept on each side of a window. */
export const WINDOW_SENTENCES = 32;
export const WINDOW_CONTEXT = 8;

/**
 * The part of a paragraph a sentence's checks see. A paragraph of up to WINDOW_SENTENCES +
 * 2 × WINDOW_CONTEXT sentences is seen whole; a longer one (a hard-wrapped text with no blank
 * lines, an export with one line per paragraph) in fixed windows with WINDOW_CONTEXT sentences
 * of context on each side, so the work per sentence is bounded and a run is linear in the
 * paragraph's length. Each window is one array, made once, so per-paragraph caches still hit.
 */
export function paragraphWindows(paragraph: string[]): (index: number) => { window: string[]; at: number } {
  if (paragraph.length <= WINDOW_SENTENCES + 2 * WINDOW_CONTEXT) return (index) => ({ window: paragraph, at: index });
  let made: { chunk: number; window: string[]; start: number } | undefined;
  return (index) => {
    const chunk = Math.floor(index / WINDOW_SENTENCES);
    if (made?.chunk !== chunk) {
      const start = Math.max(0, chunk * WINDOW_SENTENCES - WINDOW_CONTEXT);
      made = { chunk, start, window: paragraph.slice(start, (chunk + 1) * WINDOW_SENTENCES + WINDOW_CONTEXT) };
    }
    return { window: made.window, at: index - made.start };
  };
}

