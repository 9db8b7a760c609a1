/**
 * `firnline merge`: joins the JSON or SARIF reports of shards (`check --shard K/N`) into the report
 * one run over every file would have written: files, claims, flags and results in the same order,
 * rules once each by id and (JSON) sources once each (SARIF rule indexes and JSON source places
 * renumbered), the summary counts added up.
 */
import { FirnlineError } from '../errors.js';
import type { JsonReport } from '../report/json-report.js';
import type { SarifInvocation, SarifLog, SarifResult } from '../report/sarif-log.js';
import { orderSources } from '../report/render-json.js';
import { compareByPlace, sortRules } from '../report/sort.js';
import type { Source } from '../types.js';

/** One report to merge: its name (for messages) and its text. */
export interface NamedReport {
  name: string;
  text: string;
}

/** The merged report's format and text (ending in a newline, as `check` writes it). */
export function mergeReports(reports: NamedReport[]): { format: 'json' | 'sarif'; text: string } {
  if (reports.length === 0) throw new FirnlineError('usage', 'name the reports to merge');
  const parsed = reports.map(({ name, text }) => {
    let data: unknown;
    try {
      data = JSON.parse(text);
    } catch (error) {
      throw new FirnlineError('merge-not-json', `not a JSON or SARIF report (${(error as Error).message})`, { file: name });
    }
    return { name, data, format: formatOf(data, name) };
  });
  const format = parsed[0]?.format ?? 'json';
  const other = parsed.find((p) => p.format !== format);
  if (other !== undefined) throw new FirnlineError('merge-mixed', `a ${other.format} report among ${format} reports; merge one format at a time`, { file: other.name });
  const merged = format === 'json'
    ? mergeJson(parsed.map((p) => ({ name: p.name, report: p.data as JsonReport })))
    : mergeSarif(parsed.map((p) => ({ name: p.name, log: p.data as SarifLog })));
  return { format, text: `${JSON.stringify(merged, null, 2)}\n` };
}

function formatOf(data: unknown, name: string): 'json' | 'sarif' {
  const d = data as Partial<JsonReport & SarifLog> | null;
  if (d !== null && typeof d === 'object' && d.version === '2.1.0' && Array.isArray(d.runs) && d.runs.length === 1) return 'sarif';
  if (d !== null && typeof d === 'object' && d.tool?.name === 'firnline' && Array.isArray(d.claims) && Array.isArray(d.flags)) return 'json';
  throw new FirnlineError('merge-unknown', 'not a Firnline JSON report nor a one-run SARIF log', { file: name });
}

function codeUnitOrder(a: string, b: string): number {
  return a < b ? -1 : a > b ? 1 : 0;
}

function sameVersion(versions: { name: string; version: string }[]): void {
  const first = versions[0];
  const odd = versions.find((v) => v.version !== first?.version);
  if (odd !== undefined) throw new FirnlineError('merge-versions', `made by Firnline ${odd.version}, the first report by ${first?.version}; rerun the shards with one version`, { file: odd.name });
}

function mergeJson(reports: { name: string; report: JsonReport }[]): JsonReport {
  sameVersion(reports.map((r) => ({ name: r.name, version: r.report.tool.version })));
  const all = reports.map((r) => r.report);
  const first = all[0] as JsonReport;
  const summary = { ...first.summary };
  for (const report of all.slice(1)) {
    for (const key of Object.keys(summary) as (keyof typeof summary)[]) summary[key] += report.summary[key] ?? 0;
  }
  // Each distinct source entry once, in the order one run gives them; flags renumbered to it.
  const distinct = new Map<string, Source>();
  for (const report of all) for (const source of report.sources) distinct.set(JSON.stringify(source), source);
  const ordered = orderSources(distinct);
  const place = new Map(ordered.map(([key], i) => [key, i]));
  const flags = all.flatMap((r) => {
    const renumbered = r.sources.map((source) => place.get(JSON.stringify(source)) as number);
    return r.flags.map((f) => ({ ...f, sources: f.sources.map((i) => renumbered[i] as number) }));
  });
  return {
    tool: first.tool,
    files: [...new Set(all.flatMap((r) => r.files))].sort(codeUnitOrder),
    summary,
    claims: all.flatMap((r) => r.claims).sort(compareByPlace),
    flags: flags.sort(compareByPlace),
    rules: sortRules(all.flatMap((r) => r.rules)),
    sources: ordered.map(([, source]) => source),
    skipped: all.flatMap((r) => r.skipped).sort((a, b) => codeUnitOrder(a.file, b.file)),
    // Every shard ran with the same packs.
    packs: first.packs,
  };
}

function mergeSarif(logs: { name: string; log: SarifLog }[]): SarifLog {
  sameVersion(logs.map((l) => ({ name: l.name, version: l.log.runs[0].tool.driver.version })));
  const runs = logs.map((l) => l.log.runs[0]);
  const first = logs[0]?.log as SarifLog;
  const rules = sortRules(runs.flatMap((r) => r.tool.driver.rules));
  const indexById = new Map(rules.map((rule, index) => [rule.id, index]));
  const results = runs.flatMap((r) => r.results.map((result) => ({ ...result, ...(result.ruleIndex === undefined ? {} : { ruleIndex: indexById.get(result.ruleId) }) }) as SarifResult));
  results.sort((a, b) => compareByPlace(placeOf(a), placeOf(b)));
  const run = first.runs[0];
  // Files passed over or not checked: one notification each, in path order as the JSON report's
  // `skipped`; the merged run succeeded only if every shard did.
  const invocations = runs.flatMap((r) => r.invocations ?? []);
  const notifications = invocations.flatMap((i) => i.toolExecutionNotifications);
  notifications.sort((a, b) => codeUnitOrder(notifiedFile(a), notifiedFile(b)));
  const { invocations: _dropped, ...rest } = run;
  const merged = { ...rest, tool: { driver: { ...run.tool.driver, rules } }, results };
  if (notifications.length === 0) return { ...first, runs: [merged] };
  return { ...first, runs: [{ ...merged, invocations: [{ executionSuccessful: invocations.every((i) => i.executionSuccessful), toolExecutionNotifications: notifications }] }] };
}

function notifiedFile(n: SarifInvocation['toolExecutionNotifications'][number]): string {
  const uri = n.locations[0]?.physicalLocation.artifactLocation.uri ?? '';
  try {
    return decodeURIComponent(uri);
  } catch {
    return uri;
  }
}

/** A result's place, as report/sort.ts orders flags: the path (the URI decoded), then the span. */
function placeOf(result: SarifResult): Parameters<typeof compareByPlace>[0] {
  const location = result.locations[0]?.physicalLocation;
  const region = location?.region;
  let file = location?.artifactLocation.uri ?? '';
  try {
    file = decodeURIComponent(file);
  } catch {
    // An undecodable URI sorts as written.
  }
  return {
    file,
    ruleId: result.ruleId,
    span: {
      start: { line: region?.startLine ?? 0, column: region?.startColumn ?? 0 },
      end: { line: region?.endLine ?? 0, column: region?.endColumn ?? 0 },
    } as Parameters<typeof compareByPlace>[0]['span'],
  };
}
