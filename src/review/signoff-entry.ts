/**
 * One sign-off as the ledger keeps it, and the mapping between the TypeScript shape (camelCase) and
 * the YAML keys (snake_case, see schemas/ledger.schema.json). The mapping is a table, so a new key
 * is one line here and one in the schema.
 */

/**
 * An expert's decision on one claim. `needs-change` is not a sign-off: the claim must change, and
 * the gate stays red until it has changed and been signed off again; its reason is the comment the
 * editor sees on the claim.
 */
export const DECISIONS = ['approved', 'corrected', 'waived', 'needs-change'] as const;
export type Decision = (typeof DECISIONS)[number];

/** Decisions that must say why (what was corrected, why the claim stands, what must change). */
export const DECISIONS_NEEDING_REASON: readonly Decision[] = ['corrected', 'waived', 'needs-change'];

/** One recorded sign-off. */
export interface SignoffEntry {
  /** The claim id (see review/claim-id). */
  claim: string;
  file: string;
  /** The claim's sentence when it was signed off. */
  text: string;
  decision: Decision;
  reason?: string;
  reviewer: string;
  /** ISO 8601 date or UTC date-time. */
  date: string;
  note?: string;
  /** The rule packs checked against, e.g. `paleoclimate 1.0.0`. */
  packVersion: string;
  /** The git identity (`Name <email>`) that ran `firnline signoff`, when it ran in a git work tree. */
  gitIdentity?: string;
}

/** The ledger as read: its entries in file order (oldest first). */
export interface Ledger {
  file: string;
  signoffs: SignoffEntry[];
}

/** TypeScript key → YAML key, in the order keys are written. */
const KEYS: readonly (readonly [keyof SignoffEntry, string])[] = [
  ['claim', 'claim'],
  ['file', 'file'],
  ['text', 'text'],
  ['decision', 'decision'],
  ['reason', 'reason'],
  ['reviewer', 'reviewer'],
  ['date', 'date'],
  ['note', 'note'],
  ['packVersion', 'pack_version'],
  ['gitIdentity', 'git_identity'],
];

/** The entry as a plain YAML mapping, keys in ledger order, absent optional keys left out. */
export function entryToYaml(entry: SignoffEntry): Record<string, string> {
  const out: Record<string, string> = {};
  for (const [key, yamlKey] of KEYS) {
    const value = entry[key];
    if (value !== undefined) out[yamlKey] = value;
  }
  return out;
}

/** The entry from a YAML mapping already validated against the ledger schema (unknown keys ignored). */
export function entryFromYaml(data: Record<string, unknown>): SignoffEntry {
  const out: Record<string, unknown> = {};
  for (const [key, yamlKey] of KEYS) {
    const value = data[yamlKey];
    if (value !== undefined && value !== null) out[key] = String(value);
  }
  return out as unknown as SignoffEntry;
}

/** Today's date and time in UTC, to the second, as the ledger writes it: `2025-03-14T09:30:00Z`. */
export function ledgerDate(now: Date = new Date()): string {
  return `${now.toISOString().slice(0, 19)}Z`;
}
