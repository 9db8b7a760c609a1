/**
 * The characters a match of a regular expression can start with, read from its source: a superset,
 * or undefined when the source holds something this reader does not take apart (a negated class, a
 * class escape such as `\s` or `\p{L}` where the match may start, `.`, a back-reference, a wide
 * range). V8 compiles a regular expression on its first use, and the unit table's 73 sticky
 * matchers (`u` flag, look-arounds with `\p{L}`) cost a cold `check` some 100 to 200 ms to compile
 * on this machine; matchUnit runs only those whose first characters hold the one at the number's
 * end, so a run compiles the few it meets (docs/speed.md, Start-up).
 *
 * Read for a case-sensitive source (no `i` flag), as the unit table's are: `[yY]` is two
 * characters. Look-arounds and `\b` match no character, so they add none and the reader goes on
 * past them; an element that may be absent (`?`, `*`, `{0,n}`) lets the next one start the match.
 * test/quantities/first-chars.test.ts compares matchUnit with every matcher run.
 */

interface Read {
  /** Code points a match of this part can start with; undefined: any. */
  set: Set<number> | undefined;
  /** The part can match the empty string. */
  empty: boolean;
  /** Where the reading stopped in the source. */
  end: number;
}

const CLASS_ESCAPES = new Set(['s', 'S', 'd', 'D', 'w', 'W', 'p', 'P']);
const ZERO_WIDTH_ESCAPES = new Set(['b', 'B']);
const CONTROL_ESCAPES: Record<string, number> = { n: 10, r: 13, t: 9, v: 11, f: 12, '0': 0 };
const WIDEST_RANGE = 256;

class Unreadable extends Error {}

function union(into: Set<number> | undefined, from: Set<number> | undefined): Set<number> | undefined {
  if (into === undefined || from === undefined) return undefined;
  for (const c of from) into.add(c);
  return into;
}

/** An escape at `i` (the backslash) inside or outside a class: its code point and where it ends. */
function escapeAt(src: string, i: number): { cp: number; end: number } | 'class' | 'zero' {
  const c = src[i + 1];
  if (c === undefined) throw new Unreadable();
  if (CLASS_ESCAPES.has(c)) return 'class';
  if (ZERO_WIDTH_ESCAPES.has(c)) return 'zero';
  if (c in CONTROL_ESCAPES && !(c === '0' && /\d/u.test(src[i + 2] ?? ''))) return { cp: CONTROL_ESCAPES[c] as number, end: i + 2 };
  if (c === 'u') {
    if (src[i + 2] === '{') {
      const close = src.indexOf('}', i + 3);
      if (close < 0) throw new Unreadable();
      return { cp: Number.parseInt(src.slice(i + 3, close), 16), end: close + 1 };
    }
    const hex = src.slice(i + 2, i + 6);
    if (!/^[0-9a-fA-F]{4}$/u.test(hex)) throw new Unreadable();
    return { cp: Number.parseInt(hex, 16), end: i + 6 };
  }
  if (c === 'x') {
    const hex = src.slice(i + 2, i + 4);
    if (!/^[0-9a-fA-F]{2}$/u.test(hex)) throw new Unreadable();
    return { cp: Number.parseInt(hex, 16), end: i + 4 };
  }
  // Back-references, \k<name>, \c: not taken apart.
  if (/[1-9kc]/u.test(c)) throw new Unreadable();
  // An escaped syntax character stands for itself.
  if (/[\^$\\.*+?()[\]{}|/-]/u.test(c)) return { cp: c.codePointAt(0) as number, end: i + 2 };
  throw new Unreadable();
}

/** A class `[...]` at `i`: its code points (undefined: any) and where it ends. */
function classAt(src: string, i: number): { set: Set<number> | undefined; end: number } {
  let j = i + 1;
  let set: Set<number> | undefined = new Set();
  if (src[j] === '^') throw new Unreadable();
  let first = true;
  while (j < src.length && (src[j] !== ']' || first)) {
    first = false;
    let lo: number;
    if (src[j] === '\\') {
      const e = escapeAt(src, j);
      if (e === 'zero') throw new Unreadable(); // \b in a class is a backspace: not used here
      if (e === 'class') {
        set = undefined;
        j = src[j + 1] === 'p' || src[j + 1] === 'P' ? src.indexOf('}', j) + 1 : j + 2;
        if (j <= 0) throw new Unreadable();
        continue;
      }
      lo = e.cp;
      j = e.end;
    } else {
      lo = src.codePointAt(j) as number;
      j += lo > 0xffff ? 2 : 1;
    }
    if (src[j] === '-' && src[j + 1] !== ']' && j + 1 < src.length) {
      let hi: number;
      if (src[j + 1] === '\\') {
        const e = escapeAt(src, j + 1);
        if (typeof e === 'string') throw new Unreadable();
        hi = e.cp;
        j = e.end;
      } else {
        hi = src.codePointAt(j + 1) as number;
        j += hi > 0xffff ? 3 : 2;
      }
      if (hi - lo > WIDEST_RANGE) set = undefined;
      else for (let c = lo; c <= hi; c += 1) set?.add(c);
    } else set?.add(lo);
  }
  if (src[j] !== ']') throw new Unreadable();
  return { set, end: j + 1 };
}

/** After an element ending at `i`: its quantifier, if any: may it be absent, and where it ends. */
function quantifierAt(src: string, i: number): { optional: boolean; end: number } {
  const c = src[i];
  let optional = false;
  let end = i;
  if (c === '?' || c === '*') {
    optional = true;
    end = i + 1;
  } else if (c === '+') end = i + 1;
  else if (c === '{') {
    const m = /^\{(\d+)(?:,\d*)?\}/u.exec(src.slice(i));
    if (m !== null) {
      optional = Number(m[1]) === 0;
      end = i + m[0].length;
    }
  }
  if (end > i && src[end] === '?') end += 1; // lazy
  return { optional, end };
}

/** Where the group whose body starts at `i` ends (past its `)`), skipping escapes and classes. */
function pastGroup(src: string, i: number): number {
  let depth = 1;
  let j = i;
  while (j < src.length) {
    const c = src[j];
    if (c === '\\') j += 2;
    else if (c === '[') {
      j += src[j + 1] === ']' ? 2 : 1;
      while (j < src.length && src[j] !== ']') j += src[j] === '\\' ? 2 : 1;
      j += 1;
    } else {
      if (c === '(') depth += 1;
      else if (c === ')') {
        depth -= 1;
        if (depth === 0) return j + 1;
      }
      j += 1;
    }
  }
  throw new Unreadable();
}

/** An alternation from `i` up to an unmatched `)` or the end. */
function alternationAt(src: string, i: number): Read {
  let set: Set<number> | undefined = new Set();
  let empty = false;
  let j = i;
  for (;;) {
    const seq = sequenceAt(src, j);
    set = union(set, seq.set);
    empty ||= seq.empty;
    j = seq.end;
    if (src[j] !== '|') return { set, empty, end: j };
    j += 1;
  }
}

/** A sequence of elements from `i` up to `|`, an unmatched `)` or the end. */
function sequenceAt(src: string, i: number): Read {
  let set: Set<number> | undefined = new Set();
  // Whether every element so far may match nothing (then the next one can start the match).
  let open = true;
  let j = i;
  while (j < src.length && src[j] !== '|' && src[j] !== ')') {
    const c = src[j] as string;
    let element: { set: Set<number> | undefined; empty: boolean };
    if (c === '(') {
      const look = /^\(\?(?:=|!|<=|<!)/u.exec(src.slice(j, j + 4));
      const start = look !== null ? j + look[0].length : src.startsWith('(?:', j) ? j + 3 : src.startsWith('(?<', j) ? src.indexOf('>', j) + 1 : j + 1;
      if (start <= 0) throw new Unreadable();
      if (look !== null) {
        // A look-around matches no character: what it holds is only skipped.
        j = pastGroup(src, start);
        element = { set: new Set(), empty: true };
      } else {
        const inner = alternationAt(src, start);
        if (src[inner.end] !== ')') throw new Unreadable();
        j = inner.end + 1;
        element = inner;
      }
    } else if (c === '[') {
      const cls = classAt(src, j);
      j = cls.end;
      element = { set: cls.set, empty: false };
    } else if (c === '\\') {
      const e = escapeAt(src, j);
      if (e === 'zero') {
        j += 2;
        element = { set: new Set(), empty: true };
      } else if (e === 'class') {
        j = src[j + 1] === 'p' || src[j + 1] === 'P' ? src.indexOf('}', j) + 1 : j + 2;
        if (j <= 0) throw new Unreadable();
        element = { set: undefined, empty: false };
      } else {
        j = e.end;
        element = { set: new Set([e.cp]), empty: false };
      }
    } else if (c === '^' || c === '$') {
      j += 1;
      element = { set: new Set(), empty: true };
    } else if (c === '.') {
      j += 1;
      element = { set: undefined, empty: false };
    } else if (c === '*' || c === '+' || c === '?' || c === '{' || c === ']' || c === '}') {
      throw new Unreadable();
    } else {
      const cp = src.codePointAt(j) as number;
      j += cp > 0xffff ? 2 : 1;
      element = { set: new Set([cp]), empty: false };
    }
    const q = quantifierAt(src, j);
    j = q.end;
    if (open) set = union(set, element.set);
    open &&= element.empty || q.optional;
  }
  return { set, empty: open, end: j };
}

/** The code points a match of `source` (case-sensitive) can start with, or undefined: any. */
export function firstChars(source: string): ReadonlySet<number> | undefined {
  try {
    const read = alternationAt(source, 0);
    if (read.end !== source.length) return undefined;
    return read.set;
  } catch (error) {
    if (error instanceof Unreadable) return undefined;
    throw error;
  }
}
