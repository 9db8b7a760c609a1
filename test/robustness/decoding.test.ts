/**
 * Text decoding (ROBUSTNESS-REPORT B3, B4, B5, B23, O8): a draft that is not UTF-8 is never
 * passed over quietly. UTF-16 with a byte-order mark is read; anything else fails the run with the
 * place of the first bad byte, and the JSON and SARIF reports list the draft as not checked.
 *
 * The sample sentence gives the Vostok record as 800,000 years; the Vostok core spans about
 * 420,000 years (Petit et al. 1999, Nature 399, 429-436), so the built-in pack flags it.
 */
import { describe, expect, it } from 'vitest';
import { CHECKLIST_MARKER } from '../../src/report/checklist-markdown.js';
import { expectNoCrash, expectUserError, folderWith, runBin, runCli } from './helpers.js';

const VOSTOK = 'The Vostok core spans 800,000 years of CO2 history.\n';
const latin1 = (text: string) => Uint8Array.from([...text].map((c) => c.charCodeAt(0)));

describe('drafts that are not UTF-8', () => {
  it('B3: a stray Latin-1 byte fails the run with line:column and the byte, even under --require-signoff', async () => {
    const dir = await folderWith({ 'latin1.md': latin1(`Temperature \u00b0C: ${VOSTOK}`) });
    const run = await runCli(['check', 'latin1.md', '--require-signoff', '--fail-on', 'note'], dir);
    // Byte 0xB0 is the Latin-1 degree sign (ISO/IEC 8859-1); it is not a UTF-8 lead byte (RFC 3629).
    expectUserError(run, /^latin1\.md:1:13: not valid UTF-8 \(byte 0xB0\); save the file as UTF-8/u);
  });

  it('B23: one invalid byte inside an HTML comment no longer exempts a draft', async () => {
    const dir = await folderWith({ 'ff.md': Uint8Array.from([...Buffer.from('<!-- '), 0xff, ...Buffer.from(` -->\n${VOSTOK}`)]) });
    expectUserError(await runCli(['check', 'ff.md', '--require-signoff', '--fail-on', 'note'], dir), /^ff\.md:1:6: not valid UTF-8 \(byte 0xFF\)/u);
  });

  it('B23: a NUL byte (the old mark of a binary file) fails the run instead of skipping it', async () => {
    const dir = await folderWith({ 'nul.md': `<!-- x \u0000 -->\n${VOSTOK}` });
    expectUserError(await runCli(['check', '.', '--require-signoff'], dir), /^nul\.md:1:8: holds a NUL byte/u);
  });

  it.each([
    ['UTF-16 LE', Buffer.concat([Buffer.from([0xff, 0xfe]), Buffer.from(VOSTOK, 'utf16le')])],
    ['UTF-16 BE', Buffer.concat([Buffer.from([0xfe, 0xff]), Buffer.from(VOSTOK, 'utf16le').swap16()])],
    ['UTF-8 with a byte-order mark', Buffer.concat([Buffer.from([0xef, 0xbb, 0xbf]), Buffer.from(VOSTOK)])],
  ])('B4, B5: %s is read and checked like UTF-8', async (_what, bytes) => {
    const dir = await folderWith({ 'd.md': bytes });
    const run = await runCli(['check', 'd.md', '--format', 'json'], dir);
    expectNoCrash(run);
    expect(run.code).toBe(1);
    const report = JSON.parse(run.stdout) as { flags: { ruleId: string; span: { start: { line: number; column: number } } }[] };
    // The BOM is not a column: "800,000 years" starts at column 23 as in the plain UTF-8 copy.
    expect(report.flags.map((f) => [f.ruleId, f.span.start.line, f.span.start.column])).toEqual([['value.vostok-record-span', 1, 23]]);
  });

  it('JSON and SARIF list a draft that was not checked, and the other drafts are still checked', async () => {
    const dir = await folderWith({ 'bad.md': latin1(`Caf\u00e9 ${VOSTOK}`), 'good.md': VOSTOK });
    const json = await runCli(['check', '.', '--format', 'json'], dir);
    expect(json.code).toBe(2);
    const report = JSON.parse(json.stdout) as { files: string[]; skipped: unknown[] };
    expect(report.files).toEqual(['good.md']);
    expect(report.skipped).toEqual([{ file: 'bad.md', reason: expect.stringMatching(/^not valid UTF-8 \(byte 0xE9\)/u) as unknown, unchecked: true, line: 1, column: 4 }]);

    const sarif = JSON.parse((await runCli(['check', '.', '--format', 'sarif'], dir)).stdout) as { runs: { invocations: { executionSuccessful: boolean; toolExecutionNotifications: { level: string; locations: { physicalLocation: { artifactLocation: { uri: string }; region: { startLine: number } } }[] }[] }[] }[] };
    // SARIF 2.1.0 §3.20.14 executionSuccessful, §3.20.21 toolExecutionNotifications.
    const invocation = sarif.runs[0]?.invocations[0];
    expect(invocation?.executionSuccessful).toBe(false);
    expect(invocation?.toolExecutionNotifications.map((n) => [n.level, n.locations[0]?.physicalLocation.artifactLocation.uri, n.locations[0]?.physicalLocation.region.startLine])).toEqual([['error', 'bad.md', 1]]);
  });

  it('B23: a draft that only borrows the checklist marker line is still checked', async () => {
    const dir = await folderWith({ 'm.md': `${CHECKLIST_MARKER}\n${VOSTOK}` });
    const run = await runCli(['check', 'm.md', '--require-signoff', '--fail-on', 'note'], dir);
    expectNoCrash(run);
    expect(run.code).toBe(1);
    expect(run.stdout).toContain('m.md:2:23 · error · value.vostok-record-span');
  });

  it('O8: invalid UTF-8 on standard input is refused with its place, as in a file', async () => {
    const dir = await folderWith({ 'latin1.md': latin1(`Temperature \u00b0C: ${VOSTOK}`) });
    expectUserError(await runBin([], dir, { shell: 'FL check - < latin1.md' }), /^-:1:13: not valid UTF-8 \(byte 0xB0\)/u);
  });

  it('O8: the decoder standard input uses places the first bad byte', async () => {
    // runCli hands the CLI text, so the stdin decoder is the real process's; here the same decoder is checked directly.
    const { decodeDraftBytes } = await import('../../src/source/decode-text.js');
    expect(decodeDraftBytes(latin1('x\u00b0'))).toEqual({ problem: expect.stringMatching(/^not valid UTF-8 \(byte 0xB0\)/u) as unknown, line: 1, column: 2 });
  });
});
