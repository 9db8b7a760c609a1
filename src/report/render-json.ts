import type { CheckResult, Claim, Flag, ShownValue, Source } from '../types.js';
import type { JsonBound, JsonClaim, JsonFlag, JsonReport, JsonShownValue } from './json-report.js';
import type { ReportOptions } from './report-options.js';
import { sortByPlace, sortRules } from './sort.js';
import { summarize } from './summarize.js';

// JSON has no Infinity (JSON.stringify would write null silently); say so on purpose instead.
function bound(value: number): JsonBound {
  return Number.isFinite(value) ? value : null;
}

function shown<T extends ShownValue>(value: T): Omit<T, 'low' | 'high'> & JsonShownValue {
  return { ...value, low: bound(value.low), high: bound(value.high) };
}

// Written member by member so every report lists them in the same order, whatever the producer did.
function jsonFlag(flag: Flag, cited: CitedSources): JsonFlag {
  const { claimed, reference, correction, suggestion, claimId, signoff } = flag;
  return {
    ruleId: flag.ruleId,
    level: flag.level,
    file: flag.file,
    span: flag.span,
    ...(flag.paragraph === undefined ? {} : { paragraph: flag.paragraph }),
    excerpt: flag.excerpt,
    sentence: flag.sentence,
    reason: flag.reason,
    ...(claimed === undefined ? {} : { claimed: shown(claimed) }),
    ...(reference === undefined ? {} : { reference: shown(reference) }),
    ...(correction === undefined ? {} : { correction }),
    ...(suggestion === undefined ? {} : { suggestion }),
    sources: flag.sources.map((source) => cited.indexOf(source)),
    ...(claimId === undefined ? {} : { claimId }),
    ...(signoff === undefined ? {} : { signoff }),
  };
}

function jsonClaim(claim: Claim): JsonClaim {
  return {
    id: claim.id,
    file: claim.file,
    span: claim.span,
    ...(claim.paragraph === undefined ? {} : { paragraph: claim.paragraph }),
    text: claim.text,
    heading: claim.heading,
    quantities: claim.quantities.map((q) => ({ ...q, low: bound(q.low), high: bound(q.high) })),
    bindings: claim.bindings,
    ...(claim.marked === true ? { marked: true as const } : {}),
    verdict: claim.verdict,
  };
}

/**
 * Every source the flags cite, each distinct entry once, ordered by id and then by content; a flag
 * names its sources by their place in this list, so a long draft's report does not repeat the same
 * author lists thousands of times (the report of 2 MB of on-topic prose was 140 MB with them). Two
 * entries may share an id (a check may cite a source in a shorter form than its pack does), so
 * entries are told apart by content, not by id.
 */
export class CitedSources {
  readonly list: Source[];
  private readonly byObject = new Map<Source, number>();
  private readonly byContent = new Map<string, number>();

  constructor(flags: readonly Flag[]) {
    const distinct = new Map<string, Source>();
    const seen = new Set<Source>();
    for (const flag of flags) {
      for (const source of flag.sources) {
        if (seen.has(source)) continue;
        seen.add(source);
        distinct.set(JSON.stringify(source), source);
      }
    }
    const keyed = orderSources(distinct);
    this.list = keyed.map(([, source]) => source);
    keyed.forEach(([key], i) => this.byContent.set(key, i));
  }

  /** The place of `source` in `list` (looked up by content once per distinct object). */
  indexOf(source: Source): number {
    let index = this.byObject.get(source);
    if (index === undefined) {
      index = this.byContent.get(JSON.stringify(source)) ?? -1;
      this.byObject.set(source, index);
    }
    return index;
  }
}

function codeUnitOrder(a: string, b: string): number {
  return a < b ? -1 : a > b ? 1 : 0;
}

/** Distinct source entries keyed by their JSON text, in report order: by id, then by that text. */
export function orderSources(distinct: ReadonlyMap<string, Source>): [string, Source][] {
  return [...distinct].sort(([ka, a], [kb, b]) => codeUnitOrder(a.id, b.id) || codeUnitOrder(ka, kb));
}

/** The `json` report as data (what `renderJson` writes), for callers that want the object. */
export function toJsonReport(result: CheckResult, options: ReportOptions): JsonReport {
  const cited = new CitedSources(result.flags);
  return {
    tool: { name: 'firnline', version: options.toolVersion },
    files: [...result.files],
    summary: summarize(result),
    claims: sortByPlace(result.claims).map(jsonClaim),
    flags: sortByPlace(result.flags).map((flag) => jsonFlag(flag, cited)),
    rules: sortRules(result.rules),
    sources: cited.list,
    skipped: result.skipped.map((entry) => ({ ...entry })),
    packs: (result.packs ?? []).map((p) => ({ ...p })),
  };
}

/** Firnline's own machine-readable report, described by schemas/report.schema.json. */
export function renderJson(result: CheckResult, options: ReportOptions): string {
  return [...jsonReportPieces(result, options)].join('');
}

/** How much text `jsonReportPieces` gathers before it hands a piece on. */
const PIECE_SIZE = 1 << 20;

/**
 * The text of `renderJson`, in pieces of about a megabyte, for a caller that writes it out as it
 * goes: the text is `JSON.stringify(toJsonReport(result, options), null, 2)` and a newline, but
 * neither the whole report object nor the whole text is ever held. Claims and flags are converted
 * and written one at a time (a JSON string holds no raw line break, so indenting a member's own
 * text by its depth gives what the whole stringify gives).
 */
export function* jsonReportPieces(result: CheckResult, options: ReportOptions): Generator<string> {
  let pending = '';
  const cited = new CitedSources(result.flags);
  const members: [string, () => Iterable<unknown> | unknown, boolean][] = [
    ['tool', () => ({ name: 'firnline', version: options.toolVersion }), false],
    ['files', () => [...result.files], false],
    ['summary', () => summarize(result), false],
    ['claims', () => lazyMap(sortByPlace(result.claims), jsonClaim), true],
    ['flags', () => lazyMap(sortByPlace(result.flags), (flag) => jsonFlag(flag, cited)), true],
    ['rules', () => sortRules(result.rules), false],
    ['sources', () => cited.list, false],
    ['skipped', () => result.skipped.map((entry) => ({ ...entry })), false],
    ['packs', () => (result.packs ?? []).map((p) => ({ ...p })), false],
  ];
  pending += '{\n';
  for (const [m, [name, value, listed]] of members.entries()) {
    pending += `  ${JSON.stringify(name)}: `;
    if (!listed) {
      pending += indented(value(), '  ');
    } else {
      let first = true;
      for (const item of value() as Iterable<unknown>) {
        pending += `${first ? '[\n' : ',\n'}    ${indented(item, '    ')}`;
        first = false;
        if (pending.length >= PIECE_SIZE) {
          yield pending;
          pending = '';
        }
      }
      pending += first ? '[]' : '\n  ]';
    }
    pending += m === members.length - 1 ? '\n}\n' : ',\n';
  }
  yield pending;
}

function indented(value: unknown, indent: string): string {
  return JSON.stringify(value, null, 2).replaceAll('\n', `\n${indent}`);
}

function* lazyMap<T, U>(items: readonly T[], convert: (item: T) => U): Generator<U> {
  for (const item of items) yield convert(item);
}
