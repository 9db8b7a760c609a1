/**
 * How wide a draft's lines run when a line break carries a sentence on: the widest line that another
 * line follows in its paragraph, table rows left out (a row is laid out, not wrapped). A draft
 * wrapped by hand or by an editor breaks its lines near this width; a writer who does not wrap
 * (chat logs, comment threads, forum posts) breaks a line where a message or a thought ends, so a
 * line well short of the width that ends in no mark carrying a sentence on is a sentence's end.
 *
 *   draftLineWidth('a short line\na much longer line of text here\nend') → 30
 */
export function draftLineWidth(text: string): number {
  if (text === lastText) return lastWidth;
  let widest = 0;
  let previous = '';
  for (const line of text.split('\n')) {
    const here = line.trim();
    if (here !== '' && previous !== '' && !previous.includes('|')) widest = Math.max(widest, previous.length);
    previous = here;
  }
  lastText = text;
  lastWidth = widest;
  return widest;
}

// One draft is split block after block: its width is worked out once.
let lastText = '';
let lastWidth = 0;
