/**
 * Reads only the parts of an on-topic Markdown draft that can hold a claim, with every position
 * exact in the original file. A claim needs a subject named in its block or in a block beside it
 * (engine.subjectBeside), or the draft's own arithmetic or unit slip, which needs two numbers in one
 * sentence. So the raw text is cut into chunks where a parse of the whole would start a new
 * top-level block anyway, and a chunk is left unparsed when it provably holds neither:
 *
 * - it names no subject, and none of its sentences holds two numbers, judged on its raw text with
 *   inline code and bullets blanked out (each prose sentence then lies inside one raw sentence, and
 *   every prose character, digit or word is one of the raw text's);
 * - its raw text has no markup that could change that judgement or hold a heading: no emphasis,
 *   strikethrough, link, image, escape, character reference, HTML, table, address, block quote or
 *   heading (`* _ ~ [ ] \ & < > | # @`, `://`, `www.`, a line of only `=` or `-`), and its backticks
 *   pair up on each line;
 * - it is not beside a chunk that names a subject: from each such chunk, the chunks are parsed
 *   outwards up to and including the first that starts with a letter (which holds a block).
 *
 * The parsed chunks, in runs, are parsed as parts of the whole (source/markdown.ts readMarkdownParts):
 * a chunk starts after a blank line with a line at column 0 that starts with a letter or a digit
 * (not a list number), outside a fenced code block, so no construct is open there. A draft for which
 * that cannot be vouched (link reference definitions `]:`, a line starting with `<`, a fence
 * indented by one to three spaces, front matter without an end) is parsed whole. Drafts with
 * markup are common; only their plain chunks are skipped, and the result is the same either way
 * (test/sparse compares the two on our drafts and on generated pages).
 */
import { plainParagraphKind, readMarkdownParts, type PlainPiece } from '../source/markdown.js';
import { checkMarkdownLimits } from '../source/markdown-limits.js';
import { checkNestingDepth } from '../source/nesting-depth.js';
import { splitSentences } from '../prose/index.js';
import { topicalThroughout } from '../prose/topical-throughout.js';
import type { Draft, ProseBlock } from '../types.js';

/** A draft read in parts, and per block whether a block beside it (in the whole draft) names a subject. */
export interface SparseDraft {
  draft: Draft;
  subjectBeside: boolean[];
  /**
   * The draft names its subject throughout (prose/topical-throughout.ts): every block is read, and
   * `draft` holds a whole parse's blocks (each block may take its subject from the draft).
   */
  throughout: boolean;
}

const TWO_NUMBERS = /\d[^\d]+\d/u;
/** Markup after which a chunk's raw text no longer vouches for its prose. */
const MARKUP = /[*_~[\]\\&<>|#@]|:\/\/|www\./u;
const UNDERLINE = /^[ \t]*(?:=+|-+)[ \t]*\r?$/mu;
const BULLET = /^([ \t]*)([-+])([ \t]+)/gmu;
const BLANK = /^[ \t]*\r?$/u;
const FENCE = /^(`{3,}|~{3,})([^\n]*)$/u;
const INDENTED_FENCE = /^[ \t]{1,3}(?:`{3}|~{3})/u;
const LIST_NUMBER = /^\d{1,9}[.)](?:[ \t]|\r?$)/u;
const CHUNK_START = /^(?:[A-Za-z0-9]|#{1,6}(?:[ \t]|\r?$))/u;
const HEADING = /^#{1,6}(?=[ \t]|\r?$)/u;
const LETTER_START = /^[A-Za-z]/u;

/**
 * The draft of `text` in parts (see the module comment), or undefined when it must be parsed whole.
 * `namesSubject` is the engine's subject matcher. Throws the Markdown limits' FirnlineError as a
 * whole parse does.
 */
export function sparseMarkdownDraft(path: string, text: string, namesSubject: (text: string) => boolean): SparseDraft | undefined {
  checkMarkdownLimits(text, path);
  checkNestingDepth(text, path);
  const starts = chunkStarts(text);
  if (starts === undefined || starts.length < 3) return undefined;
  const ends = [...starts.slice(1), text.length];
  const chunks = starts.map((s, i) => text.slice(s, ends[i]));
  // A chunk with markup may name a subject its raw text hides ("C**O2**"): it counts as naming one.
  const plain = chunks.map((c) => plainText(c));
  const hit = chunks.map((c, i) => !fenceOnly(c) && (plain[i] === undefined || namesSubject(plain[i])));
  // A draft about its subject throughout is read whole (every block may take its subject from it),
  // but still in chunks: its plain paragraphs and fenced code skip the parser as below, and the blocks
  // are a whole parse's.
  const throughout = topicalThroughout(hit);
  // Headings are always read: every block after one carries it.
  const parse = chunks.map((c, i) => throughout || i === 0 || HEADING.test(c) || hit[i] === true || plain[i] === undefined || splitSentences(plain[i], 0).some((s) => TWO_NUMBERS.test(s.text)));
  hit.forEach((h, i) => {
    if (!h) return;
    for (let j = i + 1; j < chunks.length; j += 1) {
      parse[j] = true;
      if (LETTER_START.test(chunks[j] ?? '')) break;
    }
    for (let j = i - 1; j >= 0; j -= 1) {
      parse[j] = true;
      if (LETTER_START.test(chunks[j] ?? '')) break;
    }
  });
  const runs: [number, number][] = [];
  parse.forEach((p, i) => {
    if (!p) return;
    const last = runs.at(-1);
    if (last !== undefined && last[1] === starts[i]) last[1] = ends[i] as number;
    else runs.push([starts[i] as number, ends[i] as number]);
  });
  // A chunk that is one fenced code block, or one plain paragraph, needs no parser (no block, or its
  // text as its block); the first chunk may hold a byte-order mark or front matter and is always parsed.
  const pieces = chunks.flatMap((c, i): PlainPiece[] => {
    if (i === 0 || parse[i] !== true) return [];
    const kind = fenceOnly(c) ? 'code' : plainParagraphKind(c);
    return kind === undefined ? [] : [{ start: starts[i] as number, end: ends[i] as number, kind }];
  });
  const parts = readMarkdownParts(text, runs, pieces);
  const blocks: ProseBlock[] = parts.flat();
  const subjectBeside = parts.flatMap((run) => {
    const named = run.map((b) => namesSubject(b.text));
    return named.map((_n, i) => named[i - 1] === true || named[i + 1] === true);
  });
  return { draft: { path, text, format: 'markdown', blocks }, subjectBeside, throughout };
}

/**
 * Where chunks start: offset 0, then each line after a blank line that starts at column 0 with a
 * letter or a digit (not a list number), outside a fenced code block and front matter. Undefined
 * when the draft cannot be cut safely.
 */
function chunkStarts(text: string): number[] | undefined {
  if (text.includes(']:')) return undefined;
  const starts = [0];
  let fence: { mark: string; length: number } | undefined;
  let blankBefore = false;
  let at = text.charCodeAt(0) === 0xfeff ? 1 : 0;
  // Front matter runs to its closing line: no chunk starts inside it.
  const opening = /^(---|\+\+\+)[ \t]*\r?\n/u.exec(text.slice(at));
  if (opening !== null) {
    const close = new RegExp(`\\n${opening[1] === '---' ? '---' : '\\+\\+\\+'}[ \\t]*(?:\\r?\\n|$)`, 'u').exec(text.slice(at + opening[0].length - 1));
    if (close === null) return undefined;
    at += opening[0].length - 1 + close.index + close[0].length;
  }
  while (at < text.length) {
    let end = text.indexOf('\n', at);
    if (end < 0) end = text.length;
    const line = text.slice(at, end);
    if (/^[ \t]*</u.test(line) || INDENTED_FENCE.test(line)) return undefined;
    const fenceLine = FENCE.exec(line);
    if (fence !== undefined) {
      const close = fenceLine !== null && fenceLine[1]?.[0] === fence.mark && (fenceLine[1]?.length ?? 0) >= fence.length && /^[ \t]*\r?$/u.test(fenceLine[2] ?? '');
      if (close) fence = undefined;
    } else if (fenceLine !== null) {
      const mark = fenceLine[1] ?? '';
      // A backtick in a backtick fence's info string makes it no fence (inline code instead).
      if (mark[0] === '`' && (fenceLine[2] ?? '').includes('`')) return undefined;
      if (blankBefore) starts.push(at);
      fence = { mark: mark[0] ?? '`', length: mark.length };
    } else if (blankBefore && CHUNK_START.test(line) && !LIST_NUMBER.test(line)) {
      starts.push(at);
    }
    blankBefore = fence === undefined && BLANK.test(line);
    at = end + 1;
  }
  return starts.filter((s, i) => i === 0 || s > (starts[i - 1] ?? 0));
}

/**
 * A plain chunk's raw text with inline code and bullets blanked out, which then holds every
 * character, digit and word of its prose, and every prose sentence inside one of its sentences;
 * undefined for a chunk with markup (see the module comment).
 */
function plainText(raw: string): string | undefined {
  // An ATX heading's marks are not prose ("## Section 2", "# Title #"): blank them on its line.
  let chunk = raw;
  const opening = HEADING.exec(raw);
  if (opening !== null) {
    const lineEnd = raw.indexOf('\n') < 0 ? raw.length : raw.indexOf('\n');
    const line = raw.slice(0, lineEnd).replace(HEADING, ' '.repeat(opening[0].length)).replace(/[ \t]+#+([ \t]*\r?)$/u, (m) => ' '.repeat(m.length));
    chunk = line + raw.slice(lineEnd);
  }
  if (MARKUP.test(chunk) || UNDERLINE.test(chunk)) return undefined;
  return blankInlineCode(chunk)?.replace(BULLET, (_m, indent: string, _b: string, space: string) => `${indent} ${space}`);
}

/** A chunk that is one fenced code block and blank lines: it holds no prose. */
function fenceOnly(chunk: string): boolean {
  const lines = chunk.replace(/\s+$/u, '').split('\n');
  const open = FENCE.exec(lines[0] ?? '');
  const close = FENCE.exec(lines.at(-1) ?? '');
  if (lines.length < 2 || open === null || close === null) return false;
  const mark = open[1] ?? '';
  const closing = close[1] ?? '';
  const inner = lines.slice(1, -1);
  // The closing line closes the block, and no line before it could.
  const closes = (m: RegExpExecArray | null): boolean => m !== null && m[1]?.[0] === mark[0] && (m[1]?.length ?? 0) >= mark.length && /^[ \t]*\r?$/u.test(m[2] ?? '');
  return closes(close) && closing.length >= mark.length && !inner.some((l) => closes(FENCE.exec(l)));
}

/**
 * The chunk with each inline code span (a pair of single backticks on one line) turned into spaces,
 * as the prose reader leaves a gap for it; undefined when backticks do not pair up so simply.
 */
function blankInlineCode(chunk: string): string | undefined {
  if (!chunk.includes('`')) return chunk;
  if (chunk.includes('``')) return undefined;
  const lines = chunk.split('\n');
  if (lines.some((l) => (l.match(/`/gu)?.length ?? 0) % 2 !== 0)) return undefined;
  return lines.map((l) => l.replace(/`[^`]*`/gu, (m) => ' '.repeat(m.length))).join('\n');
}
