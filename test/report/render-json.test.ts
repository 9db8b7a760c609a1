import { readFileSync } from 'node:fs';
import { Ajv2020 } from 'ajv/dist/2020.js';
import { describe, expect, it } from 'vitest';
import type { JsonReport } from '../../src/report/json-report.js';
import { REPORT_SCHEMA_ID } from '../../src/report/json-report.js';
import type { ReportOptions } from '../../src/report/report-options.js';
import { jsonReportPieces, renderJson, toJsonReport } from '../../src/report/render-json.js';
import type { CheckResult, Flag, Source } from '../../src/types.js';
import { EMPTY_RESULT, ICE_AGE_RESULT, SPAN_FLAG } from './fixtures/ice-age-result.js';

const OPTIONS: ReportOptions = { color: false, toolVersion: '0.1.0', failOn: 'error' };
const schema = JSON.parse(readFileSync(new URL('../../schemas/report.schema.json', import.meta.url), 'utf8')) as object;
// One strict draft 2020-12 validator, as the JSON Schema specification reads (json-schema.org, 2020-12).
const validate = new Ajv2020({ allErrors: true, strict: true }).compile<JsonReport>(schema);

function errorsOf(value: unknown): string[] {
  return validate(value) ? [] : (validate.errors ?? []).map((e) => `${e.instancePath} ${e.message ?? ''}`);
}

describe('json report', () => {
  const text = renderJson(ICE_AGE_RESULT, OPTIONS);
  const report = JSON.parse(text) as JsonReport;

  it('is described by schemas/report.schema.json', () => {
    expect((schema as { $id: string }).$id).toBe(REPORT_SCHEMA_ID);
    expect(errorsOf(report)).toEqual([]);
    expect(errorsOf(JSON.parse(renderJson(EMPTY_RESULT, OPTIONS)))).toEqual([]);
  });

  it('matches the golden report for the sample run', async () => {
    await expect(text).toMatchFileSnapshot('./__snapshots__/ice-age-result.json');
  });

  it('names the tool and counts claims, flags by level and skipped files', () => {
    expect(report.tool).toEqual({ name: 'firnline', version: '0.1.0' });
    expect(report.summary).toEqual({ claims: 4, flags: 3, error: 1, warning: 1, note: 1, skipped: 1, marked: 0 });
    expect(report.files).toEqual(['drafts/ice-ages.md', 'drafts/glacial-co2.md']);
  });

  it('lists flags and claims in place order, claims without a copy of their flags', () => {
    expect(report.flags.map((f) => f.ruleId)).toEqual([
      'value.deglacial-co2-rise',
      'value.edc-record-span',
      'logic.lag-rules-out-cause',
    ]);
    expect(report.claims.map((c) => `${c.file}:${c.span.start.line}`)).toEqual([
      'drafts/glacial-co2.md:5',
      'drafts/ice-ages.md:3',
      'drafts/ice-ages.md:5',
      'drafts/ice-ages.md:7',
    ]);
    expect(report.claims.every((c) => !('flags' in c))).toBe(true);
    expect(report.flags[1]).toEqual({ ...SPAN_FLAG, sources: [report.sources.findIndex((s) => s.id === 'jouzel-2007')] });
  });

  it('writes each cited source once, in id order, and a flag names its sources by their places', () => {
    const cited = ICE_AGE_RESULT.flags.flatMap((f) => f.sources);
    expect(report.sources.map((s) => s.id)).toEqual([...new Set(cited.map((s) => s.id))].sort());
    for (const flag of report.flags) {
      const original = ICE_AGE_RESULT.flags.find((f) => f.ruleId === flag.ruleId && f.file === flag.file && f.span.start.offset === flag.span.start.offset);
      expect(flag.sources.map((i) => report.sources[i])).toEqual(original?.sources);
    }
  });

  it('keeps two entries with one id apart when they differ, each flag pointing at its own', () => {
    const [first, second] = ICE_AGE_RESULT.flags as [Flag, Flag, ...Flag[]];
    const full = first.sources[0] as Source;
    const short: Source = { id: full.id, cite: 'J. Jouzel and others (2007).', how: 'from memory' };
    const written = JSON.parse(renderJson({ ...ICE_AGE_RESULT, flags: [first, { ...second, sources: [short] }] }, OPTIONS)) as JsonReport;
    expect(written.sources.filter((s) => s.id === full.id)).toHaveLength(2);
    const back = written.flags.map((f) => f.sources.map((i) => written.sources[i]));
    expect(back).toEqual(expect.arrayContaining([first.sources, [short]]));
    expect(errorsOf(written)).toEqual([]);
  });

  it('writes an open interval end as null, and the schema accepts it', () => {
    const open: CheckResult = {
      ...ICE_AGE_RESULT,
      flags: [{ ...SPAN_FLAG, claimed: { text: 'more than 400,000 years', low: 400_000, high: Infinity, unit: 'yr' } }],
    };
    const written = JSON.parse(renderJson(open, OPTIONS)) as JsonReport;
    expect(written.flags[0]?.claimed).toEqual({ text: 'more than 400,000 years', low: 400_000, high: null, unit: 'yr' });
    expect(errorsOf(written)).toEqual([]);
  });
});

describe('the json report written in pieces', () => {
  // JSON.stringify with an indent of 2 (ECMA-262, JSON.stringify) is the text the pieces must make.
  const whole = (result: CheckResult) => `${JSON.stringify(toJsonReport(result, OPTIONS), null, 2)}\n`;
  // A long run: the sample's claims and flags repeated in many files, enough for several pieces.
  const long: CheckResult = {
    ...ICE_AGE_RESULT,
    files: Array.from({ length: 3000 }, (_, i) => `drafts/part-${i}.md`),
    claims: Array.from({ length: 3000 }, (_, i) => ICE_AGE_RESULT.claims.map((c) => ({ ...c, id: `${c.id}-${i}`, file: `drafts/part-${i}.md` }))).flat(),
    flags: Array.from({ length: 3000 }, (_, i) => ICE_AGE_RESULT.flags.map((f) => ({ ...f, file: `drafts/part-${i}.md` }))).flat(),
  };

  it('joins to exactly the text of the whole report, empty lists included', () => {
    for (const result of [ICE_AGE_RESULT, EMPTY_RESULT, long]) expect([...jsonReportPieces(result, OPTIONS)].join('')).toBe(whole(result));
  });

  it('hands a long report on in pieces of about a megabyte', () => {
    const pieces = [...jsonReportPieces(long, OPTIONS)];
    expect(pieces.length).toBeGreaterThan(2);
    for (const piece of pieces.slice(0, -1)) expect(piece.length).toBeGreaterThanOrEqual(1 << 20);
    for (const piece of pieces) expect(piece.length).toBeLessThan((1 << 20) + 10_000);
  });
});

describe('the report schema rejects broken reports', () => {
  const good = JSON.parse(renderJson(ICE_AGE_RESULT, OPTIONS)) as Record<string, unknown>;
  const flag = (good.flags as Record<string, unknown>[])[0]!;
  const broken: [string, unknown, string][] = [
    ['summary missing', { ...good, summary: undefined }, "must have required property 'summary'"],
    ['another tool name', { ...good, tool: { name: 'other', version: '1' } }, 'must be equal to constant'],
    ['an unknown level', { ...good, flags: [{ ...flag, level: 'fatal' }] }, 'must be equal to one of the allowed values'],
    [
      'column 0 (columns are 1-based)',
      { ...good, flags: [{ ...flag, span: { start: { line: 3, column: 0, offset: 0 }, end: { line: 3, column: 2, offset: 2 } } }] },
      'must be >= 1',
    ],
    ['a property the format does not have', { ...good, verdicts: [] }, 'must NOT have additional properties'],
    ['a negative count', { ...good, summary: { ...(good.summary as object), note: -1 } }, 'must be >= 0'],
    ['a source without `how`', { ...good, sources: [{ id: 'x', cite: 'X (2020).' }] }, "must have required property 'how'"],
    ['a flag that repeats a source in full instead of its place', { ...good, flags: [{ ...flag, sources: [(good.sources as unknown[])[0]] }] }, 'must be integer'],
    ['no list of sources', { ...good, sources: undefined }, "must have required property 'sources'"],
    ['a rule id that is not dotted', { ...good, flags: [{ ...flag, ruleId: 'EDC_SPAN' }] }, 'must match pattern'],
  ];
  it.each(broken)('%s', (_name, report, message) => {
    const cleaned = JSON.parse(JSON.stringify(report)) as unknown; // drops the `undefined` member
    expect(errorsOf(cleaned).join('\n')).toContain(message);
  });
});
