import { describe, expect, it } from 'vitest';
import type { ReportOptions } from '../../src/report/report-options.js';
import { renderJunit } from '../../src/report/render-junit.js';
import type { CheckResult, Flag, Level } from '../../src/types.js';
import { CLAIMS, EMPTY_RESULT, ICE_AGE_RESULT, LAG_FLAG, RULES, SPAN_FLAG } from './fixtures/ice-age-result.js';
import { parseXml } from './xml-check.js';
import type { XmlElement } from './xml-check.js';

const OPTIONS: ReportOptions = { color: false, toolVersion: '0.1.0', failOn: 'error' };

function all(element: XmlElement, name: string): XmlElement[] {
  return [...(element.name === name ? [element] : []), ...element.children.flatMap((child) => all(child, name))];
}

describe('the XML checker the JUnit tests rely on', () => {
  // XML 1.0 (W3C Recommendation, fifth edition): well-formedness constraints and the Char production.
  const broken: [string, string][] = [
    ['a mismatched close tag', '<a><b></a></b>'],
    ['a raw ampersand', '<a>x & y</a>'],
    ['an unknown entity', '<a>&nbsp;</a>'],
    ['a reference to a forbidden character', '<a>&#1;</a>'],
    ['a raw forbidden character', '<a>\u0001</a>'],
    ['a raw "<" in an attribute', '<a b="<"/>'],
    ['an unclosed element', '<a><b/>'],
    ['text after the root', '<a/>x'],
  ];
  it.each(broken)('rejects %s', (_name, body) => {
    expect(() => parseXml(`<?xml version="1.0" encoding="UTF-8"?>\n${body}`)).toThrow();
  });
});

describe('JUnit report', () => {
  it('writes the exact Ant/Surefire shape for a small run', () => {
    const small: CheckResult = {
      files: ['drafts/ice-ages.md'],
      rules: [RULES[0]!],
      claims: [CLAIMS[0]!, CLAIMS[2]!],
      flags: [SPAN_FLAG],
      skipped: [],
    };
    expect(renderJunit(small, OPTIONS)).toBe(
      [
        '<?xml version="1.0" encoding="UTF-8"?>',
        '<testsuites name="firnline" tests="2" failures="1" errors="0" skipped="0">',
        '  <testsuite name="drafts/ice-ages.md" tests="2" failures="1" errors="0" skipped="0">',
        '    <testcase classname="drafts/ice-ages.md" name="3:3 At the Halvorsen Polar Museum, the EPICA Dome C core holds a climate record spa…">',
        '      <failure type="value.edc-record-span" message="value.edc-record-span: The span given for the EPICA Dome C record is about half the published one.">drafts/ice-ages.md:3:88 error value.edc-record-span',
        'The span given for the EPICA Dome C record is about half the published one. The draft says "400,000 years" (read as 395,000–405,000 years). Reference: 790,000–810,000 years for the time span of the EPICA Dome C ice-core record (as of 2007). Correction: replace "400,000 years" with "800,000 years".',
        'Sources:',
        '- Jouzel et al. 2007, doi:10.1126/science.1141038</failure>',
        '    </testcase>',
        '    <testcase classname="drafts/ice-ages.md" name="7:1 Our replica core section is 3 metres long."/>',
        '  </testsuite>',
        '</testsuites>',
        '',
      ].join('\n'),
    );
  });

  it('matches the golden report for the sample run, and it is well-formed', async () => {
    const xml = renderJunit(ICE_AGE_RESULT, OPTIONS);
    await expect(xml).toMatchFileSnapshot('./__snapshots__/ice-age-result.junit.xml');
    const root = parseXml(xml);
    expect(root.name).toBe('testsuites');
    expect(all(root, 'testsuite').map((s) => s.attributes.name)).toEqual([
      'drafts/ice-ages.md',
      'drafts/glacial-co2.md',
      'drafts/staff-picnic.md',
    ]);
    const skipped = all(root, 'skipped');
    expect(skipped.map((s) => s.attributes.message)).toEqual(['no topic term']);
  });

  // The sample run has one error, one warning and one note flag.
  const thresholds: [Level | 'never', number][] = [
    ['error', 1],
    ['warning', 2],
    ['note', 3],
    ['never', 0],
  ];
  it.each(thresholds)('with failOn %s, %i flags fail and the rest are in system-out', (failOn, failing) => {
    const root = parseXml(renderJunit(ICE_AGE_RESULT, { ...OPTIONS, failOn }));
    expect(all(root, 'failure')).toHaveLength(failing);
    expect(all(root, 'system-out').reduce((n, out) => n + out.text.split('\n\n').length, 0)).toBe(3 - failing);
    expect(root.attributes.failures).toBe(String(failing));
    expect(root.attributes.tests).toBe('5');
  });

  it('escapes markup, quotes, line breaks and control characters, keeping them readable', () => {
    const nasty: Flag = {
      ...SPAN_FLAG,
      reason: 'Says <b>400,000</b> & "more"\tthan \u0001 the\u001b record\r\nshows \uD800',
      claimId: 'c-odd',
    };
    const claim = { ...CLAIMS[0]!, id: 'c-odd', text: 'Tab\there & <there>' };
    const xml = renderJunit({ ...EMPTY_RESULT, files: [SPAN_FLAG.file], claims: [claim], flags: [nasty] }, OPTIONS);
    const root = parseXml(xml);
    const failure = all(root, 'failure')[0]!;
    // Attributes keep tab and line breaks as references; C0 controls become control pictures (U+2400 block).
    expect(failure.attributes.message).toBe(
      'value.edc-record-span: Says <b>400,000</b> & "more"\tthan \u2401 the\u241b record\r\nshows \uFFFD.',
    );
    expect(failure.text).toContain('Says <b>400,000</b> & "more"\tthan \u2401 the\u241b record\r\nshows \uFFFD.');
    expect(all(root, 'testcase')[0]?.attributes.name).toBe('3:3 Tab here & <there>');
  });

  it('gives a flag without a known claim its own test case, and a suite to a file not listed', () => {
    const { claimId: _none, ...lone } = LAG_FLAG;
    const elsewhere: Flag = { ...SPAN_FLAG, file: 'drafts/museum-label.md', claimId: 'c-unknown' };
    const root = parseXml(renderJunit({ ...EMPTY_RESULT, files: [LAG_FLAG.file], flags: [lone, elsewhere] }, { ...OPTIONS, failOn: 'warning' }));
    expect(all(root, 'testcase').map((c) => c.attributes.name)).toEqual([
      '5:99 logic.lag-rules-out-cause: "cannot have caused"',
      '3:88 value.edc-record-span: "400,000 years"',
    ]);
    expect(all(root, 'testsuite').map((s) => s.attributes.name)).toEqual([LAG_FLAG.file, 'drafts/museum-label.md']);
    expect(all(root, 'failure')).toHaveLength(2);
  });

  it('writes an empty suite for a file with no claims', () => {
    expect(renderJunit(EMPTY_RESULT, OPTIONS)).toBe(
      '<?xml version="1.0" encoding="UTF-8"?>\n' +
        '<testsuites name="firnline" tests="0" failures="0" errors="0" skipped="0">\n' +
        '  <testsuite name="drafts/gift-shop.md" tests="0" failures="0" errors="0" skipped="0"/>\n' +
        '</testsuites>\n',
    );
  });
});
