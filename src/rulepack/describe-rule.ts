/**
 * What a rule id means, in the shape reports and `firnline explain` use (RuleInfo). The rule id
 * groups are data: each maps an id prefix to the list it looks in and how to describe an entry.
 */
import type { RuleInfo } from '../types.js';
import type { LoadedPacks } from './types.js';
import { describeRange, midSentence } from './describe-range.js';

type Describe = (packs: LoadedPacks, id: string) => RuleInfo | undefined;

const BY_PREFIX: [string, Describe][] = [
  ['value.', (packs, id) => {
    const r = packs.reference(id);
    if (r === undefined) return undefined;
    const dated = r.asOf === undefined ? '' : ` (as of ${r.asOf})`;
    const notes = r.notes === undefined ? '' : ` ${r.notes}`;
    const ends = r.ends === undefined ? '' : ` A range told for it is checked end by end: its low end against ${r.ends.low.join(', ')}, its high end against ${r.ends.high.join(', ')}.`;
    return {
      id: `value.${r.id}`,
      summary: `Checks the ${midSentence(r.measures, packs)} against the sourced range.`,
      description: `Accepted range: ${describeRange(r)}${dated}. A correction reads "${r.wording}".${ends}${notes}`,
      defaultLevel: 'warning',
      sources: r.sources,
    };
  }],
  ['direction.', (packs, id) => {
    const d = packs.directions.find((x) => x.id === id);
    return d && { id: `direction.${d.id}`, summary: `Catches the wrong direction of: ${d.statement}`, description: d.statement, defaultLevel: d.level, sources: d.sources };
  }],
];

/** A description of `ruleId` (`value.<id>`, `direction.<id>`, a reasoning check or pattern id). */
export function describeRule(packs: LoadedPacks, ruleId: string): RuleInfo | undefined {
  for (const [prefix, describe] of BY_PREFIX) {
    if (ruleId.startsWith(prefix)) {
      const found = describe(packs, ruleId.slice(prefix.length));
      if (found !== undefined) return found;
    }
  }
  const check = packs.reasoning.find((c) => c.id === ruleId);
  if (check !== undefined) {
    return { id: check.id, summary: check.summary, description: `${check.reason} ${check.suggestion}`, defaultLevel: check.level, sources: check.sources };
  }
  const pattern = packs.patterns.find((p) => p.id === ruleId);
  if (pattern !== undefined) {
    const advice = pattern.suggestion === undefined ? '' : ` ${pattern.suggestion}`;
    return { id: pattern.id, summary: pattern.reason, description: `${pattern.reason}${advice}`, defaultLevel: pattern.level, sources: pattern.sources };
  }
  return undefined;
}
