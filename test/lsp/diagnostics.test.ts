// Flags as LSP diagnostics. LSP 3.17, "Diagnostic": severity 1 Error, 2 Warning, 3 Information,
// 4 Hint; `code`, `codeDescription.href` (a URI), `source`, `message`. SARIF 2.1.0 `result.level`
// (§3.27.10, section number from memory) names the levels error, warning and note.
import { describe, expect, it } from 'vitest';
import { diagnosticOf } from '../../src/lsp/diagnostics.js';
import { createPositionMap } from '../../src/lsp/positions.js';
import { createLineIndex } from '../../src/source/line-index.js';
import type { Flag, Level } from '../../src/types.js';

const TEXT = 'CO2 stood near 280 ppm before 1750.';

function flagOf(level: Level, extra: Partial<Flag> = {}): Flag {
  return {
    ruleId: 'value.co2-preindustrial-1750',
    level,
    file: 'draft.md',
    span: createLineIndex(TEXT).toSpan(15, 22),
    excerpt: '280 ppm',
    sentence: TEXT,
    reason: 'A reason.',
    // IPCC AR6 WG1 (Gulev et al. 2021, ch. 2): 278 ppm in 1750; the DOI of the chapter is left out here.
    sources: [{ id: 'ipcc', cite: 'IPCC (2021). Summary for Policymakers.', how: 'read in the source', url: 'https://www.ipcc.ch/report/ar6/wg1/' }],
    ...extra,
  };
}

describe('diagnosticOf', () => {
  it.each([
    ['error', 1],
    ['warning', 2],
    ['note', 3],
  ] as const)('gives a %s flag severity %i', (level, severity) => {
    const diagnostic = diagnosticOf(flagOf(level), createPositionMap(TEXT));
    expect(diagnostic).toMatchObject({
      severity,
      code: 'value.co2-preindustrial-1750',
      codeDescription: { href: 'https://www.ipcc.ch/report/ar6/wg1/' },
      source: 'firnline',
      message: 'A reason.',
      range: { start: { line: 0, character: 15 }, end: { line: 0, character: 22 } },
    });
  });

  it('shows a signed-off error as information, saying who signed it off', () => {
    const signoff = { reviewer: 'Dr A. Reviewer', date: '2026-03-02T09:30:00Z', decision: 'approved' };
    const diagnostic = diagnosticOf(flagOf('error', { signoff }), createPositionMap(TEXT));
    expect(diagnostic.severity).toBe(3);
    expect(diagnostic.message).toBe('A reason. (signed off by Dr A. Reviewer on 2026-03-02: approved; level error)');
  });

  it('leaves the link out when no source has one', () => {
    const diagnostic = diagnosticOf(flagOf('warning', { sources: [] }), createPositionMap(TEXT));
    expect(diagnostic.codeDescription).toBeUndefined();
  });
});
