import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { Ajv2020 } from 'ajv/dist/2020.js';
import type { FormatsPlugin } from 'ajv-formats';
import { describe, expect, it } from 'vitest';
import { describeFlag } from '../../src/report/describe-flag.js';
import type { ReportOptions } from '../../src/report/report-options.js';
import { renderSarif, SARIF_SCHEMA_URI } from '../../src/report/render-sarif.js';
import type { SarifLog } from '../../src/report/sarif-log.js';
import { SARIF_LEVELS } from '../../src/report/sarif-rules.js';
import type { CheckResult } from '../../src/types.js';
import { EMPTY_RESULT, ICE_AGE_RESULT, ICE_AGES_MD, LAG_FLAG, RISE_FLAG, SPAN_FLAG } from './fixtures/ice-age-result.js';

const OPTIONS: ReportOptions = { color: false, toolVersion: '0.1.0', failOn: 'error' };

// The OASIS SARIF 2.1.0 schema, as shipped in the SARIF SDK package. Its $schema is draft 2020-12,
// and it uses keywords ajv's strict mode does not know, hence Ajv2020 with strict off, plus formats.
const sarifSchema = JSON.parse(
  readFileSync(new URL('../../node_modules/@microsoft/sarif-multitool-linux/sarif-2.1.0.json', import.meta.url), 'utf8'),
) as object;
// ajv-formats is CommonJS whose export is the plugin itself; require gives exactly that.
const addFormats = createRequire(import.meta.url)('ajv-formats') as FormatsPlugin;
const ajv = new Ajv2020({ strict: false, allErrors: true });
addFormats(ajv);
const validateSarif = ajv.compile(sarifSchema);

function errorsOf(text: string): string[] {
  return validateSarif(JSON.parse(text)) ? [] : (validateSarif.errors ?? []).map((e) => `${e.instancePath} ${e.message ?? ''}`);
}

const text = renderSarif(ICE_AGE_RESULT, OPTIONS);
const log = JSON.parse(text) as SarifLog;
const run = log.runs[0];
const resultFor = (ruleId: string) => run.results.find((r) => r.ruleId === ruleId)!;

describe('SARIF 2.1.0 report', () => {
  it('validates against the OASIS SARIF 2.1.0 schema: all three levels, with and without corrections', () => {
    expect(run.results.map((r) => [r.level, r.fixes !== undefined])).toEqual([
      ['note', true],
      ['error', true],
      ['warning', false],
    ]);
    expect(errorsOf(text)).toEqual([]);
  });

  it('validates for a run that found nothing, and still lists no rules and no results', () => {
    const empty = renderSarif(EMPTY_RESULT, OPTIONS);
    expect(errorsOf(empty)).toEqual([]);
    const emptyRun = (JSON.parse(empty) as SarifLog).runs[0];
    expect(emptyRun.results).toEqual([]);
    expect(emptyRun.tool.driver.rules).toEqual([]);
  });

  it('matches the golden log for the sample run', async () => {
    await expect(text).toMatchFileSnapshot('./__snapshots__/ice-age-result.sarif');
  });

  it('has exactly one run, names the tool, states the column kind and the %SRCROOT% base', () => {
    expect(log.$schema).toBe(SARIF_SCHEMA_URI);
    expect(log.version).toBe('2.1.0');
    expect(log.runs).toHaveLength(1);
    expect(run.tool.driver.name).toBe('Firnline');
    expect(run.tool.driver.version).toBe('0.1.0');
    expect(run.tool.driver).not.toHaveProperty('informationUri');
    expect(run.columnKind).toBe('unicodeCodePoints');
    expect(run.originalUriBaseIds['%SRCROOT%']).not.toHaveProperty('uri');
    const rooted = JSON.parse(renderSarif(ICE_AGE_RESULT, { ...OPTIONS, srcRoot: '/srv/halvorsen-newsletter' })) as SarifLog;
    expect(rooted.runs[0].originalUriBaseIds['%SRCROOT%']).toEqual({ uri: 'file:///srv/halvorsen-newsletter/' });
  });

  it('maps the levels one to one', () => {
    // SARIF 2.1.0 §3.27.10: level is one of none, note, warning, error.
    expect(SARIF_LEVELS).toEqual({ error: 'error', warning: 'warning', note: 'note' });
    for (const flag of [SPAN_FLAG, LAG_FLAG, RISE_FLAG]) expect(resultFor(flag.ruleId).level).toBe(flag.level);
  });

  it('gives one rule per rule id with texts, default level and sources, and ruleIndex points at it', () => {
    expect(run.tool.driver.rules.map((r) => r.id)).toEqual([
      'logic.lag-rules-out-cause',
      'value.deglacial-co2-rise',
      'value.edc-record-span',
    ]);
    for (const result of run.results) expect(run.tool.driver.rules[result.ruleIndex!]?.id).toBe(result.ruleId);
    const span = run.tool.driver.rules[2]!;
    expect(span.shortDescription.text).toBe('Time span of the EPICA Dome C ice-core record');
    expect(span.defaultConfiguration.level).toBe('error');
    expect(span.help.text).toContain('https://doi.org/10.1126/science.1141038');
    expect(span.properties).toEqual({ sources: SPAN_FLAG.sources });
  });

  it('places a result with a full region in code points, the same numbers the draft gives', () => {
    // Line 3 of the draft opens with U+1F9CA (one code point, two UTF-16 units): column 88, not 89.
    const location = resultFor('value.edc-record-span').locations[0]!.physicalLocation;
    expect(location.artifactLocation).toEqual({ uri: 'drafts/ice-ages.md', uriBaseId: '%SRCROOT%' });
    expect(location.region).toEqual({
      startLine: 3,
      startColumn: 88,
      endLine: 3,
      endColumn: 101,
      charOffset: 120,
      charLength: 13,
      snippet: { text: '400,000 years' },
    });
    expect([...ICE_AGES_MD].slice(120, 120 + 13).join('')).toBe('400,000 years');
    expect(resultFor('logic.lag-rules-out-cause').locations[0]!.physicalLocation.region).toMatchObject({
      startLine: 5,
      startColumn: 99,
      endColumn: 117,
      charOffset: 234,
      charLength: 18,
    });
  });

  it('states the claimed value, the reference range and the corrected wording in the message', () => {
    const message = resultFor('value.edc-record-span').message.text;
    expect(message).toBe(describeFlag(SPAN_FLAG));
    expect(message).toContain('"400,000 years"');
    expect(message).toContain('790,000–810,000 years');
    expect(message).toContain('with "800,000 years"');
  });

  it('offers a fix replacing the flagged region when a correction exists, and none otherwise', () => {
    expect(resultFor('value.edc-record-span').fixes).toEqual([
      {
        description: { text: 'Replace "400,000 years" with "800,000 years".' },
        artifactChanges: [
          {
            artifactLocation: { uri: 'drafts/ice-ages.md', uriBaseId: '%SRCROOT%' },
            replacements: [
              {
                deletedRegion: { startLine: 3, startColumn: 88, endLine: 3, endColumn: 101, charOffset: 120, charLength: 13 },
                insertedContent: { text: '800,000 years' },
              },
            ],
          },
        ],
      },
    ]);
    expect(resultFor('logic.lag-rules-out-cause')).not.toHaveProperty('fixes');
  });

  it('carries the claim id as a partial fingerprint, and leaves it out when there is none', () => {
    expect(resultFor('value.edc-record-span').partialFingerprints).toEqual({ 'firnlineClaimId/v1': 'c-3f1a9e20' });
    const { claimId: _none, ...unowned } = LAG_FLAG;
    const lone = JSON.parse(renderSarif({ ...ICE_AGE_RESULT, flags: [unowned] }, OPTIONS)) as SarifLog;
    expect(lone.runs[0].results[0]).not.toHaveProperty('partialFingerprints');
  });

  it('leaves out ruleIndex for a flag whose rule is not described, and still validates', () => {
    const undescribed = renderSarif({ ...ICE_AGE_RESULT, rules: [] }, OPTIONS);
    expect(errorsOf(undescribed)).toEqual([]);
    expect((JSON.parse(undescribed) as SarifLog).runs[0].results.every((r) => !('ruleIndex' in r))).toBe(true);
  });

  it('writes paths as relative URI references that still validate', () => {
    const odd: CheckResult = { ...ICE_AGE_RESULT, flags: [{ ...SPAN_FLAG, file: 'notes #2/ice age.md' }] };
    const written = renderSarif(odd, OPTIONS);
    expect(errorsOf(written)).toEqual([]);
    const uri = (JSON.parse(written) as SarifLog).runs[0].results[0]?.locations[0]?.physicalLocation.artifactLocation.uri;
    expect(uri).toBe('notes%20%232/ice%20age.md');
  });

  it('rejects what the schema forbids, so the validation above is real', () => {
    const broken = JSON.parse(text) as { runs: { results: { level: string }[] }[] };
    broken.runs[0]!.results[0]!.level = 'fatal';
    expect(validateSarif(broken)).toBe(false);
    // An unencoded space is not a URI reference (RFC 3986): formats are checked too.
    const spaced = JSON.parse(text) as SarifLog;
    spaced.runs[0].results[0]!.locations[0]!.physicalLocation.artifactLocation.uri = 'ice age.md';
    expect(validateSarif(spaced)).toBe(false);
  });
});
