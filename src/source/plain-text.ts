import type { ProseBlock } from '../types.js';

const LINE = /[^\r\n]*(?:\r\n|\r|\n|$)/gy;

/**
 * The prose of a plain-text draft: one block per paragraph, paragraphs being separated by blank
 * (or whitespace-only) lines. Each block runs from its first to its last non-blank character.
 * Offsets are the identity, except that a `\r\n` or `\r` line end inside a paragraph becomes one
 * `\n` mapped to its first unit, so blocks read the same whatever the file's line ends.
 *
 *     readPlainTextBlocks('Ice cores\r\nhold air.\r\n\r\nSecond.')
 *     // [{ kind: 'text', text: 'Ice cores\nhold air.', offsets: [0, ..., 9, 11, ..., 20] },
 *     //  { kind: 'text', text: 'Second.', offsets: [24, ..., 31] }]
 */
export function readPlainTextBlocks(text: string): ProseBlock[] {
  const blocks: ProseBlock[] = [];
  let paragraph: { start: number; end: number } | undefined;
  // A leading byte-order mark is not prose.
  LINE.lastIndex = text.charCodeAt(0) === 0xfeff ? 1 : 0;
  while (LINE.lastIndex < text.length) {
    const lineStart = LINE.lastIndex;
    const line = LINE.exec(text)?.[0] ?? '';
    if (line === '') break;
    const content = line.replace(/[\r\n]+$/u, '');
    const first = content.search(/\S/u);
    if (first < 0) {
      if (paragraph !== undefined) blocks.push(makeBlock(text, paragraph.start, paragraph.end));
      paragraph = undefined;
    } else {
      const end = lineStart + content.trimEnd().length;
      paragraph = { start: paragraph?.start ?? lineStart + first, end };
    }
  }
  if (paragraph !== undefined) blocks.push(makeBlock(text, paragraph.start, paragraph.end));
  return blocks;
}

function makeBlock(text: string, start: number, end: number): ProseBlock {
  const units: string[] = [];
  const offsets: number[] = [];
  for (let i = start; i < end; i += 1) {
    const unit = text[i] ?? '';
    if (unit === '\r' && text[i + 1] === '\n') {
      units.push('\n');
      offsets.push(i);
      i += 1;
    } else {
      units.push(unit === '\r' ? '\n' : unit);
      offsets.push(i);
    }
  }
  offsets.push(end);
  return { kind: 'text', text: units.join(''), offsets, heading: '' };
}
