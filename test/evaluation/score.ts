import type { CorrectClaim, ErrorKind, SeededError } from './answer-key.js';

/** The part of an engine flag the evaluation reads (positions are 1-based, columns in code points). */
export interface FlagLike {
  readonly ruleId: string;
  readonly level: string;
  readonly file: string;
  readonly span: {
    readonly start: { readonly line: number; readonly column: number };
    readonly end: { readonly line: number; readonly column?: number };
  };
  readonly excerpt?: string;
}

/** A 1-based line and column; compared in reading order. */
export interface Point {
  readonly line: number;
  readonly column: number;
}

/** Levels that count: a note is advice for the editor, not a claim that something is wrong. */
export function isSerious(flag: FlagLike): boolean {
  return flag.level === 'error' || flag.level === 'warning';
}

/** Same file (POSIX, no leading ./), rule group equals the error's kind, and the span's lines include the error's line. */
export function flagMatchesError(flag: FlagLike, error: SeededError): boolean {
  return (
    normalisePath(flag.file) === normalisePath(error.file) &&
    flag.ruleId.startsWith(`${error.kind}.`) &&
    flag.span.start.line <= error.line &&
    error.line <= flag.span.end.line
  );
}

/**
 * Pairs flags with seeded errors one to one (maximum bipartite matching), so that one flag whose
 * span covers two errors of the same kind is credited once, not twice.
 * Returns, for each error index, the index of the flag credited to it, or -1.
 */
export function assignFlags(flags: readonly FlagLike[], errors: readonly SeededError[]): number[] {
  const flagOwner = new Array<number>(flags.length).fill(-1);
  const errorFlag = new Array<number>(errors.length).fill(-1);
  const candidates = errors.map((error) =>
    flags.flatMap((flag, index) => (flagMatchesError(flag, error) ? [index] : [])),
  );
  const tryAssign = (errorIndex: number, seen: Set<number>): boolean => {
    for (const flagIndex of candidates[errorIndex] ?? []) {
      if (seen.has(flagIndex)) continue;
      seen.add(flagIndex);
      const owner = flagOwner[flagIndex] ?? -1;
      if (owner === -1 || tryAssign(owner, seen)) {
        flagOwner[flagIndex] = errorIndex;
        errorFlag[errorIndex] = flagIndex;
        return true;
      }
    }
    return false;
  };
  errors.forEach((_, errorIndex) => tryAssign(errorIndex, new Set()));
  return errorFlag;
}

/**
 * Where a correct claim sits in its file: the text is searched from its key line on, with any run
 * of whitespace (and a block-quote marker at a line start) matching any other, so hard-wrapped
 * sentences are found. Returns undefined when the key no longer matches the draft.
 */
export function locateClaim(source: string, claim: CorrectClaim): { start: Point; end: Point } | undefined {
  const lines = source.split(/\r\n|\r|\n/);
  const window = lines.slice(claim.line - 1, claim.line + 4).join('\n');
  const words = claim.text.replace(/(^|\s)>\s/g, ' ').trim().split(/\s+/).map(escapeRegExp);
  const match = new RegExp(words.join('\\s+(?:>\\s+)?')).exec(window);
  if (match === null || match.index > (lines[claim.line - 1] ?? '').length) return undefined;
  return {
    start: pointAt(window, match.index, claim.line),
    end: pointAt(window, match.index + match[0].length - 1, claim.line),
  };
}

/** Whether a flag's span overlaps a located claim; a flag without an end column runs to the end of its last line. */
export function flagTouches(flag: FlagLike, where: { start: Point; end: Point }): boolean {
  const flagEnd: Point = { line: flag.span.end.line, column: flag.span.end.column ?? Number.MAX_SAFE_INTEGER };
  return !isBefore(flagEnd, where.start) && !isBefore(where.end, flag.span.start);
}

/** Detected over seeded, per kind, in a fixed order. */
export function countByKind(errors: readonly SeededError[], detected: readonly boolean[]): Map<ErrorKind, [number, number]> {
  const order: readonly ErrorKind[] = ['value', 'arith', 'unit', 'logic', 'scope', 'direction'];
  const counts = new Map<ErrorKind, [number, number]>(order.map((kind) => [kind, [0, 0]]));
  errors.forEach((error, index) => {
    const entry = counts.get(error.kind) ?? [0, 0];
    counts.set(error.kind, [entry[0] + (detected[index] === true ? 1 : 0), entry[1] + 1]);
  });
  return counts;
}

function isBefore(a: Point, b: Point): boolean {
  return a.line < b.line || (a.line === b.line && a.column < b.column);
}

// Columns count Unicode code points (DESIGN.md), so CO₂ and °C are one column each.
function pointAt(text: string, offset: number, firstLine: number): Point {
  const before = text.slice(0, offset).split('\n');
  return { line: firstLine + before.length - 1, column: [...(before[before.length - 1] ?? '')].length + 1 };
}

function normalisePath(file: string): string {
  return file.replace(/\\/g, '/').replace(/^\.\//, '');
}

function escapeRegExp(text: string): string {
  return text.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');
}
