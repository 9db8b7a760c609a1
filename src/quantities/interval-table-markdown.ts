/**
 * The interval table as Markdown, for docs/quantities.md. Generated from INTERVAL_RULES, so the
 * documentation cannot drift from what the parser does (a test compares the two).
 */
import { INTERVAL_RULES, type Bound, type Term } from './interval-rules.js';

const ORDER: Term[] = ['v', 'L', 'H', 's', 'h', 'absV', 'n', 'one'];
const NAMES: Record<Term, string> = { v: 'v', L: 'L', H: 'H', s: 's', h: 'h', absV: '|v|', n: 'n', one: '1' };

function term(t: Term, k: number): string {
  const size = Math.abs(k);
  if (t === 'one') return String(size);
  if (t === 'absV' && size !== 1) return `${Math.round(size * 100)}% of |v|`;
  return size === 1 ? NAMES[t] : `${size} × ${NAMES[t]}`;
}

/** A bound in words: { v: 1, h: -1 } → "v − h"; { L: 1, absV: -0.1 } → "L − 10% of |v|". */
export function describeBound(bound: Bound): string {
  const parts = ORDER.filter((t) => (bound[t] ?? 0) !== 0).map((t) => ({ k: bound[t] as number, text: term(t, bound[t] as number) }));
  return parts.map((p, i) => (i === 0 ? (p.k < 0 ? `−${p.text}` : p.text) : `${p.k < 0 ? '−' : '+'} ${p.text}`)).join(' ') || '0';
}

const cell = (s: string): string => s.replace(/\|/g, '\\|');

/** The Markdown table: rule, kind, words, low, high, why. */
export function renderIntervalTable(): string {
  const rows = INTERVAL_RULES.map((r) =>
    `| ${r.id} | ${r.kind} | ${r.words.map((w) => `"${cell(w)}"`).join(', ')} | ${cell(describeBound(r.low))} | ${cell(describeBound(r.high))} | ${cell(r.why)} |`,
  );
  return ['| rule | kind | words | low | high | why |', '|---|---|---|---|---|---|', ...rows].join('\n');
}
