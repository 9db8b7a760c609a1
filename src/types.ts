/**
 * The data every stage of Firnline passes on. Plain data only: no classes, no functions.
 * Each stage folder (source/, prose/, quantities/, claims/, checks/, review/, report/) takes and
 * returns these shapes, and engine.ts joins them.
 */

import type { CslItem } from './cite/csl-item.js';

/** The SARIF levels, in order of severity. */
export const LEVELS = ['error', 'warning', 'note'] as const;
export type Level = (typeof LEVELS)[number];

/** A place in an original file: 1-based line and column (Unicode code points), 0-based offset (code points). */
export interface Point {
  line: number;
  column: number;
  offset: number;
}

/** A stretch of an original file; `end` is just past the last character. */
export interface Span {
  start: Point;
  end: Point;
}

// ---------------------------------------------------------------------------------------------
// source/: drafts as read from disk
// ---------------------------------------------------------------------------------------------

export const BLOCK_KINDS = ['paragraph', 'heading', 'list-item', 'table-cell', 'blockquote', 'text', 'front-matter', 'image-text'] as const;
export type BlockKind = (typeof BLOCK_KINDS)[number];

/**
 * One run of prose from a draft (a paragraph, heading, table cell...), with markup removed.
 * `offsets[i]` is the UTF-16 index in the ORIGINAL file text of `text[i]`; `offsets` has one extra
 * final entry: the original index just past the block's last character. Sentences never cross blocks.
 */
export interface ProseBlock {
  kind: BlockKind;
  text: string;
  offsets: number[];
  /** Text of the nearest heading above the block (empty when there is none). */
  heading: string;
  /** The draft marks this block as a deliberate quotation of a claim (`<!-- firnline: reported -->`). */
  marked?: boolean;
}

/** A draft after reading: the original text, and its prose blocks in document order. */
export interface Draft {
  /** The path as reported: relative POSIX path from the working folder, or `-` for standard input. */
  path: string;
  /** The original text exactly as read (after UTF-8 decoding; a leading BOM is kept). */
  text: string;
  format: 'markdown' | 'text' | 'html' | 'docx';
  blocks: ProseBlock[];
}

/**
 * Where something stands in a Word draft, which has no lines: the paragraph (1-based, counting
 * the paragraphs that hold text, as a word processor's statistics do) and the heading above it.
 */
export interface ParagraphPlace {
  number: number;
  /** Text of the nearest heading above (the paragraph's own text for a heading); empty when none. */
  heading: string;
}

// ---------------------------------------------------------------------------------------------
// prose/: sentences
// ---------------------------------------------------------------------------------------------

/** One sentence inside a block. `start`/`end` are UTF-16 indices into `block.text`. */
export interface Sentence {
  text: string;
  blockIndex: number;
  start: number;
  end: number;
  /**
   * How many characters of the text are title, by-line or label lines that open it, each on a line
   * of its own (prose/split-sentences.ts labelCuts): context for the figures under them, not part
   * of what the sentence asserts.
   */
  label?: number;
}

// ---------------------------------------------------------------------------------------------
// quantities/: numbers with units, read as intervals
// ---------------------------------------------------------------------------------------------

/**
 * What a quantity measures. Canonical units: duration `yr`; age `yr BP` (years before AD 1950);
 * concentration `ppm`; temperature-change `K`; temperature `degC`; length `m`;
 * concentration-rate `ppm/yr`; temperature-rate `K/yr`; length-rate `m/yr` (a sea-level
 * rise in mm a year); duration-per-length `yr/m` (the years one metre of ice holds); count `count`; ratio `ratio` (2 = twice);
 * percent `%` (a bare percentage not converted to anything else).
 */
export const DIMENSIONS = [
  'duration',
  'age',
  'concentration',
  'temperature-change',
  'temperature',
  'length',
  'concentration-rate',
  'temperature-rate',
  'length-rate',
  'duration-per-length',
  'count',
  'ratio',
  'percent',
  'number',
] as const;
export type Dimension = (typeof DIMENSIONS)[number];

/**
 * A number as the draft states it, read as an interval in the dimension's canonical unit.
 * `start`/`end` are UTF-16 indices into the text given to the parser (one sentence).
 */
export interface Quantity {
  /** The quantity as written, e.g. "about 800,000 years". */
  text: string;
  start: number;
  end: number;
  /** The stated central value in the canonical unit. */
  value: number;
  /** The interval in the canonical unit after precision and hedges. */
  low: number;
  high: number;
  dimension: Dimension;
  /** The canonical unit of the dimension, e.g. `yr`, `ppm`, `K`. */
  unit: string;
  /** The unit as written, normalised (e.g. `kyr`, `degF`, `ft`, `BCE`, `%`); empty when none. */
  statedUnit: string;
  /** The hedge or bound word as written ("about", "more than"...), if any. */
  hedge?: string;
}

// ---------------------------------------------------------------------------------------------
// rulepack/: sources, reference values, direction facts, reasoning checks
// ---------------------------------------------------------------------------------------------

/** One bibliographic entry a rule cites. */
export interface Source {
  id: string;
  /** Full reference: authors (year). Title. Journal volume, pages, link. */
  cite: string;
  /** Short reference for one line: `Jouzel et al. 2007, Science 317, doi:10.1126/science.1141038`. */
  short?: string;
  doi?: string;
  url?: string;
  /** How the value was obtained from it: `read in the source: ...`, `computed: ...`, `from memory: ...`. */
  how: string;
  /** What it is (sources with structured citation fields). */
  kind?: SourceKind;
  /** Its CSL-JSON item (sources with structured citation fields). */
  csl?: CslItem;
  /** Citation fields recalled and not checked against the source (`DOI`, `page`...). */
  fromMemory?: string[];
}

/** A source of record: a peer-reviewed paper, an assessment chapter, an official data set or an agency page. */
export type SourceKind = 'paper' | 'assessment' | 'dataset' | 'agency';

// ---------------------------------------------------------------------------------------------
// checks/: flags
// ---------------------------------------------------------------------------------------------

/** A value with its interval and unit, as shown to an editor. */
export interface ShownValue {
  /** Words as the draft wrote them, or as the reference states them. */
  text: string;
  low: number;
  high: number;
  unit: string;
}

/**
 * A problem found on a claim. Data only: reporters turn it into words.
 * `span` is where the editor should look (usually the quantity or the cue words).
 */
export interface Flag {
  /** Dotted rule id, e.g. `value.vostok-record-span`, `logic.lag-rules-out-cause`. */
  ruleId: string;
  level: Level;
  file: string;
  span: Span;
  /** In a Word draft, the paragraph (reports show it instead of line and column). */
  paragraph?: ParagraphPlace;
  /** The flagged text as it stands in the draft. */
  excerpt: string;
  /** The whole sentence the flag is in, as prose text (markup removed). */
  sentence: string;
  /** One or two plain sentences: what is wrong. */
  reason: string;
  claimed?: ShownValue;
  reference?: ShownValue & { id: string; measures: string; asOf?: string };
  /** Replacement for the text at `span`, when an exact one exists. */
  correction?: string;
  /** Rewording advice when no exact replacement exists (reasoning checks). */
  suggestion?: string;
  sources: Source[];
  /** The id of the claim the flag belongs to (see review/claim-id). */
  claimId?: string;
  /** Set by the sign-off gate when an expert has signed off the claim: shown, but not failing. */
  signoff?: FlagSignoff;
}

/** Who signed off a flagged claim, when, and how. */
export interface FlagSignoff {
  reviewer: string;
  /** ISO 8601 date. */
  date: string;
  decision: string;
}

/** A flag before positions are resolved: offsets are UTF-16 indices into the sentence text. */
export interface FlagDraft extends Omit<Flag, 'file' | 'span' | 'paragraph' | 'excerpt' | 'sentence' | 'claimId' | 'signoff'> {
  start: number;
  end: number;
}

// ---------------------------------------------------------------------------------------------
// claims/: what is checked
// ---------------------------------------------------------------------------------------------

/** per claim: inside the reference range, outside it, or nothing in the packs covers it. */
export const VERDICTS = ['agrees', 'conflicts', 'no reference'] as const;
export type Verdict = (typeof VERDICTS)[number];

/** A quantity bound to the reference value it speaks about. */
export interface Binding {
  quantityIndex: number;
  referenceId: string;
}

/** One checkable statement: a sentence on the subject with its quantities and what they bind to. */
export interface Claim {
  id: string;
  /** The path as reported (relative to the working folder). */
  file: string;
  /**
   * The path relative to the project root (the folder of firnline.yaml, else the git work tree,
   * else the working folder): what claim ids and the ledger use, so that they do not depend on the
   * folder a command runs in. Absent when it equals `file`.
   */
  projectPath?: string;
  span: Span;
  /** In a Word draft, the paragraph (reports show it instead of line and column). */
  paragraph?: ParagraphPlace;
  text: string;
  heading: string;
  quantities: Quantity[];
  bindings: Binding[];
  verdict: Verdict;
  flags: Flag[];
  /** The claim stands in a passage the draft marks as reported (`<!-- firnline: reported -->`). */
  marked?: true;
}

/** What a report says about one rule id: for SARIF `tool.driver.rules`, `explain` and the checklist. */
export interface RuleInfo {
  id: string;
  /** One line: what the rule checks. */
  summary: string;
  /** Longer text: the reference range or the reasoning error, with notes. */
  description: string;
  defaultLevel: Level;
  sources: Source[];
}

/** What one run found. */
export interface CheckResult {
  files: string[];
  /** Every rule id that appears in `flags`, described. */
  rules: RuleInfo[];
  claims: Claim[];
  flags: Flag[];
  /**
   * Files passed over with the reason (no subject named, a checklist...), for the report. `unchecked`
   * marks a draft that was named or walked but could not be read (not UTF-8, a special file, too
   * large, nested too deep): it fails the run; `line` and `column` say where, when known.
   */
  skipped: { file: string; reason: string; unchecked?: true; line?: number; column?: number }[];
  /** The rule packs the run checked against, with the date their values were last reviewed. */
  packs?: PackInfo[];
}

/** A rule pack as a report names it: id, version and as-of date. */
export interface PackInfo {
  id: string;
  version: string;
  asOf: string;
}
