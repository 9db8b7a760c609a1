import type { Level, RuleInfo } from '../types.js';
import { fullReference } from './format-source.js';
import type { SarifLevel, SarifReportingDescriptor } from './sarif-log.js';

/** Our levels are named after SARIF's, so the map is one to one; written out so it is checked. */
export const SARIF_LEVELS: Record<Level, SarifLevel> = {
  error: 'error',
  warning: 'warning',
  note: 'note',
};

/** The rule's citations as help text: one source per line, each with its DOI link or URL. */
function helpText(rule: RuleInfo): string {
  if (rule.sources.length === 0) return `${rule.summary}\nNo source is cited for this rule.`;
  return [`${rule.summary}`, 'Sources:', ...rule.sources.map((source) => `- ${fullReference(source)}`)].join('\n');
}

/**
 * One SARIF `reportingDescriptor` for one Firnline rule: summary as short description,
 * description as full description, the citations as help text and, as data, in `properties.sources`.
 */
export function toReportingDescriptor(rule: RuleInfo): SarifReportingDescriptor {
  return {
    id: rule.id,
    shortDescription: { text: rule.summary },
    fullDescription: { text: rule.description },
    help: { text: helpText(rule) },
    defaultConfiguration: { level: SARIF_LEVELS[rule.defaultLevel] },
    properties: { sources: rule.sources },
  };
}
