/**
 * Formulas written out in the draft and their stated results: an expression with brackets or a
 * natural logarithm, "5.35 × ln(280/190) ≈ 2.1", "(280 − 190) / 190 ≈ 0.47", "5.35 times the
 * natural log of 280 over 190 comes out at about 2.1", each worked step of a chain "= 5.35 × 0.388
 * ≈ 2.1" read from the step before it. The expression is read by a small recursive reader of the
 * usual order of operations (brackets, powers, × and ÷, + and −); its numbers are exact, as the
 * writer worked them, and the result is read as written (quantities/written-interval.ts), so only
 * a result that no reading of its written places allows is flagged. A plain "A op B = C" is
 * arithmetic-equations.ts's; this reads what that cannot: brackets, functions, longer chains.
 * Symbols in the formula ("ln(C/C0)") make no expression, and a plain "log", whose base a writer
 * may mean either way, is not read.
 */
import { toCanonical } from '../quantities/index.js';
import type { Quantity } from '../types.js';
import { disjoint } from './arithmetic-levels.js';
import type { Derived } from './arithmetic-derive.js';
import { WORDS } from './arithmetic-reader/word-classes.js';

/** An expression read from the text: its exact value, where it ends, and what it is made of. */
interface Expression {
  value: number;
  end: number;
  /** Operators and functions applied. */
  steps: number;
  /** True when it holds a function or a bracketed group. */
  structured: boolean;
}

const SPACE = /[\s\u00A0]/u;
/** Multiplication signs and words; "x" only as a word of its own. */
const TIMES = ['×', '*', '·', '⋅', 'multiplied by', 'times'];
const DIVIDE = ['÷', '/', 'divided by', 'over'];
/** Names of the natural logarithm, written or spoken, each taking the operand after it. */
const NATURAL_LOG = ['the natural logarithm of', 'the natural log of', 'natural logarithm of', 'natural log of', 'ln'];

/** The reader's place in one sentence. */
class Reader {
  constructor(
    readonly text: string,
    public at: number,
  ) {}

  skip(): void {
    while (this.at < this.text.length && SPACE.test(this.text[this.at] as string)) this.at++;
  }

  /** Takes one of `words` at the reader's place (case-insensitive, whole words for letters). */
  take(words: readonly string[]): string | undefined {
    this.skip();
    const rest = this.text.slice(this.at, this.at + 40).toLowerCase();
    for (const w of words) {
      if (!rest.startsWith(w)) continue;
      const after = rest[w.length] ?? '';
      if (/\p{L}$/u.test(w) && /[\p{L}\d]/u.test(after) && !(w === 'ln' && after === '(')) continue;
      if (w === 'ln' && /[\p{L}\d]/u.test(after)) continue;
      this.at += w.length;
      return w;
    }
    return undefined;
  }

  /** A number written in digits ("5.35", "800,000", "0.388"). */
  number(): number | undefined {
    this.skip();
    const m = /^(?:\d{1,3}(?:,\d{3})+|\d+)(?:\.\d+)?/u.exec(this.text.slice(this.at));
    if (m === null) return undefined;
    // Part of a word or a larger token ("C0", "CO2") is no operand.
    if (this.at > 0 && /[\p{L}\d.]/u.test(this.text[this.at - 1] as string)) return undefined;
    if (/^[\p{L}]/u.test(this.text.slice(this.at + m[0].length))) return undefined;
    this.at += m[0].length;
    return Number(m[0].replace(/,/gu, ''));
  }
}

/** A minus sign: the true sign anywhere, a hyphen or dash only with space on both sides ("1750–2019" is a range). */
function takeMinus(r: Reader): boolean {
  const before = r.at;
  r.skip();
  const c = r.text[r.at];
  if (c === '−') {
    r.at++;
    return true;
  }
  if ((c === '-' || c === '–') && SPACE.test(r.text[r.at - 1] ?? '') && SPACE.test(r.text[r.at + 1] ?? '')) {
    r.at++;
    return true;
  }
  r.at = before;
  return false;
}

/** "x" as a sign of multiplication: a word of its own between two operands. */
function takeX(r: Reader): boolean {
  const before = r.at;
  r.skip();
  if (SPACE.test(r.text[r.at - 1] ?? '') && (r.text[r.at] === 'x' || r.text[r.at] === 'X') && SPACE.test(r.text[r.at + 1] ?? '')) {
    r.at++;
    return true;
  }
  r.at = before;
  return false;
}

type Part = { value: number; steps: number; structured: boolean };

function primary(r: Reader): Part | undefined {
  const start = r.at;
  r.skip();
  if (r.text[r.at] === '(') {
    r.at++;
    const inner = sum(r);
    r.skip();
    if (inner === undefined || r.text[r.at] !== ')') {
      r.at = start;
      return undefined;
    }
    r.at++;
    return { value: inner.value, steps: inner.steps, structured: true };
  }
  const log = r.take(NATURAL_LOG);
  if (log !== undefined) {
    // "ln(280/190)", "ln 2"; in words, "the natural log of 280 over 190" takes the quotient after it.
    const arg = log === 'ln' ? power(r) : product(r);
    if (arg === undefined || !(arg.value > 0)) {
      r.at = start;
      return undefined;
    }
    return { value: Math.log(arg.value), steps: arg.steps + 1, structured: true };
  }
  const n = r.number();
  if (n === undefined) {
    r.at = start;
    return undefined;
  }
  return { value: n, steps: 0, structured: false };
}

function power(r: Reader): Part | undefined {
  const base = primary(r);
  if (base === undefined) return undefined;
  const at = r.at;
  r.skip();
  if (r.text[r.at] !== '^') {
    r.at = at;
    return base;
  }
  r.at++;
  const exp = primary(r);
  if (exp === undefined) {
    r.at = at;
    return base;
  }
  return { value: base.value ** exp.value, steps: base.steps + exp.steps + 1, structured: true };
}

function product(r: Reader): Part | undefined {
  let left = power(r);
  if (left === undefined) return undefined;
  for (;;) {
    const at = r.at;
    let op: '×' | '÷' | undefined;
    if (r.take(TIMES) !== undefined || takeX(r)) op = '×';
    else if (r.take(DIVIDE) !== undefined) op = '÷';
    else {
      // "5.35 ln(280/190)": a function right after a number multiplies it.
      r.skip();
      if (/^(?:ln|the natural|natural)/iu.test(r.text.slice(r.at, r.at + 11))) op = '×';
    }
    if (op === undefined) {
      r.at = at;
      return left;
    }
    const right = power(r);
    if (right === undefined || (op === '÷' && right.value === 0)) {
      r.at = at;
      return left;
    }
    left = { value: op === '×' ? left.value * right.value : left.value / right.value, steps: left.steps + right.steps + 1, structured: left.structured || right.structured };
  }
}

function sum(r: Reader): Part | undefined {
  let left = product(r);
  if (left === undefined) return undefined;
  for (;;) {
    const at = r.at;
    r.skip();
    let sign = 0;
    if (r.text[r.at] === '+') {
      r.at++;
      sign = 1;
    } else if (takeMinus(r)) sign = -1;
    if (sign === 0) {
      r.at = at;
      return left;
    }
    const right = product(r);
    if (right === undefined) {
      r.at = at;
      return left;
    }
    left = { value: left.value + sign * right.value, steps: left.steps + right.steps + 1, structured: left.structured || right.structured };
  }
}

/** The expression that starts at `at`, or undefined when none does. */
function expressionAt(text: string, at: number): Expression | undefined {
  const r = new Reader(text, at);
  const e = sum(r);
  return e === undefined ? undefined : { ...e, end: r.at };
}

/** Words a result verb may close an apposition with ("5.35 × ln(2), a doubling adds about 3.7"). */
const RESULT_VERBS = ['adds', 'add', 'yields', 'yield', 'gives', 'give', 'comes to', 'comes out at', 'is', 'was', 'means'];
/** The most words between an expression and its result. */
const MAX_TIE_WORDS = 7;

/**
 * True when the text between an expression and the figure after it states that figure as its
 * result: a sign or word of the result ("≈", "=", "comes to", "gives"), a bare apposition (", about
 * 2.1"), or a short clause after a comma closed by a verb of the result (", and that comes out
 * at", ", a doubling of CO2 adds"). No full stop, semicolon or other figure may stand between.
 */
function states(between: string, result: Quantity): boolean {
  // A digit inside a word ("CO2") is no figure; the figures between were skipped by the caller.
  if (/[.;!?]\s|[;!?]|(?<![\p{L}])\d/u.test(between)) return false;
  const bare = between.trim();
  // "≈ 2.1": the sign of the result was read as the figure's hedge.
  if (bare === '') return result.hedge !== undefined && WORDS.equals.includes(result.hedge.trim());
  // ", about 2.1", ": 2.1": the result in apposition.
  if (bare === ',' || bare === ':') return true;
  const words = bare.replace(/^[,:]\s*/u, '').toLowerCase().split(/[\s\u00A0]+/u).filter((x) => x !== '');
  if (words.length > MAX_TIE_WORDS) return false;
  const tail = (phrases: readonly string[]): boolean => phrases.some((p) => words.slice(-p.split(' ').length).join(' ') === p);
  if (tail(WORDS.equals)) return words.length <= 4 || bare.startsWith(',');
  return bare.startsWith(',') && tail(RESULT_VERBS);
}

/** The result of a formula: its stated figure and the value the formula gives it. */
export interface FormulaFinding {
  stated: Quantity;
  computed: Derived;
  measures: string;
}

/** The exact value `v` (in the result's written unit) in the result's canonical unit. */
function inUnitOf(v: number, q: Quantity): number {
  return q.statedUnit === '' ? v : toCanonical(v, q.statedUnit, q.dimension);
}

/** Where the digits of a figure start, after its hedge or sign ("≈ 2.1", "= 5.35 × 0.388"). */
const digitsAt = (q: Quantity): number => q.start + q.text.search(/\d/u);

/**
 * Every formula of the sentence whose stated result is not what its expression gives: the whole
 * chain of "expression = expression ≈ figure" is followed, each step against the one before.
 */
export function writtenFormulas(text: string, qs: readonly Quantity[]): FormulaFinding[] {
  const out: FormulaFinding[] = [];
  let from = 0;
  for (let at = 0; at < text.length; at++) {
    if (at < from) continue;
    const c = text[at] as string;
    const prev = at > 0 ? (text[at - 1] as string) : ' ';
    if (!(/\d/u.test(c) || c === '(' || /l/iu.test(c) || /n/iu.test(c) || /t/iu.test(c)) || /[\p{L}\d.,]/u.test(prev)) continue;
    const e = expressionAt(text, at);
    if (e === undefined || e.steps === 0 || !e.structured) continue;
    let current = e;
    let measures = text.slice(at, e.end).trim();
    for (;;) {
      // The first figure written in digits after it ("a doubling", a figure in words, is passed over).
      const next = qs.find((q) => /\d/u.test(q.text) && digitsAt(q) >= current.end);
      if (next === undefined || !states(text.slice(current.end, next.start), next)) break;
      const step = expressionAt(text, digitsAt(next));
      if (step !== undefined && step.steps > 0) {
        // A worked step: the chain goes on from its written numbers.
        measures = text.slice(digitsAt(next), step.end).trim();
        current = step;
        continue;
      }
      const value = current.value;
      // A percentage may be given for a ratio worked as a fraction ("(420 − 280)/280 = 50%").
      const readings = next.dimension === 'percent' && Math.abs(value) < 10 ? [value, value * 100] : [value];
      const exact = readings.map((v) => inUnitOf(v, next));
      if (exact.every((v) => disjoint(next, { low: v, high: v }))) {
        const v = exact[exact.length - 1] as number;
        out.push({ stated: next, computed: { value: v, low: v, high: v }, measures });
      }
      break;
    }
    from = current.end;
  }
  return out;
}
