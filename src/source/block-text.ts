import type { BlockKind, ProseBlock } from '../types.js';
import { decodeReference, matchReference } from './character-reference.js';

/**
 * A prose block being assembled: its text, one UTF-16 unit at a time, each with the UTF-16 index
 * in the original file it came from. `end` is the original index just past what was consumed last.
 */
export interface BlockText {
  units: string[];
  offsets: number[];
  end: number;
}

/** An empty block under construction. */
export function startBlockText(): BlockText {
  return { units: [], offsets: [], end: 0 };
}

/**
 * How a source language spells characters in text: its escapes and its character references.
 * Markdown has both; HTML has only references (a backslash is a backslash).
 */
export interface ValueSyntax {
  isEscape(original: string, k: number): boolean;
  /** The reference starting at `k` (its length in the source and what it decodes to), if any. */
  reference(original: string, k: number): { length: number; decoded: string } | undefined;
}

/** CommonMark's spelling: backslash escapes and `&name;` / `&#...;` references. */
export const MARKDOWN_SYNTAX: ValueSyntax = {
  isEscape,
  reference(original, k) {
    const reference = original[k] === '&' ? matchReference(original, k) : undefined;
    if (reference === undefined) return undefined;
    const decoded = decodeReference(reference);
    return decoded === reference ? undefined : { length: reference.length, decoded };
  },
};

/** One value character (or decoded reference) found in the source. */
interface Step {
  text: string;
  at: number;
  next: number;
  consumed: number;
}

/**
 * Appends a parser's decoded text `value` whose source is `original[from..to)`, finding each value
 * character in the source. The source may hold more than the value (indentation, `>` markers,
 * trailing spaces), or spell a character differently: a backslash escape (`\*` → `*`), a
 * character reference (`&amp;` → `&`) or a `\r\n` / `\r` line end (→ `\n`). Each is mapped to its
 * first unit, so a range starting there covers the whole spelling. A value character not found
 * keeps the last position, so offsets never run backwards and odd input never throws.
 */
export function appendValue(
  block: BlockText,
  value: string,
  original: string,
  from: number,
  to: number,
  syntax: ValueSyntax = MARKDOWN_SYNTAX,
): void {
  let j = from;
  let i = 0;
  while (i < value.length) {
    let step: Step | undefined;
    for (let k = j; k < to && step === undefined; k += 1) {
      step = matchAt(original, k, value, i, syntax);
      if (step === undefined && syntax.isEscape(original, k)) k += 1; // an escape of another character
    }
    if (step === undefined) {
      const unit = value[i] ?? '';
      step = { text: isLineEnd(unit) ? '\n' : unit, at: Math.max(from, Math.min(j, to - 1)), next: j, consumed: lineEndWidth(value, i) };
    }
    for (let u = 0; u < step.text.length; u += 1) push(block, step.text[u] ?? '', step.at);
    j = step.next;
    i += step.consumed;
  }
  block.end = Math.max(block.end, j);
}

function matchAt(original: string, k: number, value: string, i: number, syntax: ValueSyntax): Step | undefined {
  const unit = value[i];
  const source = original[k];
  if (unit === undefined) return undefined;
  if (syntax.isEscape(original, k)) {
    return original[k + 1] === unit ? { text: unit, at: k, next: k + 2, consumed: 1 } : undefined;
  }
  const reference = syntax.reference(original, k);
  if (reference !== undefined && value.startsWith(reference.decoded, i)) {
    return { text: reference.decoded, at: k, next: k + reference.length, consumed: reference.decoded.length };
  }
  if (isLineEnd(unit) && source !== undefined && isLineEnd(source)) {
    return { text: '\n', at: k, next: k + lineEndWidth(original, k), consumed: lineEndWidth(value, i) };
  }
  return source === unit ? { text: unit, at: k, next: k + 1, consumed: 1 } : undefined;
}

/** CommonMark's escapable characters (§2.4). */
export const ASCII_PUNCTUATION = new Set('!"#$%&\'()*+,-./:;<=>?@[\\]^_`{|}~');

/** A CommonMark backslash escape starts at `k`: a backslash before ASCII punctuation. */
export function isEscape(original: string, k: number): boolean {
  return original[k] === '\\' && ASCII_PUNCTUATION.has(original[k + 1] ?? '');
}

function isLineEnd(unit: string): boolean {
  return unit === '\r' || unit === '\n';
}

/** 2 for a `\r\n` at `k`, else 1. */
function lineEndWidth(text: string, k: number): number {
  return text[k] === '\r' && text[k + 1] === '\n' ? 2 : 1;
}

/** Appends one space for a removed inline element (code, HTML, image...), so words do not merge. */
export function appendGap(block: BlockText, start: number, end: number): void {
  push(block, ' ', start);
  block.end = Math.max(block.end, end);
}

/** The finished block, trimmed of surrounding whitespace; undefined when nothing but whitespace. */
export function finishBlock(block: BlockText, kind: BlockKind, heading: string): ProseBlock | undefined {
  const text = block.units.join('');
  const first = text.search(/\S/u);
  if (first < 0) return undefined;
  const last = text.length - (/\s*$/u.exec(text)?.[0].length ?? 0);
  // Just past the block: where trimmed whitespace began, or just past the last thing consumed.
  const lastOffset = block.offsets[last - 1] ?? 0;
  const final = last < text.length ? (block.offsets[last] ?? lastOffset + 1) : Math.max(block.end, lastOffset + 1);
  const offsets = block.offsets.slice(first, last);
  offsets.push(final);
  return { kind, text: text.slice(first, last), offsets, heading };
}

function push(block: BlockText, unit: string, at: number): void {
  block.units.push(unit);
  block.offsets.push(at);
}
