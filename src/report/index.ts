import type { CheckResult } from '../types.js';
import type { ReportOptions, Reporter } from './report-options.js';
import { renderJson } from './render-json.js';
import { renderJunit } from './render-junit.js';
import { renderHtml } from './review-page/render-html.js';
import { renderSarif } from './render-sarif.js';
import { renderText } from './render-text.js';

/** The output formats `check --format` accepts; `text` is the default. */
export const REPORT_FORMATS = ['text', 'json', 'sarif', 'junit', 'html'] as const;
/** One of REPORT_FORMATS. */
export type ReportFormat = (typeof REPORT_FORMATS)[number];

/** The one place a format name meets its reporter. */
const REPORTERS: Record<ReportFormat, Reporter> = {
  text: renderText,
  json: renderJson,
  sarif: renderSarif,
  junit: renderJunit,
  html: renderHtml,
};

/** True when `name` is one of REPORT_FORMATS (for the CLI, before it calls renderReport). */
export function isReportFormat(name: string): name is ReportFormat {
  return (REPORT_FORMATS as readonly string[]).includes(name);
}

/** Renders one run's result in the named format. Pure: the caller writes the string out. */
export function renderReport(format: ReportFormat, result: CheckResult, options: ReportOptions): string {
  return REPORTERS[format](result, options);
}

export type { ReportOptions, Reporter } from './report-options.js';
export { reachesFailLevel } from './report-options.js';
export { compareByPlace, sortByPlace, sortRules } from './sort.js';
export type { Placed } from './sort.js';
export { describeFlag, formatReference } from './describe-flag.js';
export { formatAmount, formatClaimed, formatNumber, formatRange } from './format-value.js';
export { doiUrl, formatSource, fullReference, isFromMemory, shortReference, sourceLink } from './format-source.js';
export { summarize } from './summarize.js';
export type { ReportSummary } from './summarize.js';
export { renderText } from './render-text.js';
export { jsonReportPieces, renderJson, toJsonReport } from './render-json.js';
export { REPORT_SCHEMA_ID } from './json-report.js';
export type { JsonClaim, JsonFlag, JsonQuantity, JsonReport, JsonShownValue, JsonBound } from './json-report.js';
export { renderSarif, toSarifLog, SARIF_SCHEMA_URI } from './render-sarif.js';
export type { SarifLog, SarifResult, SarifRegion, SarifReportingDescriptor } from './sarif-log.js';
export { SARIF_LEVELS } from './sarif-rules.js';
export { renderJunit } from './render-junit.js';
export { renderHtml } from './review-page/render-html.js';
export { escapeXmlAttribute, escapeXmlText } from './escape-xml.js';
