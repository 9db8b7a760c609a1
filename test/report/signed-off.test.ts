import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { Ajv2020 } from 'ajv/dist/2020.js';
import type { FormatsPlugin } from 'ajv-formats';
import { describe, expect, it } from 'vitest';
import { renderReport } from '../../src/report/index.js';
import type { ReportOptions } from '../../src/report/report-options.js';
import type { SarifLog } from '../../src/report/sarif-log.js';
import type { CheckResult, Flag } from '../../src/types.js';
import { ICE_AGE_RESULT, SPAN_FLAG } from './fixtures/ice-age-result.js';

const OPTIONS: ReportOptions = { color: false, toolVersion: '0.1.0', failOn: 'error' };
const SIGNED: Flag = { ...SPAN_FLAG, signoff: { reviewer: 'R. Okafor', date: '2026-11-30', decision: 'waived' } };
const RESULT: CheckResult = { ...ICE_AGE_RESULT, flags: ICE_AGE_RESULT.flags.map((f) => (f === SPAN_FLAG ? SIGNED : f)) };

const require = createRequire(import.meta.url);
const addFormats = require('ajv-formats') as FormatsPlugin;
// The OASIS SARIF 2.1.0 schema, as shipped in the SARIF SDK package (draft 2020-12; strict off).
const sarifAjv = new Ajv2020({ strict: false, allErrors: true });
addFormats(sarifAjv);
const validateSarif = sarifAjv.compile(
  JSON.parse(readFileSync(new URL('../../node_modules/@microsoft/sarif-multitool-linux/sarif-2.1.0.json', import.meta.url), 'utf8')) as object,
);
const validateJson = new Ajv2020({ strict: true, allErrors: true }).compile(
  JSON.parse(readFileSync(new URL('../../schemas/report.schema.json', import.meta.url), 'utf8')) as object,
);

describe('a flag on a signed-off claim', () => {
  it('is an accepted external suppression in SARIF (SARIF 2.1.0 §3.35), and still validates', () => {
    const log = JSON.parse(renderReport('sarif', RESULT, OPTIONS)) as SarifLog;
    expect(validateSarif(log)).toBe(true);
    const result = log.runs[0]?.results.find((r) => r.ruleId === SPAN_FLAG.ruleId);
    expect(result?.suppressions).toEqual([{ kind: 'external', status: 'accepted', justification: 'Signed off by R. Okafor on 2026-11-30 (waived).' }]);
  });

  it('carries the sign-off in JSON, as the report schema describes', () => {
    const report = JSON.parse(renderReport('json', RESULT, OPTIONS)) as { flags: Flag[] };
    expect(validateJson(report)).toBe(true);
    expect(report.flags.find((f) => f.ruleId === SPAN_FLAG.ruleId)?.signoff).toEqual(SIGNED.signoff);
  });

  it('says so in the text report', () => {
    expect(renderReport('text', RESULT, OPTIONS)).toContain('signed off  by R. Okafor on 2026-11-30 (waived); this flag does not fail the run');
  });

  it('is not a JUnit failure', () => {
    const before = renderReport('junit', ICE_AGE_RESULT, OPTIONS).match(/<failure /gu)?.length ?? 0;
    const after = renderReport('junit', RESULT, OPTIONS).match(/<failure /gu)?.length ?? 0;
    expect(SPAN_FLAG.level).toBe('error');
    expect(after).toBe(before - 1);
  });
});
