/**
 * Word lists searched by walking their trie in code, with exactly the answers of the regular
 * expressions they replace (ECMAScript RegExp under the `iu` flags: simple case folding, `\p{L}` and
 * `\p{N}` word boundaries, a run of white space in a phrase as `\s+`). V8 compiles such an expression
 * on its first use, and with its Unicode classes and case folding that cost one to several
 * milliseconds for a term's dozen phrases and 60 to 90 ms for a topic list of thousands: most of a
 * short `check`'s start-up. The walk needs no compilation; each character question (is this a letter
 * or digit, white space, equal to that unit under case folding) is asked of a one-character
 * expression with the same flags, once per code point met, so its answers are the engine's own.
 */

/**
 * A node: children by unit code point, the white-space run's child, and the first phrase (in list
 * order) ending here. Most nodes of a word list's trie have one child (the rest of a word), so the
 * first child is held in two fields and a Map is made only for a second: a Map for every node took
 * some 17 MiB per thread for the built-in pack's lists (80,000 nodes), kept for the whole run.
 */
interface Node {
  /** The unit of the first child, or -1 when there is none. */
  unit: number;
  child: Node | undefined;
  /** The children after the first, by unit. */
  more: Map<number, Node> | undefined;
  space: Node | undefined;
  /** Index in the list of the first phrase that ends here, or -1. */
  end: number;
}

const newNode = (): Node => ({ unit: -1, child: undefined, more: undefined, space: undefined, end: -1 });

/** The child of `node` for unit `u`, if any. */
function childOf(node: Node, u: number): Node | undefined {
  return node.unit === u ? node.child : node.more?.get(u);
}

/** The child of `node` for unit `u`, made when it is not there. */
function childMade(node: Node, u: number): Node {
  const found = childOf(node, u);
  if (found !== undefined) return found;
  const made = newNode();
  if (node.child === undefined) {
    node.unit = u;
    node.child = made;
  } else {
    (node.more ??= new Map()).set(u, made);
  }
  return made;
}

const WORD = /^[\p{L}\p{N}]$/iu;
const SPACE = /^\s$/iu;
const ASCII_WORD = new Uint8Array(128);
const ASCII_SPACE = new Uint8Array(128);
for (let c = 0; c < 128; c += 1) {
  ASCII_WORD[c] = WORD.test(String.fromCharCode(c)) ? 1 : 0;
  ASCII_SPACE[c] = SPACE.test(String.fromCharCode(c)) ? 1 : 0;
}
const wordCache = new Map<number, boolean>();
const spaceCache = new Map<number, boolean>();

/** True when code point `c` is a letter or digit as `[\p{L}\p{N}]` reads it under `iu`; false for -1 (no character). */
export function isWordCode(c: number): boolean {
  if (c < 128) return c >= 0 && ASCII_WORD[c] === 1;
  let known = wordCache.get(c);
  if (known === undefined) {
    known = WORD.test(String.fromCodePoint(c));
    wordCache.set(c, known);
  }
  return known;
}

function isSpaceCode(c: number): boolean {
  if (c < 128) return ASCII_SPACE[c] === 1;
  let known = spaceCache.get(c);
  if (known === undefined) {
    known = SPACE.test(String.fromCodePoint(c));
    spaceCache.set(c, known);
  }
  return known;
}

const unitExpressions = new Map<number, RegExp>();
const sameCache = new Map<number, boolean>();

/** True when text code point `c` matches the literal unit `u` under the `iu` flags. */
function sameUnit(c: number, u: number): boolean {
  if (c === u) return true;
  if (c < 128 && u < 128) {
    // Of ASCII characters only a letter's other case is equal to it.
    const lc = c >= 65 && c <= 90 ? c + 32 : c;
    const lu = u >= 65 && u <= 90 ? u + 32 : u;
    return lc === lu && lc >= 97 && lc <= 122;
  }
  const key = c * 0x110000 + u;
  let known = sameCache.get(key);
  if (known === undefined) {
    let re = unitExpressions.get(u);
    if (re === undefined) {
      re = new RegExp(`^${escapeUnit(String.fromCodePoint(u))}$`, 'iu');
      unitExpressions.set(u, re);
    }
    known = re.test(String.fromCodePoint(c));
    sameCache.set(key, known);
  }
  return known;
}

const foldCache = new Map<number, number>();

/**
 * The lower-case ASCII letter or the digit that code point `c` equals under the `iu` flags, or -1
 * for none: an ASCII letter's other case, and the few code points case folding sends to an ASCII
 * letter (the Kelvin sign, the long s), asked of the same one-character expressions as the walk.
 */
export function asciiFoldOf(c: number): number {
  if (c < 128) {
    if (c >= 65 && c <= 90) return c + 32;
    return (c >= 97 && c <= 122) || (c >= 48 && c <= 57) ? c : -1;
  }
  let known = foldCache.get(c);
  if (known === undefined) {
    known = -1;
    for (let u = 97; u <= 122; u += 1) {
      if (sameUnit(c, u)) {
        known = u;
        break;
      }
    }
    foldCache.set(c, known);
  }
  return known;
}

function escapeUnit(unit: string): string {
  return unit.replace(/[.*+?^${}()|[\]\\/]/gu, '\\$&');
}

/** The code point at `i` as the `u` flag reads it: a surrogate pair is one, a lone surrogate is itself; -1 past the end. */
function codeAt(text: string, i: number): number {
  if (i >= text.length) return -1;
  const c = text.charCodeAt(i);
  if (c >= 0xd800 && c <= 0xdbff && i + 1 < text.length) {
    const d = text.charCodeAt(i + 1);
    if (d >= 0xdc00 && d <= 0xdfff) return ((c - 0xd800) << 10) + (d - 0xdc00) + 0x10000;
  }
  return c;
}

/** The code point ending just before `i` as a `u` lookbehind reads it, or -1 at the start. */
function codeBefore(text: string, i: number): number {
  if (i <= 0) return -1;
  const d = text.charCodeAt(i - 1);
  if (d >= 0xdc00 && d <= 0xdfff && i >= 2) {
    const c = text.charCodeAt(i - 2);
    if (c >= 0xd800 && c <= 0xdbff) return ((c - 0xd800) << 10) + (d - 0xdc00) + 0x10000;
  }
  return d;
}

/** A list of phrases as a trie, searched as the regular expressions of topicPattern and the term binder. */
export class PhraseTrie {
  private readonly root = newNode();
  private readonly units: number[];
  private readonly equal = new Map<number, readonly number[]>();
  private readonly starts = new Map<number, boolean>();
  private readonly asciiStart = new Uint8Array(128);
  /** Whether a hyphen, too, belongs to the run that a phrase's white space matches. */
  private readonly hyphens: boolean;

  /**
   * `phrases` in order of preference (the first that matches at a place wins, as in an alternation); none may be empty.
   * With `hyphens`, a phrase's white space matches a run of white space and hyphens (`[\s-]+`), so no
   * phrase may have a hyphen or white space just after its white space.
   */
  constructor(phrases: readonly string[], options: { hyphens?: boolean } = {}) {
    this.hyphens = options.hyphens === true;
    const units = new Set<number>();
    phrases.forEach((phrase, index) => {
      let node = this.root;
      // Units as topicPattern cuts them: a run of white space is one, every other code point is one.
      for (let i = 0; i < phrase.length; ) {
        const c = codeAt(phrase, i);
        if (isSpaceCode(c)) {
          node = node.space ??= newNode();
          while (i < phrase.length && isSpaceCode(phrase.charCodeAt(i))) i += 1;
          continue;
        }
        i += c > 0xffff ? 2 : 1;
        units.add(c);
        node = childMade(node, c);
      }
      if (node.end < 0) node.end = index;
    });
    this.units = [...units];
    for (let c = 0; c < 128; c += 1) this.asciiStart[c] = this.canStart(c) ? 1 : 0;
  }

  private isJoiner(c: number): boolean {
    return isSpaceCode(c) || (this.hyphens && c === 0x2d);
  }

  /** The units of this trie that text code point `c` equals under the `iu` flags. */
  private unitsEqualTo(c: number): readonly number[] {
    let found = this.equal.get(c);
    if (found === undefined) {
      found = this.units.filter((u) => sameUnit(c, u));
      this.equal.set(c, found);
    }
    return found;
  }

  private canStart(c: number): boolean {
    let known = this.starts.get(c);
    if (known === undefined) {
      known = this.root.space !== undefined || this.unitsEqualTo(c).some((u) => childOf(this.root, u) !== undefined);
      this.starts.set(c, known);
    }
    return known;
  }

  /**
   * From `at`, the end and phrase index of the first phrase (in list order) that matches and is
   * followed by no letter or digit; undefined for none. With `any`, the first such end found.
   */
  private walk(text: string, node: Node, at: number, any: boolean, best: { end: number; index: number } | undefined): { end: number; index: number } | undefined {
    if (node.end >= 0 && (best === undefined || node.end < best.index) && !isWordCode(codeAt(text, at))) {
      best = { end: at, index: node.end };
      if (any) return best;
    }
    if (at >= text.length) return best;
    const c = codeAt(text, at);
    if (node.space !== undefined && this.isJoiner(c)) {
      let after = at + 1;
      while (after < text.length && this.isJoiner(text.charCodeAt(after))) after += 1;
      best = this.walk(text, node.space, after, any, best);
      if (any && best !== undefined) return best;
    }
    const size = c > 0xffff ? 2 : 1;
    for (const u of this.unitsEqualTo(c)) {
      const child = childOf(node, u);
      if (child === undefined) continue;
      best = this.walk(text, child, at + size, any, best);
      if (any && best !== undefined) return best;
    }
    return best;
  }

  /**
   * True when a phrase occurs with no letter or digit on either side: what
   * `/(?<![\p{L}\p{N}])(?:…)(?![\p{L}\p{N}])/iu.test(text)` answers.
   */
  test(text: string): boolean {
    const n = text.length;
    let i = 0;
    while (i < n) {
      const c = text.charCodeAt(i);
      if (c < 128) {
        if (this.asciiStart[c] === 1 && !isWordCode(codeBefore(text, i)) && this.walk(text, this.root, i, true, undefined) !== undefined) return true;
        i += 1;
        continue;
      }
      const cp = codeAt(text, i);
      if (this.canStart(cp) && !isWordCode(codeBefore(text, i)) && this.walk(text, this.root, i, true, undefined) !== undefined) return true;
      i += cp > 0xffff ? 2 : 1;
    }
    return false;
  }

  /**
   * Every occurrence as [start, end] of the phrase, as `text.matchAll` of
   * `/(^|[^\p{L}\p{N}])(?:…)(?![\p{L}\p{N}])/giu` finds them, the phrases in list order, each match
   * starting after the group: the character before a phrase is part of the match, so the next
   * search starts after it.
   */
  spans(text: string): [number, number][] {
    const found: [number, number][] = [];
    const n = text.length;
    let from = 0;
    // A phrase may start at `s` when s is 0 (and no match came before) or the code point before s
    // is not a letter or digit and begins at or after `from`.
    for (let s = 0; s < n; ) {
      const unit = text.charCodeAt(s);
      if (unit < 128 && this.asciiStart[unit] === 0) {
        s += 1;
        continue;
      }
      const c = codeAt(text, s);
      const size = c > 0xffff ? 2 : 1;
      let allowed = s === 0 && from === 0;
      if (!allowed && s > 0) {
        const before = codeBefore(text, s);
        allowed = !isWordCode(before) && s - (before > 0xffff ? 2 : 1) >= from;
      }
      if (allowed && (c < 128 || this.canStart(c))) {
        const best = this.walk(text, this.root, s, false, undefined);
        if (best !== undefined) {
          found.push([s, best.end]);
          from = best.end;
          s = best.end;
          continue;
        }
      }
      s += size;
    }
    return found;
  }

  /**
   * Every occurrence as [start, end], as `text.matchAll` of
   * `/(?<![\p{L}\p{N}])(?:…)(?![\p{L}\p{N}])/giu` finds them, the phrases in list order: the
   * character before a phrase is only looked at, so the next search starts at the end of a match.
   */
  occurrences(text: string): [number, number][] {
    const found: [number, number][] = [];
    const n = text.length;
    for (let s = 0; s < n; ) {
      const unit = text.charCodeAt(s);
      if (unit < 128 && this.asciiStart[unit] === 0) {
        s += 1;
        continue;
      }
      const c = codeAt(text, s);
      if ((c < 128 || this.canStart(c)) && !isWordCode(codeBefore(text, s))) {
        const best = this.walk(text, this.root, s, false, undefined);
        if (best !== undefined) {
          found.push([s, best.end]);
          s = best.end;
          continue;
        }
      }
      s += c > 0xffff ? 2 : 1;
    }
    return found;
  }
}
