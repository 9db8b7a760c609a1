/**
 * Flags as LSP diagnostics (LSP 3.17, "Diagnostic"): the flag's exact range, a severity from its
 * level, the rule id as `code`, the first source's link as `codeDescription`, the reason as the
 * message. A flag on a signed-off claim is shown as information, with who signed it off, so it
 * stays visible without reading as an error.
 */
import { DiagnosticSeverity, type Diagnostic } from 'vscode-languageserver';
import { sourceLink } from '../report/format-source.js';
import type { Flag, Level } from '../types.js';
import type { PositionMap } from './positions.js';

/** The `source` of every diagnostic: the tool's name, as the editor shows it. */
export const DIAGNOSTIC_SOURCE = 'firnline';

/** SARIF levels to LSP severities: error → Error, warning → Warning, note → Information. */
export const SEVERITY_OF: Record<Level, DiagnosticSeverity> = {
  error: DiagnosticSeverity.Error,
  warning: DiagnosticSeverity.Warning,
  note: DiagnosticSeverity.Information,
};

/** What a diagnostic carries back to the server in `data` (for code actions). */
export interface DiagnosticData {
  claimId?: string;
  ruleId: string;
}

/** The diagnostic of one flag. */
export function diagnosticOf(flag: Flag, positions: PositionMap): Diagnostic {
  const link = flag.sources.map(sourceLink).find((l) => l !== undefined);
  const signed = flag.signoff === undefined ? '' : ` (${signedOffWords(flag.signoff)}; level ${flag.level})`;
  const data: DiagnosticData = { ruleId: flag.ruleId, ...(flag.claimId === undefined ? {} : { claimId: flag.claimId }) };
  return {
    range: positions.rangeOf(flag.span),
    severity: flag.signoff === undefined ? SEVERITY_OF[flag.level] : DiagnosticSeverity.Information,
    code: flag.ruleId,
    ...(link === undefined ? {} : { codeDescription: { href: link } }),
    source: DIAGNOSTIC_SOURCE,
    message: `${flag.reason}${signed}`,
    data,
  };
}

/** `signed off by Dr A. Reviewer on 2026-03-02: approved`. */
export function signedOffWords(signoff: NonNullable<Flag['signoff']>): string {
  return `signed off by ${signoff.reviewer} on ${signoff.date.slice(0, 10)}: ${signoff.decision}`;
}
