import type { Claim, Flag, PackInfo, Quantity, RuleInfo, ShownValue, Source } from '../types.js';
import type { ReportSummary } from './summarize.js';

/**
 * The shapes of the `json` report, as described by schemas/report.schema.json. They follow the
 * data contracts in src/types.ts with two differences JSON forces or makes clearer:
 * an open interval end (±Infinity, which JSON cannot hold) is written as `null`, and a claim
 * does not repeat its flags (each flag names its claim by `claimId`), and a flag names its sources
 * by their places in the report's `sources`, where each is written once.
 */

/** An interval end: a number, or `null` for an open end. */
export type JsonBound = number | null;

/** A shown value with JSON-safe bounds. */
export type JsonShownValue = Omit<ShownValue, 'low' | 'high'> & { low: JsonBound; high: JsonBound };

/** A flag as written in the report. */
export type JsonFlag = Omit<Flag, 'claimed' | 'reference' | 'sources'> & {
  /** The flag's sources, in the flag's order, as places (from 0) in `JsonReport.sources`. */
  sources: number[];
  claimed?: JsonShownValue;
  reference?: JsonShownValue & { id: string; measures: string; asOf?: string };
};

/** A quantity as written in the report. */
export type JsonQuantity = Omit<Quantity, 'low' | 'high'> & { low: JsonBound; high: JsonBound };

/** A claim as written in the report: its flags are in the top-level list, joined by `claimId`. */
export type JsonClaim = Omit<Claim, 'flags' | 'quantities'> & { quantities: JsonQuantity[] };

/** The whole `json` report. */
export interface JsonReport {
  tool: { name: 'firnline'; version: string };
  /** The files read and checked, as given. */
  files: string[];
  summary: ReportSummary;
  /** Every claim found, in place order. */
  claims: JsonClaim[];
  /** Every flag, in place order. */
  flags: JsonFlag[];
  /** Every rule that has a flag, by id. */
  rules: RuleInfo[];
  /** Every distinct source entry a flag cites, once, in code-unit order of id (then of content). */
  sources: Source[];
  skipped: { file: string; reason: string; unchecked?: true; line?: number; column?: number }[];
  /** The rule packs checked against, with the date their values were last reviewed. */
  packs: PackInfo[];
}

/** The `$id` of the schema that describes `JsonReport` (a reserved domain: it names, it does not locate). */
export const REPORT_SCHEMA_ID = 'https://firnline.invalid/schemas/report.schema.json';
