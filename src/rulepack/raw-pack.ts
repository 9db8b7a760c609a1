/**
 * The rule pack as written in YAML, after schema validation (schemas/rulepack.schema.json).
 * These types mirror the schema; test/rulepack/schema-types.test.ts checks that they stay in step.
 */
import type { CitationFields } from '../cite/csl-item.js';
import type { Dimension, Level } from '../types.js';

/** A source entry as written: structured CSL-compatible fields, or (team packs) a `cite` text. */
export interface RawSource extends Partial<Omit<CitationFields, 'doi' | 'url'>> {
  id: string;
  cite?: string;
  doi?: string;
  url?: string;
  from_memory?: string[];
  how: string;
}

/** A reference value as written: bounds in `unit`, sources as ids. */
export interface RawReferenceValue {
  id: string;
  measures: string;
  low: number;
  high: number;
  central?: number;
  unit: string;
  also_as?: Dimension[];
  binds_when: { all: string[][]; none?: string[]; role?: 'level' | 'change' | 'range' | 'any'; implied?: boolean; default_setting?: string[] };
  correction: string;
  levels?: Partial<Record<Level, number>>;
  as_of?: string;
  review_by?: string;
  superseded_by?: string;
  regional_version_of?: string;
  ends?: { low: string | string[]; high: string | string[] };
  sources: string[];
  notes?: string;
}

/** A direction fact as written. */
export interface RawDirectionFact {
  id: string;
  statement: string;
  wrong?: string[];
  relation?: OneOrMany<{ x: string; y: string; sign: 'same' | 'opposite' }>;
  comparison?: OneOrMany<{ a: OneOrMany<string>; b: OneOrMany<string>; attribute: 'age' | 'size' | 'rate'; sign: 'higher' | 'lower' }>;
  order?: OneOrMany<{ first: string; then: string; regions?: OneOrMany<string>; during?: OneOrMany<string> }>;
  change?: OneOrMany<{ of: OneOrMany<string>; attribute?: 'temperature' | 'amount'; during?: OneOrMany<string>; sign: 'up' | 'down' }>;
  right?: string[];
  level?: Level;
  sources: string[];
}

/** One item or a list of them, as the schema allows. */
export type OneOrMany<T> = T | T[];

/** A pattern rule as written. */
export interface RawPattern {
  id: string;
  level?: Level;
  reason: string;
  suggestion?: string;
  match?: string;
  regex?: string;
  sources?: string[];
}

/** Reasoning-check settings as written. */
export interface RawReasoningCheck {
  id: string;
  level?: Level;
  enabled?: boolean;
  summary: string;
  reason: string;
  suggestion: string;
  cue_words?: Record<string, string[]>;
  sources: string[];
}

/** A whole pack as written. */
export interface RawPack {
  pack: string;
  version: string;
  as_of: string;
  description?: string;
  sources?: RawSource[];
  terms?: { id: string; words: string[]; units?: string[]; unless?: string[] }[];
  reference_values?: RawReferenceValue[];
  direction_facts?: RawDirectionFact[];
  patterns?: RawPattern[];
  reasoning_checks?: RawReasoningCheck[];
  lexicon?: Record<string, string[] | Record<string, string[]>>;
}
