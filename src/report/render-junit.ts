import type { CheckResult, Flag } from '../types.js';
import { describeFlag } from './describe-flag.js';
import { escapeXmlAttribute as attr, escapeXmlText as text } from './escape-xml.js';
import { formatPlace } from './format-place.js';
import { formatSource } from './format-source.js';
import { asSentence } from './format-value.js';
import type { JunitCase, JunitSuite } from './junit-suites.js';
import { toJunitSuites } from './junit-suites.js';
import type { ReportOptions } from './report-options.js';

interface Counts {
  tests: number;
  failures: number;
  skipped: number;
}

function count(cases: JunitCase[]): Counts {
  return {
    tests: cases.length,
    // A test fails once however many flags it carries: JUnit counts failed tests, not failures.
    failures: cases.filter((c) => c.failures.length > 0).length,
    skipped: cases.filter((c) => c.skipped !== undefined).length,
  };
}

// Firnline reports no tool errors as test errors (a broken pack stops the run), hence errors="0".
function countAttributes({ tests, failures, skipped }: Counts): string {
  return `tests="${tests}" failures="${failures}" errors="0" skipped="${skipped}"`;
}

/** A flag in full, for a failure body or standard output: place, level, rule, words, sources. */
function flagText(flag: Flag): string {
  const lines = [`${formatPlace(flag)} ${flag.level} ${flag.ruleId}`, describeFlag(flag)];
  if (flag.sources.length > 0) lines.push('Sources:', ...flag.sources.map((s) => `- ${formatSource(s)}`));
  return lines.join('\n');
}

function caseXml(file: string, junitCase: JunitCase): string[] {
  const open = `    <testcase classname="${attr(file)}" name="${attr(junitCase.name)}"`;
  const inner: string[] = [];
  if (junitCase.skipped !== undefined) inner.push(`      <skipped message="${attr(junitCase.skipped)}"/>`);
  for (const flag of junitCase.failures) {
    const message = attr(`${flag.ruleId}: ${asSentence(flag.reason)}`);
    inner.push(`      <failure type="${attr(flag.ruleId)}" message="${message}">${text(flagText(flag))}</failure>`);
  }
  if (junitCase.passed.length > 0) {
    inner.push(`      <system-out>${text(junitCase.passed.map(flagText).join('\n\n'))}</system-out>`);
  }
  return inner.length === 0 ? [`${open}/>`] : [`${open}>`, ...inner, '    </testcase>'];
}

function suiteXml(suite: JunitSuite): string[] {
  const head = `  <testsuite name="${attr(suite.file)}" ${countAttributes(count(suite.cases))}`;
  if (suite.cases.length === 0) return [`${head}/>`];
  return [`${head}>`, ...suite.cases.flatMap((c) => caseXml(suite.file, c)), '  </testsuite>'];
}

/**
 * JUnit XML in the common Ant/Surefire shape, for CI test views: `testsuites` > one `testsuite`
 * per file > one `testcase` per claim, with a `failure` per flag at or above `options.failOn`
 * and lower flags in `system-out`; a skipped file is a suite with one `skipped` case. No `time`
 * attributes: Firnline does not time claims, and an invented time would mislead.
 */
export function renderJunit(result: CheckResult, options: ReportOptions): string {
  const suites = toJunitSuites(result, options);
  const all = count(suites.flatMap((suite) => suite.cases));
  return [
    '<?xml version="1.0" encoding="UTF-8"?>',
    `<testsuites name="firnline" ${countAttributes(all)}>`,
    ...suites.flatMap(suiteXml),
    '</testsuites>',
    '',
  ].join('\n');
}
