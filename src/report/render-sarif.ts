import { pathToFileURL } from 'node:url';
import type { CheckResult } from '../types.js';
import type { ReportOptions } from './report-options.js';
import type { SarifArtifactLocation, SarifInvocation, SarifLog } from './sarif-log.js';
import { SRCROOT, toArtifactUri, toSarifResult } from './sarif-result.js';
import { toReportingDescriptor } from './sarif-rules.js';
import { sortByPlace, sortRules } from './sort.js';

/** Where the SARIF 2.1.0 schema (with Errata 01) is published by OASIS. */
export const SARIF_SCHEMA_URI =
  'https://docs.oasis-open.org/sarif/sarif/v2.1.0/errata01/os/schemas/sarif-schema-2.1.0.json';

/** The %SRCROOT% base: an absolute file URI ending in `/` when the folder is known (SARIF §3.14.14). */
function srcRootLocation(srcRoot: string | undefined): SarifArtifactLocation {
  if (srcRoot === undefined) {
    // No uri: the standard lets the viewer supply the base (e.g. the repository checkout).
    return { description: { text: 'The folder Firnline was run in; result paths are relative to it.' } };
  }
  const href = pathToFileURL(srcRoot).href;
  return { uri: href.endsWith('/') ? href : `${href}/` };
}

/** The SARIF log as data (what `renderSarif` writes): one run, rules by id, results in place order. */
export function toSarifLog(result: CheckResult, options: ReportOptions): SarifLog {
  const rules = sortRules(result.rules);
  const indexById = new Map(rules.map((rule, index) => [rule.id, index]));
  return {
    $schema: SARIF_SCHEMA_URI,
    version: '2.1.0',
    runs: [
      {
        tool: { driver: { name: 'Firnline', version: options.toolVersion, rules: rules.map(toReportingDescriptor) } },
        originalUriBaseIds: { [SRCROOT]: srcRootLocation(options.srcRoot) },
        columnKind: 'unicodeCodePoints',
        results: sortByPlace(result.flags).map((flag) => toSarifResult(flag, indexById.get(flag.ruleId))),
        ...(result.skipped.length === 0 ? {} : { invocations: [skippedFiles(result)] }),
      },
    ],
  };
}

/**
 * Every file passed over, as a tool execution notification: `error` for a draft that could not be
 * checked (the run then did not succeed), `note` for one with nothing to check.
 */
function skippedFiles(result: CheckResult): SarifInvocation {
  return {
    executionSuccessful: !result.skipped.some((s) => s.unchecked === true),
    toolExecutionNotifications: result.skipped.map((s) => ({
      level: s.unchecked === true ? 'error' : 'note',
      message: { text: `${s.unchecked === true ? 'Not checked' : 'Skipped'}: ${s.reason}` },
      locations: [
        {
          physicalLocation: {
            artifactLocation: { uri: toArtifactUri(s.file), uriBaseId: SRCROOT },
            ...(s.line === undefined ? {} : { region: { startLine: s.line, ...(s.column === undefined ? {} : { startColumn: s.column }) } }),
          },
        },
      ],
    })),
  };
}

/**
 * SARIF 2.1.0 for code-scanning and review tools. Columns, `charOffset` and `charLength` count
 * Unicode code points, as `columnKind` states.
 */
export function renderSarif(result: CheckResult, options: ReportOptions): string {
  return `${JSON.stringify(toSarifLog(result, options), null, 2)}\n`;
}
