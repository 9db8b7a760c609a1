/**
 * The lead-in of a block: the last sentences of the blocks just before it that a writer reads on
 * from. A thread's post ("14/ That's a 34% increase on the pre-industrial 280 ppm."), a list item
 * ("- That means CO2 went up by roughly 150 ppm."), a table's cell ("Note: an average of 10 cm per
 * year") or a short paragraph often does its arithmetic on figures given one block up. The
 * arithmetic and unit checks read these sentences as they read the paragraph's earlier ones; no
 * other check does, and flags still fall only on the block's own words.
 *
 * A block before counts only when it stands right before (nothing but spaces and markup between
 * them: no heading, no code, no text left out; for a table's cell, a cell of the same row) and names a subject of the packs or holds two
 * numbers in one sentence. Both make sure a draft read in parts (speed/sparse-markdown.ts) has that
 * block too, so a lead-in is the same whichever way the draft was read.
 */
import type { ProseBlock } from '../types.js';
import { splitSentences } from './split-sentences.js';
import { draftLineWidth } from './line-width.js';

/** How many sentences a lead-in holds at most: as many as the checks read of their own paragraph. */
export const LEAD_IN_SENTENCES = 4;
const TWO_NUMBERS = /\d[^\d]+\d/u;
/**
 * Between two blocks that follow on: spaces, line breaks and markup, no letter or digit but the
 * label of an ordered list's next item ("\n2. ", "\n10) ": CommonMark's ordered list markers).
 */
const FOLLOWS_ON = /^(?:[^\p{L}\p{N}]*\n)?[ \t]*(?:\d{1,9}[.)](?=[ \t]))?[^\p{L}\p{N}]*$/u;
/** Blocks that are no running prose. */
const NOT_PROSE = new Set(['heading', 'front-matter', 'image-text']);

/**
 * The lead-in of `blocks[index]` in `text` (the draft's original text): up to LEAD_IN_SENTENCES
 * sentences, in order. `namesSubject` is the engine's subject matcher.
 */
export function leadInOf(text: string, blocks: readonly ProseBlock[], index: number, namesSubject: (t: string) => boolean): string[] {
  const out: string[] = [];
  let here = blocks[index];
  for (let i = index - 1; i >= 0 && here !== undefined && out.length < LEAD_IN_SENTENCES; i -= 1) {
    const block = blocks[i] as ProseBlock;
    if (NOT_PROSE.has(block.kind) || NOT_PROSE.has(here.kind) || block.heading !== here.heading) break;
    // A table's cell reads on from the cells of its own row; a row of another record is no premise
    // of it. A row with no figure but the result ("Today's rise compared with the deglacial average
    // | about 240 times faster") works on the rows above, and reads on from them too.
    if (here.kind === 'table-cell' || block.kind === 'table-cell') {
      if (here.kind !== block.kind) break;
      const row = (blocks[index] as ProseBlock).offsets[0];
      if (block.offsets[0] !== row && here.offsets[0] === row && !readsRowsAbove(blocks, index)) break;
      // A row header is read again at the head of each cell of its row: it adds no sentence.
      if (blocks[i + 1]?.text.startsWith(`${block.text}, `) === true) {
        here = block;
        continue;
      }
    } else {
      const end = (block.offsets[block.offsets.length - 1] ?? 0) + 1;
      const start = here.offsets[0] ?? 0;
      if (end > start || !FOLLOWS_ON.test(text.slice(end, start))) break;
    }
    const sentences = splitSentences(block.text, i, draftLineWidth(text)).map((s) => s.text);
    if (!namesSubject(block.text) && !sentences.some((s) => TWO_NUMBERS.test(s))) break;
    out.unshift(...sentences.slice(-(LEAD_IN_SENTENCES - out.length)));
    here = block;
  }
  return out;
}

/**
 * True when a cell of a table with row headers may read on from the rows above: its row header
 * and the other cells of its row hold no figure, so the cell's figure is drawn from elsewhere.
 */
function readsRowsAbove(blocks: readonly ProseBlock[], index: number): boolean {
  const cell = blocks[index] as ProseBlock;
  const row = cell.offsets[0];
  const digit = /\d/u;
  // The row header is read at the head of each cell of its row; without one, rows are not told apart.
  const header = blocks.slice(0, index).reverse().find((b) => b.kind === 'table-cell' && b.offsets[0] === row && cell.text.startsWith(`${b.text}, `));
  if (header === undefined || digit.test(header.text)) return false;
  for (let i = index - 1; i >= 0 && blocks[i]?.kind === 'table-cell' && blocks[i]?.offsets[0] === row; i -= 1) {
    const other = blocks[i] as ProseBlock;
    if (other !== header && digit.test(other.text.slice(header.text.length))) return false;
  }
  return true;
}

/**
 * The sentence that introduces a block: the last sentence of its lead-in when it ends with a colon
 * ("What the core gives us:" before "- a record that reaches back 420,000 years"); for a list item,
 * the nearest such sentence of its lead-in, past the items before it ("How far back the cores reach:",
 * "- Vostok: 420,000 years", then "- EPICA Dome C: 800,000 years"). A block's first sentence reads on
 * from it as from the sentence before it in its own paragraph: the binder takes the subject or the
 * measure it lacks from there. Undefined when there is none.
 */
export function introOf(leadIn: readonly string[], listItem = false): string | undefined {
  for (let i = leadIn.length - 1; i >= 0; i -= 1) {
    const sentence = leadIn[i] as string;
    if (INTRODUCES.test(sentence)) return sentence;
    if (!listItem) return undefined;
  }
  return undefined;
}

const INTRODUCES = /:\s*$/u;
