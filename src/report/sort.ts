import type { Span } from '../types.js';

/** Anything the reports list by place: flags (with a rule id) and claims (without one). */
export interface Placed {
  file: string;
  span: Span;
  ruleId?: string;
}

// Plain code-unit order, not localeCompare: the same report must come out on every machine.
function compareStrings(a: string, b: string): number {
  return a < b ? -1 : a > b ? 1 : 0;
}

/**
 * The one order of every report: file, then start line, start column, rule id, and last the end
 * of the span (so nested spans list the shorter first). Items equal on all of these keep their order.
 */
export function compareByPlace(a: Placed, b: Placed): number {
  return (
    compareStrings(a.file, b.file) ||
    a.span.start.line - b.span.start.line ||
    a.span.start.column - b.span.start.column ||
    compareStrings(a.ruleId ?? '', b.ruleId ?? '') ||
    a.span.end.line - b.span.end.line ||
    a.span.end.column - b.span.end.column
  );
}

/** A sorted copy (the input is left as it was). */
export function sortByPlace<T extends Placed>(items: readonly T[]): T[] {
  return [...items].sort(compareByPlace);
}

/**
 * Rules in id order, one per id (the first description wins), so every report lists the same rules
 * the same way and SARIF rule indexes are stable.
 */
export function sortRules<T extends { id: string }>(rules: readonly T[]): T[] {
  const seen = new Map<string, T>();
  for (const rule of rules) if (!seen.has(rule.id)) seen.set(rule.id, rule);
  return [...seen.values()].sort((a, b) => compareStrings(a.id, b.id));
}

/** Rule ids written in lower-case ASCII letters, digits, dots and hyphens, as every built-in rule's is. */
const PLAIN_ID = /^[a-z0-9.-]*$/u;

/**
 * `items` sorted in place by `id` as `a.id.localeCompare(b.id)` sorts them, without starting ICU's
 * collator (its first use cost 10 to 40 ms of every `check` on our machine) when every id is plain:
 * the root and English collations order such ids as their code units (letters after digits after
 * the dot after the hyphen, a prefix first; test/report/sort-ids.test.ts compares both), and code
 * units are the order the reports use anyway (compareStrings above). Any other id keeps
 * localeCompare for the whole list.
 */
export function sortById<T extends { id: string }>(items: T[]): T[] {
  if (items.every((item) => PLAIN_ID.test(item.id))) return items.sort((a, b) => compareStrings(a.id, b.id));
  return items.sort((a, b) => a.id.localeCompare(b.id));
}
