import type { Draft, ProseBlock } from '../types.js';
import { readMarkdownBlocks } from './markdown.js';
import { readPlainTextBlocks } from './plain-text.js';

/**
 * The least work per byte: a draft is parsed and analysed only around the places where a subject
 * is named. The raw text is cut into segments at blank lines that are certainly top-level block
 * boundaries (not inside a code fence, an HTML block or front matter, and followed by a line that
 * starts in the first column); a hit marks its segment and one segment on each side, and a hit in a
 * heading marks its whole section. Only the marked windows are parsed, each on its own, and every
 * block keeps offsets into the original file, so positions stay exact. A Markdown file that cannot
 * be cut safely (link reference definitions, setext headings, headings inside containers, bare CR
 * line ends, a `firnline: reported` marker) is parsed whole and its blocks outside the windows are dropped: the same blocks.
 */
export function draftAroundHits(path: string, text: string, format: Draft['format'], hits: RegExp): Draft | undefined {
  const segments = format === 'markdown' ? markdownSegments(text) : undefined;
  const starts = segments?.starts ?? plainSegmentStarts(text);
  const marked = markSegments(text, starts, segments?.headings ?? [], hits);
  if (marked.length === 0) return undefined;
  const windows = joinWindows(starts, marked, text.length);
  let blocks: ProseBlock[];
  if (segments === undefined || !segments.safe) {
    const all = format === 'markdown' ? readMarkdownBlocks(text) : readPlainTextBlocks(text);
    blocks = all.filter((b) => windows.some((w) => (b.offsets[0] ?? -1) >= w.start && (b.offsets[0] ?? -1) < w.end));
  } else {
    blocks = readWindowBlocks(text, windows, segments.headings);
  }
  return { path, text, format, blocks };
}

/** A span of the original file: [start, end) in UTF-16 units. */
export interface Window {
  start: number;
  end: number;
}

interface Segments {
  /** Where each segment starts (the first is 0), ascending. */
  starts: number[];
  /** ATX heading lines at the top level: [start, end) of the line. */
  headings: Window[];
  /** False when the file must be parsed whole (see draftAroundHits). */
  safe: boolean;
}

const FENCE_OPEN = /^([ \t]*)(`{3,}|~{3,})/u;
const ATX_HEADING = /^ {0,3}#{1,6}(?:[ \t]|$)/u;
const SETEXT_UNDERLINE = /^ {0,3}(?:=+|-+)[ \t]*$/u;
const CONTAINER_HEADING = /^[ \t]*(?:>[ \t]*|[-*+][ \t]+|\d{1,9}[.)][ \t]+)+#{1,6}(?:[ \t]|$)/mu;
const LINK_DEFINITION = /^ {0,3}\[[^\]\n]+\]:/mu;
/** HTML blocks that may hold blank lines (CommonMark kinds 1 to 5), with what ends each. */
const HTML_BLOCKS: [RegExp, RegExp][] = [
  [/^ {0,3}<(?:script|pre|style|textarea)(?:[\s>]|$)/iu, /<\/(?:script|pre|style|textarea)>/iu],
  [/^ {0,3}<!--/u, /-->/u],
  [/^ {0,3}<\?/u, /\?>/u],
  [/^ {0,3}<![A-Za-z]/u, />/u],
  [/^ {0,3}<!\[CDATA\[/u, /\]\]>/u],
];

/** The safe cut points of a Markdown text, and its top-level ATX headings. */
export function markdownSegments(text: string): Segments {
  const starts = [0];
  const headings: Window[] = [];
  // A `<!-- firnline: reported -->` marker may stand a blank line before the block it marks.
  let safe = !LINK_DEFINITION.test(text) && !CONTAINER_HEADING.test(text) && !/\r(?!\n)/u.test(text) && !/<!--\s*firnline:/u.test(text);
  let fence: { char: string; length: number; topLevel: boolean } | undefined;
  let htmlEnd: RegExp | undefined;
  let afterBlank = false;
  let previousBlank = true;
  let pos = text.charCodeAt(0) === 0xfeff ? 1 : 0;
  // Front matter: no cut before it closes; a front matter that never closes is not cut at all.
  const opening = /^(---|\+\+\+)\r?\n/u.exec(text.slice(pos));
  if (opening !== null) {
    const close = new RegExp(`\\n${opening[1] === '---' ? '---' : '\\+\\+\\+'}[ \\t]*(?:\\r?\\n|$)`, 'u').exec(text.slice(pos));
    if (close === null) return { starts, headings, safe: false };
    pos += close.index + close[0].length;
  }
  while (pos < text.length) {
    const newline = text.indexOf('\n', pos);
    const lineEnd = newline < 0 ? text.length : newline;
    const line = text.slice(pos, lineEnd).replace(/\r$/u, '');
    const blank = /^[ \t]*$/u.test(line);
    if (fence !== undefined) {
      const close = new RegExp(`^${fence.topLevel ? ' {0,3}' : '[ \\t]*'}${fence.char === '`' ? '`' : '~'}{${fence.length},}[ \\t]*$`, 'u');
      if (close.test(line)) fence = undefined;
    } else if (htmlEnd !== undefined) {
      if (htmlEnd.test(line)) htmlEnd = undefined;
    } else if (!blank) {
      if (afterBlank && /^\S/u.test(line)) starts.push(pos);
      const opened = FENCE_OPEN.exec(line);
      const html = HTML_BLOCKS.find(([open]) => open.test(line));
      if (opened !== null) {
        fence = { char: opened[2]?.[0] ?? '`', length: opened[2]?.length ?? 3, topLevel: (opened[1] ?? '').length <= 3 };
      } else if (html !== undefined) {
        if (!html[1].test(line.slice(line.search(/</u) + 2))) htmlEnd = html[1];
      } else if (ATX_HEADING.test(line)) {
        headings.push({ start: pos, end: lineEnd });
      } else if (!previousBlank && SETEXT_UNDERLINE.test(line)) {
        safe = false;
      }
    }
    afterBlank = blank && fence === undefined && htmlEnd === undefined;
    previousBlank = blank;
    pos = lineEnd + 1;
  }
  return { starts, headings, safe };
}

/** Plain text: every paragraph starts a segment. */
function plainSegmentStarts(text: string): number[] {
  const starts = [0];
  const blankThenText = /\n[ \t]*\r?\n(?=[ \t\r\n]*\S)/gu;
  for (let m = blankThenText.exec(text); m !== null; m = blankThenText.exec(text)) {
    const next = text.slice(m.index + m[0].length).search(/\S/u);
    const at = m.index + m[0].length + next;
    if (at > (starts[starts.length - 1] ?? 0)) starts.push(at);
  }
  return starts;
}

/** The indexes of the segments to analyse, ascending. */
function markSegments(text: string, starts: number[], headings: Window[], hits: RegExp): number[] {
  const marked = new Set<number>();
  const global = hits.global ? hits : new RegExp(hits.source, `${hits.flags}g`);
  global.lastIndex = 0;
  const segmentOf = (offset: number): number => {
    let low = 0;
    let high = starts.length - 1;
    while (low < high) {
      const mid = (low + high + 1) >> 1;
      if ((starts[mid] ?? 0) <= offset) low = mid;
      else high = mid - 1;
    }
    return low;
  };
  const headingStarts = new Set(headings.map((h) => segmentOf(h.start)));
  const headingAt = (offset: number): number => {
    // The index of the first heading that ends after `offset` (headings are in file order).
    let low = 0;
    let high = headings.length;
    while (low < high) {
      const mid = (low + high) >> 1;
      if ((headings[mid]?.end ?? 0) <= offset) low = mid + 1;
      else high = mid;
    }
    return low;
  };
  for (let m = global.exec(text); m !== null; m = global.exec(text)) {
    const at = segmentOf(m.index);
    for (const s of [at - 1, at, at + 1]) if (s >= 0 && s < starts.length) marked.add(s);
    const h = headingAt(m.index);
    const heading = headings[h];
    // A subject named in a heading is the subject of its whole section.
    if (heading !== undefined && heading.start <= m.index) {
      for (let s = at + 1; s < starts.length && !headingStarts.has(s); s += 1) marked.add(s);
    }
    // Another hit in this segment marks nothing new, unless it is in a heading further on.
    const following = heading !== undefined && heading.start <= m.index ? headings[h + 1] : heading;
    const nextHeading = following?.start ?? Infinity;
    const skipTo = Math.min(starts[at + 1] ?? text.length, nextHeading);
    if (skipTo > global.lastIndex) global.lastIndex = skipTo;
    if (m[0].length === 0) global.lastIndex += 1;
  }
  return [...marked].sort((a, b) => a - b);
}

/** Consecutive marked segments joined into windows of the original text. */
function joinWindows(starts: number[], marked: number[], length: number): Window[] {
  const windows: Window[] = [];
  for (const s of marked) {
    const start = starts[s] ?? 0;
    const end = starts[s + 1] ?? length;
    const last = windows[windows.length - 1];
    if (last !== undefined && last.end === start) last.end = end;
    else windows.push({ start, end });
  }
  return windows;
}

/** The text of the nearest top-level heading above `offset` ('' when none). */
function headingBefore(text: string, headings: Window[], offset: number): string {
  let found: Window | undefined;
  for (const h of headings) {
    if (h.start >= offset) break;
    found = h;
  }
  if (found === undefined) return '';
  return readMarkdownBlocks(text.slice(found.start, found.end))[0]?.text ?? '';
}

/** The blocks of each window (ascending, from markdownSegments), each parsed on its own. */
export function readWindowBlocks(text: string, windows: Window[], headings: Window[]): ProseBlock[] {
  return windows.flatMap((w) => windowBlocks(text, w, headingBefore(text, headings, w.start)));
}

/** The blocks of one window, parsed on its own, with offsets into the whole file. */
function windowBlocks(text: string, window: Window, heading: string): ProseBlock[] {
  if (window.start === 0 && window.end === text.length) return readMarkdownBlocks(text, heading);
  const blocks = readMarkdownBlocks(text.slice(window.start, window.end), heading);
  for (const block of blocks) {
    for (let i = 0; i < block.offsets.length; i += 1) block.offsets[i] = (block.offsets[i] ?? 0) + window.start;
  }
  return blocks;
}
