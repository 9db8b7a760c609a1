import chalk from 'chalk';
import { describe, expect, it } from 'vitest';
import type { ReportOptions } from '../../src/report/report-options.js';
import { renderText } from '../../src/report/render-text.js';
import { EMPTY_RESULT, ICE_AGE_RESULT } from './fixtures/ice-age-result.js';

const OPTIONS: ReportOptions = { color: false, toolVersion: '0.1.0', failOn: 'error' };
// SGR escape sequences (ECMA-48 "CSI ... m"), the only kind chalk writes.
// eslint-disable-next-line no-control-regex -- ANSI escapes begin with ESC (ECMA-48)
const ANSI = /\u001b\[[0-9;]*m/g;
const stripAnsi = (text: string): string => text.replace(ANSI, '');

describe('text report', () => {
  const plain = renderText(ICE_AGE_RESULT, OPTIONS);

  it('matches the golden report for the sample run', async () => {
    await expect(plain).toMatchFileSnapshot('./__snapshots__/ice-age-result.txt');
  });

  it('writes one block per flag, in place order, each headed by path:line:column, level and rule id', () => {
    const heads = plain.split('\n\n').map((block) => block.split('\n')[0]);
    expect(heads.slice(0, 3)).toEqual([
      'drafts/glacial-co2.md:5:55 · note · value.deglacial-co2-rise',
      'drafts/ice-ages.md:3:88 · error · value.edc-record-span',
      'drafts/ice-ages.md:5:99 · warning · logic.lag-rules-out-cause',
    ]);
  });

  it('ends with the skipped files and one summary line', () => {
    expect(plain.endsWith(
      'Skipped drafts/staff-picnic.md: no topic term.\n' +
        'Checked 2 files: 4 claims found, 3 flags (1 error, 1 warning, 1 note), 1 file skipped.\n',
    )).toBe(true);
  });

  it('has no escape codes when colour is off', () => {
    expect(plain).not.toContain('\u001b');
  });

  it('colours only when asked, and the colours hide nothing: stripped, it is the plain report', () => {
    const coloured = renderText(ICE_AGE_RESULT, { ...OPTIONS, color: true });
    expect(coloured).toMatch(ANSI);
    expect(coloured).toContain('\u001b[31m'); // red for error (ECMA-48 SGR 31)
    expect(stripAnsi(coloured)).toBe(plain);
  });

  it('leaves the shared chalk instance as it found it', () => {
    const before = chalk.level;
    renderText(ICE_AGE_RESULT, { ...OPTIONS, color: true });
    renderText(ICE_AGE_RESULT, OPTIONS);
    expect(chalk.level).toBe(before);
  });

  it('says so when nothing was flagged', () => {
    expect(renderText(EMPTY_RESULT, OPTIONS)).toBe(
      'No flags.\nChecked 1 file: 0 claims found, 0 flags (0 errors, 0 warnings, 0 notes), 0 files skipped.\n',
    );
  });
});
