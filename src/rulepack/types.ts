/**
 * The shapes of a rule pack after loading: sources resolved from ids to entries, values converted to
 * the canonical unit of their dimension, defaults filled in. Plain data only. The YAML format these
 * come from is described by schemas/rulepack.schema.json and docs/rule-packs.md.
 */
import type { Dimension, Level, Source } from '../types.js';

/** A subject term: its words are matched case-insensitively on word boundaries. */
export interface Term {
  /** e.g. `co2` */
  id: string;
  /** e.g. `['CO2', 'CO₂', 'carbon dioxide']` */
  words: string[];
  /** Units whose quantities name this term themselves (a figure in ppm is CO2), e.g. `['ppm']`. */
  units?: string[];
  /** Term ids whose presence in the sentence stops `units` from naming this term. */
  unless?: string[];
}

/**
 * The part a number plays in its sentence: a `level` (a value at a time, "stood at 190 ppm", either
 * end of "from 190 to 280 ppm") or a `change` (a difference, "rose by 80 ppm", "a rise of 80 ppm").
 */
export type QuantityRole = 'level' | 'change';

/**
 * The part a number must play for a value to bind it: a role of one number, or `range`, a number
 * that states both ends of a range ("between 180 and 300 ppm", "180–300 ppm").
 */
export type ValueRole = QuantityRole | 'range';

/** Which sentences a reference value speaks about, in term ids. */
export interface TermBinding {
  /** Every group must be satisfied; a group is satisfied when any one of its term ids appears. */
  all: string[][];
  /** Term ids that veto the binding when any of them appears. */
  none: string[];
  /** The only role of number the value binds (absent: any role). */
  role?: ValueRole;
  /**
   * False when the value must be named in words: a figure beside its subject alone, whose unit
   * would imply what it measures, never binds it (claims/bind-implied.ts). Absent: it may.
   */
  implied?: false;
  /**
   * Terms a setting group of the value (a period, a region: the lexicon's `settings`) is filled with
   * when neither the number's sentence nor its passage names a setting of that kind (claims/bind-setting.ts).
   */
  defaultSetting?: string[];
}

/**
 * Relative distance outside the reference range at which each level starts. Distance is
 * `gap / width` where gap is how far the claim's interval lies from the reference interval and
 * width is `max(high - low, |central or midpoint| * 0.01)`. `{ warning: 0, error: 0.25 }`: any
 * disjoint claim is a warning; one a quarter of the range's width (or more) away is an error.
 * A level left out never applies; the highest level whose threshold is reached wins.
 */
export type LevelSteps = Partial<Record<Level, number>>;

/** A sourced, accepted range for one measurable thing. */
export interface ReferenceValue {
  id: string;
  /** What is measured, in words, e.g. "time span of the EPICA Dome C ice-core record". */
  measures: string;
  /** The dimension the range is stated in. */
  dimension: Dimension;
  /** What a claim's quantity may be to bind (e.g. a record span may be stated as duration or age). */
  dimensions: Dimension[];
  /** Bounds in the canonical unit of `dimension`. */
  low: number;
  high: number;
  central?: number;
  /** Canonical unit of `dimension` (see DIMENSIONS in src/types.ts). */
  unit: string;
  binding: TermBinding;
  /** How a correction states the value, e.g. "about 800,000 years". */
  wording: string;
  /** ISO date, for values that change with time (e.g. today's CO2). */
  asOf?: string;
  /** ISO date by which a time-dependent value must be checked again (`firnline refs --due`). */
  reviewBy?: string;
  /** The id of the value that replaced this one (a figure right when published, since superseded). */
  supersededBy?: string;
  /** The id of the global value this one is a regional size of (Antarctic warming beside the global mean). */
  regionalVersionOf?: string;
  /**
   * The value is the span of a record, and these values are its ends (value ids: the glacial
   * minimum and the lowest level for the low end, the interglacial maximum and the highest for the
   * high end). A claim stating a range for it is checked end by end: each end against the hull of
   * its values (src/checks/reference-ends.ts).
   */
  ends?: { low: string[]; high: string[] };
  levels: LevelSteps;
  sources: Source[];
  notes?: string;
}

/**
 * What a direction fact says, as data over the lexicon's keys (see src/propositions):
 * - relation: y moves with x (`sign` 1) or against it (-1), e.g. water:temperature vs co2:uptake;
 * - comparison: `a` stands higher (1) or lower (-1) than `b` in `attribute` (age, size of swings);
 * - order: `first` changed before `then`, where a region of `regions` is named (any, when empty);
 * - change: what `of` (an entity or region) did in `attribute` during a period of `during`.
 */
export type FactForm =
  | { kind: 'relation'; x: FactVariable; y: FactVariable; sign: 1 | -1 }
  | { kind: 'comparison'; a: string[]; b: string[]; attribute: 'age' | 'size' | 'rate'; sign: 1 | -1 }
  | { kind: 'order'; first: string; then: string; regions: string[]; during: string[] }
  | { kind: 'change'; of: string[]; attribute: 'temperature' | 'amount'; during: string[]; sign: 1 | -1 };

/** A lexicon key with the attribute a relation reads (`water:temperature`, `co2:uptake`). */
export interface FactVariable {
  key: string;
  attribute: string;
}

/** The lexicon of the loaded packs: class → key → phrases (a flat class has the key `all`). */
export type Lexicon = Record<string, Record<string, string[]>>;

/** A sourced statement of which way an effect goes. */
export interface DirectionFact {
  id: string;
  statement: string;
  /** What the fact says, read against the propositions of each sentence. */
  says: FactForm[];
  /**
   * Phrasings of the wrong direction to catch, as JavaScript regular expressions (source text,
   * compiled by the loader with the `iu` flags; each is checked for validity and length on load).
   * For team packs; the built-in pack states its facts as `says` data only.
   */
  wrong: string[];
  /** Phrasings of the right direction (same syntax), used to avoid flagging a correct sentence. */
  right?: string[];
  level: Level;
  sources: Source[];
}

/** Settings of one reasoning check (a detector written in code, tuned by the pack). */
export interface ReasoningCheck {
  /** Rule id, e.g. `logic.lag-rules-out-cause`. */
  id: string;
  level: Level;
  summary: string;
  reason: string;
  suggestion: string;
  sources: Source[];
  /** Cue word lists the detector reads, e.g. `lag: [lag, lagged, after, followed]`. */
  words: Record<string, string[]>;
  enabled: boolean;
}

/** A team's own rule: a phrase to catch, in compromise match syntax or as a regular expression. */
export interface PatternRule {
  /** Rule id, e.g. `house.no-ppmv`. */
  id: string;
  level: Level;
  reason: string;
  suggestion?: string;
  /** compromise match syntax, e.g. `carbon dioxide (lagged|trailed)`. */
  match?: string;
  /** JavaScript regular expression source, compiled with the `iu` flags. */
  regex?: string;
  sources: Source[];
}

/** One loaded pack file. */
export interface RulePack {
  id: string;
  version: string;
  /** ISO date the pack's values were last reviewed. */
  asOf: string;
  /** The file it was loaded from (absolute path). */
  file: string;
  sources: Source[];
  terms: Term[];
  references: ReferenceValue[];
  directions: DirectionFact[];
  reasoning: ReasoningCheck[];
  patterns: PatternRule[];
  lexicon: Lexicon;
}

/** All packs of a run merged (built-in first, then extra packs in order). Ids are unique across packs. */
export interface LoadedPacks {
  packs: RulePack[];
  references: ReferenceValue[];
  terms: Term[];
  directions: DirectionFact[];
  reasoning: ReasoningCheck[];
  patterns: PatternRule[];
  sources: Source[];
  /** The lexicons of all packs joined, class by class and key by key. */
  lexicon: Lexicon;
  /** Every term word, lower-case, for the file and sentence prefilter. */
  topicWords: string[];
  reference(id: string): ReferenceValue | undefined;
  term(id: string): Term | undefined;
}

/** Project settings from `firnline.yaml`; paths are resolved relative to the settings file. */
export interface Settings {
  /** Absolute path of the settings file. */
  file: string;
  /** Glob patterns (gitignore syntax) of drafts to check. */
  include: string[];
  /** Glob patterns (gitignore syntax) to leave out. */
  exclude: string[];
  /** Extra rule packs (absolute paths). */
  packs: string[];
  /** Level overrides per rule id; `off` turns a rule off. */
  levels: Record<string, Level | 'off'>;
  failOn?: Level | 'never' | 'strict';
  /** Sign-off ledger (absolute path). */
  ledger?: string;
  /** Who may sign off; empty: anyone. */
  reviewers?: { name: string; git?: string }[];
  /** Where each `levels` key stands in the file (1-based), for errors found once the packs are loaded. */
  levelPlaces?: Record<string, { line: number; column: number }>;
}
