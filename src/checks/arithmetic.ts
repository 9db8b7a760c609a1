/**
 * Checks the draft's own arithmetic inside one sentence (and a change whose start is in the
 * sentence before, src/checks/arithmetic-context.ts): a change that is not to − from, a rate that
 * is not change ÷ duration, a duration that contradicts its start and end dates, a ratio or
 * percentage that contradicts its two values. Tolerances come from the intervals (see
 * src/quantities/interval-rules.ts); correct arithmetic is never flagged.
 */
import { hasNumeral } from '../quantities/two-numerals.js';
import { WORDS, wordsIn } from './arithmetic-reader/word-classes.js';
import { correctionFigures, derivedFigures, dimensionOfCanonical, findUnit, formatQuantity, hedgeRule, parseQuantities, rewriteQuantity } from '../quantities/index.js';
import type { FlagDraft, Quantity } from '../types.js';
import type { Derived } from './arithmetic-derive.js';
import { disjoint, levelFor } from './arithmetic-levels.js';
import { ARITHMETIC_RULES, findPairs } from './arithmetic-rules.js';
import { shownClaim } from './reference-format.js';
import { operandsOf } from './arithmetic-vague.js';

/**
 * The replacement for a stated quantity: its own words with the right value. An approximation
 * hedge stays ("about 100 ppm"); a bound is dropped, since "more than 1.6 times" would misstate it.
 * A sum shows the figures its inputs allow (derivedFigures); a conversion asks for its own.
 */
export function correctionFor(q: Quantity, value: number, figures = derivedFigures(q, value)): string {
  const rewritten = rewriteQuantity(q, value, figures);
  if (q.hedge === undefined || hedgeRule(q.hedge)?.id === 'about') return rewritten;
  const lower = rewritten.toLowerCase();
  const hedge = q.hedge.toLowerCase();
  if (lower.startsWith(hedge)) return rewritten.slice(hedge.length).trimStart();
  const at = lower.lastIndexOf(hedge);
  return at > 0 ? rewritten.slice(0, at).replace(/[\s,]+$/u, '') : rewritten;
}

/**
 * A bare change's correction with the unit of the figures it is the difference of: "from 180 to 280
 * parts per million; that's 80 more" is corrected to "100 ppm", so the editor reads the amount, not
 * a bare number. Only a difference takes its operands' unit, and only one unit they all share.
 */
function withOperandUnit(correction: string, stated: Quantity, ruleId: string, measures: string): string {
  if (ruleId !== 'arith.change' || stated.dimension !== 'number' || stated.statedUnit !== '' || !/^[^\p{L}]*[\d.,]+$/u.test(correction)) return correction;
  const units = new Set(parseQuantities(measures).filter((q) => q.statedUnit !== '' && q.dimension !== 'number').map((q) => `${q.dimension} ${q.unit}`));
  const operand = parseQuantities(measures).find((q) => q.statedUnit !== '' && q.dimension !== 'number');
  if (units.size !== 1 || operand === undefined) return correction;
  const word = formatQuantity(1, operand.unit, operand.statedUnit).replace(/^1\s*/u, '');
  return word === '' ? correction : `${correction} ${word}`;
}

/**
 * A rate's correction with the yearly rate beside it when the draft told its pace over another
 * stretch: an amount every interval ("about 0.11 ppm every ten years") or a rate per decade or
 * century ("0.11 ppm per decade"). An editor restates such a pace per year, the unit the reference
 * values keep: "about 0.11 ppm (about 0.011 ppm per year)".
 */
export function withYearlyRate(correction: string, stated: Quantity, value: number, yearly: { value: number; unit: string } | undefined): string {
  const [base, per] = rateParts(stated.statedUnit);
  // The draft's own amount unit, now per year: "mm per decade" gives "mm per year".
  const perYear = yearly !== undefined ? { ...yearly, shown: `${stated.statedUnit}/yr` } : stated.unit.endsWith('/yr') && per !== undefined && per !== 'yr' ? { value, unit: stated.unit, shown: `${base}/yr` } : undefined;
  if (perYear === undefined || !(perYear.value > 0)) return correction;
  const dimension = dimensionOfCanonical(perYear.unit);
  const shown = dimension !== undefined && findUnit(perYear.shown, dimension) !== undefined ? perYear.shown : perYear.unit;
  return `${correction} (about ${formatQuantity(perYear.value, perYear.unit, shown, 2)})`;
}

/** A rate unit's amount and period: "ppm/decade" is ["ppm", "decade"]; a unit of no period, [unit, undefined]. */
function rateParts(unit: string): [string, string | undefined] {
  const at = unit.lastIndexOf('/');
  return at < 0 ? [unit, undefined] : [unit.slice(0, at), unit.slice(at + 1)];
}

/**
 * The sentences an answer reads on from when the sentence just before it is a question with no
 * figure of its own ("... ran from about 12,900 to 11,700 years ago. How long did it last? About
 * 1,800 years."): the question asks for a result of the figures before it, so the answer is drawn
 * from them as a "so" sentence is. Undefined when the sentence before is no such question.
 */
function askedBefore(context: readonly string[]): readonly string[] | undefined {
  const last = context.at(-1);
  if (last === undefined || !/\?[\s"'”’)*_]*$/u.test(last) || hasNumeral(last) || !asksForFigure(last)) return undefined;
  const rest = context.slice(0, -1);
  return rest.length > 0 && rest.some((s) => hasNumeral(s)) ? rest : undefined;
}

/** True when a question asks for a figure: "how long", "by how much", "what was the average rate?" (word-classes.ts). */
export function asksForFigure(question: string): boolean {
  const words = wordsIn(question, 0, question.length);
  return words.some((x, i) => (x.text === 'how' && WORDS.askedMeasures.has(words[i + 1]?.text ?? '')) || WORDS.askedNouns.has(x.text));
}

/** Words an answer is read with: it states the result the question asked for. */
const ANSWERED = 'So, ';

/** The flags of an answer, checked as the sentence "So, <answer>" after the figures the question asks about. */
function answerTo(text: string, quantities: Quantity[], context: readonly string[]): FlagDraft[] {
  const shift = ANSWERED.length;
  const moved = quantities.map((q) => ({ ...q, start: q.start + shift, end: q.end + shift }));
  return checkArithmetic(ANSWERED + text, moved, context).map((f) => ({ ...f, start: f.start - shift, end: f.end - shift }));
}

const shown = (q: Quantity, d: Derived): string => formatQuantity(d.value, q.unit, q.statedUnit, correctionFigures(q));

/** A contradiction one rule found, with the inputs of earlier sentences it took at their right value. */
interface RuleFinding {
  rule: (typeof ARITHMETIC_RULES)[number];
  stated: Quantity;
  computed: Derived;
  measures: string;
  basis: string | undefined;
  corrected: readonly Corrected[];
  yearly: { value: number; unit: string } | undefined;
}

/** A figure of an earlier sentence that its own figures contradict, and the value they give it. */
interface Corrected {
  q: Quantity;
  right: Derived;
}

/**
 * The quantities of a context sentence, each result its own paragraph's figures contradict taken at
 * the value they give ("76 ppm in 6,000 years. That is 0.13 ppm a year. Today's 2.4 ppm a year is
 * 19 times faster.": the 0.13 is 0.0127, so the multiple is 190, not 19). A later sum on a wrong
 * result inherits the slip; the draft's own figures say what the result should have been.
 */
function correctedQuantities(context: readonly string[], index: number): { quantities: Quantity[]; corrected: Corrected[] } {
  // What it reads depends on the sentence and the three before it alone (findingsOf's window), and
  // each sentence of a paragraph asks for the three before it: kept for the last few windows, so a
  // paragraph's sentence is read once as context, not three times (copies out, as parseQuantities).
  const key = JSON.stringify(context.slice(Math.max(0, index - CONTEXT_WINDOW), index + 1));
  let read = correctedKept.get(key);
  if (read === undefined) {
    read = readCorrected(context, index);
    if (correctedKept.size >= CORRECTED_KEPT) correctedKept.delete(correctedKept.keys().next().value as string);
    correctedKept.set(key, read);
  }
  return { quantities: read.quantities.map((q) => ({ ...q })), corrected: read.corrected.map((c) => ({ q: { ...c.q }, right: { ...c.right } })) };
}

/** The sentences before a sentence that its arithmetic reads on from (findingsOf's window). */
const CONTEXT_WINDOW = 3;
/** How many context readings are kept: a paragraph's next sentence asks for the last three again. */
const CORRECTED_KEPT = 64;
const correctedKept = new Map<string, { quantities: Quantity[]; corrected: Corrected[] }>();

function readCorrected(context: readonly string[], index: number): { quantities: Quantity[]; corrected: Corrected[] } {
  const text = context[index] ?? '';
  const quantities = operandsOf(text, parseQuantities(text));
  if (quantities.length === 0) return { quantities, corrected: [] };
  const found = findingsOf(text, quantities, context.slice(0, index), false);
  const corrected = found.map((f) => ({ q: f.stated, right: f.computed }));
  return { quantities: quantities.map((q) => {
    const c = corrected.find((x) => x.q === q);
    return c === undefined ? q : { ...q, value: c.right.value, low: c.right.low, high: c.right.high };
  }), corrected };
}

/** Every finding of every rule on one sentence; `correct` takes the context's wrong results at their right values. */
function findingsOf(text: string, quantities: Quantity[], context: readonly string[], correct: boolean): RuleFinding[] {
  const window = context.slice(-CONTEXT_WINDOW);
  const offset = context.length - window.length;
  const read = window.map((_, i) => (correct ? correctedQuantities(context, offset + i) : { quantities: operandsOf(context[offset + i] ?? '', parseQuantities(context[offset + i] ?? '')), corrected: [] }));
  const corrected = read.flatMap((r) => r.corrected);
  const earlier = window.map((t, i) => ({ text: t, quantities: (read[i] as { quantities: Quantity[] }).quantities })).reverse();
  const previous = earlier[0];
  const pairs = findPairs(text, quantities);
  const out: RuleFinding[] = [];
  for (const rule of ARITHMETIC_RULES) {
    for (const { stated, computed, measures, basis, yearly } of rule.derive(text, quantities, pairs, previous, earlier)) {
      if (disjoint(stated, computed)) out.push({ rule, stated, computed, measures, basis, corrected, yearly });
    }
  }
  return out;
}

/**
 * Every arithmetic contradiction in one sentence, with the right value in the correction.
 * `context` is the sentences before it in the same paragraph, in order; the last one may hold the
 * start of a change this sentence states ("... stood near 190 ppm. By then it had climbed to 280
 * ppm, a rise of 110 ppm."). Flags always fall on this sentence's own words.
 */
export function checkArithmetic(text: string, quantities: Quantity[], context: readonly string[] = []): FlagDraft[] {
  const asked = askedBefore(context);
  if (asked !== undefined) return answerTo(text, quantities, asked);
  const flags: FlagDraft[] = [];
  for (const { rule, stated, computed, measures, basis, corrected, yearly } of findingsOf(text, quantities, context, true)) {
    const right = shown(stated, computed);
    // An input the draft itself got wrong earlier is taken at its right value, and the reason says so.
    const owned = corrected.filter((c) => measures.includes(c.q.text)).map((c) => ` (${c.q.text} is itself ${shown(c.q, c.right)} by the figures before it)`);
    flags.push({
      ruleId: rule.id,
      level: levelFor(stated, computed),
      start: stated.start,
      end: stated.end,
      reason: `By ${basis ?? "the sentence's"} own numbers, ${measures} is ${right}, not ${stated.text}${owned.join('')}.`,
      claimed: shownClaim(stated),
      reference: { id: rule.id, measures, text: right, low: computed.low, high: computed.high, unit: stated.unit },
      correction: withYearlyRate(withOperandUnit(correctionFor(stated, computed.value), stated, rule.id, measures), stated, computed.value, yearly),
      sources: [],
    });
  }
  // One figure, one flag: a result two rules read ("12,900 take away 11,700 leaves a cold spell of
  // about 2,200 years" is a written sum and a span of dates) is flagged by the first.
  const once = flags.filter((f, i) => !flags.slice(0, i).some((g) => g.start === f.start && g.end === f.end));
  return once.sort((a, b) => a.start - b.start);
}
