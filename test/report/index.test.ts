import { renderHtml } from '../../src/report/review-page/render-html.js';
import { describe, expect, it } from 'vitest';
import {
  isReportFormat,
  reachesFailLevel,
  renderJson,
  renderJunit,
  renderReport,
  renderSarif,
  renderText,
  REPORT_FORMATS,
} from '../../src/report/index.js';
import type { ReportOptions } from '../../src/report/index.js';
import type { Level } from '../../src/types.js';
import { ICE_AGE_RESULT } from './fixtures/ice-age-result.js';

const OPTIONS: ReportOptions = { color: false, toolVersion: '0.1.0', failOn: 'warning' };

describe('the reporter registry', () => {
  it('offers text, json, sarif, junit and html, text first as the default', () => {
    expect(REPORT_FORMATS).toEqual(['text', 'json', 'sarif', 'junit', 'html']);
  });

  const formats = [
    ['text', renderText],
    ['json', renderJson],
    ['sarif', renderSarif],
    ['junit', renderJunit],
    ['html', renderHtml],
  ] as const;
  it.each(formats)('renderReport("%s") is that format\'s reporter', (format, reporter) => {
    expect(renderReport(format, ICE_AGE_RESULT, OPTIONS)).toBe(reporter(ICE_AGE_RESULT, OPTIONS));
  });

  const names: [string, boolean][] = [
    ['sarif', true],
    ['junit', true],
    ['html', true],
    ['SARIF', false],
    ['markdown', false],
    ['', false],
  ];
  it.each(names)('isReportFormat(%j) is %s', (name, known) => expect(isReportFormat(name)).toBe(known));
});

describe('reachesFailLevel: at or above the fail level (GLOSSARY: --fail-on)', () => {
  const cases: [Level, Level | 'never', boolean][] = [
    ['error', 'error', true],
    ['warning', 'error', false],
    ['error', 'warning', true],
    ['warning', 'warning', true],
    ['note', 'warning', false],
    ['note', 'note', true],
    ['error', 'never', false],
  ];
  it.each(cases)('%s with fail level %s: %s', (level, failOn, fails) => expect(reachesFailLevel(level, failOn)).toBe(fails));
});
