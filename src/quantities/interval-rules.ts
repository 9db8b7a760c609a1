/**
 * THE interval table: how a number as written becomes an interval [low, high]. One row per rule;
 * the parser reads this table (never a copy of it), and docs/quantities.md shows it, generated from
 * here (a test fails when the two differ).
 *
 * A bound is a sum of terms: v = the stated value, |v| its size, h = half the last significant place
 * (or the stated ± uncertainty), L and H = the interval before the hedge, s = the scale of a vague
 * word (hundreds → 100), n = the larger of 10% of |v| and half the width H − L (so a small round number
 * such as "one", ±0.5, keeps its precision under "just over"), 1 = a constant. "stated" rows make the first interval from the number as
 * written; it is then converted to the canonical unit, where "hedge" rows widen or cut it (so
 * "around 1750" is 200 ± 5.5 years before 1950, and "about −30 °C" is −31.25 to −28.75 °C).
 */

/** The inputs a bound may use. */
export type Term = 'v' | 'absV' | 'h' | 'L' | 'H' | 's' | 'n' | 'one';
/** A bound: the sum of coefficient × term. */
export type Bound = Partial<Record<Term, number>>;

/** One row of the interval table. */
export interface IntervalRule {
  id: string;
  kind: 'stated' | 'hedge';
  /** Words as a draft writes them; for hedges, exactly the words the parser accepts. */
  words: string[];
  low: Bound;
  high: Bound;
  /** Why the rule is what it is, for an editor. */
  why: string;
}

/** The interval table. Order matters only for display. */
export const INTERVAL_RULES: readonly IntervalRule[] = [
  { id: 'precision', kind: 'stated', words: ['420,000', '0.5', '8.1 × 10^5', 'eight hundred thousand'], low: { v: 1, h: -1 }, high: { v: 1, h: 1 },
    why: 'Half a unit in the last significant place. Trailing zeros of a whole number are ambiguous, so a round number is read to its second digit: 420,000 and 800,000 are ±5,000; 5 is ±0.5; 0.5 is ±0.05; 8e5 is ±50,000.' },
  { id: 'calendar-year', kind: 'stated', words: ['in 1750', 'by 2019', 'AD 1850', '1850 CE'], low: { v: 1, one: -0.5 }, high: { v: 1, one: 0.5 },
    why: 'A calendar year names one year, whatever its trailing zeros.' },
  { id: 'plus-minus', kind: 'stated', words: ['±', '+/-', 'give or take', 'plus or minus'], low: { v: 1, h: -1 }, high: { v: 1, h: 1 },
    why: 'The writer states the uncertainty (h is the number after ±, or after "give or take").' },
  { id: 'range', kind: 'stated', words: ['7,000 to 8,000', '7-8 thousand', '180–190', 'between 180 and 190', 'ranging from 3 to 6', 'six or seven thousand'], low: { L: 1 }, high: { H: 1 },
    why: 'A range states its own spread: its two ends, as written, with no further precision added.' },
  { id: 'multiplier-word', kind: 'stated', words: ['twice', 'doubled', 'three-fold', 'three times', 'half', 'a third'], low: { v: 1, absV: -0.05 }, high: { v: 1, absV: 0.05 },
    why: 'A multiplier in words is exact as a word but loose as a measurement; ±5% keeps 1.95× as "twice" and 1.8× not.' },
  { id: 'plural-magnitude', kind: 'stated', words: ['tens of', 'hundreds of', 'thousands of', 'millions of', 'dozens of', 'tens of thousands of', 'hundreds of thousands of'], low: { s: 2 }, high: { s: 10 },
    why: 'A plural of a magnitude means at least two of it and fewer than ten: thousands of years = 2,000–10,000 years; the value is the middle.' },
  { id: 'a-few', kind: 'stated', words: ['a few'], low: { s: 2 }, high: { s: 5 },
    why: '"A few centuries" = 2 to 5 centuries; the value is the middle.' },
  { id: 'a-couple', kind: 'stated', words: ['a couple', 'a couple of'], low: { s: 2 }, high: { s: 3 },
    why: '"A couple of degrees", "a couple thousand years" = 2 to 3 of them, as people say it; the value is the middle.' },
  { id: 'several', kind: 'stated', words: ['several'], low: { s: 3 }, high: { s: 7 },
    why: '"Several millennia" = 3 to 7 millennia; the value is the middle.' },
  { id: 'about', kind: 'hedge', words: ['about', 'around', 'roughly', 'some', 'approximately', 'approx.', '~', '∼', '≈', 'c.', 'ca.', 'circa', 'close to', 'an estimated', 'or so', 'like', 'something like', 'more like', '-ish'], low: { L: 1, absV: -0.025 }, high: { H: 1, absV: 0.025 },
    why: 'An approximation: the stated precision, widened by a further 2.5% of the value each way: "about 310 ppm" is 297–323 ppm, too high for the pre-industrial 278 ppm; "about 800,000 years" is 775,000–825,000 years. A 10% margin let errors of 10–15% pass. "-ish" is written onto the number, as people do in posts ("420ish ppm", "280-ish").' },
  { id: 'nearly', kind: 'hedge', words: ['nearly', 'almost', 'just under', 'just below', 'not quite', 'slightly less than', 'slightly under', 'a little under', 'a little less than'], low: { L: 1, absV: -0.025 }, high: { v: 1 },
    why: 'Close to the value from below: within its stated precision under it and a further 2.5% of the value, the margin "about" adds ("nearly two ppm per century" allows 1.5; "nearly 3,800 metres" is 3,655–3,800 m, too deep for the 3,623 m Vostok reached). A 10% margin let overstatements of 5–10% pass.' },
  { id: 'just-over', kind: 'hedge', words: ['just over', 'just above', 'slightly more than', 'slightly over', 'a little over', 'a little more than'], low: { v: 1 }, high: { H: 1, absV: 0.025 },
    why: 'Close to the value from above: within its stated precision over it and a further 2.5% of the value, the margin "about" adds ("a little over one ppm per century" allows 1.5: one is ±0.5; "just over 3,000 metres" is 3,000–3,125 m). A 10% margin let understatements of 5–10% pass.' },
  { id: 'more-than', kind: 'hedge', words: ['more than', 'over', 'above', 'exceeding', 'in excess of', 'greater than', 'upwards of', 'well over'], low: { v: 1 }, high: { v: 1, absV: 0.5 },
    why: 'A lower bound. Writers use it near the value, so it is capped at 1.5 v; a larger true value is a different claim.' },
  { id: 'at-least', kind: 'hedge', words: ['at least', 'no less than', 'no fewer than', 'or more', 'or longer'], low: { v: 1 }, high: { v: 1, absV: 1 },
    why: 'A floor with no claim of closeness: up to twice the value.' },
  { id: 'up-to', kind: 'hedge', words: ['up to', 'as much as', 'as many as', 'as high as', 'as large as', 'at most', 'no more than', 'or less'], low: { v: 1, absV: -0.5 }, high: { v: 1 },
    why: 'A ceiling that the writer presents as reached or nearly so: half the value to the value.' },
  { id: 'less-than', kind: 'hedge', words: ['less than', 'fewer than', 'under', 'below'], low: { v: 1, absV: -1 }, high: { v: 1 },
    why: 'An upper bound with no floor: from zero (for a positive value) to the value.' },
];

/** The inputs to one rule. */
export interface BoundInputs {
  v: number;
  h: number;
  L: number;
  H: number;
  s: number;
}

/** The value of one bound for the given inputs. */
export function evaluateBound(bound: Bound, inputs: BoundInputs): number {
  // Summed in the bound's own member order, as before, so every result is the same to the last bit;
  // the members are listed once per bound and no record of terms is built (every number of every
  // sentence passes here several times).
  let members = boundMembers.get(bound);
  if (members === undefined) {
    members = Object.entries(bound) as [Term, number][];
    boundMembers.set(bound, members);
  }
  let sum = 0;
  for (const [term, k] of members) sum += k * termValue(term, inputs);
  return sum;
}

const boundMembers = new WeakMap<Bound, [Term, number][]>();

function termValue(term: Term, inputs: BoundInputs): number {
  switch (term) {
    case 'absV':
      return Math.abs(inputs.v);
    case 'n':
      return Math.max(0.1 * Math.abs(inputs.v), (inputs.H - inputs.L) / 2);
    case 'one':
      return 1;
    default:
      return inputs[term];
  }
}

/** The interval a rule gives, low first. */
export function applyRule(rule: IntervalRule, inputs: BoundInputs): [number, number] {
  const a = evaluateBound(rule.low, inputs);
  const b = evaluateBound(rule.high, inputs);
  return a <= b ? [a, b] : [b, a];
}

const BY_ID = new Map(INTERVAL_RULES.map((r) => [r.id, r]));
const HEDGE_BY_WORD = new Map(
  INTERVAL_RULES.filter((r) => r.kind === 'hedge').flatMap((r) => r.words.map((w) => [w.toLowerCase(), r] as const)),
);

/** The row with this id; throws for an unknown id (a programming error, not a user one). */
export function intervalRule(id: string): IntervalRule {
  const rule = BY_ID.get(id);
  if (rule === undefined) throw new Error(`no interval rule "${id}"`);
  return rule;
}

/** The hedge row for a hedge word as written (any case, any spacing), or undefined. */
export function hedgeRule(word: string): IntervalRule | undefined {
  return HEDGE_BY_WORD.get(word.toLowerCase().replace(/\s+/g, ' '));
}
